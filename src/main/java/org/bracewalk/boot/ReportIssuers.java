package org.bracewalk.boot;

import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.ui.findings.ReportIssuer;

/** Builds the app's report issuer over the report service. */
final class ReportIssuers {
  private ReportIssuers() {}

  static ReportIssuer over(AppContext context, AppServices services, Map<String, String> env) {
    return new ReportIssuer() {
      @Override
      public String issueReport(long inspectionId, java.nio.file.Path out, java.util.function.Consumer<Progress> progress) {
        throw new IllegalStateException("the report service is not part of this build yet");
      }

      @Override
      public String issueRepairOrder(long inspectionId, java.nio.file.Path out, java.util.function.Consumer<Progress> progress) {
        throw new IllegalStateException("the report service is not part of this build yet");
      }
    };
  }
}
