package org.bracewalk.ui.common;

/**
 * The four verdicts a plane can be shown with. Each has its own symbol and word, so none depends
 * on colour.
 */
public enum VerdictKind {
  /** Rigid even with every panel not inspected counted as missing. */
  HOLDS("Holds its shape", "\u25A0"),
  /** Rigid only if the panels not yet inspected turn out as designed. */
  DEPENDS_ON_UNSEEN("Depends on panels not inspected", "\u25D1"),
  /** Rigid as far as the rigid members go, but tension-only members let it sway one way. */
  SWAYS_ONE_WAY("Lost rigidity: sways one way", "\u25B2"),
  /** Not rigid whatever the panels not yet seen turn out to be. */
  LOST("Lost rigidity", "\u25B2"),
  /** No inspection recorded. */
  NOT_INSPECTED("Not inspected", "\u25CB");

  private final String words;
  private final String symbol;

  VerdictKind(String words, String symbol) {
    this.words = words;
    this.symbol = symbol;
  }

  public String words() {
    return words;
  }

  /** A symbol that tells the verdicts apart without colour. */
  public String symbol() {
    return symbol;
  }

  public boolean lost() {
    return this == LOST || this == SWAYS_ONE_WAY;
  }
}
