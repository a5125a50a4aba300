package org.bracewalk.ui.common;

import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.scene.canvas.Canvas;
import javafx.scene.layout.Region;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;

/**
 * A resizable drawing of a plane. Redraws whenever its picture or size changes; a click or tap on a
 * panel is passed to {@link #setOnPanelPicked}, one within {@link #FRAME_REACH} pixels of a ledger or
 * standard to {@link #setOnFramePicked} when a screen has set it. Takes keyboard focus, so a screen
 * can route keys to it.
 */
public final class PlaneCanvas extends Region {
  private final Canvas canvas = new Canvas();
  private final ObjectProperty<PlanePicture> picture = new SimpleObjectProperty<>(this, "picture");
  /** How near a ledger or standard line a click picks the member rather than the panel, in pixels. */
  public static final double FRAME_REACH = 6;

  private Consumer<PanelRef> onPanelPicked = p -> {};
  private Consumer<FrameRef> onFramePicked;
  private PlaneGeometry geometry;
  private PlanePicture painted;
  private long lastPaintNanos;
  private boolean lastPaintPartial;

  public PlaneCanvas() {
    getChildren().add(canvas);
    getStyleClass().add("plane-canvas");
    setFocusTraversable(true);
    setMinSize(200, 120);
    setPrefSize(900, 520);
    picture.addListener((obs, a, b) -> redraw());
    canvas.setOnMouseClicked(
        e -> {
          requestFocus();
          if (geometry != null) {
            FrameRef f = onFramePicked == null ? null : geometry.frameAt(e.getX(), e.getY(), FRAME_REACH);
            if (f != null) {
              onFramePicked.accept(f);
              return;
            }
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

  /** Clicks near a ledger or standard go here ({@code null}: every click picks a panel). */
  public void setOnFramePicked(Consumer<FrameRef> handler) {
    onFramePicked = handler;
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
      painted = null;
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
      painted = null;
      return;
    }
    java.util.Set<PanelRef> dirty = painted == null ? null : dirtyPanels(painted, pic);
    if (dirty != null && geometry != null) {
      PlanePainter.repaint(g, pic, geometry, dirty);
      lastPaintPartial = true;
    } else {
      geometry = PlanePainter.paint(g, pic, w, h);
      lastPaintPartial = false;
    }
    painted = pic;
    lastPaintNanos = System.nanoTime() - t0;
  }

  /** Whether the last redraw repainted only the panels that changed. */
  public boolean lastPaintPartial() {
    return lastPaintPartial;
  }

  /**
   * The panels to repaint when only findings or the cursor changed since {@code before}; {@code
   * null} when anything else changed (blocks, critical braces, repair, design), which needs a full
   * redraw.
   */
  static java.util.Set<PanelRef> dirtyPanels(PlanePicture before, PlanePicture after) {
    if (before.design() != after.design() && !before.design().equals(after.design())
        || before.showFindings() != after.showFindings()
        || !before.blocks().equals(after.blocks())
        || !before.critical().equals(after.critical())
        || !before.repair().equals(after.repair())
        || !before.changed().equals(after.changed())
        || !before.frameFindings().equals(after.frameFindings())
        || !before.freedoms().equals(after.freedoms())
        || !before.repairMembers().equals(after.repairMembers())
        || !before.changedMembers().equals(after.changedMembers())
        || !after.repairMembers().isEmpty()
        || !after.changedMembers().isEmpty()
        || before.selectedMember() != null
        || after.selectedMember() != null) {
      return null;
    }
    java.util.Set<PanelRef> dirty = new java.util.HashSet<>();
    if (!java.util.Objects.equals(before.cursor(), after.cursor())) {
      if (before.cursor() != null) {
        dirty.add(before.cursor());
      }
      if (after.cursor() != null) {
        dirty.add(after.cursor());
      }
    }
    if (before.findings() != after.findings()) {
      for (var e : after.findings().entrySet()) {
        if (!e.getValue().equals(before.findings().get(e.getKey()))) {
          dirty.add(e.getKey());
        }
      }
      for (PanelRef p : before.findings().keySet()) {
        if (!after.findings().containsKey(p)) {
          dirty.add(p);
        }
      }
    }
    if (dirty.size() > 24 || nearFrameDetail(after, dirty)) {
      return null;
    }
    return dirty;
  }

  /**
   * Whether a panel to repaint lies within two panels of a frame member drawn in a style of its
   * own or of a marked joint: the partial repaint redraws the plain frame there, so those need a
   * full redraw (they are few: most frame members are as designed).
   */
  private static boolean nearFrameDetail(PlanePicture pic, java.util.Set<PanelRef> dirty) {
    java.util.List<Joint> joints = new java.util.ArrayList<>();
    for (FrameRef f : pic.design().omittedFrame()) {
      joints.add(f.start());
    }
    for (FrameRef f : pic.frameFindings().keySet()) {
      joints.add(f.start());
    }
    for (var fr : pic.freedoms()) {
      joints.addAll(fr.joints());
    }
    for (Joint j : joints) {
      for (PanelRef p : dirty) {
        if (Math.abs(p.lift() - j.level()) <= 3 && Math.abs(p.bay() - j.line()) <= 3) {
          return true;
        }
      }
    }
    return false;
  }
}
