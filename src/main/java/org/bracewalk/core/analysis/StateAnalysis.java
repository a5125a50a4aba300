package org.bracewalk.core.analysis;

import java.util.List;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
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
 * @param blocks the connected groups of lifts and bays, the fixed one first, where the frame is
 *     complete; empty where it is not
 * @param criticalMembers frame members whose loss alone adds a freedom, ledgers first
 * @param movingJoints with a pinned base, every joint that moves in some motion (tension-only
 *     members as rigid); empty on a free plane and when nothing moves
 * @param freedoms the freedoms told apart by kind; their counts add up to {@code degreesOfFreedom}
 * @param frameComplete whether every ledger and standard is there in this state
 */
public record StateAnalysis(
    boolean rigid,
    int degreesOfFreedom,
    boolean oneWayOnly,
    int lossTolerance,
    boolean lossToleranceExact,
    List<PanelRef> criticalBraces,
    List<Block> blocks,
    List<FrameRef> criticalMembers,
    List<Joint> movingJoints,
    List<Freedom> freedoms,
    boolean frameComplete) {

  /**
   * A state of a complete frame without the frame-member fields (no critical frame members, no
   * moving joints or freedoms listed): for hand-made fixtures; the engine fills every field.
   */
  public StateAnalysis(
      boolean rigid,
      int degreesOfFreedom,
      boolean oneWayOnly,
      int lossTolerance,
      boolean lossToleranceExact,
      List<PanelRef> criticalBraces,
      List<Block> blocks) {
    this(rigid, degreesOfFreedom, oneWayOnly, lossTolerance, lossToleranceExact, criticalBraces,
        blocks, List.of(), List.of(), List.of(), true);
  }

  public StateAnalysis {
    criticalBraces = List.copyOf(criticalBraces);
    blocks = List.copyOf(blocks);
    criticalMembers = List.copyOf(criticalMembers);
    movingJoints = List.copyOf(movingJoints);
    freedoms = List.copyOf(freedoms);
  }

  /** The number of freedoms of one kind. */
  public int freedomsOf(FreedomKind kind) {
    int n = 0;
    for (Freedom f : freedoms) {
      if (f.kind() == kind) {
        n += f.count();
      }
    }
    return n;
  }
}
