package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The cautions every Bracewalk output carries, from "Cautions every output carries" in {@code
 * shared/design/trade-facts.md}, in the project's own words. Reports, screens and the command line
 * all take them from here so they never drift apart.
 */
public final class Cautions {

  /** The standing caution: what the check is and what it is not. */
  public static final String STANDING =
      "Bracewalk checks only whether the bracing keeps the plane in shape, on a model in which every"
          + " joint is a pin. It does not check the strength of members, connections, ties,"
          + " foundations, loads, plumb or stability under load, and it is no substitute for the"
          + " inspection itself. Restoring rigidity, any departure from the design, and any structure"
          + " tall enough to need an engineered design must be reviewed by a licensed engineer (or"
          + " the system's manufacturer) under the local codes that apply.";

  private Cautions() {}

  /**
   * What to do while a plane has lost rigidity, naming where: {@code Keep people and loads off
   * lift 3 (all bays) until a competent person has acted.}
   */
  public static String keepOff(StateAnalysis state, PlaneGrid grid) {
    return "Keep people and loads off " + swayingPart(state, grid) + " until a competent person has acted.";
  }

  /**
   * The part of the plane that can move: the lifts and bays outside the block held by the base, or
   * the whole plane when nothing is held (a free plane) or the motion is one way only.
   */
  static String swayingPart(StateAnalysis state, PlaneGrid grid) {
    boolean anyFixed = state.blocks().stream().anyMatch(Block::fixed);
    TreeSet<Integer> lifts = new TreeSet<>();
    TreeSet<Integer> bays = new TreeSet<>();
    for (Block b : state.blocks()) {
      if (!b.fixed()) {
        lifts.addAll(b.lifts());
        bays.addAll(b.bays());
      }
    }
    String whole =
        "the whole plane ("
            + Wording.numbered("lift", List.copyOf(range(grid.lifts())))
            + ", "
            + Wording.numbered("bay", List.copyOf(range(grid.bays())))
            + ")";
    if (!anyFixed || state.oneWayOnly() || (lifts.isEmpty() && bays.isEmpty())) {
      return whole;
    }
    List<String> parts = new ArrayList<>();
    if (!lifts.isEmpty()) {
      parts.add(Wording.numbered("lift", List.copyOf(lifts)) + (bays.isEmpty() ? " (all bays)" : ""));
    }
    if (!bays.isEmpty()) {
      parts.add(Wording.numbered("bay", List.copyOf(bays)) + (lifts.isEmpty() ? " (all lifts)" : ""));
    }
    return String.join(" and ", parts);
  }

  private static TreeSet<Integer> range(int n) {
    TreeSet<Integer> all = new TreeSet<>();
    for (int i = 1; i <= n; i++) {
      all.add(i);
    }
    return all;
  }
}
