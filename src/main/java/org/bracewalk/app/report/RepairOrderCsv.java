package org.bracewalk.app.report;

import java.util.List;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.port.report.RepairStep;

/**
 * The repair plan as CSV (RFC 4180, UTF-8, CRLF line ends), one row per step in working order.
 * Columns, documented in README.md: {@code number, plane, lift, bay, lifts, action, member, kind,
 * urgency, due, deviation, done_by, done_date, level, line} ({@code done_by} and {@code done_date}
 * left empty for the crew). A frame member's row names it as the check contract does: a ledger by
 * {@code level} and {@code bay} ({@code lift} empty), a standard by {@code lift} and {@code line}
 * ({@code bay} empty); its {@code member} is {@code ledger} or {@code standard} and its {@code kind}
 * is empty. A panel's row leaves {@code level} and {@code line} empty.
 */
public final class RepairOrderCsv {
  /** The header row's columns. */
  public static final List<String> COLUMNS = List.of("number", "plane", "lift", "bay", "lifts",
      "action", "member", "kind", "urgency", "due", "deviation", "done_by", "done_date", "level",
      "line");

  private RepairOrderCsv() {}

  public static String write(List<RepairStep> steps) {
    StringBuilder sb = new StringBuilder();
    row(sb, COLUMNS);
    for (RepairStep s : steps) {
      FrameRef f = s.frameMember();
      String lift = f == null ? String.valueOf(s.panel().lift()) : f.isLedger() ? "" : String.valueOf(f.first());
      String bay = f == null ? String.valueOf(s.panel().bay()) : f.isLedger() ? String.valueOf(f.second()) : "";
      String member = f != null ? f.type().label()
          : s.member() == null ? "" : s.member().diagonal().symbol();
      row(sb, List.of(
          String.valueOf(s.number()),
          s.plane(),
          lift,
          bay,
          String.join(" ", s.lifts().stream().map(String::valueOf).toList()),
          s.type().code(),
          member,
          f != null || s.member() == null ? "" : s.member().kind().label(),
          s.priority().code(),
          s.dueDate() == null ? "" : s.dueDate().toString(),
          String.valueOf(s.deviation()),
          "",
          "",
          f != null && f.isLedger() ? String.valueOf(f.first()) : "",
          f != null && !f.isLedger() ? String.valueOf(f.second()) : ""));
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
