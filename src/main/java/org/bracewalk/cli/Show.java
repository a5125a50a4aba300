package org.bracewalk.cli;

import java.time.Instant;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;

/** How records are shown on the command line. Times in the site's zone, stored as UTC. */
final class Show {
  private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

  private Show() {}

  static String time(Instant at, ZoneId zone) {
    return at == null ? "-" : WHEN.format(at.atZone(zone)) + " " + zone.getId();
  }

  static String grid(PlaneGrid g) {
    return g.lifts() + (g.lifts() == 1 ? " lift x " : " lifts x ") + g.bays()
        + (g.bays() == 1 ? " bay, " : " bays, ") + g.support().label();
  }

  static String plane(PlaneRecord p) {
    return "plane " + p.id() + " '" + p.name() + "' (" + grid(p.grid()) + ")";
  }

  static String inspection(Inspection i, ZoneId zone) {
    return "inspection " + i.id() + ": " + i.reason().label() + ", " + i.status().label()
        + ", started " + time(i.startedAt(), zone)
        + (i.finishedAt() == null ? "" : ", finished " + time(i.finishedAt(), zone))
        + ", by " + i.inspectorName();
  }

  /** What an observation is of: its panel, or its frame member. */
  static String where(Observation o) {
    return o.panel() != null ? o.panel().toString() : o.frameMember().toString();
  }

  static String observation(Observation o, String planeName) {
    StringBuilder b = new StringBuilder("observation ").append(o.id()).append(" recorded: ")
        .append(planeName).append(", ").append(where(o)).append(", ").append(o.state().label());
    if (o.memberFound() != null) {
      b.append(" (member ").append(o.memberFound().token()).append(')');
    }
    if (o.bowMm() != null) {
      b.append(", bow ").append(o.bowMm()).append(" mm over ").append(o.gaugeLengthMm()).append(" mm");
    }
    if (o.supersedes() != null) {
      b.append(", corrects observation ").append(o.supersedes());
    }
    return b.toString();
  }
}
