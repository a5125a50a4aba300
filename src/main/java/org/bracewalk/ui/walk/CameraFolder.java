package org.bracewalk.ui.walk;

import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Clock;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.app.PhotoFiles;
import org.bracewalk.core.model.Photo;

/**
 * The folder a camera (the tablet's own, or a phone or camera that syncs to the laptop) saves its
 * pictures in: the walk-round takes the photos that arrived there since the previous mark, so
 * the inspector photographs a brace and presses one key instead of browsing for the file.
 */
public final class CameraFolder {
  /** At most this many photos are taken at once (the newest). */
  public static final int MOST_AT_ONCE = 12;

  /** Why a file that is not a JPEG or PNG picture (by its first bytes) is not taken. */
  static final String NOT_A_PICTURE =
      "not a JPEG or PNG picture, which is all the report can draw: save it as JPEG";

  private final Setting setting;
  private final Clock clock;
  /** Photos count from here: the walk-round's opening, then each mark (read from the clock). */
  private Instant since;
  /** Photos already taken in this session, so none is taken twice. */
  private final Set<Path> taken = new HashSet<>();
  /** The folder's photos at the previous mark, once the folder is in use; null before. */
  private Set<Path> before;

  /**
   * The camera folder of one walk-round: remembered in {@code setting}; "since the previous mark"
   * is read from {@code clock} (never the system clock directly), so it can be tested with a fixed one.
   */
  public CameraFolder(Setting setting, Clock clock) {
    this.setting = Objects.requireNonNull(setting, "setting");
    this.clock = Objects.requireNonNull(clock, "clock");
    this.since = clock.instant();
    // what the remembered folder holds now is not new: from here its listing says what is
    this.before = currentListing();
  }

  /** The folder in use, if one has been chosen. */
  public Optional<Path> folder() {
    return setting.get();
  }

  /** The instant photos count from (the opening, or the previous mark). */
  public Instant since() {
    return since;
  }

  /** Uses {@code folder} from now on; another folder than before brings none of its old listing. */
  public void choose(Path folder) {
    Optional<Path> old = setting.get();
    setting.set(folder);
    if (!old.equals(Optional.of(folder))) {
      before = null; // another folder: nothing of the old one's listing applies
    }
  }

  /**
   * The new photos in the folder in use (see {@link #newPhotos}); from here on its own listing says
   * what is new, whatever the camera's clock.
   *
   * @throws IOException when the folder cannot be read
   */
  public Found take() throws IOException {
    Path folder = setting.get().orElseThrow(() -> new IllegalStateException("no camera folder chosen"));
    Found found = newPhotos(folder, before, since, taken);
    before = listing(folder);
    return found;
  }

  /** Notes that {@code photos} went with the next mark, so they are not taken again. */
  public void taken(Collection<Path> photos) {
    taken.addAll(photos);
  }

  /** Notes that {@code photos} were taken off the next mark: they may be offered again. */
  public void released(Collection<Path> photos) {
    taken.removeAll(photos);
    if (before != null) {
      before.removeAll(photos);
    }
  }

  /** A mark was made: photos count from now (by the clock), and from the folder's listing now. */
  public void markMade() {
    markMade(clock.instant());
  }

  /** A mark was made at {@code at} (read from the clock at the key press): photos count from then. */
  public void markMade(Instant at) {
    since = Objects.requireNonNull(at, "at");
    if (before != null) {
      before = currentListing();
    }
  }

  /**
   * The folder's photos now, or null when no folder is set or it cannot be read (then the time
   * rule serves until it can).
   */
  private Set<Path> currentListing() {
    return setting.get().filter(Files::isDirectory).map(f -> {
      try {
        return listing(f);
      } catch (IOException e) {
        return null;
      }
    }).orElse(null);
  }

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

