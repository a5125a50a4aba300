package org.bracewalk.core.analysis;

import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/** Analyses brace planes. Implementations are stateless and safe to share between threads. */
public interface PlaneAnalyzer {

  /** The verdict on one set of effective members in a grid (support taken from the grid). */
  StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members);

  /**
   * The verdict on one state of a plane whose frame may be incomplete: the exact analysis of the
   * bar-and-joint framework of every ledger, standard and diagonal that is there.
   */
  StateAnalysis analyseState(BuiltFrame state);

  /**
   * A first-order motion of the state for drawings: for {@code freedom} (one of the state's
   * freedoms) a motion that shows it; empty when the state has no freedom (tension-only members
   * taken as rigid).
   */
  Optional<JointMotion> motion(BuiltFrame state, Freedom freedom);

  /** A design on its own, with the least set of braces that would make it rigid. */
  PlaneAnalysis analyse(PlaneDesign design);

  /**
   * An as-built state against its design (same grid), with the repair of the as-built state. The
   * support used is the design grid's.
   */
  PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt);

  /** The engine Bracewalk uses. */
  static PlaneAnalyzer standard() {
    return new FramePlaneAnalyzer();
  }
}
