package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
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

/** The report commands driven as a user would, over string writers. */
class ReportCommandsTest {
  @TempDir Path dir;
  private Path db;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(Map<String, String> env, String... args) {
    return Commands.run(context, env, args);
  }

  Run run(String... args) {
    return run(Map.of(), args);
  }

  @BeforeEach
  void demo() {
    db = dir.resolve("demo.db");
    assertThat(run("demo", "--db", db.toString()).code()).isZero();
  }

  @Test
  void theAfterImpactReportIsWrittenAndVerifiesUntilARecordChanges() throws Exception {
    Path pdf = dir.resolve("out/impact.pdf");
    Run made = run("report", "--db", db.toString(), "--inspection", "2", "--out", pdf.toString());
    assertThat(made.code()).as(made.err()).isZero();
    assertThat(made.out()).contains("wrote " + pdf).contains("frame 2: \u25b2 Lost rigidity. Keep people and loads off lifts 1-5, bay 1")
        .containsPattern("record fingerprint [0-9a-f]{64}");
    assertThat(Files.readAllBytes(pdf)).startsWith("%PDF-".getBytes(StandardCharsets.US_ASCII));

    Run same = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(same.code()).isZero();
    assertThat(same.out()).contains("matches: " + pdf + " is the inspection-report issued as"
        + " impact.pdf").contains("the records of inspection 2 are as they were then");

    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement st = c.createStatement()) {
      // the database refuses to change a structure's description; an editor drops that guard
      st.executeUpdate("DROP TRIGGER structures_keep_their_particulars");
      st.executeUpdate("UPDATE structures SET description = description || '.' WHERE id = 1");
    }
    Run changed = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(changed.code()).isEqualTo(1);
    assertThat(changed.out()).contains("does not match: " + pdf + " (inspection-report of"
        + " inspection 2)").contains("records changed since issue: the structure record");
  }

  @Test
  void aFileThatIsNotOursExitsTwo() throws Exception {
    Path txt = dir.resolve("notes.pdf");
    Files.writeString(txt, "just some notes");
    Run r = run("verify-report", "--db", db.toString(), txt.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).contains("not a Bracewalk document: " + txt);
  }

  @Test
  void missingParticularsExitTwoNamingEveryOneAndWriteNothing() {
    Run started = run("inspection", "start", "--db", db.toString(), "--structure", "1",
        "--inspector", "Priya Danvers");
    assertThat(started.code()).as(started.err()).isZero();
    String id = started.out().replaceAll("(?s).*?inspection (\\d+).*", "$1");
    Path pdf = dir.resolve("bare.pdf");
    Run r = run("report", "--db", db.toString(), "--inspection", id, "--out", pdf.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: inspection " + id)
        // the demo site stands under UK rules: its racking run's report needs the reporter's
        // position and the person responsible for storage equipment safety (HSE HSG76)
        .contains("(United Kingdom)")
        .contains("these are empty: reporter-position, storage-safety-person.");
    assertThat(pdf).doesNotExist();
  }

  @Test
  void theRepairOrderAndItsCsvAreWritten() throws Exception {
    Path pdf = dir.resolve("order.pdf");
    Path csv = dir.resolve("order.csv");
    Run r = run("repair-order", "--db", db.toString(), "--inspection", "2", "--out", pdf.toString(),
        "--csv", csv.toString());
    assertThat(r.code()).as(r.err()).isZero();
    // take frame 2 out of service; refit its bottom horizontal, replace its struck upright and
    // the two diagonals (the demo's after-impact records)
    assertThat(r.out()).contains("wrote " + pdf + ": 5 actions")
        .containsPattern("registered as issued \\(repair-order \\d+, SHA-256 [0-9a-f]{64}\\)")
        .containsPattern("registered as issued \\(repair-order-csv \\d+, SHA-256 [0-9a-f]{64}\\)");
    assertThat(Files.readString(csv)).startsWith("number,plane,lift,bay,lifts,action,member,kind,"
        + "urgency,due,deviation,done_by,done_date,level,line\r\n1,frame 2,1,1,1 2 3 4 5,out-of-service,");
    Run v = run("verify-report", "--db", db.toString(), pdf.toString());
    assertThat(v.code()).isZero();
    assertThat(v.out()).contains("matches: " + pdf + " is the repair-order issued as order.pdf");
    Run c = run("verify-report", "--db", db.toString(), csv.toString());
    assertThat(c.code()).as(c.out()).isZero();
    assertThat(c.out()).contains("matches: " + csv + " is the repair-order-csv issued as order.csv");
  }

  @Test
  void aBrokenTemplateFolderIsBadInputNamingTheFileAndKey() throws Exception {
    Path templates = dir.resolve("firm-templates");
    Files.createDirectories(templates);
    String packed = new String(getClass().getResourceAsStream("/templates/report.en.properties")
        .readAllBytes(), StandardCharsets.UTF_8);
    Files.writeString(templates.resolve("report.en.properties"),
        packed.replace("footer.page=page {n} of {total}", "footer.page=page {n} of {all}"));
    Path pdf = dir.resolve("firm.pdf");
    Run r = run(Map.of("BRACEWALK_TEMPLATES", templates.toString()), "report", "--db",
        db.toString(), "--inspection", "2", "--out", pdf.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains(templates.resolve("report.en.properties").toString())
        .contains("key 'footer.page' uses placeholder {all}");
    assertThat(pdf).doesNotExist();
  }
}
