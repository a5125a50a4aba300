package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Map;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * On a team server the working role (the grants of {@code postgresql-working-role.sql}, as
 * README shows them) does the day's work through Bracewalk, but even with raw SQL it cannot alter
 * a finalised inspection: the triggers refuse an update, and the role has no right to delete,
 * truncate, disable a trigger, alter or drop (PostgreSQL documentation: "Privileges" and
 * "ALTER TABLE": only a table's owner may alter it or its triggers). Needs the test server.
 */
class WorkingRoleTest {
  private static final String WORKER = "bracewalk_test_worker";

  @TempDir Path dir;
  private String location;
  private long finalised;
  private long open;
  private long plane;

  @BeforeEach
  void aMigratedDatabaseWithAFinalisedInspection() throws Exception {
    location = StoreBackend.POSTGRESQL.freshLocation(dir);
    try (Database db = StoreBackend.reopen(location)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord p = Fixtures.plane(s);
      plane = p.id();
      finalised = s.inspections().start(p.structureId(),
          NewInspection.of("M. Okafor", "competent person", InspectionReason.ROUTINE)).id();
      s.inspections().recordObservation(finalised,
          NewObservation.of(plane, PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor"));
      s.inspections().finalise(finalised);
      open = s.inspections().start(p.structureId(),
          NewInspection.of("M. Okafor", "competent person", InspectionReason.ROUTINE)).id();
    }
    String grants;
    try (var in = WorkingRoleTest.class.getResourceAsStream(
        "/org/bracewalk/store/postgresql-working-role.sql")) {
      grants = new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      st.execute("DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '" + WORKER
          + "') THEN CREATE ROLE " + WORKER + " LOGIN; END IF; END $$");
      for (String line : grants.split("\n")) {
        if (!line.startsWith("--") && !line.isBlank()) {
          st.execute(line.replace(":working", WORKER).replace(";", ""));
        }
      }
    }
  }

  private static String inspectorOf(Connection c, long id) throws SQLException {
    try (Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT inspector_name FROM inspections WHERE id = " + id)) {
      r.next();
      return r.getString(1);
    }
  }

  @Test
  void theWorkingRoleCannotAlterAFinalisedInspectionEvenWithRawSql() throws Exception {
    try (Connection c = StoreBackend.connectAs(location, WORKER);
        Statement st = c.createStatement()) {
      assertThatThrownBy(() -> st.executeUpdate(
              "UPDATE inspections SET inspector_name = 'X' WHERE id = " + finalised))
          .hasMessageContaining("the inspection is finalised and cannot be changed (update it)");
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM inspections WHERE id = " + finalised))
          .hasMessageContaining("permission denied");
      assertThatThrownBy(() -> st.execute("TRUNCATE observations CASCADE"))
          .hasMessageContaining("permission denied");
      assertThatThrownBy(() -> st.execute("ALTER TABLE inspections DISABLE TRIGGER ALL"))
          .hasMessageContaining("must be owner");
      assertThatThrownBy(() -> st.execute(
              "DROP TRIGGER finalised_inspections_never_change ON inspections"))
          .hasMessageContaining("must be owner");
      assertThatThrownBy(() -> st.execute("DROP TABLE observations CASCADE"))
          .hasMessageContaining("must be owner");
      assertThatThrownBy(() -> st.executeUpdate("UPDATE observations SET state = 'missing'"))
          .hasMessageContaining("permission denied");
      assertThatThrownBy(() -> st.execute("SET session_replication_role = replica"))
          .hasMessageContaining("permission denied");
      assertThat(inspectorOf(c, finalised)).isEqualTo("M. Okafor");
    }
  }

  @Test
  void theWorkingRoleDoesTheDaysWorkThroughBracewalk() {
    try (Database db = Database.open(location, Map.of("PGUSER", WORKER))) {
      Fixtures.Services s = Fixtures.Services.over(db);
      long o = s.inspections().recordObservation(open,
          NewObservation.of(plane, PanelRef.of(2, 1), PanelState.MISSING, "M. Okafor")).id();
      s.inspections().correct(open, o,
          NewObservation.of(plane, PanelRef.of(2, 1), PanelState.SOUND, "M. Okafor"), "misread");
      s.inspections().finalise(open);
      assertThat(db.inspections().find(open).orElseThrow().status().label())
          .isEqualTo("finalised");
      assertThat(db.observations().ofInspection(open)).hasSize(2);
    }
  }

  @Test
  void theWorkingRoleSyncsAFieldFileWithNoMoreThanItsGrants() throws Exception {
    java.time.Clock clock = java.time.Clock.systemUTC();
    org.bracewalk.app.SyncService sync = new org.bracewalk.app.SyncService(clock);
    try (Database field = Database.open(dir.resolve("field.db"));
        Database server = Database.open(location, Map.of("PGUSER", WORKER))) {
      org.bracewalk.app.SyncService.Summary pulled = sync.sync(field, server);
      assertThat(pulled.conflicts()).isEmpty();
      long fieldPlane = field.identities().idOf(org.bracewalk.core.port.GlobalIdentities.Kind.PLANE,
          server.identities().uuidOf(org.bracewalk.core.port.GlobalIdentities.Kind.PLANE, plane))
          .orElseThrow();
      Fixtures.Services s = Fixtures.Services.over(field);
      long inspection = s.inspections().start(field.planes().find(fieldPlane).orElseThrow()
          .structureId(), NewInspection.of("A. Field", "inspector", InspectionReason.ROUTINE))
          .id();
      s.inspections().recordObservation(inspection,
          NewObservation.of(fieldPlane, PanelRef.of(1, 1), PanelState.MISSING, "A. Field"));
      s.inspections().finalise(inspection);
      org.bracewalk.app.SyncService.Summary pushed = sync.sync(field, server);
      assertThat(pushed.conflicts()).isEmpty();
      assertThat(pushed.pushedInspections()).isEqualTo(1);
      assertThat(sync.sync(field, server).skippedInspections()).isEqualTo(1);
    }
  }
}
