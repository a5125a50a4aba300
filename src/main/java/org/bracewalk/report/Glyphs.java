package org.bracewalk.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import java.awt.Color;
import org.bracewalk.core.symbol.Symbol;

/**
 * The small vector symbols and line styles shared by the elevation, the legend and the locator.
 * Every symbol is one of {@link Symbol}, drawn in the shape the app draws it.
 */
final class Glyphs {
  private Glyphs() {}

  /** How a member line is stroked. */
  enum Stroke {
    /** A design member: thin grey dashes. */
    DESIGN,
    /** Found sound: solid. */
    SOUND,
    /** Damaged, still counting: solid in the damage colour. */
    DAMAGED,
    /** Damaged beyond use: dots. */
    INEFFECTIVE,
    /** Missing: red dashes. */
    MISSING,
    /** Found, not in the design: solid violet. */
    EXTRA,
    /** A brace to fit: long dashes. */
    REPAIR,
    /** A frame member the design leaves out: thin grey dash-dot. */
    OMITTED,
    /** A frame member not inspected: thin grey, solid. */
    UNSEEN
  }

  /**
   * The state drawn at a member's middle: the walk-round key's letter in a rounded box, the same
   * mark the app draws (filled in its colour where the member no longer counts), or a question
   * mark in a dashed ring where nobody has looked. Each is one {@link Symbol}.
   */
  enum Mark {
    NONE(null, null, false),
    DAMAGED(Symbol.STATE_DAMAGED, Palette.DAMAGED, false),
    BEYOND_USE(Symbol.STATE_BEYOND_USE, Palette.LOST, true),
    MISSING(Symbol.STATE_MISSING, Palette.LOST, true),
    EXTRA(Symbol.STATE_EXTRA, Palette.EXTRA, false),
    NOT_REACHABLE(Symbol.STATE_NOT_REACHABLE, Palette.GRID, false),
    NOT_SEEN(Symbol.STATE_NOT_INSPECTED, Palette.GRID, false);

    /** The symbol drawn; {@code null} for none. */
    final Symbol symbol;
    final String letter;
    final Color colour;
    /** Filled in its colour, the letter in white (a member that does not count). */
    final boolean alarm;

    Mark(Symbol symbol, Color colour, boolean alarm) {
      this.symbol = symbol;
      this.letter = symbol == null ? null : symbol.glyph().substring(1, symbol.glyph().length() - 1);
      this.colour = colour;
      this.alarm = alarm;
    }

    /** A question mark in a dashed ring, not a letter in a box. */
    boolean ring() {
      return this == NOT_SEEN;
    }
  }

  static void stroke(PdfContentByte cb, Stroke s, float weight) {
    switch (s) {
      case DESIGN -> set(cb, Palette.GHOST, 0.5f, new float[] {2f, 1.6f});
      case SOUND -> set(cb, Palette.INK, 1.5f * weight, null);
      case DAMAGED -> set(cb, Palette.DAMAGED, 1.5f * weight, null);
      case INEFFECTIVE -> {
        set(cb, Palette.LOST, 1.6f * weight, new float[] {0.1f, 2.4f * weight});
        cb.setLineCap(PdfContentByte.LINE_CAP_ROUND);
      }
      case MISSING -> set(cb, Palette.LOST, 0.8f, new float[] {3.2f, 2.2f});
      case EXTRA -> set(cb, Palette.EXTRA, 1.5f * weight, null);
      case REPAIR -> set(cb, Palette.REPAIR, 1.6f * weight, new float[] {6f, 2.5f});
      case OMITTED -> set(cb, Palette.GHOST, 0.5f, new float[] {4f, 1.5f, 0.8f, 1.5f});
      case UNSEEN -> set(cb, Palette.GHOST, 0.5f, null);
    }
  }

  private static void set(PdfContentByte cb, Color c, float width, float[] dash) {
    cb.setColorStroke(c);
    cb.setLineWidth(width);
    cb.setLineCap(PdfContentByte.LINE_CAP_BUTT);
    if (dash == null) {
      cb.setLineDash(0f);
    } else {
      cb.setLineDash(dash, 0f);
    }
  }

  static void line(PdfContentByte cb, float x1, float y1, float x2, float y2) {
    cb.moveTo(x1, y1);
    cb.lineTo(x2, y2);
    cb.stroke();
  }

  /**
   * Draws a mark of radius {@code r} centred on (cx, cy): the state's letter in a rounded box, or
   * the question mark in a dashed ring.
   */
  static void mark(PdfContentByte cb, BaseFont font, Mark m, float cx, float cy, float r) {
    if (m == Mark.NONE) {
      return;
    }
    float side = r * 2.2f;
    float x = cx - side / 2;
    float y = cy - side / 2;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setLineWidth(0.5f);
    cb.setColorStroke(m.colour);
    cb.setColorFill(m.alarm ? m.colour : java.awt.Color.WHITE);
    if (m.ring()) {
      // nobody has looked: a ring of short dashes, a little larger than the boxes
      cb.setLineWidth(0.6f);
      cb.setLineDash(new float[] {side * 0.16f, side * 0.12f}, 0f);
      cb.circle(cx, cy, side * 0.54f);
    } else {
      cb.roundRectangle(x, y, side, side, side * 0.22f);
    }
    cb.fillStroke();
    cb.setColorFill(m.alarm ? java.awt.Color.WHITE : m.colour);
    float size = side * 0.78f;
    cb.beginText();
    cb.setFontAndSize(font, size);
    cb.showTextAligned(PdfContentByte.ALIGN_CENTER, m.letter, cx, cy - size * 0.36f, 0f);
    cb.endText();
    cb.restoreState();
  }

