package org.bracewalk.core.model;

/**
 * The two kinds of frame member of a brace plane: horizontals (scaffold ledgers, racking beams and
 * frame horizontals) and verticals (scaffold standards, racking uprights).
 */
public enum FrameMemberType {
  /** A horizontal member: a ledger (racking: a beam, or a horizontal of an upright frame). */
  LEDGER("ledger", "beam"),
  /** A vertical member: a standard (racking: an upright). */
  STANDARD("standard", "upright");

  private final String label;
  private final String rackingLabel;

  FrameMemberType(String label, String rackingLabel) {
    this.label = label;
    this.rackingLabel = rackingLabel;
  }

  /** The scaffold word, also the stored and exported spelling: {@code ledger} or {@code standard}. */
  public String label() {
    return label;
  }

  /** The racking word: {@code beam} or {@code upright}. */
  public String rackingLabel() {
    return rackingLabel;
  }

  /** The type named by either word ({@code ledger}/{@code beam}, {@code standard}/{@code upright}). */
  public static FrameMemberType fromWord(String word) {
    for (FrameMemberType t : values()) {
      if (t.label.equals(word) || t.rackingLabel.equals(word)) {
        return t;
      }
    }
    throw new IllegalArgumentException("unknown frame member '" + word + "'");
  }
}
