package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Clock;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.SyncService;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.store.Database;
import org.bracewalk.store.StoreBackend;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A sync killed with SIGKILL part-way, as a real program: the server then holds each of the field
 * file's inspections whole (every observation) or not at all, and the next sync finishes the job.
 * Needs the test server ({@code BRACEWALK_TEST_PG}, see {@code StoreBackend}); the reference is
 * the server's own rows, read with plain SQL.
 */
@Tag("slow")
class SyncSurvivesKillTest {
  private static final int INSPECTIONS = 40;

  @TempDir Path dir;

  /** Observations on the server per field-file inspection (by identity), read with plain SQL. */
  private static Map<String, Long> onServer(String location, Map<String, Long> field)
      throws Exception {
    Map<String, Long> out = new HashMap<>();
    try (Connection c = StoreBackend.connect(location); PreparedStatement s = c.prepareStatement(
        "SELECT i.uuid, count(o.id) FROM inspections i LEFT JOIN observations o"
            + " ON o.inspection_id = i.id GROUP BY i.uuid")) {
      try (ResultSet r = s.executeQuery()) {
        while (r.next()) {
          if (field.containsKey(r.getString(1))) {
            out.put(r.getString(1), r.getLong(2));
          }
        }
      }
    }
    return out;
  }

  @Test
  void aKilledSyncLeavesWholeInspectionsAndTheNextSyncFinishes() throws Exception {
    String server = StoreBackend.POSTGRESQL.freshLocation(dir);
    Path field = dir.resolve("field.db");
    Map<String, Long> fieldCounts = new HashMap<>();
    try (AppServices office = AppServices.over(Database.open(server, StoreBackend.env()),
            Clock.systemUTC(), PlaneAnalyzer.standard());
        AppServices laptop = AppServices.over(Database.open(field), Clock.systemUTC(),
            PlaneAnalyzer.standard())) {
      office.demo().load();
      new SyncService(Clock.systemUTC()).sync(laptop, office);
      // many finalised inspections of the scaffold, every panel of every plane marked
      Structure st = laptop.sites().sites().stream()
          .flatMap(s -> laptop.sites().structures(s.id()).stream())
          .filter(s -> s.kind().label().equals("scaffold")).findFirst().orElseThrow();
      for (int n = 0; n < INSPECTIONS; n++) {
        Inspection i = laptop.inspections().start(st.id(),
            NewInspection.of("Ada Field", "inspector", InspectionReason.ROUTINE));
        long marked = 0;
        for (PlaneRecord p : laptop.inspections().planesOf(i.id())) {
          List<org.bracewalk.core.model.PanelRef> rest =
              laptop.inspections().notLookedAt(i.id(), p.id());
          marked += laptop.inspections().recordRestAsDesigned(i.id(), p.id(), rest, "Ada Field")
              .size();
        }
        laptop.inspections().finalise(i.id());
        fieldCounts.put(laptop.store().identities().uuidOf(Kind.INSPECTION, i.id()), marked);
      }
    }
    assertThat(fieldCounts.values()).allSatisfy(c -> assertThat(c).isGreaterThan(10));

    String classpath = System.getProperty("surefire.test.class.path",
        System.getProperty("java.class.path"));
    Path java = Path.of(System.getProperty("java.home"), "bin", "java");
    Process child = new ProcessBuilder(java.toString(), "-cp", classpath, Main.class.getName(),
        "sync", "--db", field.toString(), "--server", server)
        .redirectOutput(dir.resolve("child-stdout.txt").toFile())
        .redirectError(dir.resolve("child-stderr.txt").toFile())
        .start();
    // kill it once a few inspections are on the server, well before all of them
    long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
    while (onServer(server, fieldCounts).size() < 3 && child.isAlive()
        && System.nanoTime() < deadline) {
      Thread.sleep(5);
    }
    child.destroyForcibly(); // SIGKILL: no shutdown hook, no clean close of the connection
    assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
    assertThat(child.exitValue()).as("killed, not finished: "
        + Files.readString(dir.resolve("child-stdout.txt"))
        + Files.readString(dir.resolve("child-stderr.txt"))).isNotZero();

    Map<String, Long> cut = onServer(server, fieldCounts);
    assertThat(cut.size()).as("cut part-way").isBetween(3, INSPECTIONS - 1);
    cut.forEach((uuid, count) -> assertThat(count).as("inspection " + uuid + " whole")
        .isEqualTo(fieldCounts.get(uuid)));

    try (AppServices office = AppServices.over(Database.open(server, StoreBackend.env()),
            Clock.systemUTC(), PlaneAnalyzer.standard());
        AppServices laptop = AppServices.over(Database.open(field), Clock.systemUTC(),
            PlaneAnalyzer.standard())) {
      SyncService.Summary next = new SyncService(Clock.systemUTC()).sync(laptop, office);
      assertThat(next.conflicts()).isEmpty();
      assertThat(next.pushedInspections() + next.skippedInspections()).isEqualTo(INSPECTIONS);
      assertThat(next.skippedInspections()).isEqualTo(cut.size());
    }
    assertThat(onServer(server, fieldCounts)).isEqualTo(fieldCounts);
  }
}
