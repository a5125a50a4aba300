package org.bracewalk.core.analysis;

/**
 * The three kinds of freedom a plane can have ({@code shared/design/analysis.md}, "Frame members"),
 * told apart because each asks for a different response on site.
 */
public enum FreedomKind {
  /** A part of the plane sways: a region of joints moves together. Keep people and loads off. */
  SWAY("sway"),
  /**
   * A joint where the only members run in one straight line (a standard or ledger running through
   * with nothing holding it sideways): its unbraced length grows. Not a collapse mechanism of a
   * continuous member by itself; an engineer checks it before loading.
   */
  LOST_RESTRAINT("lost-restraint"),
  /** A joint held by one member only: a loose member end. */
  LOOSE_END("loose-end");

  private final String label;

  FreedomKind(String label) {
    this.label = label;
  }

  /** The JSON spelling. */
  public String label() {
    return label;
  }
}
