package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.UserInputException;
import org.bracewalk.app.report.Issued;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.ReportServiceFactory;
import org.bracewalk.app.report.Verification;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import org.bracewalk.core.model.IssuedReport;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code report}, {@code repair-order}, and {@code verify-report}. */
public final class ReportCommands {
  private ReportCommands() {}

  /** Registers the report commands. */
  public static void addTo(CommandLine root, CliContext context, ReportServiceFactory reports) {
    root.addSubcommand("report", new Report(context, reports));
    root.addSubcommand("repair-order", new RepairOrderCommand(context, reports));
    root.addSubcommand("verify-report", new VerifyReport(context, reports));
  }

  /** A store command that needs the report service (a wording-template fault is bad input, exit 2). */
  abstract static class ReportCommand extends StoreCommand {
    final ReportServiceFactory reports;

    ReportCommand(CliContext context, ReportServiceFactory reports) {
      super(context);
      this.reports = reports;
    }

    @Override
    final int run(AppServices services, PrintWriter out, PrintWriter err) {
      outputs = outputs.withInputs(reports.inputFiles());
      return run(services, reports.over(services), out, err);
    }

    abstract int run(AppServices services, ReportService reports, PrintWriter out, PrintWriter err);
  }

  /** The line saying what the register now holds for an issued file. */
  static String registered(IssuedReport r, boolean signed) {
    boolean pdf = r.kind() != IssuedReport.Kind.REPAIR_ORDER_CSV;
    return "registered as issued (" + r.kind().label() + " " + r.id() + ", SHA-256 "
        + r.fingerprint() + ")" + (pdf && signed ? "; digitally signed" : "");
  }

  @Command(name = "report", mixinStandardHelpOptions = true,
      description = {"Write the inspection report (PDF) of an inspection.",
          "A finalised inspection gives the report; an open one the same marked DRAFT on every"
              + " page. Refused (exit 2, nothing written) while a recorded particular is empty;"
              + " the message names every one. The file's exact bytes are registered as issued"
              + " (SHA-256, records fingerprint); with $BRACEWALK_SIGN_P12 and"
              + " $BRACEWALK_SIGN_PASSWORD set, the PDF is also digitally signed."})
  static final class Report extends ReportCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    @Option(names = "--out", required = true, paramLabel = "FILE.pdf",
        description = "Where to write the report (replaced if it exists; never the database,"
            + " a link or a file the command reads: refused, exit 2).")
    Path outFile;

    Report(CliContext context, ReportServiceFactory reports) {
      super(context, reports);
    }

    @Override
    int run(AppServices s, ReportService reports, PrintWriter out, PrintWriter err) {
      Issued.Report issued = reports.issueReport(inspection, outFile, outputs, Issued.Progress.NONE);
      out.println("wrote " + outFile + (issued.draft() ? " (DRAFT: the inspection is open)" : ""));
      out.println(registered(issued.registered(), issued.signed()));
      out.println("inspection " + inspection + ", " + issued.planes() + " planes, "
          + issued.findings() + " findings, " + issued.actions() + " repair actions");
      issued.planeLines().forEach(line -> out.println("  " + line));
      out.println("record fingerprint " + issued.recordsFingerprint());
      return 0;
    }
  }

  @Command(name = "repair-order", mixinStandardHelpOptions = true,
      description = {"Write the crew's repair order (PDF) of an inspection, and optionally the"
          + " same actions as CSV (columns in README.md).",
          "Actions come in working order: taking out of service first, then what is needed for"
              + " rigidity, then the rest of the restore-to-design list. Both files are registered"
              + " as issued; the PDF is signed as the report is."})
  static final class RepairOrderCommand extends ReportCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    @Option(names = "--out", required = true, paramLabel = "FILE.pdf",
        description = "Where to write the repair order.")
    Path outFile;

    @Option(names = "--csv", paramLabel = "FILE.csv", description = "Also write the actions as CSV"
        + " (a file other than --out; never the database or a link: refused, exit 2).")
    Path csv;

    RepairOrderCommand(CliContext context, ReportServiceFactory reports) {
      super(context, reports);
    }

    @Override
    int run(AppServices s, ReportService reports, PrintWriter out, PrintWriter err) {
      Issued.RepairOrder issued =
          reports.issueRepairOrder(inspection, outFile, csv, outputs, Issued.Progress.NONE);
      out.println("wrote " + outFile + ": " + issued.actions() + " actions");
      out.println(registered(issued.registered().get(0), issued.signed()));
      if (csv != null) {
        out.println("wrote " + csv);
        out.println(registered(issued.registered().get(1), issued.signed()));
      }
      return 0;
    }
  }

  @Command(name = "verify-report", mixinStandardHelpOptions = true,
      description = {"Check a report or repair order (PDF, or its CSV) against the database: it"
          + " matches only when its bytes are those of a copy in the register of issued documents,"
          + " its stamp names that same registered document, and the inspection's records still"
          + " give the fingerprint it was issued with.",
          "Exit 0 when it matches, 1 when anything differs (each difference is named: bytes"
              + " edited or never issued, a stamp naming another document, records changed since"
              + " issue), 2 when the file is not a Bracewalk document."})
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
      outputs = outputs.withInput(file);
      try {
        // bounded before reading, as every input is (a device such as /dev/zero included)
        bytes = TextInput.readBytes(file, file.toString(), DOCUMENT_LIMITS);
      } catch (TextInputException e) {
        throw new UserInputException(e.getMessage(), e);
      }
      Verification v = reports.verify(bytes);
      switch (v.outcome()) {
        case NOT_OURS -> out.println("not a Bracewalk document: " + file
            + " (no Bracewalk stamp in it, and its bytes are no registered copy)");
        case MATCH -> {
          IssuedReport r = v.issuedCopy().orElseThrow();
          out.println("matches: " + file + " is the " + r.kind().label() + " issued as "
              + r.fileName() + " at " + r.issuedAt() + " for inspection " + v.inspectionId()
              + ", and the records of inspection " + v.inspectionId()
              + " are as they were then (fingerprint " + v.fingerprint() + ")");
        }
        case DIFFERS -> {
          out.println("does not match: " + file + " (" + (v.kind().isEmpty() ? "document" : v.kind())
              + " of inspection " + v.inspectionId() + ")");
          for (String d : v.differences()) {
            out.println("  " + d);
          }
        }
      }
      for (String note : v.notes()) {
        out.println("note: " + note);
      }
      return v.outcome().exitCode();
    }
  }
}
