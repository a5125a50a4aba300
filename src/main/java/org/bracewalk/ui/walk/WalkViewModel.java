package org.bracewalk.ui.walk;

import org.bracewalk.core.model.DefectType;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.ui.common.VerdictWords;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.core.model.PlaneRole;

/**
 * The walk-round of one plane. A cursor walks the panels in a chosen order; one command records a
 * state for the current panel, commits it through the {@link MarkRecorder}, re-analyses the plane
 * and moves on. Undo records a correction (the earlier state, or "not inspected"), never a
 * deletion. When the marks prove the plane has lost rigidity, {@link #alarmProperty()} says so in
 * words that name the lifts and bays to keep people and loads off.
 *
 * <p>The verdict drawn while walking takes the panels not yet seen as designed, so what is shown is
 * what the marks so far prove; the headline says when the verdict still depends on them.
 */
public final class WalkViewModel {
  /** Why an undo was recorded. */
  public static final String UNDO_REASON = "undone by the inspector during the walk-round";
  /** Why a second mark on a panel was recorded. */
  public static final String REMARK_REASON = "re-marked by the inspector during the walk-round";

  private final PlaneDesign design;
  private final String title;
  private final PlaneRole role;
  private final MarkRecorder recorder;
  private final PlaneAnalyzer analyzer;
  private final DialogService dialogs;
  private final boolean racking;

  private final Map<PanelRef, RecordedMark> latest = new LinkedHashMap<>();
  /** The finding of each marked panel, kept in step with {@code latest}. */
  private final Map<PanelRef, PanelFinding> findingMap = new HashMap<>();
  /** Effective members, panels not inspected counted as missing (the conservative state). */
  private final Map<PanelRef, Brace> conservativeMembers = new HashMap<>();
  /** Effective members, panels not inspected taken as designed (what the marks so far prove). */
  private final Map<PanelRef, Brace> seenMembers = new HashMap<>();
  private boolean quietCursor;
  private final Deque<Step> undo = new ArrayDeque<>();
  private List<PanelRef> sequence;

  private final ObjectProperty<WalkOrder> order = new SimpleObjectProperty<>(this, "order");
  private final ReadOnlyObjectWrapper<PanelRef> cursor = new ReadOnlyObjectWrapper<>(this, "cursor");
  private final ReadOnlyObjectWrapper<PlanePicture> picture = new ReadOnlyObjectWrapper<>(this, "picture");
  private final ReadOnlyObjectWrapper<VerdictWords> verdict = new ReadOnlyObjectWrapper<>(this, "verdict");
  private final ReadOnlyStringWrapper alarm = new ReadOnlyStringWrapper(this, "alarm", "");
  private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
  private final ReadOnlyStringWrapper error = new ReadOnlyStringWrapper(this, "error", "");
  private final ReadOnlyStringWrapper progressText = new ReadOnlyStringWrapper(this, "progressText");
  private final ReadOnlyStringWrapper cursorText = new ReadOnlyStringWrapper(this, "cursorText");
  private final ReadOnlyStringWrapper bowHint = new ReadOnlyStringWrapper(this, "bowHint", "");
  private final ReadOnlyIntegerWrapper done = new ReadOnlyIntegerWrapper(this, "done");
  private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");
  private final BooleanProperty readOnly = new SimpleBooleanProperty(this, "readOnly");

  private final ObjectProperty<DefectType> defect = new SimpleObjectProperty<>(this, "defect");
  private final StringProperty bowMm = new SimpleStringProperty(this, "bowMm", "");
  private final StringProperty note = new SimpleStringProperty(this, "note", "");
  private final ObservableList<Path> photos = FXCollections.observableArrayList();
  /** The member actually seen, when it differs from what the state implies; null = follows state. */
  private final ObjectProperty<Diagonal> memberSeen = new SimpleObjectProperty<>(this, "memberSeen");
  private final ObjectProperty<MemberKind> memberKind =
      new SimpleObjectProperty<>(this, "memberKind", MemberKind.RIGID);
  private Path photoFolder;
  private final java.time.Clock clock;
  private CameraFolder cameraFolder;

  /** One mark made in this session, so undo can correct it. */
  private record Step(PanelRef panel, RecordedMark before, RecordedMark made) {}

