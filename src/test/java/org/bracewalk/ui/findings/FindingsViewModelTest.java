package org.bracewalk.ui.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FindingsViewModelTest {
  @TempDir Path dir;
  private AppServices services;
  private final FakeDialogs dialogs = new FakeDialogs();
  private final List<Runnable> queued = new ArrayList<>();
  private final Executor background = queued::add;
  private final Executor ui = Runnable::run;
  private final List<String> issued = new ArrayList<>();
  private PlaneRecord facade;
  private Inspection walk;

  private final ReportIssuer issuer =
      new ReportIssuer() {
        @Override
        public String issueReport(long id, Path out, Consumer<Progress> progress) {
          progress.accept(new Progress(0.5, "drawing"));
          issued.add("report " + id + " " + out.getFileName());
          return "issued " + out.getFileName();
        }

        @Override
        public String issueRepairOrder(long id, Path out, Consumer<Progress> progress) {
          throw new IllegalStateException("template repair-order.en.properties: key 'title' missing");
        }
      };

  @BeforeEach
  void walk() {
    services = DemoDatabase.withDemo(dir);
    facade = DemoWalk.facade(services);
    walk = DemoWalk.record(services, 50);
  }

  @AfterEach
  void close() {
    services.close();
  }

  /** A view model whose findings are loaded (the load run off the caller's turn, as the app does). */
  private FindingsViewModel vm() {
    FindingsViewModel vm = new FindingsViewModel(services.sites(), services.inspections(), services.analysis(),
        PlaneAnalyzer.standard(), issuer, dialogs, ui, background, walk.id(), facade.id());
    assertThat(queued).as("nothing read while constructing").isEmpty();
    vm.load();
    assertThat(vm.verdictProperty().get()).as("nothing read on the caller's turn").isNull();
    runQueued();
    return vm;
  }

  /** Runs the background work queued so far, and what it queues in turn. */
  private void runQueued() {
    while (!queued.isEmpty()) {
      queued.remove(0).run();
    }
  }

  @Test
  void theLostFacadeShowsOneDesignBraceInLiftThreeAsTheRepair() {
    FindingsViewModel vm = vm();
    assertThat(vm.verdictProperty().get().kind()).isEqualTo(VerdictKind.LOST);
    // lift 3 has lost all three of its braces: one degree of freedom, so one brace restores it
    assertThat(vm.pictureProperty().get().repair()).singleElement().satisfies(r -> {
      assertThat(r.panel().lift()).isEqualTo(3);
      assertThat(r.inDesign()).isTrue();
    });
    assertThat(vm.repairLines()).singleElement().asString().startsWith("1.  lift 3, bay").contains("restores the design");
    assertThat(vm.restoreLines()).hasSize(3).allMatch(s -> s.startsWith("lift 3,"));
    assertThat(vm.restoreLines()).filteredOn(s -> s.contains("needed for rigidity")).hasSize(1);
    assertThat(vm.findingLines()).anyMatch(s -> s.startsWith("lift 3, bay 6: damaged beyond use"));
    assertThat(vm.planes()).extracting(FindingsViewModel.PlaneChoice::name).contains("north facade", "east end frame");
    // each with its progress and verdict where it is chosen (issue 12, item 5)
    assertThat(vm.planes()).extracting(Object::toString).anyMatch(t -> t.contains("east end frame \u2014 0 of 5 panels \u2014 "
        + VerdictKind.NOT_INSPECTED.words()));
  }

  @Test
  void theReportIsMadeOffTheUiThreadAndReportsItsProgress() {
    FindingsViewModel vm = vm();
    dialogs.saveAnswers.push(Optional.of(dir.resolve("r.pdf")));
    assertThat(vm.issueReport()).isTrue();
    assertThat(vm.busyProperty().get()).isTrue();
    assertThat(issued).isEmpty(); // nothing has run yet: it waits on the background executor
    queued.remove(0).run();
    assertThat(issued).containsExactly("report " + walk.id() + " r.pdf");
    assertThat(vm.busyProperty().get()).isFalse();
    assertThat(vm.statusProperty().get()).isEqualTo("issued r.pdf");
  }

  @Test
  void aFailedDocumentSaysWhyAndLeavesTheScreenUsable() {
    FindingsViewModel vm = vm();
    dialogs.saveAnswers.push(Optional.of(dir.resolve("o.pdf")));
    vm.issueRepairOrder();
    queued.remove(0).run();
    assertThat(vm.errorProperty().get()).contains("Repair order not issued").contains("repair-order.en.properties");
    assertThat(dialogs.errors).hasSize(1);
    assertThat(vm.busyProperty().get()).isFalse();
  }

  @Test
  void cancellingTheSaveQuestionIssuesNothing() {
    FindingsViewModel vm = vm();
    assertThat(vm.issueReport()).isFalse();
    assertThat(queued).isEmpty();
  }

  @Test
  void finalisingAsksNamesThePanelsNotInspectedAndMakesTheInspectionReadOnly() {
    FindingsViewModel vm = vm();
    dialogs.confirmAnswers.push(false);
    assertThat(vm.finaliseInspection()).isTrue();
    assertThat(dialogs.asked).as("the gaps are counted off the caller's turn first").isEmpty();
    runQueued();
    assertThat(services.inspections().inspection(walk.id()).isFinalised()).isFalse();
    assertThat(dialogs.asked.get(0)).contains("plane 'east end frame': 5 of 5 panels nobody has looked at");
    dialogs.confirmAnswers.push(true);
    assertThat(vm.finaliseInspection()).isTrue();
    runQueued();
    assertThat(vm.finalisedProperty().get()).isTrue();
    assertThat(vm.statusProperty().get()).contains("finalised");
    assertThat(services.inspections().inspection(walk.id()).isFinalised()).isTrue();
    assertThat(vm.finaliseInspection()).isFalse();
  }
}
