package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.TreeSet;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;

/**
 * The degrees of freedom of a {@link FrameFramework}, told apart by kind, with the joints that move.
 *
 * <p>Exact reduction first (each step removes exactly one freedom, so the counts add up):
 *
 * <ol>
 *   <li>a joint (not held by a pinned base) whose members, two of them, run in one straight line
 *       has lost its sideways restraint: the two become one member end to end (one freedom: the
 *       joint moves across the line; the two members' angular velocities are tied);
 *   <li>a joint held by one member is a loose end: the member is stripped (one freedom: the joint
 *       swings about the other end; the member's angular velocity is fixed). A member loose at both
 *       ends counts both ends as loose, and the piece keeps one freedom as a sway.
 * </ol>
 *
 * Both are read off the framework as it stands (not repeated on what is left). What is left sways:
 * its freedoms come from the face equations of {@link FaceClassSystem}, split into parts (classes
 * linked by a row, meeting at a joint, or in a piece that nothing holds), each part's count its
 * columns less its rank plus 2 per piece that nothing holds. Ranks are taken modulo p; a deficiency
 * on a part of at most {@value #EXACT_LIMIT} columns is confirmed by {@link ExactRank} (larger parts
 * keep the modular rank, which can only overstate the freedoms: the cautious side). On a free plane
 * the piece holding the first joint is the reference (its rotation and translation are the plane's
 * rigid motions).
 *
 * <p>The joints that move with a part come from one random motion of that part (mod p, joint
 * velocities propagated along the members): a joint that moves in some motion of the part moves in
 * a random one with probability at least 1 - 2/p. Cost: one sweep per part down the state's
 * spanning forest ({@link FrameSystem.SpanningForest}, built once per state).
 */
final class FrameFreedoms {
  static final int EXACT_LIMIT = 400;

  /** A swaying part as found: its count, moving grid joints (increasing), classes, rows, pieces. */
  private record Found(
      int count, int[] joints, List<Integer> classes, List<Integer> rows, List<Integer> comps) {}

  /** A swaying part: its classes, rows and the components that nothing holds. */
  record Part(Freedom freedom, List<Integer> classes, List<Integer> rows, List<Integer> comps) {}

  final FrameFramework fw;
  final int dof;
  final List<Freedom> freedoms;
  final List<Joint> movingJoints;
  final boolean exact;
  // kept for motions
  private final FaceClassSystem parts;
  private final int[][] adj;
  private final int[] compOf;
  private final int components;
  private final int anchorComp;
  private final int anchorJoint;
  private final List<Part> partList;
  private final List<int[]> ownBars;
  private final List<Freedom> own;

  private FrameFreedoms(Builder b) {
    this.fw = b.fw;
    this.dof = b.dof;
    this.freedoms = b.freedoms;
    this.movingJoints = b.moving;
    this.exact = b.exact;
    this.parts = b.parts;
    this.adj = b.adj;
    this.compOf = b.compOf;
    this.components = b.components;
    this.anchorComp = b.anchorComp;
    this.anchorJoint = b.anchorJoint;
    this.partList = b.partList;
    this.ownBars = b.ownBars;
    this.own = b.own;
  }

  static FrameFreedoms of(FrameFramework fw, long seed) {
    return of(FrameSystem.of(fw), seed);
  }

  /** The freedoms of a state whose shared equations are built already. */
  static FrameFreedoms of(FrameSystem system, long seed) {
    Builder b = new Builder(system, new SplittableRandom(seed));
    b.run();
    return new FrameFreedoms(b);
  }

