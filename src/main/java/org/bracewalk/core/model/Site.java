package org.bracewalk.core.model;

import java.time.ZoneId;
import java.util.Objects;

/**
 * A site: where the structures stand and for whom they are inspected.
 *
 * @param id the stored id; 0 for a site not stored yet
 * @param name a short name people use for the site
 * @param clientName the person or firm for whom inspections are carried out (report item 1)
 * @param clientAddress their postal address
 * @param location where the equipment stands (report item 2)
 * @param timeZone the zone times are shown in; they are stored as UTC instants
 * @param units how lengths are shown
 * @param jurisdiction whose regulations the report cites and whose particulars it requires;
 *     fixed when the site is created, like every field of a site
 */
public record Site(
    long id,
    String name,
    String clientName,
    String clientAddress,
    String location,
    ZoneId timeZone,
    DisplayUnits units,
    Jurisdiction jurisdiction) {

  public Site {
    Text.id(id, "site id");
    name = Text.required(name, "site name");
    clientName = Text.optional(clientName);
    clientAddress = Text.optional(clientAddress);
    location = Text.optional(location);
    Objects.requireNonNull(timeZone, "time zone");
    Objects.requireNonNull(units, "display units");
    Objects.requireNonNull(jurisdiction, "jurisdiction");
  }

  /** A site whose jurisdiction is not recorded ({@link Jurisdiction#OTHER}). */
  public Site(long id, String name, String clientName, String clientAddress, String location,
      ZoneId timeZone, DisplayUnits units) {
    this(id, name, clientName, clientAddress, location, timeZone, units, Jurisdiction.OTHER);
  }

  /** The same site with the given stored id. */
  public Site withId(long newId) {
    return new Site(newId, name, clientName, clientAddress, location, timeZone, units,
        jurisdiction);
  }
}
