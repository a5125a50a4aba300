package org.bracewalk.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.model.PlaneRecord;

/**
 * How far an inspection has got with one of its planes: how many of its panels somebody has looked
 * at (any mark but a withdrawn one; "not reachable" counts as looked at, though not as inspected),
 * how many it has, and its verdict as recorded so far. What every plane chooser shows, and what
 * the warning before finalising names.
 *
 * @param plane the plane
 * @param lookedAt panels with a mark in force
 * @param notReachable of those, panels marked not reachable
 * @param total the plane's panels
 * @param verdict the verdict on the records so far
 */
public record PlaneProgress(PlaneRecord plane, int lookedAt, int notReachable, int total, VerdictKind verdict) {
  public PlaneProgress {
    Objects.requireNonNull(plane, "plane");
    Objects.requireNonNull(verdict, "verdict");
    if (lookedAt < 0 || lookedAt > total || notReachable < 0 || notReachable > lookedAt) {
      throw new IllegalArgumentException("plane '" + plane.name() + "': " + lookedAt + " of " + total
          + " panels looked at, " + notReachable + " not reachable");
    }
  }

  /** Panels nobody has looked at yet. */
  public int notLookedAt() {
    return total - lookedAt;
  }

  /** "15 of 50 panels". */
  public String countWords() {
    return lookedAt + " of " + total + (total == 1 ? " panel" : " panels");
  }

  /** The plane's name, its count and its verdict in one line, for a chooser. */
  public String line() {
    return plane.name() + " \u2014 " + countWords() + " \u2014 " + verdict.headline();
  }

  /**
   * The warning before finalising: each plane with panels nobody has looked at, named with how many
   * (and those not reachable, which count as not inspected too); empty when there is none.
   */
  public static String finaliseWarning(List<PlaneProgress> planes) {
    List<String> lines = new ArrayList<>();
    for (PlaneProgress p : planes) {
      List<String> parts = new ArrayList<>();
      if (p.notLookedAt() > 0) {
        parts.add(p.notLookedAt() + " of " + p.total() + (p.total() == 1 ? " panel" : " panels")
            + " nobody has looked at");
      }
      if (p.notReachable() > 0) {
        parts.add(p.notReachable() + " not reachable");
      }
      if (!parts.isEmpty()) {
        lines.add("plane '" + p.plane().name() + "': " + String.join(", ", parts));
      }
    }
    if (lines.isEmpty()) {
      return "";
    }
    return "Not every panel was inspected:\n  " + String.join("\n  ", lines)
        + "\nThe report counts those panels as missing. Walk them first (Ctrl+3, Ctrl+P chooses the"
        + " plane), or finalise knowing they are not inspected.";
  }
}
