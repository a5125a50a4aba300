package org.bracewalk.ui;

import java.time.Clock;
import java.util.concurrent.Executor;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.ui.common.FxDialogService;
import org.bracewalk.ui.common.FxExecutor;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;

/**
 * The desktop app's window over one database. Built by the composition root with its services (no
 * {@code Application} subclass: the toolkit is started by the launcher, and everything here is
 * passed in).
 */
public final class BracewalkApp {
  private final AppServices services;
  private final PlaneAnalyzer analyzer;
  private final Clock clock;
  private final Executor background;
  private final ReportIssuer issuer;
  private MainWindow window;

  public BracewalkApp(
      AppServices services, PlaneAnalyzer analyzer, Clock clock, Executor background, ReportIssuer issuer) {
    this.services = services;
    this.analyzer = analyzer;
    this.clock = clock;
    this.background = background;
    this.issuer = issuer;
  }

  /** Fills {@code stage} with the app and shows it, on the Sites screen. Call on the FX thread. */
  public MainWindow show(Stage stage) {
    return show(stage, new FxDialogService(stage));
  }

  /** As {@link #show(Stage)}, with the dialogs given (tests answer them). */
  public MainWindow show(Stage stage, org.bracewalk.ui.common.DialogService dialogs) {
    AppScreens screens = new AppScreens(services, analyzer, clock, dialogs, new FxExecutor(), background, issuer);
    window = new MainWindow(screens, AppScreens.screenKeys(),
        "Database: " + services.store().location() + "   \u00b7   every mark is saved the moment it is made   \u00b7   F1: keys");
    // fit the screen: a 1280 x 800 tablet is a target too
    var bounds = javafx.stage.Screen.getPrimary().getVisualBounds();
    Scene scene = new Scene(window.root(), Math.min(1360, bounds.getWidth()), Math.min(860, bounds.getHeight()));
    Stylesheet.apply(scene);
    stage.setTitle("Bracewalk \u2014 " + services.store().location());
    stage.setScene(scene);
    stage.setMinWidth(Math.min(1024, bounds.getWidth()));
    stage.setMinHeight(Math.min(700, bounds.getHeight()));
    window.open(ScreenId.OVERVIEW, Selection.NONE);
    stage.show();
    return window;
  }

  public MainWindow window() {
    return window;
  }
}
