package org.bracewalk.app;

import java.util.List;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;

/**
 * What an import stored, with the ids it was given.
 *
 * @param site the new site
 * @param structures its structures
 * @param planes their planes
 * @param inspections their inspections, in file order
 * @param observations how many observations were stored
 */
public record ImportedSite(
    Site site,
    List<Structure> structures,
    List<PlaneRecord> planes,
    List<Inspection> inspections,
    int observations) {

  public ImportedSite {
    structures = List.copyOf(structures);
    planes = List.copyOf(planes);
    inspections = List.copyOf(inspections);
  }
}
