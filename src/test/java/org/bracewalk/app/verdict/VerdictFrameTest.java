package org.bracewalk.app.verdict;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The one verdict where frame members are missing. The states are written by hand as the engine
 * reports the planes of shared/design/analysis.md, "Frame members" (its table: freedoms and moving
 * joints computed there from the rigidity matrix with exact rank); what is tested here is the
 * verdict, the keep-off zone and the words drawn from them. analysis.md also gives the rules: a
 * joint without sideways restraint is not a collapse mechanism by itself in a continuous member,
 * but an engineer checks it before loading; a part that sways keeps people and loads off as lost
 * bracing does. Racking words (beam, upright) are the trade's own.
 */
class VerdictFrameTest {

  private static StateAnalysis incomplete(int dof, List<Joint> moving, Freedom... freedoms) {
    return new StateAnalysis(false, dof, false, -1, true, List.of(), List.of(), List.of(), moving,
        List.of(freedoms), false);
  }

  private static Freedom restraint(Joint at, FrameRef... through) {
    return new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(at), List.of(through), List.of());
  }

  /** analysis.md plane A: 3 lifts x 1 bay, ledger at level 1 missing: joint (1, 0) only moves. */
  private static final StateAnalysis PLANE_A = incomplete(1, List.of(new Joint(1, 0)),
      restraint(new Joint(1, 0), FrameRef.standard(1, 0), FrameRef.standard(2, 0)));

  @Test
  void onlyLostRestraintHasItsOwnKindNeverHoldsItsShapeAndNamesTheStandard() {
    PlaneGrid grid = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, PLANE_A, 0, false);

    assertThat(v.kind()).isEqualTo(VerdictKind.LOST_RESTRAINT);
    assertThat(v.kind()).isNotEqualTo(VerdictKind.HOLDS);
    assertThat(v.headline()).contains("Lost sideways restraint").contains("engineer");
    assertThat(v.kind().lost()).as("needs action and a keep-off zone").isTrue();
    // the joint at level 1 moves: lift 1 and every lift above it, every bay
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(1, 2, 3), List.of(1), false));
    assertThat(v.anyLostRestraint()).isTrue();
    assertThat(v.freedomWords(Set.of(FrameRef.ledger(1, 1)))).containsExactly(
        "standard on line 0 runs unrestrained through level 1 (ledger at level 1, bay 1 not there):"
            + " its unbraced length grows; an engineer checks it before loading");
    assertThat(Wording.LOST_RESTRAINT_NOTE).contains("conservative side").contains("engineer");
  }

  @Test
  void aRackingPlaneSaysUprightAndHorizontalOrBeam() {
    PlaneGrid grid = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.UPRIGHT_FRAME, PLANE_A, 0, false);
    assertThat(v.freedomWords(Set.of(FrameRef.ledger(1, 1)))).containsExactly(
        "upright on line 0 runs unrestrained through level 1 (horizontal at level 1, bay 1 not there):"
            + " its unbraced length grows; an engineer checks it before loading");
    // an upright frame still off-loads the beam bays beside it (common practice, as before)
    assertThat(v.keepOffZone().orElseThrow().offloadBeside()).isTrue();
    assertThat(Terms.of(StructureKind.RACKING_RUN, PlaneRole.OTHER)).isEqualTo(Terms.RACKING);
    assertThat(Terms.of(StructureKind.SCAFFOLD, PlaneRole.FACADE)).isEqualTo(Terms.SCAFFOLD);
    assertThat(Wording.frameMember(FrameRef.standard(2, 3), Terms.RACKING)).isEqualTo("upright of lift 2 on line 3");
    // an upright frame's ledgers are its horizontals, a spine's (down-aisle) are beams; the report's
    // templates say the same (frame.ledger.upright-frame) (common practice: the racking trade's words)
    assertThat(Terms.of(StructureKind.RACKING_RUN, PlaneRole.UPRIGHT_FRAME)).isEqualTo(Terms.RACKING_FRAME);
    assertThat(Wording.frameMember(FrameRef.ledger(1, 2), Terms.RACKING_FRAME)).isEqualTo("horizontal at level 1, bay 2");
    assertThat(Wording.frameMember(FrameRef.ledger(1, 2), Terms.of(PlaneRole.SPINE))).isEqualTo("beam at level 1, bay 2");
  }

  /** analysis.md plane G: 1 lift x 3 bays, ledger level 1 bay 3 missing: joint (1, 3) is loose. */
  @Test
  void aLooseEndIsLostRigidityAndIsNamed() {
    PlaneGrid grid = PlaneGrid.uniform(1, 3, Support.PINNED_BASE);
    Joint top = new Joint(1, 3);
    StateAnalysis g = incomplete(1, List.of(top),
        new Freedom(FreedomKind.LOOSE_END, 1, List.of(top), List.of(FrameRef.standard(1, 3)), List.of()));

    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, g, 0, false);

    assertThat(v.kind()).isEqualTo(VerdictKind.LOST);
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(1), List.of(1, 2, 3), false));
    assertThat(v.freedomWords(Set.of(FrameRef.ledger(1, 3)))).containsExactly(
        "loose end at level 1, line 3: the standard of lift 1 on line 3 is held there by nothing else"
            + " (ledger at level 1, bay 3 not there)");
  }

  /** analysis.md plane I: 4 lifts x 1 bay, both standards of lift 2 missing: lifts 2-4 sway. */
  @Test
  void aSwayingPartKeepsPeopleOffFromItsLowestMovingJointUp() {
    PlaneGrid grid = PlaneGrid.uniform(4, 1, Support.PINNED_BASE);
    List<Joint> moving = new ArrayList<>();
    for (int level = 2; level <= 4; level++) {
      moving.add(new Joint(level, 0));
      moving.add(new Joint(level, 1));
    }
    StateAnalysis i = incomplete(2, moving, new Freedom(FreedomKind.SWAY, 2, moving, List.of(), List.of()));

    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, i, 0, false);

    assertThat(v.kind()).isEqualTo(VerdictKind.LOST);
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(2, 3, 4), List.of(1), false));
    assertThat(Verdict.lowestSwayingLift(grid, i)).isEqualTo(2);
    assertThat(v.freedomWords(Set.of())).containsExactly(
        "the part at levels 2-4, lines 0, 1 can sway (2 independent motions): keep people and loads"
            + " off it and everything it carries");
  }

  @Test
  void lostRestraintBesideASwayIsLostRigidityAndTheZoneStartsAtTheLowerOfThem() {
    PlaneGrid grid = PlaneGrid.uniform(4, 1, Support.PINNED_BASE);
    StateAnalysis s = incomplete(2, List.of(new Joint(1, 0), new Joint(3, 0), new Joint(3, 1)),
        restraint(new Joint(1, 0), FrameRef.standard(1, 0), FrameRef.standard(2, 0)),
        new Freedom(FreedomKind.SWAY, 1, List.of(new Joint(3, 0), new Joint(3, 1)), List.of(), List.of()));

    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, s, 0, false);

    assertThat(v.kind()).isEqualTo(VerdictKind.LOST);
    assertThat(v.keepOffZone().orElseThrow().lifts()).containsExactly(1, 2, 3, 4);
  }

  @Test
  void frameMembersNotInspectedMakeTheVerdictDependOnThem() {
    PlaneGrid grid = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, PLANE_A, 0, 1, true);
    assertThat(v.kind()).isEqualTo(VerdictKind.DEPENDS_ON_UNSEEN);
    assertThat(v.unknownFrameMembers()).isEqualTo(1);
    // the zone is the worst case, as for panels not inspected
    assertThat(v.keepOffZone()).isPresent();
  }

  @Test
  void aLedgerWithoutRestraintIsNamedByItsLevel() {
    Freedom f = restraint(new Joint(2, 1), FrameRef.ledger(2, 1), FrameRef.ledger(2, 2));
    assertThat(Wording.freedom(f, Terms.SCAFFOLD, Set.of(FrameRef.standard(2, 1), FrameRef.standard(3, 1))))
        .isEqualTo("ledger at level 2 runs unrestrained across line 1 (standard of lift 2 on line 1,"
            + " standard of lift 3 on line 1 not there): its unbraced length grows; an engineer"
            + " checks it before loading");
  }

  @Test
  void theSeverityOfLostRestraintLiesBetweenDependingOnUnseenAndSwayingOneWay() {
    assertThat(VerdictKind.worse(VerdictKind.LOST_RESTRAINT, VerdictKind.DEPENDS_ON_UNSEEN))
        .isEqualTo(VerdictKind.LOST_RESTRAINT);
    assertThat(VerdictKind.worse(VerdictKind.LOST_RESTRAINT, VerdictKind.SWAYS_ONE_WAY))
        .isEqualTo(VerdictKind.SWAYS_ONE_WAY);
  }
}
