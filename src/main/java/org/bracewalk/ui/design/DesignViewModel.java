package org.bracewalk.ui.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Executor;
import java.util.function.Supplier;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.PanelSide;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.app.verdict.VerdictKind;

/**
 * Edits one plane's design: grid size and dimensions, support, and the brace or opening of each
 * panel, the frame members (ledgers, standards) the design leaves out, with fill helpers. Every change re-analyses the design, so its verdict, loss tolerance and
 * the braces that would make it rigid are always current. Saving a design that does not hold its
 * shape asks first.
 */
public final class DesignViewModel {
  private final PlaneAnalyzer analyzer;
  private final DesignSaver saver;
  private final ObjectProperty<PlaneRole> role;
  private final DialogService dialogs;
  private final Executor ui;
  private final Executor background;
  /** The plane as named (and its revision): follows a save as a new plane. */
  private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "");
  /** The id of the plane edited (0 when the saver names none): follows a save as a new plane. */
  private final javafx.beans.property.ReadOnlyLongWrapper planeId =
      new javafx.beans.property.ReadOnlyLongWrapper(this, "planeId");
  /** True while a save runs on the background executor. */
  private boolean saving;

  private final ReadOnlyObjectWrapper<PlaneDesign> design = new ReadOnlyObjectWrapper<>(this, "design");
  private final ReadOnlyObjectWrapper<PlanePicture> picture = new ReadOnlyObjectWrapper<>(this, "picture");
  private final ReadOnlyObjectWrapper<PanelRef> cursor = new ReadOnlyObjectWrapper<>(this, "cursor");
  /** The side of the cursor's panel selected (a ledger or standard), or null: the panel itself. */
  private final ReadOnlyObjectWrapper<PanelSide> side = new ReadOnlyObjectWrapper<>(this, "side");
  private final ReadOnlyObjectWrapper<VerdictKind> verdictKind = new ReadOnlyObjectWrapper<>(this, "verdictKind");
  private final ReadOnlyStringWrapper verdictText = new ReadOnlyStringWrapper(this, "verdictText");
  /** The verdict's sentence without its symbol, for the save warning. */
  private String verdictSentence = "";
  private final ReadOnlyStringWrapper toleranceText = new ReadOnlyStringWrapper(this, "toleranceText");
  private final ReadOnlyStringWrapper error = new ReadOnlyStringWrapper(this, "error", "");
  private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
  private final ReadOnlyStringWrapper cursorText = new ReadOnlyStringWrapper(this, "cursorText", "");
  private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty");

  private final IntegerProperty lifts = new SimpleIntegerProperty(this, "lifts");
  private final IntegerProperty bays = new SimpleIntegerProperty(this, "bays");
  private final StringProperty widths = new SimpleStringProperty(this, "widths");
  private final StringProperty heights = new SimpleStringProperty(this, "heights");
  private final ObjectProperty<Support> support = new SimpleObjectProperty<>(this, "support");
  private final ObjectProperty<MemberKind> kind = new SimpleObjectProperty<>(this, "kind", MemberKind.RIGID);
  private final BooleanProperty showSuggestion = new SimpleBooleanProperty(this, "showSuggestion", true);
  private final StringProperty note = new SimpleStringProperty(this, "note", "");
  private final StringProperty author = new SimpleStringProperty(this, "author", "");

  private final IntegerProperty fillStep = new SimpleIntegerProperty(this, "fillStep", 3);
  private final IntegerProperty fillFirstBay = new SimpleIntegerProperty(this, "fillFirstBay", 1);

  private PlaneAnalysis lastAnalysis;

  /**
   * @param initial the design shown first
   * @param title the plane's name as shown
   * @param analyzer the engine
   * @param saver stores the design
   * @param dialogs questions and warnings
   * @param ui runs on the toolkit's thread (tests: same thread)
   * @param background runs the database work of saving (tests: same thread)
   */
  public DesignViewModel(PlaneDesign initial, String title, PlaneAnalyzer analyzer, DesignSaver saver,
      DialogService dialogs, Executor ui, Executor background) {
    this.ui = Objects.requireNonNull(ui, "ui");
    this.background = Objects.requireNonNull(background, "background");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.saver = Objects.requireNonNull(saver, "saver");
    this.role = new SimpleObjectProperty<>(this, "role", saver.role());
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.title.set(title == null ? "" : title);
    this.planeId.set(saver.planeId());
    cursor.set(new PanelRef(1, 1));
    load(initial);
    dirty.set(false);
    cursor.addListener((o, a, b) -> refreshPicture());
    side.addListener((o, a, b) -> refreshPicture());
    showSuggestion.addListener((o, a, b) -> refreshPicture());
  }

  private void load(PlaneDesign d) {
    PlaneGrid g = d.grid();
    lifts.set(g.lifts());
    bays.set(g.bays());
    widths.set(numbers(g.bayWidths()));
    heights.set(numbers(g.liftHeights()));
    support.set(g.support());
    setDesign(d);
  }

  private static String numbers(List<Double> xs) {
    List<String> out = new ArrayList<>();
    for (double x : xs) {
      String s = String.format(Locale.ROOT, "%.3f", x).replaceAll("0+$", "").replaceAll("\\.$", "");
      out.add(s);
    }
    return String.join(" ", out);
  }

  private void setDesign(PlaneDesign d) {
    design.set(d);
    dirty.set(true);
    PanelRef c = cursor.get();
    if (c == null || !d.grid().contains(c)) {
      cursor.set(new PanelRef(Math.min(c == null ? 1 : c.lift(), d.grid().lifts()),
          Math.min(c == null ? 1 : c.bay(), d.grid().bays())));
    }
    lastAnalysis = analyzer.analyse(d);
    StateAnalysis s = lastAnalysis.design();
    int need = lastAnalysis.repair().minimum();
    if (s.rigid()) {
      verdictKind.set(VerdictKind.HOLDS);
      verdictSentence = "As designed, the plane holds its shape.";
      verdictText.set(VerdictKind.HOLDS.symbol() + " " + verdictSentence);
    } else {
      verdictKind.set(VerdictKind.LOST);
      String how =
          s.degreesOfFreedom() == 0
              ? "its tension-only members let it sway one way."
              : s.degreesOfFreedom() + (s.degreesOfFreedom() == 1 ? " independent motion." : " independent motions.");
      String fix =
          lastAnalysis.repair().possible()
              ? " " + need + (need == 1 ? " more brace would" : " more braces would") + " make it rigid (drawn dash-dot, numbered)."
              : " No brace in the allowed panels can make it rigid: remove an opening or change the support.";
      verdictSentence = "As designed, the plane does NOT hold its shape: " + how + fix;
      verdictText.set(VerdictKind.LOST.symbol() + " " + verdictSentence);
    }
    int k = s.lossTolerance();
    String atLeast = s.lossToleranceExact() ? "" : "at least ";
    toleranceText.set(
        k < 0
            ? "Loss tolerance: none (not rigid)."
            : k == 0
                ? "Loss tolerance: 0 \u2014 " + s.criticalBraces().size() + " critical braces; losing any one lets it sway."
                : "Loss tolerance: " + atLeast + k + " \u2014 stays rigid after losing any " + atLeast + k
                    + (k == 1 ? " brace." : " braces."));
    refreshPicture();
  }

  private void refreshPicture() {
    PlaneDesign d = design.get();
    if (d == null) {
      return;
    }
    StateAnalysis s = lastAnalysis.design();
    picture.set(
        new PlanePicture(
            d,
            Map.of(),
            false,
            s.blocks(),
            Set.copyOf(s.criticalBraces()),
            showSuggestion.get() ? lastAnalysis.repair().braces() : List.of(),
            Set.of(),
            cursor.get(),
            Map.of(),
            selectedMember(),
            s.freedoms()));
    cursorText.set(describe(cursor.get()));
  }

  /** The ledger or standard selected, or null when the panel itself is. */
  public FrameRef selectedMember() {
    PanelRef c = cursor.get();
    return side.get() == null || c == null ? null : side.get().of(c);
  }

  private String describe(PanelRef p) {
    if (p == null) {
      return "";
    }
    PlaneDesign d = design.get();
    Brace b = d.braceAt(p);
    String what = d.isOpening(p) ? "opening" : b == null ? "no brace" : b.token() + " (" + b.kind().label() + ")";
    boolean critical = lastAnalysis.design().criticalBraces().contains(p);
    List<String> out = new ArrayList<>();
    for (PanelSide ps : PanelSide.values()) {
      if (!d.hasFrameMember(ps.of(p))) {
        out.add(ps.words());
      }
    }
    String frame = out.isEmpty() ? "" : "; left out: " + String.join(", ", out);
    FrameRef m = selectedMember();
    String selected = m == null ? ""
        : " \u2014 selected: " + m + (d.hasFrameMember(m) ? " (in the design)" : " (left out of the design)")
            + (lastAnalysis.design().criticalMembers().contains(m) ? ", critical" : "");
    return "Lift " + p.lift() + ", bay " + p.bay() + ": " + what + (critical ? ", critical" : "") + frame + selected;
  }

  // ---- frame members --------------------------------------------------------------------------

  /**
   * Selects {@code s} of the current panel (a ledger or standard); selecting the side already
   * selected goes back to the panel itself.
   */
  public void selectSide(PanelSide s) {
    side.set(s == side.get() ? null : s);
  }

  /** Back to the panel itself (its diagonal). */
  public void clearSide() {
    side.set(null);
  }

  /** Leaves the selected ledger or standard out of the design, or puts it back; false when none is selected. */
  public boolean toggleSelectedMember() {
    FrameRef m = selectedMember();
    if (m == null) {
      error.set("No ledger or standard selected: Shift and an arrow key select one side of the current panel.");
      return false;
    }
    toggleMember(m);
    return true;
  }

  /**
   * A click or tap on a ledger or standard: selects it (the cursor goes to a panel it borders) and
   * leaves it out of the design, or puts it back.
   */
  public void toggleMember(FrameRef m) {
    PlaneDesign d = design.get();
    if (!m.within(d.grid())) {
      return;
    }
    PanelRef c = cursor.get();
    PanelSide here = c == null ? null : PanelSide.of(c, m);
    if (here == null) {
      PanelSide.Placed placed = PanelSide.place(m);
      cursor.set(placed.panel());
      here = placed.side();
    }
    side.set(here);
    Set<FrameRef> omitted = new HashSet<>(d.omittedFrame());
    boolean out = !omitted.remove(m);
    if (out) {
      omitted.add(m);
    }
    error.set("");
    setDesign(d.withOmittedFrame(omitted));
    status.set((out ? "Left out of the design: " : "Back in the design: ") + m + ".");
  }

  // ---- panel editing --------------------------------------------------------------------------

  /** Puts {@code diagonal} of the current kind in the cursor's panel; {@code null} clears it. */
  public void setBrace(Diagonal diagonal) {
    setBraceAt(cursor.get(), diagonal);
  }

  private void setBraceAt(PanelRef p, Diagonal diagonal) {
    PlaneDesign d = design.get();
    Map<PanelRef, Brace> braces = new HashMap<>(d.braces());
    Set<PanelRef> openings = new HashSet<>(d.openings());
    openings.remove(p);
    if (diagonal == null) {
      braces.remove(p);
    } else {
      braces.put(p, new Brace(diagonal, kind.get()));
    }
    error.set("");
    setDesign(new PlaneDesign(d.grid(), braces, openings, d.omittedFrame()));
  }

  /** Makes the cursor's panel an opening (its brace, if any, goes), or back to an empty panel. */
  public void toggleOpening() {
    PanelRef p = cursor.get();
    PlaneDesign d = design.get();
    Map<PanelRef, Brace> braces = new HashMap<>(d.braces());
    Set<PanelRef> openings = new HashSet<>(d.openings());
    if (!openings.remove(p)) {
      openings.add(p);
      braces.remove(p);
    }
    setDesign(new PlaneDesign(d.grid(), braces, openings, d.omittedFrame()));
  }

  /** Switches the cursor's brace between rigid and tension-only; also the kind of new braces. */
  public void toggleKind() {
    kind.set(kind.get() == MemberKind.RIGID ? MemberKind.TENSION_ONLY : MemberKind.RIGID);
    Brace b = design.get().braceAt(cursor.get());
    if (b != null) {
      setBraceAt(cursor.get(), b.diagonal());
    }
  }

  /** A click or tap: moves the cursor there and cycles none → / → \ → X → opening → none. */
  public void cycle(PanelRef p) {
    if (!design.get().grid().contains(p)) {
      return;
    }
    cursor.set(p);
    PlaneDesign d = design.get();
    if (d.isOpening(p)) {
      setBraceAt(p, null);
      return;
    }
    Brace b = d.braceAt(p);
    if (b == null) {
      setBraceAt(p, Diagonal.RISING);
    } else if (b.diagonal() == Diagonal.RISING) {
      setBraceAt(p, Diagonal.FALLING);
    } else if (b.diagonal() == Diagonal.FALLING) {
      setBraceAt(p, Diagonal.BOTH);
    } else {
      toggleOpening();
    }
  }

  public void move(int dLift, int dBay) {
    PlaneGrid g = design.get().grid();
    PanelRef p = cursor.get();
    cursor.set(new PanelRef(
        Math.max(1, Math.min(g.lifts(), p.lift() + dLift)),
        Math.max(1, Math.min(g.bays(), p.bay() + dBay))));
  }

  public void select(PanelRef p) {
    if (design.get().grid().contains(p)) {
      cursor.set(p);
    }
  }

  // ---- grid -----------------------------------------------------------------------------------

  /**
   * Applies the lifts, bays, widths, heights and support fields. Braces and left-out frame members
   * outside the new grid go; a
   * width or height list of one value applies to every bay or lift; a shorter list is an error.
   * On any error nothing changes and the message names the field.
   */
  public boolean applyGrid() {
    int m = lifts.get();
    int n = bays.get();
    try {
      if (m < 1) {
        throw new IllegalArgumentException("Lifts: " + m + " is out of range; give 1 to "
            + PlaneLimits.MAX_LIFTS + " lifts.");
      }
      if (n < 1) {
        throw new IllegalArgumentException("Bays: " + n + " is out of range; give 1 to "
            + PlaneLimits.MAX_BAYS + " bays.");
      }
      // the one limit of a stored plane, before anything of that size is built
      PlaneLimits.problem(title.get(), m, n).ifPresent(problem -> {
        throw new IllegalArgumentException(
            (PlaneLimits.fieldOver(m, n).equals("lifts") ? "Lifts: " : "Bays: ") + problem + ".");
      });
      List<Double> w = parseSizes("Widths", widths.get(), n, "bay", design.get().grid().bayWidths());
      List<Double> h = parseSizes("Heights", heights.get(), m, "lift", design.get().grid().liftHeights());
      PlaneGrid g = new PlaneGrid(m, n, w, h, support.get());
      PlaneDesign old = design.get();
      Map<PanelRef, Brace> braces = new HashMap<>();
      old.braces().forEach((p, b) -> {
        if (g.contains(p)) {
          braces.put(p, b);
        }
      });
      Set<PanelRef> openings = new HashSet<>();
      old.openings().forEach(p -> {
        if (g.contains(p)) {
          openings.add(p);
        }
      });
      Set<FrameRef> omitted = new HashSet<>();
      old.omittedFrame().forEach(f -> {
        if (f.within(g)) {
          omitted.add(f);
        }
      });
      widths.set(numbers(w));
      heights.set(numbers(h));
      error.set("");
      setDesign(new PlaneDesign(g, braces, openings, omitted));
      return true;
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
  }

  /**
   * Parses a list of sizes in metres. One value fills every position; when the count grows, the
   * earlier values are kept and the last one repeats (so adding bays needs no retyping).
   */
  static List<Double> parseSizes(String field, String text, int count, String unit, List<Double> previous) {
    String t = text == null ? "" : text.strip();
    if (t.isEmpty()) {
      throw new IllegalArgumentException(field + ": empty. Give one size in metres per " + unit + ", or one for all.");
    }
    if (t.equals(numbers(previous)) && previous.size() > count) {
      // the list was not edited and the grid shrank: keep the first values
      return List.copyOf(previous.subList(0, count));
    }
    String[] parts = t.split("[\\s;]+");
    List<Double> values = new ArrayList<>();
    for (int i = 0; i < parts.length; i++) {
      String s = parts[i].replace(',', '.');
      double v;
      try {
        v = Double.parseDouble(s);
      } catch (NumberFormatException e) {
        throw new IllegalArgumentException(
            field + ": value " + (i + 1) + " '" + parts[i] + "' is not a number of metres (such as 2.4).");
      }
      if (!(v > 0) || v > 100 || Double.isNaN(v)) {
        throw new IllegalArgumentException(
            field + ": value " + (i + 1) + " (" + parts[i] + ") must be more than 0 and at most 100 metres.");
      }
      values.add(v);
    }
    if (values.size() == 1) {
      return java.util.Collections.nCopies(count, values.get(0));
    }
    if (values.size() > count) {
      throw new IllegalArgumentException(
          field + ": " + values.size() + " values for " + count + " " + unit + "s. Give one per " + unit + ", or one for all.");
    }
    while (values.size() < count) {
      values.add(values.get(values.size() - 1));
    }
    return values;
  }

  // ---- fills ----------------------------------------------------------------------------------

  public boolean fillEveryKthBay(Diagonal diagonal) {
    return fill(() -> BracingPatterns.everyKthBay(design.get(), fillStep.get(), fillFirstBay.get(), new Brace(diagonal, kind.get())),
        "a " + diagonal.symbol() + " brace every " + fillStep.get() + " bays from bay " + fillFirstBay.get());
  }

  public boolean fillZigZag() {
    return fill(() -> BracingPatterns.zigZag(design.get(), fillStep.get(), fillFirstBay.get(), kind.get()),
        "a zig-zag every " + fillStep.get() + " bays from bay " + fillFirstBay.get());
  }

  public boolean fillEveryPanel() {
    return fill(() -> BracingPatterns.everyPanel(design.get(), new Brace(Diagonal.RISING, kind.get()), true),
        "every panel, zig-zag");
  }

  public boolean clearBraces() {
    return fill(() -> BracingPatterns.clear(design.get()), "no braces");
  }

  private boolean fill(java.util.function.Supplier<PlaneDesign> f, String what) {
    try {
      setDesign(f.get());
      error.set("");
      status.set("Filled: " + what + ".");
      return true;
    } catch (IllegalArgumentException e) {
      error.set(e.getMessage());
      return false;
    }
  }

  // ---- save -----------------------------------------------------------------------------------

  /**
   * Saves the design as a new revision; asks first when it does not hold its shape. The database
   * work runs on the background executor and the status says when it is done; false when nothing
   * is being saved.
   */
  public boolean save() {
    if (saving) {
      status.set("Still saving the design; wait for it to finish.");
      return false;
    }
    PlaneDesign d = design.get();
    String n = note.get() == null ? "" : note.get().strip();
    if (!lastAnalysis.design().rigid()) {
      // the safe choice (not saving) is the default button: Enter does not store a design that sways
      boolean go =
          dialogs.confirmRisky(
              "This design does not hold its shape",
              (title.get().isEmpty() ? "This plane" : title.get())
                  + " as designed can sway: "
                  + verdictSentence
                  + "\n\nA plane built to this design would need more bracing before it is used."
                  + " Save it anyway (for example, as a record of what is on site)?",
              "Save anyway",
              "Do not save");
      if (!go) {
        status.set("Not saved.");
        return false;
      }
      n = (n.isEmpty() ? "" : n + " ") + "[saved although not rigid as designed; warning acknowledged]";
    }
    Supplier<String> work;
    try {
      work = saver.prepare(d, author.get() == null ? "" : author.get().strip(), n,
          role.get() == null ? saver.role() : role.get());
    } catch (SaveDeclined e) {
      error.set("");
      status.set("Not saved: " + e.getMessage() + ".");
      return false;
    } catch (RuntimeException e) {
      notSaved(e);
      return false;
    }
    saving = true;
    error.set("");
    status.set("Saving the design\u2026");
    background.execute(() -> {
      try {
        String rev = work.get();
        ui.execute(() -> {
          saving = false;
          // a change made while saving is not in the saved revision
          if (design.get().equals(d)) {
            dirty.set(false);
          }
          // a save as a new plane: the editor now edits that plane, and says so
          String now = saver.title();
          if (now != null) {
            title.set(now);
          }
          planeId.set(saver.planeId());
          status.set("Saved as " + rev + ".");
        });
      } catch (RuntimeException e) {
        ui.execute(() -> {
          saving = false;
          status.set("");
          notSaved(e);
        });
      }
    });
    return true;
  }

  private void notSaved(RuntimeException e) {
    error.set("Design not saved: " + e.getMessage());
    dialogs.showError("Design not saved", error.get());
  }

  // ---- properties -----------------------------------------------------------------------------

  /**
   * What the plane is (upright frame, spine, facade, ...): the role of a new plane saved from a
   * changed grid; a stored plane keeps its own.
   */
  public ObjectProperty<PlaneRole> roleProperty() {
    return role;
  }

  public String title() {
    return title.get();
  }

  /** The plane as named, with its revision; follows a save as a new plane. */
  public ReadOnlyStringProperty titleProperty() {
    return title.getReadOnlyProperty();
  }

  /** The id of the plane edited (0 when not known); follows a save as a new plane. */
  public javafx.beans.property.ReadOnlyLongProperty planeIdProperty() {
    return planeId.getReadOnlyProperty();
  }

  /**
   * Whether the editor may be left (another screen opened, the window closed): at once when
   * nothing is unsaved; otherwise the person is asked, with staying as the default.
   */
  public boolean mayLeave() {
    if (!dirty.get()) {
      return true;
    }
    boolean leave = dialogs.confirmRisky("The design has unsaved changes",
        "The changes to " + (title.get().isEmpty() ? "this design" : title.get()) + " are not saved. Leave"
            + " without saving them (they are lost), or stay and save them (Ctrl+S)?",
        "Leave without saving", "Stay");
    if (!leave) {
      status.set("Still here: save the design with Ctrl+S, or leave again to drop the changes.");
    }
    return leave;
  }

  public PlaneDesign design() {
    return design.get();
  }

  public PlaneAnalysis analysis() {
    return lastAnalysis;
  }

  public ReadOnlyObjectProperty<PlanePicture> pictureProperty() {
    return picture.getReadOnlyProperty();
  }

  public ReadOnlyObjectProperty<PanelRef> cursorProperty() {
    return cursor.getReadOnlyProperty();
  }

  public PanelRef cursor() {
    return cursor.get();
  }

  public ReadOnlyObjectProperty<PanelSide> sideProperty() {
    return side.getReadOnlyProperty();
  }

  public ReadOnlyObjectProperty<VerdictKind> verdictKindProperty() {
    return verdictKind.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty verdictTextProperty() {
    return verdictText.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty toleranceTextProperty() {
    return toleranceText.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty errorProperty() {
    return error.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty statusProperty() {
    return status.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty cursorTextProperty() {
    return cursorText.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty dirtyProperty() {
    return dirty.getReadOnlyProperty();
  }

  public IntegerProperty liftsProperty() {
    return lifts;
  }

  public IntegerProperty baysProperty() {
    return bays;
  }

  public StringProperty widthsProperty() {
    return widths;
  }

  public StringProperty heightsProperty() {
    return heights;
  }

  public ObjectProperty<Support> supportProperty() {
    return support;
  }

  public ObjectProperty<MemberKind> kindProperty() {
    return kind;
  }

  public BooleanProperty showSuggestionProperty() {
    return showSuggestion;
  }

  public StringProperty noteProperty() {
    return note;
  }

  public StringProperty authorProperty() {
    return author;
  }

  public IntegerProperty fillStepProperty() {
    return fillStep;
  }

  public IntegerProperty fillFirstBayProperty() {
    return fillFirstBay;
  }
}
