package org.bracewalk.ui.sites;

import java.time.Clock;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.app.AnalysisService;
import org.bracewalk.app.DemoService;
import org.bracewalk.app.InspectionService;
import org.bracewalk.app.IntervalRules;
import org.bracewalk.app.SiteService;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.PlaneResult;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import java.util.Set;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.Map;
import java.util.HashSet;
import java.util.HashMap;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.app.verdict.VerdictKind;

/**
 * The overview of every site, structure and plane in the database, the demo-site offer when it is
 * empty, and starting (or continuing) an inspection of the selected structure. The database is read
 * and written on the background executor only: the commands look up the structure or plane of the
 * selected line in what the last read of the overview found, and every write reads the overview
 * again.
 */
public final class SitesViewModel {
  private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm");

  private final SiteService sites;
  private final InspectionService inspections;
  private final AnalysisService analysis;
  private final DemoService demo;
  private final String databaseLocation;
  private final Clock clock;
  private final DialogService dialogs;
  private final Navigator navigator;
  private final Executor ui;
  private final Executor background;
  /** True while a write runs on the background executor. */
  private boolean writing;
  /** The error naming the form's empty fields, as last shown (it follows the fields as they are filled). */
  private String missingShown = "";
  /** The last overview read (UI thread only): the commands look up structures and planes here. */
  private Overview known = Overview.EMPTY;
  private final ReadOnlyBooleanWrapper loading = new ReadOnlyBooleanWrapper(this, "loading");

  private final ObservableList<OverviewRow> rows = FXCollections.observableArrayList();
  private final ObjectProperty<OverviewRow> selected = new SimpleObjectProperty<>(this, "selected");
  private final ReadOnlyBooleanWrapper empty = new ReadOnlyBooleanWrapper(this, "empty");
  private final ReadOnlyStringWrapper error = new ReadOnlyStringWrapper(this, "error", "");
  private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
  private final ReadOnlyStringWrapper selectionText = new ReadOnlyStringWrapper(this, "selectionText", "");

  private final StringProperty inspectorName = new SimpleStringProperty(this, "inspectorName", "");
  private final StringProperty inspectorPosition = new SimpleStringProperty(this, "inspectorPosition", "");
  private final StringProperty competentPerson = new SimpleStringProperty(this, "competentPerson", "");
  private final StringProperty shift = new SimpleStringProperty(this, "shift", "");
  private final StringProperty storageSafetyPerson = new SimpleStringProperty(this, "storageSafetyPerson", "");
  private final ObjectProperty<InspectionReason> reason =
      new SimpleObjectProperty<>(this, "reason", InspectionReason.ROUTINE);

  /**
   * @param sites sites, structures, planes
   * @param inspections starting and listing inspections
   * @param analysis the verdict of each plane
   * @param demo the demo site offered on an empty database
   * @param databaseLocation where the database is, as shown
   * @param clock today, for what is due
   * @param dialogs questions and warnings
   * @param navigator opens the other screens
   * @param ui runs on the toolkit's thread (tests: same thread)
   * @param background runs the reading of the overview and the loading of the demo site (tests: same thread)
   */
  public SitesViewModel(SiteService sites, InspectionService inspections, AnalysisService analysis, DemoService demo,
      String databaseLocation, Clock clock, DialogService dialogs, Navigator navigator, Executor ui,
      Executor background) {
    this.ui = Objects.requireNonNull(ui, "ui");
    this.background = Objects.requireNonNull(background, "background");
    this.sites = Objects.requireNonNull(sites, "sites");
    this.inspections = Objects.requireNonNull(inspections, "inspections");
    this.analysis = Objects.requireNonNull(analysis, "analysis");
    this.demo = Objects.requireNonNull(demo, "demo");
    this.databaseLocation = Objects.requireNonNull(databaseLocation, "databaseLocation");
    this.clock = Objects.requireNonNull(clock, "clock");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.navigator = Objects.requireNonNull(navigator, "navigator");
    selected.addListener((o, a, b) -> describeSelection());
    for (javafx.beans.Observable field : List.of(inspectorName, inspectorPosition, competentPerson, shift,
        storageSafetyPerson, selected)) {
      field.addListener(o -> recheckMissing());
    }
    refresh();
  }

