package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.bracewalk.core.port.report.ReportContent;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The report's layout read back from the PDF with PDFBox: page 1 says what to do where before
 * anything else; elevations are at standard scales, measured on the page; no page is left nearly
 * empty; a 50-frame racking run stays short and readable (the frames that hold their shape with
 * nothing found go into one table, the struck one has its section). Pages are also rendered with
 * pdftoppm into target/report-png for a person to look at.
 */
class ReportLayoutTest {
  /** Millimetres per PDF point: a point is 1/72 inch, an inch 25.4 mm. */
  private static final double MM_PER_POINT = 25.4 / 72;
  /**
   * The reduction scales of ISO 5455 (1:10, 1:20, 1:50, 1:100, 1:200, then on by tens) and 1:25,
   * common in building drawings (from memory).
   */
  private static final List<Integer> STANDARD_SCALES =
      List.of(10, 20, 25, 50, 100, 200, 500, 1000, 2000, 5000, 10000);

  private static byte[] fixture;
  private static byte[] run;

  @BeforeAll
  static void render() throws IOException {
    fixture = PdfReportRendererTest.render(ReportFixtures.report(true));
    run = PdfReportRendererTest.render(RackingRunFixture.report());
  }

  /** One string drawn on the page, with the box it covers (points, y from the page's top). */
  record Glyphs(String text, float x0, float x1, float y, int page) {
    float centreX() {
      return (x0 + x1) / 2;
    }
  }

  /** Every string in content order, glyphs run together while they follow on the same line. */
  static List<Glyphs> strings(byte[] pdf) throws IOException {
    List<Glyphs> out = new ArrayList<>();
    try (PDDocument d = Loader.loadPDF(pdf)) {
      for (int page = 1; page <= d.getNumberOfPages(); page++) {
        int current = page;
        List<TextPosition> run = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper() {
          @Override
          protected void processTextPosition(TextPosition t) {
            if (!run.isEmpty()) {
              TextPosition last = run.get(run.size() - 1);
              boolean follows = Math.abs(last.getYDirAdj() - t.getYDirAdj()) < 0.5f
                  && Math.abs(last.getXDirAdj() + last.getWidthDirAdj() - t.getXDirAdj()) < 1f;
              if (!follows) {
                flush(run, out, current);
              }
            }
            run.add(t);
          }
        };
        s.setSortByPosition(false);
        s.setStartPage(page);
        s.setEndPage(page);
        s.getText(d);
        flush(run, out, current);
      }
    }
    return out;
  }

  private static void flush(List<TextPosition> run, List<Glyphs> out, int page) {
    if (run.isEmpty()) {
      return;
    }
    StringBuilder sb = new StringBuilder();
    run.forEach(t -> sb.append(t.getUnicode()));
    TextPosition first = run.get(0);
    TextPosition last = run.get(run.size() - 1);
    out.add(new Glyphs(sb.toString(), first.getXDirAdj(), last.getXDirAdj() + last.getWidthDirAdj(),
        first.getYDirAdj(), page));
    run.clear();
  }

  @Test
  void pageOneSaysWhereToKeepOffAndHowManyRepairsBeforeAnythingElse() throws IOException {
    String first = PdfReportRendererTest.flat(PdfReportRendererTest.pageTexts(fixture).get(0));
    // the facade: lost lift 3 and everything above it, every bay (KeepOffZone); actions 1, 2
    // (take out of service, replace for rigidity) at once, 4 and 5 to restore the design
    assertThat(first).contains("North elevation lost rigidity lifts 3-5, every bay"
        + " 4 actions, 2 at once: actions 1, 2, 4 and 5")
        .contains("Plan bracing L3 lost rigidity every lift, every bay"
        + " 1 action, 1 at once: action 3");
    // on the page, top to bottom: what to do where, then the alert, the summary, the cautions
    // and the particulars
    assertTopToBottom(strings(fixture), "What to do, and where", "North elevation",
        "Plan bracing L3", "LOST RIGIDITY", "Summary: does each plane hold its shape?",
        "Cautions", "Particulars of the inspection");
  }

  /** Each text's first line on page 1 lies below the one before it. */
  private static void assertTopToBottom(List<Glyphs> all, String... texts) {
    float last = -1;
    for (String t : texts) {
      float y = all.stream().filter(g -> g.page() == 1 && g.text().contains(t))
          .map(Glyphs::y).min(Float::compare)
          .orElseThrow(() -> new AssertionError("'" + t + "' is not on page 1"));
      assertThat(y).as("'%s' lies below the text before it", t).isGreaterThan(last);
      last = y;
    }
  }

