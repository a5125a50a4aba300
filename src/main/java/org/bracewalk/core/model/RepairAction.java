package org.bracewalk.core.model;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Objects;

/**
 * One action of a repair order, on one panel or one frame member (ledger, standard) of one plane.
 *
 * @param id stored id; 0 when new
 * @param orderId the repair order
 * @param planeId the plane
 * @param panel the panel; {@code null} when the action concerns the whole plane (say, taking it
 *     out of service)
 * @param action repair, replace, brace or take out of service; refit only on a frame member
 * @param brace the member to fit, when the action fits one; else {@code null}
 * @param description what to do, in words
 * @param dueDate by when; {@code null} when at once
 * @param assignee who is to do it
 * @param doneAt when it was done; {@code null} while outstanding
 * @param doneBy who did it (empty while outstanding)
 * @param verifiedByInspectionId the later inspection that confirmed it; {@code null} until then
 * @param frameMember the ledger or standard the action is on (to replace or refit it); then {@code
 *     panel} and {@code brace} are {@code null}. {@code null} for an action on a panel or the
 *     whole plane
 */
public record RepairAction(
    long id,
    long orderId,
    long planeId,
    PanelRef panel,
    RepairActionKind action,
    Brace brace,
    String description,
    LocalDate dueDate,
    String assignee,
    Instant doneAt,
    String doneBy,
    Long verifiedByInspectionId,
    FrameRef frameMember) {

  /** An action on a panel, or on the whole plane when {@code panel} is null. */
  public RepairAction(long id, long orderId, long planeId, PanelRef panel, RepairActionKind action,
      Brace brace, String description, LocalDate dueDate, String assignee, Instant doneAt,
      String doneBy, Long verifiedByInspectionId) {
    this(id, orderId, planeId, panel, action, brace, description, dueDate, assignee, doneAt,
        doneBy, verifiedByInspectionId, null);
  }

  public RepairAction {
    Text.id(id, "repair action id");
    Text.ref(orderId, "repair order");
    Text.ref(planeId, "plane");
    Objects.requireNonNull(action, "action");
    if (frameMember != null) {
      if (panel != null || brace != null) {
        throw new IllegalArgumentException(
            "an action on the " + frameMember + " names no panel and no diagonal");
      }
      if (action == RepairActionKind.BRACE || action == RepairActionKind.TAKE_OUT_OF_SERVICE) {
        throw new IllegalArgumentException("the " + frameMember + " can be repaired, replaced"
            + " or refitted, not " + action.label() + " (take the whole plane out of service"
            + " instead)");
      }
    } else if (action == RepairActionKind.REFIT) {
      throw new IllegalArgumentException("refit puts back a frame member (a ledger or standard):"
          + " name one; fit a diagonal with replace or brace");
    }
    description = Text.optional(description);
    assignee = Text.optional(assignee);
    doneBy = Text.optional(doneBy);
    if (doneAt == null && !doneBy.isBlank()) {
      throw new IllegalArgumentException("an action done by " + doneBy + " needs the time it was done");
    }
    if (verifiedByInspectionId != null) {
      Text.ref(verifiedByInspectionId, "verifying inspection");
      if (doneAt == null) {
        throw new IllegalArgumentException("an action cannot be verified before it is done");
      }
    }
  }

  public boolean isDone() {
    return doneAt != null;
  }

  public RepairAction withId(long newId) {
    return new RepairAction(
        newId, orderId, planeId, panel, action, brace, description, dueDate, assignee, doneAt,
        doneBy, verifiedByInspectionId, frameMember);
  }

  /** Whether this action is on a frame member. */
  public boolean isFrameMember() {
    return frameMember != null;
  }
}
