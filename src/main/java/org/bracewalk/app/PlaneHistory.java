package org.bracewalk.app;

import org.bracewalk.app.verdict.Verdict;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;

/**
 * One plane across the inspections of its structure, oldest first.
 *
 * @param plane the plane
 * @param entries one per inspection of the structure
 */
public record PlaneHistory(PlaneRecord plane, List<Entry> entries) {

  public PlaneHistory {
    Objects.requireNonNull(plane, "plane");
    entries = List.copyOf(entries);
  }

  /**
   * The plane in one inspection.
   *
   * @param inspection the inspection
   * @param design the design in force
   * @param findings the latest finding per inspected panel
   * @param asBuilt the as-built state
   * @param verdict the as-built verdict (uninspected panels counted as missing)
   * @param changes the panels whose finding differs from the previous inspection's, by panel
   *     (empty for the first inspection)
   * @param summary the one verdict on the plane in this inspection ({@link Verdict})
   * @param frameFindings the latest state per frame member recorded (others taken as designed)
   * @param frameChanges the frame members whose recorded state differs from the previous
   *     inspection's, in member order (empty for the first inspection)
   */
  public record Entry(
      Inspection inspection,
      DesignRevision design,
      Map<PanelRef, PanelFinding> findings,
      AsBuiltPlane asBuilt,
      StateAnalysis verdict,
      List<PanelChange> changes,
      Verdict summary,
      Map<FrameRef, PanelState> frameFindings,
      List<FrameChange> frameChanges) {

    /** An entry with no frame member recorded. */
    public Entry(Inspection inspection, DesignRevision design,
        Map<PanelRef, PanelFinding> findings, AsBuiltPlane asBuilt, StateAnalysis verdict,
        List<PanelChange> changes, Verdict summary) {
      this(inspection, design, findings, asBuilt, verdict, changes, summary, Map.of(), List.of());
    }

    public Entry {
      Objects.requireNonNull(summary, "summary");
      Objects.requireNonNull(inspection, "inspection");
      Objects.requireNonNull(design, "design");
      findings = Map.copyOf(findings);
      Objects.requireNonNull(asBuilt, "asBuilt");
      Objects.requireNonNull(verdict, "verdict");
      changes = List.copyOf(changes);
      frameFindings = Map.copyOf(frameFindings);
      frameChanges = List.copyOf(frameChanges);
    }
  }
}
