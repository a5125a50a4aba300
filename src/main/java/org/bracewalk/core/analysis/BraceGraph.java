package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * The brace graph of one bracing state, held in flat arrays so that planes of a million panels
 * stay fast and small. Vertex {@code i} (0-based) is lift {@code i + 1}, vertex {@code m + j} is
 * bay {@code j + 1}, and on a pinned base vertex {@code m + n} is the ground, joined to every bay by
 * links that cannot be lost. Each member is one edge: a cross is two parallel edges.
 *
 * <p>Arcs for tension-only members follow analysis.md: a rising ({@code /}) member in panel
 * {@code (i, j)} gives the arc lift → bay, a falling ({@code \}) member the arc bay → lift; a rigid
 * member and every ground link give both arcs.
 */
final class BraceGraph {
  static final byte RISING = 0;
  static final byte FALLING = 1;

  final int lifts;
  final int bays;
  final boolean pinned;
  final int vertexCount;
  final int ground;
  private int memberCount;
  private int[] lift = new int[16];
  private int[] bay = new int[16];
  private byte[] dir = new byte[16];
  private boolean[] rigid = new boolean[16];
  private int tensionCount;

  BraceGraph(PlaneGrid grid) {
    this.lifts = grid.lifts();
    this.bays = grid.bays();
    this.pinned = grid.support() == Support.PINNED_BASE;
    this.ground = pinned ? lifts + bays : -1;
    this.vertexCount = lifts + bays + (pinned ? 1 : 0);
  }

  static BraceGraph of(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return of(grid, PanelCodes.encode(grid, members));
  }

  /** The graph of the members coded per panel (see {@link PanelCodes}), in lift-then-bay order. */
  static BraceGraph of(PlaneGrid grid, byte[] codes) {
    BraceGraph g = new BraceGraph(grid);
    int n = grid.bays();
    for (int idx = 0; idx < codes.length; idx++) {
      if (codes[idx] != PanelCodes.NONE) {
        g.add(idx / n, idx % n, PanelCodes.decode(codes[idx]));
      }
    }
    return g;
  }

  BraceGraph copy() {
    BraceGraph c = new BraceGraph(lifts, bays, pinned);
    c.memberCount = memberCount;
    c.lift = Arrays.copyOf(lift, lift.length);
    c.bay = Arrays.copyOf(bay, bay.length);
    c.dir = Arrays.copyOf(dir, dir.length);
    c.rigid = Arrays.copyOf(rigid, rigid.length);
    c.tensionCount = tensionCount;
    return c;
  }

  private BraceGraph(int lifts, int bays, boolean pinned) {
    this.lifts = lifts;
    this.bays = bays;
    this.pinned = pinned;
    this.ground = pinned ? lifts + bays : -1;
    this.vertexCount = lifts + bays + (pinned ? 1 : 0);
  }

  /** Adds the member(s) of {@code brace} in panel {@code p}; returns how many edges were added. */
  int add(PanelRef p, Brace brace) {
    return add(p.lift() - 1, p.bay() - 1, brace);
  }

  private int add(int l, int b, Brace brace) {
    boolean isRigid = brace.isRigid();
    int added = 0;
    if (brace.diagonal().hasRising()) {
      addMember(l, b, RISING, isRigid);
      added++;
    }
    if (brace.diagonal().hasFalling()) {
      addMember(l, b, FALLING, isRigid);
      added++;
    }
    return added;
  }

  /** Removes the last {@code count} members added. */
  void removeLast(int count) {
    for (int k = 0; k < count; k++) {
      memberCount--;
      if (!rigid[memberCount]) {
        tensionCount--;
      }
    }
  }

  private void addMember(int l, int b, byte d, boolean isRigid) {
    if (memberCount == lift.length) {
      int cap = memberCount * 2;
      lift = Arrays.copyOf(lift, cap);
      bay = Arrays.copyOf(bay, cap);
      dir = Arrays.copyOf(dir, cap);
      rigid = Arrays.copyOf(rigid, cap);
    }
    lift[memberCount] = l;
    bay[memberCount] = b;
    dir[memberCount] = d;
    rigid[memberCount] = isRigid;
    memberCount++;
    if (!isRigid) {
      tensionCount++;
    }
  }

  int memberCount() {
    return memberCount;
  }

  boolean hasTension() {
    return tensionCount > 0;
  }

  int liftVertex(int member) {
    return lift[member];
  }

  int bayVertex(int member) {
    return lifts + bay[member];
  }

  PanelRef panel(int member) {
    return new PanelRef(lift[member] + 1, bay[member] + 1);
  }

  // ---------------------------------------------------------------- connectivity

