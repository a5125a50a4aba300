package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The examples of analysis.md's "Frame members" table (A, E, G, I, F: values computed there from
 * the rigidity matrix with exact rank) as regression tests, for the oracle ({@link FrameOracle},
 * L. Asimow, B. Roth, Trans. AMS 245 (1978)) and for the engine. Pinned base unless said; rows of
 * the maps are top lift first; unit bays and lifts, and the same planes with uneven ones (the
 * answers do not depend on the dimensions).
 */
class FrameOracleExamplesTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  /** One example: the state, its freedoms, its moving joints, and the kinds of its freedoms. */
  record Example(String name, BuiltFrame state, int freedoms, List<Joint> moving, List<FreedomKind> kinds) {}

  private static BuiltFrame frame(Support s, int lifts, int bays, Set<FrameRef> absent, String... rows) {
    return new BuiltFrame(PlaneGrid.uniform(lifts, bays, s), TestPlanes.parse(rows), absent);
  }

  private static List<Joint> joints(int... levelLine) {
    List<Joint> out = new ArrayList<>();
    for (int k = 0; k < levelLine.length; k += 2) {
      out.add(new Joint(levelLine[k], levelLine[k + 1]));
    }
    return out;
  }

  static List<Example> examples() {
    Support pinned = Support.PINNED_BASE;
    return List.of(
        // A: 3 lifts x 1 bay, '/', '\', '/' from lift 1, ledger at level 1 missing: 1 freedom,
        // joint (1, 0) only (the standards meet in a straight line there, nothing holds them)
        new Example("A", frame(pinned, 3, 1, Set.of(FrameRef.ledger(1, 1)), "/", "\\", "/"),
            1, joints(1, 0), List.of(FreedomKind.LOST_RESTRAINT)),
        // E: 2 lifts x 3 bays, lift 1 bay 1 '/', lift 2 bay 3 '/', ledger level 1 bay 1 missing
        new Example("E", frame(pinned, 2, 3, Set.of(FrameRef.ledger(1, 1)), ". . /", "/ . ."),
            1, joints(1, 0), List.of(FreedomKind.LOST_RESTRAINT)),
        // G: 1 lift x 3 bays, bay 1 '/', ledger level 1 bay 3 missing: joint (1, 3) held by nothing
        // but the right-hand standard
        new Example("G", frame(pinned, 1, 3, Set.of(FrameRef.ledger(1, 3)), "/ . ."),
            1, joints(1, 3), List.of(FreedomKind.LOOSE_END)),
        // I: 4 lifts x 1 bay, '/' in every lift, both standards of lift 2 missing: 2 freedoms,
        // every joint from level 2 up (lifts 2-4 sway)
        new Example("I",
            frame(pinned, 4, 1, Set.of(FrameRef.standard(2, 0), FrameRef.standard(2, 1)), "/", "/", "/", "/"),
            2, joints(2, 0, 2, 1, 3, 0, 3, 1, 4, 0, 4, 1), List.of(FreedomKind.SWAY)),
        // F: 2 x 2 free, X in every panel, standard of lift 2 on line 1 missing: no freedom
        new Example("F", frame(Support.FREE, 2, 2, Set.of(FrameRef.standard(2, 1)), "X X", "X X"),
            0, List.of(), List.of()));
  }

  /** The same example on a grid of uneven bays and lifts (whole centimetres). */
  private static BuiltFrame uneven(BuiltFrame s) {
    List<Double> widths = new ArrayList<>();
    for (int j = 0; j < s.grid().bays(); j++) {
      widths.add(List.of(2.57, 1.09, 3.0, 0.73).get(j % 4));
    }
    List<Double> heights = new ArrayList<>();
    for (int i = 0; i < s.grid().lifts(); i++) {
      heights.add(List.of(2.0, 1.35, 0.8, 2.11).get(i % 4));
    }
    PlaneGrid g = new PlaneGrid(s.grid().lifts(), s.grid().bays(), widths, heights, s.grid().support());
    return new BuiltFrame(g, s.braces(), s.absentFrame());
  }

  @Test
  void theOracleGivesTheTablesFreedomsAndMovingJoints() {
    for (Example e : examples()) {
      for (BuiltFrame state : List.of(e.state(), uneven(e.state()))) {
        FrameOracle o = FrameOracle.of(state);
        String plane = " of example " + e.name() + FramePlanes.describe(state);
        assertThat(o.freedoms()).as("freedoms" + plane).isEqualTo(e.freedoms());
        if (o.pinned()) {
          assertThat(o.movingJoints()).as("moving joints" + plane).containsExactlyElementsOf(e.moving());
        }
        // the brace graph (frame taken complete) calls all five rigid
        assertThat(FrameOracle.of(state.grid(), state.braces(), Set.of()).freedoms())
            .as("freedoms with the frame complete" + plane).isZero();
      }
    }
  }

  @Test
  void theEngineGivesTheTablesFreedomsMovingJointsAndChecksOut() {
    for (Example e : examples()) {
      for (BuiltFrame state : List.of(e.state(), uneven(e.state()))) {
        String plane = " of example " + e.name() + FramePlanes.describe(state);
        StateAnalysis a = engine.analyseState(state);
        assertThat(a.degreesOfFreedom()).as("degrees of freedom" + plane).isEqualTo(e.freedoms());
        assertThat(a.rigid()).as("verdict" + plane).isEqualTo(e.freedoms() == 0);
        if (state.grid().support() == Support.PINNED_BASE) {
          assertThat(a.movingJoints()).as("moving joints" + plane).containsExactlyElementsOf(e.moving());
        }
        FrameEngineChecks.assertVerdictMatches(engine, state);
        FrameEngineChecks.assertKindsMatch(a, state);
        FrameEngineChecks.assertCriticalMatch(a, state);
        FrameEngineChecks.assertMotionsMatch(engine, a, state);
      }
    }
  }

  @Test
  void theEngineListsOneFreedomPerJointOrSwayingPartAsTheTableSays() {
    // one entry per loose end or joint without restraint, one per swaying part (Freedom's javadoc):
    // A and E one lost restraint, G one loose end, I one part (lifts 2-4) with two motions, F none
    for (Example e : examples()) {
      BuiltFrame state = e.state();
      List<FreedomKind> kinds = new ArrayList<>();
      int counts = 0;
      for (Freedom f : engine.analyseState(state).freedoms()) {
        kinds.add(f.kind());
        counts += f.count();
      }
      String plane = " of example " + e.name() + FramePlanes.describe(state);
      assertThat(kinds).as("kinds of freedom" + plane).containsExactlyElementsOf(e.kinds());
      assertThat(counts).as("freedoms counted" + plane).isEqualTo(e.freedoms());
    }
  }

  @Test
  void theJointsWithoutRestraintNameTheMembersRunningThrough() {
    // A: the standards of lifts 1 and 2 on line 0 run straight through joint (1, 0)
    StateAnalysis a = engine.analyseState(examples().get(0).state());
    assertThat(a.freedoms()).hasSize(1);
    assertThat(a.freedoms().get(0).members())
        .containsExactly(FrameRef.standard(1, 0), FrameRef.standard(2, 0));
    // G: the loose end at joint (1, 3) is held by the standard of lift 1 on line 3 alone
    StateAnalysis g = engine.analyseState(examples().get(2).state());
    assertThat(g.freedoms()).hasSize(1);
    assertThat(g.freedoms().get(0).joints()).containsExactly(new Joint(1, 3));
    assertThat(g.freedoms().get(0).members()).containsExactly(FrameRef.standard(1, 3));
  }
}
