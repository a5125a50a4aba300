package org.bracewalk.bench;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.Supplier;
import javafx.application.Platform;

/**
 * Starts the JavaFX toolkit without a display (Monocle's headless platform, software rendering),
 * for rendering screens to pictures and for benchmarks. Must be called before anything else starts
 * the toolkit in this process.
 */
public final class HeadlessFx {
  private HeadlessFx() {}

  /** Sets the headless platform properties and starts the toolkit (once per process). */
  public static void start() {
    System.setProperty("glass.platform", "Monocle");
    System.setProperty("monocle.platform", "Headless");
    System.setProperty("prism.order", "sw");
    System.setProperty("prism.text", "t2k");
    System.setProperty("java.awt.headless", "true");
    CompletableFuture<Void> started = new CompletableFuture<>();
    try {
      Platform.startup(() -> started.complete(null));
    } catch (IllegalStateException alreadyRunning) {
      started.complete(null);
    }
    Platform.setImplicitExit(false);
    started.join();
  }

  /** Runs {@code task} on the JavaFX thread and waits for its result (up to a minute). */
  public static <T> T onFx(Supplier<T> task) {
    CompletableFuture<T> f = new CompletableFuture<>();
    Platform.runLater(() -> {
      try {
        f.complete(task.get());
      } catch (Throwable t) {
        f.completeExceptionally(t);
      }
    });
    try {
      return f.get(60, TimeUnit.SECONDS);
    } catch (ExecutionException e) {
      Throwable c = e.getCause();
      if (c instanceof RuntimeException r) {
        throw r;
      }
      if (c instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(c);
    } catch (InterruptedException e) {
      Thread.currentThread().interrupt();
      throw new IllegalStateException("interrupted while waiting for the JavaFX thread", e);
    } catch (TimeoutException e) {
      throw new IllegalStateException("the JavaFX thread did not answer within a minute", e);
    }
  }
}
