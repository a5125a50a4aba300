package org.bracewalk.core.model;

import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A plane as designed: its grid, the brace of each braced panel, the openings (doorways, access,
 * loading gaps) where no diagonal may ever be placed, and the frame members the design leaves out
 * (say a ledger left out for access; never proposed in a repair). Every other ledger and standard
 * of the grid is in the design.
 */
public record PlaneDesign(
    PlaneGrid grid, Map<PanelRef, Brace> braces, Set<PanelRef> openings, Set<FrameRef> omittedFrame) {

  /** A design with every frame member. */
  public PlaneDesign(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<PanelRef> openings) {
    this(grid, braces, openings, Set.of());
  }

  public PlaneDesign {
    Objects.requireNonNull(grid, "grid");
    braces = Map.copyOf(braces);
    openings = Set.copyOf(openings);
    omittedFrame = Set.copyOf(omittedFrame);
    for (FrameRef f : omittedFrame) {
      f.requireWithin(grid);
    }
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

  /** Whether the design has this frame member (it leaves out only those in {@link #omittedFrame}). */
  public boolean hasFrameMember(FrameRef member) {
    return !omittedFrame.contains(member);
  }

  /** Whether every ledger and standard of the grid is in the design. */
  public boolean frameComplete() {
    return omittedFrame.isEmpty();
  }

  /** Frame members left out, in output order (ledgers first). */
  public TreeSet<FrameRef> sortedOmittedFrame() {
    return new TreeSet<>(omittedFrame);
  }

  public PlaneDesign withGrid(PlaneGrid newGrid) {
    return new PlaneDesign(newGrid, braces, openings, omittedFrame);
  }

  /** The same design with these frame members left out (and every other one in). */
  public PlaneDesign withOmittedFrame(Set<FrameRef> omitted) {
    return new PlaneDesign(grid, braces, openings, omitted);
  }

  /** The same design with the brace at {@code p} replaced ({@code null} removes it). */
  public PlaneDesign withBrace(PanelRef p, Brace brace) {
    Map<PanelRef, Brace> copy = new TreeMap<>(braces);
    if (brace == null) {
      copy.remove(p);
    } else {
      copy.put(p, brace);
    }
    return new PlaneDesign(grid, copy, openings, omittedFrame);
  }
}