  /**
   * A first-order motion showing {@code f} (one of {@link #freedoms}): for a swaying part an exact
   * null vector of its equations (or, when its classes are held, a translation of a piece that
   * nothing holds); for a loose end the member turning about its other end; for a joint without
   * sideways restraint the joint moving across the line. Rounded to doubles only at the end, the
   * largest velocity scaled to 1.
   */
  JointMotion motion(Freedom f) {
    int i = freedoms.indexOf(f);
    if (i < 0) {
      throw new IllegalArgumentException("not a freedom of this state: " + f);
    }
    double[] w = new double[fw.memberCount];
    double[] tx = new double[Math.max(1, components)];
    double[] ty = new double[Math.max(1, components)];
    if (i < partList.size()) {
      Part part = partList.get(i);
      Map<Integer, Integer> local = new HashMap<>();
      for (int c : part.classes()) {
        local.put(c, local.size());
      }
      long[][] dense = new long[part.rows().size()][part.classes().size()];
      for (int r = 0; r < dense.length; r++) {
        int row = part.rows().get(r);
        for (int k = 0; k < parts.rowCols[row].length; k++) {
          dense[r][local.get(parts.rowCols[row][k])] = parts.rowVals[row][k];
        }
      }
      java.math.BigInteger[] x =
          part.classes().isEmpty() ? null : ExactRank.nullVector(dense, part.classes().size());
      if (x != null) {
        int bits = 0;
        for (java.math.BigInteger v : x) {
          bits = Math.max(bits, v.bitLength());
        }
        int shift = Math.max(0, bits - 60);
        for (int e = 0; e < fw.memberCount; e++) {
          int c = parts.classOf[e];
          Integer l = c >= 0 ? local.get(c) : null;
          if (l != null) {
            w[e] = x[l].shiftRight(shift).doubleValue();
          }
        }
      } else {
        tx[part.comps().get(0)] = 1;
      }
    } else {
      int[] data = ownBars.get(i - partList.size());
      int n1 = data[5];
      if (f.kind() == FreedomKind.LOOSE_END) {
        for (int k = 0; k < n1; k++) {
          w[data[6 + k]] = 1;
        }
      } else {
        int j = data[0];
        int a = data[1];
        int c = data[3];
        double l1 = Math.abs(fw.x(j) - fw.x(a)) + Math.abs(fw.y(j) - fw.y(a));
        double l2 = Math.abs(fw.x(c) - fw.x(j)) + Math.abs(fw.y(c) - fw.y(j));
        for (int k = 6; k < data.length; k++) {
          w[data[k]] = k < 6 + n1 ? l2 : -l1;
        }
      }
    }
    int firstRoot = i < partList.size() ? -1 : ownBars.get(i - partList.size())[1];
    double[][] v = propagateDouble(w, tx, ty, firstRoot);
    double max = 0;
    for (int j = 0; j < fw.gridJoints; j++) {
      max = Math.max(max, Math.hypot(v[0][j], v[1][j]));
    }
    double[] ox = new double[fw.gridJoints];
    double[] oy = new double[fw.gridJoints];
    for (int j = 0; j < fw.gridJoints; j++) {
      ox[j] = max == 0 ? 0 : v[0][j] / max;
      oy[j] = max == 0 ? 0 : v[1][j] / max;
    }
    return new JointMotion(fw.lifts, fw.bays, ox, oy);
  }

  private double[][] propagateDouble(double[] w, double[] tx, double[] ty, int firstRoot) {
    int n = fw.jointCount;
    double[] vx = new double[n];
    double[] vy = new double[n];
    boolean[] seen = new boolean[n];
    int[] queue = new int[n];
    int[] start = adj[0];
    int[] list = adj[1];
    int len = 0;
    if (fw.pinned) {
      for (int line = 0; line <= fw.bays; line++) {
        seen[line] = true;
        queue[len++] = line;
      }
    } else if (anchorJoint >= 0) {
      seen[anchorJoint] = true;
      queue[len++] = anchorJoint;
    }
    int head = 0;
    for (int r = -2; r < n; r++) {
      // a freedom of a piece that nothing holds is drawn about the joint it turns on
      int root = r == -2 ? firstRoot : r;
      if (root >= 0) {
        if (seen[root] || start[root] == start[root + 1]) {
          continue;
        }
        seen[root] = true;
        int c = compOf[root];
        if (c != anchorComp) {
          vx[root] = tx[c];
          vy[root] = ty[c];
        }
        queue[len++] = root;
      }
      while (head < len) {
        int u = queue[head++];
        for (int i = start[u]; i < start[u + 1]; i++) {
          int e = list[i];
          int v = fw.ja[e] == u ? fw.jb[e] : fw.ja[e];
          if (seen[v]) {
            continue;
          }
          seen[v] = true;
          double jx = -w[e] * fw.dy[e];
          double jy = w[e] * fw.dx[e];
          double sign = fw.ja[e] == u ? 1 : -1;
          vx[v] = vx[u] + sign * jx;
          vy[v] = vy[u] + sign * jy;
          queue[len++] = v;
        }
      }
    }
    return new double[][] {vx, vy};
  }

