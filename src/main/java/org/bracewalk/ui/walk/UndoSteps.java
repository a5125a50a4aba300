package org.bracewalk.ui.walk;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Optional;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * The marks made in this walk-round, newest first, so undo can correct them. One job: undo. A step
 * names its write by ticket ({@link MarkWrites}); the record ids stay on the write queue.
 */
final class UndoSteps {
  /**
   * One mark made in this session: the panel, what it held before (null: nothing), the mark made,
   * the ticket of its write, and the frame member marked (null: the panel's diagonals).
   */
  record Step(PanelRef panel, Mark before, Mark made, long ticket, FrameRef member) {
    /** A mark on the panel's diagonals. */
    Step(PanelRef panel, Mark before, Mark made, long ticket) {
      this(panel, before, made, ticket, null);
    }
  }

  private final Deque<Step> steps = new ArrayDeque<>();
  private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");

  void made(Step step) {
    steps.push(step);
    canUndo.set(true);
  }

  /** The newest step, if any, still held until {@link #undone()}. */
  Optional<Step> newest() {
    return Optional.ofNullable(steps.peek());
  }

  /** The newest step was corrected. */
  void undone() {
    steps.pop();
    canUndo.set(!steps.isEmpty());
  }

  /** The write {@code ticket} never reached the record: there is nothing of it to undo. */
  void forget(long ticket) {
    steps.removeIf(s -> s.ticket() == ticket);
    canUndo.set(!steps.isEmpty());
  }

  ReadOnlyBooleanProperty canUndoProperty() {
    return canUndo.getReadOnlyProperty();
  }
}
