package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Labeled;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewObservation;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.store.Database;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.findings.ServiceReportIssuer;
import org.bracewalk.ui.walk.WalkOrder;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * A whole walk-round by keys alone, headless, on the demo site: load it into an empty database,
 * start an inspection of the facade scaffold, mark every panel of the facade (lift 3's braces
 * missing or beyond use), see the verdict turn to lost rigidity, see the proposed repair, finalise,
 * issue the report; then check that every mark reached the database.
 */
@ExtendWith(ApplicationExtension.class)
class WalkRoundEndToEndFxTest {
  @TempDir static Path dir;
  private AppServices services;
  private final FakeDialogs dialogs = new FakeDialogs();
  private final ExecutorService background = Executors.newSingleThreadExecutor();
  private MainWindow window;

  @Start
  void start(Stage stage) {
    services = AppServices.over(Database.open(dir.resolve("walk.db")), Clock.systemUTC(), PlaneAnalyzer.standard());
    BracewalkApp app = new BracewalkApp(PlaneAnalyzer.standard(), Clock.systemUTC(), background);
    window = app.show(stage, dialogs, services,
        new ServiceReportIssuer(AppContext.standard().reportFactory(Map.of()).over(services),
            services.outputs()));
  }

  @AfterEach
  void close() throws Exception {
    background.shutdown();
    background.awaitTermination(30, TimeUnit.SECONDS);
    services.close();
  }

  private static void ctrl(FxRobot robot, KeyCode key) {
    robot.press(KeyCode.CONTROL).type(key).release(KeyCode.CONTROL);
    WaitForAsyncUtils.waitForFxEvents();
  }

  /**
   * Waits (explicitly, no sleep) until the background executor has run everything handed to it so
   * far (the marks are written there, in order), then for the JavaFX thread to show the answers.
   */
  private void settle() throws Exception {
    WaitForAsyncUtils.waitForFxEvents();
    background.submit(() -> { }).get(30, TimeUnit.SECONDS);
    WaitForAsyncUtils.waitForFxEvents();
  }

  private static String text(FxRobot robot, String id) {
    return robot.lookup(id).queryAs(Labeled.class).getText();
  }

