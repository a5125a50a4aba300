package org.bracewalk.core.port;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.PlaneRecord;

/** Brace planes of structures. Grids are stored in whole millimetres. */
public interface PlaneRepository {
  /**
   * Stores a new plane (id 0) and returns it with its id. Refuses (with a {@link StoreException}
   * naming it) a second plane of the same name in one structure.
   */
  PlaneRecord add(PlaneRecord plane);

  Optional<PlaneRecord> find(long id);

  /** The planes of one structure, by id. */
  List<PlaneRecord> ofStructure(long structureId);

  Optional<PlaneRecord> findByName(long structureId, String name);
}
