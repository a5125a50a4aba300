package org.bracewalk.core.port;

import java.util.List;
import org.bracewalk.core.model.IssuedReport;

/**
 * The register of issued documents (kind, file name, SHA-256 of the bytes, records fingerprint,
 * time). Append-only: rows are added, never changed or removed (the database refuses too).
 */
public interface IssuedReportRepository {
  IssuedReport add(IssuedReport report);

  /** The documents issued for one inspection, oldest first. */
  List<IssuedReport> ofInspection(long inspectionId);

  /** The registered documents whose bytes have this SHA-256 (lower-case hex), oldest first. */
  List<IssuedReport> withBytes(String sha256);
}
