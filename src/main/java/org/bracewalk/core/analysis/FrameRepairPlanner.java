package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.TreeMap;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The least repair of a state whose frame is incomplete: greedy basis extension in the linear
 * matroid of the rigidity matrix's rows (W. Whiteley, "Some matroids from discrete applied
 * geometry", Contemp. Math. 197 (1996)). Candidates in cost order: design frame members not there,
 * design diagonals missing or ineffective (both "in design"), then new rigid diagonals, rising then
 * falling, in every panel that is not an opening; a frame member the design leaves out is never
 * used. A candidate is taken iff it is independent of the members there, i.e. some motion of the
 * current state changes its length; that is tested against one random motion (mod p, see {@link
 * ModularEchelon}), recomputed after each item taken. Each item taken removes exactly one freedom,
 * so the plan has as many items as the state has freedoms (tension-only members counted as bars),
 * the least possible, and greedy order makes the items outside the design the fewest (matroid
 * greedy).
 *
 * <p>A candidate whose end is a joint no member holds is skipped (alone it adds a freedom).
 */
final class FrameRepairPlanner {
  private FrameRepairPlanner() {}

  private record Candidate(int panel, int way, FrameRef frame, MemberKind kind, boolean inDesign) {}

  static RepairPlan plan(
      PlaneGrid grid,
      byte[] design,
      Set<FrameRef> omitted,
      BitSet openings,
      byte[] analysed,
      Set<FrameRef> notThere,
      Set<FrameRef> unknownFrame,
      boolean restoreList,
      int dof) {
    SplittableRandom rnd = new SplittableRandom(FramePlaneAnalyzer.SEED);
    Motion motion =
        dof == 0
            ? null
            : Motion.of(
                FrameFramework.of(grid, FramePlaneAnalyzer.rigidityCodes(analysed),
                    FramePlaneAnalyzer.frameThere(grid, notThere)),
                rnd, dof);
    return plan(grid, design, omitted, openings, analysed, notThere, restoreList, dof, motion, rnd);
  }

