package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;
import java.util.Random;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Critical frame members of complete frames (the panel-level self-stress of {@link
 * CompleteFrameStress}) against removal and the exact rank of the rigidity matrix in {@link
 * FrameOracle} (L. Asimow, B. Roth, Trans. AMS 245 (1978)): a member is critical iff removing it
 * alone adds a freedom (check-contract.md, "Frame members"). Uniform grids are included, where
 * diagonals line up and the geometry is special.
 */
class CompleteFrameCriticalTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  @Test
  void completeFramesCriticalMembersAreThoseWhoseRemovalAloneAddsAFreedom() {
    Random rnd = new Random(0xC0_3F1E7EL);
    int critical = 0;
    int stressedPlanes = 0;
    for (int k = 0; k < 160; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = FramePlanes.grid(rnd, 1 + rnd.nextInt(6), 1 + rnd.nextInt(6), s);
      Map<PanelRef, Brace> braces =
          TestPlanes.members(rnd, grid, 0.1 + 0.8 * rnd.nextDouble(), k % 3 == 0 ? 0.3 : 0);
      BuiltFrame state = BuiltFrame.complete(grid, braces);
      StateAnalysis a = engine.analyseState(state);
      FrameEngineChecks.assertCriticalMatch(a, state);
      critical += a.criticalMembers().size();
      int all = (grid.lifts() + 1) * grid.bays() + grid.lifts() * (grid.bays() + 1)
          - (s == Support.PINNED_BASE ? grid.bays() : 0);
      if (a.criticalMembers().size() < all) {
        stressedPlanes++;
      }
    }
    // the sample must hold both kinds of member: critical ones and ones carrying a self-stress
    assertThat(critical).isGreaterThan(300);
    assertThat(stressedPlanes).isGreaterThan(40);
  }
}
