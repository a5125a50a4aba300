package org.bracewalk.app.verdict;

import org.bracewalk.core.symbol.Symbol;

/**
 * The six verdicts a plane can have, each with its own code (the report template's key), words
 * and symbol, so none depends on colour. Never "safe": holding its shape is a statement about
 * bracing continuity only.
 */
public enum VerdictKind {
  /** Rigid even with every panel not inspected counted as missing. */
  HOLDS("holds-shape", "Holds its shape", Symbol.HOLDS_SHAPE),
  /** Not rigid with the panels not inspected counted as missing, rigid if they are as designed. */
  DEPENDS_ON_UNSEEN("depends-on-uninspected", "Depends on panels not inspected", Symbol.DEPENDS_ON_UNSEEN),
  /** No free motion with members taken as rigid, but tension-only members let it lean one way. */
  SWAYS_ONE_WAY("one-way", "Lost rigidity: sways one way only", Symbol.LOST_RIGIDITY),
  /**
   * Its only freedoms are joints where a standard or ledger runs straight through with nothing
   * holding it sideways ({@code shared/design/analysis.md}, "Frame members"): no part sways, but
   * the member's unbraced length has grown; an engineer checks it before loading. Never "holds its
   * shape": the pin-jointed model counts each such joint as a freedom.
   */
  LOST_RESTRAINT(
      "lost-restraint", "Lost sideways restraint: an engineer checks it before loading", Symbol.LOST_RESTRAINT),
  /** Not rigid whatever the panels not yet seen turn out to be. */
  LOST("lost-rigidity", "Lost rigidity", Symbol.LOST_RIGIDITY),
  /** Nothing recorded for this plane yet. */
  NOT_INSPECTED("not-inspected", "Not yet inspected", Symbol.NOT_INSPECTED);

  private final String code;
  private final String words;
  private final String symbol;

  VerdictKind(String code, String words, Symbol symbol) {
    this.code = code;
    this.words = words;
    this.symbol = symbol.glyph();
  }

  /** A stable code: the report template's key is {@code verdict.<code>}. */
  public String code() {
    return code;
  }

  public String words() {
    return words;
  }

  /** A symbol that tells the verdicts apart without colour. */
  public String symbol() {
    return symbol;
  }

  /** {@code ▲ Lost rigidity}. */
  public String headline() {
    return symbol + " " + words;
  }

  /**
   * Something in the plane can move now in the pin-jointed model: lost rigidity either way, or a
   * member without sideways restraint. Each has a keep-off zone and needs a competent person (and
   * for lost restraint an engineer) before the part is loaded again.
   */
  public boolean lost() {
    return this == LOST || this == SWAYS_ONE_WAY || this == LOST_RESTRAINT;
  }

  /**
   * Worst first: lost, sways one way, lost sideways restraint, depends on unseen panels, not
   * inspected, holds.
   */
  public int severity() {
    return switch (this) {
      case HOLDS -> 0;
      case NOT_INSPECTED -> 1;
      case DEPENDS_ON_UNSEEN -> 2;
      case LOST_RESTRAINT -> 3;
      case SWAYS_ONE_WAY -> 4;
      case LOST -> 5;
    };
  }

  /** The worse of two verdicts; {@code a} may be null. */
  public static VerdictKind worse(VerdictKind a, VerdictKind b) {
    return a == null || b.severity() > a.severity() ? b : a;
  }
}
