package org.bracewalk.ui.walk;

import java.util.Objects;
import org.bracewalk.core.model.PanelRef;

/** A mark as the record holds it: the id the record gave it, the panel and what was marked. */
public record RecordedMark(long id, PanelRef panel, Mark mark) {
  public RecordedMark {
    Objects.requireNonNull(panel, "panel");
    Objects.requireNonNull(mark, "mark");
  }
}
