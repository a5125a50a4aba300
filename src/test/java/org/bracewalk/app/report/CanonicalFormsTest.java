package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * New documents carry the second canonical form ({@code bracewalk-records-2}); a document stamped
 * with the first ({@code bracewalk-records-1}, every document issued before) still verifies, and
 * each form catches a change to the records.
 */
class CanonicalFormsTest {
  @TempDir Path dir;
  private AppServices services;
  private ReportService reports;
  private Inspection impact;

  @BeforeEach
  void open() {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(dir.resolve("demo.db")), clock,
        PlaneAnalyzer.standard());
    reports = new ReportService(services, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
    ImportedSite demo = services.demo().load();
    impact = demo.inspections().stream()
        .filter(i -> i.reason() == InspectionReason.AFTER_IMPACT
            && i.status() == InspectionStatus.FINALISED)
        .findFirst().orElseThrow();
  }

  @AfterEach
  void close() {
    services.close();
  }

  @Test
  void aNewDocumentCarriesTheSecondFormAndVerifies() throws Exception {
    ReportContent content = reports.reportContent(impact.id());
    assertThat(content.fingerprint().scheme()).isEqualTo("bracewalk-records-2");
    assertThat(content.fingerprint().sections()).extracting(s -> s.name())
        .contains("inspection " + services.store().identities()
            .uuidOf(org.bracewalk.core.port.GlobalIdentities.Kind.INSPECTION, impact.id()));
    Path out = dir.resolve("v2.pdf");
    reports.issueReport(content, out);
    Verification v = reports.verify(Files.readAllBytes(out));
    assertThat(v.outcome()).as("%s", v.differences()).isEqualTo(Verification.Outcome.MATCH);
  }

  @Test
  void aDocumentOfTheFirstFormStillVerifiesAndStillCatchesAChange() throws Exception {
    ReportContent now = reports.reportContent(impact.id());
    RecordFingerprint first = RecordFingerprinter.fingerprint(reports.records(impact.id()),
        RecordFingerprinter.SCHEME_1);
    assertThat(first.scheme()).isEqualTo("bracewalk-records-1");
    assertThat(first.sections()).extracting(s -> s.name()).contains("inspection");
    // a document as this program issued them before the second form: stamped with the first
    ReportContent old = new ReportContent(now.header(), now.particulars(), now.planes(),
        now.findings(), now.actions(), first);
    Path out = dir.resolve("v1.pdf");
    reports.issueReport(old, out);
    byte[] pdf = Files.readAllBytes(out);
    Verification v = reports.verify(pdf);
    assertThat(v.outcome()).as("%s", v.differences()).isEqualTo(Verification.Outcome.MATCH);
    assertThat(v.fingerprint()).isEqualTo(first.sha256());

    // a repair action marked done changes the repair orders section, in the first form too
    var order = services.store().repairs().ordersOf(impact.id());
    assertThat(order).as("the demo's after-impact inspection has a repair order").isNotEmpty();
    long action = services.store().repairs().actionsOf(order.get(0).id()).get(0).id();
    services.repairs().markDone(action, "crew A");
    Verification after = reports.verify(pdf);
    assertThat(after.outcome()).isEqualTo(Verification.Outcome.DIFFERS);
    assertThat(after.differences()).anySatisfy(d -> assertThat(d)
        .contains("the repair orders and their actions"));
  }
}
