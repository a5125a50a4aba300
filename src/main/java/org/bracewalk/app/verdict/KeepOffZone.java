package org.bracewalk.app.verdict;

import java.util.List;

/**
 * Where people and loads must be kept off while a plane has lost rigidity: the lowest lift that
 * can sway and every lift above it (they are carried sideways with it), all bays, and for a
 * racking upright frame also the beam bays on both sides of it ({@code offloadBeside}).
 *
 * @param lifts the lifts, ascending
 * @param bays the bays, ascending
 * @param offloadBeside the beam bays either side of this upright frame carry load into it: off-load
 *     them too
 */
public record KeepOffZone(List<Integer> lifts, List<Integer> bays, boolean offloadBeside) {
  public KeepOffZone {
    lifts = List.copyOf(lifts);
    bays = List.copyOf(bays);
    if (lifts.isEmpty() || bays.isEmpty()) {
      throw new IllegalArgumentException("a keep-off zone has at least one lift and one bay");
    }
  }

  /** {@code lifts 3-5, bays 1-5}: the one way every output names the zone. */
  public String where() {
    return Wording.numbered("lift", lifts) + ", " + Wording.numbered("bay", bays);
  }

  /** {@code lifts 3-5}. */
  public String liftsText() {
    return Wording.numbered("lift", lifts);
  }

  /** {@code bays 1-5}. */
  public String baysText() {
    return Wording.numbered("bay", bays);
  }
}
