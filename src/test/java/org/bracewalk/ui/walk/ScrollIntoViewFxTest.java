package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ScrollPane;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.FxExecutor;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 12, item 6: a control of the walk-round's side panel that takes the focus is scrolled into
 * the visible part of the panel, on the demo facade at a tablet's 1280 x 800, where the side panel
 * is taller than its room: down to the last control, and back up to the first.
 */
@ExtendWith(ApplicationExtension.class)
class ScrollIntoViewFxTest {
  @TempDir static Path dir;
  private final ExecutorService background = Executors.newSingleThreadExecutor();
  private AppServices services;

  private Stage stage;

  @Start
  void start(Stage stage) {
    this.stage = stage;
  }

  /** The demo database and the walk-round, made here: loading the demo may outlast the toolkit's setup time. */
  private void open(FxRobot robot) throws Exception {
    services = DemoDatabase.withDemo(Files.createTempDirectory(dir, "scroll"));
    Structure st = DemoWalk.scaffold(services);
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection insp = services.inspections().start(st.id(), NewInspection.of("Rowan Test", "Scaffold inspector",
        InspectionReason.ROUTINE));
    WalkViewModel vm = new WalkViewModel(services.inspections().designInForce(insp.id(), facade.id()).design(),
        facade.name(), facade.role(), java.util.List.of(),
        new InspectionMarkRecorder(services.inspections(), insp.id(), facade.id(), "Rowan Test"),
        PlaneAnalyzer.standard(), new FakeDialogs(), false, false, DemoDatabase.CLOCK, new FxExecutor(), background);
    robot.interact(() -> {
      WalkView view = new WalkView(vm);
      Scene scene = new Scene(view, 1280, 800);
      Stylesheet.apply(scene);
      stage.setScene(scene);
      stage.show();
      view.focusPlane();
    });
  }

  @AfterEach
  void close() throws Exception {
    background.shutdown();
    background.awaitTermination(30, TimeUnit.SECONDS);
    if (services != null) {
      services.close();
    }
  }

  private static ScrollPane sidePanel(Node n) {
    for (Node p = n.getParent(); p != null; p = p.getParent()) {
      if (p instanceof ScrollPane sp && sp.getStyleClass().contains("walk-controls")) {
        return sp;
      }
    }
    throw new AssertionError(n.getId() + " is not in the side panel");
  }

  /** Where {@code n} lies against the side panel's viewport: negative above it, positive below, 0 inside. */
  private static int against(Node n) {
    ScrollPane sp = sidePanel(n);
    Bounds b = n.localToScene(n.getBoundsInLocal());
    double top = sp.localToScene(0, 0).getY() + sp.snappedTopInset();
    double bottom = top + sp.getViewportBounds().getHeight();
    if (b.getMinY() < top - 0.5) {
      return -1;
    }
    return b.getMaxY() > bottom + 0.5 ? 1 : 0;
  }

  @Test
  void theFocusedControlIsScrolledIntoTheSidePanelsView(FxRobot robot) throws Exception {
    open(robot);
    Node last = robot.lookup("#walk-frame-in-walk").query();
    Node first = robot.lookup("#mark-sound").query();
    assertThat(against(last)).as("the panel is taller than its room: the last control starts below it").isPositive();
    robot.interact(last::requestFocus);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(against(last)).as("scrolled down to it").isZero();
    assertThat(against(first)).as("the first is out of view now").isNegative();
    robot.interact(first::requestFocus);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(against(first)).as("scrolled back up").isZero();
  }
}
