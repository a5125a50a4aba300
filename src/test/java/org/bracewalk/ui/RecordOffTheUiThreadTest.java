package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.reflect.InvocationHandler;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Proxy;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import org.bracewalk.app.AppServices;
import org.bracewalk.bench.DemoWalk;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.store.Database;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.findings.FindingsViewModel;
import org.bracewalk.ui.findings.ReportIssuer;
import org.bracewalk.ui.history.HistoryViewModel;
import org.bracewalk.ui.sites.OverviewRow;
import org.bracewalk.ui.sites.SitesViewModel;
import org.bracewalk.ui.walk.CameraFolder;
import org.bracewalk.ui.walk.InspectionMarkRecorder;
import org.bracewalk.ui.walk.WalkViewModel;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxToolkit;
import org.testfx.util.WaitForAsyncUtils;

/**
 * No view model touches the record on the UI thread (issue 10, item 5), the running half: the test
 * thread plays the JavaFX thread (the UI executor's tasks run on it, the dialogs answer on it), the
 * background executor is a thread of its own, and the record is reached through a store that notes
 * every call made on the UI thread. The Sites, Findings, History and walk-round view models are put
 * through their commands; not one call may reach the store from the UI thread. Then every screen
 * is opened through the navigator (the main window) on the real JavaFX thread, the walk-round also
 * while a mark's write is still queued: again not one call on the JavaFX thread, and the walk-round
 * reopened starts from the mark just written.
 */
class RecordOffTheUiThreadTest {
  @TempDir Path dir;
  private AppServices services;
  private final ExecutorService background = Executors.newSingleThreadExecutor();
  private final ConcurrentLinkedQueue<Runnable> uiTasks = new ConcurrentLinkedQueue<>();
  private final java.util.concurrent.Executor ui = uiTasks::add;
  private final FakeDialogs dialogs = new FakeDialogs();
  private final List<String> onUiThread = new java.util.concurrent.CopyOnWriteArrayList<>();
  private final List<String> opened = new ArrayList<>();
  private volatile Thread uiThread;
  private volatile boolean armed;

  @BeforeEach
  void open() {
    uiThread = Thread.currentThread();
    RecordStore store = watched(RecordStore.class, Database.open(dir.resolve("test.db")));
    services = AppServices.over(store, DemoDatabase.CLOCK, PlaneAnalyzer.standard());
    services.demo().load();
  }

  @AfterEach
  void close() throws Exception {
    background.shutdown();
    background.awaitTermination(30, TimeUnit.SECONDS);
    services.close();
  }

  /** {@code target} behind a proxy that notes each call on the UI thread, and watches what it returns. */
  private <T> T watched(Class<T> type, T target) {
    InvocationHandler h = (proxy, m, args) -> {
      if (armed && Thread.currentThread() == uiThread && m.getDeclaringClass() != Object.class
          && !m.getName().equals("location") && !m.getName().equals("close")) {
        onUiThread.add(type.getSimpleName() + "." + m.getName());
      }
      Object r;
      try {
        r = m.invoke(target, args);
      } catch (InvocationTargetException e) {
        throw e.getCause();
      }
      Class<?> rt = m.getReturnType();
      if (r != null && rt.isInterface() && rt.getName().startsWith("org.bracewalk.core.port.")) {
        @SuppressWarnings("unchecked")
        Class<Object> cast = (Class<Object>) rt;
        return watched(cast, r);
      }
      return r;
    };
    return type.cast(Proxy.newProxyInstance(type.getClassLoader(), new Class<?>[] {type}, h));
  }

  /** Lets the background thread and the UI tasks run until neither has anything left. */
  private void settle() throws Exception {
    do {
      background.submit(() -> { }).get(60, TimeUnit.SECONDS);
      Runnable r;
      while ((r = uiTasks.poll()) != null) {
        r.run();
      }
      background.submit(() -> { }).get(60, TimeUnit.SECONDS);
    } while (!uiTasks.isEmpty());
  }

  private static OverviewRow row(SitesViewModel vm, String name) {
    return vm.rows().stream().filter(r -> r.name().equals(name)).findFirst().orElseThrow();
  }

