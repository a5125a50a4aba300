package org.bracewalk.ui.common;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.symbol.Symbol;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;

/**
 * Draws a {@link PlanePicture} on a canvas. Each element has its own line style or symbol besides
 * its colour, every symbol the one {@link Symbol} names (the PDF draws the same shapes): members
 * by state (see {@link PanelLook}) with the state's letter badge, shearing panels hatched,
 * critical braces a diamond, proposed braces a dash-dot line with a numbered ring (a square where
 * the panel is not in the design), openings an arch, changed panels a dashed frame with a star,
 * the cursor a double frame with corner brackets. Frame members recorded or left out by the design
 * are drawn in the style of their {@link FrameLook}; a joint without sideways restraint is a ring
 * with a two-headed arrow, a loose end a filled dot; the selected side of the current panel is
 * boxed and pointed at.
 */
public final class PlanePainter {
  static final Color FRAME = Color.web("#4a4a4a");
  static final Color SWAY = Color.web("#c26a00");
  static final Color REPAIR = Color.web("#0b57b0");
  static final Color CHANGED = Color.web("#6a1b9a");
  static final Color CURSOR = Color.web("#111111");
  static final Color PAPER = Color.web("#fbfaf7");

  private PlanePainter() {}

  /** Paints the whole picture into a box of {@code w} × {@code h}; returns the geometry used. */
  public static PlaneGeometry paint(GraphicsContext g, PlanePicture pic, double w, double h) {
    return paint(g, pic, w, h, true);
  }

  /**
   * Paints the picture; {@code labelled} false leaves out the lift and bay numbers and the margin
   * they need (legend swatches).
   */
  public static PlaneGeometry paint(
      GraphicsContext g, PlanePicture pic, double w, double h, boolean labelled) {
    PlaneGrid grid = pic.grid();
    PlaneGeometry geo = labelled
        ? new PlaneGeometry(grid, w, h, LEFT_MARGIN, MARGIN) : new PlaneGeometry(grid, w, h, 8, 8);
    paint(g, pic, geo, w, h, labelled);
    return geo;
  }

  /** Room left of the plane for the lift numbers, pixels. */
  public static final double LEFT_MARGIN = 52;
  /** Room on the other sides (the bay numbers below), pixels. */
  public static final double MARGIN = 30;

  /**
   * Paints the picture into a box of {@code w} × {@code h} in the geometry {@code geo} (which may
   * draw the plane larger than the box, scrolled: the lift and bay numbers then stay at the box's
   * left and bottom edges).
   */
  public static void paint(
      GraphicsContext g, PlanePicture pic, PlaneGeometry geo, double w, double h, boolean labelled) {
    PlaneGrid grid = pic.grid();
    g.clearRect(0, 0, w, h); // a full clear also drops the canvas's queued commands
    g.setFill(PAPER);
    g.fillRect(0, 0, w, h);
    g.setLineCap(StrokeLineCap.BUTT);
    SwayRegion sway = pic.sway();
    double smallest = smallestPanel(geo);
    boolean badges = smallest >= 18;
    hatchAll(g, geo, sway);
    paintFrame(g, geo);
    frameMembers(g, geo, pic);
    // members first, gathered into one path per line style (a shape per line is what makes a
    // large plane slow in the software renderer), then what is drawn over them
    MemberLines lines = new MemberLines();
    for (Pass pass : new Pass[] {Pass.LINES, Pass.OVER}) {
      for (int i = 1; i <= grid.lifts(); i++) {
        for (int j = 1; j <= grid.bays(); j++) {
          panel(g, geo, pic, new PanelRef(i, j), badges, pass, lines);
        }
      }
      lines.stroke(g);
    }
    overlays(g, geo, pic, null, badges || smallest >= 12);
    joints(g, geo, pic);
    if (pic.cursor() != null && grid.contains(pic.cursor())) {
      cursor(g, geo, pic.cursor(), pic.selectedMember());
    }
    if (labelled) {
      labels(g, geo, sway, w, h);
    }
  }

  /** Which part of a panel to draw: everything, only its member lines, or all but them. */
  private enum Pass {
    ALL,
    /** the member lines, into a {@link MemberLines} */
    LINES,
    /** openings, rod rings, damage ticks and badges: what lies over the member lines */
    OVER
  }

  /** The contents of one panel: opening, member(s) in the style of their state, badge. */
  private static void panel(GraphicsContext g, PlaneGeometry geo, PlanePicture pic, PanelRef p, boolean badges) {
    panel(g, geo, pic, p, badges, Pass.ALL, null);
  }

  private static void panel(GraphicsContext g, PlaneGeometry geo, PlanePicture pic, PanelRef p, boolean badges,
      Pass pass, MemberLines lines) {
    if (pic.design().isOpening(p)) {
      if (pass != Pass.LINES) {
        opening(g, geo, p);
      }
      return;
    }
    if (!pic.showFindings()) {
      Brace b = pic.design().braceAt(p);
      if (b != null) {
        member(g, geo, p, b, PanelLook.SOUND, pass, lines);
      }
      return;
    }
    PanelFinding f = pic.findings().get(p);
    PanelLook look = PanelLook.of(f == null ? null : f.state());
    Brace designBrace = pic.design().braceAt(p);
    Brace shown = pic.memberShown(p);
    if (f != null && (f.state() == PanelState.MISSING || f.state() == PanelState.DAMAGED_INEFFECTIVE)
        && designBrace != null) {
      // the design member drawn in the state's style; a remaining member found drawn solid
      member(g, geo, p, designBrace, look, pass, lines);
      if (f.memberFound() != null) {
        member(g, geo, p, f.memberFound(), PanelLook.SOUND, pass, lines);
      }
    } else if (shown != null) {
      member(g, geo, p, shown, look, pass, lines);
    }
    if (pass != Pass.LINES && badges && (f != null || designBrace != null)) {
      badge(g, geo, p, look);
    }
  }

