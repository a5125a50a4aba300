package org.bracewalk.report;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.PanelRef;

/**
 * The engine's blocks as the reader sees them, lettered as the {@code check} command letters
 * them: the block a pinned base holds has no letter, every other block is A, B, ... in the
 * engine's order. On a pinned base the lettered blocks sway; on a free plane nothing is held and
 * each block moves against the others (the sketch draws the first one still).
 */
final class Parts {
  record Part(String letter, Block block, boolean sways, int swayIndex) {
    /** Whether panel {@code p} belongs to this part: its lift and bay turn with it. */
    boolean covers(PanelRef p) {
      if (block.lifts().isEmpty() && block.bays().isEmpty()) {
        return false;
      }
      boolean lift = block.lifts().isEmpty() || block.containsLift(p.lift());
      boolean bay = block.bays().isEmpty() || block.containsBay(p.bay());
      return lift && bay;
    }

    boolean held() {
      return block.fixed();
    }
  }

  private Parts() {}

  static List<Part> of(StateAnalysis state) {
    List<Part> parts = new ArrayList<>();
    int k = 0;
    boolean lettered = state.blocks().size() > 1;
    for (Block b : state.blocks()) {
      if (b.fixed() || !lettered) {
        parts.add(new Part("", b, false, -1));
      } else {
        parts.add(new Part(letter(k), b, true, k));
        k++;
      }
    }
    return parts;
  }

  /** The letter of the {@code k}-th swaying part (from 0): A, B, ..., then numbers. */
  static String letter(int k) {
    return k < 26 ? String.valueOf((char) ('A' + k)) : String.valueOf(k + 1);
  }

  /** The part the mechanism sketch moves: the first that sways, or on a free plane the second. */
  static Part moving(StateAnalysis state, boolean free) {
    List<Part> swaying = of(state).stream().filter(Part::sways).toList();
    if (swaying.isEmpty()) {
      return null;
    }
    return free && swaying.size() > 1 ? swaying.get(1) : swaying.get(0);
  }
}
