package org.bracewalk.ui.common;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Everything one drawing of a plane shows, as plain values: the design, what was found in each
 * panel, the blocks that can sway, the critical braces, the proposed repair, the panels changed
 * since an earlier inspection and the current-panel cursor. View models build it; {@link
 * PlaneCanvas} draws it.
 *
 * @param findings the finding of each panel looked at; a panel absent here has not been recorded
 * @param showFindings false draws the design alone (the design editor), true the as-found state
 * @param blocks the analysed state's blocks (empty: do not shade)
 * @param critical panels whose brace is critical: its loss alone lets the plane sway
 * @param repair proposed braces, in the order they are numbered on the drawing
 * @param changed panels whose finding differs from the previous inspection
 * @param cursor the current panel, or {@code null}
 */
public record PlanePicture(
    PlaneDesign design,
    Map<PanelRef, PanelFinding> findings,
    boolean showFindings,
    List<Block> blocks,
    Set<PanelRef> critical,
    List<RepairBrace> repair,
    Set<PanelRef> changed,
    PanelRef cursor) {

  public PlanePicture {
    Objects.requireNonNull(design, "design");
    findings = Map.copyOf(findings);
    blocks = List.copyOf(blocks);
    critical = Set.copyOf(critical);
    repair = List.copyOf(repair);
    changed = Set.copyOf(changed);
  }

  /** The design alone, nothing found, nothing analysed. */
  public static PlanePicture ofDesign(PlaneDesign design) {
    return new PlanePicture(design, Map.of(), false, List.of(), Set.of(), List.of(), Set.of(), null);
  }

  public PlaneGrid grid() {
    return design.grid();
  }

  /** The member drawn in {@code p} as found: the finding's own member, else the design's. */
  public Brace memberShown(PanelRef p) {
    PanelFinding f = findings.get(p);
    if (f != null && f.memberFound() != null) {
      return f.memberFound();
    }
    return design.braceAt(p);
  }

  /** The shearing panels of the blocks shown. */
  public SwayRegion sway() {
    return SwayRegion.of(grid(), blocks);
  }
}
