package org.bracewalk.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.NewInspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.StoreException;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The register of issued documents (V5): what it keeps, and that it is append-only for anyone. */
class IssuedRegisterTest {
  private static final String BYTES = "a".repeat(64);
  private static final String RECORDS = "b".repeat(64);

  @TempDir Path dir;

  private long inspection(Database db) {
    Fixtures.Services s = Fixtures.Services.over(db);
    PlaneRecord plane = Fixtures.plane(s);
    return s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "", InspectionReason.ROUTINE)).id();
  }

  private static List<String> rows(Connection c) throws Exception {
    List<String> out = new ArrayList<>();
    try (Statement s = c.createStatement();
        ResultSet r = s.executeQuery("SELECT id, inspection_id, kind, file_name, fingerprint,"
            + " records_fingerprint, origin, issued_at FROM issued_reports ORDER BY id")) {
      while (r.next()) {
        StringBuilder sb = new StringBuilder();
        for (int i = 1; i <= 8; i++) {
          sb.append(r.getString(i)).append('|');
        }
        out.add(sb.toString());
      }
    }
    return out;
  }

  @Test
  void everyIssuedDocumentIsKeptWithItsKindBytesAndRecords() {
    try (Database db = Database.open(dir.resolve("r.db"))) {
      long id = inspection(db);
      IssuedReport pdf = db.issuedReports().add(IssuedReport.issued(id,
          IssuedReport.Kind.REPAIR_ORDER, "order.pdf", BYTES, RECORDS,
          Instant.parse("2025-03-06T09:00:00Z")));
      IssuedReport csv = db.issuedReports().add(IssuedReport.issued(id,
          IssuedReport.Kind.REPAIR_ORDER_CSV, "order.csv", "c".repeat(64), RECORDS,
          Instant.parse("2025-03-06T09:00:01Z")));
      assertThat(pdf.id()).isPositive();
      assertThat(db.issuedReports().ofInspection(id)).containsExactly(pdf, csv);
      assertThat(db.issuedReports().withBytes(BYTES)).containsExactly(pdf);
      assertThat(pdf.origin()).isEqualTo(IssuedReport.Origin.ISSUED);
      assertThat(pdf.recordsFingerprint()).isEqualTo(RECORDS);
      // a site file's report (name, bytes, time) comes in as imported, vouching for nothing
      IssuedReport imported = db.issuedReports().add(new IssuedReport(0, id, "old.pdf",
          "d".repeat(64), Instant.parse("2025-01-01T00:00:00Z")));
      assertThat(imported.origin()).isEqualTo(IssuedReport.Origin.IMPORTED);
      assertThat(imported.recordsFingerprint()).isNull();
    }
  }

  @Test
  void theRegisterRefusesUpdateDeleteAndReplaceFromAnyClient() throws Exception {
    Path file = dir.resolve("r.db");
    long id;
    long row;
    try (Database db = Database.open(file)) {
      id = inspection(db);
      row = db.issuedReports().add(IssuedReport.issued(id, IssuedReport.Kind.INSPECTION_REPORT,
          "r.pdf", BYTES, RECORDS, Instant.parse("2025-03-06T09:00:00Z"))).id();
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      List<String> before = rows(c);
      String other = "e".repeat(64);
      assertThatThrownBy(() -> st.executeUpdate(
          "UPDATE issued_reports SET fingerprint = '" + other + "'"))
          .hasMessageContaining("append-only").hasMessageContaining("cannot be changed");
      assertThatThrownBy(() -> st.executeUpdate(
          "UPDATE OR REPLACE issued_reports SET records_fingerprint = '" + other + "'"))
          .hasMessageContaining("append-only");
      assertThatThrownBy(() -> st.executeUpdate("DELETE FROM issued_reports"))
          .hasMessageContaining("append-only").hasMessageContaining("cannot be deleted");
      for (String verb : List.of("INSERT OR REPLACE INTO", "REPLACE INTO")) {
        assertThatThrownBy(() -> st.executeUpdate(verb + " issued_reports (id, inspection_id,"
            + " kind, file_name, fingerprint, records_fingerprint, origin, issued_at) VALUES ("
            + row + ", " + id + ", 'inspection-report', 'r.pdf', '" + other + "', '" + RECORDS
            + "', 'issued', '2025-03-06T09:00:00.000Z')"))
            .as(verb).hasMessageContaining("append-only").hasMessageContaining("cannot be replaced");
      }
      // a row cannot pose as one registered before the register, nor as issued without records
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO issued_reports (inspection_id,"
          + " file_name, fingerprint, issued_at) VALUES (" + id + ", 'x.pdf', '" + other
          + "', '2025-03-06T09:00:00.000Z')"))
          .hasMessageContaining("before the register");
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO issued_reports (inspection_id,"
          + " file_name, fingerprint, origin, issued_at) VALUES (" + id + ", 'x.pdf', '" + other
          + "', 'issued', '2025-03-06T09:00:00.000Z')"))
          .hasMessageContaining("fingerprint of its records");
      assertThat(rows(c)).isEqualTo(before);
    }
    // through the program, the trigger's message reaches the user as a store error
    try (Database db = Database.open(file)) {
      assertThatThrownBy(() -> db.call(c -> {
        try (Statement s = c.createStatement()) {
          return s.executeUpdate("DELETE FROM issued_reports WHERE id = " + row);
        }
      })).isInstanceOf(StoreException.class).hasMessageContaining("append-only");
    }
  }

  @Test
  void aRowRegisteredBeforeTheRegisterIsKeptAsSuch() throws Exception {
    Path file = dir.resolve("old.db");
    // a file made by a program that knew only the first two scripts, with one issued report
    OlderFiles.migratedTo(file, "2");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      st.executeUpdate("INSERT INTO sites (id, name, time_zone, display_units)"
          + " VALUES (1, 'yard', 'UTC', 'metric')");
      st.executeUpdate("INSERT INTO structures (id, site_id, name, kind) VALUES (1, 1, 'run', 'scaffold')");
      st.executeUpdate("INSERT INTO inspections (id, structure_id, started_at, inspector_name, reason)"
          + " VALUES (1, 1, '2025-03-05T14:10:00.000Z', 'M. Okafor', 'routine')");
      st.executeUpdate("INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at)"
          + " VALUES (1, 'r.pdf', '" + BYTES + "', '2025-03-05T15:00:00.000Z')");
    }
    try (Database db = Database.open(file)) {
      assertThat(db.issuedReports().withBytes(BYTES)).singleElement().satisfies(r -> {
        assertThat(r.origin()).isEqualTo(IssuedReport.Origin.BEFORE_REGISTER);
        assertThat(r.kind()).isEqualTo(IssuedReport.Kind.INSPECTION_REPORT);
        assertThat(r.recordsFingerprint()).isNull();
        assertThat(r.fileName()).isEqualTo("r.pdf");
      });
    }
  }

  /**
   * The V5 script parses and holds in an older SQLite (Debian 12's sqlite3 3.40 command line,
   * when installed): literal RAISE messages only, as SQLite before 3.47 requires (SQLite
   * documentation, "RAISE function" / release notes of 3.47; from memory).
   */
  @Test
  void theRegisterScriptParsesAndHoldsInTheSqlite3CommandLine() throws Exception {
    Path cli = Path.of("/usr/bin/sqlite3");
    Assumptions.assumeTrue(Files.isExecutable(cli), "no sqlite3 command line at " + cli);
    String v1 = Files.readString(Path.of("db-migrations/V1__site_records.sql"));
    Matcher table = Pattern.compile("CREATE TABLE issued_reports \\(.*?\\);", Pattern.DOTALL).matcher(v1);
    assertThat(table.find()).isTrue();
    String v5 = Files.readString(Path.of("db-migrations/V5__register_of_issued_documents.sql"));
    String script = "PRAGMA foreign_keys = OFF;\n" + table.group() + "\n"
        + "INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at)"
        + " VALUES (1, 'r.pdf', '" + BYTES + "', '2025-03-05T15:00:00.000Z');\n" + v5 + "\n"
        + "SELECT origin FROM issued_reports;\n"
        + "UPDATE issued_reports SET file_name = 'other.pdf';\n"
        + "DELETE FROM issued_reports;\n"
        + "INSERT OR REPLACE INTO issued_reports (id, inspection_id, file_name, fingerprint,"
        + " records_fingerprint, origin, issued_at) VALUES (1, 1, 'x.pdf', '" + BYTES + "', '"
        + RECORDS + "', 'issued', '2025-03-06T09:00:00.000Z');\n"
        + "SELECT file_name FROM issued_reports;\n";
    Process p = new ProcessBuilder(cli.toString(), dir.resolve("cli.db").toString())
        .redirectErrorStream(true).start();
    p.getOutputStream().write(script.getBytes(StandardCharsets.UTF_8));
    p.getOutputStream().close();
    String output = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
    assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
    assertThat(output).doesNotContain("Parse error").doesNotContain("syntax error")
        .contains("before-register")
        .contains("a registered document cannot be changed")
        .contains("a registered document cannot be deleted")
        .contains("a registered document cannot be replaced");
    assertThat(output.strip()).endsWith("r.pdf");
  }
}