  /**
   * True for the picture files the record keeps (JPEG, PNG, HEIC), leaving out hidden files: the
   * {@code ._} shadows another system leaves on a card, a phone's {@code .pending-} and {@code
   * .trashed-} files.
   */
  static boolean isPhoto(Path f) {
    String n = f.getFileName().toString().toLowerCase(Locale.ROOT);
    return !n.startsWith(".")
        && (n.endsWith(".jpg") || n.endsWith(".jpeg") || n.endsWith(".png") || n.endsWith(".heic"));
  }

  /** The names of the photo files directly in {@code folder}, as absolute paths (no sizes read). */
  public static Set<Path> listing(Path folder) throws IOException {
    Set<Path> out = new java.util.HashSet<>();
    try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
      for (Path f : entries) {
        if (isPhoto(f)) {
          out.add(f.toAbsolutePath());
        }
      }
    }
    return out;
  }

  /**
   * The new photos found, oldest first; how many more there were than are taken at once; and the
   * new files passed over, with why (empty: still being copied; too large to keep).
   */
  public record Found(List<Path> photos, int leftOut, List<String> passedOver) {}

  /**
   * The photos in {@code folder} that are new: not in {@code before} (the folder's listing at the
   * previous mark or when the folder was chosen), or last written at or after {@code since} (less
   * two seconds: a memory card keeps times to two seconds) — the listing catches a camera whose
   * clock is behind, the time a file that was still being copied at the mark. Never one in {@code
   * taken}; only JPEG and PNG pictures of 1 byte to {@link Photo#MAX_BYTES}. Oldest first; the newest {@link
   * #MOST_AT_ONCE} when there are more.
   *
   * @param before the earlier listing, or null when there is none (then only the time counts)
   * @throws IOException when the folder cannot be read
   */
  public static Found newPhotos(Path folder, Set<Path> before, Instant since, Set<Path> taken) throws IOException {
    record Candidate(Path path, Instant written) {}
    Instant from = since.minusSeconds(2);
    List<Candidate> found = new ArrayList<>();
    List<String> passedOver = new ArrayList<>();
    for (Path f : listing(folder)) {
      if (taken.contains(f)) {
        continue;
      }
      BasicFileAttributes a;
      try {
        a = Files.readAttributes(f, BasicFileAttributes.class);
      } catch (IOException gone) {
        continue; // removed while being read
      }
      Instant written = a.lastModifiedTime().toInstant();
      boolean unlisted = before != null && !before.contains(f);
      if (!a.isRegularFile() || !(unlisted || !written.isBefore(from))) {
        continue;
      }
      if (a.size() < 1) {
        passedOver.add(f.getFileName() + " (empty: still being copied?)");
      } else if (a.size() > Photo.MAX_BYTES) {
        passedOver.add(f.getFileName() + " (over 20 MB)");
      } else if (PhotoFiles.problem(f).isPresent()) {
        passedOver.add(f.getFileName() + " (" + NOT_A_PICTURE + ")");
      } else {
        found.add(new Candidate(f, written));
      }
    }
    found.sort(Comparator.comparing(Candidate::written).thenComparing(Candidate::path));
    int leftOut = Math.max(0, found.size() - MOST_AT_ONCE);
    return new Found(found.subList(leftOut, found.size()).stream().map(Candidate::path).toList(), leftOut,
        List.copyOf(passedOver));
  }

  /**
   * Why the photo file {@code f} cannot go with a mark now (gone, unreadable, empty, too large, not
   * a JPEG or PNG picture by its first bytes), or
   * empty when it can.
   */
  public static Optional<String> problem(Path f) {
    try {
      if (!Files.isRegularFile(f)) {
        return Optional.of("it is no longer there");
      }
      long size = Files.size(f);
      if (size < 1) {
        return Optional.of("it is empty (still being copied?)");
      }
      if (size > Photo.MAX_BYTES) {
        return Optional.of("it holds " + size + " bytes; a photo may hold up to 20 MB");
      }
      if (!Files.isReadable(f)) {
        return Optional.of("it cannot be read");
      }
      return PhotoFiles.problem(f).map(why -> NOT_A_PICTURE);
    } catch (IOException e) {
      return Optional.of("it cannot be read (" + e.getMessage() + ")");
    }
  }
}
