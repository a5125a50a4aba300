package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;
import org.bracewalk.app.DemoService;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every text file the command line reads means the same whatever its line ends (LF, CRLF, or a
 * bare CR as classic Mac OS wrote them: the three in common practice), refuses other separators
 * at their line and column, and is bounded before it is read: {@code /dev/zero} is refused with
 * exit 2, not read until memory runs out.
 */
class LineEndsAndBoundsTest {
  private static final ObjectMapper JSON = new ObjectMapper();
  private static final Path FRAME_2_FOUND = Path.of("demo-site/maps/racking-frame-2.after-impact.txt");
  private static final Path FRAME_2_DESIGN = Path.of("demo-site/maps/racking-frame-2.design.txt");

  @TempDir Path dir;

  private final AppContext context =
      new AppContext(
          // after the demo's inspections: a design recorded before a finalised inspection's finish
          // would be back-dated, which the database refuses
          new Fixtures.SteppingClock(java.time.Instant.parse("2025-03-10T08:00:00Z")),
          PlaneAnalyzer.standard());

  private Run run(String... args) {
    return Commands.run(context, Map.of("BRACEWALK_LOG_DIR", dir.resolve("logs").toString()), args);
  }

  private String db() {
    return dir.resolve("site.db").toString();
  }

  /** The file with its LF line ends replaced by {@code end}. */
  private Path withLineEnds(Path lf, String end, String name) throws Exception {
    String text = Files.readString(lf);
    assertThat(text).doesNotContain("\r");
    Path p = dir.resolve(name);
    Files.writeString(p, text.replace("\n", end), StandardCharsets.UTF_8);
    return p;
  }

  /** Frame 2 as found after the impact, grid lines only (how the attack's file was written). */
  private Path gridOnly(String end, String name) throws Exception {
    StringBuilder b = new StringBuilder();
    for (String line : Files.readAllLines(FRAME_2_FOUND)) {
      if (!line.startsWith("#") && !line.contains(":") && !frameLine(line)) {
        b.append(line).append(end);
      }
    }
    Path p = dir.resolve(name);
    Files.writeString(p, b.toString(), StandardCharsets.UTF_8);
    return p;
  }

  /** A frame line of a map ({@code ledger 1 1 missing}): an as-built state, refused by a design map. */
  private static boolean frameLine(String line) {
    return line.startsWith("ledger ") || line.startsWith("standard ");
  }

  /** Frame 2 as found, without its frame lines: read alone, a map is a design map. */
  private Path foundAsDesign() throws Exception {
    Path p = dir.resolve("found-design.txt");
    Files.write(p, Files.readAllLines(FRAME_2_FOUND).stream().filter(l -> !frameLine(l)).toList());
    return p;
  }

  @Test
  void frame2AfterTheImpactReadsAsFiveLiftsThatLostRigidityWhateverItsLineEnds() throws Exception {
    JsonNode expected = null;
    Path found = foundAsDesign();
    for (String end : new String[] {"\n", "\r\n", "\r"}) {
      for (Path map : new Path[] {withLineEnds(found, end, "found.txt"), gridOnly(end, "grid.txt")}) {
        Run r = run("check", map.toString(), "--format", "json");
        String as = map.getFileName() + " with " + end.replace("\r", "CR").replace("\n", "LF");
        assertThat(r.code()).as(as + ": " + r.err()).isEqualTo(1);
        JsonNode v = JSON.readTree(r.out());
        assertThat(v.get("lifts").asInt()).as(as).isEqualTo(5);
        assertThat(v.get("bays").asInt()).as(as).isEqualTo(1);
        assertThat(v.at("/design/rigid").asBoolean()).as(as).isFalse();
        if (expected == null) {
          expected = v;
        }
        assertThat(v).as(as).isEqualTo(expected);
      }
    }
  }

  @Test
  void theDesignAndTheAsBuiltMapWithDifferentLineEndsGiveTheSameVerdictAsWithLf() throws Exception {
    Run lf = run("check", FRAME_2_DESIGN.toString(), FRAME_2_FOUND.toString(), "--format", "json");
    Run mixed = run("check", withLineEnds(FRAME_2_DESIGN, "\r", "d.txt").toString(),
        withLineEnds(FRAME_2_FOUND, "\r\n", "a.txt").toString(), "--format", "json");
    assertThat(lf.code()).as(lf.err()).isEqualTo(1);
    assertThat(mixed.code()).as(mixed.err()).isEqualTo(1);
    assertThat(JSON.readTree(mixed.out())).isEqualTo(JSON.readTree(lf.out()));
  }

