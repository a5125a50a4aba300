package org.bracewalk.ui.common;

import java.util.List;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Where a plane's panels sit on screen, drawn to scale in a box of a given size. Model coordinates
 * have y up (lift 1 at the bottom); screen coordinates have y down. Every conversion between the
 * two happens here, so a rising ({@code /}) brace is drawn from the bottom-left corner of its panel
 * to the top-right one, as seen on screen.
 *
 * <p>Pure arithmetic with no toolkit type, so it is tested as plain JUnit.
 */
public final class PlaneGeometry {
  private final PlaneGrid grid;
  private final double scale;
  private final double originX;
  private final double baseY;
  private final double[] lineX;
  private final double[] levelY;

  /**
   * Fits {@code grid} into a box {@code width} × {@code height} pixels with {@code margin} pixels
   * on every side (the left margin is {@code leftMargin}, room for the lift labels), keeping the
   * real proportions of bays and lifts.
   */
  public PlaneGeometry(PlaneGrid grid, double width, double height, double leftMargin, double margin) {
    this(grid, width, height, leftMargin, margin, 0, 0, 0);
  }

  /**
   * Fits {@code grid} into the box as above, but never draws a panel smaller than {@code minPanel}
   * pixels either way: where the box is too small for that, the plane is drawn larger than the box
   * and shifted by ({@code scrollX}, {@code scrollY}) pixels, the part in view of a larger drawing
   * (see {@link #content}). Along an axis where the drawing fits, it is centred and the scroll is
   * ignored.
   */
  public PlaneGeometry(PlaneGrid grid, double width, double height, double leftMargin, double margin,
      double minPanel, double scrollX, double scrollY) {
    this(grid, width, height, height, leftMargin, margin, minPanel, scrollX, scrollY);
  }

  /**
   * As above, with the scale fitted to a box {@code fitHeight} high rather than {@code height}
   * (taller: the drawing keeps the size it had before something took room above it).
   */
  public PlaneGeometry(PlaneGrid grid, double width, double height, double fitHeight, double leftMargin,
      double margin, double minPanel, double scrollX, double scrollY) {
    this.grid = grid;
    double totalW = sum(grid.bayWidths());
    double totalH = sum(grid.liftHeights());
    double availW = Math.max(1, width - leftMargin - margin);
    Content c = content(grid, width, height, fitHeight, leftMargin, margin, minPanel);
    this.scale = c.scale();
    // centred in the box where it fits (the spare room goes equally to both sides), else scrolled
    this.originX = c.width() <= width + 0.5
        ? leftMargin + (availW - totalW * scale) / 2
        : leftMargin - Math.max(0, Math.min(scrollX, c.width() - width));
    // laid out in a box fitHeight tall (the box the scale was fitted to), of which the view shows
    // height pixels from scrollY down: so the drawing stays where it was while a shorter box
    // cuts off its bottom (scrolled into view on demand)
    double boxH = Math.max(height, fitHeight);
    double drawnH = 2 * margin + totalH * scale;
    double top = drawnH <= boxH + 0.5 ? (boxH - drawnH) / 2 : 0;
    this.baseY = top + margin + totalH * scale
        - (c.height() <= height + 0.5 ? 0 : Math.max(0, Math.min(scrollY, c.height() - height)));
    this.lineX = new double[grid.bays() + 1];
    this.levelY = new double[grid.lifts() + 1];
    // grid lines on whole pixels: crisp lines that a partial repaint redraws exactly (the
    // rounding moves no line by more than half a pixel from its place to scale)
    double x = originX;
    lineX[0] = Math.round(x);
    for (int j = 1; j <= grid.bays(); j++) {
      x += grid.bayWidths().get(j - 1) * scale;
      lineX[j] = Math.round(x);
    }
    double y = baseY;
    levelY[0] = Math.round(y);
    for (int i = 1; i <= grid.lifts(); i++) {
      y -= grid.liftHeights().get(i - 1) * scale;
      levelY[i] = Math.round(y);
    }
  }

  /**
   * How large a plane is drawn: its scale (pixels per metre) and the size of the whole drawing,
   * margins included, which is larger than the box where a panel would otherwise be drawn smaller
   * than {@code minPanel} pixels.
   */
  public record Content(double scale, double width, double height) {}

  /** The drawing of {@code grid} in a box of {@code width} × {@code height} (see the constructor). */
  public static Content content(PlaneGrid grid, double width, double height, double leftMargin, double margin,
      double minPanel) {
    return content(grid, width, height, height, leftMargin, margin, minPanel);
  }

