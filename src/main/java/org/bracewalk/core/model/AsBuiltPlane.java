package org.bracewalk.core.model;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * A plane as found: the effective members present in each panel (a member damaged beyond use is
 * not listed), and the panels nobody has looked at. A panel in neither was inspected and carries no
 * effective diagonal.
 */
public record AsBuiltPlane(PlaneGrid grid, Map<PanelRef, Brace> members, Set<PanelRef> uninspected) {

  public AsBuiltPlane {
    Objects.requireNonNull(grid, "grid");
    members = Map.copyOf(members);
    uninspected = Set.copyOf(uninspected);
    for (PanelRef p : members.keySet()) {
      grid.requireContains(p);
      if (uninspected.contains(p)) {
        throw new IllegalArgumentException(
            "panel " + p + " cannot be both not inspected and carry a member");
      }
    }
    for (PanelRef p : uninspected) {
      grid.requireContains(p);
    }
  }

  /**
   * The as-built state that follows from the inspector's findings. A panel with no finding is not
   * inspected. A sound or damaged-but-effective panel carries its design member unless the finding
   * names the member found; a missing or ineffective panel carries only what the finding names as
   * still effective (say the remaining half of a cross); an extra member is the one named.
   */
  public static AsBuiltPlane fromFindings(PlaneDesign design, Map<PanelRef, PanelFinding> findings) {
    PlaneGrid grid = design.grid();
    Map<PanelRef, Brace> members = new HashMap<>();
    Set<PanelRef> unknown = new HashSet<>();
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      for (int bay = 1; bay <= grid.bays(); bay++) {
        PanelRef p = new PanelRef(lift, bay);
        PanelFinding f = findings.get(p);
        if (f == null || !f.state().inspected()) {
          unknown.add(p);
          continue;
        }
        Brace member =
            switch (f.state()) {
              case SOUND, DAMAGED_EFFECTIVE -> f.memberFound() != null
                  ? f.memberFound()
                  : design.braceAt(p);
              default -> f.memberFound();
            };
        if (member != null) {
          members.put(p, member);
        }
      }
    }
    for (PanelRef p : findings.keySet()) {
      grid.requireContains(p);
    }
    return new AsBuiltPlane(grid, members, unknown);
  }

  public Brace memberAt(PanelRef p) {
    return members.get(p);
  }

  public boolean isUninspected(PanelRef p) {
    return uninspected.contains(p);
  }
}
