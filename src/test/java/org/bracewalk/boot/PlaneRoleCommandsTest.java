package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
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
 * A plane records its role (upright frame, spine, facade, transverse frame, plan bracing, other)
 * when it is created; the site file carries it (absent means other), and the verdict's keep-off
 * zone of an upright frame takes in the beam bays on both sides of it.
 */
class PlaneRoleCommandsTest {
  @TempDir Path dir;
  private String db;
  private static final ObjectMapper JSON = new ObjectMapper();
  private final AppContext context =
      new AppContext(Clock.fixed(Instant.parse("2025-03-06T09:00:00Z"), ZoneOffset.UTC),
          PlaneAnalyzer.standard());

  record Run(int code, String out, String err) {}

  Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), Map.of(), context);
    return new Run(code, out.toString(), err.toString());
  }

  @BeforeEach
  void demo() {
    db = dir.resolve("demo.db").toString();
    assertThat(run("demo", "--db", db).code()).isZero();
  }

  private static JsonNode plane(JsonNode site, String name) {
    for (JsonNode st : site.get("structures")) {
      for (JsonNode p : st.get("planes")) {
        if (p.get("name").asText().equals(name)) {
          return p;
        }
      }
    }
    throw new AssertionError("no plane " + name);
  }

  @Test
  void aRoleIsGivenAtCreationAndTheSiteFileKeepsItThroughExportImportExport() throws Exception {
    Run made = run("plane", "create", "--db", db, "--structure", "1", "--name", "end bracing",
        "--lifts", "3", "--bays", "1", "--role", "plan-bracing");
    assertThat(made.code()).as(made.err()).isZero();
    Run exported = run("export", "--db", db, "--site", "1");
    assertThat(exported.code()).as(exported.err()).isZero();
    JsonNode site = JSON.readTree(exported.out());
    assertThat(plane(site, "end bracing").get("role").asText()).isEqualTo("plan-bracing");
    assertThat(plane(site, "frame 2").get("role").asText()).isEqualTo("upright-frame");
    assertThat(plane(site, "north facade").get("role").asText()).isEqualTo("facade");

    Path file = Files.writeString(dir.resolve("site.json"), exported.out());
    String other = dir.resolve("other.db").toString();
    Run imported = run("import", "--db", other, "--site", file.toString());
    assertThat(imported.code()).as(imported.err()).isZero();
    Run again = run("export", "--db", other, "--site", "1");
    assertThat(again.out()).isEqualTo(exported.out());
  }

  @Test
  void aSiteFileWithoutRolesReadsAsOtherAndWritesNoRole() throws Exception {
    String withRoles = run("export", "--db", db, "--site", "1").out();
    String without = withRoles.lines().filter(l -> !l.strip().startsWith("\"role\""))
        .reduce("", (a, b) -> a + b + "\n");
    Path file = Files.writeString(dir.resolve("old.json"), without);
    String other = dir.resolve("old.db").toString();
    Run imported = run("import", "--db", other, "--site", file.toString());
    assertThat(imported.code()).as(imported.err()).isZero();
    String back = run("export", "--db", other, "--site", "1").out();
    assertThat(back).doesNotContain("\"role\"");
    assertThat(back).isEqualTo(without);
  }

  @Test
  void anUnknownRoleIsRefusedByTheCommandTheSiteFileAndTheDatabase() throws Exception {
    Run bad = run("plane", "create", "--db", db, "--structure", "1", "--name", "shelf plane",
        "--lifts", "2", "--bays", "2", "--role", "shelf");
    assertThat(bad.code()).isEqualTo(2);
    assertThat(bad.err()).contains("--role").contains("unknown plane role 'shelf'");
    assertThat(run("plane", "list", "--db", db, "--structure", "1").out()).doesNotContain("shelf plane");

    String exported = run("export", "--db", db, "--site", "1").out();
    Path file = Files.writeString(dir.resolve("bad.json"),
        exported.replaceFirst("\"role\": \"upright-frame\"", "\"role\": \"shelf\""));
    Run refused = run("import", "--db", dir.resolve("bad.db").toString(), "--site", file.toString());
    assertThat(refused.code()).isEqualTo(2);
    assertThat(refused.err()).contains(file.toString()).contains("role").contains("shelf");

    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db);
        Statement s = c.createStatement()) {
      assertThatThrownBy(() -> s.executeUpdate("INSERT INTO planes (structure_id, name, lifts, bays,"
          + " support, role) VALUES (1, 'raw', 1, 1, 'pinned-base', 'shelf')"))
          .isInstanceOf(SQLException.class).hasMessageContaining("CHECK");
    }
  }

  @Test
  void theDemosUprightFrameKeepsTheBeamBaysBesideItOffAndOtherPlanesDoNot() throws Exception {
    Run analysed = run("analyse", "--db", db, "--inspection", "2", "--format", "json");
    assertThat(analysed.code()).isEqualTo(1);
    JsonNode frame2 = null;
    for (JsonNode p : JSON.readTree(analysed.out()).get("planes")) {
      if (p.get("plane").asText().equals("frame 2")) {
        frame2 = p;
      } else {
        assertThat(p.has("keepOffZone")).as(p.get("plane").asText()).isFalse();
      }
    }
    assertThat(frame2.get("role").asText()).isEqualTo("upright-frame");
    assertThat(frame2.get("verdict").asText()).isEqualTo("lost-rigidity");
    assertThat(frame2.get("keepOffZone")).isEqualTo(JSON.readTree(
        "{\"lifts\": [1, 2, 3, 4, 5], \"bays\": [1], \"offloadBeside\": true}"));
    assertThat(frame2.get("keepOff").asText())
        .isEqualTo("Keep people and loads off lifts 1-5, bay 1, and off-load the beam bays on both"
            + " sides of this upright frame, until a competent person has acted.");
  }
}
