package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.UserInputException;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The attacks of "the database destroyed, exit 0" and "another program's SQLite file is
 * changed", repeated through the command line (and the app's document issuer): every one is
 * refused with exit status 2, the message names the path, and every record is still there.
 */
class NothingOverwrittenTest {
  @TempDir Path dir;
  private Path db;
  private Map<String, Long> records;
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  Run run(Map<String, String> env, String... args) {
    return Commands.run(context, env, args);
  }

  Run run(String... args) {
    return run(Map.of(), args);
  }

  /** Rows of every table of the database, read with the driver directly. */
  private static Map<String, Long> rows(Path file) throws Exception {
    Map<String, Long> counts = new TreeMap<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement s = c.createStatement()) {
      List<String> tables = new ArrayList<>();
      try (ResultSet r = s.executeQuery(
          "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'")) {
        while (r.next()) {
          tables.add(r.getString(1));
        }
      }
      for (String t : tables) {
        try (ResultSet r = s.executeQuery("SELECT count(*) FROM \"" + t + "\"")) {
          r.next();
          counts.put(t, r.getLong(1));
        }
      }
    }
    return counts;
  }

  @BeforeEach
  void demo() throws Exception {
    db = dir.resolve("demo.db");
    assertThat(run("demo", "--db", db.toString()).code()).isZero();
    records = rows(db);
    assertThat(records.get("observations")).isPositive();
  }

  /** Exit 2, the path named, the database opens with every record, nothing beside it written. */
  private void refusedAndIntact(Run r, Path named, String... words) throws Exception {
    assertThat(r.code()).as(r.err()).isEqualTo(2);
    assertThat(r.err()).contains("error: " + named).contains("Nothing was written");
    for (String w : words) {
      assertThat(r.err()).contains(w);
    }
    assertThat(Files.readAllBytes(db)).startsWith("SQLite format 3\0".getBytes(StandardCharsets.US_ASCII));
    assertThat(rows(db)).isEqualTo(records);
    Run analyse = run("analyse", "--db", db.toString(), "--inspection", "2");
    assertThat(analyse.code()).as(analyse.err()).isEqualTo(1); // frame 2 lost rigidity, as before
    try (var listing = Files.list(dir)) {
      assertThat(listing.map(p -> p.getFileName().toString()))
          .noneMatch(n -> n.endsWith(".part") || n.endsWith(".pdf"));
    }
  }

  @Test
  void reportOutTheDatabaseIsRefused() throws Exception {
    refusedAndIntact(run("report", "--db", db.toString(), "--inspection", "2", "--out",
        db.toString()), db, "is the open database");
  }

  @Test
  void exportToTheDatabaseOrItsWriteAheadLogIsRefused() throws Exception {
    refusedAndIntact(run("export", "--db", db.toString(), "--site", "1", "--to", db.toString()),
        db, "is the open database");
    Path wal = Path.of(db + "-wal");
    refusedAndIntact(run("export", "--db", db.toString(), "--site", "1", "--to", wal.toString()),
        wal, "write-ahead log");
    // another spelling of the same path
    Path roundabout = dir.resolve("x").resolve("..").resolve("demo.db");
    refusedAndIntact(run("export", "--db", db.toString(), "--inspection", "2", "--to",
        roundabout.toString()), roundabout, "is the open database");
  }

  @Test
  void repairOrderCsvOverTheDatabaseIsRefusedBeforeThePdfIsWritten() throws Exception {
    Path pdf = dir.resolve("order.pdf");
    refusedAndIntact(run("repair-order", "--db", db.toString(), "--inspection", "2", "--out",
        pdf.toString(), "--csv", db.toString()), db, "is the open database");
    assertThat(pdf).doesNotExist();
    Path both = dir.resolve("order.csv");
    Run same = run("repair-order", "--db", db.toString(), "--inspection", "2", "--out",
        both.toString(), "--csv", both.toString());
    refusedAndIntact(same, both, "are the same file");
  }

  @Test
  void exportToALinkToTheDatabaseIsRefusedAndTheLinkStays() throws Exception {
    Path link = Files.createSymbolicLink(dir.resolve("site.json"), db);
    refusedAndIntact(run("export", "--db", db.toString(), "--site", "1", "--to", link.toString()),
        link, "symbolic link to the open database");
    assertThat(Files.isSymbolicLink(link)).isTrue();
  }

  @Test
  void aReportOverTheTemplateFileItIsMadeFromIsRefused() throws Exception {
    Path templates = Files.createDirectories(dir.resolve("firm-templates"));
    byte[] packed = getClass().getResourceAsStream("/templates/report.en.properties").readAllBytes();
    Path template = templates.resolve("report.en.properties");
    Files.write(template, packed);
    Run r = run(Map.of("BRACEWALK_TEMPLATES", templates.toString()), "report", "--db",
        db.toString(), "--inspection", "2", "--out", template.toString());
    refusedAndIntact(r, template, "a file this command reads");
    assertThat(Files.readAllBytes(template)).isEqualTo(packed);
  }

  @Test
  void theAppsDocumentsCannotBeSavedOverTheDatabase() throws Exception {
    try (AppServices services = context.open(db)) {
      var issuer = ReportIssuers.over(context, services, Map.of());
      assertThatThrownBy(() -> issuer.issueReport(2, db, p -> { }))
          .isInstanceOf(UserInputException.class).hasMessageContaining(db + " is the open database");
      // the repair order's CSV goes beside the PDF: demo.csv.pdf would be fine, demo.db.csv too;
      // a PDF chosen as the database is refused before the CSV is made
      assertThatThrownBy(() -> issuer.issueRepairOrder(2, db, p -> { }))
          .isInstanceOf(UserInputException.class).hasMessageContaining(db + " is the open database");
    }
    assertThat(rows(db)).isEqualTo(records);
    assertThat(Path.of(db + ".csv")).doesNotExist();
  }

  private static String sha256(Path file) throws Exception {
    return HexFormat.of().formatHex(
        MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
  }

  @Test
  void anotherProgramsSqliteFileIsRefusedByEveryCommandAndLeftAsItWas() throws Exception {
    Path other = dir.resolve("inventory.sqlite");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + other);
        Statement s = c.createStatement()) {
      s.execute("CREATE TABLE t (item TEXT)");
      s.execute("INSERT INTO t VALUES ('ladder')");
    }
    String sha = sha256(other);
    FileTime modified = Files.getLastModifiedTime(other);
    for (String[] args : List.of(
        new String[] {"site", "list", "--db", other.toString()},
        new String[] {"demo", "--db", other.toString()},
        new String[] {"demo", "--db", other.toString(), "--replace"})) {
      Run r = run(args);
      assertThat(r.code()).as(String.join(" ", args) + "\n" + r.err()).isEqualTo(2);
      assertThat(r.err()).contains("error: " + other + " is a SQLite database but not a Bracewalk"
          + " one (its tables: t;");
      assertThat(sha256(other)).isEqualTo(sha);
      assertThat(Files.getLastModifiedTime(other)).isEqualTo(modified);
      assertThat(Path.of(other + "-wal")).doesNotExist();
      assertThat(Path.of(other + "-shm")).doesNotExist();
    }
  }

  @Test
  void demoReplaceReplacesOnlyABracewalkDatabase() throws Exception {
    Run replaced = run("demo", "--db", db.toString(), "--replace");
    assertThat(replaced.code()).as(replaced.err()).isZero();
    assertThat(replaced.err()).contains("replaced: the old " + db + " was deleted");
    assertThat(rows(db)).isEqualTo(records);
  }

  @Test
  void aDatabaseInAFolderThatDoesNotExistIsRefusedButTheDefaultFolderIsMade() throws Exception {
    Path typo = dir.resolve("Dokuments/site.db");
    Run r = run("site", "list", "--db", typo.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("the folder " + typo.getParent() + " does not exist");
    assertThat(typo.getParent()).doesNotExist();
    Run viaVariable = run(Map.of("BRACEWALK_DB", typo.toString()), "site", "list");
    assertThat(viaVariable.code()).isEqualTo(2);
    assertThat(typo.getParent()).doesNotExist();

    Path xdg = dir.resolve("xdg-data"); // the per-user data folder on Linux: $XDG_DATA_HOME/bracewalk
    Run first = run(Map.of("XDG_DATA_HOME", xdg.toString()), "site", "list");
    if (System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).startsWith("linux")) {
      assertThat(first.code()).as(first.err()).isZero();
      assertThat(first.err()).contains("database: " + xdg.resolve("bracewalk/bracewalk.db"));
      assertThat(xdg.resolve("bracewalk/bracewalk.db")).exists();
    }
  }
}
