package org.bracewalk.cli;

import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.app.verdict.VerdictKind;
import java.io.PrintWriter;
import java.time.ZoneId;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.FrameChange;
import org.bracewalk.app.PanelChange;
import org.bracewalk.app.PlaneHistory;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code history --plane ID}: a plane across inspections and what changed each time. */
@Command(name = "history", mixinStandardHelpOptions = true,
    description = "A plane across the inspections of its structure, oldest first: the verdict"
        + " each time, and which panels and frame members changed since the previous"
        + " inspection.")
final class HistoryCommand extends StoreCommand {
  @Option(names = "--plane", required = true, description = "The plane's id (see 'plane list').")
  long plane;

  HistoryCommand(CliContext context) {
    super(context);
  }

  static String finding(PanelFinding f) {
    if (f == null) {
      return "not inspected";
    }
    return f.state().label() + (f.memberFound() == null ? "" : " (" + f.memberFound().token() + ")");
  }

  /** A frame member's recorded state; one not recorded is taken as designed. */
  static String frameState(PanelState s) {
    return s == null ? "not recorded (as designed)" : s.label();
  }

  /** The one verdict's words ({@link Verdict}), with its keep-off zone when it has one. */
  static String verdict(Verdict v) {
    String freedoms = v.kind() == VerdictKind.HOLDS || v.kind() == VerdictKind.NOT_INSPECTED ? ""
        : ", " + v.degreesOfFreedom() + (v.degreesOfFreedom() == 1 ? " degree" : " degrees") + " of freedom";
    return v.headline() + freedoms + (v.keepOffZone().isPresent() ? " (" + v.keepOff() + ")" : "");
  }

  @Override
  int run(AppServices s, PrintWriter out, PrintWriter err) {
    PlaneHistory history = s.history().history(plane);
    PlaneRecord p = history.plane();
    Structure st = s.sites().structure(p.structureId());
    ZoneId zone = s.sites().site(st.siteId()).timeZone();
    out.println(Show.plane(p) + " of structure " + st.id() + " '" + st.name() + "'");
    if (history.entries().isEmpty()) {
      out.println("not inspected yet");
      return 0;
    }
    Long previous = null;
    for (PlaneHistory.Entry e : history.entries()) {
      int inspected = (int) e.findings().values().stream().filter(f -> f.state().inspected()).count();
      out.println();
      out.println("inspection " + e.inspection().id() + " (" + e.inspection().reason().label()
          + ", " + e.inspection().status().label() + ", started "
          + Show.time(e.inspection().startedAt(), zone) + "), design revision "
          + e.design().number() + ": " + verdict(e.summary()) + "; " + inspected + " of "
          + p.grid().panelCount() + " panels inspected");
      if (previous != null) {
        if (e.changes().isEmpty() && e.frameChanges().isEmpty()) {
          out.println("  no change since inspection " + previous);
        } else {
          out.println("  changed since inspection " + previous + ":");
          for (PanelChange c : e.changes()) {
            out.println("    " + c.panel() + ": " + finding(c.before()) + " -> " + finding(c.after()));
          }
          for (FrameChange c : e.frameChanges()) {
            out.println("    " + c.member() + ": " + frameState(c.before()) + " -> "
                + frameState(c.after()));
          }
        }
      }
      previous = e.inspection().id();
    }
    return 0;
  }
}
