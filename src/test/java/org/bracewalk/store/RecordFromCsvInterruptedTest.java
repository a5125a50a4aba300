package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.CsvRecording;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportExportService;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.RecordingStoppedException;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PlaneRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code record --from} when the database stays busy part-way: the error says exactly which rows
 * are recorded, and running the same file again records the rest and nothing twice.
 */
class RecordFromCsvInterruptedTest {
  @TempDir Path dir;

  private static final int ROWS = 40;
  private static final int BEFORE_THE_LOCK = 15;

  /** 40 rows on lines 2-41; the row on line 36 (data row 35) corrects data row 3 (line 4). */
  private static String csv() {
    StringBuilder b = new StringBuilder("plane,lift,bay,state,supersedes_row,correction_reason\n");
    for (int i = 1; i <= ROWS; i++) {
      if (i == 35) {
        b.append("spine,2,1,sound,3,brace was behind the sheeting\n");
      } else {
        b.append("spine,").append(1 + i % 3).append(',').append(1 + i % 2)
            .append(i % 5 == 0 ? ",missing,," : ",sound,,").append('\n');
      }
    }
    return b.toString();
  }

  private static long count(Connection c, String sql) throws Exception {
    try (Statement s = c.createStatement(); ResultSet r = s.executeQuery(sql)) {
      r.next();
      return r.getLong(1);
    }
  }

  @Test
  void aBusyDatabaseStopsTheRunWithTheLastAcknowledgedLineAndARerunRecordsTheRestOnce()
      throws Exception {
    Path file = dir.resolve("site.db");
    String text = csv();
    try (Database db = Database.open(file, 300);
        Connection other = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement lock = other.createStatement()) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      long inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      ImportExportService files = new ImportExportService(db, new Fixtures.SteppingClock());
      List<Observation> acknowledged = new ArrayList<>();
      // another program takes the write lock after the 15th acknowledgement and keeps it
      assertThatThrownBy(() -> files.recordFromCsv(inspection, "walk.csv", text, "", o -> {
        acknowledged.add(o);
        if (acknowledged.size() == BEFORE_THE_LOCK) {
          try {
            lock.execute("BEGIN IMMEDIATE");
          } catch (java.sql.SQLException e) {
            throw new IllegalStateException(e);
          }
        }
      }))
          .isInstanceOfSatisfying(RecordingStoppedException.class,
              e -> assertThat(e.lastRecordedLine()).isEqualTo(16))
          .hasMessageContaining("recording walk.csv stopped at line 17: the database " + file
              + " stayed busy for 0.3 s (another Bracewalk is writing to it).")
          .hasMessageContaining("Rows 2-16 of walk.csv are recorded (last acknowledged: line"
              + " 16); nothing after it; run the same command again to record the rest")
          .hasMessageNotContaining("nothing was saved");
      assertThat(acknowledged).hasSize(BEFORE_THE_LOCK);
      lock.execute("ROLLBACK");
      assertThat(count(other, "SELECT count(*) FROM observations")).isEqualTo(BEFORE_THE_LOCK);

      // the same file again: the rest, once
      CsvRecording rest = files.recordFromCsv(inspection, "walk.csv", text, "", o -> { });
      assertThat(rest.recorded()).hasSize(ROWS - BEFORE_THE_LOCK);
      assertThat(rest.alreadyRecorded()).isEqualTo(BEFORE_THE_LOCK);
      assertThat(rest.summary()).isEqualTo("25 recorded, 15 already recorded by an earlier run");
      List<Observation> all = s.inspections().observations(inspection);
      assertThat(all).hasSize(ROWS);
      assertThat(count(other, "SELECT count(DISTINCT line) FROM observation_sources"))
          .isEqualTo(ROWS);
      // the correction recorded by the second run names the row the first run recorded
      Observation third = acknowledged.get(2);
      assertThat(rest.recorded()).filteredOn(o -> o.supersedes() != null).singleElement()
          .satisfies(o -> assertThat(o.supersedes()).isEqualTo(third.id()));
      // and every row of the file is recorded exactly once, in file order
      Map<Long, Long> lineOf = new HashMap<>();
      try (Statement q = other.createStatement();
          ResultSet r = q.executeQuery("SELECT observation_id, line FROM observation_sources")) {
        while (r.next()) {
          lineOf.put(r.getLong(1), r.getLong(2));
        }
      }
      assertThat(all).extracting(o -> lineOf.get(o.id()))
          .containsExactlyElementsOf(java.util.stream.LongStream.rangeClosed(2, ROWS + 1)
              .boxed().toList());

      // a third run records nothing
      CsvRecording none = files.recordFromCsv(inspection, "walk.csv", text, "", o -> { });
      assertThat(none.recorded()).isEmpty();
      assertThat(none.alreadyRecorded()).isEqualTo(ROWS);
      assertThat(s.inspections().observations(inspection)).hasSize(ROWS);

      // another inspection is another record: the same file records all its rows there
      long next = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.AFTER_IMPACT)).id();
      assertThat(files.recordFromCsv(next, "walk.csv", text, "", o -> { }).recorded())
          .hasSize(ROWS);
      assertThat(db.integrityCheck()).isEqualTo("ok");
    }
  }

  @Test
  void theSourcesOfObservationsAreAppendOnlyEvenBySql() throws Exception {
    Path file = dir.resolve("site.db");
    long inspection;
    long next;
    try (Database db = Database.open(file)) {
      Fixtures.Services s = Fixtures.Services.over(db);
      PlaneRecord plane = Fixtures.plane(s);
      inspection = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      next = s.inspections().start(plane.structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
      new ImportExportService(db, new Fixtures.SteppingClock())
          .recordFromCsv(inspection, "walk.csv", csv(), "", o -> { });
    }
    String key = "'" + "ab".repeat(32) + "'";
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      long before = count(c, "SELECT count(*) FROM observation_sources");
      String taken = "SELECT inspection_id, source_sha256, line FROM observation_sources"
          + " WHERE observation_id = 1";
      // INSERT OR REPLACE would delete the first row without a delete trigger: refused first
      assertThatThrownBy(() -> st.executeUpdate("INSERT OR REPLACE INTO observation_sources"
          + " SELECT inspection_id, source_sha256, line, 2 FROM observation_sources"
          + " WHERE observation_id = 1"))
          .hasMessageContaining("already recorded");
      assertThatThrownBy(() -> st.executeUpdate("INSERT OR REPLACE INTO observation_sources"
          + " VALUES (" + inspection + ", " + key + ", 999, 1)"))
          .hasMessageContaining("already recorded");
      assertThatThrownBy(() -> st.executeUpdate("UPDATE observation_sources SET line = line + 100"))
          .hasMessageContaining("cannot be changed");
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM observation_sources"))
          .hasMessageContaining("cannot be deleted");
      // a source row naming an observation of another inspection
      st.executeUpdate("INSERT INTO observations (inspection_id, plane_id, lift, bay, state,"
          + " recorded_at) SELECT " + next + ", plane_id, 1, 1, 'sound', recorded_at"
          + " FROM observations WHERE id = 1");
      long newest = count(c, "SELECT max(id) FROM observations");
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO observation_sources VALUES ("
          + inspection + ", " + key + ", 2, " + newest + ")"))
          .hasMessageContaining("not an observation of that inspection");
      assertThat(count(c, "SELECT count(*) FROM observation_sources")).isEqualTo(before);
      try (ResultSet r = st.executeQuery(taken)) {
        assertThat(r.next()).isTrue();
        assertThat(r.getLong(3)).isEqualTo(2);
      }
    }
  }
}
