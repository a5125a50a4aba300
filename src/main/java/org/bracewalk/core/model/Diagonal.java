package org.bracewalk.core.model;

/**
 * Which diagonal members a panel carries, seen on the elevation as drawn (model coordinates, y up):
 * {@link #RISING} runs from bottom-left to top-right ({@code /}), {@link #FALLING} from top-left to
 * bottom-right ({@code \}), {@link #BOTH} is a cross ({@code X}: two members).
 */
public enum Diagonal {
  RISING("/"),
  FALLING("\\"),
  BOTH("X");

  private final String symbol;

  Diagonal(String symbol) {
    this.symbol = symbol;
  }

  /** The panel-map token for a rigid member: {@code /}, {@code \} or {@code X}. */
  public String symbol() {
    return symbol;
  }

  /** Number of members: 2 for a cross, else 1. */
  public int memberCount() {
    return this == BOTH ? 2 : 1;
  }

  public boolean hasRising() {
    return this != FALLING;
  }

  public boolean hasFalling() {
    return this != RISING;
  }

  /** The diagonal made of the given members, or {@code null} when there are none. */
  public static Diagonal of(boolean rising, boolean falling) {
    if (rising && falling) {
      return BOTH;
    }
    if (rising) {
      return RISING;
    }
    return falling ? FALLING : null;
  }

  /** Parses {@code /}, {@code \} or {@code X} (case-insensitive); {@code null} if it is none. */
  public static Diagonal fromSymbol(String token) {
    for (Diagonal d : values()) {
      if (d.symbol.equalsIgnoreCase(token)) {
        return d;
      }
    }
    return null;
  }
}
