package org.bracewalk.ui;

import java.time.Clock;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import java.util.function.Supplier;
import javafx.beans.binding.Bindings;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.VBox;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.RecordsChanged;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.common.Widgets;
import org.bracewalk.ui.design.DesignView;
import org.bracewalk.ui.design.DesignViewModel;
import org.bracewalk.ui.design.PlaneDesignSaver;
import org.bracewalk.ui.findings.FindingsView;
import org.bracewalk.ui.findings.FindingsViewModel;
import org.bracewalk.ui.findings.ReportIssuer;
import org.bracewalk.ui.history.HistoryView;
import org.bracewalk.ui.history.HistoryViewModel;
import org.bracewalk.ui.sites.SitesView;
import org.bracewalk.ui.sites.SitesViewModel;
import org.bracewalk.ui.walk.InOrder;
import org.bracewalk.ui.walk.InspectionMarkRecorder;
import org.bracewalk.ui.walk.RecordedMark;
import org.bracewalk.ui.walk.WalkView;
import org.bracewalk.ui.walk.WalkViewModel;

/**
 * Builds every screen over the application's services, each with fresh data from the database.
 *
 * <p>A screen opens in two steps: what it shows is read from the record on {@link #records} (an
 * ordered queue on the background executor, never the JavaFX thread) into a small value per
 * screen ({@link Place}, {@link DesignRead}, {@link WalkRead}, {@link FindingsRead}); its nodes are
 * then built from that value on the UI executor. The walk-round's marks are written through the
 * same ordered queue, so a walk-round opened while marks are still queued reads its plane's stored
 * records after they are written, never before.
 */
public final class AppScreens implements ScreenFactory {
  /** The camera folder, remembered in the user's preferences between sessions. */
  private final org.bracewalk.ui.walk.CameraFolder.Setting cameraFolder =
      org.bracewalk.ui.walk.CameraFolder.Setting.userPreferences();
  /** Whether the walk order takes in every ledger and standard, remembered beside the camera folder. */
  private final org.bracewalk.ui.walk.FrameInWalkSetting frameInWalk =
      org.bracewalk.ui.walk.FrameInWalkSetting.userPreferences();
  private final AppServices services;
  private final PlaneAnalyzer analyzer;
  private final Clock clock;
  private final DialogService dialogs;
  private final Executor ui;
  private final Executor background;
  private final ReportIssuer issuer;
  /**
   * Where screens read the record and walk-rounds write their marks: one at a time, in the order
   * queued, on the background executor.
   */
  private final Executor records;
  private SitesViewModel preloaded;
  /** The records-changed signal (the main window): told after a write another part may show. */
  private RecordsChanged changes = RecordsChanged.NONE;

  public AppScreens(
      AppServices services,
      PlaneAnalyzer analyzer,
      Clock clock,
      DialogService dialogs,
      Executor ui,
      Executor background,
      ReportIssuer issuer) {
    this.services = Objects.requireNonNull(services, "services");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.clock = Objects.requireNonNull(clock, "clock");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.ui = Objects.requireNonNull(ui, "ui");
    this.background = Objects.requireNonNull(background, "background");
    this.issuer = Objects.requireNonNull(issuer, "issuer");
    this.records = new InOrder(background);
  }

  /** Where to send the records-changed signal (the main window passes it on to the screen shown). */
  public void useRecordsChanged(RecordsChanged signal) {
    this.changes = java.util.Objects.requireNonNull(signal, "signal");
  }

  /** The key help of every screen, in rail order. */
  public static List<KeyHelp.Section> screenKeys() {
    return List.of(SitesView.keys(), DesignView.keys(), WalkView.keys(), FindingsView.keys(), HistoryView.keys());
  }

