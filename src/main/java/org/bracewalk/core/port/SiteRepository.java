package org.bracewalk.core.port;

import java.util.List;
import java.util.Optional;
import org.bracewalk.core.model.Site;

/** Sites. */
public interface SiteRepository {
  /** Stores a new site (its id is 0) and returns it with its id. */
  Site add(Site site);

  Optional<Site> find(long id);

  /** Every site, by id. */
  List<Site> all();
}
