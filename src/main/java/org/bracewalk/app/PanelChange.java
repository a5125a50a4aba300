package org.bracewalk.app;

import java.util.Objects;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;

/**
 * How one panel's finding differs from the previous inspection's.
 *
 * @param panel the panel
 * @param before the previous finding; {@code null} when the panel was not inspected then
 * @param after this inspection's finding; {@code null} when it was not inspected now
 */
public record PanelChange(PanelRef panel, PanelFinding before, PanelFinding after) {
  public PanelChange {
    Objects.requireNonNull(panel, "panel");
  }
}
