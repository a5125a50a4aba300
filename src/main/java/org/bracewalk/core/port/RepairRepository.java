package org.bracewalk.core.port;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;

/** Repair orders and their actions. */
public interface RepairRepository {
  RepairOrder addOrder(RepairOrder order);

  RepairAction addAction(RepairAction action);

  Optional<RepairOrder> findOrder(long id);

  Optional<RepairAction> findAction(long id);

  /** The orders raised from one inspection, by id. */
  List<RepairOrder> ordersOf(long inspectionId);

  /** The actions of one order, by id. */
  List<RepairAction> actionsOf(long orderId);

  /** Records that an outstanding action was done, and returns it. */
  RepairAction markDone(long actionId, Instant doneAt, String doneBy);

  /** Records that a later inspection confirmed a done action, and returns it. */
  RepairAction markVerified(long actionId, long inspectionId);
}