  /** Joint adjacency over the members that are there (CSR). */
  static int[][] adjacency(FrameFramework fw) {
    int n = fw.jointCount;
    final int m = fw.memberCount;
    final int[] ja = fw.ja;
    final int[] jb = fw.jb;
    final boolean[] present = fw.present;
    int[] start = new int[n + 1];
    for (int e = 0; e < m; e++) {
      if (present[e]) {
        start[ja[e] + 1]++;
        start[jb[e] + 1]++;
      }
    }
    for (int i = 0; i < n; i++) {
      start[i + 1] += start[i];
    }
    int[] list = new int[start[n]];
    int[] fill = Arrays.copyOf(start, n);
    for (int e = 0; e < m; e++) {
      if (present[e]) {
        list[fill[ja[e]]++] = e;
        list[fill[jb[e]]++] = e;
      }
    }
    return new int[][] {start, list};
  }

  /**
   * Joint velocities mod p of the motion with angular velocity {@code w[e]} per member, joints of
   * the anchored part at rest at the anchors, each other part's first joint moving by the given
   * translation ({@code tx}, {@code ty} per component, may be null for 0).
   */
  static long[][] propagate(
      FrameFramework fw, int[][] adj, long[] w, int[] compOf, int anchorComp, int anchorJoint,
      long[] tx, long[] ty) {
    int n = fw.jointCount;
    long[] vx = new long[n];
    long[] vy = new long[n];
    boolean[] seen = new boolean[n];
    int[] queue = new int[n];
    int[] start = adj[0];
    int[] list = adj[1];
    int len = 0;
    if (fw.pinned) {
      for (int line = 0; line <= fw.bays; line++) {
        seen[line] = true;
        queue[len++] = line;
      }
    } else if (anchorJoint >= 0) {
      seen[anchorJoint] = true;
      queue[len++] = anchorJoint;
    }
    int head = 0;
    for (int root = -1; root < n; root++) {
      if (root >= 0) {
        if (seen[root] || start[root] == start[root + 1]) {
          continue;
        }
        seen[root] = true;
        int c = compOf[root];
        if (tx != null && c != anchorComp) {
          vx[root] = tx[c];
          vy[root] = ty[c];
        }
        queue[len++] = root;
      }
      while (head < len) {
        int u = queue[head++];
        for (int i = start[u]; i < start[u + 1]; i++) {
          int e = list[i];
          int v = fw.ja[e] == u ? fw.jb[e] : fw.ja[e];
          if (seen[v]) {
            continue;
          }
          seen[v] = true;
          // v_b - v_a = w J d, J d = (-dy, dx)
          long jx = ModularEchelon.mul(w[e], ModularEchelon.mod(-fw.dy[e]));
          long jy = ModularEchelon.mul(w[e], ModularEchelon.mod(fw.dx[e]));
          if (fw.ja[e] == u) {
            vx[v] = ModularEchelon.add(vx[u], jx);
            vy[v] = ModularEchelon.add(vy[u], jy);
          } else {
            vx[v] = ModularEchelon.sub(vx[u], jx);
            vy[v] = ModularEchelon.sub(vy[u], jy);
          }
          queue[len++] = v;
        }
      }
    }
    return new long[][] {vx, vy};
  }

  /** Components of the joints through the members that are there (pinned: the base is one). */
  static int[] components(FrameFramework fw, int[][] adj) {
    int n = fw.jointCount;
    final int[] start = adj[0];
    final int[] list = adj[1];
    final int[] ja = fw.ja;
    final int[] jb = fw.jb;
    final boolean pinned = fw.pinned;
    final int bays = fw.bays;
    int[] comp = new int[n];
    Arrays.fill(comp, -1);
    int[] queue = new int[n];
    int count = 0;
    for (int root = 0; root < n; root++) {
      if (comp[root] >= 0 || (start[root] == start[root + 1] && !(pinned && root <= bays))) {
        continue;
      }
      int len = 0;
      int head = 0;
      if (pinned && root <= bays) {
        for (int line = 0; line <= bays; line++) {
          comp[line] = count;
          queue[len++] = line;
        }
      } else {
        comp[root] = count;
        queue[len++] = root;
      }
      while (head < len) {
        int u = queue[head++];
        for (int i = start[u]; i < start[u + 1]; i++) {
          int e = list[i];
          int a = ja[e];
          int v = a == u ? jb[e] : a;
          if (comp[v] < 0) {
            comp[v] = count;
            queue[len++] = v;
          }
        }
      }
      count++;
    }
    return comp;
  }

