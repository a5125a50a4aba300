package org.bracewalk.ui.design;

import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Spinner;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputControl;
import javafx.scene.control.ToggleButton;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Legend;
import org.bracewalk.ui.common.PanelSide;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.app.verdict.Cautions;
import org.bracewalk.ui.common.Widgets;

/** The design editor screen. Only binds to its view model. */
public final class DesignView extends BorderPane {
  private final DesignViewModel vm;
  private final PlaneCanvas canvas = new PlaneCanvas();

  public DesignView(DesignViewModel vm) {
    this.vm = vm;
    getStyleClass().add("screen");
    setId("design-screen");
    Label title = new Label();
    title.setId("design-title");
    // follows a save as a new plane: the editor then edits that plane
    title.textProperty().bind(javafx.beans.binding.Bindings.concat("Design: ", vm.titleProperty()));
    title.getStyleClass().add("screen-title");
    Widgets.wrap(title);
    Label dirty = new Label("unsaved changes");
    dirty.getStyleClass().add("error-text");
    dirty.visibleProperty().bind(vm.dirtyProperty());
    HBox top = Widgets.row(14, title, dirty);
    top.setPadding(new Insets(0, 0, 8, 0));
    setTop(top);

    canvas.setId("design-canvas");
    canvas.pictureProperty().bind(vm.pictureProperty());
    canvas.setOnPanelPicked(p -> {
      vm.clearSide();
      vm.cycle(p);
    });
    canvas.setOnFramePicked(vm::toggleMember);
    VBox.setVgrow(canvas, Priority.ALWAYS);
    Label cursor = Widgets.text(vm.cursorTextProperty());
    cursor.setStyle("-fx-font-weight: bold;");
    setCenter(new VBox(8, canvas, cursor, new Legend(Legend.Set_.DESIGN),
        Widgets.hint("Click or tap a panel to cycle: none, /, \\, X, opening; click on a ledger or standard to leave it"
            + " out of the design or put it back. Braces drawn dash-dot and numbered are the"
            + " least set that would make the design rigid (not part of it until you place them).")));

    ScrollPane side = new ScrollPane(side());
    side.setFitToWidth(true);
    side.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
    side.setPrefViewportWidth(400);
    setRight(side);

    Label error = Widgets.text(vm.errorProperty(), "error-text");
    error.setId("design-error");
    Label status = Widgets.text(vm.statusProperty());
    VBox bottom = new VBox(4, error, status);
    bottom.setPadding(new Insets(6, 0, 0, 0));
    setBottom(bottom);
    addEventHandler(KeyEvent.KEY_PRESSED, this::onKey);
  }