  /**
   * @param design the plane's design
   * @param title the plane's name as shown (structure and plane)
   * @param existing the latest mark of each panel already recorded in this inspection
   * @param recorder commits marks
   * @param analyzer the engine
   * @param dialogs for photos and warnings
   * @param racking true for storage racking (bow hints use the EN 15635 limits)
   * @param readOnly true when the inspection is finalised
   * @param clock when a mark is made (the camera folder's photos count from the previous mark)
   */
  public WalkViewModel(
      PlaneDesign design,
      String title,
      List<RecordedMark> existing,
      MarkRecorder recorder,
      PlaneAnalyzer analyzer,
      DialogService dialogs,
      boolean racking,
      boolean readOnly,
      java.time.Clock clock) {
    this(design, title, PlaneRole.OTHER, existing, recorder, analyzer, dialogs, racking, readOnly, clock);
  }

  /** As above, for a plane of the given role (its keep-off zone depends on it). */
  public WalkViewModel(
      PlaneDesign design,
      String title,
      PlaneRole role,
      List<RecordedMark> existing,
      MarkRecorder recorder,
      PlaneAnalyzer analyzer,
      DialogService dialogs,
      boolean racking,
      boolean readOnly,
      java.time.Clock clock) {
    this.clock = Objects.requireNonNull(clock, "clock");
    this.cameraFolder = new CameraFolder(CameraFolder.Setting.inMemory(), clock);
    this.role = Objects.requireNonNull(role, "role");
    this.design = Objects.requireNonNull(design, "design");
    this.title = title;
    this.recorder = Objects.requireNonNull(recorder, "recorder");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.racking = racking;
    this.readOnly.set(readOnly);
    for (RecordedMark r : existing) {
      design.grid().requireContains(r.panel());
      latest.put(r.panel(), r);
    }
    PlaneGrid g = design.grid();
    for (int i = 1; i <= g.lifts(); i++) {
      for (int j = 1; j <= g.bays(); j++) {
        PanelRef p = new PanelRef(i, j);
        RecordedMark r = latest.get(p);
        updatePanel(p, r == null ? null : r.mark().finding());
      }
    }
    order.set(WalkOrder.BAYS_UP_AND_DOWN);
    sequence = order.get().sequence(design.grid());
    order.addListener((obs, a, b) -> sequence = b.sequence(design.grid()));
    cursor.set(firstUnmarked());
    bowMm.addListener((obs, a, b) -> updateBowHint());
    cursor.addListener((obs, a, b) -> {
      if (!quietCursor) {
        refreshPicture();
      }
    });
    reanalyse();
  }

  // ---- commands -------------------------------------------------------------------------------

