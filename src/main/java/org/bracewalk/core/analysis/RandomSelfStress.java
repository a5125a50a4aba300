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
    // 2. residual per member from the joined groups (none when no face is joined)
    final int[] faceL = fw.faceL;
    final int[] faceR = fw.faceR;
    final long[] dxs = fw.dx;
    final long[] dys = fw.dy;
    final boolean[] present = fw.present;
    final boolean[] ground = fw.ground;
    final int[] groupOf = sys.groupOf;
    long[] res = new long[m + 1];
    if (g2 > 0) {
      for (int e = 0; e < m; e++) {
        // every member there has its equation, those turning with a fixed member too
        if (!present[e] || ground[e]) {
          continue;
        }
        int l = faceL[e];
        int r = faceR[e];
        int gl = l == FrameFramework.OUTER ? -1 : groupOf[l];
        int gr = r == FrameFramework.OUTER ? -1 : groupOf[r];
        if (gl < 0 && gr < 0) {
          continue;
        }
        long mx = ModularEchelon.mod(dxs[e]);
        long my = ModularEchelon.mod(dys[e]);
        long acc = 0;
        if (gl >= 0) {
          acc = ModularEchelon.add(acc, dot(z[2 * gl], mx, z[2 * gl + 1], my));
        }
        if (gr >= 0) {
          acc = ModularEchelon.sub(acc, dot(z[2 * gr], mx, z[2 * gr + 1], my));
        }
        res[e] = acc;
      }
    }
    // 3. flows on the union-find edges: random on cycle edges, then solved up the forest
    final int ec = sys.edgeCount;
    final int[] eu = sys.eu;
    final int[] ev = sys.ev;
    final int[] eface = sys.eface;
    final boolean[] tree = sys.tree;
    // each intact face's two edge flows go straight to phi (slot 0) and psi (slot 1)
    int faces = fw.faceCount;
    final byte[] eslot = sys.eslot;
    long[] phi = new long[faces];
    long[] psi = new long[faces];
    int n = m + 1;
    int[] tdeg = new int[n];
    int[] xr = new int[n];
    for (int k = 0; k < ec; k++) {
      if (tree[k]) {
        tdeg[eu[k]]++;
        tdeg[ev[k]]++;
        xr[eu[k]] ^= k;
        xr[ev[k]] ^= k;
      } else if (eface[k] >= 0) {
        long f = ModularEchelon.random(rnd);
        (eslot[k] == 0 ? phi : psi)[eface[k]] = f;
        res[eu[k]] = ModularEchelon.add(res[eu[k]], f);
        res[ev[k]] = ModularEchelon.sub(res[ev[k]], f);
      }
    }
    // the forest's edges from the leaves in: each tree rooted at the fixed node, or at its lowest
    // node; a leaf's one edge (the xor of its edges) carries what balances it, so each edge's flow
    // is fixed by the side away from the root, in any leaf order
    int fixedRoot = sys.findMember(sys.fixedNode);
    boolean[] root = new boolean[n];
    boolean[] rootTaken = new boolean[n];
    for (int x = 0; x < n; x++) {
      if (tdeg[x] == 0) {
        // alone in its set: the root of a one-node tree, never a leaf
        continue;
      }
      int r = sys.findMember(x);
      if (r == fixedRoot) {
        root[x] = x == sys.fixedNode;
      } else if (!rootTaken[r]) {
        rootTaken[r] = true;
        root[x] = true;
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
      boolean free = eface[k] < 0;
      int other;
      if (eu[k] == child) {
        // child gets +flow, other end -flow
        other = ev[k];
        long f = free ? 0 : ModularEchelon.sub(0, res[child]);
        if (!free) {
          (eslot[k] == 0 ? phi : psi)[eface[k]] = f;
        }
        res[child] = ModularEchelon.add(res[child], f);
        res[other] = ModularEchelon.sub(res[other], f);
      } else {
        other = eu[k];
        long f = free ? 0 : res[child];
        if (!free) {
          (eslot[k] == 0 ? phi : psi)[eface[k]] = f;
        }
        res[child] = ModularEchelon.sub(res[child], f);
        res[other] = ModularEchelon.add(res[other], f);
      }
      tdeg[child] = 0;
      xr[other] ^= k;
      if (--tdeg[other] == 1 && !root[other]) {
        stack[sp++] = other;
      }
    }
    // 4. y per intact face from the flows of its two edges: s_a . y = phi, s_b . y = psi
    // An intact face of four sides (a panel with no diagonal) has for its first two members its
    // bottom ledger (w, 0) and right standard (0, h), both with the face on their left: y = (phi /
    // w, psi / h), from the inverses of the bay widths and lift heights. Any other intact face (a
    // triangle) solves its 2 x 2 system by its determinant. All the inverses at once by batch
    // inversion (one modular inverse, three products per value).
    final int[] faceMembers = fw.faceMembers;
    final int bays = fw.bays;
    final int lifts = fw.lifts;
    final int firstStandard = (lifts + 1) * bays;
    int nv = bays + lifts;
    long[] vals = new long[nv + faces];
    long[] sides = new long[4];
    for (int j = 1; j <= bays; j++) {
      vals[j - 1] = fw.xs[j] - fw.xs[j - 1];
    }
    for (int i = 1; i <= lifts; i++) {
      vals[bays + i - 1] = fw.ys[i] - fw.ys[i - 1];
    }
    for (int f = 0; f < faces; f++) {
      if (groupOf[f] != -2 || faceMembers[4 * f + 3] >= 0) {
        vals[nv + f] = 1;
        continue;
      }
      triangleSides(fw, f, sides);
      long det = ModularEchelon.sub(product(sides[0], sides[3]), product(sides[1], sides[2]));
      if (det == 0) {
        throw new ArithmeticException("no inverse of 0");
      }
      vals[nv + f] = det;
    }
    long[] inverses = batchInverse(vals);
    // y is written over phi and psi, face by face (yx in phi, yy in psi)
    long[] yx = phi;
    long[] yy = psi;
    for (int f = 0; f < faces; f++) {
      int g = groupOf[f];
      if (g >= 0) {
        yx[f] = z[2 * g];
        yy[f] = z[2 * g + 1];
      } else if (g == -2) {
        long p = phi[f];
        long q = psi[f];
        if (p == 0 && q == 0) {
          continue;
        }
        if (faceMembers[4 * f + 3] >= 0) {
          int bottom = faceMembers[4 * f];
          int right = faceMembers[4 * f + 1];
          yx[f] = product(p, inverses[bottom % bays]);
          yy[f] = product(q, inverses[bays + (right - firstStandard) / (bays + 1)]);
        } else {
          triangleSides(fw, f, sides);
          long ax = sides[0];
          long ay = sides[1];
          long bx = sides[2];
          long by = sides[3];
          long invF = inverses[nv + f];
          // [ax ay; bx by] (x, y) = (phi, psi)
          yx[f] = product(invF, ModularEchelon.sub(product(by, p), product(ay, q)));
          yy[f] = product(invF, ModularEchelon.sub(product(ax, q), product(bx, p)));
        }
      }
    }
    boolean[] out = new boolean[m];
    for (int e = 0; e < m; e++) {
      if (!present[e] || ground[e]) {
        continue;
      }
      int l = faceL[e];
      int r = faceR[e];
      long lx = l == FrameFramework.OUTER ? 0 : yx[l];
      long ly = l == FrameFramework.OUTER ? 0 : yy[l];
      long rx = r == FrameFramework.OUTER ? 0 : yx[r];
      long ry = r == FrameFramework.OUTER ? 0 : yy[r];
      out[e] = lx != rx || ly != ry;
    }
    return out;
  }

  /**
   * The first two sides of the triangular face {@code f} as the face sees them (negated where the
   * face is on a side's right), mod p, written to {@code out}: {ax, ay, bx, by}.
   */
  private static void triangleSides(FrameFramework fw, int f, long[] out) {
    int a = fw.faceMembers[4 * f];
    int b = fw.faceMembers[4 * f + 1];
    boolean aLeft = fw.faceL[a] == f;
    boolean bLeft = fw.faceL[b] == f;
    out[0] = signedMod(fw.dx[a], aLeft);
    out[1] = signedMod(fw.dy[a], aLeft);
    out[2] = signedMod(fw.dx[b], bLeft);
    out[3] = signedMod(fw.dy[b], bLeft);
  }

  /** a * b mod p, with no work when either is 0 (sides of a panel are axis-parallel). */
  private static long product(long a, long b) {
    return a == 0 || b == 0 ? 0 : ModularEchelon.mul(a, b);
  }

  private static long dot(long a, long b, long c, long d) {
    return ModularEchelon.add(product(a, b), product(c, d));
  }

  /** v (a coordinate difference, far below p) mod p, negated when the face is on its right. */
  private static long signedMod(long v, boolean left) {
    long s = left ? v : -v;
    return s >= 0 ? s : s + ModularEchelon.P;
  }

  /** The inverses mod p of nonzero residues (1 stays 1 at no cost). */
  private static long[] batchInverse(long[] vals) {
    int n = vals.length;
    long[] prefix = new long[n + 1];
    prefix[0] = 1;
    for (int i = 0; i < n; i++) {
      prefix[i + 1] = vals[i] == 1 ? prefix[i] : ModularEchelon.mul(prefix[i], vals[i]);
    }
    long inv = ModularEchelon.inverse(prefix[n]);
    // written over vals, from the last down
    for (int i = n - 1; i >= 0; i--) {
      long v = vals[i];
      if (v == 1) {
        continue;
      }
      // inv is the inverse of vals[0] ... vals[i]
      vals[i] = ModularEchelon.mul(inv, prefix[i]);
      inv = ModularEchelon.mul(inv, v);
    }
    return vals;
  }
}
