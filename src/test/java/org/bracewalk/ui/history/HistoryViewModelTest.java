package org.bracewalk.ui.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.DemoDatabase;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HistoryViewModelTest {
  @TempDir Path dir;
  private AppServices services;

  @AfterEach
  void close() {
    services.close();
  }

  private PlaneRecord plane(String name) {
    return services.sites().sites().stream()
        .flatMap(s -> services.sites().structures(s.id()).stream())
        .flatMap(st -> services.sites().planes(st.id()).stream())
        .filter(p -> p.name().equals(name))
        .findFirst()
        .orElseThrow();
  }

  @Test
  void theLatestInspectionIsDrawnWithThePanelsThatChangedMarked() {
    services = DemoDatabase.withDemo(dir);
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(), Runnable::run, Runnable::run, plane("frame 2").id());
    assertThat(vm.entries()).hasSize(2);
    assertThat(vm.chosenProperty().get()).isEqualTo(1);
    assertThat(vm.timelineProperty().get()).isEqualTo("\u25A0 #1  \u2192  \u25B2 #2");
    var changed = vm.pictureProperty().get().changed();
    assertThat(changed).isNotEmpty();
    // one line per panel and per frame member that changed
    assertThat(vm.changes())
        .hasSize(changed.size() + vm.pictureProperty().get().changedMembers().size())
        .allMatch(s -> s.contains("\u2192"));
    vm.older();
    assertThat(vm.pictureProperty().get().changed()).isEmpty();
    assertThat(vm.changes()).containsExactly("The first inspection of this plane: nothing to compare with.");
  }

  @Test
  void aPlaneNeverInspectedSaysSo() {
    services = DemoDatabase.withDemo(dir);
    // every plane of the demo is inspected: a plane added to the racking run after its inspections
    PlaneRecord frame2 = plane("frame 2");
    services.sites().createPlane(new PlaneRecord(0, frame2.structureId(), "west return",
        frame2.grid()), "Ines Carrow", java.time.LocalDate.of(2025, 3, 15), "",
        services.sites().currentDesign(frame2.id()).design());
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(), Runnable::run, Runnable::run, plane("west return").id());
    assertThat(vm.entries()).isEmpty();
    assertThat(vm.timelineProperty().get()).isEqualTo("No inspections yet.");
    assertThat(vm.headingProperty().get()).contains("not inspected yet");
  }

  @Test
  void theHistoryIsReadOnTheBackgroundExecutorAndShownThroughTheUiOne() {
    services = DemoDatabase.withDemo(dir);
    java.util.List<Runnable> background = new java.util.ArrayList<>();
    java.util.List<Runnable> ui = new java.util.ArrayList<>();
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(), ui::add, background::add,
        plane("frame 2").id());
    // nothing read on the calling (toolkit) thread: the view shows that it is being read
    assertThat(vm.entries()).isEmpty();
    assertThat(vm.headingProperty().get()).contains("Reading the history");
    assertThat(background).hasSize(1);
    background.remove(0).run();
    assertThat(vm.entries()).isEmpty(); // the result waits for the UI executor
    assertThat(ui).hasSize(1);
    ui.remove(0).run();
    assertThat(vm.entries()).hasSize(2);
    assertThat(vm.planeNameProperty().get()).isEqualTo("frame 2");
  }

  @Test
  void aHistoryThatCannotBeReadSaysSoNamingThePlane() {
    services = DemoDatabase.withDemo(dir);
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(), Runnable::run, Runnable::run,
        987654L);
    assertThat(vm.entries()).isEmpty();
    assertThat(vm.headingProperty().get()).contains("plane 987654 could not be read");
  }
}
