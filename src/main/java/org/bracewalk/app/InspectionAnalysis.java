package org.bracewalk.app;

import java.util.List;
import java.util.Objects;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;

/**
 * Every plane of an inspection, analysed, with the records around it (for reports and screens).
 *
 * @param site the site
 * @param structure the structure inspected
 * @param inspection the inspection
 * @param planes one result per plane of the structure, by plane id
 */
public record InspectionAnalysis(
    Site site, Structure structure, Inspection inspection, List<PlaneResult> planes) {

  public InspectionAnalysis {
    Objects.requireNonNull(site, "site");
    Objects.requireNonNull(structure, "structure");
    Objects.requireNonNull(inspection, "inspection");
    planes = List.copyOf(planes);
  }

  /** True when every plane is rigid as built (conservatively: uninspected panels missing). */
  public boolean allRigid() {
    return planes.stream().allMatch(PlaneResult::rigid);
  }

  /** The planes that are not rigid as built. */
  public List<PlaneResult> notRigid() {
    return planes.stream().filter(p -> !p.rigid()).toList();
  }
}
