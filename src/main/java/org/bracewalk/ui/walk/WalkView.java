package org.bracewalk.ui.walk;

import org.bracewalk.core.model.DefectType;
import java.util.List;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.control.TextInputControl;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.Legend;
import org.bracewalk.ui.common.PanelLook;
import org.bracewalk.ui.common.PanelSide;
import org.bracewalk.ui.common.PlaneCanvas;
import org.bracewalk.ui.common.SteadyBox;
import org.bracewalk.ui.common.Widgets;

/**
 * The walk-round screen: the plane with its cursor in the middle, the state buttons (each with its
 * key) and the details of the next mark at the side, the verdict redrawn after every mark, and a
 * banner that says what to do when the plane has lost rigidity. Only binds to its view model.
 */
public final class WalkView extends BorderPane {
  private final WalkViewModel vm;
  private final PlaneCanvas canvas = new PlaneCanvas();
  private final javafx.scene.control.TitledPane key =
      new javafx.scene.control.TitledPane("Key to the drawing (K folds and unfolds it)", null);

  /** Window heights below this start with the key folded. */
  static final double ROOM_FOR_KEY = 840;
  /**
   * Window heights below this show the detail fields (defect, bow, note, photos) as one compact
   * strip under the drawing, opened when a field is asked for (Alt+D, Alt+B, Alt+O) or holds
   * something for the next mark, instead of in the side panel below the fold.
   */
  static final double ROOM_FOR_DETAILS = 900;

  /** The scrolled side panel with the mark buttons and the other controls. */
  private ScrollPane controls;
  private final BooleanProperty compact = new SimpleBooleanProperty(this, "compact");
  /** The strip was asked for (Alt+D, Alt+B, Alt+O) and not yet left. */
  private boolean stripWanted;
  private final FlowPane strip = new FlowPane(12, 6);
  private GridPane details;
  private VBox detailBox;
  private ComboBox<DefectType> defect;
  private TextField bow;
  private TextField note;
  private Label defectLabel;
  private Label bowLabel;
  private Label noteLabel;
  private HBox photoRow;
  private Button photos;
  private Button camera;
  private HBox countRow;
  private Label bowHint;
  private Label detailHint;

  /** The state keys, in button order; digits 1 to 6 do the same. */
  static final List<PanelState> STATES =
      List.of(
          PanelState.SOUND,
          PanelState.DAMAGED_EFFECTIVE,
          PanelState.DAMAGED_INEFFECTIVE,
          PanelState.MISSING,
          PanelState.EXTRA,
          PanelState.NOT_REACHABLE);

