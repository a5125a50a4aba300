package org.bracewalk.core.port;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;

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

  /**
   * The planes an inspection covers, by id: its scope, fixed when it started (see {@link
   * #fixScope}); a plane added to the structure later is not among them. Empty when there is no
   * such inspection.
   */
  List<PlaneRecord> ofInspection(long inspectionId);

  /**
   * Records the scope of an inspection being started: each plane it covers and the id of the
   * design revision it is checked against. Append-only: the database refuses a change, a removal,
   * a plane of another structure, a revision of another plane, and any addition once the
   * inspection has an observation or is finalised.
   *
   * @param revisionByPlane design revision id by plane id
   */
  void fixScope(long inspectionId, Map<Long, Long> revisionByPlane);

  /** The scope of an inspection: design revision id by plane id, in plane id order. */
  Map<Long, Long> scopeOf(long inspectionId);

  /**
   * Stores a plane's retirement (append-only; the database refuses a second one for a plane, or
   * any change) and returns it as stored (its instant to the millisecond).
   */
  PlaneRetirement retire(PlaneRetirement retirement);

  /** The retirement of a plane, if it is retired. */
  Optional<PlaneRetirement> retirement(long planeId);

  /** The retirements of the planes of one structure, by plane id. */
  List<PlaneRetirement> retirementsOf(long structureId);
}
