package org.bracewalk.core.model;

import java.util.Objects;

/**
 * One braced structure on a site: a scaffold, a racking run or another braced frame.
 *
 * @param id the stored id; 0 when not stored yet
 * @param siteId the site it stands on
 * @param name a short name (unique within the site by convention, not enforced)
 * @param kind scaffold, racking run or other frame
 * @param description what it is (report item 3)
 * @param designReference the drawing or scheme the design comes from
 * @param inspectionIntervalDays days between routine inspections; 7 by default (Work at Height
 *     Regulations 2005 reg. 12 for working platforms; weekly visual checks for racking, HSG76)
 */
public record Structure(
    long id,
    long siteId,
    String name,
    StructureKind kind,
    String description,
    String designReference,
    int inspectionIntervalDays) {

  /** The interval used when none is given. */
  public static final int DEFAULT_INTERVAL_DAYS = 7;

  public Structure {
    Text.id(id, "structure id");
    Text.ref(siteId, "site");
    name = Text.required(name, "structure name");
    Objects.requireNonNull(kind, "structure kind");
    description = Text.optional(description);
    designReference = Text.optional(designReference);
    if (inspectionIntervalDays < 1 || inspectionIntervalDays > 366) {
      throw new IllegalArgumentException(
          "inspection interval must be 1 to 366 days, got " + inspectionIntervalDays);
    }
  }

  public Structure withId(long newId) {
    return new Structure(
        newId, siteId, name, kind, description, designReference, inspectionIntervalDays);
  }
}
