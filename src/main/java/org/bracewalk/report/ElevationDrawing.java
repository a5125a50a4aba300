package org.bracewalk.report;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * A plane's elevation drawn to scale as vector lines: the grid of standards and ledgers (each
 * frame member not there as designed in its state: damaged, beyond use, missing, left out by the
 * design, there although left out, not inspected), every panel's design member (thin dashes) with
 * the as-found state over it (line style, symbol and colour), the parts that can sway hatched and
 * lettered, joints with no sideways restraint and loose member ends marked, critical braces and
 * frame members marked, the members to fit drawn in long dashes with their action numbers,
 * dimensions in the site's units and a scale bar.
 */
final class ElevationDrawing {
  /** Points per metre of paper: 72 points per inch. */
  static final double POINTS_PER_METRE = 72 / 0.0254;

  /**
   * The scales an elevation is drawn at, 1:n: the reduction scales of ISO 5455 (1:10, 1:20, 1:50,
   * 1:100, 1:200 and on by tens: 1:500, 1:1000 ...), with 1:25, common in building drawings (from
   * memory). The largest serve the longest racking runs and facades (up to 500 bays).
   */
  static final int[] SCALES = {10, 20, 25, 50, 100, 200, 500, 1000, 2000, 5000, 10000, 20000, 50000};

  private static final float LEFT = 30;
  private static final float RIGHT = 40;
  private static final float TOP = 16;
  private static final float BOTTOM = 34;

  private final Wording w;
  private final BaseFont font;
  private final BaseFont bold;

  ElevationDrawing(Wording w, BaseFont font, BaseFont bold) {
    this.w = w;
    this.font = font;
    this.bold = bold;
  }

  /**
   * The largest standard scale (the least n of 1:n in {@link #SCALES}) at which the plane fits a
   * box {@code width} by {@code height} points with its labels; the smallest scale when none fits.
   */
  static int scaleFor(PlaneGrid g, float width, float height) {
    for (int n : SCALES) {
      double s = POINTS_PER_METRE / n;
      if (widthOf(g) * s <= width - LEFT - RIGHT && heightOf(g) * s <= height - TOP - BOTTOM) {
        return n;
      }
    }
    return SCALES[SCALES.length - 1];
  }

  /** The height of the drawing's box at scale 1:{@code n}, labels included. */
  static float heightAt(PlaneGrid g, int n) {
    return (float) (heightOf(g) * POINTS_PER_METRE / n) + TOP + BOTTOM;
  }

  static double widthOf(PlaneGrid g) {
    return g.bayWidths().stream().mapToDouble(Double::doubleValue).sum();
  }

  static double heightOf(PlaneGrid g) {
    return g.liftHeights().stream().mapToDouble(Double::doubleValue).sum();
  }

