package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

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

  @Override
  public String toString() {
    return words;
  }
}
