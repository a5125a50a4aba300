package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;
import org.junit.jupiter.api.Test;

/**
 * The examples of {@code shared/design/analysis.md}, section "Frame members" (table A, E, G, I, F;
 * values there computed from the rigidity matrix with exact rank), and a seeded comparison with
 * the rigidity matrix of the bar-and-joint framework (L. Asimow, B. Roth, "The rigidity of graphs",
 * Trans. AMS 245 (1978)), its rank and null space from EJML's singular value decomposition.
 */
class FrameExamplesTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private static Map<PanelRef, Brace> braces(Object... pairs) {
    Map<PanelRef, Brace> m = new HashMap<>();
    for (int i = 0; i < pairs.length; i += 2) {
      m.put((PanelRef) pairs[i], Brace.rigid(Diagonal.fromSymbol((String) pairs[i + 1])));
    }
    return m;
  }

  private static List<Joint> joints(int... levelLine) {
    List<Joint> out = new ArrayList<>();
    for (int i = 0; i < levelLine.length; i += 2) {
      out.add(new Joint(levelLine[i], levelLine[i + 1]));
    }
    return out;
  }

  @Test
  void exampleA_ledgerMissingLeavesTheStandardsWithoutSidewaysRestraint() {
    // analysis.md, "Frame members", row A: 3 lifts x 1 bay, / \ /, ledger at level 1 missing:
    // 1 freedom, only joint (1, 0) moves (standards in a straight line, nothing holding them).
    PlaneGrid grid = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
    BuiltFrame state = new BuiltFrame(grid,
        braces(new PanelRef(1, 1), "/", new PanelRef(2, 1), "\\", new PanelRef(3, 1), "/"),
        Set.of(FrameRef.ledger(1, 1)));
    StateAnalysis s = engine.analyseState(state);
    assertThat(s.rigid()).isFalse();
    assertThat(s.degreesOfFreedom()).isEqualTo(1);
    assertThat(s.movingJoints()).containsExactly(new Joint(1, 0));
    assertThat(s.freedomsOf(FreedomKind.LOST_RESTRAINT)).isEqualTo(1);
    Freedom f = s.freedoms().get(0);
    assertThat(f.kind()).isEqualTo(FreedomKind.LOST_RESTRAINT);
    assertThat(f.joints()).containsExactly(new Joint(1, 0));
    assertThat(f.members()).containsExactly(FrameRef.standard(1, 0), FrameRef.standard(2, 0));
    assertThat(s.blocks()).isEmpty();
    assertThat(s.frameComplete()).isFalse();
    JointMotion motion = engine.motion(state, f).orElseThrow();
    assertThat(Math.abs(motion.dx(1, 0))).isEqualTo(1.0);
    assertThat(motion.dy(1, 0)).isZero();
    assertThat(motion.moves(2, 0)).isFalse();
  }

  @Test
  void exampleE_ledgerMissingInABracedLift() {
    // analysis.md, "Frame members", row E: 2 lifts x 3 bays, lift 1 bay 1 /, lift 2 bay 3 /,
    // ledger level 1 bay 1 missing: 1 freedom, joint (1, 0) only.
    PlaneGrid grid = PlaneGrid.uniform(2, 3, Support.PINNED_BASE);
    StateAnalysis s = engine.analyseState(new BuiltFrame(grid,
        braces(new PanelRef(1, 1), "/", new PanelRef(2, 3), "/"), Set.of(FrameRef.ledger(1, 1))));
    assertThat(s.degreesOfFreedom()).isEqualTo(1);
    assertThat(s.movingJoints()).containsExactly(new Joint(1, 0));
    assertThat(s.freedomsOf(FreedomKind.LOST_RESTRAINT)).isEqualTo(1);
  }

  @Test
  void exampleG_looseEndOfTheRightHandStandard() {
    // analysis.md, "Frame members", row G: 1 lift x 3 bays, bay 1 /, ledger level 1 bay 3
    // missing: 1 freedom, joint (1, 3) held by nothing but its standard.
    PlaneGrid grid = PlaneGrid.uniform(1, 3, Support.PINNED_BASE);
    BuiltFrame state = new BuiltFrame(grid, braces(new PanelRef(1, 1), "/"),
        Set.of(FrameRef.ledger(1, 3)));
    StateAnalysis s = engine.analyseState(state);
    assertThat(s.degreesOfFreedom()).isEqualTo(1);
    assertThat(s.movingJoints()).containsExactly(new Joint(1, 3));
    Freedom f = s.freedoms().get(0);
    assertThat(f.kind()).isEqualTo(FreedomKind.LOOSE_END);
    assertThat(f.members()).containsExactly(FrameRef.standard(1, 3));
    JointMotion motion = engine.motion(state, f).orElseThrow();
    assertThat(Math.abs(motion.dx(1, 3))).isEqualTo(1.0);
    assertThat(motion.moves(1, 2)).isFalse();
  }

  @Test
  void exampleI_bothStandardsOfALiftMissingLetTheLiftsAboveSway() {
    // analysis.md, "Frame members", row I: 4 lifts x 1 bay, / in every lift, both standards of
    // lift 2 missing: 2 freedoms, every joint from level 2 up moves (lifts 2-4 sway).
    PlaneGrid grid = PlaneGrid.uniform(4, 1, Support.PINNED_BASE);
    StateAnalysis s = engine.analyseState(new BuiltFrame(grid,
        braces(new PanelRef(1, 1), "/", new PanelRef(2, 1), "/", new PanelRef(3, 1), "/",
            new PanelRef(4, 1), "/"),
        Set.of(FrameRef.standard(2, 0), FrameRef.standard(2, 1))));
    assertThat(s.degreesOfFreedom()).isEqualTo(2);
    assertThat(s.movingJoints()).containsExactly(joints(2, 0, 2, 1, 3, 0, 3, 1, 4, 0, 4, 1).toArray(new Joint[0]));
    assertThat(s.freedomsOf(FreedomKind.SWAY)).isEqualTo(2);
  }

  @Test
  void exampleF_crossesMakeUpForAMissingStandard() {
    // analysis.md, "Frame members", row F: 2 x 2 free, X in every panel, standard of lift 2 on
    // line 1 missing: 0 freedoms, nothing moves.
    PlaneGrid grid = PlaneGrid.uniform(2, 2, Support.FREE);
    StateAnalysis s = engine.analyseState(new BuiltFrame(grid,
        braces(new PanelRef(1, 1), "X", new PanelRef(1, 2), "X", new PanelRef(2, 1), "X",
            new PanelRef(2, 2), "X"),
        Set.of(FrameRef.standard(2, 1))));
    assertThat(s.rigid()).isTrue();
    assertThat(s.degreesOfFreedom()).isZero();
    assertThat(s.freedoms()).isEmpty();
  }

  @Test
  void completeFrameKeepsTheBraceGraphAnswers() {
    // analysis.md, "Why a bipartite graph": a free 2 x 2 plane with two diagonals in one lift has
    // 1 freedom (Bolker & Crapo 1979); the frame-member fields are added, nothing else changes.
    PlaneGrid grid = PlaneGrid.uniform(2, 2, Support.FREE);
    Map<PanelRef, Brace> b = braces(new PanelRef(1, 1), "/", new PanelRef(1, 2), "/");
    StateAnalysis complete = engine.analyseState(grid, b);
    StateAnalysis old = BraceGraphAnalysis.analyse(BraceGraph.of(grid, b));
    assertThat(complete.degreesOfFreedom()).isEqualTo(1).isEqualTo(old.degreesOfFreedom());
    assertThat(complete.blocks()).isEqualTo(old.blocks());
    assertThat(complete.criticalBraces()).isEqualTo(old.criticalBraces());
    assertThat(complete.freedomsOf(FreedomKind.SWAY)).isEqualTo(1);
  }

  @Test
  void aSlackCableWhereALedgerIsMissingIsRepairedByRefittingTheLedger() {
    // 1 lift x 2 bays, pinned, designed with tension-only crosses; as built the ledger over bay 2
    // is missing and bay 2 keeps only its rising cable. The joint (1, 2) is held by the standard and
    // that cable: no freedom with cables as bars, but moving it left shortens the cable (it goes
    // slack), so the plane sways one way (B. Roth, W. Whiteley, Trans. AMS 265 (1981)). Refitting
    // the design ledger makes the lift a complete frame held by the cross of bay 1 (analysis.md,
    // "Why a bipartite graph"): one item.
    PlaneGrid grid = PlaneGrid.uniform(1, 2, Support.PINNED_BASE);
    Map<PanelRef, Brace> design = Map.of(
        new PanelRef(1, 1), Brace.tension(Diagonal.BOTH), new PanelRef(1, 2), Brace.tension(Diagonal.BOTH));
    Map<PanelRef, Brace> built = Map.of(
        new PanelRef(1, 1), Brace.tension(Diagonal.BOTH), new PanelRef(1, 2), Brace.tension(Diagonal.RISING));
    PlaneAnalysis a = engine.analyse(
        new org.bracewalk.core.model.PlaneDesign(grid, design, Set.of()),
        new org.bracewalk.core.model.AsBuiltPlane(grid, built, Set.of(), Set.of(FrameRef.ledger(1, 2)), Set.of()));
    StateAnalysis s = a.asBuilt().orElseThrow().state();
    assertThat(s.degreesOfFreedom()).isZero();
    assertThat(s.rigid()).isFalse();
    assertThat(s.oneWayOnly()).isTrue();
    assertThat(a.repair().possible()).isTrue();
    assertThat(a.repair().members()).containsExactly(new RepairMember(FrameRef.ledger(1, 2), true));
    assertThat(a.repair().restoreFrame())
        .containsExactly(new RestoreFrameItem(FrameRef.ledger(1, 2), true));
  }

  // ---- the rigidity matrix, for seeded random planes ----

  private record Oracle(int dof, int rank, Set<Joint> moving) {}

  /** Freedoms and moving joints from the rigidity matrix (EJML SVD, tolerance 1e-9 relative). */
  private static Oracle oracle(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<FrameRef> absent) {
    int m = grid.lifts();
    int n = grid.bays();
    double[] xs = new double[n + 1];
    double[] ys = new double[m + 1];
    for (int j = 1; j <= n; j++) {
      xs[j] = xs[j - 1] + grid.bayWidths().get(j - 1);
    }
    for (int i = 1; i <= m; i++) {
      ys[i] = ys[i - 1] + grid.liftHeights().get(i - 1);
    }
    List<int[]> bars = new ArrayList<>();
    for (int level = 0; level <= m; level++) {
      for (int bay = 1; bay <= n; bay++) {
        if (!absent.contains(FrameRef.ledger(level, bay))) {
          bars.add(new int[] {level, bay - 1, level, bay});
        }
      }
    }
    for (int lift = 1; lift <= m; lift++) {
      for (int line = 0; line <= n; line++) {
        if (!absent.contains(FrameRef.standard(lift, line))) {
          bars.add(new int[] {lift - 1, line, lift, line});
        }
      }
    }
    for (Map.Entry<PanelRef, Brace> e : braces.entrySet()) {
      PanelRef p = e.getKey();
      if (e.getValue().diagonal().hasRising()) {
        bars.add(new int[] {p.lift() - 1, p.bay() - 1, p.lift(), p.bay()});
      }
      if (e.getValue().diagonal().hasFalling()) {
        bars.add(new int[] {p.lift(), p.bay() - 1, p.lift() - 1, p.bay()});
      }
    }
    boolean pinned = grid.support() == Support.PINNED_BASE;
    Map<Integer, Integer> col = new HashMap<>();
    for (int[] bar : bars) {
      for (int k = 0; k < 2; k++) {
        int level = bar[2 * k];
        int line = bar[2 * k + 1];
        if (pinned && level == 0) {
          continue;
        }
        col.putIfAbsent(level * (n + 1) + line, col.size());
      }
    }
    int cols = 2 * col.size();
    if (cols == 0) {
      return new Oracle(0, 0, Set.of());
    }
    DMatrixRMaj r = new DMatrixRMaj(Math.max(bars.size(), 1), cols);
    for (int i = 0; i < bars.size(); i++) {
      int[] bar = bars.get(i);
      double dx = xs[bar[3]] - xs[bar[1]];
      double dy = ys[bar[2]] - ys[bar[0]];
      Integer a = col.get(bar[0] * (n + 1) + bar[1]);
      Integer b = col.get(bar[2] * (n + 1) + bar[3]);
      if (a != null) {
        r.set(i, 2 * a, -dx);
        r.set(i, 2 * a + 1, -dy);
      }
      if (b != null) {
        r.set(i, 2 * b, dx);
        r.set(i, 2 * b + 1, dy);
      }
    }
    SingularValueDecomposition_F64<DMatrixRMaj> svd =
        DecompositionFactory_DDRM.svd(r.numRows, r.numCols, false, true, false);
    svd.decompose(r.copy());
    double[] sv = svd.getSingularValues();
    double max = 0;
    for (double s : sv) {
      max = Math.max(max, s);
    }
    int rank = 0;
    for (int i = 0; i < svd.numberOfSingularValues(); i++) {
      if (sv[i] > 1e-9 * max) {
        rank++;
      }
    }
    int dof = pinned ? cols - rank : cols - 3 - rank;
    Set<Joint> moving = new HashSet<>();
    if (pinned) {
      DMatrixRMaj v = svd.getV(null, false);
      for (Map.Entry<Integer, Integer> e : col.entrySet()) {
        double norm = 0;
        for (int k = 0; k < v.numCols; k++) {
          boolean nullDir = k >= svd.numberOfSingularValues() || sv[k] <= 1e-9 * max;
          if (nullDir) {
            norm += Math.pow(v.get(2 * e.getValue(), k), 2) + Math.pow(v.get(2 * e.getValue() + 1, k), 2);
          }
        }
        if (norm > 1e-12) {
          moving.add(new Joint(e.getKey() / (n + 1), e.getKey() % (n + 1)));
        }
      }
    }
    return new Oracle(dof, rank, moving);
  }

  @Test
  void seededRandomPlanesAgreeWithTheRigidityMatrix() {
    Random rnd = new Random(11);
    String[] tokens = {".", ".", "/", "\\", "X"};
    for (int trial = 0; trial < 300; trial++) {
      int m = 1 + rnd.nextInt(4);
      int n = 1 + rnd.nextInt(4);
      Support support = rnd.nextBoolean() ? Support.PINNED_BASE : Support.FREE;
      List<Double> widths = new ArrayList<>();
      List<Double> heights = new ArrayList<>();
      for (int j = 0; j < n; j++) {
        widths.add(1.0 + rnd.nextInt(20) * 0.1);
      }
      for (int i = 0; i < m; i++) {
        heights.add(1.0 + rnd.nextInt(20) * 0.1);
      }
      PlaneGrid grid = new PlaneGrid(m, n, widths, heights, support);
      Map<PanelRef, Brace> b = new HashMap<>();
      for (int i = 1; i <= m; i++) {
        for (int j = 1; j <= n; j++) {
          Diagonal d = Diagonal.fromSymbol(tokens[rnd.nextInt(tokens.length)]);
          if (d != null) {
            b.put(new PanelRef(i, j), Brace.rigid(d));
          }
        }
      }
      Set<FrameRef> absent = new HashSet<>();
      int damage = rnd.nextInt(4);
      for (int k = 0; k < damage; k++) {
        absent.add(rnd.nextBoolean()
            ? FrameRef.ledger(rnd.nextInt(m + 1), 1 + rnd.nextInt(n))
            : FrameRef.standard(1 + rnd.nextInt(m), rnd.nextInt(n + 1)));
      }
      StateAnalysis s = engine.analyseState(new BuiltFrame(grid, b, absent));
      Oracle o = oracle(grid, b, absent);
      String where = "trial " + trial + " " + m + "x" + n + " " + support + " " + b + " absent " + absent;
      assertThat(s.degreesOfFreedom()).as(where).isEqualTo(Math.max(0, o.dof()));
      int sum = 0;
      for (Freedom f : s.freedoms()) {
        sum += f.count();
      }
      assertThat(sum).as(where).isEqualTo(s.degreesOfFreedom());
      if (support == Support.PINNED_BASE) {
        assertThat(new HashSet<>(s.movingJoints())).as(where).isEqualTo(o.moving());
      }
      // critical members: removal changes the freedoms (rigidity matrix again)
      for (int level = 0; level <= m; level++) {
        for (int bay = 1; bay <= n; bay++) {
          checkCritical(s, grid, b, absent, FrameRef.ledger(level, bay), where);
        }
      }
      for (int lift = 1; lift <= m; lift++) {
        for (int line = 0; line <= n; line++) {
          checkCritical(s, grid, b, absent, FrameRef.standard(lift, line), where);
        }
      }
    }
  }

  private static void checkCritical(StateAnalysis s, PlaneGrid grid, Map<PanelRef, Brace> b,
      Set<FrameRef> absent, FrameRef f, String where) {
    if (absent.contains(f)) {
      assertThat(s.criticalMembers()).as(where).doesNotContain(f);
      return;
    }
    Set<FrameRef> more = new HashSet<>(absent);
    more.add(f);
    // check-contract.md, "Frame members": critical iff its loss alone adds a freedom (the
    // rigidity matrix before and after, joints left bare dropped)
    int before = Math.max(0, oracle(grid, b, absent).dof());
    int after = Math.max(0, oracle(grid, b, more).dof());
    assertThat(s.criticalMembers().contains(f)).as(where + " member " + f).isEqualTo(after > before);
  }
}
