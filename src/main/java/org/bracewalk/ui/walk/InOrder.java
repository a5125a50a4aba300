package org.bracewalk.ui.walk;

import java.util.ArrayDeque;
import java.util.Objects;
import java.util.concurrent.Executor;

/**
 * Runs tasks one at a time in the order given, on an executor of any kind (a single background
 * thread in the app, a pool or the calling thread in tests). The walk-round's writes go through
 * one of these: each mark or undo needs the record id of the one before it on its panel, and that
 * chain is kept here, off the JavaFX thread, so the marks reach the record in key order. A task
 * handed in while another runs waits for it; one that throws does not stop those after it.
 *
 * <p>The app shares one across its screens ({@code ui.AppScreens}): every walk-round writes its
 * marks through it, and every screen reads what it shows on it, so a screen opened while marks are
 * still being written reads them after they are stored.
 */
public final class InOrder implements Executor {
  private final Executor under;
  private final ArrayDeque<Runnable> tasks = new ArrayDeque<>();
  private boolean running;

  public InOrder(Executor under) {
    this.under = Objects.requireNonNull(under, "under");
  }

  @Override
  public void execute(Runnable task) {
    Objects.requireNonNull(task, "task");
    synchronized (this) {
      tasks.add(task);
      if (running) {
        return;
      }
      running = true;
    }
    try {
      under.execute(this::drain);
    } catch (RuntimeException e) {
      synchronized (this) {
        running = false;
        tasks.clear();
      }
      throw e;
    }
  }

  private void drain() {
    while (true) {
      Runnable next;
      synchronized (this) {
        next = tasks.poll();
        if (next == null) {
          running = false;
          return;
        }
      }
      try {
        next.run();
      } catch (RuntimeException e) {
        // each task reports its own failure on the screen; a stray one must not stop the queue
        System.getLogger(InOrder.class.getName()).log(System.Logger.Level.ERROR, "walk-round write failed", e);
      }
    }
  }
}
