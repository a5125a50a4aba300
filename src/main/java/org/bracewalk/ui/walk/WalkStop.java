package org.bracewalk.ui.walk;

import java.util.Objects;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.ui.common.PanelSide;

/**
 * One place the walk-round's cursor can stand: a panel's diagonals ({@code side} null), or one side
 * of a panel (a ledger above or below, a standard left or right).
 */
public record WalkStop(PanelRef panel, PanelSide side) {
  public WalkStop {
    Objects.requireNonNull(panel, "panel");
  }

  /** The panel's diagonals. */
  public static WalkStop of(PanelRef panel) {
    return new WalkStop(panel, null);
  }

  /** The frame member stood at, or null for the diagonals. */
  public FrameRef member() {
    return side == null ? null : side.of(panel);
  }
}
