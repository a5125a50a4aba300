package org.bracewalk.ui.findings;

import java.nio.file.Path;
import java.util.Objects;
import java.util.function.Consumer;
import org.bracewalk.app.OutputFiles;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.ReportContent;

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
    outputs.check(out);
    progress.accept(new Progress(0.1, "reading the inspection's records"));
    ReportContent content = reports.reportContent(inspectionId);
    progress.accept(new Progress(0.4, "drawing the report" + (reports.signs() ? " and signing it" : "")));
    reports.issueReport(content, out, outputs);
    return "Issued the inspection report " + out + (content.header().draft() ? " (DRAFT: the inspection is open)" : "")
        + "; record fingerprint " + content.fingerprint().sha256().substring(0, 16) + "\u2026"
        + (reports.signs() ? "; digitally signed" : "");
  }

  @Override
  public String issueRepairOrder(long inspectionId, Path out, Consumer<Progress> progress) {
    String name = out.getFileName().toString();
    Path csv = out.resolveSibling((name.toLowerCase(java.util.Locale.ROOT).endsWith(".pdf")
        ? name.substring(0, name.length() - 4) : name) + ".csv");
    outputs.check(out, csv);
    progress.accept(new Progress(0.1, "reading the inspection's records"));
    RepairOrderContent order = reports.repairOrderContent(inspectionId);
    progress.accept(new Progress(0.4, "drawing the repair order" + (reports.signs() ? " and signing it" : "")));
    reports.issueRepairOrder(order, out, csv, outputs);
    return "Issued the repair order " + out + " (" + order.actions().size() + " actions) and " + csv.getFileName();
  }
}
