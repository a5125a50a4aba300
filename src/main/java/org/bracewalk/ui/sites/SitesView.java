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
  /** The columns are to be fitted to their words again before the table's next layout. */
  private boolean refit = true;
  private final TableView<OverviewRow> table = new TableView<>() {
    @Override
    protected void layoutChildren() {
      // fitted here, not where a font or width changes (that is in the middle of styling the
      // cells: rows rebuilt then missed their selected look)
      if (refit) {
        refit = false;
        fitColumns();
      }
      super.layoutChildren();
    }
  };
  private final TextField inspector = new TextField();
  /** A plane to select once the rows are read (0: none). */
  private long pendingPlane;
  /** Select the first structure once the rows are read. */
  private boolean pendingFirst;

  public SitesView(SitesViewModel vm) {
    this.vm = vm;
    getStyleClass().add("screen");
    setId("sites-screen");
    Label title = Widgets.text("Sites, structures and planes");
    title.getStyleClass().add("screen-title");
    Label database = Widgets.hint("Database: " + vm.databaseLocation());
    database.setMaxWidth(Label.USE_PREF_SIZE);
    // the title and the database side by side where both fit, else the database below
    setTop(new org.bracewalk.ui.common.LineOrStack(12, title, database));

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
    table.getColumns().add(column("Name", this::name));
    table.getColumns().add(column("What", r -> r.level() == OverviewRow.Level.SITE ? "" : r.kind()));
    table.getColumns().add(verdictColumn());
    table.getColumns().add(column("Last inspected", r -> r.level() == OverviewRow.Level.STRUCTURE ? r.lastInspected() : ""));
    TableColumn<OverviewRow, OverviewRow> due = new TableColumn<>("Next inspection due");
    due.setSortable(false);
    due.setCellValueFactory(c -> new javafx.beans.property.SimpleObjectProperty<>(c.getValue()));
    due.setCellFactory(c -> new TableCell<>() {
      {
        setWrapText(true);
        fontProperty().addListener((o, a, b) -> fontChanged(b));
      }

      @Override
      protected double computePrefHeight(double width) {
        return super.computePrefHeight(width < 0 && getTableColumn() != null ? getTableColumn().getWidth() : width);
      }

      @Override
      protected void updateItem(OverviewRow r, boolean emptyCell) {
        super.updateItem(r, emptyCell);
        getStyleClass().remove("overdue");
        if (emptyCell || r == null || r.level() != OverviewRow.Level.STRUCTURE) {
          setText(null);
          return;
        }
        setText(dueText(r));
        if (r.due() == OverviewRow.Due.OVERDUE || r.due() == OverviewRow.Due.NEVER_INSPECTED
            || r.due() == OverviewRow.Due.LOST_RIGIDITY) {
          getStyleClass().add("overdue");
        }
      }
    });
    table.getColumns().add(due);
    table.getColumns().add(column("Interval", OverviewRow::interval));
    // every column as wide as its widest entry, the room left shared out; where the table is
    // narrower than that, the widest columns give way and their words wrap (the rows grow); only
    // where even that does not fit (large text, a small window) the table scrolls sideways
    table.setColumnResizePolicy(TableView.UNCONSTRAINED_RESIZE_POLICY);
    table.widthProperty().addListener((o, a, b) -> refitColumns());
    vm.rows().addListener((javafx.collections.ListChangeListener<OverviewRow>) c -> refitColumns());
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

    javafx.scene.layout.Region actions = side();
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

  private TableColumn<OverviewRow, String> column(
      String title, java.util.function.Function<OverviewRow, String> value) {
    TableColumn<OverviewRow, String> c = new TableColumn<>(title);
    c.setSortable(false);
    c.setUserData(value);
    c.setCellValueFactory(d -> new ReadOnlyStringWrapper(value.apply(d.getValue())));
    c.setCellFactory(col -> {
      TableCell<OverviewRow, String> cell = new TableCell<>() {
        @Override
        protected void updateItem(String item, boolean empty) {
          super.updateItem(item, empty);
          setText(empty ? null : item);
        }
      };
      // the text size changed (Ctrl+=): the columns are measured again
      cell.fontProperty().addListener((o, a, b) -> fontChanged(b));
      return cell;
    });
    return c;
  }

  /**
   * The verdict column: the one with long words, the one that gives way when the table is narrower
   * than its columns. Its words wrap within the column (a text wrapped to the column's width, in the
   * cell's font and colour, so a selected row shows it in the selection's text colour) and the row
   * grows to hold them.
   */
  private TableColumn<OverviewRow, String> verdictColumn() {
    TableColumn<OverviewRow, String> c = column("Latest verdict", OverviewRow::verdictText);
    c.setCellFactory(col -> {
      javafx.scene.text.Text words = new javafx.scene.text.Text();
      TableCell<OverviewRow, String> cell = new TableCell<>() {
        @Override
        protected void updateItem(String item, boolean empty) {
          super.updateItem(item, empty);
          words.setText(empty || item == null ? "" : item);
          setGraphic(empty ? null : words);
        }
      };
      words.fontProperty().bind(cell.fontProperty());
      words.fillProperty().bind(cell.textFillProperty());
      words.wrappingWidthProperty().bind(javafx.beans.binding.Bindings.createDoubleBinding(
          () -> Math.max(20, c.getWidth() - cell.snappedLeftInset() - cell.snappedRightInset() - 2),
          c.widthProperty(), cell.paddingProperty()));
      cell.fontProperty().addListener((o, a, b) -> fontChanged(b));
      return cell;
    });
    verdict = c;
    return c;
  }

  private TableColumn<OverviewRow, String> verdict;

  private static String dueText(OverviewRow r) {
    return r.level() != OverviewRow.Level.STRUCTURE ? "" : r.due().words() + " \u00b7 " + r.nextDue();
  }

  /** The font a cell of the table shows its text in now (the table's own, after the stylesheet). */
  private javafx.scene.text.Font cellFont() {
    Node cell = table.lookup(".table-cell");
    return cell instanceof javafx.scene.control.Labeled l ? l.getFont() : javafx.scene.text.Font.getDefault();
  }

  /**
   * Makes every column as wide as its widest entry or heading (site and structure rows in bold), and
   * shares what is left of the table's width out among them.
   */
  @SuppressWarnings("unchecked")
  private void fitColumns() {
    javafx.scene.text.Font font = cellFont();
    javafx.scene.text.Font bold = javafx.scene.text.Font.font(font.getFamily(), javafx.scene.text.FontWeight.BOLD, font.getSize());
    double pad = font.getSize() * 0.8 + 6; // a cell's padding and a little air
    double[] widths = new double[table.getColumns().size()];
    double sum = 0;
    for (int i = 0; i < widths.length; i++) {
      TableColumn<OverviewRow, ?> c = table.getColumns().get(i);
      double w = textWidth(c.getText(), bold);
      for (OverviewRow r : vm.rows()) {
        String t = c.getUserData() instanceof java.util.function.Function<?, ?> f
            ? ((java.util.function.Function<OverviewRow, String>) f).apply(r) : dueText(r);
        w = Math.max(w, textWidth(t, r.level() != OverviewRow.Level.PLANE ? bold : font));
      }
      widths[i] = Math.ceil(w + pad);
      sum += widths[i];
    }
    double room = table.getWidth() - table.snappedLeftInset() - table.snappedRightInset() - 20; // a scroll bar
    double[] shown = new double[widths.length];
    if (sum <= room) {
      for (int i = 0; i < widths.length; i++) {
        shown[i] = widths[i] + (room - sum) * widths[i] / sum;
      }
    } else {
      // the verdict column gives way (its words wrap), never below its heading or eight letters;
      // the others keep their words on one line, and the table scrolls sideways if it must
      int v = table.getColumns().indexOf(verdict);
      for (int i = 0; i < widths.length; i++) {
        shown[i] = widths[i];
      }
      double others = sum - widths[v];
      double heading = Math.ceil(textWidth(verdict.getText(), bold) + pad);
      shown[v] = Math.min(widths[v], Math.max(Math.max(heading, font.getSize() * 8), room - others));
    }
    boolean changed = false;
    for (int i = 0; i < widths.length; i++) {
      TableColumn<OverviewRow, ?> c = table.getColumns().get(i);
      if (Math.abs(c.getPrefWidth() - shown[i]) >= 1) {
        c.setPrefWidth(shown[i]);
        changed = true;
      }
    }
    if (changed) {
      table.refresh(); // the wrapped rows take their new heights
    }
  }

  private double fittedFont;

  private void refitColumns() {
    refit = true;
    table.requestLayout();
  }

  /** A cell's font changed: the columns are fitted again when the size is new. */
  private void fontChanged(javafx.scene.text.Font font) {
    if (font != null && font.getSize() != fittedFont) {
      fittedFont = font.getSize();
      refitColumns();
    }
  }

  private static double textWidth(String s, javafx.scene.text.Font font) {
    if (s == null || s.isEmpty()) {
      return 0;
    }
    javafx.scene.text.Text t = new javafx.scene.text.Text(s);
    t.setFont(font);
    return t.getLayoutBounds().getWidth();
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

  private javafx.scene.layout.Region side() {
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
    Widgets.wrap(sel);
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
    formColumns(form, fields, Double.MAX_VALUE);
    open.setPrefWidth(420);
    startBox.setPrefWidth(560);
    // two fields a row where the box is wide enough for two names and two fields, else one a row
    // (the order of the children, and so of Tab, stays)
    startBox.widthProperty().addListener((o, a, w) -> formColumns(form, fields,
        w.doubleValue() - startBox.snappedLeftInset() - startBox.snappedRightInset()));
    // the two boxes side by side where both fit, else the new inspection's below
    org.bracewalk.ui.common.LineOrStack side = new org.bracewalk.ui.common.LineOrStack(10, open, startBox);
    side.setMaxHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
    return side;
  }

  /** The start form's fields two a row when {@code width} holds two names and two fields, else one a row. */
  private static void formColumns(GridPane form, Node[][] fields, double width) {
    double names = 0;
    for (Node[] f : fields) {
      names = Math.max(names, f[0].prefWidth(-1));
    }
    boolean two = width >= 2 * names + 2 * 120 + 3 * form.getHgap();
    if (form.getColumnConstraints().size() != (two ? 4 : 2)) {
      form.getColumnConstraints().setAll(new javafx.scene.layout.ColumnConstraints(),
          new javafx.scene.layout.ColumnConstraints(120, 200, Double.MAX_VALUE));
      if (two) {
        form.getColumnConstraints().addAll(new javafx.scene.layout.ColumnConstraints(),
            new javafx.scene.layout.ColumnConstraints(120, 200, Double.MAX_VALUE));
      }
    }
    for (int i = 0; i < fields.length; i++) {
      int col = two ? (i % 2) * 2 : 0;
      int row = two ? i / 2 : i;
      Integer at = GridPane.getColumnIndex(fields[i][0]);
      Integer on = GridPane.getRowIndex(fields[i][0]);
      if (at == null || on == null || at != col || on != row) {
        GridPane.setConstraints(fields[i][0], col, row);
        GridPane.setConstraints(fields[i][1], col + 1, row);
      }
    }
  }

  private static Button wide(String text, Runnable action) {
    Button b = Widgets.wideButton(text);
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
