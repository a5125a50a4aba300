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
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.Stylesheet;
import org.bracewalk.ui.common.FakeDialogs;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** Frame members in the walk-round, by keys alone: each side of the panel, its mark, its details, undo. */
@ExtendWith(ApplicationExtension.class)
class WalkFrameFxTest {
  private final MemoryRecorder recorder = new MemoryRecorder();
  private WalkViewModel vm;

  @Start
  void start(Stage stage) {
    PlaneDesign design = new PlaneDesign(PlaneGrid.uniform(2, 2, Support.PINNED_BASE),
        Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), PanelRef.of(2, 2), Brace.rigid(Diagonal.FALLING)),
        java.util.Set.of(), java.util.Set.of(FrameRef.ledger(2, 2)));
    vm = new WalkViewModel(design, "Frame keys", List.of(), recorder, PlaneAnalyzer.standard(), new FakeDialogs(),
        false, false, java.time.Clock.systemUTC(), Runnable::run, Runnable::run);
    WalkView view = new WalkView(vm);
    Scene scene = new Scene(view, 1280, 800);
    Stylesheet.apply(scene);
    stage.setScene(scene);
    stage.show();
    view.focusPlane();
  }

  private static void shift(FxRobot robot, KeyCode arrow) {
    robot.press(KeyCode.SHIFT).type(arrow).release(KeyCode.SHIFT);
    WaitForAsyncUtils.waitForFxEvents();
  }

  @Test
  void eachShiftArrowSelectsItsSideAndEachStateKeyRecordsIt(FxRobot robot) {
    PanelRef here = PanelRef.of(1, 1);
    // Shift+arrow, then a state key: the mark goes to that side, and the cursor stays on the panel
    record Case(KeyCode arrow, FrameRef member, KeyCode key, PanelState state) {}
    List<Case> cases = List.of(
        new Case(KeyCode.UP, FrameRef.ledger(1, 1), KeyCode.M, PanelState.MISSING),
        new Case(KeyCode.DOWN, FrameRef.ledger(0, 1), KeyCode.D, PanelState.DAMAGED_EFFECTIVE),
        new Case(KeyCode.LEFT, FrameRef.standard(1, 0), KeyCode.U, PanelState.DAMAGED_INEFFECTIVE),
        new Case(KeyCode.RIGHT, FrameRef.standard(1, 1), KeyCode.R, PanelState.NOT_REACHABLE));
    for (Case c : cases) {
      shift(robot, c.arrow());
      assertThat(vm.selectedMember()).as("Shift+" + c.arrow()).isEqualTo(c.member());
      assertThat(vm.pictureProperty().get().selectedMember()).isEqualTo(c.member());
      robot.type(c.key());
      WaitForAsyncUtils.waitForFxEvents();
      MemoryRecorder.Row row = recorder.rows.get(recorder.rows.size() - 1);
      assertThat(row.member()).isEqualTo(c.member());
      assertThat(row.mark().state()).isEqualTo(c.state());
      assertThat(row.mark().memberFound()).isNull();
      assertThat(row.supersedes()).isNull();
      assertThat(vm.cursor()).as("diagonals only: back to the panel").isEqualTo(here);
      assertThat(vm.selectedMember()).isNull();
    }
    assertThat(vm.frameFindings()).containsOnly(
        Map.entry(FrameRef.ledger(1, 1), PanelState.MISSING),
        Map.entry(FrameRef.ledger(0, 1), PanelState.DAMAGED_EFFECTIVE),
        Map.entry(FrameRef.standard(1, 0), PanelState.DAMAGED_INEFFECTIVE),
        Map.entry(FrameRef.standard(1, 1), PanelState.NOT_REACHABLE));
    assertThat(vm.findings()).as("no diagonal recorded").isEmpty();
    assertThat(robot.lookup("#walk-progress").queryLabeled().getText())
        .isEqualTo("0 of 4 panels, 4 ledgers and standards marked (2 missing or beyond use)");
    assertThat(vm.pictureProperty().get().frameFindings()).hasSize(4);

    // undo corrects the newest, the standard on the right, back to no mark (taken as designed)
    robot.type(KeyCode.BACK_SPACE);
    WaitForAsyncUtils.waitForFxEvents();
    MemoryRecorder.Row undo = recorder.rows.get(recorder.rows.size() - 1);
    assertThat(undo.member()).isEqualTo(FrameRef.standard(1, 1));
    assertThat(undo.mark().state()).isEqualTo(PanelState.NOT_INSPECTED);
    assertThat(undo.supersedes()).isEqualTo(recorder.rows.get(3).id());
    assertThat(undo.reason()).isEqualTo(WalkViewModel.UNDO_REASON);
    assertThat(vm.frameFindings()).doesNotContainKey(FrameRef.standard(1, 1));
    assertThat(vm.selectedMember()).as("undo puts the cursor on the member").isEqualTo(FrameRef.standard(1, 1));

    // a second mark on a member corrects its first
    robot.type(KeyCode.ESCAPE);
    shift(robot, KeyCode.UP);
    robot.type(KeyCode.S);
    WaitForAsyncUtils.waitForFxEvents();
    MemoryRecorder.Row again = recorder.rows.get(recorder.rows.size() - 1);
    assertThat(again.member()).isEqualTo(FrameRef.ledger(1, 1));
    assertThat(again.supersedes()).isEqualTo(recorder.rows.get(0).id());
    assertThat(again.reason()).isEqualTo(WalkViewModel.REMARK_REASON);
  }

  @Test
  void aMemberMarkCarriesTheDetailsAndExtraFollowsTheDesign(FxRobot robot) {
    // the note by its mnemonic, then back to the plane with Enter
    robot.press(KeyCode.ALT).type(KeyCode.O).release(KeyCode.ALT);
    robot.write("bent at the coupler");
    robot.type(KeyCode.ENTER);
    robot.interact(() -> vm.bowMmProperty().set("12"));
    shift(robot, KeyCode.RIGHT);
    robot.type(KeyCode.D);
    WaitForAsyncUtils.waitForFxEvents();
    MemoryRecorder.Row row = recorder.rows.get(0);
    assertThat(row.member()).isEqualTo(FrameRef.standard(1, 1));
    assertThat(row.mark().note()).isEqualTo("bent at the coupler");
    assertThat(row.mark().bowMm()).isEqualTo(12.0);

    // E on a member the design has: refused, nothing recorded, the field says why
    shift(robot, KeyCode.LEFT);
    robot.type(KeyCode.E);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(recorder.rows).hasSize(1);
    assertThat(robot.lookup("#walk-error").queryLabeled().getText())
        .contains("standard of lift 1 on line 0 is in the design");

    // the ledger at level 2 over bay 2 is left out of the design: S records it as there, extra
    robot.type(KeyCode.ESCAPE);
    robot.interact(() -> vm.select(PanelRef.of(2, 2)));
    shift(robot, KeyCode.UP);
    robot.type(KeyCode.S);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(robot.lookup("#walk-error").queryLabeled().getText()).isEmpty();
    MemoryRecorder.Row extra = recorder.rows.get(recorder.rows.size() - 1);
    assertThat(extra.member()).isEqualTo(FrameRef.ledger(2, 2));
    assertThat(extra.mark().state()).isEqualTo(PanelState.EXTRA);
  }

  @Test
  void wTakesTheFrameIntoTheWalkOrderAndNWalksIt(FxRobot robot) {
    assertThat(vm.stops()).as("default: diagonals only").hasSize(4).allMatch(s -> s.side() == null);
    robot.type(KeyCode.W);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.frameInWalkProperty().get()).isTrue();
    // 4 panels and 12 frame members (3 levels x 2 bays of ledgers, 2 lifts x 3 lines of standards)
    assertThat(vm.stops()).hasSize(16);
    assertThat(vm.stops().stream().filter(s -> s.side() != null).map(WalkStop::member).distinct()).hasSize(12);
    // from the first panel's diagonals, N walks its sides: below, left, right, above
    robot.type(KeyCode.N);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.selectedMember()).isEqualTo(FrameRef.ledger(0, 1));
    robot.type(KeyCode.S);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(recorder.rows.get(0).member()).isEqualTo(FrameRef.ledger(0, 1));
    assertThat(vm.selectedMember()).as("in a frame walk a mark moves on").isEqualTo(FrameRef.standard(1, 0));
    assertThat(robot.lookup("#walk-progress").queryLabeled().getText()).isEqualTo("0 of 4 panels, 1 of 12 ledgers and standards");
    robot.type(KeyCode.W);
    WaitForAsyncUtils.waitForFxEvents();
    assertThat(vm.stops()).hasSize(4);
  }
}
