package org.bracewalk.app.panelmap;

/**
 * The state a frame line gives its member ({@code shared/design/check-contract.md}, "Frame
 * members"). A design map says only {@code none} (the design leaves the member out); an as-built map
 * says {@code sound}, {@code damaged} (still effective), {@code ineffective} (damaged beyond use:
 * counts as missing), {@code missing} or {@code ?} (not inspected: counts as missing, like a
 * {@code ?} panel).
 */
public enum FrameState {
  NONE("none", MapKind.DESIGN),
  SOUND("sound", MapKind.AS_BUILT),
  DAMAGED("damaged", MapKind.AS_BUILT),
  INEFFECTIVE("ineffective", MapKind.AS_BUILT),
  MISSING("missing", MapKind.AS_BUILT),
  UNKNOWN("?", MapKind.AS_BUILT);

  private final String text;
  private final MapKind kind;

  FrameState(String text, MapKind kind) {
    this.text = text;
    this.kind = kind;
  }

  /** The word as written in a map. */
  public String text() {
    return text;
  }

  /** The kind of map this state belongs in. */
  public MapKind kind() {
    return kind;
  }

  /** Whether a member in this as-built state is there and counts. */
  public boolean effective() {
    return this == SOUND || this == DAMAGED;
  }

  /** The state written {@code text} (letters in any case), or {@code null}. */
  public static FrameState fromText(String text) {
    for (FrameState s : values()) {
      if (s.text.equalsIgnoreCase(text)) {
        return s;
      }
    }
    return null;
  }

  /** The words of the states a map of {@code kind} may use, for messages. */
  public static String choices(MapKind kind) {
    return kind == MapKind.DESIGN
        ? "none (the design leaves the member out)"
        : "sound, damaged (still effective), ineffective (damaged beyond use), missing or ? (not"
            + " inspected)";
  }
}
