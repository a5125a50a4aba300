package org.bracewalk.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;

/**
 * A small elevation of a plane, to proportion, with the panel of one action filled and ringed (a
 * frame member drawn heavy and ringed; to take out of service, the whole lifts hatched; to off-load
 * beside a racking upright frame, the beam bays either side hatched), its lifts and bays labelled
 * (L1, B1 ...; the marked ones in bold, others thinned out where they would crowd) in type large
 * enough to read on a phone's photo of the page, so a crew finds the place on the structure.
 */
final class LocatorDrawing {
  /** The labels' type size: 7.5 points is about 2.6 mm high on the page. */
  static final float LABEL = 7.5f;
  private static final float LEFT = 20f;
  private static final float BOTTOM = 12f;
  /** Room either side of an upright frame for the beam bays to off-load. */
  private static final float BESIDE = 22f;

  private LocatorDrawing() {}

  /** A vector form of {@code width} by {@code height} points showing where {@code a} is. */
  static PdfTemplate draw(PdfContentByte parent, Wording w, BaseFont font, BaseFont bold,
      PlaneGrid g, RepairStep a, float width, float height) {
    PdfTemplate t = parent.createTemplate(width, height);
    int m = g.lifts();
    int n = g.bays();
    boolean beside = a.type() == RepairStepKind.OFFLOAD_BESIDE;
    double wm = ElevationDrawing.widthOf(g);
    double hm = ElevationDrawing.heightOf(g);
    float side = beside ? BESIDE : 0f;
    float pad = 3f;
    float availW = width - LEFT - pad - 2 * side;
    float availH = height - BOTTOM - pad;
    float s = (float) Math.min(availW / wm, availH / hm);
    float ox = LEFT + side + (float) ((availW - wm * s) / 2);
    float oy = BOTTOM;
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
    java.util.Set<Integer> liftsMarked = new java.util.HashSet<>();
    java.util.Set<Integer> baysMarked = new java.util.HashSet<>();
    if (a.type().wholeLifts()) {
      for (int lift : a.lifts()) {
        if (lift >= 1 && lift <= m) {
          liftsMarked.add(lift);
          if (beside) {
            Glyphs.hatch(t, xs[0] - side, ys[lift - 1], side - 2, ys[lift] - ys[lift - 1],
                Palette.tint(0), 0);
            Glyphs.hatch(t, xs[n] + 2, ys[lift - 1], side - 2, ys[lift] - ys[lift - 1],
                Palette.tint(0), 0);
          } else {
            Glyphs.hatch(t, xs[0], ys[lift - 1], xs[n] - xs[0], ys[lift] - ys[lift - 1],
                Palette.tint(0), 0);
          }
        }
      }
    }
    t.setColorStroke(Palette.GHOST);
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
    if (g.support() == Support.PINNED_BASE) {
      t.setColorStroke(Palette.GRID);
      t.setLineWidth(0.9f);
      Glyphs.line(t, xs[0] - 2 - side, ys[0], xs[n] + 2 + side, ys[0]);
    }
    if (a.type().wholeLifts() && !a.lifts().isEmpty()) {
      int lo = Math.max(1, a.lifts().stream().mapToInt(Integer::intValue).min().getAsInt());
      int hi = Math.min(m, a.lifts().stream().mapToInt(Integer::intValue).max().getAsInt());
      if (lo <= hi) {
        t.setColorStroke(Palette.LOST);
        t.setLineWidth(1.2f);
        if (beside) {
          t.rectangle(xs[0] - side, ys[lo - 1], side - 2, ys[hi] - ys[lo - 1]);
          t.rectangle(xs[n] + 2, ys[lo - 1], side - 2, ys[hi] - ys[lo - 1]);
        } else {
          t.rectangle(xs[0], ys[lo - 1], xs[n] - xs[0], ys[hi] - ys[lo - 1]);
        }
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
        if (f.isLedger()) {
          baysMarked.add(f.second());
          if (f.first() >= 1) {
            liftsMarked.add(f.first());
          }
          if (f.first() < m) {
            liftsMarked.add(f.first() + 1);
          }
        } else {
          liftsMarked.add(f.first());
        }
      }
    } else if (!a.type().wholeLifts()) {
      int i = a.panel().lift();
      int j = a.panel().bay();
      if (i <= m && j <= n) {
        liftsMarked.add(i);
        baysMarked.add(j);
        float px = xs[j - 1];
        float py = ys[i - 1];
        float pw = xs[j] - px;
        float ph = ys[i] - py;
        t.setColorFill(Palette.REPAIR);
        t.rectangle(px, py, pw, ph);
        t.fill();
        t.setColorStroke(Palette.LOST);
        t.setLineWidth(1.2f);
        t.circle(px + pw / 2, py + ph / 2, Math.min(pw, ph) * 0.5f + 4f);
        t.stroke();
      }
    }
    labels(t, w, font, bold, xs, ys, side, liftsMarked, baysMarked);
    return t;
  }

