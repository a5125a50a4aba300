package org.bracewalk.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.report.ReportServiceFactory;
import org.bracewalk.cli.CliContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code bench-report}: times the report on the demo and on a large invented structure. */
@Command(name = "bench-report", mixinStandardHelpOptions = true,
    description = "Time the report on the demo's after-impact inspection and on a large invented"
        + " structure, in a temporary database (your own is not touched).")
public final class BenchReportCommand implements java.util.concurrent.Callable<Integer> {
  @picocli.CommandLine.Spec picocli.CommandLine.Model.CommandSpec spec;

  @Option(names = "--planes", defaultValue = "50", description = "Planes (default ${DEFAULT-VALUE}).")
  int planes;

  @Option(names = "--size", defaultValue = "20",
      description = "Lifts and bays of each plane, at most "
          + org.bracewalk.core.model.PlaneLimits.MAX_LIFTS + " (default ${DEFAULT-VALUE}).")
  int size;

  @Option(names = "--runs", defaultValue = "3", description = "Runs of each (default ${DEFAULT-VALUE}).")
  int runs;

  private final CliContext context;
  private final ReportServiceFactory reports;

  public BenchReportCommand(CliContext context, ReportServiceFactory reports) {
    this.context = context;
    this.reports = reports;
  }

  @Override
  public Integer call() throws IOException {
    PrintWriter out = spec.commandLine().getOut();
    if (planes < 1 || size < 1 || runs < 1) {
      spec.commandLine().getErr().println("error: --planes, --size and --runs must be 1 or more");
      return picocli.CommandLine.ExitCode.USAGE;
    }
    // the planes are stored, so they keep to the one limit of a stored plane
    var tooLarge = org.bracewalk.core.model.PlaneLimits.problem("plane 1", size, size);
    if (tooLarge.isPresent()) {
      spec.commandLine().getErr().println("error: " + tooLarge.get() + " (field --size)");
      return picocli.CommandLine.ExitCode.USAGE;
    }
    Path dir = Files.createTempDirectory("bracewalk-bench");
    try {
      try (AppServices s = context.services().open(dir.resolve("bench.db"))) {
        var threads = java.lang.management.ManagementFactory.getThreadMXBean();
        ReportBenchmark bench = new ReportBenchmark(s, reports.over(s), System::nanoTime,
            threads::getCurrentThreadCpuTime);
        out.println("wall-clock ms (CPU ms of the thread); first run cold, then the median of"
            + " the next " + Math.max(1, runs - 1));
        out.flush();
        for (ReportBenchmark.Figure f : List.of(bench.demo(runs), bench.large(planes, size, runs))) {
          out.printf("%s: %d planes, %d panels, %d kB: first %d ms (%d), then %d ms (%d)%n",
              f.what(), f.planes(), f.panels(), f.bytes() / 1024, f.firstMillis(),
              f.firstCpuMillis(), f.medianMillis(), f.medianCpuMillis());
          out.flush();
        }
      }
    } finally {
      try (var files = Files.list(dir)) {
        for (Path p : files.toList()) {
          Files.deleteIfExists(p);
        }
      }
      Files.deleteIfExists(dir);
    }
    return 0;
  }
}
