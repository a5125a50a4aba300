package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The walk-round screen driven by keys alone, headless. */
@ExtendWith(ApplicationExtension.class)
class WalkViewFxTest {
  private final MemoryRecorder recorder = new MemoryRecorder();
  private WalkViewModel vm;

  @Start
  void start(Stage stage) {
    PlaneDesign design =
        PlaneDesign.of(
            PlaneGrid.uniform(2, 2, Support.PINNED_BASE),
            Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), PanelRef.of(2, 2), Brace.rigid(Diagonal.FALLING)));
    vm = new WalkViewModel(design, "Key test", List.of(), recorder, PlaneAnalyzer.standard(), new FakeDialogs(), false, false,
        java.time.Clock.systemUTC(), Runnable::run, Runnable::run);
    WalkView view = new WalkView(vm);
    Scene scene = new Scene(view, 1280, 800);
    Stylesheet.apply(scene);
    stage.setScene(scene);
    stage.show();
    view.focusPlane();
  }

  @Test
  void keysRecordEachPanelAndTheLastMissingBraceTurnsTheVerdict(FxRobot robot) {
    robot.type(KeyCode.S); // 1,1 sound
    robot.type(KeyCode.S); // 2,1 sound (no design brace)
    robot.type(KeyCode.M); // 2,2 missing: lift 2 has no brace left
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(recorder.rows).extracting(MemoryRecorder.Row::panel)
        .containsExactly(PanelRef.of(1, 1), PanelRef.of(2, 1), PanelRef.of(2, 2));
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    assertThat(robot.lookup("#walk-alarm-banner").query().isVisible()).isTrue();
    assertThat(robot.lookup("#walk-alarm").queryLabeled().getText()).contains("Keep people and loads off lift 2");
    assertThat(robot.lookup("#walk-progress").queryLabeled().getText()).isEqualTo("3 of 4 panels");
    robot.type(KeyCode.BACK_SPACE);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(recorder.rows).hasSize(4);
    assertThat(recorder.rows.get(3).mark().state()).isEqualTo(PanelState.NOT_INSPECTED);
    assertThat(robot.lookup("#walk-alarm-banner").query().isVisible()).isFalse();
  }

  /**
   * The drawing keeps its size when the alarm banner appears (issue 12, item 7): the plane's
   * canvas is as wide and as tall before the plane loses rigidity as after, banner shown.
   */
  @Test
  void theDrawingKeepsItsSizeWhenTheAlarmBannerAppears(FxRobot robot) {
    javafx.scene.Node canvas = robot.lookup("#walk-canvas").query();
    double width = canvas.getLayoutBounds().getWidth();
    double height = canvas.getLayoutBounds().getHeight();
    assertThat(robot.lookup("#walk-alarm-banner").query().isVisible()).isFalse();
    robot.type(KeyCode.S); // 1,1 sound
    robot.type(KeyCode.S); // 2,1 sound (no design brace)
    robot.type(KeyCode.M); // 2,2 missing: lift 2 has no brace left, the plane has lost rigidity
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    assertThat(robot.lookup("#walk-alarm-banner").query().isVisible()).isTrue();
    assertThat(canvas.getLayoutBounds().getWidth()).as("the drawing's width, banner shown").isEqualTo(width);
    assertThat(canvas.getLayoutBounds().getHeight()).as("the drawing's height, banner shown").isEqualTo(height);
    assertThat(width).isGreaterThan(100);
    assertThat(height).isGreaterThan(100);
  }

  @Test
  void aDigitRecordsTheSameStateAsItsLetter(FxRobot robot) {
    robot.type(KeyCode.DIGIT4);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(recorder.rows).singleElement().extracting(r -> r.mark().state()).isEqualTo(PanelState.MISSING);
  }
}
