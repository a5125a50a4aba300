package org.bracewalk.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/** The baseline against published values (as collected in shared/design/analysis.md). */
class RigidityMatrixBaselineTest {
  private static Map<PanelRef, Brace> braces(int... liftBay) {
    Map<PanelRef, Brace> m = new HashMap<>();
    for (int k = 0; k < liftBay.length; k += 2) {
      m.put(PanelRef.of(liftBay[k], liftBay[k + 1]), Brace.rigid(Diagonal.RISING));
    }
    return m;
  }

  private static PlaneGrid uneven(int lifts, int bays, Support support) {
    List<Double> w = new java.util.ArrayList<>();
    for (int j = 0; j < bays; j++) {
      w.add(1.8 + 0.2 * j);
    }
    List<Double> h = new java.util.ArrayList<>();
    for (int i = 0; i < lifts; i++) {
      h.add(2.0 - 0.15 * i);
    }
    return new PlaneGrid(lifts, bays, w, h, support);
  }

  @Test
  void anUnbracedFreeThreeByFourPlaneHasSixFreedoms() {
    // Bolker & Crapo 1979: freedoms = components of the brace graph - 1 = 7 - 1
    assertThat(RigidityMatrixBaseline.freedoms(uneven(3, 4, Support.FREE), Map.of())).isEqualTo(6);
  }

  @Test
  void aFreeTwoByTwoPlaneWithBothDiagonalsInOneLiftHasOneFreedom() {
    assertThat(RigidityMatrixBaseline.freedoms(uneven(2, 2, Support.FREE), braces(1, 1, 1, 2))).isEqualTo(1);
  }

  @Test
  void aSpanningTreeOfDiagonalsMakesAFreePlaneRigid() {
    // m + n - 1 = 4 diagonals forming a spanning tree of K(2,3) (Bolker & Crapo 1979)
    assertThat(RigidityMatrixBaseline.freedoms(uneven(2, 3, Support.FREE), braces(1, 1, 1, 2, 1, 3, 2, 1))).isZero();
  }

  @Test
  void cornersAndCentreOfAFreeThreeByThreePlaneLeaveOneFreedomDespiteLamanCounts() {
    // analysis.md: 2V - 3 members yet one freedom; the grid is a special position
    assertThat(RigidityMatrixBaseline.freedoms(uneven(3, 3, Support.FREE), braces(1, 1, 1, 3, 2, 2, 3, 1, 3, 3)))
        .isEqualTo(1);
  }

  @Test
  void onAPinnedBaseEveryLiftWithoutADiagonalIsOneFreedom() {
    // analysis.md: pinned base rigid iff every lift has an effective diagonal; freedoms = bare lifts
    assertThat(RigidityMatrixBaseline.freedoms(uneven(4, 3, Support.PINNED_BASE), Map.of())).isEqualTo(4);
    assertThat(RigidityMatrixBaseline.freedoms(uneven(4, 3, Support.PINNED_BASE), braces(1, 2, 3, 1))).isEqualTo(2);
    assertThat(RigidityMatrixBaseline.freedoms(uneven(4, 3, Support.PINNED_BASE), braces(1, 2, 2, 3, 3, 1, 4, 1)))
        .isZero();
  }
}