  /**
   * Critical diamonds, numbered repairs, changed frames and the cursor, for the panels in {@code
   * only} (every panel when {@code null}).
   */
  private static void overlays(
      GraphicsContext g, PlaneGeometry geo, PlanePicture pic, java.util.Set<PanelRef> only, boolean repairLabels) {
    for (PanelRef p : pic.critical()) {
      if ((only == null || only.contains(p)) && pic.memberShown(p) != null) {
        diamond(g, geo, p);
      }
    }
    // frame members of the repair first (as the repair order lists them), then the braces
    int n = 1;
    for (FrameRef f : pic.repairMembers()) {
      if (only == null) {
        repairMember(g, geo, f, n, repairLabels);
      }
      n++;
    }
    for (RepairBrace r : pic.repair()) {
      if (only == null || only.contains(r.panel())) {
        repair(g, geo, r, n, repairLabels);
      }
      n++;
    }
    for (PanelRef p : pic.changed()) {
      if (only == null || only.contains(p)) {
        changed(g, geo, p);
      }
    }
    if (only == null) {
      for (FrameRef f : pic.changedMembers()) {
        changedMember(g, geo, f);
      }
    }
  }

  /**
   * A frame member of the proposed repair: dash-dot beside it in the repair's colour (the member's
   * own look, say missing, stays visible) and its number in a circle (a design member) on the
   * panel side of its middle.
   */
  private static void repairMember(GraphicsContext g, PlaneGeometry geo, FrameRef f, int number,
      boolean label) {
    double[] s = geo.frame(f);
    boolean upright = !f.isLedger();
    // towards the inside of the plane: a ledger's panel above it (below it at the top), a
    // standard's panel to its right (to its left on the last line)
    double side = upright
        ? (f.second() < geo.grid().bays() ? 1 : -1)
        : (f.first() < geo.grid().lifts() ? -1 : 1);
    double off = 5;
    g.setStroke(REPAIR);
    g.setLineWidth(3);
    g.setLineDashes(12, 4, 2, 4);
    if (upright) {
      g.strokeLine(s[0] + side * off, s[1] - 4, s[2] + side * off, s[3] + 4);
    } else {
      g.strokeLine(s[0] + 4, s[1] + side * off, s[2] - 4, s[3] + side * off);
    }
    g.setLineDashes();
    if (!label) {
      return;
    }
    double len = Math.hypot(s[2] - s[0], s[3] - s[1]);
    double rad = Math.max(6, Math.min(10, len * 0.18));
    double cx = (s[0] + s[2]) / 2 + (upright ? side * (off + rad + 3) : 0);
    double cy = (s[1] + s[3]) / 2 + (upright ? 0 : side * (off + rad + 3));
    g.setFill(Color.WHITE);
    g.setStroke(REPAIR);
    g.setLineWidth(2);
    g.fillOval(cx - rad, cy - rad, 2 * rad, 2 * rad);
    g.strokeOval(cx - rad, cy - rad, 2 * rad, 2 * rad);
    g.setFill(REPAIR);
    g.setFont(Font.font("DejaVu Sans", FontWeight.BOLD, rad * 1.1));
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.CENTER);
    g.fillText(Integer.toString(number), cx, cy + 0.5);
  }

  /** A frame member whose state changed since the previous inspection: a dashed box around it. */
  private static void changedMember(GraphicsContext g, PlaneGeometry geo, FrameRef f) {
    double[] s = geo.frame(f);
    double pad = 7;
    double x0 = Math.min(s[0], s[2]);
    double x1 = Math.max(s[0], s[2]);
    double y0 = Math.min(s[1], s[3]);
    double y1 = Math.max(s[1], s[3]);
    g.setStroke(CHANGED);
    g.setLineWidth(2.5);
    g.setLineDashes(5, 3);
    if (f.isLedger()) {
      g.strokeRect(x0 + 6, y0 - pad, x1 - x0 - 12, 2 * pad);
    } else {
      g.strokeRect(x0 - pad, y0 + 6, 2 * pad, y1 - y0 - 12);
    }
    g.setLineDashes();
  }

  /**
   * Repaints only the panels in {@code dirty} (and what of their neighbours lies within a few
   * pixels, where the cursor's brackets reach), on a canvas that already shows an earlier picture
   * of the same plane, size, blocks, critical braces, repair and changes. Per mark only two or
   * three panels change, so this is what keeps a large plane fast in the software renderer.
   */
  public static void repaint(
      GraphicsContext g, PlanePicture pic, PlaneGeometry geo, java.util.Set<PanelRef> dirty) {
    PlaneGrid grid = pic.grid();
    double smallest = smallestPanel(geo);
    boolean badges = smallest >= 18;
    SwayRegion sway = pic.sway();
    double edge = 6; // the cursor's brackets reach this far past the plane's edge
    for (PanelRef d : dirty) {
      if (!grid.contains(d)) {
        continue;
      }
      // the panel and its neighbours are wiped and drawn again whole: no clip (slow in software)
      int i0 = Math.max(1, d.lift() - 1);
      int i1 = Math.min(grid.lifts(), d.lift() + 1);
      int j0 = Math.max(1, d.bay() - 1);
      int j1 = Math.min(grid.bays(), d.bay() + 1);
      double x0 = geo.lineX(j0 - 1) - (j0 == 1 ? edge : 0);
      double x1 = geo.lineX(j1) + (j1 == grid.bays() ? edge : 0);
      double y0 = geo.levelY(i1) - (i1 == grid.lifts() ? edge : 0);
      double y1 = geo.levelY(i0 - 1) + (i0 == 1 ? edge + 2 : 0);
      g.setFill(PAPER);
      g.fillRect(x0, y0, x1 - x0, y1 - y0);
      java.util.Set<PanelRef> near = new java.util.HashSet<>();
      for (int i = i0; i <= i1; i++) {
        for (int j = j0; j <= j1; j++) {
          PanelRef p = new PanelRef(i, j);
          near.add(p);
          if (sway.isShearing(p)) {
            hatchRect(g, geo.left(p), geo.top(p), geo.panelWidth(p), geo.panelHeight(p), geo.lineX(0));
          }
        }
      }
      paintFrameNear(g, geo, d);
      for (PanelRef p : near) {
        panel(g, geo, pic, p, badges);
      }
      overlays(g, geo, pic, near, badges || smallest >= 12);
      if (pic.cursor() != null && near.contains(pic.cursor())) {
        cursor(g, geo, pic.cursor(), pic.selectedMember());
      }
    }
  }

  /**
   * The lift and bay numbers again, over a partial repaint of a plane drawn larger than its box
   * (whose numbers stand on strips over the drawing).
   */
  static void labelsOver(GraphicsContext g, PlaneGeometry geo, PlanePicture pic, double w, double h) {
    labels(g, geo, pic.sway(), w, h);
  }

  /** The frame members (and ground) around one panel and its neighbours. */
  private static void paintFrameNear(GraphicsContext g, PlaneGeometry geo, PanelRef d) {
    PlaneGrid grid = geo.grid();
    int j0 = Math.max(0, d.bay() - 2);
    int j1 = Math.min(grid.bays(), d.bay() + 1);
    int i0 = Math.max(0, d.lift() - 2);
    int i1 = Math.min(grid.lifts(), d.lift() + 1);
    g.setLineDashes();
    g.setStroke(FRAME);
    g.setLineWidth(2);
    g.setFill(FRAME);
    for (int j = j0; j <= j1; j++) {
      bar(g, geo.lineX(j), geo.levelY(i1), geo.lineX(j), geo.levelY(i0), 2);
    }
    for (int i = i0; i <= i1; i++) {
      bar(g, geo.lineX(j0), geo.levelY(i), geo.lineX(j1), geo.levelY(i), 2);
    }
    if (i0 == 0 && grid.support() == org.bracewalk.core.model.Support.PINNED_BASE) {
      double bottom = geo.levelY(0);
      bar(g, geo.lineX(j0) - (j0 == 0 ? 6 : 0), bottom, geo.lineX(j1) + (j1 == grid.bays() ? 6 : 0), bottom, 3);
      g.setLineWidth(1);
      double start = geo.lineX(0) - 4;
      double from = geo.lineX(j0) - 8;
      double x = start + Math.max(0, Math.ceil((from - start) / 8)) * 8;
      for (; x < geo.lineX(j1) + 8 && x < geo.lineX(grid.bays()) + 6; x += 8) {
        g.strokeLine(x, bottom + 1, x - 5, bottom + 7);
      }
    }
  }

  /**
   * An upright or level line of {@code width} from (x0, y0) to (x1, y1), as a stroke with flat
   * ends would cover it, filled in the current fill.
   */
  private static void bar(GraphicsContext g, double x0, double y0, double x1, double y1, double width) {
    double half = width / 2;
    if (x0 == x1) {
      g.fillRect(x0 - half, Math.min(y0, y1), width, Math.abs(y1 - y0));
    } else {
      g.fillRect(Math.min(x0, x1), y0 - half, Math.abs(x1 - x0), width);
    }
  }

  private static double smallestPanel(PlaneGeometry geo) {
    double s = Double.MAX_VALUE;
    PlaneGrid grid = geo.grid();
    for (int j = 1; j <= grid.bays(); j++) {
      s = Math.min(s, geo.lineX(j) - geo.lineX(j - 1));
    }
    for (int i = 1; i <= grid.lifts(); i++) {
      s = Math.min(s, geo.levelY(i - 1) - geo.levelY(i));
    }
    return s;
  }

  private static final Map<PanelLook, Color> LOOK_COLOURS = new EnumMap<>(PanelLook.class);

  static {
    for (PanelLook look : PanelLook.values()) {
      LOOK_COLOURS.put(look, Color.web(look.colour()));
    }
  }

  private static Color colour(PanelLook look) {
    return LOOK_COLOURS.get(look);
  }

  /**
   * Member lines gathered by line style (look and member kind), then stroked as one path per
   * style. Each line is its own sub-path, so a dash pattern starts afresh on every member, as when
   * each is stroked alone. The broken styles are stroked first, so that a member found solid in a
   * panel whose design member is missing lies on top, as when the panel is drawn alone.
   */
  private static final class MemberLines {
    /** Stroke order: broken lines (not inspected, not reachable, missing, unusable), then solid. */
    private static final List<PanelLook> ORDER = List.of(PanelLook.NOT_RECORDED, PanelLook.NOT_REACHABLE,
        PanelLook.MISSING, PanelLook.DAMAGED_INEFFECTIVE, PanelLook.SOUND, PanelLook.DAMAGED_EFFECTIVE,
        PanelLook.EXTRA);

    private final java.util.Map<Integer, double[]> coords = new java.util.TreeMap<>();
    private final java.util.Map<Integer, Integer> counts = new java.util.HashMap<>();
    private final java.util.Map<Integer, Double> widths = new java.util.HashMap<>();

    void add(PanelLook look, boolean tension, double width, double[] segment) {
      int key = ORDER.indexOf(look) * 2 + (tension ? 1 : 0);
      int n = counts.getOrDefault(key, 0);
      double[] xs = coords.get(key);
      if (xs == null || xs.length < (n + 1) * 4) {
        xs = java.util.Arrays.copyOf(xs == null ? new double[0] : xs, Math.max(64, (n + 1) * 8));
        coords.put(key, xs);
      }
      System.arraycopy(segment, 0, xs, n * 4, 4);
      counts.put(key, n + 1);
      widths.put(key, width);
    }

    void stroke(GraphicsContext g) {
      for (var e : coords.entrySet()) {
        int key = e.getKey();
        PanelLook look = ORDER.get(key / 2);
        double[] xs = e.getValue();
        g.setStroke(colour(look));
        g.setLineWidth(widths.get(key));
        double[] dashes = look.dashes();
        if (dashes == null) {
          g.setLineDashes();
        } else {
          g.setLineDashes(dashes);
        }
        g.beginPath();
        for (int k = 0, n = counts.get(key); k < n; k++) {
          g.moveTo(xs[4 * k], xs[4 * k + 1]);
          g.lineTo(xs[4 * k + 2], xs[4 * k + 3]);
        }
        g.stroke();
        g.setLineDashes();
      }
      coords.clear();
      counts.clear();
      widths.clear();
    }
  }

  private static void paintFrame(GraphicsContext g, PlaneGeometry geo) {
    PlaneGrid grid = geo.grid();
    g.setLineDashes();
    g.setStroke(FRAME);
    g.setLineWidth(2);
    double top = geo.levelY(grid.lifts());
    double bottom = geo.levelY(0);
    // standards and ledgers as filled bars (a stroke is a shape for the software renderer's
    // antialiasing; an upright bar fills fast), the ground's ticks as one path
    g.setFill(FRAME);
    for (int j = 0; j <= grid.bays(); j++) {
      bar(g, geo.lineX(j), top, geo.lineX(j), bottom, 2);
    }
    for (int i = 0; i <= grid.lifts(); i++) {
      bar(g, geo.lineX(0), geo.levelY(i), geo.lineX(grid.bays()), geo.levelY(i), 2);
    }
    if (grid.support() == org.bracewalk.core.model.Support.PINNED_BASE) {
      // ground: a heavy base line with short ticks below it
      bar(g, geo.lineX(0) - 6, bottom, geo.lineX(grid.bays()) + 6, bottom, 3);
      g.setLineWidth(1);
      g.beginPath();
      for (double x = geo.lineX(0) - 4; x < geo.lineX(grid.bays()) + 6; x += 8) {
        g.moveTo(x, bottom + 1);
        g.lineTo(x - 5, bottom + 7);
      }
      g.stroke();
    }
  }

  /**
   * Frame members drawn in a style of their own (recorded, or left out by the design): each plain
   * bar is wiped between its joints and the member drawn again in its {@link FrameLook}. Members
   * drawn plain are left as {@link #paintFrame} drew them, so a plane with none costs nothing more.
   */
  private static void frameMembers(GraphicsContext g, PlaneGeometry geo, PlanePicture pic) {
    java.util.Set<FrameRef> styled = new java.util.TreeSet<>(pic.design().omittedFrame());
    if (pic.showFindings()) {
      styled.addAll(pic.frameFindings().keySet());
    }
    for (FrameRef f : styled) {
      FrameLook look = pic.frameLook(f);
      if (!look.plain()) {
        frameMember(g, geo.frame(f), look);
      }
    }
  }

  /** One frame member, segment {@code s} from joint to joint, in the style of {@code look}. */
  static void frameMember(GraphicsContext g, double[] s, FrameLook look) {
    boolean upright = s[0] == s[2];
    // wipe the plain bar between the joints (the joints' own bars stay)
    g.setFill(PAPER);
    if (upright) {
      g.fillRect(s[0] - 1, Math.min(s[1], s[3]) + 1, 2, Math.abs(s[3] - s[1]) - 2);
    } else {
      g.fillRect(Math.min(s[0], s[2]) + 1, s[1] - 1, Math.abs(s[2] - s[0]) - 2, 2);
    }
    Color c = Color.web(look.colour());
    double len = Math.hypot(s[2] - s[0], s[3] - s[1]);
    if (len < 2) {
      return;
    }
    double ux = (s[2] - s[0]) / len;
    double uy = (s[3] - s[1]) / len;
    // the line stops short of the joints, so a broken style reads as this member's alone
    double gap = Math.min(3, len * 0.1);
    double[] line = {s[0] + ux * gap, s[1] + uy * gap, s[2] - ux * gap, s[3] - uy * gap};
    g.setStroke(c);
    g.setLineWidth(look.width());
    double[] dashes = look.dashes();
    if (dashes == null) {
      g.setLineDashes();
    } else {
      g.setLineDashes(dashes);
    }
    if (look.doubled()) {
      for (double[] d : doubled(new double[][] {line})) {
        g.strokeLine(d[0], d[1], d[2], d[3]);
      }
    } else {
      g.strokeLine(line[0], line[1], line[2], line[3]);
    }
    g.setLineDashes();
    double mx = (s[0] + s[2]) / 2;
    double my = (s[1] + s[3]) / 2;
    double nx = -uy;
    double ny = ux;
    if (look.ticked()) {
      // two strokes across, longer than a brace's: the bar is thick
      g.setStroke(c);
      g.setLineWidth(2.5);
      for (double t : new double[] {0.4, 0.6}) {
        double px = s[0] + (s[2] - s[0]) * t;
        double py = s[1] + (s[3] - s[1]) * t;
        g.strokeLine(px - nx * 9, py - ny * 9, px + nx * 9, py + ny * 9);
      }
    }
    if (look.badge() != null && len >= 20) {
      // the state's letter, as on a brace and in the PDF (beside the damage ticks)
      double size = Math.min(15, len * 0.3);
      double off = look.ticked() ? size * 0.9 + 6 : 0;
      stateMark(g, mx - size / 2 + ux * off, my - size / 2 + uy * off, size, look.symbol(), c,
          look == FrameLook.MISSING || look == FrameLook.DAMAGED_INEFFECTIVE);
    }
    if (look.endTicks()) {
      double t = Math.min(8, len * 0.2);
      g.setStroke(c);
      g.setLineWidth(2.2);
      for (double k : new double[] {gap + 1, len - gap - 1}) {
        double px = s[0] + ux * k;
        double py = s[1] + uy * k;
        g.strokeLine(px - nx * t, py - ny * t, px + nx * t, py + ny * t);
      }
    }
  }

  /**
   * The joints of the freedoms that are marked where they are: a joint with nothing holding it
   * sideways (a ring with a two-headed arrow across the line running through it) and a loose end
   * (a filled triangle).
   */
  private static void joints(GraphicsContext g, PlaneGeometry geo, PlanePicture pic) {
    for (Freedom f : pic.freedoms()) {
      if (f.kind() == FreedomKind.SWAY) {
        continue;
      }
      for (Joint j : f.joints()) {
        if (j.level() > geo.grid().lifts() || j.line() > geo.grid().bays()) {
          continue;
        }
        double x = geo.lineX(j.line());
        double y = geo.levelY(j.level());
        if (f.kind() == FreedomKind.LOST_RESTRAINT) {
          lostRestraint(g, x, y, arrowAcross(f));
        } else {
          looseEnd(g, x, y);
        }
      }
    }
  }

  /** Which way the arrow of a lost restraint points: 'h' across standards, 'v' across ledgers. */
  private static char arrowAcross(Freedom f) {
    boolean standards = !f.members().isEmpty() && f.members().stream().noneMatch(FrameRef::isLedger);
    boolean ledgers = !f.members().isEmpty() && f.members().stream().allMatch(FrameRef::isLedger);
    return standards ? 'h' : ledgers ? 'v' : ' ';
  }

  /** A white ring with a heavy outline and, across it, a two-headed arrow: free to move sideways. */
  static void lostRestraint(GraphicsContext g, double x, double y, char across) {
    double r = 7;
    g.setLineDashes();
    g.setFill(Color.WHITE);
    g.fillOval(x - r, y - r, 2 * r, 2 * r);
    g.setStroke(Color.BLACK);
    g.setLineWidth(2.4);
    g.strokeOval(x - r, y - r, 2 * r, 2 * r);
    if (across == ' ') {
      g.setFill(Color.BLACK);
      g.fillOval(x - 2, y - 2, 4, 4);
      return;
    }
    double a = 15;
    double dx = across == 'h' ? 1 : 0;
    double dy = across == 'h' ? 0 : 1;
    g.setLineWidth(2);
    g.strokeLine(x - dx * a, y - dy * a, x + dx * a, y + dy * a);
    g.setFill(Color.BLACK);
    for (int sign : new int[] {-1, 1}) {
      double tx = x + sign * dx * a;
      double ty = y + sign * dy * a;
      double bx = tx - sign * dx * 5;
      double by = ty - sign * dy * 5;
      g.fillPolygon(new double[] {tx, bx - dy * 4, bx + dy * 4}, new double[] {ty, by - dx * 4, by + dx * 4}, 3);
    }
  }

  /** {@link Symbol#LOOSE_END}: a filled dot outlined in white, a member end held by nothing else. */
  static void looseEnd(GraphicsContext g, double x, double y) {
    double r = 6.5;
    g.setLineDashes();
    g.setFill(Color.BLACK);
    g.fillOval(x - r, y - r, 2 * r, 2 * r);
    g.setStroke(Color.WHITE);
    g.setLineWidth(1.4);
    g.strokeOval(x - r, y - r, 2 * r, 2 * r);
  }

  /**
   * Shades the shearing panels: a tint and thin, steep hatch lines (read as shading, never as a
   * brace). Drawn per run of neighbouring panels in a lift, each line clipped by arithmetic: a clip
   * per panel is very slow in the software renderer.
   */
  private static void hatchAll(GraphicsContext g, PlaneGeometry geo, SwayRegion sway) {
    if (sway.isEmpty()) {
      return;
    }
    PlaneGrid grid = geo.grid();
    boolean[][] on = new boolean[grid.lifts() + 1][grid.bays() + 2];
    for (PanelRef p : sway.shearing()) {
      on[p.lift()][p.bay()] = true;
    }
    g.setLineDashes();
    for (int i = 1; i <= grid.lifts(); i++) {
      int j = 1;
      while (j <= grid.bays()) {
        if (!on[i][j]) {
          j++;
          continue;
        }
        int start = j;
        while (j <= grid.bays() && on[i][j]) {
          j++;
        }
        double x0 = geo.lineX(start - 1);
        double x1 = geo.lineX(j - 1);
        double yTop = geo.levelY(i);
        double yBottom = geo.levelY(i - 1);
        hatchRect(g, x0, yTop, x1 - x0, yBottom - yTop, geo.lineX(0));
      }
    }
  }

  private static void hatchRect(GraphicsContext g, double x0, double y0, double w, double h, double phaseX) {
    g.setFill(Color.web("#fde9c8"));
    g.fillRect(x0, y0, w, h);
    g.setStroke(SWAY);
    g.setLineWidth(1);
    double run = h * 0.5; // each line rises h while moving right by h/2
    g.beginPath();
    // lines start on a 7 px pitch counted from phaseX, so neighbouring runs line up
    double first = phaseX + Math.floor((x0 - run - phaseX) / 7) * 7 - x0;
    for (double t = first; t < w; t += 7) {
      // segment from (x0 + t, y0 + h) to (x0 + t + run, y0), cut to x0 .. x0 + w
      double sa = Math.max(0, (0 - t) / run);
      double sb = Math.min(1, (w - t) / run);
      if (sa >= sb) {
        continue;
      }
      g.moveTo(x0 + t + run * sa, y0 + h - h * sa);
      g.lineTo(x0 + t + run * sb, y0 + h - h * sb);
    }
    g.stroke();
  }

  /** Draws the member(s) of {@code b} in {@code p} in the style of {@code look}. */
  static void member(GraphicsContext g, PlaneGeometry geo, PanelRef p, Brace b, PanelLook look) {
    member(g, geo, p, b, look, Pass.ALL, null);
  }

  private static void member(GraphicsContext g, PlaneGeometry geo, PanelRef p, Brace b, PanelLook look,
      Pass pass, MemberLines lines) {
    double inset = Math.min(4, Math.min(geo.panelWidth(p), geo.panelHeight(p)) * 0.08);
    double[][] segs = look.doubled() ? doubled(geo.members(p, b.diagonal(), inset)) : geo.members(p, b.diagonal(), inset);
    Color c = colour(look);
    boolean tension = b.kind() == MemberKind.TENSION_ONLY;
    double width = tension ? Math.max(1.2, look.width() * 0.5) : look.width();
    for (double[] s : segs) {
      if (pass == Pass.LINES) {
        lines.add(look, tension, width, s);
        continue;
      }
      if (pass == Pass.ALL) {
        g.setStroke(c);
        g.setLineWidth(width);
        double[] dashes = look.dashes();
        if (dashes == null) {
          g.setLineDashes();
        } else {
          g.setLineDashes(dashes);
        }
        g.strokeLine(s[0], s[1], s[2], s[3]);
        g.setLineDashes();
      }
      if (tension) {
        // a rod: small rings at both ends
        g.setFill(PAPER);
        double r = 2.6;
        g.fillOval(s[0] - r, s[1] - r, 2 * r, 2 * r);
        g.fillOval(s[2] - r, s[3] - r, 2 * r, 2 * r);
        g.setStroke(c); // in the second pass of a full paint the stroke is still the last panel's
        g.setLineDashes();
        g.setLineWidth(1.3);
        g.strokeOval(s[0] - r, s[1] - r, 2 * r, 2 * r);
        g.strokeOval(s[2] - r, s[3] - r, 2 * r, 2 * r);
      }
      if (look.ticked()) {
        ticks(g, s, c);
      }
    }
  }

  /** Each segment as two parallel ones, 1.7 px either side of it. */
  private static double[][] doubled(double[][] segs) {
    double[][] out = new double[segs.length * 2][];
    for (int k = 0; k < segs.length; k++) {
      double[] s = segs[k];
      double len = Math.hypot(s[2] - s[0], s[3] - s[1]);
      double nx = len < 1e-9 ? 0 : -(s[3] - s[1]) / len * 1.7;
      double ny = len < 1e-9 ? 0 : (s[2] - s[0]) / len * 1.7;
      out[2 * k] = new double[] {s[0] + nx, s[1] + ny, s[2] + nx, s[3] + ny};
      out[2 * k + 1] = new double[] {s[0] - nx, s[1] - ny, s[2] - nx, s[3] - ny};
    }
    return out;
  }

  /** Two short strokes across the member: the mark of a dent or bend. */
  private static void ticks(GraphicsContext g, double[] s, Color c) {
    double dx = s[2] - s[0];
    double dy = s[3] - s[1];
    double len = Math.hypot(dx, dy);
    if (len < 1) {
      return;
    }
    double nx = -dy / len * 5;
    double ny = dx / len * 5;
    g.setStroke(c);
    g.setLineWidth(2);
    g.setLineDashes();
    for (double t : new double[] {0.42, 0.58}) {
      double mx = s[0] + dx * t;
      double my = s[1] + dy * t;
      g.strokeLine(mx - nx, my - ny, mx + nx, my + ny);
    }
  }

  private static void badge(GraphicsContext g, PlaneGeometry geo, PanelRef p, PanelLook look) {
    double size = Math.min(16, Math.min(geo.panelWidth(p), geo.panelHeight(p)) * 0.34);
    boolean alarm = look == PanelLook.MISSING || look == PanelLook.DAMAGED_INEFFECTIVE;
    stateMark(g, geo.left(p) + 3, geo.top(p) + 3, size, look.symbol(), colour(look), alarm);
  }

  /**
   * A state's mark in the square of side {@code size} with its top-left corner at (x, y): the
   * walk-round key's letter in a rounded box (an alarm state filled in its colour with the letter
   * in white), or for {@link Symbol#STATE_NOT_INSPECTED} a question mark in a dashed ring, so a
   * member nobody has looked at never looks like one that could not be reached ({@link
   * Symbol#STATE_NOT_REACHABLE}, the letter R).
   */
  static void stateMark(GraphicsContext g, double x, double y, double size, Symbol symbol,
      Color colour, boolean alarm) {
    String glyph = symbol.glyph();
    String letter = glyph.substring(1, glyph.length() - 1);
    g.setFill(alarm ? colour : Color.WHITE);
    g.setStroke(colour);
    g.setLineWidth(1);
    if (symbol == Symbol.STATE_NOT_INSPECTED) {
      double d = size * 1.16;
      double o = (d - size) / 2;
      g.fillOval(x - o, y - o, d, d);
      g.setLineDashes(Math.max(1.5, size * 0.16), Math.max(1.2, size * 0.12));
      g.strokeOval(x - o, y - o, d, d);
      g.setLineDashes();
    } else {
      g.setLineDashes();
      g.fillRoundRect(x, y, size, size, 4, 4);
      g.strokeRoundRect(x, y, size, size, 4, 4);
    }
    g.setFill(alarm ? Color.WHITE : colour);
    g.setFont(Font.font("DejaVu Sans", FontWeight.BOLD, size * 0.72));
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.CENTER);
    g.fillText(letter, x + size / 2, y + size / 2 + 0.5);
  }

  private static void opening(GraphicsContext g, PlaneGeometry geo, PanelRef p) {
    double w = geo.panelWidth(p);
    double h = geo.panelHeight(p);
    double x0 = geo.left(p) + w * 0.22;
    double x1 = geo.right(p) - w * 0.22;
    double yb = geo.bottom(p);
    double yt = geo.top(p) + h * 0.18;
    double r = (x1 - x0) / 2;
    g.setStroke(FRAME);
    g.setLineWidth(1.4);
    g.setLineDashes(4, 3);
    g.beginPath();
    g.moveTo(x0, yb);
    g.lineTo(x0, yt + r);
    g.arcTo(x0, yt, x0 + r, yt, r);
    g.arcTo(x1, yt, x1, yt + r, r);
    g.lineTo(x1, yb);
    g.stroke();
    g.setLineDashes();
  }

  private static void diamond(GraphicsContext g, PlaneGeometry geo, PanelRef p) {
    double cx = (geo.left(p) + geo.right(p)) / 2;
    double cy = (geo.top(p) + geo.bottom(p)) / 2;
    double r = Math.max(4, Math.min(8, Math.min(geo.panelWidth(p), geo.panelHeight(p)) * 0.14));
    diamond(g, cx, cy, r);
  }

  /** {@link Symbol#CRITICAL}: a black diamond outlined in white. */
  static void diamond(GraphicsContext g, double cx, double cy, double r) {
    double[] xs = {cx, cx + r, cx, cx - r};
    double[] ys = {cy - r, cy, cy + r, cy};
    g.setLineDashes();
    g.setFill(Color.BLACK);
    g.fillPolygon(xs, ys, 4);
    g.setStroke(Color.WHITE);
    g.setLineWidth(1.2);
    g.strokePolygon(xs, ys, 4);
  }

  private static void repair(GraphicsContext g, PlaneGeometry geo, RepairBrace r, int number, boolean label) {
    PanelRef p = r.panel();
    double[][] segs = geo.members(p, r.brace().diagonal(), Math.min(4, geo.panelWidth(p) * 0.08));
    g.setStroke(REPAIR);
    g.setLineWidth(3.5);
    g.setLineDashes(12, 4, 2, 4);
    for (double[] s : segs) {
      g.strokeLine(s[0], s[1], s[2], s[3]);
    }
    g.setLineDashes();
    if (!label) {
      return;
    }
    double cx = (geo.left(p) + geo.right(p)) / 2;
    double cy = (geo.top(p) + geo.bottom(p)) / 2;
    double rad = Math.max(6, Math.min(10, Math.min(geo.panelWidth(p), geo.panelHeight(p)) * 0.2));
    g.setFill(Color.WHITE);
    g.setStroke(REPAIR);
    g.setLineWidth(2);
    if (r.inDesign()) {
      g.fillOval(cx - rad, cy - rad, 2 * rad, 2 * rad);
      g.strokeOval(cx - rad, cy - rad, 2 * rad, 2 * rad);
    } else {
      g.fillRect(cx - rad, cy - rad, 2 * rad, 2 * rad);
      g.strokeRect(cx - rad, cy - rad, 2 * rad, 2 * rad);
    }
    g.setFill(REPAIR);
    g.setFont(Font.font("DejaVu Sans", FontWeight.BOLD, rad * 1.1));
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.CENTER);
    g.fillText(Integer.toString(number), cx, cy + 0.5);
  }

  private static void changed(GraphicsContext g, PlaneGeometry geo, PanelRef p) {
    g.setStroke(CHANGED);
    g.setLineWidth(3);
    g.setLineDashes(5, 3);
    g.strokeRect(geo.left(p) + 2.5, geo.top(p) + 2.5, geo.panelWidth(p) - 5, geo.panelHeight(p) - 5);
    g.setLineDashes();
    double s = Math.min(10, geo.panelWidth(p) * 0.25);
    double x = geo.right(p) - 4 - s;
    double y = geo.top(p) + 4;
    star(g, x + s / 2, y + s / 2, s / 2 + 1);
  }

  /** {@link Symbol#CHANGED}: a six-spoked star (three crossing strokes). */
  static void star(GraphicsContext g, double cx, double cy, double r) {
    g.setLineDashes();
    g.setStroke(CHANGED);
    g.setLineWidth(2.2);
    for (int k = 0; k < 3; k++) {
      double a = Math.PI / 2 + k * Math.PI / 3;
      g.strokeLine(cx - r * Math.cos(a), cy - r * Math.sin(a), cx + r * Math.cos(a), cy + r * Math.sin(a));
    }
  }

  private static void labels(GraphicsContext g, PlaneGeometry geo, SwayRegion sway, double w, double h) {
    PlaneGrid grid = geo.grid();
    // a plane scrolled past the box's edge keeps its numbers in sight, on a strip of paper
    double labelX = geo.lineX(0);
    if (labelX < LEFT_MARGIN) {
      labelX = LEFT_MARGIN;
      g.setFill(PAPER);
      g.fillRect(0, 0, LEFT_MARGIN - 2, h);
    }
    double labelY = geo.levelY(0);
    if (labelY > h - MARGIN) {
      labelY = h - MARGIN;
      g.setFill(PAPER);
      g.fillRect(0, labelY + 4, w, MARGIN);
    }
    g.setFill(Color.web("#333333"));
    g.setFont(Font.font("DejaVu Sans", 12));
    g.setTextBaseline(VPos.CENTER);
    g.setTextAlign(TextAlignment.RIGHT);
    int liftStep = step(grid.lifts(), geo.planeHeight(), 16);
    for (int i = 1; i <= grid.lifts(); i++) {
      boolean shearing = false;
      for (PanelRef p : sway.shearing()) {
        if (p.lift() == i) {
          shearing = true;
          break;
        }
      }
      if (i % liftStep != 0 && i != 1 && !shearing) {
        continue;
      }
      double y = (geo.levelY(i) + geo.levelY(i - 1)) / 2;
      g.setFont(Font.font("DejaVu Sans", shearing ? FontWeight.BOLD : FontWeight.NORMAL, 12));
      g.setFill(shearing ? SWAY.darker() : Color.web("#333333"));
      if (y < 0 || y > labelY) {
        continue;
      }
      g.fillText((shearing ? "\u2194 " : "") + "L" + i, labelX - 6, y);
    }
    g.setFill(Color.web("#333333"));
    g.setFont(Font.font("DejaVu Sans", 12));
    g.setTextAlign(TextAlignment.CENTER);
    g.setTextBaseline(VPos.TOP);
    int bayStep = step(grid.bays(), geo.planeWidth(), 26);
    for (int j = 1; j <= grid.bays(); j++) {
      if (j % bayStep != 0 && j != 1) {
        continue;
      }
      double x = (geo.lineX(j) + geo.lineX(j - 1)) / 2;
      if (x < labelX || x > w) {
        continue;
      }
      g.fillText(Integer.toString(j), x, labelY + 9);
    }
  }

  private static int step(int count, double span, double minPx) {
    double per = span / count;
    int s = 1;
    while (per * s < minPx) {
      s = s == 1 ? 2 : s == 2 ? 5 : s * 2;
    }
    return s;
  }

  /**
   * The current panel: a double frame just inside its edges (so its ledgers and standards stay in
   * sight) with corner brackets outside. With a side selected the frame is thin and dashed, and the
   * side is boxed and pointed at from inside the panel by two solid triangles.
   */
  private static void cursor(GraphicsContext g, PlaneGeometry geo, PanelRef p, FrameRef selected) {
    double x = geo.left(p);
    double y = geo.top(p);
    double w = geo.panelWidth(p);
    double h = geo.panelHeight(p);
    double in = Math.min(6, Math.min(w, h) * 0.12);
    g.setLineDashes();
    if (selected == null) {
      g.setStroke(Color.WHITE);
      g.setLineWidth(5);
      g.strokeRect(x + in, y + in, w - 2 * in, h - 2 * in);
      g.setStroke(CURSOR);
      g.setLineWidth(2.5);
      g.strokeRect(x + in, y + in, w - 2 * in, h - 2 * in);
    } else {
      g.setStroke(CURSOR);
      g.setLineWidth(1.2);
      g.setLineDashes(3, 3);
      g.strokeRect(x + in, y + in, w - 2 * in, h - 2 * in);
      g.setLineDashes();
    }
    g.setStroke(CURSOR);
    double c = Math.min(12, Math.min(w, h) * 0.4);
    g.setLineWidth(4);
    double x0 = x - 3;
    double y0 = y - 3;
    double x1 = x + w + 3;
    double y1 = y + h + 3;
    g.strokeLine(x0, y0, x0 + c, y0);
    g.strokeLine(x0, y0, x0, y0 + c);
    g.strokeLine(x1, y0, x1 - c, y0);
    g.strokeLine(x1, y0, x1, y0 + c);
    g.strokeLine(x0, y1, x0 + c, y1);
    g.strokeLine(x0, y1, x0, y1 - c);
    g.strokeLine(x1, y1, x1 - c, y1);
    g.strokeLine(x1, y1, x1, y1 - c);
    if (selected != null && selected.within(geo.grid())) {
      selectedSide(g, geo, p, selected);
    }
  }

  /** A box around the selected side and two triangles pointing at it from inside the panel. */
  private static void selectedSide(GraphicsContext g, PlaneGeometry geo, PanelRef p, FrameRef f) {
    double[] s = geo.frame(f);
    double box = 7;
    double bx = Math.min(s[0], s[2]) - box;
    double by = Math.min(s[1], s[3]) - box;
    double bw = Math.abs(s[2] - s[0]) + 2 * box;
    double bh = Math.abs(s[3] - s[1]) + 2 * box;
    g.setLineDashes();
    g.setStroke(Color.WHITE);
    g.setLineWidth(5);
    g.strokeRect(bx, by, bw, bh);
    g.setStroke(CURSOR);
    g.setLineWidth(2.5);
    g.strokeRect(bx, by, bw, bh);
    // triangles inside the panel, pointing at the side
    double cx = (geo.left(p) + geo.right(p)) / 2;
    double cy = (geo.top(p) + geo.bottom(p)) / 2;
    double mx = (s[0] + s[2]) / 2;
    double my = (s[1] + s[3]) / 2;
    double dx = Math.signum(mx - cx);
    double dy = Math.signum(my - cy);
    double along = f.isLedger() ? (s[2] - s[0]) * 0.25 : (s[1] - s[3]) * 0.25;
    double size = Math.max(5, Math.min(9, Math.min(geo.panelWidth(p), geo.panelHeight(p)) * 0.12));
    g.setFill(CURSOR);
    for (int k : new int[] {-1, 1}) {
      double tx = f.isLedger() ? mx + k * along : mx - dx * (box + 2);
      double ty = f.isLedger() ? my - dy * (box + 2) : my + k * along;
      // the tip at (tx, ty), the base further into the panel
      double bxx = tx - dx * size * 1.3;
      double byy = ty - dy * size * 1.3;
      if (f.isLedger()) {
        g.fillPolygon(new double[] {tx, bxx - size, bxx + size}, new double[] {ty, byy, byy}, 3);
      } else {
        g.fillPolygon(new double[] {tx, bxx, bxx}, new double[] {ty, byy - size, byy + size}, 3);
      }
    }
  }
}