  @Override
  public void open(ScreenId id, Selection selection, Navigator navigator, Consumer<Screen> shown,
      Consumer<String> failed) {
    if (id == ScreenId.OVERVIEW || !selection.hasPlane()) {
      // the Sites view model reads its rows on the background executor itself
      ui.execute(() -> shown.accept(overview(navigator, selection)));
      return;
    }
    records.execute(() -> {
      Supplier<Screen> build;
      try {
        build = switch (id) {
          case DESIGN -> {
            DesignRead r = readDesign(selection);
            yield () -> design(r, selection);
          }
          case WALK -> {
            WalkRead r = readWalk(selection);
            yield () -> walk(r, selection, navigator);
          }
          case FINDINGS -> {
            FindingsRead r = readFindings(selection);
            yield () -> findings(r, selection, navigator);
          }
          case HISTORY -> {
            Place r = place(selection.planeId());
            yield () -> history(r);
          }
          case OVERVIEW -> throw new IllegalStateException("the Sites screen is built above");
        };
      } catch (CannotRead e) {
        System.getLogger(AppScreens.class.getName()).log(System.Logger.Level.WARNING,
            "opening " + id.title() + ": " + e.getMessage(), e.getCause());
        String words = "Could not open " + id.title() + ": " + e.getMessage()
            + ". The screen shown stays; open it again (Ctrl+" + id.digit() + ") to retry.";
        ui.execute(() -> failed.accept(words));
        return;
      }
      ui.execute(() -> shown.accept(build.get()));
    });
  }

  /** What could not be read from the record, named for the person (the cause's words kept). */
  private static final class CannotRead extends RuntimeException {
    private static final long serialVersionUID = 1L;

    CannotRead(String what, RuntimeException cause) {
      super(what + " could not be read from the database (" + cause.getMessage() + ")", cause);
    }
  }

  /** Reads {@code what} from the record (off the JavaFX thread), naming it if that fails. */
  private static <T> T read(String what, Supplier<T> reading) {
    try {
      return reading.get();
    } catch (CannotRead e) {
      throw e;
    } catch (RuntimeException e) {
      throw new CannotRead(what, e);
    }
  }

  /** Where a plane is: the plane, its structure and its site (for the header). */
  private record Place(PlaneRecord plane, Structure structure, Site site) { }

  /** What the design screen shows: the plane's current revision. */
  private record DesignRead(Place place, DesignRevision revision) { }

  /**
   * What the findings screen needs before its view model reads the rest: the inspection (empty
   * when none) and whether it covers the plane.
   */
  private record FindingsRead(Place place, Optional<Inspection> inspection, boolean covered) { }

  /**
   * What the walk-round starts from: the inspection (empty when none), whether it covers the plane,
   * the design in force, the marks already stored for the plane and the planes it covers.
   */
  private record WalkRead(Place place, Optional<Inspection> inspection, boolean covered, DesignRevision design,
      List<RecordedMark> existing, List<org.bracewalk.app.PlaneProgress> planes) { }

  private Place place(long planeId) {
    PlaneRecord plane = read("plane " + planeId, () -> services.sites().plane(planeId));
    Structure st = read("the structure of plane '" + plane.name() + "'",
        () -> services.sites().structure(plane.structureId()));
    Site site = read("the site of structure '" + st.name() + "'", () -> services.sites().site(st.siteId()));
    return new Place(plane, st, site);
  }

  private DesignRead readDesign(Selection s) {
    Place p = place(s.planeId());
    return new DesignRead(p, read("the current design of plane '" + p.plane().name() + "'",
        () -> services.sites().currentDesign(p.plane().id())));
  }

  private FindingsRead readFindings(Selection s) {
    Place p = place(s.planeId());
    Optional<Inspection> found = read("the inspections of structure '" + p.structure().name() + "'",
        () -> inspectionFor(s));
    boolean covered = found.isPresent() && read("the planes of inspection " + found.get().id(),
        () -> services.inspections().covers(found.get().id(), p.plane().id()));
    return new FindingsRead(p, found, covered);
  }