  /**
   * The same, starting from {@code start}: the motions of the analysed state drawn with {@code
   * rnd} ({@link Motion#of(FrameSystem, SplittableRandom, int)}, null when {@code dof} is 0), which
   * the plan then takes from.
   */
  static RepairPlan plan(
      PlaneGrid grid,
      byte[] design,
      Set<FrameRef> omitted,
      BitSet openings,
      byte[] analysed,
      Set<FrameRef> notThere,
      boolean restoreList,
      int dof,
      Motion start,
      SplittableRandom rnd) {
    int m = grid.lifts();
    int n = grid.bays();
    boolean pinned = grid.support() == org.bracewalk.core.model.Support.PINNED_BASE;
    List<Candidate> candidates = new ArrayList<>();
    List<FrameRef> designFrameMissing = new ArrayList<>();
    for (FrameRef f : new java.util.TreeSet<>(notThere)) {
      if (omitted.contains(f)) {
        continue;
      }
      designFrameMissing.add(f);
      if (!(pinned && f.isLedger() && f.first() == 0)) {
        candidates.add(new Candidate(-1, -1, f, null, true));
      }
    }
    Map<Integer, Brace> designMissing = new TreeMap<>();
    BitSet designWays = new BitSet(2 * design.length);
    for (int idx = 0; idx < design.length; idx++) {
      if (design[idx] != PanelCodes.NONE && design[idx] != analysed[idx]) {
        Brace missing =
            PanelMatch.missing(PanelCodes.decode(design[idx]), PanelCodes.decode(analysed[idx]));
        if (missing != null) {
          designMissing.put(idx, missing);
          for (int way = 0; way < 2; way++) {
            if (way == 0 ? missing.diagonal().hasRising() : missing.diagonal().hasFalling()) {
              candidates.add(new Candidate(idx, way, null, missing.kind(), true));
              designWays.set(idx * 2 + way);
            }
          }
        }
      }
    }
    byte[] codes = FramePlaneAnalyzer.rigidityCodes(analysed);
    boolean[] there = FramePlaneAnalyzer.frameThere(grid, notThere);
    List<Candidate> taken = new ArrayList<>();
    Motion motion = start;
    boolean rigid = dof == 0 || motion.dof == 0;
    int designCount = candidates.size();
    int next = 0;
    int panels = m * n;
    // design candidates, then new diagonals produced in panel order
    while (!rigid) {
      Candidate c;
      if (next < designCount) {
        c = candidates.get(next);
      } else {
        int k = next - designCount;
        if (k >= 2 * panels) {
          break;
        }
        int idx = k / 2;
        int way = k % 2;
        if (openings.get(idx)
            || (codes[idx] & (1 << way)) != 0
            || designWays.get(idx * 2 + way)) {
          next++;
          continue;
        }
        c = new Candidate(idx, way, null, MemberKind.RIGID, false);
      }
      next++;
      FrameFramework fw = motion.fw;
      int a;
      int b;
      if (c.frame() != null) {
        int e = fw.frameId(c.frame());
        a = fw.ja[e];
        b = fw.jb[e];
      } else {
        int lift = c.panel() / n;
        int bay = c.panel() % n;
        a = c.way() == 0 ? fw.joint(lift, bay) : fw.joint(lift + 1, bay);
        b = c.way() == 0 ? fw.joint(lift + 1, bay + 1) : fw.joint(lift, bay + 1);
      }
      if (!motion.held[a] || !motion.held[b]) {
        continue;
      }
      long ddx = ModularEchelon.mod(fw.x(b) - fw.x(a));
      long ddy = ModularEchelon.mod(fw.y(b) - fw.y(a));
      if (motion.stretch(a, b, ddx, ddy) == 0) {
        continue;
      }
      taken.add(c);
      if (c.frame() != null) {
        there[fw.frameId(c.frame())] = true;
      } else {
        codes[c.panel()] |= (byte) (1 << c.way());
      }
      motion.take();
      rigid = motion.dof == 0;
      if (!rigid && motion.size == 0) {
        int left = motion.dof;
        // the spent motions' framework and velocities go before the next are drawn
        motion.release();
        start = null;
        motion = null;
        motion = Motion.of(FrameFramework.of(grid, codes, there), rnd, left);
        rigid = motion.dof == 0;
      }
    }
    // tension-only members: the freedoms are gone, but a cable may still go slack; restore the
    // design's members left, then add rigid diagonals, until the exact test is met
    boolean tension = false;
    for (byte code : analysed) {
      tension |= code != PanelCodes.NONE && !PanelCodes.isRigid(code);
    }
    for (Brace b : designMissing.values()) {
      tension |= !b.isRigid();
    }
    if (rigid && tension) {
      byte[] kinds = analysed.clone();
      Set<Candidate> inPlan = new HashSet<>(taken);
      for (Candidate c : taken) {
        if (c.frame() == null) {
          kinds[c.panel()] |= (byte) ((1 << c.way()) | (c.kind() == MemberKind.RIGID ? 0 : 4));
        }
      }
      List<Candidate> more = new ArrayList<>();
      for (Candidate c : candidates) {
        if (!inPlan.contains(c)) {
          more.add(c);
        }
      }
      for (int idx = 0; idx < m * n; idx++) {
        for (int way = 0; way < 2; way++) {
          if (!openings.get(idx) && (codes[idx] & (1 << way)) == 0
              && !designWays.get(idx * 2 + way)) {
            more.add(new Candidate(idx, way, null, MemberKind.RIGID, false));
          }
        }
      }
      rigid = TensionOnlyFrame.rigid(grid, kinds, absentOf(grid, there));
      for (int i = 0; i < more.size() && !rigid; i++) {
        Candidate c = more.get(i);
        taken.add(c);
        if (c.frame() != null) {
          there[FrameFramework.frameId(m, n, c.frame())] = true;
        } else {
          // a panel holds members of one kind: skip a member of the other kind
          int have = kinds[c.panel()];
          boolean tensionHere = (have & 4) != 0;
          if ((have & 3) != 0 && tensionHere != (c.kind() != MemberKind.RIGID)) {
            taken.remove(taken.size() - 1);
            continue;
          }
          kinds[c.panel()] |= (byte) ((1 << c.way()) | (c.kind() == MemberKind.RIGID ? 0 : 4));
          codes[c.panel()] |= (byte) (1 << c.way());
        }
        rigid = TensionOnlyFrame.rigid(grid, kinds, absentOf(grid, there));
      }
    }
    // the plan
    List<RepairMember> members = new ArrayList<>();
    Set<FrameRef> takenFrame = new HashSet<>();
    Map<Integer, boolean[]> designTaken = new TreeMap<>();
    Map<Integer, boolean[]> newTaken = new TreeMap<>();
    for (Candidate c : taken) {
      if (c.frame() != null) {
        members.add(new RepairMember(c.frame(), true));
        takenFrame.add(c.frame());
      } else {
        (c.inDesign() ? designTaken : newTaken)
            .computeIfAbsent(c.panel(), k -> new boolean[2])[c.way()] = true;
      }
    }
    members.sort((x, y) -> x.member().compareTo(y.member()));
    List<RepairBrace> braces = new ArrayList<>();
    // one entry per diagonal member (a cross placed new is two items), design ones first
    Map<Integer, List<RepairBrace>> byPanel = new TreeMap<>();
    for (Map.Entry<Integer, boolean[]> e : designTaken.entrySet()) {
      Brace missing = designMissing.get(e.getKey());
      for (int way = 0; way < 2; way++) {
        if (e.getValue()[way]) {
          byPanel.computeIfAbsent(e.getKey(), k -> new ArrayList<>())
              .add(new RepairBrace(PanelCodes.panel(e.getKey(), n),
                  new Brace(way == 0 ? Diagonal.RISING : Diagonal.FALLING, missing.kind()), true));
        }
      }
    }
    for (Map.Entry<Integer, boolean[]> e : newTaken.entrySet()) {
      for (int way = 0; way < 2; way++) {
        if (e.getValue()[way]) {
          byPanel.computeIfAbsent(e.getKey(), k -> new ArrayList<>())
              .add(new RepairBrace(PanelCodes.panel(e.getKey(), n),
                  Brace.rigid(way == 0 ? Diagonal.RISING : Diagonal.FALLING), false));
        }
      }
    }
    for (List<RepairBrace> l : byPanel.values()) {
      braces.addAll(l);
    }
    List<RestoreItem> restore = new ArrayList<>();
    List<RestoreFrameItem> restoreFrame = new ArrayList<>();
    if (restoreList) {
      for (Map.Entry<Integer, Brace> e : designMissing.entrySet()) {
        restore.add(new RestoreItem(PanelCodes.panel(e.getKey(), n), e.getValue(),
            designTaken.containsKey(e.getKey())));
      }
      for (FrameRef f : designFrameMissing) {
        restoreFrame.add(new RestoreFrameItem(f, takenFrame.contains(f)));
      }
    }
    return new RepairPlan(rigid, braces, restore, members, restoreFrame);
  }

