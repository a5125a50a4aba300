package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

/**
 * Renders the first pages of a report to PNG with poppler's pdftoppm (an outside renderer: if it
 * draws them, so will a reader's viewer) and checks the pictures, not just the file. Skipped when
 * pdftoppm is not installed ({@code .ci/run} installs poppler-utils). The PNGs stay in
 * target/report-png for a person to look at.
 */
class PageImagesTest {

  static boolean pdftoppm() {
    try {
      Process p = new ProcessBuilder("pdftoppm", "-v").redirectErrorStream(true).start();
      p.getInputStream().readAllBytes();
      return p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0;
    } catch (IOException | InterruptedException e) {
      return false;
    }
  }

  static Path render(byte[] pdf, String name, int first, int last) throws Exception {
    Path dir = Path.of("target", "report-png");
    Files.createDirectories(dir);
    Path file = dir.resolve(name + ".pdf");
    Files.write(file, pdf);
    Process p = new ProcessBuilder("pdftoppm", "-r", "60", "-png", "-f", String.valueOf(first),
        "-l", String.valueOf(last), file.toString(), dir.resolve(name).toString())
        .redirectErrorStream(true).start();
    String log = new String(p.getInputStream().readAllBytes());
    assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
    assertThat(p.exitValue()).as(log).isZero();
    return dir;
  }

  /** Share of pixels that are clearly coloured (not grey), in a region given as page fractions. */
  static double colouredShare(BufferedImage img, double x0, double y0, double x1, double y1,
      int red, int green, int blue) {
    int n = 0;
    int hit = 0;
    for (int y = (int) (y0 * img.getHeight()); y < (int) (y1 * img.getHeight()); y++) {
      for (int x = (int) (x0 * img.getWidth()); x < (int) (x1 * img.getWidth()); x++) {
        int rgb = img.getRGB(x, y);
        int r = (rgb >> 16) & 0xff;
        int g = (rgb >> 8) & 0xff;
        int b = rgb & 0xff;
        n++;
        if (Math.abs(r - red) < 40 && Math.abs(g - green) < 40 && Math.abs(b - blue) < 40) {
          hit++;
        }
      }
    }
    return n == 0 ? 0 : (double) hit / n;
  }

  /**
   * How many pixels in a region (page fractions) have {@code c} within 8 of each component: close
   * enough that white (which differs from the light alert red by 4, 27 and 23) is never counted.
   */
  static int pixelsOf(BufferedImage img, double x0, double y0, double x1, double y1,
      java.awt.Color c) {
    int hit = 0;
    for (int y = (int) (y0 * img.getHeight()); y < (int) (y1 * img.getHeight()); y++) {
      for (int x = (int) (x0 * img.getWidth()); x < (int) (x1 * img.getWidth()); x++) {
        int rgb = img.getRGB(x, y);
        if (Math.abs(((rgb >> 16) & 0xff) - c.getRed()) <= 8
            && Math.abs(((rgb >> 8) & 0xff) - c.getGreen()) <= 8
            && Math.abs((rgb & 0xff) - c.getBlue()) <= 8) {
          hit++;
        }
      }
    }
    return hit;
  }

  /** The number of the first page whose text holds {@code text}. */
  static int firstPageWith(byte[] pdf, String text) throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      PDFTextStripper s = new PDFTextStripper();
      for (int i = 1; i <= d.getNumberOfPages(); i++) {
        s.setStartPage(i);
        s.setEndPage(i);
        if (s.getText(d).contains(text)) {
          return i;
        }
      }
    }
    throw new AssertionError("no page holds '" + text + "'");
  }

  static int inkRows(BufferedImage img) {
    int rows = 0;
    for (int y = 0; y < img.getHeight(); y++) {
      for (int x = 0; x < img.getWidth(); x++) {
        if ((img.getRGB(x, y) & 0xff) < 128) {
          rows++;
          break;
        }
      }
    }
    return rows;
  }

  @Test
  void theFirstPagesRenderWithTheAlertAndTheHatchedSwayingLift() throws Exception {
    assumeTrue(pdftoppm(), "pdftoppm (poppler-utils) is not installed");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(ReportFixtures.report(true), out);
    // the plane page follows the particulars, which may run over onto a second page
    int planePage = firstPageWith(out.toByteArray(), "Plane: ");
    Path dir = render(out.toByteArray(), "fixture", 1, planePage);
    BufferedImage first = ImageIO.read(dir.resolve("fixture-1.png").toFile());
    BufferedImage plane = ImageIO.read(dir.resolve("fixture-" + planePage + ".png").toFile());
    // A4 at 60 dpi
    assertThat(first.getWidth()).isBetween(490, 500);
    assertThat(inkRows(first)).as("page one carries text").isGreaterThan(200);
    // the alert box on page one is filled with its light red: at least a box of 300 x 15 px
    // (the text width by two lines at 60 dpi) of that colour, counted within a tolerance that
    // leaves white out, in the upper half of the page where the alert stands
    assertThat(pixelsOf(first, 0, 0, 1, 0.5, Palette.ALERT_FILL)).as("alert fill pixels on page 1")
        .isGreaterThan(300 * 15);
    // the plane page: the hatched tint of the swaying lift lies in the drawing's upper half
    assertThat(colouredShare(plane, 0.1, 0.2, 0.9, 0.6, 0xf7, 0xd3, 0xd9)).isGreaterThan(0.02);
  }

  @Test
  void theAlertCountFindsNoAlertWhereEveryPlaneHoldsItsShape() throws Exception {
    // the other side of the count above: a report whose one plane holds its shape draws its
    // page-1 box in the light green of "nothing to act on", so the count of the alert's red is 0
    assumeTrue(pdftoppm(), "pdftoppm (poppler-utils) is not installed");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    var holds = new org.bracewalk.core.port.report.ReportContent(
        ReportFixtures.header(true, org.bracewalk.core.port.report.LengthUnits.METRIC, "scaffold"),
        ReportFixtures.particulars(), java.util.List.of(ReportFixtures.frame()),
        java.util.List.of(), java.util.List.of(), ReportFixtures.fingerprint());
    new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(holds, out);
    Path dir = render(out.toByteArray(), "holds", 1, 1);
    BufferedImage first = ImageIO.read(dir.resolve("holds-1.png").toFile());
    assertThat(pixelsOf(first, 0, 0, 1, 0.5, Palette.ALERT_FILL)).isLessThan(300 * 15);
    assertThat(pixelsOf(first, 0, 0, 1, 0.5, Palette.OK_FILL)).isGreaterThan(300 * 15);
  }

  @Test
  void theRepairOrderRenders() throws Exception {
    assumeTrue(pdftoppm(), "pdftoppm (poppler-utils) is not installed");
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfRepairOrderRenderer(TemplateSource.packed(), "en").renderRepairOrder(ReportFixtures.order(), out);
    Path dir = render(out.toByteArray(), "order", 1, 1);
    BufferedImage page = ImageIO.read(dir.resolve("order-1.png").toFile());
    assertThat(inkRows(page)).isGreaterThan(150);
    // the locator sketches mark their panels in the repair colour
    assertThat(colouredShare(page, 0.55, 0.15, 0.8, 0.6, 0x0f, 0x7a, 0x5a)).isGreaterThan(0.001);
  }
}
