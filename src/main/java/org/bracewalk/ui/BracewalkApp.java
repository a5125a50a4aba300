package org.bracewalk.ui;

import java.time.Clock;
import java.util.concurrent.Executor;
import javafx.scene.Scene;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.control.TableView;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.FxDialogService;
import org.bracewalk.ui.common.FxExecutor;
import org.bracewalk.ui.common.Navigator;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;

/**
 * The desktop app's window over one database. Built by the composition root with its services (no
 * {@code Application} subclass: the toolkit is started by the launcher, and everything here is
 * passed in). The window can be shown before the database is open ({@link #showOpening}), so the
 * toolkit's first styling and layout overlap with opening the database; {@link #attach} then shows
 * the Sites screen.
 */
public final class BracewalkApp {
  private final PlaneAnalyzer analyzer;
  private final Clock clock;
  private final Executor background;
  private final LateScreens screens = new LateScreens();
  private MainWindow window;
  private volatile DialogService dialogs;
  /** Forwards to the window's dialogs, which exist only once the window does. */
  private final DialogService lateDialogs =
      new DialogService() {
        private DialogService d() {
          DialogService d = dialogs;
          return d != null ? d : new QuietDialogs();
        }

        @Override
        public boolean confirm(String title, String message, String confirmLabel) {
          return d().confirm(title, message, confirmLabel);
        }

        @Override
        public boolean confirmRisky(String title, String message, String riskyLabel, String safeLabel) {
          return d().confirmRisky(title, message, riskyLabel, safeLabel);
        }

        @Override
        public void inform(String title, String message) {
          d().inform(title, message);
        }

        @Override
        public void showError(String title, String message) {
          d().showError(title, message);
        }

        @Override
        public java.util.List<java.nio.file.Path> choosePhotos(String title, java.nio.file.Path folder) {
          return d().choosePhotos(title, folder);
        }

        @Override
        public java.util.Optional<java.nio.file.Path> chooseFolder(String title, java.nio.file.Path initial) {
          return d().chooseFolder(title, initial);
        }

        @Override
        public java.util.Optional<String> askText(String title, String message, String initial) {
          return d().askText(title, message, initial);
        }

        @Override
        public java.util.Optional<java.nio.file.Path> chooseSaveFile(String title, String suggestedName) {
          return d().chooseSaveFile(title, suggestedName);
        }
      };

  public BracewalkApp(PlaneAnalyzer analyzer, Clock clock, Executor background) {
    this.analyzer = analyzer;
    this.clock = clock;
    this.background = background;
  }

  /** Screens built once the services are known. */
  private static final class LateScreens implements ScreenFactory {
    private ScreenFactory delegate;

    @Override
    public void open(ScreenId id, Selection selection, Navigator navigator,
        java.util.function.Consumer<Screen> shown, java.util.function.Consumer<String> failed) {
      if (delegate == null) {
        failed.accept("Could not open " + id.title() + ": the database is not open yet.");
        return;
      }
      delegate.open(id, selection, navigator, shown, failed);
    }
  }

  /** Shows the app on {@code services} at once, on the Sites screen. Call on the FX thread. */
  public MainWindow show(Stage stage, AppServices services, ReportIssuer issuer) {
    return show(stage, new FxDialogService(stage), services, issuer);
  }

  /** As {@link #show(Stage, AppServices, ReportIssuer)}, with the dialogs given (tests answer them). */
  public MainWindow show(Stage stage, DialogService dialogs, AppServices services, ReportIssuer issuer) {
    showOpening(stage, dialogs, services.location());
    attach(services, issuer);
    return window;
  }

  /**
   * Shows the window while the database at {@code location} is being opened: the frame, the rail
   * and a line saying what is happening. Also builds (out of sight) the heaviest controls the first
   * screen uses, so their first styling is done while the database opens.
   */
  public MainWindow showOpening(Stage stage, DialogService dialogs, String location) {
    this.dialogs = dialogs;
    window = new MainWindow(screens, AppScreens.screenKeys(),
        "Database: " + location + "   \u00b7   every mark is saved the moment it is made   \u00b7   F1: keys");
    // fit the screen: a 1280 x 800 tablet is a target too
    var bounds = javafx.stage.Screen.getPrimary().getVisualBounds();
    Scene scene = new Scene(window.root(), Math.min(1360, bounds.getWidth()), Math.min(860, bounds.getHeight()));
    Stylesheet.apply(scene);
    window.useLookSetting(org.bracewalk.ui.common.LookSetting.userPreferences());
    stage.setTitle("Bracewalk \u2014 " + location);
    stage.setScene(scene);
    stage.setMinWidth(Math.min(1024, bounds.getWidth()));
    stage.setMinHeight(Math.min(700, bounds.getHeight()));
    Label what = new Label("Opening " + location + " \u2026");
    what.getStyleClass().add("screen-title");
    // styled and laid out, but not seen: the table's first styling is then paid for here
    TableView<String> warm = new TableView<>(javafx.collections.FXCollections.observableArrayList("a", "b"));
    javafx.scene.control.TableColumn<String, String> col = new javafx.scene.control.TableColumn<>("warm");
    col.setCellValueFactory(c -> new javafx.beans.property.ReadOnlyStringWrapper(c.getValue()));
    warm.getColumns().add(col);
    warm.setOpacity(0);
    warm.setMouseTransparent(true);
    warm.setFocusTraversable(false);
    warm.setMaxSize(200, 120);
    Canvas warmCanvas = new Canvas(10, 10);
    warmCanvas.setOpacity(0);
    VBox box = new VBox(14, what, new ProgressIndicator());
    box.getStyleClass().add("empty-offer");
    window.showPlaceholder(new StackPane(warm, warmCanvas, box), "opening the database");
    // closing the window asks the screen shown first (the design editor: unsaved changes)
    stage.setOnCloseRequest(e -> {
      if (!window.mayLeave()) {
        e.consume();
      }
    });
    stage.show();
    return window;
  }

  /** The database is open: builds the screens over it and shows the Sites screen. FX thread. */
  public void attach(AppServices services, ReportIssuer issuer) {
    prepare(services, issuer);
    window.open(ScreenId.OVERVIEW, Selection.NONE);
  }

  /**
   * Builds the screens over the open database and reads the Sites screen's rows, on the calling
   * thread; {@link #attach} then only shows them. Lets the launcher read the database while the
   * window is still being styled on the FX thread.
   */
  public synchronized void prepare(AppServices services, ReportIssuer issuer) {
    if (screens.delegate != null) {
      return;
    }
    AppScreens s = new AppScreens(services, analyzer, clock, lateDialogs, new FxExecutor(), background, issuer);
    s.useRecordsChanged(source -> window.changed(source));
    s.preloadOverview((id, sel) -> window.open(id, sel));
    screens.delegate = s;
  }

  public MainWindow window() {
    return window;
  }
}
