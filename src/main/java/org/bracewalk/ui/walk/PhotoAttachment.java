package org.bracewalk.ui.walk;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.ui.common.DialogService;

/**
 * The photos waiting for the next mark: picked as files or taken from the camera folder. One job:
 * photo attachment. The list of photos lives on the UI thread; the camera folder (its listing,
 * the files' times, sizes and first bytes) is read only on the walk-round's ordered queue, never
 * on the JavaFX thread, and what a command has to say comes back through the UI executor.
 */
final class PhotoAttachment {
  /** What a command has to say: a status line, or an error (either may be empty; null = unchanged). */
  record Said(String status, String error) {
    static final Said NOTHING = new Said(null, null);
  }

  private final DialogService dialogs;
  private final Clock clock;
  private final Executor ui;
  /** Where file work runs, in order with the marks (the walk-round's queue). */
  private final Executor files;
  private final ObservableList<Path> photos = FXCollections.observableArrayList();
  private Path photoFolder;
  /** Where the camera folder is remembered (read on the UI thread: a preference, not a file). */
  private CameraFolder.Setting setting = CameraFolder.Setting.inMemory();
  /** Used on the {@code files} queue only. */
  private CameraFolder camera;

  PhotoAttachment(DialogService dialogs, Clock clock, Executor ui, Executor files) {
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.clock = Objects.requireNonNull(clock, "clock");
    this.ui = Objects.requireNonNull(ui, "ui");
    this.files = Objects.requireNonNull(files, "files");
    CameraFolder.Setting first = setting;
    files.execute(() -> camera = new CameraFolder(first, clock));
  }

  /** Where the camera folder is remembered; the folder's listing is read on the queue. */
  void useCameraFolderSetting(CameraFolder.Setting use) {
    setting = Objects.requireNonNull(use, "setting");
    files.execute(() -> camera = new CameraFolder(use, clock));
  }

  Optional<Path> cameraFolder() {
    return setting.get();
  }

  /** Asks for photo files and adds them to the next mark (they are checked when the mark is written). */
  void addPhotos(String title) {
    List<Path> chosen = dialogs.choosePhotos(title, photoFolder);
    if (!chosen.isEmpty()) {
      photos.addAll(chosen);
      Path parent = chosen.get(0).toAbsolutePath().getParent();
      if (parent != null) {
        photoFolder = parent;
      }
    }
  }

  /**
   * Attaches the photos saved in the camera folder since the previous mark (or since the
   * walk-round opened); asks for the folder the first time, when {@code choose}, or when the folder
   * remembered is no longer there. {@code said} is told on the UI thread (not at all when the
   * question is cancelled).
   */
  void addCameraPhotos(boolean choose, Consumer<Said> said) {
    Optional<Path> folder = setting.get();
    if (choose || folder.isEmpty()) {
      askFolder(folder.orElse(photoFolder), said);
      return;
    }
    Path known = folder.get();
    files.execute(() -> {
      if (!Files.isDirectory(known)) {
        ui.execute(() -> askFolder(known, said));
        return;
      }
      take(known, said);
    });
  }

  private void askFolder(Path initial, Consumer<Said> said) {
    Optional<Path> picked = dialogs.chooseFolder(
        "Camera folder: where the camera or phone saves its pictures", initial);
    if (picked.isEmpty()) {
      return;
    }
    Path chosen = picked.get();
    files.execute(() -> {
      camera.choose(chosen);
      take(chosen, said);
    });
  }

  /** On the queue: reads the folder, then attaches on the UI thread what is not attached already. */
  private void take(Path folder, Consumer<Said> said) {
    CameraFolder.Found found;
    try {
      found = camera.take();
    } catch (IOException e) {
      String why = e.getMessage();
      ui.execute(() -> said.accept(new Said(null, "The camera folder " + folder + " cannot be read (" + why
          + "). Press Shift+G to choose another, or F to pick the files.")));
      return;
    }
    ui.execute(() -> said.accept(attach(folder, found)));
  }

  private Said attach(Path folder, CameraFolder.Found found) {
    String passed = found.passedOver().isEmpty() ? ""
        : " Passed over: " + String.join(", ", found.passedOver()) + ".";
    List<Path> fresh = found.photos().stream().filter(f -> !photos.contains(f)).toList();
    if (fresh.isEmpty()) {
      return new Said("No new photos in " + folder + " since the previous mark." + passed
          + " Take the photo, then press G again; F picks files.", null);
    }
    photos.addAll(fresh);
    files.execute(() -> camera.taken(fresh));
    return new Said(fresh.size() + (fresh.size() == 1 ? " photo" : " photos") + " from " + folder
        + " attached to the next mark: " + String.join(", ",
            fresh.stream().map(f -> f.getFileName().toString()).toList())
        + (found.leftOut() > 0 ? "; " + found.leftOut() + " older new ones left out (F picks them)" : "")
        + "." + passed + " Shift+F takes them off again.", "");
  }

  /** Takes the photos off the next mark (none deleted from its folder); null when there were none. */
  String clear() {
    if (photos.isEmpty()) {
      return null;
    }
    int n = photos.size();
    List<Path> off = List.copyOf(photos);
    files.execute(() -> camera.released(off)); // G may offer them again
    photos.clear();
    return n + (n == 1 ? " photo" : " photos") + " taken off the next mark (the files stay where they are).";
  }

  /**
   * A mark took the photos: the list empties and the camera counts from now (the time read here,
   * at the key press; the folder's listing read on the queue).
   */
  void markMade() {
    photos.clear();
    Instant at = clock.instant();
    files.execute(() -> camera.markMade(at));
  }

  ObservableList<Path> photos() {
    return photos;
  }
}
