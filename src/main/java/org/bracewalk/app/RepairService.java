package org.bracewalk.app;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import org.bracewalk.app.verdict.Terms;
import org.bracewalk.app.verdict.Wording;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.RecordStore;

/**
 * Repair orders raised from an inspection and their actions: raise, add actions, mark done, and
 * mark verified by a later finalised inspection of the same structure. Orders may be raised after
 * the inspection is finalised; the inspection itself does not change.
 */
public final class RepairService {
  private final RecordStore store;
  private final Clock clock;

  public RepairService(RecordStore store, Clock clock) {
    this.store = Objects.requireNonNull(store);
    this.clock = Objects.requireNonNull(clock);
  }

  /** Raises a repair order from an inspection now. */
  public RepairOrder raise(long inspectionId, String createdBy, String note) {
    inspection(inspectionId);
    return store.repairs().addOrder(
        StoredText.order(new RepairOrder(0, inspectionId, clock.instant(), createdBy, note)));
  }

  /**
   * Adds an action to an order: on a panel of a plane the inspection covers ({@code panel}
   * {@code null} for the whole plane), with the brace to fit when there is one.
   */
  public RepairAction addAction(long orderId, long planeId, PanelRef panel, RepairActionKind action,
      Brace brace, String description, LocalDate dueDate, String assignee) {
    PlaneRecord plane = coveredPlane(orderId, planeId);
    if (panel != null && !plane.grid().contains(panel)) {
      throw new UserInputException("panel " + panel + " lies outside plane '" + plane.name() + "'");
    }
    if (action == RepairActionKind.REFIT) {
      throw new UserInputException("refit puts back a frame member (ledger or standard), not a"
          + (panel == null ? " whole plane" : " diagonal of panel " + panel) + ": name the frame"
          + " member, or replace or brace the panel");
    }
    return store.repairs().addAction(StoredText.action(new RepairAction(0, orderId, planeId,
        panel, action, brace, description, dueDate, assignee, null, "", null)));
  }

  /**
   * Adds an action on a frame member (a ledger or standard; racking: a beam, frame horizontal or
   * upright segment) of a plane the inspection covers: {@code refit} a design member found missing,
   * {@code replace} one damaged beyond use, or {@code repair} one. The member must lie in the plane
   * and be in the design in force for the inspection (a member the design leaves out is never
   * refitted, as the check contract's repair never uses one).
   */
  public RepairAction addFrameAction(long orderId, long planeId, FrameRef member,
      RepairActionKind action, String description, LocalDate dueDate, String assignee) {
    Objects.requireNonNull(member, "member");
    Objects.requireNonNull(action, "action");
    PlaneRecord plane = coveredPlane(orderId, planeId);
    Terms terms = Terms.of(structureOf(plane).kind(), plane.role());
    String named = Wording.frameMember(member, terms);
    if (!member.within(plane.grid())) {
      throw new UserInputException("the " + named + " lies outside plane '" + plane.name() + "' ("
          + plane.grid().lifts() + " lifts x " + plane.grid().bays() + " bays)");
    }
    if (action != RepairActionKind.REFIT && action != RepairActionKind.REPLACE
        && action != RepairActionKind.REPAIR) {
      throw new UserInputException("the " + named + " of plane '" + plane.name() + "' can be"
          + " refitted, replaced or repaired, not given the action " + action.label()
          + " (take the whole plane out of service instead)");
    }
    long inspectionId = order(orderId).inspectionId();
    Long revision = store.planes().scopeOf(inspectionId).get(planeId);
    if (revision != null) {
      store.designs().find(revision).ifPresent(d -> {
        if (!d.design().hasFrameMember(member)) {
          throw new UserInputException("the " + named + " of plane '" + plane.name() + "' is left"
              + " out by design revision " + d.number() + ", which inspection " + inspectionId
              + " was checked against: a repair never fits a member the design leaves out (ask"
              + " the designer for a new revision first)");
        }
      });
    }
    return store.repairs().addAction(StoredText.action(new RepairAction(0, orderId, planeId,
        null, action, null, description, dueDate, assignee, null, "", null, member)));
  }

  /** The plane of an order's inspection, refused unless that inspection covers it. */
  private PlaneRecord coveredPlane(long orderId, long planeId) {
    RepairOrder order = order(orderId);
    Inspection inspection = inspection(order.inspectionId());
    PlaneRecord plane = store.planes().find(planeId)
        .orElseThrow(() -> new NotFoundException("plane " + planeId));
    if (plane.structureId() != inspection.structureId()) {
      throw new UserInputException("plane '" + plane.name() + "' is not part of the structure "
          + inspection.label() + " covers");
    }
    if (!store.planes().scopeOf(inspection.id()).containsKey(planeId)) {
      throw new UserInputException("plane '" + plane.name() + "' (id " + planeId + ") is not part of"
          + " inspection " + inspection.id() + ": it was added or retired outside the planes that"
          + " inspection covers; raise the repair from an inspection that covers it");
    }
    return plane;
  }

  private Structure structureOf(PlaneRecord plane) {
    return store.structures().find(plane.structureId())
        .orElseThrow(() -> new NotFoundException("structure " + plane.structureId()));
  }

  /** Records that an action was done now, by {@code doneBy}. */
  public RepairAction markDone(long actionId, String doneBy) {
    action(actionId);
    return store.repairs().markDone(actionId, clock.instant(), StoredText.clean(doneBy, "done by"));
  }

  /**
   * Records that a later, finalised inspection of the same structure confirmed a done action.
   */
  public RepairAction markVerified(long actionId, long inspectionId) {
    RepairAction action = action(actionId);
    Inspection raisedIn = inspection(order(action.orderId()).inspectionId());
    Inspection verifying = inspection(inspectionId);
    if (verifying.structureId() != raisedIn.structureId()) {
      throw new UserInputException(verifying.label() + " is of another structure than "
          + raisedIn.label() + ", where the repair was ordered");
    }
    if (!verifying.isFinalised()) {
      throw new UserInputException(verifying.label() + " is still open; finalise it first");
    }
    if (action.doneAt() == null) {
      throw new UserInputException("repair action " + actionId + " is not done yet");
    }
    if (verifying.finishedAt().isBefore(action.doneAt())) {
      throw new UserInputException(verifying.label() + " finished before repair action "
          + actionId + " was done; a later inspection must verify it");
    }
    return store.repairs().markVerified(actionId, inspectionId);
  }

  /** The orders raised from an inspection. */
  public List<RepairOrder> orders(long inspectionId) {
    inspection(inspectionId);
    return store.repairs().ordersOf(inspectionId);
  }

  /** The actions of an order. */
  public List<RepairAction> actions(long orderId) {
    order(orderId);
    return store.repairs().actionsOf(orderId);
  }

  private Inspection inspection(long id) {
    return store.inspections().find(id).orElseThrow(() -> new NotFoundException("inspection " + id));
  }

  private RepairOrder order(long id) {
    return store.repairs().findOrder(id).orElseThrow(() -> new NotFoundException("repair order " + id));
  }

  private RepairAction action(long id) {
    return store.repairs().findAction(id)
        .orElseThrow(() -> new NotFoundException("repair action " + id));
  }
}
