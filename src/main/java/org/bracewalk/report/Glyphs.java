package org.bracewalk.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import java.awt.Color;

/** The small vector symbols and line styles shared by the elevation, the legend and the locator. */
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

  /** The symbol drawn at a panel's centre. */
  enum Mark {
    NONE,
    OPEN_TRIANGLE,
    FILLED_TRIANGLE,
    SLASHED_RING,
    PLUS,
    QUESTION
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

  /** Draws a mark of radius {@code r} centred on (cx, cy). */
  static void mark(PdfContentByte cb, BaseFont font, Mark m, float cx, float cy, float r) {
    cb.saveState();
    cb.setLineDash(0f);
    switch (m) {
      case NONE -> {}
      case OPEN_TRIANGLE -> {
        cb.setColorStroke(Palette.DAMAGED);
        cb.setColorFill(java.awt.Color.WHITE);
        cb.setLineWidth(0.9f);
        triangle(cb, cx, cy, r);
        cb.fillStroke();
      }
      case FILLED_TRIANGLE -> {
        cb.setColorFill(Palette.LOST);
        cb.setColorStroke(Palette.LOST);
        cb.setLineWidth(0.6f);
        triangle(cb, cx, cy, r);
        cb.fillStroke();
      }
      case SLASHED_RING -> {
        cb.setColorStroke(Palette.LOST);
        cb.setColorFill(java.awt.Color.WHITE);
        cb.setLineWidth(0.9f);
        cb.circle(cx, cy, r * 0.85f);
        cb.fillStroke();
        line(cb, cx - r * 0.85f, cy - r * 0.85f, cx + r * 0.85f, cy + r * 0.85f);
      }
      case PLUS -> {
        cb.setColorStroke(Palette.EXTRA);
        cb.setLineWidth(1.2f);
        line(cb, cx - r, cy, cx + r, cy);
        line(cb, cx, cy - r, cx, cy + r);
      }
      case QUESTION -> {
        float size = r * 2.4f;
        cb.setColorFill(Palette.GRID);
        cb.beginText();
        cb.setFontAndSize(font, size);
        cb.showTextAligned(PdfContentByte.ALIGN_CENTER, "?", cx, cy - size * 0.35f, 0f);
        cb.endText();
      }
    }
    cb.restoreState();
  }

  private static void triangle(PdfContentByte cb, float cx, float cy, float r) {
    cb.moveTo(cx, cy + r);
    cb.lineTo(cx + r * 0.95f, cy - r * 0.7f);
    cb.lineTo(cx - r * 0.95f, cy - r * 0.7f);
    cb.closePath();
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

  /** A loose member end: an open diamond on the joint. */
  static void looseEnd(PdfContentByte cb, float cx, float cy, float r) {
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.LOST);
    cb.setColorFill(java.awt.Color.WHITE);
    cb.setLineWidth(1.1f);
    cb.moveTo(cx, cy + r);
    cb.lineTo(cx + r, cy);
    cb.lineTo(cx, cy - r);
    cb.lineTo(cx - r, cy);
    cb.closePath();
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

  /** The critical-brace marker: a small filled black square. */
  static void critical(PdfContentByte cb, float cx, float cy, float size) {
    cb.saveState();
    cb.setColorFill(java.awt.Color.BLACK);
    cb.rectangle(cx - size / 2, cy - size / 2, size, size);
    cb.fill();
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
