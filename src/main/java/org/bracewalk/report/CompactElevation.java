package org.bracewalk.report;

import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import java.util.Map;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * The small elevation of a plane in the table of planes that hold their shape with nothing found:
 * its grid, its braces as designed (found sound) and its openings, at a given standard scale, so
 * every plane of the table is drawn at the same scale.
 */
final class CompactElevation {
  private CompactElevation() {}

  /**
   * A vector form {@code width} by {@code height} points with the plane centred in it at
   * 1:{@code scale}.
   */
  static PdfTemplate draw(PdfContentByte parent, PlaneSection plane, int scale, float width,
      float height) {
    PdfTemplate t = parent.createTemplate(width, height);
    PlaneGrid g = plane.design().grid();
    int m = g.lifts();
    int n = g.bays();
    float s = (float) (ElevationDrawing.POINTS_PER_METRE / scale);
    float ox = (float) Math.max(0, (width - ElevationDrawing.widthOf(g) * s) / 2);
    float oy = (float) Math.max(1.5, (height - ElevationDrawing.heightOf(g) * s) / 2);
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
    for (PanelRef p : plane.design().openings()) {
      t.setColorFill(Palette.OPENING);
      t.rectangle(xs[p.bay() - 1], ys[p.lift() - 1], xs[p.bay()] - xs[p.bay() - 1],
          ys[p.lift()] - ys[p.lift() - 1]);
      t.fill();
    }
    t.setColorStroke(Palette.GRID);
    t.setLineWidth(0.5f);
    for (int j = 0; j <= n; j++) {
      t.moveTo(xs[j], ys[0]);
      t.lineTo(xs[j], ys[m]);
    }
    for (int i = 0; i <= m; i++) {
      t.moveTo(xs[0], ys[i]);
      t.lineTo(xs[n], ys[i]);
    }
    t.stroke();
    t.saveState();
    Glyphs.stroke(t, Glyphs.Stroke.SOUND, 0.6f);
    for (Map.Entry<PanelRef, Brace> e : plane.design().braces().entrySet()) {
      PanelRef p = e.getKey();
      if (p.lift() <= m && p.bay() <= n) {
        ElevationDrawing.members(t, e.getValue().diagonal(), e.getValue().kind(), xs[p.bay() - 1],
            ys[p.lift() - 1], xs[p.bay()], ys[p.lift()], 0.04f);
      }
    }
    t.restoreState();
    if (g.support() == Support.PINNED_BASE) {
      t.setColorStroke(Palette.GRID);
      t.setLineWidth(1f);
      Glyphs.line(t, xs[0] - 2, ys[0], xs[n] + 2, ys[0]);
    }
    return t;
  }
}
