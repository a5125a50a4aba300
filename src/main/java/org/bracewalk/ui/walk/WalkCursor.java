package org.bracewalk.ui.walk;

import java.util.List;
import java.util.function.Predicate;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

/** The walk order and the cursor that walks it. One job: where the inspector is. */
final class WalkCursor {
  private final PlaneGrid grid;
  private final Predicate<PanelRef> marked;
  private final ObjectProperty<WalkOrder> order = new SimpleObjectProperty<>(this, "order");
  private final ReadOnlyObjectWrapper<PanelRef> cursor = new ReadOnlyObjectWrapper<>(this, "cursor");
  private List<PanelRef> sequence;

  /**
   * @param grid the plane's grid
   * @param marked true for a panel that already holds a mark (the cursor starts on the first that does not)
   */
  WalkCursor(PlaneGrid grid, Predicate<PanelRef> marked) {
    this.grid = grid;
    this.marked = marked;
    order.set(WalkOrder.BAYS_UP_AND_DOWN);
    sequence = order.get().sequence(grid);
    order.addListener((obs, a, b) -> sequence = b.sequence(grid));
    cursor.set(firstUnmarked());
  }

  /** Moves to the next panel in the walk order; false when already on the last. */
  boolean next() {
    int i = sequence.indexOf(cursor.get());
    if (i < sequence.size() - 1) {
      cursor.set(sequence.get(i + 1));
      return true;
    }
    return false;
  }

  /** Moves to the previous panel in the walk order (stays on the first). */
  void previous() {
    int i = sequence.indexOf(cursor.get());
    if (i > 0) {
      cursor.set(sequence.get(i - 1));
    }
  }

  /** Moves by whole panels: {@code dLift} up, {@code dBay} right, stopping at edges. */
  void move(int dLift, int dBay) {
    PanelRef p = cursor.get();
    int lift = Math.max(1, Math.min(grid.lifts(), p.lift() + dLift));
    int bay = Math.max(1, Math.min(grid.bays(), p.bay() + dBay));
    cursor.set(new PanelRef(lift, bay));
  }

  /** Puts the cursor on {@code p} when it is in the grid. */
  void select(PanelRef p) {
    if (grid.contains(p)) {
      cursor.set(p);
    }
  }

  /** The first panel, in walk order, that has no mark yet (else the first panel). */
  PanelRef firstUnmarked() {
    for (PanelRef p : sequence) {
      if (!marked.test(p)) {
        return p;
      }
    }
    return sequence.get(0);
  }

  /** Cycles the walk order. */
  void cycleOrder() {
    WalkOrder[] all = WalkOrder.values();
    order.set(all[(order.get().ordinal() + 1) % all.length]);
  }

  /** Where {@code c} is in the walk order, from 1. */
  int position(PanelRef c) {
    return sequence.indexOf(c) + 1;
  }

  List<PanelRef> sequence() {
    return List.copyOf(sequence);
  }

  int length() {
    return sequence.size();
  }

  ObjectProperty<WalkOrder> orderProperty() {
    return order;
  }

  ReadOnlyObjectProperty<PanelRef> cursorProperty() {
    return cursor.getReadOnlyProperty();
  }

  PanelRef get() {
    return cursor.get();
  }

  void set(PanelRef p) {
    cursor.set(p);
  }
}