  /** Records {@code state} for the current panel with the details entered, then moves on. */
  public boolean mark(PanelState state) {
    if (state == PanelState.NOT_INSPECTED) {
      throw new IllegalArgumentException("a mark records what was found; use undo to withdraw one");
    }
    if (readOnly.get()) {
      error.set("This inspection is finalised and read-only. Start a new inspection to record changes.");
      return false;
    }
    PanelRef p = cursor.get();
    List<String> bad = new java.util.ArrayList<>();
    for (Path photo : List.copyOf(photos)) {
      java.util.Optional<String> problem = CameraFolder.problem(photo);
      if (problem.isPresent()) {
        photos.remove(photo);
        bad.add(photo + " (" + problem.get() + ")");
      }
    }
    if (!bad.isEmpty()) {
      error.set("Not recorded: taken off the mark: " + String.join("; ", bad)
          + ". Press the key again to record without " + (bad.size() == 1 ? "it" : "them")
          + ", or attach another (F, G).");
      return false;
    }
    Mark m;
    try {
      m = buildMark(state, p);
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
    RecordedMark before = latest.get(p);
    RecordedMark made;
    try {
      made = before == null ? recorder.record(p, m) : recorder.correct(before, m, REMARK_REASON);
    } catch (RuntimeException e) {
      error.set("Not recorded: " + p + " could not be saved (" + e.getMessage()
          + "). Nothing was changed; try the mark again.");
      dialogs.showError("Mark not saved", error.get());
      return false;
    }
    error.set("");
    latest.put(p, made);
    updatePanel(p, m.finding());
    undo.push(new Step(p, before, made));
    canUndo.set(true);
    clearDetails();
    cameraFolder.markMade();
    status.set("Saved " + p + ": " + describe(m) + " (record " + made.id() + ")");
    quietCursor = true;
    try {
      advance();
    } finally {
      quietCursor = false;
    }
    reanalyse();
    return true;
  }

  /** Corrects the last mark of this session back to what the panel held before it. */
  public boolean undo() {
    if (readOnly.get()) {
      error.set("This inspection is finalised and read-only.");
      return false;
    }
    Step step = undo.peek();
    if (step == null) {
      error.set("Nothing to undo in this walk-round.");
      return false;
    }
    RecordedMark current = latest.get(step.panel());
    Mark back = step.before() == null ? Mark.of(PanelState.NOT_INSPECTED) : step.before().mark();
    RecordedMark made;
    try {
      made = recorder.correct(current, back, UNDO_REASON);
    } catch (RuntimeException e) {
      error.set("Undo not recorded for " + step.panel() + " (" + e.getMessage() + "). Nothing was changed.");
      dialogs.showError("Undo not saved", error.get());
      return false;
    }
    undo.pop();
    canUndo.set(!undo.isEmpty());
    latest.put(step.panel(), made);
    updatePanel(step.panel(), back.finding());
    error.set("");
    status.set("Undone " + step.panel() + ": now " + describe(back) + " (correction record " + made.id() + ")");
    quietCursor = true;
    try {
      cursor.set(step.panel());
    } finally {
      quietCursor = false;
    }
    reanalyse();
    return true;
  }

  /** Moves the cursor to the next panel in the walk order (stays on the last). */
  public void next() {
    int i = sequence.indexOf(cursor.get());
    if (i < sequence.size() - 1) {
      cursor.set(sequence.get(i + 1));
    }
  }

  /** Moves the cursor to the previous panel in the walk order. */
  public void previous() {
    int i = sequence.indexOf(cursor.get());
    if (i > 0) {
      cursor.set(sequence.get(i - 1));
    }
  }

  /** Moves the cursor by whole panels: {@code dLift} up, {@code dBay} right, stopping at edges. */
  public void move(int dLift, int dBay) {
    PlaneGrid g = design.grid();
    PanelRef p = cursor.get();
    int lift = Math.max(1, Math.min(g.lifts(), p.lift() + dLift));
    int bay = Math.max(1, Math.min(g.bays(), p.bay() + dBay));
    cursor.set(new PanelRef(lift, bay));
  }

  /** Puts the cursor on {@code p} (a click or tap). */
  public void select(PanelRef p) {
    if (design.grid().contains(p)) {
      cursor.set(p);
    }
  }

  /** Puts the cursor on the first panel, in walk order, that has no mark yet. */
  public void goToFirstUnmarked() {
    cursor.set(firstUnmarked());
  }

  /** Asks for photo files and adds them to the next mark. */
  public void addPhotos() {
    List<Path> chosen = dialogs.choosePhotos("Photos for " + cursor.get(), photoFolder);
    if (!chosen.isEmpty()) {
      photos.addAll(chosen);
      Path parent = chosen.get(0).toAbsolutePath().getParent();
      if (parent != null) {
        photoFolder = parent;
      }
    }
  }

  /** Where the camera folder is remembered (the app: the user's preferences; by default memory). */
  public void useCameraFolderSetting(CameraFolder.Setting setting) {
    cameraFolder = new CameraFolder(setting, clock);
  }

  /** The camera folder in use, if one has been chosen. */
  public java.util.Optional<Path> cameraFolder() {
    return cameraFolder.folder();
  }

  /**
   * Attaches to the next mark the photos saved in the camera folder since the previous mark (or
   * since the walk-round opened); asks for the folder the first time, or when {@code choose}.
   */
  public void addCameraPhotos(boolean choose) {
    java.util.Optional<Path> folder = cameraFolder.folder();
    if (choose || folder.isEmpty() || !java.nio.file.Files.isDirectory(folder.get())) {
      java.util.Optional<Path> picked = dialogs.chooseFolder(
          "Camera folder: where the camera or phone saves its pictures", folder.orElse(photoFolder));
      if (picked.isEmpty()) {
        return;
      }
      cameraFolder.choose(picked.get());
      folder = picked;
    }
    CameraFolder.Found found;
    try {
      found = cameraFolder.take();
    } catch (java.io.IOException e) {
      error.set("The camera folder " + folder.get() + " cannot be read (" + e.getMessage()
          + "). Press Shift+G to choose another, or F to pick the files.");
      return;
    }
    String passed = found.passedOver().isEmpty() ? ""
        : " Passed over: " + String.join(", ", found.passedOver()) + ".";
    List<Path> fresh = found.photos().stream().filter(f -> !photos.contains(f)).toList();
    if (fresh.isEmpty()) {
      status.set("No new photos in " + folder.get() + " since the previous mark." + passed
          + " Take the photo, then press G again; F picks files.");
      return;
    }
    error.set("");
    photos.addAll(fresh);
    cameraFolder.taken(fresh);
    status.set(fresh.size() + (fresh.size() == 1 ? " photo" : " photos") + " from " + folder.get()
        + " attached to the next mark: " + String.join(", ",
            fresh.stream().map(f -> f.getFileName().toString()).toList())
        + (found.leftOut() > 0 ? "; " + found.leftOut() + " older new ones left out (F picks them)" : "")
        + "." + passed + " Shift+F takes them off again.");
  }

  /** Takes the photos waiting for the next mark off it again (none is deleted from its folder). */
  public void clearPhotos() {
    if (photos.isEmpty()) {
      return;
    }
    int n = photos.size();
    cameraFolder.released(photos); // G may offer them again
    photos.clear();
    status.set(n + (n == 1 ? " photo" : " photos") + " taken off the next mark (the files stay where they are).");
  }

  /** Switches the member seen between rigid and tension-only. */
  public void toggleMemberKind() {
    memberKind.set(memberKind.get() == MemberKind.RIGID ? MemberKind.TENSION_ONLY : MemberKind.RIGID);
  }

  /** Cycles the walk order. */
  public void cycleOrder() {
    WalkOrder[] all = WalkOrder.values();
    order.set(all[(order.get().ordinal() + 1) % all.length]);
  }

  // ---- state ----------------------------------------------------------------------------------

  private Mark buildMark(PanelState state, PanelRef p) {
    Double bow = parseBow(bowMm.get());
    Brace seen = memberSeen.get() == null ? null : new Brace(memberSeen.get(), memberKind.get());
    if (state == PanelState.EXTRA && seen == null) {
      Brace d = design.braceAt(p);
      if (d != null) {
        throw new IllegalArgumentException(
            p + " has a " + d.token() + " brace in the design, so a member there is not extra."
                + " Mark it S (sound), or choose the member seen with / \\ or X first.");
      }
      seen = new Brace(Diagonal.RISING, memberKind.get());
    }
    if (design.isOpening(p) && seen != null) {
      // an opening carries no design member; a member there is extra whatever the state says
      state = PanelState.EXTRA;
    }
    return new Mark(state, seen, defect.get(), bow, bow == null ? null : Mark.STANDARD_GAUGE_MM, note.get(), List.copyOf(photos));
  }

  /** Parses the bow field (millimetres over a 1 m straight edge, to 0.1 mm); empty is none. */
  static Double parseBow(String text) {
    String t = text == null ? "" : text.strip().replace(',', '.');
    if (t.isEmpty()) {
      return null;
    }
    double v;
    try {
      v = Double.parseDouble(t);
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException(
          "Bow: '" + t + "' is not a number of millimetres. Type a number such as 12 or 10.5, or"
              + " leave the field empty. Nothing was recorded.");
    }
    if (!(v >= 0) || v > 2000) {
      throw new IllegalArgumentException(
          "Bow: " + t + " mm is out of range. Type the bow in millimetres (0 to 2000), or"
              + " leave the field empty. Nothing was recorded.");
    }
    return Math.round(v * 10) / 10.0;
  }

  private void updateBowHint() {
    Double bow;
    try {
      bow = parseBow(bowMm.get());
    } catch (IllegalArgumentException e) {
      bowHint.set(e.getMessage());
      return;
    }
    if (bow == null || !racking) {
      bowHint.set("");
      return;
    }
    // Bracing member over a 1 m gauge: 10 mm limit; over twice the limit, offload and isolate
    // (EN 15635 as reproduced in DGUV Information 208-043, see trade-facts.md).
    if (bow <= 10.0) {
      bowHint.set("Within 10 mm over 1 m: record and monitor (D).");
    } else if (bow <= 20.0) {
      bowHint.set("Over 10 mm: offload, repair within 4 weeks; counts as beyond use (U).");
    } else {
      bowHint.set("Over 20 mm: offload at once and isolate until repaired (U).");
    }
  }

  private void clearDetails() {
    defect.set(null);
    bowMm.set("");
    note.set("");
    photos.clear();
    memberSeen.set(null);
    memberKind.set(MemberKind.RIGID);
  }

  private void advance() {
    PanelRef p = cursor.get();
    int i = sequence.indexOf(p);
    if (i < sequence.size() - 1) {
      cursor.set(sequence.get(i + 1));
    } else if (done.get() == design.grid().panelCount()) {
      status.set(status.get() + ". Every panel is marked: see Findings (Ctrl+4).");
    } else {
      status.set(status.get() + ". End of the walk order; press Home for the first panel not yet marked.");
    }
  }

  private PanelRef firstUnmarked() {
    for (PanelRef p : sequence) {
      RecordedMark r = latest.get(p);
      if (r == null || r.mark().state() == PanelState.NOT_INSPECTED) {
        return p;
      }
    }
    return sequence.get(0);
  }

  /** The finding of each panel with a mark (withdrawn marks excluded). */
  public Map<PanelRef, PanelFinding> findings() {
    return Map.copyOf(findingMap);
  }

  /**
   * Brings the finding and both member maps of one panel up to date. Follows the rule of {@link
   * AsBuiltPlane#fromFindings} (a test holds the two together): sound or damaged-effective carries
   * the member found or else the design's; any other inspected state only the member found; a panel
   * not inspected nothing (conservative) or its design brace (as seen so far).
   */
  private void updatePanel(PanelRef p, PanelFinding f) {
    if (f == null || f.state() == PanelState.NOT_INSPECTED) {
      findingMap.remove(p);
    } else {
      findingMap.put(p, f);
    }
    Brace designed = design.braceAt(p);
    Brace member;
    boolean inspected = f != null && f.state().inspected();
    if (!inspected) {
      member = null;
    } else if (f.state() == PanelState.SOUND || f.state() == PanelState.DAMAGED_EFFECTIVE) {
      member = f.memberFound() != null ? f.memberFound() : designed;
    } else {
      member = f.memberFound();
    }
    put(conservativeMembers, p, member);
    put(seenMembers, p, inspected ? member : designed);
  }

  private static void put(Map<PanelRef, Brace> map, PanelRef p, Brace b) {
    if (b == null) {
      map.remove(p);
    } else {
      map.put(p, b);
    }
  }

  /** The effective members as the conservative verdict counts them (for tests). */
  Map<PanelRef, Brace> conservativeMembers() {
    return Map.copyOf(conservativeMembers);
  }

  private void reanalyse() {
    // Per keystroke only the two verdicts are needed (a fraction of a millisecond each on the
    // member maps kept up to date panel by panel); the repair plan is worked out when asked for
    // (fullAnalysis), as it costs far more.
    StateAnalysis conservative = analyzer.analyseState(design.grid(), conservativeMembers);
    int total = design.grid().panelCount();
    int inspected = 0;
    for (PanelFinding f : findingMap.values()) {
      if (f.state().inspected()) {
        inspected++;
      }
    }
    int unknown = total - inspected;
    StateAnalysis seen = unknown > 0 ? analyzer.analyseState(design.grid(), seenMembers) : conservative;
    int count = findingMap.size();
    done.set(count);
    progressText.set(count + " of " + total + " panels");
    int repairCount = seen.rigid() ? 0 : Math.max(1, seen.degreesOfFreedom());
    Verdict one = Verdict.classify(design.grid(), role, conservative, unknown, seen.rigid());
    VerdictWords words = VerdictWords.of(one, conservative, repairCount);
    verdict.set(words);
    alarm.set(words.alarm(title));
    lastSeen = seen;
    refreshPicture();
  }

  /** The engine's whole answer for the marks so far: verdicts, repair plan, restore list. */
  public PlaneAnalysis fullAnalysis() {
    return analyzer.analyse(design, AsBuiltPlane.fromFindings(design, findings()));
  }

  private StateAnalysis lastSeen;

  private void refreshPicture() {
    StateAnalysis s = lastSeen;
    PanelRef c = cursor.get();
    cursorText.set(describeCursor(c));
    picture.set(
        new PlanePicture(
            design,
            findingMap,
            true,
            s == null ? List.of() : s.blocks(),
            s == null ? Set.of() : Set.copyOf(s.criticalBraces()),
            List.of(),
            Set.of(),
            c));
  }

  private String describeCursor(PanelRef c) {
    if (c == null) {
      return "";
    }
    Brace d = design.braceAt(c);
    String designed =
        design.isOpening(c) ? "opening" : d == null ? "no brace in the design" : "design: " + d.token() + " " + d.kind().label();
    RecordedMark r = latest.get(c);
    String found = r == null || r.mark().state() == PanelState.NOT_INSPECTED ? "not marked yet" : "marked " + describe(r.mark());
    int pos = sequence.indexOf(c) + 1;
    return "Lift " + c.lift() + ", bay " + c.bay() + " \u2014 " + designed + "; " + found
        + " (" + pos + " of " + sequence.size() + " in walk order)";
  }

  private static String describe(Mark m) {
    StringBuilder sb = new StringBuilder(m.state().label());
    if (m.memberFound() != null) {
      sb.append(" (member ").append(m.memberFound().token()).append(')');
    }
    if (m.bowMm() != null) {
      sb.append(", bow ").append(m.bowMm()).append(" mm");
    }
    if (m.defect() != null) {
      sb.append(", ").append(m.defect().label());
    }
    if (!m.photos().isEmpty()) {
      sb.append(", ").append(m.photos().size()).append(m.photos().size() == 1 ? " photo" : " photos");
    }
    return sb.toString();
  }

  // ---- properties -----------------------------------------------------------------------------

  public PlaneDesign design() {
    return design;
  }

  public String title() {
    return title;
  }

  public List<PanelRef> sequence() {
    return List.copyOf(sequence);
  }

  public ObjectProperty<WalkOrder> orderProperty() {
    return order;
  }

  public ReadOnlyObjectProperty<PanelRef> cursorProperty() {
    return cursor.getReadOnlyProperty();
  }

  public PanelRef cursor() {
    return cursor.get();
  }

  public ReadOnlyObjectProperty<PlanePicture> pictureProperty() {
    return picture.getReadOnlyProperty();
  }

  public ReadOnlyObjectProperty<VerdictWords> verdictProperty() {
    return verdict.getReadOnlyProperty();
  }

  public VerdictWords verdict() {
    return verdict.get();
  }

  public ReadOnlyStringProperty alarmProperty() {
    return alarm.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty statusProperty() {
    return status.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty errorProperty() {
    return error.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty progressTextProperty() {
    return progressText.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty cursorTextProperty() {
    return cursorText.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty bowHintProperty() {
    return bowHint.getReadOnlyProperty();
  }

  public ReadOnlyIntegerProperty doneProperty() {
    return done.getReadOnlyProperty();
  }

  public int total() {
    return design.grid().panelCount();
  }

  public ReadOnlyBooleanProperty canUndoProperty() {
    return canUndo.getReadOnlyProperty();
  }

  public BooleanProperty readOnlyProperty() {
    return readOnly;
  }

  public ObjectProperty<DefectType> defectProperty() {
    return defect;
  }

  public StringProperty bowMmProperty() {
    return bowMm;
  }

  public StringProperty noteProperty() {
    return note;
  }

  public ObservableList<Path> photos() {
    return photos;
  }

  public ObjectProperty<Diagonal> memberSeenProperty() {
    return memberSeen;
  }

  public ObjectProperty<MemberKind> memberKindProperty() {
    return memberKind;
  }
}
