package org.bracewalk.ui.common;

import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.scene.canvas.Canvas;
import javafx.scene.layout.Region;
import org.bracewalk.core.model.PanelRef;

/**
 * A resizable drawing of a plane. Redraws whenever its picture or size changes; a click or tap on a
 * panel is passed to {@link #setOnPanelPicked}. Takes keyboard focus, so a screen can route keys
 * to it.
 */
public final class PlaneCanvas extends Region {
  private final Canvas canvas = new Canvas();
  private final ObjectProperty<PlanePicture> picture = new SimpleObjectProperty<>(this, "picture");
  private Consumer<PanelRef> onPanelPicked = p -> {};
  private PlaneGeometry geometry;
  private long lastPaintNanos;

  public PlaneCanvas() {
    getChildren().add(canvas);
    getStyleClass().add("plane-canvas");
    setFocusTraversable(true);
    setMinSize(200, 160);
    setPrefSize(900, 520);
    picture.addListener((obs, a, b) -> redraw());
    canvas.setOnMouseClicked(
        e -> {
          requestFocus();
          if (geometry != null) {
            PanelRef p = geometry.panelAt(e.getX(), e.getY());
            if (p != null) {
              onPanelPicked.accept(p);
            }
          }
        });
  }

  public ObjectProperty<PlanePicture> pictureProperty() {
    return picture;
  }

  public void setOnPanelPicked(Consumer<PanelRef> handler) {
    onPanelPicked = handler == null ? p -> {} : handler;
  }

  /** The geometry of the last drawing, or {@code null} before the first. */
  public PlaneGeometry geometry() {
    return geometry;
  }

  /** How long the last redraw took to issue its drawing commands, in nanoseconds. */
  public long lastPaintNanos() {
    return lastPaintNanos;
  }

  @Override
  protected void layoutChildren() {
    double w = getWidth();
    double h = getHeight();
    if (canvas.getWidth() != w || canvas.getHeight() != h) {
      canvas.setWidth(w);
      canvas.setHeight(h);
      redraw();
    }
  }

  /** Draws the current picture now. */
  public void redraw() {
    long t0 = System.nanoTime();
    PlanePicture pic = picture.get();
    double w = canvas.getWidth();
    double h = canvas.getHeight();
    var g = canvas.getGraphicsContext2D();
    if (pic == null || w < 10 || h < 10) {
      g.clearRect(0, 0, w, h);
      geometry = null;
      return;
    }
    geometry = PlanePainter.paint(g, pic, w, h);
    lastPaintNanos = System.nanoTime() - t0;
  }
}
