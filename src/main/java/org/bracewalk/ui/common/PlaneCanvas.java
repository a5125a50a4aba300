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
 *
 * <p>No panel is drawn smaller than {@link #MIN_PANEL} pixels either way (a target for a gloved
 * finger): where the box is too small for that, the plane is drawn larger and scrolls (scroll bars,
 * the mouse wheel or a swipe), and the view follows the cursor. The drawing's scale is the one
 * that fits the box, or that minimum.
 */
public final class PlaneCanvas extends Region {
  private final Canvas canvas = new Canvas();
  private final ObjectProperty<PlanePicture> picture = new SimpleObjectProperty<>(this, "picture");
  /** How near a ledger or standard line a click picks the member rather than the panel, in pixels. */
  public static final double FRAME_REACH = 6;
  /** The least width and height of a drawn panel, pixels (a touch target). */
  public static final double MIN_PANEL = 44;

  private final javafx.scene.control.ScrollBar hBar = new javafx.scene.control.ScrollBar();
  private final javafx.scene.control.ScrollBar vBar = new javafx.scene.control.ScrollBar();
  /** The part of a drawing larger than the box that is in view: its offset, pixels. */
  private double scrollX;
  private double scrollY;
  /** True while a click is handled: what was clicked is in view, so the view does not move. */
  private boolean clicking;

  private Consumer<PanelRef> onPanelPicked = p -> {};
  private Consumer<FrameRef> onFramePicked;
  private PlaneGeometry geometry;
  private PlanePicture painted;
  private long lastPaintNanos;
  private boolean lastPaintPartial;

  public PlaneCanvas() {
    getChildren().addAll(canvas, hBar, vBar);
    vBar.setOrientation(javafx.geometry.Orientation.VERTICAL);
    hBar.setVisible(false);
    vBar.setVisible(false);
    hBar.setFocusTraversable(false);
    vBar.setFocusTraversable(false);
    hBar.valueProperty().addListener((o, a, b) -> scrollTo(b.doubleValue(), scrollY));
    vBar.valueProperty().addListener((o, a, b) -> scrollTo(scrollX, b.doubleValue()));
    canvas.setOnScroll(e -> {
      if (hBar.isVisible()) {
        hBar.setValue(clamp(hBar.getValue() - e.getDeltaX(), hBar.getMax()));
      }
      if (vBar.isVisible()) {
        vBar.setValue(clamp(vBar.getValue() - e.getDeltaY(), vBar.getMax()));
      }
      e.consume();
    });
    getStyleClass().add("plane-canvas");
    setFocusTraversable(true);
    setMinSize(200, 120);
    setPrefSize(900, 520);
    picture.addListener((obs, a, b) -> {
      if (a == null || b == null || !a.grid().equals(b.grid())) {
        requestLayout(); // the scroll bars may come or go
      }
      redraw();
    });
    canvas.setOnMouseClicked(
        e -> {
          requestFocus();
          if (geometry != null) {
            clicking = true;
            try {
              picked(e.getX(), e.getY());
            } finally {
              clicking = false;
            }
          }
        });
  }

  /** A click or tap at (ex, ey): a frame member near it, else the panel under it. */
  private void picked(double ex, double ey) {
    FrameRef f = onFramePicked == null ? null : geometry.frameAt(ex, ey, FRAME_REACH);
    if (f != null) {
      onFramePicked.accept(f);
      return;
    }
    PanelRef p = geometry.panelAt(ex, ey);
    if (p != null) {
      onPanelPicked.accept(p);
    }
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
    PlanePicture pic = picture.get();
    boolean horizontal = false;
    boolean vertical = false;
    double bar = 16;
    if (pic != null) {
      // a scroll bar takes room from the other axis, which may call for the other bar too
      for (int k = 0; k < 2; k++) {
        PlaneGeometry.Content c = content(pic, w - (vertical ? bar : 0), h - (horizontal ? bar : 0));
        horizontal = c.width() > w - (vertical ? bar : 0) + 0.5;
        vertical = c.height() > h - (horizontal ? bar : 0) + 0.5;
      }
    }
    double cw = Math.max(0, w - (vertical ? bar : 0));
    double ch = Math.max(0, h - (horizontal ? bar : 0));
    hBar.setVisible(horizontal);
    vBar.setVisible(vertical);
    if (horizontal) {
      hBar.resizeRelocate(0, ch, cw, bar);
    }
    if (vertical) {
      vBar.resizeRelocate(cw, 0, bar, ch);
    }
    if (canvas.getWidth() != cw || canvas.getHeight() != ch) {
      canvas.setWidth(cw);
      canvas.setHeight(ch);
      painted = null;
      updateBars(pic);
      redraw();
    }
  }

