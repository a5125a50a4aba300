package org.bracewalk.ui;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import javafx.geometry.Insets;
import javafx.scene.Node;
import javafx.scene.Parent;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import org.bracewalk.ui.common.KeyHelp;
import org.bracewalk.ui.common.LookSetting;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.RecordsChanged;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.common.Widgets;

/**
 * The main window's content: a header with where you are, a rail of screens on the left (each
 * Ctrl+digit), the current screen, a status line, and the key help overlay (F1 or ?).
 *
 * <p>The header follows the screen's {@link Screen#crumbsValue()}; another screen opens only once
 * the current one agrees ({@link Screen#mayLeave()}: the design editor asks about unsaved
 * changes); and the records-changed signal ({@link RecordsChanged}) is passed on to the screen
 * shown, which reads again what it shows.
 */
public final class MainWindow implements Navigator, RecordsChanged {
  static final int MIN_FONT = 12;
  static final int MAX_FONT = 26;

  private final ScreenFactory factory;
  private final List<KeyHelp.Section> keys;
  private final StackPane root = new StackPane();
  private final BorderPane frame = new BorderPane();
  private final Label crumbs = new Label();
  private final Map<ScreenId, ToggleButton> rail = new EnumMap<>(ScreenId.class);
  private final ToggleGroup railGroup = new ToggleGroup();
  /** "Opening …" while a screen's record is read; empty otherwise. */
  private final Label opening = new Label();
  /** Why the last screen asked for could not be opened; empty otherwise. */
  private final Label openError = new Label();
  /** Counts the screens asked for: only the latest one asked for is shown. */
  private long requests;
  private Screen current;
  private ScreenId currentId;
  private Selection selection = Selection.NONE;
  private HelpOverlay help;
  private int fontSize = 15;
  private LookSetting look = LookSetting.inMemory();
  private final ToggleButton daylightButton = new ToggleButton("Daylight");
  /**
   * Holds the screen shown: the screen fills it, and where the screen needs more room than the
   * window has (large text on a small window) it scrolls, so nothing falls off the window's edge.
   */
  private final javafx.scene.control.ScrollPane screenPane = new javafx.scene.control.ScrollPane();

  public MainWindow(ScreenFactory factory, List<KeyHelp.Section> screenKeys, String statusText) {
    this.factory = factory;
    List<KeyHelp.Section> all = new ArrayList<>();
    all.add(windowKeys());
    all.addAll(screenKeys);
    this.keys = List.copyOf(all);

    Label mark = new Label("Bracewalk");
    mark.getStyleClass().add("wordmark");
    crumbs.getStyleClass().add("crumbs");
    crumbs.setId("crumbs");
    Button helpButton = new Button("Keys (F1)");
    helpButton.setOnAction(e -> toggleHelp());
    helpButton.setFocusTraversable(false);
    Button smaller = new Button("A\u2212");
    smaller.setOnAction(e -> scaleText(-1));
    smaller.setFocusTraversable(false);
    Button larger = new Button("A+");
    larger.setOnAction(e -> scaleText(1));
    larger.setFocusTraversable(false);
    daylightButton.setId("daylight");
    daylightButton.setFocusTraversable(false);
    daylightButton.setOnAction(e -> setDaylight(daylightButton.isSelected()));
    // at any text size the header's words stay whole: the buttons and the word mark keep their
    // width, the crumbs wrap onto a second line
    for (javafx.scene.control.Labeled l : List.of(mark, daylightButton, smaller, larger, helpButton)) {
      l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
    }
    crumbs.setWrapText(true);
    crumbs.setMinWidth(0);
    HBox.setHgrow(crumbs, javafx.scene.layout.Priority.ALWAYS);
    crumbs.setMaxWidth(Double.MAX_VALUE);
    HBox header = Widgets.row(16, mark, crumbs, daylightButton, smaller, larger, helpButton);
    header.getStyleClass().add("header");
    frame.setTop(header);

    VBox railBox = new VBox();
    railBox.getStyleClass().add("rail");
    for (ScreenId id : ScreenId.values()) {
      ToggleButton b = new ToggleButton(id.title());
      b.setGraphic(Widgets.key("Ctrl+" + id.digit()));
      b.setContentDisplay(javafx.scene.control.ContentDisplay.BOTTOM);
      b.getStyleClass().add("rail-button");
      b.setToggleGroup(railGroup);
      b.setId("rail-" + id.slug());
      b.setFocusTraversable(false);
      b.setOnAction(e -> open(id, selection));
      rail.put(id, b);
      railBox.getChildren().add(b);
    }
    frame.setLeft(railBox);
    screenPane.setId("screen-pane");
    screenPane.getStyleClass().add("screen-pane");
    screenPane.setFitToWidth(true);
    screenPane.setFitToHeight(true);
    screenPane.setFocusTraversable(false);
    // the rail takes the height it needs, not less: its buttons keep their words whole
    railBox.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);