  private static final class Builder {
    final FrameFramework fw;
    final FrameSystem system;
    final SplittableRandom rnd;
    int[][] adj;
    int[] compOf;
    int anchorComp = -1;
    int anchorJoint = -1;
    int dof;
    boolean exact = true;
    List<Freedom> freedoms = new ArrayList<>();
    List<Part> partList = new ArrayList<>();
    List<Joint> moving = new ArrayList<>();
    FaceClassSystem parts;
    int[] partOfClass;
    int components;
    List<int[]> ownBars = new ArrayList<>();
    Map<Integer, int[]> constituents = new HashMap<>();
    /** Components whose piece is a member loose at both ends: one freedom counted as loose. */
    Map<Integer, Integer> lessOne = new HashMap<>();

    // bars: real members first, virtual (end to end) after
    int barCount;
    int[] barA;
    int[] barB;
    int[] endA; // real member at the A end
    int[] endB;
    int[] rep; // a real member of the bar (its class)
    boolean[] alive;
    int[] deg;
    Map<Integer, List<Integer>> virtualAt = new HashMap<>();
    boolean[] removed;
    List<Integer> fixed = new ArrayList<>();
    List<Integer> joins = new ArrayList<>();
    List<Freedom> own = new ArrayList<>();

    Builder(FrameSystem system, SplittableRandom rnd) {
      this.fw = system.fw;
      this.system = system;
      this.rnd = rnd;
    }

    boolean anchored(int j) {
      return fw.pinned && j <= fw.bays;
    }

    void run() {
      adj = system.adj;
      compOf = system.comp;
      reduce();
      for (int c : compOf) {
        components = Math.max(components, c + 1);
      }
      if (fw.pinned) {
        anchorComp = compOf[0];
      } else {
        for (int j = 0; j < fw.jointCount && anchorJoint < 0; j++) {
          if (!removed[j] && compOf[j] >= 0) {
            for (int bar : barsAt(j)) {
              anchorJoint = j;
              fixed.add(rep[bar]);
              break;
            }
          }
        }
        anchorComp = anchorJoint < 0 ? -1 : compOf[anchorJoint];
      }
      if (!fw.pinned && anchorJoint < 0) {
        // a free plane of loose members only (single members and stars, all stripped): a forest,
        // so its rank is its member count; freedoms 2V - 3 - E, shared out as loose ends first
        parts = system.base.quotient(toArray(fixed), toArray(joins));
        partOfClass = new int[0];
        int joints = 0;
        int members = 0;
        for (int j = 0; j < fw.jointCount; j++) {
          joints += compOf[j] >= 0 ? 1 : 0;
        }
        for (int e = 0; e < fw.memberCount; e++) {
          members += fw.present[e] ? 1 : 0;
        }
        dof = joints == 0 ? 0 : Math.max(0, 2 * joints - 3 - members);
        while (own.size() > dof) {
          own.remove(own.size() - 1);
          ownBars.remove(ownBars.size() - 1);
        }
        List<Freedom> all = new ArrayList<>(own);
        if (dof > own.size()) {
          List<Joint> js = new ArrayList<>();
          for (int j = 0; j < fw.gridJoints; j++) {
            if (compOf[j] >= 0) {
              js.add(fw.jointRef(j));
            }
          }
          Freedom sway = new Freedom(FreedomKind.SWAY, dof - own.size(), js, List.of(), List.of());
          all.add(0, sway);
          partList.add(new Part(sway, List.of(), List.of(), List.of(compOf[fw.jointCount > 0
              ? firstJoint() : 0])));
        }
        freedoms = all;
        return;
      }
      parts = system.base.quotient(toArray(fixed), toArray(joins));
      splitParts(components);
      int total = 0;
      // the moving joints in joint order, the freedoms' own joint objects shared
      Joint[] movingAt = new Joint[fw.gridJoints];
      List<Freedom> sway = new ArrayList<>();
      for (Part part : partList) {
        Freedom f = part.freedom();
        total += f.count();
        sway.add(f);
        for (Joint j : f.joints()) {
          movingAt[fw.joint(j.level(), j.line())] = j;
        }
      }
      for (Freedom f : own) {
        total += f.count();
        for (Joint j : f.joints()) {
          movingAt[fw.joint(j.level(), j.line())] = j;
        }
      }
      List<Joint> movingSet = new ArrayList<>();
      for (Joint j : movingAt) {
        if (j != null) {
          movingSet.add(j);
        }
      }
      dof = total;
      List<Freedom> all = new ArrayList<>(sway);
      Integer[] idx = new Integer[own.size()];
      for (int i = 0; i < idx.length; i++) {
        idx[i] = i;
      }
      Arrays.sort(idx, (a, b) -> {
        Freedom fa = own.get(a);
        Freedom fb = own.get(b);
        return fa.kind() != fb.kind()
            ? fa.kind().compareTo(fb.kind())
            : compareJoints(fa.joints(), fb.joints());
      });
      List<Freedom> ownSorted = new ArrayList<>();
      List<int[]> barsSorted = new ArrayList<>();
      for (int i : idx) {
        ownSorted.add(own.get(i));
        barsSorted.add(ownBars.get(i));
      }
      own = ownSorted;
      ownBars = barsSorted;
      all.addAll(ownSorted);
      freedoms = all;
      moving = fw.pinned ? movingSet : List.of();
    }

