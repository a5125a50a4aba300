package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
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
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.RepairService;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.port.StoreException;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.Parameter;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Plain SQL, from any client, cannot change what a finalised inspection rests on: no update or
 * delete, and no replace-style overwrite (INSERT OR REPLACE, REPLACE INTO, an upsert, UPDATE OR
 * REPLACE), which deletes the row it collides with without firing delete triggers (SQLite
 * documentation, "ON CONFLICT clause": "the delete triggers fire if and only if recursive
 * triggers are enabled"). And the file opens in the sqlite3 command line of SQLite 3.40.
 *
 * <p>Run against both stores ({@link StoreBackend}): on PostgreSQL the same rules are the
 * server's PL/pgSQL triggers, with the same messages. PostgreSQL has no replace-style insert (an
 * upsert's BEFORE INSERT triggers fire before its conflict check, PostgreSQL documentation,
 * "Overview of Trigger Behavior"), so there the overwrite is a plain insert over a taken key.
 */
@ParameterizedClass
@EnumSource(StoreBackend.class)
class RecordsNeverOverwrittenTest {
  private static final Path SQLITE3 = Path.of("/usr/bin/sqlite3");
  private static final String AT = "'2025-03-03T09:00:00.000Z'";

  @Parameter StoreBackend backend;
  @TempDir Path dir;
  private String location;
  private Path file;
  private long site;
  private long structure;
  private long plane;
  private long revision;
  private long open;
  private long finalised;
  private long finalisedObservation;
  private long openObservation;
  private long openCorrection;
  private long photo;
  private long order;
  private long action;

  /**
   * A site, a structure with one plane and its design; a finalised inspection with an observation
   * and a photo and a repair order whose action is done; and an open inspection with an
   * observation and its correction.
   */
  @BeforeEach
  void records() {
    location = backend.freshLocation(dir);
    file = backend == StoreBackend.SQLITE ? Path.of(location) : null;
    try (Database db = StoreBackend.reopen(location)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord p = Fixtures.plane(s);
      plane = p.id();
      structure = p.structureId();
      site = db.structures().find(structure).orElseThrow().siteId();
      revision = db.designs().latest(plane).orElseThrow().id();
      finalised = s.inspections().start(structure,
          NewInspection.of("M. Okafor", "competent person", InspectionReason.ROUTINE)).id();
      finalisedObservation = s.inspections().recordObservation(finalised,
          NewObservation.of(plane, PanelRef.of(1, 1), PanelState.SOUND, "M. Okafor")).id();
      photo = db.observations().addPhoto(new org.bracewalk.core.model.Photo(0,
          finalisedObservation, "a1.jpg", "image/jpeg", new byte[] {1, 2, 3},
          s.clock().instant())).id();
      s.inspections().finalise(finalised);
      RepairService repairs = new RepairService(db, s.clock());
      order = repairs.raise(finalised, "M. Okafor", "brace bay 2").id();
      action = repairs.addAction(order, plane, PanelRef.of(1, 2), RepairActionKind.BRACE, null,
          "fit a brace", null, "crew").id();
      repairs.markDone(action, "crew");
      open = s.inspections().start(structure,
          NewInspection.of("M. Okafor", "competent person", InspectionReason.ROUTINE)).id();
      openObservation = s.inspections().recordObservation(open,
          NewObservation.of(plane, PanelRef.of(2, 1), PanelState.SOUND, "M. Okafor")).id();
      openCorrection = s.inspections().correct(open, openObservation,
          NewObservation.of(plane, PanelRef.of(2, 1), PanelState.MISSING, "M. Okafor"),
          "misread").id();
    }
  }

  /** Every row of every table, as text: what "nothing changed" compares. */
  private String everything() throws SQLException {
    StringBuilder out = new StringBuilder();
    try (Connection c = StoreBackend.connect(location);
        Statement st = c.createStatement()) {
      for (String t : StoreBackend.tables(c, location)) {
        out.append('[').append(t).append("]\n");
        try (ResultSet r = st.executeQuery("SELECT * FROM " + t + " ORDER BY 1, 2, 3")) {
          ResultSetMetaData m = r.getMetaData();
          while (r.next()) {
            for (int i = 1; i <= m.getColumnCount(); i++) {
              Object v = r.getObject(i);
              out.append(v instanceof byte[] b ? Arrays.toString(b) : String.valueOf(v))
                  .append('|');
            }
            out.append('\n');
          }
        }
      }
    }
    return out.toString();
  }

