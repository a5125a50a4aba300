package org.bracewalk.core.model;

import java.time.Instant;
import java.util.Objects;

/**
 * A plane taken out of use, for instance one created by mistake. The plane and everything
 * recorded on it are kept; inspections started at or after {@code retiredAt} leave it out, and
 * inspections started before keep it as they did. A plane is retired at most once, and a
 * retirement never changes.
 *
 * @param planeId the plane retired
 * @param retiredAt when (inspections starting then or later leave the plane out)
 * @param retiredBy who retired it; may be empty
 * @param reason why; required
 */
public record PlaneRetirement(long planeId, Instant retiredAt, String retiredBy, String reason) {

  public PlaneRetirement {
    Text.ref(planeId, "plane");
    Objects.requireNonNull(retiredAt, "retiredAt");
    retiredBy = Text.optional(retiredBy);
    reason = Text.required(reason, "the reason for retiring the plane");
  }

  /** Whether an inspection started at {@code startedAt} leaves the plane out. */
  public boolean appliesToInspectionStartedAt(Instant startedAt) {
    return !retiredAt.isAfter(startedAt);
  }
}
