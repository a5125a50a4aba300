package org.bracewalk.core.analysis;

import java.util.Map;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

final class BraceGraphPlaneAnalyzer implements PlaneAnalyzer {
  @Override
  public StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members) {
    throw new UnsupportedOperationException("engine being written");
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design) {
    throw new UnsupportedOperationException("engine being written");
  }

  @Override
  public PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt) {
    throw new UnsupportedOperationException("engine being written");
  }
}
