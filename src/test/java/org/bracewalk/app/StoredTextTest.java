package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.ZoneId;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Typed text is trimmed once, before it is stored; what is stored comes back as stored. */
class StoredTextTest {
  @TempDir Path dir;

  @Test
  void blanksAtTheEndsGoAndALineBreakInsideStays() {
    assertThat(StoredText.clean("  4 Quarry Lane\nEastmere \n", "client address"))
        .isEqualTo("4 Quarry Lane\nEastmere");
    assertThat(StoredText.clean(null, "note")).isEmpty();
  }

  @Test
  void aControlCharacterIsRefusedNamingTheField() {
    assertThatThrownBy(() -> StoredText.clean("dent\tnear node", "note"))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("note").hasMessageContaining("position 5");
  }

  @Test
  void theServicesStoreTrimmedTextAndTheStoreGivesItBackUntouched() {
    try (Database db = Database.open(dir.resolve("b.db"))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      Site site = s.sites().createSite(new Site(0, " Depot ", "", " 4 Quarry Lane ", "",
          ZoneId.of("UTC"), DisplayUnits.METRIC));
      assertThat(db.sites().find(site.id()).orElseThrow().clientAddress())
          .isEqualTo("4 Quarry Lane");
      PlaneRecord plane = Fixtures.plane(s);
      long inspection = s.inspections().start(plane.structureId(),
          NewInspection.of(" M. Okafor ", "", InspectionReason.ROUTINE)).id();
      Observation o = s.inspections().recordObservation(inspection,
          new NewObservation(plane.id(), PanelRef.of(1, 1), PanelState.SOUND, null, null, null,
              null, " looks fine  ", "M. Okafor"));
      assertThat(db.observations().find(o.id()).orElseThrow().note()).isEqualTo("looks fine");
      assertThat(db.inspections().find(inspection).orElseThrow().inspectorName())
          .isEqualTo("M. Okafor");
      assertThatThrownBy(() -> s.inspections().recordObservation(inspection,
              new NewObservation(plane.id(), PanelRef.of(1, 2), PanelState.SOUND, null, null,
                  null, null, "bell\u0007", "M. Okafor")))
          .isInstanceOf(UserInputException.class).hasMessageContaining("note");
      assertThat(db.observations().ofInspection(inspection)).hasSize(1);
    }
  }
}
