/**
 * Benchmark and picture scaffolding, kept out of the production packages: nothing but {@code
 * boot} (which registers the commands) may depend on it ({@code ArchitectureTest}). Like {@code
 * boot} it may use every layer.
 *
 * <ul>
 *   <li>{@code bench} ({@link org.bracewalk.bench.BenchCommand}, {@link
 *       org.bracewalk.bench.BenchService}): times the engine on seeded random planes from 10 x 10
 *       to 1000 x 1000 panels, and a general-purpose baseline on the small ones: the rank of the
 *       bar-and-joint rigidity matrix (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245
 *       (1978)) by a dense SVD from EJML, whose freedoms are compared with the engine's on every
 *       plane it sees, so the bench doubles as an outside check. The clock and the memory beans are
 *       passed in.
 *   <li>{@code bench-store} ({@link org.bracewalk.bench.StoreBenchmark}) and {@code bench-report}
 *       ({@link org.bracewalk.bench.ReportBenchmark}): the store and the report timed in a
 *       temporary database; {@code bench-sync} ({@link org.bracewalk.bench.SyncBenchmark}): field
 *       files pushing to one team server at once, every record counted there by global identity.
 *   <li>{@code snapshot} ({@link org.bracewalk.bench.SnapshotCommand}, {@link
 *       org.bracewalk.bench.ScreenShots}, {@link org.bracewalk.bench.ScreenPicture}, {@link
 *       org.bracewalk.bench.HeadlessFx}): pictures of the screens drawn headless; {@link
 *       org.bracewalk.bench.DemoWalk} walks the demo's planes for them and for the screen tests.
 *   <li>{@link org.bracewalk.bench.WalkBench}: times the walk-round screen.
 * </ul>
 *
 * <p>The start-up bench stays in {@code boot} ({@code StartupBench}): it measures boot's own
 * quick-start path through package-private hooks that would otherwise have to be made public.
 */
package org.bracewalk.bench;
