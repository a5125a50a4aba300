package org.bracewalk.report;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.PanelRef;

/**
 * The engine's blocks as the reader sees them: lettered A, B, ... in the engine's order, each
 * marked whether it sways. On a pinned base the block holding the ground is held; on a free plane
 * the first block is taken as held and the others move relative to it, as in the mechanism sketch.
 */
final class Parts {
  record Part(char letter, Block block, boolean sways, int swayIndex) {
    /** Whether panel {@code p} belongs to this part: its lift and bay turn with it. */
    boolean covers(PanelRef p) {
      boolean lift = block.lifts().isEmpty() || block.containsLift(p.lift());
      boolean bay = block.bays().isEmpty() || block.containsBay(p.bay());
      if (block.lifts().isEmpty() && block.bays().isEmpty()) {
        return false;
      }
      return lift && bay;
    }
  }

  private Parts() {}

  static List<Part> of(StateAnalysis state) {
    List<Block> blocks = state.blocks();
    boolean anyFixed = blocks.stream().anyMatch(Block::fixed);
    List<Part> parts = new ArrayList<>();
    int sway = 0;
    for (int i = 0; i < blocks.size(); i++) {
      Block b = blocks.get(i);
      boolean sways = !b.fixed() && (anyFixed || i > 0) && !state.rigid();
      parts.add(new Part((char) ('A' + Math.min(i, 25)), b, sways, sways ? sway++ : -1));
    }
    return parts;
  }

  static List<Part> swaying(StateAnalysis state) {
    return of(state).stream().filter(Part::sways).toList();
  }
}