  /** Runs {@code sql} over plain JDBC and expects the database to refuse it, changing nothing. */
  private void refused(String sql, String because) throws SQLException {
    String before = everything();
    try (Connection c = StoreBackend.connect(location);
        Statement st = c.createStatement()) {
      assertThatThrownBy(() -> st.executeUpdate(sql)).as(sql)
          .isInstanceOf(SQLException.class).hasMessageContaining(because);
    }
    assertThat(everything()).as("nothing changed by " + sql).isEqualTo(before);
  }

  /**
   * An insert over a row that is there: SQLite's {@code INSERT OR REPLACE}; PostgreSQL has no
   * replace, so a plain insert (its triggers refuse before the key's own check).
   */
  private String overwrite(String table) {
    return (backend == StoreBackend.SQLITE ? "INSERT OR REPLACE INTO " : "INSERT INTO ")
        + table + " ";
  }

  private boolean sqlite() {
    return backend == StoreBackend.SQLITE;
  }

  private void onlyOnSqlite(String why) {
    Assumptions.assumeTrue(sqlite(), "a check of the SQLite file itself (" + why
        + "); the server's rules are checked by the other tests of this class");
  }

  @Test
  void anObservationCannotBeMovedOutOfAFinalisedInspectionByAReplace() throws Exception {
    String row = "(id, inspection_id, plane_id, lift, bay, state, recorded_at) VALUES ("
        + finalisedObservation + ", " + open + ", " + plane + ", 1, 1, 'missing', " + AT + ")";
    refused(overwrite("observations") + row, "records are never overwritten");
    if (sqlite()) {
      refused("REPLACE INTO observations " + row, "records are never overwritten");
    }
    refused("INSERT INTO observations " + row
        + " ON CONFLICT (id) DO UPDATE SET inspection_id = excluded.inspection_id",
        "records are never overwritten");
  }

  @Test
  void aCorrectionCannotBeReplacedByAnother() throws Exception {
    refused(overwrite("observations") + "(inspection_id, plane_id, lift, bay, state,"
        + " recorded_at, supersedes_id, correction_reason) VALUES (" + open + ", " + plane
        + ", 2, 1, 'sound', " + AT + ", " + openObservation + ", 'again')",
        "already corrected");
    assertThat(everything()).contains("|" + openObservation + "|misread|");
    assertThat(openCorrection).isPositive();
  }

  @Test
  void aPhotoCannotBeMovedOutOfAFinalisedInspectionByAReplace() throws Exception {
    refused(overwrite("photos") + "(id, observation_id, file_name, media_type, data,"
        + " attached_at) VALUES (" + photo + ", " + openObservation + ", 'x.jpg', 'image/jpeg',"
        + (sqlite() ? " x'01', " : " '\\x01'::bytea, ") + AT + ")", "records are never overwritten");
  }

  @Test
  void aFinalisedInspectionCannotBeReopenedByAReplaceOrByTakingItsId() throws Exception {
    refused(overwrite("inspections") + "(id, structure_id, started_at, inspector_name,"
        + " reason, status) VALUES (" + finalised + ", " + structure + ", " + AT
        + ", 'X', 'routine', 'open')", "records are never overwritten");
    refused((sqlite() ? "UPDATE OR REPLACE" : "UPDATE") + " inspections SET id = " + finalised + " WHERE id = " + open,
        "keeps its id");
    refused("UPDATE inspections SET status = 'open', finished_at = NULL WHERE id = " + finalised,
        "finalised and cannot be changed");
  }

  @Test
  void theDesignInForceCannotBeEdited() throws Exception {
    refused(overwrite("design_panels") + "(revision_id, lift, bay, diagonal, member_kind,"
        + " opening) VALUES (" + revision + ", 1, 1, NULL, NULL, 1)", "add a new revision");
    // a panel with no row (no diagonal) given one afterwards
    refused("INSERT INTO design_panels (revision_id, lift, bay, diagonal, member_kind, opening)"
        + " VALUES (" + revision + ", 1, 2, 'X', 'rigid', 0)", "already has all its panels");
    refused(overwrite("design_revisions") + "(plane_id, number, design_date, recorded_at,"
        + " panel_count) VALUES (" + plane + ", 1, '2025-01-01', " + AT + ", 0)",
        "never overwritten");
    // a new revision dated back to before the finalised inspection ended
    refused("INSERT INTO design_revisions (plane_id, number, design_date, recorded_at,"
        + " panel_count) VALUES (" + plane + ", 2, '2025-01-01', '2025-01-01T00:00:00.000Z', 0)",
        "would change the design that inspection was checked against");
    refused("INSERT INTO design_revisions (plane_id, number, design_date, recorded_at)"
        + " VALUES (" + plane + ", 2, '2025-01-01', '2099-01-01T00:00:00.000Z')",
        "panel count");
    refused("DELETE FROM design_panels", "add a new revision");
  }

