package org.bracewalk.core.port.report;

import java.util.Objects;

/**
 * What a Bracewalk document carries about itself, machine-readably: which kind it is, which
 * inspection it is about, and the fingerprint of that inspection's records when it was made.
 */
public record DocumentStamp(String kind, String inspectionId, RecordFingerprint fingerprint) {
  /** The kind of an inspection report. */
  public static final String REPORT = "inspection-report";

  /** The kind of a repair order. */
  public static final String REPAIR_ORDER = "repair-order";

  public DocumentStamp {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(inspectionId, "inspectionId");
    Objects.requireNonNull(fingerprint, "fingerprint");
  }
}
