package org.bracewalk.ui.common;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The only way view models talk to the person through a window of its own. The app shows real
 * dialogs; tests answer with a fake, so no logic ever opens a window itself.
 */
public interface DialogService {

  /** Asks a yes/no question; true when the person chose {@code confirmLabel}. */
  boolean confirm(String title, String message, String confirmLabel);

  /**
   * Asks before something risky; true when the person chose {@code riskyLabel}. The safe choice,
   * {@code safeLabel}, is the default: Enter or Esc choose it.
   */
  default boolean confirmRisky(String title, String message, String riskyLabel, String safeLabel) {
    return confirm(title, message, riskyLabel);
  }

  /** Tells the person something that needs no answer. */
  void inform(String title, String message);

  /** Shows an error: what went wrong, where, and what to do. */
  void showError(String title, String message);

  /** Lets the person pick photo files, starting in {@code folder} if given; empty when cancelled. */
  List<Path> choosePhotos(String title, Path folder);

  /** Lets the person pick a folder, starting in {@code initial} if given; empty when cancelled. */
  default Optional<Path> chooseFolder(String title, Path initial) {
    return Optional.empty();
  }

  /** Asks for a line of text (a name), offering {@code initial}; empty when cancelled. */
  Optional<String> askText(String title, String message, String initial);

  /** Asks where to save a file; empty when cancelled. */
  Optional<Path> chooseSaveFile(String title, String suggestedName);
}
