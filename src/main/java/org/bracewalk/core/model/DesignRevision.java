package org.bracewalk.core.model;

import java.time.Instant;
import java.time.LocalDate;
import java.util.Objects;

/**
 * One revision of a plane's design: which panels are braced, how, and which are openings.
 *
 * <p>The revision in force for an inspection is the highest-numbered one recorded at or before the
 * moment the inspection was finished (or now, while it is open); see {@code DesignRepository}.
 *
 * @param id stored id; 0 when new
 * @param planeId the plane
 * @param number 1, 2, 3 ... within the plane
 * @param author who drew or approved it
 * @param date the date on the design
 * @param approvalNote who approved it and on what basis
 * @param recordedAt when it was entered into Bracewalk (UTC)
 * @param design the bracing; its grid must be the plane's grid
 */
public record DesignRevision(
    long id,
    long planeId,
    int number,
    String author,
    LocalDate date,
    String approvalNote,
    Instant recordedAt,
    PlaneDesign design) {

  public DesignRevision {
    Text.id(id, "design revision id");
    Text.ref(planeId, "plane");
    if (number < 1) {
      throw new IllegalArgumentException("design revision numbers start at 1, got " + number);
    }
    author = Text.optional(author);
    Objects.requireNonNull(date, "design date");
    approvalNote = Text.optional(approvalNote);
    Objects.requireNonNull(recordedAt, "recorded at");
    Objects.requireNonNull(design, "design");
  }

  public DesignRevision withId(long newId) {
    return new DesignRevision(
        newId, planeId, number, author, date, approvalNote, recordedAt, design);
  }
}