  /**
   * Reads every site again on the background executor (each plane's verdict is worked out from
   * its inspections) and shows the rows through the UI one.
   */
  public void refresh() {
    refresh(() -> { });
  }

  /** As {@link #refresh()}, then runs {@code then} on the UI executor once the rows are shown. */
  private void refresh(Runnable then) {
    loading.set(true);
    background.execute(() -> {
      Overview out;
      try {
        out = readRows();
      } catch (RuntimeException e) {
        ui.execute(() -> {
          loading.set(false);
          error.set("The sites could not be read from the database " + databaseLocation + " ("
              + e.getMessage() + "). Press F5 to read it again.");
        });
        return;
      }
      ui.execute(() -> {
        show(out);
        loading.set(false);
        then.run();
      });
    });
  }

  /**
   * What one read of the overview found: the rows, and the structures and planes behind them, so
   * the commands look them up here rather than in the database on the UI thread.
   */
  private record Overview(List<OverviewRow> rows, Map<Long, Structure> structures, Map<Long, List<PlaneRecord>> planes,
      Map<Long, PlaneRetirement> retired, Map<Long, Jurisdiction> jurisdictions) {
    static final Overview EMPTY = new Overview(List.of(), Map.of(), Map.of(), Map.of(), Map.of());
  }

  /**
   * A site line's second column: where it is, and whose rules its reports cite (fixed when the
   * site is created, with {@code site create --jurisdiction} or in a site file).
   */
  static String siteWords(Site site) {
    String rules = site.jurisdiction() == Jurisdiction.OTHER
        ? "rules: no jurisdiction recorded" : "rules: " + site.jurisdiction().title();
    return site.location().isEmpty() ? rules : site.location() + " \u00b7 " + rules;
  }

