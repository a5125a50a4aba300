package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.LocalDate;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RepairServiceTest {
  @TempDir Path dir;

  @Test
  void anActionIsVerifiedOnlyByALaterFinalisedInspectionOfTheSameStructure() {
    try (Database db = Database.open(dir.resolve("r.db"))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      RepairService repairs = new RepairService(db, s.clock());
      PlaneRecord plane = Fixtures.plane(s);
      Inspection found = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.AFTER_IMPACT));
      s.inspections().finalise(found.id());
      RepairOrder order = repairs.raise(found.id(), "M. Okafor", "frame hit");
      RepairAction action = repairs.addAction(order.id(), plane.id(), PanelRef.of(2, 1),
          RepairActionKind.REPLACE, Brace.rigid(Diagonal.RISING), "new brace",
          LocalDate.of(2025, 3, 7), "crew B");
      assertThatThrownBy(() -> repairs.addAction(order.id(), plane.id(), PanelRef.of(9, 1),
              RepairActionKind.BRACE, null, "", null, ""))
          .hasMessageContaining("lift 9, bay 1 lies outside plane 'spine'");
      Inspection check = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.AFTER_ALTERATION));
      assertThatThrownBy(() -> repairs.markVerified(action.id(), check.id()))
          .hasMessageContaining("still open");
      RepairAction done = repairs.markDone(action.id(), "crew B");
      assertThat(done.isDone()).isTrue();
      s.inspections().finalise(check.id());
      assertThat(repairs.markVerified(action.id(), check.id()).verifiedByInspectionId())
          .isEqualTo(check.id());
      assertThat(repairs.actions(order.id())).hasSize(1);
      assertThat(repairs.orders(found.id())).containsExactly(order);
    }
  }

  @Test
  void anActionOnAPlaneTheInspectionDoesNotCoverIsRefused() {
    try (Database db = Database.open(dir.resolve("scope.db"))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      RepairService repairs = new RepairService(db, s.clock());
      PlaneRecord spine = Fixtures.plane(s);
      Inspection found = s.inspections().start(spine.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      // a plane added after the inspection started is not part of it (its scope is fixed)
      PlaneRecord later = s.sites().createPlane(
          new PlaneRecord(0, spine.structureId(), "west return", spine.grid()),
          "D. Fenwick", LocalDate.of(2025, 3, 9), "", org.bracewalk.core.model.PlaneDesign.of(
              spine.grid(), java.util.Map.of()));
      RepairOrder order = repairs.raise(found.id(), "M. Okafor", "walk-round");
      assertThatThrownBy(() -> repairs.addAction(order.id(), later.id(), PanelRef.of(1, 1),
              RepairActionKind.BRACE, Brace.rigid(Diagonal.RISING), "", null, ""))
          .isInstanceOf(UserInputException.class)
          .hasMessageContaining("plane 'west return' (id " + later.id() + ") is not part of"
              + " inspection " + found.id());
      assertThat(repairs.actions(order.id())).isEmpty();
      // a plane it covers takes the action
      assertThat(repairs.addAction(order.id(), spine.id(), PanelRef.of(1, 1),
          RepairActionKind.BRACE, Brace.rigid(Diagonal.RISING), "", null, "").planeId())
          .isEqualTo(spine.id());
    }
  }
}
