package org.bracewalk.ui.common;

import javafx.geometry.HPos;
import javafx.geometry.Orientation;
import javafx.geometry.VPos;
import javafx.scene.Node;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.Skin;
import javafx.scene.control.skin.ChoiceBoxSkin;

/**
 * A choice box whose chosen line wraps onto more lines when the box is narrower than the line,
 * instead of ending in an ellipsis: the box is as tall as the wrapped line needs (JavaFX's own
 * skin asks its line's height at no width, so it stays one line high and cuts the words short).
 * The list that opens is JavaFX's, unchanged.
 */
public class WrappingChoiceBox<T> extends ChoiceBox<T> {
  public WrappingChoiceBox() {
    setMinHeight(USE_PREF_SIZE);
  }

  public WrappingChoiceBox(javafx.collections.ObservableList<T> items) {
    super(items);
    setMinHeight(USE_PREF_SIZE);
  }

  @Override
  protected Skin<?> createDefaultSkin() {
    return new WrappingSkin<>(this);
  }

  /** Its height depends on its width (the chosen line wraps). */
  @Override
  public Orientation getContentBias() {
    return Orientation.HORIZONTAL;
  }

  /** JavaFX's skin with the line wrapped beside the arrow, and the height it then needs. */
  static final class WrappingSkin<T> extends ChoiceBoxSkin<T> {
    WrappingSkin(ChoiceBox<T> box) {
      super(box);
      line().setWrapText(true);
    }

    /** The skin's children are its line (a label) and its open button, in that order. */
    private Label line() {
      return (Label) getChildren().get(0);
    }

    private Node button() {
      return getChildren().get(1);
    }

    @Override
    protected void layoutChildren(double x, double y, double w, double h) {
      double arrow = button().prefWidth(-1);
      line().resizeRelocate(x, y, Math.max(0, w - arrow), h);
      button().resize(arrow, button().prefHeight(-1));
      positionInArea(button(), x + w - arrow, y, arrow, h, 0, HPos.CENTER, VPos.CENTER);
    }

    @Override
    protected double computePrefHeight(double width, double top, double right, double bottom, double left) {
      if (width < 0 && getSkinnable().getWidth() > 0) {
        width = getSkinnable().getWidth(); // a parent that does not ask by width: as laid out now
      }
      double lineWidth = width < 0 ? -1 : Math.max(0, width - left - right - button().prefWidth(-1));
      return top + Math.max(line().prefHeight(lineWidth), button().prefHeight(-1)) + bottom;
    }

    @Override
    protected double computeMinHeight(double width, double top, double right, double bottom, double left) {
      return computePrefHeight(width, top, right, bottom, left);
    }

    @Override
    protected double computeMinWidth(double height, double top, double right, double bottom, double left) {
      // room for a word or two beside the arrow; the rest wraps
      return left + line().getFont().getSize() * 6 + button().minWidth(-1) + right;
    }

    @Override
    protected double computeMaxWidth(double height, double top, double right, double bottom, double left) {
      return Double.MAX_VALUE;
    }
  }
}
