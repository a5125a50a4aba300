package org.bracewalk.core.port;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Inspection;

/** Inspections. A finalised inspection is never changed; the store enforces it too. */
public interface InspectionRepository {
  /** Stores a new inspection (id 0) and returns it with its id. */
  Inspection add(Inspection inspection);

  Optional<Inspection> find(long id);

  /** The inspections of one structure, oldest first (by start time, then id). */
  List<Inspection> ofStructure(long structureId);

  /** Every inspection, by id. */
  List<Inspection> all();

  /**
   * Marks an open inspection finalised at {@code finishedAt} and returns it. In the same write
   * the store keeps the structure's inspection interval as at this moment with the inspection
   * (see {@link StructureRepository#asOfInspection}).
   *
   * @throws InspectionFinalisedException when it already is
   */
  Inspection finalise(long id, Instant finishedAt);
}
