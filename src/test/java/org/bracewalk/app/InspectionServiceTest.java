package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.Map;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InspectionServiceTest {
  @TempDir Path dir;

  private Database db;
  private Fixtures.Services s;
  private PlaneRecord plane;
  private Inspection inspection;

  @BeforeEach
  void open() {
    db = Database.open(dir.resolve("t.db"));
    s = Fixtures.Services.over(db);
    plane = Fixtures.plane(s);
    inspection = s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "inspector", InspectionReason.ROUTINE));
  }

  @AfterEach
  void close() {
    db.close();
  }

  private Observation record(int lift, int bay, PanelState state) {
    return s.inspections().recordObservation(inspection.id(),
        NewObservation.of(plane.id(), PanelRef.of(lift, bay), state, "M. Okafor"));
  }

  @Test
  void theLatestUncorrectedObservationOfEachPanelCountsAndCorrectionsKeepTheOldRow() {
    Observation first = record(1, 1, PanelState.SOUND);
    record(1, 1, PanelState.MISSING); // looked again later: the later one counts
    Observation wrong = record(2, 1, PanelState.MISSING);
    Observation fixed = s.inspections().correct(inspection.id(), wrong.id(),
        NewObservation.of(plane.id(), PanelRef.of(2, 1), PanelState.SOUND, "M. Okafor"),
        "brace hidden behind sheeting, it is there");
    Map<PanelRef, Observation> latest = s.inspections().latestObservations(inspection.id(), plane.id());
    assertThat(latest).containsOnlyKeys(PanelRef.of(1, 1), PanelRef.of(2, 1));
    assertThat(latest.get(PanelRef.of(1, 1)).state()).isEqualTo(PanelState.MISSING);
    assertThat(latest.get(PanelRef.of(2, 1))).isEqualTo(fixed);
    assertThat(fixed.supersedes()).isEqualTo(wrong.id());
    assertThat(s.inspections().observations(inspection.id()))
        .hasSize(4).contains(first, wrong);
    assertThatThrownBy(() -> s.inspections().correct(inspection.id(), wrong.id(),
            NewObservation.of(plane.id(), PanelRef.of(2, 1), PanelState.SOUND, "x"), "again"))
        .hasMessageContaining("already corrected by observation " + fixed.id());
  }

  @Test
  void panelsWithNoObservationAreNotInspectedInTheAsBuiltPlane() {
    record(1, 1, PanelState.SOUND);
    record(2, 1, PanelState.DAMAGED_INEFFECTIVE);
    AsBuiltPlane asBuilt = s.inspections().asBuilt(inspection.id(), plane.id());
    assertThat(asBuilt.memberAt(PanelRef.of(1, 1))).isEqualTo(Brace.rigid(Diagonal.RISING));
    assertThat(asBuilt.memberAt(PanelRef.of(2, 1))).isNull();
    assertThat(asBuilt.uninspected()).containsExactlyInAnyOrder(
        PanelRef.of(1, 2), PanelRef.of(2, 2), PanelRef.of(3, 1), PanelRef.of(3, 2));
  }

  @Test
  void aPanelOutsideThePlaneOrAPlaneOfAnotherStructureIsRefusedByName() {
    assertThatThrownBy(() -> record(4, 1, PanelState.SOUND))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("lift 4, bay 1 lies outside plane 'spine'");
    assertThat(s.inspections().observations(inspection.id())).isEmpty();
  }

  @Test
  void theDesignInForceIsTheLatestRecordedBeforeTheInspectionFinished() {
    record(1, 1, PanelState.SOUND);
    s.inspections().finalise(inspection.id());
    PlaneDesign braceEverywhere = Fixtures.threeByTwo()
        .withBrace(PanelRef.of(1, 2), Brace.rigid(Diagonal.FALLING));
    s.sites().addDesignRevision(plane.id(), "D. Fenwick", LocalDate.of(2025, 4, 1), "rev 2",
        braceEverywhere);
    assertThat(s.inspections().designInForce(inspection.id(), plane.id()).number()).isEqualTo(1);
    Inspection later = s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "", InspectionReason.AFTER_ALTERATION));
    assertThat(s.inspections().designInForce(later.id(), plane.id()).number()).isEqualTo(2);
  }

  @Test
  void theNextRoutineInspectionIsDueAnIntervalAfterTheLastFinalisedOne() {
    assertThat(s.inspections().nextInspectionDue(plane.structureId())).isEmpty();
    Inspection done = s.inspections().finalise(inspection.id());
    // the stepping clock starts 2025-03-03 08:00 UTC; the site is in Europe/London
    assertThat(done.finishedAt()).isAfter(Instant.parse("2025-03-03T08:00:00Z"));
    assertThat(s.inspections().nextInspectionDue(plane.structureId()))
        .contains(LocalDate.of(2025, 3, 10));
  }

  @Test
  void aMapFindingMakesTheAsBuiltPlaneCarryExactlyWhatWasFound() {
    Brace rising = Brace.rigid(Diagonal.RISING);
    Brace cross = Brace.rigid(Diagonal.BOTH);
    assertThat(ImportExportService.findingFor(rising, rising)).isEqualTo(PanelFinding.of(PanelState.SOUND));
    assertThat(ImportExportService.findingFor(rising, null)).isEqualTo(PanelFinding.of(PanelState.MISSING));
    assertThat(ImportExportService.findingFor(null, rising))
        .isEqualTo(new PanelFinding(PanelState.EXTRA, rising));
    assertThat(ImportExportService.findingFor(cross, rising))
        .isEqualTo(new PanelFinding(PanelState.MISSING, rising));
    assertThat(ImportExportService.findingFor(rising, Brace.rigid(Diagonal.FALLING)))
        .isEqualTo(new PanelFinding(PanelState.SOUND, Brace.rigid(Diagonal.FALLING)));
    assertThat(ImportExportService.findingFor(rising, Brace.tension(Diagonal.RISING)).state())
        .isEqualTo(PanelState.MISSING);
    assertThat(ImportExportService.findingFor(null, null)).isEqualTo(PanelFinding.of(PanelState.SOUND));
  }
}
