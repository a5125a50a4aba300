package org.bracewalk.ui;

import java.nio.file.Path;
import java.util.concurrent.Executor;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;
import javafx.scene.Scene;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The whole app's window over the demo site, headless, in a scene of a given size with the app's
 * stylesheet: the facade part way through a walk-round after the impact (as the README's pictures
 * show it). Screens open at once (the record is read on the calling thread).
 */
final class ScreenRig {
  final AppServices services;
  final Selection facadeWalk;
  private final AppScreens screens;
  MainWindow window;
  Scene scene;
  private javafx.stage.Stage stage;

  private ScreenRig(AppServices services, AppScreens screens, Selection facadeWalk) {
    this.services = services;
    this.screens = screens;
    this.facadeWalk = facadeWalk;
  }

  /** Panels of the facade marked in the shared rig: it keeps its shape until the 48th (DemoWalk). */
  static final int SHARED_MARKED = 44;
  private static ScreenRig shared;

  /**
   * One rig for the window tests of a run (the demo database and its walk take a while to record),
   * in a folder under {@code target/}: the facade's walk-round with {@value #SHARED_MARKED} panels
   * marked. A test that marks more leaves it so for the tests after it.
   */
  static synchronized ScreenRig shared() throws Exception {
    if (shared == null) {
      Path dir = java.nio.file.Files.createDirectories(Path.of("target", "screen-rig"))
          .resolve("run-" + System.nanoTime());
      java.nio.file.Files.createDirectories(dir);
      shared = open(dir, SHARED_MARKED);
    }
    return shared;
  }

  /** The demo database in {@code dir}, with a walk-round of the facade {@code marked} panels in. */
  static ScreenRig open(Path dir, int marked) throws Exception {
    FxToolkit.registerPrimaryStage();
    AppServices services = DemoDatabase.withDemo(dir);
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection walk = DemoWalk.record(services, marked);
    Selection sel = new Selection(facade.structureId(), facade.id(), walk.id());
    ReportIssuer none = new ReportIssuer() {
      @Override
      public String issueReport(long id, Path out, Consumer<Progress> progress) {
        return "issued";
      }

      @Override
      public String issueRepairOrder(long id, Path out, Consumer<Progress> progress) {
        return "issued";
      }
    };
    Executor now = Runnable::run;
    AppScreens screens = new AppScreens(services, PlaneAnalyzer.standard(), DemoDatabase.CLOCK,
        new QuietDialogs(), now, now, none);
    return new ScreenRig(services, screens, sel);
  }

  /** A new main window in a scene of {@code width} x {@code height} with the app's stylesheet. */
  void window(double width, double height) throws Exception {
    window(width, height, true);
  }

  /**
   * As {@link #window(double, double)}; {@code shown} false leaves the scene out of a window (no
   * focus, any size: the headless screen is 1280 x 800).
   */
  void window(double width, double height, boolean shown) throws Exception {
    fx(() -> {
      if (stage != null) {
        stage.close();
      }
      window = new MainWindow(screens, AppScreens.screenKeys(), "Database: test");
      scene = new Scene(window.root(), width, height);
      Stylesheet.apply(scene);
      // a window of its own, shown, so focus works as in the app
      if (!shown) {
        stage = null;
        return null;
      }
      stage = new javafx.stage.Stage();
      stage.setScene(scene);
      stage.show();
      stage.requestFocus();
      return null;
    });
  }

  /** Opens screen {@code id} (the facade's walk-round selected) and lays the window out. */
  void show(ScreenId id) throws Exception {
    fx(() -> {
      window.open(id, facadeWalk);
      layout();
      return null;
    });
  }

  /** Closes the window. */
  void close() throws Exception {
    fx(() -> {
      if (stage != null) {
        stage.close();
      }
      return null;
    });
  }

  void layout() {
    for (int k = 0; k < 3; k++) {
      window.root().applyCss();
      window.root().layout();
    }
  }

  static <T> T fx(java.util.concurrent.Callable<T> task) throws Exception {
    return WaitForAsyncUtils.asyncFx(task).get(120, TimeUnit.SECONDS);
  }
}
