package org.bracewalk.ui.walk;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.ObservableList;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.PanelSide;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.ui.common.VerdictWords;

/**
 * The walk-round of one plane, for the view: a thin composition of pieces with one job each — the
 * cursor and walk order ({@link WalkCursor}), the marks so far ({@link MarkedPanels}), the detail
 * fields ({@link MarkDetails}), the photos and camera folder ({@link PhotoAttachment}), the live
 * verdict and banner ({@link LiveVerdict}) and undo ({@link UndoSteps}). One command records a state
 * for the current panel's diagonals, or for the side of it selected (a ledger above or below, a
 * standard left or right, kept in {@link MarkedFrame}), commits it through the {@link
 * MarkRecorder}, re-analyses the plane and moves on. Undo records a correction (the earlier state, or "not inspected"), never a deletion.
 * When the marks prove the plane has lost rigidity, {@link #alarmProperty()} says so in words that
 * name the lifts and bays to keep people and loads off.
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
  private final MarkRecorder recorder;
  private final PlaneAnalyzer analyzer;
  private final DialogService dialogs;

  private final MarkedPanels marks;
  private final MarkedFrame frame;
  private FrameInWalkSetting frameSetting = FrameInWalkSetting.inMemory();
  private final WalkCursor cursor;
  private final MarkDetails details;
  private final PhotoAttachment photos;
  private final LiveVerdict live;
  private final UndoSteps undo = new UndoSteps();
  private boolean quietCursor;

  private final ReadOnlyObjectWrapper<PlanePicture> picture = new ReadOnlyObjectWrapper<>(this, "picture");
  private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
  private final ReadOnlyStringWrapper error = new ReadOnlyStringWrapper(this, "error", "");
  private final ReadOnlyStringWrapper cursorText = new ReadOnlyStringWrapper(this, "cursorText");
  private final BooleanProperty readOnly = new SimpleBooleanProperty(this, "readOnly");

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
      Clock clock) {
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
      Clock clock) {
    this.design = Objects.requireNonNull(design, "design");
    this.title = title;
    this.recorder = Objects.requireNonNull(recorder, "recorder");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.readOnly.set(readOnly);
    List<RecordedMark> onPanels = new java.util.ArrayList<>();
    List<RecordedMark> onFrame = new java.util.ArrayList<>();
    for (RecordedMark r : existing) {
      (r.onFrame() ? onFrame : onPanels).add(r);
    }
    this.marks = new MarkedPanels(design, onPanels);
    this.frame = new MarkedFrame(design, onFrame);
    this.cursor = new WalkCursor(design.grid(),
        st -> st.side() == null ? marks.isMarked(st.panel()) : frame.isMarked(st.member()));
    this.details = new MarkDetails(design, racking);
    this.photos = new PhotoAttachment(dialogs, clock);
    this.live = new LiveVerdict(design, title, Objects.requireNonNull(role, "role"), analyzer);
    cursor.cursorProperty().addListener((obs, a, b) -> {
      if (!quietCursor) {
        refreshPicture();
      }
    });
    cursor.sideProperty().addListener((obs, a, b) -> {
      if (!quietCursor) {
        refreshPicture();
      }
    });
    cursor.frameInWalkProperty().addListener((obs, a, b) -> {
      frameSetting.set(b);
      status.set(b ? "The walk order now takes in every ledger and standard (W: diagonals only)."
          : "The walk order now walks the diagonals only; Shift+arrow still selects a ledger or standard (W: take them in).");
      reanalyse();
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
    if (cursor.stop().side() != null) {
      return markMember(state, cursor.stop());
    }
    PanelRef p = cursor.get();
    List<String> bad = photos.dropUnusable();
    if (!bad.isEmpty()) {
      error.set("Not recorded: taken off the mark: " + String.join("; ", bad)
          + ". Press the key again to record without " + (bad.size() == 1 ? "it" : "them")
          + ", or attach another (F, G).");
      return false;
    }
    Mark m;
    try {
      m = details.build(state, p, photos.photos());
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
    RecordedMark before = marks.latest(p);
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
    marks.put(p, made, m);
    undo.made(new UndoSteps.Step(p, before, made));
    details.clear();
    photos.markMade();
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

  /**
   * Records {@code state} for the frame member at {@code at} with the details entered. In a walk that
   * takes in the frame it moves on; otherwise the cursor goes back to the panel's diagonals.
   */
  private boolean markMember(PanelState state, WalkStop at) {
    FrameRef f = at.member();
    List<String> bad = photos.dropUnusable();
    if (!bad.isEmpty()) {
      error.set("Not recorded: taken off the mark: " + String.join("; ", bad)
          + ". Press the key again to record without " + (bad.size() == 1 ? "it" : "them")
          + ", or attach another (F, G).");
      return false;
    }
    Mark m;
    try {
      m = details.buildMember(state, f, photos.photos());
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
    RecordedMark before = frame.latest(f);
    RecordedMark made;
    try {
      made = before == null ? recorder.recordMember(f, at.panel(), m) : recorder.correct(before, m, REMARK_REASON);
    } catch (RuntimeException e) {
      error.set("Not recorded: the " + f + " could not be saved (" + e.getMessage()
          + "). Nothing was changed; try the mark again.");
      dialogs.showError("Mark not saved", error.get());
      return false;
    }
    error.set("");
    frame.put(f, made, m);
    undo.made(new UndoSteps.Step(at.panel(), before, made));
    details.clear();
    photos.markMade();
    status.set("Saved the " + f + ": " + describe(m) + " (record " + made.id() + ")");
    quietCursor = true;
    try {
      if (cursor.frameInWalkProperty().get()) {
        advance();
      } else {
        cursor.set(WalkStop.of(at.panel()));
      }
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
    Optional<UndoSteps.Step> newest = undo.newest();
    if (newest.isEmpty()) {
      error.set("Nothing to undo in this walk-round.");
      return false;
    }
    UndoSteps.Step step = newest.get();
    FrameRef member = step.made().member();
    RecordedMark current = member == null ? marks.latest(step.panel()) : frame.latest(member);
    Mark back = step.before() == null ? Mark.of(PanelState.NOT_INSPECTED) : step.before().mark();
    String what = member == null ? step.panel().toString() : "the " + member;
    RecordedMark made;
    try {
      made = recorder.correct(current, back, UNDO_REASON);
    } catch (RuntimeException e) {
      error.set("Undo not recorded for " + what + " (" + e.getMessage() + "). Nothing was changed.");
      dialogs.showError("Undo not saved", error.get());
      return false;
    }
    undo.undone();
    if (member == null) {
      marks.put(step.panel(), made, back);
    } else {
      frame.put(member, made, back);
    }
    error.set("");
    status.set("Undone " + what + ": now " + (member != null && step.before() == null ? "as designed (not marked)"
        : describe(back)) + " (correction record " + made.id() + ")");
    quietCursor = true;
    try {
      cursor.set(new WalkStop(step.panel(), member == null ? null : PanelSide.of(step.panel(), member)));
    } finally {
      quietCursor = false;
    }
    reanalyse();
    return true;
  }

  /** Moves the cursor to the next panel in the walk order (stays on the last). */
  public void next() {
    cursor.next();
  }

  /** Moves the cursor to the previous panel in the walk order. */
  public void previous() {
    cursor.previous();
  }

  /** Moves the cursor by whole panels: {@code dLift} up, {@code dBay} right, stopping at edges. */
  public void move(int dLift, int dBay) {
    cursor.move(dLift, dBay);
  }

  /** Puts the cursor on {@code p}'s diagonals (a click or tap). */
  public void select(PanelRef p) {
    cursor.select(p);
  }

  /**
   * Selects a side of the current panel for the next mark: the ledger above or below, the standard
   * on the left or right; the side already selected goes back to the panel's diagonals.
   */
  public void selectSide(PanelSide side) {
    cursor.selectSide(Objects.requireNonNull(side, "side"));
  }

  /** Back to the current panel's diagonals. */
  public void backToPanel() {
    if (cursor.stop().side() != null) {
      cursor.selectSide(cursor.stop().side());
    }
  }

  /** Selects the frame member {@code f} (a click or tap on it). */
  public void selectMember(FrameRef f) {
    cursor.selectMember(f);
  }

  /** Takes every ledger and standard into the walk order, or walks the diagonals only. */
  public void toggleFrameInWalk() {
    cursor.frameInWalkProperty().set(!cursor.frameInWalkProperty().get());
  }

  /**
   * Where the choice to walk the frame members is remembered (the app: the user's preferences; by
   * default memory); the walk order takes the remembered choice at once.
   */
  public void useFrameInWalkSetting(FrameInWalkSetting setting) {
    FrameInWalkSetting s = Objects.requireNonNull(setting, "setting");
    boolean v = s.get();
    frameSetting = s;
    if (cursor.frameInWalkProperty().get() != v) {
      quietCursor = true;
      try {
        cursor.frameInWalkProperty().set(v);
      } finally {
        quietCursor = false;
      }
      status.set("");
    }
  }

  /** Puts the cursor on the first panel, in walk order, that has no mark yet. */
  public void goToFirstUnmarked() {
    cursor.set(cursor.firstUnmarked());
  }

  /** Asks for photo files and adds them to the next mark. */
  public void addPhotos() {
    photos.addPhotos("Photos for " + cursor.get());
  }

  /** Where the camera folder is remembered (the app: the user's preferences; by default memory). */
  public void useCameraFolderSetting(CameraFolder.Setting setting) {
    photos.useCameraFolderSetting(Objects.requireNonNull(setting));
  }

  /** The camera folder in use, if one has been chosen. */
  public Optional<Path> cameraFolder() {
    return photos.cameraFolder();
  }

  /**
   * Attaches to the next mark the photos saved in the camera folder since the previous mark (or
   * since the walk-round opened); asks for the folder the first time, or when {@code choose}.
   */
  public void addCameraPhotos(boolean choose) {
    PhotoAttachment.Said said = photos.addCameraPhotos(choose);
    if (said.error() != null) {
      error.set(said.error());
    }
    if (said.status() != null) {
      status.set(said.status());
    }
  }

  /** Takes the photos waiting for the next mark off it again (none is deleted from its folder). */
  public void clearPhotos() {
    String said = photos.clear();
    if (said != null) {
      status.set(said);
    }
  }

  /** Switches the member seen between rigid and tension-only. */
  public void toggleMemberKind() {
    details.toggleMemberKind();
  }

  /** Cycles the walk order. */
  public void cycleOrder() {
    cursor.cycleOrder();
  }

  // ---- state ----------------------------------------------------------------------------------

  private void advance() {
    if (cursor.next()) {
      return;
    }
    // counted from the marks as they are now, this one included
    if (allMarked()) {
      status.set(status.get() + ". Every panel is marked: see Findings (Ctrl+4).");
    } else {
      status.set(status.get() + ". End of the walk order; press Home for the first panel not yet marked.");
    }
  }

  private boolean allMarked() {
    return marks.findingMap().size() == design.grid().panelCount();
  }

  /** The finding of each panel with a mark (withdrawn marks excluded). */
  public Map<PanelRef, PanelFinding> findings() {
    return Map.copyOf(marks.findingMap());
  }

  /** The effective members as the conservative verdict counts them (for tests). */
  Map<PanelRef, Brace> conservativeMembers() {
    return Map.copyOf(marks.conservativeMembers());
  }

  private void reanalyse() {
    try {
      live.update(marks, frame, cursor.frameInWalkProperty().get());
    } catch (RuntimeException e) {
      // the marks are saved; only the verdict shown is behind
      error.set("The verdict could not be worked out again (" + e.getMessage()
          + "); every mark is saved. Findings (Ctrl+4) works it out from the record.");
    }
    refreshPicture();
  }

  /** The state of each frame member with a mark in force (withdrawn marks excluded). */
  public Map<FrameRef, PanelState> frameFindings() {
    return Map.copyOf(frame.states());
  }

  /** The engine's whole answer for the marks so far: verdicts, repair plan, restore list. */
  public PlaneAnalysis fullAnalysis() {
    return analyzer.analyse(design, AsBuiltPlane.fromFindings(design, findings(), frameFindings()));
  }

  private void refreshPicture() {
    StateAnalysis s = live.lastSeen();
    PanelRef c = cursor.get();
    WalkStop at = cursor.stop();
    cursorText.set(describeCursor(c, at));
    picture.set(
        new PlanePicture(
            design,
            marks.findingMap(),
            true,
            s == null ? List.of() : s.blocks(),
            s == null ? Set.of() : Set.copyOf(s.criticalBraces()),
            List.of(),
            Set.of(),
            c,
            frame.states(),
            at.member(),
            s == null ? List.of() : s.freedoms()));
  }

  private String describeCursor(PanelRef c, WalkStop at) {
    if (c == null) {
      return "";
    }
    if (at.side() != null) {
      FrameRef f = at.member();
      String designed = design.hasFrameMember(f) ? "in the design" : "left out of the design";
      RecordedMark r = frame.latest(f);
      String found = r == null || r.mark().state() == PanelState.NOT_INSPECTED
          ? "not marked: taken as designed" : "marked " + describe(r.mark());
      int pos = cursor.position(at);
      return "Lift " + c.lift() + ", bay " + c.bay() + ", " + at.side().words() + ": the " + f + " \u2014 "
          + designed + "; " + found
          + (pos > 0 ? " (" + pos + " of " + cursor.length() + " in walk order)" : " (Esc: back to the panel)");
    }
    Brace d = design.braceAt(c);
    String designed =
        design.isOpening(c) ? "opening" : d == null ? "no brace in the design" : "design: " + d.token() + " " + d.kind().label();
    RecordedMark r = marks.latest(c);
    String found = r == null || r.mark().state() == PanelState.NOT_INSPECTED ? "not marked yet" : "marked " + describe(r.mark());
    return "Lift " + c.lift() + ", bay " + c.bay() + " \u2014 " + designed + "; " + found
        + " (" + cursor.position(WalkStop.of(c)) + " of " + cursor.length() + " in walk order)";
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
    return cursor.sequence();
  }

  public ObjectProperty<WalkOrder> orderProperty() {
    return cursor.orderProperty();
  }

  /** Whether the walk order takes in every ledger and standard (default: diagonals only). */
  public BooleanProperty frameInWalkProperty() {
    return cursor.frameInWalkProperty();
  }

  /** Every stop of the walk, in order. */
  public List<WalkStop> stops() {
    return cursor.stops();
  }

  /** The side of the current panel selected, or null for its diagonals. */
  public ReadOnlyObjectProperty<PanelSide> sideProperty() {
    return cursor.sideProperty();
  }

  /** The frame member selected, or null for the current panel's diagonals. */
  public FrameRef selectedMember() {
    return cursor.stop().member();
  }

  public ReadOnlyObjectProperty<PanelRef> cursorProperty() {
    return cursor.cursorProperty();
  }

  public PanelRef cursor() {
    return cursor.get();
  }

  public ReadOnlyObjectProperty<PlanePicture> pictureProperty() {
    return picture.getReadOnlyProperty();
  }

  public ReadOnlyObjectProperty<VerdictWords> verdictProperty() {
    return live.verdictProperty();
  }

  public VerdictWords verdict() {
    return live.verdictProperty().get();
  }

  public ReadOnlyStringProperty alarmProperty() {
    return live.alarmProperty();
  }

  public ReadOnlyStringProperty statusProperty() {
    return status.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty errorProperty() {
    return error.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty progressTextProperty() {
    return live.progressTextProperty();
  }

  public ReadOnlyStringProperty cursorTextProperty() {
    return cursorText.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty bowHintProperty() {
    return details.bowHintProperty();
  }

  public ReadOnlyIntegerProperty doneProperty() {
    return live.doneProperty();
  }

  public int total() {
    return design.grid().panelCount();
  }

  public ReadOnlyBooleanProperty canUndoProperty() {
    return undo.canUndoProperty();
  }

  public BooleanProperty readOnlyProperty() {
    return readOnly;
  }

  public ObjectProperty<DefectType> defectProperty() {
    return details.defectProperty();
  }

  public StringProperty bowMmProperty() {
    return details.bowMmProperty();
  }

  public StringProperty noteProperty() {
    return details.noteProperty();
  }

  public ObservableList<Path> photos() {
    return photos.photos();
  }

  public ObjectProperty<Diagonal> memberSeenProperty() {
    return details.memberSeenProperty();
  }

  public ObjectProperty<MemberKind> memberKindProperty() {
    return details.memberKindProperty();
  }
}
