package org.bracewalk.ui.findings;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.app.report.Verification;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The app issues through the same use case as the command line: every file is registered. */
class ServiceReportIssuerTest {
  @TempDir Path dir;

  @Test
  void theAppsReportRepairOrderAndCsvAreRegisteredAndVerify() throws Exception {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    try (AppServices services = AppServices.over(Database.open(dir.resolve("d.db")), clock,
        PlaneAnalyzer.standard())) {
      Inspection impact = services.demo().load().inspections().stream()
          .filter(i -> i.reason() == InspectionReason.AFTER_IMPACT).findFirst().orElseThrow();
      ReportService reports = new ReportService(services, PlaneAnalyzer.standard(),
          new PdfReportRenderer(TemplateSource.packed(), "en"),
          new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
          clock);
      ServiceReportIssuer issuer = new ServiceReportIssuer(reports, services.outputs());
      List<ReportIssuer.Progress> progress = new ArrayList<>();
      issuer.issueReport(impact.id(), dir.resolve("impact.pdf"), progress::add);
      issuer.issueRepairOrder(impact.id(), dir.resolve("order.pdf"), progress::add);
      assertThat(services.store().issuedReports().ofInspection(impact.id()))
          .extracting(IssuedReport::kind, IssuedReport::fileName)
          .containsExactly(
              org.assertj.core.groups.Tuple.tuple(IssuedReport.Kind.INSPECTION_REPORT, "impact.pdf"),
              org.assertj.core.groups.Tuple.tuple(IssuedReport.Kind.REPAIR_ORDER, "order.pdf"),
              org.assertj.core.groups.Tuple.tuple(IssuedReport.Kind.REPAIR_ORDER_CSV, "order.csv"));
      for (String name : List.of("impact.pdf", "order.pdf", "order.csv")) {
        Verification v = reports.verify(Files.readAllBytes(dir.resolve(name)));
        assertThat(v.outcome()).as(name + ": " + v.differences())
            .isEqualTo(Verification.Outcome.MATCH);
      }
    }
  }
}