  static Stream<Arguments> separators() {
    return Stream.of(
        Arguments.of("\u000B", "vertical tab"),
        Arguments.of("\f", "form feed"),
        Arguments.of("\u2028", "line separator (U+2028)"),
        Arguments.of("\u2029", "paragraph separator (U+2029)"),
        Arguments.of("\0", "NUL"));
  }

  @ParameterizedTest
  @MethodSource("separators")
  void anotherSeparatorInAMapIsRefusedAtItsLineAndColumn(String separator, String named)
      throws Exception {
    // the grid of frame 2 with the separator in place of the line end after lift 4's brace
    String grid = String.join("\n", "/", "\\", "/" + separator + ".", ".", "") ;
    Path map = dir.resolve("sep.txt");
    Files.writeString(map, grid, StandardCharsets.UTF_8);
    Run r = run("check", map.toString(), "--format", "json");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith(map + ":3:2: ").contains(named);
  }

  @Test
  void planeCreateFromAMapWithCrLineEndsStoresFiveLiftsByOneBay() throws Exception {
    assertThat(run("demo", "--db", db()).code()).isZero();
    Path cr = withLineEnds(FRAME_2_DESIGN, "\r", "frame2-cr.txt");
    Run plane = run("plane", "create", "--db", db(), "--structure", "1", "--name", "frame 2 copy",
        "--design", cr.toString());
    assertThat(plane.code()).as(plane.err()).isZero();
    assertThat(plane.out()).contains("'frame 2 copy' (5 lifts x 1 bay, pinned-base)");
    Path vt = dir.resolve("frame2-vt.txt");
    Files.writeString(vt, Files.readString(FRAME_2_DESIGN).replace("heights", "\u000Bheights"));
    Run refused = run("plane", "create", "--db", db(), "--structure", "1", "--name", "frame 2 vt",
        "--design", vt.toString());
    assertThat(refused.code()).isEqualTo(2);
    assertThat(refused.err()).contains(vt + ":4:1: ").contains("vertical tab");
    assertThat(run("plane", "list", "--db", db(), "--structure", "1").out())
        .contains("frame 2 copy").doesNotContain("frame 2 vt");
  }

  @Test
  void aCsvWithCrLineEndsRecordsTheSameRowsAsWithLf() throws Exception {
    assertThat(run("demo", "--db", db()).code()).isZero();
    assertThat(run("inspection", "start", "--db", db(), "--structure", "1", "--inspector",
        "Priya Danvers", "--reason", "routine").code()).isZero();
    String rows = "plane,lift,bay,state,note\n"
        + "frame 2,1,1,sound,\"two\nlines\"\n"
        + "frame 2,2,1,missing,gone\n";
    Path lf = dir.resolve("lf.csv");
    Files.writeString(lf, rows);
    Path cr = dir.resolve("cr.csv");
    Files.writeString(cr, rows.replace("\n", "\r"));
    Run a = run("record", "--db", db(), "--inspection", "4", "--from", lf.toString());
    Run b = run("record", "--db", db(), "--inspection", "4", "--from", cr.toString());
    assertThat(a.code()).as(a.err()).isZero();
    assertThat(b.code()).as(b.err()).isZero();
    assertThat(a.out().lines().map(l -> l.replaceAll("observation \\d+", "observation N")).toList())
        .hasSize(2)
        .isEqualTo(b.out().lines().map(l -> l.replaceAll("observation \\d+", "observation N")).toList());
    Path ff = dir.resolve("ff.csv");
    Files.writeString(ff, "plane,lift,bay,state\r\nframe 2,1,1,sound\fframe 2,2,1,sound\r\n");
    Run refused = run("record", "--db", db(), "--inspection", "4", "--from", ff.toString());
    assertThat(refused.code()).isEqualTo(2);
    assertThat(refused.err()).contains(ff + ", line 2 (at column 18): a form feed");
  }

