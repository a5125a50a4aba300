package org.bracewalk.ui.common;

/** The screens of the app, in the order of the side rail; each has a Ctrl+digit key. */
public enum ScreenId {
  OVERVIEW("Sites", "overview", "1"),
  DESIGN("Design", "design", "2"),
  WALK("Walk-round", "walk", "3"),
  FINDINGS("Findings", "findings", "4"),
  HISTORY("History", "history", "5");

  private final String title;
  private final String slug;
  private final String digit;

  ScreenId(String title, String slug, String digit) {
    this.title = title;
    this.slug = slug;
    this.digit = digit;
  }

  public String title() {
    return title;
  }

  /** The name used by {@code bracewalk snapshot --screen}. */
  public String slug() {
    return slug;
  }

  /** The digit of its Ctrl+digit key. */
  public String digit() {
    return digit;
  }
}
