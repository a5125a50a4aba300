package org.bracewalk.core.port.report;

import java.util.Map;
import java.util.Objects;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRole;

/**
 * One plane as the report shows it.
 *
 * @param name the plane's name
 * @param design the design in force
 * @param asBuilt the as-built state that follows from the findings
 * @param findings the latest finding per panel (a panel without one was not inspected)
 * @param analysis the engine's analysis of {@code asBuilt} against {@code design}
 * @param revision the design revision in force: its number, date and author
 * @param role the plane's role in its structure (the verdict's keep-off zone depends on it)
 * @param frameFindings the latest recorded state per frame member (a member without one is taken
 *     as designed)
 * @param sketch the motion to sketch where the analysed state is not rigid and the engine gave
 *     one; {@code null} otherwise (the sketch then follows the engine's blocks)
 */
public record PlaneSection(
    String name,
    PlaneDesign design,
    AsBuiltPlane asBuilt,
    Map<PanelRef, PanelFinding> findings,
    PlaneAnalysis analysis,
    DesignRef revision,
    PlaneRole role,
    Map<FrameRef, PanelState> frameFindings,
    MotionSketch sketch) {

  /** A section with no frame member recorded and no motion to sketch. */
  public PlaneSection(String name, PlaneDesign design, AsBuiltPlane asBuilt,
      Map<PanelRef, PanelFinding> findings, PlaneAnalysis analysis, DesignRef revision,
      PlaneRole role) {
    this(name, design, asBuilt, findings, analysis, revision, role, Map.of(), null);
  }

  /** A section of a plane of no particular role. */
  public PlaneSection(String name, PlaneDesign design, AsBuiltPlane asBuilt,
      Map<PanelRef, PanelFinding> findings, PlaneAnalysis analysis, DesignRef revision) {
    this(name, design, asBuilt, findings, analysis, revision, PlaneRole.OTHER);
  }

  public PlaneSection {
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(design, "design");
    Objects.requireNonNull(asBuilt, "asBuilt");
    Objects.requireNonNull(analysis, "analysis");
    Objects.requireNonNull(revision, "revision");
    findings = Map.copyOf(findings);
    frameFindings = Map.copyOf(frameFindings);
  }

  /**
   * Whether the drawing and words need the frame: a frame member recorded, left out by the design,
   * absent or unknown as built, or a freedom other than a swaying part.
   */
  public boolean showsFrame() {
    return !frameFindings.isEmpty()
        || !design.frameComplete()
        || !asBuilt.frameComplete()
        || !analysis.analysedState().frameComplete()
        || analysis.analysedState().freedoms().stream()
            .anyMatch(f -> f.kind() != org.bracewalk.core.analysis.FreedomKind.SWAY)
        || !analysis.repair().members().isEmpty()
        || !analysis.repair().restoreFrame().isEmpty();
  }

  /** Which design revision a plane was checked against. */
  public record DesignRef(int number, java.time.LocalDate date, String author) {
    public DesignRef {
      Objects.requireNonNull(date, "date");
      author = author == null ? "" : author;
    }
  }
}
