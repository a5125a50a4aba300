package org.bracewalk.report;

import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import java.awt.Color;
import java.io.IOException;
import org.bracewalk.core.port.RenderingException;

/** Fonts and the few table and paragraph shapes both documents use. */
final class Pdf {
  final BaseFont regular;
  final BaseFont bold;
  final BaseFont mono;

  Pdf() {
    try {
      regular = BaseFont.createFont(BaseFont.HELVETICA, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED);
      bold = BaseFont.createFont(BaseFont.HELVETICA_BOLD, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED);
      mono = BaseFont.createFont(BaseFont.COURIER, BaseFont.WINANSI, BaseFont.NOT_EMBEDDED);
    } catch (IOException e) {
      throw new RenderingException("the PDF's standard fonts cannot be loaded: " + e.getMessage(), e);
    }
  }

  Font font(float size) {
    return new Font(regular, size, Font.NORMAL, Palette.GRID);
  }

  Font font(float size, Color c) {
    return new Font(regular, size, Font.NORMAL, c);
  }

  Font boldFont(float size) {
    return new Font(bold, size, Font.NORMAL, Palette.INK);
  }

  Font boldFont(float size, Color c) {
    return new Font(bold, size, Font.NORMAL, c);
  }

  Font monoFont(float size) {
    return new Font(mono, size, Font.NORMAL, Palette.GRID);
  }

  Paragraph heading(String text, float size) {
    Paragraph p = new Paragraph(text, boldFont(size));
    p.setSpacingBefore(size * 0.7f);
    p.setSpacingAfter(size * 0.35f);
    return p;
  }

  Paragraph para(String text, float size) {
    Paragraph p = new Paragraph(text, font(size));
    p.setLeading(size * 1.3f);
    p.setSpacingAfter(size * 0.3f);
    return p;
  }

  PdfPTable table(float... widths) {
    PdfPTable t = new PdfPTable(widths);
    t.setWidthPercentage(100);
    t.setSpacingBefore(4f);
    t.setSpacingAfter(6f);
    return t;
  }

  PdfPCell cell(String text, Font f) {
    return cell(new Phrase(text == null ? "" : text, f));
  }

  PdfPCell cell(Phrase phrase) {
    PdfPCell c = new PdfPCell(phrase);
    c.setPadding(3f);
    c.setPaddingTop(2f);
    c.setBorderColor(new Color(0xbb, 0xbb, 0xbb));
    c.setBorderWidth(0.5f);
    c.setVerticalAlignment(Element.ALIGN_TOP);
    c.setLeading(0f, 1.2f);
    return c;
  }

  PdfPCell headCell(String text) {
    PdfPCell c = cell(text, boldFont(7.5f));
    c.setBackgroundColor(Palette.HEAD_FILL);
    return c;
  }

  /** A single-cell box: a coloured panel of text (an alert, the cautions). */
  PdfPTable box(Color fill, Color border, Element... content) {
    PdfPTable t = table(1f);
    PdfPCell c = new PdfPCell();
    c.setBackgroundColor(fill);
    c.setBorderColor(border);
    c.setBorderWidth(1f);
    c.setPadding(6f);
    for (Element e : content) {
      c.addElement(e);
    }
    t.addCell(c);
    return t;
  }
}
