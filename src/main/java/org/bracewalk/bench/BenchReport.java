package org.bracewalk.bench;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What a bench run found.
 *
 * @param plan what was measured
 * @param results every measurement, in the order taken
 * @param ratios in the order computed; e.g. {@code rigidityMatrixOverEngine20x20}: the baseline's median over the engine's
 *     full-analysis median on the same size
 * @param baselineAgrees whether the rigidity matrix gave the engine's degrees of freedom on every
 *     plane it was run on
 * @param processors processors available to the run
 * @param javaVersion the Java runtime
 */
public record BenchReport(
    BenchPlan plan,
    List<BenchResult> results,
    Map<String, Double> ratios,
    boolean baselineAgrees,
    int processors,
    String javaVersion) {
  public BenchReport {
    results = List.copyOf(results);
    ratios = Collections.unmodifiableMap(new LinkedHashMap<>(ratios));
  }
}
