package org.bracewalk.boot;

import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.ui.findings.ReportIssuer;
import org.bracewalk.ui.findings.ServiceReportIssuer;

/** Builds the app's report issuer over the report service, with the templates the environment names. */
final class ReportIssuers {
  private ReportIssuers() {}

  static ReportIssuer over(AppContext context, AppServices services, Map<String, String> env) {
    var factory = context.reportFactory(env);
    return new ServiceReportIssuer(factory.over(services),
        services.outputs().withInputs(factory.inputFiles()));
  }
}
