package org.bracewalk.app.report;

import java.util.Collections;
import java.util.EnumMap;
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
import org.bracewalk.core.port.GlobalIdentities.Kind;

/**
 * Every record an inspection's report rests on, as stored: what the fingerprint covers.
 *
 * @param planes the planes the inspection covers (its scope, fixed when it started), by id, each
 *     with the design revision of its scope
 * @param orders the repair orders raised from the inspection, by id
 */
public record InspectionRecords(
    Site site, Structure structure, Inspection inspection, List<PlaneRecords> planes,
    List<OrderRecords> orders, Identities identities) {

  public InspectionRecords {
    Objects.requireNonNull(site, "site");
    Objects.requireNonNull(structure, "structure");
    Objects.requireNonNull(inspection, "inspection");
    planes = List.copyOf(planes);
    orders = List.copyOf(orders);
    Objects.requireNonNull(identities, "identities");
  }

  /** The records without their global identities: enough for the first canonical form. */
  public InspectionRecords(Site site, Structure structure, Inspection inspection,
      List<PlaneRecords> planes, List<OrderRecords> orders) {
    this(site, structure, inspection, planes, orders, Identities.NONE);
  }

  /**
   * The global identities (UUIDs) of the records, by kind and local id: what the second
   * canonical form names records by.
   */
  public record Identities(Map<Kind, Map<Long, String>> byKind) {
    /** No identities known (records made in memory, or for the first canonical form). */
    public static final Identities NONE = new Identities(Map.of());

    public Identities {
      Map<Kind, Map<Long, String>> copy = new EnumMap<>(Kind.class);
      byKind.forEach((k, v) -> copy.put(k, Map.copyOf(v)));
      byKind = Collections.unmodifiableMap(copy);
    }

    /**
     * The global identity of a record.
     *
     * @throws IllegalStateException when it is not known
     */
    public String uuid(Kind kind, long id) {
      String u = byKind.getOrDefault(kind, Map.of()).get(id);
      if (u == null) {
        throw new IllegalStateException("no global identity known for " + kind.words() + " " + id);
      }
      return u;
    }
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
