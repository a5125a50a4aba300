package org.bracewalk.core.model;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * A plane as found: the effective diagonals present in each panel (a member damaged beyond use is
 * not listed), the panels nobody has looked at, and the frame: every ledger and standard of the
 * grid is there and effective except those in {@code absentFrame} (missing, damaged beyond use, or
 * never built) and those in {@code unknownFrame} (not inspected: counted as absent for the verdict
 * shown, like a panel not inspected). A panel in neither diagonal set was inspected and carries no
 * effective diagonal.
 */
public record AsBuiltPlane(
    PlaneGrid grid,
    Map<PanelRef, Brace> members,
    Set<PanelRef> uninspected,
    Set<FrameRef> absentFrame,
    Set<FrameRef> unknownFrame) {

  /** An as-built state whose frame is complete. */
  public AsBuiltPlane(PlaneGrid grid, Map<PanelRef, Brace> members, Set<PanelRef> uninspected) {
    this(grid, members, uninspected, Set.of(), Set.of());
  }

  public AsBuiltPlane {
    Objects.requireNonNull(grid, "grid");
    members = Map.copyOf(members);
    uninspected = Set.copyOf(uninspected);
    absentFrame = Set.copyOf(absentFrame);
    unknownFrame = Set.copyOf(unknownFrame);
    for (FrameRef f : absentFrame) {
      f.requireWithin(grid);
      if (unknownFrame.contains(f)) {
        throw new IllegalArgumentException(f + " cannot be both absent and not inspected");
      }
    }
    for (FrameRef f : unknownFrame) {
      f.requireWithin(grid);
    }
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
    return fromFindings(design, findings, Map.of());
  }

  /**
   * The as-built state from the findings on panels (see above) and on frame members. A frame member
   * nobody recorded is taken as designed: there when the design has it, absent when the design
   * leaves it out. One recorded in an effective state (sound, damaged but effective, extra) is
   * there; one not inspected or not reachable is unknown; any other state leaves it absent.
   */
  public static AsBuiltPlane fromFindings(
      PlaneDesign design,
      Map<PanelRef, PanelFinding> findings,
      Map<FrameRef, PanelState> frameFindings) {
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
    Set<FrameRef> absent = new HashSet<>(design.omittedFrame());
    Set<FrameRef> unknownFrame = new HashSet<>();
    for (Map.Entry<FrameRef, PanelState> e : frameFindings.entrySet()) {
      FrameRef f = e.getKey();
      f.requireWithin(grid);
      PanelState s = e.getValue();
      absent.remove(f);
      if (!s.inspected()) {
        unknownFrame.add(f);
      } else if (!s.effective()) {
        absent.add(f);
      }
    }
    return new AsBuiltPlane(grid, members, unknown, absent, unknownFrame);
  }

  /** Whether the frame is complete and inspected: no frame member absent or unknown. */
  public boolean frameComplete() {
    return absentFrame.isEmpty() && unknownFrame.isEmpty();
  }

  /** Whether this frame member is there and effective as found. */
  public boolean hasFrameMember(FrameRef member) {
    return !absentFrame.contains(member) && !unknownFrame.contains(member);
  }

  public Brace memberAt(PanelRef p) {
    return members.get(p);
  }

  public boolean isUninspected(PanelRef p) {
    return uninspected.contains(p);
  }
}
