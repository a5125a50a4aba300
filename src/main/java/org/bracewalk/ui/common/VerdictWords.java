package org.bracewalk.ui.common;

import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.app.verdict.VerdictKind;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.StateAnalysis;
import java.util.Set;
import org.bracewalk.app.verdict.Wording;
import org.bracewalk.core.model.FrameRef;

/**
 * The one {@link Verdict} laid out for a screen: the headline is the verdict's own words, the
 * advice names its keep-off zone in the words of {@link Verdict#keepOff()}, so the walk-round, the
 * findings screen, the command line and the documents say the same. Never calls a structure safe.
 *
 * @param kind which of the verdicts
 * @param headline a few words, with the verdict's symbol
 * @param detail what the analysis found: motions, critical braces, loss tolerance
 * @param advice what to do now
 * @param verdict the verdict these words show
 * @param action what the competent person is to do (empty unless it lost rigidity)
 */
public record VerdictWords(
    VerdictKind kind, String headline, String detail, String advice, Verdict verdict, String action) {

  /**
   * The banner over a plane that lost rigidity, built from the parts (never cut out of the
   * advice): {@code LOST RIGIDITY — Aisle C, frame 2. Keep people and loads off lifts 1-5, bay 1
   * until a competent person has acted. Competent person to act: ...}; empty otherwise.
   */
  public String alarm(String title) {
    if (!kind.lost()) {
      return "";
    }
    return kind.headline().toUpperCase(java.util.Locale.ROOT) + " \u2014 "
        + (title == null || title.isBlank() ? "" : title + ". ") + verdict.keepOff() + " " + action;
  }

  /**
   * Words for a verdict.
   *
   * @param verdict the one verdict
   * @param state the conservative state it was classified from (loss tolerance, critical braces)
   * @param repairCount braces in the minimal repair set
   */
  public static VerdictWords of(Verdict verdict, StateAnalysis state, int repairCount) {
    return of(verdict, state, repairCount, Set.of());
  }

  /**
   * As above, naming at each joint that can move the frame members not there ({@code absent}:
   * missing, beyond use, not inspected or left out of the design).
   */
  public static VerdictWords of(Verdict verdict, StateAnalysis state, int repairCount, Set<FrameRef> absent) {
    VerdictKind kind = verdict.kind();
    int unknown = verdict.unknownPanels();
    String stillToInspect =
        unknown > 0 ? " " + unknown + plural(unknown, " panel", " panels") + " still to inspect." : "";
    if (kind.lost()) {
      boolean jointsOnly = !state.freedoms().isEmpty() && state.freedomsOf(FreedomKind.SWAY) == 0;
      String detail = kind == VerdictKind.SWAYS_ONE_WAY
          ? "Tension-only members go slack one way, so the plane can lean that way."
          : verdict.degreesOfFreedom()
              + plural(verdict.degreesOfFreedom(), " independent motion", " independent motions")
              + (jointsOnly ? "." : "; the lowest swaying lift carries every lift above it sideways.")
              + freedoms(verdict, state, absent);
      String what = state.frameComplete()
          ? plural(repairCount, " brace", " braces")
          : plural(repairCount, " member", " members") + " (braces, ledgers or standards)";
      String fix;
      if (kind == VerdictKind.LOST_RESTRAINT) {
        fix = "Competent person to act: refit the " + (repairCount > 0 ? repairCount + what : "members")
            + " shown under Findings, and have an engineer check the member before it is loaded.";
      } else if (repairCount > 0) {
        fix = "Competent person to act: fit the " + repairCount + what
            + " shown under Findings, or take this part out of service.";
      } else {
        fix = "Competent person to act: take this part out of service until it is re-braced.";
      }
      return new VerdictWords(kind, kind.headline(), detail,
          verdict.keepOff() + " " + fix + stillToInspect, verdict, fix);
    }
    String tolerance = tolerance(state);
    if (kind == VerdictKind.DEPENDS_ON_UNSEEN || kind == VerdictKind.NOT_INSPECTED) {
      return new VerdictWords(kind, kind.headline(),
          "Holds its shape only if the " + unknown + plural(unknown, " panel", " panels")
              + " not yet inspected are as designed.",
          "Inspect the remaining panels before relying on this verdict."
              + (verdict.keepOffZone().isPresent() ? " Until then, at worst: " + verdict.keepOff() : ""),
          verdict, "");
    }
    String unseen = unknown > 0
        ? " The " + unknown + plural(unknown, " panel", " panels") + " not inspected cannot change this."
        : "";
    return new VerdictWords(kind, kind.headline(), tolerance + unseen,
        "Bracing check only: record any other defect and act on it as the inspection requires.",
        verdict, "");
  }

  /**
   * The freedoms told apart by kind, in the one verdict's words ({@link Verdict#freedomWords}): a
   * part that sways, a member running unrestrained through a joint (naming it and the place), a
   * loose end (naming the one member holding it), each with the frame members not there at that
   * joint; the note on lost sideways restraint once when there is one. At most four are spelt out.
   * Empty when the frame is complete (the swaying lifts are then named by the keep-off zone).
   */
  static String freedoms(Verdict verdict, StateAnalysis s, Set<FrameRef> absent) {
    if (s.frameComplete() || verdict.freedoms().isEmpty()) {
      return "";
    }
    List<String> out = new ArrayList<>();
    for (String w : verdict.freedomWords(absent)) {
      out.add(Character.toUpperCase(w.charAt(0)) + w.substring(1) + ".");
    }
    int shown = Math.min(4, out.size());
    String more = out.size() > shown ? " And " + (out.size() - shown) + " more under Findings." : "";
    String note = verdict.anyLostRestraint() ? " " + Wording.LOST_RESTRAINT_NOTE : "";
    return " " + String.join(" ", out.subList(0, shown)) + more + note;
  }

  private static String plural(int n, String one, String many) {
    return n == 1 ? one : many;
  }

  private static String tolerance(StateAnalysis s) {
    int k = s.lossTolerance();
    String atLeast = s.lossToleranceExact() ? "" : "at least ";
    int critical = s.criticalBraces().size();
    if (k <= 0) {
      return "No spare bracing: " + critical + (critical == 1 ? " brace is" : " braces are")
          + " critical, and losing any one lets the plane sway.";
    }
    return "Stays rigid after losing any " + atLeast + k + (k == 1 ? " brace." : " braces.");
  }
}
