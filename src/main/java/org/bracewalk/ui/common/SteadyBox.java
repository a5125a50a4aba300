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
  /**
   * One height, remembered for two widths: a scroll pane asks at its width with and without room
   * for its scroll bar.
   */
  private static final class Memo {
    private final double[] widths = {Double.NaN, Double.NaN};
    private final double[] heights = new double[2];
    private int next;

    double get(double width, java.util.function.DoubleUnaryOperator compute) {
      for (int k = 0; k < 2; k++) {
        if (widths[k] == width) {
          return heights[k];
        }
      }
      double h = compute.applyAsDouble(width);
      widths[next] = width;
      heights[next] = h;
      next = 1 - next;
      return h;
    }

    void forget() {
      java.util.Arrays.fill(widths, Double.NaN);
    }
  }

  private final Memo pref = new Memo();
  private final Memo min = new Memo();

  public SteadyBox(double spacing, Node... children) {
    super(spacing, children);
  }

  @Override
  public void requestLayout() {
    if (pref != null) { // null while VBox's constructor sets the spacing
      pref.forget();
      min.forget();
    }
    super.requestLayout();
  }

  @Override
  protected double computePrefHeight(double width) {
    return pref.get(width, super::computePrefHeight);
  }

  @Override
  protected double computeMinHeight(double width) {
    return min.get(width, super::computeMinHeight);
  }
}
