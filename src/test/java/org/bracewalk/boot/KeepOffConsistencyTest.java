package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Structure;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.walk.InspectionMarkRecorder;
import org.bracewalk.ui.walk.WalkViewModel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * One keep-off zone everywhere: for the demo's after-impact states (racking frame 2 in the
 * demo's after-impact inspection; the facade after the scripted lift-3 impact), {@code check},
 * {@code analyse} (JSON and text), page 1 of the report, the repair order and the walk-round's
 * banner name the same lifts and bays. They once said "lift 3", "lifts 3-5" and "the affected
 * part" for the same plane.
 */
class KeepOffConsistencyTest {
  @TempDir Path dir;
  private static final ObjectMapper JSON = new ObjectMapper();
  private final AppContext context = new AppContext(new Fixtures.SteppingClock(), PlaneAnalyzer.standard());

  record Run(int code, String out, String err) {}

  private Run run(String... args) {
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    int code = Launcher.run(args, new PrintWriter(out), new PrintWriter(err), Map.of(), context);
    return new Run(code, out.toString(), err.toString());
  }

  /** Lifts and bays as two sorted lists. */
  record Zone(List<Integer> lifts, List<Integer> bays) {}

  /** One state to compare: an inspection and a plane of it. */
  record State(long inspection, long planeId, String plane, String title) {}

  @Test
  void everyOutputNamesTheSameLiftsAndBaysForTheDemosAfterImpactStates() throws IOException {
    Path db = dir.resolve("demo.db");
    List<State> states = new ArrayList<>();
    List<String> banners = new ArrayList<>();
    List<String> reportPage1 = new ArrayList<>();
    List<String> orderPage1 = new ArrayList<>();
    var clock = new Fixtures.SteppingClock(java.time.Instant.parse("2025-03-06T09:00:00Z"));
    try (AppServices services = AppServices.over(Database.open(db), clock, PlaneAnalyzer.standard())) {
      services.demo().load();
      Structure racking = services.sites().sites().stream()
          .flatMap(s -> services.sites().structures(s.id()).stream())
          .filter(s -> s.kind() == StructureKind.RACKING_RUN).findFirst().orElseThrow();
      Inspection impact = services.inspections().inspections(racking.id()).stream()
          .filter(i -> i.reason().label().equals("after-impact")).findFirst().orElseThrow();
      PlaneRecord frame2 = services.sites().planes(racking.id()).stream()
          .filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
      states.add(new State(impact.id(), frame2.id(), frame2.name(), racking.name() + ", " + frame2.name()));
      PlaneRecord facade = DemoWalk.facade(services);
      Inspection walked = DemoWalk.record(services, facade.grid().panelCount());
      states.add(new State(walked.id(), facade.id(), facade.name(),
          DemoWalk.scaffold(services).name() + ", " + facade.name()));

      ReportService reports = new ReportService(services, PlaneAnalyzer.standard(),
          new PdfReportRenderer(TemplateSource.packed(), "en"),
          new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(), clock);
      for (State s : states) {
        ByteArrayOutputStream report = new ByteArrayOutputStream();
        new PdfReportRenderer(TemplateSource.packed(), "en")
            .renderReport(reports.reportContent(s.inspection()), report);
        reportPage1.add(firstPage(report.toByteArray()));
        ByteArrayOutputStream order = new ByteArrayOutputStream();
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en")
            .renderRepairOrder(reports.repairOrderContent(s.inspection()), order);
        orderPage1.add(firstPage(order.toByteArray()));
        Inspection insp = services.inspections().inspection(s.inspection());
        PlaneRecord plane = services.sites().plane(s.planeId());
        WalkViewModel walk = new WalkViewModel(
            services.inspections().designInForce(s.inspection(), s.planeId()).design(), s.title(), plane.role(),
            InspectionMarkRecorder.existing(services.inspections(), s.inspection(), s.planeId()),
            new InspectionMarkRecorder(services.inspections(), s.inspection(), s.planeId(), "nobody"),
            PlaneAnalyzer.standard(), new FakeDialogs(), racking.id() == plane.structureId(), true,
            java.time.Clock.systemUTC(), Runnable::run, Runnable::run);
        banners.add(walk.alarmProperty().get());
        assertThat(insp.id()).isEqualTo(s.inspection());
      }
    }

    for (int k = 0; k < states.size(); k++) {
      State s = states.get(k);
      Run analysed = run("analyse", "--db", db.toString(), "--inspection", String.valueOf(s.inspection()),
          "--format", "json");
      assertThat(analysed.code()).as(analysed.err()).isEqualTo(1);
      JsonNode plane = null;
      for (JsonNode p : JSON.readTree(analysed.out()).get("planes")) {
        if (p.get("plane").asText().equals(s.plane())) {
          plane = p;
        }
      }
      assertThat(plane).as(s.plane()).isNotNull();
      Zone expected = new Zone(numbers(plane.at("/keepOffZone/lifts")), numbers(plane.at("/keepOffZone/bays")));
      assertThat(expected.lifts()).as("the lowest swaying lift and every lift above it").isNotEmpty();
      assertThat(expected.lifts().get(expected.lifts().size() - 1)).isEqualTo(plane.get("lifts").asInt());

      Run analysedText = run("analyse", "--db", db.toString(), "--inspection", String.valueOf(s.inspection()));
      Path design = Files.writeString(dir.resolve(k + ".design.txt"),
          run("export", "--db", db.toString(), "--plane", String.valueOf(s.planeId())).out());
      Path asBuilt = Files.writeString(dir.resolve(k + ".as-built.txt"),
          run("export", "--db", db.toString(), "--inspection", String.valueOf(s.inspection()), "--plane",
              String.valueOf(s.planeId())).out());
      Run check = run("check", design.toString(), asBuilt.toString(), "--format", "json");
      assertThat(check.code()).as(check.err()).isEqualTo(1);
      JsonNode checked = JSON.readTree(check.out());
      Run checkText = run("check", design.toString(), asBuilt.toString());

      assertThat(new Zone(numbers(checked.at("/keepOffZone/lifts")), numbers(checked.at("/keepOffZone/bays"))))
          .as("check --format json").isEqualTo(expected);
      assertThat(zoneIn(checked.get("keepOff").asText(), "")).as("check keepOff").isEqualTo(expected);
      assertThat(zoneIn(checkText.out(), "")).as("check text").isEqualTo(expected);
      assertThat(zoneIn(plane.get("keepOff").asText(), "")).as("analyse keepOff").isEqualTo(expected);
      String section = analysedText.out().substring(analysedText.out().indexOf("plane '" + s.plane() + "'"));
      section = section.contains("=====") ? section.substring(0, section.indexOf("=====")) : section;
      assertThat(zoneIn(section, "")).as("analyse text").isEqualTo(expected);
      String onPlane = "plane " + s.plane() + ": ";
      int lifts = plane.get("lifts").asInt();
      int bays = plane.get("bays").asInt();
      // page 1 of the report: the plane's row of "what to do, and where" (plane, verdict, zone)
      assertThat(zoneIn(reportPage1.get(k), Pattern.quote(s.plane() + " ") + ".*?", lifts, bays))
          .as("report page 1").isEqualTo(expected);
      assertThat(zoneIn(orderPage1.get(k), "Keep people and loads off " + Pattern.quote(onPlane),
          lifts, bays)).as("repair order").isEqualTo(expected);
      assertThat(banners.get(k)).startsWith("\u25b2 LOST RIGIDITY \u2014 " + s.title());
      assertThat(zoneIn(banners.get(k), "")).as("walk-round banner").isEqualTo(expected);
    }
  }