  public WalkView(WalkViewModel vm) {
    this.vm = vm;
    getStyleClass().add("screen");
    setId("walk-screen");

    Label title = new Label("Walk-round");
    title.getStyleClass().add("screen-title");
    title.setMinWidth(Label.USE_PREF_SIZE);
    Label progress = Widgets.text(vm.progressTextProperty(), "progress-text");
    progress.setId("walk-progress");
    progress.setMinWidth(Label.USE_PREF_SIZE);
    progress.setWrapText(false);
    ProgressBar bar = new ProgressBar();
    bar.setPrefWidth(220);
    bar.setMinWidth(40); // the words keep their width, the bar gives way
    bar.progressProperty().bind(Bindings.createDoubleBinding(
        () -> vm.doneProperty().get() / (double) vm.total(), vm.doneProperty()));
    HBox top = Widgets.row(14, title, progress, bar);
    top.setPadding(new Insets(0, 0, 8, 0));
    setTop(top);

    Label alarm = Widgets.text(vm.alarmProperty());
    alarm.setId("walk-alarm");
    HBox banner = new HBox(10, Widgets.key("!"), alarm);
    HBox.setHgrow(alarm, Priority.ALWAYS);
    banner.getStyleClass().add("alarm-banner");
    banner.setId("walk-alarm-banner");
    banner.setAlignment(Pos.CENTER_LEFT);
    banner.visibleProperty().bind(vm.alarmProperty().isNotEmpty());
    banner.managedProperty().bind(banner.visibleProperty());
    banner.setMinHeight(Region.USE_PREF_SIZE);
    alarm.setAccessibleText("alarm");

    canvas.setId("walk-canvas");
    canvas.pictureProperty().bind(vm.pictureProperty());
    canvas.setOnPanelPicked(vm::select);
    canvas.setOnFramePicked(vm::selectMember);
    VBox.setVgrow(canvas, Priority.ALWAYS);
    Label cursorText = Widgets.text(vm.cursorTextProperty());
    cursorText.setId("walk-cursor");
    cursorText.setStyle("-fx-font-weight: bold;");
    Legend legend = new Legend(Legend.Set_.WALK);
    // the key's sizes are remembered: the line above it changes with every mark. On a short
    // screen (a tablet) it starts folded, so the plane keeps the room; K or a click unfolds it.
    // the key scrolls within at most a third of the column, so the drawing keeps the most room
    javafx.scene.control.ScrollPane keyScroll =
        new javafx.scene.control.ScrollPane(new SteadyBox(0, legend));
    keyScroll.setFitToWidth(true);
    keyScroll.setHbarPolicy(javafx.scene.control.ScrollPane.ScrollBarPolicy.NEVER);
    keyScroll.setId("walk-key-scroll");
    key.setContent(keyScroll);
    key.setId("walk-key");
    key.setAnimated(false);
    key.setFocusTraversable(false);
    sceneProperty().addListener((o, was, now) -> {
      if (now == null || was != null) {
        return;
      }
      if (now.getHeight() > 0) {
        key.setExpanded(now.getHeight() >= ROOM_FOR_KEY);
      } else { // a scene still being made: decide once its height is known
        javafx.beans.value.ChangeListener<Number> once = new javafx.beans.value.ChangeListener<>() {
          @Override
          public void changed(javafx.beans.value.ObservableValue<? extends Number> v, Number a, Number h) {
            if (h.doubleValue() > 0) {
              now.heightProperty().removeListener(this);
              key.setExpanded(h.doubleValue() >= ROOM_FOR_KEY);
            }
          }
        };
        now.heightProperty().addListener(once);
      }
    });
    strip.setId("walk-detail-strip");
    strip.getStyleClass().add("detail-strip");
    strip.setAlignment(Pos.CENTER_LEFT);
    strip.prefWrapLengthProperty().bind(canvas.widthProperty());
    strip.setVisible(false);
    strip.managedProperty().bind(strip.visibleProperty());
    // the banner stands at the head of the side column, above the verdict it explains: the drawing
    // keeps its size when it appears (above the drawing it took the drawing's room; over it, it
    // would hide the top lifts)
    VBox centre = new VBox(8, canvas, strip, cursorText, key);
    keyScroll.maxHeightProperty().bind(centre.heightProperty().divide(3));
    setCenter(centre);

    // The verdict stands above the scrolled controls, outside the scroll pane: its words change
    // with every mark, and a change inside the pane would lay out every control in it again.
    VBox verdict = Widgets.verdictBox(vm.verdictProperty());
    verdict.setId("walk-verdict");
    Label readOnly = Widgets.text("This inspection is finalised: read-only.");
    readOnly.getStyleClass().add("error-text");
    readOnly.visibleProperty().bind(vm.readOnlyProperty());
    readOnly.managedProperty().bind(readOnly.visibleProperty());
    ScrollPane side = new ScrollPane(sidePanel());
    controls = side;
    side.setFitToWidth(true);
    side.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
    side.setPrefViewportWidth(400);
    side.setPrefViewportHeight(300); // the pane takes the height left; its content is not asked
    VBox.setVgrow(side, Priority.ALWAYS);
    // on a short screen both give way, the verdict to its own scroll bar, the controls never below
    // the mark buttons (their least height is set in the stylesheet, in em, so it grows with A+)
    side.getStyleClass().add("walk-controls"); // keeps the mark buttons in sight: a least height in em
    ScrollPane verdictPane = new ScrollPane(verdict);
    verdictPane.setFitToWidth(true);
    verdictPane.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
    verdictPane.setMinHeight(110);
    verdictPane.setFocusTraversable(false);
    verdictPane.getStyleClass().add("verdict-pane");
    // the verdict takes the height it needs, as long as the controls keep their least
    VBox right = new VBox(10, readOnly, banner, verdictPane, side) {
      @Override
      protected void layoutChildren() {
        double width = getWidth() - snappedLeftInset() - snappedRightInset();
        double wanted = verdict.prefHeight(width) + verdictPane.snappedTopInset() + verdictPane.snappedBottomInset();
        double others = (readOnly.isManaged() ? readOnly.prefHeight(width) + getSpacing() : 0)
            + (banner.isManaged() ? banner.prefHeight(width) + getSpacing() : 0);
        double room = getHeight() - snappedTopInset() - snappedBottomInset() - others - getSpacing()
            - side.getMinHeight();
        verdictPane.setPrefHeight(Math.max(verdictPane.getMinHeight(), Math.min(wanted, room)));
        super.layoutChildren();
      }
    };
    right.setPrefWidth(420); // else the verdict's longest line, unwrapped, would set the width
    right.setId("walk-side");
    setRight(right);

    Label status = Widgets.text(vm.statusProperty());
    status.setId("walk-status");
    Label error = Widgets.text(vm.errorProperty(), "error-text");
    error.setId("walk-error");
    VBox bottom = new VBox(4, error, status);
    bottom.setPadding(new Insets(6, 0, 0, 0));
    setBottom(bottom);

    addEventHandler(KeyEvent.KEY_PRESSED, this::onKey);
    addEventFilter(KeyEvent.KEY_PRESSED, this::onDetailKey);

    // a short window: the detail fields as a strip under the drawing; any focused control in the
    // side panel is scrolled into view
    sceneProperty().addListener((o, was, now) -> {
      if (now != null) {
        compact.set(now.getHeight() > 0 && now.getHeight() < ROOM_FOR_DETAILS);
        now.heightProperty().addListener((v, a, h) -> compact.set(h.doubleValue() > 0 && h.doubleValue() < ROOM_FOR_DETAILS));
        now.focusOwnerProperty().addListener((v, a, f) -> {
          if (f != canvas && f != null && !within(f, strip)) {
            stripWanted = false;
          }
          if (f == canvas) {
            stripWanted = false;
          }
          updateStrip();
          if (f != null && within(f, controls.getContent())) {
            scrollIntoView(controls, f);
          }
        });
      }
    });
    compact.addListener((o, a, b) -> placeDetails(b));
    Runnable update = this::updateStrip;
    vm.defectProperty().addListener((o, a, b) -> update.run());
    vm.bowMmProperty().addListener((o, a, b) -> update.run());
    vm.noteProperty().addListener((o, a, b) -> update.run());
    vm.photos().addListener((javafx.collections.ListChangeListener<java.nio.file.Path>) c -> update.run());
  }

