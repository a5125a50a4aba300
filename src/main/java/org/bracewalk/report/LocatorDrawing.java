package org.bracewalk.report;

import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;

/**
 * A small elevation of a plane, to scale, with the panel of one action filled and ringed (a frame
 * member drawn heavy and ringed; to take out of service, the whole lifts hatched), so a crew finds
 * the place on the structure.
 */
final class LocatorDrawing {
  private LocatorDrawing() {}

  /** A vector form of {@code width} by {@code height} points showing where {@code a} is. */
  static PdfTemplate draw(PdfContentByte parent, PlaneGrid g, RepairStep a, float width,
      float height) {
    PdfTemplate t = parent.createTemplate(width, height);
    int m = g.lifts();
    int n = g.bays();
    double wm = g.bayWidths().stream().mapToDouble(Double::doubleValue).sum();
    double hm = g.liftHeights().stream().mapToDouble(Double::doubleValue).sum();
    float pad = 3f;
    float s = (float) Math.min((width - 2 * pad) / wm, (height - 2 * pad - 2) / hm);
    float ox = pad + (float) ((width - 2 * pad - wm * s) / 2);
    float oy = pad + 2;
    float[] xs = new float[n + 1];
    float[] ys = new float[m + 1];
    xs[0] = ox;
    ys[0] = oy;
    for (int j = 1; j <= n; j++) {
      xs[j] = xs[j - 1] + (float) (g.bayWidths().get(j - 1) * s);
    }
    for (int i = 1; i <= m; i++) {
      ys[i] = ys[i - 1] + (float) (g.liftHeights().get(i - 1) * s);
    }
    if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE) {
      for (int lift : a.lifts()) {
        if (lift >= 1 && lift <= m) {
          Glyphs.hatch(t, xs[0], ys[lift - 1], xs[n] - xs[0], ys[lift] - ys[lift - 1],
              Palette.tint(0), 0);
        }
      }
    }
    t.setColorStroke(Palette.GHOST);
    t.setLineWidth(0.4f);
    for (int j = 0; j <= n; j++) {
      t.moveTo(xs[j], ys[0]);
      t.lineTo(xs[j], ys[m]);
    }
    for (int i = 0; i <= m; i++) {
      t.moveTo(xs[0], ys[i]);
      t.lineTo(xs[n], ys[i]);
    }
    t.stroke();
    if (g.support() == Support.PINNED_BASE) {
      t.setColorStroke(Palette.GRID);
      t.setLineWidth(0.9f);
      Glyphs.line(t, xs[0] - 2, ys[0], xs[n] + 2, ys[0]);
    }
    if (a.type() == RepairStepKind.TAKE_OUT_OF_SERVICE && !a.lifts().isEmpty()) {
      int lo = Math.max(1, a.lifts().stream().mapToInt(Integer::intValue).min().getAsInt());
      int hi = Math.min(m, a.lifts().stream().mapToInt(Integer::intValue).max().getAsInt());
      if (lo <= hi) {
        t.setColorStroke(Palette.LOST);
        t.setLineWidth(1.2f);
        t.rectangle(xs[0], ys[lo - 1], xs[n] - xs[0], ys[hi] - ys[lo - 1]);
        t.stroke();
      }
    }
    if (a.isFrameMember()) {
      FrameRef f = a.frameMember();
      if (f.within(g)) {
        float[] seg = ElevationDrawing.segment(f, xs, ys);
        t.setColorStroke(Palette.REPAIR);
        t.setLineWidth(2.6f);
        Glyphs.line(t, seg[0], seg[1], seg[2], seg[3]);
        float span = (float) Math.hypot(seg[2] - seg[0], seg[3] - seg[1]);
        t.setColorStroke(Palette.LOST);
        t.setLineWidth(1.2f);
        t.circle((seg[0] + seg[2]) / 2, (seg[1] + seg[3]) / 2, span * 0.5f + 4f);
        t.stroke();
      }
    } else if (a.type() != RepairStepKind.TAKE_OUT_OF_SERVICE) {
      int i = a.panel().lift();
      int j = a.panel().bay();
      if (i <= m && j <= n) {
        float px = xs[j - 1];
        float py = ys[i - 1];
        float pw = xs[j] - px;
        float ph = ys[i] - py;
        t.setColorFill(Palette.REPAIR);
        t.rectangle(px, py, pw, ph);
        t.fill();
        t.setColorStroke(Palette.LOST);
        t.setLineWidth(1.2f);
        float cx = px + pw / 2;
        float cy = py + ph / 2;
        t.circle(cx, cy, Math.min(pw, ph) * 0.5f + 4f);
        t.stroke();
      }
    }
    return t;
  }
}
