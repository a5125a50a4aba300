package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.Map;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * An inspection's scope (its planes and the design revision of each) is fixed when it starts: a
 * plane added to the structure and a design revised after it, as the command line does it, change
 * neither what {@code analyse} says of it nor whether its issued report verifies.
 */
class InspectionScopeCommandsTest {
  @TempDir Path dir;
  private Path db;

  /** A clock after the demo's inspections that moves on a minute each time it is read. */
  private static final class Ticking extends Clock {
    private Instant now = Instant.parse("2025-03-06T09:00:00Z");

    @Override
    public ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(ZoneId zone) {
      return this;
    }

    @Override
    public synchronized Instant instant() {
      now = now.plus(Duration.ofMinutes(1));
      return now;
    }
  }

  private final AppContext context = new AppContext(new Ticking(), PlaneAnalyzer.standard());

  Run run(String... args) {
    return Commands.run(context, Map.of(), args);
  }

  private Run ok(String... args) {
    Run r = run(args);
    assertThat(r.code()).as(String.join(" ", args) + "\n" + r.out() + r.err()).isZero();
    return r;
  }

  /** Frame 2's design with its second panel from the bottom braced the other way. */
  private Path revisedFrame2() throws Exception {
    String map = Files.readString(Path.of("demo-site/maps/racking-frame-2.design.txt"));
    String[] lines = map.split("\n", -1);
    int panels = 0;
    for (int k = lines.length - 1; k >= 0; k--) {
      if (lines[k].equals("/") || lines[k].equals("\\")) {
        panels++;
        if (panels == 2) {
          lines[k] = "X";
          break;
        }
      }
    }
    Path revised = dir.resolve("frame-2.rev2.txt");
    Files.writeString(revised, String.join("\n", lines));
    return revised;
  }

  @BeforeEach
  void demo() {
    db = dir.resolve("demo.db");
    ok("demo", "--db", db.toString());
  }

  @Test
  void addingAPlaneAndADesignRevisionAfterIssueLeavesAnalysisAndTheIssuedReportAsTheyWere()
      throws Exception {
    String d = db.toString();
    // an inspection of the racking run, one mark, finalised, its report issued
    assertThat(ok("inspection", "start", "--db", d, "--structure", "1", "--inspector",
        "Priya Danvers", "--position", "racking inspector", "--competent-person", "Priya Danvers",
        "--shift", "early", "--storage-safety-person", "Tom Hale", "--reason", "routine").out())
        .contains("4");
    ok("record", "--db", d, "--inspection", "4", "--plane", "frame 2", "--lift",
        "2", "--bay", "1", "--state", "missing");
    ok("finalise", "--db", d, "--inspection", "4");
    Path pdf = dir.resolve("inspection-3.pdf");
    ok("report", "--db", d, "--inspection", "4", "--out", pdf.toString());
    Run before = run("analyse", "--db", d, "--inspection", "4", "--format", "json");
    Run beforeText = run("analyse", "--db", d, "--inspection", "4");
    assertThat(before.out()).contains("\"inspection\": 4").doesNotContain("west return");

    // then the structure changes: a new plane, and a new design revision of frame 2
    Run plane = ok("plane", "create", "--db", d, "--structure", "1", "--name", "west return",
        "--design", "demo-site/maps/racking-frame-2.design.txt");
    assertThat(plane.out()).contains("'west return'");
    Run revision = ok("import", "--db", d, "--plane", "2", "--design",
        revisedFrame2().toString());
    assertThat(revision.out() + revision.err()).contains("2");

    // the finalised inspection is what it was, and its issued report verifies
    assertThat(run("analyse", "--db", d, "--inspection", "4", "--format", "json"))
        .isEqualTo(before);
    assertThat(run("analyse", "--db", d, "--inspection", "4")).isEqualTo(beforeText);
    Run verified = run("verify-report", "--db", d, pdf.toString());
    assertThat(verified.code()).as(verified.out() + verified.err()).isZero();
    assertThat(verified.out()).contains("the records of inspection 4 are as they were then")
        .doesNotContain("west return");

    // an inspection started now covers the new plane and the new revision
    ok("inspection", "start", "--db", d, "--structure", "1", "--inspector", "Priya Danvers",
        "--reason", "after-alteration");
    assertThat(run("analyse", "--db", d, "--inspection", "5", "--format", "json").out())
        .contains("west return");
  }

  @Test
  void anOpenInspectionKeepsTheDesignInForceWhenItStarted() throws Exception {
    String d = db.toString();
    ok("inspection", "start", "--db", d, "--structure", "1", "--inspector", "Priya Danvers",
        "--reason", "routine");
    Run before = run("analyse", "--db", d, "--inspection", "4", "--format", "json");
    ok("import", "--db", d, "--plane", "2", "--design", revisedFrame2().toString());
    ok("plane", "create", "--db", d, "--structure", "1", "--name", "west return", "--design",
        "demo-site/maps/racking-frame-2.design.txt");
    // the walk goes on against the design it started with, over the planes it started with
    assertThat(run("analyse", "--db", d, "--inspection", "4", "--format", "json"))
        .isEqualTo(before);
    // and a mark on the new plane belongs to a new inspection, said so with the plane's name
    Run refused = run("record", "--db", d, "--inspection", "4", "--plane",
        "west return", "--lift", "1", "--bay", "1", "--state", "sound");
    assertThat(refused.code()).as(refused.out() + refused.err()).isEqualTo(2);
    assertThat(refused.err()).contains("west return").contains("inspection 4");
  }
}