  /** Alt+D, Alt+B, Alt+O: the defect, bow or note field, opened and in view whatever the window's size. */
  private void onDetailKey(KeyEvent e) {
    if (!e.isAltDown() || e.isControlDown() || e.isMetaDown()) {
      return;
    }
    Node field = switch (e.getCode()) {
      case D -> defect;
      case B -> bow;
      case O -> note;
      default -> null;
    };
    if (field == null) {
      return;
    }
    stripWanted = compact.get();
    updateStrip();
    field.requestFocus();
    e.consume();
  }

  /** Whether the detail strip shows: on a short window, when asked for, focused or holding something. */
  private void updateStrip() {
    boolean pending = vm.defectProperty().get() != null || !vm.bowMmProperty().get().isEmpty()
        || !vm.noteProperty().get().isEmpty() || !vm.photos().isEmpty();
    Node focus = getScene() == null ? null : getScene().getFocusOwner();
    strip.setVisible(compact.get() && (stripWanted || pending || (focus != null && within(focus, strip))));
  }

  /** Puts the detail fields in the compact strip under the drawing, or back in the side panel. */
  private void placeDetails(boolean inStrip) {
    if (inStrip) {
      details.getChildren().clear();
      detailBox.setVisible(false);
      defect.setMaxWidth(Region.USE_PREF_SIZE);
      defect.setPrefWidth(150);
      bow.setPrefColumnCount(6);
      note.setPrefColumnCount(10);
      photos.setText("Photos (F)");
      camera.setText("Camera (G)");
      // the photo count and the bow's damage level only when they say something
      countRow.visibleProperty().bind(Bindings.isNotEmpty(vm.photos()));
      countRow.managedProperty().bind(countRow.visibleProperty());
      bowHint.visibleProperty().bind(bowHint.textProperty().isNotEmpty());
      bowHint.managedProperty().bind(bowHint.visibleProperty());
      strip.getChildren().setAll(
          Widgets.row(6, defectLabel, defect), Widgets.row(6, bowLabel, bow), Widgets.row(6, noteLabel, note),
          photoRow, countRow, bowHint);
    } else {
      strip.getChildren().clear();
      defect.setMaxWidth(Double.MAX_VALUE);
      defect.setPrefWidth(Region.USE_COMPUTED_SIZE);
      bow.setPrefColumnCount(TextField.DEFAULT_PREF_COLUMN_COUNT);
      note.setPrefColumnCount(TextField.DEFAULT_PREF_COLUMN_COUNT);
      photos.setText("Add photos\u2026 (F)");
      camera.setText("From camera folder (G)");
      for (Node n : List.of(countRow, bowHint)) {
        n.visibleProperty().unbind();
        n.managedProperty().unbind();
        n.setVisible(true);
        n.setManaged(true);
      }
      fillDetails();
      detailBox.setVisible(true);
    }
    updateStrip();
  }