  /**
   * A joint with no sideways restraint: a ring with a double arrow across it, horizontal when the
   * members through it are vertical, else vertical.
   */
  static void lostRestraint(PdfContentByte cb, float cx, float cy, float r, boolean horizontal) {
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.LOST);
    cb.setColorFill(java.awt.Color.WHITE);
    cb.setLineWidth(0.9f);
    cb.circle(cx, cy, r);
    cb.fillStroke();
    float a = r * 2.2f;
    float h = r * 0.7f;
    cb.setColorFill(Palette.LOST);
    cb.setLineWidth(0.8f);
    if (horizontal) {
      line(cb, cx - a, cy, cx + a, cy);
      arrowHead(cb, cx + a, cy, 1, 0, h);
      arrowHead(cb, cx - a, cy, -1, 0, h);
    } else {
      line(cb, cx, cy - a, cx, cy + a);
      arrowHead(cb, cx, cy + a, 0, 1, h);
      arrowHead(cb, cx, cy - a, 0, -1, h);
    }
    cb.restoreState();
  }

  private static void arrowHead(PdfContentByte cb, float x, float y, float ux, float uy, float h) {
    cb.moveTo(x, y);
    cb.lineTo(x - ux * h - uy * h * 0.6f, y - uy * h + ux * h * 0.6f);
    cb.lineTo(x - ux * h + uy * h * 0.6f, y - uy * h - ux * h * 0.6f);
    cb.closePath();
    cb.fill();
  }

  /** A loose member end ({@link Symbol#LOOSE_END}): a filled dot on the joint, outlined in white. */
  static void looseEnd(PdfContentByte cb, float cx, float cy, float r) {
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorFill(Palette.LOST);
    cb.setColorStroke(java.awt.Color.WHITE);
    cb.setLineWidth(0.6f);
    cb.circle(cx, cy, r * 0.8f);
    cb.fillStroke();
    cb.restoreState();
  }

  /** Short ticks across both ends of a member: a frame member the design leaves out. */
  static void endTicks(PdfContentByte cb, float x0, float y0, float x1, float y1, float len) {
    float dx = x1 - x0;
    float dy = y1 - y0;
    float l = (float) Math.hypot(dx, dy);
    if (l <= 0) {
      return;
    }
    float nx = -dy / l * len / 2;
    float ny = dx / l * len / 2;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.GHOST);
    cb.setLineWidth(0.6f);
    float ix = dx / l * len * 0.4f;
    float iy = dy / l * len * 0.4f;
    line(cb, x0 + ix - nx, y0 + iy - ny, x0 + ix + nx, y0 + iy + ny);
    line(cb, x1 - ix - nx, y1 - iy - ny, x1 - ix + nx, y1 - iy + ny);
    cb.restoreState();
  }

  /**
   * The critical-brace or critical-member marker ({@link Symbol#CRITICAL}): a filled black diamond
   * outlined in white, {@code size} across, as in the app.
   */
  static void critical(PdfContentByte cb, float cx, float cy, float size) {
    float h = size * 0.7f;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorFill(java.awt.Color.BLACK);
    cb.setColorStroke(java.awt.Color.WHITE);
    cb.setLineWidth(0.4f);
    cb.moveTo(cx, cy + h);
    cb.lineTo(cx + h, cy);
    cb.lineTo(cx, cy - h);
    cb.lineTo(cx - h, cy);
    cb.closePath();
    cb.fillStroke();
    cb.restoreState();
  }

  /**
   * A repair's number: in a ring where the design has the brace or member ({@link
   * Symbol#REPAIR_IN_DESIGN}), in a square where it is a new position ({@link
   * Symbol#REPAIR_NEW_POSITION}), as in the app.
   */
  static void repairNumber(PdfContentByte cb, BaseFont font, String text, float cx, float cy,
      float size, boolean inDesign) {
    if (!inDesign) {
      label(cb, font, text, cx, cy, size, Palette.REPAIR);
      return;
    }
    float w = font.getWidthPoint(text, size) + size * 0.6f;
    float h = size * 1.25f;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorFill(java.awt.Color.WHITE);
    cb.setColorStroke(Palette.REPAIR);
    cb.setLineWidth(0.6f);
    if (w <= h * 1.15f) {
      cb.circle(cx, cy, h * 0.58f);
    } else {
      // a longer number ("2-4") in a ring stretched to a pill, still round at both ends
      cb.roundRectangle(cx - w / 2, cy - h / 2, w, h, h / 2);
    }
    cb.fillStroke();
    cb.setColorFill(Palette.REPAIR);
    cb.beginText();
    cb.setFontAndSize(font, size);
    cb.showTextAligned(PdfContentByte.ALIGN_CENTER, text, cx, cy - size * 0.35f, 0f);
    cb.endText();
    cb.restoreState();
  }

  /**
   * A swaying part's letter beside the lift numbers ({@link Symbol#SWAYING}): a two-headed arrow
   * and the letter, in the colour of lost rigidity; its right end at {@code right}.
   */
  static void partLetter(PdfContentByte cb, BaseFont bold, String letter, float right, float cy,
      float size) {
    float lw = bold.getWidthPoint(letter, size);
    float arrow = size * 1.1f;
    float ax1 = right - lw - size * 0.3f;
    float ax0 = ax1 - arrow;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.LOST);
    cb.setColorFill(Palette.LOST);
    cb.setLineWidth(0.6f);
    line(cb, ax0 + size * 0.2f, cy, ax1 - size * 0.2f, cy);
    arrowHead(cb, ax1, cy, 1, 0, size * 0.3f);
    arrowHead(cb, ax0, cy, -1, 0, size * 0.3f);
    cb.beginText();
    cb.setFontAndSize(bold, size);
    cb.showTextAligned(PdfContentByte.ALIGN_RIGHT, letter, right, cy - size * 0.35f, 0f);
    cb.endText();
    cb.restoreState();
  }

  /** An opening ({@link Symbol#OPENING}): a light tint and a dashed arch, as in the app. */
  static void opening(PdfContentByte cb, float px, float py, float pw, float ph) {
    cb.saveState();
    cb.setColorFill(Palette.OPENING);
    cb.rectangle(px, py, pw, ph);
    cb.fill();
    cb.setColorStroke(Palette.GRID);
    cb.setLineWidth(0.6f);
    cb.setLineDash(new float[] {2f, 1.5f}, 0f);
    float x0 = px + pw * 0.22f;
    float x1 = px + pw - pw * 0.22f;
    float rad = (x1 - x0) / 2;
    float top = py + ph - ph * 0.18f;
    float springing = Math.max(py, top - rad);
    cb.moveTo(x0, py);
    cb.lineTo(x0, springing);
    cb.arc(x0, springing - rad, x1, springing + rad, 180f, -180f);
    cb.lineTo(x1, py);
    cb.stroke();
    cb.restoreState();
  }

  /** A number in a small white box with a border, as a repair brace's label. */
  static void label(PdfContentByte cb, BaseFont font, String text, float cx, float cy, float size, Color border) {
    float w = font.getWidthPoint(text, size) + size * 0.6f;
    float h = size * 1.25f;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorFill(java.awt.Color.WHITE);
    cb.setColorStroke(border);
    cb.setLineWidth(0.6f);
    cb.rectangle(cx - w / 2, cy - h / 2, w, h);
    cb.fillStroke();
    cb.setColorFill(border);
    cb.beginText();
    cb.setFontAndSize(font, size);
    cb.showTextAligned(PdfContentByte.ALIGN_CENTER, text, cx, cy - size * 0.35f, 0f);
    cb.endText();
    cb.restoreState();
  }

  /** Hatched tint over a rectangle (a part that can sway), lines at {@code angle} degrees. */
  static void hatch(PdfContentByte cb, float x, float y, float w, float h, Color tint, int style) {
    cb.saveState();
    cb.setColorFill(tint);
    cb.rectangle(x, y, w, h);
    cb.fill();
    cb.rectangle(x, y, w, h);
    cb.clip();
    cb.newPath();
    cb.setColorStroke(tint.darker());
    cb.setLineWidth(0.4f);
    cb.setLineDash(0f);
    float step = 4.5f;
    float span = w + h;
    for (float d = -span; d <= span; d += step) {
      if (style % 2 == 0) {
        cb.moveTo(x + d, y);
        cb.lineTo(x + d + h, y + h);
      } else {
        cb.moveTo(x + d, y + h);
        cb.lineTo(x + d + h, y);
      }
    }
    cb.stroke();
    cb.restoreState();
  }

  /** Hatching below a base line: the ground that holds a pinned base. */
  static void ground(PdfContentByte cb, float x1, float x2, float y) {
    cb.saveState();
    cb.setColorStroke(Palette.GRID);
    cb.setLineDash(0f);
    cb.setLineWidth(1.2f);
    line(cb, x1 - 3, y, x2 + 3, y);
    cb.setLineWidth(0.5f);
    for (float x = x1; x <= x2 + 0.1f; x += 5f) {
      cb.moveTo(x, y);
      cb.lineTo(x - 3.5f, y - 3.5f);
    }
    cb.stroke();
    cb.restoreState();
  }

  static void text(PdfContentByte cb, BaseFont font, float size, Color c, int align, String s, float x, float y) {
    cb.saveState();
    cb.setColorFill(c);
    cb.beginText();
    cb.setFontAndSize(font, size);
    cb.showTextAligned(align, s, x, y, 0f);
    cb.endText();
    cb.restoreState();
  }
}
