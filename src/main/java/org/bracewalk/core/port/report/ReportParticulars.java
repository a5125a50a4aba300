package org.bracewalk.core.port.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/**
 * The recorded particulars of one inspection. Blank text or a missing time means the particular
 * is missing; {@link #missing(boolean)} lists every one, so a report is refused naming them all at
 * once rather than one per attempt.
 *
 * @param actionsTaken Sch. 7 item 6: the repair orders recorded against the inspection (empty
 *     when none is recorded; the report then says so)
 */
public record ReportParticulars(
    String clientName,
    String clientAddress,
    String equipmentLocation,
    String equipmentDescription,
    Instant inspectedAt,
    List<RecordedOrder> actionsTaken,
    String reporterName,
    String reporterPosition,
    String competentPerson,
    String shift,
    String storageSafetyPerson) {

  public ReportParticulars {
    actionsTaken = List.copyOf(actionsTaken);
  }

  /**
   * The value of a recorded particular as text ({@code null} or blank when missing; the time as
   * ISO); {@code null} for the particulars the report draws up itself.
   */
  public String text(Particular p) {
    return switch (p) {
      case CLIENT_NAME -> clientName;
      case CLIENT_ADDRESS -> clientAddress;
      case EQUIPMENT_LOCATION -> equipmentLocation;
      case EQUIPMENT_DESCRIPTION -> equipmentDescription;
      case INSPECTED_AT -> inspectedAt == null ? null : inspectedAt.toString();
      case REPORTER_NAME -> reporterName;
      case REPORTER_POSITION -> reporterPosition;
      case COMPETENT_PERSON -> competentPerson;
      case SHIFT -> shift;
      case STORAGE_SAFETY_PERSON -> storageSafetyPerson;
      case RISK_MATTERS, ACTION_TAKEN, FURTHER_ACTION -> null;
    };
  }

  /**
   * Every recorded particular that is empty, in the order of {@link Particular}.
   *
   * @param racking whether the structure is storage racking (then the storage safety person is
   *     required too)
   */
  public List<Particular> missing(boolean racking) {
    List<Particular> all = new ArrayList<>();
    for (Particular p : Particular.values()) {
      if (p.recordedFor(racking)) {
        all.add(p);
      }
    }
    return missing(all);
  }

  /**
   * Every particular of {@code required} that is empty, in the order of {@link Particular} (see
   * {@link SiteRules#required}).
   */
  public List<Particular> missing(List<Particular> required) {
    List<Particular> out = new ArrayList<>();
    for (Particular p : Particular.values()) {
      if (!required.contains(p) || p.source() == Particular.Source.DRAWN) {
        continue;
      }
      String v = text(p);
      if (v == null || v.isBlank()) {
        out.add(p);
      }
    }
    return out;
  }
}
