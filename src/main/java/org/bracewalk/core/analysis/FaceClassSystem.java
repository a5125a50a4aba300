package org.bracewalk.core.analysis;

import java.util.Arrays;

/**
 * The first-order equations of a {@link FrameFramework} in angular-velocity form, reduced by
 * union-find. Give every member an angular velocity w; joint velocities exist (up to translation)
 * iff around every cycle the rotated member vectors sum to zero, and the bounded faces of the plane
 * graph generate the cycles. So:
 *
 * <ul>
 *   <li>an intact face (a panel with its four sides there and no diagonal, or a triangle of a
 *       braced panel with its three sides there) forces opposite sides, or all three sides, to turn
 *       together: union-find over members ("classes"; where the frame is complete this is the brace
 *       graph);
 *   <li>a member that is not there joins the faces on its two sides (union-find over faces); a
 *       group of faces joined to the outside gives no equation, every other group that is not a
 *       single intact face gives two linear rows over the classes (the sum of its faces' rows);
 *   <li>fixed members (the pinned base's level-0 ledgers, and whatever the caller fixes) have
 *       angular velocity 0: their classes drop out.
 * </ul>
 *
 * The motions of the framework are then the null space of the rows over the free classes plus a
 * translation per connected part that nothing holds. The union-find edges are kept so that a
 * self-stress can be computed from them ({@link RandomSelfStress}).
 */
final class FaceClassSystem {
  final FrameFramework fw;
  /** Union-find over members plus one fixed node (id memberCount). */
  private final int[] mParent;
  final int fixedNode;
  /** Union-find over faces plus the outside (id faceCount). */
  /** Union-find over faces while the system is built; released after. */
  private int[] fParent;
  private int[] fSize;
  final int outerNode;

  /** Compact class of each member: -1 when not there or fixed. */
  final int[] classOf;
  int classCount;
  /** Compact group of each face: -1 joined to the outside, -2 intact face, else its group. */
  final int[] groupOf;
  int groupCount;
  /** Per group: x row then y row, sparse over classes. */
  int[][] rowCols;
  long[][] rowVals;

  // union-find edges among members (for self-stresses): u, v, face, slot (0 or 1), tree?
  int edgeCount;
  int[] eu;
  int[] ev;
  int[] eface;
  byte[] eslot;
  boolean[] tree;
  private final boolean keepEdges;

  /**
   * @param fixed members whose angular velocity is fixed at 0 (beside the pinned base's ledgers)
   * @param joins pairs of members forced to turn together (flat array of pairs)
   */
  FaceClassSystem(FrameFramework fw, int[] fixed, int[] joins) {
    this(fw, fixed, joins, true);
  }

  /**
   * As above; {@code keepEdges} false keeps no union-find edges (a system not asked for a
   * self-stress: the same classes and rows, a fifth of the memory fewer on a large plane).
   */
  FaceClassSystem(FrameFramework fw, int[] fixed, int[] joins, boolean keepEdges) {
    this.fw = fw;
    this.keepEdges = keepEdges;
    int m = fw.memberCount;
    fixedNode = m;
    mParent = new int[m + 1];
    for (int i = 0; i <= m; i++) {
      mParent[i] = i;
    }
    outerNode = fw.faceCount;
    fParent = new int[fw.faceCount + 1];
    fSize = new int[fw.faceCount + 1];
    for (int i = 0; i <= fw.faceCount; i++) {
      fParent[i] = i;
      fSize[i] = 1;
    }
    // faces joined across members that are not there
    for (int e = 0; e < m; e++) {
      if (!fw.present[e]) {
        unionFaces(faceNode(fw.faceL[e]), faceNode(fw.faceR[e]));
      }
    }
    groupOf = new int[fw.faceCount];
    int[] groupIndex = new int[fw.faceCount + 1];
    Arrays.fill(groupIndex, -3);
    int outerRoot = findFace(outerNode);
    for (int f = 0; f < fw.faceCount; f++) {
      int r = findFace(f);
      if (r == outerRoot) {
        groupOf[f] = -1;
      } else if (fSize[r] == 1) {
        groupOf[f] = -2;
      } else {
        if (groupIndex[r] == -3) {
          groupIndex[r] = groupCount++;
        }
        groupOf[f] = groupIndex[r];
      }
    }
    // member classes: fixed members first (tree edges to the fixed node), then intact faces
    int cap = 2 * fw.faceCount + m + 1;
    fParent = null;
    fSize = null;
    if (keepEdges) {
      eu = new int[cap];
      ev = new int[cap];
      eface = new int[cap];
      eslot = new byte[cap];
      tree = new boolean[cap];
    }
    for (int e = 0; e < m; e++) {
      if (fw.ground[e]) {
        edge(fixedNode, e, -1, (byte) 0);
      }
    }
    for (int e : fixed) {
      edge(fixedNode, e, -1, (byte) 0);
    }
    for (int f = 0; f < fw.faceCount; f++) {
      if (groupOf[f] == -2) {
        int a = fw.faceMembers[4 * f];
        int b = fw.faceMembers[4 * f + 1];
        int c = fw.faceMembers[4 * f + 2];
        int d = fw.faceMembers[4 * f + 3];
        edge(a, c, f, (byte) 0);
        edge(b, d < 0 ? c : d, f, (byte) 1);
      }
    }
    for (int i = 0; i + 1 < joins.length; i += 2) {
      edge(joins[i], joins[i + 1], -1, (byte) 2);
    }
    classOf = new int[m];
    int[] classIndex = new int[m + 1];
    Arrays.fill(classIndex, -1);
    int fixedRoot = findMember(fixedNode);
    for (int e = 0; e < m; e++) {
      int r = findMember(e);
      if (!fw.present[e] || r == fixedRoot) {
        classOf[e] = -1;
        continue;
      }
      if (classIndex[r] < 0) {
        classIndex[r] = classCount++;
      }
      classOf[e] = classIndex[r];
    }
    buildRows();
  }

