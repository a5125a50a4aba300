package org.bracewalk.core.model;

import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A plane as designed: its grid, the brace of each braced panel, and the openings (doorways,
 * access, loading gaps) where no diagonal may ever be placed.
 */
public record PlaneDesign(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<PanelRef> openings) {

  public PlaneDesign {
    Objects.requireNonNull(grid, "grid");
    braces = Map.copyOf(braces);
    openings = Set.copyOf(openings);
    for (PanelRef p : braces.keySet()) {
      grid.requireContains(p);
      if (openings.contains(p)) {
        throw new IllegalArgumentException("panel " + p + " is an opening and cannot be braced");
      }
    }
    for (PanelRef p : openings) {
      grid.requireContains(p);
    }
  }

  public static PlaneDesign of(PlaneGrid grid, Map<PanelRef, Brace> braces) {
    return new PlaneDesign(grid, braces, Set.of());
  }

  public Brace braceAt(PanelRef p) {
    return braces.get(p);
  }

  public boolean isOpening(PanelRef p) {
    return openings.contains(p);
  }

  /** Braces in lift-then-bay order. */
  public TreeMap<PanelRef, Brace> sortedBraces() {
    return new TreeMap<>(braces);
  }

  public TreeSet<PanelRef> sortedOpenings() {
    return new TreeSet<>(openings);
  }

  public PlaneDesign withGrid(PlaneGrid newGrid) {
    return new PlaneDesign(newGrid, braces, openings);
  }

  /** The same design with the brace at {@code p} replaced ({@code null} removes it). */
  public PlaneDesign withBrace(PanelRef p, Brace brace) {
    Map<PanelRef, Brace> copy = new TreeMap<>(braces);
    if (brace == null) {
      copy.remove(p);
    } else {
      copy.put(p, brace);
    }
    return new PlaneDesign(grid, copy, openings);
  }
}