  private PlaneGeometry.Content content(PlanePicture pic, double w, double h) {
    return PlaneGeometry.content(pic.grid(), w, h, PlanePainter.LEFT_MARGIN, PlanePainter.MARGIN, MIN_PANEL);
  }

  private void updateBars(PlanePicture pic) {
    if (pic == null) {
      return;
    }
    PlaneGeometry.Content c = content(pic, canvas.getWidth(), canvas.getHeight());
    double maxX = Math.max(0, c.width() - canvas.getWidth());
    double maxY = Math.max(0, c.height() - canvas.getHeight());
    scrollX = clamp(scrollX, maxX);
    scrollY = clamp(scrollY, maxY);
    hBar.setMax(maxX);
    hBar.setVisibleAmount(maxX <= 0 ? 1 : canvas.getWidth() * maxX / c.width());
    hBar.setUnitIncrement(MIN_PANEL);
    hBar.setBlockIncrement(canvas.getWidth() * 0.8);
    hBar.setValue(scrollX);
    vBar.setMax(maxY);
    vBar.setVisibleAmount(maxY <= 0 ? 1 : canvas.getHeight() * maxY / c.height());
    vBar.setUnitIncrement(MIN_PANEL);
    vBar.setBlockIncrement(canvas.getHeight() * 0.8);
    vBar.setValue(scrollY);
  }

  private static double clamp(double v, double max) {
    return Math.max(0, Math.min(max, v));
  }

  private void scrollTo(double x, double y) {
    if (x == scrollX && y == scrollY) {
      return;
    }
    scrollX = x;
    scrollY = y;
    painted = null;
    redraw();
  }

  /** Whether the plane is drawn larger than the box (it scrolls). */
  public boolean scrolls() {
    return hBar.isVisible() || vBar.isVisible();
  }

  /**
   * Scrolls so that panel {@code p} is in view with room around it, where the drawing is larger
   * than the box; returns whether the view moved.
   */
  private boolean follow(PlanePicture pic, PanelRef p) {
    if (p == null || !scrolls() || !pic.grid().contains(p)) {
      return false;
    }
    double w = canvas.getWidth();
    double h = canvas.getHeight();
    PlaneGeometry geo = geometryFor(pic, w, h);
    double room = MIN_PANEL;
    double x = scrollX;
    double y = scrollY;
    if (geo.left(p) < PlanePainter.LEFT_MARGIN + 4) {
      x += geo.left(p) - PlanePainter.LEFT_MARGIN - room;
    } else if (geo.right(p) > w - 4) {
      x += geo.right(p) - w + room;
    }
    if (geo.top(p) < 4) {
      y += geo.top(p) - room;
    } else if (geo.bottom(p) > h - PlanePainter.MARGIN - 4) {
      y += geo.bottom(p) - (h - PlanePainter.MARGIN) + room;
    }
    x = clamp(x, hBar.getMax());
    y = clamp(y, vBar.getMax());
    if (x == scrollX && y == scrollY) {
      return false;
    }
    scrollX = x;
    scrollY = y;
    hBar.setValue(x);
    vBar.setValue(y);
    return true;
  }

  private PlaneGeometry geometryFor(PlanePicture pic, double w, double h) {
    return new PlaneGeometry(pic.grid(), w, h, PlanePainter.LEFT_MARGIN, PlanePainter.MARGIN, MIN_PANEL,
        scrollX, scrollY);
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
    if (painted != null && !painted.grid().equals(pic.grid())) {
      painted = null;
      updateBars(pic);
      requestLayout();
    }
    if (!clicking && follow(pic, pic.cursor())) {
      painted = null;
    }
    java.util.Set<PanelRef> dirty = painted == null ? null : dirtyPanels(painted, pic);
    if (dirty != null && geometry != null) {
      PlanePainter.repaint(g, pic, geometry, dirty);
      if (scrolls()) {
        PlanePainter.labelsOver(g, geometry, pic, w, h);
      }
      lastPaintPartial = true;
    } else {
      geometry = geometryFor(pic, w, h);
      PlanePainter.paint(g, pic, geometry, w, h, true);
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
