package org.bracewalk.core.analysis;

import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;

/**
 * One group of freedoms of one kind. The counts of all freedoms of a state add up to its degrees of
 * freedom (tension-only members taken as rigid).
 *
 * <ul>
 *   <li>{@link FreedomKind#SWAY}: one entry per part that sways ({@code count} its independent
 *       motions); {@code joints} the joints that move with it, each moving joint listed under the
 *       last part (in list order) that moves it, so that the parts' lists partition the moving
 *       joints (on a pinned base: a swaying lift and the storeys above it up to the next part) and
 *       a huge plane does not list a joint once per part below it; a part all of whose joints a
 *       later part lists keeps its own full list; {@code members} and {@code
 *       diagonals} empty;
 *   <li>{@link FreedomKind#LOST_RESTRAINT}: one entry per such joint, {@code count} 1; {@code
 *       joints} that joint; {@code members} the frame members running straight through it (say the
 *       standards of lifts 1 and 2 on line 0), {@code diagonals} the panels of diagonals in that
 *       line, if the straight line is made of diagonals;
 *   <li>{@link FreedomKind#LOOSE_END}: one entry per such joint, {@code count} 1; {@code joints}
 *       that joint; the one member holding it in {@code members} or {@code diagonals}.
 * </ul>
 *
 * @param kind which kind
 * @param count independent first-order motions of this group
 * @param joints the joints concerned, sorted
 * @param members frame members concerned, sorted (ledgers first)
 * @param diagonals panels of diagonals concerned, sorted
 */
public record Freedom(
    FreedomKind kind, int count, List<Joint> joints, List<FrameRef> members, List<PanelRef> diagonals) {

  public Freedom {
    Objects.requireNonNull(kind, "kind");
    if (count < 1) {
      throw new IllegalArgumentException("a freedom counts at least one motion, got " + count);
    }
    joints = List.copyOf(joints);
    members = List.copyOf(members);
    diagonals = List.copyOf(diagonals);
  }
}