  /**
   * Draws {@code plane} inside the box with lower-left corner (x, y).
   *
   * @param actionsAt the repair-plan action numbers that concern each panel
   * @param frameActionsAt the action numbers that concern each frame member
   * @param scale the drawing is at 1:{@code scale} (see {@link #scaleFor}); the box must hold it
   */
  void draw(
      PdfContentByte cb,
      PlaneSection plane,
      Map<PanelRef, List<Integer>> actionsAt,
      Map<FrameRef, List<Integer>> frameActionsAt,
      float x,
      float y,
      float width,
      float height,
      int scale) {
    PlaneGrid g = plane.design().grid();
    int m = g.lifts();
    int n = g.bays();
    double wm = g.bayWidths().stream().mapToDouble(Double::doubleValue).sum();
    double hm = g.liftHeights().stream().mapToDouble(Double::doubleValue).sum();
    float s = (float) (POINTS_PER_METRE / scale);
    // centred across the box; lift labels and heights stay beside the grid
    float ox = x + LEFT + (float) Math.max(0, (width - LEFT - RIGHT - wm * s) / 2);
    float oy = y + BOTTOM;
    float[] xs = new float[n + 1];
    float[] ys = new float[m + 1];
    for (int j = 1; j <= n; j++) {
      xs[j] = xs[j - 1] + (float) (g.bayWidths().get(j - 1) * s);
    }
    for (int i = 1; i <= m; i++) {
      ys[i] = ys[i - 1] + (float) (g.liftHeights().get(i - 1) * s);
    }
    for (int j = 0; j <= n; j++) {
      xs[j] += ox;
    }
    for (int i = 0; i <= m; i++) {
      ys[i] += oy;
    }
    float minPanel = Float.MAX_VALUE;
    for (int j = 1; j <= n; j++) {
      minPanel = Math.min(minPanel, xs[j] - xs[j - 1]);
    }
    for (int i = 1; i <= m; i++) {
      minPanel = Math.min(minPanel, ys[i] - ys[i - 1]);
    }
    float r = Math.max(1.8f, Math.min(4.5f, minPanel * 0.14f));
    float weight = Math.max(0.6f, Math.min(1f, minPanel / 30f));
    float labelSize = Math.max(4.5f, Math.min(6.5f, minPanel * 0.3f));

    StateAnalysis state = plane.analysis().analysedState();
    List<Parts.Part> parts = Parts.of(state);

    // title with the scale
    Glyphs.text(
        cb, bold, 8f, Palette.GRID, PdfContentByte.ALIGN_LEFT,
        w.format("elevation.title", "scale", scale), x, y + height - 9f);

    // parts that can sway
    for (Parts.Part part : parts) {
      if (!part.sways()) {
        continue;
      }
      for (int i = 1; i <= m; i++) {
        for (int j = 1; j <= n; j++) {
          if (part.covers(new PanelRef(i, j))) {
            Glyphs.hatch(cb, xs[j - 1], ys[i - 1], xs[j] - xs[j - 1], ys[i] - ys[i - 1],
                Palette.tint(part.swayIndex()), part.swayIndex());
          }
        }
      }
    }
    // where the frame is incomplete the engine names no blocks: hatch every panel with a corner
    // that moves with a swaying part
    List<Freedom> sways = FrameLooks.freedoms(plane, FreedomKind.SWAY);
    boolean swayFromFreedoms = parts.stream().noneMatch(Parts.Part::sways) && !sways.isEmpty();
    String[] liftLetters = new String[m + 1];
    if (swayFromFreedoms) {
      for (int k = 0; k < sways.size(); k++) {
        Set<Joint> moving = new HashSet<>(sways.get(k).joints());
        for (int i = 1; i <= m; i++) {
          for (int j = 1; j <= n; j++) {
            if (moving.contains(new Joint(i - 1, j - 1)) || moving.contains(new Joint(i - 1, j))
                || moving.contains(new Joint(i, j - 1)) || moving.contains(new Joint(i, j))) {
              Glyphs.hatch(cb, xs[j - 1], ys[i - 1], xs[j] - xs[j - 1], ys[i] - ys[i - 1],
                  Palette.tint(k), k);
              if (liftLetters[i] == null) {
                liftLetters[i] = Parts.letter(k);
              }
            }
          }
        }
      }
    }
    PlaneDesign design = plane.design();
    // openings
    for (PanelRef p : design.openings()) {
      float px = xs[p.bay() - 1];
      float py = ys[p.lift() - 1];
      float pw = xs[p.bay()] - px;
      float ph = ys[p.lift()] - py;
      Glyphs.opening(cb, px, py, pw, ph);
    }
    // the grid: standards and ledgers there as designed in plain runs, the others in their states
    Map<FrameRef, FrameLooks.Look> looks = FrameLooks.of(plane);
    cb.saveState();
    cb.setColorStroke(Palette.GRID);
    cb.setLineWidth(0.9f * weight);
    cb.setLineDash(0f);
    for (int j = 0; j <= n; j++) {
      int from = 0;
      for (int i = 1; i <= m + 1; i++) {
        if (i > m || looks.containsKey(FrameRef.standard(i, j))) {
          if (i - 1 > from) {
            cb.moveTo(xs[j], ys[from]);
            cb.lineTo(xs[j], ys[i - 1]);
          }
          from = i;
        }
      }
    }
    for (int i = 0; i <= m; i++) {
      int from = 0;
      for (int j = 1; j <= n + 1; j++) {
        if (j > n || looks.containsKey(FrameRef.ledger(i, j))) {
          if (j - 1 > from) {
            cb.moveTo(xs[from], ys[i]);
            cb.lineTo(xs[j - 1], ys[i]);
          }
          from = j;
        }
      }
    }
    cb.stroke();
    cb.restoreState();
    for (Map.Entry<FrameRef, FrameLooks.Look> e : looks.entrySet()) {
      float[] seg = segment(e.getKey(), xs, ys);
      cb.saveState();
      Glyphs.stroke(cb, e.getValue().stroke, weight);
      Glyphs.line(cb, seg[0], seg[1], seg[2], seg[3]);
      cb.restoreState();
      if (e.getValue() == FrameLooks.Look.OMITTED) {
        Glyphs.endTicks(cb, seg[0], seg[1], seg[2], seg[3], r * 1.6f);
      }
      Glyphs.mark(cb, font, e.getValue().mark, (seg[0] + seg[2]) / 2, (seg[1] + seg[3]) / 2,
          r * 0.8f);
    }
    if (g.support() == Support.PINNED_BASE) {
      Glyphs.ground(cb, xs[0], xs[n], ys[0]);
    }

    // members: design ghost, then as found
    Set<PanelRef> critical = new HashSet<>(state.criticalBraces());
    Map<PanelRef, Brace> repairs = new HashMap<>();
    Set<PanelRef> newPositions = new HashSet<>();
    for (RepairBrace rb : plane.analysis().repair().braces()) {
      repairs.put(rb.panel(), rb.brace());
      if (!rb.inDesign()) {
        newPositions.add(rb.panel());
      }
    }
    for (int i = 1; i <= m; i++) {
      for (int j = 1; j <= n; j++) {
        PanelRef p = new PanelRef(i, j);
        float x0 = xs[j - 1];
        float y0 = ys[i - 1];
        float x1 = xs[j];
        float y1 = ys[i];
        Brace designBrace = design.braceAt(p);
        PanelFinding f = plane.findings().get(p);
        Glyphs.Mark mark = drawPanel(cb, designBrace, f, x0, y0, x1, y1, weight);
        Brace repair = repairs.get(p);
        if (repair != null) {
          cb.saveState();
          Glyphs.stroke(cb, Glyphs.Stroke.REPAIR, weight);
          members(cb, repair.diagonal(), repair.kind(), x0, y0, x1, y1, 0.1f);
          cb.restoreState();
        }
        float cx = (x0 + x1) / 2;
        float cy = (y0 + y1) / 2;
        Glyphs.mark(cb, font, mark, cx, cy, r);
        if (critical.contains(p)) {
          float size = Math.max(2.2f, r * 0.95f);
          Glyphs.critical(cb, x0 + size * 0.9f, y1 - size * 0.9f, size);
        }
        List<Integer> numbers = actionsAt.get(p);
        if (numbers != null && !numbers.isEmpty()) {
          // at mid-height, a fifth of the way in from the left side: clear of every corner, of
          // the centre's symbol and of either diagonal (which pass a fifth of the way up or down)
          String text = numbers.size() > 2 ? numbers.get(0) + "+" : Wording.ranges(numbers);
          float lw = bold.getWidthPoint(text, labelSize) + labelSize * 0.6f;
          float lx = x0 + Math.max(lw / 2 + 1.5f, (x1 - x0) * 0.22f);
          Glyphs.repairNumber(cb, bold, text, lx, cy, labelSize, !newPositions.contains(p));
        }
      }
    }

    // frame members to fit, critical frame members, their action numbers
    for (RepairMember rm : plane.analysis().repair().members()) {
      float[] seg = segment(rm.member(), xs, ys);
      float off = 1.8f * weight;
      float ox2 = rm.member().isLedger() ? 0 : rm.member().second() == n ? -off : off;
      float oy2 = !rm.member().isLedger() ? 0 : rm.member().first() == m ? -off : off;
      cb.saveState();
      Glyphs.stroke(cb, Glyphs.Stroke.REPAIR, weight);
      Glyphs.line(cb, seg[0] + ox2, seg[1] + oy2, seg[2] + ox2, seg[3] + oy2);
      cb.restoreState();
    }
    for (FrameRef f : state.criticalMembers()) {
      float[] seg = segment(f, xs, ys);
      float size = Math.max(2.2f, r * 0.8f);
      float along = r * 1.8f;
      float cx = (seg[0] + seg[2]) / 2 + (f.isLedger() ? along : 0);
      float cy = (seg[1] + seg[3]) / 2 + (f.isLedger() ? 0 : along);
      Glyphs.critical(cb, cx, cy, size);
    }
    for (Map.Entry<FrameRef, List<Integer>> e : frameActionsAt.entrySet()) {
      if (e.getValue().isEmpty() || !e.getKey().within(g)) {
        continue;
      }
      float[] seg = segment(e.getKey(), xs, ys);
      String text = e.getValue().size() > 2 ? e.getValue().get(0) + "+" : Wording.ranges(e.getValue());
      float lw = bold.getWidthPoint(text, labelSize) + labelSize * 0.6f;
      float cx = (seg[0] + seg[2]) / 2 + (e.getKey().isLedger() ? -r * 1.4f - lw / 2 : lw / 2 + 2f);
      float cy = (seg[1] + seg[3]) / 2
          + (e.getKey().isLedger() ? labelSize * 0.8f + 1f : -r * 1.4f - labelSize * 0.6f);
      Glyphs.repairNumber(cb, bold, text, cx, cy, labelSize, true);
    }
    // joints with no sideways restraint, loose member ends
    for (Freedom f : FrameLooks.freedoms(plane, FreedomKind.LOST_RESTRAINT)) {
      for (Joint j : f.joints()) {
        if (j.level() <= m && j.line() <= n) {
          Glyphs.lostRestraint(cb, xs[j.line()], ys[j.level()], r * 0.9f, FrameLooks.vertical(f));
        }
      }
    }
    for (Freedom f : FrameLooks.freedoms(plane, FreedomKind.LOOSE_END)) {
      for (Joint j : f.joints()) {
        if (j.level() <= m && j.line() <= n) {
          Glyphs.looseEnd(cb, xs[j.line()], ys[j.level()], r * 1.1f);
        }
      }
    }

    // labels: lifts on the left (with the letter of a swaying part), bays below
    float fs = Math.max(4.5f, Math.min(7f, minPanel * 0.35f));
    for (int i = 1; i <= m; i++) {
      float cy = (ys[i - 1] + ys[i]) / 2;
      Glyphs.text(cb, font, fs, Palette.GRID, PdfContentByte.ALIGN_RIGHT,
          w.format("elevation.lift", "n", i), ox - 3f, cy - fs * 0.35f);
      Parts.Part part = swayingPartOfLift(parts, i);
      String letter = part != null ? part.letter() : liftLetters[i];
      if (letter != null) {
        Glyphs.partLetter(cb, bold, letter, ox - 3f - fs * 2.6f, cy, fs);
      }
      String hText = w.length(g.liftHeights().get(i - 1));
      if (font.getWidthPoint(hText, fs) < RIGHT - 4 && ys[i] - ys[i - 1] > fs) {
        Glyphs.text(cb, font, fs, Palette.GHOST, PdfContentByte.ALIGN_LEFT, hText, xs[n] + 3f,
            cy - fs * 0.35f);
      }
    }
    float dimSize = fs;
    boolean widthsFit = false;
    for (float size : new float[] {fs, Math.min(fs, 5f)}) {
      boolean fit = true;
      for (int j = 1; j <= n; j++) {
        fit &= font.getWidthPoint(w.length(g.bayWidths().get(j - 1)), size) < xs[j] - xs[j - 1] - 2;
      }
      if (fit) {
        widthsFit = true;
        dimSize = size;
        break;
      }
    }
    for (int j = 1; j <= n; j++) {
      float cx = (xs[j - 1] + xs[j]) / 2;
      Glyphs.text(cb, font, fs, Palette.GRID, PdfContentByte.ALIGN_CENTER,
          w.format("elevation.bay", "n", j), cx, oy - 6f - fs);
      if (widthsFit) {
        Glyphs.text(cb, font, dimSize, Palette.GHOST, PdfContentByte.ALIGN_CENTER,
            w.length(g.bayWidths().get(j - 1)), cx, oy - 8f - fs - dimSize);
      }
    }
    // line numbers above the standards, so a frame member's words find their place
    if (plane.showsFrame()) {
      float ls = Math.max(4f, Math.min(6f, minPanel * 0.3f));
      boolean fits = true;
      for (int j = 1; j <= n; j++) {
        fits &= xs[j] - xs[j - 1] > font.getWidthPoint(String.valueOf(n), ls) * 2.2f;
      }
      if (fits) {
        for (int j = 0; j <= n; j++) {
          Glyphs.text(cb, font, ls, Palette.GHOST, PdfContentByte.ALIGN_CENTER, String.valueOf(j),
              xs[j], ys[m] + 2.5f);
        }
      }
    }
    // overall size and a scale bar
    String overall = w.format("elevation.overall", "width", w.length(wm), "height", w.length(hm));
    Glyphs.text(cb, font, 6.5f, Palette.GRID, PdfContentByte.ALIGN_LEFT, overall, x, y + 1f);
    drawScaleBar(cb, s, x + width - 6f, y + 2f);
  }

