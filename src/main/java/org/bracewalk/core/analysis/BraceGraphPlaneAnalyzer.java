package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The brace-graph analysis of analysis.md on flat arrays (see {@link BraceGraph}). Verdict, blocks,
 * critical braces and repair are linear or near-linear in lifts + bays + members; the exact loss
 * tolerance of a free plane is a global minimum cut, O((m + n)³), computed up to {@value
 * #EXACT_CUT_LIMIT} lifts + bays and bounded from below beyond.
 */
final class BraceGraphPlaneAnalyzer implements PlaneAnalyzer {
  static final int EXACT_CUT_LIMIT = 600;

  @Override
  public StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return analyse(BraceGraph.of(grid, members));
  }

  @Override
  public StateAnalysis analyseState(BuiltFrame state) {
    if (!state.frameComplete()) {
      throw new UnsupportedOperationException(
          "frame members missing: the exact framework analysis is not wired in yet");
    }
    return analyseState(state.grid(), state.braces());
  }

  @Override
  public Optional<JointMotion> motion(BuiltFrame state, Freedom freedom) {
    throw new UnsupportedOperationException("joint motions are not wired in yet");
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design) {
    PlaneGrid grid = design.grid();
    byte[] codes = PanelCodes.encode(grid, design.braces());
    BraceGraph graph = BraceGraph.of(grid, codes);
    StateAnalysis state = analyse(graph);
    BitSet openings = PanelCodes.mark(grid, design.openings());
    RepairPlan repair = RepairPlanner.plan(grid, codes, openings, codes, graph, false);
    return new PlaneAnalysis(grid, state, Optional.empty(), repair);
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt) {
    PlaneGrid grid = design.grid();
    PlaneGrid found = asBuilt.grid();
    if (found.lifts() != grid.lifts() || found.bays() != grid.bays()) {
      throw new IllegalArgumentException(
          "the as-built state has "
              + found.lifts()
              + " lifts x "
              + found.bays()
              + " bays but the design has "
              + grid.lifts()
              + " x "
              + grid.bays());
    }
    int n = grid.bays();
    byte[] designCodes = PanelCodes.encode(grid, design.braces());
    byte[] builtCodes = PanelCodes.encode(grid, asBuilt.members());
    StateAnalysis designState = analyse(BraceGraph.of(grid, designCodes));
    BraceGraph builtGraph = BraceGraph.of(grid, builtCodes);
    StateAnalysis builtState = analyse(builtGraph);

    boolean rigidIfSound = builtState.rigid();
    if (!asBuilt.uninspected().isEmpty()) {
      byte[] optimistic = builtCodes.clone();
      BitSet unknown = PanelCodes.mark(grid, asBuilt.uninspected());
      for (int idx = unknown.nextSetBit(0); idx >= 0; idx = unknown.nextSetBit(idx + 1)) {
        optimistic[idx] = designCodes[idx];
      }
      rigidIfSound = isRigid(BraceGraph.of(grid, optimistic));
    }
    List<PlacedBrace> extras = new ArrayList<>();
    for (int idx = 0; idx < builtCodes.length; idx++) {
      if (builtCodes[idx] != PanelCodes.NONE && builtCodes[idx] != designCodes[idx]) {
        Brace extra =
            PanelMatch.extra(PanelCodes.decode(designCodes[idx]), PanelCodes.decode(builtCodes[idx]));
        if (extra != null) {
          extras.add(new PlacedBrace(PanelCodes.panel(idx, n), extra));
        }
      }
    }
    AsBuiltAnalysis built =
        new AsBuiltAnalysis(builtState, asBuilt.uninspected().size(), rigidIfSound, extras);
    BitSet openings = PanelCodes.mark(grid, design.openings());
    RepairPlan repair =
        RepairPlanner.plan(grid, designCodes, openings, builtCodes, builtGraph, true);
    return new PlaneAnalysis(grid, designState, Optional.of(built), repair);
  }

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
