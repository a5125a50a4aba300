package org.bracewalk.core.port.report;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * One numbered action of the repair plan, in the order to do it.
 *
 * @param number 1, 2, ... in working order
 * @param plane the plane's name
 * @param panel the panel (for {@link RepairStepKind#TAKE_OUT_OF_SERVICE} and {@link
 *     RepairStepKind#OFFLOAD_BESIDE} the lowest panel of the affected part); {@code null} for an
 *     action on a frame member
 * @param lifts for taking out of service and off-loading beside: every lift of the affected part;
 *     else the panel's lift
 * @param type what to do
 * @param member the member to fit or repair ({@code null} for taking out of service)
 * @param priority why and how soon
 * @param deviation true when the member is not in the design (needs engineering approval first)
 * @param dueDate when it falls due, or {@code null} for "at once"
 * @param frameMember the ledger or standard to refit, replace or inspect; {@code null} for an
 *     action on a panel. Exactly one of {@code panel} and {@code frameMember} is given
 */
public record RepairStep(
    int number,
    String plane,
    PanelRef panel,
    List<Integer> lifts,
    RepairStepKind type,
    Brace member,
    RepairUrgency priority,
    boolean deviation,
    LocalDate dueDate,
    FrameRef frameMember) {

  /** An action on a panel. */
  public RepairStep(int number, String plane, PanelRef panel, List<Integer> lifts,
      RepairStepKind type, Brace member, RepairUrgency priority, boolean deviation,
      LocalDate dueDate) {
    this(number, plane, panel, lifts, type, member, priority, deviation, dueDate, null);
  }

  public RepairStep {
    if (number < 1) {
      throw new IllegalArgumentException("actions are numbered from 1, got " + number);
    }
    Objects.requireNonNull(plane, "plane");
    if ((panel == null) == (frameMember == null)) {
      throw new IllegalArgumentException("action " + number + " is on one panel or on one frame"
          + " member, not " + (panel == null ? "neither" : "both"));
    }
    if (frameMember != null && (member != null || type.wholeLifts()
        || type == RepairStepKind.BRACE)) {
      throw new IllegalArgumentException("action " + number + " on the " + frameMember
          + " fits no diagonal and is not " + type.code());
    }
    Objects.requireNonNull(type, "type");
    Objects.requireNonNull(priority, "priority");
    lifts = List.copyOf(lifts);
  }

  /** Whether this action is on a frame member (else on a panel). */
  public boolean isFrameMember() {
    return frameMember != null;
  }
}
