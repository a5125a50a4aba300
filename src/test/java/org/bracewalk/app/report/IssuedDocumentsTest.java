package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.port.StoreException;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Issuing registers exact bytes; verification trusts only what this database issued. */
class IssuedDocumentsTest {
  @TempDir Path dir;
  private Path file;
  private AppServices services;
  private ReportService reports;
  private Inspection impact;
  private Inspection routine;

  @BeforeEach
  void open() {
    file = dir.resolve("demo.db");
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(file), clock, PlaneAnalyzer.standard());
    reports = new ReportService(services, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
    ImportedSite demo = services.demo().load();
    impact = demo.inspections().stream().filter(i -> i.reason() == InspectionReason.AFTER_IMPACT)
        .findFirst().orElseThrow();
    routine = demo.inspections().stream().filter(i -> i.reason() == InspectionReason.ROUTINE)
        .findFirst().orElseThrow();
  }

  @AfterEach
  void close() {
    services.close();
  }

  private void sql(String... statements) throws Exception {
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      for (String s : statements) {
        st.executeUpdate(s);
      }
    }
  }

  @Test
  void theRegisterHoldsTheExactBytesWrittenAndTheRecordsTheyCameFrom() throws Exception {
    Path out = dir.resolve("reports/impact.pdf");
    IssuedReport row = reports.issueReport(reports.reportContent(impact.id()), out);
    byte[] written = Files.readAllBytes(out);
    assertThat(row.fingerprint()).isEqualTo(RecordFingerprinter.sha256(written));
    assertThat(row.recordsFingerprint()).isEqualTo(reports.fingerprint(impact.id()).sha256());
    assertThat(row.kind()).isEqualTo(IssuedReport.Kind.INSPECTION_REPORT);
    assertThat(row.fileName()).isEqualTo("impact.pdf");
    assertThat(services.store().issuedReports().withBytes(row.fingerprint())).containsExactly(row);
    try (var files = Files.list(out.getParent())) {
      assertThat(files.map(p -> p.getFileName().toString()).toList()).containsExactly("impact.pdf");
    }
  }

  @Test
  void whenTheRegisterRefusesNothingIsWrittenAndAnEarlierFileStays() throws Exception {
    Path out = dir.resolve("impact.pdf");
    Files.writeString(out, "the earlier copy");
    sql("CREATE TRIGGER test_register_full BEFORE INSERT ON issued_reports"
        + " BEGIN SELECT RAISE(ABORT, 'disk full (simulated)'); END");
    assertThatThrownBy(() -> reports.issueReport(reports.reportContent(impact.id()), out))
        .isInstanceOf(StoreException.class).hasMessageContaining("disk full (simulated)");
    assertThat(Files.readString(out)).isEqualTo("the earlier copy");
    Path order = dir.resolve("order.pdf");
    Path csv = dir.resolve("order.csv");
    assertThatThrownBy(() -> reports.issueRepairOrder(reports.repairOrderContent(impact.id()),
        order, csv)).isInstanceOf(StoreException.class);
    assertThat(order).doesNotExist();
    assertThat(csv).doesNotExist();
    try (var files = Files.list(dir)) {
      assertThat(files.map(p -> p.getFileName().toString()))
          .noneMatch(n -> n.endsWith(".part"));
    }
  }

  @Test
  void aCopyRegisteredOnlyByASiteFileImportVouchesForNothing() throws Exception {
    // a site file can carry any SHA-256 as an "issued report": an edited copy's, say
    byte[] neverIssued = reports.reportPdf(impact.id());
    services.store().issuedReports().add(new IssuedReport(0, impact.id(), "impact.pdf",
        RecordFingerprinter.sha256(neverIssued), Instant.parse("2025-03-06T10:00:00Z")));
    Verification v = reports.verify(neverIssued);
    assertThat(v.outcome()).isEqualTo(Verification.Outcome.DIFFERS);
    assertThat(v.differences()).anySatisfy(d -> assertThat(d)
        .startsWith("these bytes are registered only through a site-file import (as impact.pdf"));
  }

  @Test
  void aCopyRegisteredBeforeTheRegisterKeptFingerprintsIsCheckedByItsOwnStamp() throws Exception {
    byte[] pdf = reports.reportPdf(impact.id());
    String hash = RecordFingerprinter.sha256(pdf);
    // a row as V1 kept it: the file's bytes only (the trigger refusing such rows comes with V5)
    sql("DROP TRIGGER issued_reports_none_before_the_register",
        "INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at) VALUES ("
            + impact.id() + ", 'impact.pdf', '" + hash + "', '2025-03-06T09:30:00.000Z')");
    Verification v = reports.verify(pdf);
    assertThat(v.outcome()).as("%s", v.differences()).isEqualTo(Verification.Outcome.MATCH);
    assertThat(v.notes()).singleElement().asString()
        .startsWith("registered before the register kept record fingerprints");

    // the same bytes rule on a row of another inspection: the stamp does not name it
    byte[] other = reports.reportPdf(impact.id());
    String otherHash = RecordFingerprinter.sha256(other);
    sql("INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at) VALUES ("
        + routine.id() + ", 'routine.pdf', '" + otherHash + "', '2025-03-06T09:40:00.000Z')");
    assertThat(reports.verify(other).differences()).contains("stamp names inspection "
        + impact.id() + " but this document was issued for inspection " + routine.id());

    RepairOrder order = services.store().repairs().ordersOf(impact.id()).get(0);
    RepairAction first = services.store().repairs().actionsOf(order.id()).get(0);
    services.store().repairs().markDone(first.id(), Instant.parse("2025-03-07T10:00:00Z"), "crew");
    assertThat(reports.verify(pdf).differences())
        .containsExactly("records changed since issue: the repair orders and their actions");
  }

  @Test
  void anIssuedCsvVerifiesByItsBytesUntilTheRecordsChange() throws Exception {
    Path pdf = dir.resolve("order.pdf");
    Path csv = dir.resolve("order.csv");
    RepairOrderContent content = reports.repairOrderContent(impact.id());
    List<IssuedReport> rows = reports.issueRepairOrder(content, pdf, csv);
    assertThat(rows).extracting(IssuedReport::kind).containsExactly(
        IssuedReport.Kind.REPAIR_ORDER, IssuedReport.Kind.REPAIR_ORDER_CSV);
    byte[] csvBytes = Files.readAllBytes(csv);
    assertThat(rows.get(1).fingerprint()).isEqualTo(RecordFingerprinter.sha256(csvBytes));
    Verification v = reports.verify(csvBytes);
    assertThat(v.outcome()).isEqualTo(Verification.Outcome.MATCH);
    assertThat(v.kind()).isEqualTo("repair-order-csv");

    // a CSV not issued (one byte different) is no document of ours
    byte[] edited = new String(csvBytes, StandardCharsets.UTF_8).replace("frame 2", "frame 3")
        .getBytes(StandardCharsets.UTF_8);
    assertThat(edited).isNotEqualTo(csvBytes);
    assertThat(reports.verify(edited).outcome()).isEqualTo(Verification.Outcome.NOT_OURS);

    RepairOrder order = services.store().repairs().ordersOf(impact.id()).get(0);
    RepairAction first = services.store().repairs().actionsOf(order.id()).get(0);
    services.store().repairs().markDone(first.id(), Instant.parse("2025-03-07T10:00:00Z"), "crew");
    Verification later = reports.verify(csvBytes);
    assertThat(later.outcome()).isEqualTo(Verification.Outcome.DIFFERS);
    assertThat(later.differences()).singleElement().asString()
        .startsWith("records changed since issue: the records of inspection " + impact.id());
    assertThat(reports.verify(Files.readAllBytes(pdf)).differences())
        .containsExactly("records changed since issue: the repair orders and their actions");
  }
}
