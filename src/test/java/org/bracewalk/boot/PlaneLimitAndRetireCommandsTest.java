package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
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
 * The one size limit of a stored plane and the retirement of a plane created by mistake, driven
 * as a user would over the demo database: a typo used to store a 100000 x 100000 plane that no
 * one could delete, after which every analysis and report of the structure ran for minutes.
 */
class PlaneLimitAndRetireCommandsTest {
  @TempDir Path dir;
  private String db;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(String... args) {
    return Commands.run(context, Map.of(), args);
  }

  @BeforeEach
  void demo() {
    db = dir.resolve("demo.db").toString();
    assertThat(run("demo", "--db", db).code()).isZero();
  }

  @Test
  void aTypoSizedPlaneIsRefusedNamingTheLimitAndTheFieldAndNothingIsStored() {
    Run r = run("plane", "create", "--db", db, "--structure", "1", "--name", "typo", "--lifts",
        "100000", "--bays", "100000");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: plane 'typo': 100000 lifts x 100000 bays is larger than"
        + " the limit of 100 lifts x 500 bays a stored plane may have (field --lifts)");
    assertThat(run("plane", "list", "--db", db, "--structure", "1").out()).doesNotContain("typo");
    assertThat(run("structure", "list", "--db", db, "--site", "1").out()).contains("5 planes");

    Run bays = run("plane", "create", "--db", db, "--structure", "1", "--name", "long",
        "--lifts", "3", "--bays", "501");
    assertThat(bays.code()).isEqualTo(2);
    assertThat(bays.err()).contains("3 lifts x 501 bays is larger than the limit").contains("(field --bays)");

