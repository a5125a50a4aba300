package org.bracewalk.ui.sites;

import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.symbol.Symbol;

/**
 * One line of the overview: a site, a structure or a plane.
 *
 * @param level what the line is
 * @param name its name
 * @param kind structure kind or plane size, as words
 * @param verdict the latest verdict (planes, and the worst of a structure's planes)
 * @param verdictText the verdict in words, with its symbol
 * @param lastInspected when the last finalised inspection finished, in the site's time zone
 * @param nextDue when the next routine inspection is due, with its status in words
 * @param due how the due date stands
 * @param interval the structure's interval between routine inspections, as words
 * @param structureId the structure (0 for a site line)
 * @param planeId the plane (0 unless a plane line)
 * @param openInspectionId the structure's open inspection, 0 when none
 * @param latestInspectionId the structure's latest inspection, 0 when none
 */
public record OverviewRow(
    Level level,
    String name,
    String kind,
    VerdictKind verdict,
    String verdictText,
    String lastInspected,
    String nextDue,
    Due due,
    String interval,
    long structureId,
    long planeId,
    long openInspectionId,
    long latestInspectionId) {

  /** What a line stands for. */
  public enum Level {
    SITE,
    STRUCTURE,
    PLANE
  }

  /** How the next routine inspection stands; each has a word and a symbol, not only a colour. */
  public enum Due {
    NOT_APPLICABLE(""),
    NEVER_INSPECTED(Symbol.NOT_INSPECTED.glyph() + " never inspected"),
    IN_TIME(Symbol.IN_TIME.glyph() + " in time"),
    DUE_TODAY(Symbol.DUE_TODAY.glyph() + " due today"),
    OVERDUE(Symbol.OVERDUE.glyph() + " OVERDUE"),
    /** The date is not past, but a plane has lost rigidity: never a tick beside that. */
    LOST_RIGIDITY(Symbol.LOST_RIGIDITY.glyph() + " lost rigidity: act and re-inspect now");

    private final String words;

    Due(String words) {
      this.words = words;
    }

    public String words() {
      return words;
    }
  }
}
