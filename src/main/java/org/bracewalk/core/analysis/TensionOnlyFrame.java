package org.bracewalk.core.analysis;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Tension-only members where the frame is incomplete, decided exactly (B. Roth, W. Whiteley,
 * "Tensegrity frameworks", Trans. AMS 265 (1981)): given that the framework has no motion with the
 * tension members as bars, it is rigid iff no nonzero motion of the rigid members' framework
 * avoids lengthening every tension member (a cable goes slack when shortened), i.e. there is no u
 * with L u &lt;= 0 and (sum of the rows of L) u &lt;= -1, where the columns of L are the motions of
 * the rigid members' framework (an exact integer null-space basis, {@link ExactRank}) and its rows
 * the tension members' rates of lengthening. That small system is decided by Fourier-Motzkin
 * elimination over BigInteger (exact; the basis has as many vectors as the rigid members' framework
 * has freedoms, which is small).
 *
 * <p>Frameworks of more than {@value #JOINT_LIMIT} joints, or where the elimination grows beyond
 * {@value #ROW_LIMIT} rows, are decided by the sufficient half only: rigid when the rigid members
 * alone make the plane rigid, otherwise not rigid (one way only), the cautious side.
 */
final class TensionOnlyFrame {
  static final int JOINT_LIMIT = 160;
  static final int ROW_LIMIT = 20_000;

  private TensionOnlyFrame() {}

  /** The verdict on a state whose freedoms (tension-only members as bars) are already 0. */
  static boolean rigid(PlaneGrid grid, byte[] codes, Set<FrameRef> absent) {
    byte[] rigidOnly = new byte[codes.length];
    for (int i = 0; i < codes.length; i++) {
      rigidOnly[i] = PanelCodes.isRigid(codes[i]) ? codes[i] : PanelCodes.NONE;
    }
    boolean[] there = FramePlaneAnalyzer.frameThere(grid, absent);
    FrameFramework rigidFw = FrameFramework.of(grid, rigidOnly, there);
    if (FrameFreedoms.of(rigidFw, FramePlaneAnalyzer.SEED).dof == 0) {
      return true;
    }
    Boolean exact = exactTest(grid, codes, there);
    return exact != null && exact;
  }

  /** The exact test, or null when the plane is too large for it. */
  private static Boolean exactTest(PlaneGrid grid, byte[] codes, boolean[] there) {
    FrameFramework fw = FrameFramework.of(grid, new byte[codes.length], there);
    int n = grid.bays();
    List<int[]> bars = new ArrayList<>();
    List<int[]> cables = new ArrayList<>();
    for (int e = 0; e < fw.memberCount; e++) {
      if (fw.present[e] && !fw.ground[e]) {
        bars.add(new int[] {fw.ja[e], fw.jb[e]});
      }
    }
    for (int idx = 0; idx < codes.length; idx++) {
      int lift = idx / n;
      int bay = idx % n;
      List<int[]> into = PanelCodes.isRigid(codes[idx]) ? bars : cables;
      if ((codes[idx] & 1) != 0) {
        into.add(new int[] {fw.joint(lift, bay), fw.joint(lift + 1, bay + 1)});
      }
      if ((codes[idx] & 2) != 0) {
        into.add(new int[] {fw.joint(lift + 1, bay), fw.joint(lift, bay + 1)});
      }
    }
    // columns: joints carrying members, the base dropped on a pinned plane
    Map<Integer, Integer> col = new HashMap<>();
    List<int[]> all = new ArrayList<>(bars);
    all.addAll(cables);
    for (int[] b : all) {
      for (int j : b) {
        if (!(fw.pinned && j <= n)) {
          col.putIfAbsent(j, col.size());
        }
      }
    }
    if (col.size() > JOINT_LIMIT) {
      return null;
    }
    int cols = 2 * col.size();
    List<long[]> rows = new ArrayList<>();
    for (int[] b : bars) {
      rows.add(row(fw, col, cols, b));
    }
    if (!fw.pinned && !col.isEmpty()) {
      // hold the plane's rigid motions: the first joint fixed, the second held across the line
      int j0 = -1;
      int j1 = -1;
      for (Map.Entry<Integer, Integer> e : col.entrySet()) {
        if (e.getValue() == 0) {
          j0 = e.getKey();
        } else if (e.getValue() == 1) {
          j1 = e.getKey();
        }
      }
      long[] r0 = new long[cols];
      r0[0] = 1;
      long[] r1 = new long[cols];
      r1[1] = 1;
      rows.add(r0);
      rows.add(r1);
      if (j1 >= 0) {
        long[] r2 = new long[cols];
        r2[2] = -(fw.y(j1) - fw.y(j0));
        r2[3] = fw.x(j1) - fw.x(j0);
        rows.add(r2);
      }
    }
    BigInteger[][] basis = ExactRank.nullBasis(rows.toArray(new long[0][]), cols);
    int k = basis.length;
    if (k == 0) {
      return true;
    }
    // L: rate of lengthening of each cable along each basis motion
    List<BigInteger[]> ineq = new ArrayList<>();
    BigInteger[] sum = new BigInteger[k + 1];
    java.util.Arrays.fill(sum, BigInteger.ZERO);
    for (int[] c : cables) {
      long[] r = row(fw, col, cols, c);
      BigInteger[] li = new BigInteger[k + 1];
      for (int t = 0; t < k; t++) {
        BigInteger s = BigInteger.ZERO;
        for (int q = 0; q < cols; q++) {
          if (r[q] != 0) {
            s = s.add(BigInteger.valueOf(r[q]).multiply(basis[t][q]));
          }
        }
        li[t] = s;
        sum[t] = sum[t].add(s);
      }
      li[k] = BigInteger.ZERO;
      ineq.add(li);
    }
    sum[k] = BigInteger.ONE.negate();
    ineq.add(sum);
    Boolean feasible = feasible(ineq, k);
    return feasible == null ? null : !feasible;
  }

  private static long[] row(FrameFramework fw, Map<Integer, Integer> col, int cols, int[] b) {
    long[] r = new long[cols];
    long dx = fw.x(b[1]) - fw.x(b[0]);
    long dy = fw.y(b[1]) - fw.y(b[0]);
    Integer a = col.get(b[0]);
    Integer c = col.get(b[1]);
    if (a != null) {
      r[2 * a] -= dx;
      r[2 * a + 1] -= dy;
    }
    if (c != null) {
      r[2 * c] += dx;
      r[2 * c + 1] += dy;
    }
    return r;
  }

  /**
   * Whether some u satisfies every row a . u &lt;= b (row = a_0..a_{k-1}, b), by Fourier-Motzkin
   * elimination; null when the rows grow beyond the limit.
   */
  static Boolean feasible(List<BigInteger[]> rows, int k) {
    List<BigInteger[]> cur = new ArrayList<>();
    for (BigInteger[] r : rows) {
      cur.add(normal(r));
    }
    for (int v = k - 1; v >= 0; v--) {
      List<BigInteger[]> pos = new ArrayList<>();
      List<BigInteger[]> neg = new ArrayList<>();
      List<BigInteger[]> next = new ArrayList<>();
      for (BigInteger[] r : cur) {
        int s = r[v].signum();
        (s > 0 ? pos : s < 0 ? neg : next).add(r);
      }
      if ((long) pos.size() * neg.size() + next.size() > ROW_LIMIT) {
        return null;
      }
      for (BigInteger[] p : pos) {
        for (BigInteger[] q : neg) {
          BigInteger a = p[v];
          BigInteger b = q[v].negate();
          BigInteger[] r = new BigInteger[k + 1];
          for (int t = 0; t <= k; t++) {
            r[t] = p[t].multiply(b).add(q[t].multiply(a));
          }
          next.add(normal(r));
        }
      }
      java.util.Set<List<BigInteger>> seen = new java.util.HashSet<>();
      cur = new ArrayList<>();
      for (BigInteger[] r : next) {
        if (seen.add(java.util.Arrays.asList(r))) {
          cur.add(r);
        }
      }
    }
    for (BigInteger[] r : cur) {
      if (r[k].signum() < 0) {
        return false;
      }
    }
    return true;
  }

  private static BigInteger[] normal(BigInteger[] r) {
    BigInteger g = BigInteger.ZERO;
    for (BigInteger x : r) {
      g = g.gcd(x);
    }
    if (g.signum() == 0 || g.equals(BigInteger.ONE)) {
      return r;
    }
    BigInteger[] out = new BigInteger[r.length];
    for (int i = 0; i < r.length; i++) {
      out[i] = r[i].divide(g);
    }
    return out;
  }
}
