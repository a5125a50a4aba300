package org.bracewalk.report;

import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.ColumnText;
import com.lowagie.text.pdf.PdfContentByte;
import java.util.Map;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.JointMotion;
import org.bracewalk.core.analysis.MechanismShape;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.MotionSketch;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * The sketch of how a plane that lost rigidity can move: from the engine's exact first-order joint
 * motion where the report carries one ({@link #drawMotion}: any frame, members missing or not), else
 * from the engine's exact mechanism shape (the part that sways turned by an exaggerated angle, the
 * rest held). The plane at rest is behind in grey dashes; members that move are drawn in the
 * alert colour and heavier.
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

  /** The largest joint move drawn, as a share of the plane's larger dimension. */
  static final double MOTION_SHARE = 0.1;

  /**
   * Draws the engine's exact first-order motion of {@code sketch} inside the box with lower-left
   * corner (x, y): each joint at its rest position plus a scale times its velocity, the scale such
   * that the largest move is {@link #MOTION_SHARE} of the plane's size; the plane at rest behind in
   * grey dashes; members with a moving end heavier in the alert colour; the joints of a freedom
   * without sideways restraint or at a loose end marked.
   *
   * @param letter the letter of the swaying part shown (for a sway)
   */
  void drawMotion(PdfContentByte cb, PlaneSection plane, MotionSketch sketch, String letter,
      float x, float y, float width, float height) {
    PlaneGrid g = plane.design().grid();
    int m = g.lifts();
    int n = g.bays();
    JointMotion v = sketch.motion();
    if (v.lifts() != m || v.bays() != n) {
      throw new IllegalArgumentException("the motion of plane '" + plane.name() + "' is for a "
          + v.lifts() + " x " + v.bays() + " grid, the plane is " + m + " x " + n);
    }
    double[] rx = new double[n + 1];
    double[] ry = new double[m + 1];
    for (int j = 1; j <= n; j++) {
      rx[j] = rx[j - 1] + g.bayWidths().get(j - 1);
    }
    for (int i = 1; i <= m; i++) {
      ry[i] = ry[i - 1] + g.liftHeights().get(i - 1);
    }
    double size = Math.max(rx[n], ry[m]);
    double largest = 0;
    for (int i = 0; i <= m; i++) {
      for (int j = 0; j <= n; j++) {
        largest = Math.max(largest, Math.hypot(v.dx(i, j), v.dy(i, j)));
      }
    }
    double scale = largest > 0 ? MOTION_SHARE * size / largest : 0;
    double[][] mx = new double[m + 1][n + 1];
    double[][] my = new double[m + 1][n + 1];
    double minX = Double.MAX_VALUE;
    double maxX = -Double.MAX_VALUE;
    double minY = Double.MAX_VALUE;
    double maxY = -Double.MAX_VALUE;
    for (int i = 0; i <= m; i++) {
      for (int j = 0; j <= n; j++) {
        mx[i][j] = rx[j] + scale * v.dx(i, j);
        my[i][j] = ry[i] + scale * v.dy(i, j);
        minX = Math.min(minX, Math.min(mx[i][j], rx[j]));
        maxX = Math.max(maxX, Math.max(mx[i][j], rx[j]));
        minY = Math.min(minY, Math.min(my[i][j], ry[i]));
        maxY = Math.max(maxY, Math.max(my[i][j], ry[i]));
      }
    }
    Freedom f = sketch.freedom();
    String title = switch (f.kind()) {
      case SWAY -> w.format(g.support() == Support.FREE ? "mechanism.title.motion.free"
          : "mechanism.title.motion", "part", letter);
      case LOST_RESTRAINT -> w.format("mechanism.title.restraint", "joint",
          f.joints().isEmpty() ? w.text("list.none") : w.joint(f.joints().get(0)));
      case LOOSE_END -> w.format("mechanism.title.loose", "joint",
          f.joints().isEmpty() ? w.text("list.none") : w.joint(f.joints().get(0)));
    };
    Glyphs.text(cb, bold, 8f, Palette.LOST, PdfContentByte.ALIGN_LEFT, title, x, y + height - 9f);
    float noteHeight = 22f;
    note(cb, w.format("mechanism.note.motion", "percent", Math.round(MOTION_SHARE * 100)), x, y,
        width, noteHeight);

    float boxX = x + 10;
    float boxY = y + noteHeight + 8;
    float boxW = width - 20;
    float boxH = height - noteHeight - 8 - 16;
    float s = (float) Math.min(boxW / Math.max(maxX - minX, 1e-9), boxH / Math.max(maxY - minY, 1e-9));
    Mapper at = new Mapper(s, boxX + (float) ((boxW - (maxX - minX) * s) / 2 - minX * s),
        boxY - (float) (minY * s));

    // at rest: the whole design frame in grey dashes
    cb.saveState();
    Glyphs.stroke(cb, Glyphs.Stroke.DESIGN, 1f);
    for (int j = 0; j <= n; j++) {
      cb.moveTo(at.x(rx[j]), at.y(ry[0]));
      cb.lineTo(at.x(rx[j]), at.y(ry[m]));
    }
    for (int i = 0; i <= m; i++) {
      cb.moveTo(at.x(rx[0]), at.y(ry[i]));
      cb.lineTo(at.x(rx[n]), at.y(ry[i]));
    }
    cb.stroke();
    cb.restoreState();
    if (g.support() == Support.PINNED_BASE) {
      Glyphs.ground(cb, at.x(rx[0]), at.x(rx[n]), at.y(ry[0]));
    }
    // moved: the frame members that are there, in two passes (held, then moving)
    for (int pass = 0; pass < 2; pass++) {
      cb.saveState();
      cb.setLineDash(0f);
      cb.setColorStroke(pass == 0 ? Palette.INK : Palette.LOST);
      cb.setLineWidth(pass == 0 ? 0.8f : 1.6f);
      for (int i = 0; i <= m; i++) {
        for (int j = 0; j <= n; j++) {
          if (j >= 1 && plane.asBuilt().hasFrameMember(FrameRef.ledger(i, j))) {
            member(cb, at, v, mx, my, i, j - 1, i, j, pass == 1);
          }
          if (i >= 1 && plane.asBuilt().hasFrameMember(FrameRef.standard(i, j))) {
            member(cb, at, v, mx, my, i - 1, j, i, j, pass == 1);
          }
        }
      }
      for (Map.Entry<PanelRef, Brace> e : plane.asBuilt().members().entrySet()) {
        int i = e.getKey().lift();
        int j = e.getKey().bay();
        if (e.getValue().diagonal().hasRising()) {
          member(cb, at, v, mx, my, i - 1, j - 1, i, j, pass == 1);
        }
        if (e.getValue().diagonal().hasFalling()) {
          member(cb, at, v, mx, my, i, j - 1, i - 1, j, pass == 1);
        }
      }
      cb.stroke();
      cb.restoreState();
    }
    // the joints of this freedom that are no sway: marked where they have moved to
    if (f.kind() != FreedomKind.SWAY) {
      for (Joint jt : f.joints()) {
        if (jt.level() <= m && jt.line() <= n) {
          float jx = at.x(mx[jt.level()][jt.line()]);
          float jy = at.y(my[jt.level()][jt.line()]);
          if (f.kind() == FreedomKind.LOST_RESTRAINT) {
            Glyphs.lostRestraint(cb, jx, jy, 3.5f, FrameLooks.vertical(f));
          } else {
            Glyphs.looseEnd(cb, jx, jy, 4f);
          }
        }
      }
    }
    // an arrow from the joint that moves most (the highest, then the most central), its way
    int bi = 0;
    int bj = 0;
    double best = -1;
    for (int i = 0; i <= m; i++) {
      for (int j = 0; j <= n; j++) {
        double d = Math.hypot(v.dx(i, j), v.dy(i, j));
        boolean tie = Math.abs(d - best) <= 1e-9 * Math.max(1, best);
        if (d > best && !tie || tie && (i > bi || i == bi && Math.abs(2 * j - n) < Math.abs(2 * bj - n))) {
          best = Math.max(best, d);
          bi = i;
          bj = j;
        }
      }
    }
    float x0 = at.x(rx[bj]);
    float y0 = at.y(ry[bi]);
    float x1 = at.x(mx[bi][bj]);
    float y1 = at.y(my[bi][bj]);
    double len = Math.hypot(x1 - x0, y1 - y0);
    if (len > 1) {
      double grow = Math.max(1, 28 / len);
      // lifted clear of the top joint, but never into the title
      float lift = bi == m && f.kind() == FreedomKind.SWAY ? 7 : 0;
      float ex = (float) (x0 + (x1 - x0) * grow);
      float ey = (float) (y0 + (y1 - y0) * grow);
      float roof = y + height - 14f;
      lift = Math.max(0, Math.min(lift, roof - Math.max(y0, ey)));
      if (Math.max(y0, ey) + lift > roof) {
        ey = Math.min(ey, roof);
      }
      arrow(cb, x0, y0 + lift, ex, ey + lift);
    }
  }

  /** One moved member, stroked in this pass when it has a moving end ({@code moving}) or not. */
  private static void member(PdfContentByte cb, Mapper at, JointMotion v, double[][] mx,
      double[][] my, int i0, int j0, int i1, int j1, boolean moving) {
    if ((v.moves(i0, j0) || v.moves(i1, j1)) != moving) {
      return;
    }
    cb.moveTo(at.x(mx[i0][j0]), at.y(my[i0][j0]));
    cb.lineTo(at.x(mx[i1][j1]), at.y(my[i1][j1]));
  }

  private void note(PdfContentByte cb, String text, float x, float y, float width, float h) {
    ColumnText ct = new ColumnText(cb);
    ct.setSimpleColumn(new Phrase(text, new Font(font, 6.5f, Font.NORMAL, Palette.GRID)),
        x, y, x + width, y + h, 8f, Element.ALIGN_LEFT);
    try {
      ct.go();
    } catch (com.lowagie.text.DocumentException e) {
      throw new IllegalStateException(e);
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
