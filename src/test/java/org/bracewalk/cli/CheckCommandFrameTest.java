package org.bracewalk.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.bracewalk.boot.Launcher;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code check} with frame lines (check-contract.md, "Frame members"), run through the launcher. The
 * planes are those of the table in shared/design/analysis.md, "Frame members" (pinned base unless
 * said; freedoms and moving joints computed there from the rigidity matrix with exact rank, L.
 * Asimow, B. Roth, Trans. AMS 245 (1978)); the brace graph alone calls all five rigid. Each is run
 * as an as-built map against a whole design, and as a design that leaves the member out.
 */
class CheckCommandFrameTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  @TempDir Path dir;

  record Run(int code, String out, String err) {
    JsonNode json() throws IOException {
      return JSON.readTree(out);
    }
  }

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), Map.of());
    return new Run(code, out.toString(), err.toString());
  }

  private Path map(String name, String text) throws IOException {
    return Files.writeString(dir.resolve(name), text);
  }

  /** Runs the plane twice: as built against the whole design, and as a design leaving it out. */
  private List<JsonNode> states(String grid, String asBuiltLines, int exitCode) throws IOException {
    Path design = map("design.txt", grid);
    Path built = map("built.txt", grid + asBuiltLines);
    Path leftOut = map("left-out.txt", grid + asBuiltLines.replaceAll("(missing|ineffective)\n", "none\n"));
    List<JsonNode> out = new ArrayList<>();
    Run b = run("check", design.toString(), built.toString(), "--format", "json");
    assertThat(b.code()).as("as built: exit").isEqualTo(exitCode);
    assertThat(b.err()).isEmpty();
    out.add(b.json().get("asBuilt"));
    Run d = run("check", leftOut.toString(), "--format", "json");
    assertThat(d.code()).as("design leaving it out: exit").isEqualTo(exitCode);
    out.add(d.json().get("design"));
    // without the frame lines the brace graph's answer stands: rigid (analysis.md, the table)
    assertThat(run("check", design.toString(), "--format", "json").code()).isZero();
    return out;
  }

  private static String joints(JsonNode array) {
    List<String> out = new ArrayList<>();
    array.forEach(j -> out.add(j.get("level").asInt() + "/" + j.get("line").asInt()));
    return String.join(" ", out);
  }

  private static int count(JsonNode freedoms, String kind) {
    int n = 0;
    for (JsonNode f : freedoms) {
      if (f.get("kind").asText().equals(kind)) {
        n += f.get("count").asInt();
      }
    }
    return n;
  }

  /** Plane A: 3 lifts x 1 bay, / \ / from lift 1, ledger at level 1 missing: 1 freedom, joint (1, 0) only. */
  @Test
  void planeAStandardsMeetInAStraightLineUnrestrained() throws IOException {
    for (JsonNode s : states("/\n\\\n/\n", "ledger 1 1 missing\n", 1)) {
      assertThat(s.get("rigid").asBoolean()).isFalse();
      assertThat(s.get("degreesOfFreedom").asInt()).isEqualTo(1);
      assertThat(joints(s.get("movingJoints"))).isEqualTo("1/0");
      assertThat(count(s.get("freedoms"), "lost-restraint")).isEqualTo(1);
      assertThat(s.get("blocks")).isEmpty();
    }
    Run r = run("check", map("d.txt", "/\n\\\n/\n").toString(), map("b.txt", "/\n\\\n/\nledger 1 1 missing\n").toString(),
        "--format", "json");
    JsonNode v = r.json();
    // the least repair refits the ledger: one item, as many as the freedoms (contract)
    assertThat(v.at("/repair/minimum").asInt()).isEqualTo(1);
    assertThat(v.at("/repair/members").toString()).isEqualTo("[{\"member\":\"ledger\",\"level\":1,\"bay\":1,\"inDesign\":true}]");
    assertThat(v.at("/repair/restoreFrame").toString())
        .isEqualTo("[{\"member\":\"ledger\",\"level\":1,\"bay\":1,\"neededForRigidity\":true}]");
    // the joint moves: lift 1 and every lift above are kept off
    assertThat(v.at("/keepOffZone/lifts").toString()).isEqualTo("[1,2,3]");

    Run text = run("check", map("d.txt", "/\n\\\n/\n").toString(), map("b.txt", "/\n\\\n/\nledger 1 1 missing\n").toString());
    assertThat(text.code()).isEqualTo(1);
    assertThat(text.out()).contains("Verdict: \u25B3 Lost sideways restraint").doesNotContain("Verdict: \u25A0");
    assertThat(text.out().replaceAll("\\s+", " "))
        .contains("standard on line 0 runs unrestrained through level 1 (ledger at level 1, bay 1 not there)")
        .contains("  level 1 #     + ".replaceAll("\\s+", " "));
    Run rack = run("check", map("d.txt", "/\n\\\n/\n").toString(), map("b.txt", "/\n\\\n/\nbeam 1 1 missing\n").toString(),
        "--role", "upright-frame");
    assertThat(rack.out().replaceAll("\\s+", " "))
        .contains("upright on line 0 runs unrestrained through level 1 (horizontal at level 1, bay 1 not there)");
  }

  /** Plane E: 2 lifts x 3 bays, lift 1 bay 1 / and lift 2 bay 3 /, ledger level 1 bay 1 missing: joint (1, 0) only. */
  @Test
  void planeEJointOnTheLeftEndOnlyMoves() throws IOException {
    for (JsonNode s : states(". . /\n/ . .\n", "ledger 1 1 missing\n", 1)) {
      assertThat(s.get("degreesOfFreedom").asInt()).isEqualTo(1);
      assertThat(joints(s.get("movingJoints"))).isEqualTo("1/0");
      assertThat(count(s.get("freedoms"), "lost-restraint")).isEqualTo(1);
    }
  }

  /** Plane G: 1 lift x 3 bays, bay 1 /, ledger level 1 bay 3 missing: joint (1, 3), the right standard's top, held by nothing. */
  @Test
  void planeGTheRightHandStandardsTopIsALooseEnd() throws IOException {
    for (JsonNode s : states("/ . .\n", "ledger 1 3 missing\n", 1)) {
      assertThat(s.get("degreesOfFreedom").asInt()).isEqualTo(1);
      assertThat(joints(s.get("movingJoints"))).isEqualTo("1/3");
      assertThat(count(s.get("freedoms"), "loose-end")).isEqualTo(1);
    }
    Run text = run("check", map("d.txt", "/ . .\n").toString(), map("b.txt", "/ . .\nledger 1 3 missing\n").toString());
    assertThat(text.out()).contains("Verdict: \u25B2 Lost rigidity");
    assertThat(text.out().replaceAll("\\s+", " "))
        .contains("loose end at level 1, line 3: the standard of lift 1 on line 3 is held there by nothing else");
  }

  /** Plane I: 4 lifts x 1 bay, / in every lift, both standards of lift 2 missing: 2 freedoms, lifts 2-4 sway. */
  @Test
  void planeILiftsTwoToFourSway() throws IOException {
    for (JsonNode s : states("/\n/\n/\n/\n", "standard 2 0 missing\nstandard 2 1 missing\n", 1)) {
      assertThat(s.get("degreesOfFreedom").asInt()).isEqualTo(2);
      assertThat(joints(s.get("movingJoints"))).isEqualTo("2/0 2/1 3/0 3/1 4/0 4/1");
      assertThat(count(s.get("freedoms"), "sway")).isEqualTo(2);
    }
    JsonNode v = run("check", map("d.txt", "/\n/\n/\n/\n").toString(),
        map("b.txt", "/\n/\n/\n/\nupright 2 0 ineffective\nstandard 2 1 missing\n").toString(), "--format", "json").json();
    assertThat(v.at("/keepOffZone/lifts").toString()).isEqualTo("[2,3,4]");
    assertThat(v.at("/repair/minimum").asInt()).isEqualTo(2);
  }

  /** Plane F: 2 x 2 free, X in every panel, standard of lift 2 on line 1 missing: 0 freedoms, the crosses make up for it. */
  @Test
  void planeFCrossesMakeUpForTheMissingStandard() throws IOException {
    for (JsonNode s : states("support: free\nX X\nX X\n", "standard 2 1 missing\n", 0)) {
      assertThat(s.get("rigid").asBoolean()).isTrue();
      assertThat(s.get("degreesOfFreedom").asInt()).isZero();
      assertThat(s.get("freedoms")).isEmpty();
      // the frame is incomplete: no blocks (contract)
      assertThat(s.get("blocks")).isEmpty();
    }
  }

  @Test
  void frameMembersNotInspectedAreCountedAndTheVerdictSaysItDependsOnThem() throws IOException {
    Path d = map("d.txt", "/\n\\\n/\n");
    JsonNode v = run("check", d.toString(), map("b.txt", "/\n\\\n/\nledger 1 1 ?\n").toString(), "--format", "json").json();
    assertThat(v.at("/asBuilt/unknownFrameMembers").asInt()).isEqualTo(1);
    assertThat(v.at("/asBuilt/rigid").asBoolean()).isFalse();
    assertThat(v.at("/asBuilt/rigidIfUnknownSound").asBoolean()).isTrue();
    Run text = run("check", d.toString(), dir.resolve("b.txt").toString());
    assertThat(text.code()).isEqualTo(1);
    assertThat(text.out()).contains("Depends on panels not inspected")
        .contains("Frame members not inspected: 1 member (ledger at level 1, bay 1)");
  }

  @Test
  void anAsBuiltMemberWhereTheDesignSaysNoneCounts() throws IOException {
    Path d = map("d.txt", "/\n\\\n/\nledger 1 1 none\n");
    assertThat(run("check", d.toString()).code()).isEqualTo(1);
    Run sound = run("check", d.toString(), map("b.txt", "/\n\\\n/\nledger 1 1 sound\n").toString(), "--format", "json");
    assertThat(sound.code()).isZero();
    // the design's none is never proposed in a repair
    JsonNode design = run("check", d.toString(), "--format", "json").json();
    assertThat(design.at("/repair/members")).isEmpty();
  }

  static Stream<Arguments> badFrameLines() {
    return Stream.of(
        Arguments.of("design", "/ .\nledger 2 1 none\n", 2, 8, "LEVEL 2 is outside the plane"),
        Arguments.of("as-built", "/ .\nstandard 1 3 missing\n", 2, 12, "LINE 3 is outside the plane"),
        Arguments.of("as-built", "/ .\ngirder 1 1 missing\n", 2, 1, "unknown frame member 'girder'"),
        Arguments.of("as-built", "/ .\nledger 1 1 bent\n", 2, 12, "unknown state 'bent'"),
        Arguments.of("as-built", "/ .\nledger 1 1 none\n", 2, 12, "'none' is a design state"),
        Arguments.of("design", "/ .\nledger 1 1 missing\n", 2, 12, "'missing' is an as-built state"),
        Arguments.of("as-built", "/ .\nledger 1 1 ?\nbeam 1 1 sound\n", 3, 1, "given twice (first on line 2)"),
        Arguments.of("design", "ledger 1 1 none\n/ .\n", 1, 1, "frame line before the grid"),
        Arguments.of("as-built", ". .\nledger 1 1 missing\n/ .\n", 2, 1, "frame line between grid rows"),
        Arguments.of("as-built", "/ .\nledger 1 1\n", 2, 11, "too few fields"),
        Arguments.of("design", "/ .\nledger 1 1 none none\n", 2, 17, "too many fields"));
  }

  @ParameterizedTest
  @MethodSource("badFrameLines")
  void aBadFrameLineExitsTwoWithALocatedMessageAndNothingOnStdout(
      String which, String text, int line, int column, String says) throws IOException {
    boolean design = which.equals("design");
    Path bad = map("bad.txt", text);
    Path good = map("good.txt", design ? ". .\n" : "/ .\n. .\n".substring(0, 4));
    Run r = design
        ? run("check", bad.toString(), "--format", "json")
        : run("check", good.toString(), bad.toString(), "--format", "json");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(bad + ":" + line + ":" + column + ": ").contains(says);
  }
}
