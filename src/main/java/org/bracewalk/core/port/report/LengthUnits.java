package org.bracewalk.core.port.report;

/** How lengths are shown: metres and millimetres, or feet and inches. Stored values are metric. */
public enum LengthUnits {
  METRIC("metric"),
  IMPERIAL("imperial");

  private final String code;

  LengthUnits(String code) {
    this.code = code;
  }

  /** The code used in templates and files: {@code metric} or {@code imperial}. */
  public String code() {
    return code;
  }
}