  /**
   * L1, L2 ... beside the lifts and B1, B2 ... below the bays; where they would crowd, only the
   * first, the last, every k-th and the marked ones, so each label stays apart from the next.
   */
  private static void labels(PdfTemplate t, Wording w, BaseFont font, BaseFont bold, float[] xs,
      float[] ys, float side, java.util.Set<Integer> liftsMarked,
      java.util.Set<Integer> baysMarked) {
    int m = ys.length - 1;
    int n = xs.length - 1;
    float tall = LABEL + 1.5f;
    int everyLift = Math.max(1, (int) Math.ceil(tall / Math.max(0.1f, (ys[m] - ys[0]) / m)));
    java.util.List<Integer> shownLifts = new java.util.ArrayList<>();
    for (int i = 1; i <= m; i++) {
      boolean marked = liftsMarked.contains(i);
      if (!marked && i != 1 && i != m && (i - 1) % everyLift != 0) {
        continue;
      }
      float cy = (ys[i - 1] + ys[i]) / 2;
      boolean clash = false;
      for (int k = 1; k <= m && !marked; k++) {
        boolean other = liftsMarked.contains(k) || shownLifts.contains(k);
        clash |= k != i && other && Math.abs((ys[k - 1] + ys[k]) / 2 - cy) < tall;
      }
      if (clash) {
        continue;
      }
      shownLifts.add(i);
      Glyphs.text(t, marked ? bold : font, LABEL, marked ? Palette.LOST : Palette.GRID,
          PdfContentByte.ALIGN_RIGHT, w.format("elevation.lift", "n", i), xs[0] - side - 3f,
          cy - LABEL * 0.35f);
    }
    float widest = font.getWidthPoint(w.format("elevation.bay", "n", n), LABEL) + 3f;
    int every = Math.max(1, (int) Math.ceil(widest / Math.max(0.1f, (xs[n] - xs[0]) / n)));
    java.util.List<Integer> shown = new java.util.ArrayList<>();
    for (int j = 1; j <= n; j++) {
      boolean marked = baysMarked.contains(j);
      if (!marked && j != 1 && j != n && (j - 1) % every != 0) {
        continue;
      }
      float cx = (xs[j - 1] + xs[j]) / 2;
      boolean clash = false;
      for (int k = 1; k <= n && !marked; k++) {
        // an unmarked label gives way to a marked one and to the one before it
        boolean other = baysMarked.contains(k) || shown.contains(k);
        clash |= k != j && other && Math.abs((xs[k - 1] + xs[k]) / 2 - cx) < widest;
      }
      if (clash) {
        continue;
      }
      shown.add(j);
      Glyphs.text(t, marked ? bold : font, LABEL, marked ? Palette.LOST : Palette.GRID,
          PdfContentByte.ALIGN_CENTER, w.format("elevation.bay", "n", j), cx, ys[0] - LABEL - 1f);
    }
  }
}
