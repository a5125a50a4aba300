package org.bracewalk.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import java.util.ArrayList;
import java.util.List;

/**
 * The key to the elevation: a sample of each line style and symbol, with its wording. The entries
 * are laid out in rows on a grid of {@link #CELLS} cells across the width given: each entry takes
 * as many cells as its sample and words need, and a row wraps before an entry would pass the
 * right edge, so no word runs off the page or into the next sample, whatever the font's widths.
 */
final class Legend {
  private static final String[] ENTRIES = {
    "design", "sound", "damaged-effective", "damaged-ineffective", "missing", "extra",
    "not-inspected", "not-reachable", "opening", "critical", "repair", "repair-new", "part",
    "tension"
  };
  /** The frame entries, shown where a plane's frame is not whole or is named. */
  private static final String[] FRAME_ENTRIES = {
    "frame-damaged", "frame-ineffective", "frame-missing", "frame-omitted", "frame-extra",
    "frame-not-inspected", "frame-not-reachable", "lost-restraint", "loose-end"
  };
  private static final float ROW = 11f;
  /** The grid the entries snap to: this many cells across the width. */
  static final int CELLS = 6;
  /** Where the words start, right of the sample. */
  private static final float SAMPLE = 30f;
  /** The least room after an entry's words before the next entry's sample. */
  private static final float GAP = 8f;
  static final float TEXT_SIZE = 6.3f;
  private static final float TITLE = 12f;

  private Legend() {}

  /**
   * One entry's place: its left edge and row, the size of its words and the room they take (the
   * size is {@link #TEXT_SIZE} unless the words would not fit a row of their own, as a long
   * translation might: then smaller, to fit).
   */
  record Place(String entry, String words, float x, int row, float size, float textWidth) {
    /** The right end of its words. */
    float right() {
      return x + SAMPLE + textWidth;
    }
  }

  /** The height of the key laid out across {@code width}. */
  static float height(Wording w, BaseFont font, float width, boolean frame) {
    List<Place> places = layout(w, font, width, frame);
    int rows = places.isEmpty() ? 0 : places.get(places.size() - 1).row() + 1;
    return TITLE + ROW * rows + 2f;
  }

  private static String[] entries(boolean frame) {
    if (!frame) {
      return ENTRIES;
    }
    String[] all = java.util.Arrays.copyOf(ENTRIES, ENTRIES.length + FRAME_ENTRIES.length);
    System.arraycopy(FRAME_ENTRIES, 0, all, ENTRIES.length, FRAME_ENTRIES.length);
    return all;
  }

  /**
   * Where each entry goes, relative to the key's left edge: in order, each starting on a cell
   * boundary and taking whole cells, on a new row when the rest of the row cannot hold it. An
   * entry wider than the whole width (none of the English ones is) gets a row of its own and
   * words set smaller to fit it.
   */
  static List<Place> layout(Wording w, BaseFont font, float width, boolean frame) {
    float cell = width / CELLS;
    List<Place> out = new ArrayList<>();
    int row = 0;
    int used = 0;
    for (String e : entries(frame)) {
      String words = w.text("legend." + e);
      float size = TEXT_SIZE;
      float text = font.getWidthPoint(words, size);
      if (SAMPLE + text > width) {
        size = TEXT_SIZE * (width - SAMPLE) / text;
        text = font.getWidthPoint(words, size);
      }
      int cells = Math.max(1, (int) Math.ceil((SAMPLE + text + GAP) / cell));
      if (used > 0 && used + cells > CELLS) {
        row++;
        used = 0;
      }
      out.add(new Place(e, words, used * cell, row, size, text));
      used += cells;
    }
    return List.copyOf(out);
  }

  /**
   * Draws the key with its top-left corner at (x, top), across {@code width}; with {@code frame},
   * the frame members' states and the marks of joints too.
   */
  static void draw(PdfContentByte cb, Wording w, BaseFont font, BaseFont bold, float x, float top,
      float width, boolean frame) {
    Glyphs.text(cb, bold, 7.5f, Palette.GRID, PdfContentByte.ALIGN_LEFT, w.text("legend.title"),
        x, top - 8f);
    for (Place p : layout(w, font, width, frame)) {
      float sx = x + p.x();
      float sy = top - TITLE - p.row() * ROW - ROW / 2;
      sample(cb, font, bold, p.entry(), sx, sy);
      Glyphs.text(cb, font, p.size(), Palette.GRID, PdfContentByte.ALIGN_LEFT, p.words(),
          sx + SAMPLE, sy - 2.2f);
    }
  }