  private Overview readRows() {
    List<OverviewRow> out = new ArrayList<>();
    Map<Long, Structure> structuresRead = new HashMap<>();
    Map<Long, List<PlaneRecord>> planesRead = new HashMap<>();
    Map<Long, PlaneRetirement> retiredRead = new HashMap<>();
    Map<Long, Jurisdiction> jurisdictionsRead = new HashMap<>();
    for (Site site : sites.sites()) {
      out.add(new OverviewRow(OverviewRow.Level.SITE, site.name(), siteWords(site), null, "", "", "",
          OverviewRow.Due.NOT_APPLICABLE, "", 0, 0, 0, 0));
      LocalDate today = LocalDate.now(clock.withZone(site.timeZone()));
      for (Structure st : sites.structures(site.id())) {
        jurisdictionsRead.put(st.id(), site.jurisdiction());
        List<Inspection> insp = inspections.inspections(st.id());
        Optional<Inspection> latest = insp.stream().max(Comparator.comparing(Inspection::startedAt));
        Optional<Inspection> open = insp.stream().filter(i -> !i.isFinalised()).max(Comparator.comparing(Inspection::startedAt));
        Optional<Inspection> lastDone =
            insp.stream().filter(Inspection::isFinalised).max(Comparator.comparing(Inspection::finishedAt));
        String last = lastDone.map(i -> WHEN.format(i.finishedAt().atZone(site.timeZone()))).orElse("never");
        Optional<LocalDate> due = inspections.nextInspectionDue(st.id());
        OverviewRow.Due dueState;
        String dueText;
        if (due.isEmpty()) {
          dueState = OverviewRow.Due.NEVER_INSPECTED;
          dueText = "now";
        } else if (due.get().isBefore(today)) {
          dueState = OverviewRow.Due.OVERDUE;
          dueText = "since " + due.get();
        } else if (due.get().isEqual(today)) {
          dueState = OverviewRow.Due.DUE_TODAY;
          dueText = due.get().toString();
        } else {
          dueState = OverviewRow.Due.IN_TIME;
          dueText = due.get().toString();
        }
        int structureIndex = out.size();
        out.add(null); // filled in once the planes are known
        VerdictKind worst = null;
        Map<Long, PlaneRetirement> retired = new HashMap<>();
        sites.retirements(st.id()).forEach(x -> retired.put(x.planeId(), x));
        retiredRead.putAll(retired);
        structuresRead.put(st.id(), st);
        List<PlaneRecord> planesOfStructure = sites.planes(st.id());
        planesRead.put(st.id(), planesOfStructure);
        Map<Long, Set<Long>> covered = new HashMap<>();
        for (Inspection i : insp) {
          Set<Long> ids = new HashSet<>();
          inspections.planesOf(i.id()).forEach(p -> ids.add(p.id()));
          covered.put(i.id(), ids);
        }
        Set<Long> inLatest = latest.map(i -> covered.get(i.id())).orElse(Set.of());
        List<Inspection> newestFirst =
            insp.stream().sorted(Comparator.comparing(Inspection::startedAt).reversed()).toList();
        // how far the open inspection has got with each of its planes, so a second plane is not missed
        Map<Long, org.bracewalk.app.PlaneProgress> openProgress = new HashMap<>();
        open.ifPresent(i -> analysis.progress(i.id()).forEach(pp -> openProgress.put(pp.plane().id(), pp)));
        for (PlaneRecord plane : planesOfStructure) {
          VerdictKind v = VerdictKind.NOT_INSPECTED;
          String words;
          PlaneRetirement gone = retired.get(plane.id());
          if (gone != null && !inLatest.contains(plane.id())) {
            // left out of the latest inspection: shown for the record, not analysed, not counted
            out.add(new OverviewRow(OverviewRow.Level.PLANE, plane.name(),
                plane.grid().lifts() + " lifts \u00d7 " + plane.grid().bays() + (plane.grid().bays() == 1 ? " bay" : " bays"),
                v, "retired " + WHEN.format(gone.retiredAt().atZone(site.timeZone())) + ": " + gone.reason(),
                last, "", OverviewRow.Due.NOT_APPLICABLE, "", st.id(), plane.id(),
                open.map(Inspection::id).orElse(0L), latest.map(Inspection::id).orElse(0L)));
            continue;
          }
          Shown shown = shownVerdict(plane, newestFirst, covered);
          v = shown.kind();
          words = shown.words();
          if (latest.isPresent() && !inLatest.contains(plane.id())) {
            // added after the latest inspection started: not part of it (its scope is fixed)
            words += " (added after inspection " + latest.get().id() + " started)";
          }
          org.bracewalk.app.PlaneProgress pp = openProgress.get(plane.id());
          if (pp != null && !words.contains("open #" + open.get().id() + ":")) {
            // a plane of the open inspection nobody has marked yet: say so, so it is not missed
            words += " \u00b7 open #" + open.get().id() + ": " + pp.countWords() + " looked at";
          }
          if (gone != null) {
            words += " \u00b7 retired " + WHEN.format(gone.retiredAt().atZone(site.timeZone())) + ": "
                + gone.reason();
          }
          worst = VerdictKind.worse(worst, v);
          out.add(new OverviewRow(OverviewRow.Level.PLANE, plane.name(),
              plane.grid().lifts() + " lifts \u00d7 " + plane.grid().bays() + (plane.grid().bays() == 1 ? " bay" : " bays"),
              v, words, last, "", OverviewRow.Due.NOT_APPLICABLE, "", st.id(), plane.id(),
              open.map(Inspection::id).orElse(0L), latest.map(Inspection::id).orElse(0L)));
        }
        VerdictKind sv = worst == null ? VerdictKind.NOT_INSPECTED : worst;
        if (sv.lost() && (dueState == OverviewRow.Due.IN_TIME || dueState == OverviewRow.Due.DUE_TODAY)) {
          // never a tick beside lost rigidity: the date still stands, the mark warns
          dueState = OverviewRow.Due.LOST_RIGIDITY;
        }
        out.set(structureIndex, new OverviewRow(OverviewRow.Level.STRUCTURE, st.name(), kindWords(st.kind()), sv,
            sv.headline() + (open.isPresent() ? " \u00b7 #" + open.get().id() + " open" : ""),
            last, dueText, dueState, st.inspectionIntervalDays() + " days", st.id(), 0,
            open.map(Inspection::id).orElse(0L), latest.map(Inspection::id).orElse(0L)));
      }
    }
    return new Overview(out, structuresRead, planesRead, retiredRead, jurisdictionsRead);
  }

