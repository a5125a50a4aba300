package org.bracewalk.core.analysis;

import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * One state of a plane as the engine sees it: the grid (support included), the effective diagonals
 * of each panel, and the frame members that are not there (every other ledger and standard of the
 * grid is there and effective).
 */
public record BuiltFrame(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<FrameRef> absentFrame) {

  public BuiltFrame {
    Objects.requireNonNull(grid, "grid");
    braces = Map.copyOf(braces);
    absentFrame = Set.copyOf(absentFrame);
    for (PanelRef p : braces.keySet()) {
      grid.requireContains(p);
    }
    for (FrameRef f : absentFrame) {
      f.requireWithin(grid);
    }
  }

  /** A state with every frame member there. */
  public static BuiltFrame complete(PlaneGrid grid, Map<PanelRef, Brace> braces) {
    return new BuiltFrame(grid, braces, Set.of());
  }

  public boolean frameComplete() {
    return absentFrame.isEmpty();
  }
}
