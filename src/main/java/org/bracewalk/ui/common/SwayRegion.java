package org.bracewalk.ui.common;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * Which part of a plane moves when it is not rigid, worked out from its blocks. A panel whose lift
 * and bay lie in different blocks shears (it does not stay square). On a pinned base every bay is
 * held, so a lift in a free block shears, and every lift above it is carried sideways with it:
 * the affected part runs from the lowest shearing lift to the top. On a free plane the affected
 * part is every lift and bay holding a shearing panel.
 *
 * @param shearing the panels that do not stay square, lift-then-bay order
 * @param affectedLifts lifts people and loads must be kept off
 * @param affectedBays bays people and loads must be kept off
 */
public record SwayRegion(List<PanelRef> shearing, Set<Integer> affectedLifts, Set<Integer> affectedBays) {

  public SwayRegion {
    shearing = List.copyOf(shearing);
    affectedLifts = Set.copyOf(affectedLifts);
    affectedBays = Set.copyOf(affectedBays);
  }

  /** Nothing moves: one block, or no blocks given. */
  public boolean isEmpty() {
    return shearing.isEmpty();
  }

  public boolean isShearing(PanelRef p) {
    return shearing.contains(p);
  }

  public static SwayRegion of(PlaneGrid grid, List<Block> blocks) {
    int m = grid.lifts();
    int n = grid.bays();
    int[] liftBlock = new int[m + 1];
    int[] bayBlock = new int[n + 1];
    java.util.Arrays.fill(liftBlock, -1);
    java.util.Arrays.fill(bayBlock, -1);
    int fixed = -1;
    for (int b = 0; b < blocks.size(); b++) {
      Block block = blocks.get(b);
      if (block.fixed()) {
        fixed = b;
      }
      for (int lift : block.lifts()) {
        if (lift >= 1 && lift <= m) {
          liftBlock[lift] = b;
        }
      }
      for (int bay : block.bays()) {
        if (bay >= 1 && bay <= n) {
          bayBlock[bay] = b;
        }
      }
    }
    if (blocks.size() <= 1) {
      return new SwayRegion(List.of(), Set.of(), Set.of());
    }
    if (grid.support() == Support.PINNED_BASE && fixed >= 0) {
      for (int j = 1; j <= n; j++) {
        if (bayBlock[j] < 0) {
          bayBlock[j] = fixed;
        }
      }
    }
    List<PanelRef> shearing = new ArrayList<>();
    TreeSet<Integer> lifts = new TreeSet<>();
    TreeSet<Integer> bays = new TreeSet<>();
    for (int i = 1; i <= m; i++) {
      for (int j = 1; j <= n; j++) {
        if (liftBlock[i] != bayBlock[j]) {
          shearing.add(new PanelRef(i, j));
          lifts.add(i);
          bays.add(j);
        }
      }
    }
    if (grid.support() == Support.PINNED_BASE && !lifts.isEmpty()) {
      for (int i = lifts.first(); i <= m; i++) {
        lifts.add(i);
      }
      for (int j = 1; j <= n; j++) {
        bays.add(j);
      }
    }
    return new SwayRegion(shearing, lifts, bays);
  }
}
