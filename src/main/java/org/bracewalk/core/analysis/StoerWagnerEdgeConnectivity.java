package org.bracewalk.core.analysis;

import java.util.Arrays;

/**
 * The loss tolerance of a plane: the edge connectivity of the graph of its rigid members, the
 * ground links unbreakable (analysis.md: the plane survives the loss of any {@code k} braces iff
 * that graph is {@code (k + 1)}-edge-connected).
 *
 * <ul>
 *   <li>Pinned base: the ground and every bay act as one vertex, so the edge connectivity is the
 *       least number of rigid members in any lift (one pass over the members).
 *   <li>Free plane, up to {@code exactLimit} lifts + bays: a global minimum cut by Stoer-Wagner
 *       (M. Stoer, F. Wagner, "A simple min-cut algorithm", J. ACM 44 (1997)) on a dense matrix
 *       of lifts and bays, O(V³).
 *   <li>Free plane, larger: a lower bound (0 when the rigid members do not hold the plane
 *       together, 1 when one of them is a bridge by {@link TarjanBridges}, else 2 or the least
 *       degree if lower), flagged as not exact.
 * </ul>
 *
 * <p>Why a dense matrix and not JGraphT's {@code StoerWagnerMinimumCut}: the stored planes reach
 * the exact limit (100 lifts + 500 bays), and a free plane near it is dense in edges. Measured on
 * the shared two-core build machine, a free 299 x 300 plane with half its panels braced took 0.25 s
 * here and 23.6 s with JGraphT 1.5.3 (150 x 150: 0.05 s against 0.87 s); its object graph and
 * pairing heap cost about a hundred times the matrix at this size. {@code GraphCrossCheckTest}
 * checks this one against an independent computation (the least maximum flow, JGraphT's
 * Edmonds-Karp).
 */
final class StoerWagnerEdgeConnectivity {
  private StoerWagnerEdgeConnectivity() {}

  /** Edge connectivity, exact or a lower bound. */
  record Connectivity(int value, boolean exact) {}

  static Connectivity of(BraceGraph g, int exactLimit) {
    if (g.pinned) {
      int[] perLift = new int[g.lifts];
      for (int e = 0; e < g.memberCount(); e++) {
        if (g.isRigid(e)) {
          perLift[g.liftVertex(e)]++;
        }
      }
      int min = Integer.MAX_VALUE;
      for (int c : perLift) {
        min = Math.min(min, c);
      }
      return new Connectivity(min, true);
    }
    if (UnionFindBlocks.of(g, true).count() > 1) {
      return new Connectivity(0, true);
    }
    int v = g.vertexCount;
    if (v <= exactLimit) {
      return new Connectivity(minimumCut(g), true);
    }
    int[] deg = new int[v];
    for (int e = 0; e < g.memberCount(); e++) {
      if (g.isRigid(e)) {
        deg[g.liftVertex(e)]++;
        deg[g.bayVertex(e)]++;
      }
    }
    int minDegree = Integer.MAX_VALUE;
    for (int d : deg) {
      minDegree = Math.min(minDegree, d);
    }
    boolean[] br = TarjanBridges.of(g, true);
    boolean anyBridge = false;
    for (int e = 0; e < g.memberCount(); e++) {
      if (g.isRigid(e) && br[e]) {
        anyBridge = true;
        break;
      }
    }
    int lower = anyBridge ? 1 : Math.min(2, minDegree);
    return new Connectivity(lower, lower == minDegree);
  }

  private static int minimumCut(BraceGraph g) {
    int size = g.vertexCount;
    // Active vertices always occupy positions 0..size-1 so that the inner loops run over
    // contiguous rows; a merged-away vertex is replaced by the one in the last position.
    int[][] w = new int[size][size];
    for (int e = 0; e < g.memberCount(); e++) {
      if (g.isRigid(e)) {
        int a = g.liftVertex(e);
        int b = g.bayVertex(e);
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
}
