package org.bracewalk.report;

import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import java.util.Map;
import org.bracewalk.core.analysis.MechanismShape;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * The sketch of how a plane that lost rigidity can move, from the engine's exact mechanism
 * shape: the part that sways turned by an exaggerated angle, the rest held, the plane at rest
 * behind it in grey dashes. Members that turn are drawn in the alert colour and heavier.
 */
final class MechanismDrawing {
  private final Wording w;
  private final BaseFont font;
  private final BaseFont bold;

  MechanismDrawing(Wording w, BaseFont font, BaseFont bold) {
    this.w = w;
    this.font = font;
    this.bold = bold;
  }

  /** Draws the sketch of {@code part} moving inside the box with lower-left corner (x, y). */
  void draw(PdfContentByte cb, PlaneSection plane, Parts.Part part, float x, float y, float width,
      float height) {
    PlaneGrid g = plane.design().grid();
    int m = g.lifts();
    int n = g.bays();
    double size = Math.max(
        g.bayWidths().stream().mapToDouble(Double::doubleValue).sum(),
        g.liftHeights().stream().mapToDouble(Double::doubleValue).sum());
    double angle = exaggeratedAngle(g, part, size);
    MechanismShape rest = MechanismShape.of(g, part.block(), 0);
    MechanismShape moved = MechanismShape.of(g, part.block(), angle);

    Glyphs.text(cb, bold, 8f, Palette.LOST, PdfContentByte.ALIGN_LEFT,
        w.format(g.support() == Support.FREE ? "mechanism.title.free" : "mechanism.title", "part",
            part.letter()), x, y + height - 9f);
    float noteHeight = 22f;
    ColumnText ct = new ColumnText(cb);
    ct.setSimpleColumn(
        new Phrase(
            w.format("mechanism.note", "angle", Math.round(Math.toDegrees(angle))),
            new Font(font, 6.5f, Font.NORMAL, Palette.GRID)),
        x, y, x + width, y + noteHeight, 8f, Element.ALIGN_LEFT);
    try {
      ct.go();
    } catch (com.lowagie.text.DocumentException e) {
      throw new IllegalStateException(e);
    }

    double minX = Double.MAX_VALUE;
    double maxX = -Double.MAX_VALUE;
    double minY = Double.MAX_VALUE;
    double maxY = -Double.MAX_VALUE;
    for (MechanismShape sh : new MechanismShape[] {rest, moved}) {
      for (int i = 0; i <= m; i++) {
        for (int j = 0; j <= n; j++) {
          minX = Math.min(minX, sh.x(i, j));
          maxX = Math.max(maxX, sh.x(i, j));
          minY = Math.min(minY, sh.y(i, j));
          maxY = Math.max(maxY, sh.y(i, j));
        }
      }
    }
    float boxX = x + 10;
    float boxY = y + noteHeight + 8;
    float boxW = width - 20;
    float boxH = height - noteHeight - 8 - 16;
    float s = (float) Math.min(boxW / (maxX - minX), boxH / (maxY - minY));
    float offX = boxX + (float) ((boxW - (maxX - minX) * s) / 2 - minX * s);
    float offY = boxY - (float) (minY * s);
    Mapper at = new Mapper(s, offX, offY);

    // at rest: grey dashes
    cb.saveState();
    Glyphs.stroke(cb, Glyphs.Stroke.DESIGN, 1f);
    frame(cb, rest, at, m, n, -1, null);
    cb.restoreState();
    if (g.support() == Support.PINNED_BASE) {
      Glyphs.ground(cb, at.x(rest.x(0, 0)), at.x(rest.x(0, n)), at.y(rest.y(0, 0)));
    }
    // moved: every member, the turning ones heavier in the alert colour
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.INK);
    cb.setLineWidth(0.8f);
    frame(cb, moved, at, m, n, 0, part);
    cb.setColorStroke(Palette.LOST);
    cb.setLineWidth(1.6f);
    frame(cb, moved, at, m, n, 1, part);
    cb.restoreState();
    // effective diagonals as found keep their panels square
    cb.saveState();
    Glyphs.stroke(cb, Glyphs.Stroke.SOUND, 0.8f);
    for (Map.Entry<PanelRef, Brace> e : plane.asBuilt().members().entrySet()) {
      int i = e.getKey().lift();
      int j = e.getKey().bay();
      if (e.getValue().diagonal().hasRising()) {
        Glyphs.line(cb, at.x(moved.x(i - 1, j - 1)), at.y(moved.y(i - 1, j - 1)),
            at.x(moved.x(i, j)), at.y(moved.y(i, j)));
      }
      if (e.getValue().diagonal().hasFalling()) {
        Glyphs.line(cb, at.x(moved.x(i, j - 1)), at.y(moved.y(i, j - 1)),
            at.x(moved.x(i - 1, j)), at.y(moved.y(i - 1, j)));
      }
    }
    cb.restoreState();
    // an arrow above the highest joint that moves most, pointing the way it moves
    int bi = 0;
    int bj = 0;
    double best = -1;
    for (int i = 0; i <= m; i++) {
      for (int j = 0; j <= n; j++) {
        double d = Math.hypot(moved.x(i, j) - rest.x(i, j), moved.y(i, j) - rest.y(i, j));
        boolean tie = Math.abs(d - best) <= 1e-9 * Math.max(1, best);
        if (d > best && !tie || tie && (i > bi || i == bi && Math.abs(2 * j - n) < Math.abs(2 * bj - n))) {
          best = Math.max(best, d);
          bi = i;
          bj = j;
        }
      }
    }
    float x0 = at.x(rest.x(bi, bj));
    float y0 = at.y(rest.y(bi, bj));
    float x1 = at.x(moved.x(bi, bj));
    float y1 = at.y(moved.y(bi, bj));
    double len = Math.hypot(x1 - x0, y1 - y0);
    if (len > 1) {
      double grow = Math.max(1, 28 / len);
      float ex = (float) (x0 + (x1 - x0) * grow);
      float ey = (float) (y0 + (y1 - y0) * grow);
      float lift = bi == m ? 7 : 0;
      arrow(cb, x0, y0 + lift, ex, ey + lift);
    }
  }

  /** An angle that moves the most-moved joint by about a tenth of the plane's size. */
  static double exaggeratedAngle(PlaneGrid g, Parts.Part part, double size) {
    double probe = 0.05;
    MechanismShape rest = MechanismShape.of(g, part.block(), 0);
    MechanismShape probeShape = MechanismShape.of(g, part.block(), probe);
    double most = 0;
    for (int i = 0; i <= g.lifts(); i++) {
      for (int j = 0; j <= g.bays(); j++) {
        most = Math.max(most,
            Math.hypot(probeShape.x(i, j) - rest.x(i, j), probeShape.y(i, j) - rest.y(i, j)));
      }
    }
    if (most <= 0) {
      return 0.15;
    }
    double t = probe * (0.1 * size) / most;
    return Math.max(0.06, Math.min(0.3, t));
  }

  /**
   * Strokes the grid members of {@code sh}: {@code which} -1 all, 0 those that do not turn, 1
   * those that turn with {@code part}.
   */
  private static void frame(PdfContentByte cb, MechanismShape sh, Mapper at, int m, int n,
      int which, Parts.Part part) {
    for (int i = 1; i <= m; i++) {
      boolean turns = part != null && part.block().containsLift(i);
      if (which >= 0 && turns != (which == 1)) {
        continue;
      }
      for (int j = 0; j <= n; j++) {
        cb.moveTo(at.x(sh.x(i - 1, j)), at.y(sh.y(i - 1, j)));
        cb.lineTo(at.x(sh.x(i, j)), at.y(sh.y(i, j)));
      }
    }
    for (int j = 1; j <= n; j++) {
      boolean turns = part != null && part.block().containsBay(j);
      if (which >= 0 && turns != (which == 1)) {
        continue;
      }
      for (int i = 0; i <= m; i++) {
        cb.moveTo(at.x(sh.x(i, j - 1)), at.y(sh.y(i, j - 1)));
        cb.lineTo(at.x(sh.x(i, j)), at.y(sh.y(i, j)));
      }
    }
    cb.stroke();
  }

  private static void arrow(PdfContentByte cb, float x0, float y0, float x1, float y1) {
    double a = Math.atan2(y1 - y0, x1 - x0);
    float head = 4.5f;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.LOST);
    cb.setColorFill(Palette.LOST);
    cb.setLineWidth(1f);
    Glyphs.line(cb, x0, y0, x1, y1);
    cb.moveTo(x1, y1);
    cb.lineTo((float) (x1 - head * Math.cos(a - 0.45)), (float) (y1 - head * Math.sin(a - 0.45)));
    cb.lineTo((float) (x1 - head * Math.cos(a + 0.45)), (float) (y1 - head * Math.sin(a + 0.45)));
    cb.closePath();
    cb.fill();
    cb.restoreState();
  }

  private record Mapper(float s, float offX, float offY) {
    float x(double mx) {
      return (float) (offX + mx * s);
    }

    float y(double my) {
      return (float) (offY + my * s);
    }
  }
}
