package org.bracewalk.core.analysis;

/**
 * What the analyses of one state share, built once per state: the framework, its joint adjacency
 * and components, the face equations without anything fixed beyond the pinned base ({@link
 * FaceClassSystem}), their echelon form modulo p, and spanning forests of the joints for motions.
 * The freedoms ({@link FrameFreedoms}), the critical members ({@link CriticalByStress}), the
 * motions of the repair and of "rigid if sound" ({@link FrameRepairPlanner.Motion}) all read it,
 * so a state's framework is laid out and its equations built and reduced once, not once per
 * question.
 */
final class FrameSystem {
  final FrameFramework fw;
  /** Joint adjacency over the members that are there (CSR: start, list). */
  final int[][] adj;
  /** Component of each joint through the members there (pinned: the base is one); -1 bare. */
  final int[] comp;
  final int components;
  /** The face equations with only the pinned base's ledgers fixed. */
  final FaceClassSystem base;
  private ModularEchelon echelon;
  private SpanningForest forest;

  private FrameSystem(FrameFramework fw, boolean forStress) {
    this.fw = fw;
    this.adj = FrameFreedoms.adjacency(fw);
    this.comp = FrameFreedoms.components(fw, adj);
    int count = 0;
    for (int c : comp) {
      count = Math.max(count, c + 1);
    }
    this.components = count;
    this.base = new FaceClassSystem(fw, new int[0], new int[0], forStress);
  }

  static FrameSystem of(FrameFramework fw) {
    return new FrameSystem(fw, true);
  }

  /**
   * The shared parts for motions alone (the repair's rebuilt frameworks): no union-find edges kept,
   * so it cannot give {@link CriticalByStress} a self-stress.
   */
  static FrameSystem forMotions(FrameFramework fw) {
    return new FrameSystem(fw, false);
  }

  /** The base rows in echelon form modulo p (built on first use). */
  ModularEchelon echelon() {
    if (echelon == null) {
      echelon = echelonOf(base);
    }
    return echelon;
  }

  static ModularEchelon echelonOf(FaceClassSystem sys) {
    ModularEchelon ech = new ModularEchelon(sys.classCount);
    for (int r = 0; r < 2 * sys.groupCount; r++) {
      if (sys.rowCols[r].length > 0) {
        ech.addRow(sys.rowCols[r], sys.rowVals[r]);
      }
    }
    return ech;
  }

  /**
   * The breadth-first spanning forest of {@link FrameFreedoms#propagate} for a free plane's anchor
   * joint (ignored on a pinned base), kept for the last anchor asked for.
   */
  SpanningForest forest(int anchorJoint) {
    int anchor = fw.pinned ? -1 : anchorJoint;
    if (forest == null || forest.anchorJoint != anchor) {
      forest = new SpanningForest(this, anchor);
    }
    return forest;
  }

  /**
   * The joints in the order {@link FrameFreedoms#propagate} reaches them, each with the member it is
   * reached through (-1 for a joint it starts from: the pinned base or the anchor at rest, the first
   * joint of any other piece moving by that piece's translation). A motion's joint velocities are
   * then one sweep in that order, with no search.
   */
  static final class SpanningForest {
    final int anchorJoint;
    final int[] order;
    final int size;
    final int[] via;

    SpanningForest(FrameSystem s, int anchorJoint) {
      this.anchorJoint = anchorJoint;
      FrameFramework fw = s.fw;
      int n = fw.jointCount;
      final int[] start = s.adj[0];
      final int[] list = s.adj[1];
      final int[] ja = fw.ja;
      final int[] jb = fw.jb;
      int[] reach = new int[n];
      java.util.Arrays.fill(reach, -2);
      int[] queue = new int[n];
      int len = 0;
      if (fw.pinned) {
        for (int line = 0; line <= fw.bays; line++) {
          reach[line] = -1;
          queue[len++] = line;
        }
      } else if (anchorJoint >= 0) {
        reach[anchorJoint] = -1;
        queue[len++] = anchorJoint;
      }
      int head = 0;
      for (int root = -1; root < n; root++) {
        if (root >= 0) {
          if (reach[root] != -2 || start[root] == start[root + 1]) {
            continue;
          }
          reach[root] = -1;
          queue[len++] = root;
        }
        while (head < len) {
          int u = queue[head++];
          for (int i = start[u]; i < start[u + 1]; i++) {
            int e = list[i];
            int a = ja[e];
            int v = a == u ? jb[e] : a;
            if (reach[v] != -2) {
              continue;
            }
            reach[v] = e;
            queue[len++] = v;
          }
        }
      }
      this.order = queue;
      this.size = len;
      this.via = reach;
    }

    /**
     * Joint velocities mod p of the motion with angular velocity {@code rate[classOf[e]]} per
     * member (0 for a member with no class): as {@link FrameFreedoms#propagate}, into {@code vx},
     * {@code vy} (joints not reached keep 0).
     */
    void sweep(
        FrameFramework fw, int[] classOf, long[] rate, int[] compOf, int anchorComp, long[] tx,
        long[] ty, long[] vx, long[] vy) {
      final int[] ja = fw.ja;
      final int[] jb = fw.jb;
      final long[] dxs = fw.dx;
      final long[] dys = fw.dy;
      final int[] ord = order;
      final int[] through = via;
      final int len = size;
      for (int t = 0; t < len; t++) {
        int v = ord[t];
        int e = through[v];
        if (e < 0) {
          int c = compOf[v];
          boolean moves = tx != null && c != anchorComp;
          vx[v] = moves ? tx[c] : 0;
          vy[v] = moves ? ty[c] : 0;
          continue;
        }
        int cls = classOf[e];
        long r = cls >= 0 ? rate[cls] : 0;
        int a = ja[e];
        int from = a != v ? a : jb[e];
        if (r == 0) {
          vx[v] = vx[from];
          vy[v] = vy[from];
          continue;
        }
        // v_b = v_a + w J d, J d = (-dy, dx); coordinates differences lie far below p
        long jx = -dys[e];
        long jy = dxs[e];
        long mx = ModularEchelon.mul(r, jx < 0 ? jx + ModularEchelon.P : jx);
        long my = ModularEchelon.mul(r, jy < 0 ? jy + ModularEchelon.P : jy);
        if (a != v) {
          // reached from its start a
          vx[v] = ModularEchelon.add(vx[a], mx);
          vy[v] = ModularEchelon.add(vy[a], my);
        } else {
          vx[v] = ModularEchelon.sub(vx[from], mx);
          vy[v] = ModularEchelon.sub(vy[from], my);
        }
      }
    }
  }

}
