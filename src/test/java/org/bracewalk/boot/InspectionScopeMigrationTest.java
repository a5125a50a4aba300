package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import org.bracewalk.store.OlderFiles;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.report.RecordFingerprinter;
import org.bracewalk.app.report.ReportService;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.report.PdfDocumentStampReader;
import org.bracewalk.report.PdfRepairOrderRenderer;
import org.bracewalk.report.PdfReportRenderer;
import org.bracewalk.report.TemplateSource;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Migration V7 gives the inspections of a file made before it the scope they had: the planes that
 * existed at their start (and those they hold observations of, and those their issued documents
 * were made from), and the design revision their documents were issued under, so every record
 * fingerprint stays as it was.
 */
class InspectionScopeMigrationTest {
  @TempDir Path dir;

  private static final String[] AT_ISSUE = {
    "INSERT INTO sites (id, name, time_zone, display_units) VALUES (1, 'Depot', 'UTC', 'metric')",
    "INSERT INTO structures (id, site_id, name, kind, inspection_interval_days)"
        + " VALUES (1, 1, 'Run A', 'racking-run', 7)",
    // spine (1) and north (3) from the start; east (4) created after inspection 1 finished, before
    // its report was issued: that report was made with east in it
    plane(1, "spine", "2025-01-01T00:00:00.000Z"),
    plane(3, "north", "2025-01-01T00:00:00.000Z"),
    "INSERT INTO inspections (id, structure_id, started_at, inspector_name, reason)"
        + " VALUES (1, 1, '2025-02-01T08:00:00.000Z', 'M. Okafor', 'routine')",
    "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, recorded_at)"
        + " VALUES (1, 1, 1, 1, 1, 'missing', '2025-02-01T08:10:00.000Z')",
    "UPDATE inspections SET status = 'finalised', finished_at = '2025-02-01T09:00:00.000Z',"
        + " inspection_interval_days = 7 WHERE id = 1",
    plane(4, "east", "2025-02-02T00:00:00.000Z"),
    "INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at, kind,"
        + " records_fingerprint, origin) VALUES (1, 'i1.pdf', '" + "a".repeat(64) + "',"
        + " '2025-02-03T00:00:00.000Z', 'inspection-report', '" + "b".repeat(64) + "', 'issued')",
  };

  private static final String[] AFTER = {
    // spine revised after inspection 1; north retired; west (2) created after the report; an
    // inspection started between, still open, with a mark on west
    revision(5, 1, 2, "2025-02-05T00:00:00.000Z"),
    "INSERT INTO plane_retirements (plane_id, retired_at, reason)"
        + " VALUES (3, '2025-02-07T00:00:00.000Z', 'dismantled')",
    "INSERT INTO inspections (id, structure_id, started_at, inspector_name, reason)"
        + " VALUES (2, 1, '2025-02-08T08:00:00.000Z', 'M. Okafor', 'routine')",
    plane(2, "west", "2025-02-10T00:00:00.000Z"),
    "INSERT INTO observations (id, inspection_id, plane_id, lift, bay, state, recorded_at)"
        + " VALUES (2, 2, 2, 1, 1, 'sound', '2025-02-10T08:00:00.000Z')",
  };

  /** A plane of 1 lift x 2 bays, braced in bay 1, its revision 1 (id = plane id) recorded at. */
  private static String plane(long id, String name, String at) {
    return "INSERT INTO planes (id, structure_id, name, lifts, bays, support) VALUES (" + id
        + ", 1, '" + name + "', 1, 2, 'pinned-base');"
        + "INSERT INTO plane_bay_widths VALUES (" + id + ", 1, 2000), (" + id + ", 2, 2000);"
        + "INSERT INTO plane_lift_heights VALUES (" + id + ", 1, 1500);"
        + revision(id, id, 1, at);
  }

  private static String revision(long id, long planeId, int number, String at) {
    return "INSERT INTO design_revisions (id, plane_id, number, design_date, recorded_at,"
        + " panel_count) VALUES (" + id + ", " + planeId + ", " + number + ", '2025-01-01', '"
        + at + "', 1);"
        + "INSERT INTO design_panels (revision_id, lift, bay, diagonal, member_kind, opening)"
        + " VALUES (" + id + ", 1, " + number + ", '/', 'rigid', 0)";
  }