  @Test
  void theSitesScreenStartsRetiresAndChangesTheIntervalWithoutTheRecordOnTheUiThread() throws Exception {
    armed = true;
    SitesViewModel vm = new SitesViewModel(services.sites(), services.inspections(), services.analysis(),
        services.demo(), services.store().location(), DemoDatabase.CLOCK, dialogs,
        (screen, sel) -> opened.add(screen + " " + sel), ui, background);
    settle();
    vm.selectedProperty().set(row(vm, "frame 2"));
    dialogs.textAnswers.push(Optional.of("14"));
    // UK racking over 7 days: the note on HSG76's weekly inspection is confirmed first
    dialogs.confirmAnswers.add(true);
    assertThat(vm.changeInterval()).isTrue();
    settle();
    assertThat(row(vm, "Aisle C racking run").interval()).isEqualTo("14 days");
    vm.selectedProperty().set(row(vm, "spine"));
    dialogs.textAnswers.add(Optional.of("dismantled"));
    dialogs.confirmAnswers.add(true);
    assertThat(vm.retirePlane()).isTrue();
    settle();
    assertThat(vm.selectionForOthers().hasPlane()).isTrue();
    vm.selectedProperty().set(row(vm, "north facade"));
    vm.inspectorNameProperty().set("Rowan Test");
    vm.inspectorPositionProperty().set("Scaffold inspector");
    vm.competentPersonProperty().set("Rowan Test");
    vm.shiftProperty().set("day");
    dialogs.confirmAnswers.add(true); // the last look: start
    assertThat(vm.startInspection()).as(vm.errorProperty().get()).isTrue();
    settle();
    assertThat(opened).singleElement().asString().startsWith("WALK");
    assertThat(vm.errorProperty().get()).isEmpty();
    assertThat(onUiThread).isEmpty();
  }

  @Test
  void theFindingsAndHistoryScreensReadAndFinaliseWithoutTheRecordOnTheUiThread() throws Exception {
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection walk = DemoWalk.record(services, 50);
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
    armed = true;
    FindingsViewModel vm = new FindingsViewModel(services.sites(), services.inspections(), services.analysis(),
        PlaneAnalyzer.standard(), none, dialogs, ui, background, walk.id(), facade.id());
    vm.load();
    settle();
    assertThat(vm.repairLines()).isNotEmpty();
    dialogs.confirmAnswers.push(true);
    assertThat(vm.finaliseInspection()).isTrue();
    settle();
    assertThat(vm.finalisedProperty().get()).isTrue();
    HistoryViewModel history = new HistoryViewModel(services.history(), services.sites(), ui, background, facade.id());
    settle();
    assertThat(history).isNotNull();
    assertThat(onUiThread).isEmpty();
  }

  @Test
  void theWalkRoundMarksUndoesAndReadsTheCameraFolderWithoutTheRecordOnTheUiThread() throws Exception {
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection walk = DemoWalk.record(services, 3);
    var existing = InspectionMarkRecorder.existing(services.inspections(), walk.id(), facade.id());
    var design = services.inspections().designInForce(walk.id(), facade.id()).design();
    Path camera = Files.createDirectories(dir.resolve("DCIM"));
    armed = true;
    WalkViewModel vm = new WalkViewModel(design, "facade", facade.role(), existing,
        new InspectionMarkRecorder(services.inspections(), walk.id(), facade.id(), "Rowan Test"),
        PlaneAnalyzer.standard(), dialogs, false, false, DemoDatabase.CLOCK, ui, background);
    CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
    setting.set(camera);
    vm.useCameraFolderSetting(setting);
    settle();
    vm.select(PanelRef.of(1, 1));
    assertThat(vm.mark(PanelState.MISSING)).isTrue();
    assertThat(vm.mark(PanelState.SOUND)).isTrue();
    assertThat(vm.undo()).isTrue();
    vm.addCameraPhotos(false);
    settle();
    assertThat(vm.errorProperty().get()).isEmpty();
    assertThat(vm.writing()).isFalse();
    armed = false; // the test reads the record itself from here
    var latest = services.inspections().latestObservations(walk.id(), facade.id());
    assertThat(latest.get(PanelRef.of(1, 1)).state()).isEqualTo(PanelState.MISSING);
    assertThat(onUiThread).isEmpty();
  }

  /** Runs what the background thread and the JavaFX thread have been handed until both are idle. */
  private void settleFx() throws Exception {
    for (int i = 0; i < 4; i++) {
      background.submit(() -> { }).get(60, TimeUnit.SECONDS);
      WaitForAsyncUtils.waitForFxEvents();
    }
  }

  private static String progress(MainWindow window) {
    return ((javafx.scene.control.Labeled) window.current().node().lookup("#walk-progress")).getText();
  }

