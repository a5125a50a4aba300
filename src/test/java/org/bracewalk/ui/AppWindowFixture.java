package org.bracewalk.ui;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.Scene;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.ScreenId;
import org.bracewalk.ui.common.Selection;
import org.bracewalk.ui.findings.ReportIssuer;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The whole app window, headless, over a new database with the demo site and an open inspection
 * of the facade scaffold (a few panels of the facade marked): for tests that go through the shell.
 */
final class AppWindowFixture implements AutoCloseable {
  final Path dir;
  final AppServices services;
  final FakeDialogs dialogs = new FakeDialogs();
  final ExecutorService background = Executors.newSingleThreadExecutor();
  final PlaneRecord facade;
  final Inspection open;
  final MainWindow window;
  final Stage stage;

  AppWindowFixture() throws Exception {
    dir = Files.createTempDirectory("bracewalk-window");
    services = DemoDatabase.withDemo(dir);
    facade = DemoWalk.facade(services);
    open = DemoWalk.record(services, 3);
    stage = FxToolkit.registerPrimaryStage();
    ReportIssuer none = new ReportIssuer() {
      @Override
      public String issueReport(long id, Path out, java.util.function.Consumer<Progress> progress) {
        return "issued";
      }

      @Override
      public String issueRepairOrder(long id, Path out, java.util.function.Consumer<Progress> progress) {
        return "issued";
      }
    };
    window = WaitForAsyncUtils.asyncFx(() -> {
      BracewalkApp app = new BracewalkApp(PlaneAnalyzer.standard(), DemoDatabase.CLOCK, background);
      return app.show(stage, dialogs, services, none);
    }).get(60, TimeUnit.SECONDS);
    settle();
  }

  /** The facade in the open inspection. */
  Selection facadeInTheOpenInspection() {
    return new Selection(facade.structureId(), facade.id(), open.id());
  }

  /** Runs what the background thread and the JavaFX thread have been handed until both are idle. */
  void settle() throws Exception {
    for (int i = 0; i < 4; i++) {
      background.submit(() -> { }).get(60, TimeUnit.SECONDS);
      WaitForAsyncUtils.waitForFxEvents();
    }
  }

  /** Opens {@code id} through the main window, as the rail does, and waits until it is shown. */
  void open(ScreenId id, Selection selection) throws Exception {
    WaitForAsyncUtils.asyncFx(() -> window.open(id, selection)).get(60, TimeUnit.SECONDS);
    settle();
  }

  Scene scene() {
    return stage.getScene();
  }

  Node focusOwner() {
    return scene().getFocusOwner();
  }

  @Override
  public void close() throws Exception {
    WaitForAsyncUtils.asyncFx(() -> stage.setOnCloseRequest(null)).get(60, TimeUnit.SECONDS);
    background.shutdown();
    background.awaitTermination(30, TimeUnit.SECONDS);
    services.close();
  }
}
