package org.bracewalk.app.report;

import java.util.List;
import org.bracewalk.core.port.report.RepairStep;

/**
 * The repair plan as CSV (RFC 4180, UTF-8, CRLF line ends), one row per step in working order.
 * Columns, documented in README.md: {@code number, plane, lift, bay, lifts, action, member, kind,
 * urgency, due, deviation, done_by, done_date} (the last two left empty for the crew).
 */
public final class RepairOrderCsv {
  /** The header row's columns. */
  public static final List<String> COLUMNS = List.of("number", "plane", "lift", "bay", "lifts",
      "action", "member", "kind", "urgency", "due", "deviation", "done_by", "done_date");

  private RepairOrderCsv() {}

  public static String write(List<RepairStep> steps) {
    StringBuilder sb = new StringBuilder();
    row(sb, COLUMNS);
    for (RepairStep s : steps) {
      row(sb, List.of(
          String.valueOf(s.number()),
          s.plane(),
          String.valueOf(s.panel().lift()),
          String.valueOf(s.panel().bay()),
          String.join(" ", s.lifts().stream().map(String::valueOf).toList()),
          s.type().code(),
          s.member() == null ? "" : s.member().diagonal().symbol(),
          s.member() == null ? "" : s.member().kind().label(),
          s.priority().code(),
          s.dueDate() == null ? "" : s.dueDate().toString(),
          String.valueOf(s.deviation()),
          "",
          ""));
    }
    return sb.toString();
  }

  private static void row(StringBuilder sb, List<String> cells) {
    for (int i = 0; i < cells.size(); i++) {
      if (i > 0) {
        sb.append(',');
      }
      String c = cells.get(i);
      if (c.indexOf(',') >= 0 || c.indexOf('"') >= 0 || c.indexOf('\n') >= 0
          || c.indexOf('\r') >= 0) {
        sb.append('"').append(c.replace("\"", "\"\"")).append('"');
      } else {
        sb.append(c);
      }
    }
    sb.append("\r\n");
  }
}