  /** A file at migration V6 holding the statements' records. */
  private Path v6File(String name, String[]... parts) throws Exception {
    Path file = dir.resolve(name);
    OlderFiles.migratedTo(file, "6");
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      for (String[] part : parts) {
        for (String statements : part) {
          for (String s : statements.split(";")) {
            st.executeUpdate(s);
          }
        }
      }
    }
    return file;
  }

  private static AppServices open(Path file) {
    return AppServices.over(Database.open(file),
        Clock.fixed(Instant.parse("2025-03-01T00:00:00Z"), ZoneOffset.UTC),
        PlaneAnalyzer.standard());
  }

  /**
   * The first canonical form's fingerprint (local ids): the two files compared here are made
   * apart, so V12 gave their records different global identities, which the second form names.
   */
  private static String fingerprint(AppServices s, long inspection) {
    return RecordFingerprinter.fingerprint(new ReportService(s, PlaneAnalyzer.standard(),
        new PdfReportRenderer(TemplateSource.packed(), "en"),
        new PdfRepairOrderRenderer(TemplateSource.packed(), "en"), new PdfDocumentStampReader(),
        Clock.systemUTC()).records(inspection), RecordFingerprinter.SCHEME_1).sha256();
  }

  private static List<String> names(List<PlaneRecord> planes) {
    return planes.stream().map(PlaneRecord::name).toList();
  }

  @Test
  void aV6FileGetsTheScopeItsInspectionsHadAndItsFingerprintsStay() throws Exception {
    // the records as they were when inspection 1's report was issued: every plane then existing
    // and revision 1 each (so the rule before V7 and the scope give the same records)
    String atIssue;
    try (AppServices s = open(v6File("at-issue.db", AT_ISSUE))) {
      assertThat(names(s.inspections().planesOf(1))).containsExactly("spine", "north", "east");
      atIssue = fingerprint(s, 1);
    }
    try (AppServices s = open(v6File("later.db", AT_ISSUE, AFTER))) {
      // finalised: the planes it was issued with, revision as at its finish
      assertThat(names(s.inspections().planesOf(1))).containsExactly("spine", "north", "east");
      assertThat(s.store().planes().scopeOf(1)).isEqualTo(Map.of(1L, 1L, 3L, 3L, 4L, 4L));
      assertThat(s.inspections().designInForce(1, 1).number()).isEqualTo(1);
      assertThat(fingerprint(s, 1)).isEqualTo(atIssue);
      // open: the planes of its start (north retired before, west created after but marked),
      // each with its latest revision
      assertThat(names(s.inspections().planesOf(2))).containsExactly("spine", "west", "east");
      assertThat(s.store().planes().scopeOf(2)).isEqualTo(Map.of(1L, 5L, 2L, 2L, 4L, 4L));
      // west did not exist when inspection 1 was made: its history starts with inspection 2
      assertThat(s.history().history(2).entries()).extracting(e -> e.inspection().id())
          .containsExactly(2L);
    }
  }

  @Test
  void aFinalisedInspectionWithNoDocumentCoversThePlanesOfItsStartOnly() throws Exception {
    String[] noIssue = java.util.Arrays.copyOf(AT_ISSUE, AT_ISSUE.length - 1);
    try (AppServices s = open(v6File("no-issue.db", noIssue))) {
      assertThat(names(s.inspections().planesOf(1))).containsExactly("spine", "north");
    }
  }

  @Test
  void theScopeIsNeverAlteredBehindTheProgram() throws Exception {
    Path file = v6File("later.db", AT_ISSUE, AFTER);
    try (AppServices s = open(file)) {
      assertThat(s.store().planes().scopeOf(2)).hasSize(3);
    }
    try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
        Statement st = c.createStatement()) {
      String fixed = "the scope of an inspection cannot be changed";
      assertThatThrownBy(() -> st.executeUpdate(
          "UPDATE inspection_scope SET design_revision_id = 5 WHERE inspection_id = 1"))
          .hasMessageContaining(fixed);
      assertThatThrownBy(() -> st.executeUpdate(
          "DELETE FROM inspection_scope WHERE inspection_id = 1 AND plane_id = 4"))
          .hasMessageContaining(fixed);
      // a replace would delete the row it collides with without a delete trigger firing
      assertThatThrownBy(() -> st.executeUpdate("INSERT OR REPLACE INTO inspection_scope"
          + " (inspection_id, plane_id, design_revision_id) VALUES (1, 1, 5)"))
          .hasMessageContaining("the scope of an inspection");
      // a plane added to a finalised inspection, or to an open one that has observations
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO inspection_scope"
          + " (inspection_id, plane_id, design_revision_id) VALUES (1, 2, 2)"))
          .hasMessageContaining("fixed when it starts");
      st.executeUpdate("INSERT INTO plane_retirements (plane_id, retired_at, reason)"
          + " VALUES (4, '2025-02-20T00:00:00.000Z', 'gone')");
      st.executeUpdate("INSERT INTO inspections (id, structure_id, started_at, inspector_name,"
          + " reason) VALUES (3, 1, '2025-02-21T08:00:00.000Z', 'M. Okafor', 'routine')");
      // a revision of another plane, or a plane of another structure
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO inspection_scope"
          + " (inspection_id, plane_id, design_revision_id) VALUES (3, 1, 2)"))
          .hasMessageContaining("each with a design revision of that plane");
      // an observation of a plane outside the scope (inspection 3 has none yet)
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO observations (inspection_id,"
          + " plane_id, lift, bay, state, recorded_at) VALUES (3, 1, 1, 1, 'sound',"
          + " '2025-02-21T09:00:00.000Z')"))
          .hasMessageContaining("not in the scope of the inspection");
      st.executeUpdate("INSERT INTO inspection_scope (inspection_id, plane_id,"
          + " design_revision_id) VALUES (3, 1, 5)");
      // while it is being started, a row once written is not replaced
      assertThatThrownBy(() -> st.executeUpdate("REPLACE INTO inspection_scope"
          + " (inspection_id, plane_id, design_revision_id) VALUES (3, 1, 1)"))
          .hasMessageContaining("records are never overwritten");
      st.executeUpdate("INSERT INTO observations (inspection_id, plane_id, lift, bay, state,"
          + " recorded_at) VALUES (3, 1, 1, 1, 'sound', '2025-02-21T09:00:00.000Z')");
      assertThatThrownBy(() -> st.executeUpdate("INSERT INTO inspection_scope"
          + " (inspection_id, plane_id, design_revision_id) VALUES (3, 2, 2)"))
          .hasMessageContaining("fixed when it starts");
    }
    try (AppServices s = open(file)) {
      assertThat(s.store().planes().scopeOf(1)).isEqualTo(Map.of(1L, 1L, 3L, 3L, 4L, 4L));
      assertThat(s.store().planes().scopeOf(3)).isEqualTo(Map.of(1L, 5L));
    }
  }
}
