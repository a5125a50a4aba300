package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assumptions.assumeThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The database the {@code demo} command writes, at the latest migration, opens in SQLite tools
 * older than the library the program uses: the sqlite3 command line of the system (Debian 12
 * ships 3.40; the file must open in 3.31 and later, DEVELOPERS.md) and Python's sqlite3 module.
 * Each runs {@code PRAGMA integrity_check} and counts the rows of every table the file has, listed
 * from {@code sqlite_master} so that a table a later migration adds is covered without editing
 * this test; the counts must be those the program's own driver reads.
 */
class DemoDatabaseInOlderSqliteTest {
  private static final Path SQLITE3 = Path.of("/usr/bin/sqlite3");
  private static final Path PYTHON3 = Path.of("/usr/bin/python3");

  @TempDir Path dir;
  private Path db;
  /** "table|rows" for every table, by name, as the program's driver reads them. */
  private List<String> counts;

  @BeforeEach
  void demo() throws Exception {
    db = dir.resolve("demo.db");
    AppContext context = new AppContext(
        Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
        PlaneAnalyzer.standard());
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(new String[] {"demo", "--db", db.toString()}, new PrintWriter(out),
        new PrintWriter(err), Map.of(), context);
    assertThat(code).as(out + "" + err).isZero();
    counts = new ArrayList<>();
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement st = c.createStatement()) {
      List<String> tables = new ArrayList<>();
      try (ResultSet r = st.executeQuery(
          "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name")) {
        while (r.next()) {
          tables.add(r.getString(1));
        }
      }
      for (String t : tables) {
        try (ResultSet r = st.executeQuery("SELECT count(*) FROM \"" + t + "\"")) {
          r.next();
          counts.add(t + "|" + r.getLong(1));
        }
      }
    }
    // the tables of the latest migrations are there, and hold the demo's records
    assertThat(counts).anyMatch(s -> s.startsWith("inspection_scope|") && !s.endsWith("|0"))
        .anyMatch(s -> s.startsWith("plane_retirements|"))
        .anyMatch(s -> s.startsWith("issued_reports|"));
  }

  record Ran(int code, String out, String err) {}

  private static Ran run(List<String> command, String input) throws Exception {
    Process p = new ProcessBuilder(command).start();
    p.getOutputStream().write(input.getBytes(StandardCharsets.UTF_8));
    p.getOutputStream().close();
    byte[] out = p.getInputStream().readAllBytes();
    byte[] err = p.getErrorStream().readAllBytes();
    assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
    return new Ran(p.exitValue(), new String(out, StandardCharsets.UTF_8),
        new String(err, StandardCharsets.UTF_8));
  }

  private static List<String> lines(String text) {
    return text.lines().toList();
  }

  @Test
  void theSystemsSqlite3CommandLineChecksTheDemoAndReadsEveryTable() throws Exception {
    assumeThat(Files.isExecutable(SQLITE3))
        .as("the sqlite3 command line (Debian package sqlite3) is not installed at " + SQLITE3)
        .isTrue();
    Path copy = dir.resolve("copy.db");
    Files.copy(db, copy);
    // the shell lists the tables itself and writes one count query per table, which it then runs
    String script = """
        .bail on
        SELECT 'version|' || sqlite_version();
        PRAGMA integrity_check;
        .headers off
        .mode list
        .once %s
        SELECT 'SELECT ''' || name || '|'' || count(*) FROM "' || name || '";'
          FROM sqlite_master WHERE type = 'table' ORDER BY name;
        .read %s
        """.formatted(dir.resolve("counts.sql"), dir.resolve("counts.sql"));
    Ran ran = run(List.of(SQLITE3.toString(), copy.toString()), script);
    assertThat(ran.code()).as(ran.out() + ran.err()).isZero();
    assertThat(ran.err()).isEmpty();
    List<String> out = lines(ran.out());
    assertThat(out.get(0)).startsWith("version|3.");
    assertThat(out.get(1)).isEqualTo("ok");
    assertThat(out.subList(2, out.size())).isEqualTo(counts);
  }

  @Test
  void pythonsSqlite3ModuleChecksTheDemoAndReadsEveryTable() throws Exception {
    Path python = Files.isExecutable(PYTHON3) ? PYTHON3 : null;
    assumeThat(python).as("python3 is not installed at " + PYTHON3).isNotNull();
    Ran module = run(List.of(python.toString(), "-c", "import sqlite3"), "");
    assumeThat(module.code()).as("python3 has no sqlite3 module: " + module.err()).isZero();
    String program = """
        import sqlite3, sys
        c = sqlite3.connect(sys.argv[1])
        print("version|" + sqlite3.sqlite_version)
        print(c.execute("PRAGMA integrity_check").fetchone()[0])
        names = [r[0] for r in c.execute(
            "SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name")]
        for n in names:
            print(n + "|" + str(c.execute('SELECT count(*) FROM "%s"' % n).fetchone()[0]))
        """;
    Path copy = dir.resolve("copy.db");
    Files.copy(db, copy);
    Ran ran = run(List.of(python.toString(), "-", copy.toString()), program);
    assertThat(ran.code()).as(ran.out() + ran.err()).isZero();
    List<String> out = lines(ran.out());
    assertThat(out.get(0)).startsWith("version|3.");
    assertThat(out.get(1)).isEqualTo("ok");
    assertThat(out.subList(2, out.size())).isEqualTo(counts);
  }
}