    private static int compareJoints(List<Joint> a, List<Joint> b) {
      if (a.isEmpty() || b.isEmpty()) {
        return Boolean.compare(a.isEmpty(), b.isEmpty());
      }
      return a.get(0).compareTo(b.get(0));
    }

    int firstJoint() {
      for (int j = 0; j < fw.jointCount; j++) {
        if (compOf[j] >= 0) {
          return j;
        }
      }
      return 0;
    }

    List<Integer> barsAt(int j) {
      List<Integer> out = new ArrayList<>();
      for (int i = adj[0][j]; i < adj[0][j + 1]; i++) {
        int e = adj[1][i];
        if (alive[e]) {
          out.add(e);
        }
      }
      List<Integer> v = virtualAt.get(j);
      if (v != null) {
        for (int bar : v) {
          if (alive[bar]) {
            out.add(bar);
          }
        }
      }
      return out;
    }

    void reduce() {
      int m = fw.memberCount;
      int n = fw.jointCount;
      final int[] ja = fw.ja;
      final int[] jb = fw.jb;
      final boolean[] present = fw.present;
      final boolean[] ground = fw.ground;
      deg = new int[n];
      removed = new boolean[n];
      for (int e = 0; e < m; e++) {
        if (present[e] && !ground[e]) {
          deg[ja[e]]++;
          deg[jb[e]]++;
        }
      }
      // a bar end to end is made at most once per joint of two members
      int twos = 0;
      for (int j = 0; j < n; j++) {
        twos += deg[j] == 2 && !anchored(j) ? 1 : 0;
      }
      int cap = m + twos + 1;
      barA = new int[cap];
      barB = new int[cap];
      endA = new int[cap];
      endB = new int[cap];
      rep = new int[cap];
      alive = new boolean[cap];
      System.arraycopy(ja, 0, barA, 0, m);
      System.arraycopy(jb, 0, barB, 0, m);
      for (int e = 0; e < m; e++) {
        endA[e] = e;
        endB[e] = e;
        rep[e] = e;
        alive[e] = present[e] && !ground[e];
      }
      barCount = m;
      int[] original = deg.clone();
      // 1. joints whose two members run in one straight line: one member end to end
      for (int j = 0; j < n; j++) {
        if (anchored(j) || original[j] != 2) {
          continue;
        }
        List<Integer> bars = barsAt(j);
        int b1 = bars.get(0);
        int b2 = bars.get(1);
        int a = other(b1, j);
        int c = other(b2, j);
        long ux = fw.x(a) - fw.x(j);
        long uy = fw.y(a) - fw.y(j);
        long vx = fw.x(c) - fw.x(j);
        long vy = fw.y(c) - fw.y(j);
        if (a == c || ux * vy - uy * vx != 0) {
          continue;
        }
        alive[b1] = false;
        alive[b2] = false;
        removed[j] = true;
        deg[j] = 0;
        int nb = barCount++;
        barA[nb] = a;
        barB[nb] = c;
        endA[nb] = barA[b1] == a ? endA[b1] : endB[b1];
        endB[nb] = barA[b2] == c ? endA[b2] : endB[b2];
        rep[nb] = rep[b1];
        alive[nb] = true;
        virtualAt.computeIfAbsent(a, x -> new ArrayList<>()).add(nb);
        virtualAt.computeIfAbsent(c, x -> new ArrayList<>()).add(nb);
        joins.add(rep[b1]);
        joins.add(rep[b2]);
        int m1 = barA[b1] == j ? endA[b1] : endB[b1];
        int m2 = barA[b2] == j ? endA[b2] : endB[b2];
        addOwn(FreedomKind.LOST_RESTRAINT, j, new int[] {m1, m2}, new int[] {j, a, b1, c, b2});
        constituents.put(nb, concat(members(b1), members(b2)));
      }
      // 2. joints held by one member: strip the member (a member loose at both ends keeps one of
      // its freedoms as the sway of its piece)
      boolean[] done = new boolean[n];
      for (int j = 0; j < n; j++) {
        if (anchored(j) || original[j] != 1 || done[j]) {
          continue;
        }
        int bar = barsAt(j).get(0);
        int k = other(bar, j);
        alive[bar] = false;
        deg[j]--;
        deg[k]--;
        removed[j] = true;
        done[j] = true;
        fixed.add(rep[bar]);
        addOwn(FreedomKind.LOOSE_END, j, new int[] {barA[bar] == j ? endA[bar] : endB[bar]},
            new int[] {j, k, bar, -1, -1});
        if (!anchored(k) && original[k] == 1) {
          done[k] = true;
          addOwn(FreedomKind.LOOSE_END, k, new int[] {barA[bar] == k ? endA[bar] : endB[bar]},
              new int[] {k, j, bar, -1, -1});
          lessOne.merge(compOf[k], 1, Integer::sum);
        }
      }
    }

