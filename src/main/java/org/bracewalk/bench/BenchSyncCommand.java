package org.bracewalk.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import org.bracewalk.app.SyncService;
import org.bracewalk.app.UserInputException;
import org.bracewalk.cli.CliContext;
import org.bracewalk.core.port.StoreException;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code bench-sync}: many field files pushing to one team server at once. */
@Command(name = "bench-sync", mixinStandardHelpOptions = true,
    description = {"Measure field files syncing with one team server at once: makes --fields"
        + " field files in a temporary folder (removed afterwards), syncs each from the server"
        + " first, records --inspections finalised inspections of --observations observations in"
        + " each (not timed), then pushes them all concurrently, one thread per file, and times"
        + " that. Prints the wall time, the throughput, the server's counts of the records and"
        + " whether every record arrived exactly once (by global identity), then pushes all again"
        + " and shows nothing doubled. The baseline of the same run is one more field file of the"
        + " same size pushed alone. Exit 1 when a record is missing or doubled.",
        "An empty server database gets a generated site first (a 20 x 25 plane); a database"
            + " that holds records is used as it is (its first structure, or the generated site"
            + " of an earlier run). The records stay on the server: give it a database kept for"
            + " benchmarks."})
public final class BenchSyncCommand implements Callable<Integer> {
  /** Exit status when a record is missing or doubled on the server. */
  static final int NOT_EXACTLY_ONCE = 1;

  @Spec CommandSpec spec;

  @Option(names = "--server", required = true, paramLabel = "postgresql://HOST[:PORT]/DB",
      description = "The team server's database (login: PGUSER, ~/.pgpass or PGPASSWORD).")
  String server;

  @Option(names = "--fields", defaultValue = "8",
      description = "Field files pushing at once (default ${DEFAULT-VALUE}).")
  int fields;

  @Option(names = "--inspections", defaultValue = "50",
      description = "Finalised inspections in each field file (default ${DEFAULT-VALUE}).")
  int inspections;

  @Option(names = "--observations", defaultValue = "500",
      description = "Observations in each inspection (default ${DEFAULT-VALUE}).")
  int observations;

  private final CliContext context;

  public BenchSyncCommand(CliContext context) {
    this.context = context;
  }

  @Override
  public Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    if (fields < 1 || fields > 64 || inspections < 1 || observations < 1) {
      err.println("error: --fields must be 1 to 64, --inspections and --observations at least 1");
      return CommandLine.ExitCode.USAGE;
    }
    if (!CliContext.isServer(server)) {
      err.println("error: --server takes a team server's address, postgresql://HOST[:PORT]/DB,"
          + " not " + CliContext.shown(server));
      return CommandLine.ExitCode.USAGE;
    }
    double loadBefore = ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
    Path folder;
    try {
      folder = Files.createTempDirectory("bracewalk-bench-sync");
    } catch (IOException e) {
      err.println("error: cannot make a temporary folder: " + e.getMessage());
      return CommandLine.ExitCode.USAGE;
    }
    err.println("server: " + CliContext.shown(server));
    err.println("field files in: " + folder);
    err.flush();
    try {
      SyncBenchmark.Result r = new SyncBenchmark(context.services(), context.clock(),
          System::nanoTime).run(server, folder, fields, inspections, observations, line -> {
            err.println(line);
            err.flush();
          });
      double loadAfter = ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
      print(out, r, loadBefore, loadAfter);
      return r.exactlyOnce() ? 0 : NOT_EXACTLY_ONCE;
    } catch (UserInputException | StoreException e) {
      err.println("error: " + e.getMessage());
      return CommandLine.ExitCode.USAGE;
    } finally {
      try {
        delete(folder);
      } catch (IOException e) {
        err.println("could not remove " + folder + ": " + e.getMessage());
      }
    }
  }

  static void print(PrintWriter out, SyncBenchmark.Result r, double loadBefore,
      double loadAfter) {
    long inspectionsAll = (long) r.fields() * r.inspections();
    long observationsAll = inspectionsAll * r.observations();
    SyncBenchmark.Push c = r.concurrent();
    out.println("inspected: " + r.structure() + "; this run's records are by inspector '"
        + r.tag() + "'");
    double wallS = c.wallMillis() / 1000;
    double inspectionsPerS = inspectionsAll / wallS;
    out.println(String.format(Locale.ROOT,
        "pushed at once: %d field files x %d inspections x %d observations in %.0f ms wall"
            + " (each file's sync %.0f to %.0f ms)",
        r.fields(), r.inspections(), r.observations(), c.wallMillis(),
        c.fieldMillis().stream().mapToDouble(Double::doubleValue).min().orElse(0),
        c.fieldMillis().stream().mapToDouble(Double::doubleValue).max().orElse(0)));
    out.println(String.format(Locale.ROOT,
        "throughput: %.1f inspections/s, %.0f observations/s", inspectionsPerS,
        observationsAll / wallS));
    SyncBenchmark.Push a = r.alone();
    double aloneS = a.wallMillis() / 1000;
    double aloneInspectionsPerS = r.inspections() / aloneS;
    out.println(String.format(Locale.ROOT,
        "baseline, one more field file of the same size pushed alone: %.0f ms, %.1f"
            + " inspections/s, %.0f observations/s; %d at once gave %.2f times its throughput",
        a.wallMillis(), aloneInspectionsPerS, (double) r.inspections() * r.observations() / aloneS,
        r.fields(), inspectionsPerS / aloneInspectionsPerS));
    out.println("server counts of this bench: " + counts(r.first()));
    SyncBenchmark.Push again = r.again();
    out.println(String.format(Locale.ROOT,
        "pushed again, all %d field files at once (%.0f ms): %d inspections pushed, %d skipped as"
            + " already there; server counts now: %s",
        again.summaries().size(), again.wallMillis(), again.pushedInspections(),
        again.skippedInspections(), counts(r.second())));
    out.println("baseline file's records on the server: " + counts(r.aloneTally())
        + "; after pushing again: " + counts(r.aloneSecond()));
    for (SyncService.Conflict conflict : c.conflicts()) {
      out.println("  conflict: " + conflict.message());
    }
    for (SyncService.Conflict conflict : a.conflicts()) {
      out.println("  conflict (baseline): " + conflict.message());
    }
    for (SyncService.Conflict conflict : again.conflicts()) {
      out.println("  conflict (again): " + conflict.message());
    }
    out.println("every record arrived exactly once: " + (r.exactlyOnce() ? "yes" : "NO"));
    out.println(String.format(Locale.ROOT,
        "machine: %d cores, load average %.1f at the start, %.1f at the end (the server's work"
            + " and the field files' are on the same machine when the server is local)",
        Runtime.getRuntime().availableProcessors(), loadBefore, loadAfter));
  }

  private static String counts(SyncBenchmark.Tally t) {
    return String.format(Locale.ROOT,
        "%d inspections (expected %d), %d observations (expected %d); by global identity %d"
            + " missing, %d doubled",
        t.serverInspections(), t.expectedInspections(), t.serverObservations(),
        t.expectedObservations(), t.missingInspections() + t.missingObservations(),
        t.extraInspections() + t.extraObservations());
  }

  private static void delete(Path folder) throws IOException {
    try (Stream<Path> files = Files.walk(folder)) {
      for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
        Files.deleteIfExists(p);
      }
    }
  }
}