  private static Set<FrameRef> absentOf(PlaneGrid grid, boolean[] there) {
    Set<FrameRef> out = new HashSet<>();
    int ledgers = (grid.lifts() + 1) * grid.bays();
    for (int e = 0; e < there.length; e++) {
      if (!there[e]) {
        out.add(e < ledgers
            ? FrameRef.ledger(e / grid.bays(), e % grid.bays() + 1)
            : FrameRef.standard((e - ledgers) / (grid.bays() + 1) + 1, (e - ledgers) % (grid.bays() + 1)));
      }
    }
    return out;
  }

  /**
   * Random first-order motions of a framework (mod p), up to {@link #POOL_BYTES} bytes of joint
   * velocities, and its freedoms (mod p). The motions drawn are uniform in the motion space; the
   * current motions are kept as combinations of them (coefficients only). Taking a member that
   * current motion 0 stretches (the pivot) keeps every other current motion in the smaller motion
   * space of the framework with that member: each is reduced by the multiple of the pivot that
   * cancels its stretch, a linear map onto that space, so they stay independent and uniform there;
   * the pivot is dropped. The framework is rebuilt only when the current motions run out.
   */
  static final class Motion {
    static final long POOL_BYTES = 96L << 20;
    FrameFramework fw;
    int dof;
    /** Current motions 0..size-1, as coefficients over the motions drawn. */
    int size;
    private long[][] coef;
    /** The motions drawn: velocities of the grid joints. */
    private long[][] vx;
    private long[][] vy;
    boolean[] held;
    private final long[] s;

    private Motion(FrameFramework fw, int dof, long[][] vx, long[][] vy, boolean[] held) {
      this.fw = fw;
      this.dof = dof;
      this.size = vx.length;
      this.vx = vx;
      this.vy = vy;
      this.held = held;
      coef = new long[size][size];
      for (int k = 0; k < size; k++) {
        coef[k][k] = 1;
      }
      s = new long[size];
    }

    /** Stretches of the bar a-b under the motions drawn into {@code s}. */
    private void drawnStretches(int a, int b, long ddx, long ddy) {
      for (int l = 0; l < vx.length; l++) {
        s[l] = ModularEchelon.add(
            ModularEchelon.mul(ModularEchelon.sub(vx[l][b], vx[l][a]), ddx),
            ModularEchelon.mul(ModularEchelon.sub(vy[l][b], vy[l][a]), ddy));
      }
    }

    private long current(int k) {
      long t = 0;
      long[] c = coef[k];
      for (int l = 0; l < c.length; l++) {
        if (c[l] != 0 && s[l] != 0) {
          t = ModularEchelon.add(t, ModularEchelon.mul(c[l], s[l]));
        }
      }
      return t;
    }

    /**
     * The first-order change of length (times the length) of a bar a-b under current motion 0;
     * leaves that bar's stretches ready for {@link #take()}.
     */
    long stretch(int a, int b, long ddx, long ddy) {
      drawnStretches(a, b, ddx, ddy);
      return current(0);
    }

