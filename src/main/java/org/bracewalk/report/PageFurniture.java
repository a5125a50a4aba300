package org.bracewalk.report;

import com.lowagie.text.DocumentException;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfGState;
import com.lowagie.text.pdf.PdfReader;
import com.lowagie.text.pdf.PdfStamper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;
import org.bracewalk.core.port.report.DocumentStamp;

/**
 * The second pass over a finished document: on every page the footer ("page n of N", the record
 * fingerprint, the inspection and issue time), the DRAFT mark when the inspection is open; and the
 * machine-readable stamp in the document information. Done after layout so N is known.
 */
final class PageFurniture {
  private PageFurniture() {}

  static byte[] apply(byte[] body, Pdf pdf, Wording w, DocumentStamp stamp, boolean draft,
      String title, String issued) throws IOException {
    PdfReader reader = new PdfReader(body);
    ByteArrayOutputStream out = new ByteArrayOutputStream(body.length + 16 * 1024);
    try {
      PdfStamper stamper = new PdfStamper(reader, out);
      int total = reader.getNumberOfPages();
      String fingerprint = w.format("footer.fingerprint", "fingerprint", stamp.fingerprint().sha256());
      String issuedLine = w.format("footer.issued", "issued", issued, "inspection", stamp.inspectionId());
      for (int page = 1; page <= total; page++) {
        Rectangle size = reader.getPageSize(page);
        PdfContentByte cb = stamper.getOverContent(page);
        float left = 40;
        float right = size.getWidth() - 40;
        cb.saveState();
        cb.setColorStroke(Palette.GHOST);
        cb.setLineWidth(0.5f);
        Glyphs.line(cb, left, 40, right, 40);
        cb.restoreState();
        Glyphs.text(cb, pdf.regular, 7f, Palette.GRID, PdfContentByte.ALIGN_LEFT, issuedLine,
            left, 31);
        Glyphs.text(cb, pdf.bold, 7.5f, Palette.INK, PdfContentByte.ALIGN_RIGHT,
            w.format("footer.page", "n", page, "total", total), right, 31);
        Glyphs.text(cb, pdf.mono, 6.5f, Palette.GRID, PdfContentByte.ALIGN_LEFT, fingerprint,
            left, 22);
        Glyphs.text(cb, pdf.regular, 7f, Palette.GHOST, PdfContentByte.ALIGN_RIGHT, title, right,
            size.getHeight() - 26);
        if (draft) {
          Glyphs.text(cb, pdf.bold, 8f, Palette.DRAFT, PdfContentByte.ALIGN_LEFT,
              w.format("draft.banner", "inspection", stamp.inspectionId()), left,
              size.getHeight() - 26);
          cb.saveState();
          PdfGState faint = new PdfGState();
          faint.setFillOpacity(0.13f);
          cb.setGState(faint);
          cb.setColorFill(Palette.DRAFT);
          cb.beginText();
          cb.setFontAndSize(pdf.bold, 110f);
          cb.showTextAligned(PdfContentByte.ALIGN_CENTER, w.text("draft.mark"),
              size.getWidth() / 2, size.getHeight() / 2 - 40, 50f);
          cb.endText();
          cb.restoreState();
        }
      }
      Map<String, String> info = new HashMap<>(StampCodec.encode(stamp));
      info.put("Title", title);
      info.put("Creator", "Bracewalk");
      info.put("Subject", "inspection " + stamp.inspectionId());
      stamper.setInfoDictionary(info);
      stamper.close();
    } catch (DocumentException e) {
      throw new IOException("the PDF could not be finished: " + e.getMessage(), e);
    } finally {
      reader.close();
    }
    return out.toByteArray();
  }
}
