package org.bracewalk.ui.walk;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.concurrent.Executor;

/** An executor that keeps its tasks until told to run them: a test sees the screen between key and write. */
final class HeldTasks implements Executor {
  private final Deque<Runnable> tasks = new ArrayDeque<>();
  /** How many tasks have run. */
  int ran;

  @Override
  public void execute(Runnable task) {
    tasks.add(task);
  }

  /** Runs every task held, and those they hand in, in order. */
  void runAll() {
    while (!tasks.isEmpty()) {
      tasks.poll().run();
      ran++;
    }
  }

  boolean idle() {
    return tasks.isEmpty();
  }
}
