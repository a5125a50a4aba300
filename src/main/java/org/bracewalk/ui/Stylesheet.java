package org.bracewalk.ui;

import javafx.scene.Parent;
import javafx.scene.Scene;

/**
 * The one stylesheet every window uses. It holds two looks: the usual one, and the daylight look
 * (high contrast for bright sun), which is the usual one with the style class {@value #DAYLIGHT}
 * on the window's root.
 */
public final class Stylesheet {
  /** The style class of a root shown in the daylight look. */
  public static final String DAYLIGHT = "daylight";

  private Stylesheet() {}

  public static void apply(Scene scene) {
    var url = Stylesheet.class.getResource("bracewalk.css");
    if (url == null) {
      throw new IllegalStateException("bracewalk.css is missing from the program's resources");
    }
    scene.getStylesheets().add(url.toExternalForm());
  }

  /** Shows {@code root} and everything in it in the daylight look, or in the usual look. */
  public static void daylight(Parent root, boolean on) {
    root.getStyleClass().remove(DAYLIGHT);
    if (on) {
      root.getStyleClass().add(DAYLIGHT);
    }
  }
}
