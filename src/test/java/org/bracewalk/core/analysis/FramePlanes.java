package org.bracewalk.core.analysis;

import java.util.HashSet;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/** Seeded random planes with frame damage for the frame cross-checks, and their pictures. */
final class FramePlanes {
  private FramePlanes() {}

  /**
   * A grid of whole centimetres: one in five uniform (1 m squares, where diagonals of neighbouring
   * panels can run in one straight line), the others uneven as {@link TestPlanes#unevenGrid}.
   */
  static PlaneGrid grid(Random rnd, int lifts, int bays, Support support) {
    return rnd.nextInt(5) == 0
        ? PlaneGrid.uniform(lifts, bays, support)
        : TestPlanes.unevenGrid(rnd, lifts, bays, support);
  }

  /** Each frame member absent with probability {@code share}. */
  static Set<FrameRef> damage(Random rnd, PlaneGrid grid, double share) {
    Set<FrameRef> absent = new HashSet<>();
    for (FrameRef f : FrameOracle.allFrameMembers(grid)) {
      if (rnd.nextDouble() < share) {
        absent.add(f);
      }
    }
    return absent;
  }

  /**
   * A random state up to {@code maxSize} x {@code maxSize}: braces as {@link TestPlanes#members}
   * ('/', '\' and 'X'), tension-only with probability {@code tensionShare}; one plane in eight with
   * a complete frame, the others with 0..30 % of the frame members absent.
   */
  static BuiltFrame state(Random rnd, int maxSize, Support support, double tensionShare) {
    PlaneGrid grid = grid(rnd, 1 + rnd.nextInt(maxSize), 1 + rnd.nextInt(maxSize), support);
    Map<PanelRef, Brace> braces =
        TestPlanes.members(rnd, grid, 0.2 + 0.7 * rnd.nextDouble(), tensionShare);
    double share = rnd.nextInt(8) == 0 ? 0 : 0.3 * rnd.nextDouble();
    return new BuiltFrame(grid, braces, damage(rnd, grid, share));
  }

  /** A panel map of one state with its frame lines (as in the check format) for failure messages. */
  static String describe(BuiltFrame s) {
    return TestPlanes.map(s.grid(), s.braces()) + frameLines(s.absentFrame(), "missing");
  }

  static String describe(PlaneDesign design, AsBuiltPlane asBuilt) {
    return "\ndesign:" + TestPlanes.map(design) + frameLines(design.omittedFrame(), "none")
        + "as built:" + TestPlanes.map(asBuilt) + frameLines(asBuilt.absentFrame(), "missing")
        + frameLines(asBuilt.unknownFrame(), "?");
  }

  private static String frameLines(Set<FrameRef> members, String state) {
    StringBuilder sb = new StringBuilder();
    for (FrameRef f : new TreeSet<>(members)) {
      sb.append(f.type().label()).append(' ').append(f.first()).append(' ').append(f.second())
          .append(' ').append(state).append('\n');
    }
    return sb.toString();
  }
}
