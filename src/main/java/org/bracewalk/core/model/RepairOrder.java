package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * A repair order raised from an inspection: the crew's list of {@link RepairAction}s. Orders and
 * their actions may be added and completed after the inspection is finalised; the inspection
 * itself stays as it was.
 *
 * @param id stored id; 0 when new
 * @param inspectionId the inspection that found the need
 * @param createdAt when it was raised (UTC)
 * @param createdBy who raised it
 * @param note anything the crew must know
 */
public record RepairOrder(long id, long inspectionId, Instant createdAt, String createdBy, String note) {

  public RepairOrder {
    Text.id(id, "repair order id");
    Text.ref(inspectionId, "inspection");
    Objects.requireNonNull(createdAt, "created at");
    createdBy = Text.optional(createdBy);
    note = Text.optional(note);
  }

  public RepairOrder withId(long newId) {
    return new RepairOrder(newId, inspectionId, createdAt, createdBy, note);
  }
}