  private void show(Overview read) {
    known = read;
    List<OverviewRow> out = read.rows();
    OverviewRow keep = selected.get();
    rows.setAll(out);
    empty.set(out.isEmpty());
    if (keep != null) {
      for (OverviewRow r : out) {
        if (r.level() == keep.level() && r.structureId() == keep.structureId() && r.planeId() == keep.planeId()
            && r.name().equals(keep.name())) {
          selected.set(r);
        }
      }
    }
    describeSelection();
  }

  static String kindWords(StructureKind k) {
    return switch (k) {
      case SCAFFOLD -> "scaffold";
      case RACKING_RUN -> "racking run";
      case OTHER_FRAME -> "braced frame";
    };
  }

  /** What the overview shows for one plane: the kind and its words. */
  record Shown(VerdictKind kind, String words) {}

  /**
   * The verdict the overview shows for a plane, from the one {@link org.bracewalk.app.verdict.Verdict}
   * of each inspection: the last finalised inspection that recorded the plane gives the known
   * verdict; a later inspection replaces it only once it has recorded the plane (any observation
   * on it), and an open inspection whose unseen panels leave its verdict open ("depends on panels
   * not inspected") never hides a known lost rigidity.
   *
   * @param newestFirst the structure's inspections, newest first
   * @param covered the planes each inspection covers, by inspection id
   */
  Shown shownVerdict(PlaneRecord plane, List<Inspection> newestFirst, Map<Long, Set<Long>> covered) {
    PlaneResult later = null;
    Inspection laterInspection = null;
    for (Inspection i : newestFirst) {
      if (!covered.getOrDefault(i.id(), Set.of()).contains(plane.id())) {
        continue;
      }
      PlaneResult r = analysis.analysePlane(i.id(), plane.id());
      if (r.latest().isEmpty()) {
        continue; // nothing recorded on this plane in this inspection: it changes nothing known
      }
      if (i.isFinalised()) {
        VerdictKind known = r.verdict().kind();
        String knownWords = known.headline() + " (#" + i.id() + ")";
        if (later == null) {
          return new Shown(known, knownWords);
        }
        VerdictKind now = later.verdict().kind();
        String progress = progress(laterInspection, later, plane);
        if (known.lost() && !now.lost() && now != VerdictKind.HOLDS) {
          // the open walk-round's unseen panels must not hide what is known
          return new Shown(known, knownWords + ", not yet cleared" + progress);
        }
        return new Shown(now, now.headline() + progress);
      }
      if (later == null) {
        later = r;
        laterInspection = i;
      }
    }
    if (later == null) {
      return new Shown(VerdictKind.NOT_INSPECTED, VerdictKind.NOT_INSPECTED.headline());
    }
    VerdictKind now = later.verdict().kind();
    return new Shown(now, now.headline() + progress(laterInspection, later, plane));
  }

