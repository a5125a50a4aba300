package org.bracewalk.core.model;

/** How a diagonal member works: in tension and compression, or in tension only (rod, cable, strap). */
public enum MemberKind {
  RIGID("rigid"),
  TENSION_ONLY("tension-only");

  private final String label;

  MemberKind(String label) {
    this.label = label;
  }

  /** The contract's spelling: {@code rigid} or {@code tension-only}. */
  public String label() {
    return label;
  }

  public static MemberKind fromLabel(String label) {
    for (MemberKind k : values()) {
      if (k.label.equals(label)) {
        return k;
      }
    }
    throw new IllegalArgumentException("unknown member kind '" + label + "'");
  }
}
