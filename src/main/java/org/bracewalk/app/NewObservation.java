package org.bracewalk.app;

import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;

/**
 * What the inspector records about one panel's diagonals or one frame member ({@code panel} null and
 * {@code frameMember} given); the service adds the inspection, the time (from its
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
    String recordedBy,
    FrameRef frameMember) {

  /** A record of one panel's diagonals. */
  public NewObservation(
      long planeId,
      PanelRef panel,
      PanelState state,
      Brace memberFound,
      Double bowMm,
      Integer gaugeLengthMm,
      DefectType defect,
      String note,
      String recordedBy) {
    this(planeId, panel, state, memberFound, bowMm, gaugeLengthMm, defect, note, recordedBy, null);
  }

  public NewObservation {
    if ((panel == null) == (frameMember == null)) {
      throw new IllegalArgumentException("record one panel's diagonals or one frame member");
    }
    Objects.requireNonNull(state, "state");
  }

  /** A plain finding on a frame member: state only. */
  public static NewObservation ofMember(long planeId, FrameRef member, PanelState state, String by) {
    return new NewObservation(planeId, null, state, null, null, null, null, null, by, member);
  }

  /** A plain finding: state only, member as designed. */
  public static NewObservation of(long planeId, PanelRef panel, PanelState state, String by) {
    return new NewObservation(planeId, panel, state, null, null, null, null, null, by);
  }
}
