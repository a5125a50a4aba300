package org.bracewalk.core.port.report;

/**
 * What the crew does. The first four are the actions of 29 CFR 1926.451(f)(4) (repair, replace,
 * brace, or take out of service); {@link #INSPECT} is a panel or frame member nobody has looked at,
 * which must be looked at (and fitted if it is missing) before the plane can be counted on; {@link
 * #REFIT} puts back a design frame member found missing (one damaged beyond use is replaced); {@link
 * #OFFLOAD_BESIDE} goes with taking a racking upright frame out of service.
 */
public enum RepairStepKind {
  /** Put a damaged member back into a sound state. */
  REPAIR("repair"),
  /** Fit a design member that is missing or damaged beyond use. */
  REPLACE("replace"),
  /** Fit a brace the design does not have (a deviation: engineering approval first). */
  BRACE("brace"),
  /** Keep people and loads off the affected part until the actions that follow are done. */
  TAKE_OUT_OF_SERVICE("out-of-service"),
  /** Look at a panel not inspected; fit its design member if it is missing. */
  INSPECT("inspect"),
  /** Fit back a design frame member (ledger, standard) that is missing. */
  REFIT("refit"),
  /**
   * Off-load the beam bays on both sides of a racking upright frame that lost rigidity: their
   * beams bear on it (common practice in racking inspection).
   */
  OFFLOAD_BESIDE("offload-beside");

  private final String code;

  RepairStepKind(String code) {
    this.code = code;
  }

  public String code() {
    return code;
  }

  /** Whether the action concerns whole lifts of a plane, not one panel or member. */
  public boolean wholeLifts() {
    return this == TAKE_OUT_OF_SERVICE || this == OFFLOAD_BESIDE;
  }
}
