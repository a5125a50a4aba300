package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Tension-only members (rods, cables, straps) on planes with frame damage, against the tensegrity
 * test of B. Roth, W. Whiteley, "Tensegrity frameworks", Trans. AMS 265 (1981): rigid iff the
 * rigidity matrix with the cables as bars has full rank (exact rank, {@link FrameOracle}) and no
 * nonzero first-order motion v with {@code R_rigid v = 0} and {@code R_tension v <= 0} shortens a
 * cable (a linear programme, commons-math3 simplex).
 */
class FrameTensionOnlyCrossCheckTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private void assertMatchesLinearProgramme(BuiltFrame state) {
    String plane = FramePlanes.describe(state);
    FrameOracle o = FrameOracle.of(state);
    int freedoms = o.freedoms();
    boolean rigid = freedoms == 0 && !o.someCableCanSlacken();
    StateAnalysis a = engine.analyseState(state);
    assertThat(a.degreesOfFreedom()).as("degrees of freedom of" + plane).isEqualTo(freedoms);
    assertThat(a.rigid()).as("verdict of" + plane).isEqualTo(rigid);
    assertThat(a.oneWayOnly()).as("oneWayOnly of" + plane).isEqualTo(freedoms == 0 && !rigid);
  }

  @Test
  void verdictMatchesTheTensegrityLinearProgrammeOnRandomDamagedPlanes() {
    Random rnd = new Random(0x7E7F_0001L);
    int rigid = 0;
    int oneWay = 0;
    int swaying = 0;
    for (int k = 0; k < 240; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = FramePlanes.grid(rnd, 1 + rnd.nextInt(3), 1 + rnd.nextInt(4), s);
      Map<PanelRef, Brace> braces =
          TestPlanes.members(rnd, grid, 0.5 + 0.5 * rnd.nextDouble(), 0.4 + 0.6 * rnd.nextDouble());
      Set<FrameRef> absent = FramePlanes.damage(rnd, grid, rnd.nextInt(4) == 0 ? 0 : 0.12 * rnd.nextDouble());
      BuiltFrame state = new BuiltFrame(grid, braces, absent);
      assertMatchesLinearProgramme(state);
      FrameOracle o = FrameOracle.of(state);
      if (o.freedoms() > 0) {
        swaying++;
      } else if (o.someCableCanSlacken()) {
        oneWay++;
      } else {
        rigid++;
      }
    }
    // all three outcomes must be well represented, or the comparison proves little
    assertThat(rigid).isGreaterThan(20);
    assertThat(oneWay).isGreaterThan(20);
    assertThat(swaying).isGreaterThan(20);
  }

  @Test
  void verdictMatchesTheLinearProgrammeForEveryTensionBracingWithOneFrameMemberGone() {
    // exhaustive on 1 x 2 and 2 x 1: every panel empty, ~/, ~\ or ~X, each frame member gone in turn
    int[][] sizes = {{1, 2}, {2, 1}};
    Random rnd = new Random(0x7E7F_0002L);
    int oneWay = 0;
    for (int[] size : sizes) {
      for (Support s : Support.values()) {
        PlaneGrid grid = TestPlanes.unevenGrid(rnd, size[0], size[1], s);
        List<PanelRef> panels = TestPlanes.panels(grid);
        for (FrameRef gone : FrameOracle.allFrameMembers(grid)) {
          for (int code = 0; code < 1 << (2 * panels.size()); code++) {
            BuiltFrame state =
                new BuiltFrame(grid, TensionOnlyCrossCheckTest.tensionBracing(panels, code), Set.of(gone));
            assertMatchesLinearProgramme(state);
            FrameOracle o = FrameOracle.of(state);
            oneWay += o.freedoms() == 0 && o.someCableCanSlacken() ? 1 : 0;
          }
        }
      }
    }
    assertThat(oneWay).isGreaterThan(10);
  }
}
