package org.bracewalk.ui.walk;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * The folder a camera (the tablet's own, or a phone or camera that syncs to the laptop) saves its
 * pictures in: the walk-round takes the photos that arrived there since the previous mark, so
 * the inspector photographs a brace and presses one key instead of browsing for the file.
 */
public final class CameraFolder {
  /** At most this many photos are taken at once (the newest). */
  public static final int MOST_AT_ONCE = 12;

  private CameraFolder() {}

  /** Where the chosen camera folder is remembered between sessions. */
  public interface Setting {
    Optional<Path> get();

    void set(Path folder);

    /** Remembered only while the program runs. */
    static Setting inMemory() {
      return new Setting() {
        private Path folder;

        @Override
        public Optional<Path> get() {
          return Optional.ofNullable(folder);
        }

        @Override
        public void set(Path f) {
          folder = f;
        }
      };
    }

    /** Remembered in the user's preferences (per user, per machine). */
    static Setting userPreferences() {
      return new Setting() {
        // the preferences are opened only when the camera folder is first wanted
        private java.util.prefs.Preferences node() {
          return java.util.prefs.Preferences.userNodeForPackage(CameraFolder.class);
        }

        @Override
        public Optional<Path> get() {
          String v = node().get("cameraFolder", "");
          return v.isEmpty() ? Optional.empty() : Optional.of(Path.of(v));
        }

        @Override
        public void set(Path f) {
          node().put("cameraFolder", f.toAbsolutePath().toString());
        }
      };
    }
  }

  /** True for the picture files a report can hold or the record keeps: JPEG, PNG, HEIC. */
  static boolean isPhoto(Path f) {
    String n = f.getFileName().toString().toLowerCase(Locale.ROOT);
    return n.endsWith(".jpg") || n.endsWith(".jpeg") || n.endsWith(".png") || n.endsWith(".heic");
  }

  /**
   * The photo files directly in {@code folder} last written at or after {@code since}, not in
   * {@code taken}, oldest first; the newest {@link #MOST_AT_ONCE} when there are more.
   *
   * @throws IOException when the folder cannot be read
   */
  public static List<Path> photosSince(Path folder, Instant since, Set<Path> taken) throws IOException {
    record Found(Path path, Instant written) {}
    List<Found> found = new ArrayList<>();
    try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
      for (Path f : entries) {
        if (!isPhoto(f) || taken.contains(f.toAbsolutePath())) {
          continue;
        }
        BasicFileAttributes a = Files.readAttributes(f, BasicFileAttributes.class);
        Instant written = a.lastModifiedTime().toInstant();
        if (a.isRegularFile() && !written.isBefore(since)) {
          found.add(new Found(f.toAbsolutePath(), written));
        }
      }
    }
    found.sort(Comparator.comparing(Found::written).thenComparing(Found::path));
    List<Found> newest = found.subList(Math.max(0, found.size() - MOST_AT_ONCE), found.size());
    return newest.stream().map(Found::path).toList();
  }
}