  /** On the ordered queue: after every mark queued before it is written. */
  private WalkRead readWalk(Selection s) {
    FindingsRead f = readFindings(s);
    if (!f.covered()) {
      return new WalkRead(f.place(), f.inspection(), false, null, List.of(), List.of());
    }
    long inspection = f.inspection().orElseThrow().id();
    long plane = f.place().plane().id();
    String name = "'" + f.place().plane().name() + "'";
    // the design fixed when the inspection started: a revision saved while it is open is for the
    // next inspection, so the walk continues against the design it started with
    DesignRevision design = read("the design in force for plane " + name + " in inspection " + inspection,
        () -> services.inspections().designInForce(inspection, plane));
    List<RecordedMark> existing = read("the marks already recorded for plane " + name + " in inspection " + inspection,
        () -> InspectionMarkRecorder.existing(services.inspections(), inspection, plane));
    // the planes the inspection covers (a plane retired before it started is not one of them),
    // each with its progress and verdict for the plane chooser
    List<org.bracewalk.app.PlaneProgress> planes = read("the planes of inspection " + inspection,
        () -> services.analysis().progress(inspection));
    return new WalkRead(f.place(), f.inspection(), true, design, existing, planes);
  }

  /**
   * Reads the Sites screen's rows now, on the calling thread (the launcher's, while the window
   * is still being styled), for the first time the Sites screen is shown.
   */
  public void preloadOverview(Navigator navigator) {
    preloaded = sites(navigator);
  }

  private SitesViewModel sites(Navigator navigator) {
    return new SitesViewModel(services.sites(), services.inspections(), services.analysis(), services.demo(),
        services.location(), clock, dialogs, navigator, ui, background);
  }

  private Screen overview(Navigator navigator, Selection selection) {
    SitesViewModel vm = preloaded != null ? preloaded : sites(navigator);
    preloaded = null;
    SitesView view = new SitesView(vm);
    if (selection.hasPlane()) {
      view.selectPlane(selection.planeId());
    }
    var sel = Bindings.createObjectBinding(vm::selectionForOthers, vm.selectedProperty());
    LiveScreen screen = new LiveScreen(view, "Sites", view::focusTable, sel);
    // a change another part made: the rows are read again
    screen.reread = source -> {
      if (source != vm) {
        vm.refresh();
      }
    };
    return screen;
  }

  private static String crumbs(Place place, Inspection inspection) {
    return place.site().name() + "  \u203a  " + place.structure().name() + "  \u203a  " + place.plane().name()
        + (inspection == null ? "" : "  \u00b7  inspection " + inspection.id()
            + (inspection.isFinalised() ? " (finalised)" : " (open)"));
  }

  private Screen design(DesignRead r, Selection opened) {
    PlaneRecord plane = r.place().plane();
    DesignRevision rev = r.revision();
    DesignViewModel vm =
        new DesignViewModel(rev.design(), plane.name() + " (revision " + rev.number() + ")", analyzer,
            new PlaneDesignSaver(services.sites(), plane, rev.number(), clock, dialogs), dialogs, ui, background);
    DesignView view = new DesignView(vm);
    Place place = r.place();
    // the header and the selection follow a save as a new plane: the editor then edits that plane
    var crumbsNow = Bindings.createStringBinding(() -> place.site().name() + "  \u203a  " + place.structure().name()
        + "  \u203a  " + vm.titleProperty().get() + "  \u00b7  design", vm.titleProperty());
    var selectionNow = Bindings.createObjectBinding(() -> {
      long now = vm.planeIdProperty().get();
      return now == 0 || now == plane.id() ? opened : new Selection(plane.structureId(), now, 0);
    }, vm.planeIdProperty());
    LiveScreen screen = new LiveScreen(view, crumbsNow.get(), view::focusPlane, selectionNow);
    screen.crumbs.bind(crumbsNow);
    screen.mayLeave = vm::mayLeave;
    return screen;
  }

  /** The inspection a screen is about: the one selected, else the structure's open one, else its latest. */
  private Optional<Inspection> inspectionFor(Selection s) {
    if (s.hasInspection()) {
      Inspection i = services.inspections().inspection(s.inspectionId());
      if (i.structureId() == s.structureId() || s.structureId() == 0) {
        return Optional.of(i);
      }
    }
    List<Inspection> all = services.inspections().inspections(s.structureId());
    Optional<Inspection> open = all.stream().filter(i -> !i.isFinalised()).max(Comparator.comparing(Inspection::startedAt));
    return open.isPresent() ? open : all.stream().max(Comparator.comparing(Inspection::startedAt));
  }

