package org.bracewalk.core.model;

/**
 * How the plane is held. {@link #PINNED_BASE}: every base joint is held by the foundation.
 * {@link #FREE}: nothing holds the plane but itself (a plan-bracing level, a frame not yet fixed).
 */
public enum Support {
  PINNED_BASE("pinned-base"),
  FREE("free");

  private final String label;

  Support(String label) {
    this.label = label;
  }

  /** The contract's spelling: {@code pinned-base} or {@code free}. */
  public String label() {
    return label;
  }

  /** Parses {@code pinned-base} or {@code free}; {@code null} if it is neither. */
  public static Support fromLabel(String label) {
    for (Support s : values()) {
      if (s.label.equals(label)) {
        return s;
      }
    }
    return null;
  }
}
