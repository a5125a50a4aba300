package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.port.StoreException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Migration V6 holds whatever program writes to the file: no plane larger than the limit, a
 * retirement never changed, removed or replaced, no observation into a plane retired before its
 * inspection started.
 */
class PlaneLimitsAndRetirementsSqlTest {
  @TempDir Path dir;

  private static long count(Statement st, String sql) throws Exception {
    try (ResultSet r = st.executeQuery(sql)) {
      r.next();
      return r.getLong(1);
    }
  }

  @Test
  void rawSqlCannotStoreAPlaneLargerThanTheProgramsLimit() throws Exception {
    Path file = dir.resolve("b.db");
    long structure;
    try (Database db = Database.open(file)) {
      structure = Fixtures.plane(Fixtures.Services.over(db)).structureId();
    }
    String insert = "INSERT INTO planes (structure_id, name, lifts, bays, support) VALUES ("
        + structure + ", '%s', %d, %d, 'free')";
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      // the trigger's numbers are the program's constant: the limit itself goes in, one more not
      st.executeUpdate(insert.formatted("largest", PlaneLimits.MAX_LIFTS, PlaneLimits.MAX_BAYS));
      assertThatThrownBy(() -> st.executeUpdate(
          insert.formatted("taller", PlaneLimits.MAX_LIFTS + 1, 1)))
          .hasMessageContaining("larger than the limit of 100 lifts x 500 bays");
      assertThatThrownBy(() -> st.executeUpdate(
          insert.formatted("longer", 1, PlaneLimits.MAX_BAYS + 1)))
          .hasMessageContaining("larger than the limit of 100 lifts x 500 bays");
      assertThatThrownBy(() -> st.executeUpdate(insert.formatted("typo", 100000, 100000)))
          .hasMessageContaining("larger than the limit");
      assertThat(count(st, "SELECT count(*) FROM planes")).isEqualTo(2);
    }
  }

  @Test
  void aRetirementCannotBeUndoneChangedOrReplacedEvenBySql() throws Exception {
    Path file = dir.resolve("b.db");
    long planeId;
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      planeId = Fixtures.plane(s).id();
      s.sites().retirePlane(planeId, "M. Okafor", "created by mistake");
      assertThatThrownBy(() -> db.planes().retire(new PlaneRetirement(planeId,
          Instant.parse("2030-01-01T00:00:00Z"), "", "again")))
          .isInstanceOf(StoreException.class).hasMessageContaining("plane " + planeId + " is already retired");
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM plane_retirements"))
          .hasMessageContaining("cannot be deleted");
      assertThatThrownBy(() -> st.executeUpdate(
          "UPDATE plane_retirements SET retired_at = '2099-01-01T00:00:00.000Z'"))
          .hasMessageContaining("cannot be changed");
      assertThatThrownBy(() -> st.executeUpdate("INSERT OR REPLACE INTO plane_retirements"
          + " (plane_id, retired_at, reason) VALUES (" + planeId + ", '2099-01-01T00:00:00.000Z', 'x')"))
          .hasMessageContaining("already retired");
      assertThatThrownBy(() -> st.executeUpdate("REPLACE INTO plane_retirements"
          + " (plane_id, retired_at, reason) VALUES (" + planeId + ", '2099-01-01T00:00:00.000Z', 'x')"))
          .hasMessageContaining("already retired");
      assertThat(count(st, "SELECT count(*) FROM plane_retirements WHERE reason = 'created by mistake'"))
          .isEqualTo(1);
    }
  }

  @Test
  void aRetirementNeedsAReasonEvenBySql() throws Exception {
    Path file = dir.resolve("b.db");
    long planeId;
    try (Database db = Database.open(file)) {
      planeId = Fixtures.plane(Fixtures.Services.over(db)).id();
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO plane_retirements"
          + " (plane_id, retired_at, reason) VALUES (" + planeId + ", '2025-03-03T08:00:00.000Z', '  ')"))
          .hasMessageContaining("CHECK");
    }
  }

  @Test
  void anObservationIntoAPlaneRetiredBeforeItsInspectionStartedIsRefusedBySqlAndByTheStore()
      throws Exception {
    Path file = dir.resolve("b.db");
    long planeId;
    long before;
    long after;
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      planeId = plane.id();
      before = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      s.sites().retirePlane(planeId, "", "dismantled");
      Inspection later = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE));
      after = later.id();
      assertThat(db.planes().ofInspection(before)).containsExactly(plane);
      assertThat(db.planes().ofInspection(after)).isEmpty();
      // the inspection that started before keeps the plane and takes observations on it
      s.inspections().recordObservation(before,
          NewObservation.of(planeId, PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor"));
      // past the service, the store's trigger still refuses, and the message names both
      assertThatThrownBy(() -> db.observations().add(new Observation(0, after, planeId,
          PanelRef.of(1, 1), PanelState.SOUND, null, null, null, null, "", s.clock().instant(),
          "M. Okafor", null, "")))
          .isInstanceOf(StoreException.class)
          .hasMessageContaining("plane " + planeId + " was retired before inspection " + after);
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      String insert = "INSERT INTO observations (inspection_id, plane_id, lift, bay, state,"
          + " recorded_at) VALUES (%d, " + planeId + ", 1, 2, 'sound', '2030-01-01T00:00:00.000Z')";
      assertThatThrownBy(() -> st.executeUpdate(insert.formatted(after)))
          .hasMessageContaining("the plane was retired before the inspection started");
      st.executeUpdate(insert.formatted(before));
    }
  }

  @Test
  void debiansSqliteShellRunsMigrationV6AndItsTriggersHold() throws Exception {
    // the file must open in SQLite 3.31 and later (DEVELOPERS.md); Debian 12 ships 3.40, which
    // cannot parse an expression in RAISE: V6 has literal messages only. V6 runs here over just
    // the columns it uses, so the check does not depend on the older migrations.
    Path shell = Path.of("/usr/bin/sqlite3");
    assumeTrue(Files.isExecutable(shell), "no sqlite3 shell at /usr/bin/sqlite3");
    String v6 = Files.readString(Path.of("db-migrations/V6__plane_limits_and_retirements.sql"));
    String script = """
        CREATE TABLE planes (id INTEGER PRIMARY KEY, structure_id INTEGER, name TEXT,
          lifts INTEGER, bays INTEGER, support TEXT);
        CREATE TABLE inspections (id INTEGER PRIMARY KEY, started_at TEXT);
        CREATE TABLE observations (id INTEGER PRIMARY KEY, inspection_id INTEGER,
          plane_id INTEGER);
        """ + v6 + """
        INSERT INTO planes (structure_id, name, lifts, bays, support) VALUES (1, 'a', 100, 500, 'free');
        INSERT INTO inspections (started_at) VALUES ('2025-03-04T00:00:00.000Z');
        INSERT INTO plane_retirements (plane_id, retired_at, reason)
          VALUES (1, '2025-03-03T00:00:00.000Z', 'created by mistake');
        SELECT 'stored ' || count(*) FROM planes;
        """;
    Path db = dir.resolve("shell.db");
    assertThat(shell(shell, db, script)).isEqualTo("stored 1");
    assertThat(shell(shell, db, "INSERT INTO planes (structure_id, name, lifts, bays, support)"
        + " VALUES (1, 'typo', 100000, 100000, 'free');"))
        .contains("larger than the limit of 100 lifts x 500 bays");
    assertThat(shell(shell, db, "DELETE FROM plane_retirements;")).contains("cannot be deleted");
    assertThat(shell(shell, db, "UPDATE plane_retirements SET reason = 'x';"))
        .contains("cannot be changed");
    assertThat(shell(shell, db, "INSERT OR REPLACE INTO plane_retirements (plane_id, retired_at,"
        + " reason) VALUES (1, '2025-03-05T00:00:00.000Z', 'x');")).contains("already retired");
    assertThat(shell(shell, db, "INSERT INTO observations (inspection_id, plane_id) VALUES (1, 1);"))
        .contains("the plane was retired before the inspection started");
  }

  private static String shell(Path shell, Path db, String sql) throws Exception {
    Process p = new ProcessBuilder(shell.toString(), db.toString())
        .redirectErrorStream(true).start();
    p.getOutputStream().write(sql.getBytes(StandardCharsets.UTF_8));
    p.getOutputStream().close();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
    p.waitFor();
    return out;
  }
}
