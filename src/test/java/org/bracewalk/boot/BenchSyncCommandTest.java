package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.store.StoreBackend;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code bench-sync} on a real server (PostgreSQL: {@code BRACEWALK_TEST_PG}, as the store's tests;
 * skipped with the reason without it, failing in CI), with small numbers: what it prints is what
 * the server holds. The outside reference is the server's own rows, counted with plain SQL. No
 * timing is checked.
 */
class BenchSyncCommandTest {
  @TempDir Path dir;

  private final AppContext context = new AppContext(
      Clock.fixed(Instant.parse("2025-03-03T09:00:00Z"), ZoneOffset.UTC), PlaneAnalyzer.standard());

  private Commands.Run run(String... args) {
    return Commands.run(context, Commands.serverEnv(dir), args);
  }

  @Test
  void threeFieldFilesPushAtOnceAndEveryRecordArrivesExactlyOnce() throws Exception {
    String db = StoreBackend.POSTGRESQL.freshLocation(dir);
    Commands.Run r = run("bench-sync", "--server", db, "--fields", "3", "--inspections", "2",
        "--observations", "5");
    assertThat(r.code()).as(r.out() + r.err()).isZero();
    String tag = tag(r.out());
    assertThat(r.out())
        .contains("inspected: structure 'bench scaffold' of site 'bench-sync site'")
        .contains("pushed at once: 3 field files x 2 inspections x 5 observations in")
        .contains("throughput: ")
        .contains("baseline, one more field file of the same size pushed alone: ")
        .contains("server counts of this bench: 6 inspections (expected 6), 30 observations"
            + " (expected 30); by global identity 0 missing, 0 doubled")
        // three files and the baseline's, two inspections each, none pushed twice
        .contains("0 inspections pushed, 8 skipped as already there; server counts now:"
            + " 6 inspections (expected 6), 30 observations (expected 30); by global identity"
            + " 0 missing, 0 doubled")
        .contains("baseline file's records on the server: 2 inspections (expected 2),"
            + " 10 observations (expected 10)")
        .contains("every record arrived exactly once: yes")
        .contains("machine: " + Runtime.getRuntime().availableProcessors() + " cores, load");
    assertThat(r.out()).doesNotContain("conflict");

    // the server's rows, counted with plain SQL
    try (Connection c = StoreBackend.connect(db)) {
      assertThat(count(c, "SELECT count(*) FROM sites")).isEqualTo(1);
      assertThat(count(c, "SELECT count(*) FROM planes")).isEqualTo(1);
      assertThat(count(c, "SELECT count(*) FROM inspections")).isEqualTo(8);
      assertThat(count(c, "SELECT count(*) FROM inspections WHERE status = 'finalised'"))
          .isEqualTo(8);
      assertThat(count(c, "SELECT count(*) FROM observations")).isEqualTo(40);
      assertThat(count(c, "SELECT count(DISTINCT uuid) FROM observations")).isEqualTo(40);
      assertThat(count(c, "SELECT count(*) FROM inspections WHERE inspector_name = ?", tag))
          .isEqualTo(6);
      assertThat(count(c, "SELECT count(*) FROM observations o JOIN inspections i"
          + " ON o.inspection_id = i.id WHERE i.inspector_name = ?", tag)).isEqualTo(30);
      assertThat(count(c, "SELECT count(*) FROM inspections WHERE inspector_name = ?",
          tag + " alone")).isEqualTo(2);
      // each inspection holds its five observations, none of another inspection's
      assertThat(count(c, "SELECT count(*) FROM (SELECT inspection_id FROM observations"
          + " GROUP BY inspection_id HAVING count(*) = 5) x")).isEqualTo(8);
    }

    // a second run on the same database reuses the generated site and counts only its own
    Commands.Run again = run("bench-sync", "--server", db, "--fields", "2", "--inspections",
        "1", "--observations", "3");
    assertThat(again.code()).as(again.out() + again.err()).isZero();
    assertThat(tag(again.out())).isNotEqualTo(tag);
    assertThat(again.out()).contains("server counts of this bench: 2 inspections (expected 2),"
        + " 6 observations (expected 6); by global identity 0 missing, 0 doubled");
    try (Connection c = StoreBackend.connect(db)) {
      assertThat(count(c, "SELECT count(*) FROM sites")).isEqualTo(1);
      assertThat(count(c, "SELECT count(*) FROM inspections")).isEqualTo(8 + 3);
      assertThat(count(c, "SELECT count(*) FROM observations")).isEqualTo(40 + 9);
    }
  }

  @Test
  void aFileIsNotAServer() {
    Commands.Run r = run("bench-sync", "--server", dir.resolve("x.db").toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("--server takes a team server's address");
  }

  private static String tag(String out) {
    Matcher m = Pattern.compile("records are by inspector '([^']+)'").matcher(out);
    assertThat(m.find()).as(out).isTrue();
    return m.group(1);
  }

  private static long count(Connection c, String sql, String... args) throws Exception {
    try (PreparedStatement s = c.prepareStatement(sql)) {
      for (int i = 0; i < args.length; i++) {
        s.setString(i + 1, args[i]);
      }
      try (ResultSet r = s.executeQuery()) {
        r.next();
        return r.getLong(1);
      }
    }
  }
}
