package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * Critical frame members of a plane whose frame is complete, from one random self-stress built
 * straight on the panels (flat arrays, no framework): the same answer as {@link CriticalByStress}
 * on the {@link FrameFramework} of the plane, in a few passes over the panels.
 *
 * <p>In the face form of {@link RandomSelfStress} (a 2-vector y = (a, b) per face, 0 outside,
 * (y_left - y_right) . d_e = 0 for every member e, the stress of e nonzero iff y_left differs from
 * y_right), a complete frame gives: across a ledger a is equal, across a standard b is equal. So a
 * is one value per ledger position (alpha, per bay and level), b one per standard position (beta, per
 * lift and line), 0 where the position is on the outline (top, both ends, and the base of a free
 * plane; a pinned base's ledgers carry no equation). An unbraced panel is one face: alpha and beta do
 * not change across it. A panel with one diagonal or a cross (whatever the diagonal's way) changes
 * them by h t going up and by w t going right for one free t per panel; a cross has one more free
 * value, the b of its top triangle. With mu = w h t per braced panel, the outline conditions say
 * that mu sums to 0 over every lift's braced panels and (free plane) over every bay's: mu is a
 * circulation on the brace graph (lifts and bays as vertices, a pinned base's bays as one ground
 * vertex), drawn at random on the edges off a spanning forest and solved up the forest. Every
 * self-stress arises so, from exactly one such circulation and cross values, so a member carries
 * some self-stress iff it carries this random one, with probability at least 1 - 1/p per member
 * (p = 2^61 - 1): an error can only call a member critical that is not (the cautious side).
 *
 * <p>A complete frame leaves no joint held by one member, so the critical members are exactly the
 * frame members that carry no stress (base ledgers of a pinned base excepted: they are the ground).
 */
final class CompleteFrameStress {
  private CompleteFrameStress() {}

  /** The critical frame members, sorted; {@code codes} as {@link PanelCodes}, tension bits ignored. */
  static List<FrameRef> criticalMembers(PlaneGrid grid, byte[] codes, long seed) {
    int m = grid.lifts();
    int n = grid.bays();
    boolean pinned = grid.support() == Support.PINNED_BASE;
    long[] w = new long[n + 1];
    long[] h = new long[m + 1];
    for (int j = 1; j <= n; j++) {
      w[j] = 2 * Math.max(1, Math.round(grid.bayWidths().get(j - 1) * 1000));
    }
    for (int i = 1; i <= m; i++) {
      h[i] = 2 * Math.max(1, Math.round(grid.liftHeights().get(i - 1) * 1000));
    }
    SplittableRandom rnd = new SplittableRandom(seed);
    long[] mu = circulation(m, n, pinned, codes, rnd);
    // cross values: row-scaled b of the top triangle (h times it), random
    long[] top = new long[m * n];
    for (int idx = 0; idx < codes.length; idx++) {
      if ((codes[idx] & 3) == 3) {
        top[idx] = ModularEchelon.random(rnd);
      }
    }
    // M[(i-1)(n+1) + j] = h_i beta_i(j) = sum of mu over lift i's panels in bays <= j
    long[] rowSum = new long[m * (n + 1)];
    for (int i = 1; i <= m; i++) {
      int base = (i - 1) * (n + 1);
      for (int j = 1; j <= n; j++) {
        rowSum[base + j] = ModularEchelon.add(rowSum[base + j - 1], mu[(i - 1) * n + j - 1]);
      }
    }
    // A[level * n + j - 1] = w_j alpha_j(level) = - sum of mu over bay j's panels above the level
    long[] colA = new long[(m + 1) * n];
    for (int level = m - 1; level >= 0; level--) {
      for (int j = 1; j <= n; j++) {
        colA[level * n + j - 1] =
            ModularEchelon.sub(colA[(level + 1) * n + j - 1], mu[level * n + j - 1]);
      }
    }
    List<FrameRef> out = new ArrayList<>();
    for (int level = pinned ? 1 : 0; level <= m; level++) {
      for (int j = 1; j <= n; j++) {
        long below = level == 0 ? 0 : topB(codes, rowSum, top, n, level, j);
        long above = level == m ? 0 : bottomB(codes, rowSum, top, n, level + 1, j);
        boolean stressed;
        if (level == 0 || level == m) {
          stressed = below != 0 || above != 0;
        } else {
          stressed = ModularEchelon.mul(below, h[level + 1]) != ModularEchelon.mul(above, h[level]);
        }
        if (!stressed) {
          out.add(FrameRef.ledger(level, j));
        }
      }
    }
    for (int i = 1; i <= m; i++) {
      for (int line = 0; line <= n; line++) {
        long left = line == 0 ? 0 : rightA(codes, rowSum, colA, top, n, i, line);
        long right = line == n ? 0 : leftA(codes, rowSum, colA, top, n, i, line + 1);
        boolean stressed;
        if (line == 0 || line == n) {
          stressed = left != 0 || right != 0;
        } else {
          stressed = ModularEchelon.mul(left, w[line + 1]) != ModularEchelon.mul(right, w[line]);
        }
        if (!stressed) {
          out.add(FrameRef.standard(i, line));
        }
      }
    }
    return out;
  }

  /** h_i times the b of the face of panel (i, j) on its top ledger. */
  private static long topB(byte[] codes, long[] rowSum, long[] top, int n, int i, int j) {
    int idx = (i - 1) * n + j - 1;
    int base = (i - 1) * (n + 1);
    return switch (codes[idx] & 3) {
      case 1 -> rowSum[base + j - 1];
      case 3 -> top[idx];
      default -> rowSum[base + j];
    };
  }

  /** h_i times the b of the face of panel (i, j) on its bottom ledger. */
  private static long bottomB(byte[] codes, long[] rowSum, long[] top, int n, int i, int j) {
    int idx = (i - 1) * n + j - 1;
    int base = (i - 1) * (n + 1);
    return switch (codes[idx] & 3) {
      case 1 -> rowSum[base + j];
      case 3 -> ModularEchelon.sub(
          ModularEchelon.add(rowSum[base + j - 1], rowSum[base + j]), top[idx]);
      default -> rowSum[base + j - 1];
    };
  }

  /** w_j times the a of the face of panel (i, j) on its right standard. */
  private static long rightA(
      byte[] codes, long[] rowSum, long[] colA, long[] top, int n, int i, int j) {
    int idx = (i - 1) * n + j - 1;
    long up = colA[i * n + j - 1];
    long down = colA[(i - 1) * n + j - 1];
    return switch (codes[idx] & 3) {
      case 1 -> down;
      case 3 -> ModularEchelon.add(
          up, ModularEchelon.sub(top[idx], rowSum[(i - 1) * (n + 1) + j]));
      default -> up;
    };
  }

  /** w_j times the a of the face of panel (i, j) on its left standard. */
  private static long leftA(
      byte[] codes, long[] rowSum, long[] colA, long[] top, int n, int i, int j) {
    int idx = (i - 1) * n + j - 1;
    long up = colA[i * n + j - 1];
    long down = colA[(i - 1) * n + j - 1];
    return switch (codes[idx] & 3) {
      case 1 -> up;
      case 3 -> ModularEchelon.add(
          ModularEchelon.sub(up, top[idx]), rowSum[(i - 1) * (n + 1) + j - 1]);
      default -> down;
    };
  }

  /**
   * A random circulation mu per panel (0 where unbraced): at every lift, and at every bay of a free
   * plane, mu sums to 0 over the braced panels there; a pinned base's bays are one ground vertex
   * with no condition. Random on the edges off a breadth-first spanning forest, solved on the
   * others from the leaves up.
   */
  private static long[] circulation(int m, int n, boolean pinned, byte[] codes, SplittableRandom rnd) {
    int vertices = m + (pinned ? 1 : n);
    int[] start = new int[vertices + 1];
    int edges = 0;
    for (int idx = 0; idx < codes.length; idx++) {
      if ((codes[idx] & 3) != 0) {
        start[idx / n + 1]++;
        start[colVertex(m, n, pinned, idx) + 1]++;
        edges++;
      }
    }
    long[] mu = new long[m * n];
    if (edges == 0) {
      return mu;
    }
    for (int v = 0; v < vertices; v++) {
      start[v + 1] += start[v];
    }
    int[] adj = new int[start[vertices]];
    int[] fill = Arrays.copyOf(start, vertices);
    for (int idx = 0; idx < codes.length; idx++) {
      if ((codes[idx] & 3) != 0) {
        adj[fill[idx / n]++] = idx;
        adj[fill[colVertex(m, n, pinned, idx)]++] = idx;
      }
    }
    int[] parentEdge = new int[vertices];
    Arrays.fill(parentEdge, -2);
    boolean[] treeEdge = new boolean[m * n];
    int[] order = new int[vertices];
    int len = 0;
    int first = pinned ? m : 0;
    for (int r = 0; r < vertices; r++) {
      int root = (first + r) % vertices;
      if (parentEdge[root] != -2) {
        continue;
      }
      parentEdge[root] = -1;
      int head = len;
      order[len++] = root;
      while (head < len) {
        int u = order[head++];
        for (int k = start[u]; k < start[u + 1]; k++) {
          int idx = adj[k];
          int v = idx / n == u ? colVertex(m, n, pinned, idx) : idx / n;
          if (parentEdge[v] == -2) {
            parentEdge[v] = idx;
            treeEdge[idx] = true;
            order[len++] = v;
          }
        }
      }
    }
    long[] sum = new long[vertices];
    for (int idx = 0; idx < codes.length; idx++) {
      if ((codes[idx] & 3) != 0 && !treeEdge[idx]) {
        mu[idx] = ModularEchelon.random(rnd);
        sum[idx / n] = ModularEchelon.add(sum[idx / n], mu[idx]);
        int c = colVertex(m, n, pinned, idx);
        sum[c] = ModularEchelon.add(sum[c], mu[idx]);
      }
    }
    for (int k = len - 1; k >= 0; k--) {
      int v = order[k];
      int idx = parentEdge[v];
      if (idx < 0) {
        continue;
      }
      mu[idx] = ModularEchelon.sub(0, sum[v]);
      int other = idx / n == v ? colVertex(m, n, pinned, idx) : idx / n;
      sum[v] = 0;
      sum[other] = ModularEchelon.add(sum[other], mu[idx]);
    }
    return mu;
  }

  private static int colVertex(int m, int n, boolean pinned, int idx) {
    return pinned ? m : m + idx % n;
  }
}
