package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HexFormat;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The plane size limit in the app and the site file; retirement and the planes an inspection covers. */
class PlaneLimitsAndRetirementTest {
  @TempDir Path dir;

  private final AppContext context = new AppContext(
      Clock.fixed(Instant.parse("2025-03-10T08:00:00Z"), ZoneOffset.UTC), PlaneAnalyzer.standard());

  private static String sha256(Path file) throws Exception {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
  }

  private static String replaceOnce(String text, String from, String to) {
    assertThat(text).contains(from);
    return text.replaceFirst(Pattern.quote(from), Matcher.quoteReplacement(to));
  }

  private static int lineOf(String text, String fragment) {
    int at = text.indexOf(fragment);
    return (int) text.substring(0, at).chars().filter(ch -> ch == '\n').count() + 1;
  }

  @Test
  void aSiteFileWithAPlaneLargerThanTheLimitGetsALocatedErrorAndStoresNothing() throws Exception {
    Path db = dir.resolve("a.db");
    try (AppServices s = context.open(db)) {
      s.demo().load();
    }
    String good = DemoService.siteFileText();
    String from = "\"name\": \"frame 1\",\n          \"lifts\": 5,\n          \"bays\": 1";
    record Case(String to, String field, String says) {}
    for (Case c : new Case[] {
        new Case("\"name\": \"frame 1\",\n          \"lifts\": 100000,\n          \"bays\": 100000",
            "lifts", "plane 'frame 1': 100000 lifts x 100000 bays is larger than the limit of 100"
                + " lifts x 500 bays"),
        new Case("\"name\": \"frame 1\",\n          \"lifts\": 5,\n          \"bays\": 2000000000",
            "bays", "plane 'frame 1': 5 lifts x 2000000000 bays is larger than the limit"),
        new Case("\"name\": \"frame 1\",\n          \"lifts\": 100000000000000000000,\n          \"bays\": 1",
            "lifts", "is larger than the limit of 100 lifts x 500 bays")}) {
      String bad = replaceOnce(good, from, c.to());
      String before = sha256(db);
      try (AppServices s = context.open(db)) {
        assertThatThrownBy(() -> s.files().importSite("typo.json", bad))
            .isInstanceOfSatisfying(FileFormatException.class, e -> {
              assertThat(e.field()).as(e.getMessage()).isEqualTo(c.field());
              assertThat(e.line()).isEqualTo(lineOf(bad, "\"" + c.field() + "\": ")
);
              assertThat(e.getMessage()).startsWith("typo.json, line ").contains(c.says());
            });
      }
      assertThat(sha256(db)).isEqualTo(before);
    }
  }

