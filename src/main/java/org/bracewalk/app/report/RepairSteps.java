package org.bracewalk.app.report;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.core.port.report.RackDamageLevel;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.RepairUrgency;

/**
 * Draws up the repair plan from the engine's analyses, in the order the crew works it:
 *
 * <ol>
 *   <li>take out of service: every plane that lost rigidity (on a pinned base from its lowest
 *       swaying lift to the top, since everything above moves with it; a free plane whole), for a
 *       racking upright frame followed by off-loading the beam bays on both sides of it (their
 *       beams bear on it), and every racking member bowed beyond twice its limit;
 *   <li>the engine's minimal repair set of each plane (needed for rigidity: at once), frame members
 *       (ledgers, standards) before diagonals, since the diagonals are fixed to them;
 *   <li>the rest of the restore-to-design lists, frame members first (restores redundancy only);
 *   <li>racking members to repair within 4 weeks that no earlier step covers.
 * </ol>
 *
 * Within a group, planes come in the given order and panels by lift, then bay. Actions follow
 * 29 CFR 1926.451(f)(4): a design member missing or damaged beyond use is replaced, a brace the
 * design lacks is a brace added (a deviation: engineering approval first), a panel nobody has
 * looked at is inspected first. A design frame member found missing is refitted, one damaged beyond
 * use replaced, one recorded as not inspected (or not reachable) inspected first; a repair never
 * proposes a frame member the design leaves out (the engine never lists one).
 */
public final class RepairSteps {
  private static final int REPAIR_WITHIN_DAYS = 28;

  private RepairSteps() {}

  /**
   * @param planes the planes with their analyses, in report order
   * @param bows the judged bows of racking members, per plane name and panel (may be empty)
   * @param day the day of the inspection, from which "at once" and due dates count
   */
  public static List<RepairStep> plan(
      List<PlaneSection> planes, Map<String, Map<PanelRef, BowAssessment>> bows, LocalDate day) {
    List<Draft> isolate = new ArrayList<>();
    List<Draft> rigidity = new ArrayList<>();
    List<Draft> redundancy = new ArrayList<>();
    List<Draft> scheduled = new ArrayList<>();
    for (PlaneSection plane : planes) {
      String name = plane.name();
      Map<PanelRef, BowAssessment> planeBows = bows.getOrDefault(name, Map.of());
      Set<PanelRef> covered = new HashSet<>();
      boolean planeIsolated = false;
      Verdict verdict = Verdict.of(plane.analysis(), plane.role(), !plane.findings().isEmpty());
      if (verdict.keepOffZone().isPresent()) {
        List<Integer> lifts = verdict.keepOffZone().get().lifts();
        isolate.add(new Draft(name, new PanelRef(lifts.get(0), 1), lifts,
            RepairStepKind.TAKE_OUT_OF_SERVICE, null, RepairUrgency.ISOLATE, false, day));
        if (verdict.keepOffZone().get().offloadBeside()) {
          isolate.add(new Draft(name, new PanelRef(lifts.get(0), 1), lifts,
              RepairStepKind.OFFLOAD_BESIDE, null, RepairUrgency.ISOLATE, false, day));
        }
        planeIsolated = true;
      }
      if (!planeIsolated) {
        for (Map.Entry<PanelRef, BowAssessment> e : new java.util.TreeMap<>(planeBows).entrySet()) {
          if (e.getValue().level() == RackDamageLevel.OFFLOAD_AND_ISOLATE) {
            isolate.add(new Draft(name, e.getKey(), List.of(e.getKey().lift()),
                RepairStepKind.TAKE_OUT_OF_SERVICE, null, RepairUrgency.ISOLATE, false, day));
          }
        }
      }
      int lifts = plane.design().grid().lifts();
      Set<FrameRef> coveredFrame = new HashSet<>();
      for (RepairMember rm : plane.analysis().repair().members()) {
        rigidity.add(Draft.frame(name, rm.member(), liftsOf(rm.member(), lifts), frameKind(plane, rm.member()),
            RepairUrgency.NEEDED_FOR_RIGIDITY, day));
        coveredFrame.add(rm.member());
      }
      List<Draft> frameRedundancy = new ArrayList<>();
      for (RestoreFrameItem item : plane.analysis().repair().restoreFrame()) {
        if (!coveredFrame.add(item.member())) {
          continue;
        }
        if (item.neededForRigidity()) {
          rigidity.add(Draft.frame(name, item.member(), liftsOf(item.member(), lifts), frameKind(plane, item.member()),
              RepairUrgency.NEEDED_FOR_RIGIDITY, day));
        } else {
          frameRedundancy.add(Draft.frame(name, item.member(), liftsOf(item.member(), lifts), frameKind(plane, item.member()),
              RepairUrgency.RESTORES_REDUNDANCY, null));
        }
      }
      redundancy.addAll(frameRedundancy);
      for (RepairBrace rb : plane.analysis().repair().braces()) {
        RepairStepKind kind = !rb.inDesign() ? RepairStepKind.BRACE
            : uninspected(plane, rb.panel()) ? RepairStepKind.INSPECT : RepairStepKind.REPLACE;
        rigidity.add(new Draft(name, rb.panel(), List.of(rb.panel().lift()), kind, rb.brace(),
            RepairUrgency.NEEDED_FOR_RIGIDITY, !rb.inDesign(), day));
        covered.add(rb.panel());
      }
      for (RestoreItem item : plane.analysis().repair().restoreToDesign()) {
        if (covered.contains(item.panel())) {
          continue;
        }
        RepairStepKind kind =
            uninspected(plane, item.panel()) ? RepairStepKind.INSPECT : RepairStepKind.REPLACE;
        RepairUrgency urgency =
            item.neededForRigidity() ? RepairUrgency.NEEDED_FOR_RIGIDITY : RepairUrgency.RESTORES_REDUNDANCY;
        (item.neededForRigidity() ? rigidity : redundancy).add(new Draft(name, item.panel(),
            List.of(item.panel().lift()), kind, item.missing(), urgency, false,
            item.neededForRigidity() ? day : null));
        covered.add(item.panel());
      }
      for (Map.Entry<PanelRef, BowAssessment> e : new java.util.TreeMap<>(planeBows).entrySet()) {
        if (e.getValue().level() == RackDamageLevel.REPAIR_WITHIN_4_WEEKS
            && !covered.contains(e.getKey())) {
          scheduled.add(new Draft(name, e.getKey(), List.of(e.getKey().lift()),
              RepairStepKind.REPAIR, plane.design().braceAt(e.getKey()), RepairUrgency.SCHEDULED,
              false, day.plusDays(REPAIR_WITHIN_DAYS)));
        }
      }
    }
    List<RepairStep> steps = new ArrayList<>();
    for (List<Draft> group : List.of(isolate, rigidity, redundancy, scheduled)) {
      for (Draft d : group) {
        steps.add(new RepairStep(steps.size() + 1, d.plane, d.panel, d.lifts, d.kind, d.member,
            d.urgency, d.deviation, d.due, d.frameMember));
      }
    }
    return steps;
  }

