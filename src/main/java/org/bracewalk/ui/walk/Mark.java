package org.bracewalk.ui.walk;

import org.bracewalk.core.model.DefectType;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelState;

/**
 * What the inspector records for one panel's diagonals or one frame member.
 *
 * @param state the state found
 * @param memberFound the member actually there when it differs from what the state implies (the
 *     extra member; the half of a cross that remains), else {@code null}
 * @param defect what is wrong (bent, torn...), or {@code null}
 * @param bowMm the bow measured, to 0.1 mm, or {@code null}
 * @param gaugeLengthMm the straight-edge length the bow was measured over; set with a bow
 * @param note free text, or empty
 * @param photos photo files to attach
 */
public record Mark(
    PanelState state,
    Brace memberFound,
    DefectType defect,
    Double bowMm,
    Integer gaugeLengthMm,
    String note,
    List<Path> photos) {

  /** The straight edge of EN 15635 damage checks: 1 m. */
  public static final int STANDARD_GAUGE_MM = 1000;

  public Mark {
    Objects.requireNonNull(state, "state");
    note = note == null ? "" : note.strip();
    photos = List.copyOf(photos);
    // a mark on a panel's diagonals names an extra member ({@link #finding()} holds that rule); a
    // mark on a frame member names none, extra or not
    if (bowMm != null && gaugeLengthMm == null) {
      gaugeLengthMm = STANDARD_GAUGE_MM;
    }
  }

  public static Mark of(PanelState state) {
    return new Mark(state, null, null, null, null, "", List.of());
  }

  /** The finding of a panel's diagonals; an extra member must be named. */
  public PanelFinding finding() {
    return new PanelFinding(state, memberFound);
  }
}
