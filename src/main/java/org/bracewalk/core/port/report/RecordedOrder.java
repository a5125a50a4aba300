package org.bracewalk.core.port.report;

import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * A repair order recorded against the inspection, as Sch. 7 item 6 ("action taken") lists it.
 *
 * @param id the order's id
 * @param createdAt when it was raised
 * @param createdBy who raised it
 * @param note its note, as written
 * @param actions its actions, in the order recorded
 */
public record RecordedOrder(
    long id, Instant createdAt, String createdBy, String note, List<RecordedOrder.Action> actions) {

  public RecordedOrder {
    Objects.requireNonNull(createdAt, "createdAt");
    createdBy = createdBy == null ? "" : createdBy;
    note = note == null ? "" : note;
    actions = List.copyOf(actions);
  }

  /**
   * One recorded action.
   *
   * @param kind what is done (never {@link RepairStepKind#INSPECT}: the four recorded kinds)
   * @param plane the plane's name
   * @param panel the panel, or {@code null} for the whole plane
   * @param member the member to fit, or {@code null}
   * @param description what to do, as written
   * @param dueDate by when, or {@code null}
   * @param doneAt when done, or {@code null} while outstanding
   * @param doneBy who did it
   * @param frameMember the frame member the action is on, or {@code null} (then {@code panel}
   *     names the place, or the whole plane when it is null too)
   */
  public record Action(
      RepairStepKind kind,
      String plane,
      PanelRef panel,
      Brace member,
      String description,
      LocalDate dueDate,
      Instant doneAt,
      String doneBy,
      FrameRef frameMember) {

    /** An action on a panel, or on the whole plane. */
    public Action(RepairStepKind kind, String plane, PanelRef panel, Brace member,
        String description, LocalDate dueDate, Instant doneAt, String doneBy) {
      this(kind, plane, panel, member, description, dueDate, doneAt, doneBy, null);
    }

    public Action {
      Objects.requireNonNull(kind, "kind");
      Objects.requireNonNull(plane, "plane");
      description = description == null ? "" : description;
      doneBy = doneBy == null ? "" : doneBy;
    }
  }
}
