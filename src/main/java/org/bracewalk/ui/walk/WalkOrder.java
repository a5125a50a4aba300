package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.ui.common.PanelSide;

/** The orders in which the cursor walks a plane. */
public enum WalkOrder {
  /** Bay 1 from the bottom lift up, bay 2 from the top down, and so on. */
  BAYS_UP_AND_DOWN("Bay by bay: up one bay, down the next"),
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

  /** Every panel of {@code grid} once, in this order. */
  public List<PanelRef> sequence(PlaneGrid grid) {
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
    }
    return out;
  }

  /** The order in which the sides of a panel are walked: below, left, right, above. */
  private static final List<PanelSide> SIDES = List.of(
      PanelSide.LEDGER_BELOW, PanelSide.STANDARD_LEFT, PanelSide.STANDARD_RIGHT, PanelSide.LEDGER_ABOVE);

  /**
   * The stops of a walk in this order: each panel's diagonals, and with {@code frame} also every
   * ledger and standard once, at the first panel it borders (below, left, right, above, after the
   * panel's diagonals).
   */
  public List<WalkStop> stops(PlaneGrid grid, boolean frame) {
    List<PanelRef> panels = sequence(grid);
    List<WalkStop> out = new ArrayList<>(frame ? panels.size() * 3 + grid.lifts() + grid.bays() + 1 : panels.size());
    Set<FrameRef> seen = new HashSet<>();
    for (PanelRef p : panels) {
      out.add(WalkStop.of(p));
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
