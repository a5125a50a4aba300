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

  /**
   * The database option when {@code args} ask for the app: none at all, or only {@code --db FILE}
   * (or {@code --db=FILE}); empty when they are a command line.
   */
  static Optional<Optional<Path>> appRequest(String[] args) {
    if (args.length == 0) {
      return Optional.of(Optional.empty());
    }
    if (args.length == 2 && args[0].equals("--db")) {
      return Optional.of(Optional.of(Path.of(args[1])));
    }
    if (args.length == 1 && args[0].startsWith("--db=") && args[0].length() > 5) {
      return Optional.of(Optional.of(Path.of(args[0].substring(5))));
    }
    return Optional.empty();
  }

  /** Opens the app on the chosen database and returns the exit status once its window closes. */
  static int run(Optional<Path> dbOption, Map<String, String> env, PrintWriter err) {
    AppContext context = AppContext.standard();
    CliContext cli = context.cliContext(env);
    Path db = cli.database(dbOption.orElse(null));
    boolean timing = "1".equals(env.get(TIMING_VARIABLE));
    // open the database while the toolkit starts: the two together decide the start-up time
    CompletableFuture<AppServices> opening = CompletableFuture.supplyAsync(() -> {
      try {
        java.nio.file.Files.createDirectories(db.toAbsolutePath().getParent());
      } catch (java.io.IOException e) {
        throw new java.io.UncheckedIOException("cannot create the folder of " + db + ": " + e.getMessage(), e);
      }
      return context.open(db);
    });
    CountDownLatch closed = new CountDownLatch(1);
    CompletableFuture<Void> started = new CompletableFuture<>();
    Platform.setImplicitExit(true);
    Platform.startup(() -> started.complete(null));
    started.join();
    AppServices services;
    try {
      services = opening.join();
    } catch (RuntimeException e) {
      Throwable cause = e.getCause() == null ? e : e.getCause();
      err.println("bracewalk: cannot open the database " + db + ": " + cause.getMessage());
      err.println("Give another file with --db FILE, or set " + CliContext.DB_VARIABLE + ".");
      err.flush();
      Platform.exit();
      return 2;
    }
    ExecutorService background = Executors.newSingleThreadExecutor(r -> {
      Thread t = new Thread(r, "bracewalk-documents");
      t.setDaemon(true);
      return t;
    });
    ReportIssuer issuer = ReportIssuers.over(context, services, env);
    Platform.runLater(() -> {
      Stage stage = new Stage();
      stage.setOnHidden(e -> closed.countDown());
      new BracewalkApp(services, context.analyzer(), context.clock(), background, issuer).show(stage);
      if (timing) {
        // the frame after show() is the first one drawn
        Platform.runLater(() -> {
          long ms = System.currentTimeMillis() - ManagementFactory.getRuntimeMXBean().getStartTime();
          err.println("bracewalk: window ready " + ms + " ms after the JVM started");
          err.flush();
        });
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
