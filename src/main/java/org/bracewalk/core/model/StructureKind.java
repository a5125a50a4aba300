package org.bracewalk.core.model;

/** What kind of braced structure is inspected. Decides which extra report fields apply. */
public enum StructureKind {
  SCAFFOLD("scaffold"),
  RACKING_RUN("racking-run"),
  OTHER_FRAME("other-braced-frame");

  private final String label;

  StructureKind(String label) {
    this.label = label;
  }

  /** The file and command-line spelling. */
  public String label() {
    return label;
  }

  /** Parses a label; throws naming the value and the choices otherwise. */
  public static StructureKind fromLabel(String label) {
    for (StructureKind k : values()) {
      if (k.label.equals(label)) {
        return k;
      }
    }
    throw new IllegalArgumentException(
        "unknown structure kind '" + label + "': use scaffold, racking-run or other-braced-frame");
  }
}