  private void fillDetails() {
    details.getChildren().clear();
    details.addRow(0, defectLabel, defect);
    details.addRow(1, bowLabel, bow);
    details.addRow(2, noteLabel, note);
    details.add(photoRow, 0, 3, 2, 1);
    details.add(countRow, 0, 4, 2, 1);
    details.add(detailHint, 0, 5, 2, 1);
    if (!detailBox.getChildren().contains(bowHint)) {
      detailBox.getChildren().add(bowHint);
    }
  }

  private static boolean within(Node n, Node ancestor) {
    for (Node p = n; p != null; p = p.getParent()) {
      if (p == ancestor) {
        return true;
      }
    }
    return false;
  }

  /** Scrolls {@code pane} the least so that {@code n} (inside its content) lies in its viewport. */
  static void scrollIntoView(ScrollPane pane, Node n) {
    Node content = pane.getContent();
    pane.applyCss();
    pane.layout();
    javafx.geometry.Bounds b = content.sceneToLocal(n.localToScene(n.getBoundsInLocal()));
    double contentHeight = content.getLayoutBounds().getHeight();
    double view = pane.getViewportBounds().getHeight();
    double room = contentHeight - view;
    if (room <= 0 || b == null) {
      return;
    }
    double top = room * (pane.getVvalue() - pane.getVmin()) / (pane.getVmax() - pane.getVmin());
    double margin = 8;
    if (b.getMinY() - margin < top) {
      top = b.getMinY() - margin;
    } else if (b.getMaxY() + margin > top + view) {
      top = b.getMaxY() + margin - view;
    } else {
      return;
    }
    double f = Math.max(0, Math.min(1, top / room));
    pane.setVvalue(pane.getVmin() + f * (pane.getVmax() - pane.getVmin()));
  }