  @Test
  void aSiteFileWithARawLineSeparatorIsRefusedAtItsLine() throws Exception {
    String text = DemoService.siteFileText();
    int line = (int) text.substring(0, text.indexOf("no diagonal seen")).chars().filter(c -> c == '\n').count() + 1;
    Path bad = dir.resolve("bad.json");
    Files.writeString(bad, text.replace("no diagonal seen", "no diagonal\u2028seen"));
    Run r = run("import", "--db", db(), "--site", bad.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: " + bad + ", line " + line + " (at column ")
        .contains("a line separator (U+2028)");
    assertThat(r.out()).isEmpty();
  }

  @Test
  void aNoteHoldingALineSeparatorIsExportedEscapedAndReadsBack() throws Exception {
    Path escaped = dir.resolve("escaped.json");
    Files.writeString(escaped, DemoService.siteFileText()
        .replace("no diagonal seen", "no diagonal\\u2028seen"));
    assertThat(run("import", "--db", db(), "--site", escaped.toString()).code()).isZero();
    Run exported = run("export", "--db", db(), "--site", "1");
    assertThat(exported.out()).doesNotContain("\u2028").contains("no diagonal\\u2028seen");
    Path again = dir.resolve("again.json");
    Files.writeString(again, exported.out());
    Run back = run("import", "--db", dir.resolve("other.db").toString(), "--site", again.toString());
    assertThat(back.code()).as(back.err()).isZero();
  }

  @Test
  void checkOfDevZeroIsRefusedQuicklyWithTheLimitNamed() {
    Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")), "no /dev/zero here");
    long start = System.nanoTime();
    Run r = run("check", "/dev/zero");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).startsWith("/dev/zero: is not a regular file and gives more than the 64 MiB"
        + " a panel map may have");
    assertThat(System.nanoTime() - start).isLessThan(10_000_000_000L);
  }

  @Test
  void recordFromDevZeroIsRefusedAndRecordsNothing() {
    Assumptions.assumeTrue(Files.exists(Path.of("/dev/zero")), "no /dev/zero here");
    assertThat(run("demo", "--db", db()).code()).isZero();
    assertThat(run("inspection", "start", "--db", db(), "--structure", "1", "--inspector",
        "Priya Danvers", "--reason", "routine").code()).isZero();
    Run r = run("record", "--db", db(), "--inspection", "4", "--from", "/dev/zero");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: /dev/zero: is not a regular file and gives more than"
        + " the 64 MiB an observation CSV may have");
    assertThat(run("inspection", "show", "--db", db(), "--inspection", "4").out())
        .contains("0 observations");
  }

  @Test
  void planeCreateWithTwoBillionLiftsIsRefusedNamingTheLimit() {
    assertThat(run("demo", "--db", db()).code()).isZero();
    Run r = run("plane", "create", "--db", db(), "--structure", "1", "--name", "typo",
        "--lifts", "2000000000", "--bays", "1");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("2000000000 lifts x 1 bay is larger than the limit of 100 lifts x"
        + " 500 bays").contains("(field --lifts)");
  }

  @Test
  void aSiteFileHoldingAPhotoOfTheLargestSizeAllowedImports() throws Exception {
    // base64 of a 20 MiB photo is about 28 million characters: more than the 20 million Jackson
    // accepts in one string by default (StreamReadConstraints, jackson-core docs)
    byte[] photo = new byte[org.bracewalk.core.model.Photo.MAX_BYTES];
    byte[] png = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1A, '\n'};
    System.arraycopy(png, 0, photo, 0, png.length);
    String text = DemoService.siteFileText();
    int start = text.indexOf("\"data\": \"") + 9;
    int end = text.indexOf('"', start);
    Path big = dir.resolve("big-photo.json");
    Files.writeString(big, text.substring(0, start)
        + java.util.Base64.getEncoder().encodeToString(photo) + text.substring(end));
    Run r = run("import", "--db", db(), "--site", big.toString());
    assertThat(r.code()).as(r.err()).isZero();
  }

  @Test
  void verifyReportOfAThreeGigabyteFileIsRefusedFromItsSize() throws Exception {
    assertThat(run("demo", "--db", db()).code()).isZero();
    Path big = dir.resolve("big.pdf");
    try (java.io.RandomAccessFile f = new java.io.RandomAccessFile(big.toFile(), "rw")) {
      f.setLength(3L << 30); // sparse: no memory and almost no disk
    }
    Run r = run("verify-report", "--db", db(), big.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: " + big + ": is 3221225472 bytes, more than the 1 GiB"
        + " a Bracewalk document may have");
  }
}
