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
  private DialogService dialogs;

  public BracewalkApp(PlaneAnalyzer analyzer, Clock clock, Executor background) {
    this.analyzer = analyzer;
    this.clock = clock;
    this.background = background;
  }

  /** Screens built once the services are known. */
  private static final class LateScreens implements ScreenFactory {
    private ScreenFactory delegate;

    @Override
    public Screen build(ScreenId id, Selection selection, Navigator navigator) {
      if (delegate == null) {
        throw new IllegalStateException("the database is not open yet");
      }
      return delegate.build(id, selection, navigator);
    }
  }

  /** Shows the app on {@code services} at once, on the Sites screen. Call on the FX thread. */
  public MainWindow show(Stage stage, AppServices services, ReportIssuer issuer) {
    return show(stage, new FxDialogService(stage), services, issuer);
  }

  /** As {@link #show(Stage, AppServices, ReportIssuer)}, with the dialogs given (tests answer them). */
  public MainWindow show(Stage stage, DialogService dialogs, AppServices services, ReportIssuer issuer) {
    showOpening(stage, dialogs, services.store().location());
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
    stage.setTitle("Bracewalk \u2014 " + location);
    stage.setScene(scene);
    stage.setMinWidth(Math.min(1024, bounds.getWidth()));
    stage.setMinHeight(Math.min(700, bounds.getHeight()));
    Label what = new Label("Opening " + location + " \u2026");
    what.getStyleClass().add("screen-title");
    TableView<String> warm = new TableView<>();
    warm.setVisible(false);
    Canvas warmCanvas = new Canvas(10, 10);
    warmCanvas.setVisible(false);
    VBox box = new VBox(14, what, new ProgressIndicator());
    box.getStyleClass().add("empty-offer");
    window.showPlaceholder(new StackPane(warm, warmCanvas, box), "opening the database");
    stage.show();
    return window;
  }

  /** The database is open: builds the screens over it and shows the Sites screen. FX thread. */
  public void attach(AppServices services, ReportIssuer issuer) {
    screens.delegate = new AppScreens(services, analyzer, clock, dialogs, new FxExecutor(), background, issuer);
    window.open(ScreenId.OVERVIEW, Selection.NONE);
  }

  public MainWindow window() {
    return window;
  }
}
