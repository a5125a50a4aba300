package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.DemoDatabase;
import org.bracewalk.ui.common.FakeDialogs;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The design editor's role choice: the role of a new plane; a stored plane keeps its own. */
class PlaneDesignSaverRoleTest {
  @TempDir Path dir;
  private AppServices services;

  @AfterEach
  void close() {
    services.close();
  }

  @Test
  void aNewPlaneFromAChangedGridTakesTheChosenRoleAndAStoredPlaneKeepsItsOwn() {
    services = DemoDatabase.withDemo(dir);
    PlaneRecord frame2 = services.sites().sites().stream()
        .flatMap(s -> services.sites().structures(s.id()).stream())
        .flatMap(st -> services.sites().planes(st.id()).stream())
        .filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
    assertThat(frame2.role()).isEqualTo(PlaneRole.UPRIGHT_FRAME);
    FakeDialogs dialogs = new FakeDialogs();
    PlaneDesignSaver saver = new PlaneDesignSaver(services.sites(), frame2, DemoDatabase.CLOCK, dialogs);
    assertThat(saver.role()).isEqualTo(PlaneRole.UPRIGHT_FRAME);

    // same grid, another role: refused by name (a stored plane's role is fixed), nothing saved
    PlaneDesign same = services.sites().currentDesign(frame2.id()).design();
    assertThatThrownBy(() -> saver.save(same, "Priya", "", PlaneRole.SPINE))
        .hasMessageContaining("plane 'frame 2' is stored as upright frame");

    // a changed grid becomes a new plane of the chosen role
    dialogs.textAnswers.push(Optional.of("frame 2 end bracing"));
    PlaneDesign changed = PlaneDesign.of(PlaneGrid.uniform(2, 1, Support.PINNED_BASE), Map.of());
    assertThat(saver.save(changed, "Priya", "", PlaneRole.PLAN_BRACING)).startsWith("new plane 'frame 2 end bracing'");
    PlaneRecord made = services.sites().planes(frame2.structureId()).stream()
        .filter(p -> p.name().equals("frame 2 end bracing")).findFirst().orElseThrow();
    assertThat(made.role()).isEqualTo(PlaneRole.PLAN_BRACING);
  }

  @Test
  void theNewPlanesNameIsAskedWhenPreparedAndNothingIsStoredUntilTheWorkRuns() {
    services = DemoDatabase.withDemo(dir);
    PlaneRecord frame2 = services.sites().sites().stream()
        .flatMap(s -> services.sites().structures(s.id()).stream())
        .flatMap(st -> services.sites().planes(st.id()).stream())
        .filter(p -> p.name().equals("frame 2")).findFirst().orElseThrow();
    FakeDialogs dialogs = new FakeDialogs();
    PlaneDesignSaver saver = new PlaneDesignSaver(services.sites(), frame2, DemoDatabase.CLOCK, dialogs);
    int planes = services.sites().planes(frame2.structureId()).size();
    dialogs.textAnswers.push(Optional.of("frame 2 top"));
    PlaneDesign changed = PlaneDesign.of(PlaneGrid.uniform(2, 1, Support.PINNED_BASE), Map.of());
    // the dialog is answered on the calling (toolkit) thread; the work only stores
    var work = saver.prepare(changed, "Priya", "", PlaneRole.UPRIGHT_FRAME);
    assertThat(dialogs.textAnswers).isEmpty();
    assertThat(services.sites().planes(frame2.structureId())).hasSize(planes);
    assertThat(work.get()).startsWith("new plane 'frame 2 top'");
    assertThat(services.sites().planes(frame2.structureId())).hasSize(planes + 1);
  }
}
