package org.bracewalk.core.model;

/**
 * Why an inspection took place: the routine interval, or an event that could have affected the
 * structure (29 CFR 1926.451(f)(3); Work at Height Regulations 2005 reg. 12).
 */
public enum InspectionReason {
  ROUTINE("routine"),
  AFTER_IMPACT("after-impact"),
  AFTER_ALTERATION("after-alteration"),
  HANDOVER("handover"),
  AFTER_SEVERE_WEATHER("after-severe-weather");

  private final String label;

  InspectionReason(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }

  public static InspectionReason fromLabel(String label) {
    for (InspectionReason r : values()) {
      if (r.label.equals(label)) {
        return r;
      }
    }
    throw new IllegalArgumentException(
        "unknown inspection reason '"
            + label
            + "': use routine, after-impact, after-alteration, handover or after-severe-weather");
  }
}
