package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.lowagie.text.PageSize;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The elevation's key lies inside the page margins and no entry's words run into the next
 * entry's sample, with the embedded DejaVu Sans (about a tenth wider than the Helvetica the key
 * was first laid out for). Read back with PDFBox from the demo's reports, the widest plane among
 * them (the north facade, 10 bays) included. Page size: ISO 216 A4, 595.28 x 841.89 points; the
 * margins are the documents' own (40 points each side).
 */
class LegendLayoutTest {
  private static final float LEFT = 40f;
  private static final float RIGHT = PageSize.A4.getWidth() - 40f;
  /** Rounding of text positions read back (a hundredth of a point is written). */
  private static final float SLACK = 0.5f;

  @TempDir Path dir;
  private AppServices services;

  @AfterEach
  void close() {
    if (services != null) {
      services.close();
    }
  }

  private static Wording wording() {
    return new Wording(Templates.load(TemplateSource.packed(), "en"),
        ReportFixtures.header(true, org.bracewalk.core.port.report.LengthUnits.METRIC, "scaffold"));
  }

  @Test
  void everyEntryFitsTheWidthAndLeavesRoomForTheNextSample() {
    Pdf pdf = new Pdf();
    float width = RIGHT - LEFT;
    for (boolean frame : new boolean[] {false, true}) {
      List<Legend.Place> places = Legend.layout(wording(), pdf.regular, width, frame);
      assertThat(places).hasSize(frame ? 23 : 14);
      for (int k = 0; k < places.size(); k++) {
        Legend.Place p = places.get(k);
        assertThat(p.x()).as(p.entry()).isGreaterThanOrEqualTo(0f);
        assertThat(p.right()).as("%s ends inside the width", p.entry()).isLessThanOrEqualTo(width);
        // and the wording is short enough for two entries a row (so the key stays compact)
        assertThat(p.right() - p.x()).as("%s within half the width", p.entry())
            .isLessThanOrEqualTo(width / 2);
        if (k + 1 < places.size() && places.get(k + 1).row() == p.row()) {
          // the next sample starts after these words, with a gap
          assertThat(places.get(k + 1).x()).as("%s then %s", p.entry(), places.get(k + 1).entry())
              .isGreaterThan(p.right() + 4f);
        }
      }
      // the height given to the page layout is the rows laid out
      int rows = places.get(places.size() - 1).row() + 1;
      assertThat(Legend.height(wording(), pdf.regular, width, frame))
          .isEqualTo(12f + 11f * rows + 2f);
    }
  }

  @Test
  void wordsTooLongForARowAreSetSmallerToFitIt(@TempDir Path templates) throws IOException {
    // a translation may word an entry longer than the whole width: it gets a row of its own
    String text = java.nio.file.Files.readString(Path.of("templates", "report.en.properties"));
    String longer = "to fit where the design has it" + ", and so on".repeat(30);
    text = text.replaceFirst("(?m)^legend\\.repair=.*$", "legend.repair=" + longer);
    java.nio.file.Files.writeString(templates.resolve("report.en.properties"), text);
    Wording w = new Wording(Templates.load(TemplateSource.folder(templates), "en"),
        ReportFixtures.header(true, org.bracewalk.core.port.report.LengthUnits.METRIC, "scaffold"));
    float width = RIGHT - LEFT;
    List<Legend.Place> places = Legend.layout(w, new Pdf().regular, width, false);
    Legend.Place repair = places.stream().filter(p -> p.entry().equals("repair")).findFirst()
        .orElseThrow();
    assertThat(repair.words()).isEqualTo(longer);
    assertThat(repair.size()).isLessThan(Legend.TEXT_SIZE);
    assertThat(repair.x()).isZero();
    assertThat(repair.right()).isLessThanOrEqualTo(width + 0.01f);
    int k = places.indexOf(repair);
    assertThat(places.get(k - 1).row()).isLessThan(repair.row());
    assertThat(places.get(k + 1).row()).isGreaterThan(repair.row());
    for (Legend.Place p : places) {
      assertThat(p.right()).as(p.entry()).isLessThanOrEqualTo(width + 0.01f);
    }
  }

  @Test
  void theKeyOfEveryElevationOfTheDemoLiesInsideThePageMargins() throws IOException {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(dir.resolve("demo.db")), clock,
        PlaneAnalyzer.standard());
    ReportService reports = new ReportService(services, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
    ImportedSite demo = services.demo().load();
    int widest = 0;
    Wording w = wording();
    List<String> words = new ArrayList<>();
    for (String e : List.of("design", "not-inspected", "not-reachable", "repair", "repair-new",
        "part", "frame-ineffective", "frame-not-inspected", "frame-not-reachable",
        "frame-extra", "loose-end")) {
      words.add(w.text("legend." + e));
    }
    int keys = 0;
    for (Inspection i : demo.inspections()) {
      for (PlaneRecord p : services.sites().planes(i.structureId())) {
        widest = Math.max(widest, p.grid().bays());
      }
      List<Line> lines = lines(reports.reportPdf(i.id()));
      for (Line l : lines) {
        boolean key = words.stream().anyMatch(l.text()::contains);
        if (!key) {
          continue;
        }
        keys++;
        assertThat(l.left()).as("'%s' starts inside the left margin", l.text())
            .isGreaterThanOrEqualTo(LEFT - SLACK);
        assertThat(l.right()).as("'%s' ends inside the right margin", l.text())
            .isLessThanOrEqualTo(RIGHT + SLACK);
      }
    }
    assertThat(widest).as("the demo's widest plane").isEqualTo(10);
    assertThat(keys).as("key lines read back").isGreaterThan(10);
  }

  /** One line of text as PDFBox groups it, with the left and right ends of its glyphs. */
  record Line(String text, float left, float right) {}

  private static List<Line> lines(byte[] pdf) throws IOException {
    List<Line> out = new ArrayList<>();
    try (PDDocument d = Loader.loadPDF(pdf)) {
      PDFTextStripper s = new PDFTextStripper() {
        @Override
        protected void writeString(String text, List<TextPosition> positions) {
          float left = Float.MAX_VALUE;
          float right = -Float.MAX_VALUE;
          for (TextPosition t : positions) {
            left = Math.min(left, t.getXDirAdj());
            right = Math.max(right, t.getXDirAdj() + t.getWidthDirAdj());
          }
          out.add(new Line(text, left, right));
        }
      };
      s.setSortByPosition(true);
      s.getText(d);
    }
    return out;
  }
}
