package org.bracewalk.core.model;

import java.util.Objects;

/**
 * The latest finding for one panel: its state and, where a member is there, the member found
 * ({@code null} means "as designed"; an {@link PanelState#EXTRA} finding must name it).
 */
public record PanelFinding(PanelState state, Brace memberFound) {

  public PanelFinding {
    Objects.requireNonNull(state, "state");
    if (state == PanelState.EXTRA && memberFound == null) {
      throw new IllegalArgumentException("an extra member must say which diagonal it is");
    }
  }

  public static PanelFinding of(PanelState state) {
    return new PanelFinding(state, null);
  }
}
