package org.bracewalk.core.port.report;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * The crew's repair order: the numbered actions in working order, each with the plane it is on
 * (for the locator sketch). {@code planes} holds every plane an action names; {@code inspectedAt}
 * is when the inspection the order follows from was made.
 */
public record RepairOrderContent(
    ReportHeader header,
    Instant inspectedAt,
    List<PlaneSection> planes,
    List<RepairStep> actions,
    RecordFingerprint fingerprint) {
  public RepairOrderContent {
    Objects.requireNonNull(header, "header");
    Objects.requireNonNull(inspectedAt, "inspectedAt");
    Objects.requireNonNull(fingerprint, "fingerprint");
    planes = List.copyOf(planes);
    actions = List.copyOf(actions);
  }

  public DocumentStamp stamp() {
    return new DocumentStamp(DocumentStamp.REPAIR_ORDER, header.inspectionId(), fingerprint);
  }
}