  private VBox side() {
    Label verdict = Widgets.text(vm.verdictTextProperty(), "verdict-headline");
    verdict.setId("design-verdict");
    verdict.setStyle("-fx-font-size: 1.07em;");
    Label tolerance = Widgets.text(vm.toleranceTextProperty());
    VBox verdictBox = new VBox(6, verdict, tolerance, Widgets.hint(Cautions.STANDING));
    verdictBox.getStyleClass().add("verdict");
    Runnable style = () -> {
      verdictBox.getStyleClass().removeAll("holds", "lost");
      verdictBox.getStyleClass().add(vm.verdictKindProperty().get() == VerdictKind.HOLDS ? "holds" : "lost");
    };
    vm.verdictKindProperty().addListener((o, a, b) -> style.run());
    style.run();

    // no spinner maximum: a spinner clamps a larger typed value without a word, the view model
    // refuses it naming the limit of a stored plane
    Spinner<Integer> lifts = new Spinner<>(1, Integer.MAX_VALUE, vm.liftsProperty().get());
    lifts.setEditable(true);
    lifts.getValueFactory().valueProperty().addListener((o, a, b) -> vm.liftsProperty().set(b));
    vm.liftsProperty().addListener((o, a, b) -> lifts.getValueFactory().setValue(b.intValue()));
    Spinner<Integer> bays = new Spinner<>(1, Integer.MAX_VALUE, vm.baysProperty().get());
    bays.setEditable(true);
    bays.getValueFactory().valueProperty().addListener((o, a, b) -> vm.baysProperty().set(b));
    vm.baysProperty().addListener((o, a, b) -> bays.getValueFactory().setValue(b.intValue()));
    TextField widths = new TextField();
    widths.textProperty().bindBidirectional(vm.widthsProperty());
    widths.setId("design-widths");
    TextField heights = new TextField();
    heights.textProperty().bindBidirectional(vm.heightsProperty());
    heights.setId("design-heights");
    ChoiceBox<Support> support = new org.bracewalk.ui.common.WrappingChoiceBox<>();
    support.getItems().addAll(Support.values());
    support.setConverter(new StringConverter<>() {
      @Override
      public String toString(Support s) {
        return s == null ? "" : s == Support.PINNED_BASE ? "pinned base (held at every base joint)" : "free (held by nothing)";
      }

      @Override
      public Support fromString(String s) {
        return null;
      }
    });
    support.valueProperty().bindBidirectional(vm.supportProperty());
    Button apply = Widgets.wrap(new Button("Apply grid (Enter)"));
    apply.setOnAction(e -> vm.applyGrid());
    GridPane grid = new GridPane();
    grid.setHgap(8);
    grid.setVgap(6);
    // a field a row: at large text two spinners and their names side by side are wider than the panel
    grid.addRow(0, Widgets.mnemonic("_Lifts", lifts), lifts);
    grid.addRow(1, Widgets.mnemonic("B_ays", bays), bays);
    grid.add(Widgets.mnemonic("_Widths m", widths), 0, 2);
    grid.add(widths, 1, 2);
    grid.add(Widgets.mnemonic("_Heights m", heights), 0, 3);
    grid.add(heights, 1, 3);
    grid.add(Widgets.mnemonic("Su_pport", support), 0, 4);
    grid.add(support, 1, 4);
    support.setMaxWidth(Double.MAX_VALUE);
    GridPane.setHgrow(support, Priority.ALWAYS);
    // what the plane is: its keep-off zone depends on it (an upright frame's takes in the bays
    // beside it); fixed for a stored plane, chosen for a new plane saved from a changed grid
    ChoiceBox<PlaneRole> role = new org.bracewalk.ui.common.WrappingChoiceBox<>();
    role.setId("design-role");
    role.getItems().addAll(PlaneRole.values());
    role.setConverter(new StringConverter<>() {
      @Override
      public String toString(PlaneRole r) {
        return r == null ? "" : r.words();
      }

      @Override
      public PlaneRole fromString(String s) {
        return null;
      }
    });
    role.valueProperty().bindBidirectional(vm.roleProperty());
    grid.add(Widgets.mnemonic("R_ole", role), 0, 5);
    grid.add(role, 1, 5);
    role.setMaxWidth(Double.MAX_VALUE);
    javafx.scene.layout.ColumnConstraints fields = new javafx.scene.layout.ColumnConstraints();
    fields.setHgrow(Priority.ALWAYS);
    fields.setMinWidth(60);
    grid.getColumnConstraints().addAll(new javafx.scene.layout.ColumnConstraints(), fields);
    lifts.setPrefWidth(90);
    bays.setPrefWidth(90);
    VBox gridBox = Widgets.box("Grid", grid,
        Widgets.hint("Widths left to right, heights bottom lift first, in metres; one value fills all."), apply);

    javafx.scene.layout.FlowPane braceRow = Widgets.flow(6,
        brace("/  rising", Diagonal.RISING), brace("\\  falling", Diagonal.FALLING),
        brace("X  cross", Diagonal.BOTH));
    Button none = Widgets.wrap(new Button("none (.)"));
    none.setOnAction(e -> vm.setBrace(null));
    Button opening = Widgets.wrap(new Button("opening (O)"));
    opening.setOnAction(e -> vm.toggleOpening());
    ToggleButton kind = Widgets.wrap(new ToggleButton("tension-only (T)"));
    kind.setOnAction(e -> vm.toggleKind());
    vm.kindProperty().addListener((o, a, b) -> kind.setSelected(b == MemberKind.TENSION_ONLY));
    Button member = new Button("leave out / put back the selected side (Space)");
    member.setId("design-frame-toggle");
    member.setOnAction(e -> {
      vm.toggleSelectedMember();
      canvas.requestFocus();
    });
    member.disableProperty().bind(vm.sideProperty().isNull());
    Widgets.wrap(member);
    VBox braceBox = Widgets.box("Current panel", braceRow, Widgets.flow(6, none, opening, kind), member,
        Widgets.hint("Shift+arrow selects the ledger above or below, the standard left or right; Esc the panel again."));

    Spinner<Integer> step = new Spinner<>(1, 50, vm.fillStepProperty().get());
    step.getValueFactory().valueProperty().addListener((o, a, b) -> vm.fillStepProperty().set(b));
    step.setPrefWidth(80);
    Spinner<Integer> first = new Spinner<>(1, PlaneLimits.MAX_BAYS, vm.fillFirstBayProperty().get());
    first.getValueFactory().valueProperty().addListener((o, a, b) -> vm.fillFirstBayProperty().set(b));
    first.setPrefWidth(80);
    Button everyK = new Button("/ every k bays, every lift (K)");
    everyK.setOnAction(e -> vm.fillEveryKthBay(Diagonal.RISING));
    Button zig = new Button("zig-zag up every k bays (Z)");
    zig.setOnAction(e -> vm.fillZigZag());
    Button all = new Button("every panel, zig-zag: upright frame (A)");
    all.setOnAction(e -> vm.fillEveryPanel());
    Button clear = new Button("clear all braces");
    clear.setOnAction(e -> vm.clearBraces());
    VBox fillBox = Widgets.box("Fill",
        Widgets.flow(8, Widgets.row(8, new Label("k ="), step), Widgets.row(8, new Label("from bay"), first)),
        everyK, zig, all, clear);
    for (Node n : List.of(everyK, zig, all, clear)) {
      Widgets.wrap((Button) n).setMaxWidth(Double.MAX_VALUE);
    }

    CheckBox suggest = Widgets.wrap(new CheckBox("show the braces that would make it rigid"));
    suggest.selectedProperty().bindBidirectional(vm.showSuggestionProperty());
    TextField author = new TextField();
    author.setPromptText("author of this revision");
    author.textProperty().bindBidirectional(vm.authorProperty());
    TextField note = new TextField();
    note.setPromptText("what changed, who approved it");
    note.textProperty().bindBidirectional(vm.noteProperty());
    Button save = Widgets.wrap(new Button("Save design (Ctrl+S)"));
    save.setId("design-save");
    save.setOnAction(e -> vm.save());
    VBox saveBox = Widgets.box("Save as a new revision", suggest, author, note, save);

    VBox side = new VBox(10, verdictBox, braceBox, fillBox, gridBox, saveBox);
    side.getStyleClass().add("side");
    return side;
  }

