package org.bracewalk.core.port.report;

import java.util.List;
import java.util.Objects;

/**
 * Everything an inspection report shows. Findings and actions come in the order they are listed;
 * planes in the order they are drawn.
 */
public record ReportContent(
    ReportHeader header,
    ReportParticulars particulars,
    List<PlaneSection> planes,
    List<Finding> findings,
    List<RepairStep> actions,
    RecordFingerprint fingerprint) {
  public ReportContent {
    Objects.requireNonNull(header, "header");
    Objects.requireNonNull(particulars, "particulars");
    Objects.requireNonNull(fingerprint, "fingerprint");
    planes = List.copyOf(planes);
    findings = List.copyOf(findings);
    actions = List.copyOf(actions);
  }

  /** The stamp the rendered file carries. */
  public DocumentStamp stamp() {
    return new DocumentStamp(DocumentStamp.REPORT, header.inspectionId(), fingerprint);
  }
}