  private VBox sidePanel() {
    GridPane states = new GridPane();
    states.setHgap(8);
    states.setVgap(8);
    for (int i = 0; i < STATES.size(); i++) {
      PanelState s = STATES.get(i);
      PanelLook look = PanelLook.of(s);
      Button b = new Button(look.words());
      b.setGraphic(Widgets.key(look.badge() + "  " + (i + 1)));
      b.getStyleClass().add("state-button");
      if (s == PanelState.MISSING || s == PanelState.DAMAGED_INEFFECTIVE) {
        b.getStyleClass().add("alarm");
      }
      Widgets.wrap(b);
      b.setId("mark-" + s.label());
      b.setOnAction(e -> {
        vm.mark(s);
        canvas.requestFocus();
      });
      b.disableProperty().bind(vm.readOnlyProperty());
      b.setFocusTraversable(false);
      states.add(b, i % 2, i / 2);
    }
    VBox marks = Widgets.box("Mark the current panel (then it moves on)", states,
        Widgets.hint("S or Space = sound. The mark is saved at once; Backspace or Ctrl+Z undoes the last one (kept as a correction)."),
        Widgets.hint("Shift+arrow selects a side of the panel (ledger above or below, standard left or right): the same"
            + " keys then mark it. Esc goes back to the panel's diagonals."));

    ToggleGroup seen = new ToggleGroup();
    HBox seenRow = Widgets.row(6);
    for (Diagonal d : new Diagonal[] {null, Diagonal.RISING, Diagonal.FALLING, Diagonal.BOTH}) {
      ToggleButton t = new ToggleButton(d == null ? "follows state" : d.symbol());
      t.setUserData(d);
      t.setToggleGroup(seen);
      t.setFocusTraversable(false);
      seenRow.getChildren().add(t);
    }
    seen.selectedToggleProperty().addListener((o, a, b) -> {
      if (b == null) {
        // keep one selected
        if (a != null) {
          seen.selectToggle(a);
        }
        return;
      }
      vm.memberSeenProperty().set((Diagonal) b.getUserData());
    });
    Runnable syncSeen = () -> {
      for (var t : seen.getToggles()) {
        if (t.getUserData() == vm.memberSeenProperty().get()) {
          seen.selectToggle(t);
        }
      }
    };
    vm.memberSeenProperty().addListener((o, a, b) -> syncSeen.run());
    syncSeen.run();
    ToggleButton tension = new ToggleButton("tension-only (T)");
    tension.setFocusTraversable(false);
    tension.setOnAction(e -> vm.toggleMemberKind());
    vm.memberKindProperty().addListener((o, a, b) -> tension.setSelected(b == MemberKind.TENSION_ONLY));
    VBox member = Widgets.box("Member seen (keys / \\ X, . follows state)", seenRow, tension,
        Widgets.hint("Only when it differs: the extra member, or the half of a cross still there."));

    defect = new ComboBox<>();
    defect.getItems().add(null);
    defect.getItems().addAll(DefectType.values());
    defect.valueProperty().bindBidirectional(vm.defectProperty());
    defect.setId("walk-defect");
    defect.setConverter(new javafx.util.StringConverter<>() {
      @Override
      public String toString(DefectType d) {
        return d == null ? "(none)" : d.label().replace('-', ' ');
      }

      @Override
      public DefectType fromString(String t) {
        return null;
      }
    });
    defect.setMaxWidth(Double.MAX_VALUE);
    bow = new TextField();
    bow.setId("walk-bow");
    bow.setPromptText("mm over 1 m");
    bow.textProperty().bindBidirectional(vm.bowMmProperty());
    note = new TextField();
    note.setId("walk-note");
    note.setPromptText("what, where");
    note.textProperty().bindBidirectional(vm.noteProperty());
    photos = new Button("Add photos\u2026 (F)");
    photos.setId("walk-photos");
    photos.setOnAction(e -> vm.addPhotos());
    photos.setFocusTraversable(false);
    Label photoCount = new Label();
    photoCount.textProperty().bind(Bindings.size(vm.photos()).asString("%d attached to the next mark"));
    details = new GridPane();
    details.setHgap(8);
    details.setVgap(6);
    defectLabel = Widgets.mnemonic("_Defect", defect);
    bowLabel = Widgets.mnemonic("_Bow mm", bow);
    noteLabel = Widgets.mnemonic("N_ote", note);
    camera = new Button("From camera folder (G)");
    camera.setId("walk-camera");
    camera.setOnAction(e -> {
      vm.addCameraPhotos(false);
      canvas.requestFocus();
    });
    camera.setFocusTraversable(false);
    photos.setMinWidth(Button.USE_PREF_SIZE);
    camera.setMinWidth(Button.USE_PREF_SIZE);
    Button clear = new Button("Take off");
    clear.setId("walk-photos-off");
    clear.setOnAction(e -> {
      vm.clearPhotos();
      canvas.requestFocus();
    });
    clear.setFocusTraversable(false);
    clear.disableProperty().bind(Bindings.isEmpty(vm.photos()));
    clear.setMinWidth(Button.USE_PREF_SIZE);
    photoRow = Widgets.row(8, photos, camera);
    countRow = Widgets.row(8, photoCount, clear);
    detailHint = Widgets.hint("G takes the pictures the camera saved in its folder since the last mark;"
        + " Shift+G chooses the folder.");
    GridPane.setHgrow(defect, Priority.ALWAYS);
    GridPane.setHgrow(note, Priority.ALWAYS);
    bowHint = Widgets.text(vm.bowHintProperty(), "hint");
    detailBox = Widgets.box("Details for the next mark (Alt+D, Alt+B, Alt+O; Enter returns)", details, bowHint);
    detailBox.managedProperty().bind(detailBox.visibleProperty());
    fillDetails();

    Button undo = Widgets.wrap(new Button("Undo last mark (Backspace)"));
    undo.setId("walk-undo");
    undo.disableProperty().bind(vm.canUndoProperty().not().or(vm.readOnlyProperty()));
    undo.setOnAction(e -> vm.undo());
    undo.setFocusTraversable(false);

    ChoiceBox<WalkOrder> order = new org.bracewalk.ui.common.WrappingChoiceBox<>();
    order.getItems().addAll(WalkOrder.values());
    order.valueProperty().bindBidirectional(vm.orderProperty());
    order.setFocusTraversable(false);
    order.setMaxWidth(Double.MAX_VALUE);
    javafx.scene.control.CheckBox frameInWalk = new javafx.scene.control.CheckBox("take in every ledger and standard (W)");
    frameInWalk.setId("walk-frame-in-walk");
    frameInWalk.selectedProperty().bindBidirectional(vm.frameInWalkProperty());
    frameInWalk.setFocusTraversable(false);
    Widgets.wrap(frameInWalk);
    Button rest = new Button("Record the rest as designed\u2026 (A)");
    rest.setId("walk-rest");
    rest.setOnAction(e -> {
      vm.recordRestAsDesigned();
      canvas.requestFocus();
    });
    rest.setFocusTraversable(false);
    Widgets.wrap(rest);
    rest.disableProperty().bind(vm.readOnlyProperty());
    VBox orderBox = Widgets.box("Walk order (O changes it)", order, frameInWalk, rest,
        Widgets.hint("A routine walk visits the braced panels; A then records the panels not yet looked at"
            + " as found as designed, after asking."));
    VBox side = new SteadyBox(10, marks, member, detailBox, orderBox, undo);
    side.getStyleClass().add("side");
    return side;
  }