  @Test
  void theAppRefusesAPlaneLargerThanTheLimitNamingItAndTheField() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      s.demo().load();
      PlaneGrid big = PlaneGrid.uniform(101, 3, Support.FREE);
      assertThatThrownBy(() -> s.sites().createPlane(new PlaneRecord(0, 1, "tall", big), "", LocalDate.now(),
          "", PlaneDesign.of(big, Map.of())))
          .isInstanceOf(UserInputException.class)
          .hasMessage("plane 'tall': 101 lifts x 3 bays is larger than the limit of 100 lifts x 500"
              + " bays a stored plane may have (field lifts)");
      assertThat(s.sites().planes(1)).extracting(PlaneRecord::name).doesNotContain("tall");
    }
  }

  @Test
  void aRetirementTravelsInTheSiteFileAndExportImportExportStaysByteIdentical() {
    String first;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      long site = a.demo().load().site().id();
      PlaneRecord spine = spineOf(a);
      a.sites().retirePlane(spine.id(), "Priya Danvers", "dismantled after the impact");
      first = a.files().exportSite(site);
    }
    assertThat(first).contains("\"retired\": {\n")
        .contains("\"at\": \"2025-03-10T08:00:00Z\"")
        .contains("\"by\": \"Priya Danvers\"")
        .contains("\"reason\": \"dismantled after the impact\"");
    String second;
    try (AppServices b = context.open(dir.resolve("b.db"))) {
      long site = b.files().importSite("first.json", first).site().id();
      PlaneRecord spine = spineOf(b);
      assertThat(b.sites().retirement(spine.id())).contains(new PlaneRetirement(spine.id(),
          Instant.parse("2025-03-10T08:00:00Z"), "Priya Danvers", "dismantled after the impact"));
      second = b.files().exportSite(site);
    }
    assertThat(second).isEqualTo(first);
  }

  @Test
  void aSiteFileCannotRecordObservationsIntoAPlaneRetiredBeforeTheInspectionStarted()
      throws Exception {
    String text;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      long site = a.demo().load().site().id();
      a.sites().retirePlane(spineOf(a).id(), "", "dismantled");
      text = a.files().exportSite(site);
    }
    // between the two demo inspections: the second one still has observations of the spine
    String bad = replaceOnce(text, "\"at\": \"2025-03-10T08:00:00Z\"", "\"at\": \"2025-03-04T00:00:00Z\"");
    try (AppServices b = context.open(dir.resolve("b.db"))) {
      assertThatThrownBy(() -> b.files().importSite("moved.json", bad))
          .isInstanceOfSatisfying(FileFormatException.class, e -> {
            assertThat(e.field()).isEqualTo("plane");
            assertThat(e.getMessage()).contains("plane \"spine\" was retired at 2025-03-04T00:00:00Z,"
                + " before this inspection started (2025-03-05T14:10:00Z)");
          });
      String early = replaceOnce(text, "\"at\": \"2025-03-10T08:00:00Z\"", "\"at\": \"2025-01-01T00:00:00Z\"");
      assertThatThrownBy(() -> b.files().importSite("early.json", early))
          .isInstanceOfSatisfying(FileFormatException.class, e -> assertThat(e.field()).isEqualTo("at"));
      assertThat(b.sites().sites()).isEmpty();
    }
  }

  @Test
  void aRetiredPlaneIsLeftOutOfNewInspectionsOnlyAndEvenATieOfTheClockKeepsItInTheStartedOne() {
    // a frozen clock: the inspection starts, the plane is retired and a second inspection starts,
    // all at the same instant
    try (AppServices s = new AppContext(Clock.fixed(Instant.parse("2025-03-10T08:00:00Z"),
        ZoneOffset.UTC), PlaneAnalyzer.standard()).open(dir.resolve("a.db"))) {
      s.demo().load();
      PlaneRecord spine = spineOf(s);
      Inspection open = s.inspections().start(1, NewInspection.of("P. Danvers", "", InspectionReason.ROUTINE));
      PlaneRetirement r = s.sites().retirePlane(spine.id(), "", "dismantled");
      assertThat(r.retiredAt()).isEqualTo(Instant.parse("2025-03-10T08:00:00.001Z"));
      assertThat(s.inspections().planesOf(open.id())).contains(spine);
      for (long finalised : new long[] {1, 2}) {
        assertThat(s.inspections().planesOf(finalised)).contains(spine);
        assertThat(s.analysis().analyse(finalised).planes()).extracting(p -> p.plane().name())
            .contains("spine");
      }
      Inspection later = s.inspections().start(1, NewInspection.of("P. Danvers", "", InspectionReason.ROUTINE));
      assertThat(s.inspections().planesOf(later.id())).extracting(PlaneRecord::name)
          .containsExactly("frame 1", "frame 2", "frame 3", "frame 4");
      assertThat(s.analysis().analyse(later.id()).planes()).extracting(p -> p.plane().name())
          .doesNotContain("spine");
      // observations: still into the inspection that covers it, refused in the one that does not
      s.inspections().recordObservation(open.id(), NewObservation.of(spine.id(),
          org.bracewalk.core.model.PanelRef.of(1, 1), org.bracewalk.core.model.PanelState.SOUND, "P. Danvers"));
      assertThatThrownBy(() -> s.inspections().recordObservation(later.id(), NewObservation.of(
          spine.id(), org.bracewalk.core.model.PanelRef.of(1, 1),
          org.bracewalk.core.model.PanelState.SOUND, "P. Danvers")))
          .isInstanceOf(UserInputException.class)
          .hasMessageContaining("plane 'spine' (id " + spine.id() + ") was retired");
      // the plane and its records stay
      assertThat(s.sites().planes(1)).contains(spine);
    }
  }

  /** The plane named "spine" of structure 1 (the demo's racking run). */
  private static PlaneRecord spineOf(AppServices services) {
    return services.sites().planes(1).stream()
        .filter(p -> p.name().equals("spine"))
        .findFirst()
        .orElseThrow();
  }
}