    int other(int bar, int j) {
      return barA[bar] == j ? barB[bar] : barA[bar];
    }

    int[] members(int bar) {
      return bar < fw.memberCount ? new int[] {bar} : constituents.get(bar);
    }

    static int[] concat(int[] a, int[] b) {
      int[] out = Arrays.copyOf(a, a.length + b.length);
      System.arraycopy(b, 0, out, a.length, b.length);
      return out;
    }

    void addOwn(FreedomKind kind, int j, int[] members, int[] bars) {
      List<Joint> joints = fw.isGridJoint(j) ? List.of(fw.jointRef(j)) : List.of();
      TreeSet<FrameRef> frame = new TreeSet<>();
      TreeSet<PanelRef> diags = new TreeSet<>();
      for (int e : members) {
        if (fw.isFrame(e)) {
          frame.add(fw.frameRef(e));
        } else {
          diags.add(fw.panelRef(fw.panel[e]));
        }
      }
      Freedom f = new Freedom(kind, 1, joints, new ArrayList<>(frame), new ArrayList<>(diags));
      own.add(f);
      int[] withMembers = Arrays.copyOf(bars, bars.length);
      ownBars.add(concat(withMembers, concat(new int[] {members(bars[2]).length},
          concat(members(bars[2]), bars[4] >= 0 ? members(bars[4]) : new int[0]))));
    }

