package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The engine's verdict on planes with tension-only members (rods, cables, straps) against an
 * independent one on the bar-and-joint framework: the rigidity matrix with the cables as bars must
 * have no nontrivial kernel, and a linear programme (commons-math3 simplex) must find no
 * first-order motion that keeps every bar's length and lets a cable go slack without lengthening
 * any (B. Roth, W. Whiteley, "Tensegrity frameworks", Trans. AMS 265 (1981)).
 */
class TensionOnlyCrossCheckTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  /** Checks the engine's rigid, oneWayOnly and degrees of freedom against the framework. */
  private void assertMatchesFramework(PlaneGrid grid, Map<PanelRef, Brace> members) {
    String plane = TestPlanes.map(grid, members);
    BarJointFramework framework = new BarJointFramework(grid, members);
    int freedoms = framework.freedoms();
    // Roth & Whiteley 1981: rigid iff no nontrivial admissible first-order motion
    boolean rigid = freedoms == 0 && !framework.someCableCanSlacken();
    StateAnalysis state = engine.analyseState(grid, members);
    assertThat(state.degreesOfFreedom()).as("degrees of freedom of" + plane).isEqualTo(freedoms);
    assertThat(state.rigid()).as("verdict of" + plane).isEqualTo(rigid);
    assertThat(state.oneWayOnly()).as("oneWayOnly of" + plane).isEqualTo(freedoms == 0 && !rigid);
  }

  private static PlaneGrid uniform(int lifts, int bays, Support s) {
    return PlaneGrid.uniform(lifts, bays, s);
  }

  @Test
  void verdictMatchesTheTensegrityLinearProgrammeOnRandomMixedPlanes() {
    Random rnd = new Random(0x7E75_0001L);
    int rigid = 0;
    int oneWay = 0;
    int swaying = 0;
    for (int k = 0; k < 260; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(3), 1 + rnd.nextInt(4), s);
      Map<PanelRef, Brace> members =
          TestPlanes.members(rnd, grid, 0.4 + 0.6 * rnd.nextDouble(), 0.3 + 0.7 * rnd.nextDouble());
      assertMatchesFramework(grid, members);
      BarJointFramework f = new BarJointFramework(grid, members);
      if (f.freedoms() > 0) {
        swaying++;
      } else if (f.someCableCanSlacken()) {
        oneWay++;
      } else {
        rigid++;
      }
    }
    // all three outcomes must be well represented, or the comparison proves little
    assertThat(rigid).isGreaterThan(30);
    assertThat(oneWay).isGreaterThan(30);
    assertThat(swaying).isGreaterThan(30);
  }

  @Test
  void verdictMatchesTheLinearProgrammeForEveryTensionBracingOfSmallPlanes() {
    // exhaustive: every panel empty, ~/, ~\ or ~X, on 1x1, 1x2, 2x1, 1x3, 2x2, both supports
    int[][] sizes = {{1, 1}, {1, 2}, {2, 1}, {1, 3}, {2, 2}};
    Random rnd = new Random(0x7E75_0002L);
    for (int[] size : sizes) {
      for (Support s : Support.values()) {
        PlaneGrid grid = TestPlanes.unevenGrid(rnd, size[0], size[1], s);
        List<PanelRef> panels = TestPlanes.panels(grid);
        int combos = 1 << (2 * panels.size());
        for (int code = 0; code < combos; code++) {
          assertMatchesFramework(grid, tensionBracing(panels, code));
        }
      }
    }
  }

  /** Panel k gets no member, ~/, ~\ or ~X from the k-th pair of bits of {@code code}. */
  static Map<PanelRef, Brace> tensionBracing(List<PanelRef> panels, int code) {
    Map<PanelRef, Brace> members = new TreeMap<>();
    for (int k = 0; k < panels.size(); k++) {
      int c = (code >> (2 * k)) & 3;
      Diagonal d = Diagonal.of((c & 1) != 0, (c & 2) != 0);
      if (d != null) {
        members.put(panels.get(k), Brace.tension(d));
      }
    }
    return members;
  }

  @Test
  void aSinglePanelNeedsBothTensionDiagonals() {
    // analysis.md (Baglivo & Graver 1983): a single panel needs an X of tension members
    for (Support s : Support.values()) {
      PlaneGrid grid = uniform(1, 1, s);
      Map<PanelRef, Brace> rising = TestPlanes.parse("~/");
      Map<PanelRef, Brace> falling = TestPlanes.parse("~\\");
      Map<PanelRef, Brace> cross = TestPlanes.parse("~X");
      assertThat(engine.analyseState(grid, rising).rigid()).as("~/ on " + s).isFalse();
      assertThat(engine.analyseState(grid, rising).oneWayOnly()).as("~/ on " + s).isTrue();
      assertThat(engine.analyseState(grid, falling).rigid()).as("~\\ on " + s).isFalse();
      assertThat(engine.analyseState(grid, cross).rigid()).as("~X on " + s).isTrue();
      assertThat(new BarJointFramework(grid, rising).rigidWithCables()).isFalse();
      assertThat(new BarJointFramework(grid, cross).rigidWithCables()).isTrue();
      assertMatchesFramework(grid, rising);
      assertMatchesFramework(grid, falling);
      assertMatchesFramework(grid, cross);
    }
  }

  @Test
  void risingAndFallingTensionMembersStopOppositeSways() {
    // pinned base, one lift, two bays: one '/' and one '\' stop both sways, two alike stop one
    PlaneGrid pinned = uniform(1, 2, Support.PINNED_BASE);
    assertThat(engine.analyseState(pinned, TestPlanes.parse("~/ ~\\")).rigid()).isTrue();
    assertThat(engine.analyseState(pinned, TestPlanes.parse("~\\ ~/")).rigid()).isTrue();
    assertThat(engine.analyseState(pinned, TestPlanes.parse("~/ ~/")).rigid()).isFalse();
    assertThat(engine.analyseState(pinned, TestPlanes.parse("~\\ ~\\")).rigid()).isFalse();
    for (String[] map :
        List.of(
            new String[] {"~/ ~\\"}, new String[] {"~\\ ~/"}, new String[] {"~/ ~/"},
            new String[] {"~\\ ~\\"}, new String[] {"~X ~/"}, new String[] {"/ ~\\"})) {
      assertMatchesFramework(pinned, TestPlanes.parse(map));
      assertMatchesFramework(uniform(1, 2, Support.FREE), TestPlanes.parse(map));
    }
    // free 2x2: a directed 4-cycle lift 1 -> bay 1 -> lift 2 -> bay 2 -> lift 1 is rigid,
    // the same four members all one way are not
    PlaneGrid free = uniform(2, 2, Support.FREE);
    Map<PanelRef, Brace> cycle = TestPlanes.parse("~\\ ~/", "~/ ~\\");
    Map<PanelRef, Brace> oneWay = TestPlanes.parse("~/ ~/", "~/ ~/");
    assertThat(engine.analyseState(free, cycle).rigid()).isTrue();
    assertThat(engine.analyseState(free, oneWay).rigid()).isFalse();
    assertThat(engine.analyseState(free, oneWay).oneWayOnly()).isTrue();
    assertMatchesFramework(free, cycle);
    assertMatchesFramework(free, oneWay);
    // the mirror image of a rigid bracing is rigid; '/' and '\' swapped in one panel is not
    assertMatchesFramework(free, TestPlanes.parse("~/ ~\\", "~\\ ~/"));
    assertMatchesFramework(free, TestPlanes.parse("~/ ~/", "~/ ~\\"));
  }
}
