package org.bracewalk.bench;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Parent;
import javafx.scene.Scene;
import javafx.scene.image.WritableImage;
import javax.imageio.ImageIO;
import org.bracewalk.app.OutputFiles;
import org.bracewalk.ui.Stylesheet;

/** Renders a screen (a scene-graph root) to a PNG file. Call on the JavaFX thread. */
public final class ScreenPicture {
  private ScreenPicture() {}

  /**
   * Lays {@code root} out at {@code width} × {@code height}, renders it and writes {@code out}
   * through {@code outputs} (never over the database, through a link, or half-written).
   */
  public static void write(Parent root, double width, double height, Path out, OutputFiles outputs) {
    Scene scene = root.getScene();
    if (scene == null) {
      scene = new Scene(root, width, height);
      Stylesheet.apply(scene);
    }
    root.applyCss();
    root.layout();
    WritableImage img = scene.snapshot(null);
    BufferedImage bi = SwingFXUtils.fromFXImage(img, null);
    BufferedImage rgb = new BufferedImage(bi.getWidth(), bi.getHeight(), BufferedImage.TYPE_INT_RGB);
    rgb.getGraphics().drawImage(bi, 0, 0, null);
    outputs.write(out, stream -> {
      if (!ImageIO.write(rgb, "png", stream)) {
        throw new IOException("no PNG writer available");
      }
    });
  }
}
