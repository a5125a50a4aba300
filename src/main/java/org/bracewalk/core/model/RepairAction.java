package org.bracewalk.core.model;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Objects;

/**
 * One action of a repair order, on one panel of one plane.
 *
 * @param id stored id; 0 when new
 * @param orderId the repair order
 * @param planeId the plane
 * @param panel the panel; {@code null} when the action concerns the whole plane (say, taking it
 *     out of service)
 * @param action repair, replace, brace or take out of service
 * @param brace the member to fit, when the action fits one; else {@code null}
 * @param description what to do, in words
 * @param dueDate by when; {@code null} when at once
 * @param assignee who is to do it
 * @param doneAt when it was done; {@code null} while outstanding
 * @param doneBy who did it (empty while outstanding)
 * @param verifiedByInspectionId the later inspection that confirmed it; {@code null} until then
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
    Long verifiedByInspectionId) {

  public RepairAction {
    Text.id(id, "repair action id");
    Text.ref(orderId, "repair order");
    Text.ref(planeId, "plane");
    Objects.requireNonNull(action, "action");
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
        doneBy, verifiedByInspectionId);
  }
}
