package org.bracewalk.ui.findings;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Objects;
import java.util.function.Consumer;
import org.bracewalk.app.UserInputException;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.ReportContent;

/**
 * Issues the documents through the report service, as {@code bracewalk report} and {@code bracewalk
 * repair-order} do: the PDF is written to a temporary file beside the target and moved into place,
 * so a half-written file never stands under the chosen name; an issued report is recorded with its
 * fingerprint.
 */
public final class ServiceReportIssuer implements ReportIssuer {
  private final ReportService reports;

  public ServiceReportIssuer(ReportService reports) {
    this.reports = Objects.requireNonNull(reports, "reports");
  }

  @Override
  public String issueReport(long inspectionId, Path out, Consumer<Progress> progress) {
    progress.accept(new Progress(0.1, "reading the inspection's records"));
    ReportContent content = reports.reportContent(inspectionId);
    progress.accept(new Progress(0.4, "drawing the report"));
    byte[] pdf = reports.reportPdf(content);
    progress.accept(new Progress(0.8, "writing " + out.getFileName()));
    write(out, pdf);
    progress.accept(new Progress(0.95, "recording the issue"));
    reports.recordIssued(inspectionId, out.getFileName().toString(), pdf);
    return "Issued the inspection report " + out + (content.header().draft() ? " (DRAFT: the inspection is open)" : "")
        + "; record fingerprint " + content.fingerprint().sha256().substring(0, 16) + "\u2026";
  }

  @Override
  public String issueRepairOrder(long inspectionId, Path out, Consumer<Progress> progress) {
    progress.accept(new Progress(0.1, "reading the inspection's records"));
    RepairOrderContent order = reports.repairOrderContent(inspectionId);
    progress.accept(new Progress(0.4, "drawing the repair order"));
    byte[] pdf = reports.repairOrderPdf(order);
    String name = out.getFileName().toString();
    Path csv = out.resolveSibling((name.toLowerCase(java.util.Locale.ROOT).endsWith(".pdf")
        ? name.substring(0, name.length() - 4) : name) + ".csv");
    progress.accept(new Progress(0.8, "writing " + out.getFileName() + " and " + csv.getFileName()));
    write(out, pdf);
    write(csv, ReportService.repairOrderCsv(order).getBytes(StandardCharsets.UTF_8));
    return "Issued the repair order " + out + " (" + order.actions().size() + " actions) and " + csv.getFileName();
  }

  private static void write(Path file, byte[] bytes) {
    Path target = file.toAbsolutePath();
    Path tmp = null;
    try {
      tmp = Files.createTempFile(target.getParent(), ".bracewalk-", ".part");
      Files.write(tmp, bytes);
      Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    } catch (IOException e) {
      if (tmp != null) {
        try {
          Files.deleteIfExists(tmp);
        } catch (IOException ignored) {
          // nothing more to do
        }
      }
      throw new UserInputException("cannot write " + file + ": " + e.getMessage());
    } catch (UncheckedIOException e) {
      throw new UserInputException("cannot write " + file + ": " + e.getMessage());
    }
  }
}
