package org.bracewalk.ui.common;

import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.symbol.Symbol;

/**
 * How each panel state is drawn: a line style and a badge letter, so that no state depends on
 * colour alone. The line styles differ among themselves too (dash pattern, width, a double line,
 * damage ticks), because a large plane is drawn too small for badges. The badge letter is also
 * the key that records the state in the walk-round.
 */
public enum PanelLook {
  NOT_RECORDED("?", "not inspected yet", new double[] {6, 4}, 1.5, "#8a8a8a"),
  SOUND("S", "sound", null, 3.0, "#1b1b1b"),
  DAMAGED_EFFECTIVE("D", "damaged, still effective", null, 3.0, "#1b1b1b"),
  DAMAGED_INEFFECTIVE("U", "damaged beyond use", new double[] {11, 5}, 3.0, "#b3261e"),
  MISSING("M", "missing", new double[] {2, 5}, 2.0, "#b3261e"),
  /** drawn as a double line */
  EXTRA("E", "extra: not in the design", null, 1.3, "#5b2a86"),
  NOT_REACHABLE("R", "not reachable", new double[] {8, 3, 1.5, 3}, 1.5, "#8a8a8a");

  private final String badge;
  private final String words;
  private final double[] dashes;
  private final double width;
  private final String colour;

  PanelLook(String badge, String words, double[] dashes, double width, String colour) {
    this.badge = badge;
    this.words = words;
    this.dashes = dashes;
    this.width = width;
    this.colour = colour;
  }

  public String badge() {
    return badge;
  }

  public String words() {
    return words;
  }

  /** Dash pattern of the member line, {@code null} for a solid line. */
  public double[] dashes() {
    return dashes == null ? null : dashes.clone();
  }

  public double width() {
    return width;
  }

  public String colour() {
    return colour;
  }

  /** True when the member is drawn as two thin parallel lines (a member the design does not have). */
  public boolean doubled() {
    return this == EXTRA;
  }

  /** True when two short strokes cross the member (a dent or bend). */
  public boolean ticked() {
    return this == DAMAGED_EFFECTIVE || this == DAMAGED_INEFFECTIVE;
  }

  /**
   * The mark drawn on the panel: the walk-round key's letter in a rounded box, or for a panel
   * nobody has looked at a question mark in a dashed ring (as in the PDF).
   */
  public Symbol symbol() {
    return switch (this) {
      case NOT_RECORDED -> Symbol.STATE_NOT_INSPECTED;
      case SOUND -> Symbol.STATE_SOUND;
      case DAMAGED_EFFECTIVE -> Symbol.STATE_DAMAGED;
      case DAMAGED_INEFFECTIVE -> Symbol.STATE_BEYOND_USE;
      case MISSING -> Symbol.STATE_MISSING;
      case EXTRA -> Symbol.STATE_EXTRA;
      case NOT_REACHABLE -> Symbol.STATE_NOT_REACHABLE;
    };
  }

  public static PanelLook of(PanelState state) {
    if (state == null) {
      return NOT_RECORDED;
    }
    return switch (state) {
      case SOUND -> SOUND;
      case DAMAGED_EFFECTIVE -> DAMAGED_EFFECTIVE;
      case DAMAGED_INEFFECTIVE -> DAMAGED_INEFFECTIVE;
      case MISSING -> MISSING;
      case EXTRA -> EXTRA;
      case NOT_REACHABLE -> NOT_REACHABLE;
      case NOT_INSPECTED -> NOT_RECORDED;
    };
  }
}