    Label status = new Label(statusText);
    status.setId("status-line");
    opening.setId("screen-opening");
    openError.setId("screen-open-error");
    openError.getStyleClass().add("error-text");
    openError.setWrapText(true);
    HBox statusBar = new HBox(16, status, opening, openError);
    statusBar.getStyleClass().add("status-bar");
    frame.setBottom(statusBar);
    // on a window too short for the frame at large text (header, rail, status line), the whole
    // window scrolls up and down; it never needs to scroll sideways (NoClippedLabelsFxTest)
    frame.setId("window-frame");
    javafx.scene.control.ScrollPane windowPane = new javafx.scene.control.ScrollPane(frame);
    windowPane.setId("window-pane");
    windowPane.getStyleClass().add("screen-pane");
    windowPane.setFitToWidth(true);
    windowPane.setFitToHeight(true);
    windowPane.setFocusTraversable(false);
    root.getChildren().add(windowPane);
    root.addEventFilter(KeyEvent.KEY_PRESSED, this::onKey);
    applyFont();
  }

  /** The node to put in a scene. */
  public Parent root() {
    return root;
  }

  public ScreenId currentScreen() {
    return currentId;
  }

  public Screen current() {
    return current;
  }

  public Selection selection() {
    return selection;
  }

  /** Shows {@code node} in place of a screen (while the database opens); the rail is disabled. */
  public void showPlaceholder(Node node, String where) {
    frame.setCenter(node);
    crumbs.textProperty().unbind();
    crumbs.setText(where);
    for (ToggleButton b : rail.values()) {
      b.setDisable(true);
    }
  }

  /**
   * Opens screen {@code id}: the current screen stays, with "Opening …" in the status bar, while
   * what the new one shows is read off the JavaFX thread; then the new screen is shown. When the
   * record cannot be read the status bar says what could not be read, and the current screen
   * stays. Call on the JavaFX thread.
   */
  @Override
  public void open(ScreenId id, Selection newSelection) {
    if (current != null && !current.mayLeave()) {
      // the person stays (unsaved changes): the rail shows the screen that stays
      if (currentId != null) {
        rail.get(currentId).setSelected(true);
      }
      return;
    }
    long request = ++requests;
    opening.setText("Opening " + id.title() + " \u2026");
    openError.setText("");
    factory.open(id, newSelection, this, s -> {
      if (request == requests) {
        opening.setText("");
        show(id, newSelection, s);
      }
    }, words -> {
      if (request == requests) {
        opening.setText("");
        openError.setText(words);
      }
    });
  }

  /**
   * The records-changed signal: the screen shown reads again what a change it did not make itself
   * may have made stale (the header follows it). Call on the JavaFX thread.
   */
  @Override
  public void changed(Object source) {
    if (current != null) {
      current.reread(source);
    }
  }

  /** Whether the window may close now: the screen shown agrees (it may ask about unsaved changes). */
  public boolean mayLeave() {
    return current == null || current.mayLeave();
  }

  /** Whether a screen asked for is still being read. */
  public boolean isOpening() {
    return !opening.getText().isEmpty();
  }

  private void show(ScreenId id, Selection newSelection, Screen s) {
    selection = newSelection;
    current = s;
    currentId = id;
    Node node = s.node();
    BorderPane.setMargin(node, new Insets(0));
    screenPane.setContent(node);
    if (frame.getCenter() != screenPane) {
      frame.setCenter(screenPane);
    }
    forgetMnemonicsOfNodesGone();
    crumbs.textProperty().unbind();
    crumbs.textProperty().bind(s.crumbsValue());
    ToggleButton b = rail.get(id);
    b.setSelected(true);
    if (help != null) {
      closeHelp();
    }
    if (s.selection() != null) {
      s.selection().addListener((o, before, now) -> {
        selection = now == null ? Selection.NONE : now;
        updateRail();
      });
      if (s.selection().getValue() != null) {
        selection = s.selection().getValue();
      }
    }
    updateRail();
    s.focus();
  }

  /**
   * The scene keeps the Alt+letter of a label after the label has left it (a screen replaced), and
   * two labels with one letter make Alt+letter go round them: Alt+H in the design editor went to
   * the Sites screen's gone "Shift" field and left the focus where it was. So the letters of nodes
   * no longer in the scene are forgotten each time a screen is shown (MnemonicsFxTest).
   */
  private void forgetMnemonicsOfNodesGone() {
    javafx.scene.Scene scene = root.getScene();
    if (scene == null) {
      return;
    }
    for (var it = scene.getMnemonics().entrySet().iterator(); it.hasNext();) {
      var entry = it.next();
      entry.getValue().removeIf(m -> m.getNode() == null || m.getNode().getScene() != scene);
      if (entry.getValue().isEmpty()) {
        it.remove();
      }
    }
  }

  private void updateRail() {
    for (ScreenId other : ScreenId.values()) {
      rail.get(other).setDisable(other != ScreenId.OVERVIEW && !selection.hasPlane());
    }
  }

  private void onKey(KeyEvent e) {
    if (help != null) {
      if (e.getCode() == KeyCode.ESCAPE || e.getCode() == KeyCode.F1) {
        closeHelp();
      }
      e.consume();
      return;
    }
    if (e.getCode() == KeyCode.F1 || (e.getCode() == KeyCode.SLASH && e.isShiftDown() && !typing())) {
      toggleHelp();
      e.consume();
      return;
    }
    if (e.isShortcutDown()) {
      for (ScreenId id : ScreenId.values()) {
        if (e.getText() != null && e.getText().equals(id.digit())
            || e.getCode() == KeyCode.valueOf("DIGIT" + id.digit())) {
          if (id == ScreenId.OVERVIEW || selection.hasPlane()) {
            open(id, selection);
          }
          e.consume();
          return;
        }
      }
      if (e.getCode() == KeyCode.L && !e.isShiftDown() && !e.isAltDown()) {
        setDaylight(!daylight());
        e.consume();
        return;
      }
      if (e.getCode() == KeyCode.EQUALS || e.getCode() == KeyCode.PLUS || e.getCode() == KeyCode.ADD) {
        scaleText(1);
        e.consume();
      } else if (e.getCode() == KeyCode.MINUS || e.getCode() == KeyCode.SUBTRACT) {
        scaleText(-1);
        e.consume();
      }
    }
  }

  private boolean typing() {
    return root.getScene() != null
        && root.getScene().getFocusOwner() instanceof javafx.scene.control.TextInputControl;
  }

  /** Shows or hides the key help. */
  public void toggleHelp() {
    if (help != null) {
      closeHelp();
    } else {
      help = new HelpOverlay(keys, this::closeHelp);
      root.getChildren().add(help);
    }
  }

  private void closeHelp() {
    root.getChildren().remove(help);
    help = null;
    if (current != null) {
      current.focus();
    }
  }

  /** Makes all text {@code step} pixels larger (negative: smaller), as Ctrl+= and Ctrl+- do. */
  public void scaleText(int step) {
    fontSize = Math.max(MIN_FONT, Math.min(MAX_FONT, fontSize + step));
    applyFont();
  }

  private void applyFont() {
    root.setStyle("-fx-font-size: " + fontSize + "px;");
  }

  /**
   * Takes the daylight look from {@code setting} now, and keeps every later change of look there
   * (the app passes the user's preferences; pictures and tests keep the default, in memory).
   */
  public void useLookSetting(LookSetting setting) {
    look = setting;
    applyLook(setting.daylight());
  }

  /** Whether the window shows the daylight look (high contrast for bright sun). */
  public boolean daylight() {
    return root.getStyleClass().contains(Stylesheet.DAYLIGHT);
  }

  /** Shows the daylight look (high contrast for bright sun) or the usual look, and remembers it. */
  public void setDaylight(boolean on) {
    applyLook(on);
    look.setDaylight(on);
  }

  private void applyLook(boolean on) {
    Stylesheet.daylight(root, on);
    daylightButton.setSelected(on);
  }

  /** The body text size now, in pixels ({@value #MIN_FONT} to {@value #MAX_FONT}). */
  public int fontSize() {
    return fontSize;
  }

  /** Every key section, window keys first (for the README). */
  public List<KeyHelp.Section> keys() {
    return keys;
  }

  static KeyHelp.Section windowKeys() {
    return new KeyHelp.Section(
        "Anywhere",
        List.of(
            KeyHelp.of("F1 or ?", "this key help; Esc closes it"),
            KeyHelp.of("Ctrl+1 \u2026 Ctrl+5", "Sites, Design, Walk-round, Findings, History"),
            KeyHelp.of("Ctrl+= / Ctrl+\u2212", "larger / smaller text"),
            KeyHelp.of("Ctrl+L", "daylight look (high contrast for bright sun) / the usual look; remembered"),
            KeyHelp.of("Tab / Shift+Tab", "next / previous field or button"),
            KeyHelp.of("Space or Enter", "press the focused button")));
  }
}
