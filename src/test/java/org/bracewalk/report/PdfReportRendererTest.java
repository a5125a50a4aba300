package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.contentstream.operator.Operator;
import org.apache.pdfbox.pdfparser.PDFStreamParser;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.graphics.image.PDImageXObject;
import org.apache.pdfbox.text.PDFTextStripper;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.Particular;
import org.bracewalk.core.port.report.ReportParticulars;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class PdfReportRendererTest {
  private static byte[] finalised;
  private static byte[] draft;

  @BeforeAll
  static void render() throws IOException {
    finalised = render(ReportFixtures.report(true));
    draft = render(ReportFixtures.report(false));
    Path dir = Path.of("target", "report-test");
    Files.createDirectories(dir);
    Files.write(dir.resolve("fixture-report.pdf"), finalised);
    Files.write(dir.resolve("fixture-report-draft.pdf"), draft);
  }

  static byte[] render(ReportContent r) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(r, out);
    return out.toByteArray();
  }

  static List<String> pageTexts(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      List<String> pages = new ArrayList<>();
      PDFTextStripper s = new PDFTextStripper();
      for (int i = 1; i <= d.getNumberOfPages(); i++) {
        s.setStartPage(i);
        s.setEndPage(i);
        pages.add(s.getText(d));
      }
      return pages;
    }
  }

  /** Page 1's text in reading order: top to bottom, left to right. */
  static String firstPageByPosition(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      PDFTextStripper s = new PDFTextStripper();
      s.setSortByPosition(true);
      s.setStartPage(1);
      s.setEndPage(1);
      return flat(s.getText(d));
    }
  }

  static String flat(String s) {
    return s.replaceAll("\\s+", " ");
  }

  @Test
  void everyParticularAppearsWithItsLabel() throws IOException {
    String text = flat(String.join("\n", pageTexts(finalised)));
    ReportParticulars p = ReportFixtures.particulars();
    for (Particular q : Particular.values()) {
      if (q.recordedFor(false) && q != Particular.INSPECTED_AT) {
        assertThat(text).as(q.code()).contains(flat(p.text(q)));
      }
    }
    assertThat(text).contains("Matters found that could give rise to a risk to health or safety")
        .contains("North elevation: lost rigidity. Plan bracing L3: lost rigidity. Panels and frame members not found sound: 5")
        .contains("Action taken as a result")
        .contains("Repair order 4, raised 14 Mar 2025, 08:10 (GMT) by Ada Brennock. Lift 3 closed")
        .contains("- take out of service, North elevation, whole plane: barrier lift 3 and tag the"
            + " ladder access (due 14 Mar 2025; done 14 Mar 2025, 08:30 (GMT) by Col Marsh)")
        .contains("Checked against design revision 3 of 20 Feb 2025, by R. Okafor.")
        .contains("Further action considered necessary The repair plan below: 5 actions, 3 at once.");
    assertThat(text).contains("14 Mar 2025, 07:40").contains("Date and time of the inspection");
    assertThat(text).contains("Inspected for (name)").contains("Report made by (position)")
        .contains("Competent person").contains("Shift");
  }

  @Test
  void cautionsAndTheEngineeringPointerAreOnPageOneAndAtTheEnd() throws IOException {
    List<String> pages = pageTexts(finalised);
    String first = flat(pages.get(0));
    String last = flat(pages.get(pages.size() - 1) + pages.get(Math.max(0, pages.size() - 2)));
    for (String s : new String[] {
        "on a model in which every joint is a pin",
        "keep people and loads off the affected part",
        "reviewed by a licensed engineer"}) {
      assertThat(first).contains(s);
      assertThat(last).contains(s);
    }
  }

  @Test
  void theLostPlaneIsNamedOnPageOne() throws IOException {
    String first = flat(pageTexts(finalised).get(0));
    assertThat(first).contains("LOST RIGIDITY: North elevation, Plan bracing L3 (2 of 3 planes)");
    assertThat(first).contains("holds its shape").contains("lost rigidity");
    assertThat(first).doesNotContainIgnoringCase(" safe ");
  }

  @Test
  void everyPageCarriesPageNumberOfTotalAndTheFingerprint() throws IOException {
    List<String> pages = pageTexts(finalised);
    String fp = ReportFixtures.fingerprint().sha256();
    for (int i = 0; i < pages.size(); i++) {
      assertThat(pages.get(i)).contains("page " + (i + 1) + " of " + pages.size()).contains(fp);
      assertThat(pages.get(i)).doesNotContain("DRAFT");
    }
  }

  @Test
  void anOpenInspectionGivesADraftMarkOnEveryPage() throws IOException {
    List<String> pages = pageTexts(draft);
    assertThat(pages).hasSizeGreaterThan(3);
    for (String page : pages) {
      assertThat(page).contains("DRAFT - inspection 17 is still open");
    }
  }

  @Test
  void everyFindingIsListedWithItsStateNoteAndDamageLevel() throws IOException {
    String text = flat(String.join("\n", pageTexts(finalised)));
    for (Finding f : ReportFixtures.findings()) {
      assertThat(text).contains(f.plane() + ", lift " + f.panel().lift() + ", bay " + f.panel().bay());
      assertThat(text).contains(flat(f.note()));
    }
    assertThat(text).contains("damaged beyond use").contains("bow 24.0 mm over 1000.0 mm, limit 10.0 mm")
        .contains("bow 6.5 mm over 1000.0 mm").contains("bent or bowed")
        .contains("over twice the limit: offload at once and isolate until repaired (14 Mar 2025)");
  }

  @Test
  void planesThatLostRigidityHaveSectionsTheRestAreInTheCompactTableAndTheDigestsComeLast()
      throws IOException {
    List<String> pages = pageTexts(finalised);
    String all = flat(String.join("\n", pages));
    List<String> order = List.of(
        "What to do, and where",
        "Plane: " + ReportFixtures.FACADE,
        "Plane: " + ReportFixtures.PLAN,
        "Planes that hold their shape, with nothing found",
        ReportFixtures.FRAME,
        "Findings: every panel and frame member not found sound",
        "Repair plan",
        "Sign-off",
        "Appendix: record digests",
        ReportFixtures.fingerprint().sections().get(3).sha256());
    // in the order they lie on the pages (page, then top to bottom)
    List<ReportLayoutTest.Glyphs> strings = ReportLayoutTest.strings(finalised);
    double[] last = {-1};
    for (String s : order) {
      double at = strings.stream().filter(g -> g.text().contains(s))
          .mapToDouble(g -> g.page() * 1000.0 + g.y()).filter(v -> v > last[0]).min().orElse(-1);
      assertThat(at).as(s).isGreaterThan(last[0]);
      last[0] = at;
    }
    // the plane that holds its shape with nothing found has no section of its own
    assertThat(all).doesNotContain("Plane: " + ReportFixtures.FRAME);
    // the appendix is at the end: nothing but the digests after its heading
    String lastPage = flat(pages.get(pages.size() - 1));
    assertThat(lastPage).contains("Appendix: record digests");
    try (PDDocument d = Loader.loadPDF(finalised)) {
      assertThat(d.getNumberOfPages()).isEqualTo(pages.size());
    }
  }

  @Test
  void planePagesAreDrawnWithVectorOperatorsNotImages() throws IOException {
    List<String> pages = pageTexts(finalised);
    int facade = indexOf(pages, "Plane: " + ReportFixtures.FACADE);
    // the drawing follows the words, on their page or (when they start low on a page) the next
    int drawn = facade;
    while (!flat(pages.get(drawn)).contains("Elevation, design and as found")) {
      drawn++;
    }
    try (PDDocument d = Loader.loadPDF(finalised)) {
      PDPage page = d.getPage(drawn);
      List<String> ops = operators(page);
      // 11 standards + 6 ledgers, at least 9 design diagonals, the mechanism's members
      assertThat(ops.stream().filter("l"::equals).count()).isGreaterThan(60);
      assertThat(ops).contains("m", "S", "re", "f", "d");
      for (var name : page.getResources().getXObjectNames()) {
        assertThat(page.getResources().getXObject(name)).isNotInstanceOf(PDImageXObject.class);
      }
    }
  }

  @Test
  void imperialSitesGetFeetAndInches() throws IOException {
    String text = flat(String.join("\n", pageTexts(render(ReportFixtures.report(true, LengthUnits.IMPERIAL)))));
    // 1 in = 25.4 mm exactly: 2.4 m = 94.49 in = 7 ft 10.5 in; 1.09 m = 42.91 in = 3 ft 6.9 in;
    // 24 mm = 0.94 in; the facade's 23.4 m = 921.26 in = 76 ft 9.3 in
    assertThat(text).contains("7 ft 10.5 in").contains("3 ft 6.9 in").contains("0.94 in (24.0 mm)")
        .contains("76 ft 9.3 in wide").doesNotContain("2.40 m");
  }

  @Test
  void aReportWithEmptyParticularsIsRefusedNamingEveryOne() {
    ReportParticulars p = ReportFixtures.particulars();
    ReportParticulars gaps = new ReportParticulars(p.clientName(), " ", p.equipmentLocation(),
        p.equipmentDescription(), null, List.of(), p.reporterName(), "", p.competentPerson(), null,
        null);
    ReportContent r = new ReportContent(ReportFixtures.header(true, LengthUnits.METRIC, "scaffold"),
        gaps, List.of(ReportFixtures.frame()), List.of(), List.of(), ReportFixtures.fingerprint());
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    assertThatThrownBy(() -> new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(r, out))
        .isInstanceOf(RenderingException.class)
        .hasMessageContaining("client-address, inspected-at, reporter-position, shift");
    assertThat(out.size()).isZero();
  }

  @Test
  void theStampReadsBackAndOtherFilesAreNotOurs() throws IOException {
    var reader = new PdfDocumentStampReader();
    var stamp = reader.readStamp(new ByteArrayInputStream(finalised));
    assertThat(stamp).contains(ReportFixtures.report(true).stamp());
    assertThat(reader.readStamp(new ByteArrayInputStream("hello".getBytes()))).isEmpty();
    ByteArrayOutputStream foreign = new ByteArrayOutputStream();
    try (PDDocument d = new PDDocument()) {
      d.addPage(new PDPage());
      d.save(foreign);
    }
    assertThat(reader.readStamp(new ByteArrayInputStream(foreign.toByteArray()))).isEmpty();
    byte[] cut = java.util.Arrays.copyOf(finalised, finalised.length / 3);
    assertThat(reader.readStamp(new ByteArrayInputStream(cut))).isEmpty();
  }

  static int indexOf(List<String> pages, String text) {
    for (int i = 0; i < pages.size(); i++) {
      if (flat(pages.get(i)).contains(text)) {
        return i;
      }
    }
    return -1;
  }

  static List<String> operators(PDPage page) throws IOException {
    List<String> ops = new ArrayList<>();
    PDFStreamParser parser = new PDFStreamParser(page);
    for (Object token = parser.parseNextToken(); token != null; token = parser.parseNextToken()) {
      if (token instanceof Operator op) {
        ops.add(op.getName());
      }
    }
    return ops;
  }
}
