package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;
import javafx.scene.Scene;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Labeled;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.verdict.VerdictKind;
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
 * Issue 12, item 5, in the walk-round: Ctrl+P lists every plane of the inspection with its
 * progress and verdict (the plane walked follows the marks), and the bar says another plane is
 * still to walk. The main window over the demo site, a routine inspection of the facade scaffold.
 */
@ExtendWith(ApplicationExtension.class)
class WalkPlaneChooserFxTest {
  @TempDir static Path dir;
  private AppServices services;
  private MainWindow window;

  private Stage stage;

  @Start
  void start(Stage stage) {
    this.stage = stage;
  }

  /** The demo database and the main window, made here: loading the demo may outlast the toolkit's setup time. */
  private void open(FxRobot robot) throws Exception {
    services = DemoDatabase.withDemo(Files.createTempDirectory(dir, "chooser"));
    Structure st = DemoWalk.scaffold(services);
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection insp = services.inspections().start(st.id(), NewInspection.of("Rowan Test", "Scaffold inspector",
        InspectionReason.ROUTINE));
    Executor now = Runnable::run;
    AppScreens screens = new AppScreens(services, PlaneAnalyzer.standard(), DemoDatabase.CLOCK, new FakeDialogs(),
        now, now, new ServiceReportIssuer(AppContext.standard().reportFactory(Map.of()).over(services), services.outputs()));
    Selection walk = new Selection(st.id(), facade.id(), insp.id());
    robot.interact(() -> {
      window = new MainWindow(screens, AppScreens.screenKeys(), "test");
      Scene scene = new Scene(window.root(), 1280, 800);
      Stylesheet.apply(scene);
      stage.setScene(scene);
      stage.show();
      window.open(ScreenId.WALK, walk);
    });
  }

  @AfterEach
  void close() {
    if (services != null) {
      services.close();
    }
  }

  @SuppressWarnings("unchecked")
  private static List<String> lines(FxRobot robot) {
    ChoiceBox<Object> c = robot.lookup("#plane-choice").queryAs(ChoiceBox.class);
    return c.getItems().stream().map(i -> c.getConverter().toString(i)).toList();
  }

  @Test
  void everyPlaneShowsItsProgressAndVerdictAndTheWalkedOneFollowsTheMarks(FxRobot robot) throws Exception {
    open(robot);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(window.currentScreen()).isEqualTo(ScreenId.WALK);
    assertThat(lines(robot)).containsExactly(
        "north facade \u2014 0 of 50 panels \u2014 " + VerdictKind.DEPENDS_ON_UNSEEN.headline(),
        "east end frame \u2014 0 of 5 panels \u2014 " + VerdictKind.NOT_INSPECTED.headline());
    assertThat(robot.lookup("#plane-others").queryAs(Labeled.class).getText()).isEqualTo("+1 plane to walk");
    robot.interact(() -> robot.lookup("#walk-canvas").query().requestFocus());
    robot.type(KeyCode.S, KeyCode.S);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(lines(robot).get(0)).startsWith("north facade \u2014 2 of 50 panels \u2014 ");
    robot.press(KeyCode.CONTROL).type(KeyCode.P).release(KeyCode.CONTROL);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(robot.lookup("#plane-choice").queryAs(ChoiceBox.class).isShowing()).isTrue();
    robot.type(KeyCode.ESCAPE);
  }
}
