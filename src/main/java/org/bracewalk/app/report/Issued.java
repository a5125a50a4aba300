package org.bracewalk.app.report;

import java.util.List;
import org.bracewalk.core.model.IssuedReport;

/**
 * What issuing a document did, in the terms a front end tells the user: the rows now in the
 * register of issued documents and what the document says in brief. Front ends get this from
 * {@link ReportService#issueReport(long, java.nio.file.Path, org.bracewalk.app.OutputFiles,
 * Progress)} and its repair-order twin, never the report content itself.
 */
public final class Issued {
  private Issued() {}

  /** Hears how far issuing has come: a fraction from 0 to 1 and what is being done. */
  @FunctionalInterface
  public interface Progress {
    Progress NONE = (fraction, doing) -> { };

    void at(double fraction, String doing);
  }

  /**
   * An issued inspection report.
   *
   * @param registered the register's row for the file
   * @param draft true while the inspection is open (every page says DRAFT)
   * @param planeLines one line per plane: its name, verdict and, where people and loads must be
   *     kept off, where (the words of {@code app.verdict})
   * @param recordsFingerprint the SHA-256 fingerprint of the inspection's records
   * @param signed true when the PDF carries a digital signature
   */
  public record Report(IssuedReport registered, long inspectionId, boolean draft, int planes,
      int findings, int actions, List<String> planeLines, String recordsFingerprint,
      boolean signed) {
    public Report {
      planeLines = List.copyOf(planeLines);
    }
  }

  /**
   * An issued repair order.
   *
   * @param registered the register's rows: the PDF's, then the CSV's when one was written
   * @param actions how many actions it lists
   * @param signed true when the PDF carries a digital signature
   */
  public record RepairOrder(List<IssuedReport> registered, int actions, boolean signed) {
    public RepairOrder {
      registered = List.copyOf(registered);
    }
  }
}
