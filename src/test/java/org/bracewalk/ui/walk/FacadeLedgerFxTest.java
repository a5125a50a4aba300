package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.scene.Scene;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
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
 * Issue 11's "done when", in the walk-round: on the demo facade, every panel found sound, the
 * inspector marks a ledger missing by keys and the verdict names the standard that lost its
 * sideways restraint; the mark is in the record as an observation of that ledger.
 */
@ExtendWith(ApplicationExtension.class)
class FacadeLedgerFxTest {
  @TempDir static Path dir;
  private final ExecutorService background = Executors.newSingleThreadExecutor();
  private AppServices services;
  private WalkViewModel vm;
  private long inspectionId;
  private PlaneRecord facade;
  private FrameRef ledger;

  @Start
  void start(Stage stage) {
    services = DemoDatabase.withDemo(dir);
    Structure st = DemoWalk.scaffold(services);
    facade = DemoWalk.facade(services);
    Inspection insp = services.inspections().start(st.id(), new NewInspection("Rowan Test", "Scaffold inspector",
        "Rowan Test", "day shift", null, InspectionReason.ROUTINE, null, null));
    inspectionId = insp.id();
    DesignRevision rev = services.inspections().designInForce(insp.id(), facade.id());
    PlaneDesign design = rev.design();
    for (PanelRef p : org.bracewalk.ui.walk.WalkOrder.LIFTS_LEFT_TO_RIGHT.sequence(facade.grid())) {
      services.inspections().recordObservation(insp.id(), NewObservation.of(facade.id(), p, PanelState.SOUND, "Rowan Test"));
    }
    // the ledger over bay 1 at the lowest level whose left joint no diagonal reaches: taking it
    // away leaves the standard on line 0 running straight through that joint (analysis.md, example A)
    for (int level = 1; level < facade.grid().lifts() && ledger == null; level++) {
      if (!touches(design.braceAt(PanelRef.of(level, 1)), true) && !touches(design.braceAt(PanelRef.of(level + 1, 1)), false)) {
        ledger = FrameRef.ledger(level, 1);
      }
    }
    assertThat(ledger).as("the demo facade has such a ledger").isNotNull();
    vm = new WalkViewModel(design, st.name() + ", " + facade.name(), facade.role(),
        InspectionMarkRecorder.existing(services.inspections(), insp.id(), facade.id()),
        new InspectionMarkRecorder(services.inspections(), insp.id(), facade.id(), "Rowan Test"),
        PlaneAnalyzer.standard(), new FakeDialogs(), false, false, DemoDatabase.CLOCK, new FxExecutor(), background);
    WalkView view = new WalkView(vm);
    Scene scene = new Scene(view, 1280, 800);
    Stylesheet.apply(scene);
    stage.setScene(scene);
    stage.show();
    view.focusPlane();
  }

  /** Whether a diagonal in the panel has an end at its top-left ({@code top}) or bottom-left corner. */
  private static boolean touches(Brace b, boolean top) {
    if (b == null) {
      return false;
    }
    return switch (b.diagonal()) {
      case BOTH -> true;
      case RISING -> !top; // bottom-left to top-right
      case FALLING -> top; // top-left to bottom-right
    };
  }

  @AfterEach
  void close() throws Exception {
    background.shutdown();
    background.awaitTermination(30, TimeUnit.SECONDS);
    services.close();
  }

  private void settle() throws Exception {
    WaitForAsyncUtils.waitForFxEvents();
    background.submit(() -> { }).get(30, TimeUnit.SECONDS);
    WaitForAsyncUtils.waitForFxEvents();
  }

  @Test
  void markingALedgerMissingByKeysNamesTheStandardThatLostItsSidewaysRestraint(FxRobot robot) throws Exception {
    settle();
    assertThat(vm.verdict().kind()).as("every panel sound").isEqualTo(VerdictKind.HOLDS);
    robot.interact(() -> vm.select(PanelRef.of(ledger.first(), 1)));
    robot.press(KeyCode.SHIFT).type(KeyCode.UP).release(KeyCode.SHIFT);
    assertThat(vm.selectedMember()).isEqualTo(ledger);
    robot.type(KeyCode.M);
    settle();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST_RESTRAINT);
    assertThat(robot.lookup("#walk-verdict").queryAs(javafx.scene.Parent.class).lookupAll(".label").stream()
        .map(n -> ((javafx.scene.control.Labeled) n).getText()).reduce("", String::concat))
        .contains("Standard on line 0 runs unrestrained through level " + ledger.first());
    assertThat(vm.pictureProperty().get().jointsOf(FreedomKind.LOST_RESTRAINT)).containsExactly(new Joint(ledger.first(), 0));
    Map<FrameRef, Observation> stored = services.inspections().latestFrameObservations(inspectionId, facade.id());
    assertThat(stored).containsOnlyKeys(ledger);
    assertThat(stored.get(ledger).state()).isEqualTo(PanelState.MISSING);
    assertThat(stored.get(ledger).panel()).isNull();
    List<RecordedMark> reopened = InspectionMarkRecorder.existing(services.inspections(), inspectionId, facade.id());
    assertThat(reopened).filteredOn(RecordedMark::onFrame).singleElement()
        .satisfies(r -> assertThat(r.member()).isEqualTo(ledger));
  }
}
