package org.bracewalk.ui.walk;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.ui.common.PanelSide;

/**
 * The walk order and the cursor that walks it: the current panel and, when one is selected, the
 * side of it (a ledger or standard). One job: where the inspector is. The walk order takes in the
 * frame members or not ({@link #frameInWalkProperty()}); either way any side can be selected.
 */
final class WalkCursor {
  private final PlaneDesign design;
  private final PlaneGrid grid;
  private final Predicate<WalkStop> marked;
  private final ObjectProperty<WalkOrder> order = new SimpleObjectProperty<>(this, "order");
  private final BooleanProperty frameInWalk = new SimpleBooleanProperty(this, "frameInWalk", false);
  private final ReadOnlyObjectWrapper<PanelRef> cursor = new ReadOnlyObjectWrapper<>(this, "cursor");
  private final ReadOnlyObjectWrapper<PanelSide> side = new ReadOnlyObjectWrapper<>(this, "side");
  private List<WalkStop> sequence;
  private Map<WalkStop, Integer> index;
  /** Each panel's place in the order of every panel the walk follows. */
  private Map<PanelRef, Integer> fullIndex;

  /**
   * @param design the plane's design (a braced order visits the panels it braces)
   * @param marked true for a stop that already holds a mark (the cursor starts on the first that does not)
   */
  WalkCursor(PlaneDesign design, Predicate<WalkStop> marked) {
    this.design = design;
    this.grid = design.grid();
    this.marked = marked;
    order.set(WalkOrder.BAYS_UP_AND_DOWN);
    rebuild();
    order.addListener((obs, a, b) -> rebuild());
    frameInWalk.addListener((obs, a, b) -> rebuild());
    set(firstUnmarked());
  }

  private void rebuild() {
    sequence = order.get().stops(design, frameInWalk.get());
    index = new HashMap<>(sequence.size() * 2);
    for (int i = 0; i < sequence.size(); i++) {
      index.put(sequence.get(i), i);
    }
    List<PanelRef> all = order.get().everyPanel().sequence(grid);
    fullIndex = new HashMap<>(all.size() * 2);
    for (int i = 0; i < all.size(); i++) {
      fullIndex.put(all.get(i), i);
    }
  }

  /**
   * Where a stop stands in the order of every panel this walk follows: its panel's place there,
   * then the diagonals before the sides. Orders stops the walk leaves out among those it takes in.
   */
  private int rank(WalkStop s) {
    Integer i = fullIndex.get(s.panel());
    return (i == null ? 0 : i) * 5 + (s.side() == null ? 0 : 1 + s.side().ordinal());
  }

  /** Moves to the next stop in the walk order; false when already on the last. */
  boolean next() {
    Integer i = index.get(stop());
    if (i != null) {
      if (i < sequence.size() - 1) {
        set(sequence.get(i + 1));
        return true;
      }
      return false;
    }
    // off the walk (a panel a braced order leaves out, a side): the next stop after it
    int here = rank(stop());
    for (WalkStop s : sequence) {
      if (rank(s) > here) {
        set(s);
        return true;
      }
    }
    return false;
  }

  /** Moves to the previous stop in the walk order (stays on the first). */
  void previous() {
    Integer i = index.get(stop());
    if (i != null) {
      if (i > 0) {
        set(sequence.get(i - 1));
      }
      return;
    }
    int here = rank(stop());
    WalkStop before = null;
    for (WalkStop s : sequence) {
      if (rank(s) < here) {
        before = s;
      }
    }
    if (before != null) {
      set(before);
    }
  }

  /** Moves by whole panels: {@code dLift} up, {@code dBay} right, stopping at edges; the side selected stays. */
  void move(int dLift, int dBay) {
    PanelRef p = cursor.get();
    int lift = Math.max(1, Math.min(grid.lifts(), p.lift() + dLift));
    int bay = Math.max(1, Math.min(grid.bays(), p.bay() + dBay));
    cursor.set(new PanelRef(lift, bay));
  }

  /** Puts the cursor on {@code p}'s diagonals when it is in the grid. */
  void select(PanelRef p) {
    if (grid.contains(p)) {
      set(WalkStop.of(p));
    }
  }

  /**
   * Selects {@code s} of the current panel; selecting the side already selected goes back to the
   * panel's diagonals.
   */
  void selectSide(PanelSide s) {
    side.set(s == side.get() ? null : s);
  }

  /**
   * Selects the frame member {@code f}: as a side of the current panel when it borders it, else
   * of a panel it borders.
   */
  void selectMember(FrameRef f) {
    if (!f.within(grid)) {
      return;
    }
    PanelSide s = PanelSide.of(cursor.get(), f);
    if (s != null) {
      side.set(s);
    } else {
      PanelSide.Placed placed = PanelSide.place(f);
      set(new WalkStop(placed.panel(), placed.side()));
    }
  }

  /**
   * The first stop, in walk order, that has no mark yet; else the first panel of the grid with
   * none (a braced order leaves some out); else the first stop.
   */
  WalkStop firstUnmarked() {
    for (WalkStop s : sequence) {
      if (!marked.test(s)) {
        return s;
      }
    }
    for (PanelRef p : order.get().everyPanel().sequence(grid)) {
      if (!marked.test(WalkStop.of(p))) {
        return WalkStop.of(p);
      }
    }
    return sequence.isEmpty() ? WalkStop.of(new PanelRef(1, 1)) : sequence.get(0);
  }

  /** Cycles the walk order. */
  void cycleOrder() {
    WalkOrder[] all = WalkOrder.values();
    order.set(all[(order.get().ordinal() + 1) % all.length]);
  }

  /** Where {@code s} is in the walk order, from 1; 0 when the walk does not take it in. */
  int position(WalkStop s) {
    Integer i = index.get(s);
    return i == null ? 0 : i + 1;
  }

  /** The panels of the walk, in order (each once). */
  List<PanelRef> sequence() {
    return order.get().sequence(design);
  }

  /** Every stop of the walk, in order. */
  List<WalkStop> stops() {
    return List.copyOf(sequence);
  }

  int length() {
    return sequence.size();
  }

  ObjectProperty<WalkOrder> orderProperty() {
    return order;
  }

  BooleanProperty frameInWalkProperty() {
    return frameInWalk;
  }

  ReadOnlyObjectProperty<PanelRef> cursorProperty() {
    return cursor.getReadOnlyProperty();
  }

  ReadOnlyObjectProperty<PanelSide> sideProperty() {
    return side.getReadOnlyProperty();
  }

  PanelRef get() {
    return cursor.get();
  }

  /** The stop the cursor stands on. */
  WalkStop stop() {
    return new WalkStop(cursor.get(), side.get());
  }

  /** Puts the cursor on {@code s} (the side first, so a listener of the panel sees both). */
  void set(WalkStop s) {
    side.set(s.side());
    cursor.set(s.panel());
  }

  void set(PanelRef p) {
    set(WalkStop.of(p));
  }
}
