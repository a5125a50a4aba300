package org.bracewalk.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.UserInputException;
import org.bracewalk.app.report.ReportBenchmark;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.ReportServiceFactory;
import org.bracewalk.app.report.Verification;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.port.RenderingException;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.PlaneVerdict;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.ReportContent;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code report}, {@code repair-order}, {@code verify-report} and {@code bench-report}. */
public final class ReportCommands {
  private ReportCommands() {}

  /** Registers the report commands. */
  public static void addTo(CommandLine root, CliContext context, ReportServiceFactory reports) {
    root.addSubcommand("report", new Report(context, reports));
    root.addSubcommand("repair-order", new RepairOrderCommand(context, reports));
    root.addSubcommand("verify-report", new VerifyReport(context, reports));
    root.addSubcommand("bench-report", new BenchReport(context, reports));
  }

  /** A store command that needs the report service; wording-template faults are bad input. */
  abstract static class ReportCommand extends StoreCommand {
    final ReportServiceFactory reports;

    ReportCommand(CliContext context, ReportServiceFactory reports) {
      super(context);
      this.reports = reports;
    }

    @Override
    final int run(AppServices services, PrintWriter out, PrintWriter err) {
      try {
        return run(services, reports.over(services), out, err);
      } catch (RenderingException e) {
        err.println("error: " + e.getMessage());
        return BAD_INPUT;
      }
    }

    abstract int run(AppServices services, ReportService reports, PrintWriter out, PrintWriter err);
  }

  /** Writes bytes to a file through a temporary file beside it, so a failure leaves no file. */
  static void writeFile(Path file, byte[] bytes) {
    Path target = file.toAbsolutePath();
    try {
      Path parent = target.getParent();
      if (parent != null) {
        Files.createDirectories(parent);
      }
      Path tmp = Files.createTempFile(parent, ".bracewalk-", ".part");
      try {
        Files.write(tmp, bytes);
        try {
          Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING,
              StandardCopyOption.ATOMIC_MOVE);
        } catch (AtomicMoveNotSupportedException e) {
          Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
      } finally {
        Files.deleteIfExists(tmp);
      }
    } catch (IOException e) {
      throw new UserInputException("cannot write " + file + ": " + e.getMessage());
    }
  }

  static void planeLines(ReportContent c, PrintWriter out) {
    for (PlaneSection p : c.planes()) {
      PlaneVerdict v = p.verdict();
      out.println("  " + p.name() + ": " + switch (v) {
        case HOLDS_SHAPE -> "holds its shape";
        case LOST_RIGIDITY -> "LOST RIGIDITY";
        case DEPENDS_ON_UNINSPECTED -> "depends on panels not inspected";
      });
    }
  }

  @Command(name = "report", mixinStandardHelpOptions = true,
      description = {"Write the inspection report (PDF) of an inspection.",
          "A finalised inspection gives the report; an open one the same marked DRAFT on every"
              + " page. Refused (exit 2, nothing written) while a recorded particular is empty;"
              + " the message names every one. The file's fingerprint is remembered as issued."})
  static final class Report extends ReportCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    @Option(names = "--out", required = true, paramLabel = "FILE.pdf",
        description = "Where to write the report (replaced if it exists).")
    Path outFile;

    Report(CliContext context, ReportServiceFactory reports) {
      super(context, reports);
    }

