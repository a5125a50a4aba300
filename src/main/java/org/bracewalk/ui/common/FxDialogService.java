package org.bracewalk.ui.common;

import java.io.File;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import javafx.scene.control.Alert;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/** The real dialogs, owned by the main window. */
public final class FxDialogService implements DialogService {
  private final Window owner;

  public FxDialogService(Window owner) {
    this.owner = owner;
  }

  @Override
  public boolean confirm(String title, String message, String confirmLabel) {
    ButtonType yes = new ButtonType(confirmLabel, ButtonBar.ButtonData.OK_DONE);
    ButtonType no = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);
    Alert a = new Alert(Alert.AlertType.CONFIRMATION, message, yes, no);
    prepare(a, title);
    return a.showAndWait().filter(b -> b == yes).isPresent();
  }

  /** The safe button is the default and has the focus; the risky one is neither. */
  @Override
  public boolean confirmRisky(String title, String message, String riskyLabel, String safeLabel) {
    ButtonType risky = new ButtonType(riskyLabel, ButtonBar.ButtonData.OTHER);
    ButtonType safe = new ButtonType(safeLabel, ButtonBar.ButtonData.CANCEL_CLOSE);
    Alert a = new Alert(Alert.AlertType.WARNING, message, safe, risky);
    prepare(a, title);
    javafx.scene.control.Button safeButton = (javafx.scene.control.Button) a.getDialogPane().lookupButton(safe);
    javafx.scene.control.Button riskyButton = (javafx.scene.control.Button) a.getDialogPane().lookupButton(risky);
    riskyButton.setDefaultButton(false);
    safeButton.setDefaultButton(true);
    a.setOnShown(e -> safeButton.requestFocus());
    return a.showAndWait().filter(b -> b == risky).isPresent();
  }

  @Override
  public void inform(String title, String message) {
    Alert a = new Alert(Alert.AlertType.INFORMATION, message, ButtonType.OK);
    prepare(a, title);
    a.showAndWait();
  }

  @Override
  public void showError(String title, String message) {
    Alert a = new Alert(Alert.AlertType.ERROR, message, ButtonType.OK);
    prepare(a, title);
    a.showAndWait();
  }

  private void prepare(Alert a, String title) {
    a.initOwner(owner);
    a.setTitle(title);
    a.setHeaderText(title);
    a.getDialogPane().setMinWidth(520);
    a.setResizable(true);
  }

  @Override
  public List<Path> choosePhotos(String title, Path folder) {
    FileChooser fc = new FileChooser();
    fc.setTitle(title);
    fc.getExtensionFilters()
        .addAll(
            new FileChooser.ExtensionFilter("Photos", "*.jpg", "*.jpeg", "*.png", "*.JPG", "*.JPEG", "*.PNG"),
            new FileChooser.ExtensionFilter("All files", "*"));
    if (folder != null && folder.toFile().isDirectory()) {
      fc.setInitialDirectory(folder.toFile());
    }
    List<File> files = fc.showOpenMultipleDialog(owner);
    return files == null ? List.of() : files.stream().map(File::toPath).toList();
  }

  @Override
  public Optional<Path> chooseFolder(String title, Path initial) {
    javafx.stage.DirectoryChooser dc = new javafx.stage.DirectoryChooser();
    dc.setTitle(title);
    if (initial != null && initial.toFile().isDirectory()) {
      dc.setInitialDirectory(initial.toFile());
    }
    return Optional.ofNullable(dc.showDialog(owner)).map(File::toPath);
  }

  @Override
  public Optional<String> askText(String title, String message, String initial) {
    javafx.scene.control.TextInputDialog d = new javafx.scene.control.TextInputDialog(initial);
    d.initOwner(owner);
    d.setTitle(title);
    d.setHeaderText(title);
    d.setContentText(message);
    return d.showAndWait().map(String::strip).filter(t -> !t.isEmpty());
  }

  @Override
  public Optional<Path> chooseSaveFile(String title, String suggestedName) {
    FileChooser fc = new FileChooser();
    fc.setTitle(title);
    fc.setInitialFileName(suggestedName);
    File f = fc.showSaveDialog(owner);
    return Optional.ofNullable(f).map(File::toPath);
  }
}