    /** The bar last given to {@link #stretch} is added; current motion 0 stretches it. */
    void take() {
      long inv = ModularEchelon.inverse(current(0));
      long[] pivot = coef[0];
      for (int k = 1; k < size; k++) {
        long f = ModularEchelon.mul(current(k), inv);
        long[] c = coef[k];
        if (f != 0) {
          for (int l = 0; l < c.length; l++) {
            c[l] = ModularEchelon.sub(c[l], ModularEchelon.mul(f, pivot[l]));
          }
        }
        coef[k - 1] = c;
      }
      size--;
      coef[size] = pivot;
      dof--;
    }

    /** Lets go of the framework and the velocities (the motions are spent; not used after). */
    void release() {
      fw = null;
      coef = null;
      vx = null;
      vy = null;
      held = null;
      size = 0;
    }

    /** A copy whose current motions can be taken from without changing this one's. */
    Motion copy() {
      Motion c = new Motion(fw, dof, vx, vy, held);
      c.size = size;
      for (int k = 0; k < coef.length; k++) {
        c.coef[k] = coef[k].clone();
      }
      return c;
    }

    /** {@code wanted} motions at most (fewer where the pool would exceed its bytes). */
    static Motion of(FrameFramework fw, SplittableRandom rnd, int wanted) {
      return of(FrameSystem.forMotions(fw), rnd, wanted);
    }

    /** The freedoms modulo p alone: no motion drawn (a full rank proves rigidity). */
    static int freedoms(FrameSystem system) {
      return new Setup(system).dof;
    }

    /** As {@link #of(FrameFramework, SplittableRandom, int)} on a state's shared equations. */
    static Motion of(FrameSystem system, SplittableRandom rnd, int wanted) {
      Setup st = new Setup(system);
      FrameFramework fw = system.fw;
      int dof = st.dof;
      int pool = (int) Math.max(1, Math.min(Math.min(wanted, Math.max(1, dof)),
          POOL_BYTES / (16L * fw.gridJoints)));
      long[][] vx = new long[pool][];
      long[][] vy = new long[pool][];
      int components = system.components;
      FrameSystem.SpanningForest forest = system.forest(st.anchorJoint);
      long[] sx = new long[fw.jointCount];
      long[] sy = new long[fw.jointCount];
      int[] classOf = st.sys.classOf;
      for (int k = 0; k < pool; k++) {
        long[] x = st.ech.randomNullVector(rnd);
        long[] tx = new long[Math.max(1, components)];
        long[] ty = new long[Math.max(1, components)];
        for (int c = 0; c < components; c++) {
          tx[c] = ModularEchelon.random(rnd);
          ty[c] = ModularEchelon.random(rnd);
        }
        forest.sweep(fw, classOf, x, system.comp, st.anchorComp, tx, ty, sx, sy);
        vx[k] = java.util.Arrays.copyOf(sx, fw.gridJoints);
        vy[k] = java.util.Arrays.copyOf(sy, fw.gridJoints);
      }
      return new Motion(fw, dof, vx, vy, st.held);
    }

    /** The anchor, the equations with it fixed, their echelon form and the freedoms mod p. */
    private static final class Setup {
      final int anchorJoint;
      final int anchorComp;
      final boolean[] held;
      final FaceClassSystem sys;
      final ModularEchelon ech;
      final int dof;

      Setup(FrameSystem system) {
        FrameFramework fw = system.fw;
        int[][] adj = system.adj;
        int[] comp = system.comp;
        int joint = -1;
        int anchorMember = -1;
        if (!fw.pinned) {
          for (int j = 0; j < fw.jointCount && joint < 0; j++) {
            if (adj[0][j] < adj[0][j + 1]) {
              joint = j;
              anchorMember = adj[1][adj[0][j]];
            }
          }
        }
        anchorJoint = joint;
        anchorComp = fw.pinned ? comp[0] : (joint < 0 ? -1 : comp[joint]);
        held = new boolean[fw.jointCount];
        for (int j = 0; j < fw.jointCount; j++) {
          held[j] = comp[j] >= 0;
        }
        int components = system.components;
        if (anchorMember < 0) {
          sys = system.base;
          ech = system.echelon();
        } else {
          sys = system.base.quotient(new int[] {anchorMember}, new int[0]);
          ech = FrameSystem.echelonOf(sys);
        }
        int d = sys.classCount - ech.rank() + 2 * Math.max(0, components - (anchorComp < 0 ? 0 : 1));
        if (joint < 0 && !fw.pinned) {
          d = 0;
        }
        dof = d;
      }
    }
  }
}
