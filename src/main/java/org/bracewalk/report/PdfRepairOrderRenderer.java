package org.bracewalk.report;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.util.HashMap;
import java.util.Map;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.RepairOrderRenderer;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.app.verdict.Cautions;
import org.bracewalk.core.port.report.ReportHeader;

/**
 * The crew's repair order as a PDF: the keep-off note first, then one row per action in working
 * order with where it is, what to fit, a locator sketch of the plane with the place marked and its
 * lifts and bays labelled, and boxes for who did it and when; the cautions last, worded for a
 * repair order.
 */
public final class PdfRepairOrderRenderer implements RepairOrderRenderer {
  private final TemplateSource source;
  private final String language;

  public PdfRepairOrderRenderer(TemplateSource source, String language) {
    this.source = source;
    this.language = language;
  }

  @Override
  public void renderRepairOrder(RepairOrderContent order, OutputStream out) throws IOException {
    Templates t = Templates.load(source, language);
    ReportHeader h = order.header();
    Wording w = new Wording(t, h);
    Map<String, PlaneGrid> grids = new HashMap<>();
    Map<String, PlaneRole> roles = new HashMap<>();
    for (PlaneSection p : order.planes()) {
      grids.put(p.name(), p.design().grid());
      roles.put(p.name(), p.role());
    }
    for (RepairStep a : order.actions()) {
      if (!grids.containsKey(a.plane())) {
        throw new RenderingException(
            "repair order action " + a.number() + " names plane '" + a.plane()
                + "', which the order does not carry");
      }
    }
    Pdf pdf = new Pdf();
    Document doc = new Document(PageSize.A4, 40, 40, 42, 50);
    ByteArrayOutputStream bytes = new ByteArrayOutputStream(32 * 1024);
    PageFurniture furniture = new PageFurniture(pdf, w, order.stamp(), h.draft(),
        w.text("doc.order.title"), w.dateTime(h.issuedAt()));
    try {
      PdfWriter writer = PdfWriter.getInstance(doc, bytes);
      writer.setPageEvent(furniture);
      furniture.describe(doc);
      doc.open();
      Paragraph title = new Paragraph(w.text("doc.order.title"), pdf.boldFont(17f));
      title.setSpacingAfter(2f);
      doc.add(title);
      doc.add(pdf.para(w.format("doc.subtitle", "site", h.siteName(), "structure",
          h.structureName(), "inspection", h.inspectionId()), 9f));
      doc.add(pdf.para(w.format("order.based-on", "inspection", h.inspectionId(), "date",
          w.dateTime(order.inspectedAt())), 8.5f));
      if (h.draft()) {
        doc.add(pdf.box(Palette.ALERT_FILL, Palette.DRAFT,
            new Paragraph(w.format("draft.banner", "inspection", h.inspectionId()),
                pdf.boldFont(9f, Palette.DRAFT))));
      }
      doc.add(pdf.box(Palette.ALERT_FILL, Palette.LOST,
          new Paragraph(w.text("order.safety"), pdf.boldFont(10f, Palette.LOST))));
      for (String keepOff : KeepOffLines.of(order.planes(), w)) {
        doc.add(pdf.box(Palette.ALERT_FILL, Palette.LOST,
            new Paragraph(keepOff, pdf.boldFont(9.5f, Palette.LOST))));
      }
      for (String restraint : KeepOffLines.restraint(order.planes(), w)) {
        doc.add(pdf.box(Palette.ALERT_FILL, Palette.DAMAGED,
            new Paragraph(restraint, pdf.boldFont(9f, Palette.DAMAGED))));
      }
      if (order.actions().isEmpty()) {
        doc.add(pdf.para(w.text("order.none"), 10f));
      } else {
        int count = order.actions().size();
        long rigidity = order.actions().stream().filter(PdfReportRenderer::urgent)
            .mapToInt(RepairStep::number).max().orElse(0);
        String intro = rigidity == 0 ? w.plural("order.intro.plain", count, "count", count)
            : count == 1 ? w.text("order.intro.one")
            : rigidity == count ? w.format("order.intro.all", "count", count)
            : w.format("order.intro.many", "count", count, "rigidity", rigidity);
        doc.add(pdf.para(intro, 9f));
        PdfPTable table = pdf.table(6, 20, 26, 35, 13);
        table.setHeaderRows(1);
        for (String k : new String[] {"number", "where", "what", "locator", "done"}) {
          table.addCell(pdf.headCell(w.text("order.col." + k)));
        }
        for (RepairStep a : order.actions()) {
          row(table, writer, pdf, w, a, grids.get(a.plane()), roles.get(a.plane()));
        }
        doc.add(table);
      }
      Paragraph review = new Paragraph(Cautions.STANDING, pdf.boldFont(8f));
      review.setSpacingBefore(4f);
      Paragraph lost = new Paragraph(w.text("caution.lost"), pdf.font(8f));
      lost.setSpacingBefore(4f);
      doc.add(pdf.box(Palette.NOTE_FILL, Palette.GRID,
          new Paragraph(w.text("heading.cautions"), pdf.boldFont(9f)),
          new Paragraph(w.text("order.caution"), pdf.boldFont(8f)),
          lost,
          review));
      doc.close();
    } catch (DocumentException e) {
      throw new RenderingException("the repair order could not be laid out: " + e.getMessage(), e);
    }
    out.write(bytes.toByteArray());
  }

