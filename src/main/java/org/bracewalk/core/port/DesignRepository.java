package org.bracewalk.core.port;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.DesignRevision;

/** Design revisions of planes. Revisions are never changed once stored. */
public interface DesignRepository {
  /** Stores a new revision (id 0; its number must be new for the plane) and returns it. */
  DesignRevision add(DesignRevision revision);

  Optional<DesignRevision> find(long id);

  /** Every revision of a plane, by number. */
  List<DesignRevision> ofPlane(long planeId);

  /** The highest-numbered revision of a plane, if any. */
  default Optional<DesignRevision> latest(long planeId) {
    List<DesignRevision> all = ofPlane(planeId);
    return all.isEmpty() ? Optional.empty() : Optional.of(all.get(all.size() - 1));
  }

  /**
   * The revision in force at {@code at}: the highest-numbered one recorded at or before it; when
   * none was recorded by then, the first revision (the plane's design was entered late).
   */
  default Optional<DesignRevision> inForceAt(long planeId, Instant at) {
    List<DesignRevision> all = ofPlane(planeId);
    DesignRevision found = null;
    for (DesignRevision r : all) {
      if (!r.recordedAt().isAfter(at)) {
        found = r;
      }
    }
    if (found == null && !all.isEmpty()) {
      found = all.get(0);
    }
    return Optional.ofNullable(found);
  }
}
