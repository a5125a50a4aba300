package org.bracewalk.core.analysis;

import java.util.Optional;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Everything the engine says about one plane: the design's verdict, the as-built verdict when an
 * as-built state was given, and the repair of the analysed state (the as-built one when given).
 */
public record PlaneAnalysis(
    PlaneGrid grid, StateAnalysis design, Optional<AsBuiltAnalysis> asBuilt, RepairPlan repair) {

  /** The state the verdict is about: as built when known, else as designed. */
  public StateAnalysis analysedState() {
    return asBuilt.map(AsBuiltAnalysis::state).orElse(design);
  }
}
