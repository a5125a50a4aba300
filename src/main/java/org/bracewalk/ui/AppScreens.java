package org.bracewalk.ui;

import java.time.Clock;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
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
import org.bracewalk.ui.walk.InspectionMarkRecorder;
import org.bracewalk.ui.walk.WalkView;
import org.bracewalk.ui.walk.WalkViewModel;

/** Builds every screen over the application's services, each with fresh data from the database. */
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
  private SitesViewModel preloaded;

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
  }

  /** The key help of every screen, in rail order. */
  public static List<KeyHelp.Section> screenKeys() {
    return List.of(SitesView.keys(), DesignView.keys(), WalkView.keys(), FindingsView.keys(), HistoryView.keys());
  }

  @Override
  public Screen build(ScreenId id, Selection selection, Navigator navigator) {
    if (id != ScreenId.OVERVIEW && !selection.hasPlane()) {
      return overview(navigator, selection);
    }
    return switch (id) {
      case OVERVIEW -> overview(navigator, selection);
      case DESIGN -> design(selection);
      case WALK -> walk(selection, navigator);
      case FINDINGS -> findings(selection, navigator);
      case HISTORY -> history(selection);
    };
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
    return Screen.of(view, "Sites", view::focusTable, sel);
  }

  private String crumbs(PlaneRecord plane, Inspection inspection) {
    Structure st = services.sites().structure(plane.structureId());
    Site site = services.sites().site(st.siteId());
    return site.name() + "  \u203a  " + st.name() + "  \u203a  " + plane.name()
        + (inspection == null ? "" : "  \u00b7  inspection " + inspection.id()
            + (inspection.isFinalised() ? " (finalised)" : " (open)"));
  }

  private Screen design(Selection s) {
    PlaneRecord plane = services.sites().plane(s.planeId());
    DesignRevision rev = services.sites().currentDesign(plane.id());
    DesignViewModel vm =
        new DesignViewModel(rev.design(), plane.name() + " (revision " + rev.number() + ")", analyzer,
            new PlaneDesignSaver(services.sites(), plane, clock, dialogs), dialogs, ui, background);
    DesignView view = new DesignView(vm);
    return focused(view, crumbs(plane, null) + "  \u00b7  design", view::focusPlane);
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

  private Screen walk(Selection s, Navigator navigator) {
    PlaneRecord plane = services.sites().plane(s.planeId());
    Optional<Inspection> found = inspectionFor(s);
    if (found.isEmpty()) {
      Label l = Widgets.text("No inspection of this structure yet. On Sites (Ctrl+1), select it, fill in the"
          + " inspector and press Start; the walk-round opens here.");
      l.getStyleClass().add("screen-title");
      Button back = new Button("Go to Sites (Ctrl+1)");
      back.setOnAction(e -> navigator.open(ScreenId.OVERVIEW, s));
      VBox box = new VBox(14, l, back);
      box.getStyleClass().add("empty-offer");
      return focused(box, crumbs(plane, null), back::requestFocus);
    }
    Inspection insp = found.get();
    if (!services.inspections().covers(insp.id(), plane.id())) {
      return notInScope(plane, insp, s, navigator);
    }
    Structure st = services.sites().structure(plane.structureId());
    // the design fixed when the inspection started: a revision saved while it is open is for the
    // next inspection, so the walk continues against the design it started with
    DesignRevision design = services.inspections().designInForce(insp.id(), plane.id());
    WalkViewModel vm =
        new WalkViewModel(design.design(), st.name() + ", " + plane.name(), plane.role(),
            InspectionMarkRecorder.existing(services.inspections(), insp.id(), plane.id()),
            new InspectionMarkRecorder(services.inspections(), insp.id(), plane.id(), insp.inspectorName()),
            analyzer, dialogs, st.kind() == StructureKind.RACKING_RUN, insp.isFinalised(), clock, ui, background);
    vm.useCameraFolderSetting(cameraFolder);
    vm.useFrameInWalkSetting(frameInWalk);
    WalkView view = new WalkView(vm);
    Selection here = new Selection(st.id(), plane.id(), insp.id());
    BorderPane wrap = new BorderPane(view);
    wrap.setTop(planeBar(insp, st, plane, p -> navigator.open(ScreenId.WALK, new Selection(st.id(), p, insp.id()))));
    wrap.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
      if (e.isControlDown() && e.getCode() == KeyCode.P) {
        ((ChoiceBox<?>) ((javafx.scene.layout.HBox) wrap.getTop()).lookup("#plane-choice")).show();
        e.consume();
      }
    });
    return focusedWithSelection(wrap, crumbs(plane, insp), view::focusPlane, here);
  }

  private Node planeBar(Inspection insp, Structure st, PlaneRecord current, java.util.function.LongConsumer open) {
    ChoiceBox<PlaneRecord> choice = new ChoiceBox<>();
    choice.setId("plane-choice");
    // the planes the inspection covers (a plane retired before it started is not one of them)
    choice.getItems().addAll(insp == null ? services.sites().planes(st.id()) : services.inspections().planesOf(insp.id()));
    choice.setConverter(new javafx.util.StringConverter<>() {
      @Override
      public String toString(PlaneRecord p) {
        return p == null ? "" : p.name() + " (" + p.grid().lifts() + " \u00d7 " + p.grid().bays() + ")";
      }

      @Override
      public PlaneRecord fromString(String t) {
        return null;
      }
    });
    for (PlaneRecord p : choice.getItems()) {
      if (p.id() == current.id()) {
        choice.setValue(p);
      }
    }
    choice.setOnAction(e -> {
      if (choice.getValue() != null && choice.getValue().id() != current.id()) {
        open.accept(choice.getValue().id());
      }
    });
    choice.setFocusTraversable(false);
    Label who = new Label("Inspection " + insp.id() + " by " + insp.inspectorName() + " \u00b7 "
        + insp.reason().label().replace('-', ' ') + (insp.isFinalised() ? " \u00b7 finalised (read-only)" : " \u00b7 open"));
    var bar = Widgets.row(10, who, Widgets.grow(), new Label("Plane (Ctrl+P):"), choice);
    bar.setPadding(new Insets(12, 12, 0, 12));
    return bar;
  }

  /**
   * The planes of an inspection are fixed when it starts: a plane added later is walked, and its
   * findings shown, in a later inspection.
   */
  private Screen notInScope(PlaneRecord plane, Inspection insp, Selection s, Navigator navigator) {
    Label l = Widgets.text("Plane '" + plane.name() + "' is not part of inspection " + insp.id()
        + ": the planes an inspection covers are fixed when it starts, and this plane was added"
        + " after. To inspect it, start a new inspection on Sites (Ctrl+1).");
    l.getStyleClass().add("screen-title");
    Button back = new Button("Go to Sites (Ctrl+1)");
    back.setOnAction(e -> navigator.open(ScreenId.OVERVIEW, s));
    VBox box = new VBox(14, l, back);
    box.getStyleClass().add("empty-offer");
    return focused(box, crumbs(plane, insp), back::requestFocus);
  }

  private Screen findings(Selection s, Navigator navigator) {
    PlaneRecord plane = services.sites().plane(s.planeId());
    Optional<Inspection> found = inspectionFor(s);
    if (found.isEmpty()) {
      Label l = Widgets.text("No inspection of this structure yet: nothing to show. Start one on Sites (Ctrl+1).");
      l.getStyleClass().add("screen-title");
      VBox box = new VBox(l);
      box.getStyleClass().add("empty-offer");
      return focused(box, crumbs(plane, null), box::requestFocus);
    }
    Inspection insp = found.get();
    if (!services.inspections().covers(insp.id(), plane.id())) {
      return notInScope(plane, insp, s, navigator);
    }
    FindingsViewModel vm = new FindingsViewModel(services.sites(), services.inspections(), services.analysis(), analyzer, issuer, dialogs, ui, background, insp.id(), plane.id());
    FindingsView view = new FindingsView(vm,
        p -> navigator.open(ScreenId.FINDINGS, new Selection(plane.structureId(), p, insp.id())));
    vm.load(); // on the background executor
    return focusedWithSelection(view, crumbs(plane, insp), view::focusPlane,
        new Selection(plane.structureId(), plane.id(), insp.id()));
  }

  private Screen history(Selection s) {
    PlaneRecord plane = services.sites().plane(s.planeId());
    HistoryView view = new HistoryView(new HistoryViewModel(services.history(), services.sites(), ui, background, plane.id()));
    return focused(view, crumbs(plane, null) + "  \u00b7  history", view::focusList);
  }

  private static Screen focused(Node node, String crumbs, Runnable focus) {
    return focusedWithSelection(node, crumbs, focus, null);
  }

  private static Screen focusedWithSelection(Node node, String crumbs, Runnable focus, Selection sel) {
    return Screen.of(node, crumbs, focus, sel == null ? null : new javafx.beans.property.SimpleObjectProperty<>(sel));
  }

}
