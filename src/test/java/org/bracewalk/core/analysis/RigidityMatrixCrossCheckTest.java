package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The engine's degrees of freedom, blocks and critical braces against the rank of the rigidity
 * matrix of the bar-and-joint framework (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS
 * 245 (1978)), computed with EJML on planes with uneven bay widths and lift heights.
 */
class RigidityMatrixCrossCheckTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private static Support support(int k) {
    return k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
  }

  @Test
  void degreesOfFreedomEqualTheFreedomsOfTheRigidityMatrixOnRandomPlanes() {
    Random rnd = new Random(0xB1A5_0001L);
    int rigid = 0;
    int withCables = 0;
    int withCrosses = 0;
    for (int k = 0; k < 600; k++) {
      PlaneGrid grid =
          TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), support(k));
      Map<PanelRef, Brace> members = TestPlanes.members(rnd, grid, 0.8 * rnd.nextDouble(), 0.2);
      String plane = TestPlanes.map(grid, members);
      // Asimow & Roth 1978: freedoms = 2V - 3 - rank (free), 2V' - rank (pinned base);
      // tension-only members count as bars for the degrees of freedom.
      int expected = new BarJointFramework(grid, members).freedoms();
      StateAnalysis state = engine.analyseState(grid, members);
      assertThat(state.degreesOfFreedom()).as("degrees of freedom of" + plane).isEqualTo(expected);
      if (TestPlanes.allRigid(members)) {
        assertThat(state.rigid()).as("verdict of" + plane).isEqualTo(expected == 0);
        assertThat(state.oneWayOnly()).as("oneWayOnly of" + plane).isFalse();
      }
      if (state.degreesOfFreedom() > 0) {
        assertThat(state.rigid()).as("verdict of" + plane).isFalse();
        assertThat(state.lossTolerance()).as("loss tolerance of" + plane).isEqualTo(-1);
      }
      rigid += expected == 0 ? 1 : 0;
      withCables += TestPlanes.allRigid(members) ? 0 : 1;
      withCrosses +=
          members.values().stream().anyMatch(b -> b.diagonal().memberCount() == 2) ? 1 : 0;
    }
    // the sample must hold both verdicts and both kinds of member, or the check proves little
    assertThat(rigid).isBetween(60, 540);
    assertThat(withCables).isGreaterThan(100);
    assertThat(withCrosses).isGreaterThan(100);
  }

  @Test
  void blocksPartitionThePlaneAndEachFreeBlockMovesWithEveryMemberKeepingItsLength() {
    Random rnd = new Random(0xB1A5_0002L);
    int mechanisms = 0;
    for (int k = 0; k < 300; k++) {
      PlaneGrid grid =
          TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), support(k));
      Map<PanelRef, Brace> members = TestPlanes.members(rnd, grid, 0.7 * rnd.nextDouble(), 0.2);
      String plane = TestPlanes.map(grid, members);
      BarJointFramework framework = new BarJointFramework(grid, members);
      int freedoms = framework.freedoms();
      StateAnalysis state = engine.analyseState(grid, members);
      List<Block> blocks = state.blocks();

      // every lift and every bay in exactly one block, no empty block
      List<Integer> lifts = new ArrayList<>();
      List<Integer> bays = new ArrayList<>();
      for (Block b : blocks) {
        assertThat(b.lifts().size() + b.bays().size()).as("empty block in" + plane).isPositive();
        lifts.addAll(b.lifts());
        bays.addAll(b.bays());
      }
      assertThat(lifts).as("lifts over the blocks of" + plane).hasSize(grid.lifts())
          .containsExactlyInAnyOrderElementsOf(range(grid.lifts()));
      assertThat(bays).as("bays over the blocks of" + plane).hasSize(grid.bays())
          .containsExactlyInAnyOrderElementsOf(range(grid.bays()));
      // one block per independent motion, plus the one held (rank of the rigidity matrix)
      assertThat(blocks).as("blocks of" + plane).hasSize(freedoms + 1);
      if (grid.support() == Support.PINNED_BASE) {
        assertThat(blocks.get(0).fixed()).as("fixed block first in" + plane).isTrue();
        assertThat(blocks.stream().filter(Block::fixed)).as("fixed blocks of" + plane).hasSize(1);
        assertThat(blocks.get(0).bays()).as("fixed block of" + plane).hasSize(grid.bays());
      } else {
        assertThat(blocks).as("blocks of free" + plane).noneMatch(Block::fixed);
      }

      // each block that can move does so as an exact finite motion (analysis.md, "Mechanism
      // shape"): checked here against the lengths of the members themselves
      List<Block> moving = new ArrayList<>();
      for (int b = 0; b < blocks.size(); b++) {
        if (!blocks.get(b).fixed() && blocks.size() > 1) {
          moving.add(blocks.get(b));
        }
      }
      for (Block block : moving) {
        for (double t : new double[] {1e-4, 0.3, -0.3}) {
          MechanismShape shape = MechanismShape.of(grid, block, t);
          String where = " turning " + block + " by " + t + " in" + plane;
          for (int[] member : framework.allMembers()) {
            assertThat(framework.lengthIn(shape, member))
                .as("member length" + where)
                .isCloseTo(framework.restLength(member), offset(1e-9));
          }
          if (grid.support() == Support.PINNED_BASE) {
            for (int j = 0; j <= grid.bays(); j++) {
              assertThat(shape.x(0, j)).as("base joint x" + where).isCloseTo(framework.x(0, j),
                  offset(1e-12));
              assertThat(shape.y(0, j)).as("base joint y" + where).isCloseTo(framework.y(0, j),
                  offset(1e-12));
            }
          }
          // nontrivial: some distance between two joints changes (no rigid-body motion does that)
          assertThat(largestDistanceChange(shape, framework))
              .as("the motion changes the shape" + where)
              .isGreaterThan(Math.abs(t) * 1e-3);
        }
        mechanisms++;
      }
    }
    assertThat(mechanisms).isGreaterThan(300);
  }

  @Test
  void criticalBracesAreExactlyThePanelsWhereLosingOneMemberAddsAFreedom() {
    Random rnd = new Random(0xB1A5_0003L);
    int critical = 0;
    for (int k = 0; k < 150; k++) {
      PlaneGrid grid =
          TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(5), 1 + rnd.nextInt(5), support(k));
      Map<PanelRef, Brace> members =
          TestPlanes.members(rnd, grid, 0.3 + 0.6 * rnd.nextDouble(), 0.2);
      String plane = TestPlanes.map(grid, members);
      int freedoms = new BarJointFramework(grid, members).freedoms();
      Set<PanelRef> expected = new HashSet<>();
      for (Map.Entry<PanelRef, Brace> e : members.entrySet()) {
        // a panel is critical when losing one of its members adds a freedom (a bridge of the brace
        // multigraph): the half of a cross that is left still squares the panel
        PanelRef p = e.getKey();
        Brace b = e.getValue();
        List<Brace> losses =
            b.diagonal() == Diagonal.BOTH
                ? List.of(new Brace(Diagonal.FALLING, b.kind()), new Brace(Diagonal.RISING, b.kind()))
                : java.util.Collections.singletonList(null);
        for (Brace left : losses) {
          Map<PanelRef, Brace> without = new TreeMap<>(members);
          if (left == null) {
            without.remove(p);
          } else {
            without.put(p, left);
          }
          if (new BarJointFramework(grid, without).freedoms() > freedoms) {
            expected.add(p);
          }
        }
      }
      List<PanelRef> reported = engine.analyseState(grid, members).criticalBraces();
      assertThat(reported).as("critical braces of" + plane)
          .containsExactlyElementsOf(new TreeSet<>(expected));
      critical += expected.size();
    }
    assertThat(critical).isGreaterThan(100);
  }

  private static List<Integer> range(int n) {
    List<Integer> r = new ArrayList<>();
    for (int i = 1; i <= n; i++) {
      r.add(i);
    }
    return r;
  }

  private static double largestDistanceChange(MechanismShape s, BarJointFramework f) {
    double worst = 0;
    for (int a = 0; a < f.jointCount(); a++) {
      for (int b = a + 1; b < f.jointCount(); b++) {
        int[] pair = {a, b};
        worst = Math.max(worst, Math.abs(f.lengthIn(s, pair) - f.restLength(pair)));
      }
    }
    return worst;
  }
}