  private ToggleButton brace(String text, Diagonal d) {
    ToggleButton b = Widgets.wrap(new ToggleButton(text));
    b.setOnAction(e -> {
      vm.setBrace(d);
      b.setSelected(false);
    });
    return b;
  }

  private void onKey(KeyEvent e) {
    Node focus = getScene() == null ? null : getScene().getFocusOwner();
    if (e.isControlDown() && e.getCode() == KeyCode.S) {
      vm.save();
      e.consume();
      return;
    }
    if (focus instanceof TextInputControl || (focus != null && focus.getParent() instanceof Spinner)
        || focus instanceof Spinner || focus instanceof ChoiceBox) {
      if (e.getCode() == KeyCode.ENTER) {
        vm.applyGrid();
        canvas.requestFocus();
        e.consume();
      } else if (e.getCode() == KeyCode.ESCAPE) {
        canvas.requestFocus();
        e.consume();
      }
      return;
    }
    if (e.isAltDown() || e.isControlDown() || e.isMetaDown()) {
      return;
    }
    PanelSide side = e.isShiftDown() ? PanelSide.ofArrow(e.getCode()) : null;
    if (side != null) {
      vm.selectSide(side);
      e.consume();
      return;
    }
    boolean handled = true;
    switch (e.getCode()) {
      case UP -> vm.move(1, 0);
      case DOWN -> vm.move(-1, 0);
      case LEFT -> vm.move(0, -1);
      case RIGHT -> vm.move(0, 1);
      case ESCAPE -> vm.clearSide();
      case SLASH -> {
        if (e.isShiftDown()) {
          handled = false;
        } else {
          vm.setBrace(Diagonal.RISING);
        }
      }
      case BACK_SLASH -> vm.setBrace(Diagonal.FALLING);
      case X -> vm.setBrace(Diagonal.BOTH);
      case PERIOD, DELETE -> vm.setBrace(null);
      case O -> vm.toggleOpening();
      case T -> vm.toggleKind();
      case SPACE, ENTER -> {
        if (vm.sideProperty().get() != null) {
          vm.toggleSelectedMember();
        } else {
          vm.cycle(vm.cursor());
        }
      }
      case K -> vm.fillEveryKthBay(Diagonal.RISING);
      case Z -> vm.fillZigZag();
      case A -> vm.fillEveryPanel();
      default -> handled = false;
    }
    if (handled) {
      e.consume();
    }
  }

  public void focusPlane() {
    canvas.requestFocus();
  }

  public PlaneCanvas canvas() {
    return canvas;
  }

  public static KeyHelp.Section keys() {
    return new KeyHelp.Section(
        "Design editor",
        List.of(
            KeyHelp.of("Arrows", "move the cursor one panel"),
            KeyHelp.of("/  \\  X", "brace rising, falling, cross in the current panel"),
            KeyHelp.of(". or Delete", "no brace"),
            KeyHelp.of("O", "opening (never braced) / not an opening"),
            KeyHelp.of("T", "rigid / tension-only"),
            KeyHelp.of("Space or Enter", "cycle the current panel (as a click does); with a side selected, leave it out / put it back"),
            KeyHelp.of("Shift+Arrows", "select the ledger above or below, the standard left or right (again or Esc: the panel)"),
            KeyHelp.of("K, Z, A", "fill: brace every k bays, zig-zag every k bays, every panel"),
            KeyHelp.of("Alt+ L A W H P O", "lifts, bays, widths, heights, support, role fields; Enter applies"),
            KeyHelp.of("Ctrl+S", "save the design (asks first if it is not rigid)")));
  }
}