  /** The end points (x0, y0, x1, y1) of a frame member on the drawing. */
  static float[] segment(FrameRef f, float[] xs, float[] ys) {
    return f.isLedger()
        ? new float[] {xs[f.second() - 1], ys[f.first()], xs[f.second()], ys[f.first()]}
        : new float[] {xs[f.second()], ys[f.first() - 1], xs[f.second()], ys[f.first()]};
  }

  private static Parts.Part swayingPartOfLift(List<Parts.Part> parts, int lift) {
    for (Parts.Part p : parts) {
      if (p.sways() && p.block().containsLift(lift)) {
        return p;
      }
    }
    return null;
  }

  private void drawScaleBar(PdfContentByte cb, float s, float right, float y) {
    double unit = w.metresPerDisplayUnit();
    double[] steps = {0.5, 1, 2, 5, 10, 20, 50};
    double len = steps[0];
    for (double step : steps) {
      len = step;
      if (step * unit * s >= 40) {
        break;
      }
    }
    float bar = (float) (len * unit * s);
    String label = w.scaleBar(len);
    float barRight = right - font.getWidthPoint(label, 6.5f) - 3f;
    float left = barRight - bar;
    cb.saveState();
    cb.setLineDash(0f);
    cb.setColorStroke(Palette.GRID);
    cb.setColorFill(Palette.GRID);
    cb.setLineWidth(0.6f);
    cb.rectangle(left, y + 1f, bar / 2, 2.5f);
    cb.fillStroke();
    cb.rectangle(left + bar / 2, y + 1f, bar / 2, 2.5f);
    cb.stroke();
    cb.restoreState();
    Glyphs.text(cb, font, 6.5f, Palette.GRID, PdfContentByte.ALIGN_RIGHT, "0", left - 2f, y + 0.5f);
    Glyphs.text(cb, font, 6.5f, Palette.GRID, PdfContentByte.ALIGN_LEFT, label, barRight + 3f, y + 0.5f);
  }

