package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.Test;

class DesignViewModelTest {
  private final FakeDialogs dialogs = new FakeDialogs();
  private final List<PlaneDesign> saved = new ArrayList<>();
  private final List<String> notes = new ArrayList<>();
  private final DesignSaver saver =
      (d, author, note) -> {
        saved.add(d);
        notes.add(note);
        return "revision " + saved.size();
      };

  private DesignViewModel editor(PlaneDesign d) {
    return new DesignViewModel(d, "Test plane", PlaneAnalyzer.standard(), saver, dialogs, Runnable::run, Runnable::run);
  }

  @Test
  void aFreeTwoByTwoPlaneWithBothBracesInOneLiftHasOneFreedomAndNeedsOneMoreBrace() {
    // Bolker & Crapo (1979): a free 2x2 plane with two diagonals in one lift has 1 freedom,
    // and a minimal bracing has m + n - 1 = 3 diagonals
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(2, 2, Support.FREE), Map.of()));
    vm.setBrace(Diagonal.RISING);
    vm.move(0, 1);
    vm.setBrace(Diagonal.FALLING);
    assertThat(vm.verdictKindProperty().get()).isEqualTo(VerdictKind.LOST);
    assertThat(vm.verdictTextProperty().get()).contains("1 independent motion").contains("1 more brace");
    assertThat(vm.pictureProperty().get().repair()).hasSize(1);
    vm.move(1, 0);
    vm.setBrace(Diagonal.RISING);
    assertThat(vm.verdictKindProperty().get()).isEqualTo(VerdictKind.HOLDS);
    assertThat(vm.toleranceTextProperty().get()).contains("Loss tolerance: 0").contains("3 critical");
  }

  @Test
  void clickingAPanelCyclesThroughTheDiagonalsAndAnOpening() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(2, 3, Support.PINNED_BASE), Map.of()));
    PanelRef p = PanelRef.of(2, 3);
    vm.cycle(p);
    assertThat(vm.design().braceAt(p)).isEqualTo(Brace.rigid(Diagonal.RISING));
    vm.cycle(p);
    assertThat(vm.design().braceAt(p).diagonal()).isEqualTo(Diagonal.FALLING);
    vm.cycle(p);
    assertThat(vm.design().braceAt(p).diagonal()).isEqualTo(Diagonal.BOTH);
    vm.cycle(p);
    assertThat(vm.design().isOpening(p)).isTrue();
    assertThat(vm.design().braceAt(p)).isNull();
    vm.cycle(p);
    assertThat(vm.design().isOpening(p)).isFalse();
    assertThat(vm.cursor()).isEqualTo(p);
  }

  @Test
  void theKindToggleMakesTheCursorBraceTensionOnly() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(1, 1, Support.PINNED_BASE), Map.of()));
    vm.setBrace(Diagonal.RISING);
    vm.toggleKind();
    assertThat(vm.design().braceAt(PanelRef.of(1, 1)).kind()).isEqualTo(MemberKind.TENSION_ONLY);
    // one tension-only diagonal stops a panel leaning one way only (Baglivo & Graver 1983)
    assertThat(vm.analysis().design().rigid()).isFalse();
  }

  @Test
  void savingADesignThatIsNotRigidAsksFirstAndSavesNothingWhenDeclined() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(3, 3, Support.PINNED_BASE), Map.of()));
    dialogs.confirmAnswers.push(false);
    assertThat(vm.save()).isFalse();
    assertThat(saved).isEmpty();
    assertThat(dialogs.asked).singleElement().asString().startsWith("This design does not hold its shape");
    // the warning carries the verdict's own sentence, whole and without the verdict's symbol
    assertThat(dialogs.asked.get(0))
        .contains("as designed can sway: As designed, the plane does NOT hold its shape: ")
        .doesNotContain(VerdictKind.LOST.symbol());
    dialogs.confirmAnswers.push(true);
    assertThat(vm.save()).isTrue();
    assertThat(notes.get(0)).contains("warning acknowledged");
  }

  @Test
  void savingARigidDesignDoesNotAsk() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(3, 6, Support.PINNED_BASE), Map.of()));
    vm.fillStepProperty().set(5);
    assertThat(vm.fillZigZag()).isTrue();
    assertThat(vm.save()).isTrue();
    assertThat(dialogs.asked).isEmpty();
    assertThat(vm.statusProperty().get()).isEqualTo("Saved as revision 1.");
    assertThat(vm.dirtyProperty().get()).isFalse();
  }

  @Test
  void aBadWidthChangesNothingAndNamesTheValue() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(2, 3, Support.PINNED_BASE), Map.of()));
    PlaneDesign before = vm.design();
    vm.widthsProperty().set("2.4 2,4 x");
    vm.baysProperty().set(3);
    assertThat(vm.applyGrid()).isFalse();
    assertThat(vm.errorProperty().get()).isEqualTo("Widths: value 3 'x' is not a number of metres (such as 2.4).");
    assertThat(vm.design()).isSameAs(before);
  }

  @Test
  void growingTheGridKeepsBracesAndRepeatsTheLastSize() {
    DesignViewModel vm = editor(PlaneDesign.of(PlaneGrid.uniform(2, 2, Support.PINNED_BASE), Map.of()));
    vm.setBrace(Diagonal.RISING);
    vm.widthsProperty().set("2.4 1.8");
    vm.baysProperty().set(4);
    assertThat(vm.applyGrid()).isTrue();
    assertThat(vm.design().grid().bayWidths()).containsExactly(2.4, 1.8, 1.8, 1.8);
    assertThat(vm.design().braceAt(PanelRef.of(1, 1))).isNotNull();
    vm.baysProperty().set(1);
    vm.liftsProperty().set(1);
    vm.widthsProperty().set("2.4");
    assertThat(vm.applyGrid()).isTrue();
    assertThat(vm.cursor()).isEqualTo(PanelRef.of(1, 1));
  }

  @Test
  void savingRunsOnTheBackgroundExecutorAndReportsThroughTheUiOne() {
    List<Runnable> background = new ArrayList<>();
    List<Runnable> ui = new ArrayList<>();
    DesignViewModel vm = new DesignViewModel(PlaneDesign.of(PlaneGrid.uniform(3, 6, Support.PINNED_BASE), Map.of()),
        "Test plane", PlaneAnalyzer.standard(), saver, dialogs, ui::add, background::add);
    vm.fillStepProperty().set(5);
    assertThat(vm.fillZigZag()).isTrue();
    assertThat(vm.save()).isTrue();
    // nothing stored on the calling (toolkit) thread; a second save waits for the first
    assertThat(saved).isEmpty();
    assertThat(vm.statusProperty().get()).startsWith("Saving the design");
    assertThat(vm.save()).isFalse();
    assertThat(vm.statusProperty().get()).startsWith("Still saving");
    assertThat(background).hasSize(1);
    background.remove(0).run();
    assertThat(saved).hasSize(1);
    assertThat(vm.dirtyProperty().get()).isTrue(); // not yet told
    ui.remove(0).run();
    assertThat(vm.statusProperty().get()).isEqualTo("Saved as revision 1.");
    assertThat(vm.dirtyProperty().get()).isFalse();
  }

  @Test
  void aSaveThatFailsOnTheBackgroundSaysWhyAndKeepsTheEdits() {
    DesignSaver failing = (d, author, note) -> {
      throw new IllegalStateException("the database is locked by another program");
    };
    DesignViewModel vm = new DesignViewModel(PlaneDesign.of(PlaneGrid.uniform(3, 6, Support.PINNED_BASE), Map.of()),
        "Test plane", PlaneAnalyzer.standard(), failing, dialogs, Runnable::run, Runnable::run);
    vm.fillStepProperty().set(5);
    assertThat(vm.fillZigZag()).isTrue();
    vm.save();
    assertThat(vm.errorProperty().get()).isEqualTo("Design not saved: the database is locked by another program");
    assertThat(vm.dirtyProperty().get()).isTrue();
    // and another save may be tried
    assertThat(vm.save()).isTrue();
  }
}
