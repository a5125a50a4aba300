package org.bracewalk.core.model;

/** An inspection is open while observations are recorded; once finalised it never changes. */
public enum InspectionStatus {
  OPEN("open"),
  FINALISED("finalised");

  private final String label;

  InspectionStatus(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }

  public static InspectionStatus fromLabel(String label) {
    for (InspectionStatus s : values()) {
      if (s.label.equals(label)) {
        return s;
      }
    }
    throw new IllegalArgumentException("unknown inspection status '" + label + "'");
  }
}
