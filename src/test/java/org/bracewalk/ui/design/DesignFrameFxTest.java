package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import javafx.geometry.Point2D;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.PanelSide;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.PlaneGeometry;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The design editor leaves a ledger or standard out of the design and puts it back, by keys and by mouse. */
@ExtendWith(ApplicationExtension.class)
class DesignFrameFxTest {
  private final List<PlaneDesign> saved = new ArrayList<>();
  private final FakeDialogs dialogs = new FakeDialogs();
  private DesignViewModel vm;
  private DesignView view;

  @Start
  void start(Stage stage) {
    PlaneDesign design = new PlaneDesign(PlaneGrid.uniform(2, 3, Support.PINNED_BASE),
        Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING)), Set.of(), Set.of(FrameRef.standard(2, 3)));
    DesignSaver saver = (d, author, note) -> {
      saved.add(d);
      return "revision " + saved.size();
    };
    vm = new DesignViewModel(design, "Frame test", PlaneAnalyzer.standard(), saver, dialogs, Runnable::run, Runnable::run);
    view = new DesignView(vm);
    Scene scene = new Scene(view, 1280, 800);
    Stylesheet.apply(scene);
    stage.setScene(scene);
    stage.show();
    view.focusPlane();
  }

  @Test
  void shiftAndAnArrowSelectEachSideAndSpaceLeavesItOutAndPutsItBack(FxRobot robot) {
    PanelRef here = PanelRef.of(1, 1);
    assertThat(vm.cursor()).isEqualTo(here);
    // each key selects its own side of the current panel
    Map<KeyCode, FrameRef> expected = Map.of(
        KeyCode.UP, FrameRef.ledger(1, 1),
        KeyCode.DOWN, FrameRef.ledger(0, 1),
        KeyCode.LEFT, FrameRef.standard(1, 0),
        KeyCode.RIGHT, FrameRef.standard(1, 1));
    for (var e : expected.entrySet()) {
      robot.press(KeyCode.SHIFT).type(e.getKey()).release(KeyCode.SHIFT);
      WaitForAsyncUtils.waitForFxEvents();
      assertThat(vm.selectedMember()).as("Shift+" + e.getKey()).isEqualTo(e.getValue());
      assertThat(vm.pictureProperty().get().selectedMember()).isEqualTo(e.getValue());
      robot.type(KeyCode.ESCAPE);
      WaitForAsyncUtils.waitForFxEvents();
      assertThat(vm.selectedMember()).isNull();
    }
    robot.press(KeyCode.SHIFT).type(KeyCode.UP).release(KeyCode.SHIFT);
    robot.type(KeyCode.SPACE);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.design().omittedFrame()).containsExactlyInAnyOrder(FrameRef.ledger(1, 1), FrameRef.standard(2, 3));
    assertThat(vm.design().braceAt(here)).as("the panel's brace is untouched").isEqualTo(Brace.rigid(Diagonal.RISING));
    assertThat(vm.cursorTextProperty().get()).contains("left out: ledger above");
    // the side stays selected along a run: Right, Space leaves out the next ledger too
    robot.type(KeyCode.RIGHT).type(KeyCode.SPACE);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.design().omittedFrame()).contains(FrameRef.ledger(1, 2));
    robot.type(KeyCode.SPACE);
    robot.type(KeyCode.LEFT).type(KeyCode.SPACE);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.design().omittedFrame()).containsExactly(FrameRef.standard(2, 3));
  }

  @Test
  void aClickOnAStandardLeavesItOutAndASecondPutsItBackAndTheSaveCarriesIt(FxRobot robot) {
    PlaneCanvas canvas = view.canvas();
    PlaneGeometry geo = canvas.geometry();
    FrameRef f = FrameRef.standard(2, 1);
    double[] s = geo.frame(f);
    Point2D onScreen = canvas.localToScreen((s[0] + s[2]) / 2 + 2, (s[1] + s[3]) / 2);
    robot.clickOn(onScreen);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.design().omittedFrame()).containsExactlyInAnyOrder(f, FrameRef.standard(2, 3));
    assertThat(vm.selectedMember()).isEqualTo(f);
    assertThat(vm.sideProperty().get()).isEqualTo(PanelSide.STANDARD_RIGHT);
    robot.clickOn(onScreen);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.design().omittedFrame()).containsExactly(FrameRef.standard(2, 3));
    robot.clickOn(onScreen);
    dialogs.confirmAnswers.add(true); // not rigid as designed: save anyway
    robot.press(KeyCode.CONTROL).type(KeyCode.S).release(KeyCode.CONTROL);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(saved).singleElement().extracting(PlaneDesign::omittedFrame)
        .isEqualTo(Set.of(f, FrameRef.standard(2, 3)));
  }

  @Test
  void aSmallerGridDropsTheLeftOutMembersOutsideIt(FxRobot robot) {
    robot.interact(() -> {
      vm.baysProperty().set(2);
      assertThat(vm.applyGrid()).isTrue();
    });
    assertThat(vm.design().omittedFrame()).isEmpty();
    // a fill keeps what is left out
    robot.interact(() -> {
      vm.toggleMember(FrameRef.ledger(2, 2));
      vm.fillEveryPanel();
    });
    assertThat(vm.design().omittedFrame()).containsExactly(FrameRef.ledger(2, 2));
  }
}
