package org.bracewalk.bench;

import java.util.List;

/**
 * What one bench run measures.
 *
 * @param seed seed of the random planes (the same seed gives the same planes)
 * @param bracedShare share of the panels braced in each design, about 0.3
 * @param fullSizes square planes (lifts = bays) timed with the full analysis of design and as-built
 * @param verdictRepairSize the plane timed for the verdict and repair of one state alone, with its
 *     heap use
 * @param baselineSizes square planes timed with the rigidity-matrix rank; each is also in {@code
 *     fullSizes} so the two can be compared
 * @param warmupNanos before the timed samples of a measurement, the work is repeated untimed for
 *     at least this long (at least once) so that the JIT has compiled it
 * @param repetitions timed samples per measurement (the median is reported)
 * @param largeRepetitions timed samples for planes of a million panels or more, and for baselines
 *     of {@code largeBaselineFrom} or more (each call takes seconds)
 * @param largeBaselineFrom the baseline size from which a rank is sampled like a large plane
 * @param largeWarmup whether those large measurements get one untimed call first (the code is
 *     compiled by then; the call mainly settles the heap)
 * @param minSampleNanos a sample repeats the work until this much time has passed, so that quick
 *     operations are timed over many calls
 * @param frame the frame-damage cases, or {@code null} for none
 */
public record BenchPlan(
    long seed,
    double bracedShare,
    List<Integer> fullSizes,
    int verdictRepairSize,
    List<Integer> baselineSizes,
    long warmupNanos,
    int repetitions,
    int largeRepetitions,
    int largeBaselineFrom,
    boolean largeWarmup,
    long minSampleNanos,
    FrameBenchPlan frame) {

  /** A plan without the frame-damage cases. */
  public BenchPlan(
      long seed,
      double bracedShare,
      List<Integer> fullSizes,
      int verdictRepairSize,
      List<Integer> baselineSizes,
      long warmupNanos,
      int repetitions,
      int largeRepetitions,
      int largeBaselineFrom,
      boolean largeWarmup,
      long minSampleNanos) {
    this(seed, bracedShare, fullSizes, verdictRepairSize, baselineSizes, warmupNanos, repetitions,
        largeRepetitions, largeBaselineFrom, largeWarmup, minSampleNanos, null);
  }

  public BenchPlan {
    fullSizes = List.copyOf(fullSizes);
    baselineSizes = List.copyOf(baselineSizes);
    if (repetitions < 1 || largeRepetitions < 1 || warmupNanos < 0) {
      throw new IllegalArgumentException("at least one timed sample per measurement");
    }
    for (int size : baselineSizes) {
      if (!fullSizes.contains(size)) {
        throw new IllegalArgumentException("baseline size " + size + " must also be timed on the engine");
      }
    }
  }

  /** Seed of the published figures. */
  public static final long SEED = 20_261_201L;

  /** The full bench: engine 10 to 1000, baseline 10, 20, 30, and the frame-damage cases. */
  public static BenchPlan standard() {
    return new BenchPlan(SEED, 0.3, List.of(10, 20, 30, 100, 1000), 1000, List.of(10, 20, 30), 2_000_000_000L, 9, 3, 30, true, 20_000_000L,
        FrameBenchPlan.standard());
  }

  /**
   * {@code --quick}: the same without the 30 x 30 baseline, with fewer samples and no warm-up call
   * for the large measurements, the frame-damage cases included; under a minute.
   */
  public static BenchPlan quick() {
    return new BenchPlan(SEED, 0.3, List.of(10, 20, 100, 1000), 1000, List.of(10, 20), 500_000_000L, 5, 3, 20, false, 10_000_000L,
        FrameBenchPlan.quick());
  }
}
