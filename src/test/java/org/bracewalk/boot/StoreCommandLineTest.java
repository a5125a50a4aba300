package org.bracewalk.boot;

import org.bracewalk.boot.Commands.Run;
import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.DemoService;
import org.bracewalk.app.Fixtures;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The store commands, driven through {@link Launcher} over string writers. */
class StoreCommandLineTest {
  @TempDir Path dir;

  private final AppContext context =
      new AppContext(new Fixtures.SteppingClock(), PlaneAnalyzer.standard());

  private Run run(Map<String, String> env, String... args) {
    return Commands.run(context, env, args);
  }

  private Run run(String... args) {
    return run(Map.of(), args);
  }

  private String db() {
    return dir.resolve("site.db").toString();
  }

  @Test
  void everyCommandHasHelp() {
    List<String[]> paths = new ArrayList<>();
    collect(Launcher.commandLine(Map.of(), context), new ArrayList<>(), paths);
    assertThat(paths).hasSizeGreaterThan(12);
    for (String[] path : paths) {
      String[] args = java.util.Arrays.copyOf(path, path.length + 1);
      args[path.length] = "--help";
      Run r = run(args);
      assertThat(r.code()).as(String.join(" ", args)).isZero();
      assertThat(r.out()).as(String.join(" ", args)).contains("Usage: bracewalk");
    }
  }

  private static void collect(CommandLine c, List<String> prefix, List<String[]> out) {
    for (var e : c.getSubcommands().entrySet()) {
      List<String> p = new ArrayList<>(prefix);
      p.add(e.getKey());
      out.add(p.toArray(String[]::new));
      collect(e.getValue(), p, out);
    }
  }

  @Test
  void demoLoadsIntoAFreshDatabaseAndSaysWhereAndWhat() {
    Run r = run("demo", "--db", db());
    assertThat(r.code()).as(r.err()).isZero();
    assertThat(r.err().lines().findFirst()).contains("database: " + db());
    assertThat(r.out())
        .contains("site 1: Larkspur Depot")
        .contains("inspection 1: routine, finalised")
        .contains("inspection 2: after-impact, finalised");
    Run again = run("demo", "--db", db());
    assertThat(again.code()).isEqualTo(2);
    assertThat(again.err()).contains("already holds 1 site");
    Run replaced = run("demo", "--db", db(), "--replace");
    assertThat(replaced.code()).as(replaced.err()).isZero();
    assertThat(replaced.out()).contains("inspection 2: after-impact");
  }

  @Test
  void replaceDeletesOnlyDatabaseFiles() throws Exception {
    Path notes = dir.resolve("notes.txt");
    Files.writeString(notes, "not a database");
    Run r = run("demo", "--db", notes.toString(), "--replace");
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("is not a SQLite database");
    assertThat(Files.readString(notes)).isEqualTo("not a database");
  }

  @Test
  void theDatabaseComesFromBracewalkDbWhenNoOptionIsGiven() {
    Path file = dir.resolve("from-env.db");
    Run r = run(Map.of("BRACEWALK_DB", file.toString()), "site", "list");
    assertThat(r.code()).as(r.err()).isZero();
    assertThat(r.err()).startsWith("database: " + file);
    assertThat(Files.exists(file)).isTrue();
    assertThat(r.out()).contains("no sites yet");
  }

