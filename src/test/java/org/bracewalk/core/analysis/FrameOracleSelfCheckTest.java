package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The frame oracle itself, before anything is compared with it: against published values, against
 * EJML's singular-value rank, and against the complete-frame framework the older cross-checks use.
 */
class FrameOracleSelfCheckTest {

  private static FrameOracle complete(int lifts, int bays, Support s, String... topLiftFirst) {
    return FrameOracle.of(PlaneGrid.uniform(lifts, bays, s), TestPlanes.parse(topLiftFirst), Set.of());
  }

  @Test
  void publishedFreedomsOfSmallFreePlanes() {
    // analysis.md "Published values" (E. D. Bolker, H. Crapo, SIAM J. Appl. Math. 36 (1979)):
    // an unbraced free 3 x 4 plane has 6 freedoms (m + n - 1)
    assertThat(complete(3, 4, Support.FREE, ". . . .", ". . . .", ". . . .").freedoms()).isEqualTo(6);
    // a free 2 x 2 plane with two diagonals in one lift has 1 freedom
    assertThat(complete(2, 2, Support.FREE, ". .", "/ \\").freedoms()).isEqualTo(1);
    // a free 3 x 3 plane braced in its four corners and its centre: 2V - 3 members, yet 1 freedom
    // (a grid is a special position: Laman's count does not apply)
    FrameOracle corners = complete(3, 3, Support.FREE, "/ . /", ". / .", "/ . /");
    assertThat(corners.bars()).hasSize(2 * 16 - 3);
    assertThat(corners.freedoms()).isEqualTo(1);
    // one bare square: 4 joints, 4 bars, 2V - 3 - 4 = 1 freedom (common practice: a pin-jointed
    // rectangle racks); a braced one is a rigid pair of triangles
    assertThat(complete(1, 1, Support.FREE, ".").freedoms()).isEqualTo(1);
    assertThat(complete(1, 1, Support.FREE, "X").freedoms()).isZero();
  }

