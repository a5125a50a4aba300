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
 * @param slowSamples timed calls of the rigidity-matrix rank on the baseline plane and of the
 *     verdict and repair of the large one (each takes seconds; no warm-up beyond the call that
 *     measures the large plane's heap)
 * @param steadyWarmupNanos a further warm-up of the engine on the baseline plane, after its timing
 *     with the plan's usual warm-up, before it is timed again for the ratio against the rigidity
 *     matrix: the ratio compares two methods, each at its compiled speed (the rank's inner loops
 *     are compiled within its first call; the engine's many small analyses reach theirs only after
 *     tens of thousands of calls on two processors). 0: no second timing, the ratio takes the first
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
    int slowSamples,
    long steadyWarmupNanos) {

  public FrameBenchPlan {
    if (walkLifts < 1 || walkBays < 1 || mediumSize < 1 || largeSize < 1 || baselineSize < 1) {
      throw new IllegalArgumentException("every frame bench plane needs at least one lift and bay");
    }
    if (steadyWarmupNanos < 0) {
      throw new IllegalArgumentException("a warm-up of 0 or more nanoseconds");
    }
    if (slowSamples < 1) {
      throw new IllegalArgumentException("at least one timed call of the slow measurements");
    }
    if (walkMissing < 0 || largeMissing < 0 || !(mediumShare >= 0 && mediumShare <= 1)
        || !(baselineShare >= 0 && baselineShare <= 1)) {
      throw new IllegalArgumentException("missing frame members: a count from 0, a share in 0..1");
    }
  }

  /**
   * The cases: 20 lifts x 100 bays with 20 missing (target under 5 ms), 100 x 100 with 1 %
   * missing (under 50 ms), 1000 x 1000 with 1,000 missing, verdict and repair (under 2 s and 1 GiB),
   * and 20 x 20 with 1 % missing against the rigidity-matrix rank (at least 1000 times faster),
   * the engine timed again for that ratio after 20 s more of warm-up (JMH's default warm-up is
   * five iterations of 10 s).
   */
  public static FrameBenchPlan standard() {
    return new FrameBenchPlan(20, 100, 20, 100, 0.01, 1000, 1000, 20, 0.01, 3, 20_000_000_000L);
  }

  /**
   * The same cases with one call of the slow measurements and 5 s of further warm-up (for {@code
   * bench --quick}, which promises no figures).
   */
  public static FrameBenchPlan quick() {
    return new FrameBenchPlan(20, 100, 20, 100, 0.01, 1000, 1000, 20, 0.01, 1, 5_000_000_000L);
  }

  /** Frame members of a {@code lifts} x {@code bays} plane: ledgers and standard segments. */
  static long frameMembers(int lifts, int bays) {
    return (long) (lifts + 1) * bays + (long) lifts * (bays + 1);
  }
}