  /** Union-find over all members (tension-only treated as rigid) and the ground links. */
  UnionFind components(boolean rigidOnly) {
    UnionFind uf = new UnionFind(vertexCount);
    if (pinned) {
      for (int j = 0; j < bays; j++) {
        uf.union(ground, lifts + j);
      }
    }
    for (int e = 0; e < memberCount; e++) {
      if (!rigidOnly || rigid[e]) {
        uf.union(lift[e], lifts + bay[e]);
      }
    }
    return uf;
  }

  /**
   * Number of strongly connected components of the digraph (Tarjan's algorithm, iterative; R.
   * Tarjan, SIAM J. Comput. 1 (1972)). O(V + E).
   */
  int strongComponentCount() {
    return strongComponents()[vertexCount];
  }

  /** Component id per vertex; the last entry holds the number of components. */
  int[] strongComponents() {
    int v = vertexCount;
    // Arcs in CSR form.
    int[] outDeg = new int[v];
    for (int e = 0; e < memberCount; e++) {
      int lv = lift[e];
      int bv = lifts + bay[e];
      if (rigid[e]) {
        outDeg[lv]++;
        outDeg[bv]++;
      } else if (dir[e] == RISING) {
        outDeg[lv]++;
      } else {
        outDeg[bv]++;
      }
    }
    if (pinned) {
      outDeg[ground] += bays;
      for (int j = 0; j < bays; j++) {
        outDeg[lifts + j]++;
      }
    }
    int[] start = new int[v + 1];
    for (int i = 0; i < v; i++) {
      start[i + 1] = start[i] + outDeg[i];
    }
    int[] fill = Arrays.copyOf(start, v);
    int[] head = new int[start[v]];
    for (int e = 0; e < memberCount; e++) {
      int lv = lift[e];
      int bv = lifts + bay[e];
      if (rigid[e]) {
        head[fill[lv]++] = bv;
        head[fill[bv]++] = lv;
      } else if (dir[e] == RISING) {
        head[fill[lv]++] = bv;
      } else {
        head[fill[bv]++] = lv;
      }
    }
    if (pinned) {
      for (int j = 0; j < bays; j++) {
        head[fill[ground]++] = lifts + j;
        head[fill[lifts + j]++] = ground;
      }
    }
    int[] index = new int[v];
    Arrays.fill(index, -1);
    int[] low = new int[v];
    int[] comp = new int[v + 1];
    Arrays.fill(comp, -1);
    boolean[] onStack = new boolean[v];
    int[] stack = new int[v];
    int sp = 0;
    int[] callVertex = new int[v];
    int[] callEdge = new int[v];
    int counter = 0;
    int comps = 0;
    for (int root = 0; root < v; root++) {
      if (index[root] >= 0) {
        continue;
      }
      int depth = 0;
      callVertex[0] = root;
      callEdge[0] = start[root];
      index[root] = low[root] = counter++;
      stack[sp++] = root;
      onStack[root] = true;
      while (depth >= 0) {
        int x = callVertex[depth];
        if (callEdge[depth] < start[x + 1]) {
          int y = head[callEdge[depth]++];
          if (index[y] < 0) {
            index[y] = low[y] = counter++;
            stack[sp++] = y;
            onStack[y] = true;
            depth++;
            callVertex[depth] = y;
            callEdge[depth] = start[y];
          } else if (onStack[y] && index[y] < low[x]) {
            low[x] = index[y];
          }
        } else {
          if (low[x] == index[x]) {
            int y;
            do {
              y = stack[--sp];
              onStack[y] = false;
              comp[y] = comps;
            } while (y != x);
            comps++;
          }
          depth--;
          if (depth >= 0) {
            int parent = callVertex[depth];
            if (low[x] < low[parent]) {
              low[parent] = low[x];
            }
          }
        }
      }
    }
    comp[v] = comps;
    return comp;
  }