  /** The mark one panel of {@code design} found as {@code f} gets (drawn into {@code cb}). */
  static Glyphs.Mark panelMark(PdfContentByte cb, PlaneDesign design, PanelRef p, PanelFinding f) {
    return drawPanel(cb, design.braceAt(p), f, 0f, 0f, 20f, 20f, 1f);
  }

  /**
   * Draws one panel's design member and its state as found; returns the symbol for its centre.
   */
  private static Glyphs.Mark drawPanel(
      PdfContentByte cb, Brace design, PanelFinding f, float x0, float y0, float x1, float y1,
      float weight) {
    if (design != null) {
      cb.saveState();
      Glyphs.stroke(cb, Glyphs.Stroke.DESIGN, weight);
      members(cb, design.diagonal(), x0, y0, x1, y1, 0f);
      cb.restoreState();
    }
    if (f == null || !f.state().inspected()) {
      return f != null && f.state() == PanelState.NOT_REACHABLE
          ? Glyphs.Mark.NOT_REACHABLE : Glyphs.Mark.NOT_SEEN;
    }
    PanelState st = f.state();
    Brace foundBrace = f.memberFound();
    Diagonal found = foundBrace != null ? foundBrace.diagonal() : null;
    switch (st) {
      case SOUND, DAMAGED_EFFECTIVE -> {
        Brace b = foundBrace != null ? foundBrace : design;
        if (b != null) {
          cb.saveState();
          Glyphs.stroke(cb, st == PanelState.SOUND ? Glyphs.Stroke.SOUND : Glyphs.Stroke.DAMAGED, weight);
          members(cb, b.diagonal(), b.kind(), x0, y0, x1, y1, 0.04f);
          cb.restoreState();
        }
        return st == PanelState.SOUND || b == null ? Glyphs.Mark.NONE : Glyphs.Mark.DAMAGED;
      }
      case EXTRA -> {
        cb.saveState();
        Glyphs.stroke(cb, Glyphs.Stroke.EXTRA, weight);
        members(cb, found, foundBrace.kind(), x0, y0, x1, y1, 0.04f);
        cb.restoreState();
        return Glyphs.Mark.EXTRA;
      }
      case DAMAGED_INEFFECTIVE, MISSING -> {
        if (found != null) {
          cb.saveState();
          Glyphs.stroke(cb, Glyphs.Stroke.SOUND, weight);
          members(cb, found, foundBrace.kind(), x0, y0, x1, y1, 0.04f);
          cb.restoreState();
        }
        Diagonal lost = design == null ? null : minus(design.diagonal(), found);
        if (lost != null) {
          cb.saveState();
          Glyphs.stroke(cb,
              st == PanelState.MISSING ? Glyphs.Stroke.MISSING : Glyphs.Stroke.INEFFECTIVE, weight);
          members(cb, lost, design.kind(), x0, y0, x1, y1, 0.04f);
          cb.restoreState();
        }
        return st == PanelState.MISSING ? Glyphs.Mark.MISSING : Glyphs.Mark.BEYOND_USE;
      }
      default -> {
        return Glyphs.Mark.NOT_SEEN;
      }
    }
  }

