package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.lowagie.text.Document;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * The PDF draws each symbol in the shape {@link org.bracewalk.core.symbol.Symbol} gives it, read
 * back from the content stream's path operators (PDF 32000-1:2008, 8.5.2: {@code re} appends a
 * rectangle, {@code m}/{@code l}/{@code h} a polygon, {@code c} a curve, as circles are drawn).
 */
class SymbolShapesTest {
  @Test
  void aCriticalMemberIsADiamondNotASquare() {
    String ops = ops(cb -> Glyphs.critical(cb, 50, 50, 6));
    assertThat(ops).doesNotContain(" re").contains(" m").contains(" l").contains("h");
  }

  @Test
  void aLooseEndIsADot() {
    String ops = ops(cb -> Glyphs.looseEnd(cb, 50, 50, 4));
    assertThat(ops).contains(" c").doesNotContain(" re").doesNotContain(" l\n");
  }

  @Test
  void aRepairInTheDesignIsARingAndANewPositionASquare() throws Exception {
    com.lowagie.text.pdf.BaseFont font = com.lowagie.text.pdf.BaseFont.createFont();
    assertThat(ops(cb -> Glyphs.repairNumber(cb, font, "3", 50, 50, 6, true))).contains(" c").doesNotContain(" re");
    assertThat(ops(cb -> Glyphs.repairNumber(cb, font, "3", 50, 50, 6, false))).contains(" re");
  }

  private static String ops(Consumer<PdfContentByte> draw) {
    Document doc = new Document();
    PdfWriter w = PdfWriter.getInstance(doc, new ByteArrayOutputStream());
    doc.open();
    PdfContentByte cb = new PdfContentByte(w);
    draw.accept(cb);
    return cb.toString(); // the content stream's operators (the document is never written)
  }
}