  @Test
  void aPlaneAndItsGridCannotBeOverwritten() throws Exception {
    refused(overwrite("planes") + "(structure_id, name, lifts, bays, support) VALUES ("
        + structure + ", 'spine', 1, 1, 'free')", "never overwritten");
    refused(overwrite("plane_bay_widths") + "(plane_id, bay, width_mm) VALUES (" + plane
        + ", 1, 999)", "never overwritten");
    refused(overwrite("plane_lift_heights") + "(plane_id, lift, height_mm) VALUES ("
        + plane + ", 1, 999)", "never overwritten");
  }

  @Test
  void sitesAndStructuresAreNeverDeletedNorTheirParticularsChanged() throws Exception {
    refused("DELETE FROM sites", "site cannot be deleted");
    refused("UPDATE sites SET client_address = 'elsewhere'", "site cannot be changed");
    refused(overwrite("sites") + "(id, name, time_zone, display_units) VALUES (" + site
        + ", 'X', 'UTC', 'metric')", "never overwritten");
    refused("DELETE FROM structures", "structure cannot be deleted");
    refused("UPDATE structures SET description = 'other'", "structure cannot be changed");
    refused(overwrite("structures") + "(id, site_id, name, kind) VALUES (" + structure
        + ", " + site + ", 'X', 'scaffold')", "never overwritten");
  }

  @Test
  void repairOrdersNeverChangeAndAnActionIsDoneOnce() throws Exception {
    refused("DELETE FROM repair_orders", "repair order cannot be deleted");
    refused("UPDATE repair_orders SET note = 'nothing to do'", "repair order cannot be changed");
    refused(overwrite("repair_orders") + "(id, inspection_id, created_at) VALUES ("
        + order + ", " + open + ", " + AT + ")", "never overwritten");
    refused("DELETE FROM repair_actions", "repair action cannot be deleted");
    refused("UPDATE repair_actions SET description = 'nothing'", "repair action cannot be changed");
    refused("UPDATE repair_actions SET done_at = NULL, done_by = ''", "each once");
    refused("UPDATE repair_actions SET done_by = 'someone else'", "each once");
    refused(overwrite("repair_actions") + "(id, order_id, plane_id, action) VALUES ("
        + action + ", " + order + ", " + plane + ", 'repair')", "never overwritten");
  }

  @Test
  void untrimmedTextIsRefusedOnInsert() throws Exception {
    refused("INSERT INTO observations (inspection_id, plane_id, lift, bay, state, recorded_at,"
        + " note) VALUES (" + open + ", " + plane + ", 1, 2, 'sound', " + AT + ", 'dent ')",
        "blanks at its ends");
    refused("INSERT INTO sites (name, client_address, time_zone, display_units) VALUES"
        + " ('Depot', ' 4 Quarry Lane', 'UTC', 'metric')", "blanks at its ends");
  }

  @Test
  void theStoreAddsTheIdsItKnowsToTheDatabasesLiteralMessage() {
    try (Database db = StoreBackend.reopen(location)) {
      Observation outside = new Observation(0, open, plane, PanelRef.of(9, 1), PanelState.SOUND,
          null, null, null, null, null, java.time.Instant.now(), "", null, null);
      assertThatThrownBy(() -> db.observations().add(outside))
          .isInstanceOf(StoreException.class)
          .hasMessageContaining("observation of inspection " + open + ", plane " + plane)
          .hasMessageContaining("lies outside the plane");
    }
  }