  private void onKey(KeyEvent e) {
    Node focus = getScene() == null ? null : getScene().getFocusOwner();
    if (focus instanceof TextInputControl
        || focus instanceof javafx.scene.control.ComboBoxBase
        || focus instanceof ChoiceBox) {
      if (e.getCode() == KeyCode.ENTER || e.getCode() == KeyCode.ESCAPE) {
        canvas.requestFocus();
        e.consume();
      }
      return;
    }
    if (e.isAltDown() || e.isMetaDown()) {
      return;
    }
    if (e.isControlDown()) {
      if (e.getCode() == KeyCode.Z) {
        vm.undo();
        e.consume();
      }
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
      case S, SPACE, DIGIT1, NUMPAD1 -> vm.mark(PanelState.SOUND);
      case D, DIGIT2, NUMPAD2 -> vm.mark(PanelState.DAMAGED_EFFECTIVE);
      case U, DIGIT3, NUMPAD3 -> vm.mark(PanelState.DAMAGED_INEFFECTIVE);
      case M, DIGIT4, NUMPAD4 -> vm.mark(PanelState.MISSING);
      case E, DIGIT5, NUMPAD5 -> vm.mark(PanelState.EXTRA);
      case R, DIGIT6, NUMPAD6 -> vm.mark(PanelState.NOT_REACHABLE);
      case BACK_SPACE -> vm.undo();
      case UP -> vm.move(1, 0);
      case DOWN -> vm.move(-1, 0);
      case LEFT -> vm.move(0, -1);
      case RIGHT -> vm.move(0, 1);
      case N, PAGE_DOWN -> vm.next();
      case B, PAGE_UP -> vm.previous();
      case HOME -> vm.goToFirstUnmarked();
      case SLASH -> {
        if (e.isShiftDown()) {
          handled = false; // '?' is the help key, handled by the window
        } else {
          vm.memberSeenProperty().set(Diagonal.RISING);
        }
      }
      case BACK_SLASH -> vm.memberSeenProperty().set(Diagonal.FALLING);
      case X -> vm.memberSeenProperty().set(Diagonal.BOTH);
      case PERIOD -> vm.memberSeenProperty().set(null);
      case T -> vm.toggleMemberKind();
      case F -> {
        if (e.isShiftDown()) {
          vm.clearPhotos();
        } else {
          vm.addPhotos();
        }
      }
      case G -> vm.addCameraPhotos(e.isShiftDown());
      case K -> key.setExpanded(!key.isExpanded());
      case O -> vm.cycleOrder();
      case A -> vm.recordRestAsDesigned();
      case W -> vm.toggleFrameInWalk();
      case ESCAPE -> vm.backToPanel();
      default -> handled = false;
    }
    if (handled) {
      e.consume();
    }
  }

