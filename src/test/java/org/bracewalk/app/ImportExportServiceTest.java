package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelState;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImportExportServiceTest {
  @TempDir Path dir;

  private final AppContext context = AppContext.standard();

  private static String sha256(Path file) throws Exception {
    return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
  }

  @Test
  void exportImportExportIsByteIdentical() {
    String first;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      first = a.files().exportSite(a.demo().load().site().id());
    }
    String second;
    try (AppServices b = context.open(dir.resolve("b.db"))) {
      second = b.files().exportSite(b.files().importSite("first.json", first).site().id());
      // the demo's one photo came through as a PNG kept in the database
      long withPhoto = b.store().observations().withPhotos(2).get(0);
      byte[] png = b.inspections().photos(withPhoto).get(0).data();
      assertThat(java.util.Arrays.copyOf(png, 4)).isEqualTo(new byte[] {(byte) 0x89, 'P', 'N', 'G'});
    }
    assertThat(second).isEqualTo(first);
    // the shipped demo file is itself in the exporter's layout
    assertThat(first).isEqualTo(DemoService.siteFileText());
  }

  @Test
  void theDemoHoldsEveryPanelOfEveryPlaneInEveryInspection() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      ImportedSite demo = s.demo().load();
      // two of the racking run, one of the facade scaffold
      assertThat(demo.inspections()).extracting(Inspection::id).containsExactly(1L, 2L, 3L);
      assertThat(demo.inspections()).allMatch(Inspection::isFinalised);
      for (Inspection i : demo.inspections()) {
        for (var plane : s.inspections().planesOf(i.id())) {
          assertThat(s.inspections().latestFindings(i.id(), plane.id()))
              .as("%s, plane %s", i.label(), plane.name())
              .hasSize(plane.grid().panelCount());
        }
      }
      assertThatThrownBy(() -> s.demo().load())
          .isInstanceOf(UserInputException.class).hasMessageContaining("already holds 1 site");
    }
  }

  /** Broken variants of the demo file: what to change, and the line/field the error must name. */
  private record Broken(String what, String from, String to, String field) {}

  @Test
  void everyBadSiteFileGetsALocatedErrorAndLeavesTheDatabaseByteForByteAsItWas()
      throws Exception {
    Path db = dir.resolve("a.db");
    try (AppServices s = context.open(db)) {
      s.demo().load();
    }
    String good = DemoService.siteFileText();
    List<Broken> cases = List.of(
        new Broken("unknown state", "\"state\": \"damaged-effective\"", "\"state\": \"dented\"", "state"),
        new Broken("plane not in structure", "\"plane\": \"frame 2\", \"lift\": 1", "\"plane\": \"frame 9\", \"lift\": 1", "plane"),
        new Broken("lift outside plane", "\"plane\": \"spine\", \"lift\": 4", "\"plane\": \"spine\", \"lift\": 5", "lift"),
        new Broken("misspelt field", "\"gaugeLengthMm\"", "\"gaugeLenghtMm\"", "gaugeLenghtMm"),
        new Broken("bow without gauge", ", \"gaugeLengthMm\": 1000", "", "gaugeLengthMm"),
        new Broken("ragged map row", "\"/ . . o . \\\\ . . . /\"", "\"/ . . o . \\\\ . . /\"", "map"),
        new Broken("bad time", "\"startedAt\": \"2025-03-05T14:10:00Z\"", "\"startedAt\": \"5 March\"", "startedAt"),
        new Broken("finish before start", "\"finishedAt\": \"2025-03-05T14:55:00Z\"", "\"finishedAt\": \"2025-03-05T14:00:00Z\"", "finishedAt"),
        new Broken("forward correction", "\"supersedes\": 18", "\"supersedes\": 40", "supersedes"),
        new Broken("zero lifts", "\"lifts\": 5,\n          \"bays\": 10", "\"lifts\": 0,\n          \"bays\": 10", "lifts"),
        new Broken("newer version", "\"version\": 1", "\"version\": 2", "version"),
        new Broken("not JSON", "\"units\": \"metric\"", "\"units\": metric", ""));
    String before = sha256(db);
    for (Broken c : cases) {
      assertThat(good).as(c.what()).contains(c.from());
      String bad = good.replaceFirst(java.util.regex.Pattern.quote(c.from()),
          java.util.regex.Matcher.quoteReplacement(c.to()));
      int expectedLine = lineOf(bad, c.to().isEmpty() ? lineStartBefore(good, c.from()) : c.to());
      try (AppServices s = context.open(db)) {
        assertThatThrownBy(() -> s.files().importSite("bad.json", bad))
            .as(c.what())
            .isInstanceOfSatisfying(FileFormatException.class, e -> {
              assertThat(e.file()).isEqualTo("bad.json");
              assertThat(e.field()).as(c.what() + ": " + e.getMessage()).isEqualTo(c.field());
              assertThat(e.line()).as(c.what() + ": " + e.getMessage()).isEqualTo(expectedLine);
              assertThat(e.getMessage()).startsWith("bad.json, line " + expectedLine);
            });
      }
      assertThat(sha256(db)).as(c.what()).isEqualTo(before);
    }
  }

  private static int lineOf(String text, String fragment) {
    int at = text.indexOf(fragment);
    return (int) text.substring(0, at).chars().filter(ch -> ch == '\n').count() + 1;
  }

  /** The text of the line on which {@code fragment} sits (for fragments that are deleted). */
  private static String lineStartBefore(String text, String fragment) {
    int at = text.indexOf(fragment);
    int start = text.lastIndexOf('\n', at) + 1;
    return text.substring(start, at);
  }

  @Test
  void aFailureHalfWayThroughTheImportStoresNothing() throws Exception {
    Path db = dir.resolve("a.db");
    try (AppServices s = context.open(db)) {
      s.sites().createSite(Fixtures.site());
    }
    String before = sha256(db);
    try (var store = org.bracewalk.store.Database.open(db)) {
      FailingStore failing = new FailingStore(store, 50);
      ImportExportService files = new ImportExportService(failing, java.time.Clock.systemUTC());
      assertThatThrownBy(() -> files.importSite("demo.json", DemoService.siteFileText()))
          .hasMessageContaining("disk full (simulated)");
      assertThat(failing.observationsAdded()).isEqualTo(50);
      assertThat(store.sites().all()).hasSize(1);
    }
    assertThat(sha256(db)).isEqualTo(before);
  }

  @Test
  void observationCsvRoundTripsAndABadCsvRecordsNothing() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      s.demo().load();
      String csv = s.files().exportObservationsCsv(1);
      assertThat(csv.lines().findFirst()).contains(String.join(",",
          org.bracewalk.app.sitefile.ObservationCsv.COLUMNS));
      Inspection fresh = s.inspections().start(1, NewInspection.of("Priya Danvers", "",
          InspectionReason.ROUTINE));
      List<Observation> stored =
          s.files().importObservationsCsv(fresh.id(), "i1.csv", csv).recorded();
      assertThat(stored).hasSize(33);
      assertThat(stored.get(32).supersedes()).isEqualTo(stored.get(17).id());
      assertThat(s.files().exportObservationsCsv(fresh.id())).isEqualTo(csv);

      String bad = csv.replace("frame 3,2,1,damaged-effective", "frame 3,9,1,damaged-effective");
      int line = lineOf(bad, "frame 3,9,1");
      Inspection other = s.inspections().start(1, NewInspection.of("Priya Danvers", "",
          InspectionReason.ROUTINE));
      List<Observation> acknowledged = new ArrayList<>();
      assertThatThrownBy(() -> s.files().recordFromCsv(other.id(), "bad.csv", bad, "",
              acknowledged::add))
          .isInstanceOfSatisfying(FileFormatException.class, e -> {
            assertThat(e.line()).isEqualTo(line);
            assertThat(e.field()).isEqualTo("lift");
            assertThat(e.getMessage()).contains("bad.csv, line " + line).contains("1 to 5");
          });
      assertThat(acknowledged).isEmpty();
      assertThat(s.inspections().observations(other.id())).isEmpty();
    }
  }

  @Test
  void recordingFromCsvAcknowledgesEachObservationOnceStored() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      s.demo().load();
      Inspection fresh = s.inspections().start(1, NewInspection.of("Priya Danvers", "",
          InspectionReason.AFTER_ALTERATION));
      String csv = "plane,lift,bay,state,note\nspine,1,2,sound,\nspine,2,2,missing,\"taken out, for access\"\n";
      List<Long> seen = new ArrayList<>();
      List<Observation> stored = s.files().recordFromCsv(fresh.id(), "walk.csv", csv, "J. Quill",
          o -> {
            // by the time we hear of it, it is in the store
            assertThat(s.inspections().observations(fresh.id())).extracting(Observation::id)
                .contains(o.id());
            seen.add(o.id());
          }).recorded();
      assertThat(seen).containsExactlyElementsOf(stored.stream().map(Observation::id).toList());
      assertThat(stored.get(1).state()).isEqualTo(PanelState.MISSING);
      assertThat(stored.get(1).note()).isEqualTo("taken out, for access");
      assertThat(stored.get(1).recordedBy()).isEqualTo("J. Quill");
    }
  }
}
