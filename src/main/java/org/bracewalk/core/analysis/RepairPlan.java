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
 * @param restoreToDesign every design member missing from the as-built state
 */
public record RepairPlan(boolean possible, List<RepairBrace> braces, List<RestoreItem> restoreToDesign) {

  public RepairPlan {
    braces = List.copyOf(braces);
    restoreToDesign = List.copyOf(restoreToDesign);
  }

  public int minimum() {
    return braces.size();
  }
}
