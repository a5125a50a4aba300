package org.bracewalk.bench;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/** The bench's frame-damage cases on tiny planes, and the baseline with frame members missing. */
class FrameBenchTest {
  private static final FrameBenchPlan TINY_FRAME = new FrameBenchPlan(3, 5, 2, 5, 0.05, 6, 3, 4, 0.05, 2, 1);
  private static final BenchPlan TINY =
      new BenchPlan(7, 0.3, List.of(3, 4), 4, List.of(3, 4), 0, 2, 1, 4, false, 0, TINY_FRAME);

  @Test
  void aRunWithFrameCasesMeasuresThemAfterTheOthersWithTheirRatiosAndHeap() {
    List<String> steps = new ArrayList<>();
    BenchReport report = BenchServiceTest.service().run(TINY, steps::add);
    // 5 x 5 has 60 frame members: 5 % is 3; 4 x 4 has 40: 5 % is 2
    assertThat(report.results().stream().map(BenchResult::name))
        .containsExactly(
            "engine-full-3x3",
            "engine-full-4x4",
            "engine-verdict-repair-4x4",
            "rigidity-matrix-rank-3x3",
            "rigidity-matrix-rank-4x4",
            "engine-full-3x5-frame-complete",
            "engine-full-3x5-frame-2-missing",
            "engine-full-5x5-frame-complete",
            "engine-full-5x5-frame-3-missing",
            "engine-full-4x4-frame-2-missing",
            "rigidity-matrix-rank-4x4-frame-2-missing",
            "engine-full-4x4-frame-2-missing-steady",
            "engine-verdict-repair-6x6-frame-3-missing");
    assertThat(steps).hasSize(report.results().size());
    assertThat(report.results().get(10).samples()).as("calls of the frame rank").isEqualTo(2);
    assertThat(report.results().get(12).samples()).as("calls of the large frame plane").isEqualTo(2);
    // the ratio against the rigidity matrix takes the engine's second (steady) timing
    BenchResult rank = report.results().get(10);
    BenchResult steady = report.results().get(11);
    assertThat(report.ratios().get("rigidityMatrixOverEngineFrame4x4"))
        .isEqualTo(rank.medianMs() / steady.medianMs());
    assertThat(report.ratios()).containsKeys(
        "frameMissingOverComplete3x5", "frameMissingOverComplete5x5", "rigidityMatrixOverEngineFrame4x4");
    // the large frame plane (6 x 6) has no complete-frame run of its size in this plan: no ratio
    assertThat(report.ratios()).doesNotContainKey("frameMissingOverComplete6x6");
    BenchResult large = report.results().get(report.results().size() - 1);
    assertThat(large.retainedHeapMb()).isPresent();
    assertThat(large.peakHeapMb()).isPresent();
    // outside check: the rank of the rigidity matrix gives the engine's degrees of freedom
    assertThat(report.baselineAgrees())
        .as("the rigidity matrix's freedoms against the engine's on the bench planes, frame damage included")
        .isTrue();
    assertThat(new BenchFormat().text(report)).contains("Frame damage:");
  }

  @Test
  void framesAreTakenOutAsAskedSeededAndOnlyAsBuilt() {
    RandomPlanes.Pair whole = RandomPlanes.pair(4, 6, 0.3, 5);
    RandomPlanes.Pair damaged = RandomPlanes.withFrameMissing(whole, 9, 42);
    assertThat(damaged.asBuilt().absentFrame()).hasSize(9);
    assertThat(damaged.asBuilt().absentFrame()).allMatch(f -> f.within(whole.design().grid()));
    assertThat(damaged.design()).isEqualTo(whole.design());
    assertThat(damaged.asBuilt().members()).isEqualTo(whole.asBuilt().members());
    assertThat(RandomPlanes.withFrameMissing(whole, 9, 42).asBuilt().absentFrame())
        .isEqualTo(damaged.asBuilt().absentFrame());
    // every member of a 1 x 1 plane (4), and no more
    RandomPlanes.Pair one = RandomPlanes.pair(1, 1, 0.3, 5);
    assertThat(RandomPlanes.withFrameMissing(one, 4, 1).asBuilt().absentFrame()).hasSize(4);
    assertThatThrownBy(() -> RandomPlanes.withFrameMissing(one, 5, 1))
        .hasMessageContaining("has 4");
  }

  private static Map<PanelRef, Brace> parse(String... topLiftFirst) {
    Map<PanelRef, Brace> m = new java.util.HashMap<>();
    for (int r = 0; r < topLiftFirst.length; r++) {
      String[] t = topLiftFirst[r].trim().split("\\s+");
      for (int j = 0; j < t.length; j++) {
        Diagonal d = Diagonal.fromSymbol(t[j]);
        if (d != null) {
          m.put(PanelRef.of(topLiftFirst.length - r, j + 1), Brace.rigid(d));
        }
      }
    }
    return m;
  }

  @Test
  void theBaselineGivesTheFreedomsOfAnalysisMdsFrameExamples() {
    // shared/design/analysis.md, "Frame members" (computed there with exact rank)
    PlaneGrid a = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
    assertThat(RigidityMatrixBaseline.freedoms(a, parse("/", "\\", "/"), Set.of(FrameRef.ledger(1, 1))))
        .as("A").isEqualTo(1);
    PlaneGrid e = PlaneGrid.uniform(2, 3, Support.PINNED_BASE);
    assertThat(RigidityMatrixBaseline.freedoms(e, parse(". . /", "/ . ."), Set.of(FrameRef.ledger(1, 1))))
        .as("E").isEqualTo(1);
    PlaneGrid g = PlaneGrid.uniform(1, 3, Support.PINNED_BASE);
    assertThat(RigidityMatrixBaseline.freedoms(g, parse("/ . ."), Set.of(FrameRef.ledger(1, 3))))
        .as("G").isEqualTo(1);
    PlaneGrid i = PlaneGrid.uniform(4, 1, Support.PINNED_BASE);
    assertThat(RigidityMatrixBaseline.freedoms(i, parse("/", "/", "/", "/"),
            Set.of(FrameRef.standard(2, 0), FrameRef.standard(2, 1))))
        .as("I").isEqualTo(2);
    PlaneGrid f = PlaneGrid.uniform(2, 2, Support.FREE);
    assertThat(RigidityMatrixBaseline.freedoms(f, parse("X X", "X X"), Set.of(FrameRef.standard(2, 1))))
        .as("F").isZero();
    // a joint left with no member is left out: pinned 1 x 1 '/', top ledger and left standard gone
    PlaneGrid one = PlaneGrid.uniform(1, 1, Support.PINNED_BASE);
    assertThat(RigidityMatrixBaseline.freedoms(one, parse("/"),
            Set.of(FrameRef.ledger(1, 1), FrameRef.standard(1, 0))))
        .isZero();
  }
}
