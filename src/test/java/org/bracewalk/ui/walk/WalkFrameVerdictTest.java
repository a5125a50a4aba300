package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.PanelSide;
import org.junit.jupiter.api.Test;

/**
 * The live verdict with frame members marked, on the examples of {@code shared/design/analysis.md},
 * "Frame members" (each value there computed from the rigidity matrix with exact rank): the verdict
 * counts the freedom, names its kind in the verdict's words, and the picture marks it.
 */
class WalkFrameVerdictTest {
  private final MemoryRecorder recorder = new MemoryRecorder();

  private WalkViewModel walk(PlaneGrid grid, Map<PanelRef, Brace> braces) {
    return new WalkViewModel(PlaneDesign.of(grid, braces), "Example", List.of(), recorder, PlaneAnalyzer.standard(),
        new FakeDialogs(), false, false, java.time.Clock.systemUTC(), Runnable::run, Runnable::run);
  }

  private static void markAllSound(WalkViewModel vm) {
    for (int k = 0; k < vm.total(); k++) {
      assertThat(vm.mark(PanelState.SOUND)).isTrue();
    }
  }

  private static void markSide(WalkViewModel vm, PanelRef p, PanelSide side, PanelState state) {
    vm.select(p);
    vm.selectSide(side);
    assertThat(vm.mark(state)).as(vm.errorProperty().get()).isTrue();
  }

  @Test
  void exampleA_aLedgerMissingLeavesTheStandardWithoutSidewaysRestraint() {
    // analysis.md example A: 3 lifts x 1 bay, /, \, / (lift 1 first), ledger at level 1 missing:
    // 1 freedom, joint (1, 0) only, where the standards meet in a straight line
    WalkViewModel vm = walk(PlaneGrid.uniform(3, 1, Support.PINNED_BASE), Map.of(
        PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), PanelRef.of(2, 1), Brace.rigid(Diagonal.FALLING),
        PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING)));
    markAllSound(vm);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.HOLDS);
    markSide(vm, PanelRef.of(1, 1), PanelSide.LEDGER_ABOVE, PanelState.MISSING);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST_RESTRAINT);
    assertThat(vm.verdict().verdict().degreesOfFreedom()).isEqualTo(1);
    assertThat(vm.alarmProperty().get()).contains("LOST SIDEWAYS RESTRAINT").contains("have an engineer check");
    assertThat(vm.verdict().detail())
        .contains("Standard on line 0 runs unrestrained through level 1")
        .contains("ledger at level 1, bay 1 not there")
        .contains("an engineer checks it before loading");
    List<Freedom> drawn = vm.pictureProperty().get().freedoms();
    assertThat(drawn).singleElement().satisfies(f -> {
      assertThat(f.kind()).isEqualTo(FreedomKind.LOST_RESTRAINT);
      assertThat(f.joints()).containsExactly(new Joint(1, 0));
    });
    assertThat(vm.pictureProperty().get().jointsOf(FreedomKind.LOST_RESTRAINT)).containsExactly(new Joint(1, 0));
    // undo: the ledger is back as designed, and so is the verdict
    assertThat(vm.undo()).isTrue();
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.HOLDS);
    assertThat(vm.pictureProperty().get().freedoms()).isEmpty();
  }

  @Test
  void exampleG_aLedgerMissingAtTheEndLeavesALooseEnd() {
    // analysis.md example G: 1 lift x 3 bays, bay 1 /, ledger at level 1, bay 3 missing: 1 freedom,
    // joint (1, 3): the right-hand standard's top is held by nothing
    WalkViewModel vm = walk(PlaneGrid.uniform(1, 3, Support.PINNED_BASE), Map.of(
        PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING)));
    markAllSound(vm);
    markSide(vm, PanelRef.of(1, 3), PanelSide.LEDGER_ABOVE, PanelState.MISSING);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.LOST);
    assertThat(vm.verdict().verdict().degreesOfFreedom()).isEqualTo(1);
    assertThat(vm.pictureProperty().get().jointsOf(FreedomKind.LOOSE_END)).containsExactly(new Joint(1, 3));
    assertThat(vm.verdict().detail()).contains("oose end at level 1, line 3: the standard of lift 1 on line 3");
  }

  @Test
  void exampleI_bothStandardsOfALiftGoneLetTheLiftsAboveSway() {
    // analysis.md example I: 4 lifts x 1 bay, / in every lift, both standards of lift 2 missing:
    // 2 freedoms, every joint from level 2 up moves (lifts 2-4 sway)
    Map<PanelRef, Brace> braces = new java.util.HashMap<>();
    for (int i = 1; i <= 4; i++) {
      braces.put(PanelRef.of(i, 1), Brace.rigid(Diagonal.RISING));
    }
    WalkViewModel vm = walk(PlaneGrid.uniform(4, 1, Support.PINNED_BASE), braces);
    markAllSound(vm);
    markSide(vm, PanelRef.of(2, 1), PanelSide.STANDARD_LEFT, PanelState.MISSING);
    markSide(vm, PanelRef.of(2, 1), PanelSide.STANDARD_RIGHT, PanelState.DAMAGED_INEFFECTIVE);
    assertThat(vm.frameFindings()).containsOnlyKeys(FrameRef.standard(2, 0), FrameRef.standard(2, 1));
    assertThat(vm.verdict().verdict().degreesOfFreedom()).isEqualTo(2);
    assertThat(vm.pictureProperty().get().sway().shearing())
        .containsExactly(PanelRef.of(2, 1), PanelRef.of(3, 1), PanelRef.of(4, 1));
    assertThat(vm.progressTextProperty().get()).contains("2 ledgers and standards marked (2 missing or beyond use)");
  }

  @Test
  void aStandardNotReachableMakesTheVerdictDependOnIt() {
    // example A again, the ledger only not reachable: with it as designed the plane holds, with it
    // gone it does not, so the verdict depends on what is not yet seen
    WalkViewModel vm = walk(PlaneGrid.uniform(3, 1, Support.PINNED_BASE), Map.of(
        PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), PanelRef.of(2, 1), Brace.rigid(Diagonal.FALLING),
        PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING)));
    markAllSound(vm);
    markSide(vm, PanelRef.of(1, 1), PanelSide.LEDGER_ABOVE, PanelState.NOT_REACHABLE);
    assertThat(vm.verdict().kind()).isEqualTo(VerdictKind.DEPENDS_ON_UNSEEN);
  }
}
