package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.common.FakeDialogs;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The design editor over the demo site: after a save as a new plane it edits that plane (its name,
 * the next save its next revision); a cancelled name is no error; the safe choice is the default
 * of every risky question; leaving with unsaved changes asks.
 */
class DesignSaveAndLeaveTest {
  @TempDir Path dir;
  private AppServices services;
  private final FakeDialogs dialogs = new FakeDialogs();

  @AfterEach
  void close() {
    services.close();
  }

  private DesignViewModel editorOfTheFacade() {
    services = DemoDatabase.withDemo(dir);
    PlaneRecord facade = DemoWalk.facade(services);
    DesignRevision rev = services.sites().currentDesign(facade.id());
    return new DesignViewModel(rev.design(), facade.name() + " (revision " + rev.number() + ")",
        PlaneAnalyzer.standard(), new PlaneDesignSaver(services.sites(), facade, rev.number(), DemoDatabase.CLOCK,
            dialogs), dialogs, Runnable::run, Runnable::run);
  }

  private int planesOfTheScaffold() {
    return services.sites().planes(DemoWalk.scaffold(services).id()).size();
  }

  @Test
  void afterASaveAsANewPlaneTheEditorNamesItAndTheNextSaveIsItsNextRevision() {
    DesignViewModel vm = editorOfTheFacade();
    PlaneRecord facade = DemoWalk.facade(services);
    assertThat(vm.title()).isEqualTo("north facade (revision 1)");
    int planes = planesOfTheScaffold();
    vm.baysProperty().set(vm.baysProperty().get() + 1);
    assertThat(vm.applyGrid()).isTrue();
    vm.fillEveryPanel(); // holds its shape: no question before saving
    dialogs.textAnswers.add(Optional.of("north facade extended"));
    assertThat(vm.save()).isTrue();
    assertThat(vm.statusProperty().get()).isEqualTo("Saved as new plane 'north facade extended', revision 1.");
    assertThat(vm.title()).isEqualTo("north facade extended (revision 1)");
    assertThat(vm.planeIdProperty().get()).isNotEqualTo(facade.id()).isPositive();
    assertThat(vm.dirtyProperty().get()).isFalse();
    assertThat(planesOfTheScaffold()).isEqualTo(planes + 1);

    // the next save, on the same grid, is the new plane's revision 2: no name asked, no third plane
    int askedBefore = dialogs.asked.size();
    vm.setBrace(null);
    assertThat(vm.save()).isTrue();
    assertThat(dialogs.asked).hasSize(askedBefore);
    assertThat(vm.statusProperty().get()).isEqualTo("Saved as revision 2 of plane 'north facade extended'.");
    assertThat(vm.title()).isEqualTo("north facade extended (revision 2)");
    assertThat(planesOfTheScaffold()).isEqualTo(planes + 1);
    assertThat(services.sites().currentDesign(vm.planeIdProperty().get()).number()).isEqualTo(2);
    assertThat(services.sites().currentDesign(facade.id()).number()).isEqualTo(1);
  }

  @Test
  void cancellingTheNewPlanesNameSavesNothingAndIsNoError() {
    DesignViewModel vm = editorOfTheFacade();
    int planes = planesOfTheScaffold();
    vm.baysProperty().set(vm.baysProperty().get() + 1);
    assertThat(vm.applyGrid()).isTrue();
    vm.fillEveryPanel();
    assertThat(vm.save()).isFalse(); // the name box is cancelled (no answer)
    assertThat(vm.statusProperty().get()).isEqualTo("Not saved: no name given for the new plane.");
    assertThat(vm.errorProperty().get()).isEmpty();
    assertThat(dialogs.errors).isEmpty();
    assertThat(vm.dirtyProperty().get()).isTrue();
    assertThat(planesOfTheScaffold()).isEqualTo(planes);
  }

  @Test
  void aDesignThatSwaysIsSavedOnlyByTheNonDefaultChoice() {
    DesignViewModel vm = editorOfTheFacade();
    vm.clearBraces(); // a pinned base with no braces sways
    assertThat(vm.save()).isFalse();
    assertThat(dialogs.asked).singleElement().asString()
        .startsWith("This design does not hold its shape").endsWith("[Save anyway / default: Do not save]");
    assertThat(vm.statusProperty().get()).isEqualTo("Not saved.");
    assertThat(services.sites().currentDesign(DemoWalk.facade(services).id()).number()).isEqualTo(1);
  }

  @Test
  void leavingWithUnsavedChangesAsksAndStayingIsTheDefault() {
    DesignViewModel vm = editorOfTheFacade();
    assertThat(vm.mayLeave()).isTrue(); // nothing changed: nothing asked
    assertThat(dialogs.asked).isEmpty();
    vm.setBrace(null);
    assertThat(vm.mayLeave()).isFalse(); // no answer: the default, stay
    assertThat(dialogs.asked).singleElement().asString()
        .startsWith("The design has unsaved changes").endsWith("[Leave without saving / default: Stay]");
    dialogs.confirmAnswers.add(true);
    assertThat(vm.mayLeave()).isTrue();
  }

  @Test
  void aPlainEditorWithoutAStoredPlaneKeepsItsTitle() {
    services = DemoDatabase.empty(dir);
    DesignViewModel vm = new DesignViewModel(PlaneDesign.of(PlaneGrid.uniform(1, 1, Support.PINNED_BASE), Map.of()),
        "sketch", PlaneAnalyzer.standard(), (d, a, n) -> "revision 1", dialogs, Runnable::run, Runnable::run);
    vm.setBrace(org.bracewalk.core.model.Diagonal.RISING);
    assertThat(vm.save()).isTrue();
    assertThat(vm.title()).isEqualTo("sketch");
  }
}
