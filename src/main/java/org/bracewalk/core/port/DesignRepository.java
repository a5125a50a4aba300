package org.bracewalk.core.port;

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
}
