package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An issued report of a finalised inspection keeps verifying while the program changes what it
 * may change (a structure's inspection interval), and stops verifying when a record it rests on
 * is edited behind the program's back, down to a blank added at the end of a text.
 */
class IssuedReportStaysTrueCommandsTest {
  @TempDir Path dir;
  private Path db;
  private Path pdf;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(String... args) {
    return Commands.run(context, Map.of(), args);
  }

  /** The demo's inspection 2 (finalised, after an impact) issued as a report. */
  @BeforeEach
  void issued() {
    db = dir.resolve("demo.db");
    assertThat(run("demo", "--db", db.toString()).code()).isZero();
    pdf = dir.resolve("impact.pdf");
    Run made = run("report", "--db", db.toString(), "--inspection", "2", "--out", pdf.toString());
    assertThat(made.code()).as(made.err()).isZero();
    Run same = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(same.code()).as(same.out() + same.err()).isZero();
  }

  private void sql(String... statements) throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement st = c.createStatement()) {
      for (String s : statements) {
        st.executeUpdate(s);
      }
    }
  }

  private String text(String query) throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement st = c.createStatement();
        ResultSet r = st.executeQuery(query)) {
      r.next();
      return r.getString(1);
    }
  }

  @Test
  void changingTheStructuresIntervalLeavesAFinalisedInspectionsReportVerifying() throws Exception {
    String interval = text("SELECT inspection_interval_days FROM structures WHERE id = 1");
    Run changed = run("structure", "interval", "--db", db.toString(), "--structure", "1",
        "--days", "14");
    assertThat(changed.code()).as(changed.out() + changed.err()).isZero();
    assertThat(changed.out()).contains("every 14 days");

    Run verified = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(verified.code()).as(verified.out()).isZero();
    assertThat(verified.out()).contains("matches: ").contains("the records of inspection 2 are as they were then");
    // the inspection keeps the interval as at its finalisation; the structure has the new one
    assertThat(text("SELECT inspection_interval_days FROM inspections WHERE id = 2"))
        .isEqualTo(interval);
    assertThat(text("SELECT inspection_interval_days FROM structures WHERE id = 1"))
        .isEqualTo("14");
  }

  @Test
  void aBlankAddedAtTheEndOfANoteIsADifference() throws Exception {
    // as an editor would: drop the guard, then append one space to a note of inspection 2
    sql("DROP TRIGGER observations_never_change",
        "UPDATE observations SET note = note || ' ' WHERE id ="
            + " (SELECT min(id) FROM observations WHERE inspection_id = 2 AND note <> '')");
    Run v = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(v.code()).as(v.out() + v.err()).isEqualTo(1);
    assertThat(v.out()).contains("does not match: ").contains("(inspection-report of inspection 2)")
        .containsPattern("records changed since issue: the observations of plane '[^']+'");
  }

  @Test
  void aBlankAddedAtTheEndOfTheClientsAddressIsADifference() throws Exception {
    sql("DROP TRIGGER sites_never_change",
        "UPDATE sites SET client_address = client_address || ' ' WHERE id = 1");
    Run v = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(v.code()).as(v.out() + v.err()).isEqualTo(1);
    assertThat(v.out()).contains("records changed since issue: the site record");
  }
}
