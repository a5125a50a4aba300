package org.bracewalk.core.analysis;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Which members carry a self-stress, from one random self-stress modulo p = 2^61 - 1 (see {@link
 * ModularEchelon}). A member is critical (its loss alone lowers the rank of the rigidity matrix)
 * iff it carries no self-stress (a coloop of the row matroid; W. Whiteley, "Some matroids from
 * discrete applied geometry", Contemp. Math. 197 (1996)).
 *
 * <p>A self-stress is a left null vector of the face equations of {@link FaceClassSystem}: a
 * 2-vector y per face (0 outside the plane, one value per group of joined faces) with (y_left -
 * y_right) . d_e = 0 for every member e; the stress of e is nonzero iff y_left differs from
 * y_right (Maxwell's reciprocal figure). It is drawn at random: y on joined groups is a random left
 * null vector of their rows; on intact faces, whose equations are the union-find edges, y follows
 * from a flow on those edges: random on edges that closed a cycle, solved up the spanning forest on
 * the others, the fixed members absorbing what is left. Linear time plus the small system.
 *
 * <p>With probability at least 1 - 1/p per member a member that carries some self-stress carries
 * this one; an error can only call a member critical that is not (the cautious side).
 */
final class RandomSelfStress {
  private RandomSelfStress() {}

  /** For each member: true when it carries the random self-stress. */
  static boolean[] stressed(FaceClassSystem sys, SplittableRandom rnd) {
    FrameFramework fw = sys.fw;
    int m = fw.memberCount;
    // 1. random left null vector over the joined groups' rows: rows of M^T are the classes.
    int g2 = 2 * sys.groupCount;
    long[] z = new long[g2];
    if (g2 > 0) {
      int[][] byClassCols = new int[sys.classCount][];
      long[][] byClassVals = new long[sys.classCount][];
      int[] counts = new int[sys.classCount];
      for (int r = 0; r < g2; r++) {
        for (int c : sys.rowCols[r]) {
          counts[c]++;
        }
      }
      int[] noCols = new int[0];
      long[] noVals = new long[0];
      for (int c = 0; c < sys.classCount; c++) {
        byClassCols[c] = counts[c] == 0 ? noCols : new int[counts[c]];
        byClassVals[c] = counts[c] == 0 ? noVals : new long[counts[c]];
      }
      Arrays.fill(counts, 0);
      for (int r = 0; r < g2; r++) {
        int[] cols = sys.rowCols[r];
        long[] vals = sys.rowVals[r];
        for (int k = 0; k < cols.length; k++) {
          int c = cols[k];
          byClassCols[c][counts[c]] = r;
          byClassVals[c][counts[c]] = vals[k];
          counts[c]++;
        }
      }
      ModularEchelon ech = new ModularEchelon(g2);
      for (int c = 0; c < sys.classCount; c++) {
        if (byClassCols[c].length > 0) {
          ech.addRow(byClassCols[c], byClassVals[c]);
        }
      }
      z = ech.randomNullVector(rnd);
    }
    // 2. residual per member from the joined groups
    long[] res = new long[m + 1];
    for (int e = 0; e < m; e++) {
      // every member there has its equation, those turning with a fixed member too
      if (!fw.present[e] || fw.ground[e]) {
        continue;
      }
      for (int s = 0; s < 2; s++) {
        int face = s == 0 ? fw.faceL[e] : fw.faceR[e];
        if (face == FrameFramework.OUTER) {
          continue;
        }
        int g = sys.groupOf[face];
        if (g < 0) {
          continue;
        }
        long v = ModularEchelon.add(
            ModularEchelon.mul(z[2 * g], ModularEchelon.mod(fw.dx[e])),
            ModularEchelon.mul(z[2 * g + 1], ModularEchelon.mod(fw.dy[e])));
        res[e] = s == 0 ? ModularEchelon.add(res[e], v) : ModularEchelon.sub(res[e], v);
      }
    }
    // 3. flows on the union-find edges: random on cycle edges, then solved up the forest
    int ec = sys.edgeCount;
    long[] flow = new long[ec];
    for (int k = 0; k < ec; k++) {
      if (!sys.tree[k] && sys.eface[k] >= 0) {
        flow[k] = ModularEchelon.random(rnd);
        res[sys.eu[k]] = ModularEchelon.add(res[sys.eu[k]], flow[k]);
        res[sys.ev[k]] = ModularEchelon.sub(res[sys.ev[k]], flow[k]);
      }
    }
    // the forest's edges from the leaves in: each tree rooted at the fixed node, or at its lowest
    // node; a leaf's one edge (the xor of its edges) carries what balances it, so each edge's flow
    // is fixed by the side away from the root, in any leaf order
    int n = m + 1;
    int fixedRoot = sys.findMember(sys.fixedNode);
    boolean[] root = new boolean[n];
    int[] lowest = new int[n];
    Arrays.fill(lowest, -1);
    for (int x = 0; x < n; x++) {
      int r = sys.findMember(x);
      if (r == fixedRoot) {
        root[x] = x == sys.fixedNode;
      } else if (lowest[r] < 0) {
        lowest[r] = x;
        root[x] = true;
      }
    }
    int[] tdeg = new int[n];
    int[] xr = new int[n];
    for (int k = 0; k < ec; k++) {
      if (sys.tree[k]) {
        tdeg[sys.eu[k]]++;
        tdeg[sys.ev[k]]++;
        xr[sys.eu[k]] ^= k;
        xr[sys.ev[k]] ^= k;
      }
    }
    int[] stack = new int[n];
    int sp = 0;
    for (int x = 0; x < n; x++) {
      if (tdeg[x] == 1 && !root[x]) {
        stack[sp++] = x;
      }
    }
    while (sp > 0) {
      int child = stack[--sp];
      if (tdeg[child] != 1) {
        continue;
      }
      int k = xr[child];
      boolean free = sys.eface[k] < 0;
      int other;
      if (sys.eu[k] == child) {
        // child gets +flow, other end -flow
        other = sys.ev[k];
        flow[k] = free ? 0 : ModularEchelon.sub(0, res[child]);
        res[child] = ModularEchelon.add(res[child], flow[k]);
        res[other] = ModularEchelon.sub(res[other], flow[k]);
      } else {
        other = sys.eu[k];
        flow[k] = free ? 0 : res[child];
        res[child] = ModularEchelon.sub(res[child], flow[k]);
        res[other] = ModularEchelon.add(res[other], flow[k]);
      }
      tdeg[child] = 0;
      xr[other] ^= k;
      if (--tdeg[other] == 1 && !root[other]) {
        stack[sp++] = other;
      }
    }
    // 4. y per intact face from the flows of its two edges: s_a . y = phi, s_b . y = psi
    long[] phi = new long[fw.faceCount];
    long[] psi = new long[fw.faceCount];
    for (int k = 0; k < ec; k++) {
      int f = sys.eface[k];
      if (f >= 0) {
        if (sys.eslot[k] == 0) {
          phi[f] = flow[k];
        } else {
          psi[f] = flow[k];
        }
      }
    }
    long[] yx = new long[fw.faceCount];
    long[] yy = new long[fw.faceCount];
    long[] inverses = intactInverses(fw, sys);
    for (int f = 0; f < fw.faceCount; f++) {
      int g = sys.groupOf[f];
      if (g >= 0) {
        yx[f] = z[2 * g];
        yy[f] = z[2 * g + 1];
      } else if (g == -2) {
        int a = fw.faceMembers[4 * f];
        int b = fw.faceMembers[4 * f + 1];
        long ax = ModularEchelon.mod(fw.side(f, a) * fw.dx[a]);
        long ay = ModularEchelon.mod(fw.side(f, a) * fw.dy[a]);
        long bx = ModularEchelon.mod(fw.side(f, b) * fw.dx[b]);
        long by = ModularEchelon.mod(fw.side(f, b) * fw.dy[b]);
        long inv = inverses[f];
        // [ax ay; bx by] (x, y) = (phi, psi)
        yx[f] = ModularEchelon.mul(inv,
            ModularEchelon.sub(ModularEchelon.mul(by, phi[f]), ModularEchelon.mul(ay, psi[f])));
        yy[f] = ModularEchelon.mul(inv,
            ModularEchelon.sub(ModularEchelon.mul(ax, psi[f]), ModularEchelon.mul(bx, phi[f])));
      }
    }
    boolean[] out = new boolean[m];
    for (int e = 0; e < m; e++) {
      if (!fw.present[e] || fw.ground[e]) {
        continue;
      }
      int l = fw.faceL[e];
      int r = fw.faceR[e];
      long lx = l == FrameFramework.OUTER ? 0 : yx[l];
      long ly = l == FrameFramework.OUTER ? 0 : yy[l];
      long rx = r == FrameFramework.OUTER ? 0 : yx[r];
      long ry = r == FrameFramework.OUTER ? 0 : yy[r];
      out[e] = lx != rx || ly != ry;
    }
    return out;
  }

  /**
   * For each intact face, the inverse of the determinant of its first two members' (signed)
   * directions; all at once by batch inversion (one modular inverse, three products per face).
   */
  private static long[] intactInverses(FrameFramework fw, FaceClassSystem sys) {
    long[] det = new long[fw.faceCount];
    long[] prefix = new long[fw.faceCount + 1];
    prefix[0] = 1;
    for (int f = 0; f < fw.faceCount; f++) {
      if (sys.groupOf[f] == -2) {
        int a = fw.faceMembers[4 * f];
        int b = fw.faceMembers[4 * f + 1];
        long ax = ModularEchelon.mod(fw.side(f, a) * fw.dx[a]);
        long ay = ModularEchelon.mod(fw.side(f, a) * fw.dy[a]);
        long bx = ModularEchelon.mod(fw.side(f, b) * fw.dx[b]);
        long by = ModularEchelon.mod(fw.side(f, b) * fw.dy[b]);
        det[f] = ModularEchelon.sub(ModularEchelon.mul(ax, by), ModularEchelon.mul(ay, bx));
        if (det[f] == 0) {
          throw new ArithmeticException("no inverse of 0");
        }
      } else {
        det[f] = 1;
      }
      prefix[f + 1] = ModularEchelon.mul(prefix[f], det[f]);
    }
    long inv = ModularEchelon.inverse(prefix[fw.faceCount]);
    long[] out = new long[fw.faceCount];
    for (int f = fw.faceCount - 1; f >= 0; f--) {
      // inv is the inverse of det[0] ... det[f]
      out[f] = ModularEchelon.mul(inv, prefix[f]);
      inv = ModularEchelon.mul(inv, det[f]);
    }
    return out;
  }
}
