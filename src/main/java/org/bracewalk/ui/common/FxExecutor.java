package org.bracewalk.ui.common;

import java.util.concurrent.Executor;
import javafx.application.Platform;

/**
 * Runs work on the JavaFX application thread: at once when already there, else at the next turn.
 * View models take an {@link Executor} for "back on the UI thread"; tests pass {@code Runnable::run}.
 */
public final class FxExecutor implements Executor {
  @Override
  public void execute(Runnable command) {
    if (Platform.isFxApplicationThread()) {
      command.run();
    } else {
      Platform.runLater(command);
    }
  }
}
