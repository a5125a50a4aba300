package org.bracewalk.core.model;

/**
 * What the inspector found in one panel. Whether the state leaves a member that still counts for
 * rigidity is {@link #effective()}; whether anyone has looked is {@link #inspected()}.
 */
public enum PanelState {
  /** The design member is there and sound. */
  SOUND("sound", true, true),
  /** Damaged, within the first damage level: it still counts, record and monitor. */
  DAMAGED_EFFECTIVE("damaged-effective", true, true),
  /** Damaged beyond use: treated as absent until repaired (conservative). */
  DAMAGED_INEFFECTIVE("damaged-ineffective", false, true),
  /** The design member is not there. */
  MISSING("missing", false, true),
  /** A member where the design has none: it is there, so it counts. */
  EXTRA("extra", true, true),
  /** Nobody has looked yet. Counted as missing for the verdict shown. */
  NOT_INSPECTED("not-inspected", false, false),
  /** Looked for but could not be reached or seen. Treated as not inspected. */
  NOT_REACHABLE("not-reachable", false, false);

  private final String label;
  private final boolean effective;
  private final boolean inspected;

  PanelState(String label, boolean effective, boolean inspected) {
    this.label = label;
    this.effective = effective;
    this.inspected = inspected;
  }

  public String label() {
    return label;
  }

  /** Whether a member in this state counts in the brace graph. */
  public boolean effective() {
    return effective;
  }

  /** Whether the panel has been looked at. */
  public boolean inspected() {
    return inspected;
  }

  public static PanelState fromLabel(String label) {
    for (PanelState s : values()) {
      if (s.label.equals(label)) {
        return s;
      }
    }
    throw new IllegalArgumentException("unknown panel state '" + label + "'");
  }
}