  /**
   * The members that are bridges of the undirected multigraph (all members and ground links):
   * losing one of them alone adds a degree of freedom. Parallel members are never bridges. Tarjan's
   * bridge-finding by DFS low-links, iterative, O(V + E).
   */
  boolean[] bridges(boolean rigidOnly) {
    int v = vertexCount;
    int groundLinks = pinned ? bays : 0;
    int edges = memberCount + groundLinks;
    int[] eu = new int[edges];
    int[] ev = new int[edges];
    boolean[] present = new boolean[edges];
    for (int e = 0; e < memberCount; e++) {
      eu[e] = lift[e];
      ev[e] = lifts + bay[e];
      present[e] = !rigidOnly || rigid[e];
    }
    for (int j = 0; j < groundLinks; j++) {
      eu[memberCount + j] = ground;
      ev[memberCount + j] = lifts + j;
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

  /**
   * Edge connectivity of the graph of rigid members, with the ground links unbreakable. On a
   * pinned base the ground and all bays act as one vertex, so it is the least number of rigid
   * members in any lift. On a free plane it is a global minimum cut (M. Stoer, F. Wagner, "A simple
   * min-cut algorithm", J. ACM 44 (1997)), O(V³) on a dense matrix, done exactly up to {@code
   * exactLimit} vertices; above that a lower bound is returned (see {@link Connectivity}).
   */
  Connectivity rigidEdgeConnectivity(int exactLimit) {
    if (pinned) {
      int[] perLift = new int[lifts];
      for (int e = 0; e < memberCount; e++) {
        if (rigid[e]) {
          perLift[lift[e]]++;
        }
      }
      int min = Integer.MAX_VALUE;
      for (int c : perLift) {
        min = Math.min(min, c);
      }
      return new Connectivity(min, true);
    }
    if (components(true).count() > 1) {
      return new Connectivity(0, true);
    }
    int v = vertexCount;
    int[] deg = new int[v];
    for (int e = 0; e < memberCount; e++) {
      if (rigid[e]) {
        deg[lift[e]]++;
        deg[lifts + bay[e]]++;
      }
    }
    int minDegree = Arrays.stream(deg).min().orElse(0);
    if (v <= exactLimit) {
      return new Connectivity(stoerWagner(), true);
    }
    boolean[] br = bridges(true);
    boolean anyBridge = false;
    for (int e = 0; e < memberCount; e++) {
      if (rigid[e] && br[e]) {
        anyBridge = true;
        break;
      }
    }
    int lower = anyBridge ? 1 : Math.min(2, minDegree);
    return new Connectivity(lower, lower == minDegree);
  }

  private int stoerWagner() {
    int size = vertexCount;
    // Active vertices always occupy positions 0..size-1 so that the inner loops run over
    // contiguous rows; a merged-away vertex is replaced by the one in the last position.
    int[][] w = new int[size][size];
    for (int e = 0; e < memberCount; e++) {
      if (rigid[e]) {
        int a = lift[e];
        int b = lifts + bay[e];
        w[a][b]++;
        w[b][a]++;
      }
    }
    int best = Integer.MAX_VALUE;
    int[] key = new int[size];
    boolean[] added = new boolean[size];
    while (size > 1) {
      Arrays.fill(key, 0, size, 0);
      Arrays.fill(added, 0, size, false);
      int pick = 0;
      int prev = -1;
      for (int step = 0; step < size; step++) {
        added[pick] = true;
        if (step == size - 1) {
          best = Math.min(best, key[pick]);
          break;
        }
        int[] row = w[pick];
        int next = -1;
        for (int k = 0; k < size; k++) {
          if (!added[k]) {
            key[k] += row[k];
            if (next < 0 || key[k] > key[next]) {
              next = k;
            }
          }
        }
        prev = pick;
        pick = next;
      }
      int last = pick;
      int[] pr = w[prev];
      int[] lr = w[last];
      for (int k = 0; k < size; k++) {
        pr[k] += lr[k];
        w[k][prev] = pr[k];
      }
      pr[prev] = 0;
      int s = size - 1;
      if (last != s) {
        int[] sr = w[s];
        for (int k = 0; k < size; k++) {
          if (k != last) {
            lr[k] = sr[k];
            w[k][last] = w[k][s];
          }
        }
        lr[last] = 0;
      }
      size--;
    }
    return best;
  }

  /** Edge connectivity, exact or a lower bound. */
  record Connectivity(int value, boolean exact) {}

  /** Members of each panel, for listing critical panels. */
  List<PanelRef> panelsOf(boolean[] memberFlags) {
    List<PanelRef> out = new ArrayList<>();
    for (int e = 0; e < memberCount; e++) {
      if (memberFlags[e]) {
        out.add(panel(e));
      }
    }
    return out;
  }

  /** Disjoint sets with path halving and union by size. */
  static final class UnionFind {
    private final int[] parent;
    private final int[] size;
    private int count;

    UnionFind(int n) {
      parent = new int[n];
      size = new int[n];
      for (int i = 0; i < n; i++) {
        parent[i] = i;
        size[i] = 1;
      }
      count = n;
    }

    int find(int x) {
      while (parent[x] != x) {
        parent[x] = parent[parent[x]];
        x = parent[x];
      }
      return x;
    }

    /** Joins the sets of a and b; true when they were apart. */
    boolean union(int a, int b) {
      int ra = find(a);
      int rb = find(b);
      if (ra == rb) {
        return false;
      }
      if (size[ra] < size[rb]) {
        int t = ra;
        ra = rb;
        rb = t;
      }
      parent[rb] = ra;
      size[ra] += size[rb];
      count--;
      return true;
    }

    int count() {
      return count;
    }
  }
}
