package org.bracewalk.bench;

import java.util.OptionalDouble;

/**
 * One measurement.
 *
 * @param name e.g. {@code engine-full-100x100}, {@code rigidity-matrix-rank-20x20}
 * @param description what was timed, in words
 * @param medianMs median time of one operation, in milliseconds
 * @param samples timed samples taken
 * @param retainedHeapMb heap held by the result of one run, when measured
 * @param peakHeapMb the sum of the heap pools' peaks during one run, its input included (an upper
 *     bound on the peak), when measured
 */
public record BenchResult(
    String name,
    String description,
    double medianMs,
    int samples,
    OptionalDouble retainedHeapMb,
    OptionalDouble peakHeapMb) {}
