package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Durability: a separate program records thousands of observations from a CSV, printing each id
 * as it is acknowledged; it is killed with SIGKILL part-way. Every acknowledged observation must
 * be in the file afterwards, the file must pass SQLite's integrity check, and the program must
 * open it as usual.
 */
@Tag("slow")
class RecordingSurvivesKillTest {
  private static final Pattern ACK = Pattern.compile("^observation (\\d+) recorded");
  private static final int ROWS = 5000;
  private static final int KILL_AFTER = 400;

  @TempDir Path dir;

  @Test
  void everyAcknowledgedObservationSurvivesSigkill() throws Exception {
    Path db = dir.resolve("walk.db");
    long inspection;
    StringBuilder csv = new StringBuilder("plane,lift,bay,state,note\n");
    try (AppServices s = AppContext.standard().open(db)) {
      s.demo().load();
      inspection = s.inspections().start(1, NewInspection.of("Priya Danvers", "inspector",
          InspectionReason.AFTER_IMPACT)).id();
      List<PlaneRecord> planes = s.inspections().planesOf(inspection);
      for (int row = 0; row < ROWS; row++) {
        PlaneRecord p = planes.get(row % planes.size());
        int lift = 1 + (row / planes.size()) % p.grid().lifts();
        int bay = 1 + (row / planes.size() / p.grid().lifts()) % p.grid().bays();
        csv.append(p.name()).append(',').append(lift).append(',').append(bay).append(',')
            .append(row % 7 == 0 ? "missing" : "sound").append(",walk row ").append(row).append('\n');
      }
    }
    Path rows = dir.resolve("rows.csv");
    Files.writeString(rows, csv);

    String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    Path java = Path.of(System.getProperty("java.home"), "bin", "java");
    Process child = new ProcessBuilder(java.toString(), "-cp", classpath, Main.class.getName(),
            "record", "--db", db.toString(), "--inspection", String.valueOf(inspection),
            "--from", rows.toString())
        .redirectError(dir.resolve("child-stderr.txt").toFile())
        .start();
    List<Long> acknowledged = new CopyOnWriteArrayList<>();
    CountDownLatch enough = new CountDownLatch(1);
    Thread reader = new Thread(() -> {
      try (BufferedReader in = new BufferedReader(
          new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
        String line;
        while ((line = in.readLine()) != null) {
          Matcher m = ACK.matcher(line);
          if (m.find()) {
            acknowledged.add(Long.parseLong(m.group(1)));
            if (acknowledged.size() >= KILL_AFTER) {
              enough.countDown();
            }
          }
        }
      } catch (java.io.IOException e) {
        // the stream breaks when the child is killed
      }
      enough.countDown();
    });
    reader.start();
    assertThat(enough.await(120, TimeUnit.SECONDS)).as("child acknowledged observations").isTrue();
    child.destroyForcibly(); // SIGKILL on Linux and macOS: no shutdown hook, no clean close
    assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
    reader.join(10_000);
    assertThat(child.exitValue()).as("killed, not finished").isNotZero();
    assertThat(acknowledged).as(Files.readString(dir.resolve("child-stderr.txt")))
        .hasSizeGreaterThanOrEqualTo(KILL_AFTER).hasSizeLessThan(ROWS);

    try (Database store = Database.open(db)) {
      assertThat(store.integrityCheck()).isEqualTo("ok");
      Set<Long> stored = store.observations().ofInspection(inspection).stream()
          .map(Observation::id).collect(Collectors.toSet());
      assertThat(stored).containsAll(acknowledged);
      assertThat(stored.size()).isLessThan(ROWS);
    }
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(new String[] {"inspection", "show", "--db", db.toString(),
        "--inspection", String.valueOf(inspection)}, new PrintWriter(out), new PrintWriter(err),
        Map.of());
    assertThat(code).as(err.toString()).isZero();
    assertThat(out.toString()).contains("walk row " + (acknowledged.size() - 1));
  }
}
