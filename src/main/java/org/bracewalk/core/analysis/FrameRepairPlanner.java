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
    Set<Long> designWays = new HashSet<>();
    for (int idx = 0; idx < design.length; idx++) {
      if (design[idx] != PanelCodes.NONE && design[idx] != analysed[idx]) {
        Brace missing =
            PanelMatch.missing(PanelCodes.decode(design[idx]), PanelCodes.decode(analysed[idx]));
        if (missing != null) {
          designMissing.put(idx, missing);
          for (int way = 0; way < 2; way++) {
            if (way == 0 ? missing.diagonal().hasRising() : missing.diagonal().hasFalling()) {
              candidates.add(new Candidate(idx, way, null, missing.kind(), true));
              designWays.add(idx * 2L + way);
            }
          }
        }
      }
    }
    byte[] codes = FramePlaneAnalyzer.rigidityCodes(analysed);
    boolean[] there = FramePlaneAnalyzer.frameThere(grid, notThere);
    List<Candidate> taken = new ArrayList<>();
    SplittableRandom rnd = new SplittableRandom(FramePlaneAnalyzer.SEED);
    Motion motion = dof == 0 ? null : Motion.of(FrameFramework.of(grid, codes, there), rnd);
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
            || designWays.contains(idx * 2L + way)) {
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
      long stretch =
          ModularEchelon.add(
              ModularEchelon.mul(ModularEchelon.sub(motion.vx[b], motion.vx[a]), ddx),
              ModularEchelon.mul(ModularEchelon.sub(motion.vy[b], motion.vy[a]), ddy));
      if (stretch == 0) {
        continue;
      }
      taken.add(c);
      if (c.frame() != null) {
        there[fw.frameId(c.frame())] = true;
      } else {
        codes[c.panel()] |= (byte) (1 << c.way());
      }
      motion = Motion.of(FrameFramework.of(grid, codes, there), rnd);
      rigid = motion.dof == 0;
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

  /** One random first-order motion of a framework (mod p) and its freedoms (mod p). */
  static final class Motion {
    final FrameFramework fw;
    final int dof;
    final long[] vx;
    final long[] vy;
    final boolean[] held;

    private Motion(FrameFramework fw, int dof, long[] vx, long[] vy, boolean[] held) {
      this.fw = fw;
      this.dof = dof;
      this.vx = vx;
      this.vy = vy;
      this.held = held;
    }

    static Motion of(FrameFramework fw, SplittableRandom rnd) {
      int[][] adj = FrameFreedoms.adjacency(fw);
      int[] comp = FrameFreedoms.components(fw, adj);
      int anchorJoint = -1;
      int anchorMember = -1;
      if (!fw.pinned) {
        for (int j = 0; j < fw.jointCount && anchorJoint < 0; j++) {
          if (adj[0][j] < adj[0][j + 1]) {
            anchorJoint = j;
            anchorMember = adj[1][adj[0][j]];
          }
        }
      }
      int anchorComp = fw.pinned ? comp[0] : (anchorJoint < 0 ? -1 : comp[anchorJoint]);
      boolean[] held = new boolean[fw.jointCount];
      int components = 0;
      for (int j = 0; j < fw.jointCount; j++) {
        held[j] = comp[j] >= 0;
        components = Math.max(components, comp[j] + 1);
      }
      FaceClassSystem sys =
          new FaceClassSystem(fw, anchorMember < 0 ? new int[0] : new int[] {anchorMember},
              new int[0]);
      ModularEchelon ech = new ModularEchelon(sys.classCount);
      for (int r = 0; r < 2 * sys.groupCount; r++) {
        if (sys.rowCols[r].length > 0) {
          ech.addRow(sys.rowCols[r], sys.rowVals[r]);
        }
      }
      int dof = sys.classCount - ech.rank() + 2 * Math.max(0, components - (anchorComp < 0 ? 0 : 1));
      if (anchorJoint < 0 && !fw.pinned) {
        dof = 0;
      }
      long[] x = ech.randomNullVector(rnd);
      long[] w = new long[fw.memberCount];
      for (int e = 0; e < fw.memberCount; e++) {
        int c = sys.classOf[e];
        if (c >= 0) {
          w[e] = x[c];
        }
      }
      long[] tx = new long[Math.max(1, components)];
      long[] ty = new long[Math.max(1, components)];
      for (int c = 0; c < components; c++) {
        tx[c] = ModularEchelon.random(rnd);
        ty[c] = ModularEchelon.random(rnd);
      }
      long[][] v = FrameFreedoms.propagate(fw, adj, w, comp, anchorComp, anchorJoint, tx, ty);
      return new Motion(fw, dof, v[0], v[1], held);
    }
  }
}
