package org.bracewalk.core.port.report;

/**
 * The three levels of the racking damage limits (EN 15635 style; see trade-facts.md): up to the
 * limit, above it up to twice it, above twice it.
 */
public enum RackDamageLevel {
  /** Up to the limit: record and monitor at the next inspections. */
  MONITOR("monitor"),
  /** Above the limit up to twice it: offload, do not reload, repair within 4 weeks. */
  REPAIR_WITHIN_4_WEEKS("repair-4-weeks"),
  /** Above twice the limit: offload at once and isolate until repaired. */
  OFFLOAD_AND_ISOLATE("offload-isolate");

  private final String code;

  RackDamageLevel(String code) {
    this.code = code;
  }

  public String code() {
    return code;
  }
}