  private static void row(PdfPTable table, PdfWriter writer, Pdf pdf, Wording w, RepairStep a,
      PlaneGrid grid, PlaneRole role) throws DocumentException {
    if (a.isFrameMember() && !a.frameMember().within(grid)) {
      throw new RenderingException("repair order action " + a.number() + " names the "
          + a.frameMember() + ", outside the " + grid.lifts() + " x " + grid.bays() + " plane '"
          + a.plane() + "'");
    }
    boolean urgent = PdfReportRenderer.urgent(a);
    Font f = urgent ? pdf.boldFont(8.5f, Palette.LOST) : pdf.font(8.5f);
    PdfPCell number = pdf.cell(String.valueOf(a.number()), pdf.boldFont(13f));
    number.setHorizontalAlignment(Element.ALIGN_CENTER);
    table.addCell(number);
    table.addCell(pdf.cell(PdfReportRenderer.location(w, a, role), pdf.boldFont(8.5f, Palette.GRID)));
    Phrase what = new Phrase(w.code("action", a.type().code()), pdf.boldFont(9.5f,
        urgent ? Palette.LOST : Palette.INK));
    if (a.member() != null || a.isFrameMember()) {
      what.add(new Phrase("\n" + PdfReportRenderer.member(w, a, role), pdf.font(8.5f)));
    }
    what.add(new Phrase("\n" + PdfReportRenderer.priority(w, a), f));
    if (a.deviation()) {
      what.add(new Phrase("\n" + w.text("repairs.deviation"), pdf.boldFont(7.5f, Palette.EXTRA)));
    }
    table.addCell(pdf.cell(what));
    float lw = 172f;
    float lh = 100f;
    Image locator = Image.getInstance(LocatorDrawing.draw(writer.getDirectContent(), w, pdf.regular,
        pdf.bold, grid, a, lw, lh));
    PdfPCell loc = new PdfPCell(locator, false);
    loc.setPadding(3f);
    loc.setBorderColor(new java.awt.Color(0xbb, 0xbb, 0xbb));
    loc.setBorderWidth(0.5f);
    loc.setHorizontalAlignment(Element.ALIGN_CENTER);
    table.addCell(loc);
    Phrase done = new Phrase(w.text("order.done-by") + "\n\n___________\n"
        + w.text("order.done-date") + "\n\n___________", pdf.font(8f));
    table.addCell(pdf.cell(done));
  }
}