  @Test
  void everyScreenOpensThroughTheNavigatorWithoutTheRecordOnTheJavaFxThread() throws Exception {
    FxToolkit.registerPrimaryStage();
    PlaneRecord facade = DemoWalk.facade(services);
    Inspection walk = DemoWalk.record(services, 3);
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
    uiThread = WaitForAsyncUtils.asyncFx(Thread::currentThread).get(60, TimeUnit.SECONDS);
    AppScreens screens = new AppScreens(services, PlaneAnalyzer.standard(), DemoDatabase.CLOCK, dialogs,
        new org.bracewalk.ui.common.FxExecutor(), background, none);
    // in a scene, as in the app: the window's scroll panes show their content (and lookups find it)
    // once styled
    MainWindow window = WaitForAsyncUtils.asyncFx(() -> {
      MainWindow w = new MainWindow(screens, AppScreens.screenKeys(), "test");
      new javafx.scene.Scene(w.root(), 1280, 800);
      w.root().applyCss();
      return w;
    }).get(60, TimeUnit.SECONDS);
    org.bracewalk.ui.common.Selection here =
        new org.bracewalk.ui.common.Selection(facade.structureId(), facade.id(), walk.id());
    armed = true;
    for (org.bracewalk.ui.common.ScreenId id : org.bracewalk.ui.common.ScreenId.values()) {
      WaitForAsyncUtils.asyncFx(() -> window.open(id, here)).get(60, TimeUnit.SECONDS);
      settleFx();
      assertThat(window.currentScreen()).isEqualTo(id);
      assertThat(window.isOpening()).isFalse();
      if (id != org.bracewalk.ui.common.ScreenId.OVERVIEW) {
        assertThat(window.current().crumbs()).as(id.title()).contains(facade.name());
      }
    }
    assertThat(onUiThread).as("record calls on the JavaFX thread while opening screens").isEmpty();

    // a plane that is not in the record: the screen shown stays, and the status bar names the plane
    org.bracewalk.ui.common.ScreenId before = window.currentScreen();
    WaitForAsyncUtils.asyncFx(() -> window.open(org.bracewalk.ui.common.ScreenId.DESIGN,
        new org.bracewalk.ui.common.Selection(facade.structureId(), 999_999, 0))).get(60, TimeUnit.SECONDS);
    settleFx();
    assertThat(window.currentScreen()).isEqualTo(before);
    assertThat(window.isOpening()).isFalse();
    WaitForAsyncUtils.asyncFx(() -> window.root().applyCss()).get(60, TimeUnit.SECONDS);
    assertThat(((javafx.scene.control.Labeled) window.root().lookup("#screen-open-error")).getText())
        .startsWith("Could not open Design: plane 999999 could not be read from the database");

    // the walk-round is open (3 of its panels marked); a mark's write is held behind a busy
    // background thread while the walk-round is opened again: it must start from that mark
    WaitForAsyncUtils.asyncFx(() -> window.open(org.bracewalk.ui.common.ScreenId.WALK, here)).get(60, TimeUnit.SECONDS);
    settleFx();
    assertThat(progress(window)).isEqualTo("3 of 50 panels");
    java.util.concurrent.CountDownLatch gate = new java.util.concurrent.CountDownLatch(1);
    background.execute(() -> {
      try {
        gate.await(60, TimeUnit.SECONDS);
      } catch (InterruptedException e) {
        Thread.currentThread().interrupt();
      }
    });
    WaitForAsyncUtils.asyncFx(() -> {
      javafx.scene.Node walkView = ((javafx.scene.layout.BorderPane) window.current().node()).getCenter();
      javafx.event.Event.fireEvent(walkView, new javafx.scene.input.KeyEvent(javafx.scene.input.KeyEvent.KEY_PRESSED,
          "m", "m", javafx.scene.input.KeyCode.M, false, false, false, false));
      window.open(org.bracewalk.ui.common.ScreenId.WALK, here);
    }).get(60, TimeUnit.SECONDS);
    assertThat(WaitForAsyncUtils.asyncFx(window::isOpening).get(60, TimeUnit.SECONDS)).isTrue();
    gate.countDown();
    settleFx();
    assertThat(window.isOpening()).isFalse();
    armed = false; // the test reads the record itself from here
    int stored = services.inspections().latestObservations(walk.id(), facade.id()).size();
    assertThat(stored).isEqualTo(4);
    assertThat(WaitForAsyncUtils.asyncFx(() -> progress(window)).get(60, TimeUnit.SECONDS))
        .isEqualTo(stored + " of 50 panels");
    assertThat(onUiThread).isEmpty();
  }
}
