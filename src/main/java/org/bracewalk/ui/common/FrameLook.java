package org.bracewalk.ui.common;

import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.symbol.Symbol;

/**
 * How a frame member (a ledger or a standard segment) is drawn, told apart without colour: by line
 * weight, dash pattern, a doubled line, two damage ticks, the state's letter badge at its middle
 * (as on a brace, and in the PDF), or short end ticks with only a faint line between them. A member nobody recorded is drawn as the
 * design has it: the plain frame bar, or the end ticks of a member the design leaves out.
 */
public enum FrameLook {
  /** Not recorded, in the design: the plain frame bar. */
  AS_DESIGNED("as designed (not recorded)", null, 2.0, "#4a4a4a"),
  /** Recorded sound: a heavy solid bar. */
  SOUND("sound", null, 4.5, "#1b1b1b"),
  /** Recorded damaged, still effective: the heavy bar with two ticks across it. */
  DAMAGED_EFFECTIVE("damaged, still effective", null, 4.5, "#1b1b1b"),
  /** Damaged beyond use: long dashes with two ticks across (counts as missing). */
  DAMAGED_INEFFECTIVE("damaged beyond use", new double[] {10, 5}, 3.0, "#b3261e"),
  /** Missing: a dotted line with the badge M at its middle. */
  MISSING("missing", new double[] {2, 4}, 2.0, "#b3261e"),
  /** There although the design leaves it out: two thin parallel lines. */
  EXTRA("there, not in the design", null, 1.3, "#5b2a86"),
  /** Left out by the design: short ticks across both ends and a faint hairline between. */
  OMITTED("left out by the design", new double[] {1, 7}, 1.0, "#6b6b6b"),
  /** Recorded not inspected: dashes (as a panel's) with the question mark in a dashed ring. */
  NOT_INSPECTED("not inspected", new double[] {6, 4}, 2.0, "#6b6b6b"),
  /** Looked for but not reachable: dash-dot (as a panel's) with the badge R at its middle. */
  NOT_REACHABLE("not reachable", new double[] {8, 3, 1.5, 3}, 2.0, "#6b6b6b");

  private final String words;
  private final double[] dashes;
  private final double width;
  private final String colour;

  FrameLook(String words, double[] dashes, double width, String colour) {
    this.words = words;
    this.dashes = dashes;
    this.width = width;
    this.colour = colour;
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

  /** Two thin parallel lines (a member the design does not have). */
  public boolean doubled() {
    return this == EXTRA;
  }

  /** Two short strokes across the member (a dent or bend). */
  public boolean ticked() {
    return this == DAMAGED_EFFECTIVE || this == DAMAGED_INEFFECTIVE;
  }

  /**
   * The state's mark drawn at the member's middle, the same as a brace's and the PDF's ({@link
   * Symbol}), or {@code null} where the line style alone tells it (as designed, sound, left out by
   * the design).
   */
  public Symbol symbol() {
    return switch (this) {
      case DAMAGED_EFFECTIVE -> Symbol.STATE_DAMAGED;
      case DAMAGED_INEFFECTIVE -> Symbol.STATE_BEYOND_USE;
      case MISSING -> Symbol.STATE_MISSING;
      case EXTRA -> Symbol.STATE_EXTRA;
      case NOT_INSPECTED -> Symbol.STATE_NOT_INSPECTED;
      case NOT_REACHABLE -> Symbol.STATE_NOT_REACHABLE;
      case AS_DESIGNED, SOUND, OMITTED -> null;
    };
  }

  /** The letter of {@link #symbol()} ("?" for not inspected), or {@code null}. */
  public String badge() {
    Symbol s = symbol();
    return s == null ? null : s.glyph().substring(1, s.glyph().length() - 1);
  }

  /** Short strokes across both ends (left out by the design). */
  public boolean endTicks() {
    return this == OMITTED;
  }

  /** Drawn as the plain frame bar, nothing over it. */
  public boolean plain() {
    return this == AS_DESIGNED;
  }

  /**
   * The look of a frame member recorded in {@code state} ({@code null}: not recorded), where the
   * design has it ({@code inDesign}) or leaves it out. A member the design leaves out and found
   * sound is there although not designed; found missing it is simply as designed.
   */
  public static FrameLook of(PanelState state, boolean inDesign) {
    if (state == null) {
      return inDesign ? AS_DESIGNED : OMITTED;
    }
    return switch (state) {
      case SOUND -> inDesign ? SOUND : EXTRA;
      case DAMAGED_EFFECTIVE -> DAMAGED_EFFECTIVE;
      case DAMAGED_INEFFECTIVE -> DAMAGED_INEFFECTIVE;
      case MISSING -> inDesign ? MISSING : OMITTED;
      case EXTRA -> EXTRA;
      case NOT_INSPECTED -> NOT_INSPECTED;
      case NOT_REACHABLE -> NOT_REACHABLE;
    };
  }
}
