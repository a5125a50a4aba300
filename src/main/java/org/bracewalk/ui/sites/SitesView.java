package org.bracewalk.ui.sites;

import java.util.List;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputControl;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Widgets;

/** The sites overview screen. Only binds to its view model. */
public final class SitesView extends BorderPane {
  private final SitesViewModel vm;
  private final TableView<OverviewRow> table = new TableView<>();
  private final TextField inspector = new TextField();
  /** A plane to select once the rows are read (0: none). */
  private long pendingPlane;
  /** Select the first structure once the rows are read. */
  private boolean pendingFirst;

  public SitesView(SitesViewModel vm) {
    this.vm = vm;
    getStyleClass().add("screen");
    setId("sites-screen");
    Label title = new Label("Sites, structures and planes");
    title.getStyleClass().add("screen-title");
    setTop(Widgets.row(12, title, Widgets.grow(), Widgets.hint("Database: " + vm.databaseLocation())));

    table.setId("sites-table");
    table.setItems(vm.rows());
    vm.rows().addListener((javafx.collections.ListChangeListener<OverviewRow>) c -> {
      if (vm.rows().isEmpty()) {
        return;
      }
      if (pendingPlane != 0) {
        long p = pendingPlane;
        pendingPlane = 0;
        pendingFirst = false;
        selectPlane(p);
      } else if (pendingFirst) {
        pendingFirst = false;
        focusTable();
      }
    });
    table.getColumns().add(column("Name", 210, this::name));
    table.getColumns().add(column("What", 120, r -> r.level() == OverviewRow.Level.SITE ? "" : r.kind()));
    table.getColumns().add(column("Latest verdict", 290, OverviewRow::verdictText));
    table.getColumns().add(column("Last inspected", 150, r -> r.level() == OverviewRow.Level.STRUCTURE ? r.lastInspected() : ""));
    TableColumn<OverviewRow, OverviewRow> due = new TableColumn<>("Next inspection due");
    due.setPrefWidth(280);
    due.setCellValueFactory(c -> new javafx.beans.property.SimpleObjectProperty<>(c.getValue()));
    due.setCellFactory(c -> new TableCell<>() {
      @Override
      protected void updateItem(OverviewRow r, boolean emptyCell) {
        super.updateItem(r, emptyCell);
        getStyleClass().remove("overdue");
        if (emptyCell || r == null || r.level() != OverviewRow.Level.STRUCTURE) {
          setText(null);
          return;
        }
        setText(r.due().words() + " \u00b7 " + r.nextDue());
        if (r.due() == OverviewRow.Due.OVERDUE || r.due() == OverviewRow.Due.NEVER_INSPECTED
            || r.due() == OverviewRow.Due.LOST_RIGIDITY) {
          getStyleClass().add("overdue");
        }
      }
    });
    table.getColumns().add(due);
    table.getColumns().add(column("Interval", 90, OverviewRow::interval));
    table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY);
    table.setRowFactory(t -> new TableRow<>() {
      @Override
      protected void updateItem(OverviewRow r, boolean emptyRow) {
        super.updateItem(r, emptyRow);
        setStyle(r != null && r.level() != OverviewRow.Level.PLANE ? "-fx-font-weight: bold;" : "");
      }
    });
    table.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> vm.selectedProperty().set(b));
    table.setPlaceholder(new Label(""));
    table.setOnMouseClicked(e -> {
      if (e.getClickCount() == 2) {
        vm.open(ScreenId.WALK);
      }
    });

    javafx.scene.layout.HBox actions = side();
    actions.visibleProperty().bind(vm.emptyProperty().not());
    actions.managedProperty().bind(actions.visibleProperty());
    VBox.setVgrow(table, Priority.ALWAYS);
    VBox withActions = new VBox(10, table, actions);
    StackPane centre = new StackPane(withActions, emptyOffer());
    setCenter(centre);
    Label error = Widgets.text(vm.errorProperty(), "error-text");
    error.setId("sites-error");
    Label status = Widgets.text(vm.statusProperty());
    status.setId("sites-status");
    VBox bottom = new VBox(4, error, status);
    bottom.setPadding(new Insets(6, 0, 0, 0));
    setBottom(bottom);
    addEventHandler(KeyEvent.KEY_PRESSED, this::onKey);
  }

  private String name(OverviewRow r) {
    return switch (r.level()) {
      case SITE -> "\u25A3 " + r.name();
      case STRUCTURE -> "    " + r.name();
      case PLANE -> "        \u2022 " + r.name();
    };
  }

  private static TableColumn<OverviewRow, String> column(
      String title, double width, java.util.function.Function<OverviewRow, String> value) {
    TableColumn<OverviewRow, String> c = new TableColumn<>(title);
    c.setPrefWidth(width);
    c.setSortable(false);
    c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
    return c;
  }

  private Node emptyOffer() {
    Label head = new Label("This database holds no sites yet.");
    head.getStyleClass().add("screen-title");
    Label where = Widgets.text("Database: " + vm.databaseLocation());
    where.setMaxWidth(640);
    Label offer = Widgets.text("Load the demo site to try Bracewalk: an invented depot with a racking run and a"
        + " facade scaffold. The racking run has two finished inspections, a routine one and one after a forklift"
        + " struck upright frame 2 (which lost rigidity); the scaffold has one finished routine inspection, which"
        + " found a ledger of its west end bay taken out. It goes into this database file.");
    offer.setMaxWidth(640);
    Button load = new Button("Load the demo site (L)");
    load.setId("load-demo");
    load.setDefaultButton(true);
    load.setOnAction(e -> vm.loadDemo(() -> {
      table.requestFocus();
      table.getSelectionModel().select(0);
    }));
    load.setStyle("-fx-font-size: 1.2em; -fx-min-height: 56;");
    VBox box = new VBox(14, head, where, offer, load);
    box.getStyleClass().add("empty-offer");
    box.setAlignment(Pos.CENTER);
    box.visibleProperty().bind(vm.emptyProperty());
    box.setStyle("-fx-background-color: #f4f2ed;");
    return box;
  }

  private javafx.scene.layout.HBox side() {
    Label sel = Widgets.text(vm.selectionTextProperty());
    sel.setId("sites-selection");
    Button walk = wide("Walk-round (Enter, Ctrl+3)", () -> vm.open(ScreenId.WALK));
    walk.setId("open-walk");
    Button design = wide("Design (Ctrl+2)", () -> vm.open(ScreenId.DESIGN));
    Button findings = wide("Findings and repair (Ctrl+4)", () -> vm.open(ScreenId.FINDINGS));
    Button history = wide("History (Ctrl+5)", () -> vm.open(ScreenId.HISTORY));
    GridPane buttons = new GridPane();
    buttons.setHgap(8);
    buttons.setVgap(8);
    Button interval = wide("Days between inspections\u2026 (D)", vm::changeInterval);
    interval.setId("change-interval");
    Button retire = wide("Retire plane\u2026", vm::retirePlane);
    retire.setId("retire-plane");
    buttons.addRow(0, walk, design);
    buttons.addRow(1, findings, history);
    buttons.add(interval, 0, 2, 2, 1);
    buttons.add(retire, 0, 3, 2, 1);
    javafx.scene.layout.ColumnConstraints half = new javafx.scene.layout.ColumnConstraints();
    half.setPercentWidth(50);
    buttons.getColumnConstraints().addAll(half, half);
    VBox open = Widgets.box("Open", sel, buttons);

    inspector.setId("start-inspector");
    inspector.textProperty().bindBidirectional(vm.inspectorNameProperty());
    inspector.setPromptText("full name");
    TextField position = new TextField();
    position.setId("start-position");
    position.textProperty().bindBidirectional(vm.inspectorPositionProperty());
    position.setPromptText("position, firm");
    ChoiceBox<InspectionReason> reason = new ChoiceBox<>();
    reason.getItems().addAll(InspectionReason.values());
    reason.valueProperty().bindBidirectional(vm.reasonProperty());
    reason.setConverter(new StringConverter<>() {
      @Override
      public String toString(InspectionReason r) {
        return r == null ? "" : r.label().replace('-', ' ');
      }

      @Override
      public InspectionReason fromString(String s) {
        return null;
      }
    });
    TextField competent = new TextField();
    competent.textProperty().bindBidirectional(vm.competentPersonProperty());
    competent.setPromptText("full name");
    competent.setId("start-competent");
    TextField shift = new TextField();
    shift.textProperty().bindBidirectional(vm.shiftProperty());
    shift.setPromptText("e.g. day, before work");
    shift.setId("start-shift");
    TextField storage = new TextField();
    storage.setId("start-storage");
    storage.textProperty().bindBidirectional(vm.storageSafetyPersonProperty());
    storage.setPromptText("racking only");
    GridPane form = new GridPane();
    form.setHgap(8);
    form.setVgap(6);
    // two fields a row, read left to right and top to bottom in the order Tab takes them (the order
    // of the children): who inspects, their position, the competent person, the shift, the racking's
    // storage safety person, and why; the README's walk-round paragraph names the same order
    // (SitesFormOrderFxTest)
    Node[][] fields = {
        {mnemonic("_Inspector", inspector), inspector},
        {mnemonic("_Position", position), position},
        {mnemonic("_Competent person", competent), competent},
        {mnemonic("S_hift", shift), shift},
        {mnemonic("S_torage safety", storage), storage},
        {mnemonic("_Reason", reason), reason}};
    for (int i = 0; i < fields.length; i++) {
      form.add(fields[i][0], (i % 2) * 2, i / 2);
      form.add(fields[i][1], (i % 2) * 2 + 1, i / 2);
      GridPane.setHgrow(fields[i][1], Priority.ALWAYS);
    }
    reason.setMaxWidth(Double.MAX_VALUE);
    GridPane.setHgrow(inspector, Priority.ALWAYS);
    Button start = wide("Start inspection now (Ctrl+Enter)", vm::startInspection);
    start.setId("start-inspection");
    VBox startBox = Widgets.box("New inspection of the selected structure", form, start,
        Widgets.hint("All fields go on the report and cannot be changed later (storage safety: racking only)."
            + " Start shows every value for a last look before the inspection begins; every mark you then"
            + " make is saved the moment you make it."));
    form.getColumnConstraints().addAll(new javafx.scene.layout.ColumnConstraints(),
        new javafx.scene.layout.ColumnConstraints(120, 200, Double.MAX_VALUE),
        new javafx.scene.layout.ColumnConstraints(),
        new javafx.scene.layout.ColumnConstraints(120, 200, Double.MAX_VALUE));
    javafx.scene.layout.HBox.setHgrow(open, Priority.ALWAYS);
    javafx.scene.layout.HBox.setHgrow(startBox, Priority.ALWAYS);
    open.setPrefWidth(420);
    startBox.setPrefWidth(560);
    javafx.scene.layout.HBox side = new javafx.scene.layout.HBox(10, open, startBox);
    side.setMaxHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
    side.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
    return side;
  }

  private static Button wide(String text, Runnable action) {
    Button b = new Button(text);
    b.setMaxWidth(Double.MAX_VALUE);
    b.setOnAction(e -> action.run());
    return b;
  }

  private static Label mnemonic(String text, Node target) {
    Label l = new Label(text);
    l.setMinWidth(Label.USE_PREF_SIZE);
    l.setMnemonicParsing(true);
    l.setLabelFor(target);
    return l;
  }

  private void onKey(KeyEvent e) {
    Node focus = getScene() == null ? null : getScene().getFocusOwner();
    if (e.getCode() == KeyCode.ENTER && e.isShortcutDown()) {
      vm.startInspection();
      e.consume();
      return;
    }
    if (focus instanceof TextInputControl || focus instanceof ChoiceBox) {
      if (e.getCode() == KeyCode.ESCAPE) {
        table.requestFocus();
        e.consume();
      }
      return;
    }
    if (e.getCode() == KeyCode.L && vm.emptyProperty().get()) {
      vm.loadDemo(() -> {
        table.requestFocus();
        table.getSelectionModel().select(0);
      });
      e.consume();
    } else if (e.getCode() == KeyCode.ENTER && focus == table) {
      OverviewRow r = vm.selectedProperty().get();
      if (r != null && r.openInspectionId() == 0 && r.structureId() > 0) {
        inspector.requestFocus();
      } else {
        vm.open(ScreenId.WALK);
      }
      e.consume();
    } else if (e.getCode() == KeyCode.D && !e.isShortcutDown() && !e.isAltDown()) {
      vm.changeInterval();
      e.consume();
    } else if (e.getCode() == KeyCode.F5) {
      vm.refresh();
      e.consume();
    }
  }

  /** Focus on the table, first structure selected (once the rows are read). */
  public void focusTable() {
    table.requestFocus();
    if (vm.rows().isEmpty()) {
      pendingFirst = true;
      return;
    }
    if (table.getSelectionModel().isEmpty()) {
      int index = vm.rows().size() > 1 ? 1 : 0;
      table.getSelectionModel().select(index);
    }
  }

  public void selectPlane(long planeId) {
    if (vm.rows().isEmpty()) {
      // the rows are still being read: select the plane when they arrive
      pendingPlane = planeId;
      return;
    }
    for (int i = 0; i < vm.rows().size(); i++) {
      if (vm.rows().get(i).planeId() == planeId) {
        table.getSelectionModel().select(i);
        table.scrollTo(Math.max(0, i - 3));
      }
    }
  }

  public static KeyHelp.Section keys() {
    return new KeyHelp.Section(
        "Sites",
        List.of(
            KeyHelp.of("Up / Down", "choose a structure or plane"),
            KeyHelp.of("Enter", "open its walk-round (or, with no open inspection, go to the inspector field)"),
            KeyHelp.of("Alt+ I P C H T R", "inspector, position, competent person, shift, storage safety, reason of a new inspection"),
            KeyHelp.of("Ctrl+Enter", "start the inspection (after a last look at every value)"),
            KeyHelp.of("D", "days between routine inspections of the selected structure"),
            KeyHelp.of("L", "load the demo site (empty database only)"),
            KeyHelp.of("F5", "read the database again")));
  }
}