  private Screen walk(WalkRead r, Selection s, Navigator navigator) {
    PlaneRecord plane = r.place().plane();
    Optional<Inspection> found = r.inspection();
    if (found.isEmpty()) {
      Label l = Widgets.text("No inspection of this structure yet. On Sites (Ctrl+1), select it, fill in the"
          + " inspector and press Start; the walk-round opens here.");
      l.getStyleClass().add("screen-title");
      Button back = new Button("Go to Sites (Ctrl+1)");
      back.setOnAction(e -> navigator.open(ScreenId.OVERVIEW, s));
      VBox box = new VBox(14, l, back);
      box.getStyleClass().add("empty-offer");
      return focused(box, crumbs(r.place(), null), back::requestFocus);
    }
    Inspection insp = found.get();
    if (!r.covered()) {
      return notInScope(r.place(), insp, s, navigator);
    }
    Structure st = r.place().structure();
    // the marks are written on the ordered queue the next walk-round reads its stored marks on
    WalkViewModel vm =
        new WalkViewModel(r.design().design(), st.name() + ", " + plane.name(), plane.role(), r.existing(),
            new InspectionMarkRecorder(services.inspections(), insp.id(), plane.id(), insp.inspectorName()),
            analyzer, dialogs, st.kind() == StructureKind.RACKING_RUN, insp.isFinalised(), clock, ui, records);
    vm.useCameraFolderSetting(cameraFolder);
    vm.useFrameInWalkSetting(frameInWalk);
    if (insp.reason() == org.bracewalk.core.model.InspectionReason.ROUTINE) {
      // a routine walk visits the braced panels; A records the rest as designed, after asking
      vm.startWith(org.bracewalk.ui.walk.WalkOrder.BRACED_BAYS_UP_AND_DOWN);
    }
    WalkView view = new WalkView(vm);
    Selection here = new Selection(st.id(), plane.id(), insp.id());
    BorderPane wrap = new BorderPane(view);
    org.bracewalk.ui.walk.PlaneChooser chooser = new org.bracewalk.ui.walk.PlaneChooser(insp, r.planes(), plane.id(), vm,
        p -> navigator.open(ScreenId.WALK, new Selection(st.id(), p, insp.id())));
    wrap.setTop(chooser);
    wrap.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
      if (e.isControlDown() && e.getCode() == KeyCode.P) {
        chooser.show();
        e.consume();
      }
    });
    LiveScreen screen = new LiveScreen(wrap, crumbs(r.place(), insp), view::focusPlane,
        new javafx.beans.property.SimpleObjectProperty<>(here));
    // a change made elsewhere (the inspection finalised, say): the header and the bar read it again
    screen.reread = source -> rereadInspection(insp.id(), r.place(), screen, chooser);
    return screen;
  }

  /**
   * Reads inspection {@code id} again (on the ordered queue) and puts its state into the header
   * and, when given, the walk-round's bar. A failed read leaves them as they are.
   */
  private void rereadInspection(long id, Place place, LiveScreen screen, org.bracewalk.ui.walk.PlaneChooser who) {
    records.execute(() -> {
      Inspection now;
      try {
        now = services.inspections().inspection(id);
      } catch (RuntimeException e) {
        System.getLogger(AppScreens.class.getName()).log(System.Logger.Level.WARNING,
            "reading inspection " + id + " again: " + e.getMessage(), e);
        return;
      }
      ui.execute(() -> {
        screen.crumbs.set(crumbs(place, now));
        if (who != null) {
          who.inspectionChanged(now);
        }
      });
    });
  }

  /**
   * The planes of an inspection are fixed when it starts: a plane added later is walked, and its
   * findings shown, in a later inspection.
   */
  private static Screen notInScope(Place place, Inspection insp, Selection s, Navigator navigator) {
    PlaneRecord plane = place.plane();
    Label l = Widgets.text("Plane '" + plane.name() + "' is not part of inspection " + insp.id()
        + ": the planes an inspection covers are fixed when it starts, and this plane was added"
        + " after. To inspect it, start a new inspection on Sites (Ctrl+1).");
    l.getStyleClass().add("screen-title");
    Button back = new Button("Go to Sites (Ctrl+1)");
    back.setOnAction(e -> navigator.open(ScreenId.OVERVIEW, s));
    VBox box = new VBox(14, l, back);
    box.getStyleClass().add("empty-offer");
    return focused(box, crumbs(place, insp), back::requestFocus);
  }

  private Screen findings(FindingsRead r, Selection s, Navigator navigator) {
    PlaneRecord plane = r.place().plane();
    Optional<Inspection> found = r.inspection();
    if (found.isEmpty()) {
      Label l = Widgets.text("No inspection of this structure yet: nothing to show. Start one on Sites (Ctrl+1).");
      l.getStyleClass().add("screen-title");
      VBox box = new VBox(l);
      box.getStyleClass().add("empty-offer");
      return focused(box, crumbs(r.place(), null), box::requestFocus);
    }
    Inspection insp = found.get();
    if (!r.covered()) {
      return notInScope(r.place(), insp, s, navigator);
    }
    FindingsViewModel vm = new FindingsViewModel(services.sites(), services.inspections(), services.analysis(), analyzer, issuer, dialogs, ui, background, insp.id(), plane.id());
    FindingsView view = new FindingsView(vm,
        p -> navigator.open(ScreenId.FINDINGS, new Selection(plane.structureId(), p, insp.id())));
    vm.load(); // on the background executor
    LiveScreen screen = new LiveScreen(view, crumbs(r.place(), insp), view::focusPlane,
        new javafx.beans.property.SimpleObjectProperty<>(new Selection(plane.structureId(), plane.id(), insp.id())));
    // finalising here is a change the header shows: the signal goes round the shell
    vm.finalisedProperty().addListener((o, was, now) -> {
      if (now && !was) {
        changes.changed(vm);
      }
    });
    screen.reread = source -> {
      if (source != vm) {
        vm.load(); // a change made elsewhere: the findings are read again
      }
      rereadInspection(insp.id(), r.place(), screen, null);
    };
    return screen;
  }

  private Screen history(Place place) {
    HistoryView view = new HistoryView(
        new HistoryViewModel(services.history(), services.sites(), ui, background, place.plane().id()));
    return focused(view, crumbs(place, null) + "  \u00b7  history", view::focusList);
  }

  private static Screen focused(Node node, String crumbs, Runnable focus) {
    return focusedWithSelection(node, crumbs, focus, null);
  }

  private static Screen focusedWithSelection(Node node, String crumbs, Runnable focus, Selection sel) {
    return Screen.of(node, crumbs, focus, sel == null ? null : new javafx.beans.property.SimpleObjectProperty<>(sel));
  }

  /**
   * A screen whose header words can change, that may ask before it is left, and that reads again
   * what it shows on the records-changed signal.
   */
  private static final class LiveScreen implements Screen {
    private final Node node;
    private final javafx.beans.property.StringProperty crumbs;
    private final Runnable focus;
    private final javafx.beans.value.ObservableValue<Selection> selection;
    private java.util.function.BooleanSupplier mayLeave = () -> true;
    private Consumer<Object> reread = source -> { };

    LiveScreen(Node node, String crumbs, Runnable focus, javafx.beans.value.ObservableValue<Selection> selection) {
      this.node = node;
      this.crumbs = new javafx.beans.property.SimpleStringProperty(crumbs);
      this.focus = focus;
      this.selection = selection;
    }

    @Override
    public Node node() {
      return node;
    }

    @Override
    public String crumbs() {
      return crumbs.get();
    }

    @Override
    public javafx.beans.value.ObservableValue<String> crumbsValue() {
      return crumbs;
    }

    @Override
    public void focus() {
      focus.run();
    }

    @Override
    public javafx.beans.value.ObservableValue<Selection> selection() {
      return selection;
    }

    @Override
    public boolean mayLeave() {
      return mayLeave.getAsBoolean();
    }

    @Override
    public void reread(Object source) {
      reread.accept(source);
    }
  }
}
