package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.port.GlobalIdentities;
import org.bracewalk.core.port.IssuedReportRepository;

/**
 * The register of issued documents in {@code issued_reports} (V1, extended by V5): append-only,
 * which the V5 triggers hold for any program that writes to the file.
 */
final class JdbcIssuedReportRepository implements IssuedReportRepository {
  private static final String INSERT =
      """
      INSERT INTO issued_reports (inspection_id, kind, file_name, fingerprint, records_fingerprint,
        origin, issued_at, uuid)
      VALUES (?, ?, ?, ?, ?, ?, ?, ?)
      """;
  private static final String COLUMNS =
      """
      SELECT id, inspection_id, kind, file_name, fingerprint, records_fingerprint, origin, issued_at
      FROM issued_reports
      """;
  private static final String OF_INSPECTION =
      COLUMNS + " WHERE inspection_id = ? ORDER BY issued_at, id";
  private static final String WITH_BYTES = COLUMNS + " WHERE fingerprint = ? ORDER BY issued_at, id";
  private static final String BY_ID = COLUMNS + " WHERE id = ?";

  private final Database db;

  JdbcIssuedReportRepository(Database db) {
    this.db = db;
  }

  @Override
  public IssuedReport add(IssuedReport report) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(INSERT, Statement.RETURN_GENERATED_KEYS)) {
            s.setLong(1, report.inspectionId());
            s.setString(2, report.kind().label());
            s.setString(3, report.fileName());
            s.setString(4, report.fingerprint());
            s.setString(5, report.recordsFingerprint());
            s.setString(6, report.origin().label());
            s.setString(7, Columns.text(report.issuedAt()));
            s.setString(8, db.newUuid(GlobalIdentities.Kind.ISSUED_REPORT));
            s.executeUpdate();
            long id = db.lastInsertId();
            List<IssuedReport> back = query(c, BY_ID, id);
            return back.get(0);
          }
        });
  }

  @Override
  public List<IssuedReport> ofInspection(long inspectionId) {
    return db.call(c -> query(c, OF_INSPECTION, inspectionId));
  }

  @Override
  public List<IssuedReport> withBytes(String sha256) {
    return db.call(c -> query(c, WITH_BYTES, sha256));
  }

  private static List<IssuedReport> query(java.sql.Connection c, String sql, Object key)
      throws java.sql.SQLException {
    try (PreparedStatement s = c.prepareStatement(sql)) {
      s.setObject(1, key);
      try (ResultSet r = s.executeQuery()) {
        List<IssuedReport> out = new ArrayList<>();
        while (r.next()) {
          out.add(
              new IssuedReport(
                  r.getLong("id"),
                  r.getLong("inspection_id"),
                  IssuedReport.Kind.fromLabel(r.getString("kind")),
                  r.getString("file_name"),
                  r.getString("fingerprint"),
                  r.getString("records_fingerprint"),
                  IssuedReport.Origin.fromLabel(r.getString("origin")),
                  Columns.instant(r, "issued_at")));
        }
        return out;
      }
    }
  }
}
