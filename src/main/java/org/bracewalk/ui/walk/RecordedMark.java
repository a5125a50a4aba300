package org.bracewalk.ui.walk;

import java.util.Objects;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * A mark as the record holds it: the id the record gave it, the panel and what was marked. A mark
 * on a frame member names it in {@code member}; its {@code panel} is then a panel it borders (where
 * the cursor goes back to on undo).
 */
public record RecordedMark(long id, PanelRef panel, Mark mark, FrameRef member) {
  public RecordedMark {
    Objects.requireNonNull(panel, "panel");
    Objects.requireNonNull(mark, "mark");
    if (member != null && mark.memberFound() != null) {
      throw new IllegalArgumentException("a mark on the " + member + " names no diagonal found");
    }
  }

  /** A mark on one panel's diagonals. */
  public RecordedMark(long id, PanelRef panel, Mark mark) {
    this(id, panel, mark, null);
  }

  /** Whether this is a mark on a frame member (else on a panel's diagonals). */
  public boolean onFrame() {
    return member != null;
  }
}
