package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.LocalDate;
import java.util.Map;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Starting an inspection fixes its scope, in the same transaction as the inspection. */
class InspectionScopeTest {
  @TempDir Path dir;

  private static long count(Path file, String sql) throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery(sql)) {
      r.next();
      return r.getLong(1);
    }
  }

  @Test
  void startFixesThePlanesNotRetiredEachWithItsLatestRevision() {
    try (Database db = Database.open(dir.resolve("a.db"))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord spine = Fixtures.plane(s);
      long structure = spine.structureId();
      DesignRevision second = s.sites().addDesignRevision(spine.id(), "D. Fenwick",
          LocalDate.of(2025, 2, 2), "", Fixtures.threeByTwo());
      PlaneRecord gone = s.sites().createPlane(
          new PlaneRecord(0, structure, "gone", spine.grid()), "", LocalDate.of(2025, 2, 1), "",
          Fixtures.threeByTwo());
      s.sites().retirePlane(gone.id(), "", "dismantled");
      Inspection i = s.inspections().start(structure,
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      assertThat(db.planes().scopeOf(i.id())).isEqualTo(Map.of(spine.id(), second.id()));

      // revised and added later: the inspection keeps its own, and a mark on the new plane is
      // refused naming it
      s.sites().addDesignRevision(spine.id(), "D. Fenwick", LocalDate.of(2025, 2, 3), "",
          Fixtures.threeByTwo());
      PlaneRecord later = s.sites().createPlane(
          new PlaneRecord(0, structure, "later", spine.grid()), "", LocalDate.of(2025, 2, 1), "",
          Fixtures.threeByTwo());
      assertThat(s.inspections().designInForce(i.id(), spine.id()).number()).isEqualTo(2);
      assertThat(s.inspections().planesOf(i.id())).containsExactly(spine);
      assertThatThrownBy(() -> s.inspections().recordObservation(i.id(),
          NewObservation.of(later.id(), PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor")))
          .isInstanceOf(UserInputException.class)
          .hasMessageContaining("plane 'later' (id " + later.id() + ") is not part of inspection "
              + i.id());
      assertThatThrownBy(() -> s.inspections().designInForce(i.id(), later.id()))
          .isInstanceOf(UserInputException.class).hasMessageContaining("'later'");
    }
  }

  @Test
  void anInspectionWhoseScopeCannotBeWrittenIsNotStarted() throws Exception {
    Path file = dir.resolve("b.db");
    long structure;
    try (Database db = Database.open(file)) {
      structure = Fixtures.plane(Fixtures.Services.over(db)).structureId();
    }
    // a write that fails part-way, as a full disk would: the scope row is refused
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      st.executeUpdate("CREATE TRIGGER test_scope_write_fails BEFORE INSERT ON inspection_scope"
          + " BEGIN SELECT RAISE(ABORT, 'disk full (simulated)'); END");
    }
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      assertThatThrownBy(() -> s.inspections().start(structure,
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)))
          .hasMessageContaining("disk full (simulated)");
    }
    assertThat(count(file, "SELECT count(*) FROM inspections")).isZero();
  }
}
