package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.ui.common.PanelSide;

/**
 * The orders in which the cursor walks a plane: every panel, or only the panels the design braces
 * (the default for a routine inspection; the rest are then recorded as found as designed in one
 * confirmed step, {@code A}).
 */
public enum WalkOrder {
  /** The braced panels only, bay by bay as {@link #BAYS_UP_AND_DOWN}. */
  BRACED_BAYS_UP_AND_DOWN("Braced panels only: bay by bay"),
  /** Bay 1 from the bottom lift up, bay 2 from the top down, and so on. */
  BAYS_UP_AND_DOWN("Bay by bay: up one bay, down the next"),
  /** The braced panels only, lift by lift as {@link #LIFTS_THERE_AND_BACK}. */
  BRACED_LIFTS_THERE_AND_BACK("Braced panels only: lift by lift"),
  /** Lift 1 left to right, lift 2 right to left, and so on: walking along each lift and back. */
  LIFTS_THERE_AND_BACK("Lift by lift: along and back"),
  /** Every lift from left to right, bottom lift first. */
  LIFTS_LEFT_TO_RIGHT("Lift by lift: always left to right");

  private final String words;

  WalkOrder(String words) {
    this.words = words;
  }

  public String words() {
    return words;
  }

  /** Whether this order visits only the panels the design braces. */
  public boolean bracedOnly() {
    return this == BRACED_BAYS_UP_AND_DOWN || this == BRACED_LIFTS_THERE_AND_BACK;
  }

  /** The order of every panel this one follows (itself for an order of every panel). */
  public WalkOrder everyPanel() {
    return switch (this) {
      case BRACED_BAYS_UP_AND_DOWN -> BAYS_UP_AND_DOWN;
      case BRACED_LIFTS_THERE_AND_BACK -> LIFTS_THERE_AND_BACK;
      default -> this;
    };
  }

  /**
   * The panels this order visits, each once: every panel of the design's grid, or for a braced
   * order only those where the design has a brace (openings and unbraced panels left out).
   */
  public List<PanelRef> sequence(PlaneDesign design) {
    List<PanelRef> all = everyPanel().sequence(design.grid());
    if (!bracedOnly()) {
      return all;
    }
    List<PanelRef> out = new ArrayList<>();
    for (PanelRef p : all) {
      if (design.braceAt(p) != null) {
        out.add(p);
      }
    }
    return out;
  }

  /**
   * Every panel of {@code grid} once, in this order; only for an order of every panel (a braced
   * order needs the design: {@link #sequence(PlaneDesign)}).
   */
  public List<PanelRef> sequence(PlaneGrid grid) {
    if (bracedOnly()) {
      throw new IllegalArgumentException(words + " needs the design to know the braced panels");
    }
    int m = grid.lifts();
    int n = grid.bays();
    List<PanelRef> out = new ArrayList<>(m * n);
    switch (this) {
      case BAYS_UP_AND_DOWN -> {
        for (int j = 1; j <= n; j++) {
          boolean up = j % 2 == 1;
          for (int k = 0; k < m; k++) {
            out.add(new PanelRef(up ? 1 + k : m - k, j));
          }
        }
      }
      case LIFTS_THERE_AND_BACK -> {
        for (int i = 1; i <= m; i++) {
          boolean right = i % 2 == 1;
          for (int k = 0; k < n; k++) {
            out.add(new PanelRef(i, right ? 1 + k : n - k));
          }
        }
      }
      case LIFTS_LEFT_TO_RIGHT -> {
        for (int i = 1; i <= m; i++) {
          for (int j = 1; j <= n; j++) {
            out.add(new PanelRef(i, j));
          }
        }
      }
      default -> throw new IllegalStateException(words);
    }
    return out;
  }

  /** The order in which the sides of a panel are walked: below, left, right, above. */
  private static final List<PanelSide> SIDES = List.of(
      PanelSide.LEDGER_BELOW, PanelSide.STANDARD_LEFT, PanelSide.STANDARD_RIGHT, PanelSide.LEDGER_ABOVE);

  /**
   * The stops of a walk in this order: each panel's diagonals (for a braced order, only where the
   * design braces the panel), and with {@code frame} also every ledger and standard once, at the
   * first panel it borders (below, left, right, above, after the panel's diagonals).
   */
  public List<WalkStop> stops(PlaneDesign design, boolean frame) {
    PlaneGrid grid = design.grid();
    List<PanelRef> panels = everyPanel().sequence(grid);
    List<WalkStop> out = new ArrayList<>(frame ? panels.size() * 3 + grid.lifts() + grid.bays() + 1 : panels.size());
    Set<FrameRef> seen = new HashSet<>();
    for (PanelRef p : panels) {
      if (!bracedOnly() || design.braceAt(p) != null) {
        out.add(WalkStop.of(p));
      }
      if (frame) {
        for (PanelSide s : SIDES) {
          if (seen.add(s.of(p))) {
            out.add(new WalkStop(p, s));
          }
        }
      }
    }
    return out;
  }

  @Override
  public String toString() {
    return words;
  }
}
