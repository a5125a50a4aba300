package org.bracewalk.app;

import java.util.Objects;
import org.bracewalk.core.model.InspectionReason;

/**
 * What the inspector says when starting an inspection; the service adds the structure, the start
 * time (from its clock) and the status. Empty {@code carriedOutFor*} fields default to the site's
 * client. Optional text may be {@code null}.
 */
public record NewInspection(
    String inspectorName,
    String inspectorPosition,
    String competentPerson,
    String shift,
    String storageSafetyPerson,
    InspectionReason reason,
    String carriedOutForName,
    String carriedOutForAddress) {

  public NewInspection {
    Objects.requireNonNull(reason, "reason");
  }

  /** The common case: an inspector, a position, a reason; everything else empty or defaulted. */
  public static NewInspection of(String inspectorName, String position, InspectionReason reason) {
    return new NewInspection(inspectorName, position, null, null, null, reason, null, null);
  }
}