  /**
   * Strokes members of a kind: tension-only ones (rods, cables, straps) thinner, with a small eye
   * at each end, in whatever style the state set.
   */
  static void members(PdfContentByte cb, Diagonal d, MemberKind kind, float x0, float y0,
      float x1, float y1, float inset) {
    if (kind != MemberKind.TENSION_ONLY) {
      members(cb, d, x0, y0, x1, y1, inset);
      return;
    }
    cb.setLineWidth(0.6f);
    members(cb, d, x0, y0, x1, y1, inset);
    float dx = (x1 - x0) * Math.max(inset, 0.06f);
    float dy = (y1 - y0) * Math.max(inset, 0.06f);
    float r = Math.max(1.1f, Math.min(2f, Math.min(x1 - x0, y1 - y0) * 0.05f));
    cb.setLineDash(0f);
    if (d.hasRising()) {
      cb.circle(x0 + dx, y0 + dy, r);
      cb.circle(x1 - dx, y1 - dy, r);
    }
    if (d.hasFalling()) {
      cb.circle(x0 + dx, y1 - dy, r);
      cb.circle(x1 - dx, y0 + dy, r);
    }
    cb.stroke();
  }

  /** The members of {@code whole} that {@code part} does not have. */
  static Diagonal minus(Diagonal whole, Diagonal part) {
    if (part == null) {
      return whole;
    }
    return Diagonal.of(whole.hasRising() && !part.hasRising(), whole.hasFalling() && !part.hasFalling());
  }

  /** Strokes the members of {@code d}, shortened at each end by {@code inset} of their length. */
  static void members(PdfContentByte cb, Diagonal d, float x0, float y0, float x1, float y1, float inset) {
    float dx = (x1 - x0) * inset;
    float dy = (y1 - y0) * inset;
    if (d.hasRising()) {
      Glyphs.line(cb, x0 + dx, y0 + dy, x1 - dx, y1 - dy);
    }
    if (d.hasFalling()) {
      Glyphs.line(cb, x0 + dx, y1 - dy, x1 - dx, y0 + dy);
    }
  }
}
