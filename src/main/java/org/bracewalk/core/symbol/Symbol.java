package org.bracewalk.core.symbol;

import java.util.List;

/**
 * Every symbol Bracewalk shows, each with one shape and one meaning, in the app and in the PDF
 * alike. A shape stands for one thing only: a diamond is always a critical member, a ring with a
 * number a brace to fit where the design has one, a square with a number a brace in a new
 * position, a filled triangle always lost rigidity. Each state as found has its own mark: the
 * walk-round key's letter in a rounded box (filled where the member no longer counts), and for a
 * member nobody has looked at a question mark in a dashed ring, so "not inspected" and "not
 * reachable" never look alike. The painters in {@code ui.common} and {@code
 * report} draw each shape from this list, and the README's table of symbols is checked against it.
 * The shapes are the project's own.
 */
public enum Symbol {
  // verdicts and dates, in text
  HOLDS_SHAPE("\u25A0", "filled square", "verdict: holds its shape (bracing continuity only, never a"
      + " statement that the structure is safe)", Where.TEXT),
  DEPENDS_ON_UNSEEN("\u25D1", "half-filled circle", "verdict: depends on panels not inspected yet",
      Where.TEXT),
  LOST_RIGIDITY("\u25B2", "filled triangle", "verdict: lost rigidity (also: sways one way only);"
      + " keep people and loads off the zone named", Where.TEXT),
  LOST_RESTRAINT("\u25B3", "open triangle", "verdict: lost sideways restraint; an engineer checks"
      + " the member before loading", Where.TEXT),
  NOT_INSPECTED("\u25CB", "ring", "not inspected yet (a verdict, or a structure never inspected)",
      Where.TEXT),
  IN_TIME("\u2713", "tick", "next routine inspection not yet due", Where.TEXT),
  DUE_TODAY("\u25B7", "open arrowhead", "next routine inspection due today", Where.TEXT),
  OVERDUE("\u25F7", "clock face", "routine inspection overdue", Where.TEXT),
  // on the drawings
  STATE_SOUND("[S]", "letter S in a rounded box", "found sound (the page draws a sound member"
      + " solid, with no letter)", Where.APP),
  STATE_DAMAGED("[D]", "letter D in a rounded box", "damaged, still effective: it counts",
      Where.BOTH),
  STATE_BEYOND_USE("[U]", "letter U in a filled rounded box", "damaged beyond use: counts as"
      + " missing", Where.BOTH),
  STATE_MISSING("[M]", "letter M in a filled rounded box", "missing", Where.BOTH),
  STATE_EXTRA("[E]", "letter E in a rounded box", "extra: there although the design has none",
      Where.BOTH),
  STATE_NOT_REACHABLE("[R]", "letter R in a rounded box", "looked for but not reachable: counts"
      + " as not inspected", Where.BOTH),
  STATE_NOT_INSPECTED("(?)", "question mark in a dashed ring", "not inspected yet: nobody has"
      + " looked (counts as missing)", Where.BOTH),
  CRITICAL("\u25C6", "filled diamond", "critical brace or frame member: its loss alone lets the"
      + " plane move", Where.BOTH),
  REPAIR_IN_DESIGN("(1)", "ring with a number", "brace or member to fit where the design has one"
      + " (its number in the repair list)", Where.BOTH),
  REPAIR_NEW_POSITION("[1]", "square with a number", "brace to fit in a new position: an engineer"
      + " decides", Where.BOTH),
  JOINT_UNRESTRAINED("(\u2194)", "ring with a two-headed arrow", "joint with nothing holding it"
      + " sideways", Where.BOTH),
  LOOSE_END("\u25CF", "filled dot on the joint", "member end held by nothing else", Where.BOTH),
  SWAYING("\u2194", "hatching, and a two-headed arrow by the lift number", "a part that can sway"
      + " (lettered A, B ... on the page)", Where.BOTH),
  OPENING("\u2229", "dashed arch", "opening: never braced", Where.BOTH),
  CHANGED("\u2731", "dashed panel frame with a six-spoked star", "changed since the previous"
      + " inspection (History)", Where.APP);

  /** Where a symbol appears. */
  public enum Where {
    /** In words: verdict lines, the History timeline, the Sites list, the report's text. */
    TEXT("text"),
    /** Drawn in the app and on the PDF's elevations. */
    BOTH("app and PDF"),
    /** Drawn in the app only. */
    APP("app");

    private final String words;

    Where(String words) {
      this.words = words;
    }

    public String words() {
      return words;
    }
  }

  private final String glyph;
  private final String shape;
  private final String meaning;
  private final Where where;

  Symbol(String glyph, String shape, String meaning, Where where) {
    this.glyph = glyph;
    this.shape = shape;
    this.meaning = meaning;
    this.where = where;
  }

  /** The symbol as text (a character, or a few standing for a drawn shape). */
  public String glyph() {
    return glyph;
  }

  /** The shape in words; no two symbols share one. */
  public String shape() {
    return shape;
  }

  public String meaning() {
    return meaning;
  }

  public Where where() {
    return where;
  }

  /** The README's table row for this symbol. */
  public String readmeRow() {
    return "| " + glyph + " | " + shape + " | " + meaning + " | " + where.words() + " |";
  }

  /** The README's table, header first. */
  public static List<String> readmeTable() {
    List<String> rows = new java.util.ArrayList<>();
    rows.add("| symbol | shape | meaning | where |");
    rows.add("| --- | --- | --- | --- |");
    for (Symbol s : values()) {
      rows.add(s.readmeRow());
    }
    return List.copyOf(rows);
  }
}