  @Test
  void aRackingFrameThatLostRigidityNamesTheBeamBaysBesideItOnPageOne() throws IOException {
    // (a cell may wrap after a range's hyphen)
    String first = PdfReportRendererTest.flat(PdfReportRendererTest.pageTexts(run).get(0))
        .replace("- ", "-");
    // frame 7 lost its panel-2 diagonal: lifts 2-6 sway (everything above the lowest swaying lift)
    assertThat(first).contains(RackingRunFixture.STRUCK + " lost rigidity lifts 2-6, every bay;"
        + " and off-load the beam bays on both sides of this upright frame"
        + " 3 actions, 3 at once: actions 1-3");
    assertThat(first).contains("The other 48 planes hold their shape as found, with nothing found");
    assertTopToBottom(strings(run), "What to do, and where", "LOST RIGIDITY",
        "Summary: does each plane hold its shape?");
  }

  @Test
  void elevationsAreAtTheStatedStandardScaleMeasuredOnThePage() throws IOException {
    List<Glyphs> all = strings(fixture);
    // North elevation: bays 2.4 m (x 9) and 1.8 m; bay labels at the middle of each bay, so the
    // centres of B1 and B10 are 1.2 + 8 x 2.4 + 0.9 = 21.3 m apart; lift labels of 2.0 m lifts, L1
    // to L5 centres 8.0 m apart
    checkScale(all, "Plane: North elevation", "B1", "B10", 21.3, true);
    checkScale(all, "Plane: North elevation", "L1", "L5", 8.0, false);
    // Plan bracing L3: bays of 2.4 m, B1 to B3 centres 4.8 m apart
    checkScale(all, "Plane: Plan bracing L3", "B1", "B3", 4.8, true);
  }

  private static void checkScale(List<Glyphs> all, String section, String from, String to,
      double metres, boolean across) {
    int start = indexOf(all, section, 0);
    int title = indexOf(all, "scale 1:", start);
    Matcher m = Pattern.compile("scale 1:(\\d+)").matcher(all.get(title).text());
    assertThat(m.find()).isTrue();
    int scale = Integer.parseInt(m.group(1));
    assertThat(STANDARD_SCALES).contains(scale);
    Glyphs a = all.get(exact(all, from, title));
    Glyphs b = all.get(exact(all, to, title));
    double points = across ? Math.abs(b.centreX() - a.centreX()) : Math.abs(b.y() - a.y());
    double paperMm = points * MM_PER_POINT;
    double realMm = metres * 1000;
    // the stated scale, within the rounding of text positions (0.2 per cent)
    assertThat(paperMm / realMm * scale).as("%s %s-%s at 1:%d", section, from, to, scale)
        .isCloseTo(1.0, org.assertj.core.data.Offset.offset(0.002));
  }

  private static int indexOf(List<Glyphs> all, String text, int from) {
    for (int i = from; i < all.size(); i++) {
      if (all.get(i).text().contains(text)) {
        return i;
      }
    }
    throw new AssertionError("'" + text + "' not found after string " + from);
  }

  private static int exact(List<Glyphs> all, String text, int from) {
    for (int i = from; i < all.size(); i++) {
      if (all.get(i).text().equals(text)) {
        return i;
      }
    }
    throw new AssertionError("'" + text + "' not found after string " + from);
  }

  @Test
  void actionNumbersSitAtMidHeightInsideTheirPanelAwayFromTheCorners() throws IOException {
    List<Glyphs> all = strings(fixture);
    int start = indexOf(all, "Plane: North elevation", 0);
    int title = indexOf(all, "scale 1:", start);
    // action 2 replaces the diagonal of lift 3, bay 1
    Glyphs b1 = all.get(exact(all, "B1", title));
    Glyphs b2 = all.get(exact(all, "B2", title));
    Glyphs l3 = all.get(exact(all, "L3", title));
    Glyphs l4 = all.get(exact(all, "L4", title));
    float bay = b2.centreX() - b1.centreX();
    float lift = l3.y() - l4.y();
    float left = b1.centreX() - bay / 2;
    Glyphs label = all.subList(title, all.size()).stream()
        .filter(g -> g.text().equals("2") && g.x0() > left && g.x1() < left + bay
            && Math.abs(g.y() - l3.y()) < lift / 2)
        .findFirst().orElseThrow(() -> new AssertionError("no action label 2 in lift 3, bay 1"));
    // at the panel's mid-height (the lift label's line, within 2 points) ...
    assertThat(Math.abs(label.y() - l3.y())).isLessThan(2f);
    // ... and clear of both side corners by a fifth of the bay
    assertThat(label.x0() - left).isGreaterThan(bay * 0.1f);
    assertThat(left + bay - label.x1()).isGreaterThan(bay * 0.2f);
  }