  @Test
  void recordOneObservationByOptionsThenFinaliseThenNoMore() {
    run("demo", "--db", db());
    Run start = run("inspection", "start", "--db", db(), "--structure", "1", "--inspector",
        "Priya Danvers", "--reason", "after-alteration");
    assertThat(start.out()).contains("inspection 4 started");
    Run rec = run("record", "--db", db(), "--inspection", "4", "--plane", "frame 2", "--lift",
        "1", "--bay", "1", "--state", "damaged-effective", "--bow", "10.0", "--gauge", "1000",
        "--defect", "bent");
    assertThat(rec.code()).as(rec.err()).isZero();
    assertThat(rec.out()).contains("observation 124 recorded: frame 2, lift 1, bay 1, damaged-effective, bow 10.0 mm over 1000 mm");
    Path photo = dir.resolve("gauge.jpg");
    try {
      Files.write(photo, new byte[] {(byte) 0xFF, (byte) 0xD8, (byte) 0xFF, 1, 2, 3});
    } catch (java.io.IOException e) {
      throw new java.io.UncheckedIOException(e);
    }
    Run fix = run("record", "--db", db(), "--inspection", "4", "--plane", "frame 2", "--lift",
        "1", "--bay", "1", "--state", "sound", "--supersedes", "124", "--reason", "misread gauge",
        "--photo", photo.toString());
    assertThat(fix.out()).contains("observation 125 recorded").contains("corrects observation 124")
        .contains("photo 2 attached to observation 125: gauge.jpg (6 bytes, image/jpeg)");
    assertThat(run("finalise", "--db", db(), "--inspection", "4").code()).isZero();
    Run refused = run("record", "--db", db(), "--inspection", "4", "--plane", "spine", "--lift",
        "1", "--bay", "1", "--state", "sound");
    assertThat(refused.code()).isEqualTo(2);
    assertThat(refused.err()).contains("error: inspection 4 is finalised and cannot be changed");
    assertThat(run("inspection", "show", "--db", db(), "--inspection", "4").out())
        .contains("corrects 124: misread gauge");
  }

