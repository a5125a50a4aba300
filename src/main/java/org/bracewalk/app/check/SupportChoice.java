package org.bracewalk.app.check;

/** Where the support used came from, so the output can say so. */
public enum SupportChoice {
  /** Given on the command line: it overrides the maps. */
  OPTION("chosen with --support"),
  /** Stated in the design map's header. */
  DESIGN_HEADER("from the design map's header"),
  /** Neither: the contract's default, {@code pinned-base}. */
  DEFAULT("the default: no support stated");

  private final String description;

  SupportChoice(String description) {
    this.description = description;
  }

  public String description() {
    return description;
  }
}
