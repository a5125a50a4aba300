package org.bracewalk.boot;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import javafx.application.Platform;
import javafx.stage.Stage;
import org.bracewalk.app.AppServices;
import org.bracewalk.cli.CliContext;
import org.bracewalk.ui.BracewalkApp;
import org.bracewalk.ui.common.FxDialogService;
import org.bracewalk.ui.findings.ReportIssuer;

/**
 * Starts the desktop app: {@code bracewalk} with no arguments, or with only {@code --db FILE}. The
 * database is chosen as the command line chooses it ({@code --db}, else {@code BRACEWALK_DB}, else
 * the per-user data folder). Starts the toolkit with {@link Platform#startup} rather than through an
 * {@code Application} subclass, so the window gets its services by constructor.
 */
final class GuiLauncher {
  /** Set to 1 to print the time from JVM start to the first drawn window on standard error. */
  static final String TIMING_VARIABLE = "BRACEWALK_STARTUP_TIMING";

  private GuiLauncher() {}

  private static void mark(boolean timing, PrintWriter err, String what) {
    if (timing) {
      long ms = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
      err.println("bracewalk: " + what + " at " + ms + " ms");
      err.flush();
    }
  }

  /**
   * The database option when {@code args} ask for the app: none at all, or only {@code --db FILE}
   * (or {@code --db=FILE}); empty when they are a command line.
   */
  static Optional<Optional<String>> appRequest(String[] args) {
    if (args.length == 0) {
      return Optional.of(Optional.empty());
    }
    if (args.length == 2 && args[0].equals("--db")) {
      return Optional.of(Optional.of(args[1]));
    }
    if (args.length == 1 && args[0].startsWith("--db=") && args[0].length() > 5) {
      return Optional.of(Optional.of(args[0].substring(5)));
    }
    return Optional.empty();
  }

  /**
   * Any error no screen handled, on any thread (the FX thread included: its event handlers' errors
   * end here): the stack trace goes to the error log, one line to standard error and to an error
   * window.
   */
  static void logInternalErrors(ErrorLog log, PrintWriter err) {
    Thread.setDefaultUncaughtExceptionHandler((thread, e) -> {
      String line = log.record(e, "desktop app, thread " + thread.getName(), err);
      err.println(line);
      err.flush();
      try {
        Platform.runLater(() -> {
          javafx.scene.control.Alert alert =
              new javafx.scene.control.Alert(javafx.scene.control.Alert.AlertType.ERROR, line);
          alert.setTitle("Bracewalk: internal error");
          alert.setHeaderText("Something failed that is not a problem with your input.");
          alert.show();
        });
      } catch (RuntimeException notRunning) {
        // the toolkit is not running: the line on standard error and the log must do
      }
    });
  }

  /** Opens the app on the chosen database and returns the exit status once its window closes. */
  static int run(Optional<String> dbOption, Map<String, String> env, PrintWriter err) {
    return run(dbOption, env, err, null);
  }

  /**
   * As {@link #run(Optional, Map, PrintWriter)}; {@code ready}, when given, is called on the FX
   * thread with the milliseconds since the JVM started, once the first frame of the window has been
   * drawn (the start-up benchmark closes the window there).
   */
  static int run(Optional<String> dbOption, Map<String, String> env, PrintWriter err,
      java.util.function.BiConsumer<Stage, Long> ready) {
    AppContext context = AppContext.standard();
    CliContext cli = context.cliContext(env);
    String db = cli.location(dbOption.orElse(null));
    boolean timing = "1".equals(env.get(TIMING_VARIABLE));
    logInternalErrors(new ErrorLog(cli.logFolder()), err);
    // open the database while the toolkit starts: the two together decide the start-up time
    // the default data folder is made when missing; any other folder must exist (CliContext)
    CompletableFuture<AppServices> opening = CompletableFuture.supplyAsync(() -> {
      if (CliContext.isServer(db)) {
        return context.openServer(db, env);
      }
      cli.prepareFolder(Path.of(db));
      return context.open(Path.of(db));
    });
    CountDownLatch closed = new CountDownLatch(1);
    CompletableFuture<Void> started = new CompletableFuture<>();
    Platform.setImplicitExit(true);
    try {
      Platform.startup(() -> started.complete(null));
    } catch (UnsupportedOperationException | IllegalStateException e) {
      err.println("bracewalk: cannot open a window here (" + e.getMessage() + ").");
      err.println("Run it on a desktop session, or use the command line: bracewalk --help."
          + " 'bracewalk snapshot --list' draws the screens without a display.");
      err.flush();
      opening.thenAccept(AppServices::close);
      return 2;
    }
    started.join();
    mark(timing, err, "toolkit started");
    ExecutorService background = Executors.newSingleThreadExecutor(r -> {
      Thread t = new Thread(r, "bracewalk-documents");
      t.setDaemon(true);
      return t;
    });
    BracewalkApp app = new BracewalkApp(context.analyzer(), context.clock(), background);
    Stage[] stage = new Stage[1];
    Platform.runLater(() -> {
      stage[0] = new Stage();
      stage[0].setOnHidden(e -> closed.countDown());
      app.showOpening(stage[0], new FxDialogService(stage[0]), CliContext.shown(db));
      mark(timing, err, "opening window shown");
    });
    AppServices services;
    try {
      services = opening.join();
    } catch (RuntimeException e) {
      Throwable cause = e.getCause() == null ? e : e.getCause();
      err.println("bracewalk: cannot open the database " + CliContext.shown(db) + ": "
          + cause.getMessage());
      err.println("Give another file with --db FILE, or set " + CliContext.DB_VARIABLE + ".");
      err.flush();
      Platform.exit();
      return 2;
    }
    mark(timing, err, "database open");
    ReportIssuer issuer = ReportIssuers.over(context, services, env);
    app.prepare(services, issuer); // reads the Sites rows here, while the FX thread styles the window
    mark(timing, err, "Sites rows read");
    Platform.runLater(() -> {
      app.attach(services, issuer);
      mark(timing, err, "Sites screen built");
      if (timing || ready != null) {
        // a pulse draws the frame; the second pulse after the screen is attached comes once it is drawn
        new javafx.animation.AnimationTimer() {
          private int pulses;

          @Override
          public void handle(long now) {
            if (++pulses < 2) {
              return;
            }
            stop();
            long ms = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
            if (timing) {
              err.println("bracewalk: window ready " + ms + " ms after the JVM started");
              err.flush();
            }
            if (ready != null) {
              ready.accept(stage[0], ms);
            }
          }
        }.start();
      }
    });
    try {
      closed.await();
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
    }
    background.shutdownNow();
    services.close();
    Platform.exit();
    return 0;
  }
}
