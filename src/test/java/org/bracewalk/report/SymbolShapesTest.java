package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;

import com.lowagie.text.Document;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfWriter;
import java.io.ByteArrayOutputStream;
import java.util.EnumMap;
import java.util.Map;
import java.util.function.Consumer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.symbol.Symbol;
import org.bracewalk.ui.common.PanelLook;
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

  /** The mark the page draws for a panel found in {@code state} (via the elevation's own rule). */
  private static Glyphs.Mark pageMark(PanelState state) {
    PanelFinding f = state == PanelState.EXTRA
        ? new PanelFinding(state, Brace.rigid(Diagonal.RISING)) : PanelFinding.of(state);
    Map<PanelRef, Brace> braces = Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING));
    PlaneDesign design = PlaneDesign.of(PlaneGrid.uniform(1, 1, Support.PINNED_BASE),
        state == PanelState.EXTRA ? Map.of() : braces);
    // the elevation's own choice of mark, by rendering one panel into a throwaway content stream
    Glyphs.Mark[] out = new Glyphs.Mark[1];
    ops(cb -> out[0] = ElevationDrawing.panelMark(cb, design, PanelRef.of(1, 1), f));
    return out[0];
  }

  @Test
  void everyStateAsFoundHasItsOwnMarkOnThePageAndTheSameInTheApp() {
    // project rule (issue 12, item 13): one symbol, one meaning, the same in the app and the PDF;
    // common practice for drawing keys. "Not inspected" and "not reachable" were both "?" here.
    Map<Symbol, PanelState> seen = new EnumMap<>(Symbol.class);
    for (PanelState s : PanelState.values()) {
      Glyphs.Mark m = pageMark(s);
      Symbol app = PanelLook.of(s).symbol();
      if (s == PanelState.SOUND) {
        // the page draws a sound member solid and marks nothing; the app's letter S is its own
        assertThat(m).isEqualTo(Glyphs.Mark.NONE);
        assertThat(app).isEqualTo(Symbol.STATE_SOUND);
        continue;
      }
      assertThat(m.symbol).as("page mark of %s", s).isEqualTo(app);
      assertThat(seen.put(m.symbol, s)).as("%s drawn like another state", s).isNull();
      // a frame member in that state carries the same mark in the app and on the page
      org.bracewalk.ui.common.FrameLook frame = org.bracewalk.ui.common.FrameLook.of(s, true);
      assertThat(frame.symbol()).as("app frame mark of %s", s).isEqualTo(app);
    }
    assertThat(pageMark(PanelState.NOT_INSPECTED)).isNotEqualTo(pageMark(PanelState.NOT_REACHABLE));
  }

  @Test
  void noTwoMeaningsShareAGlyphAndAShape() {
    // every pair of symbols (Symbol's table, which the README holds): a pair that shared both
    // glyph and shape would be two meanings drawn alike; the test above ties each state's mark
    // on the page and in the app to one of these symbols
    Symbol[] all = Symbol.values();
    for (int a = 0; a < all.length; a++) {
      for (int b = a + 1; b < all.length; b++) {
        boolean sameGlyph = all[a].glyph().equals(all[b].glyph());
        boolean sameShape = all[a].shape().equals(all[b].shape());
        assertThat(sameGlyph || sameShape).as("%s and %s", all[a], all[b]).isFalse();
      }
    }
  }

  @Test
  void notInspectedIsADashedRingAndNotReachableASolidBoxWithItsLetter() throws Exception {
    com.lowagie.text.pdf.BaseFont font = com.lowagie.text.pdf.BaseFont.createFont();
    String unseen = ops(cb -> Glyphs.mark(cb, font, Glyphs.Mark.NOT_SEEN, 50, 50, 4));
    String unreached = ops(cb -> Glyphs.mark(cb, font, Glyphs.Mark.NOT_REACHABLE, 50, 50, 4));
    // a dash array set before the ring is stroked (PDF 32000-1, 8.4.3.6: "[on off] phase d")
    assertThat(unseen).containsPattern("\\[[0-9. ]+\\] 0 d").contains("(?)Tj");
    assertThat(unreached).doesNotContainPattern("\\[[0-9. ]+\\] 0 d").contains("(R)Tj");
    // the ring: four curves and no straight side; the rounded box has straight sides
    assertThat(unseen.split(" c\n", -1).length - 1).isEqualTo(4);
    assertThat(unseen).doesNotContain(" l\n");
    assertThat(unreached).contains(" l\n");
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
