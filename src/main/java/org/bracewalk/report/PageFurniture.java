package org.bracewalk.report;

import com.lowagie.text.Document;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfGState;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;
import java.util.Map;
import org.bracewalk.core.port.report.DocumentStamp;

/**
 * What every page carries, drawn as each page ends: the footer ("page n of N", the record
 * fingerprint, the inspection and issue time), the running title, and the DRAFT mark while the
 * inspection is open. N is not known until the end, so it is a small form filled in when the
 * document closes. The machine-readable stamp goes into the document information.
 */
final class PageFurniture extends PdfPageEventHelper {
  private static final String MARK = "\u0001";
  private static final float PAGE_SIZE = 7.5f;

  private final Pdf pdf;
  private final Wording w;
  private final DocumentStamp stamp;
  private final boolean draft;
  private final String title;
  private final String issuedLine;
  private final String fingerprintLine;
  private PdfTemplate total;

  PageFurniture(Pdf pdf, Wording w, DocumentStamp stamp, boolean draft, String title,
      String issued) {
    this.pdf = pdf;
    this.w = w;
    this.stamp = stamp;
    this.draft = draft;
    this.title = title;
    this.issuedLine = w.format("footer.issued", "issued", issued, "inspection", stamp.inspectionId());
    this.fingerprintLine = w.format("footer.fingerprint", "fingerprint", stamp.fingerprint().sha256());
  }

  /** Puts the stamp and the title into the document information; call before opening it. */
  void describe(Document doc) {
    for (Map.Entry<String, String> e : StampCodec.encode(stamp).entrySet()) {
      doc.addHeader(e.getKey(), e.getValue());
    }
    doc.addTitle(title);
    doc.addCreator("Bracewalk");
    doc.addSubject("inspection " + stamp.inspectionId());
  }

  @Override
  public void onOpenDocument(PdfWriter writer, Document document) {
    total = writer.getDirectContent().createTemplate(40, 12);
  }

  @Override
  public void onEndPage(PdfWriter writer, Document document) {
    Rectangle size = document.getPageSize();
    PdfContentByte cb = writer.getDirectContent();
    float left = 40;
    float right = size.getWidth() - 40;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.GHOST);
    cb.setLineWidth(0.5f);
    Glyphs.line(cb, left, 40, right, 40);
    cb.restoreState();
    Glyphs.text(cb, pdf.regular, 7f, Palette.GRID, PdfContentByte.ALIGN_LEFT, issuedLine, left, 31);
    Glyphs.text(cb, pdf.mono, 6.5f, Palette.GRID, PdfContentByte.ALIGN_LEFT, fingerprintLine,
        left, 22);
    pageNumber(cb, writer.getPageNumber(), right - 64, 31);
    Glyphs.text(cb, pdf.regular, 7f, Palette.GHOST, PdfContentByte.ALIGN_RIGHT, title, right,
        size.getHeight() - 26);
    if (draft) {
      Glyphs.text(cb, pdf.bold, 8f, Palette.DRAFT, PdfContentByte.ALIGN_LEFT,
          w.format("draft.banner", "inspection", stamp.inspectionId()), left, size.getHeight() - 26);
      cb.saveState();
      PdfGState faint = new PdfGState();
      faint.setFillOpacity(0.13f);
      cb.setGState(faint);
      cb.setColorFill(Palette.DRAFT);
      cb.beginText();
      cb.setFontAndSize(pdf.bold, 110f);
      cb.showTextAligned(PdfContentByte.ALIGN_CENTER, w.text("draft.mark"), size.getWidth() / 2,
          size.getHeight() / 2 - 40, 50f);
      cb.endText();
      cb.restoreState();
    }
  }

  /** "page n of " as text, then the total's form, then whatever the wording puts after it. */
  private void pageNumber(PdfContentByte cb, int page, float x, float y) {
    String[] parts = w.format("footer.page", "n", page, "total", MARK).split(MARK, -1);
    Glyphs.text(cb, pdf.bold, PAGE_SIZE, Palette.INK, PdfContentByte.ALIGN_LEFT, parts[0], x, y);
    if (parts.length < 2) {
      return;
    }
    float at = x + pdf.bold.getWidthPoint(parts[0], PAGE_SIZE);
    cb.addTemplate(total, at, y - 3);
    String after = String.join("", java.util.Arrays.copyOfRange(parts, 1, parts.length));
    if (!after.isEmpty()) {
      Glyphs.text(cb, pdf.bold, PAGE_SIZE, Palette.INK, PdfContentByte.ALIGN_LEFT, after,
          at + pdf.bold.getWidthPoint("0000", PAGE_SIZE), y);
    }
  }

  @Override
  public void onCloseDocument(PdfWriter writer, Document document) {
    total.beginText();
    total.setFontAndSize(pdf.bold, PAGE_SIZE);
    total.setColorFill(Palette.INK);
    total.setTextMatrix(0, 3);
    total.showText(String.valueOf(writer.getPageNumber() - 1));
    total.endText();
  }
}
