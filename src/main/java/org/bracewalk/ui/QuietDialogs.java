package org.bracewalk.ui;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.bracewalk.ui.common.DialogService;

/** Dialogs for unattended runs (pictures, benchmarks): every question is declined, nothing opens. */
public final class QuietDialogs implements DialogService {
  @Override
  public boolean confirm(String title, String message, String confirmLabel) {
    return false;
  }

  @Override
  public void inform(String title, String message) {}

  @Override
  public void showError(String title, String message) {}

  @Override
  public List<Path> choosePhotos(String title, Path folder) {
    return List.of();
  }

  @Override
  public Optional<String> askText(String title, String message, String initial) {
    return Optional.empty();
  }

  @Override
  public Optional<Path> chooseSaveFile(String title, String suggestedName) {
    return Optional.empty();
  }
}