  @Test
  void aWholeWalkRoundByKeysReachesTheDatabaseMarkByMark(FxRobot robot) throws Exception {
    // empty database: the offer to load the demo site
    assertThat(robot.lookup("#load-demo").tryQuery()).isPresent();
    // the overview is read on the background executor: the offer shows once it is read
    WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> robot.lookup("#load-demo").query().getParent().isVisible());
    robot.type(KeyCode.L);
    WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS,
        () -> !robot.lookup("#sites-table").queryTableView().getItems().isEmpty());
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(services.sites().sites()).hasSize(1);

    // choose the facade plane (rows: site, racking run, 4 frames, spine, scaffold, facade...)
    for (int i = 0; i < 8; i++) {
      robot.type(KeyCode.DOWN);
    }
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(text(robot, "#sites-selection")).contains("Plane 'north facade'");
    robot.type(KeyCode.ENTER); // no open inspection: to the inspector field
    robot.write("Rowan Test");
    robot.type(KeyCode.TAB); // the position
    robot.write("Scaffold inspector, Test & Sons");
    robot.type(KeyCode.TAB);
    robot.write("Rowan Test");
    robot.type(KeyCode.TAB);
    robot.write("day shift");
    dialogs.confirmAnswers.push(true); // the last look at every value: start
    ctrl(robot, KeyCode.ENTER);
    // the inspection is started on the background executor; the walk-round opens once it is
    WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> window.currentScreen() == ScreenId.WALK);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(window.currentScreen()).isEqualTo(ScreenId.WALK);
    long inspectionId = window.selection().inspectionId();
    assertThat(inspectionId).isPositive();

    // a routine inspection starts on the braced panels only; O: every panel, bay by bay
    assertThat(text(robot, "#walk-cursor")).contains("1 of 15 in walk order");
    robot.type(KeyCode.O);
    WaitForAsyncUtils.waitForFxEvents();
    // walk the facade bay by bay; lift 3 was hit
    PlaneRecord facade = DemoWalk.facade(services);
    List<PanelRef> order = WalkOrder.BAYS_UP_AND_DOWN.sequence(facade.grid());
    List<PanelState> states = DemoWalk.states(facade);
    PanelRef lastHit = new PanelRef(DemoWalk.HIT_LIFT, facade.grid().bays());
    for (int k = 0; k < order.size(); k++) {
      robot.type(switch (states.get(k)) {
        case SOUND -> KeyCode.S;
        case MISSING -> KeyCode.M;
        case DAMAGED_INEFFECTIVE -> KeyCode.U;
        default -> throw new IllegalStateException();
      });
      settle(); // the mark is written on the background executor; the banner follows the record
      boolean bannerUp = robot.lookup("#walk-alarm-banner").query().isVisible();
      // the verdict turns exactly when the last brace of lift 3 is marked
      assertThat(bannerUp).as("alarm after %s", order.get(k)).isEqualTo(k >= order.indexOf(lastHit));
    }
    assertThat(text(robot, "#walk-progress")).isEqualTo("50 of 50 panels");
    assertThat(text(robot, "#walk-alarm"))
        .contains("Keep people and loads off lifts 3-5, bays 1-10")
        .contains("competent person");

    // findings: the proposed repair is one brace in lift 3
    ctrl(robot, KeyCode.DIGIT4);
    settle(); // the findings are read on the background executor
    assertThat(window.currentScreen()).isEqualTo(ScreenId.FINDINGS);
    String repair = robot.lookup("#findings-repair").queryAs(javafx.scene.layout.VBox.class).getChildren().stream()
        .map(n -> ((Labeled) n).getText()).reduce("", String::concat);
    assertThat(repair).startsWith("1.  lift 3, bay").contains("restores the design");

    // finalise (the dialog answers yes), then issue the report
    dialogs.confirmAnswers.push(true);
    ctrl(robot, KeyCode.F);
    settle(); // the gaps are read, the question asked, then the inspection finalised in the background
    settle();
    assertThat(robot.lookup("#findings-finalised").query().isVisible()).isTrue();
    Path pdf = dir.resolve("report.pdf");
    dialogs.saveAnswers.push(Optional.of(pdf));
    robot.type(KeyCode.R);
    WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS,
        () -> text(robot, "#findings-status").contains("Issued") || !text(robot, "#findings-error").isEmpty());
    assertThat(text(robot, "#findings-error")).isEmpty();
    assertThat(text(robot, "#findings-status")).startsWith("Issued the inspection report").doesNotContain("DRAFT");
    assertThat(new String(Files.readAllBytes(pdf), 0, 5, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
    assertThat(services.store().issuedReports().ofInspection(inspectionId)).hasSize(1);

    // every mark is in the database, in the order made, with nothing else
    List<Observation> rows = services.inspections().observations(inspectionId);
    assertThat(rows).hasSize(order.size());
    for (int k = 0; k < order.size(); k++) {
      assertThat(rows.get(k).panel()).isEqualTo(order.get(k));
      assertThat(rows.get(k).state()).isEqualTo(states.get(k));
      assertThat(rows.get(k).planeId()).isEqualTo(facade.id());
      assertThat(rows.get(k).recordedBy()).isEqualTo("Rowan Test");
    }
    Inspection done = services.inspections().inspection(inspectionId);
    assertThat(done.isFinalised()).isTrue();
    assertThat(done.inspectorPosition()).isEqualTo("Scaffold inspector, Test & Sons");
    assertThatThrownBy(() -> services.inspections().recordObservation(inspectionId,
        NewObservation.of(facade.id(), PanelRef.of(1, 1), PanelState.SOUND, "x")))
        .isInstanceOf(InspectionFinalisedException.class);

    // the walk-round is read-only now: a key records nothing
    ctrl(robot, KeyCode.DIGIT3);
    settle(); // the walk-round's record is read on the background executor, then the screen shown
    assertThat(window.currentScreen()).isEqualTo(ScreenId.WALK);
    robot.type(KeyCode.M);
    settle();
    assertThat(services.inspections().observations(inspectionId)).hasSize(order.size());
    assertThat(text(robot, "#walk-error")).contains("read-only");
  }
}
