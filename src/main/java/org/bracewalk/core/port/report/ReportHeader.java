package org.bracewalk.core.port.report;

import java.time.Instant;
import java.time.ZoneId;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import org.bracewalk.core.model.Jurisdiction;

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
 * @param jurisdiction the site's jurisdiction: the report cites its regulations only and asks
 *     for the particulars they require ({@link SiteRules})
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
    Instant issuedAt,
    Jurisdiction jurisdiction) {
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
    Objects.requireNonNull(jurisdiction, "jurisdiction");
  }

  /** A header of a site with no jurisdiction recorded ({@link Jurisdiction#OTHER}). */
  public ReportHeader(String inspectionId, String siteName, String structureName,
      String structureKind, String reason, String designReference, boolean finalised, ZoneId zone,
      LengthUnits units, Instant issuedAt) {
    this(inspectionId, siteName, structureName, structureKind, reason, designReference, finalised,
        zone, units, issuedAt, Jurisdiction.OTHER);
  }

  /** The particulars a report of this header must carry ({@link SiteRules#required}). */
  public List<Particular> requiredParticulars() {
    return SiteRules.required(jurisdiction, structureKind);
  }

  /** What the report cites ({@link SiteRules#cited}). */
  public Set<SiteRules.Source> cited() {
    return SiteRules.cited(jurisdiction, structureKind);
  }

  /** An open inspection's documents carry a DRAFT mark on every page. */
  public boolean draft() {
    return !finalised;
  }

  public boolean racking() {
    return "racking".equals(structureKind);
  }
}
