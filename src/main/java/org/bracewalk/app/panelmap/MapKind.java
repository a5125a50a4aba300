package org.bracewalk.app.panelmap;

/**
 * Which state a panel map describes. A design may mark openings ({@code o}) but never panels not
 * inspected ({@code ?}); an as-built map the other way round.
 */
public enum MapKind {
  DESIGN("design"),
  AS_BUILT("as-built");

  private final String label;

  MapKind(String label) {
    this.label = label;
  }

  /** How messages name the map: {@code design} or {@code as-built}. */
  public String label() {
    return label;
  }

  /** Whether {@code token} may appear in a map of this kind. */
  public boolean allows(PanelToken token) {
    return switch (token) {
      case UNKNOWN -> this == AS_BUILT;
      case OPENING -> this == DESIGN;
      default -> true;
    };
  }
}
