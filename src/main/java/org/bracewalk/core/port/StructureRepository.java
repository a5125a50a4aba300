package org.bracewalk.core.port;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Structure;

/** Structures of sites. */
public interface StructureRepository {
  /** Stores a new structure (id 0) and returns it with its id. */
  Structure add(Structure structure);

  Optional<Structure> find(long id);

  /** The structures of one site, by id. */
  List<Structure> ofSite(long siteId);
}
