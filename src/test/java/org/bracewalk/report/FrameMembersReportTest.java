package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.ReportContent;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * Frame members (ledgers, standards; racking beams, horizontals, uprights) in the report and the
 * repair order, from the hand-made examples A and I of shared/design/analysis.md ("Frame
 * members", whose freedoms were computed there from the rigidity matrix): their states, the three
 * kinds of freedom in words, the repair actions and their order, read back with PDFBox; the pages
 * rendered by poppler's pdftoppm for a person to look at (target/report-png).
 */
class FrameMembersReportTest {
  private static byte[] scaffold;
  private static byte[] racking;
  private static byte[] order;

  @BeforeAll
  static void render() throws IOException {
    scaffold = report(ReportFixtures.frameReport());
    racking = report(ReportFixtures.rackingReport());
    order = order(ReportFixtures.frameOrder());
  }

  static byte[] report(ReportContent r) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(r, out);
    return out.toByteArray();
  }

  static byte[] order(RepairOrderContent o) throws IOException {
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfRepairOrderRenderer(TemplateSource.packed(), "en").renderRepairOrder(o, out);
    return out.toByteArray();
  }

  static String text(byte[] pdf) throws IOException {
    return PdfReportRendererTest.flat(String.join("\n", PdfReportRendererTest.pageTexts(pdf)));
  }

  @Test
  void pageOneNamesTheJointWithoutSidewaysRestraintAfterTheKeepOffLine() throws IOException {
    String first = PdfReportRendererTest.flat(PdfReportRendererTest.pageTexts(scaffold).get(0));
    // the keep-off zone comes first, in the table of what to do where
    int keepOff = first.indexOf("Return end R1 lost sideways restraint: an engineer checks the"
        + " member before loading every lift, every bay 2 actions, 2 at once: actions 1 and 2");
    int restraint = first.indexOf("Plane Return end R1: no sideways restraint at level 1, line 0."
        + " The members running through there have a longer unbraced length: an engineer checks"
        + " them before the plane is loaded.");
    assertThat(keepOff).isNotNegative();
    assertThat(restraint).isGreaterThan(keepOff);
    // the cautions stay as they were
    assertThat(first).contains("on a model in which every joint is a pin")
        .contains("reviewed by a licensed engineer");
  }

  @Test
  void thePlanePageTellsTheFreedomsApartInWords() throws IOException {
    String text = text(scaffold);
    assertThat(text).contains("No sideways restraint at level 1, line 0: the standard of lift 1 on"
        + " line 0 and standard of lift 2 on line 0 run straight through it with nothing holding"
        + " them sideways.")
        .contains("an engineer checks them before the plane is loaded")
        .contains("Frame members the design leaves out (never proposed in a repair): ledger at"
            + " level 0, bay 1.")
        .contains("Critical frame members (losing any one of them adds a free motion): ledger at"
            + " level 2, bay 1, ledger at level 3, bay 1, standard of lift 1 on line 0")
        .contains("How it can move: the joint at level 1, line 0 has no sideways restraint");
    String rack = text(racking);
    assertThat(rack).contains("Part A sways (2 free motions): the joints at levels 2-4, lines"
        + " 0 and 1 move with it.")
        .contains("Recorded as not inspected: 1 frame member, counted as missing.")
        .contains("How it can move: part A sways, with the joints drawn moved");
  }

  @Test
  void findingsNameTheFrameMemberInTheStructuresWords() throws IOException {
    assertThat(text(scaffold)).contains("Return end R1, ledger at level 1, bay 1 missing")
        .contains("Return end R1, standard of lift 3 on line 1 damaged, still counts")
        .contains("Ledger taken out for access to the hoist.");
    // an upright frame of storage racking: uprights and horizontals
    assertThat(text(racking)).contains("Upright frame F4, upright of lift 2 on line 0 missing")
        .contains("Upright frame F4, upright of lift 2 on line 1 damaged beyond use")
        .contains("Upright frame F4, horizontal at level 0, bay 1 not inspected")
        .doesNotContain("ledger at").doesNotContain("standard of");
  }

  @Test
  void theRepairPlanRefitsReplacesAndInspectsFrameMembers() throws IOException {
    assertThat(text(scaffold)).contains("2 Return end R1, ledger at level 1, bay 1 refit ledger at once:"
        + " needed for rigidity");
    String rack = text(racking);
    assertThat(rack).contains("2 Upright frame F4: the beam bays on both sides of it, lifts 1-4"
            + " off-load the beam bays on both sides")
        .contains("3 Upright frame F4, upright of lift 2 on line 0 refit upright")
        .contains("4 Upright frame F4, upright of lift 2 on line 1 replace upright")
        .contains("5 Upright frame F4, horizontal at level 0, bay 1 inspect, fit if missing"
            + " horizontal restores the design's redundancy");
  }

  @Test
  void theRepairOrderListsFrameActionsInOrderEachWithALocator() throws IOException {
    String text = text(order);
    List<String> expected = List.of(
        "1 Return end R1, lifts 1-3, every bay",
        "2 Return end R1, beam at level 1, bay 1 refit beam",
        "3 Upright frame F4, lifts 1-4, every bay",
        "4 Upright frame F4: the beam bays on both sides of it, lifts 1-4 off-load the beam bays"
            + " on both sides",
        "5 Upright frame F4, upright of lift 2 on line 0 refit upright",
        "6 Upright frame F4, upright of lift 2 on line 1 replace upright",
        "7 Upright frame F4, horizontal at level 0, bay 1 inspect, fit if missing horizontal");
    int last = -1;
    for (String e : expected) {
      int at = text.indexOf(e);
      assertThat(at).as(e).isGreaterThan(last);
      last = at;
    }
    assertThat(text).contains("Plane Return end R1: no sideways restraint at level 1, line 0.");
  }

  @Test
  void thePagesRenderAndShowTheFrameStates() throws Exception {
    assumeTrue(PageImagesTest.pdftoppm(), "pdftoppm (poppler-utils) is not installed");
    Path dir = PageImagesTest.render(scaffold, "frame-scaffold", 1, 3);
    PageImagesTest.render(racking, "frame-racking", 1, 3);
    PageImagesTest.render(order, "frame-order", 1, 2);
    BufferedImage first = ImageIO.read(dir.resolve("frame-scaffold-1.png").toFile());
    assertThat(PageImagesTest.inkRows(first)).isGreaterThan(200);
  }
}
