package org.bracewalk.bench;

import java.lang.management.MemoryMXBean;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.Consumer;
import java.util.function.LongSupplier;
import java.util.function.Supplier;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Runs the bench of a {@link BenchPlan}: warm-up samples first, then timed samples, medians
 * reported. Measures the engine's full analysis (design and as-built: verdicts, blocks, critical
 * braces, loss tolerance, repair, restore list), the verdict and repair of one state alone ({@link
 * PlaneAnalyzer#analyse(PlaneDesign)} on the damaged bracing) with its heap use, and the
 * rigidity-matrix rank baseline, whose freedoms are checked against the engine's.
 */
public final class BenchService {
  private static final double MB = 1024.0 * 1024.0;


  private final PlaneAnalyzer analyzer;
  private final LongSupplier nanoClock;
  private final MemoryMXBean memory;
  private final List<MemoryPoolMXBean> pools;
  private final int processors;
  private final String javaVersion;

  /** Keeps results reachable so that the timed work cannot be optimised away. */
  private volatile Object sink;

  /**
   * @param nanoClock a monotonic clock in nanoseconds ({@code System::nanoTime})
   * @param memory the heap to measure
   * @param pools the memory pools whose peaks bound the peak heap use
   */
  public BenchService(
      PlaneAnalyzer analyzer,
      LongSupplier nanoClock,
      MemoryMXBean memory,
      List<MemoryPoolMXBean> pools,
      int processors,
      String javaVersion) {
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.nanoClock = Objects.requireNonNull(nanoClock, "nanoClock");
    this.memory = Objects.requireNonNull(memory, "memory");
    this.pools = List.copyOf(pools);
    this.processors = processors;
    this.javaVersion = javaVersion;
  }

  /** Runs {@code plan}, telling {@code progress} what it is about to measure. */
  public BenchReport run(BenchPlan plan, Consumer<String> progress) {
    List<BenchResult> results = new ArrayList<>();
    Map<Integer, Double> engineFull = new LinkedHashMap<>();
    Map<Integer, RandomPlanes.Pair> planes = new LinkedHashMap<>();
    for (int size : plan.fullSizes()) {
      RandomPlanes.Pair pair = RandomPlanes.pair(size, size, plan.bracedShare(), plan.seed() + size);
      planes.put(size, pair);
      String name = "engine-full-" + size + "x" + size;
      progress.accept(name);
      BenchResult r =
          time(
              name,
              "full analysis of design and as built, " + size + " x " + size + " panels",
              plan,
              (long) size * size,
              () -> analyzer.analyse(pair.design(), pair.asBuilt()));
      results.add(r);
      engineFull.put(size, r.medianMs());
      if (size * (long) size >= 1_000_000 && size != plan.verdictRepairSize()) {
        planes.remove(size); // let a million panels go before the next measurement
      }
    }

    int vr = plan.verdictRepairSize();
    String vrName = "engine-verdict-repair-" + vr + "x" + vr;
    progress.accept(vrName);
    RandomPlanes.Pair vrPair = planes.get(vr);
    if (vrPair == null) {
      vrPair = RandomPlanes.pair(vr, vr, plan.bracedShare(), plan.seed() + vr);
    }
    results.add(verdictAndRepair(vrName, vrPair, plan));
    if ((long) vr * vr >= 1_000_000) {
      planes.remove(vr);
    }

    boolean agrees = true;
    Map<String, Double> ratios = new LinkedHashMap<>();
    for (int size : plan.baselineSizes()) {
      RandomPlanes.Pair pair =
          planes.computeIfAbsent(size, s -> RandomPlanes.pair(s, s, plan.bracedShare(), plan.seed() + s));
      AsBuiltPlane built = pair.asBuilt();
      String name = "rigidity-matrix-rank-" + size + "x" + size;
      progress.accept(name);
      int engineDof = analyzer.analyseState(built.grid(), built.members()).degreesOfFreedom();
      int matrixDof = RigidityMatrixBaseline.freedoms(built.grid(), built.members());
      agrees &= engineDof == matrixDof;
      BenchResult r =
          time(
              name,
              "rank of the rigidity matrix by dense SVD (EJML), as built, " + size + " x " + size + " panels",
              plan,
              size >= plan.largeBaselineFrom() ? Long.MAX_VALUE : (long) size * size,
              () -> RigidityMatrixBaseline.freedoms(built.grid(), built.members()));
      results.add(r);
      ratios.put("rigidityMatrixOverEngine" + size + "x" + size, r.medianMs() / engineFull.get(size));
    }
    if (engineFull.containsKey(100) && engineFull.containsKey(1000)) {
      ratios.put("engineFull1000x1000OverFull100x100", engineFull.get(1000) / engineFull.get(100));
    }
    planes.clear();
    if (plan.frame() != null) {
      agrees &= frameCases(plan, plan.frame(), progress, results, ratios);
    }
    return new BenchReport(plan, results, ratios, agrees, processors, javaVersion);
  }

  /**
   * {@link PlaneAnalyzer#analyse(PlaneDesign)} on the damaged bracing of {@code pair} taken as a
   * design: one verdict and its repair, which must then search panels outside the design.
   */
  private BenchResult verdictAndRepair(String name, RandomPlanes.Pair pair, BenchPlan plan) {
    int size = pair.design().grid().lifts();
    Set<PanelRef> openings = new HashSet<>(pair.design().openings());
    openings.removeAll(pair.asBuilt().members().keySet());
    PlaneDesign damaged = new PlaneDesign(pair.asBuilt().grid(), pair.asBuilt().members(), openings);
    BenchResult heap = heap(() -> analyzer.analyse(damaged));
    BenchResult timed =
        time(
            name,
            "verdict and repair of one state (the as-built bracing as a design), " + size + " x " + size
                + " panels",
            plan,
            (long) size * size,
            () -> analyzer.analyse(damaged));
    return withHeap(timed, heap);
  }

  /**
   * Heap use of one call of {@code work}: from a collected heap (the input built), run it once and
   * collect again with the result held: what the result keeps. The pools' peaks bound the peak
   * use, input included. Returned as a result with only the heap figures meaningful.
   */
  private BenchResult heap(Supplier<?> work) {
    memory.gc();
    long before = memory.getHeapMemoryUsage().getUsed();
    List<MemoryPoolMXBean> heapPools = pools.stream().filter(p -> p.getType() == MemoryType.HEAP).toList();
    heapPools.forEach(MemoryPoolMXBean::resetPeakUsage);
    Object result = work.get();
    long peak = heapPools.stream().mapToLong(p -> p.getPeakUsage().getUsed()).sum();
    memory.gc();
    long after = memory.getHeapMemoryUsage().getUsed();
    sink = result;
    sink = null;
    return new BenchResult(
        "heap",
        "",
        0,
        0,
        OptionalDouble.of(Math.max(0, after - before) / MB),
        heapPools.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(peak / MB));
  }

  private static BenchResult withHeap(BenchResult timed, BenchResult heap) {
    return new BenchResult(
        timed.name(), timed.description(), timed.medianMs(), timed.samples(), heap.retainedHeapMb(), heap.peakHeapMb());
  }

  /**
   * The frame-damage cases (issue 11): the walk-round plane with frame members missing against the
   * same plane with its frame complete; a square plane with a share of its frame missing, likewise;
   * the rigidity-matrix rank on a plane with frame damage against the engine's full analysis of it
   * (whose as-built degrees of freedom it must give); and the verdict and repair of a large plane
   * with frame members missing, with its heap use. Returns whether the rank agreed with the engine.
   */
  private boolean frameCases(
      BenchPlan plan, FrameBenchPlan f, Consumer<String> progress, List<BenchResult> results, Map<String, Double> ratios) {
    String walkShape = f.walkLifts() + "x" + f.walkBays();
    RandomPlanes.Pair walkWhole =
        RandomPlanes.pair(f.walkLifts(), f.walkBays(), plan.bracedShare(), plan.seed() + 11L * f.walkBays() + f.walkLifts());
    RandomPlanes.Pair walk = RandomPlanes.withFrameMissing(walkWhole, f.walkMissing(), plan.seed() + 1);
    double walkComplete =
        timeFull(plan, progress, results, "engine-full-" + walkShape + "-frame-complete",
            "full analysis, " + f.walkLifts() + " lifts x " + f.walkBays() + " bays, frame complete (the baseline of the next)",
            walkWhole);
    double walkDamaged =
        timeFull(plan, progress, results, "engine-full-" + walkShape + "-frame-" + f.walkMissing() + "-missing",
            "full analysis, " + f.walkLifts() + " lifts x " + f.walkBays() + " bays, " + f.walkMissing()
                + " frame members missing",
            walk);
    ratios.put("frameMissingOverComplete" + walkShape, walkDamaged / walkComplete);

    int m = f.mediumSize();
    String mediumShape = m + "x" + m;
    long mediumMissing = Math.round(f.mediumShare() * FrameBenchPlan.frameMembers(m, m));
    RandomPlanes.Pair mediumWhole = RandomPlanes.pair(m, m, plan.bracedShare(), plan.seed() + m);
    RandomPlanes.Pair medium = RandomPlanes.withFrameMissing(mediumWhole, mediumMissing, plan.seed() + 2);
    double mediumComplete =
        timeFull(plan, progress, results, "engine-full-" + mediumShape + "-frame-complete",
            "full analysis, " + mediumShape + ", frame complete (the baseline of the next)", mediumWhole);
    double mediumDamaged =
        timeFull(plan, progress, results, "engine-full-" + mediumShape + "-frame-" + mediumMissing + "-missing",
            "full analysis, " + mediumShape + ", " + mediumMissing + " frame members missing", medium);
    ratios.put("frameMissingOverComplete" + mediumShape, mediumDamaged / mediumComplete);

    int b = f.baselineSize();
    String baseShape = b + "x" + b;
    long baseMissing = Math.round(f.baselineShare() * FrameBenchPlan.frameMembers(b, b));
    RandomPlanes.Pair base =
        RandomPlanes.withFrameMissing(RandomPlanes.pair(b, b, plan.bracedShare(), plan.seed() + b), baseMissing, plan.seed() + 3);
    double engineBase =
        timeFull(plan, progress, results, "engine-full-" + baseShape + "-frame-" + baseMissing + "-missing",
            "full analysis, " + baseShape + ", " + baseMissing + " frame members missing", base);
    AsBuiltPlane built = base.asBuilt();
    int engineDof = analyzer.analyse(base.design(), built).asBuilt().orElseThrow().state().degreesOfFreedom();
    int matrixDof = RigidityMatrixBaseline.freedoms(built.grid(), built.members(), built.absentFrame());
    String rankName = "rigidity-matrix-rank-" + baseShape + "-frame-" + baseMissing + "-missing";
    progress.accept(rankName);
    double[] rankMs = new double[f.slowSamples()];
    for (int i = 0; i < rankMs.length; i++) {
      rankMs[i] =
          sample(0, () -> RigidityMatrixBaseline.freedoms(built.grid(), built.members(), built.absentFrame())) / 1e6;
    }
    sink = null;
    BenchResult rank =
        new BenchResult(
            rankName,
            "rank of the rigidity matrix by dense SVD (EJML), as built, " + baseShape + ", " + baseMissing
                + " frame members missing",
            median(rankMs),
            rankMs.length,
            OptionalDouble.empty(),
            OptionalDouble.empty());
    results.add(rank);
    double engineForRatio = engineBase;
    if (f.steadyWarmupNanos() > 0) {
      String steadyName = "engine-full-" + baseShape + "-frame-" + baseMissing + "-missing-steady";
      progress.accept(steadyName);
      BenchResult steady =
          time(
              steadyName,
              "the same, timed again after " + Math.round(f.steadyWarmupNanos() / 1e9)
                  + " s more of warm-up (the compiled engine; the ratio's figure)",
              plan.repetitions(),
              f.steadyWarmupNanos(),
              plan.minSampleNanos(),
              () -> analyzer.analyse(base.design(), base.asBuilt()));
      results.add(steady);
      engineForRatio = steady.medianMs();
    }
    ratios.put("rigidityMatrixOverEngineFrame" + baseShape, rank.medianMs() / engineForRatio);

    int l = f.largeSize();
    String largeShape = l + "x" + l;
    String largeName = "engine-verdict-repair-" + largeShape + "-frame-" + f.largeMissing() + "-missing";
    progress.accept(largeName);
    RandomPlanes.Pair large =
        RandomPlanes.withFrameMissing(
            RandomPlanes.pair(l, l, plan.bracedShare(), plan.seed() + l), f.largeMissing(), plan.seed() + 4);
    BenchResult heap = heap(() -> analyzer.analyse(large.design(), large.asBuilt()));
    double[] largeMs = new double[f.slowSamples()];
    for (int i = 0; i < largeMs.length; i++) {
      largeMs[i] = sample(0, () -> analyzer.analyse(large.design(), large.asBuilt())) / 1e6;
    }
    sink = null;
    BenchResult timed =
        new BenchResult(
            largeName,
            "verdict and repair (full analysis of design and as built), " + largeShape + ", " + f.largeMissing()
                + " frame members missing",
            median(largeMs),
            largeMs.length,
            OptionalDouble.empty(),
            OptionalDouble.empty());
    results.add(withHeap(timed, heap));
    // against the same call on a plane of that size with its frame complete, where the run timed one
    for (BenchResult r : results) {
      if (r.name().equals("engine-full-" + largeShape)) {
        ratios.put("frameMissingOverComplete" + largeShape, timed.medianMs() / r.medianMs());
      }
    }
    return engineDof == matrixDof;
  }

  /** Times the full analysis of a pair, adds the result, returns its median in ms. */
  private double timeFull(
      BenchPlan plan, Consumer<String> progress, List<BenchResult> results, String name, String description, RandomPlanes.Pair pair) {
    progress.accept(name);
    PlaneGrid grid = pair.design().grid();
    BenchResult r =
        time(name, description, plan, (long) grid.lifts() * grid.bays(), () -> analyzer.analyse(pair.design(), pair.asBuilt()));
    results.add(r);
    return r.medianMs();
  }

  /**
   * Times {@code work}: an untimed warm-up, then timed samples; each sample repeats the work until
   * {@link BenchPlan#minSampleNanos()} has passed and counts the time per call.
   *
   * @param weight panels in the plane; a million or more (or {@code Long.MAX_VALUE} for a large
   *     baseline) takes the plan's large repetitions and at most one warm-up call
   */
  private BenchResult time(String name, String description, BenchPlan plan, long weight, Supplier<?> work) {
    boolean large = weight >= 1_000_000;
    if (large) {
      if (plan.largeWarmup()) {
        sink = work.get();
      }
    } else if (plan.warmupNanos() > 0) {
      sample(plan.warmupNanos(), work);
    }
    int samples = large ? plan.largeRepetitions() : plan.repetitions();
    return time(name, description, samples, 0, plan.minSampleNanos(), work);
  }

  /**
   * Times {@code work}: {@code warmupNanos} of untimed calls, then {@code samples} timed samples of
   * at least {@code minSampleNanos} each; the median per call.
   */
  private BenchResult time(
      String name, String description, int samples, long warmupNanos, long minSampleNanos, Supplier<?> work) {
    if (warmupNanos > 0) {
      sample(warmupNanos, work);
    }
    double[] ms = new double[samples];
    for (int i = 0; i < samples; i++) {
      ms[i] = sample(minSampleNanos, work) / 1e6;
    }
    sink = null;
    return new BenchResult(name, description, median(ms), samples, OptionalDouble.empty(), OptionalDouble.empty());
  }

  private double sample(long minNanos, Supplier<?> work) {
    long start = nanoClock.getAsLong();
    long calls = 0;
    long elapsed;
    do {
      sink = work.get();
      calls++;
      elapsed = nanoClock.getAsLong() - start;
    } while (elapsed < minNanos);
    return (double) elapsed / calls;
  }

  static double median(double[] values) {
    double[] v = values.clone();
    Arrays.sort(v);
    int n = v.length;
    return n % 2 == 1 ? v[n / 2] : (v[n / 2 - 1] + v[n / 2]) / 2;
  }
}
