package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDResources;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.PDXObject;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.pdfbox.text.PDFTextStripper;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.DemoService;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.sitefile.ObservationCsv;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Names in Polish, Romanian, Greek and Cyrillic print in full through the report, the repair
 * order and both CSV files. The demo site is imported with its people, site, address, location
 * and one plane renamed in those scripts (invented names).
 *
 * <p>Outside references: the text PDFBox extracts from the documents (its own ToUnicode reading);
 * the PDF specification (ISO 32000-1, 9.6.4): an embedded font subset's name begins with six
 * upper-case letters and a plus sign; RFC 3629 (UTF-8), checked by a strict JDK decoder.
 */
class UnicodeNamesTest {
  static final String CLIENT = "\u0141ukasz W\u00f3jcik";                     // Łukasz Wójcik
  static final String INSPECTOR = "\u0218tefan \u021a\u0103ranu";              // Ștefan Țăranu
  static final String SITE = "\u0421\u043a\u043b\u0430\u0434 \u041b\u0430\u0440\u043a\u0441"
      + "\u043f\u0443\u0440";                                                    // Склад Ларкспур
  static final String ADDRESS = "\u0443\u043b. \u0421\u0430\u0434\u043e\u0432\u0430\u044f 7,"
      + " \u041c\u043e\u0441\u043a\u0432\u0430";                                 // ул. Садовая 7, Москва
  static final String LOCATION = "\u0391\u03c0\u03bf\u03b8\u03ae\u03ba\u03b7 \u0398\u03b5\u03c3"
      + "\u03c3\u03b1\u03bb\u03bf\u03bd\u03af\u03ba\u03b7\u03c2";               // Αποθήκη Θεσσαλονίκης
  static final String PLANE = "\u0440\u0430\u043c\u0430 2";                     // рама 2

  @TempDir Path dir;
  private AppServices services;
  private ReportService reports;
  private ImportedSite demo;
  private Inspection impact;

  @BeforeEach
  void open() {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(dir.resolve("u.db")), clock, PlaneAnalyzer.standard());
    reports = new ReportService(services, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
    String text = DemoService.siteFileText()
        .replace("\"name\": \"Larkspur Depot\"", "\"name\": \"" + SITE + "\"")
        .replace("Larkspur Depot, Brackwater: warehouse aisle C and the north wall", LOCATION)
        .replace("Unit 7, Fennick Road, Brackwater BW4 2QT", ADDRESS)
        .replace("Hollin & Marsh Logistics Ltd", CLIENT)
        .replace("Priya Danvers", INSPECTOR)
        .replace("\"frame 2\"", "\"" + PLANE + "\"");
    demo = services.files().importSite("names.site.json", text);
    long racking = demo.structures().stream().filter(s -> s.kind() == StructureKind.RACKING_RUN)
        .findFirst().orElseThrow().id();
    impact = demo.inspections().stream()
        .filter(i -> i.structureId() == racking && i.reason() == InspectionReason.AFTER_IMPACT)
        .findFirst().orElseThrow();
  }

  @AfterEach
  void close() {
    services.close();
  }

  @Test
  void theReportPrintsEveryNameInFullWithAnEmbeddedSubsetFont() throws IOException {
    byte[] pdf = reports.reportPdf(impact.id());
    keep("report.pdf", pdf);
    String text = text(pdf);
    assertThat(text).contains(CLIENT, INSPECTOR, SITE, ADDRESS, LOCATION, PLANE);
    assertEmbeddedSubsets(pdf);
  }

  @Test
  void theRepairOrderPrintsTheSiteAndPlaneNamesWithAnEmbeddedSubsetFont() throws IOException {
    byte[] pdf = reports.repairOrderPdf(reports.repairOrderContent(impact.id()));
    keep("repair-order.pdf", pdf);
    assertThat(text(pdf)).contains(SITE, PLANE);
    assertEmbeddedSubsets(pdf);
  }

  @Test
  void theRepairOrderCsvIsUtf8AndCarriesThePlaneName() throws IOException {
    Path pdf = dir.resolve("order.pdf");
    Path csv = dir.resolve("order.csv");
    reports.issueRepairOrder(reports.repairOrderContent(impact.id()), pdf, csv);
    byte[] bytes = Files.readAllBytes(csv);
    String text = StandardCharsets.UTF_8.newDecoder()
        .onMalformedInput(CodingErrorAction.REPORT)
        .onUnmappableCharacter(CodingErrorAction.REPORT)
        .decode(ByteBuffer.wrap(bytes)).toString();
    assertThat(text).contains("," + PLANE + ",");
  }

  @Test
  void theObservationCsvRoundTripsTheNames() {
    String csv = services.files().exportObservationsCsv(impact.id());
    assertThat(csv).contains(INSPECTOR).contains(PLANE);
    // read back into a new inspection of the same structure, then written out again
    Inspection again = services.inspections().start(impact.structureId(),
        NewInspection.of(INSPECTOR, "", InspectionReason.ROUTINE));
    List<ObservationCsv.Row> rows = services.files().readObservationsCsv(again.id(), "obs.csv", csv);
    assertThat(rows).extracting(ObservationCsv.Row::recordedBy).contains(INSPECTOR);
    assertThat(rows).extracting(ObservationCsv.Row::plane).contains(PLANE);
    services.files().importObservationsCsv(again.id(), "obs.csv", csv);
    assertThat(services.files().exportObservationsCsv(again.id())).isEqualTo(csv);
  }

  private static String text(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      return new PDFTextStripper().getText(d).replaceAll("\\s+", " ");
    }
  }

  /** Every font on every page (and in the page's forms) is embedded and a tagged subset. */
  private static void assertEmbeddedSubsets(byte[] pdf) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      List<PDFont> fonts = new ArrayList<>();
      for (PDPage page : d.getPages()) {
        collect(page.getResources(), fonts, 0);
      }
      assertThat(fonts).isNotEmpty();
      for (PDFont f : fonts) {
        assertThat(f.isEmbedded()).as(f.getName() + " embedded").isTrue();
        assertThat(f.getName()).matches("[A-Z]{6}\\+DejaVuSans(-Bold|Mono)?");
      }
    }
  }

  private static void collect(PDResources res, List<PDFont> out, int depth) throws IOException {
    if (res == null || depth > 3) {
      return;
    }
    for (COSName n : res.getFontNames()) {
      out.add(res.getFont(n));
    }
    for (COSName n : res.getXObjectNames()) {
      PDXObject x = res.getXObject(n);
      if (x instanceof PDFormXObject form) {
        collect(form.getResources(), out, depth + 1);
      }
    }
  }

  /** Keeps a copy under target/unicode-names for a person to look at (pdftoppm). */
  private static void keep(String name, byte[] pdf) throws IOException {
    Path out = Path.of("target", "unicode-names");
    Files.createDirectories(out);
    Files.write(out.resolve(name), pdf);
  }
}
