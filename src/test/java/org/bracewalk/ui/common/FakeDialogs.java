package org.bracewalk.ui.common;

import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Optional;

/** Answers dialogs from queues and remembers what was asked. */
public final class FakeDialogs implements DialogService {
  public final List<String> asked = new ArrayList<>();
  public final List<String> errors = new ArrayList<>();
  public final List<String> told = new ArrayList<>();
  public final Deque<Boolean> confirmAnswers = new ArrayDeque<>();
  public final Deque<List<Path>> photoAnswers = new ArrayDeque<>();
  public final Deque<Optional<Path>> saveAnswers = new ArrayDeque<>();
  public final Deque<Optional<String>> textAnswers = new ArrayDeque<>();
  public final Deque<Optional<Path>> folderAnswers = new ArrayDeque<>();

  @Override
  public boolean confirm(String title, String message, String confirmLabel) {
    asked.add(title + ": " + message);
    return confirmAnswers.isEmpty() ? false : confirmAnswers.pop();
  }

  /** Answered from {@link #confirmAnswers} too; the question names the default (safe) choice. */
  @Override
  public boolean confirmRisky(String title, String message, String riskyLabel, String safeLabel) {
    asked.add(title + ": " + message + " [" + riskyLabel + " / default: " + safeLabel + "]");
    return confirmAnswers.isEmpty() ? false : confirmAnswers.pop();
  }

  @Override
  public void inform(String title, String message) {
    told.add(title + ": " + message);
  }

  @Override
  public void showError(String title, String message) {
    errors.add(title + ": " + message);
  }

  @Override
  public List<Path> choosePhotos(String title, Path folder) {
    asked.add(title);
    return photoAnswers.isEmpty() ? List.of() : photoAnswers.pop();
  }

  @Override
  public Optional<Path> chooseFolder(String title, Path initial) {
    asked.add(title);
    return folderAnswers.isEmpty() ? Optional.empty() : folderAnswers.pop();
  }

  @Override
  public Optional<String> askText(String title, String message, String initial) {
    asked.add(title + ": " + message);
    return textAnswers.isEmpty() ? Optional.empty() : textAnswers.pop();
  }

  @Override
  public Optional<Path> chooseSaveFile(String title, String suggestedName) {
    asked.add(title);
    return saveAnswers.isEmpty() ? Optional.empty() : saveAnswers.pop();
  }
}