    void splitParts(int components) {
      FaceClassSystem s = parts;
      int classes = s.classCount;
      // union-find over classes and components
      int[] parent = new int[classes + components];
      for (int i = 0; i < parent.length; i++) {
        parent[i] = i;
      }
      int[] classComp = new int[classes];
      Arrays.fill(classComp, -1);
      for (int e = 0; e < fw.memberCount; e++) {
        int c = s.classOf[e];
        if (c >= 0 && classComp[c] < 0) {
          classComp[c] = compOf[fw.ja[e]];
        }
      }
      for (int c = 0; c < classes; c++) {
        int comp = classComp[c];
        if (comp >= 0 && comp != anchorComp) {
          union(parent, c, classes + comp);
        }
      }
      for (int r = 0; r < 2 * s.groupCount; r++) {
        int[] cols = s.rowCols[r];
        for (int k = 1; k < cols.length; k++) {
          union(parent, cols[0], cols[k]);
        }
      }
      // free classes meeting at a joint belong to one swaying part (a piece and what carries it)
      int[] firstAt = new int[fw.jointCount];
      Arrays.fill(firstAt, -1);
      for (int e = 0; e < fw.memberCount; e++) {
        int c = s.classOf[e];
        if (c < 0) {
          continue;
        }
        int a = fw.ja[e];
        if (firstAt[a] < 0) {
          firstAt[a] = c;
        } else {
          union(parent, firstAt[a], c);
        }
        int b = fw.jb[e];
        if (firstAt[b] < 0) {
          firstAt[b] = c;
        } else {
          union(parent, firstAt[b], c);
        }
      }
      // parts in order of their first class, then non-anchor components with no free class
      // (translation) in order of their first joint
      int[] partOfRoot = new int[classes + components];
      Arrays.fill(partOfRoot, -1);
      int partCount = 0;
      partOfClass = new int[classes];
      for (int c = 0; c < classes; c++) {
        int r = find(parent, c);
        if (partOfRoot[r] < 0) {
          partOfRoot[r] = partCount++;
        }
        partOfClass[c] = partOfRoot[r];
      }
      boolean[] compSeen = new boolean[components];
      int[] compOrder = new int[components];
      int[] partOfComp = new int[components];
      int compCount = 0;
      for (int j = 0; j < fw.jointCount; j++) {
        int comp = compOf[j];
        if (comp < 0 || comp == anchorComp || compSeen[comp]) {
          continue;
        }
        compSeen[comp] = true;
        int r = find(parent, classes + comp);
        if (partOfRoot[r] < 0) {
          partOfRoot[r] = partCount++;
        }
        partOfComp[comp] = partOfRoot[r];
        compOrder[compCount++] = comp;
      }
      // classes, components and rows of each part, each list in increasing order
      int[] classStart = new int[partCount + 1];
      int[] localIndex = new int[classes];
      for (int c = 0; c < classes; c++) {
        localIndex[c] = classStart[partOfClass[c] + 1]++;
      }
      for (int i = 0; i < partCount; i++) {
        classStart[i + 1] += classStart[i];
      }
      int[] classList = new int[classes];
      for (int c = 0; c < classes; c++) {
        classList[classStart[partOfClass[c]] + localIndex[c]] = c;
      }
      List<List<Integer>> compsOf = new ArrayList<>();
      List<List<Integer>> rowsOf = new ArrayList<>();
      for (int i = 0; i < partCount; i++) {
        compsOf.add(new ArrayList<>());
        rowsOf.add(new ArrayList<>());
      }
      for (int k = 0; k < compCount; k++) {
        compsOf.get(partOfComp[compOrder[k]]).add(compOrder[k]);
      }
      for (int r = 0; r < 2 * s.groupCount; r++) {
        if (s.rowCols[r].length > 0) {
          rowsOf.get(partOfClass[s.rowCols[r][0]]).add(r);
        }
      }
      FrameSystem.SpanningForest forest = null;
      long[] rate = null;
      int[] movingBuf = null;
      // per part found: count, moving joints (indices), classes, rows, components
      List<Found> found = new ArrayList<>();
      long[] vx = null;
      long[] vy = null;
      for (int i = 0; i < partCount; i++) {
        int size = classStart[i + 1] - classStart[i];
        List<Integer> comps = compsOf.get(i);
        ModularEchelon ech = new ModularEchelon(size);
        List<Integer> rows = rowsOf.get(i);
        int nonzeroRows = 0;
        for (int r : rows) {
          int[] cols = s.rowCols[r];
          long[] vals = s.rowVals[r];
          int[] lc = new int[cols.length];
          boolean nonzero = false;
          for (int k = 0; k < cols.length; k++) {
            lc[k] = localIndex[cols[k]];
            nonzero |= vals[k] != 0;
          }
          ech.addRow(lc, vals);
          nonzeroRows += nonzero ? 1 : 0;
        }
        int rank = ech.rank();
        // rank mod p <= rational rank <= nonzero rows: when the rows are independent mod p, the
        // rank is exact; otherwise a deficiency mod p is confirmed over the integers
        if (rank < size && rank < nonzeroRows) {
          if (size <= EXACT_LIMIT) {
            long[][] dense = new long[rows.size()][];
            for (int t = 0; t < dense.length; t++) {
              int r = rows.get(t);
              long[] row = new long[size];
              for (int k = 0; k < s.rowCols[r].length; k++) {
                row[localIndex[s.rowCols[r][k]]] = s.rowVals[r][k];
              }
              dense[t] = row;
            }
            rank = ExactRank.rank(dense, size);
          } else {
            exact = false;
          }
        }
        int count = size - rank + 2 * comps.size();
        for (int comp : comps) {
          count -= lessOne.getOrDefault(comp, 0);
        }
        if (count <= 0) {
          continue;
        }
        // joints moving with this part: one random motion of it
        long[] x = ech.randomNullVector(rnd);
        long[] tx = new long[components];
        long[] ty = new long[components];
        for (int comp : comps) {
          tx[comp] = ModularEchelon.random(rnd);
          ty[comp] = ModularEchelon.random(rnd);
        }
        if (forest == null) {
          forest = system.forest(anchorJoint);
          vx = new long[fw.jointCount];
          vy = new long[fw.jointCount];
        }
        if (rate == null) {
          rate = new long[classes];
          movingBuf = new int[fw.gridJoints];
        }
        // this part's classes turn at the random rates, every other class is at rest
        for (int k = classStart[i]; k < classStart[i + 1]; k++) {
          rate[classList[k]] = x[k - classStart[i]];
        }
        forest.sweep(fw, s.classOf, rate, compOf, anchorComp, tx, ty, vx, vy);
        for (int k = classStart[i]; k < classStart[i + 1]; k++) {
          rate[classList[k]] = 0;
        }
        int movingCount = 0;
        final int grid = fw.gridJoints;
        for (int j = 0; j < grid; j++) {
          if ((vx[j] != 0 || vy[j] != 0) && compOf[j] >= 0) {
            movingBuf[movingCount++] = j;
          }
        }
        int[] js = Arrays.copyOf(movingBuf, movingCount);
        List<Integer> clsList = new ArrayList<>(size);
        for (int k = classStart[i]; k < classStart[i + 1]; k++) {
          clsList.add(classList[k]);
        }
        found.add(new Found(count, js, clsList, rowsOf.get(i), comps));
      }
      // parts in order of their first moving joint (a part moving none last), stable
      found.sort((a, b) -> {
        int[] ja = a.joints();
        int[] jb = b.joints();
        if (ja.length == 0 || jb.length == 0) {
          return Boolean.compare(ja.length == 0, jb.length == 0);
        }
        return Integer.compare(ja[0], jb[0]);
      });
      // each moving joint listed under the last part that moves it: the lists partition them
      int[] last = new int[fw.gridJoints];
      for (int k = 0; k < found.size(); k++) {
        for (int j : found.get(k).joints()) {
          last[j] = k;
        }
      }
      for (int k = 0; k < found.size(); k++) {
        Found p = found.get(k);
        int[] js = p.joints();
        List<Joint> mine = new ArrayList<>();
        for (int j : js) {
          if (last[j] == k) {
            mine.add(fw.jointRef(j));
          }
        }
        if (mine.isEmpty()) {
          // every joint it moves is listed under a later part: it keeps its own list
          for (int j : js) {
            mine.add(fw.jointRef(j));
          }
        }
        Freedom f = new Freedom(FreedomKind.SWAY, p.count(), mine, List.of(), List.of());
        partList.add(new Part(f, p.classes(), p.rows(), p.comps()));
      }
    }

    private static int find(int[] p, int x) {
      while (p[x] != x) {
        p[x] = p[p[x]];
        x = p[x];
      }
      return x;
    }

    private static void union(int[] p, int a, int b) {
      int ra = find(p, a);
      int rb = find(p, b);
      if (ra != rb) {
        p[rb] = ra;
      }
    }

    private static int[] toArray(List<Integer> xs) {
      int[] out = new int[xs.size()];
      for (int i = 0; i < out.length; i++) {
        out[i] = xs.get(i);
      }
      return out;
    }
  }
}
