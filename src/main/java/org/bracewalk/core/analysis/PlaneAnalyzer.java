package org.bracewalk.core.analysis;

import java.util.Map;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/** Analyses brace planes. Implementations are stateless and safe to share between threads. */
public interface PlaneAnalyzer {

  /** The verdict on one set of effective members in a grid (support taken from the grid). */
  StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members);

  /** A design on its own, with the least set of braces that would make it rigid. */
  PlaneAnalysis analyse(PlaneDesign design);

  /**
   * An as-built state against its design (same grid), with the repair of the as-built state. The
   * support used is the design grid's.
   */
  PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt);

  /** The engine Bracewalk uses. */
  static PlaneAnalyzer standard() {
    return new BraceGraphPlaneAnalyzer();
  }
}