  /** Puts keyboard focus on the plane, ready for marks. */
  public void focusPlane() {
    canvas.requestFocus();
  }

  public PlaneCanvas canvas() {
    return canvas;
  }

  /** The keys of this screen, for the help overlay and the README. */
  public static KeyHelp.Section keys() {
    return new KeyHelp.Section(
        "Walk-round",
        List.of(
            KeyHelp.of("S or Space, 1", "sound"),
            KeyHelp.of("D, 2", "damaged, still effective"),
            KeyHelp.of("U, 3", "damaged beyond use (does not count)"),
            KeyHelp.of("M, 4", "missing"),
            KeyHelp.of("E, 5", "extra: a member the design does not have"),
            KeyHelp.of("R, 6", "not reachable (counts as not inspected)"),
            KeyHelp.of("Backspace, Ctrl+Z", "undo the last mark (recorded as a correction)"),
            KeyHelp.of("Arrows", "move the cursor one panel"),
            KeyHelp.of("Shift+Arrows", "select the ledger above or below, the standard left or right: the state keys mark it"),
            KeyHelp.of("Esc", "back to the panel's diagonals"),
            KeyHelp.of("N / B, PgDn / PgUp", "next / back in the walk order"),
            KeyHelp.of("Home", "first panel not yet marked"),
            KeyHelp.of("O", "change the walk order (the braced panels only, or every panel)"),
            KeyHelp.of("A", "record the panels not yet looked at as found as designed (asks first, naming how many)"),
            KeyHelp.of("W", "walk every ledger and standard too / the diagonals only"),
            KeyHelp.of("/  \\  X  .", "member seen: rising, falling, cross, follows the state"),
            KeyHelp.of("T", "member seen is tension-only / rigid"),
            KeyHelp.of("Alt+ D B O", "defect, bow, note fields; Enter or Esc back to the plane"),
            KeyHelp.of("F, Shift+F", "attach photo files; take the photos off the next mark"),
            KeyHelp.of("G, Shift+G", "attach the camera folder's new photos; choose the camera folder"),
            KeyHelp.of("K", "fold or unfold the key to the drawing"),
            KeyHelp.of("Ctrl+P", "another plane of the same inspection")));
  }
}
