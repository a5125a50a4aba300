package org.bracewalk.report;

import com.lowagie.text.Chunk;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.SplitCharacter;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.DefaultSplitCharacter;
import com.lowagie.text.pdf.PdfChunk;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import java.awt.Color;
import java.io.IOException;
import java.io.InputStream;
import java.util.EnumMap;
import java.util.Map;
import org.bracewalk.core.port.RenderingException;

/**
 * Fonts and the few table and paragraph shapes both documents use.
 *
 * <p>The fonts are DejaVu Sans, DejaVu Sans Bold and DejaVu Sans Mono (from the {@code
 * jasperreports-fonts} jar on the class path), embedded as subsets with Identity-H encoding, so
 * every name prints as recorded (Latin with any accents, Greek, Cyrillic) and the document
 * carries only the glyphs it uses. The PDF standard fonts (Helvetica, Courier) show Windows-1252
 * only. The font files are read once per run; each document gets its own font objects, so
 * documents drawn at the same time share nothing that reads the files.
 */
final class Pdf {
  /** Where the fonts lie on the class path. */
  static final String FONT_FOLDER = "net/sf/jasperreports/fonts/dejavu/";

  /** The three fonts the documents use, by the file name in {@link #FONT_FOLDER}. */
  enum Face {
    REGULAR("DejaVuSans.ttf"),
    BOLD("DejaVuSans-Bold.ttf"),
    MONO("DejaVuSansMono.ttf");

    final String file;

    Face(String file) {
      this.file = file;
    }
  }

  private static final Map<Face, byte[]> FILES = new EnumMap<>(Face.class);

  final BaseFont regular;
  final BaseFont bold;
  final BaseFont mono;

  Pdf() {
    regular = create(Face.REGULAR);
    bold = create(Face.BOLD);
    mono = create(Face.MONO);
  }

  /** A new font object for one document: embedded, subset, Identity-H (Unicode). */
  static BaseFont create(Face face) {
    try {
      BaseFont f = BaseFont.createFont(face.file, BaseFont.IDENTITY_H, BaseFont.EMBEDDED, false,
          bytes(face), null);
      f.setSubset(true);
      return f;
    } catch (IOException | DocumentException e) {
      throw new RenderingException("the report font " + FONT_FOLDER + face.file
          + " cannot be read: " + e.getMessage(), e);
    }
  }

  /**
   * Whether the documents' fonts (regular and bold) hold a glyph for {@code codePoint}; a
   * character without one would print as an empty box or not at all.
   */
  static boolean shows(int codePoint) {
    for (BaseFont f : Probes.FONTS) {
      if (!f.charExists(codePoint)) {
        return false;
      }
    }
    return true;
  }

  /** Fonts asked only whether they hold a glyph (never drawn with): made once, when first asked. */
  private static final class Probes {
    static final BaseFont[] FONTS = {create(Face.REGULAR), create(Face.BOLD)};
  }

  /** The font file's bytes, read from the class path once per run. */
  private static byte[] bytes(Face face) {
    synchronized (FILES) {
      byte[] b = FILES.get(face);
      if (b == null) {
        try (InputStream in = Pdf.class.getClassLoader()
            .getResourceAsStream(FONT_FOLDER + face.file)) {
          if (in == null) {
            throw new RenderingException("the report font " + FONT_FOLDER + face.file
                + " is not on the class path (it comes with net.sf.jasperreports:"
                + "jasperreports-fonts; the program is incomplete)");
          }
          b = in.readAllBytes();
        } catch (IOException e) {
          throw new RenderingException("the report font " + FONT_FOLDER + face.file
              + " cannot be read: " + e.getMessage(), e);
        }
        FILES.put(face, b);
      }
      return b;
    }
  }

  /**
   * Lines break after a hyphen as usual, except inside a range of numbers, so "lifts 1-3" never
   * ends a line with "1-" (DejaVu Sans is wider than the standard Helvetica, and narrow table
   * columns broke there).
   */
  static final SplitCharacter KEEP_RANGES = new DefaultSplitCharacter() {
    @Override
    public boolean isSplitCharacter(int start, int current, int end, char[] cc, PdfChunk[] ck) {
      if (getCurrentCharacter(current, cc, ck) == '-' && current > start && current + 1 < end
          && Character.isDigit(getCurrentCharacter(current - 1, cc, ck))
          && Character.isDigit(getCurrentCharacter(current + 1, cc, ck))) {
        return false;
      }
      return super.isSplitCharacter(start, current, end, cc, ck);
    }
  };

  /** Sets {@link #KEEP_RANGES} on every chunk of {@code phrase}, nested phrases included. */
  static <P extends Phrase> P keepRanges(P phrase) {
    for (Object e : phrase) {
      if (e instanceof Chunk c) {
        c.setSplitCharacter(KEEP_RANGES);
      } else if (e instanceof Phrase inner) {
        keepRanges(inner);
      }
    }
    return phrase;
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
    Paragraph p = keepRanges(new Paragraph(text, font(size)));
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
    PdfPCell c = new PdfPCell(keepRanges(phrase));
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
