package org.bracewalk.core.port.report;

/** Why an action is on the list, in the order the list is worked. */
public enum RepairUrgency {
  /** Isolate first: keep people and loads off the affected part. */
  ISOLATE("isolate"),
  /** In the minimal set that restores rigidity: do at once. */
  NEEDED_FOR_RIGIDITY("rigidity"),
  /** Restores the design's redundancy only. */
  RESTORES_REDUNDANCY("redundancy"),
  /** A damaged member within limits or due later (racking repair within 4 weeks). */
  SCHEDULED("scheduled");

  private final String code;

  RepairUrgency(String code) {
    this.code = code;
  }

  public String code() {
    return code;
  }
}
