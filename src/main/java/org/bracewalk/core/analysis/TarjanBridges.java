package org.bracewalk.core.analysis;

import java.util.Arrays;

/**
 * The critical braces of a plane: the members that are bridges of the undirected multigraph (all
 * members and the ground links), so that losing one of them alone adds a degree of freedom.
 * Parallel members (a cross) are never bridges. Tarjan's bridge-finding by DFS low-links (R.
 * Tarjan, "A note on finding the bridges of a graph", Inf. Process. Lett. 2 (1974)), iterative,
 * O(V + E).
 *
 * <p>Flat arrays (CSR adjacency), not JGraphT: this runs on every plane and every state, up to a
 * million members, where an object graph costs far more time and heap; JGraphT's {@code
 * BiconnectivityInspector} is the independent oracle in {@code GraphCrossCheckTest}.
 */
final class TarjanBridges {
  private TarjanBridges() {}

  /** A flag per member of {@code g}: whether it is a bridge ({@code rigidOnly}: of the rigid members). */
  static boolean[] of(BraceGraph g, boolean rigidOnly) {
    int v = g.vertexCount;
    int memberCount = g.memberCount();
    int groundLinks = g.pinned ? g.bays : 0;
    int edges = memberCount + groundLinks;
    int[] eu = new int[edges];
    int[] ev = new int[edges];
    boolean[] present = new boolean[edges];
    for (int e = 0; e < memberCount; e++) {
      eu[e] = g.liftVertex(e);
      ev[e] = g.bayVertex(e);
      present[e] = !rigidOnly || g.isRigid(e);
    }
    for (int j = 0; j < groundLinks; j++) {
      eu[memberCount + j] = g.ground;
      ev[memberCount + j] = g.lifts + j;
      present[memberCount + j] = true;
    }
    int[] deg = new int[v];
    for (int e = 0; e < edges; e++) {
      if (present[e]) {
        deg[eu[e]]++;
        deg[ev[e]]++;
      }
    }
    int[] start = new int[v + 1];
    for (int i = 0; i < v; i++) {
      start[i + 1] = start[i] + deg[i];
    }
    int[] fill = Arrays.copyOf(start, v);
    int[] adjEdge = new int[start[v]];
    for (int e = 0; e < edges; e++) {
      if (present[e]) {
        adjEdge[fill[eu[e]]++] = e;
        adjEdge[fill[ev[e]]++] = e;
      }
    }
    int[] disc = new int[v];
    Arrays.fill(disc, -1);
    int[] low = new int[v];
    int[] callVertex = new int[v];
    int[] callParentEdge = new int[v];
    int[] callPos = new int[v];
    boolean[] bridge = new boolean[memberCount];
    int counter = 0;
    for (int root = 0; root < v; root++) {
      if (disc[root] >= 0) {
        continue;
      }
      int depth = 0;
      callVertex[0] = root;
      callParentEdge[0] = -1;
      callPos[0] = start[root];
      disc[root] = low[root] = counter++;
      while (depth >= 0) {
        int x = callVertex[depth];
        if (callPos[depth] < start[x + 1]) {
          int e = adjEdge[callPos[depth]++];
          if (e == callParentEdge[depth]) {
            continue;
          }
          int y = eu[e] == x ? ev[e] : eu[e];
          if (disc[y] < 0) {
            disc[y] = low[y] = counter++;
            depth++;
            callVertex[depth] = y;
            callParentEdge[depth] = e;
            callPos[depth] = start[y];
          } else if (disc[y] < low[x]) {
            low[x] = disc[y];
          }
        } else {
          int pe = callParentEdge[depth];
          depth--;
          if (depth >= 0) {
            int parent = callVertex[depth];
            if (low[x] < low[parent]) {
              low[parent] = low[x];
            }
            if (low[x] > disc[parent] && pe < memberCount) {
              bridge[pe] = true;
            }
          }
        }
      }
    }
    return bridge;
  }
}