  @Test
  void everyTriggerMessageIsLiteralText() throws Exception {
    if (!sqlite()) {
      everyServerTriggerMessageIsLiteralText();
      return;
    }
    Pattern expression = Pattern.compile("RAISE\\s*\\(\\s*ABORT\\s*,\\s*'(?:[^']|'')*'\\s*\\|\\|",
        Pattern.CASE_INSENSITIVE);
    Pattern literal = Pattern.compile("RAISE\\s*\\(\\s*ABORT\\s*,\\s*'(?:[^']|'')*'\\s*\\)",
        Pattern.CASE_INSENSITIVE);
    int triggers = 0;
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT name, sql FROM sqlite_master WHERE type = 'trigger'")) {
      while (r.next()) {
        triggers++;
        String sql = r.getString(2);
        assertThat(expression.matcher(sql).find()).as(r.getString(1)).isFalse();
        if (r.getString(1).endsWith("_given_a_uuid")) {
          // V12: gives a row inserted without a global identity one; it refuses nothing
          assertThat(sql).as(r.getString(1)).doesNotContainIgnoringCase("RAISE");
          continue;
        }
        assertThat(literal.matcher(sql).find()).as(r.getString(1)).isTrue();
      }
    }
    assertThat(triggers).isGreaterThan(40);
  }

  /** The server's trigger functions raise literal text, as SQLite's triggers do. */
  private void everyServerTriggerMessageIsLiteralText() throws Exception {
    Pattern literal = Pattern.compile("RAISE EXCEPTION USING MESSAGE = '(?:[^']|'')*';");
    int triggers = 0;
    try (Connection c = StoreBackend.connect(location);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery("SELECT t.tgname, p.prosrc FROM pg_trigger t"
            + " JOIN pg_proc p ON p.oid = t.tgfoid WHERE NOT t.tgisinternal")) {
      while (r.next()) {
        triggers++;
        assertThat(literal.matcher(r.getString(2)).find()).as(r.getString(1)).isTrue();
      }
    }
    assertThat(triggers).isGreaterThan(40);
  }

  record Cli(int code, String out, String err) {}

  private Cli sqlite3(Path db, String... sql) throws Exception {
    assumeThat(Files.isExecutable(SQLITE3))
        .as("the sqlite3 command line (Debian package sqlite3) is not installed at " + SQLITE3)
        .isTrue();
    List<String> command = new ArrayList<>(List.of(SQLITE3.toString(), db.toString()));
    command.addAll(List.of(sql));
    Process p = new ProcessBuilder(command).start();
    p.getOutputStream().close();
    byte[] out = p.getInputStream().readAllBytes();
    byte[] err = p.getErrorStream().readAllBytes();
    assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
    return new Cli(p.exitValue(), new String(out, StandardCharsets.UTF_8),
        new String(err, StandardCharsets.UTF_8));
  }

  @Test
  void theFileOpensInTheSqlite3CommandLine() throws Exception {
    onlyOnSqlite("the file opens in the sqlite3 command line");
    Path copy = dir.resolve("copy.db");
    Files.copy(file, copy);
    Cli version = sqlite3(copy, "SELECT sqlite_version();");
    Cli run = sqlite3(copy, "PRAGMA integrity_check;", "SELECT count(*) FROM observations;");
    assertThat(run.code()).as(version.out() + run.err()).isZero();
    assertThat(run.err()).isEmpty();
    assertThat(run.out()).isEqualTo("ok\n3\n");
  }

  @Test
  void theFileOpensInPythonsSqlite3Module() throws Exception {
    onlyOnSqlite("the file opens in Python's sqlite3 module");
    Path python = Path.of("/usr/bin/python3");
    assumeThat(Files.isExecutable(python)).as("python3 is not installed at " + python).isTrue();
    Path copy = dir.resolve("copy.db");
    Files.copy(file, copy);
    Process p = new ProcessBuilder(python.toString(), "-c",
        "import sqlite3, sys\n"
            + "c = sqlite3.connect(sys.argv[1])\n"
            + "print(c.execute('PRAGMA integrity_check').fetchone()[0],"
            + " c.execute('SELECT count(*) FROM observations').fetchone()[0])",
        copy.toString()).redirectErrorStream(true).start();
    p.getOutputStream().close();
    String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
    assertThat(p.exitValue()).as(out).isZero();
    assertThat(out).isEqualTo("ok 3\n");
  }

  @Test
  void anotherClientMeetsTheSameRefusal() throws Exception {
    onlyOnSqlite("the sqlite3 command line meets the refusal; on the server every test here is"
        + " another client's plain SQL");
    String before = everything();
    Cli reopen = sqlite3(file, overwrite("inspections") + "(id, structure_id, started_at,"
        + " inspector_name, reason, status) VALUES (" + finalised + ", " + structure + ", " + AT
        + ", 'X', 'routine', 'open');");
    assertThat(reopen.code()).isNotZero();
    assertThat(reopen.err()).contains("inspection already exists: records are never overwritten");
    Cli delete = sqlite3(file, "DELETE FROM sites;");
    assertThat(delete.code()).isNotZero();
    assertThat(delete.err()).contains("site cannot be deleted");
    assertThat(everything()).isEqualTo(before);
  }
}