  private static boolean uninspected(PlaneSection plane, PanelRef p) {
    PanelFinding f = plane.findings().get(p);
    return f == null || !f.state().inspected() || f.state() == PanelState.NOT_REACHABLE;
  }

  /**
   * What is done to a design frame member: inspected when recorded as not inspected or not
   * reachable, replaced when damaged beyond use, else (missing, or absent with nothing recorded)
   * refitted.
   */
  static RepairStepKind frameKind(PlaneSection plane, FrameRef member) {
    PanelState s = plane.frameFindings().get(member);
    if (s != null && !s.inspected()) {
      return RepairStepKind.INSPECT;
    }
    return s == PanelState.DAMAGED_INEFFECTIVE ? RepairStepKind.REPLACE : RepairStepKind.REFIT;
  }

  /** The lifts a frame member belongs to: a standard's lift; a ledger's lift below and above. */
  static List<Integer> liftsOf(FrameRef f, int lifts) {
    if (!f.isLedger()) {
      return List.of(f.first());
    }
    List<Integer> out = new ArrayList<>();
    if (f.first() >= 1) {
      out.add(f.first());
    }
    if (f.first() + 1 <= lifts) {
      out.add(f.first() + 1);
    }
    return out;
  }

  private record Draft(
      String plane, PanelRef panel, List<Integer> lifts, RepairStepKind kind,
      org.bracewalk.core.model.Brace member, RepairUrgency urgency, boolean deviation,
      LocalDate due, FrameRef frameMember) {

    Draft(String plane, PanelRef panel, List<Integer> lifts, RepairStepKind kind,
        org.bracewalk.core.model.Brace member, RepairUrgency urgency, boolean deviation,
        LocalDate due) {
      this(plane, panel, lifts, kind, member, urgency, deviation, due, null);
    }

    static Draft frame(String plane, FrameRef member, List<Integer> lifts, RepairStepKind kind,
        RepairUrgency urgency, LocalDate due) {
      return new Draft(plane, null, lifts, kind, null, urgency, false, due, member);
    }
  }
}