  private static void sample(PdfContentByte cb, BaseFont font, BaseFont bold, String entry,
      float x, float cy) {
    float x0 = x;
    float x1 = x + 26f;
    float y0 = cy - 4f;
    float y1 = cy + 4f;
    cb.saveState();
    switch (entry) {
      case "design" -> member(cb, font, Glyphs.Stroke.DESIGN, Glyphs.Mark.NONE, x0, y0, x1, y1, cy);
      case "sound" -> member(cb, font, Glyphs.Stroke.SOUND, Glyphs.Mark.NONE, x0, y0, x1, y1, cy);
      case "damaged-effective" -> member(cb, font, Glyphs.Stroke.DAMAGED, Glyphs.Mark.DAMAGED, x0, y0, x1, y1, cy);
      case "damaged-ineffective" ->
          member(cb, font, Glyphs.Stroke.INEFFECTIVE, Glyphs.Mark.BEYOND_USE, x0, y0, x1, y1, cy);
      case "missing" -> member(cb, font, Glyphs.Stroke.MISSING, Glyphs.Mark.MISSING, x0, y0, x1, y1, cy);
      case "extra" -> member(cb, font, Glyphs.Stroke.EXTRA, Glyphs.Mark.EXTRA, x0, y0, x1, y1, cy);
      case "not-inspected" -> member(cb, font, Glyphs.Stroke.DESIGN, Glyphs.Mark.NOT_SEEN, x0, y0, x1, y1, cy);
      case "not-reachable" ->
          member(cb, font, Glyphs.Stroke.DESIGN, Glyphs.Mark.NOT_REACHABLE, x0, y0, x1, y1, cy);
      case "opening" -> Glyphs.opening(cb, x0 + 5, y0, 16, 8);
      case "critical" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.SOUND, 1f);
        Glyphs.line(cb, x0, y0, x1, y1);
        Glyphs.critical(cb, x0 + 4f, y1 - 1f, 4.5f);
      }
      case "repair" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.REPAIR, 1f);
        Glyphs.line(cb, x0, y0, x1, y1);
        Glyphs.repairNumber(cb, bold, "3", x1 - 3f, y0 + 1.5f, 5.5f, true);
      }
      case "repair-new" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.REPAIR, 1f);
        Glyphs.line(cb, x0, y0, x1, y1);
        Glyphs.repairNumber(cb, bold, "4", x1 - 3f, y0 + 1.5f, 5.5f, false);
      }
      case "part" -> {
        Glyphs.hatch(cb, x0 + 12, y0, 14, 8, Palette.tint(0), 0);
        Glyphs.partLetter(cb, bold, "B", x0 + 11, cy, 5.5f);
      }
      case "tension" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.SOUND, 1f);
        ElevationDrawing.members(cb, org.bracewalk.core.model.Diagonal.RISING,
            org.bracewalk.core.model.MemberKind.TENSION_ONLY, x0, y0, x1, y1, 0f);
      }
      case "frame-damaged" -> frame(cb, font, FrameLooks.Look.DAMAGED, x0, x1, cy);
      case "frame-ineffective" -> frame(cb, font, FrameLooks.Look.INEFFECTIVE, x0, x1, cy);
      case "frame-missing" -> frame(cb, font, FrameLooks.Look.MISSING, x0, x1, cy);
      case "frame-omitted" -> frame(cb, font, FrameLooks.Look.OMITTED, x0, x1, cy);
      case "frame-extra" -> frame(cb, font, FrameLooks.Look.EXTRA, x0, x1, cy);
      case "frame-not-inspected" -> frame(cb, font, FrameLooks.Look.NOT_INSPECTED, x0, x1, cy);
      case "frame-not-reachable" -> frame(cb, font, FrameLooks.Look.NOT_REACHABLE, x0, x1, cy);
      case "lost-restraint" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.SOUND, 0.7f);
        cb.setColorStroke(Palette.GRID);
        Glyphs.line(cb, x0 + 13, y0 - 1, x0 + 13, y1 + 1);
        Glyphs.lostRestraint(cb, x0 + 13, cy, 2.6f, true);
      }
      case "loose-end" -> {
        Glyphs.stroke(cb, Glyphs.Stroke.SOUND, 0.7f);
        cb.setColorStroke(Palette.GRID);
        Glyphs.line(cb, x0 + 2, cy, x0 + 13, cy);
        Glyphs.looseEnd(cb, x0 + 13, cy, 3.2f);
      }
      default -> throw new IllegalArgumentException(entry);
    }
    cb.restoreState();
  }

  /** A horizontal frame member drawn in its look, as on the elevation. */
  private static void frame(PdfContentByte cb, BaseFont font, FrameLooks.Look look, float x0,
      float x1, float cy) {
    cb.saveState();
    Glyphs.stroke(cb, look.stroke, 1f);
    Glyphs.line(cb, x0, cy, x1, cy);
    cb.restoreState();
    if (look == FrameLooks.Look.OMITTED) {
      Glyphs.endTicks(cb, x0, cy, x1, cy, 5f);
    }
    if (look.mark != Glyphs.Mark.NONE) {
      Glyphs.mark(cb, font, look.mark, (x0 + x1) / 2, cy, 2.8f);
    }
  }

  /** A member in {@code stroke}, with {@code mark} at its middle (none for {@link Glyphs.Mark#NONE}). */
  private static void member(PdfContentByte cb, BaseFont font, Glyphs.Stroke stroke, Glyphs.Mark mark,
      float x0, float y0, float x1, float y1, float cy) {
    Glyphs.stroke(cb, stroke, 1f);
    Glyphs.line(cb, x0, y0, x1, y1);
    if (mark != Glyphs.Mark.NONE) {
      Glyphs.mark(cb, font, mark, (x0 + x1) / 2, cy, 3.2f);
    }
  }
}
