package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import org.bracewalk.core.model.Structure;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file made before V3 is brought up to it with its finalised inspections as they were. */
class MigrationToLiteralTriggersTest {
  @TempDir Path dir;

  private static String one(Statement st, String sql) throws Exception {
    try (ResultSet r = st.executeQuery(sql)) {
      r.next();
      return r.getString(1);
    }
  }

  @Test
  void aV2FileKeepsItsFinalisedInspectionsIntervalAndItsDesignsPanelsAreSealed() throws Exception {
    Path file = dir.resolve("v2.db");
    OlderFiles.migratedTo(file, "2");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      st.executeUpdate("INSERT INTO sites (id, name, time_zone, display_units)"
          + " VALUES (1, 'Depot', 'UTC', 'metric')");
      st.executeUpdate("INSERT INTO structures (id, site_id, name, kind, inspection_interval_days)"
          + " VALUES (1, 1, 'Run A', 'racking-run', 5)");
      st.executeUpdate("INSERT INTO planes (id, structure_id, name, lifts, bays, support)"
          + " VALUES (1, 1, 'spine', 1, 2, 'pinned-base')");
      st.executeUpdate("INSERT INTO design_revisions (id, plane_id, number, design_date,"
          + " recorded_at) VALUES (1, 1, 1, '2025-01-01', '2025-01-01T00:00:00.000Z')");
      st.executeUpdate("INSERT INTO design_panels (revision_id, lift, bay, diagonal, member_kind,"
          + " opening) VALUES (1, 1, 1, '/', 'rigid', 0)");
      st.executeUpdate("INSERT INTO inspections (id, structure_id, started_at, finished_at,"
          + " inspector_name, reason, status) VALUES (1, 1, '2025-02-01T08:00:00.000Z',"
          + " '2025-02-01T09:00:00.000Z', 'M. Okafor', 'routine', 'finalised')");
      st.executeUpdate("INSERT INTO inspections (id, structure_id, started_at, inspector_name,"
          + " reason) VALUES (2, 1, '2025-02-08T08:00:00.000Z', 'M. Okafor', 'routine')");
    }
    try (Database db = Database.open(file)) {
      assertThat(db.structures().asOfInspection(1).map(Structure::inspectionIntervalDays))
          .contains(5);
      db.structures().setInspectionInterval(1, 14);
      // the finalised one keeps 5 (what its reports showed); the open one sees the structure now
      assertThat(db.structures().asOfInspection(1).map(Structure::inspectionIntervalDays))
          .contains(5);
      assertThat(db.structures().asOfInspection(2).map(Structure::inspectionIntervalDays))
          .contains(14);
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      assertThat(one(st, "SELECT inspection_interval_days FROM inspections WHERE id = 1"))
          .isEqualTo("5");
      assertThat(one(st, "SELECT inspection_interval_days FROM inspections WHERE id = 2"))
          .isNull();
      assertThat(one(st, "SELECT panel_count FROM design_revisions WHERE id = 1")).isEqualTo("1");
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO design_panels (revision_id, lift,"
          + " bay, diagonal, member_kind, opening) VALUES (1, 1, 2, 'X', 'rigid', 0)"))
          .hasMessageContaining("already has all its panels");
    }
  }
}
