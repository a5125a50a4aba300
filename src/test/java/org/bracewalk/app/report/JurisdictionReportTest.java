package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.time.ZoneId;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.DemoService;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.NewInspection;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A report cites the regulations of its site's jurisdiction only, and asks for the particulars
 * they require. Each report is the demo site (a racking run and a scaffold, both with findings)
 * imported under one jurisdiction and read back with PDFBox.
 *
 * <p>Outside references (shared/design/trade-facts.md): UK, Work at Height Regulations 2005,
 * Schedule 7 (report contents) and reg. 12 (read); US, 29 CFR 1926.451(f)(3) and (f)(4) (read);
 * racking, HSE HSG76 paras 643-646 (read) and EN 15635 (secondary). That EN 15635 also asks for a
 * person responsible for storage equipment safety is from memory.
 */
class JurisdictionReportTest {
  private static final String WAHR = "Work at Height Regulations";
  private static final String CFR = "1926.451";
  private static final String HSG76 = "HSG76";
  private static final String EN15635 = "EN 15635";
  /** The sentence that names EN 15635 as the program's bow limits where it is not cited. */
  private static final String NOT_CITED = "These are the limits of the European racking standard"
      + " EN 15635 (as reproduced in DGUV Information 208-043), which Bracewalk applies wherever"
      + " the racking stands; they are not cited here as this site's rules";

  @TempDir Path dir;
  private AppServices services;
  private ReportService reports;
  private ImportedSite demo;

  @AfterEach
  void close() {
    if (services != null) {
      services.close();
    }
  }