  private static String progress(Inspection i, PlaneResult r, PlaneRecord plane) {
    return (i.isFinalised() ? " (#" + i.id() : " (open #" + i.id()) + ": " + r.latest().size() + " of "
        + plane.grid().panelCount() + " marked)";
  }

  private void describeSelection() {
    OverviewRow r = selected.get();
    if (r == null || r.level() == OverviewRow.Level.SITE) {
      selectionText.set("Select a structure or a plane (arrow keys, then Enter opens its walk-round).");
      return;
    }
    String open = r.openInspectionId() > 0
        ? "Inspection " + r.openInspectionId() + " is open: Enter continues the walk-round."
        : "No open inspection: fill in the inspector below and start one.";
    selectionText.set((r.level() == OverviewRow.Level.PLANE ? "Plane " : "Structure ") + "'" + r.name() + "'. " + open);
  }

  /**
   * Loads the demo site (only offered on an empty database) on the background executor; the status
   * says when it is in, and {@code then} runs on the UI executor once its rows are shown. False when
   * a load or read is already running.
   */
  public boolean loadDemo(Runnable then) {
    if (loading.get()) {
      return false;
    }
    loading.set(true);
    status.set("Loading the demo site\u2026");
    background.execute(() -> {
      ImportedSite loaded;
      try {
        loaded = demo.load();
      } catch (RuntimeException e) {
        ui.execute(() -> {
          loading.set(false);
          status.set("");
          error.set("The demo site was not loaded: " + e.getMessage());
          dialogs.showError("Demo site not loaded", error.get());
        });
        return;
      }
      ImportedSite s = loaded;
      ui.execute(() -> {
        status.set("Loaded the demo site '" + s.site().name() + "': " + s.structures().size() + " structures, "
            + s.planes().size() + " planes, " + s.inspections().size()
            + " finalised inspections. Select a structure and start a new inspection to walk a plane.");
        error.set("");
        refresh(then);
      });
    });
    return true;
  }

  /** As {@link #loadDemo(Runnable)} with nothing to run after. */
  public boolean loadDemo() {
    return loadDemo(() -> { });
  }

  /** True while the overview is being read or the demo site loaded. */
  public ReadOnlyBooleanProperty loadingProperty() {
    return loading.getReadOnlyProperty();
  }

  /**
   * Starts an inspection of the selected structure now with the inspector's details, and opens its
   * walk-round on the selected plane (the first plane when a structure line is selected).
   */
  public boolean startInspection() {
    if (writing) {
      status.set("Still saving; wait for it to finish.");
      return false; // before the last look: one start at a time
    }
    OverviewRow r = selected.get();
    if (r == null || r.structureId() == 0) {
      error.set("Select the structure (or one of its planes) to inspect first.");
      return false;
    }
    String name = strip(inspectorName.get());
    Structure structure = known.structures().get(r.structureId());
    if (structure == null) {
      error.set("The structure of the selected line is no longer in the overview: press F5 to read it again.");
      return false;
    }
    boolean racking = structure.kind() == StructureKind.RACKING_RUN;
    // the report needs every one of these, and an inspection cannot be changed once started
    List<String> missing = missingFields(racking);
    if (!missing.isEmpty()) {
      missingShown = missingWords(missing);
      error.set(missingShown);
      return false;
    }
    if (!dialogs.confirm("Start this inspection?", lastLook(r, structure, racking), "Start inspection")) {
      status.set("Not started: nothing was recorded. Change what needs changing, then start again.");
      return false;
    }
    NewInspection details = new NewInspection(name, strip(inspectorPosition.get()), strip(competentPerson.get()),
        strip(shift.get()), racking ? strip(storageSafetyPerson.get()) : null, reason.get(), null, null);
    return write("Starting the inspection", () -> {
      Inspection started = inspections.start(r.structureId(), details);
      List<PlaneRecord> covered = inspections.planesOf(started.id());
      long plane = covered.stream().anyMatch(p -> p.id() == r.planeId()) ? r.planeId()
          : covered.stream().findFirst().map(PlaneRecord::id).orElse(0L);
      return new Selection(r.structureId(), plane, started.id());
    }, opened -> navigator.open(ScreenId.WALK, opened), e -> "Not started: " + e.getMessage());
  }

