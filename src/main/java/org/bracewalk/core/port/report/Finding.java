package org.bracewalk.core.port.report;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;

/**
 * One panel or frame member not found sound, as the findings table lists it.
 *
 * @param plane the plane's name
 * @param panel lift and bay; {@code null} for a frame member
 * @param state what was found
 * @param defect the defect type's code ({@code bent}, {@code torn}, ...), or empty when none
 * @param bowMm the measured bow in millimetres, or {@code null} when none was measured
 * @param gaugeMm the straight edge it was measured over, millimetres ({@code null} without a bow)
 * @param bow the bow judged against the racking limits (racking only), else {@code null}
 * @param note the inspector's note, may be empty
 * @param recordedAt when the observation was recorded
 * @param recordedBy who recorded it
 * @param photos photos attached to the observation
 * @param frameMember the ledger or standard recorded; {@code null} for a panel's diagonals.
 *     Exactly one of {@code panel} and {@code frameMember} is given
 */
public record Finding(
    String plane,
    PanelRef panel,
    PanelState state,
    String defect,
    Double bowMm,
    Double gaugeMm,
    BowAssessment bow,
    String note,
    Instant recordedAt,
    String recordedBy,
    List<FindingPhoto> photos,
    FrameRef frameMember) {

  /** A finding on one panel's diagonals. */
  public Finding(String plane, PanelRef panel, PanelState state, String defect, Double bowMm,
      Double gaugeMm, BowAssessment bow, String note, Instant recordedAt, String recordedBy,
      List<FindingPhoto> photos) {
    this(plane, panel, state, defect, bowMm, gaugeMm, bow, note, recordedAt, recordedBy, photos,
        null);
  }

  public Finding {
    Objects.requireNonNull(plane, "plane");
    if ((panel == null) == (frameMember == null)) {
      throw new IllegalArgumentException(
          "a finding is on one panel or on one frame member, not " + (panel == null ? "neither" : "both"));
    }
    Objects.requireNonNull(state, "state");
    defect = defect == null ? "" : defect;
    if (bow != null && bowMm == null) {
      throw new IllegalArgumentException("a damage level needs the bow it was judged from");
    }
    if (bowMm != null && gaugeMm == null) {
      throw new IllegalArgumentException("a bow needs the gauge length it was measured over");
    }
    note = note == null ? "" : note;
    recordedBy = recordedBy == null ? "" : recordedBy;
    photos = List.copyOf(photos);
  }

  /** Whether this finding is on a frame member (else on a panel's diagonals). */
  public boolean isFrameMember() {
    return frameMember != null;
  }
}
