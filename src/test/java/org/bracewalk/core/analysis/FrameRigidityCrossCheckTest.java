package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Random;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The engine on planes with frame damage (ledgers and standards absent) against {@link
 * FrameOracle}: the exact rank of the rigidity matrix of every ledger, standard and diagonal that
 * is there (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245 (1978)), checked itself in
 * {@link FrameOracleSelfCheckTest}. Seeded random planes up to 8 x 8, uneven and uniform grids, both
 * supports, '/', '\' and X panels, some tension-only members (counted as bars for the degrees of
 * freedom).
 */
class FrameRigidityCrossCheckTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private static Support support(int k) {
    return k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
  }

  @Test
  void degreesOfFreedomVerdictAndMovingJointsMatchTheRigidityMatrixOnRandomDamagedPlanes() {
    Random rnd = new Random(0xF7A3_0001L);
    int mechanisms = 0;
    int complete = 0;
    int withCrosses = 0;
    int withCables = 0;
    int pinnedMoving = 0;
    for (int k = 0; k < 520; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 8, support(k), 0.2);
      FrameEngineChecks.assertVerdictMatches(engine, state);
      FrameOracle o = FrameOracle.of(state);
      mechanisms += o.freedoms() > 0 ? 1 : 0;
      complete += state.frameComplete() ? 1 : 0;
      withCrosses += state.braces().values().stream().anyMatch(b -> b.diagonal().memberCount() == 2) ? 1 : 0;
      withCables += o.hasCables() ? 1 : 0;
      pinnedMoving += o.pinned() && !o.movingJoints().isEmpty() ? 1 : 0;
    }
    // the sample must hold both verdicts, complete and damaged frames, crosses and cables
    assertThat(mechanisms).isBetween(150, 500);
    assertThat(complete).isBetween(40, 200);
    assertThat(withCrosses).isGreaterThan(250);
    assertThat(withCables).isGreaterThan(200);
    assertThat(pinnedMoving).isGreaterThan(100);
  }

  @Test
  void freedomsAreToldApartAsLooseEndsJointsWithoutSidewaysRestraintAndSwayingParts() {
    Random rnd = new Random(0xF7A3_0002L);
    int loose = 0;
    int straight = 0;
    for (int k = 0; k < 300; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 8, support(k), 0.2);
      StateAnalysis a = FrameEngineChecks.assertVerdictMatches(engine, state);
      FrameEngineChecks.assertKindsMatch(a, state);
      FrameOracle o = FrameOracle.of(state);
      loose += o.looseEnds().size();
      straight += o.straightThroughJoints().size();
    }
    assertThat(loose).isGreaterThan(50);
    assertThat(straight).isGreaterThan(50);
  }

  @Test
  void criticalMembersAndBracesAreThoseWhoseLossAddsAFreedomInTheRigidityMatrix() {
    // by the self-stress route (FrameOracle.criticalByStresses), which FrameOracleSelfCheckTest
    // ties to removal and rank; FrameCriticalMembersTest removes each member literally on smaller
    // planes
    Random rnd = new Random(0xF7A3_0003L);
    int critical = 0;
    for (int k = 0; k < 500; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 8, support(k), 0.2);
      StateAnalysis a = engine.analyseState(state);
      List<FrameOracle.Bar> bars = FrameOracle.of(state).criticalByStresses();
      FrameEngineChecks.assertCriticalMatch(a, state, bars);
      int members = (int) bars.stream().filter(b -> b.frame() != null).count();
      critical += members;
    }
    assertThat(critical).isGreaterThan(1000);
  }

  @Test
  void eachFreedomsMotionKeepsEveryMemberLengthAndMovesWhatItNames() {
    Random rnd = new Random(0xF7A3_0004L);
    int motions = 0;
    for (int k = 0; k < 200; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 6, support(k), 0.2);
      StateAnalysis a = engine.analyseState(state);
      FrameEngineChecks.assertMotionsMatch(engine, a, state);
      motions += a.freedoms().size();
      if (a.degreesOfFreedom() == 0) {
        assertThat(a.freedoms()).as("freedoms of a plane without any" + FramePlanes.describe(state))
            .isEmpty();
      }
    }
    assertThat(motions).isGreaterThan(120);
  }

  @Test
  void onCompleteFramesTheOldBraceGraphAnswersAreUnchanged() {
    // the same members through both entry points give the same analysis, and it is the one the
    // older cross-checks hold the brace graph to (freedoms of the rigidity matrix)
    Random rnd = new Random(0xF7A3_0005L);
    for (int k = 0; k < 300; k++) {
      PlaneGrid grid = FramePlanes.grid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), support(k));
      Map<PanelRef, Brace> members = TestPlanes.members(rnd, grid, rnd.nextDouble(), 0.2);
      String plane = TestPlanes.map(grid, members);
      StateAnalysis viaFrame = engine.analyseState(BuiltFrame.complete(grid, members));
      StateAnalysis viaBraces = engine.analyseState(grid, members);
      assertThat(viaFrame).as("analysis of a complete frame through both entry points of" + plane)
          .isEqualTo(viaBraces);
      assertThat(viaFrame.frameComplete()).as("frameComplete of" + plane).isTrue();
      assertThat(viaFrame.degreesOfFreedom()).as("degrees of freedom of" + plane)
          .isEqualTo(new BarJointFramework(grid, members).freedoms());
      assertThat(viaFrame.blocks()).as("blocks of" + plane).hasSize(viaFrame.degreesOfFreedom() + 1);
    }
  }
}
