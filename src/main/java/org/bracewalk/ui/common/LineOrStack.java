package org.bracewalk.ui.common;

import javafx.geometry.HPos;
import javafx.geometry.Orientation;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.layout.Region;

/**
 * Two parts side by side while both fit at their preferred widths, the second below the first
 * (each the whole width) when they do not: a bar or a pair of boxes that keeps every word whole at
 * large text on a small window instead of squeezing both. Side by side, the extra width goes to
 * the parts in proportion to their preferred widths.
 */
public final class LineOrStack extends Region {
  private final Node first;
  private final Node second;
  private final double gap;

  public LineOrStack(double gap, Node first, Node second) {
    this.gap = gap;
    this.first = first;
    this.second = second;
    getChildren().addAll(first, second);
    setMinHeight(USE_PREF_SIZE);
    // its height follows its width: a parent that asked at no width asks again
    widthProperty().addListener((o, was, now) -> requestLayout());
  }

  @Override
  public Orientation getContentBias() {
    return Orientation.HORIZONTAL;
  }

  /** Whether both parts fit side by side in {@code width} (content width). */
  public boolean sideBySide(double width) {
    return width < 0 || first.prefWidth(-1) + gap + second.prefWidth(-1) <= width;
  }

  private double[] widths(double width) {
    double a = first.prefWidth(-1);
    double b = second.prefWidth(-1);
    double extra = Math.max(0, width - gap - a - b);
    double share = a + b <= 0 ? 0.5 : a / (a + b);
    return new double[] {a + extra * share, b + extra * (1 - share)};
  }

  @Override
  protected double computePrefWidth(double height) {
    return snappedLeftInset() + first.prefWidth(-1) + gap + second.prefWidth(-1) + snappedRightInset();
  }

  @Override
  protected double computeMinWidth(double height) {
    return snappedLeftInset() + Math.max(first.minWidth(-1), second.minWidth(-1)) + snappedRightInset();
  }

  /**
   * A parent that does not ask by width (a stack pane, a border pane's min height) gets the height
   * at the width this has now, once laid out: the height one line or two stacked parts need.
   */
  @Override
  protected double computePrefHeight(double width) {
    if (width < 0 && getWidth() > 0) {
      width = getWidth();
    }
    double inner = width < 0 ? -1 : width - snappedLeftInset() - snappedRightInset();
    double h;
    if (sideBySide(inner)) {
      double[] w = inner < 0 ? new double[] {-1, -1} : widths(inner);
      h = Math.max(first.prefHeight(w[0]), second.prefHeight(w[1]));
    } else {
      h = first.prefHeight(inner) + gap + second.prefHeight(inner);
    }
    return snappedTopInset() + h + snappedBottomInset();
  }

  @Override
  protected void layoutChildren() {
    double x = snappedLeftInset();
    double y = snappedTopInset();
    double inner = getWidth() - x - snappedRightInset();
    double height = getHeight() - y - snappedBottomInset();
    if (sideBySide(inner)) {
      double[] w = widths(inner);
      layoutInArea(first, x, y, w[0], height, 0, HPos.LEFT, VPos.CENTER);
      layoutInArea(second, x + w[0] + gap, y, w[1], height, 0, HPos.RIGHT, VPos.CENTER);
    } else {
      double a = first.prefHeight(inner);
      layoutInArea(first, x, y, inner, a, 0, HPos.LEFT, VPos.CENTER);
      layoutInArea(second, x, y + a + gap, inner, Math.max(0, height - a - gap), 0, HPos.LEFT, VPos.TOP);
    }
  }
}
