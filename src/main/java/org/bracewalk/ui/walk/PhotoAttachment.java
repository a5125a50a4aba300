package org.bracewalk.ui.walk;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.ui.common.DialogService;

/**
 * The photos waiting for the next mark: picked as files or taken from the camera folder. One job:
 * photo attachment. Each command answers what to tell the inspector.
 */
final class PhotoAttachment {
  /** What a command has to say: a status line, or an error (either may be empty; null = unchanged). */
  record Said(String status, String error) {
    static final Said NOTHING = new Said(null, null);
  }

  private final DialogService dialogs;
  private final Clock clock;
  private final ObservableList<Path> photos = FXCollections.observableArrayList();
  private Path photoFolder;
  private CameraFolder camera;

  PhotoAttachment(DialogService dialogs, Clock clock) {
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.clock = Objects.requireNonNull(clock, "clock");
    this.camera = new CameraFolder(CameraFolder.Setting.inMemory(), clock);
  }

  /** Where the camera folder is remembered. */
  void useCameraFolderSetting(CameraFolder.Setting setting) {
    camera = new CameraFolder(setting, clock);
  }

  Optional<Path> cameraFolder() {
    return camera.folder();
  }

  /** Asks for photo files and adds them to the next mark. */
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
   * walk-round opened); asks for the folder the first time, or when {@code choose}.
   */
  Said addCameraPhotos(boolean choose) {
    Optional<Path> folder = camera.folder();
    if (choose || folder.isEmpty() || !Files.isDirectory(folder.get())) {
      Optional<Path> picked = dialogs.chooseFolder(
          "Camera folder: where the camera or phone saves its pictures", folder.orElse(photoFolder));
      if (picked.isEmpty()) {
        return Said.NOTHING;
      }
      camera.choose(picked.get());
      folder = picked;
    }
    CameraFolder.Found found;
    try {
      found = camera.take();
    } catch (IOException e) {
      return new Said(null, "The camera folder " + folder.get() + " cannot be read (" + e.getMessage()
          + "). Press Shift+G to choose another, or F to pick the files.");
    }
    String passed = found.passedOver().isEmpty() ? ""
        : " Passed over: " + String.join(", ", found.passedOver()) + ".";
    List<Path> fresh = found.photos().stream().filter(f -> !photos.contains(f)).toList();
    if (fresh.isEmpty()) {
      return new Said("No new photos in " + folder.get() + " since the previous mark." + passed
          + " Take the photo, then press G again; F picks files.", null);
    }
    photos.addAll(fresh);
    camera.taken(fresh);
    return new Said(fresh.size() + (fresh.size() == 1 ? " photo" : " photos") + " from " + folder.get()
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
    camera.released(photos); // G may offer them again
    photos.clear();
    return n + (n == 1 ? " photo" : " photos") + " taken off the next mark (the files stay where they are).";
  }

  /** Takes off the photos that cannot go with a mark now, each with why (empty: all can). */
  List<String> dropUnusable() {
    List<String> bad = new ArrayList<>();
    for (Path photo : List.copyOf(photos)) {
      Optional<String> problem = CameraFolder.problem(photo);
      if (problem.isPresent()) {
        photos.remove(photo);
        bad.add(photo + " (" + problem.get() + ")");
      }
    }
    return bad;
  }

  /** A mark took the photos: the list empties and the camera counts from now. */
  void markMade() {
    photos.clear();
    camera.markMade();
  }

  ObservableList<Path> photos() {
    return photos;
  }
}
