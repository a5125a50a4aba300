package org.bracewalk.ui.common;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
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
 * @param frameFindings the state recorded for each frame member looked at (ledgers and standards);
 *     a member absent here has not been recorded and is drawn as designed
 * @param selectedMember the side of the current panel selected for a mark (a ledger above or below,
 *     a standard left or right), or {@code null} when the panel's diagonals are selected
 * @param freedoms the analysed state's freedoms told apart by kind (joints without sideways
 *     restraint and loose ends are marked at the joint; a swaying part is hatched), empty for none
 * @param repairMembers frame members of the proposed repair (design members to refit or replace),
 *     numbered on the drawing before the braces of {@code repair}, as the repair order lists the
 *     frame first
 * @param changedMembers frame members whose recorded state differs from the previous inspection
 */
public record PlanePicture(
    PlaneDesign design,
    Map<PanelRef, PanelFinding> findings,
    boolean showFindings,
    List<Block> blocks,
    Set<PanelRef> critical,
    List<RepairBrace> repair,
    Set<PanelRef> changed,
    PanelRef cursor,
    Map<FrameRef, PanelState> frameFindings,
    FrameRef selectedMember,
    List<Freedom> freedoms,
    List<FrameRef> repairMembers,
    Set<FrameRef> changedMembers) {

  /** A picture without frame findings, selected member or freedoms. */
  public PlanePicture(
      PlaneDesign design,
      Map<PanelRef, PanelFinding> findings,
      boolean showFindings,
      List<Block> blocks,
      Set<PanelRef> critical,
      List<RepairBrace> repair,
      Set<PanelRef> changed,
      PanelRef cursor) {
    this(design, findings, showFindings, blocks, critical, repair, changed, cursor, Map.of(), null, List.of());
  }

  /** A picture with frame findings and freedoms, no frame member in the repair or changed. */
  public PlanePicture(
      PlaneDesign design,
      Map<PanelRef, PanelFinding> findings,
      boolean showFindings,
      List<Block> blocks,
      Set<PanelRef> critical,
      List<RepairBrace> repair,
      Set<PanelRef> changed,
      PanelRef cursor,
      Map<FrameRef, PanelState> frameFindings,
      FrameRef selectedMember,
      List<Freedom> freedoms) {
    this(design, findings, showFindings, blocks, critical, repair, changed, cursor, frameFindings,
        selectedMember, freedoms, List.of(), Set.of());
  }

  public PlanePicture {
    Objects.requireNonNull(design, "design");
    findings = Map.copyOf(findings);
    blocks = List.copyOf(blocks);
    critical = Set.copyOf(critical);
    repair = List.copyOf(repair);
    changed = Set.copyOf(changed);
    frameFindings = Map.copyOf(frameFindings);
    freedoms = List.copyOf(freedoms);
    repairMembers = List.copyOf(repairMembers);
    changedMembers = Set.copyOf(changedMembers);
  }

  /** How the frame member {@code f} is drawn: its recorded state, else as the design has it. */
  public FrameLook frameLook(FrameRef f) {
    PanelState s = showFindings ? frameFindings.get(f) : null;
    return FrameLook.of(s, design.hasFrameMember(f));
  }

  /** The joints to mark with {@code kind} (lost restraint or loose end), sorted. */
  public List<Joint> jointsOf(FreedomKind kind) {
    java.util.TreeSet<Joint> out = new java.util.TreeSet<>();
    for (Freedom f : freedoms) {
      if (f.kind() == kind) {
        out.addAll(f.joints());
      }
    }
    return List.copyOf(out);
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

  /**
   * The shearing panels: from the blocks shown where the frame is complete; where it is not (the
   * engine names no blocks), every panel with a corner in a part that sways.
   */
  public SwayRegion sway() {
    if (!blocks.isEmpty()) {
      return SwayRegion.of(grid(), blocks);
    }
    return SwayRegion.ofJoints(grid(), jointsOf(FreedomKind.SWAY));
  }
}