  /** The form's fields the report needs that are still empty, by their labels. */
  private List<String> missingFields(boolean racking) {
    List<String> missing = new ArrayList<>();
    if (strip(inspectorName.get()).isEmpty()) {
      missing.add("Inspector");
    }
    if (strip(inspectorPosition.get()).isEmpty()) {
      missing.add("Position");
    }
    if (strip(competentPerson.get()).isEmpty()) {
      missing.add("Competent person");
    }
    if (strip(shift.get()).isEmpty()) {
      missing.add("Shift");
    }
    if (racking && strip(storageSafetyPerson.get()).isEmpty()) {
      missing.add("Storage safety person (racking)");
    }
    return missing;
  }

  private static String missingWords(List<String> missing) {
    return String.join(", ", missing) + ": empty."
        + " The report needs " + (missing.size() == 1 ? "it" : "each of them")
        + ", and an inspection cannot be changed once started: fill "
        + (missing.size() == 1 ? "it" : "them") + " in, then start.";
  }

  /**
   * After a field of the form changes: the "empty" error, when shown, names only the fields still
   * empty, and goes once none is.
   */
  private void recheckMissing() {
    if (missingShown.isEmpty() || !missingShown.equals(error.get())) {
      return; // another error, or none: left as it is
    }
    OverviewRow r = selected.get();
    Structure structure = r == null ? null : known.structures().get(r.structureId());
    List<String> missing = missingFields(structure != null && structure.kind() == StructureKind.RACKING_RUN);
    missingShown = missing.isEmpty() ? "" : missingWords(missing);
    error.set(missingShown);
  }

  /**
   * Every value the new inspection will carry, for a last look before it starts: none of them can
   * be changed once it has started.
   */
  private String lastLook(OverviewRow r, Structure structure, boolean racking) {
    List<PlaneRecord> covered = known.planes().getOrDefault(structure.id(), List.of()).stream()
        .filter(p -> !known.retired().containsKey(p.id())).toList();
    StringBuilder out = new StringBuilder();
    out.append("Structure: ").append(structure.name()).append(" (").append(kindWords(structure.kind()))
        .append(")\n");
    out.append("Planes: ").append(covered.isEmpty() ? "none"
        : String.join(", ", covered.stream().map(PlaneRecord::name).toList())).append("\n");
    out.append("Inspector: ").append(strip(inspectorName.get())).append("\n");
    out.append("Position: ").append(strip(inspectorPosition.get())).append("\n");
    out.append("Competent person: ").append(strip(competentPerson.get())).append("\n");
    out.append("Shift: ").append(strip(shift.get())).append("\n");
    if (racking) {
      out.append("Storage safety: ").append(strip(storageSafetyPerson.get())).append("\n");
    }
    out.append("Reason: ").append(reason.get() == null ? "" : reason.get().label().replace('-', ' ')).append("\n\n");
    if (r.openInspectionId() > 0) {
      out.append("Inspection ").append(r.openInspectionId()).append(" of this structure is still open; it stays open"
          + " until it is finalised.\n\n");
    }
    out.append("None of these can be changed once the inspection has started. Cancel goes back to the form.");
    return out.toString();
  }

  /**
   * Runs the database write {@code work} on the background executor and {@code done} with its
   * answer on the UI one; a failure sets the error to {@code failed}'s words. One write at a time:
   * false (and the status says so) while another runs.
   */
  private <T> boolean write(String what, Supplier<T> work, Consumer<T> done,
      Function<RuntimeException, String> failed) {
    if (writing) {
      status.set("Still saving; wait for it to finish.");
      return false;
    }
    writing = true;
    status.set(what + "\u2026");
    background.execute(() -> {
      T answer;
      try {
        answer = work.get();
      } catch (RuntimeException e) {
        ui.execute(() -> {
          writing = false;
          status.set("");
          error.set(failed.apply(e));
        });
        return;
      }
      ui.execute(() -> {
        writing = false;
        status.set("");
        error.set("");
        done.accept(answer);
      });
    });
    return true;
  }

