package org.bracewalk.core.analysis;

import java.util.List;
import org.bracewalk.core.model.PanelRef;

/**
 * The verdict on one bracing state of a plane.
 *
 * @param rigid the true verdict, tension-only members included
 * @param degreesOfFreedom independent motions with tension-only members treated as if rigid
 * @param oneWayOnly no free motion with members treated as rigid, yet the plane sways one way
 *     because tension-only members go slack
 * @param lossTolerance how many braces (rigid members) may be lost, any of them, with the plane
 *     still rigid; -1 when it is not rigid now
 * @param lossToleranceExact false when {@code lossTolerance} is only a lower bound (very large free
 *     planes, where the exact edge connectivity is not computed)
 * @param criticalBraces panels whose member(s), if lost, add a degree of freedom (bridges)
 * @param blocks the connected groups of lifts and bays, the fixed one first
 */
public record StateAnalysis(
    boolean rigid,
    int degreesOfFreedom,
    boolean oneWayOnly,
    int lossTolerance,
    boolean lossToleranceExact,
    List<PanelRef> criticalBraces,
    List<Block> blocks) {

  public StateAnalysis {
    criticalBraces = List.copyOf(criticalBraces);
    blocks = List.copyOf(blocks);
  }
}
