package org.bracewalk.bench;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * Seeded random planes for the bench: a design on a pinned base with uneven bays (1.8-2.5 m) and
 * lifts (1.5-2.2 m), about {@code bracedShare} of its panels braced with rigid diagonals ({@code
 * /}, {@code \} or {@code X}) and one panel in a hundred an opening; and an as-built state in which
 * one design brace in ten is lost at random, every brace of one lift in fifty is gone (a damaged
 * band, so that the repair has work to do), one panel in a hundred is not inspected and one empty
 * panel in two hundred carries an extra brace. Rigid members only, so the rigidity matrix can
 * check every verdict.
 */
final class RandomPlanes {
  private static final Diagonal[] DIAGONALS = Diagonal.values();

  private RandomPlanes() {}

  /** A design and its as-built state. */
  record Pair(PlaneDesign design, AsBuiltPlane asBuilt) {}

  static Pair pair(int lifts, int bays, double bracedShare, long seed) {
    Random random = new Random(seed);
    List<Double> widths = new ArrayList<>(bays);
    for (int j = 0; j < bays; j++) {
      widths.add(1.8 + 0.7 * random.nextDouble());
    }
    List<Double> heights = new ArrayList<>(lifts);
    for (int i = 0; i < lifts; i++) {
      heights.add(1.5 + 0.7 * random.nextDouble());
    }
    PlaneGrid grid = new PlaneGrid(lifts, bays, widths, heights, Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    for (int i = 1; i <= lifts; i++) {
      for (int j = 1; j <= bays; j++) {
        double r = random.nextDouble();
        if (r < bracedShare) {
          braces.put(new PanelRef(i, j), Brace.rigid(DIAGONALS[random.nextInt(DIAGONALS.length)]));
        } else if (r < bracedShare + 0.01) {
          openings.add(new PanelRef(i, j));
        }
      }
    }
    PlaneDesign design = new PlaneDesign(grid, braces, openings);

    Set<Integer> damagedLifts = new HashSet<>();
    for (int i = 1; i <= lifts; i++) {
      if (random.nextDouble() < 0.02) {
        damagedLifts.add(i);
      }
    }
    if (damagedLifts.isEmpty()) {
      damagedLifts.add(1 + random.nextInt(lifts));
    }
    Map<PanelRef, Brace> members = new HashMap<>();
    Set<PanelRef> unknown = new HashSet<>();
    for (int i = 1; i <= lifts; i++) {
      for (int j = 1; j <= bays; j++) {
        PanelRef p = new PanelRef(i, j);
        if (random.nextDouble() < 0.01) {
          unknown.add(p);
          continue;
        }
        Brace b = braces.get(p);
        if (b != null) {
          if (!damagedLifts.contains(i) && random.nextDouble() >= 0.1) {
            members.put(p, b);
          }
        } else if (!openings.contains(p) && random.nextDouble() < 0.005) {
          members.put(p, Brace.rigid(Diagonal.RISING));
        }
      }
    }
    return new Pair(design, new AsBuiltPlane(grid, members, unknown));
  }

  /**
   * The same pair with {@code missing} frame members (ledgers and standard segments, drawn
   * uniformly, seeded) gone as built; the design keeps its whole frame.
   */
  static Pair withFrameMissing(Pair pair, long missing, long seed) {
    PlaneGrid grid = pair.design().grid();
    int lifts = grid.lifts();
    int bays = grid.bays();
    long ledgers = (long) (lifts + 1) * bays;
    long total = FrameBenchPlan.frameMembers(lifts, bays);
    if (missing > total) {
      throw new IllegalArgumentException(
          missing + " frame members missing, but a " + lifts + " x " + bays + " plane has " + total);
    }
    Random random = new Random(seed);
    Set<FrameRef> absent = new HashSet<>();
    while (absent.size() < missing) {
      long k = (long) (random.nextDouble() * total);
      if (k < ledgers) {
        absent.add(FrameRef.ledger((int) (k / bays), (int) (k % bays) + 1));
      } else {
        long s = k - ledgers;
        absent.add(FrameRef.standard((int) (s / (bays + 1)) + 1, (int) (s % (bays + 1))));
      }
    }
    AsBuiltPlane b = pair.asBuilt();
    return new Pair(pair.design(), new AsBuiltPlane(grid, b.members(), b.uninspected(), absent, Set.of()));
  }
}
