package org.bracewalk.ui.common;

import javafx.scene.input.KeyCode;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * The four sides of a panel, each a frame member: the ledger above (at the top of its lift) or
 * below, the standard on its left or right. Screens select a side of the current panel with
 * Shift and an arrow key.
 */
public enum PanelSide {
  LEDGER_ABOVE("ledger above"),
  LEDGER_BELOW("ledger below"),
  STANDARD_LEFT("standard on the left"),
  STANDARD_RIGHT("standard on the right");

  private final String words;

  PanelSide(String words) {
    this.words = words;
  }

  public String words() {
    return words;
  }

  /** The frame member on this side of {@code p}. */
  public FrameRef of(PanelRef p) {
    return switch (this) {
      case LEDGER_ABOVE -> FrameRef.ledger(p.lift(), p.bay());
      case LEDGER_BELOW -> FrameRef.ledger(p.lift() - 1, p.bay());
      case STANDARD_LEFT -> FrameRef.standard(p.lift(), p.bay() - 1);
      case STANDARD_RIGHT -> FrameRef.standard(p.lift(), p.bay());
    };
  }

  /**
   * A panel that {@code f} borders and the side it is of that panel: the panel below a ledger (above
   * it for the base ledger), the panel to the left of a standard (to the right for the left end).
   */
  public static Placed place(FrameRef f) {
    if (f.isLedger()) {
      return f.first() == 0
          ? new Placed(new PanelRef(1, f.second()), LEDGER_BELOW)
          : new Placed(new PanelRef(f.first(), f.second()), LEDGER_ABOVE);
    }
    return f.second() == 0
        ? new Placed(new PanelRef(f.first(), 1), STANDARD_LEFT)
        : new Placed(new PanelRef(f.first(), f.second()), STANDARD_RIGHT);
  }

  /** The side of {@code p} that {@code f} is, or {@code null} when it does not border {@code p}. */
  public static PanelSide of(PanelRef p, FrameRef f) {
    for (PanelSide s : values()) {
      if (s.of(p).equals(f)) {
        return s;
      }
    }
    return null;
  }

  /**
   * The side that Shift with arrow key {@code code} selects (up: the ledger above, down: below,
   * left and right: the standards), or {@code null} when {@code code} is not an arrow key.
   */
  public static PanelSide ofArrow(KeyCode code) {
    return switch (code) {
      case UP -> LEDGER_ABOVE;
      case DOWN -> LEDGER_BELOW;
      case LEFT -> STANDARD_LEFT;
      case RIGHT -> STANDARD_RIGHT;
      default -> null;
    };
  }

  /** A panel and one of its sides. */
  public record Placed(PanelRef panel, PanelSide side) {}
}
