package org.bracewalk.core.port;

import java.util.List;
import org.bracewalk.core.model.IssuedReport;

/** The report files issued for inspections (name, SHA-256, time). */
public interface IssuedReportRepository {
  IssuedReport add(IssuedReport report);

  /** The reports issued for one inspection, oldest first. */
  List<IssuedReport> ofInspection(long inspectionId);
}
