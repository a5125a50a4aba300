package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.jgrapht.Graph;
import org.jgrapht.alg.StoerWagnerMinimumCut;
import org.jgrapht.alg.connectivity.BiconnectivityInspector;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.graph.Pseudograph;
import org.jgrapht.graph.WeightedPseudograph;
import org.junit.jupiter.api.Test;

/**
 * The graph parts of the engine's answer against JGraphT's own algorithms on a brace graph built
 * here (E. D. Bolker, H. Crapo, "Bracing rectangular frameworks I", SIAM J. Appl. Math. 36 (1979):
 * one vertex per lift and per bay, one edge per diagonal member, a cross being two parallel edges;
 * a pinned base adds a ground vertex linked to every bay). Bridges (Tarjan, via
 * BiconnectivityInspector) against the critical braces, the Stoer-Wagner minimum cut (M. Stoer,
 * F. Wagner, J. ACM 44 (1997)) against the loss tolerance, connected components against the blocks.
 */
class GraphCrossCheckTest {
  private static final String GROUND = "ground";

  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  /** One diagonal member, or (panel null) a ground link of a pinned base. */
  record Edge(PanelRef panel, int member, int link) {}

  private static String lift(int i) {
    return "lift " + i;
  }

  private static String bay(int j) {
    return "bay " + j;
  }

  /** The brace multigraph with every member (tension-only ones too) as an edge. */
  private static Graph<String, Edge> braceGraph(PlaneGrid grid, Map<PanelRef, Brace> members) {
    Graph<String, Edge> g = new Pseudograph<>(Edge.class);
    for (int i = 1; i <= grid.lifts(); i++) {
      g.addVertex(lift(i));
    }
    for (int j = 1; j <= grid.bays(); j++) {
      g.addVertex(bay(j));
    }
    if (grid.support() == Support.PINNED_BASE) {
      g.addVertex(GROUND);
      for (int j = 1; j <= grid.bays(); j++) {
        g.addEdge(GROUND, bay(j), new Edge(null, 0, j));
      }
    }
    members.forEach(
        (p, b) -> {
          for (int k = 0; k < b.diagonal().memberCount(); k++) {
            g.addEdge(lift(p.lift()), bay(p.bay()), new Edge(p, k, 0));
          }
        });
    return g;
  }

  @Test
  void criticalBracesAreTheBridgesOfTheBraceGraph() {
    Random rnd = new Random(0x6A7F_0001L);
    int bridges = 0;
    for (int k = 0; k < 400; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), s);
      Map<PanelRef, Brace> members =
          TestPlanes.members(rnd, grid, 0.1 + 0.8 * rnd.nextDouble(), 0.2);
      Set<PanelRef> expected = new TreeSet<>();
      for (Edge e : new BiconnectivityInspector<>(braceGraph(grid, members)).getBridges()) {
        if (e.panel() != null) {
          expected.add(e.panel());
        }
      }
      assertThat(engine.analyseState(grid, members).criticalBraces())
          .as("critical braces of" + TestPlanes.map(grid, members))
          .containsExactlyElementsOf(expected);
      bridges += expected.size();
    }
    assertThat(bridges).isGreaterThan(300);
  }

  @Test
  void lossToleranceIsTheEdgeConnectivityOfTheRigidMembersLessOne() {
    Random rnd = new Random(0x6A7F_0002L);
    int rigid = 0;
    int tolerant = 0;
    for (int k = 0; k < 400; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), s);
      Map<PanelRef, Brace> members =
          TestPlanes.members(rnd, grid, 0.4 + 0.6 * rnd.nextDouble(), k % 4 < 2 ? 0 : 0.2);
      String plane = TestPlanes.map(grid, members);
      StateAnalysis state = engine.analyseState(grid, members);
      if (!state.rigid()) {
        assertThat(state.lossTolerance()).as("loss tolerance of" + plane).isEqualTo(-1);
        continue;
      }
      int expected = Math.max(0, rigidEdgeConnectivity(grid, members) - 1);
      if (state.lossToleranceExact()) {
        assertThat(state.lossTolerance()).as("loss tolerance of" + plane).isEqualTo(expected);
      } else {
        assertThat(state.lossTolerance()).as("loss tolerance bound of" + plane)
            .isBetween(0, expected);
      }
      rigid++;
      tolerant += expected > 0 ? 1 : 0;
    }
    assertThat(rigid).isGreaterThan(100);
    assertThat(tolerant).isGreaterThan(50);
  }

  /**
   * Edge connectivity of the rigid members' graph by Stoer-Wagner. On a pinned base the ground and
   * every bay are joined by unbreakable links, so they are one vertex here.
   */
  private static int rigidEdgeConnectivity(PlaneGrid grid, Map<PanelRef, Brace> members) {
    boolean pinned = grid.support() == Support.PINNED_BASE;
    WeightedPseudograph<String, Edge> g = new WeightedPseudograph<>(Edge.class);
    for (int i = 1; i <= grid.lifts(); i++) {
      g.addVertex(lift(i));
    }
    for (int j = 1; j <= grid.bays(); j++) {
      g.addVertex(pinned ? GROUND : bay(j));
    }
    members.forEach(
        (p, b) -> {
          if (b.isRigid()) {
            for (int k = 0; k < b.diagonal().memberCount(); k++) {
              Edge e = new Edge(p, k, 0);
              g.addEdge(lift(p.lift()), pinned ? GROUND : bay(p.bay()), e);
              g.setEdgeWeight(e, 1.0);
            }
          }
        });
    if (!new ConnectivityInspector<>(g).isConnected()) {
      return 0;
    }
    return (int) Math.round(new StoerWagnerMinimumCut<>(g).minCutWeight());
  }

  @Test
  void blocksAreTheConnectedComponentsOfTheBraceGraph() {
    Random rnd = new Random(0x6A7F_0003L);
    int several = 0;
    for (int k = 0; k < 400; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(8), 1 + rnd.nextInt(8), s);
      Map<PanelRef, Brace> members = TestPlanes.members(rnd, grid, 0.6 * rnd.nextDouble(), 0.2);
      Set<List<Object>> expected = new HashSet<>();
      for (Set<String> component :
          new ConnectivityInspector<>(braceGraph(grid, members)).connectedSets()) {
        List<Integer> lifts = new ArrayList<>();
        List<Integer> bays = new ArrayList<>();
        for (int i = 1; i <= grid.lifts(); i++) {
          if (component.contains(lift(i))) {
            lifts.add(i);
          }
        }
        for (int j = 1; j <= grid.bays(); j++) {
          if (component.contains(bay(j))) {
            bays.add(j);
          }
        }
        expected.add(List.of(lifts, bays, component.contains(GROUND)));
      }
      List<List<Object>> reported = new ArrayList<>();
      for (Block b : engine.analyseState(grid, members).blocks()) {
        reported.add(
            List.of(new ArrayList<>(new TreeSet<>(b.lifts())), new ArrayList<>(new TreeSet<>(b.bays())),
                b.fixed()));
      }
      assertThat(reported).as("blocks (lifts, bays, fixed) of" + TestPlanes.map(grid, members))
          .containsExactlyInAnyOrderElementsOf(expected);
      several += expected.size() > 2 ? 1 : 0;
    }
    assertThat(several).isGreaterThan(100);
  }
}