  private static String firstPage(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      PDFTextStripper t = new PDFTextStripper();
      t.setStartPage(1);
      t.setEndPage(1);
      return t.getText(d).replaceAll("\\s+", " ");
    }
  }

  private static List<Integer> numbers(JsonNode array) {
    List<Integer> out = new ArrayList<>();
    array.forEach(n -> out.add(n.asInt()));
    return out;
  }

  private static final String LIST = "(\\d+(?:-\\d+)?(?:, \\d+(?:-\\d+)?)*)";
  /** The documents' plain English: "lift 3", "lifts 1, 3 and 4", "every lift". */
  private static final String WORDS = "\\d+(?:-\\d+)?(?:(?:, | and )\\d+(?:-\\d+)?)*";

  /**
   * The zone named in the documents' words after {@code lead} (a regular expression): {@code
   * lifts 3-5, every bay}; "every" stands for all {@code lifts} or {@code bays} of the plane.
   */
  static Zone zoneIn(String text, String lead, int lifts, int bays) {
    String flat = text.replaceAll("\\s+", " ");
    Matcher m = Pattern.compile(lead + "(every lift|lifts? " + WORDS + "), (every bay|bays? "
        + WORDS + ")").matcher(flat);
    assertThat(m.find()).as("a keep-off zone after %s in: %s", lead, flat).isTrue();
    return new Zone(words(m.group(1), lifts), words(m.group(2), bays));
  }

  private static List<Integer> words(String named, int all) {
    if (named.startsWith("every")) {
      List<Integer> out = new ArrayList<>();
      for (int i = 1; i <= all; i++) {
        out.add(i);
      }
      return out;
    }
    return expand(named.substring(named.indexOf(' ') + 1).replace(" and ", ", "));
  }

  /** The zone named in {@code Keep people and loads off [prefix]lifts L, bays B}. */
  static Zone zoneIn(String text, String prefix) {
    String flat = text.replaceAll("\\s+", " ");
    Matcher m = Pattern.compile("Keep people and loads off " + Pattern.quote(prefix) + "lifts? " + LIST
        + ", bays? " + LIST).matcher(flat);
    assertThat(m.find()).as("a keep-off sentence with %s in: %s", prefix, flat).isTrue();
    return new Zone(expand(m.group(1)), expand(m.group(2)));
  }

  private static List<Integer> expand(String list) {
    List<Integer> out = new ArrayList<>();
    for (String part : list.split(", ")) {
      String[] ends = part.split("-");
      int from = Integer.parseInt(ends[0]);
      int to = ends.length == 2 ? Integer.parseInt(ends[1]) : from;
      for (int i = from; i <= to; i++) {
        out.add(i);
      }
    }
    return out;
  }
}
