package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.PanelRef;

/**
 * The brace-graph analysis of analysis.md on flat arrays (see {@link BraceGraph}): the path
 * {@link FramePlaneAnalyzer} takes wherever the analysed frame is complete. Verdict, blocks and
 * critical braces are linear or near-linear in lifts + bays + members; the exact loss tolerance of
 * a free plane is a global minimum cut, O((m + n)³), computed up to {@value #EXACT_CUT_LIMIT} lifts
 * + bays and bounded from below beyond.
 */
final class BraceGraphAnalysis {
  static final int EXACT_CUT_LIMIT = 600;

  private BraceGraphAnalysis() {}

  static boolean isRigid(BraceGraph g) {
    return g.hasTension()
        ? ContractedStrongComponents.of(g).count() == 1
        : UnionFindBlocks.of(g, false).count() == 1;
  }

  static StateAnalysis analyse(BraceGraph g) {
    UnionFindBlocks uf = UnionFindBlocks.of(g, false);
    int dof = uf.count() - 1;
    boolean rigid = dof == 0 && (!g.hasTension() || ContractedStrongComponents.of(g).count() == 1);
    boolean oneWay = dof == 0 && !rigid;
    List<PanelRef> critical = new ArrayList<>(g.panelsOf(TarjanBridges.of(g, false)));
    critical.sort(Comparator.naturalOrder());
    int tolerance = -1;
    boolean exact = true;
    if (rigid) {
      StoerWagnerEdgeConnectivity.Connectivity c =
          StoerWagnerEdgeConnectivity.of(g, EXACT_CUT_LIMIT);
      tolerance = Math.max(0, c.value() - 1);
      exact = c.exact();
    }
    return new StateAnalysis(rigid, dof, oneWay, tolerance, exact, critical, blocks(g, uf));
  }

  private static List<Block> blocks(BraceGraph g, UnionFindBlocks uf) {
    Map<Integer, List<Integer>> lifts = new HashMap<>();
    Map<Integer, List<Integer>> bays = new HashMap<>();
    List<Integer> roots = new ArrayList<>();
    for (int v = 0; v < g.lifts + g.bays; v++) {
      int r = uf.find(v);
      if (!lifts.containsKey(r)) {
        lifts.put(r, new ArrayList<>());
        bays.put(r, new ArrayList<>());
        roots.add(r);
      }
      if (v < g.lifts) {
        lifts.get(r).add(v + 1);
      } else {
        bays.get(r).add(v - g.lifts + 1);
      }
    }
    int groundRoot = g.pinned ? uf.find(g.ground) : -1;
    List<Block> out = new ArrayList<>();
    for (int r : roots) {
      out.add(new Block(lifts.get(r), bays.get(r), r == groundRoot));
    }
    out.sort(
        Comparator.comparing((Block b) -> !b.fixed())
            .thenComparing(b -> b.lifts().isEmpty())
            .thenComparingInt(b -> b.lifts().isEmpty() ? b.bays().get(0) : b.lifts().get(0)));
    return out;
  }
}
