package org.bracewalk.ui.walk;

import static org.assertj.core.api.Assertions.assertThat;

import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class WalkOrderTest {
  private final PlaneGrid grid = PlaneGrid.uniform(3, 2, Support.PINNED_BASE);

  @Test
  void bayByBayGoesUpOneBayAndDownTheNext() {
    assertThat(WalkOrder.BAYS_UP_AND_DOWN.sequence(grid))
        .containsExactly(
            PanelRef.of(1, 1), PanelRef.of(2, 1), PanelRef.of(3, 1),
            PanelRef.of(3, 2), PanelRef.of(2, 2), PanelRef.of(1, 2));
  }

  @Test
  void liftByLiftGoesAlongAndBack() {
    assertThat(WalkOrder.LIFTS_THERE_AND_BACK.sequence(grid))
        .containsExactly(
            PanelRef.of(1, 1), PanelRef.of(1, 2), PanelRef.of(2, 2),
            PanelRef.of(2, 1), PanelRef.of(3, 1), PanelRef.of(3, 2));
  }

  @Test
  void everyOrderVisitsEveryPanelOnce() {
    PlaneGrid big = PlaneGrid.uniform(7, 11, Support.FREE);
    for (WalkOrder o : WalkOrder.values()) {
      if (!o.bracedOnly()) {
        assertThat(o.sequence(big)).hasSize(77).doesNotHaveDuplicates();
      }
    }
  }
}
