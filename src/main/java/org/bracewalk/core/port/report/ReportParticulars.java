package org.bracewalk.core.port.report;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

/**
 * The particulars of one inspection as recorded. Blank text or a missing time means the
 * particular is missing; {@link #missing(boolean)} lists every one, so a report is refused naming
 * them all at once rather than one per attempt.
 */
public record ReportParticulars(
    String clientName,
    String clientAddress,
    String equipmentLocation,
    String equipmentDescription,
    Instant inspectedAt,
    String riskMatters,
    String actionTaken,
    String furtherAction,
    String reporterName,
    String reporterPosition,
    String competentPerson,
    String shift,
    String storageSafetyPerson) {

  /** The value of one particular as text ({@code null} or blank when missing); times as ISO. */
  public String text(Particular p) {
    return switch (p) {
      case CLIENT_NAME -> clientName;
      case CLIENT_ADDRESS -> clientAddress;
      case EQUIPMENT_LOCATION -> equipmentLocation;
      case EQUIPMENT_DESCRIPTION -> equipmentDescription;
      case INSPECTED_AT -> inspectedAt == null ? null : inspectedAt.toString();
      case RISK_MATTERS -> riskMatters;
      case ACTION_TAKEN -> actionTaken;
      case FURTHER_ACTION -> furtherAction;
      case REPORTER_NAME -> reporterName;
      case REPORTER_POSITION -> reporterPosition;
      case COMPETENT_PERSON -> competentPerson;
      case SHIFT -> shift;
      case STORAGE_SAFETY_PERSON -> storageSafetyPerson;
    };
  }

  /**
   * Every particular that is empty, in the order of {@link Particular}.
   *
   * @param racking whether the structure is storage racking (then the storage safety person is
   *     required too)
   */
  public List<Particular> missing(boolean racking) {
    List<Particular> out = new ArrayList<>();
    for (Particular p : Particular.values()) {
      if (!p.alwaysRequired() && !racking) {
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
