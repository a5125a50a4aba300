package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.FakeDialogs;
import org.junit.jupiter.api.Test;

/** The design editor refuses a grid larger than the one limit of a stored plane, naming it. */
class DesignGridLimitTest {
  private DesignViewModel editor() {
    return new DesignViewModel(PlaneDesign.of(PlaneGrid.uniform(2, 3, Support.PINNED_BASE), Map.of()),
        "frame 9", PlaneAnalyzer.standard(), (d, a, n) -> "revision 1", new FakeDialogs(),
        Runnable::run, Runnable::run);
  }

  @Test
  void aTypoSizedGridIsRefusedNamingTheFieldAndTheLimitAndNothingChanges() {
    DesignViewModel vm = editor();
    PlaneDesign before = vm.design();
    vm.liftsProperty().set(100000);
    vm.baysProperty().set(100000);
    assertThat(vm.applyGrid()).isFalse();
    assertThat(vm.errorProperty().get()).isEqualTo("Lifts: plane 'frame 9': 100000 lifts x 100000"
        + " bays is larger than the limit of 100 lifts x 500 bays a stored plane may have.");
    vm.liftsProperty().set(2);
    vm.baysProperty().set(2_000_000_000);
    assertThat(vm.applyGrid()).isFalse();
    assertThat(vm.errorProperty().get()).startsWith("Bays: plane 'frame 9': 2 lifts x 2000000000 bays");
    assertThat(vm.design()).isSameAs(before);
  }

  @Test
  void theLimitItselfIsAccepted() {
    DesignViewModel vm = editor();
    vm.liftsProperty().set(100);
    vm.baysProperty().set(500);
    assertThat(vm.applyGrid()).as(vm.errorProperty().get()).isTrue();
    assertThat(vm.design().grid().panelCount()).isEqualTo(50_000);
  }
}
