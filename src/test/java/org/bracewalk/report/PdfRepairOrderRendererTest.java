package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.report.DocumentStamp;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

class PdfRepairOrderRendererTest {
  private static byte[] pdf;

  @BeforeAll
  static void render() throws IOException {
    pdf = render(ReportFixtures.order());
    Path dir = Path.of("target", "report-test");
    Files.createDirectories(dir);
    Files.write(dir.resolve("fixture-repair-order.pdf"), pdf);
  }

  static byte[] render(RepairOrderContent o) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfRepairOrderRenderer(TemplateSource.packed(), "en").renderRepairOrder(o, out);
    return out.toByteArray();
  }

  @Test
  void everyActionIsListedInOrderWithWhereAndWhatToFit() throws IOException {
    String text = PdfReportRendererTest.flat(String.join("\n", PdfReportRendererTest.pageTexts(pdf)));
    int last = -1;
    for (RepairStep a : ReportFixtures.actions()) {
      String where = a.lifts().size() == 1 && a.type().code().equals("out-of-service")
          ? a.plane() + ", lift " + a.lifts().get(0) + ", every bay"
          : a.plane() + ", lift " + a.panel().lift() + ", bay " + a.panel().bay();
      int at = text.indexOf(a.number() + " " + where);
      assertThat(at).as("action %d", a.number()).isGreaterThan(last);
      last = at;
    }
    assertThat(text).contains("take out of service").contains("diagonal rising to the right (/)")
        .contains("at once: needed for rigidity");
  }

  @Test
  void theKeepOffNoteAndDoneBoxesArePresent() throws IOException {
    String text = PdfReportRendererTest.flat(String.join("\n", PdfReportRendererTest.pageTexts(pdf)));
    assertThat(text).contains("Keep people and loads off every part named here as out of service")
        .contains("reviewed by a licensed engineer");
    assertThat(text.split("___________ date", -1)).hasSize(ReportFixtures.actions().size() + 1);
    // the caution speaks of the repair order itself
    assertThat(text).contains("This repair order comes from a check of bracing continuity")
        .doesNotContain("this report");
  }

  @Test
  void eachActionHasAVectorLocatorSketch() throws IOException {
    try (PDDocument d = Loader.loadPDF(pdf)) {
      int forms = 0;
      for (PDPage page : d.getPages()) {
        for (COSName name : page.getResources().getXObjectNames()) {
          if (page.getResources().getXObject(name) instanceof PDFormXObject form) {
            String content = new String(form.getContentStream().toByteArray());
            if (!content.contains(" l")) {
              continue; // the page total of "page n of N": text only
            }
            forms++;
            // the grid, the marked place, and the lift and bay labels
            assertThat(content).contains(" l").contains(" re").contains("Tj");
            // large enough for a phone's photo of the page: at least 60 mm wide (170 points),
            // every label at least 7 points (about 2.5 mm high)
            assertThat(form.getBBox().getWidth()).isGreaterThanOrEqualTo(170f);
            java.util.regex.Matcher tf = java.util.regex.Pattern
                .compile("/\\S+ ([0-9.]+) Tf").matcher(content);
            while (tf.find()) {
              assertThat(Float.parseFloat(tf.group(1))).isGreaterThanOrEqualTo(7f);
            }
          }
        }
      }
      assertThat(forms).isEqualTo(ReportFixtures.actions().size());
    }
  }

  @Test
  void eachLocatorLabelsItsLiftsAndBaysWithTheMarkedOnesShown() throws IOException {
    String text = PdfReportRendererTest.flat(String.join("\n", PdfReportRendererTest.pageTexts(pdf)));
    // action 2 is in lift 3, bay 1 of the facade; action 5 in lift 5, bay 10; the plan bracing
    // (3 bays) shows every bay
    assertThat(text).contains("L3").contains("B1").contains("L5").contains("B10")
        .contains("B2").contains("B3");
  }

  @Test
  void theOrderIsStampedAsARepairOrder() throws IOException {
    var stamp = new PdfDocumentStampReader().readStamp(new ByteArrayInputStream(pdf));
    assertThat(stamp).isPresent();
    assertThat(stamp.get().kind()).isEqualTo(DocumentStamp.REPAIR_ORDER);
    assertThat(stamp.get().fingerprint()).isEqualTo(ReportFixtures.fingerprint());
  }

  @Test
  void anActionOnAPlaneTheOrderDoesNotCarryIsRefused() {
    RepairOrderContent o = ReportFixtures.order();
    RepairOrderContent bad = new RepairOrderContent(o.header(), o.inspectedAt(), List.of(), o.actions(), o.fingerprint());
    assertThatThrownBy(() -> render(bad)).isInstanceOf(RenderingException.class)
        .hasMessageContaining("action 1 names plane 'North elevation'");
  }
}
