package org.bracewalk.ui.common;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * Which panels of a plane shear when it is not rigid, worked out from its blocks, for drawing: a
 * panel whose lift and bay lie in different blocks does not stay square. Where people and loads
 * must be kept off is not decided here but by the one verdict ({@code app.verdict.Verdict}'s
 * keep-off zone).
 *
 * @param shearing the panels that do not stay square, lift-then-bay order
 */
public record SwayRegion(List<PanelRef> shearing) {

  public SwayRegion {
    shearing = List.copyOf(shearing);
  }

  /** Nothing moves: one block, or no blocks given. */
  public boolean isEmpty() {
    return shearing.isEmpty();
  }

  public boolean isShearing(PanelRef p) {
    return shearing.contains(p);
  }

  /** Every panel with a corner among {@code moving} (the joints of a swaying part), lift-then-bay. */
  public static SwayRegion ofJoints(PlaneGrid grid, List<org.bracewalk.core.model.Joint> moving) {
    if (moving.isEmpty()) {
      return new SwayRegion(List.of());
    }
    java.util.Set<org.bracewalk.core.model.Joint> set = new java.util.HashSet<>(moving);
    List<PanelRef> out = new ArrayList<>();
    for (int i = 1; i <= grid.lifts(); i++) {
      for (int j = 1; j <= grid.bays(); j++) {
        if (set.contains(new org.bracewalk.core.model.Joint(i, j)) || set.contains(new org.bracewalk.core.model.Joint(i, j - 1))
            || set.contains(new org.bracewalk.core.model.Joint(i - 1, j))
            || set.contains(new org.bracewalk.core.model.Joint(i - 1, j - 1))) {
          out.add(new PanelRef(i, j));
        }
      }
    }
    return new SwayRegion(out);
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
      return new SwayRegion(List.of());
    }
    if (grid.support() == Support.PINNED_BASE && fixed >= 0) {
      for (int j = 1; j <= n; j++) {
        if (bayBlock[j] < 0) {
          bayBlock[j] = fixed;
        }
      }
    }
    List<PanelRef> shearing = new ArrayList<>();
    for (int i = 1; i <= m; i++) {
      for (int j = 1; j <= n; j++) {
        if (liftBlock[i] != bayBlock[j]) {
          shearing.add(new PanelRef(i, j));
        }
      }
    }
    return new SwayRegion(shearing);
  }
}
