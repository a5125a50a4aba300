package org.bracewalk.bench;

/**
 * The frame-damage cases of a bench run (issue 11): seeded random planes as {@link RandomPlanes}
 * makes them, with frame members (ledgers and standards) missing as built.
 *
 * @param walkLifts lifts of the walk-round plane (recomputed per keystroke)
 * @param walkBays bays of the walk-round plane
 * @param walkMissing frame members missing in it
 * @param mediumSize the square plane with a share of its frame members missing
 * @param mediumShare that share (0.01: one in a hundred)
 * @param largeSize the square plane timed for verdict and repair, with its heap use
 * @param largeMissing frame members missing in it
 * @param baselineSize the square plane timed against the rigidity-matrix rank
 * @param baselineShare share of its frame members missing
 * @param rankSamples timed calls of the rigidity-matrix rank on it (each takes seconds; no warm-up:
 *     the engine side of the ratio is the quick one)
 */
public record FrameBenchPlan(
    int walkLifts,
    int walkBays,
    int walkMissing,
    int mediumSize,
    double mediumShare,
    int largeSize,
    int largeMissing,
    int baselineSize,
    double baselineShare,
    int rankSamples) {

  public FrameBenchPlan {
    if (walkLifts < 1 || walkBays < 1 || mediumSize < 1 || largeSize < 1 || baselineSize < 1) {
      throw new IllegalArgumentException("every frame bench plane needs at least one lift and bay");
    }
    if (rankSamples < 1) {
      throw new IllegalArgumentException("at least one timed call of the rank");
    }
    if (walkMissing < 0 || largeMissing < 0 || !(mediumShare >= 0 && mediumShare <= 1)
        || !(baselineShare >= 0 && baselineShare <= 1)) {
      throw new IllegalArgumentException("missing frame members: a count from 0, a share in 0..1");
    }
  }

  /**
   * The cases: 20 lifts x 100 bays with 20 missing (target under 5 ms), 100 x 100 with 1 %
   * missing (under 50 ms), 1000 x 1000 with 1,000 missing, verdict and repair (under 2 s and 1 GiB),
   * and 20 x 20 with 1 % missing against the rigidity-matrix rank (at least 1000 times faster).
   */
  public static FrameBenchPlan standard() {
    return new FrameBenchPlan(20, 100, 20, 100, 0.01, 1000, 1000, 20, 0.01, 3);
  }

  /** The same cases with one call of the rank (for {@code bench --quick}). */
  public static FrameBenchPlan quick() {
    return new FrameBenchPlan(20, 100, 20, 100, 0.01, 1000, 1000, 20, 0.01, 1);
  }

  /** Frame members of a {@code lifts} x {@code bays} plane: ledgers and standard segments. */
  static long frameMembers(int lifts, int bays) {
    return (long) (lifts + 1) * bays + (long) lifts * (bays + 1);
  }
}
