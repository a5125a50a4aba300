package org.bracewalk.ui.walk;

import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelState;

/**
 * What the inspector records for one panel.
 *
 * @param state the state found
 * @param memberFound the member actually there when it differs from what the state implies (the
 *     extra member; the half of a cross that remains), else {@code null}
 * @param defectType a short defect word (bent, torn...), or empty
 * @param bowMm the bow measured over the gauge length in whole millimetres, or {@code null}
 * @param note free text, or empty
 * @param photos photo files to attach
 */
public record Mark(
    PanelState state, Brace memberFound, String defectType, Integer bowMm, String note, List<Path> photos) {

  public Mark {
    Objects.requireNonNull(state, "state");
    defectType = defectType == null ? "" : defectType.strip();
    note = note == null ? "" : note.strip();
    photos = List.copyOf(photos);
    new PanelFinding(state, memberFound); // the same rule: an extra member must be named
  }

  public static Mark of(PanelState state) {
    return new Mark(state, null, "", null, "", List.of());
  }

  public PanelFinding finding() {
    return new PanelFinding(state, memberFound);
  }
}
