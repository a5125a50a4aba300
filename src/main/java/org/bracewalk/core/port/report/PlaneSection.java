package org.bracewalk.core.port.report;

import java.util.Map;
import java.util.Objects;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.PanelFinding;
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
 */
public record PlaneSection(
    String name,
    PlaneDesign design,
    AsBuiltPlane asBuilt,
    Map<PanelRef, PanelFinding> findings,
    PlaneAnalysis analysis,
    DesignRef revision,
    PlaneRole role) {

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
  }

  /** Which design revision a plane was checked against. */
  public record DesignRef(int number, java.time.LocalDate date, String author) {
    public DesignRef {
      Objects.requireNonNull(date, "date");
      author = author == null ? "" : author;
    }
  }
}