  @Test
  void alikePlanesShareOneScale() {
    // the run's struck and bent frames are alike (same role, grid and size): one scale
    ReportContent r = RackingRunFixture.report();
    var a = r.planes().stream().filter(p -> p.name().equals(RackingRunFixture.STRUCK)).findFirst()
        .orElseThrow();
    var b = r.planes().stream().filter(p -> p.name().equals(RackingRunFixture.BENT)).findFirst()
        .orElseThrow();
    var scales = PlaneScales.common(List.of(a, b),
        java.util.Map.of(a.name(), 50, b.name(), 25));
    assertThat(scales).containsEntry(a.name(), 50).containsEntry(b.name(), 50);
    // a plane of another size keeps its own
    var c = ReportFixtures.facade();
    scales = PlaneScales.common(List.of(a, c), java.util.Map.of(a.name(), 25, c.name(), 200));
    assertThat(scales).containsEntry(a.name(), 25).containsEntry(c.name(), 200);
  }

  @Test
  void theRunsTwoFramesWithFindingsAreDrawnAtOneStandardScale() throws IOException {
    List<Glyphs> all = strings(run);
    List<Integer> scales = new ArrayList<>();
    for (String frame : new String[] {RackingRunFixture.STRUCK, RackingRunFixture.BENT}) {
      int start = indexOf(all, "Plane: " + frame, 0);
      Matcher m = Pattern.compile("scale 1:(\\d+)").matcher(all.get(indexOf(all, "scale 1:", start)).text());
      assertThat(m.find()).isTrue();
      scales.add(Integer.parseInt(m.group(1)));
    }
    assertThat(scales.get(0)).isEqualTo(scales.get(1)).isIn(STANDARD_SCALES);
  }

  @Test
  void noPageIsNearlyEmpty() throws IOException {
    for (byte[] pdf : List.of(fixture, run)) {
      List<Glyphs> all = strings(pdf);
      int pages = all.stream().mapToInt(Glyphs::page).max().orElse(0);
      for (int page = 1; page <= pages; page++) {
        int p = page;
        // the body runs from 42 points below the top of an A4 page (842 points) to 50 above its
        // foot; the footer lies below that
        float lowest = (float) all.stream().filter(g -> g.page() == p && g.y() < 842 - 50)
            .mapToDouble(Glyphs::y).max().orElse(42);
        double filled = (lowest - 42) / (842 - 42 - 50);
        assertThat(filled).as("page %d of %d is filled to %.0f per cent", page, pages, filled * 100)
            .isGreaterThan(page == pages ? 0.1 : 0.25);
      }
    }
  }

  @Test
  void theFiftyFrameRunStaysShort() throws IOException {
    List<String> pages = PdfReportRendererTest.pageTexts(run);
    String all = PdfReportRendererTest.flat(String.join("\n", pages));
    // two sections (the struck frame and the bent one), the other 48 in the compact table
    assertThat(all).contains("Plane: " + RackingRunFixture.STRUCK)
        .contains("Plane: " + RackingRunFixture.BENT)
        .doesNotContain("Plane: " + RackingRunFixture.frameName(1) + " ");
    assertThat(all).contains("Planes that hold their shape, with nothing found");
    for (int k = 1; k <= RackingRunFixture.FRAMES; k++) {
      assertThat(all).contains(RackingRunFixture.frameName(k) + " ");
    }
    // the racking action: off-load the beam bays either side of the struck frame, at once
    assertThat(all).contains(RackingRunFixture.STRUCK
        + ": the beam bays on both sides of it, lifts 2-6 off-load the beam bays on both sides");
    // 48 frames at about ten to a page, not 48 pages; the 204 record digests in the appendix
    assertThat(pages.size()).isLessThan(16);
    assertThat(PdfReportRendererTest.flat(pages.get(pages.size() - 1)))
        .contains(String.format("%064x", 50L * 7919 + "photos".length()));
  }

  @Test
  void thePagesRenderForAPersonToLookAt() throws Exception {
    assumeTrue(PageImagesTest.pdftoppm(), "pdftoppm (poppler-utils) is not installed");
    Path dir = PageImagesTest.render(run, "racking-run", 1, 6);
    PageImagesTest.render(fixture, "layout", 1, 6);
    // pdftoppm pads the page number to the width of the last page's
    Path page1 = java.nio.file.Files.exists(dir.resolve("racking-run-01.png"))
        ? dir.resolve("racking-run-01.png") : dir.resolve("racking-run-1.png");
    BufferedImage first = ImageIO.read(page1.toFile());
    assertThat(PageImagesTest.inkRows(first)).isGreaterThan(150);
  }
}
