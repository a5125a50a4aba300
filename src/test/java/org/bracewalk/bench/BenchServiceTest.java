package org.bracewalk.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.Test;

/** The bench's shape on tiny planes, timed by a clock that ticks one millisecond per reading. */
class BenchServiceTest {
  static final BenchPlan TINY = new BenchPlan(7, 0.3, List.of(3, 4), 4, List.of(3, 4), 0, 2, 1, 4, false, 0);

  static BenchService service() {
    AtomicLong now = new AtomicLong();
    return new BenchService(
        PlaneAnalyzer.standard(),
        () -> now.addAndGet(1_000_000L),
        ManagementFactory.getMemoryMXBean(),
        ManagementFactory.getMemoryPoolMXBeans(),
        2,
        "17-test");
  }

  @Test
  void aRunMeasuresEverySizeInOrderAndComparesTheBaselineWithTheEngine() {
    List<String> steps = new ArrayList<>();
    BenchReport report = service().run(TINY, steps::add);

    assertThat(report.results().stream().map(BenchResult::name))
        .containsExactly(
            "engine-full-3x3",
            "engine-full-4x4",
            "engine-verdict-repair-4x4",
            "rigidity-matrix-rank-3x3",
            "rigidity-matrix-rank-4x4");
    assertThat(steps).hasSize(5);
    // the 4 x 4 rank is "large" in this plan: its own sample count
    assertThat(report.results().stream().map(BenchResult::samples)).containsExactly(2, 2, 2, 2, 1);
    // one tick of the fake clock per sample: every median is 1 ms, every ratio 1
    assertThat(report.results()).allSatisfy(r -> assertThat(r.medianMs()).isEqualTo(1.0));
    assertThat(report.ratios()).containsOnlyKeys("rigidityMatrixOverEngine3x3", "rigidityMatrixOverEngine4x4");
    assertThat(report.ratios().values()).containsOnly(1.0);
    assertThat(report.baselineAgrees()).isTrue();
    BenchResult vr = report.results().get(2);
    assertThat(vr.retainedHeapMb()).isPresent();
    assertThat(vr.retainedHeapMb().getAsDouble()).isNotNegative();
  }

  @Test
  void theBaselineAgreesWithTheEngineOnSeveralSeededPlanes() {
    PlaneAnalyzer engine = PlaneAnalyzer.standard();
    for (long seed = 1; seed <= 12; seed++) {
      int lifts = 2 + (int) (seed % 5);
      int bays = 2 + (int) (seed % 4);
      RandomPlanes.Pair p = RandomPlanes.pair(lifts, bays, 0.3, seed);
      // outside check: rank of the rigidity matrix (Asimow & Roth 1978) against the brace graph
      assertThat(RigidityMatrixBaseline.freedoms(p.asBuilt().grid(), p.asBuilt().members()))
          .as("seed %d", seed)
          .isEqualTo(engine.analyseState(p.asBuilt().grid(), p.asBuilt().members()).degreesOfFreedom());
    }
  }

  @Test
  void theQuickAndFullPlansCoverTheSizesTheReadmeReports() {
    assertThat(BenchPlan.quick().fullSizes()).contains(10, 20, 100, 1000);
    assertThat(BenchPlan.quick().baselineSizes()).containsExactly(10, 20);
    assertThat(BenchPlan.standard().baselineSizes()).containsExactly(10, 20, 30);
    assertThat(BenchPlan.standard().fullSizes()).contains(10, 20, 30, 100, 1000);
    assertThat(BenchPlan.quick().verdictRepairSize()).isEqualTo(1000);
  }

  @Test
  void theMedianOfAnEvenNumberOfSamplesIsTheMeanOfTheMiddleTwo() {
    assertThat(BenchService.median(new double[] {5, 1, 3})).isEqualTo(3);
    assertThat(BenchService.median(new double[] {4, 1, 3, 2})).isEqualTo(2.5);
  }
}
