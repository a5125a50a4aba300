package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * One inspection of one structure. Optional text fields are the empty string when not given.
 *
 * @param id stored id; 0 when new
 * @param structureId the structure inspected
 * @param startedAt when it began (UTC)
 * @param finishedAt when it was finalised; {@code null} while open
 * @param inspectorName the person making the report (report item 8)
 * @param inspectorPosition their position (report item 8)
 * @param competentPerson US sites: the competent person (29 CFR 1926.451(f)(3)); may be empty
 * @param shift US sites: the shift the inspection was made before; may be empty
 * @param storageSafetyPerson racking: the person responsible for storage equipment safety, to whom
 *     damage is reported (HSG76); may be empty
 * @param reason routine or the event that triggered it
 * @param status open or finalised
 * @param carriedOutForName the person for whom the inspection was carried out (report item 1);
 *     usually the site's client
 * @param carriedOutForAddress their address
 */
public record Inspection(
    long id,
    long structureId,
    Instant startedAt,
    Instant finishedAt,
    String inspectorName,
    String inspectorPosition,
    String competentPerson,
    String shift,
    String storageSafetyPerson,
    InspectionReason reason,
    InspectionStatus status,
    String carriedOutForName,
    String carriedOutForAddress) {

  public Inspection {
    Text.id(id, "inspection id");
    Text.ref(structureId, "structure");
    Objects.requireNonNull(startedAt, "started at");
    inspectorName = Text.required(inspectorName, "inspector name");
    inspectorPosition = Text.optional(inspectorPosition);
    competentPerson = Text.optional(competentPerson);
    shift = Text.optional(shift);
    storageSafetyPerson = Text.optional(storageSafetyPerson);
    Objects.requireNonNull(reason, "reason");
    Objects.requireNonNull(status, "status");
    carriedOutForName = Text.optional(carriedOutForName);
    carriedOutForAddress = Text.optional(carriedOutForAddress);
    if (status == InspectionStatus.FINALISED && finishedAt == null) {
      throw new IllegalArgumentException("a finalised inspection needs its finish time");
    }
    if (status == InspectionStatus.OPEN && finishedAt != null) {
      throw new IllegalArgumentException("an open inspection has no finish time yet");
    }
    if (finishedAt != null && finishedAt.isBefore(startedAt)) {
      throw new IllegalArgumentException(
          "inspection finished at " + finishedAt + ", before it started at " + startedAt);
    }
  }

  public boolean isFinalised() {
    return status == InspectionStatus.FINALISED;
  }

  public Inspection withId(long newId) {
    return new Inspection(
        newId, structureId, startedAt, finishedAt, inspectorName, inspectorPosition,
        competentPerson, shift, storageSafetyPerson, reason, status, carriedOutForName,
        carriedOutForAddress);
  }

  /** A short name for messages: "inspection 7". */
  public String label() {
    return "inspection " + id;
  }
}
