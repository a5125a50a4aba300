package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class SwayRegionTest {

  @Test
  void onAPinnedBaseEveryPanelOfAFreeLiftShears() {
    PlaneGrid g = PlaneGrid.uniform(4, 3, Support.PINNED_BASE);
    List<Block> blocks =
        List.of(new Block(List.of(1, 3, 4), List.of(1, 2, 3), true), new Block(List.of(2), List.of(), false));
    SwayRegion s = SwayRegion.of(g, blocks);
    assertThat(s.shearing()).containsExactly(PanelRef.of(2, 1), PanelRef.of(2, 2), PanelRef.of(2, 3));
  }

  @Test
  void oneBlockMeansNothingMoves() {
    PlaneGrid g = PlaneGrid.uniform(2, 2, Support.FREE);
    SwayRegion s = SwayRegion.of(g, List.of(new Block(List.of(1, 2), List.of(1, 2), false)));
    assertThat(s.isEmpty()).isTrue();
  }

  @Test
  void onAFreePlaneOnlyPanelsBetweenBlocksShear() {
    // lift 1 with bays 1-2, lift 2 on its own: panels of lift 2 shear
    PlaneGrid g = PlaneGrid.uniform(2, 2, Support.FREE);
    List<Block> blocks =
        List.of(new Block(List.of(1), List.of(1, 2), false), new Block(List.of(2), List.of(), false));
    SwayRegion s = SwayRegion.of(g, blocks);
    assertThat(s.shearing()).containsExactly(PanelRef.of(2, 1), PanelRef.of(2, 2));
  }
}
