package org.bracewalk.core.model;

/** What is wrong with a member found damaged. */
public enum DefectType {
  /** Bent or bowed: measure the bow over a gauge length (EN 15635 uses a 1 m straight edge). */
  BENT("bent"),
  /** Torn or split: replace (EN 15635, via secondary sources). */
  TORN("torn"),
  /** A loose or missing fitting, coupler, bolt or locking pin. */
  LOOSE_CONNECTION("loose-connection"),
  /** Corroded. */
  CORRODED("corroded"),
  /** Anything else: say what in the note. */
  OTHER("other");

  private final String label;

  DefectType(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }

  public static DefectType fromLabel(String label) {
    for (DefectType d : values()) {
      if (d.label.equals(label)) {
        return d;
      }
    }
    throw new IllegalArgumentException(
        "unknown defect type '" + label + "': use bent, torn, loose-connection, corroded or other");
  }
}