  /**
   * Retires the selected plane (one created by mistake, say) after asking why and confirming: it
   * stays in the record and in the inspections already started, and inspections started from now
   * on leave it out. A retirement cannot be undone.
   */
  public boolean retirePlane() {
    OverviewRow r = selected.get();
    if (r == null || r.level() != OverviewRow.Level.PLANE) {
      error.set("Select the plane to retire first.");
      return false;
    }
    PlaneRecord plane = known.planes().getOrDefault(r.structureId(), List.of()).stream()
        .filter(x -> x.id() == r.planeId()).findFirst().orElse(null);
    if (plane == null) {
      error.set("Plane '" + r.name() + "' is no longer in the overview: press F5 to read it again.");
      return false;
    }
    if (known.retired().containsKey(plane.id())) {
      error.set("Plane '" + plane.name() + "' is already retired.");
      return false;
    }
    Optional<String> why = dialogs.askText("Retire plane '" + plane.name() + "'",
        "Why is plane '" + plane.name() + "' retired (for example: created by mistake)? The reason is"
            + " kept with the record.", "");
    if (why.isEmpty()) {
      return false;
    }
    if (why.get().isBlank()) {
      error.set("Retire plane '" + plane.name() + "': give the reason. Nothing was changed.");
      return false;
    }
    if (!dialogs.confirm("Retire plane '" + plane.name() + "'?",
        "Plane '" + plane.name() + "' (" + plane.grid().lifts() + " lifts \u00d7 " + plane.grid().bays()
            + " bays) is kept for the record with its designs, observations and reports, and the"
            + " inspections already started keep it. Inspections started from now on leave it out."
            + " This cannot be undone.", "Retire")) {
      return false;
    }
    String reasonGiven = why.get().strip();
    return write("Retiring plane '" + plane.name() + "'", () -> {
      sites.retirePlane(plane.id(), "", reasonGiven);
      return plane;
    }, done -> {
      refresh();
      status.set("Plane '" + plane.name() + "' retired: inspections started from now on leave it out.");
    }, e -> "Retire plane '" + plane.name() + "': " + e.getMessage() + ". Nothing was changed.");
  }

  private static String strip(String s) {
    return s == null ? "" : s.strip();
  }

  private long firstPlane(long structureId) {
    return known.planes().getOrDefault(structureId, List.of()).stream().findFirst().map(PlaneRecord::id).orElse(0L);
  }

