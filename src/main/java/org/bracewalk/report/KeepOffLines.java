package org.bracewalk.report;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.app.verdict.KeepOffZone;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.port.report.PlaneSection;

/**
 * The keep-off lines of page 1 of the report and of the top of the repair order: one per plane
 * whose one {@link Verdict} has a keep-off zone, naming the plane, its lifts and its bays, in the
 * template's words ({@code summary.alert.keepoff}). Both documents take them from here.
 */
final class KeepOffLines {
  private KeepOffLines() {}

  /** The one verdict on a plane of the document ("not yet inspected" when nothing is recorded). */
  static Verdict verdict(PlaneSection p) {
    return Verdict.of(p.analysis(), p.role(), !p.findings().isEmpty());
  }

  static List<String> of(List<PlaneSection> planes, Wording w) {
    List<String> lines = new ArrayList<>();
    for (PlaneSection p : planes) {
      verdict(p).keepOffZone().ifPresent(z -> lines.add(line(p, z, w)));
    }
    return lines;
  }

  /**
   * The lines that follow the keep-off lines on page 1: per plane, the joints with no sideways
   * restraint (an engineer's check before loading), then the loose member ends.
   */
  static List<String> restraint(List<PlaneSection> planes, Wording w) {
    List<String> lines = new ArrayList<>();
    for (PlaneSection p : planes) {
      List<Joint> restraint = joints(p, FreedomKind.LOST_RESTRAINT);
      if (!restraint.isEmpty()) {
        lines.add(w.format("summary.alert.restraint", "plane", p.name(), "joints",
            w.joints(restraint)));
      }
      List<Joint> loose = joints(p, FreedomKind.LOOSE_END);
      if (!loose.isEmpty()) {
        lines.add(w.format("summary.alert.loose", "plane", p.name(), "joints", w.joints(loose)));
      }
    }
    return lines;
  }

  private static List<Joint> joints(PlaneSection p, FreedomKind kind) {
    return FrameLooks.freedoms(p, kind).stream().flatMap(f -> f.joints().stream()).sorted()
        .distinct().toList();
  }

  private static String line(PlaneSection p, KeepOffZone z, Wording w) {
    return w.format(z.offloadBeside() ? "summary.alert.keepoff.beside" : "summary.alert.keepoff",
        "plane", p.name(), "lifts", w.numbered("lift", z.lifts(), p.design().grid().lifts()),
        "bays", w.numbered("bay", z.bays(), p.design().grid().bays()));
  }
}
