package org.bracewalk.app;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
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
    if (panel != null && !plane.grid().contains(panel)) {
      throw new UserInputException("panel " + panel + " lies outside plane '" + plane.name() + "'");
    }
    return store.repairs().addAction(StoredText.action(new RepairAction(0, orderId, planeId,
        panel, action, brace, description, dueDate, assignee, null, "", null)));
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
