package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.SplittableRandom;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The engine: the brace graph ({@link BraceGraphAnalysis}) where the analysed frame is
 * complete, the exact framework analysis ({@link FrameFramework}, {@link FaceClassSystem}, {@link
 * FrameFreedoms}, {@link CriticalByStress}, {@link FrameRepairPlanner}) where a ledger or standard
 * is not there. On a complete frame every brace-graph answer is kept as it is; the frame-member
 * fields are added: critical frame members (from a random self-stress), and the freedoms and moving
 * joints read off the blocks (a block that is not fixed is a part that sways).
 */
final class FramePlaneAnalyzer implements PlaneAnalyzer {
  /** Seed of the random self-stresses and motions: answers are reproducible run to run. */
  static final long SEED = 0x5EEDF00DL;

  @Override
  public StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return analyseState(BuiltFrame.complete(grid, members));
  }

  @Override
  public StateAnalysis analyseState(BuiltFrame state) {
    PlaneGrid grid = state.grid();
    byte[] codes = PanelCodes.encode(grid, state.braces());
    return analyse(grid, codes, state.absentFrame());
  }

  @Override
  public Optional<JointMotion> motion(BuiltFrame state, Freedom freedom) {
    if (state.frameComplete()) {
      PlaneGrid grid = state.grid();
      byte[] codes = PanelCodes.encode(grid, state.braces());
      StateAnalysis s = BraceGraphAnalysis.analyse(BraceGraph.of(grid, codes));
      List<Block> moving = swayingBlocks(s, grid.support() == org.bracewalk.core.model.Support.PINNED_BASE);
      if (moving.isEmpty()) {
        return Optional.empty();
      }
      List<Block> ordered = orderedBlocks(moving);
      List<Freedom> sway = completeSway(grid, moving);
      for (int i = 0; i < sway.size(); i++) {
        if (sway.get(i).equals(freedom)) {
          return Optional.of(blockMotion(grid, ordered.get(i)));
        }
      }
      throw new IllegalArgumentException("not a freedom of this state: " + freedom);
    }
    FrameFramework fw = FrameFramework.of(state.grid(), state.braces(), state.absentFrame());
    FrameFreedoms ff = FrameFreedoms.of(fw, SEED);
    if (ff.dof == 0) {
      return Optional.empty();
    }
    return Optional.of(ff.motion(freedom));
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design) {
    PlaneGrid grid = design.grid();
    byte[] codes = PanelCodes.encode(grid, design.braces());
    BitSet openings = PanelCodes.mark(grid, design.openings());
    if (design.frameComplete()) {
      StateAnalysis state = analyseComplete(grid, codes);
      BraceGraph graph = BraceGraph.of(grid, codes);
      RepairPlan repair = RepairPlanner.plan(grid, codes, openings, codes, graph, false);
      return new PlaneAnalysis(grid, state, Optional.empty(), repair);
    }
    FrameSystem system = systemOf(grid, codes, design.omittedFrame());
    StateAnalysis state = analyseIncomplete(system, grid, codes, design.omittedFrame());
    SplittableRandom rnd = new SplittableRandom(SEED);
    int dof = state.degreesOfFreedom();
    FrameRepairPlanner.Motion motion =
        dof == 0 ? null : FrameRepairPlanner.Motion.of(system, rnd, dof);
    system = null;
    RepairPlan repair =
        FrameRepairPlanner.plan(
            grid, codes, design.omittedFrame(), openings, codes, design.omittedFrame(), false, dof,
            motion, rnd);
    return new PlaneAnalysis(grid, state, Optional.empty(), repair);
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt) {
    PlaneGrid grid = design.grid();
    PlaneGrid found = asBuilt.grid();
    if (found.lifts() != grid.lifts() || found.bays() != grid.bays()) {
      throw new IllegalArgumentException(
          "the as-built state has "
              + found.lifts()
              + " lifts x "
              + found.bays()
              + " bays but the design has "
              + grid.lifts()
              + " x "
              + grid.bays());
    }
    int n = grid.bays();
    byte[] designCodes = PanelCodes.encode(grid, design.braces());
    byte[] builtCodes = PanelCodes.encode(grid, asBuilt.members());
    StateAnalysis designState = analyse(grid, designCodes, design.omittedFrame());
    Set<FrameRef> notThere = new HashSet<>(asBuilt.absentFrame());
    notThere.addAll(asBuilt.unknownFrame());
    // where the frame is incomplete, one framework and one set of equations serve the state's
    // analysis, "rigid if sound" and the repair; the repair's motions are drawn once
    FrameSystem system = notThere.isEmpty() ? null : systemOf(grid, builtCodes, notThere);
    StateAnalysis builtState =
        system == null ? analyseComplete(grid, builtCodes)
            : analyseIncomplete(system, grid, builtCodes, notThere);
    SplittableRandom rnd = new SplittableRandom(SEED);
    FrameRepairPlanner.Motion motion =
        system == null || builtState.degreesOfFreedom() == 0
            ? null
            : FrameRepairPlanner.Motion.of(system, rnd, builtState.degreesOfFreedom());

    boolean rigidIfSound = builtState.rigid();
    if (!asBuilt.uninspected().isEmpty() || !asBuilt.unknownFrame().isEmpty()) {
      byte[] optimistic = builtCodes.clone();
      BitSet unknown = PanelCodes.mark(grid, asBuilt.uninspected());
      for (int idx = unknown.nextSetBit(0); idx >= 0; idx = unknown.nextSetBit(idx + 1)) {
        optimistic[idx] = designCodes[idx];
      }
      Set<FrameRef> absentIfSound = new HashSet<>(asBuilt.absentFrame());
      for (FrameRef f : asBuilt.unknownFrame()) {
        if (!design.hasFrameMember(f)) {
          absentIfSound.add(f);
        }
      }
      if (absentIfSound.isEmpty()) {
        rigidIfSound = BraceGraphAnalysis.isRigid(BraceGraph.of(grid, optimistic));
      } else {
        int dof = system == null ? -1 : freedomsIfSound(system, builtState, motion, builtCodes,
            optimistic, notThere, absentIfSound);
        rigidIfSound =
            dof < 0
                ? analyseIncomplete(grid, optimistic, absentIfSound, false).rigid()
                : dof == 0
                    && (!hasTension(optimistic)
                        || TensionOnlyFrame.rigid(grid, optimistic, absentIfSound));
      }
    }
    List<PlacedBrace> extras = new ArrayList<>();
    for (int idx = 0; idx < builtCodes.length; idx++) {
      if (builtCodes[idx] != PanelCodes.NONE && builtCodes[idx] != designCodes[idx]) {
        Brace extra =
            PanelMatch.extra(PanelCodes.decode(designCodes[idx]), PanelCodes.decode(builtCodes[idx]));
        if (extra != null) {
          extras.add(new PlacedBrace(PanelCodes.panel(idx, n), extra));
        }
      }
    }
    AsBuiltAnalysis built =
        new AsBuiltAnalysis(
            builtState, asBuilt.uninspected().size(), rigidIfSound, extras,
            asBuilt.unknownFrame().size());
    BitSet openings = PanelCodes.mark(grid, design.openings());
    RepairPlan repair;
    if (notThere.isEmpty()) {
      BraceGraph builtGraph = BraceGraph.of(grid, builtCodes);
      repair = RepairPlanner.plan(grid, designCodes, openings, builtCodes, builtGraph, true);
    } else {
      // the state's framework and equations are done with: a large plane's repair may rebuild
      system = null;
      repair =
          FrameRepairPlanner.plan(
              grid, designCodes, design.omittedFrame(), openings, builtCodes, notThere, true,
              builtState.degreesOfFreedom(), motion, rnd);
    }
    return new PlaneAnalysis(grid, designState, Optional.of(built), repair);
  }

  /** The state with the frame members {@code absent} not there. */
  static StateAnalysis analyse(PlaneGrid grid, byte[] codes, Set<FrameRef> absent) {
    if (absent.isEmpty()) {
      return analyseComplete(grid, codes);
    }
    return analyseIncomplete(grid, codes, absent, true);
  }

  private static StateAnalysis analyseComplete(PlaneGrid grid, byte[] codes) {
    BraceGraph g = BraceGraph.of(grid, codes);
    StateAnalysis s = BraceGraphAnalysis.analyse(g);
    List<FrameRef> critical = CompleteFrameStress.criticalMembers(grid, codes, SEED);
    boolean pinned = grid.support() == org.bracewalk.core.model.Support.PINNED_BASE;
    List<Joint> movingJoints = new ArrayList<>();
    List<Freedom> freedoms = completeSway(grid, swayingBlocks(s, pinned), movingJoints);
    if (!pinned) {
      movingJoints = List.of();
    }
    return new StateAnalysis(
        s.rigid(), s.degreesOfFreedom(), s.oneWayOnly(), s.lossTolerance(), s.lossToleranceExact(),
        s.criticalBraces(), s.blocks(), critical, movingJoints, freedoms, true);
  }

  /** The blocks that sway: not fixed, and on a free plane not the one holding bay 1. */
  private static List<Block> swayingBlocks(StateAnalysis s, boolean pinned) {
    List<Block> moving = new ArrayList<>();
    for (Block b : s.blocks()) {
      if (!b.fixed() && (pinned || !b.containsBay(1))) {
        moving.add(b);
      }
    }
    return moving;
  }

  private static int minLift(Block b) {
    return b.lifts().isEmpty() ? Integer.MAX_VALUE : b.lifts().get(0);
  }

  private static int minBay(Block b) {
    return b.bays().isEmpty() ? Integer.MAX_VALUE : b.bays().get(0);
  }

  /** Swaying blocks in the order of their first moving joint (level, then line). */
  private static List<Block> orderedBlocks(List<Block> moving) {
    List<Block> out = new ArrayList<>(moving);
    out.sort(
        (a, b) -> {
          Joint ja = minBay(a) < Integer.MAX_VALUE ? new Joint(0, minBay(a)) : new Joint(minLift(a), 0);
          Joint jb = minBay(b) < Integer.MAX_VALUE ? new Joint(0, minBay(b)) : new Joint(minLift(b), 0);
          return ja.compareTo(jb);
        });
    return out;
  }

  /**
   * One sway per block that sways (count 1). A block moves every joint at or above its lowest lift
   * or right of its first bay; each moving joint is listed under the last block (in this order)
   * that moves it, so the lists partition the moving joints (on a pinned base: each swaying lift
   * with the storeys above it up to the next swaying lift).
   */
  private static List<Freedom> completeSway(PlaneGrid grid, List<Block> moving) {
    return completeSway(grid, moving, new ArrayList<>());
  }

  /** As above; also adds every moving joint, in joint order, to {@code allMoving}. */
  private static List<Freedom> completeSway(
      PlaneGrid grid, List<Block> moving, List<Joint> allMoving) {
    List<Block> ordered = orderedBlocks(moving);
    int m = grid.lifts();
    int n = grid.bays();
    int[] byLevel = new int[m + 1];
    int[] byLine = new int[n + 1];
    java.util.Arrays.fill(byLevel, -1);
    java.util.Arrays.fill(byLine, -1);
    for (int k = 0; k < ordered.size(); k++) {
      Block b = ordered.get(k);
      for (int i = Math.min(minLift(b), m + 1); i <= m; i++) {
        byLevel[i] = Math.max(byLevel[i], k);
      }
      for (int j = Math.min(minBay(b), n + 1); j <= n; j++) {
        byLine[j] = Math.max(byLine[j], k);
      }
    }
    List<List<Joint>> lists = new ArrayList<>();
    for (int k = 0; k < ordered.size(); k++) {
      lists.add(new ArrayList<>());
    }
    for (int i = 0; i <= m; i++) {
      for (int j = 0; j <= n; j++) {
        int k = Math.max(byLevel[i], byLine[j]);
        if (k >= 0) {
          Joint joint = new Joint(i, j);
          lists.get(k).add(joint);
          allMoving.add(joint);
        }
      }
    }
    List<Freedom> out = new ArrayList<>();
    for (List<Joint> js : lists) {
      out.add(new Freedom(FreedomKind.SWAY, 1, js, List.of(), List.of()));
    }
    return out;
  }

  /**
   * The first-order motion of a block turning (analysis.md, "Mechanism shape"): joint (i, j) moves
   * by (-sum of the block's lift heights up to i, sum of its bay widths up to j), scaled to 1.
   */
  private static JointMotion blockMotion(PlaneGrid grid, Block b) {
    int m = grid.lifts();
    int n = grid.bays();
    double[] dx = new double[(m + 1) * (n + 1)];
    double[] dy = new double[(m + 1) * (n + 1)];
    double max = 0;
    double up = 0;
    for (int i = 0; i <= m; i++) {
      if (i > 0 && b.containsLift(i)) {
        up += grid.liftHeights().get(i - 1);
      }
      double across = 0;
      for (int j = 0; j <= n; j++) {
        if (j > 0 && b.containsBay(j)) {
          across += grid.bayWidths().get(j - 1);
        }
        dx[i * (n + 1) + j] = -up;
        dy[i * (n + 1) + j] = across;
        max = Math.max(max, Math.hypot(up, across));
      }
    }
    for (int k = 0; k < dx.length; k++) {
      dx[k] /= max;
      dy[k] /= max;
    }
    return new JointMotion(m, n, dx, dy);
  }

  static StateAnalysis analyseIncomplete(
      PlaneGrid grid, byte[] codes, Set<FrameRef> absent, boolean full) {
    FrameSystem system = systemOf(grid, codes, absent);
    if (!full) {
      // the verdict alone: a full rank of the face rows modulo p proves rigidity; a deficiency
      // modulo p is taken as a freedom (wrong with probability below 1/p, and only cautiously)
      int dof = FrameRepairPlanner.Motion.freedoms(system);
      boolean rigid = dof == 0 && (!hasTension(codes) || TensionOnlyFrame.rigid(grid, codes, absent));
      return new StateAnalysis(rigid, dof, dof == 0 && !rigid, -1, true, List.of(), List.of(),
          List.of(), List.of(), List.of(), false);
    }
    return analyseIncomplete(system, grid, codes, absent);
  }

  /** The framework and shared equations of a state (tension-only members as bars). */
  static FrameSystem systemOf(PlaneGrid grid, byte[] codes, Set<FrameRef> absent) {
    return FrameSystem.of(FrameFramework.of(grid, rigidityCodes(codes), frameThere(grid, absent)));
  }

  /**
   * The freedoms modulo p of the state "if sound" ({@code optimistic} diagonals, {@code
   * absentIfSound} frame members not there), from the analysed state's motions: each member it
   * adds is taken iff a current motion stretches it (each taking proves one freedom fewer, so a
   * count of 0 proves rigidity, as a full rank would; a member wrongly passed over, with
   * probability below 1/p, leaves a freedom: the cautious side). -1 when this does not apply (a
   * member removed, an added member with an end no member holds, or the motions run out), and the
   * state is then analysed on its own.
   */
  private static int freedomsIfSound(
      FrameSystem system, StateAnalysis built, FrameRepairPlanner.Motion motion, byte[] builtCodes,
      byte[] optimistic, Set<FrameRef> notThere, Set<FrameRef> absentIfSound) {
    FrameFramework fw = system.fw;
    List<int[]> added = new ArrayList<>();
    int n = fw.bays;
    for (int idx = 0; idx < optimistic.length; idx++) {
      int was = builtCodes[idx] & 3;
      int now = optimistic[idx] & 3;
      if ((was & ~now) != 0) {
        return -1;
      }
      int lift = idx / n;
      int bay = idx % n;
      if ((now & ~was & 1) != 0) {
        added.add(new int[] {fw.joint(lift, bay), fw.joint(lift + 1, bay + 1)});
      }
      if ((now & ~was & 2) != 0) {
        added.add(new int[] {fw.joint(lift + 1, bay), fw.joint(lift, bay + 1)});
      }
    }
    for (FrameRef f : notThere) {
      if (!absentIfSound.contains(f)) {
        int e = fw.frameId(f);
        added.add(new int[] {fw.ja[e], fw.jb[e]});
      }
    }
    for (int[] ab : added) {
      if (system.comp[ab[0]] < 0 || system.comp[ab[1]] < 0) {
        return -1;
      }
    }
    if (built.degreesOfFreedom() == 0 || motion == null) {
      return motion == null && built.degreesOfFreedom() > 0 ? -1 : 0;
    }
    FrameRepairPlanner.Motion m = motion.copy();
    for (int[] ab : added) {
      if (m.dof == 0) {
        break;
      }
      if (m.size == 0) {
        return -1;
      }
      long ddx = ModularEchelon.mod(fw.x(ab[1]) - fw.x(ab[0]));
      long ddy = ModularEchelon.mod(fw.y(ab[1]) - fw.y(ab[0]));
      if (m.stretch(ab[0], ab[1], ddx, ddy) != 0) {
        m.take();
      }
    }
    return m.dof;
  }

  /** The full analysis of a state whose frame is incomplete, on its shared equations. */
  static StateAnalysis analyseIncomplete(
      FrameSystem system, PlaneGrid grid, byte[] codes, Set<FrameRef> absent) {
    FrameFreedoms ff = FrameFreedoms.of(system, SEED);
    int dof = ff.dof;
    boolean tension = false;
    for (byte c : codes) {
      tension |= c != PanelCodes.NONE && !PanelCodes.isRigid(c);
    }
    boolean rigid = dof == 0;
    if (rigid && tension) {
      rigid = TensionOnlyFrame.rigid(grid, codes, absent);
    }
    boolean oneWay = dof == 0 && !rigid;
    CriticalByStress.Critical critical = CriticalByStress.of(system, SEED);
    int tolerance = -1;
    boolean exact = true;
    if (rigid) {
      if (!critical.braces().isEmpty()) {
        tolerance = 0;
      } else {
        // no single brace is critical: at least one may go; more is not computed here
        tolerance = 1;
        exact = false;
      }
    }
    return new StateAnalysis(
        rigid, dof, oneWay, tolerance, exact, critical.braces(), List.of(), critical.members(),
        ff.movingJoints, ff.freedoms, false);
  }

  private static boolean hasTension(byte[] codes) {
    for (byte c : codes) {
      if (c != PanelCodes.NONE && !PanelCodes.isRigid(c)) {
        return true;
      }
    }
    return false;
  }

  /** Diagonal codes without the tension-only bit: every member as a bar. */
  static byte[] rigidityCodes(byte[] codes) {
    byte[] out = new byte[codes.length];
    for (int i = 0; i < codes.length; i++) {
      out[i] = (byte) (codes[i] & 3);
    }
    return out;
  }

  static boolean[] allThere(PlaneGrid grid) {
    boolean[] there = new boolean[(grid.lifts() + 1) * grid.bays() + grid.lifts() * (grid.bays() + 1)];
    java.util.Arrays.fill(there, true);
    return there;
  }

  static boolean[] frameThere(PlaneGrid grid, Set<FrameRef> absent) {
    boolean[] there = allThere(grid);
    for (FrameRef f : absent) {
      there[FrameFramework.frameId(grid.lifts(), grid.bays(), f)] = false;
    }
    return there;
  }
}
