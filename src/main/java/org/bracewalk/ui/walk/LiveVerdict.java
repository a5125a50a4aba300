package org.bracewalk.ui.walk;

import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.bracewalk.app.verdict.Verdict;
import java.util.Set;
import org.bracewalk.core.analysis.BuiltFrame;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.ui.common.VerdictWords;

/**
 * The verdict drawn while walking (through {@code app.verdict}), the alarm banner, and the
 * progress. One job: what the marks so far prove.
 */
final class LiveVerdict {
  private final PlaneDesign design;
  private final String title;
  private final PlaneRole role;
  private final PlaneAnalyzer analyzer;
  private final ReadOnlyObjectWrapper<VerdictWords> verdict = new ReadOnlyObjectWrapper<>(this, "verdict");
  private final ReadOnlyStringWrapper alarm = new ReadOnlyStringWrapper(this, "alarm", "");
  private final ReadOnlyStringWrapper progressText = new ReadOnlyStringWrapper(this, "progressText");
  private final ReadOnlyIntegerWrapper done = new ReadOnlyIntegerWrapper(this, "done");
  private StateAnalysis lastSeen;

  LiveVerdict(PlaneDesign design, String title, PlaneRole role, PlaneAnalyzer analyzer) {
    this.design = design;
    this.title = title;
    this.role = role;
    this.analyzer = analyzer;
  }

  /**
   * Draws the verdict again from {@code marks}. Per keystroke only the two verdicts are needed (a
   * fraction of a millisecond each on the member maps kept up to date panel by panel); the repair
   * plan is worked out when asked for, as it costs far more.
   */
  void update(MarkedPanels marks) {
    update(marks, new MarkedFrame(design, java.util.List.of()), false);
  }

  /**
   * As above, with the marks on frame members: where a member is absent the state goes to the
   * engine's framework analysis ({@link BuiltFrame}), else to the brace graph as before.
   *
   * @param frameInWalk whether the walk takes in every frame member (the progress then counts them)
   */
  void update(MarkedPanels marks, MarkedFrame frame, boolean frameInWalk) {
    Set<FrameRef> absentNow = frame.absent(true);
    StateAnalysis conservative = analyse(marks.conservativeMembers(), absentNow);
    int total = design.grid().panelCount();
    int inspected = 0;
    for (PanelFinding f : marks.findingMap().values()) {
      if (f.state().inspected()) {
        inspected++;
      }
    }
    int unknownPanels = total - inspected;
    int unknownFrame = frame.unknown();
    int unknown = unknownPanels + unknownFrame;
    StateAnalysis seen = unknown > 0 ? analyse(marks.seenMembers(), frame.absent(false)) : conservative;
    int count = marks.findingMap().size();
    done.set(count);
    int members = frame.states().size();
    String frameText;
    if (frameInWalk) {
      frameText = ", " + members + " of " + frameMembers(design.grid()) + " ledgers and standards";
    } else if (members > 0) {
      frameText = ", " + members + (members == 1 ? " ledger or standard" : " ledgers and standards") + " marked";
    } else {
      frameText = "";
    }
    int lost = frame.lost();
    progressText.set(count + " of " + total + " panels" + frameText + (lost > 0 ? " (" + lost + " missing or beyond use)" : ""));
    int repairCount = seen.rigid() ? 0 : Math.max(1, seen.degreesOfFreedom());
    Verdict one = Verdict.classify(design.grid(), role, conservative, unknownPanels, unknownFrame, seen.rigid());
    VerdictWords words = VerdictWords.of(one, conservative, repairCount, absentNow);
    verdict.set(words);
    alarm.set(words.alarm(title));
    lastSeen = seen;
  }

  /** Every ledger and standard of a grid. */
  static int frameMembers(org.bracewalk.core.model.PlaneGrid g) {
    return (g.lifts() + 1) * g.bays() + g.lifts() * (g.bays() + 1);
  }

  private StateAnalysis analyse(java.util.Map<PanelRef, Brace> members, Set<FrameRef> absent) {
    return absent.isEmpty()
        ? analyzer.analyseState(design.grid(), members)
        : analyzer.analyseState(new BuiltFrame(design.grid(), members, absent));
  }

  /** The analysis of the plane as seen so far (panels not yet seen as designed), or null before any. */
  StateAnalysis lastSeen() {
    return lastSeen;
  }

  ReadOnlyObjectProperty<VerdictWords> verdictProperty() {
    return verdict.getReadOnlyProperty();
  }

  ReadOnlyStringProperty alarmProperty() {
    return alarm.getReadOnlyProperty();
  }

  ReadOnlyStringProperty progressTextProperty() {
    return progressText.getReadOnlyProperty();
  }

  ReadOnlyIntegerProperty doneProperty() {
    return done.getReadOnlyProperty();
  }
}
