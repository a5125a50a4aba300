package org.bracewalk.core.analysis;

import java.util.List;

/**
 * The repair of the analysed state.
 *
 * @param possible false when no set of allowed panels can make the plane rigid; {@code braces} then
 *     holds the braces that help as far as anything can
 * @param braces the minimal set: with rigid members only, the least number (equal to the degrees
 *     of freedom), design panels used before others, openings never; with tension-only members an
 *     irreducible set
 * @param restoreToDesign every design diagonal missing from the as-built state
 * @param members frame members in the least set (design members to refit), ledgers first
 * @param restoreFrame every design frame member missing, ineffective or not inspected as built
 */
public record RepairPlan(
    boolean possible,
    List<RepairBrace> braces,
    List<RestoreItem> restoreToDesign,
    List<RepairMember> members,
    List<RestoreFrameItem> restoreFrame) {

  /** A repair of diagonals only (the frame complete as built). */
  public RepairPlan(boolean possible, List<RepairBrace> braces, List<RestoreItem> restoreToDesign) {
    this(possible, braces, restoreToDesign, List.of(), List.of());
  }

  public RepairPlan {
    braces = List.copyOf(braces);
    restoreToDesign = List.copyOf(restoreToDesign);
    members = List.copyOf(members);
    restoreFrame = List.copyOf(restoreFrame);
  }

  /** Diagonals and frame members in the least set together. */
  public int minimum() {
    return braces.size() + members.size();
  }
}
