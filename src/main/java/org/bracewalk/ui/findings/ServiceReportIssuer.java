package org.bracewalk.ui.findings;

import java.nio.file.Path;
import java.util.Objects;
import java.util.function.Consumer;
import org.bracewalk.app.OutputFiles;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.Issued;

/**
 * Issues the documents through the report service's issuing use case, as {@code bracewalk report}
 * and {@code bracewalk repair-order} do, writing through the same {@link OutputFiles}: never over
 * the database or its companion files, a link or a file the documents are made from. The final
 * bytes (signed when a certificate is configured) are registered as issued and moved into place
 * from a temporary file beside the target, so a half-written or unregistered file never stands
 * under the chosen name.
 */
public final class ServiceReportIssuer implements ReportIssuer {
  private final ReportService reports;
  private final OutputFiles outputs;

  /**
   * @param reports the report service
   * @param outputs the writer guarding the open database ({@code AppServices#outputs}) and the
   *     template files
   */
  public ServiceReportIssuer(ReportService reports, OutputFiles outputs) {
    this.reports = Objects.requireNonNull(reports, "reports");
    this.outputs = Objects.requireNonNull(outputs, "outputs");
  }

  @Override
  public String issueReport(long inspectionId, Path out, Consumer<Progress> progress) {
    Issued.Report issued = reports.issueReport(inspectionId, out, outputs,
        (fraction, doing) -> progress.accept(new Progress(fraction, doing)));
    return "Issued the inspection report " + out + (issued.draft() ? " (DRAFT: the inspection is open)" : "")
        + "; record fingerprint " + issued.recordsFingerprint().substring(0, 16) + "\u2026"
        + (issued.signed() ? "; digitally signed" : "");
  }

  @Override
  public String issueRepairOrder(long inspectionId, Path out, Consumer<Progress> progress) {
    String name = out.getFileName().toString();
    Path csv = out.resolveSibling((name.toLowerCase(java.util.Locale.ROOT).endsWith(".pdf")
        ? name.substring(0, name.length() - 4) : name) + ".csv");
    Issued.RepairOrder issued = reports.issueRepairOrder(inspectionId, out, csv, outputs,
        (fraction, doing) -> progress.accept(new Progress(fraction, doing)));
    return "Issued the repair order " + out + " (" + issued.actions() + " actions) and " + csv.getFileName();
  }
}
