package org.bracewalk.ui.common;

import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The verdict on a plane in words a person on site can act on. A lost verdict names the lifts and
 * bays to keep people and loads off and says a competent person must act; a holding verdict says
 * what kind of check it was and never calls the structure safe.
 *
 * @param kind which of the verdicts
 * @param headline a few words, with the verdict's symbol
 * @param detail what the analysis found: motions, critical braces, loss tolerance
 * @param advice what to do now
 */
public record VerdictWords(VerdictKind kind, String headline, String detail, String advice) {

  /** The standing caution every verdict carries (from the project's trade facts). */
  public static final String CAUTION =
      "A geometric check of bracing continuity on a pin-jointed model: it does not check member"
          + " strength, connections, ties, foundations, loading or plumb, and does not replace the"
          + " inspection. Restoring rigidity and any deviation from the design need review by a"
          + " licensed engineer or the system's manufacturer under the local codes.";

  /**
   * Words for a state.
   *
   * @param grid the plane
   * @param seen the state with panels not yet inspected taken as designed (so what is shown is
   *     what the marks so far prove)
   * @param unknownPanels panels not inspected (0 for a design or a finished walk-round)
   * @param rigidCountingUnknownMissing the conservative verdict, panels not inspected counted as
   *     missing
   * @param repairCount braces in the minimal repair set
   */
  public static VerdictWords of(
      PlaneGrid grid,
      StateAnalysis seen,
      int unknownPanels,
      boolean rigidCountingUnknownMissing,
      int repairCount) {
    if (!seen.rigid()) {
      SwayRegion sway = SwayRegion.of(grid, seen.blocks());
      boolean oneWay = seen.oneWayOnly() || sway.isEmpty();
      VerdictKind kind = oneWay && seen.degreesOfFreedom() == 0 ? VerdictKind.SWAYS_ONE_WAY : VerdictKind.LOST;
      String where = where(grid, sway);
      String detail;
      if (kind == VerdictKind.SWAYS_ONE_WAY) {
        detail =
            "Tension-only members go slack one way, so the plane can lean that way.";
      } else {
        detail =
            seen.degreesOfFreedom()
                + (seen.degreesOfFreedom() == 1 ? " independent motion" : " independent motions")
                + "; shearing: "
                + Ranges.named("lift", "lifts", liftsOf(sway))
                + shearingBays(grid, sway)
                + ".";
      }
      String fix =
          repairCount > 0
              ? " Competent person to act: fit the "
                  + repairCount
                  + (repairCount == 1 ? " brace" : " braces")
                  + " shown under Findings, or take this part out of service."
              : " Competent person to act: take this part out of service until it is re-braced.";
      String advice =
          "Keep people and loads off " + where + " until a competent person has acted." + fix;
      if (unknownPanels > 0) {
        advice += " " + unknownPanels + plural(unknownPanels, " panel", " panels") + " still to inspect.";
      }
      return new VerdictWords(kind, kind.symbol() + " " + kind.words(), detail, advice);
    }
    String tolerance = tolerance(seen);
    if (!rigidCountingUnknownMissing && unknownPanels > 0) {
      VerdictKind kind = VerdictKind.DEPENDS_ON_UNSEEN;
      return new VerdictWords(
          kind,
          kind.symbol() + " " + kind.words(),
          "Holds its shape if the "
              + unknownPanels
              + plural(unknownPanels, " panel", " panels")
              + " not yet inspected are as designed. "
              + tolerance,
          "Inspect the remaining panels before relying on this verdict.");
    }
    VerdictKind kind = VerdictKind.HOLDS;
    String unseen =
        unknownPanels > 0
            ? " The " + unknownPanels + plural(unknownPanels, " panel", " panels")
                + " not inspected cannot change this."
            : "";
    return new VerdictWords(
        kind,
        kind.symbol() + " " + kind.words(),
        tolerance + unseen,
        "Bracing check only: record any other defect and act on it as the inspection requires.");
  }

  private static String plural(int n, String one, String many) {
    return n == 1 ? one : many;
  }

  private static java.util.Set<Integer> liftsOf(SwayRegion sway) {
    java.util.TreeSet<Integer> lifts = new java.util.TreeSet<>();
    sway.shearing().forEach(p -> lifts.add(p.lift()));
    return lifts;
  }

  private static String shearingBays(PlaneGrid grid, SwayRegion sway) {
    java.util.TreeSet<Integer> bays = new java.util.TreeSet<>();
    sway.shearing().forEach(p -> bays.add(p.bay()));
    if (bays.size() == grid.bays()) {
      return " (all bays)";
    }
    return ", " + Ranges.named("bay", "bays", bays);
  }

  private static String where(PlaneGrid grid, SwayRegion sway) {
    if (sway.isEmpty()) {
      return "the whole plane (lifts 1\u2013" + grid.lifts() + ", bays 1\u2013" + grid.bays() + ")";
    }
    String lifts = Ranges.named("lift", "lifts", sway.affectedLifts());
    String bays =
        sway.affectedBays().size() == grid.bays()
            ? "all bays"
            : Ranges.named("bay", "bays", sway.affectedBays());
    return lifts + ", " + bays;
  }

  private static String tolerance(StateAnalysis s) {
    int k = s.lossTolerance();
    String atLeast = s.lossToleranceExact() ? "" : "at least ";
    int critical = s.criticalBraces().size();
    if (k <= 0) {
      return "No spare bracing: "
          + critical
          + (critical == 1 ? " brace is" : " braces are")
          + " critical, and losing any one lets the plane sway.";
    }
    return "Stays rigid after losing any "
        + atLeast
        + k
        + (k == 1 ? " brace." : " braces.");
  }
}
