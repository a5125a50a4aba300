package org.bracewalk.app;

import java.util.Map;
import java.util.Objects;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;

/**
 * One plane of an inspection, analysed: the design in force, the as-built state from the latest
 * observations, and the engine's verdict and repair.
 *
 * @param plane the plane
 * @param design the design revision compared with
 * @param latest the observation that counts for each panel (absent: not inspected)
 * @param asBuilt the as-built state those observations give
 * @param analysis the engine's result for design and as-built
 * @param latestFrame the observation that counts for each frame member recorded (absent: taken
 *     as designed)
 */
public record PlaneResult(
    PlaneRecord plane,
    DesignRevision design,
    Map<PanelRef, Observation> latest,
    AsBuiltPlane asBuilt,
    PlaneAnalysis analysis,
    Map<FrameRef, Observation> latestFrame) {

  /** A plane with no frame member recorded. */
  public PlaneResult(PlaneRecord plane, DesignRevision design, Map<PanelRef, Observation> latest,
      AsBuiltPlane asBuilt, PlaneAnalysis analysis) {
    this(plane, design, latest, asBuilt, analysis, Map.of());
  }

  public PlaneResult {
    Objects.requireNonNull(plane, "plane");
    Objects.requireNonNull(design, "design");
    latest = Map.copyOf(latest);
    latestFrame = Map.copyOf(latestFrame);
    Objects.requireNonNull(asBuilt, "asBuilt");
    Objects.requireNonNull(analysis, "analysis");
  }

  /**
   * The one verdict on this plane ({@link Verdict}): kind, freedoms and keep-off zone; "not yet
   * inspected" while the inspection holds no observation on it (of a panel or a frame member).
   */
  public Verdict verdict() {
    return Verdict.of(analysis, plane.role(), !latest.isEmpty() || !latestFrame.isEmpty());
  }

  /** The conservative as-built verdict: uninspected panels count as missing. */
  public boolean rigid() {
    return analysis.analysedState().rigid();
  }
}
