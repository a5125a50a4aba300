package org.bracewalk.core.model;

/** How lengths are shown to the people of a site. Storage is always whole millimetres. */
public enum DisplayUnits {
  METRIC("metric"),
  IMPERIAL("imperial");

  private final String label;

  DisplayUnits(String label) {
    this.label = label;
  }

  /** The file and command-line spelling: {@code metric} or {@code imperial}. */
  public String label() {
    return label;
  }

  /** Parses {@code metric} or {@code imperial}; throws naming the value otherwise. */
  public static DisplayUnits fromLabel(String label) {
    for (DisplayUnits u : values()) {
      if (u.label.equals(label)) {
        return u;
      }
    }
    throw new IllegalArgumentException(
        "unknown display units '" + label + "': use metric or imperial");
  }
}
