package org.bracewalk.ui.common;

import javafx.scene.Node;
import javafx.scene.layout.VBox;

/**
 * A {@link VBox} that remembers its minimum and preferred height for a given width until
 * something inside it changes. A scroll pane that fits its content to its width asks for the
 * content's height at that width on every layout, and a box of wrapped labels works that out by
 * laying out every text again; when only the pane's own size changes (the verdict above it grew a
 * line), the remembered answer is the same and costs nothing.
 */
public class SteadyBox extends VBox {
  /** Two widths each: a scroll pane asks at its width with and without room for its scroll bar. */
  private final double[] prefFor = {Double.NaN, Double.NaN};
  private final double[] pref = new double[2];
  private final double[] minFor = {Double.NaN, Double.NaN};
  private final double[] min = new double[2];
  private int prefNext;
  private int minNext;

  public SteadyBox(double spacing, Node... children) {
    super(spacing, children);
  }

  @Override
  public void requestLayout() {
    if (prefFor != null) { // null while VBox's constructor sets the spacing
      java.util.Arrays.fill(prefFor, Double.NaN);
      java.util.Arrays.fill(minFor, Double.NaN);
    }
    super.requestLayout();
  }

  @Override
  protected double computePrefHeight(double width) {
    for (int k = 0; k < 2; k++) {
      if (prefFor[k] == width) {
        return pref[k];
      }
    }
    double h = super.computePrefHeight(width);
    prefFor[prefNext] = width;
    pref[prefNext] = h;
    prefNext = 1 - prefNext;
    return h;
  }

  @Override
  protected double computeMinHeight(double width) {
    for (int k = 0; k < 2; k++) {
      if (minFor[k] == width) {
        return min[k];
      }
    }
    double h = super.computeMinHeight(width);
    minFor[minNext] = width;
    min[minNext] = h;
    minNext = 1 - minNext;
    return h;
  }
}