  /** The demo site under {@code jurisdiction} ({@code null}: the field left out of the file). */
  private void load(String jurisdiction) {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(dir.resolve("j.db")), clock, PlaneAnalyzer.standard());
    reports = new ReportService(services, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        clock);
    String text = DemoService.siteFileText();
    assertThat(text).contains("\"jurisdiction\": \"uk\"");
    text = jurisdiction == null ? text.replace(",\n    \"jurisdiction\": \"uk\"", "")
        : text.replace("\"jurisdiction\": \"uk\"", "\"jurisdiction\": \"" + jurisdiction + "\"");
    demo = services.files().importSite("demo.site.json", text);
  }

  private Structure structure(StructureKind kind) {
    return demo.structures().stream().filter(s -> s.kind() == kind).findFirst().orElseThrow();
  }

  /** The report of the structure's finalised inspection with findings, as one line of text. */
  private String report(StructureKind kind) throws IOException {
    long structure = structure(kind).id();
    Inspection i = demo.inspections().stream()
        .filter(x -> x.structureId() == structure && x.isFinalised())
        .filter(x -> kind != StructureKind.RACKING_RUN || x.reason() == InspectionReason.ROUTINE)
        .findFirst().orElseThrow();
    return String.join(" ", ReportServiceTest.pages(reports.reportPdf(i.id())));
  }

  @Test
  void theDemoSiteStandsUnderUkRules() {
    load("uk");
    assertThat(demo.site().jurisdiction()).isEqualTo(Jurisdiction.UK);
  }

  @Test
  void aUkScaffoldReportCitesTheWorkAtHeightRegulationsOnly() throws IOException {
    load("uk");
    String scaffold = report(StructureKind.SCAFFOLD);
    assertThat(scaffold).contains(WAHR + " 2005, Schedule 7").contains("regulation 12")
        .contains("Jurisdiction (whose rules apply) United Kingdom")
        .doesNotContain(CFR).doesNotContain(HSG76).doesNotContain(EN15635);
  }

  @Test
  void aUkRackingReportCitesHsg76AndEn15635Only() throws IOException {
    load("uk");
    String racking = report(StructureKind.RACKING_RUN);
    assertThat(racking).contains("(HSE HSG76; EN 15635)")
        // the demo's 7.5 mm bow: the limits' source is cited as the site's own
        .contains("(EN 15635, as reproduced in DGUV Information 208-043)")
        .doesNotContain(WAHR).doesNotContain(CFR).doesNotContain(NOT_CITED);
  }

  @Test
  void aUsScaffoldReportCites29Cfr1926Only() throws IOException {
    load("us");
    String scaffold = report(StructureKind.SCAFFOLD);
    assertThat(scaffold).contains("(29 CFR 1926.451(f)(3))").contains("(29 CFR 1926.451(f)(4))")
        .contains("Competent person Maren Tolley").contains("Shift Day shift, 07:00-15:00")
        .doesNotContain(WAHR).doesNotContain("Schedule 7").doesNotContain(HSG76)
        .doesNotContain(EN15635);
  }

  @Test
  void aUsRackingReportCitesNoRegulationAndNamesItsBowLimitsAsNotTheSitesRules()
      throws IOException {
    load("us");
    String racking = report(StructureKind.RACKING_RUN);
    assertThat(racking).contains("Bracewalk holds no regulation of the United States for the"
        + " inspection report of a storage racking, so this report cites none")
        .contains(NOT_CITED);
    assertThat(racking.replace(NOT_CITED, "")).doesNotContain(EN15635).doesNotContain(WAHR)
        .doesNotContain(CFR).doesNotContain(HSG76);
  }

  @Test
  void anEuReportCitesEn15635ForRackingAndNothingForAScaffold() throws IOException {
    load("eu");
    String racking = report(StructureKind.RACKING_RUN);
    assertThat(racking).contains("an expert inspection at least every 12 months (EN 15635)")
        .doesNotContain(HSG76).doesNotContain(WAHR).doesNotContain(CFR).doesNotContain(NOT_CITED);
    String scaffold = report(StructureKind.SCAFFOLD);
    assertThat(scaffold).contains("Bracewalk holds no regulation of the European Union")
        .doesNotContain(EN15635).doesNotContain(HSG76).doesNotContain(WAHR).doesNotContain(CFR);
  }

  @Test
  void aSiteWithNoJurisdictionCitesNoneSaysSoAndReadsAsOther() throws IOException {
    load(null);
    assertThat(demo.site().jurisdiction()).isEqualTo(Jurisdiction.OTHER);
    for (StructureKind k : List.of(StructureKind.SCAFFOLD, StructureKind.RACKING_RUN)) {
      String text = report(k);
      assertThat(text).contains("The site records no jurisdiction, so this report cites no"
          + " regulation").contains("Jurisdiction (whose rules apply) not recorded");
      assertThat(text.replace(NOT_CITED, "")).doesNotContain(WAHR).doesNotContain(CFR)
          .doesNotContain(HSG76).doesNotContain(EN15635);
    }
  }

  /**
   * What each source is recognised by in a document's text. A report or repair order may show
   * only the sources of its own site's jurisdiction and structure (the table below, restated
   * from trade-facts.md, not read from SiteRules); EN 12811 / EN 12810 are cited for no site.
   */
  private static final Map<String, List<String>> MARKERS = Map.of(
      // Work at Height Regulations 2005, reg. 12 and Schedule 7 (read)
      "WAHR", List.of("Work at Height", "WAHR", "Schedule 7", "Sch. 7", "regulation 12",
          "reg. 12"),
      // 29 CFR 1926.451 (read); 1926.452 also named in trade-facts.md
      "CFR", List.of("29 CFR", "1926.45", "OSHA"),
      // HSE HSG76 paras 643-646 (read)
      "HSG76", List.of("HSG76", "HSE "),
      // EN 15635 (secondary)
      "EN15635", List.of("EN 15635"),
      // EN 12811-1, EN 12810-1 (secondary): the project cites them for no site
      "EN1281x", List.of("EN 12811", "EN 12810"));

  /** The sources a site's documents may show, by jurisdiction and structure (trade-facts.md). */
  private static Set<String> allowed(String jurisdiction, StructureKind kind) {
    boolean scaffold = kind == StructureKind.SCAFFOLD;
    return switch (jurisdiction) {
      case "uk" -> scaffold ? Set.of("WAHR") : Set.of("HSG76", "EN15635");
      case "us" -> scaffold ? Set.of("CFR") : Set.of();
      case "eu" -> scaffold ? Set.of() : Set.of("EN15635");
      default -> Set.of();
    };
  }

  @Test
  void noReportOrRepairOrderCitesTheRulesOfAnotherJurisdiction() throws IOException {
    for (String j : List.of("uk", "us", "eu", "other")) {
      if (services != null) {
        services.close();
        services = null;
        for (String f : List.of("j.db", "j.db-wal", "j.db-shm")) {
          dir.resolve(f).toFile().delete();
        }
      }
      load(j);
      int documents = 0;
      for (Inspection i : demo.inspections()) {
        if (!i.isFinalised()) {
          continue;
        }
        StructureKind kind = demo.structures().stream().filter(s -> s.id() == i.structureId())
            .findFirst().orElseThrow().kind();
        Set<String> own = allowed(j, kind);
        String report = String.join(" ", ReportServiceTest.pages(reports.reportPdf(i.id())));
        String order = String.join(" ", ReportServiceTest.pages(
            reports.repairOrderPdf(reports.repairOrderContent(i.id()))));
        for (String[] doc : new String[][] {{"report", report}, {"repair order", order}}) {
          // the one sentence that names EN 15635 as Bracewalk's own bow limits, saying that it
          // is not cited as the site's rules (racking outside the EN 15635 jurisdictions)
          String text = own.contains("EN15635") ? doc[1] : doc[1].replace(NOT_CITED, "");
          for (Map.Entry<String, List<String>> m : MARKERS.entrySet()) {
            if (own.contains(m.getKey())) {
              continue;
            }
            for (String marker : m.getValue()) {
              assertThat(text).as("%s of inspection %d (%s, %s) names %s", doc[0], i.id(), j,
                  kind.label(), m.getKey()).doesNotContain(marker);
            }
          }
          documents++;
        }
        // and each report cites its own, where it has any
        for (String source : own) {
          assertThat(MARKERS.get(source).stream().anyMatch(report::contains))
              .as("report of inspection %d (%s) cites %s", i.id(), j, source).isTrue();
        }
      }
      assertThat(documents).as("documents read for %s", j).isEqualTo(6);
    }
  }

  @Test
  void theRequiredParticularsFollowTheJurisdiction() throws IOException {
    NewInspection noShift = new NewInspection("Ana Reyes", "Scaffold inspector", "", "", "",
        InspectionReason.ROUTINE, null, null);
    // US scaffold: 1926.451(f)(3) asks for the competent person and the shift
    load("us");
    Inspection us = services.inspections().start(structure(StructureKind.SCAFFOLD).id(), noShift);
    assertThatThrownBy(() -> reports.reportPdf(us.id()))
        .isInstanceOf(MissingParticularsException.class)
        .hasMessageContaining("the rules of its site's jurisdiction (United States) ask for")
        .hasMessageEndingWith("empty: competent-person, shift. Record them on the inspection (a"
            + " finalised inspection cannot be changed: start a new one with them given).");
    services.close();
    services = null;

    // UK scaffold: Sch. 7 asks for neither; the same inspection gives a (draft) report
    dir.resolve("j.db").toFile().delete();
    for (String f : List.of("j.db-wal", "j.db-shm")) {
      dir.resolve(f).toFile().delete();
    }
    load("uk");
    Inspection uk = services.inspections().start(structure(StructureKind.SCAFFOLD).id(), noShift);
    // ... and prints no empty row for what Sch. 7 does not ask for
    String draft = String.join(" ", ReportServiceTest.pages(reports.reportPdf(uk.id())));
    assertThat(draft).contains("Report made by (position) Scaffold inspector")
        .doesNotContain("Shift").doesNotContain("Competent person");
    // UK racking: HSG76 asks for the person responsible for storage equipment safety
    Inspection rack = services.inspections().start(structure(StructureKind.RACKING_RUN).id(),
        noShift);
    assertThatThrownBy(() -> reports.reportPdf(rack.id()))
        .isInstanceOf(MissingParticularsException.class)
        .hasMessageContaining("empty: storage-safety-person.");
  }

  @Test
  void aSiteFileWithAnUnknownJurisdictionIsRefusedNamingTheField() {
    var clock = new Fixtures.SteppingClock(Instant.parse("2025-03-06T09:00:00Z"));
    services = AppServices.over(Database.open(dir.resolve("j.db")), clock, PlaneAnalyzer.standard());
    String text = DemoService.siteFileText().replace("\"jurisdiction\": \"uk\"",
        "\"jurisdiction\": \"gb\"");
    assertThatThrownBy(() -> services.files().importSite("gb.site.json", text))
        .hasMessageContaining("gb.site.json, line 11 (at site.jurisdiction), field"
            + " \"jurisdiction\": unknown jurisdiction 'gb': use uk, us, eu or other");
    assertThat(services.sites().sites()).isEmpty();
  }

  @Test
  void theDatabaseHoldsTheJurisdictionAsAnyClientWritesIt() throws SQLException {
    load("eu");
    services.close();
    services = null;
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + dir.resolve("j.db"));
        Statement s = c.createStatement()) {
      try (var r = s.executeQuery("SELECT jurisdiction FROM sites")) {
        assertThat(r.next()).isTrue();
        assertThat(r.getString(1)).isEqualTo("eu");
      }
      // the CHECK of V11, and V3's sites_never_change, which covers the new column too
      assertThatThrownBy(() -> s.executeUpdate("INSERT INTO sites (name, client_name,"
          + " client_address, location, time_zone, display_units, jurisdiction) VALUES"
          + " ('x', '', '', '', 'UTC', 'metric', 'gb')")).hasMessageContaining("CHECK");
      assertThatThrownBy(() -> s.executeUpdate("UPDATE sites SET jurisdiction = 'uk'"))
          .hasMessageContaining("site cannot be changed");
    }
  }

  @Test
  void theFingerprintNamesAJurisdictionOnlyWhenOneIsRecorded() {
    Site before = new Site(4, "Quarry Lane", "Client", "1 Road", "yard", ZoneId.of("UTC"),
        DisplayUnits.METRIC);
    String text = new String(RecordFingerprinter.site(before).bytes(), StandardCharsets.UTF_8);
    // the canonical form of DEVELOPERS.md "Record fingerprint" as it was before jurisdictions
    assertThat(text).isEqualTo("[site]\nid=4\nname=Quarry Lane\nclientName=Client\n"
        + "clientAddress=1 Road\nlocation=yard\ntimeZone=UTC\nunits=metric\n");
    Site us = new Site(4, "Quarry Lane", "Client", "1 Road", "yard", ZoneId.of("UTC"),
        DisplayUnits.METRIC, Jurisdiction.US);
    assertThat(new String(RecordFingerprinter.site(us).bytes(), StandardCharsets.UTF_8))
        .isEqualTo(text + "jurisdiction=us\n");
  }
}
