package org.bracewalk.app;

import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;

/**
 * What the inspector records about one panel; the service adds the inspection, the time (from its
 * clock) and, for a correction, what it supersedes. Optional values may be {@code null}; see
 * {@link org.bracewalk.core.model.Observation} for their meaning.
 */
public record NewObservation(
    long planeId,
    PanelRef panel,
    PanelState state,
    Brace memberFound,
    Double bowMm,
    Integer gaugeLengthMm,
    DefectType defect,
    String note,
    String recordedBy) {

  public NewObservation {
    Objects.requireNonNull(panel, "panel");
    Objects.requireNonNull(state, "state");
  }

  /** A plain finding: state only, member as designed. */
  public static NewObservation of(long planeId, PanelRef panel, PanelState state, String by) {
    return new NewObservation(planeId, panel, state, null, null, null, null, null, by);
  }
}
