package org.bracewalk.store;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.port.IssuedReportRepository;

/** Issued report files (name, SHA-256, time) in {@code issued_reports}. */
final class JdbcIssuedReportRepository implements IssuedReportRepository {
  private static final String INSERT =
      """
      INSERT INTO issued_reports (inspection_id, file_name, fingerprint, issued_at)
      VALUES (?, ?, ?, ?)
      """;
  private static final String SELECT =
      """
      SELECT id, inspection_id, file_name, fingerprint, issued_at
      FROM issued_reports WHERE inspection_id = ? ORDER BY issued_at, id
      """;

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
            s.setString(2, report.fileName());
            s.setString(3, report.fingerprint());
            s.setString(4, Columns.text(report.issuedAt()));
            s.executeUpdate();
            long id = db.lastInsertId();
            return ofInspection(report.inspectionId()).stream()
                .filter(r -> r.id() == id)
                .findFirst()
                .orElseThrow();
          }
        });
  }

  @Override
  public List<IssuedReport> ofInspection(long inspectionId) {
    return db.call(
        c -> {
          try (PreparedStatement s = c.prepareStatement(SELECT)) {
            s.setLong(1, inspectionId);
            try (ResultSet r = s.executeQuery()) {
              List<IssuedReport> out = new ArrayList<>();
              while (r.next()) {
                out.add(
                    new IssuedReport(
                        r.getLong("id"),
                        r.getLong("inspection_id"),
                        r.getString("file_name"),
                        r.getString("fingerprint"),
                        Columns.instant(r, "issued_at")));
              }
              return out;
            }
          }
        });
  }
}