  @Test
  void aBadSiteFileIsRefusedWithItsLineAndTheDatabaseIsUntouched() throws Exception {
    run("demo", "--db", db());
    Path bad = dir.resolve("bad.json");
    Files.writeString(bad, DemoService.siteFileText().replace("\"kind\": \"scaffold\"",
        "\"kind\": \"tower\""));
    byte[] before = Files.readAllBytes(Path.of(db()));
    Run r = run("import", "--db", db(), "--site", bad.toString());
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err()).contains("error: " + bad + ", line ").contains("field \"kind\"")
        .contains("'tower'");
    assertThat(r.out()).isEmpty();
    assertThat(Files.readAllBytes(Path.of(db()))).isEqualTo(before);
  }

  @Test
  void exportToAFileThenImportIntoAnEmptyDatabaseGivesTheSameSite() throws Exception {
    run("demo", "--db", db());
    Path file = dir.resolve("out/site.json");
    assertThat(run("export", "--db", db(), "--site", "1", "--to", file.toString()).code()).isZero();
    String other = dir.resolve("other.db").toString();
    Run imported = run("import", "--db", other, "--site", file.toString());
    assertThat(imported.code()).as(imported.err()).isZero();
    assertThat(imported.out()).contains("inspection 2: after-impact");
    assertThat(run("export", "--db", other, "--site", "1").out()).isEqualTo(Files.readString(file));
    assertThat(run("export", "--db", other, "--inspection", "2").out())
        .startsWith("plane,lift,bay,state,member,bow_mm");
  }

  @Test
  void historyShowsWhatChangedInThePlaneHitByTheForklift() {
    run("demo", "--db", db());
    Run r = run("history", "--db", db(), "--plane", "2");
    assertThat(r.code()).as(r.err()).isZero();
    assertThat(r.out())
        .contains("plane 2 'frame 2'")
        .contains("inspection 1 (routine")
        .contains("design revision 1: \u25a0 Holds its shape; 5 of 5 panels inspected")
        .contains("inspection 2 (after-impact")
        .contains("\u25b2 Lost rigidity, 4 degrees of freedom (Keep people and loads off lifts 1-5, bay 1")
        .contains("lift 1, bay 1: sound -> damaged-ineffective")
        .contains("lift 2, bay 1: sound -> damaged-ineffective")
        // the frame members recorded in the after-impact inspection, not recorded before
        .contains("ledger at level 1, bay 1: not recorded (as designed) -> missing")
        .contains("standard of lift 1 on line 0: not recorded (as designed) -> damaged-ineffective");
  }

  @Test
  void theInspectionIntervalOfAStructureCanBeSetAndMovesTheNextDueDate() {
    run("demo", "--db", db());
    // the racking run's last finalised inspection finished on 2025-03-05 (demo site file)
    Run monthly = run("structure", "interval", "--db", db(), "--structure", "1", "--days", "30");
    assertThat(monthly.code()).as(monthly.err()).isZero();
    assertThat(monthly.out()).contains("every 30 days; next due 2025-04-04");
    assertThat(run("structure", "list", "--db", db(), "--site", "1").out())
        .contains("inspection due 2025-04-04");
    // WAHR 2005 reg. 12: a scaffold platform is inspected at least every 7 days (trade-facts.md)
    Run scaffold = run("structure", "interval", "--db", db(), "--structure", "2", "--days", "14");
    assertThat(scaffold.code()).isZero();
    assertThat(scaffold.err()).contains("7 days").contains("reg. 12");
    Run none = run("structure", "interval", "--db", db(), "--structure", "2", "--days", "0");
    assertThat(none.code()).isEqualTo(2);
    assertThat(none.err()).contains("days between inspections").contains("1 to 366");
    Run unknown = run("structure", "interval", "--db", db(), "--structure", "99", "--days", "7");
    assertThat(unknown.code()).isEqualTo(2);
    assertThat(unknown.err()).contains("structure 99");
  }

  @Test
  void theIntervalNoteCitesTheRulesOfTheSitesOwnJurisdictionOnly() {
    // US: a competent person inspects a scaffold before each shift (29 CFR 1926.451(f)(3), read;
    // trade-facts.md); the UK's reg. 12 is not named for a US site
    assertThat(run("site", "create", "--db", db(), "--name", "Quay", "--jurisdiction", "us").code())
        .isZero();
    Run us = run("structure", "create", "--db", db(), "--site", "1", "--name", "Quay scaffold",
        "--kind", "scaffold");
    assertThat(us.code()).as(us.err()).isZero();
    assertThat(us.err()).contains("before each shift").contains("29 CFR 1926.451(f)(3)")
        .doesNotContain("Work at Height").doesNotContain("reg. 12");
    Run daily = run("structure", "interval", "--db", db(), "--structure", "1", "--days", "1");
    assertThat(daily.err()).doesNotContain("note:");
    // a site with no jurisdiction recorded: no rule named, the local codes decide
    run("site", "create", "--db", db(), "--name", "Yard");
    run("structure", "create", "--db", db(), "--site", "2", "--name", "Yard scaffold",
        "--kind", "scaffold");
    Run other = run("structure", "interval", "--db", db(), "--structure", "2", "--days", "14");
    assertThat(other.code()).isZero();
    assertThat(other.err()).contains("The site records no jurisdiction")
        .contains("local codes that apply").doesNotContain("Work at Height")
        // (the section's number, not "1926" alone: the temporary folder's name may hold it)
        .doesNotContain("reg. 12").doesNotContain("1926.45").doesNotContain("CFR")
        .doesNotContain("HSG76")
        .doesNotContain("EN 15635");
  }

  @Test
  void listsShowSitesStructuresPlanesAndInspections() {
    run("demo", "--db", db());
    assertThat(run("site", "list", "--db", db()).out()).contains("site 1: Larkspur Depot");
    assertThat(run("structure", "list", "--db", db(), "--site", "1").out())
        .contains("structure 1: Aisle C racking run (racking-run), 5 planes, next routine"
            + " inspection due 2025-03-12")
        // the facade's routine inspection finished on 2025-02-28 (demo site file), every 7 days
        .contains("structure 2: North facade scaffold (scaffold), 2 planes, next routine"
            + " inspection due 2025-03-07");
    assertThat(run("plane", "list", "--db", db(), "--structure", "2").out())
        .contains("plane 6 'north facade' (5 lifts x 10 bays, pinned-base), design revision 1");
    assertThat(run("inspection", "list", "--db", db()).out())
        .contains("inspection 2: after-impact, finalised, started 2025-03-05 14:10 Europe/London");
    Run created = run("site", "create", "--db", db(), "--name", "Quarry Lane", "--time-zone",
        "America/Chicago");
    assertThat(created.out()).contains("site 2 created");
    Run badZone = run("site", "create", "--db", db(), "--name", "X", "--time-zone", "Mars/Olympus");
    assertThat(badZone.code()).isEqualTo(2);
    assertThat(badZone.err()).contains("--time-zone").contains("Mars/Olympus");
  }

  @Test
  void aSiteIsCreatedUnderAJurisdictionAndListedWithIt() {
    Run us = run("site", "create", "--db", db(), "--name", "Quarry Lane", "--time-zone",
        "America/Chicago", "--units", "imperial", "--jurisdiction", "us");
    assertThat(us.code()).as(us.err()).isZero();
    assertThat(us.out()).contains("site 1 created: Quarry Lane (jurisdiction us)");
    Run none = run("site", "create", "--db", db(), "--name", "Elsewhere");
    assertThat(none.err()).contains("note: no jurisdiction given");
    assertThat(run("site", "list", "--db", db()).out())
        .contains("site 1: Quarry Lane (America/Chicago, imperial, jurisdiction us)")
        .contains("site 2: Elsewhere (UTC, metric, jurisdiction other)");
    Run bad = run("site", "create", "--db", db(), "--name", "X", "--jurisdiction", "gb");
    assertThat(bad.code()).isEqualTo(2);
    assertThat(bad.err()).contains("--jurisdiction: unknown jurisdiction 'gb': use uk, us, eu or"
        + " other");
  }

  @Test
  void analyseBothDemoInspectionsOneHoldsTheOtherLosesFrame2() throws Exception {
    run("demo", "--db", db());
    Run routine = run("analyse", "--db", db(), "--inspection", "1");
    assertThat(routine.code()).as(routine.err()).isZero();
    assertThat(routine.out()).contains("5 of 5 planes hold their shape as built.")
        .contains("frame 3, lift 2, bay 1: damaged-effective, bent, bow 7.5 mm over 1000 mm");
    Run impact = run("analyse", "--db", db(), "--inspection", "2");
    assertThat(impact.code()).isEqualTo(1);
    assertThat(impact.out()).contains("lost rigidity: frame 2")
        .contains("Keep people and loads off lifts 1-5, bay 1");
    Run json = run("analyse", "--db", db(), "--inspection", "2", "--format", "json");
    assertThat(json.code()).isEqualTo(1);
    JsonNode root = new ObjectMapper().readTree(json.out());
    assertThat(root.get("inspection").asLong()).isEqualTo(2);
    assertThat(root.get("planes")).hasSize(5);
    JsonNode frame2 = root.get("planes").get(1);
    assertThat(frame2.get("plane").asText()).isEqualTo("frame 2");
    assertThat(frame2.at("/asBuilt/rigid").asBoolean()).isFalse();
    // two diagonals, the bottom horizontal and the struck upright segment gone: the foot joint
    // hangs on the upright above it, and the frame above sways (check contract: with rigid members
    // only the least repair has as many items as there are freedoms)
    assertThat(frame2.at("/asBuilt/degreesOfFreedom").asInt()).isEqualTo(4);
    assertThat(frame2.at("/repair/minimum").asInt()).isEqualTo(4);
    assertThat(root.get("planes").get(0).at("/asBuilt/rigid").asBoolean()).isTrue();
  }

  @Test
  void theStoredAnalysisAgreesWithCheckOnTheExportedPanelMaps() throws Exception {
    run("demo", "--db", db());
    Path design = dir.resolve("frame2.design.txt");
    Path asBuilt = dir.resolve("frame2.as-built.txt");
    assertThat(run("export", "--db", db(), "--plane", "2", "--to", design.toString()).code())
        .isZero();
    assertThat(run("export", "--db", db(), "--inspection", "2", "--plane", "frame 2", "--to",
        asBuilt.toString()).code()).isZero();
    Run check = run("check", design.toString(), asBuilt.toString(), "--format", "json");
    assertThat(check.code()).as(check.err()).isEqualTo(1);
    JsonNode fromCheck = new ObjectMapper().readTree(check.out());
    JsonNode fromStore = new ObjectMapper().readTree(
        run("analyse", "--db", db(), "--inspection", "2", "--format", "json").out())
        .get("planes").get(1);
    for (String part : List.of("design", "asBuilt", "repair")) {
      assertThat(fromStore.get(part)).as(part).isEqualTo(fromCheck.get(part));
    }
  }

  @Test
  void anExportedSiteImportedIntoAnEmptyDatabaseAnalysesTheSame() {
    run("demo", "--db", db());
    Path file = dir.resolve("larkspur.json");
    run("export", "--db", db(), "--site", "1", "--to", file.toString());
    String other = dir.resolve("empty.db").toString();
    assertThat(run("import", "--db", other, "--site", file.toString()).code()).isZero();
    for (String id : List.of("1", "2")) {
      for (String format : List.of("text", "json")) {
        Run a = run("analyse", "--db", db(), "--inspection", id, "--format", format);
        Run b = run("analyse", "--db", other, "--inspection", id, "--format", format);
        assertThat(b.code()).isEqualTo(a.code());
        assertThat(b.out()).isEqualTo(a.out());
      }
    }
  }

  @Test
  void panelMapsBecomeAPlaneAndAnInspectionsFindings() throws Exception {
    run("demo", "--db", db());
    Path design = Path.of("demo-site/maps/north-elevation.design.txt");
    Path found = Path.of("demo-site/maps/north-elevation.after-impact.txt");
    Run plane = run("plane", "create", "--db", db(), "--structure", "2", "--name", "facade copy",
        "--design", design.toString());
    assertThat(plane.code()).as(plane.err()).isZero();
    assertThat(plane.out()).contains("plane 8 'facade copy' (5 lifts x 10 bays, pinned-base)");
    run("inspection", "start", "--db", db(), "--structure", "2", "--inspector", "Priya Danvers",
        "--reason", "after-impact");
    Run map = run("import", "--db", db(), "--inspection", "4", "--plane", "facade copy", "--map",
        found.toString());
    assertThat(map.code()).as(map.err()).isZero();
    assertThat(map.out()).contains("imported 49 observations of plane 'facade copy'")
        .contains("1 panel marked ? stays not inspected")
        .contains("lift 3, bay 4, extra (member /)");
    Run exported = run("export", "--db", db(), "--inspection", "4", "--plane", "8");
    String grid = Files.readString(found).lines().filter(l -> !l.startsWith("#")
        && !l.contains(":")).map(l -> l.trim().replaceAll("\\s+", " ")).reduce("", (x, y) -> x + y + "\n");
    String back = exported.out().lines().filter(l -> !l.startsWith("#") && !l.contains(":"))
        .map(l -> l.trim().replaceAll("\\s+", " ")).reduce("", (x, y) -> x + y + "\n");
    assertThat(back).isEqualTo(grid);
    // the other plane of the structure was not walked: not inspected, so not rigid as built
    Run analysed = run("analyse", "--db", db(), "--inspection", "4", "--format", "json");
    assertThat(analysed.code()).isEqualTo(1);
    JsonNode copy = new ObjectMapper().readTree(analysed.out()).get("planes").get(2);
    assertThat(copy.at("/asBuilt/unknownPanels").asInt()).isEqualTo(1);
    assertThat(copy.at("/asBuilt/extraBraces/0/bay").asInt()).isEqualTo(4);
    Run wrongGrid = run("import", "--db", db(), "--plane", "2", "--design", design.toString());
    assertThat(wrongGrid.code()).isEqualTo(2);
    assertThat(wrongGrid.err()).contains(design.toString()).contains("10 bays");
  }

  @Test
  void theDemoPanelMapsOfFrame2AreTheSiteFilesOwnExports() throws Exception {
    run("demo", "--db", db());
    assertThat(run("export", "--db", db(), "--plane", "2").out())
        .isEqualTo(Files.readString(Path.of("demo-site/maps/racking-frame-2.design.txt")));
    assertThat(run("export", "--db", db(), "--inspection", "2", "--plane", "frame 2").out())
        .isEqualTo(Files.readString(Path.of("demo-site/maps/racking-frame-2.after-impact.txt")));
  }
}
