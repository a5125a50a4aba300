package org.bracewalk.app.check;

import java.util.Objects;
import java.util.Optional;
import org.bracewalk.app.panelmap.PanelMap;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.PlaneDesign;

/**
 * One checked plane: the maps as read, the design and as-built state built from them, where the
 * support came from, and the engine's analysis.
 */
public record CheckResult(
    PanelMap designMap,
    Optional<PanelMap> asBuiltMap,
    PlaneDesign design,
    Optional<AsBuiltPlane> asBuilt,
    SupportChoice supportChoice,
    PlaneAnalysis analysis) {

  public CheckResult {
    Objects.requireNonNull(designMap, "designMap");
    Objects.requireNonNull(asBuiltMap, "asBuiltMap");
    Objects.requireNonNull(design, "design");
    Objects.requireNonNull(asBuilt, "asBuilt");
    Objects.requireNonNull(supportChoice, "supportChoice");
    Objects.requireNonNull(analysis, "analysis");
  }

  /** Whether the analysed state (as built when given, else as designed) holds its shape. */
  public boolean rigid() {
    return analysis.analysedState().rigid();
  }
}
