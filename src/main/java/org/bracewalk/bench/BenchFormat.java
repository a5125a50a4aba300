package org.bracewalk.bench;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.Map;
import org.bracewalk.app.json.PrettyJson;

/** Prints a {@link BenchReport} as text or as JSON. Stateless. */
public final class BenchFormat {

  /**
   * {@code {"results": [{"name", "medianMs", "samples", ...}], "ratios": {...},
   * "baselineAgrees": ..., "machine": {...}}}; heap figures appear on the results that have them.
   */
  public ObjectNode json(BenchReport report) {
    JsonNodeFactory f = JsonNodeFactory.instance;
    ObjectNode root = f.objectNode();
    ArrayNode results = root.putArray("results");
    for (BenchResult r : report.results()) {
      ObjectNode o = results.addObject();
      o.put("name", r.name());
      o.put("medianMs", round(r.medianMs()));
      o.put("samples", r.samples());
      r.retainedHeapMb().ifPresent(v -> o.put("retainedHeapMb", round(v)));
      r.peakHeapMb().ifPresent(v -> o.put("peakHeapMb", round(v)));
    }
    ObjectNode ratios = root.putObject("ratios");
    for (Map.Entry<String, Double> e : report.ratios().entrySet()) {
      ratios.put(e.getKey(), round(e.getValue()));
    }
    root.put("baselineAgrees", report.baselineAgrees());
    ObjectNode machine = root.putObject("machine");
    machine.put("processors", report.processors());
    machine.put("java", report.javaVersion());
    machine.put("seed", report.plan().seed());
    return root;
  }

  public String jsonText(BenchReport report) {
    return PrettyJson.write(json(report));
  }

  /** A table of medians, the ratios, and whether the baseline agreed with the engine. */
  public String text(BenchReport report) {
    StringBuilder sb = new StringBuilder();
    BenchPlan plan = report.plan();
    sb.append("Bracewalk bench: ")
        .append(report.processors())
        .append(report.processors() == 1 ? " processor" : " processors")
        .append(", Java ")
        .append(report.javaVersion())
        .append(", seed ")
        .append(plan.seed())
        .append('\n');
    sb.append(
        String.format(
            Locale.ROOT,
            "Random planes on a pinned base, about %d %% of panels braced with rigid diagonals; as built:"
                + " a tenth of the braces lost,%n"
                + "every brace gone in one lift in fifty, one panel in a hundred not inspected."
                + " Medians of %d samples (%d for a million%npanels and for baselines of %d x %d and"
                + " more), after an untimed warm-up.%n%n",
            Math.round(plan.bracedShare() * 100),
            plan.repetitions(),
            plan.largeRepetitions(),
            plan.largeBaselineFrom(),
            plan.largeBaselineFrom()));
    if (plan.frame() != null) {
      sb.append(
          "Frame damage: the same kind of planes with ledgers and standards missing as built (drawn at"
              + " random; the design's\nframe complete); the walk-round and medium planes are also timed"
              + " with the frame complete, for the ratios.\n"
              + (plan.frame().steadyWarmupNanos() > 0
                  ? "The engine on the plane timed against the rigidity matrix is timed twice: after the usual"
                      + " warm-up, and (-steady)\nafter " + Math.round(plan.frame().steadyWarmupNanos() / 1e9)
                      + " s more, when the compiler is done with it; that ratio takes the second.\n"
                  : "")
              + "\n");
    }
    int nameWidth = "measurement".length();
    for (BenchResult r : report.results()) {
      nameWidth = Math.max(nameWidth, r.name().length());
    }
    sb.append(String.format(Locale.ROOT, "%-" + nameWidth + "s  %12s  %7s%n", "measurement", "median ms", "samples"));
    for (BenchResult r : report.results()) {
      sb.append(String.format(Locale.ROOT, "%-" + nameWidth + "s  %12s  %7d", r.name(), figure(r.medianMs()), r.samples()));
      if (r.retainedHeapMb().isPresent()) {
        sb.append(String.format(Locale.ROOT, "  heap: %s MB held by the result", figure(r.retainedHeapMb().getAsDouble())));
      }
      if (r.peakHeapMb().isPresent()) {
        sb.append(String.format(Locale.ROOT, ", at most %s MB in use at the peak, input included", figure(r.peakHeapMb().getAsDouble())));
      }
      sb.append('\n');
    }
    sb.append('\n');
    sb.append("Ratios:\n");
    for (Map.Entry<String, Double> e : report.ratios().entrySet()) {
      sb.append("  ").append(e.getKey()).append(": ").append(figure(e.getValue())).append('\n');
    }
    sb.append(
        report.baselineAgrees()
            ? "The rigidity matrix gave the engine's degrees of freedom on every plane it was run on.\n"
            : "WARNING: the rigidity matrix and the engine disagree on the degrees of freedom of a"
                + " bench plane; please report this.\n");
    return sb.toString();
  }

  /** Four significant figures. */
  static double round(double v) {
    if (v == 0 || Double.isNaN(v) || Double.isInfinite(v)) {
      return v;
    }
    return new BigDecimal(v).round(new MathContext(4)).doubleValue();
  }

  private static String figure(double v) {
    double r = round(v);
    return BigDecimal.valueOf(r).stripTrailingZeros().toPlainString();
  }
}