    Run atLimit = run("plane", "create", "--db", db, "--structure", "1", "--name", "largest",
        "--lifts", "100", "--bays", "500");
    assertThat(atLimit.code()).as(atLimit.err()).isZero();
    assertThat(atLimit.out()).contains("'largest' (100 lifts x 500 bays, pinned-base) created");
  }

  @Test
  void twoThousandMillionLiftsAreRefusedAtOnceBeforeAnythingIsBuilt() {
    Run r = run("plane", "create", "--db", db, "--structure", "1", "--name", "huge", "--lifts",
        "2000000000", "--bays", "2000000000");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("2000000000 lifts x 2000000000 bays is larger than the limit of"
        + " 100 lifts x 500 bays").contains("(field --lifts)");
    // also more than an int holds: still the limit, not an overflow
    Run more = run("plane", "create", "--db", db, "--structure", "1", "--name", "huge", "--lifts",
        "5", "--bays", "90000000000");
    assertThat(more.code()).isEqualTo(2);
    assertThat(more.err()).contains("5 lifts x 90000000000 bays is larger than the limit").contains("(field --bays)");
  }

  @Test
  void theReportBenchStoresItsPlanesSoItKeepsToTheLimitToo() {
    Run r = run("bench-report", "--size", "101", "--planes", "1", "--runs", "1");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("plane 'plane 1': 101 lifts x 101 bays is larger than the limit"
        + " of 100 lifts x 500 bays").contains("(field --size)");
  }

  @Test
  void aDesignMapLargerThanTheLimitIsRefusedNamingTheFile() throws Exception {
    StringBuilder map = new StringBuilder();
    for (int lift = 0; lift < 101; lift++) {
      map.append(". .\n");
    }
    Path file = dir.resolve("tall.txt");
    Files.writeString(file, map);
    Run r = run("plane", "create", "--db", db, "--structure", "1", "--name", "tall", "--design",
        file.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains(file.toString())
        .contains("plane 'tall': 101 lifts x 2 bays is larger than the limit of 100 lifts x 500 bays");
    assertThat(run("plane", "list", "--db", db, "--structure", "1").out()).doesNotContain("tall");
  }

  @Test
  void aRetiredPlaneIsLeftOutOfNewInspectionsAndTheIssuedReportStillMatches() throws Exception {
    Run made = run("plane", "create", "--db", db, "--structure", "1", "--name", "mistake",
        "--lifts", "2", "--bays", "2");
    assertThat(made.code()).as(made.err()).isZero();
    assertThat(made.out()).contains("plane 8 'mistake'");
    Path pdf = dir.resolve("impact.pdf");
    Run report = run("report", "--db", db, "--inspection", "2", "--out", pdf.toString());
    assertThat(report.code()).as(report.err()).isZero();
    String before = run("analyse", "--db", db, "--inspection", "2").out();

    Run retire = run("plane", "retire", "--db", db, "--plane", "8", "--reason",
        "created by mistake", "--by", "Priya Danvers");
    assertThat(retire.code()).as(retire.err()).isZero();
    assertThat(retire.out()).contains("plane 8 'mistake'").contains("retired at")
        .contains("created by mistake");
    // a plane of the finalised inspection itself, too
    assertThat(run("plane", "retire", "--db", db, "--plane", "5", "--reason", "dismantled").code())
        .isZero();

    Run verify = run("verify-report", "--db", db, pdf.toString());
    assertThat(verify.code()).as(verify.out()).isZero();
    assertThat(verify.out()).contains("matches: ").contains("the records of inspection 2 are as they were then");
    assertThat(run("analyse", "--db", db, "--inspection", "2").out()).isEqualTo(before);
    assertThat(run("plane", "list", "--db", db, "--structure", "1").out())
        .contains("plane 8 'mistake' (2 lifts x 2 bays, pinned-base)")
        .contains("retired 2025-03-06T09:00:00Z (created by mistake)");

    Run started = run("inspection", "start", "--db", db, "--structure", "1", "--inspector",
        "Priya Danvers");
    assertThat(started.code()).as(started.err()).isZero();
    String id = started.out().replaceAll("(?s).*?inspection (\\d+).*", "$1");
    Run analysed = run("analyse", "--db", db, "--inspection", id);
    assertThat(analysed.out()).contains("frame 1").doesNotContain("mistake");
    // created after inspection 2 started, the plane was never part of it (its scope is fixed)
    assertThat(before).contains("frame 1").doesNotContain("mistake");
    Run record = run("record", "--db", db, "--inspection", id, "--plane", "mistake", "--lift",
        "1", "--bay", "1", "--state", "sound");
    assertThat(record.code()).isEqualTo(2);
    assertThat(record.err()).contains("plane 'mistake' (id 8) was retired")
        .contains("it is not part of it");
  }

  @Test
  void retiringTwiceAnUnknownPlaneOrWithoutAReasonIsRefused() {
    assertThat(run("plane", "retire", "--db", db, "--plane", "7", "--reason", "gone").code())
        .isZero();
    Run again = run("plane", "retire", "--db", db, "--plane", "7", "--reason", "gone again");
    assertThat(again.code()).isEqualTo(2);
    assertThat(again.err()).contains("(id 7) is already retired");
    Run unknown = run("plane", "retire", "--db", db, "--plane", "999", "--reason", "typo");
    assertThat(unknown.code()).isEqualTo(2);
    assertThat(unknown.err()).contains("plane 999");
    Run blank = run("plane", "retire", "--db", db, "--plane", "6", "--reason", "  ");
    assertThat(blank.code()).isEqualTo(2);
    assertThat(blank.err()).contains("say why plane 'north facade' (id 6) is retired");
  }

  @Test
  void aTypoPlaneStoredBeforeTheLimitCanBeRetiredAndNewInspectionsRunAtFullSpeedAgain()
      throws Exception {
    // a file written before migration V6: the 100000 x 100000 plane of the report that led here
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement st = c.createStatement()) {
      st.executeUpdate("DROP TRIGGER planes_within_the_size_limit");
      st.executeUpdate("INSERT INTO planes (id, structure_id, name, lifts, bays, support)"
          + " VALUES (8, 1, 'typo', 100000, 100000, 'pinned-base')");
      st.executeUpdate("WITH RECURSIVE n(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM n WHERE i < 100000)"
          + " INSERT INTO plane_bay_widths SELECT 8, i, 1000 FROM n");
      st.executeUpdate("WITH RECURSIVE n(i) AS (SELECT 1 UNION ALL SELECT i + 1 FROM n WHERE i < 100000)"
          + " INSERT INTO plane_lift_heights SELECT 8, i, 1000 FROM n");
      st.executeUpdate("INSERT INTO design_revisions (plane_id, number, design_date, recorded_at, panel_count)"
          + " VALUES (8, 1, '2025-03-06', '2025-03-06T08:00:00.000Z', 0)");
    }
    Run retire = run("plane", "retire", "--db", db, "--plane", "8", "--reason", "typo in --lifts and --bays");
    assertThat(retire.code()).as(retire.err()).isZero();
    Run started = run("inspection", "start", "--db", db, "--structure", "1", "--inspector", "Priya Danvers");
    assertThat(started.code()).as(started.err()).isZero();
    String id = started.out().replaceAll("(?s).*?inspection (\\d+).*", "$1");
    Run analysed = run("analyse", "--db", db, "--inspection", id);
    assertThat(analysed.code()).as(analysed.err()).isEqualTo(1); // nothing marked yet: not rigid
    assertThat(analysed.out()).doesNotContain("typo");
    // the site file cannot carry a map of ten thousand million panels: it says so at once
    Run export = run("export", "--db", db, "--site", "1", "--to", dir.resolve("site.json").toString());
    assertThat(export.code()).isEqualTo(2);
    assertThat(export.err()).contains("structure 'Aisle C racking run', plane 'typo': 100000 lifts x"
        + " 100000 bays is larger than the limit of 100 lifts x 500 bays");
  }
}
