package org.bracewalk.ui.walk;

import java.nio.file.Path;
import java.time.Clock;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;
import java.util.function.LongFunction;
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
 * verdict and banner ({@link LiveVerdict}), undo ({@link UndoSteps}) and the writes ({@link
 * MarkWrites}). One command records a state for the current panel's diagonals, or for the side of
 * it selected (a ledger above or below, a standard left or right: {@link MarkedFrame}), and moves on. Undo records a
 * correction (the earlier state, or "not inspected"), never a deletion.
 *
 * <p>Recording: the screen shows a mark at once (the picture, the cursor, the status) and queues
 * its write on the ordered write queue, off the JavaFX thread; there the photo files are checked
 * and the mark is committed through the {@link MarkRecorder}, each correction naming the record
 * before it. The live verdict, the banner and the progress follow what is stored: they are drawn
 * again when the record confirms a write. A write that fails takes the panel back to what the
 * record holds and says so in {@link #errorProperty()}, naming the panel and the mark, until that
 * panel is marked again and stored (no window is opened: the walk goes on).
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
  private final PlaneAnalyzer analyzer;
  private final DialogService dialogs;

  /** The marks as shown: each at once, at the key press. */
  private final MarkedPanels marks;
  /** The marks as stored: as the record confirms them; the live verdict is drawn from these. */
  private final MarkedPanels stored;
  /** The marks on frame members as shown. */
  private final MarkedFrame frame;
  /** The marks on frame members as stored. */
  private final MarkedFrame storedFrame;
  private FrameInWalkSetting frameSetting = FrameInWalkSetting.inMemory();
  private final MarkWrites writes;
  /** Writes queued and not yet answered, by panel (diagonals) or frame member. */
  private final Map<Object, Integer> pending = new HashMap<>();
  /** What the status says once a write is stored, by ticket (given the record id). */
  private final Map<Long, LongFunction<String>> saidWhenStored = new HashMap<>();
  /** The undo steps whose correction is queued, by ticket (put back if it fails). */
  private final Map<Long, UndoSteps.Step> undoing = new HashMap<>();
  /** The marks that did not reach the record, by panel or frame member, until it is stored again. */
  private final Map<Object, String> unsaved = new LinkedHashMap<>();
  private long newestTicket;
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
   * @param ui runs on the JavaFX thread ({@code FxExecutor}; tests: {@code Runnable::run})
   * @param writes where the marks are written and the photo files and camera folder read, never
   *     the JavaFX thread (the app: its background thread); its tasks are run one at a time, in
   *     the order queued
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
      Clock clock,
      Executor ui,
      Executor writes) {
    this(design, title, PlaneRole.OTHER, existing, recorder, analyzer, dialogs, racking, readOnly, clock, ui, writes);
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
      Clock clock,
      Executor ui,
      Executor writes) {
    this.design = Objects.requireNonNull(design, "design");
    this.title = title;
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    Objects.requireNonNull(dialogs, "dialogs");
    this.readOnly.set(readOnly);
    List<RecordedMark> onPanels = new java.util.ArrayList<>();
    List<RecordedMark> onFrame = new java.util.ArrayList<>();
    for (RecordedMark r : existing) {
      (r.onFrame() ? onFrame : onPanels).add(r);
    }
    this.marks = new MarkedPanels(design, onPanels);
    this.stored = new MarkedPanels(design, onPanels);
    this.frame = new MarkedFrame(design, onFrame);
    this.storedFrame = new MarkedFrame(design, onFrame);
    this.writes = new MarkWrites(existing, recorder, ui, writes, new Outcome());
    this.dialogs = dialogs;
    this.cursor = new WalkCursor(design,
        st -> st.side() == null ? marks.isMarked(st.panel()) : frame.isMarked(st.member()));
    this.details = new MarkDetails(design, racking);
    this.photos = new PhotoAttachment(dialogs, clock, ui, this.writes::onQueue);
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
    cursor.orderProperty().addListener((obs, a, b) -> refreshPicture()); // "n of N in walk order"
    cursor.frameInWalkProperty().addListener((obs, a, b) -> {
      frameSetting.set(b);
      status.set(b ? "The walk order now takes in every ledger and standard (W: diagonals only)."
          : "The walk order now walks the diagonals only; Shift+arrow still selects a ledger or standard (W: take them in).");
      reanalyse();
    });
    reanalyse();
  }

  // ---- commands -------------------------------------------------------------------------------

  /**
   * Shows {@code state} for the current panel with the details entered, queues its write, and moves
   * on. True when the mark was taken (its write is queued; a failure comes back in {@link
   * #errorProperty()}); false when it was refused here (read-only, a bad field), saying why.
   */
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
    Mark m;
    try {
      m = details.build(state, p, photos.photos());
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
    RecordedMark before = marks.latest(p);
    long ticket = writes.ticket();
    newestTicket = ticket;
    marks.put(p, new RecordedMark(0, p, m), m);
    pending.merge(p, 1, Integer::sum);
    undo.made(new UndoSteps.Step(p, before == null ? null : before.mark(), m, ticket));
    details.clear();
    photos.markMade();
    error.set(unsavedWords());
    String after;
    quietCursor = true;
    try {
      after = advance();
    } finally {
      quietCursor = false;
    }
    status.set("Marked " + p + ": " + describe(m) + after);
    saidWhenStored.put(ticket, id -> "Saved " + p + ": " + describe(m) + " (record " + id + ")" + after);
    refreshPicture();
    writes.mark(ticket, p, m, REMARK_REASON);
    return true;
  }

  /**
   * Shows {@code state} for the frame member at {@code at} with the details entered and queues its
   * write. In a walk that takes in the frame it moves on; otherwise the cursor goes back to the
   * panel's diagonals.
   */
  private boolean markMember(PanelState state, WalkStop at) {
    FrameRef f = at.member();
    PanelRef p = at.panel();
    Mark m;
    try {
      m = details.buildMember(state, f, photos.photos());
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
    RecordedMark before = frame.latest(f);
    long ticket = writes.ticket();
    newestTicket = ticket;
    frame.put(f, new RecordedMark(0, p, m, f), m);
    pending.merge(f, 1, Integer::sum);
    undo.made(new UndoSteps.Step(p, before == null ? null : before.mark(), m, ticket, f));
    details.clear();
    photos.markMade();
    error.set(unsavedWords());
    String after = "";
    quietCursor = true;
    try {
      if (cursor.frameInWalkProperty().get()) {
        after = advance();
      } else {
        cursor.set(WalkStop.of(p));
      }
    } finally {
      quietCursor = false;
    }
    String then = after;
    status.set("Marked the " + f + ": " + describe(m) + then);
    saidWhenStored.put(ticket, id -> "Saved the " + f + ": " + describe(m) + " (record " + id + ")" + then);
    refreshPicture();
    writes.mark(ticket, p, f, m, REMARK_REASON);
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
    PanelRef p = step.panel();
    FrameRef member = step.member();
    Mark back = step.before() == null ? Mark.of(PanelState.NOT_INSPECTED) : step.before();
    long ticket = writes.ticket();
    newestTicket = ticket;
    undo.undone();
    undoing.put(ticket, step);
    if (member == null) {
      marks.put(p, new RecordedMark(0, p, back), back);
    } else {
      frame.put(member, new RecordedMark(0, p, back, member), back);
    }
    pending.merge(MarkWrites.key(p, member), 1, Integer::sum);
    error.set(unsavedWords());
    String what = member == null ? p.toString() : "the " + member;
    String now = member != null && back.state() == PanelState.NOT_INSPECTED ? "as designed (no mark)" : describe(back);
    status.set("Undone " + what + ": now " + now);
    saidWhenStored.put(ticket, id -> "Undone " + what + ": now " + now + " (correction record " + id + ")");
    quietCursor = true;
    try {
      cursor.set(new WalkStop(p, member == null ? null : PanelSide.of(p, member)));
    } finally {
      quietCursor = false;
    }
    refreshPicture();
    writes.undo(ticket, step.ticket(), p, member, back, UNDO_REASON);
    return true;
  }

  /**
   * The panels nobody has looked at yet, as shown (no mark, or a mark undone), lift then bay:
   * what {@link #recordRestAsDesigned()} would record.
   */
  public List<PanelRef> notLookedAt() {
    List<PanelRef> out = new java.util.ArrayList<>();
    for (int lift = 1; lift <= design.grid().lifts(); lift++) {
      for (int bay = 1; bay <= design.grid().bays(); bay++) {
        PanelRef p = new PanelRef(lift, bay);
        if (!marks.isMarked(p)) {
          out.add(p);
        }
      }
    }
    return out;
  }

  /**
   * After asking, records every panel nobody has looked at yet as found as designed, in one step
   * (one record per panel, all in one transaction, through the use case): for a routine inspection,
   * once the braced panels are walked. The question names how many panels it covers; nothing is
   * recorded unless the person confirms. Frame members not marked are taken as designed already.
   * Each panel recorded can be marked again (a correction); Backspace undoes single marks only.
   * True when the write was queued.
   */
  public boolean recordRestAsDesigned() {
    if (readOnly.get()) {
      error.set("This inspection is finalised and read-only. Start a new inspection to record changes.");
      return false;
    }
    List<PanelRef> rest = notLookedAt();
    if (rest.isEmpty()) {
      status.set("Every panel of this plane has been looked at: nothing to record as designed.");
      return false;
    }
    int n = rest.size();
    String panels = n == 1 ? "panel" : "panels";
    boolean go = dialogs.confirm("Record the rest as designed?",
        "Record the " + n + " " + panels + " not yet looked at as found as designed?\n\n"
            + "Each is recorded as seen and as the design has it: a designed brace there and sound,"
            + " an unbraced panel or opening with nothing in it. Only confirm when you have looked"
            + " at them. A panel found otherwise can be marked again afterwards (kept as a correction).",
        "Record " + n + " " + panels);
    if (!go) {
      status.set("Nothing recorded: the " + n + " " + panels + " not yet looked at stay not inspected.");
      return false;
    }
    long ticket = writes.ticket();
    newestTicket = ticket;
    Mark m = InspectionMarkRecorder.restAsDesigned();
    for (PanelRef p : rest) {
      marks.put(p, new RecordedMark(0, p, m), m);
      pending.merge(p, 1, Integer::sum);
    }
    status.set("Recording the " + n + " " + panels + " not yet looked at as found as designed\u2026");
    saidWhenStored.put(ticket, id -> "Recorded the " + n + " " + panels
        + " not yet looked at as found as designed. Every panel is marked: see Findings (Ctrl+4).");
    refreshPicture();
    writes.rest(ticket, rest);
    return true;
  }

  /**
   * Starts the walk in {@code order} (the app: the braced panels only for a routine inspection),
   * on its first stop not yet marked.
   */
  public void startWith(WalkOrder order) {
    cursor.orderProperty().set(Objects.requireNonNull(order, "order"));
    cursor.set(cursor.firstUnmarked());
  }

  /** What the write queue says, on the UI thread. */
  private final class Outcome implements MarkWrites.Outcome {
    @Override
    public void stored(long ticket, RecordedMark made) {
      PanelRef p = made.panel();
      FrameRef f = made.member();
      if (f == null) {
        stored.put(p, made, made.mark());
        if (answered(p)) {
          marks.put(p, made, made.mark());
        }
      } else {
        storedFrame.put(f, made, made.mark());
        if (answered(f)) {
          frame.put(f, made, made.mark());
        }
      }
      undoing.remove(ticket);
      unsaved.remove(MarkWrites.key(p, f));
      error.set(unsavedWords());
      LongFunction<String> said = saidWhenStored.remove(ticket);
      if (said != null && ticket == newestTicket) {
        status.set(said.apply(made.id()));
      }
      reanalyse();
    }

    @Override
    public void refused(long ticket, PanelRef p, FrameRef f, Mark mark, String why) {
      saidWhenStored.remove(ticket);
      UndoSteps.Step undone = undoing.remove(ticket);
      if (undone != null) {
        undo.made(undone); // the mark stands in the record: it can still be undone
      } else {
        undo.forget(ticket);
      }
      Object key = MarkWrites.key(p, f);
      RecordedMark holds;
      if (f == null) {
        if (answered(p)) {
          marks.reset(p, stored.latest(p));
        }
        holds = stored.latest(p);
      } else {
        if (answered(f)) {
          frame.reset(f, storedFrame.latest(f));
        }
        holds = storedFrame.latest(f);
      }
      String what = f == null ? p.toString() : "the " + f;
      unsaved.put(key, "Not recorded: " + (undone != null ? "the undo of " : "") + what + " " + describe(mark)
          + " (" + why + "). The " + (f == null ? "panel" : "member") + " shows what the record holds"
          + (holds == null || holds.mark().state() == PanelState.NOT_INSPECTED ? " (no mark)" : " (" + describe(holds.mark()) + ")")
          + ": mark it again.");
      error.set(unsavedWords());
      reanalyse();
    }

    @Override
    public void passedOver(long ticket, PanelRef p, FrameRef f) {
      saidWhenStored.remove(ticket);
      undoing.remove(ticket);
      if (f == null) {
        if (answered(p)) {
          marks.reset(p, stored.latest(p));
        }
      } else if (answered(f)) {
        frame.reset(f, storedFrame.latest(f));
      }
      reanalyse();
    }

    @Override
    public void storedRest(long ticket, List<RecordedMark> made) {
      unsaved.remove("rest");
      for (RecordedMark r : made) {
        stored.put(r.panel(), r, r.mark());
        unsaved.remove(r.panel());
        if (answered(r.panel())) {
          marks.put(r.panel(), r, r.mark());
        }
      }
      error.set(unsavedWords());
      LongFunction<String> said = saidWhenStored.remove(ticket);
      if (said != null && ticket == newestTicket) {
        status.set(said.apply(0));
      }
      reanalyse();
    }

    @Override
    public void refusedRest(long ticket, List<PanelRef> panels, String why) {
      saidWhenStored.remove(ticket);
      for (PanelRef p : panels) {
        if (answered(p)) {
          marks.reset(p, stored.latest(p));
        }
      }
      unsaved.put("rest", "Not recorded: the " + panels.size() + " panels as found as designed (" + why
          + "). They show what the record holds: press A to ask again.");
      error.set(unsavedWords());
      reanalyse();
    }

    /** One write on {@code p} (a panel or frame member) answered: true when none is left waiting. */
    private boolean answered(Object p) {
      int left = pending.merge(p, -1, Integer::sum);
      if (left <= 0) {
        pending.remove(p);
        return true;
      }
      return false;
    }
  }

  /** The marks not recorded, each naming its panel; empty when every write so far is stored. */
  private String unsavedWords() {
    return String.join(" ", unsaved.values());
  }

  /** True while some mark or undo is queued and not yet answered by the record. */
  public boolean writing() {
    return !pending.isEmpty();
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
      cursor.frameInWalkProperty().set(v);
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
    photos.addCameraPhotos(choose, said -> {
      if (said.error() != null) {
        error.set(said.error());
      }
      if (said.status() != null) {
        status.set(said.status());
      }
    });
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

  /** Moves on in the walk order; at its end, what the status adds (else empty). */
  private String advance() {
    if (cursor.next()) {
      return "";
    }
    // counted from the marks as they are now, this one included
    if (allMarked()) {
      return ". Every panel is marked: see Findings (Ctrl+4).";
    }
    if (cursor.orderProperty().get().bracedOnly()) {
      int rest = notLookedAt().size();
      return ". End of the braced panels: A records the " + rest + (rest == 1 ? " panel" : " panels")
          + " not yet looked at as found as designed (asks first); Home goes to the first of them.";
    }
    return ". End of the walk order; press Home for the first panel not yet marked.";
  }

  /** Counted from the marks as shown (this one included). */
  private boolean allMarked() {
    return marks.findingMap().size() == design.grid().panelCount();
  }

  /** The finding of each panel with a stored mark (withdrawn marks excluded): what the record holds. */
  public Map<PanelRef, PanelFinding> findings() {
    return Map.copyOf(stored.findingMap());
  }

  /** The effective members as the conservative verdict counts them, from the stored marks (for tests). */
  Map<PanelRef, Brace> conservativeMembers() {
    return Map.copyOf(stored.conservativeMembers());
  }

  /** The live verdict drawn again from the stored marks, and the picture. */
  private void reanalyse() {
    try {
      live.update(stored, storedFrame, cursor.frameInWalkProperty().get());
    } catch (RuntimeException e) {
      // the marks are stored; only the verdict shown is behind
      error.set("The verdict could not be worked out again (" + e.getMessage()
          + "); every mark is saved. Findings (Ctrl+4) works it out from the record.");
    }
    refreshPicture();
  }

  /** The state of each frame member with a stored mark in force (withdrawn marks excluded). */
  public Map<FrameRef, PanelState> frameFindings() {
    return Map.copyOf(storedFrame.states());
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
    int pos = cursor.position(WalkStop.of(c));
    return "Lift " + c.lift() + ", bay " + c.bay() + " \u2014 " + designed + "; " + found
        + (pos > 0 ? " (" + pos + " of " + cursor.length() + " in walk order)"
            : " (not in this walk order: " + cursor.orderProperty().get().words().toLowerCase(java.util.Locale.ROOT) + ")");
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
