package org.bracewalk.core.port.report;

import java.time.Instant;
import java.time.ZoneId;
import java.util.Objects;

/**
 * Who and what a document is about, and how to show it.
 *
 * @param inspectionId the inspection's id as the database knows it
 * @param siteName the site's name
 * @param structureName the structure's name
 * @param structureKind the structure kind code (for example {@code scaffold}, {@code racking})
 * @param reason the inspection's reason code (for example {@code routine}, {@code after-impact})
 * @param designReference the design revision or drawing the planes were checked against
 * @param finalised whether the inspection is finalised; an open one gives a draft
 * @param zone the site's time zone, for every date and time shown
 * @param units the site's display units
 * @param issuedAt when this document was made
 */
public record ReportHeader(
    String inspectionId,
    String siteName,
    String structureName,
    String structureKind,
    String reason,
    String designReference,
    boolean finalised,
    ZoneId zone,
    LengthUnits units,
    Instant issuedAt) {
  public ReportHeader {
    Objects.requireNonNull(inspectionId, "inspectionId");
    Objects.requireNonNull(siteName, "siteName");
    Objects.requireNonNull(structureName, "structureName");
    Objects.requireNonNull(structureKind, "structureKind");
    Objects.requireNonNull(reason, "reason");
    designReference = designReference == null ? "" : designReference;
    Objects.requireNonNull(zone, "zone");
    Objects.requireNonNull(units, "units");
    Objects.requireNonNull(issuedAt, "issuedAt");
  }

  /** An open inspection's documents carry a DRAFT mark on every page. */
  public boolean draft() {
    return !finalised;
  }

  public boolean racking() {
    return "racking".equals(structureKind);
  }
}
