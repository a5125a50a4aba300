package org.bracewalk.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import org.bracewalk.app.AppServices;
import org.bracewalk.ui.findings.ReportIssuer;

/** The report issuer the end-to-end test uses. */
final class TestReports {
  private TestReports() {}

  static ReportIssuer issuer(AppServices services) {
    return new ReportIssuer() {
      @Override
      public String issueReport(long inspectionId, Path out, java.util.function.Consumer<Progress> progress) {
        try {
          Files.writeString(out, "inspection " + inspectionId);
        } catch (java.io.IOException e) {
          throw new java.io.UncheckedIOException(e);
        }
        return "report written to " + out;
      }

      @Override
      public String issueRepairOrder(long inspectionId, Path out, java.util.function.Consumer<Progress> progress) {
        return issueReport(inspectionId, out, progress);
      }
    };
  }
}
