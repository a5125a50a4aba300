package org.bracewalk.core.analysis;

import java.util.List;

/**
 * A group of lifts and bays that turn together: one connected component of the brace graph. On a
 * pinned base the block holding the ground is {@code fixed}; every other block can sway.
 */
public record Block(List<Integer> lifts, List<Integer> bays, boolean fixed) {
  public Block {
    lifts = List.copyOf(lifts);
    bays = List.copyOf(bays);
  }

  public boolean containsLift(int lift) {
    return lifts.contains(lift);
  }

  public boolean containsBay(int bay) {
    return bays.contains(bay);
  }
}
