package org.bracewalk.core.model;

/**
 * What is done about a weakened part: repaired, replaced, braced, or taken out of service
 * (29 CFR 1926.451(f)(4) names these four); and {@link #REFIT}, a design frame member (ledger,
 * standard) found missing put back, which only an action on a frame member is.
 */
public enum RepairActionKind {
  REPAIR("repair"),
  REPLACE("replace"),
  BRACE("brace"),
  TAKE_OUT_OF_SERVICE("take-out-of-service"),
  /** Put back a design frame member found missing (only on a frame member). */
  REFIT("refit");

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
        "unknown repair action '" + label + "': use repair, replace, refit, brace or"
            + " take-out-of-service");
  }
}
