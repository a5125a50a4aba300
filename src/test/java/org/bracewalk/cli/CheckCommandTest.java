package org.bracewalk.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;
import org.bracewalk.boot.Launcher;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** {@code bracewalk check}, driven through the launcher over string writers. */
class CheckCommandTest {
  private static final ObjectMapper JSON = new ObjectMapper();

  @TempDir Path dir;
  private Path design;
  private Path asBuilt;

  record Run(int code, String out, String err) {}

  static Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), Map.of());
    return new Run(code, out.toString(), err.toString());
  }

  static String resource(String name) throws IOException {
    try (InputStream in = CheckCommandTest.class.getResourceAsStream(name)) {
      return new String(in.readAllBytes(), StandardCharsets.UTF_8);
    }
  }

  @BeforeEach
  void writeTheContractExample() throws IOException {
    design = Files.writeString(dir.resolve("north.design.txt"), resource("contract-example.design.txt"));
    asBuilt = Files.writeString(dir.resolve("north.as-built.txt"), resource("contract-example.as-built.txt"));
  }

  private Path map(String name, String text) throws IOException {
    return Files.writeString(dir.resolve(name), text);
  }

  /** The contract's fields only: drops what this implementation adds (the contract allows adding). */
  private static JsonNode contractFields(JsonNode verdict) {
    ObjectNode copy = verdict.deepCopy();
    copy.remove("caution");
    copy.remove("keepOff");
    copy.remove("keepOffZone");
    for (String state : new String[] {"design", "asBuilt"}) {
      if (copy.has(state)) {
        // lossToleranceExact and freedoms are this implementation's; the frame-member fields are the
        // contract's "Frame members" section, checked on frame maps (CheckFrameMembersTest)
        ((ObjectNode) copy.get(state)).remove(
            java.util.List.of("lossToleranceExact", "freedoms", "criticalMembers", "movingJoints",
                "unknownFrameMembers"));
      }
    }
    ((ObjectNode) copy.get("repair")).remove(java.util.List.of("members", "restoreFrame"));
    return copy;
  }

  @Test
  void theContractExampleGivesExactlyTheContractJsonAndExitsOne() throws IOException {
    Run r = run("check", design.toString(), asBuilt.toString(), "--format", "json");

    assertThat(r.code()).isEqualTo(1);
    assertThat(r.err()).isEmpty();
    assertThat(r.out()).endsWith("}\n");
    JsonNode actual = JSON.readTree(r.out());
    // check-contract.md, "JSON output": the example verbatim
    JsonNode expected = JSON.readTree(resource("contract-example.expected.json"));
    assertThat(contractFields(actual)).isEqualTo(expected);
    assertThat(actual.get("caution").asText()).contains("does not check the strength of members");
    // check-contract.md "Frame members": the added fields are there for a map without frame lines,
    // and say the frame is whole: nothing unknown, nothing of the frame to restore or fit
    assertThat(actual.at("/asBuilt/unknownFrameMembers").asInt(-1)).isZero();
    assertThat(actual.at("/repair/members").isArray()).isTrue();
    assertThat(actual.at("/repair/members")).isEmpty();
    assertThat(actual.at("/repair/restoreFrame")).isEmpty();
    for (String state : new String[] {"/design", "/asBuilt"}) {
      assertThat(actual.at(state + "/criticalMembers").isArray()).as(state).isTrue();
      assertThat(actual.at(state + "/movingJoints").isArray()).as(state).isTrue();
      assertThat(actual.at(state + "/freedoms").isArray()).as(state).isTrue();
    }
    // added field keepOffZone: lift 3 sways on a pinned base, so lift 4 above it is carried
    // sideways with it (shared/design/analysis.md): the zone is lifts 3-4, every bay
    assertThat(actual.get("keepOffZone")).isEqualTo(JSON.readTree(
        "{\"lifts\": [3, 4], \"bays\": [1, 2, 3, 4, 5], \"offloadBeside\": false}"));
    assertThat(actual.get("keepOff").asText()).isEqualTo(
        "Keep people and loads off lifts 3, 4, bays 1-5 until a competent person has acted.");
  }

  @Test
  void theContractExampleAsTextIsTheReadableVerdict() throws IOException {
    Run r = run("check", design.toString(), asBuilt.toString());

    assertThat(r.code()).isEqualTo(1);
    assertThat(r.err()).isEmpty();
    String expected =
        resource("contract-example.expected.txt")
            .replace("{DESIGN}", design.toString())
            .replace("{AS_BUILT}", asBuilt.toString());
    assertThat(r.out()).isEqualTo(expected);
  }

  /**
   * Common practice (racking, no published source checked): the beams of the bays on both sides of
   * an upright frame load it, so those bays are offloaded with it.
   */
  @Test
  void theRoleOfAnUprightFrameAddsTheBeamBaysBesideItToTheKeepOffZone() throws IOException {
    Run frame = run("check", design.toString(), asBuilt.toString(), "--format", "json", "--role", "upright-frame");
    assertThat(frame.code()).isEqualTo(1);
    JsonNode v = JSON.readTree(frame.out());
    assertThat(v.at("/keepOffZone/offloadBeside").asBoolean()).isTrue();
    assertThat(v.get("keepOff").asText()).contains("off-load the beam bays on both sides of this upright frame");
    // the contract's fields do not change with the role
    assertThat(contractFields(v)).isEqualTo(JSON.readTree(resource("contract-example.expected.json")));
    Run text = run("check", design.toString(), asBuilt.toString(), "--role", "upright-frame");
    assertThat(text.out().replaceAll("\\s+", " ")).contains("off-load the beam bays on both sides of this upright frame");
    Run bad = run("check", design.toString(), "--role", "shelf");
    assertThat(bad.code()).isEqualTo(2);
    assertThat(bad.out()).isEmpty();
    assertThat(bad.err()).contains("--role").contains("unknown plane role 'shelf'");
  }

  @Test
  void aRigidDesignOnItsOwnExitsZeroWithAnEmptyRepair() throws IOException {
    Run r = run("check", design.toString(), "--format", "json");

    assertThat(r.code()).isZero();
    JsonNode v = JSON.readTree(r.out());
    assertThat(v.has("asBuilt")).isFalse();
    assertThat(v.get("design").get("rigid").asBoolean()).isTrue();
    assertThat(v.get("repair").get("braces")).isEmpty();
    assertThat(v.get("repair").get("minimum").asInt()).isZero();
    assertThat(v.has("keepOff")).isFalse();
    assertThat(v.has("keepOffZone")).isFalse();
  }

  @Test
  void theSupportOptionOverridesTheHeaderAndTheOutputSaysWhichWasUsed() throws IOException {
    Run json = run("check", design.toString(), "--support", "free", "--format", "json");
    Run text = run("check", design.toString(), "--support", "free");

    // free, the example's 6 braces on 4 + 5 vertices leave 9 - 1 - ... components: not rigid
    assertThat(json.code()).isEqualTo(1);
    JsonNode v = JSON.readTree(json.out());
    assertThat(v.get("support").asText()).isEqualTo("free");
    assertThat(v.get("design").get("blocks").findValues("fixed")).allMatch(f -> !f.asBoolean());
    assertThat(text.out()).contains("support used: free (chosen with --support)");
  }

  @Test
  void theTextVerdictCarriesTheStandingCautionAndNeverCallsThePlaneSafe() throws IOException {
    Run rigid = run("check", design.toString());
    Run lost = run("check", design.toString(), asBuilt.toString());

    for (Run r : new Run[] {rigid, lost}) {
      assertThat(r.out())
          .contains("It does not check the strength of members, connections, ties,")
          .contains("licensed engineer")
          .doesNotContainIgnoringCase("safe");
    }
    assertThat(rigid.out()).contains("As designed: holds its shape.").doesNotContain("Keep people");
    assertThat(lost.out())
        .contains("As built: has lost rigidity: 1 independent motion.")
        .contains("Keep people and loads off lifts 3, 4, bays 1-5 until a competent person has acted.");
  }

  @Test
  void aRepairOutsideTheDesignIsFlaggedForEngineeringApproval() throws IOException {
    // pinned base, lift 2 has no design brace at all: the repair must use a panel the design leaves empty
    Path d = map("d.txt", ". .\n/ .\n");
    Run r = run("check", d.toString());

    assertThat(r.code()).isEqualTo(1);
    assertThat(r.out())
        .contains("As designed: has lost rigidity: 1 independent motion.")
        .contains("lift 2 bay 1: / rigid - NOT IN THE DESIGN: a deviation that needs engineering approval");
  }

  @Test
  void uninspectedPanelsAreCountedAsMissingAndTheTextSaysTheVerdictDependsOnThem() throws IOException {
    Path a = map("a.txt", ". / . . \\\n. . ? . .\n/ . . X .\n. / . . .\n");
    Run r = run("check", design.toString(), a.toString());

    assertThat(r.code()).isEqualTo(1);
    assertThat(r.out())
        .contains("Not inspected: 1 panel (lift 3 bay 3), counted as missing.")
        .contains("this verdict depends on a panel nobody has looked at")
        // the picture marks the uninspected panel's design brace as the repair
        .containsPattern("lift 3 +A \\.  A \\.  A\\+/");
    JsonNode v = JSON.readTree(run("check", design.toString(), a.toString(), "--format", "json").out());
    assertThat(v.get("asBuilt").get("unknownPanels").asInt()).isEqualTo(1);
    assertThat(v.get("asBuilt").get("rigidIfUnknownSound").asBoolean()).isTrue();
  }

  static Stream<Arguments> badInputs() {
    return Stream.of(
        // which file is bad, its text, line, column, what the message says
        Arguments.of("design", "colour: red\n/ .\n", 1, 1, "unknown header key 'colour'"),
        Arguments.of("design", "support: fixed\n/ .\n", 1, 10, "support must be pinned-base (every base joint held) or free"),
        Arguments.of("design", "widths: 2.4 x\n/ .\n", 1, 13, "'x' is not a number"),
        Arguments.of("design", "widths: 2.4\n/ .\n", 1, 12, "1 value for 2 bays"),
        Arguments.of("design", "/ . .\n. /\n", 2, 4, "has 2 panels but the first grid line (line 1) has 3"),
        Arguments.of("design", "/ . Z\n", 1, 5, "unknown panel token 'Z'"),
        Arguments.of("design", "/ ?\n", 1, 3, "'?' (not inspected) belongs in as-built maps only"),
        Arguments.of("asBuilt", "/ o\n/ .\n/ .\n. /\n", 1, 3, "'o' (opening) belongs in design maps only"),
        Arguments.of("design", "# empty\n", 1, 8, "the map has no grid"),
        Arguments.of("asBuilt", ". / . . \\\n/ . . X .\n. / . . .\n", 1, 1,
            "the as-built map has 3 lifts (grid lines) but the design"),
        Arguments.of("asBuilt", ". / . .\n. . . .\n/ . . X\n. / . .\n", 1, 8,
            "the as-built map has 4 bays per line but the design"),
        Arguments.of("asBuilt", "support: free\n. / . . \\\n. . . . .\n/ . . X .\n. / . . .\n", 1, 10,
            "support is free here but pinned-base for the design"),
        Arguments.of("asBuilt", "widths: 1 1 1 1 1\n. / . . \\\n. . . . .\n/ . . X .\n. / . . .\n", 1, 9,
            "widths differ from those of the design"));
  }

  @ParameterizedTest
  @MethodSource("badInputs")
  void badInputExitsTwoWithALocatedMessageAndNothingOnStdout(
      String which, String text, int line, int column, String says) throws IOException {
    Path bad = map("bad.txt", text);
    Run r =
        which.equals("design")
            ? run("check", bad.toString(), "--format", "json")
            : run("check", design.toString(), bad.toString(), "--format", "json");

    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(bad + ":" + line + ":" + column + ": ").contains(says);
  }

  @Test
  void aFileThatIsNotUtf8IsLocatedToTheBadByte() throws IOException {
    Path bad = dir.resolve("latin1.txt");
    Files.write(bad, new byte[] {'/', ' ', '.', '\n', '.', ' ', (byte) 0xE9, '\n'});
    Run r = run("check", bad.toString());

    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(bad + ":2:3: ").contains("not UTF-8");
  }

  @Test
  void aMissingFileIsNamedAndNothingIsPrintedOnStdout() {
    Path missing = dir.resolve("nowhere.txt");
    Run r = run("check", missing.toString(), "--format", "text");

    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(missing + ": no such file");
  }

  @Test
  void usageErrorsOfTheCommandLineAlsoExitTwoWithNothingOnStdout() {
    for (String[] args :
        new String[][] {
          {"check"},
          {"check", design.toString(), "--support", "bolted"},
          {"check", design.toString(), "--format", "xml"},
          {"check", design.toString(), "--colour"},
          {"check", "a", "b", "c"},
          {"nonsense"},
          {}
        }) {
      Run r = run(args);
      assertThat(r.code()).as(String.join(" ", args)).isEqualTo(2);
      assertThat(r.out()).as(String.join(" ", args)).isEmpty();
      assertThat(r.err()).as(String.join(" ", args)).isNotEmpty();
    }
  }

  @Test
  void theRootHelpListsEveryCommand() {
    Run r = run("--help");

    assertThat(r.code()).isZero();
    assertThat(r.out()).contains("Commands:").contains("  check ").contains("  bench ");
  }
}
