package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Migration V9 (frame members) for any SQLite client: observations of frame members are as
 * append-only as those of diagonals and stay out of finalised inspections; a design revision's
 * frame members left out never change; values are checked by the schema. And a file of V8 keeps
 * every record, id and guard through the rebuild of observations, photos and sources. The
 * tests with a {@link StoreBackend} run against both stores (on PostgreSQL, V9 changes the
 * columns in place).
 */
class FrameMemberSqlTest {
  private static final String AT = "'2025-03-03T09:00:00.000Z'";

  @TempDir Path dir;

  /** Runs each statement over plain JDBC, on either store (foreign keys on in a file). */
  private static void run(String location, String... sql) throws SQLException {
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      for (String s : sql) {
        st.executeUpdate(s);
      }
    }
  }

  /**
   * As {@link #refused(Path, String, String)}, on either store; {@code because} is matched
   * ignoring case (SQLite says "CHECK constraint failed", PostgreSQL "violates check
   * constraint").
   */
  private static void refused(String location, String sql, String because) throws SQLException {
    String before = everything(location);
    assertThatThrownBy(() -> run(location, sql)).as(sql).isInstanceOf(SQLException.class)
        .satisfies(e -> assertThat(e.getMessage()).containsIgnoringCase(because));
    assertThat(everything(location)).as("nothing changed by " + sql).isEqualTo(before);
  }

  /**
   * A dump without the global identities V12 gives every row of an older database (each random;
   * {@code GlobalIdentitiesTest} checks them), so a migration test compares the rest as before.
   */
  static String withoutUuids(String dump) {
    return dump.replaceAll("uuid=[0-9a-f-]{36}\\|", "");
  }

  /** Every row of every table of either store, as text. */
  static String everything(String location) throws SQLException {
    if (!ServerAddress.isServer(location)) {
      return everything(Path.of(location));
    }
    StringBuilder out = new StringBuilder();
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement()) {
      for (String t : StoreBackend.tables(c, location)) {
        if (t.equals("flyway_schema_history")) {
          continue;
        }
        out.append('[').append(t).append("]\n");
        try (ResultSet r = st.executeQuery("SELECT * FROM " + t + " ORDER BY 1, 2, 3")) {
          ResultSetMetaData m = r.getMetaData();
          while (r.next()) {
            for (int i = 1; i <= m.getColumnCount(); i++) {
              Object v = r.getObject(i);
              out.append(m.getColumnName(i)).append('=')
                  .append(v instanceof byte[] b ? Arrays.toString(b) : String.valueOf(v))
                  .append('|');
            }
            out.append('\n');
          }
        }
      }
    }
    return out.toString();
  }

  /** Runs each statement over plain JDBC with foreign keys on. */
  private static void run(Path file, String... sql) throws SQLException {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      st.execute("PRAGMA foreign_keys = ON");
      for (String s : sql) {
        st.executeUpdate(s);
      }
    }
  }

  private static void refused(Path file, String sql, String because) throws SQLException {
    String before = everything(file);
    assertThatThrownBy(() -> run(file, sql)).as(sql)
        .isInstanceOf(SQLException.class).hasMessageContaining(because);
    assertThat(everything(file)).as("nothing changed by " + sql).isEqualTo(before);
  }

  /** Every row of every table, as text, and every index and trigger by name. */
  static String everything(Path file) throws SQLException {
    StringBuilder out = new StringBuilder();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      List<String> tables = new ArrayList<>();
      try (ResultSet r = st.executeQuery("SELECT name FROM sqlite_master WHERE type = 'table'"
          + " AND name NOT LIKE 'sqlite_%' AND name <> 'flyway_schema_history' ORDER BY name")) {
        while (r.next()) {
          tables.add(r.getString(1));
        }
      }
      for (String t : tables) {
        out.append('[').append(t).append("]\n");
        try (ResultSet r = st.executeQuery("SELECT * FROM " + t + " ORDER BY 1, 2, 3")) {
          ResultSetMetaData m = r.getMetaData();
          while (r.next()) {
            for (int i = 1; i <= m.getColumnCount(); i++) {
              Object v = r.getObject(i);
              out.append(m.getColumnName(i)).append('=')
                  .append(v instanceof byte[] b ? Arrays.toString(b) : String.valueOf(v))
                  .append('|');
            }
            out.append('\n');
          }
        }
      }
    }
    return out.toString();
  }

  private static List<String> names(Path file, String type) throws SQLException {
    List<String> out = new ArrayList<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT name FROM sqlite_master WHERE type = '" + type
            + "' AND name NOT LIKE 'sqlite_%' ORDER BY name")) {
      while (r.next()) {
        out.add(r.getString(1));
      }
    }
    return out;
  }

  private static String frameObservation(long inspection, long plane, String type, int first,
      int second, String state) {
    return "INSERT INTO observations (inspection_id, plane_id, frame_type, frame_first,"
        + " frame_second, state, recorded_at) VALUES (" + inspection + ", " + plane + ", '" + type
        + "', " + first + ", " + second + ", '" + state + "', " + AT + ")";
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void frameObservationsAreAppendOnlyAndCheckedByTheSchema(StoreBackend backend)
      throws Exception {
    String file = backend.freshLocation(dir);
    boolean sqlite = backend == StoreBackend.SQLITE;
    long plane;
    long open;
    long finalised;
    long kept;
    long revision;
    try (Database db = StoreBackend.reopen(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord p = Fixtures.plane(s); // 3 lifts x 2 bays
      plane = p.id();
      revision = db.designs().latest(plane).orElseThrow().id();
      finalised = s.inspections().start(p.structureId(),
          NewInspection.of("M. Okafor", "inspector", InspectionReason.ROUTINE)).id();
      kept = s.inspections().recordObservation(finalised, NewObservation.ofMember(plane,
          FrameRef.ledger(0, 1), PanelState.MISSING, "M. Okafor")).id();
      s.inspections().finalise(finalised);
      open = s.inspections().start(p.structureId(),
          NewInspection.of("M. Okafor", "inspector", InspectionReason.ROUTINE)).id();
      s.inspections().recordObservation(open, NewObservation.ofMember(plane,
          FrameRef.standard(1, 0), PanelState.SOUND, "M. Okafor"));
    }
    refused(file, "UPDATE observations SET state = 'sound' WHERE id = " + kept,
        "observations are append-only");
    refused(file, "UPDATE observations SET frame_first = 1 WHERE id = " + kept,
        "observations are append-only");
    refused(file, "DELETE FROM observations WHERE id = " + kept, "observations are append-only");
    // PostgreSQL has no replace: there a plain insert over the taken id
    refused(file, (sqlite ? "INSERT OR REPLACE" : "INSERT")
        + " INTO observations (id, inspection_id, plane_id, frame_type,"
        + " frame_first, frame_second, state, recorded_at) VALUES (" + kept + ", " + open + ", "
        + plane + ", 'ledger', 0, 1, 'sound', " + AT + ")", "records are never overwritten");
    refused(file, frameObservation(finalised, plane, "ledger", 0, 2, "missing"),
        "the inspection is finalised");
    refused(file, "INSERT INTO photos (observation_id, file_name, media_type, data, attached_at)"
        + " VALUES (" + kept + ", 'a.jpg', 'image/jpeg', " + (sqlite ? "x'ff'" : "'\\xff'::bytea")
        + ", " + AT + ")",
        "the inspection is finalised");
    // inside the plane: levels 0..3 and bays 1..2 for a ledger, lifts 1..3 and lines 0..2 for a
    // standard
    refused(file, frameObservation(open, plane, "ledger", 4, 1, "missing"),
        "the frame member lies outside the plane");
    refused(file, frameObservation(open, plane, "standard", 1, 3, "missing"),
        "the frame member lies outside the plane");
    refused(file, frameObservation(open, plane, "ledger", 0, 0, "missing"), "CHECK constraint");
    refused(file, frameObservation(open, plane, "standard", 0, 1, "missing"), "CHECK constraint");
    refused(file, frameObservation(open, plane, "brace", 1, 1, "missing"), "CHECK constraint");
    // a panel or a frame member, never both nor neither; no diagonal named on a frame member
    refused(file, "INSERT INTO observations (inspection_id, plane_id, lift, bay, frame_type,"
        + " frame_first, frame_second, state, recorded_at) VALUES (" + open + ", " + plane
        + ", 1, 1, 'ledger', 0, 1, 'sound', " + AT + ")", "CHECK constraint");
    refused(file, "INSERT INTO observations (inspection_id, plane_id, state, recorded_at) VALUES ("
        + open + ", " + plane + ", 'sound', " + AT + ")", "CHECK constraint");
    refused(file, "INSERT INTO observations (inspection_id, plane_id, frame_type, frame_first,"
        + " frame_second, state, member_diagonal, member_kind, recorded_at) VALUES (" + open
        + ", " + plane + ", 'ledger', 0, 1, 'sound', '/', 'rigid', " + AT + ")",
        "CHECK constraint");
    // extra only where the design in the inspection's scope leaves the member out
    refused(file, frameObservation(open, plane, "ledger", 1, 1, "extra"),
        "the frame member is in the design and cannot be recorded as extra");
    // a revision's frame members left out: complete once stored, never changed
    refused(file, "INSERT INTO design_frame_omissions VALUES (" + revision + ", 'ledger', 1, 1)",
        "already has all its frame members left out");
    run(file, frameObservation(open, plane, "ledger", 3, 2, "missing"));
  }

  @ParameterizedTest
  @EnumSource(StoreBackend.class)
  void aRevisionsFrameMembersLeftOutNeverChange(StoreBackend backend) throws Exception {
    String file = backend.freshLocation(dir);
    long revision;
    try (Database db = StoreBackend.reopen(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord p = Fixtures.plane(s);
      revision = s.sites().addDesignRevision(p.id(), "D. Fenwick",
          java.time.LocalDate.of(2025, 3, 1), "",
          Fixtures.threeByTwo().withOmittedFrame(Set.of(FrameRef.ledger(2, 1)))).id();
    }
    refused(file, "UPDATE design_frame_omissions SET frame_first = 1", "add a new revision");
    refused(file, "DELETE FROM design_frame_omissions", "add a new revision");
    refused(file, (backend == StoreBackend.SQLITE ? "INSERT OR REPLACE" : "INSERT")
        + " INTO design_frame_omissions VALUES (" + revision
        + ", 'ledger', 2, 1)", "add a new revision");
    refused(file, "UPDATE design_revisions SET omitted_frame_count = 2 WHERE id = " + revision,
        "add a new revision");
  }

  /** A file of V8 with a finalised inspection (observation, correction, photo, CSV source). */
  private static final String[] V8_RECORDS =
      OldFileRows.oneFrameInspected(
          "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, member_diagonal,"
              + " member_kind, bow_tenth_mm, gauge_length_mm, defect, note, recorded_at, recorded_by)"
              + " VALUES (7, 1, 1, 1, 1, 'damaged-effective', NULL, NULL, 35, 1000, 'bent', 'dent',"
              + " '2025-02-01T08:10:00.000Z', 'M. Okafor')",
          "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, member_diagonal,"
              + " member_kind, recorded_at, supersedes_id, correction_reason) VALUES (9, 1, 1, 2, 1,"
              + " 'extra', 'X', 'tension-only', '2025-02-01T08:11:00.000Z', NULL, '')",
          "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, recorded_at,"
              + " supersedes_id, correction_reason) VALUES (12, 1, 1, 1, 1, 'missing',"
              + " '2025-02-01T08:12:00.000Z', 7, 'looked again')",
          "INSERT INTO photos (id, observation_id, file_name, media_type, data, attached_at)"
              + " VALUES (5, 12, 'dent.jpg', 'image/jpeg', x'ffd8ff00', '2025-02-01T08:12:00.000Z')",
          "INSERT INTO observation_sources VALUES (1, '" + "c".repeat(64) + "', 3, 9)",
          "UPDATE inspections SET status = 'finalised', finished_at = '2025-02-01T09:00:00.000Z',"
              + " inspection_interval_days = 7 WHERE id = 1",
          "INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at, kind,"
              + " records_fingerprint, origin) VALUES (1, 'i1.pdf', '" + "a".repeat(64) + "',"
              + " '2025-02-03T00:00:00.000Z', 'inspection-report', '" + "b".repeat(64) + "', 'issued')");

  @Test
  void aV8FileKeepsEveryRecordIdAndGuardThroughTheRebuild() throws Exception {
    Path file = OlderFiles.migratedTo(dir.resolve("v8.db"), "8");
    run(file, V8_RECORDS);
    List<String> triggersBefore = names(file, "trigger");
    List<String> indexesBefore = names(file, "index");
    String before = everything(file);

    try (Database db = Database.open(file)) {
      assertThat(db.observations().ofInspection(1)).extracting(o -> o.id())
          .containsExactly(7L, 9L, 12L);
      assertThat(db.observations().photosOf(12)).extracting(ph -> ph.id()).containsExactly(5L);
      assertThat(db.observations().recordedFrom(1, "c".repeat(64))).containsEntry(3, 9L);
      assertThat(db.designs().find(1).orElseThrow().design().frameComplete()).isTrue();
    }

    // every row as it was, the new columns empty; the same indexes and triggers, and the new ones
    String after = withoutUuids(everything(file));
    String expected = before
        .replace("correction_reason=|\n", "correction_reason=|frame_type=null|frame_first=null|"
            + "frame_second=null|\n")
        .replace("correction_reason=looked again|\n", "correction_reason=looked again|"
            + "frame_type=null|frame_first=null|frame_second=null|\n")
        .replace("panel_count=2|\n", "panel_count=2|omitted_frame_count=0|\n")
        .replace("[design_panels]", "[design_frame_omissions]\n[design_panels]")
        // V11: a site stored before jurisdictions were recorded is "other"
        .replace("display_units=metric|\n", "display_units=metric|jurisdiction=other|\n");
    assertThat(after).isEqualTo(expected);
    assertThat(names(file, "index")).containsAll(indexesBefore);
    assertThat(names(file, "trigger")).containsAll(triggersBefore).contains(
        "observations_frame_member_inside_the_plane",
        "observations_extra_frame_member_left_out_by_the_design",
        "design_frame_omissions_only_while_stored");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      try (ResultSet r = st.executeQuery("PRAGMA foreign_key_check")) {
        assertThat(r.next()).as("no dangling reference").isFalse();
      }
      try (ResultSet r = st.executeQuery("PRAGMA integrity_check")) {
        r.next();
        assertThat(r.getString(1)).isEqualTo("ok");
      }
      // the photos and sources point at the rebuilt observations table
      try (ResultSet r = st.executeQuery("SELECT sql FROM sqlite_master WHERE name IN"
          + " ('photos', 'observation_sources', 'observations')")) {
        while (r.next()) {
          assertThat(r.getString(1)).doesNotContain("_v9");
        }
      }
    }
    // the guards hold on the migrated file as before
    refused(file, "DELETE FROM photos WHERE id = 5", "photos are kept as taken");
    refused(file, "UPDATE observations SET note = 'x' WHERE id = 7",
        "observations are append-only");
    refused(file, frameObservation(1, 1, "ledger", 0, 1, "missing"),
        "the inspection is finalised");
  }

  /**
   * The same upgrade on a server: a database of V8 keeps every row and id through V9, which on
   * PostgreSQL changes the observations' columns in place (no rebuild), and the guards hold.
   */
  @Test
  void aV8ServerDatabaseKeepsEveryRecordAndGuardThroughV9() throws Exception {
    String location = StoreBackend.blankServerDatabase();
    ServerAddress server = ServerAddress.parse(location, StoreBackend.env());
    org.flywaydb.core.Flyway.configure(Database.class.getClassLoader())
        .dataSource(Database.serverDataSource(server, StoreBackend.env()))
        .locations(Dialect.POSTGRESQL.migrations()).target("8").load().migrate();
    for (String sql : V8_RECORDS) {
      run(location, sql.replace("x'ffd8ff00'", "'\\xffd8ff00'::bytea"));
    }
    String before = everything(location);
    try (Database db = StoreBackend.reopen(location)) {
      assertThat(db.observations().ofInspection(1)).extracting(o -> o.id())
          .containsExactly(7L, 9L, 12L);
      assertThat(db.observations().photosOf(12)).extracting(ph -> ph.id()).containsExactly(5L);
      assertThat(db.observations().recordedFrom(1, "c".repeat(64))).containsEntry(3, 9L);
      assertThat(db.designs().find(1).orElseThrow().design().frameComplete()).isTrue();
    }
    String expected = before
        .replace("correction_reason=|\n", "correction_reason=|frame_type=null|frame_first=null|"
            + "frame_second=null|\n")
        .replace("correction_reason=looked again|\n", "correction_reason=looked again|"
            + "frame_type=null|frame_first=null|frame_second=null|\n")
        .replace("panel_count=2|\n", "panel_count=2|omitted_frame_count=0|\n")
        .replace("[design_panels]", "[design_frame_omissions]\n[design_panels]")
        // V11: a site stored before jurisdictions were recorded is "other"
        .replace("display_units=metric|\n", "display_units=metric|jurisdiction=other|\n");
    assertThat(withoutUuids(everything(location))).isEqualTo(expected);
    refused(location, "DELETE FROM photos WHERE id = 5", "photos are kept as taken");
    refused(location, "UPDATE observations SET note = 'x' WHERE id = 7",
        "observations are append-only");
    refused(location, frameObservation(1, 1, "ledger", 0, 1, "missing"),
        "the inspection is finalised");
    // V1's check that an extra names a diagonal gave way to V9's, which allows a frame member
    List<String> extraChecks = new ArrayList<>();
    try (Connection c = StoreBackend.connect(location); Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT pg_get_constraintdef(oid) FROM pg_constraint"
            + " WHERE conrelid = 'observations'::regclass AND contype = 'c'"
            + " AND pg_get_constraintdef(oid) LIKE '%<> ''extra''%'")) {
      while (r.next()) {
        extraChecks.add(r.getString(1));
      }
    }
    assertThat(extraChecks).singleElement().asString().contains("frame_type IS NOT NULL");
  }
}
