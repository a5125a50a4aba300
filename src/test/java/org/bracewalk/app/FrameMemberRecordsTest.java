package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Frame members in the records: a design that leaves members out, and observations of frame
 * members recorded, corrected, read back, counted in the as-built plane, and refused where they
 * do not belong, through the services over a real SQLite file (migration V9).
 */
class FrameMemberRecordsTest {
  private static final FrameRef BOTTOM_LEDGER = FrameRef.ledger(0, 2);
  private static final FrameRef LEFT_STANDARD = FrameRef.standard(1, 0);

  @TempDir Path dir;

  private Database db;
  private AppServices app;
  private Fixtures.Services s;
  private PlaneRecord plane;
  private Inspection inspection;

  @BeforeEach
  void open() {
    db = Database.open(dir.resolve("t.db"));
    s = Fixtures.Services.over(db);
    app = AppServices.over(db, s.clock(), PlaneAnalyzer.standard());
    plane = Fixtures.plane(s);
    inspection = start();
  }

  @AfterEach
  void close() {
    db.close();
  }

  private Inspection start() {
    return s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "inspector", InspectionReason.ROUTINE));
  }

  private Observation record(FrameRef member, PanelState state) {
    return s.inspections().recordObservation(inspection.id(),
        NewObservation.ofMember(plane.id(), member, state, "M. Okafor"));
  }

  @Test
  void aDesignRevisionKeepsTheFrameMembersItLeavesOut() {
    Set<FrameRef> omitted = Set.of(FrameRef.ledger(3, 1), FrameRef.standard(2, 2));
    DesignRevision r2 = s.sites().addDesignRevision(plane.id(), "D. Fenwick",
        LocalDate.of(2025, 3, 1), "top ledger left out for the hoist",
        Fixtures.threeByTwo().withOmittedFrame(omitted));
    DesignRevision read = db.designs().find(r2.id()).orElseThrow();
    assertThat(read.design().omittedFrame()).isEqualTo(omitted);
    assertThat(read.design().hasFrameMember(FrameRef.ledger(3, 1))).isFalse();
    assertThat(read).isEqualTo(r2);
    // the first revision, made without, still has a complete frame
    assertThat(db.designs().ofPlane(plane.id()).get(0).design().frameComplete()).isTrue();
  }

  @Test
  void aFrameMemberObservationIsStoredAndReadBackAsRecorded() {
    Observation o = s.inspections().recordObservation(inspection.id(), new NewObservation(
        plane.id(), null, PanelState.DAMAGED_INEFFECTIVE, null, 12.5, 1000, DefectType.BENT,
        "upright buckled above the foot plate", "M. Okafor", LEFT_STANDARD));
    assertThat(o.panel()).isNull();
    assertThat(o.frameMember()).isEqualTo(LEFT_STANDARD);
    assertThat(db.observations().find(o.id())).contains(o);
    assertThat(s.inspections().latestFrameObservations(inspection.id(), plane.id()))
        .containsExactly(Map.entry(LEFT_STANDARD, o));
    // panels and frame members are counted apart
    assertThat(s.inspections().latestObservations(inspection.id(), plane.id())).isEmpty();
  }

  @Test
  void theLatestUncorrectedObservationOfAFrameMemberCountsInTheAsBuiltPlane() {
    Observation first = record(BOTTOM_LEDGER, PanelState.SOUND);
    Observation later = record(BOTTOM_LEDGER, PanelState.MISSING);
    Observation wrong = record(LEFT_STANDARD, PanelState.MISSING);
    Observation fixed = s.inspections().correct(inspection.id(), wrong.id(),
        NewObservation.ofMember(plane.id(), LEFT_STANDARD, PanelState.NOT_REACHABLE, "M. Okafor"),
        "behind stacked pallets, could not be seen");
    s.inspections().recordObservation(inspection.id(),
        NewObservation.of(plane.id(), PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor"));

    assertThat(s.inspections().latestFrameObservations(inspection.id(), plane.id()))
        .containsOnlyKeys(BOTTOM_LEDGER, LEFT_STANDARD)
        .containsEntry(BOTTOM_LEDGER, later).containsEntry(LEFT_STANDARD, fixed);
    assertThat(fixed.supersedes()).isEqualTo(wrong.id());
    assertThat(s.inspections().observations(inspection.id())).contains(first, wrong);

    AsBuiltPlane asBuilt = s.inspections().asBuilt(inspection.id(), plane.id());
    assertThat(asBuilt.absentFrame()).containsExactly(BOTTOM_LEDGER);
    assertThat(asBuilt.unknownFrame()).containsExactly(LEFT_STANDARD);
    assertThat(asBuilt.memberAt(PanelRef.of(1, 1))).isEqualTo(Brace.rigid(Diagonal.RISING));

    assertThatThrownBy(() -> s.inspections().correct(inspection.id(), wrong.id(),
            NewObservation.ofMember(plane.id(), LEFT_STANDARD, PanelState.SOUND, "x"), "again"))
        .hasMessageContaining("already corrected by observation " + fixed.id());
  }

  @Test
  void aFrameMemberOutsideThePlaneIsRefusedNamingIt() {
    // the plane has 3 lifts and 2 bays: levels 0..3, lines 0..2
    assertThatThrownBy(() -> record(FrameRef.ledger(4, 1), PanelState.MISSING))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("ledger at level 4, bay 1 lies outside plane 'spine'");
    assertThatThrownBy(() -> record(FrameRef.standard(1, 3), PanelState.MISSING))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("standard of lift 1 on line 3 lies outside plane 'spine'");
    assertThat(s.inspections().observations(inspection.id())).isEmpty();
  }

  @Test
  void extraOnlyWhereTheDesignLeavesTheMemberOut() {
    assertThatThrownBy(() -> record(BOTTOM_LEDGER, PanelState.EXTRA))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("ledger at level 0, bay 2")
        .hasMessageContaining("cannot be extra");
    s.sites().addDesignRevision(plane.id(), "D. Fenwick", LocalDate.of(2025, 3, 1),
        "bottom ledger of bay 2 left out for access",
        Fixtures.threeByTwo().withOmittedFrame(Set.of(BOTTOM_LEDGER)));
    inspection = start(); // the new revision is in force for inspections started from now
    Observation extra = record(BOTTOM_LEDGER, PanelState.EXTRA);
    assertThat(s.inspections().asBuilt(inspection.id(), plane.id()).absentFrame()).isEmpty();
    assertThat(extra.state()).isEqualTo(PanelState.EXTRA);
    // not recorded: taken as designed, that is absent
    inspection = start();
    assertThat(s.inspections().asBuilt(inspection.id(), plane.id()).absentFrame())
        .containsExactly(BOTTOM_LEDGER);
  }

  @Test
  void aFrameMemberNamesNoDiagonalFound() {
    assertThatThrownBy(() -> s.inspections().recordObservation(inspection.id(),
            new NewObservation(plane.id(), null, PanelState.SOUND, Brace.rigid(Diagonal.RISING),
                null, null, null, null, "M. Okafor", BOTTOM_LEDGER)))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("ledger at level 0, bay 2")
        .hasMessageContaining("names no diagonal found");
  }

  @Test
  void aFrameMemberObservationAndItsPhotosAreStoredTogether() throws Exception {
    Path png = dir.resolve("foot.png");
    Files.write(png, new byte[] {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n', 0, 0});
    RecordedObservation r = s.inspections().record(inspection.id(),
        NewObservation.ofMember(plane.id(), LEFT_STANDARD, PanelState.DAMAGED_EFFECTIVE, "M. O."),
        List.of(png));
    assertThat(s.inspections().photos(r.observation().id())).hasSize(1);
    // a photo that cannot be read records nothing, frame member or not
    assertThatThrownBy(() -> s.inspections().record(inspection.id(),
            NewObservation.ofMember(plane.id(), BOTTOM_LEDGER, PanelState.MISSING, "M. O."),
            List.of(dir.resolve("gone.png"))))
        .isInstanceOf(UserInputException.class);
    assertThat(s.inspections().observations(inspection.id())).hasSize(1);
  }

  @Test
  void nothingIsAddedToAFinalisedInspection() {
    Observation o = record(BOTTOM_LEDGER, PanelState.SOUND);
    s.inspections().finalise(inspection.id());
    assertThatThrownBy(() -> record(BOTTOM_LEDGER, PanelState.MISSING))
        .isInstanceOf(InspectionFinalisedException.class);
    assertThatThrownBy(() -> s.inspections().correct(inspection.id(), o.id(),
            NewObservation.ofMember(plane.id(), BOTTOM_LEDGER, PanelState.MISSING, "x"), "r"))
        .isInstanceOf(InspectionFinalisedException.class);
  }

  @Test
  void theAnalysisAndHistoryCarryFrameMembers() {
    // states that leave the frame complete (the verdict is the diagonals' as before)
    record(BOTTOM_LEDGER, PanelState.SOUND);
    s.inspections().finalise(inspection.id());
    inspection = start();
    record(BOTTOM_LEDGER, PanelState.DAMAGED_EFFECTIVE);
    record(LEFT_STANDARD, PanelState.SOUND);

    PlaneResult result = app.analysis().analysePlane(inspection.id(), plane.id());
    assertThat(result.latestFrame()).containsOnlyKeys(BOTTOM_LEDGER, LEFT_STANDARD);
    assertThat(result.latest()).isEmpty();
    assertThat(result.verdict().kind()).isNotEqualTo(
        org.bracewalk.app.verdict.VerdictKind.NOT_INSPECTED);

    PlaneHistory h = app.history().history(plane.id());
    assertThat(h.entries()).hasSize(2);
    assertThat(h.entries().get(0).frameChanges()).isEmpty();
    assertThat(h.entries().get(1).frameFindings())
        .containsEntry(BOTTOM_LEDGER, PanelState.DAMAGED_EFFECTIVE);
    assertThat(h.entries().get(1).frameChanges()).containsExactly(
        new FrameChange(BOTTOM_LEDGER, PanelState.SOUND, PanelState.DAMAGED_EFFECTIVE),
        new FrameChange(LEFT_STANDARD, null, PanelState.SOUND));
  }
}
