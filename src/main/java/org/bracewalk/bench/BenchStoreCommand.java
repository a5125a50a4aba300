package org.bracewalk.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.bracewalk.app.UserInputException;
import org.bracewalk.cli.CliContext;
import org.bracewalk.core.port.StoreException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code bench-store}: how fast the store records and imports, on this machine's disk. */
@Command(name = "bench-store", mixinStandardHelpOptions = true,
    description = {"Measure the store on this disk: recording one observation including its"
        + " commit (target: median under 5 ms), and importing a 10,000-panel site (target: under"
        + " 2 s). Works in new database files in --dir (default: a temporary folder, removed"
        + " afterwards); your own database is not touched.",
        "With --server postgresql://HOST[:PORT]/DB: recording one observation on the team server"
        + " (target: median under 10 ms), in a new open inspection of the database's first"
        + " structure (the demo site when it is empty). A server's records are append-only: give"
        + " it a database kept for benchmarks."})
public final class BenchStoreCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--dir", paramLabel = "FOLDER",
      description = "Where to make the benchmark's database files (default: a temporary folder).")
  Path dir;

  @Option(names = "--records", defaultValue = "200",
      description = "Observations to record one by one (default ${DEFAULT-VALUE}).")
  int records;

  @Option(names = "--panels", defaultValue = "10000",
      description = "Panels of the imported site (default ${DEFAULT-VALUE}).")
  int panels;

  @Option(names = "--imports", defaultValue = "3",
      description = "Imports to time, each into a new file (default ${DEFAULT-VALUE}).")
  int imports;

  @Option(names = "--server", paramLabel = "postgresql://HOST[:PORT]/DB",
      description = "Time recording on this team server's database instead of files (credentials"
          + " as for --db: PGUSER, ~/.pgpass, PGPASSWORD).")
  String server;

  private final CliContext context;

  public BenchStoreCommand(CliContext context) {
    this.context = context;
  }

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    if (records < 1 || panels < 1 || imports < 1) {
      err.println("error: --records, --panels and --imports must be at least 1");
      return CommandLine.ExitCode.USAGE;
    }
    if (server != null) {
      return onServer(out, err);
    }
    boolean temporary = dir == null;
    try {
      Path folder = temporary ? Files.createTempDirectory("bracewalk-bench") : dir;
      Files.createDirectories(folder);
      err.println("database files in: " + folder);
      try {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        double load = ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        int cores = Runtime.getRuntime().availableProcessors();
        StoreBenchmark.Result r = new StoreBenchmark(context.services(), context.clock(),
            System::nanoTime, threads::getCurrentThreadCpuTime).run(folder, records, panels, imports);
        out.println(String.format(Locale.ROOT,
            "record one observation incl. commit: median %.2f ms, 95th percentile %.2f ms,"
                + " CPU median %.2f ms (%d records; target: median under 5 ms)",
            r.recordMedian(), r.recordPercentile95(), r.recordCpuMedian(),
            r.recordMillis().size()));
        out.println(String.format(Locale.ROOT,
            "import a %d-panel site (with one inspection observing every panel): median %.0f ms,"
                + " CPU median %.0f ms (%d imports; target: under 2000 ms)",
            r.panels(), r.importMedian(), r.importCpuMedian(), r.importMillis().size()));
        out.println(String.format(Locale.ROOT,
            "machine: %d cores, load average %.1f when started (wall times grow with load; CPU"
                + " times do not, disk waits are in wall time only)", cores, load));
        return 0;
      } finally {
        if (temporary) {
          delete(folder);
        }
      }
    } catch (IOException e) {
      err.println("error: cannot use the folder: " + e.getMessage());
      return CommandLine.ExitCode.USAGE;
    } catch (UserInputException | StoreException e) {
      err.println("error: " + e.getMessage());
      return CommandLine.ExitCode.USAGE;
    }
  }

  private int onServer(PrintWriter out, PrintWriter err) {
    try {
      double load = ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
      ThreadMXBean threads = ManagementFactory.getThreadMXBean();
      List<List<Double>> r = new StoreBenchmark(context.services(), context.clock(),
          System::nanoTime, threads::getCurrentThreadCpuTime).runOnServer(server, records);
      out.println(String.format(Locale.ROOT,
          "record one observation on the server incl. commit: median %.2f ms, 95th percentile"
              + " %.2f ms, client CPU median %.2f ms (%d records; target: median under 10 ms)",
          StoreBenchmark.median(r.get(0)), StoreBenchmark.percentile(r.get(0), 0.95),
          StoreBenchmark.median(r.get(1)), r.get(0).size()));
      out.println(String.format(Locale.ROOT,
          "machine: %d cores, load average %.1f when started (the server's work is in the wall"
              + " time only)", Runtime.getRuntime().availableProcessors(), load));
      return 0;
    } catch (UserInputException | StoreException e) {
      err.println("error: " + e.getMessage());
      return CommandLine.ExitCode.USAGE;
    }
  }

  private static void delete(Path folder) throws IOException {
    try (Stream<Path> files = Files.walk(folder)) {
      for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