  /** As above, the scale fitted to a box {@code fitHeight} high (at least {@code height}). */
  public static Content content(PlaneGrid grid, double width, double height, double fitHeight,
      double leftMargin, double margin, double minPanel) {
    double totalW = sum(grid.bayWidths());
    double totalH = sum(grid.liftHeights());
    double availW = Math.max(1, width - leftMargin - margin);
    double availH = Math.max(1, Math.max(height, fitHeight) - 2 * margin);
    double fit = Math.min(availW / totalW, availH / totalH);
    double smallest = Double.MAX_VALUE;
    for (double b : grid.bayWidths()) {
      smallest = Math.min(smallest, b);
    }
    for (double l : grid.liftHeights()) {
      smallest = Math.min(smallest, l);
    }
    // one pixel more than asked: lines fall on whole pixels, which may take half a pixel off
    double scale = minPanel <= 0 ? fit : Math.max(fit, (minPanel + 1) / smallest);
    double boxH = Math.max(height, fitHeight);
    double drawnH = 2 * margin + totalH * scale;
    return new Content(scale, Math.max(width, leftMargin + totalW * scale + margin),
        Math.max(height, drawnH <= boxH + 0.5 ? (boxH + drawnH) / 2 : drawnH));
  }

  private static double sum(List<Double> xs) {
    double s = 0;
    for (double x : xs) {
      s += x;
    }
    return s;
  }

  public PlaneGrid grid() {
    return grid;
  }

  /** Pixels per metre. */
  public double scale() {
    return scale;
  }

  /** Screen x of vertical grid line {@code line} (0 = left edge). */
  public double lineX(int line) {
    return lineX[line];
  }

  /** Screen y of level {@code level} (0 = base); larger levels are higher, so smaller y. */
  public double levelY(int level) {
    return levelY[level];
  }

  public double left(PanelRef p) {
    return lineX[p.bay() - 1];
  }

  public double right(PanelRef p) {
    return lineX[p.bay()];
  }

  /** Screen y of the panel's top edge (the smaller y). */
  public double top(PanelRef p) {
    return levelY[p.lift()];
  }

  /** Screen y of the panel's bottom edge (the larger y). */
  public double bottom(PanelRef p) {
    return levelY[p.lift() - 1];
  }

  public double panelWidth(PanelRef p) {
    return right(p) - left(p);
  }

  public double panelHeight(PanelRef p) {
    return bottom(p) - top(p);
  }

  /** Width of the whole plane on screen. */
  public double planeWidth() {
    return lineX[grid.bays()] - lineX[0];
  }

  /** Height of the whole plane on screen. */
  public double planeHeight() {
    return levelY[0] - levelY[grid.lifts()];
  }

  /**
   * The screen segment {@code {x1, y1, x2, y2}} of one member of {@code p}, inset by {@code inset}
   * pixels from the corners. {@code rising} true gives the {@code /} member: it starts at the
   * bottom-left (larger y) and ends at the top-right (smaller y).
   */
  public double[] member(PanelRef p, boolean rising, double inset) {
    double x1 = left(p) + inset;
    double x2 = right(p) - inset;
    double yBottom = bottom(p) - inset;
    double yTop = top(p) + inset;
    return rising ? new double[] {x1, yBottom, x2, yTop} : new double[] {x1, yTop, x2, yBottom};
  }

  /** The segments of every member of a diagonal in {@code p}: one, or two for a cross. */
  public double[][] members(PanelRef p, Diagonal d, double inset) {
    if (d == Diagonal.BOTH) {
      return new double[][] {member(p, true, inset), member(p, false, inset)};
    }
    return new double[][] {member(p, d == Diagonal.RISING, inset)};
  }

  /** The panel under screen point ({@code x}, {@code y}), or {@code null} outside the plane. */
  public PanelRef panelAt(double x, double y) {
    if (x < lineX[0] || x >= lineX[grid.bays()] || y > levelY[0] || y <= levelY[grid.lifts()]) {
      return null;
    }
    int bay = 1;
    while (bay < grid.bays() && x >= lineX[bay]) {
      bay++;
    }
    int lift = 1;
    while (lift < grid.lifts() && y <= levelY[lift]) {
      lift++;
    }
    return new PanelRef(lift, bay);
  }

  /** The screen segment {@code {x1, y1, x2, y2}} of a frame member, from its start joint to its end. */
  public double[] frame(FrameRef f) {
    Joint a = f.start();
    Joint b = f.end();
    return new double[] {lineX[a.line()], levelY[a.level()], lineX[b.line()], levelY[b.level()]};
  }

  /**
   * The frame member whose line passes within {@code reach} pixels of screen point ({@code x},
   * {@code y}) between its joints, the nearest one; {@code null} when none is that close. A click
   * this near a ledger or standard picks the member, not the panel.
   */
  public FrameRef frameAt(double x, double y, double reach) {
    FrameRef best = null;
    double bestD = reach;
    for (int line = 0; line <= grid.bays(); line++) {
      double d = Math.abs(x - lineX[line]);
      if (d <= bestD) {
        for (int lift = 1; lift <= grid.lifts(); lift++) {
          if (y <= levelY[lift - 1] && y >= levelY[lift]) {
            best = FrameRef.standard(lift, line);
            bestD = d;
          }
        }
      }
    }
    for (int level = 0; level <= grid.lifts(); level++) {
      double d = Math.abs(y - levelY[level]);
      if (d < bestD) {
        for (int bay = 1; bay <= grid.bays(); bay++) {
          if (x >= lineX[bay - 1] && x <= lineX[bay]) {
            best = FrameRef.ledger(level, bay);
            bestD = d;
          }
        }
      }
    }
    return best;
  }
}
