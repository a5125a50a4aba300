package org.bracewalk.core.port.report;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;

/**
 * One panel not found sound, as the findings table lists it.
 *
 * @param plane the plane's name
 * @param panel lift and bay
 * @param state what was found
 * @param defect the defect type as recorded (free text or a code), may be empty
 * @param bow the measured bow and its level when a racking member's bow was measured, else null
 * @param note the inspector's note, may be empty
 * @param recordedAt when the observation was recorded
 * @param recordedBy who recorded it
 * @param photos photos attached to the observation
 */
public record Finding(
    String plane,
    PanelRef panel,
    PanelState state,
    String defect,
    BowAssessment bow,
    String note,
    Instant recordedAt,
    String recordedBy,
    List<FindingPhoto> photos) {
  public Finding {
    Objects.requireNonNull(plane, "plane");
    Objects.requireNonNull(panel, "panel");
    Objects.requireNonNull(state, "state");
    defect = defect == null ? "" : defect;
    note = note == null ? "" : note;
    recordedBy = recordedBy == null ? "" : recordedBy;
    photos = List.copyOf(photos);
  }
}