  @Test
  void minimalBracingsOfFreePlanesNumberTheSpanningTreesOfTheCompleteBipartiteGraph() {
    // Bolker & Crapo 1979: a minimal bracing has m + n - 1 diagonals; their number is the number of
    // spanning trees of K_{m,n}, m^(n-1) n^(m-1) (H. I. Scoins, Proc. Camb. Phil. Soc. 58 (1962)):
    // 2x2: 4, 2x3: 12, 3x3: 81, 3x4: 432. Uneven widths and heights: the count must not change.
    int[][] cases = {{2, 2, 4}, {2, 3, 12}, {3, 3, 81}, {3, 4, 432}};
    Random rnd = new Random(0xF0AC_0001L);
    for (int[] c : cases) {
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, c[0], c[1], Support.FREE);
      List<PanelRef> panels = TestPlanes.panels(grid);
      int size = c[0] + c[1] - 1;
      int rigid = 0;
      for (int mask = 0; mask < 1 << panels.size(); mask++) {
        if (Integer.bitCount(mask) != size) {
          continue;
        }
        Map<PanelRef, Brace> braces = new TreeMap<>();
        for (int k = 0; k < panels.size(); k++) {
          if ((mask >> k & 1) != 0) {
            braces.put(panels.get(k), Brace.rigid(rnd.nextBoolean() ? Diagonal.RISING : Diagonal.FALLING));
          }
        }
        if (FrameOracle.of(grid, braces, Set.of()).freedoms() == 0) {
          rigid++;
        }
      }
      assertThat(rigid).as("rigid bracings of a free %d x %d plane with %d diagonals", c[0], c[1], size)
          .isEqualTo(c[2]);
    }
  }

  @Test
  void exactRankAgreesWithEjmlsSingularValuesOnDamagedPlanes() {
    // two independent ranks of the same matrix: fraction-free integer elimination and EJML's SVD
    // (singular values below 1e-9 of the largest taken as zero)
    Random rnd = new Random(0xF0AC_0002L);
    int deficient = 0;
    for (int k = 0; k < 200; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 7, k % 2 == 0 ? Support.FREE : Support.PINNED_BASE, 0);
      FrameOracle o = FrameOracle.of(state);
      assertThat(o.rank()).as("exact rank against EJML of" + FramePlanes.describe(state))
          .isEqualTo(o.ejmlRank());
      deficient += o.freedoms() > 0 ? 1 : 0;
    }
    assertThat(deficient).isBetween(40, 190);
  }

  @Test
  void onCompleteFramesTheOracleAgreesWithTheOlderFramework() {
    // BarJointFramework (RigidityMatrixCrossCheckTest's oracle, SVD rank) on complete frames
    Random rnd = new Random(0xF0AC_0003L);
    for (int k = 0; k < 150; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), s);
      Map<PanelRef, Brace> members = TestPlanes.members(rnd, grid, rnd.nextDouble(), 0.2);
      assertThat(FrameOracle.of(grid, members, Set.of()).freedoms())
          .as("freedoms of" + TestPlanes.map(grid, members))
          .isEqualTo(new BarJointFramework(grid, members).freedoms());
    }
  }

  @Test
  void coloopsByRemovalAreTheMembersNoSelfStressUses() {
    // a row whose removal lowers the rank is one that no self-stress (a vector of the left null
    // space) uses: two routes through the same matroid must agree
    Random rnd = new Random(0xF0AC_0004L);
    int coloops = 0;
    for (int k = 0; k < 40; k++) {
      BuiltFrame state = FramePlanes.state(rnd, 5, k % 2 == 0 ? Support.FREE : Support.PINNED_BASE, 0);
      FrameOracle o = FrameOracle.of(state);
      List<FrameOracle.Bar> byRemoval = o.coloops();
      assertThat(o.coloopsByStresses()).as("coloops of" + FramePlanes.describe(state))
          .containsExactlyElementsOf(byRemoval);
      // and the members whose loss adds a freedom: removal and recount against the stress route
      assertThat(o.criticalByStresses()).as("critical members of" + FramePlanes.describe(state))
          .containsExactlyElementsOf(o.criticalByRemoval());
      coloops += byRemoval.size();
    }
    assertThat(coloops).isGreaterThan(60);
  }

  @Test
  void aLooseEndAndAStraightRunEachAddOneFreedomAtTheirJoint() {
    // pinned base, one lift, one bay, '/' : rigid (two triangles on the ground)
    PlaneGrid one = PlaneGrid.uniform(1, 1, Support.PINNED_BASE);
    Map<PanelRef, Brace> rising = TestPlanes.parse("/");
    assertThat(FrameOracle.of(one, rising, Set.of()).freedoms()).isZero();
    // without the top ledger the left standard's top (joint (1, 0)) is held by that standard
    // alone: 1 freedom, only that joint moves; without the left standard too, joint (1, 0)
    // carries nothing and is left out: rigid again
    FrameOracle loose = FrameOracle.of(one, rising, Set.of(FrameRef.ledger(1, 1)));
    assertThat(loose.freedoms()).isEqualTo(1);
    assertThat(loose.movingJoints()).containsExactly(new Joint(1, 0));
    assertThat(loose.looseEnds()).containsExactly(new Joint(1, 0));
    FrameOracle bare =
        FrameOracle.of(one, rising, Set.of(FrameRef.ledger(1, 1), FrameRef.standard(1, 0)));
    assertThat(bare.isolatedJoints()).containsExactly(new Joint(1, 0));
    assertThat(bare.freedoms()).isZero();
    // a uniform 2 x 2 plane: '/' in lift 1 bay 1 and lift 2 bay 2 run in one straight line through
    // joint (1, 1); with its two ledgers and two standards gone that joint lost its restraint, and
    // so did the joints where the standards of lines 0 and 2 and the ledgers of level 2 now run
    // straight through
    PlaneGrid square = PlaneGrid.uniform(2, 2, Support.PINNED_BASE);
    FrameOracle straight =
        FrameOracle.of(square, TestPlanes.parse(". /", "/ ."),
            Set.of(FrameRef.ledger(1, 1), FrameRef.ledger(1, 2), FrameRef.standard(1, 1),
                FrameRef.standard(2, 1)));
    assertThat(straight.straightThroughJoints())
        .containsExactly(new Joint(1, 0), new Joint(1, 1), new Joint(1, 2), new Joint(2, 1));
    assertThat(straight.movingJoints()).contains(new Joint(1, 1));
    assertThat(straight.looseEnds()).isEmpty();
  }
}
