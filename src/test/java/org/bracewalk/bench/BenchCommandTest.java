package org.bracewalk.bench;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.management.ManagementFactory;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/** {@code bracewalk bench} on tiny plans: the output's shape, not its timings. */
class BenchCommandTest {
  private static final BenchPlan TINY_QUICK = new BenchPlan(3, 0.3, List.of(3, 5), 5, List.of(5), 0, 1, 1, 30, false, 0);
  private static final BenchPlan TINY_FULL = new BenchPlan(3, 0.3, List.of(3, 5), 5, List.of(3, 5), 0, 1, 1, 30, false, 0);

  record Run(int code, String out, String err) {}

  private static Run run(String... args) {
    AtomicLong now = new AtomicLong();
    BenchService service =
        new BenchService(
            PlaneAnalyzer.standard(),
            () -> now.addAndGet(250_000L),
            ManagementFactory.getMemoryMXBean(),
            ManagementFactory.getMemoryPoolMXBeans(),
            2,
            "17");
    CommandLine cli = new CommandLine(new BenchCommand(service, new BenchFormat(), TINY_QUICK, TINY_FULL));
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    cli.setOut(new PrintWriter(out));
    cli.setErr(new PrintWriter(err));
    int code = cli.execute(args);
    return new Run(code, out.toString(), err.toString());
  }

  @Test
  void quickJsonHasResultsWithMediansAndTheBaselineRatio() throws Exception {
    Run r = run("--quick", "--format", "json");

    assertThat(r.code()).isZero();
    JsonNode v = new ObjectMapper().readTree(r.out());
    assertThat(v.get("results").findValuesAsText("name"))
        .containsExactly("engine-full-3x3", "engine-full-5x5", "engine-verdict-repair-5x5", "rigidity-matrix-rank-5x5");
    assertThat(v.get("results")).allSatisfy(x -> assertThat(x.get("medianMs").asDouble()).isEqualTo(0.25));
    assertThat(v.get("ratios").get("rigidityMatrixOverEngine5x5").asDouble()).isEqualTo(1.0);
    assertThat(v.get("baselineAgrees").asBoolean()).isTrue();
    assertThat(r.err()).contains("bench: engine-full-3x3");
  }

  @Test
  void withoutQuickTheFullPlanRunsAndTheTextIsATable() {
    Run r = run();

    assertThat(r.code()).isZero();
    assertThat(r.out())
        .contains("measurement")
        .contains("rigidity-matrix-rank-3x3")
        .contains("rigidityMatrixOverEngine3x3: 1")
        .contains("The rigidity matrix gave the engine's degrees of freedom on every plane it was run on.");
  }

  @Test
  void anUnknownFormatIsAUsageErrorWithExitTwo() {
    Run r = run("--format", "yaml");

    assertThat(r.code()).isEqualTo(2);
    assertThat(r.out()).isEmpty();
    assertThat(r.err()).contains("--format must be text or json");
  }
}