  /**
   * This system with more members fixed and more pairs turning together: the same as {@code new
   * FaceClassSystem(fw, fixed, joins)} built from scratch (same classes, numbered the same way, the
   * same rows), derived from this one's classes instead of a second pass over the faces. The
   * members fixed and joined must be there. Carries no union-find edges (not for {@link
   * RandomSelfStress}).
   */
  FaceClassSystem quotient(int[] fixed, int[] joins) {
    return new FaceClassSystem(this, fixed, joins);
  }

  private FaceClassSystem(FaceClassSystem base, int[] fixed, int[] joins) {
    this.fw = base.fw;
    this.mParent = null;
    this.fixedNode = base.fixedNode;
    this.fParent = null;
    this.fSize = null;
    this.keepEdges = false;
    this.outerNode = base.outerNode;
    this.groupOf = base.groupOf;
    this.groupCount = base.groupCount;
    int k = base.classCount;
    int[] parent = new int[k + 1];
    for (int i = 0; i <= k; i++) {
      parent[i] = i;
    }
    // node k is the fixed class; a member there with no class is in the fixed class already
    for (int e : fixed) {
      int c = base.classOf[e];
      unionClasses(parent, c < 0 ? k : c, k);
    }
    for (int i = 0; i + 1 < joins.length; i += 2) {
      int a = base.classOf[joins[i]];
      int b = base.classOf[joins[i + 1]];
      unionClasses(parent, a < 0 ? k : a, b < 0 ? k : b);
    }
    int fixedRoot = findClass(parent, k);
    int[] newIndex = new int[k];
    int[] rootIndex = new int[k + 1];
    Arrays.fill(rootIndex, -1);
    // numbered by first member, as the constructor numbers them
    int m = fw.memberCount;
    classOf = new int[m];
    Arrays.fill(newIndex, -2);
    for (int e = 0; e < m; e++) {
      int c = base.classOf[e];
      if (c < 0) {
        classOf[e] = -1;
        continue;
      }
      if (newIndex[c] == -2) {
        int r = findClass(parent, c);
        if (r == fixedRoot) {
          newIndex[c] = -1;
        } else {
          if (rootIndex[r] < 0) {
            rootIndex[r] = classCount++;
          }
          newIndex[c] = rootIndex[r];
        }
      }
      classOf[e] = newIndex[c];
    }
    // rows: the base rows with their columns mapped, merged and sorted; a column is kept (even
    // with a zero sum) iff some member of its class meets the group, as the constructor keeps it
    rowCols = new int[2 * groupCount][];
    rowVals = new long[2 * groupCount][];
    for (int g = 0; g < groupCount; g++) {
      int[] bc = base.rowCols[2 * g];
      long[] bx = base.rowVals[2 * g];
      long[] by = base.rowVals[2 * g + 1];
      int len = 0;
      long[] keyed = new long[bc.length];
      for (int i = 0; i < bc.length; i++) {
        int c = newIndex[bc[i]];
        if (c >= 0) {
          keyed[len++] = ((long) c << 32) | i;
        }
      }
      putRows(g, keyed, 0, len, bx, by);
    }
  }

