package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
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
 * Issue 12, item 4: how many keystrokes a routine walk of the demo facade takes, from the walk-round
 * opening to every panel recorded, in the braced-panels order (with the one confirmed "rest as
 * designed" step) and bay by bay. The real walk view is driven by keys over the demo database, and
 * the counts are read from the README, so the numbers it states can never drift from the app.
 * The confirmation is counted as one keystroke: Enter on the dialog's default button (the real
 * dialog, {@code FxDialogService}, makes its confirm button the default).
 */
@ExtendWith(ApplicationExtension.class)
class WalkKeystrokesFxTest {
  @TempDir static Path dir;
  private final ExecutorService background = Executors.newSingleThreadExecutor();
  private final FakeDialogs dialogs = new FakeDialogs();
  private AppServices services;
  private WalkViewModel vm;
  private PlaneRecord facade;
  private long inspectionId;

  private Stage stage;

  @Start
  void start(Stage stage) {
    this.stage = stage;
  }

  /**
   * The demo database and the walk-round, made here rather than in {@code @Start}: loading the
   * demo on a busy machine may outlast the toolkit's setup time.
   */
  private void open(FxRobot robot) throws Exception {
    services = DemoDatabase.withDemo(Files.createTempDirectory(dir, "walk"));
    Structure st = DemoWalk.scaffold(services);
    facade = DemoWalk.facade(services);
    Inspection insp = services.inspections().start(st.id(), NewInspection.of("Rowan Test", "Scaffold inspector",
        InspectionReason.ROUTINE));
    inspectionId = insp.id();
    vm = new WalkViewModel(services.inspections().designInForce(insp.id(), facade.id()).design(),
        st.name() + ", " + facade.name(), facade.role(),
        InspectionMarkRecorder.existing(services.inspections(), insp.id(), facade.id()),
        new InspectionMarkRecorder(services.inspections(), insp.id(), facade.id(), "Rowan Test"),
        PlaneAnalyzer.standard(), dialogs, false, false, DemoDatabase.CLOCK, new FxExecutor(), background);
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

  private void settle() throws Exception {
    WaitForAsyncUtils.waitForFxEvents();
    background.submit(() -> { }).get(30, TimeUnit.SECONDS);
    WaitForAsyncUtils.waitForFxEvents();
  }

  /** The two counts the README states: braced-panels order first, then bay by bay. */
  static int[] readmeCounts() throws Exception {
    String readme = Files.readString(Path.of("README.md"), StandardCharsets.UTF_8).replaceAll("\\s+", " ");
    Matcher m = Pattern.compile("routine walk of the demo facade \\(every panel found as designed\\) takes"
        + " \\*\\*(\\d+)\\*\\* keystrokes in the braced-panels order .*? against \\*\\*(\\d+)\\*\\* bay by bay").matcher(readme);
    assertThat(m.find()).as("README states both keystroke counts").isTrue();
    return new int[] {Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2))};
  }

  /**
   * Presses S at each stop until the walk says it has reached its end; then, when panels remain
   * that nobody has looked at, A and the confirmation. Returns the keystrokes used.
   */
  private int walk(FxRobot robot) throws Exception {
    int keys = 0;
    while (!vm.statusProperty().get().contains("Every panel is marked")
        && !vm.statusProperty().get().contains("End of the")) {
      robot.type(KeyCode.S);
      keys++;
      assertThat(keys).as("a walk of 50 panels").isLessThanOrEqualTo(50);
    }
    settle();
    if (!vm.notLookedAt().isEmpty()) {
      dialogs.confirmAnswers.push(true);
      robot.type(KeyCode.A);
      keys += 2; // A, then Enter on the confirmation's default button
      settle();
    }
    assertThat(services.inspections().notLookedAt(inspectionId, facade.id())).as("every panel recorded").isEmpty();
    assertThat(vm.progressTextProperty().get()).startsWith("50 of 50 panels");
    return keys;
  }

  @Test
  void aRoutineWalkByTheBracedPanelsTakesTheKeystrokesTheReadmeStates(FxRobot robot) throws Exception {
    open(robot);
    robot.interact(() -> vm.startWith(WalkOrder.BRACED_BAYS_UP_AND_DOWN));
    int keys = walk(robot);
    assertThat(dialogs.asked).singleElement().asString()
        .contains("Record the 35 panels not yet looked at as found as designed?");
    assertThat(keys).isEqualTo(readmeCounts()[0]);
  }

  @Test
  void aRoutineWalkBayByBayTakesTheKeystrokesTheReadmeStates(FxRobot robot) throws Exception {
    open(robot);
    robot.interact(() -> vm.startWith(WalkOrder.BAYS_UP_AND_DOWN));
    int keys = walk(robot);
    assertThat(dialogs.asked).isEmpty();
    assertThat(keys).isEqualTo(readmeCounts()[1]);
  }
}