    @Override
    int run(AppServices s, ReportService reports, PrintWriter out, PrintWriter err) {
      ReportContent content = reports.reportContent(inspection);
      byte[] pdf = reports.reportPdf(content);
      writeFile(outFile, pdf);
      reports.recordIssued(inspection, outFile.getFileName().toString(), pdf);
      out.println("wrote " + outFile + (content.header().draft() ? " (DRAFT: the inspection is open)" : ""));
      out.println("inspection " + inspection + ", " + content.planes().size() + " planes, "
          + content.findings().size() + " findings, " + content.actions().size()
          + " repair actions");
      planeLines(content, out);
      out.println("record fingerprint " + content.fingerprint().sha256());
      return 0;
    }
  }

  @Command(name = "repair-order", mixinStandardHelpOptions = true,
      description = {"Write the crew's repair order (PDF) of an inspection, and optionally the"
          + " same actions as CSV (columns in README.md).",
          "Actions come in working order: taking out of service first, then what is needed for"
              + " rigidity, then the rest of the restore-to-design list."})
  static final class RepairOrderCommand extends ReportCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    @Option(names = "--out", required = true, paramLabel = "FILE.pdf",
        description = "Where to write the repair order.")
    Path outFile;

    @Option(names = "--csv", paramLabel = "FILE.csv", description = "Also write the actions as CSV.")
    Path csv;

    RepairOrderCommand(CliContext context, ReportServiceFactory reports) {
      super(context, reports);
    }

    @Override
    int run(AppServices s, ReportService reports, PrintWriter out, PrintWriter err) {
      RepairOrderContent order = reports.repairOrderContent(inspection);
      byte[] pdf = reports.repairOrderPdf(order);
      byte[] csvBytes = csv == null ? null
          : ReportService.repairOrderCsv(order).getBytes(StandardCharsets.UTF_8);
      writeFile(outFile, pdf);
      out.println("wrote " + outFile + ": " + order.actions().size() + " actions");
      if (csv != null) {
        writeFile(csv, csvBytes);
        out.println("wrote " + csv);
      }
      return 0;
    }
  }

  @Command(name = "verify-report", mixinStandardHelpOptions = true,
      description = {"Check a report or repair order against the database: recompute the"
          + " fingerprint of the inspection's records and compare.",
          "Exit 0 when they match, 1 when any record differs (each difference is named), 2 when"
              + " the file is not a Bracewalk document."})
  static final class VerifyReport extends ReportCommand {
    /** A document to verify: at most 1 GiB (the largest array; reports with photos are megabytes). */
    static final TextInput.Limits DOCUMENT_LIMITS =
        new TextInput.Limits("a Bracewalk document", TextInput.Limits.MOST_BYTES, 0);

    @Parameters(paramLabel = "FILE.pdf", description = "The document to check.")
    Path file;

    VerifyReport(CliContext context, ReportServiceFactory reports) {
      super(context, reports);
    }

    @Override
    int run(AppServices s, ReportService reports, PrintWriter out, PrintWriter err) {
      byte[] bytes;
      try {
        // bounded before reading, as every input is (a device such as /dev/zero included)
        bytes = TextInput.readBytes(file, file.toString(), DOCUMENT_LIMITS);
      } catch (TextInputException e) {
        throw new UserInputException(e.getMessage(), e);
      }
      Verification v = reports.verify(bytes);
      switch (v.outcome()) {
        case NOT_OURS -> out.println("not a Bracewalk document: " + file
            + " (no Bracewalk record fingerprint in it)");
        case MATCH -> out.println("matches: the records of inspection " + v.inspectionId()
            + " are as they were when this " + v.kind() + " was made (fingerprint "
            + v.fingerprint() + ")");
        case DIFFERS -> {
          out.println("differs: the records of inspection " + v.inspectionId()
              + " are not as they were when this " + v.kind() + " was made");
          for (String d : v.differences()) {
            out.println("  " + d);
          }
        }
      }
      if (v.outcome() != Verification.Outcome.NOT_OURS) {
        out.println(v.issuedCopy()
            .map(r -> "this file is the copy issued as " + r.fileName() + " at " + r.issuedAt())
            .orElse("no issued copy with exactly these bytes is recorded"));
      }
      return v.outcome().exitCode();
    }
  }

  @Command(name = "bench-report", mixinStandardHelpOptions = true,
      description = "Time the report on the demo's after-impact inspection and on a large invented"
          + " structure, in a temporary database (your own is not touched).")
  static final class BenchReport implements java.util.concurrent.Callable<Integer> {
    @picocli.CommandLine.Spec picocli.CommandLine.Model.CommandSpec spec;

    @Option(names = "--planes", defaultValue = "50", description = "Planes (default ${DEFAULT-VALUE}).")
    int planes;

    @Option(names = "--size", defaultValue = "20",
        description = "Lifts and bays of each plane (default ${DEFAULT-VALUE}).")
    int size;

    @Option(names = "--runs", defaultValue = "3", description = "Runs of each (default ${DEFAULT-VALUE}).")
    int runs;

    private final CliContext context;
    private final ReportServiceFactory reports;

    BenchReport(CliContext context, ReportServiceFactory reports) {
      this.context = context;
      this.reports = reports;
    }

    @Override
    public Integer call() throws IOException {
      PrintWriter out = spec.commandLine().getOut();
      if (planes < 1 || size < 1 || runs < 1) {
        spec.commandLine().getErr().println("error: --planes, --size and --runs must be 1 or more");
        return StoreCommand.BAD_INPUT;
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
}
