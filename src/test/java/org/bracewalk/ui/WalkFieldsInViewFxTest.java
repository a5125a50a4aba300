package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Executor;
import javafx.embed.swing.SwingFXUtils;
import javafx.geometry.Bounds;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javax.imageio.ImageIO;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ServiceReportIssuer;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * Issue 12, item 6: Alt+D, Alt+B and Alt+O on the walk-round land in a field the inspector can see,
 * in the whole main window at a tablet's 1280 x 800 and a small laptop's 1024 x 600 (the headless
 * screen is 1280 x 800, so no taller window can be shown here; {@code ScrollIntoViewFxTest} holds the
 * side panel's scrolling): the focused field lies inside the window and inside the visible part of
 * every scroll pane around it, and the fields open as one strip under the drawing.
 * The pictures are kept in {@code target/walk-fields} to be looked at.
 */
@ExtendWith(ApplicationExtension.class)
class WalkFieldsInViewFxTest {
  @TempDir static Path dir;
  private AppServices services;
  private Stage stage;
  private MainWindow window;
  private Selection walk;
  private AppScreens screens;

  @Start
  void start(Stage stage) {
    this.stage = stage;
  }

  /** The demo database and the main window, made here: loading the demo may outlast the toolkit's setup time. */
  private void prepare() throws Exception {
    services = DemoDatabase.withDemo(Files.createTempDirectory(dir, "fields"));
    Structure st = DemoWalk.scaffold(services);
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection insp = services.inspections().start(st.id(), NewInspection.of("Rowan Test", "Scaffold inspector",
        InspectionReason.ROUTINE));
    walk = new Selection(st.id(), facade.id(), insp.id());
    Executor now = Runnable::run;
    AppScreens screens = new AppScreens(services, PlaneAnalyzer.standard(), DemoDatabase.CLOCK, new FakeDialogs(),
        now, now, new ServiceReportIssuer(AppContext.standard().reportFactory(Map.of()).over(services), services.outputs()));
    this.screens = screens;
  }

  @AfterEach
  void close() {
    if (services != null) {
      services.close();
    }
  }

  private void show(FxRobot robot, double width, double height) throws Exception {
    prepare();
    robot.interact(() -> {
      window = new MainWindow(screens, AppScreens.screenKeys(), "test");
      Scene scene = new Scene(window.root(), width, height);
      Stylesheet.apply(scene);
      stage.setScene(scene);
      stage.setWidth(width);
      stage.setHeight(height);
      stage.show();
      window.open(ScreenId.WALK, walk);
    });
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(window.currentScreen()).isEqualTo(ScreenId.WALK);
    robot.interact(() -> robot.lookup("#walk-canvas").query().requestFocus());
  }

  /** The node's bounds in the scene lie in the window and in the viewport of each scroll pane around it. */
  private static void assertInView(Node n, Scene scene) {
    assertThat(n.isVisible()).isTrue();
    Bounds b = n.localToScene(n.getBoundsInLocal());
    String what = n.getId() + " at " + b;
    assertThat(b.getMinX()).as(what).isGreaterThanOrEqualTo(0);
    assertThat(b.getMinY()).as(what).isGreaterThanOrEqualTo(0);
    assertThat(b.getMaxX()).as(what).isLessThanOrEqualTo(scene.getWidth());
    assertThat(b.getMaxY()).as(what).isLessThanOrEqualTo(scene.getHeight());
    for (Node p = n.getParent(); p != null; p = p.getParent()) {
      assertThat(p.isVisible()).as(what + ": " + p + " shows").isTrue();
      if (p instanceof ScrollPane sp) {
        Bounds view = sp.localToScene(sp.getViewportBounds());
        // the viewport's bounds are relative to the pane's own insets
        double x = sp.localToScene(0, 0).getX() + sp.snappedLeftInset();
        double y = sp.localToScene(0, 0).getY() + sp.snappedTopInset();
        assertThat(b.getMinY()).as(what + " below the top of " + sp.getStyleClass()).isGreaterThanOrEqualTo(y - 0.5);
        assertThat(b.getMaxY()).as(what + " above the bottom of " + sp.getStyleClass())
            .isLessThanOrEqualTo(y + view.getHeight() + 0.5);
        assertThat(b.getMaxX()).as(what + " left of the right of " + sp.getStyleClass())
            .isLessThanOrEqualTo(x + view.getWidth() + 0.5);
      }
    }
  }

  private void picture(FxRobot robot, String name) throws Exception {
    Path out = Path.of("target", "walk-fields");
    Files.createDirectories(out);
    BufferedImage[] img = new BufferedImage[1];
    robot.interact(() -> img[0] = SwingFXUtils.fromFXImage(stage.getScene().snapshot(null), null));
    ImageIO.write(img[0], "png", out.resolve(name + ".png").toFile());
  }

  private void eachField(FxRobot robot, int width, int height, boolean strip) throws Exception {
    show(robot, width, height);
    picture(robot, width + "x" + height);
    assertThat(robot.lookup("#walk-detail-strip").query().isVisible()).as("the strip is closed until asked for").isFalse();
    for (var key : new Object[][] {{KeyCode.D, "walk-defect"}, {KeyCode.B, "walk-bow"}, {KeyCode.O, "walk-note"}}) {
      robot.press(KeyCode.ALT).type((KeyCode) key[0]).release(KeyCode.ALT);
      WaitForAsyncUtils.waitForFxEvents();
      Node focus = stage.getScene().getFocusOwner();
      assertThat(focus).isNotNull();
      // a combo box's focus may sit on the box itself
      assertThat(focus.getId()).as("Alt+" + key[0]).isEqualTo(key[1]);
      robot.interact(() -> { }); // the scroll into view follows the focus, on the JavaFX thread
      assertInView(focus, stage.getScene());
      Node stripNode = robot.lookup("#walk-detail-strip").query();
      assertThat(stripNode.isVisible()).as("the strip at " + width + " x " + height).isEqualTo(strip);
      picture(robot, width + "x" + height + "-alt-" + key[0].toString().toLowerCase(java.util.Locale.ROOT));
      robot.type(KeyCode.ESCAPE);
      WaitForAsyncUtils.waitForFxEvents();
    }
    assertThat(robot.lookup("#walk-detail-strip").query().isVisible()).as("closed again, nothing entered").isFalse();
    // something entered keeps it open for the next mark; the mark takes it and it closes
    robot.press(KeyCode.ALT).type(KeyCode.O).release(KeyCode.ALT);
    robot.write("bent tube");
    robot.type(KeyCode.ENTER);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(robot.lookup("#walk-detail-strip").query().isVisible()).isEqualTo(strip);
    picture(robot, width + "x" + height + "-note-pending");
    robot.type(KeyCode.D);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(robot.lookup("#walk-detail-strip").query().isVisible()).isFalse();
  }

  @Test
  void atATabletsSizeEachFieldOpensInView(FxRobot robot) throws Exception {
    eachField(robot, 1280, 800, true);
  }

  @Test
  void atASmallLaptopsSizeEachFieldOpensInView(FxRobot robot) throws Exception {
    eachField(robot, 1024, 600, true);
  }
}
