package org.bracewalk.ui.history;

import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.Executor;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.app.HistoryService;
import org.bracewalk.app.PanelChange;
import org.bracewalk.app.PlaneHistory;
import org.bracewalk.app.SiteService;
import org.bracewalk.app.FrameChange;
import org.bracewalk.app.verdict.Terms;
import org.bracewalk.app.verdict.Wording;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.app.verdict.VerdictKind;

/** A plane across the inspections of its structure; the chosen one drawn with its changes marked. */
public final class HistoryViewModel {
  private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

  /** Null until read. */
  private PlaneHistory history;
  private ZoneId zone;
  /** The trade's words for the plane's frame members (ledger, beam...). */
  private Terms terms = Terms.SCAFFOLD;
  private final ReadOnlyStringWrapper planeName = new ReadOnlyStringWrapper(this, "planeName", "");
  private final ObservableList<String> entries = FXCollections.observableArrayList();
  private final ObservableList<String> changes = FXCollections.observableArrayList();
  private final IntegerProperty chosen = new SimpleIntegerProperty(this, "chosen", -1);
  private final ReadOnlyObjectWrapper<PlanePicture> picture = new ReadOnlyObjectWrapper<>(this, "picture");
  private final ReadOnlyStringWrapper heading = new ReadOnlyStringWrapper(this, "heading", "");
  private final ReadOnlyStringWrapper timeline = new ReadOnlyStringWrapper(this, "timeline", "");

  /**
   * Reads the plane's history on {@code background} and shows it through {@code ui}; until then
   * the heading says it is being read.
   *
   * @param histories a plane across inspections
   * @param sites for the site's time zone
   * @param ui runs on the toolkit's thread (tests: same thread)
   * @param background runs the database work (tests: same thread)
   * @param planeId the plane shown
   */
  public HistoryViewModel(HistoryService histories, SiteService sites, Executor ui, Executor background, long planeId) {
    Objects.requireNonNull(histories, "histories");
    Objects.requireNonNull(sites, "sites");
    Objects.requireNonNull(ui, "ui");
    chosen.addListener((o, a, b) -> show(b.intValue()));
    heading.set("Reading the history of plane " + planeId + " from the database\u2026");
    background.execute(() -> {
      PlaneHistory read;
      ZoneId tz;
      Terms words;
      try {
        read = histories.history(planeId);
        var structure = sites.structure(read.plane().structureId());
        tz = sites.site(structure.siteId()).timeZone();
        words = Terms.of(structure.kind(), read.plane().role());
      } catch (RuntimeException e) {
        ui.execute(() -> heading.set("The history of plane " + planeId + " could not be read from the database ("
            + e.getMessage() + "). Open History again (Ctrl+5) to retry."));
        return;
      }
      ui.execute(() -> {
        terms = words;
        loaded(read, tz);
      });
    });
  }

  private void loaded(PlaneHistory read, ZoneId tz) {
    this.history = read;
    this.zone = tz;
    planeName.set(read.plane().name());
    StringBuilder line = new StringBuilder();
    for (PlaneHistory.Entry e : history.entries()) {
      VerdictKind k = kind(e);
      entries.add("#" + e.inspection().id() + "  " + WHEN.format(e.inspection().startedAt().atZone(zone))
          + "  " + e.inspection().reason().label().replace('-', ' ')
          + (e.inspection().isFinalised() ? "" : " (open)")
          + "\n" + k.symbol() + " " + k.words() + " \u00b7 "
          + (entries.isEmpty() ? "first inspection" : changeCount(e)));
      if (line.length() > 0) {
        line.append("  \u2192  ");
      }
      line.append(k.symbol()).append(" #").append(e.inspection().id());
    }
    timeline.set(line.length() == 0 ? "No inspections yet." : line.toString());
    chosen.set(history.entries().size() - 1);
    if (history.entries().isEmpty()) {
      heading.set(read.plane().name() + ": not inspected yet.");
    }
  }

  /** "3 changes", "1 change", with frame members counted: "2 changes (1 frame member)". */
  static String changeCount(PlaneHistory.Entry e) {
    int all = e.changes().size() + e.frameChanges().size();
    int frame = e.frameChanges().size();
    return all + (all == 1 ? " change" : " changes")
        + (frame == 0 ? "" : " (" + frame + (frame == 1 ? " frame member)" : " frame members)"));
  }

  static VerdictKind kind(PlaneHistory.Entry e) {
    return e.summary().kind();
  }

  private void show(int i) {
    if (history == null || i < 0 || i >= history.entries().size()) {
      return;
    }
    PlaneHistory.Entry e = history.entries().get(i);
    Set<PanelRef> changed = new HashSet<>();
    changes.clear();
    for (PanelChange c : e.changes()) {
      changed.add(c.panel());
      changes.add(c.panel() + ": " + words(c.before()) + " \u2192 " + words(c.after()));
    }
    Set<FrameRef> changedMembers = new HashSet<>();
    if (i > 0) {
      for (FrameChange c : e.frameChanges()) {
        changedMembers.add(c.member());
        changes.add(Wording.frameMember(c.member(), terms) + ": " + words(c.before()) + " \u2192 "
            + words(c.after()));
      }
    }
    if (changes.isEmpty()) {
      changes.add(i == 0 ? "The first inspection of this plane: nothing to compare with."
          : "No panel or frame member changed.");
    }
    java.util.Map<PanelRef, PanelFinding> shown = new java.util.HashMap<>();
    e.findings().forEach((p, f) -> {
      if (f.state() != PanelState.NOT_INSPECTED) {
        shown.put(p, f);
      }
    });
    picture.set(new PlanePicture(e.design().design(), shown, true, e.verdict().blocks(),
        Set.copyOf(e.verdict().criticalBraces()), List.of(), changed, null, e.frameFindings(), null,
        e.verdict().freedoms(), List.of(), changedMembers));
    VerdictKind k = kind(e);
    heading.set(history.plane().name() + " in inspection " + e.inspection().id() + " ("
        + WHEN.format(e.inspection().startedAt().atZone(zone)) + ", " + e.inspection().inspectorName() + "): "
        + k.symbol() + " " + k.words());
  }

  /** A frame member's recorded state; not recorded means taken as designed. */
  private static String words(PanelState s) {
    return s == null ? "not recorded (as designed)"
        : org.bracewalk.ui.common.PanelLook.of(s).words();
  }

  private static String words(PanelFinding f) {
    if (f == null || f.state() == PanelState.NOT_INSPECTED) {
      return "not inspected";
    }
    return org.bracewalk.ui.common.PanelLook.of(f.state()).words() + (f.memberFound() != null ? " (" + f.memberFound().token() + ")" : "");
  }

  public void older() {
    if (chosen.get() > 0) {
      chosen.set(chosen.get() - 1);
    }
  }

  public void newer() {
    if (history != null && chosen.get() < history.entries().size() - 1) {
      chosen.set(chosen.get() + 1);
    }
  }

  /** The plane's name, once read. */
  public ReadOnlyStringProperty planeNameProperty() {
    return planeName.getReadOnlyProperty();
  }

  public ObservableList<String> entries() {
    return entries;
  }

  public ObservableList<String> changes() {
    return changes;
  }

  public IntegerProperty chosenProperty() {
    return chosen;
  }

  public ReadOnlyObjectProperty<PlanePicture> pictureProperty() {
    return picture.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty headingProperty() {
    return heading.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty timelineProperty() {
    return timeline.getReadOnlyProperty();
  }
}
