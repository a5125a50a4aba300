package org.bracewalk.app.report;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;

/**
 * Every record an inspection's report rests on, as stored: what the fingerprint covers.
 *
 * @param planes the planes the inspection covers (its scope, fixed when it started), by id, each
 *     with the design revision of its scope
 * @param orders the repair orders raised from the inspection, by id
 */
public record InspectionRecords(
    Site site, Structure structure, Inspection inspection, List<PlaneRecords> planes,
    List<OrderRecords> orders) {

  public InspectionRecords {
    Objects.requireNonNull(site, "site");
    Objects.requireNonNull(structure, "structure");
    Objects.requireNonNull(inspection, "inspection");
    planes = List.copyOf(planes);
    orders = List.copyOf(orders);
  }

  /**
   * One plane: its record, the design revision in force for the inspection, every observation of
   * the inspection on it (superseded ones too, in the order recorded) and their photos.
   */
  public record PlaneRecords(
      PlaneRecord plane, DesignRevision design, List<Observation> observations,
      Map<Long, List<Photo>> photos) {
    public PlaneRecords {
      Objects.requireNonNull(plane, "plane");
      Objects.requireNonNull(design, "design");
      observations = List.copyOf(observations);
      photos = Map.copyOf(photos);
    }
  }

  /** One repair order and its actions, in the order recorded. */
  public record OrderRecords(RepairOrder order, List<RepairAction> actions) {
    public OrderRecords {
      Objects.requireNonNull(order, "order");
      actions = List.copyOf(actions);
    }
  }
}
