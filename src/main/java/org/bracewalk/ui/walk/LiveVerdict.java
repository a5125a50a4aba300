package org.bracewalk.ui.walk;

import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.PanelFinding;
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
    StateAnalysis conservative = analyzer.analyseState(design.grid(), marks.conservativeMembers());
    int total = design.grid().panelCount();
    int inspected = 0;
    for (PanelFinding f : marks.findingMap().values()) {
      if (f.state().inspected()) {
        inspected++;
      }
    }
    int unknown = total - inspected;
    StateAnalysis seen = unknown > 0 ? analyzer.analyseState(design.grid(), marks.seenMembers()) : conservative;
    int count = marks.findingMap().size();
    done.set(count);
    progressText.set(count + " of " + total + " panels");
    int repairCount = seen.rigid() ? 0 : Math.max(1, seen.degreesOfFreedom());
    Verdict one = Verdict.classify(design.grid(), role, conservative, unknown, seen.rigid());
    VerdictWords words = VerdictWords.of(one, conservative, repairCount);
    verdict.set(words);
    alarm.set(words.alarm(title));
    lastSeen = seen;
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