  /**
   * Asks for the days between routine inspections of the selected structure (or the structure of
   * the selected plane) and stores them; the overview's next-due dates follow at once. Days the
   * rules of the site's jurisdiction speak against are stored only once confirmed, the note naming
   * those rules only ({@link IntervalRules}).
   */
  public boolean changeInterval() {
    OverviewRow r = selected.get();
    if (r == null || r.structureId() == 0) {
      error.set("Select the structure (or one of its planes) whose inspection interval to change.");
      return false;
    }
    Structure st = known.structures().get(r.structureId());
    if (st == null) {
      error.set("The structure of the selected line is no longer in the overview: press F5 to read it again.");
      return false;
    }
    Optional<String> answer = dialogs.askText("Days between inspections",
        "Days between routine inspections of '" + st.name() + "' (" + SiteService.MIN_INTERVAL_DAYS + " to "
            + SiteService.MAX_INTERVAL_DAYS + "). The next inspection falls due this many days after the last"
            + " finalised one; inspect at once after an impact, alteration or bad weather whatever it says."
            + " Reports already issued keep what they printed (verify-report will name the structure as changed).",
        Integer.toString(st.inspectionIntervalDays()));
    if (answer.isEmpty()) {
      return false;
    }
    int days;
    try {
      days = Integer.parseInt(answer.get().strip());
    } catch (NumberFormatException e) {
      error.set("Days between inspections: '" + answer.get().strip() + "' is not a whole number of days."
          + " Nothing was changed.");
      return false;
    }
    if (days < SiteService.MIN_INTERVAL_DAYS || days > SiteService.MAX_INTERVAL_DAYS) {
      // refused here, before any database work (the service refuses it too)
      error.set("Days between inspections: " + days + " is out of range: give " + SiteService.MIN_INTERVAL_DAYS
          + " to " + SiteService.MAX_INTERVAL_DAYS + " days. Nothing was changed.");
      return false;
    }
    // the rule of the site's own jurisdiction, or the local codes where Bracewalk names none
    Optional<IntervalRules.Note> note = IntervalRules.note(
        known.jurisdictions().getOrDefault(st.id(), Jurisdiction.OTHER), st.kind(), st.name(), days);
    if (note.isPresent() && !dialogs.confirm(note.get().heading(), note.get().text(),
        "Keep " + days + (days == 1 ? " day" : " days"))) {
      return false;
    }
    int chosen = days;
    return write("Saving the days between inspections", () -> {
      Structure changed = sites.setInspectionInterval(st.id(), chosen);
      return changed.name() + "' is now inspected every " + changed.inspectionIntervalDays()
          + (changed.inspectionIntervalDays() == 1 ? " day" : " days")
          + inspections.nextInspectionDue(changed.id()).map(d -> "; next due " + d)
              .orElse("; not inspected yet, so due now") + ".";
    }, words -> {
      refresh();
      status.set("'" + words);
    }, e -> "Days between inspections: " + e.getMessage() + ". Nothing was changed.");
  }

  /** The selection the other screens should show for the selected line. */
  public Selection selectionForOthers() {
    OverviewRow r = selected.get();
    if (r == null || r.structureId() == 0) {
      return Selection.NONE;
    }
    long plane = r.planeId() > 0 ? r.planeId() : firstPlane(r.structureId());
    long insp = r.openInspectionId() > 0 ? r.openInspectionId() : r.latestInspectionId();
    return new Selection(r.structureId(), plane, insp);
  }

  /** Opens {@code screen} for the selected line. */
  public boolean open(ScreenId screen) {
    Selection s = selectionForOthers();
    if (!s.hasPlane()) {
      error.set("Select a structure or a plane first.");
      return false;
    }
    navigator.open(screen, s);
    return true;
  }

  /** Selects the line of a plane, if there is one. */
  public void selectPlane(long planeId) {
    for (OverviewRow r : rows) {
      if (r.level() == OverviewRow.Level.PLANE && r.planeId() == planeId) {
        selected.set(r);
      }
    }
  }

  public ObservableList<OverviewRow> rows() {
    return rows;
  }

  public ObjectProperty<OverviewRow> selectedProperty() {
    return selected;
  }

  public ReadOnlyBooleanProperty emptyProperty() {
    return empty.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty errorProperty() {
    return error.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty statusProperty() {
    return status.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty selectionTextProperty() {
    return selectionText.getReadOnlyProperty();
  }

  public StringProperty inspectorNameProperty() {
    return inspectorName;
  }

  public StringProperty inspectorPositionProperty() {
    return inspectorPosition;
  }

  public StringProperty competentPersonProperty() {
    return competentPerson;
  }

  public StringProperty shiftProperty() {
    return shift;
  }

  public StringProperty storageSafetyPersonProperty() {
    return storageSafetyPerson;
  }

  public ObjectProperty<InspectionReason> reasonProperty() {
    return reason;
  }

  public String databaseLocation() {
    return databaseLocation;
  }
}