  /**
   * Group {@code g}'s two rows from the entries {@code keyed[from..to)} (class in the high 32 bits,
   * index into {@code xs} and {@code ys} in the low): sorted by class, entries of one class summed.
   */
  private void putRows(int g, long[] keyed, int from, int to, long[] xs, long[] ys) {
    Arrays.sort(keyed, from, to);
    int n = 0;
    int[] cols = new int[to - from];
    long[] xv = new long[to - from];
    long[] yv = new long[to - from];
    for (int t = from; t < to; t++) {
      int c = (int) (keyed[t] >>> 32);
      int i = (int) keyed[t];
      if (n > 0 && cols[n - 1] == c) {
        xv[n - 1] += xs[i];
        yv[n - 1] += ys[i];
      } else {
        cols[n] = c;
        xv[n] = xs[i];
        yv[n] = ys[i];
        n++;
      }
    }
    if (n < cols.length) {
      cols = Arrays.copyOf(cols, n);
      xv = Arrays.copyOf(xv, n);
      yv = Arrays.copyOf(yv, n);
    }
    rowCols[2 * g] = cols;
    rowVals[2 * g] = xv;
    rowCols[2 * g + 1] = cols;
    rowVals[2 * g + 1] = yv;
  }

  private static int findClass(int[] p, int x) {
    while (p[x] != x) {
      p[x] = p[p[x]];
      x = p[x];
    }
    return x;
  }

  private static void unionClasses(int[] p, int a, int b) {
    int ra = findClass(p, a);
    int rb = findClass(p, b);
    if (ra != rb) {
      p[ra] = rb;
    }
  }

  private int faceNode(int f) {
    return f == FrameFramework.OUTER ? outerNode : f;
  }

  private void edge(int u, int v, int face, byte slot) {
    if (!keepEdges) {
      unionMembers(u, v);
      return;
    }
    int k = edgeCount++;
    eu[k] = u;
    ev[k] = v;
    eface[k] = face;
    eslot[k] = slot;
    tree[k] = unionMembers(u, v);
  }

  int findMember(int x) {
    while (mParent[x] != x) {
      mParent[x] = mParent[mParent[x]];
      x = mParent[x];
    }
    return x;
  }

  private boolean unionMembers(int a, int b) {
    int ra = findMember(a);
    int rb = findMember(b);
    if (ra == rb) {
      return false;
    }
    // keep the fixed node a root so that its class is easy to find
    if (rb == fixedNode) {
      mParent[ra] = rb;
    } else {
      mParent[rb] = ra;
    }
    return true;
  }

  private int findFace(int x) {
    while (fParent[x] != x) {
      fParent[x] = fParent[fParent[x]];
      x = fParent[x];
    }
    return x;
  }

  private void unionFaces(int a, int b) {
    int ra = findFace(a);
    int rb = findFace(b);
    if (ra == rb) {
      return;
    }
    if (fSize[ra] < fSize[rb]) {
      int t = ra;
      ra = rb;
      rb = t;
    }
    fParent[rb] = ra;
    fSize[ra] += fSize[rb];
  }

  private void buildRows() {
    // entries (group, class, signed direction) of every member with a class on a joined face,
    // bucketed by group, then sorted by class within each group and summed per class
    FrameFramework f = fw;
    final int m = f.memberCount;
    final int[] faceL = f.faceL;
    final int[] faceR = f.faceR;
    final int[] cls = classOf;
    final int[] grp = groupOf;
    int[] start = new int[groupCount + 1];
    int entries = 0;
    if (groupCount > 0) {
      for (int e = 0; e < m; e++) {
        if (cls[e] < 0) {
          continue;
        }
        int l = faceL[e];
        int r = faceR[e];
        if (l != FrameFramework.OUTER && grp[l] >= 0) {
          start[grp[l] + 1]++;
          entries++;
        }
        if (r != FrameFramework.OUTER && grp[r] >= 0) {
          start[grp[r] + 1]++;
          entries++;
        }
      }
    }
    for (int g = 0; g < groupCount; g++) {
      start[g + 1] += start[g];
    }
    long[] keyed = new long[entries];
    long[] ex = new long[entries];
    long[] ey = new long[entries];
    int[] fill = java.util.Arrays.copyOf(start, groupCount);
    int k = 0;
    for (int e = 0; e < m && entries > 0; e++) {
      int c = cls[e];
      if (c < 0) {
        continue;
      }
      for (int s = 0; s < 2; s++) {
        int face = s == 0 ? faceL[e] : faceR[e];
        if (face == FrameFramework.OUTER || grp[face] < 0) {
          continue;
        }
        long sign = s == 0 ? 1 : -1;
        int at = fill[grp[face]]++;
        keyed[at] = ((long) c << 32) | k;
        ex[k] = sign * f.dx[e];
        ey[k] = sign * f.dy[e];
        k++;
      }
    }
    rowCols = new int[2 * groupCount][];
    rowVals = new long[2 * groupCount][];
    for (int g = 0; g < groupCount; g++) {
      putRows(g, keyed, start[g], start[g + 1], ex, ey);
    }
  }
}
