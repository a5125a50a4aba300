package org.bracewalk.core.model;

/**
 * What is done about a weakened part: repaired, replaced, braced, or taken out of service
 * (29 CFR 1926.451(f)(4) names these four).
 */
public enum RepairActionKind {
  REPAIR("repair"),
  REPLACE("replace"),
  BRACE("brace"),
  TAKE_OUT_OF_SERVICE("take-out-of-service");

  private final String label;

  RepairActionKind(String label) {
    this.label = label;
  }

  public String label() {
    return label;
  }

  public static RepairActionKind fromLabel(String label) {
    for (RepairActionKind k : values()) {
      if (k.label.equals(label)) {
        return k;
      }
    }
    throw new IllegalArgumentException(
        "unknown repair action '" + label + "': use repair, replace, brace or take-out-of-service");
  }
}
