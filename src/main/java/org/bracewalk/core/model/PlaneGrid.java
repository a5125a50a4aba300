package org.bracewalk.core.model;

import java.util.Collections;
import java.util.List;
import java.util.Objects;

/**
 * The grid of a brace plane: {@code lifts} rows (1 = bottom) and {@code bays} columns (1 = left),
 * each bay's width and each lift's height in metres (bottom lift first), and how it is supported.
 */
public record PlaneGrid(
    int lifts, int bays, List<Double> bayWidths, List<Double> liftHeights, Support support) {

  public PlaneGrid {
    if (lifts < 1 || bays < 1) {
      throw new IllegalArgumentException(
          "a plane needs at least one lift and one bay, got " + lifts + " x " + bays);
    }
    Objects.requireNonNull(support, "support");
    bayWidths = bayWidths == null ? Collections.nCopies(bays, 1.0) : List.copyOf(bayWidths);
    liftHeights = liftHeights == null ? Collections.nCopies(lifts, 1.0) : List.copyOf(liftHeights);
    if (bayWidths.size() != bays) {
      throw new IllegalArgumentException(
          "widths: " + bayWidths.size() + " values for " + bays + " bays");
    }
    if (liftHeights.size() != lifts) {
      throw new IllegalArgumentException(
          "heights: " + liftHeights.size() + " values for " + lifts + " lifts");
    }
    for (double w : bayWidths) {
      if (!(w > 0) || Double.isInfinite(w)) {
        throw new IllegalArgumentException("widths must be positive, got " + w);
      }
    }
    for (double h : liftHeights) {
      if (!(h > 0) || Double.isInfinite(h)) {
        throw new IllegalArgumentException("heights must be positive, got " + h);
      }
    }
  }

  /** A grid with unit widths and heights. */
  public static PlaneGrid uniform(int lifts, int bays, Support support) {
    return new PlaneGrid(lifts, bays, null, null, support);
  }

  public boolean contains(PanelRef p) {
    return p.lift() <= lifts && p.bay() <= bays;
  }

  public int panelCount() {
    return lifts * bays;
  }

  /** Throws when the panel lies outside this grid, naming it. */
  public void requireContains(PanelRef p) {
    if (!contains(p)) {
      throw new IllegalArgumentException(
          "panel " + p + " lies outside the " + lifts + " x " + bays + " plane");
    }
  }
}
