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
import org.jgrapht.alg.connectivity.BiconnectivityInspector;
import org.jgrapht.alg.connectivity.ConnectivityInspector;
import org.jgrapht.alg.flow.EdmondsKarpMFImpl;
import org.jgrapht.graph.Pseudograph;
import org.jgrapht.graph.WeightedPseudograph;
import org.junit.jupiter.api.Test;

/**
 * The graph parts of the engine's answer against JGraphT's own algorithms on a brace graph built
 * here (E. D. Bolker, H. Crapo, "Bracing rectangular frameworks I", SIAM J. Appl. Math. 36 (1979):
 * one vertex per lift and per bay, one edge per diagonal member, a cross being two parallel edges;
 * a pinned base adds a ground vertex linked to every bay). Bridges (Tarjan, via
 * BiconnectivityInspector) against the critical braces; the global minimum cut as the least
 * maximum flow from one vertex to each other (max-flow min-cut: L. R. Ford, D. R. Fulkerson, Canad.
 * J. Math. 8 (1956); Edmonds-Karp, J. ACM 19 (1972)), an algorithm other than the engine's
 * Stoer-Wagner, against the loss tolerance; connected components against the blocks; the strong
 * components of the uncontracted digraph by transitive closure (Warshall, J. ACM 9 (1962)) against
 * the engine's contracted ones.
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
   * Edge connectivity of the rigid members' graph: the least s-t maximum flow from the first lift
   * to every other vertex (unit capacity per member). On a pinned base the ground and
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
    String source = lift(1);
    double least = Double.MAX_VALUE;
    for (String t : g.vertexSet()) {
      if (!t.equals(source)) {
        least = Math.min(least, new EdmondsKarpMFImpl<>(g).getMaximumFlowValue(source, t));
      }
    }
    return least == Double.MAX_VALUE ? 0 : (int) Math.round(least);
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

  @Test
  void contractedStrongComponentsAreTheStrongComponentsOfTheWholeDigraph() {
    Random rnd = new Random(0x6A7F_0004L);
    int several = 0;
    for (int k = 0; k < 400; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneGrid grid = TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(7), 1 + rnd.nextInt(7), s);
      Map<PanelRef, Brace> members =
          TestPlanes.members(rnd, grid, 0.2 + 0.7 * rnd.nextDouble(), 0.3 + 0.7 * rnd.nextDouble());
      BraceGraph g = BraceGraph.of(grid, members);
      boolean[][] reach = closure(g);
      ContractedStrongComponents comp = ContractedStrongComponents.of(g);
      Set<Integer> ids = new HashSet<>();
      for (int a = 0; a < g.vertexCount; a++) {
        ids.add(comp.of(a));
        for (int b = 0; b < g.vertexCount; b++) {
          assertThat(comp.of(a) == comp.of(b))
              .as("vertices %d and %d together in%s", a, b, TestPlanes.map(grid, members))
              .isEqualTo(reach[a][b] && reach[b][a]);
        }
      }
      assertThat(comp.count()).isEqualTo(ids.size());
      several += comp.count() > 1 ? 1 : 0;
    }
    assertThat(several).isGreaterThan(100);
  }

  /** Reachability in the whole brace digraph (arcs as in analysis.md), by Warshall's closure. */
  private static boolean[][] closure(BraceGraph g) {
    int v = g.vertexCount;
    boolean[][] r = new boolean[v][v];
    for (int x = 0; x < v; x++) {
      r[x][x] = true;
    }
    for (int e = 0; e < g.memberCount(); e++) {
      int l = g.liftVertex(e);
      int b = g.bayVertex(e);
      if (g.isRigid(e) || g.isRising(e)) {
        r[l][b] = true;
      }
      if (g.isRigid(e) || !g.isRising(e)) {
        r[b][l] = true;
      }
    }
    if (g.pinned) {
      for (int j = 0; j < g.bays; j++) {
        r[g.ground][g.lifts + j] = true;
        r[g.lifts + j][g.ground] = true;
      }
    }
    for (int m = 0; m < v; m++) {
      for (int a = 0; a < v; a++) {
        if (r[a][m]) {
          for (int b = 0; b < v; b++) {
            r[a][b] |= r[m][b];
          }
        }
      }
    }
    return r;
  }
}
