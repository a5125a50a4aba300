package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's frame members, through the records and the engine: the racking run's after-impact
 * inspection records frame 2's bottom horizontal missing and its aisle-side upright damaged beyond
 * use, and the frame loses rigidity with a loose end at the struck foot; the facade scaffold's
 * finalised inspection records the ledger taken out for access, and the end standard is left
 * without sideways restraint at that node.
 *
 * <p>The expected mechanisms are worked out by hand from the bar-and-joint model of
 * {@code shared/design/analysis.md} ("Frame members"): a joint held only by two collinear standards
 * has a first-order sideways motion (lost restraint); a joint held by one member only is a loose
 * end.
 */
class DemoFrameMembersTest {
  @TempDir Path dir;

  private final AppContext context = AppContext.standard();

  private static PlaneRecord plane(AppServices s, long inspection, String name) {
    return s.inspections().planesOf(inspection).stream()
        .filter(p -> p.name().equals(name)).findFirst().orElseThrow();
  }

  private static java.util.List<Freedom> ofKind(StateAnalysis a, FreedomKind kind) {
    return a.freedoms().stream().filter(f -> f.kind() == kind).toList();
  }

  @Test
  void theStruckRackingFrameLosesRigidityWithALooseEndAtItsFoot() {
    try (AppServices s = context.open(dir.resolve("demo.db"))) {
      s.demo().load();
      PlaneRecord frame2 = plane(s, 2, "frame 2");
      PlaneResult r = s.analysis().analysePlane(2, frame2.id());
      // the bottom horizontal of the upright frame: the level 0 "ledger" joins the two pinned
      // base plates and carries nothing, so the first horizontal above them is level 1
      assertThat(r.latestFrame()).containsOnlyKeys(FrameRef.ledger(1, 1), FrameRef.standard(1, 0));
      assertThat(r.latestFrame().get(FrameRef.ledger(1, 1)).state()).isEqualTo(PanelState.MISSING);
      assertThat(r.latestFrame().get(FrameRef.standard(1, 0)).state())
          .isEqualTo(PanelState.DAMAGED_INEFFECTIVE);
      assertThat(r.asBuilt().absentFrame())
          .containsExactlyInAnyOrder(FrameRef.ledger(1, 1), FrameRef.standard(1, 0));
      StateAnalysis asBuilt = r.analysis().analysedState();
      assertThat(asBuilt.rigid()).isFalse();
      assertThat(r.verdict().kind()).isEqualTo(VerdictKind.LOST);
      // joint (level 1, line 0): its upright below and its horizontal gone, only the upright
      // above holds it
      assertThat(ofKind(asBuilt, FreedomKind.LOOSE_END)).extracting(Freedom::joints)
          .contains(java.util.List.of(new Joint(1, 0)));
      // the frame was rigid in the routine inspection two days before
      assertThat(s.analysis().analysePlane(1, frame2.id()).analysis().analysedState().rigid())
          .isTrue();
    }
  }

  @Test
  void theFacadeLedgerTakenOutLeavesTheEndStandardWithoutSidewaysRestraint() {
    try (AppServices s = context.open(dir.resolve("demo.db"))) {
      s.demo().load();
      assertThat(s.inspections().inspection(3).isFinalised()).isTrue();
      PlaneRecord facade = plane(s, 3, "north facade");
      PlaneResult r = s.analysis().analysePlane(3, facade.id());
      assertThat(r.asBuilt().absentFrame()).containsExactly(FrameRef.ledger(1, 1));
      StateAnalysis asBuilt = r.analysis().analysedState();
      // no part sways (bays 1, 6 and 10 braced); the end standard on line 0 runs through level 1
      // with nothing holding it sideways: one lost restraint, at that joint
      assertThat(asBuilt.freedomsOf(FreedomKind.SWAY)).isZero();
      assertThat(ofKind(asBuilt, FreedomKind.LOST_RESTRAINT)).singleElement()
          .satisfies(f -> assertThat(f.joints()).containsExactly(new Joint(1, 0)));
      assertThat(asBuilt.degreesOfFreedom()).isEqualTo(1);
      assertThat(r.verdict().kind()).isEqualTo(VerdictKind.LOST_RESTRAINT);
      // the east end frame of the same inspection holds its shape
      PlaneResult end = s.analysis().analysePlane(3, plane(s, 3, "east end frame").id());
      assertThat(end.analysis().analysedState().rigid()).isTrue();
    }
  }

  @Test
  void historyShowsTheFrameMembersThatChanged() {
    try (AppServices s = context.open(dir.resolve("demo.db"))) {
      s.demo().load();
      PlaneRecord frame2 = plane(s, 2, "frame 2");
      PlaneHistory h = s.history().history(frame2.id());
      assertThat(h.entries()).hasSize(2);
      assertThat(h.entries().get(1).frameChanges()).containsExactly(
          new FrameChange(FrameRef.ledger(1, 1), null, PanelState.MISSING),
          new FrameChange(FrameRef.standard(1, 0), null, PanelState.DAMAGED_INEFFECTIVE));
    }
  }
}
