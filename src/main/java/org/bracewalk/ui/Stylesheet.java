package org.bracewalk.ui;

import javafx.scene.Scene;

/** The one stylesheet every window uses. */
public final class Stylesheet {
  private Stylesheet() {}

  public static void apply(Scene scene) {
    var url = Stylesheet.class.getResource("bracewalk.css");
    if (url == null) {
      throw new IllegalStateException("bracewalk.css is missing from the program's resources");
    }
    scene.getStylesheets().add(url.toExternalForm());
  }
}
