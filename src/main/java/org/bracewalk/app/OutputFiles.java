package org.bracewalk.app;

import java.io.BufferedOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.SecureRandom;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.Deque;
import java.util.HexFormat;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The one way the program writes a file the user named: a report, a repair order and its CSV, an
 * exported site file, CSV or panel map, a screen picture. Every front end writes through it.
 *
 * <p>It refuses, with a {@link UserInputException} that names the path (exit status 2 on the
 * command line) and before a byte is written:
 *
 * <ul>
 *   <li>the open database and its {@code -wal}, {@code -shm} and {@code -journal} files, under
 *       any name that reaches them: another spelling of the path, a folder reached through a
 *       link, a hard link (the same file), a name differing only in case;
 *   <li>any file the same run reads ({@link #withInput}), and two outputs of one run naming the
 *       same file ({@link #check});
 *   <li>a target that is a symbolic link, wherever it points: the file is never written through a
 *       link, and a link is not silently replaced by a file either (the message says where the
 *       link points and whether that is the database);
 *   <li>a target that is a folder, or an existing SQLite database file (an output never replaces
 *       a database, whichever program's it is).
 * </ul>
 *
 * <p>The content goes to a new temporary file in the target's folder, is synced to the disk,
 * and is then renamed over the target in one atomic step, and the folder is synced: a crash or a
 * failure part-way leaves the old file as it was and no temporary file behind. A missing folder
 * of the target is created. Immutable: {@link #withInput} returns a new value.
 */
public final class OutputFiles {
  /** A file no output may replace, and what it is, for the message. */
  private record Guarded(Path path, Path real, String what) {}

  private static final byte[] SQLITE_MAGIC =
      "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

  private static final SecureRandom RANDOM = new SecureRandom();

  private final List<Guarded> guarded;

  private OutputFiles(List<Guarded> guarded) {
    this.guarded = List.copyOf(guarded);
  }

  /** Guards no database (a snapshot or benchmark of its own): links and folders are refused. */
  public static OutputFiles none() {
    return new OutputFiles(List.of());
  }

  /** Guards the database file, when there is one, and its {@code -wal}/{@code -shm}/{@code -journal}. */
  public static OutputFiles guarding(Optional<Path> database) {
    List<Guarded> g = new ArrayList<>();
    database.ifPresent(db -> {
      Path abs = db.toAbsolutePath();
      g.add(guard(abs, "the open database"));
      g.add(guard(Path.of(abs + "-wal"), "the open database's write-ahead log (-wal)"));
      g.add(guard(Path.of(abs + "-shm"), "the open database's shared-memory file (-shm)"));
      g.add(guard(Path.of(abs + "-journal"), "the open database's rollback journal (-journal)"));
    });
    return new OutputFiles(g);
  }

  /** As this, also guarding {@code input}: a file the same run reads. */
  public OutputFiles withInput(Path input) {
    List<Guarded> g = new ArrayList<>(guarded);
    g.add(guard(input.toAbsolutePath(), "a file this command reads"));
    return new OutputFiles(g);
  }

  /** As this, also guarding every file of {@code inputs}. */
  public OutputFiles withInputs(Collection<Path> inputs) {
    OutputFiles o = this;
    for (Path p : inputs) {
      o = o.withInput(p);
    }
    return o;
  }

  private static Guarded guard(Path path, String what) {
    return new Guarded(path, real(path), what);
  }

  /**
   * Checks that every one of {@code targets} may be written, and that no two are the same file,
   * before anything is made: a command that writes two files checks both first, so a refusal
   * leaves neither written. A null target (an optional output not asked for) is passed over.
   *
   * @throws UserInputException naming the path and what it is
   */
  public void check(Path... targets) {
    targets = Arrays.stream(targets).filter(Objects::nonNull).toArray(Path[]::new);
    List<Path> reals = new ArrayList<>();
    for (Path t : targets) {
      reals.add(resolve(t));
    }
    for (int i = 0; i < reals.size(); i++) {
      for (int j = i + 1; j < reals.size(); j++) {
        if (same(reals.get(i), reals.get(j))) {
          throw new UserInputException(targets[i] + " and " + targets[j] + " are the same file."
              + " Nothing was written: give each output its own name");
        }
      }
    }
  }

  /** Writes {@code bytes} to {@code target}, as {@link #write(Path, Body)}. */
  public void write(Path target, byte[] bytes) {
    Objects.requireNonNull(bytes, "bytes");
    write(target, out -> out.write(bytes));
  }

  /** Writes {@code text} as UTF-8 to {@code target}, as {@link #write(Path, Body)}. */
  public void writeText(Path target, String text) {
    write(target, text.getBytes(StandardCharsets.UTF_8));
  }

  /** Writes what the body of a file writes to a stream. */
  @FunctionalInterface
  public interface Body {
    /** Writes the content to {@code out} (closing it is allowed and does nothing). */
    void writeTo(OutputStream out) throws IOException;
  }

  /**
   * Writes the file: checks the target ({@link #check}), writes the body to a new temporary file
   * beside it, syncs it, renames it over the target atomically and syncs the folder. On any
   * failure (the body's too) the temporary file is deleted and the target is as it was.
   *
   * @throws UserInputException naming the path: refused, or it cannot be written
   */
  public void write(Path target, Body body) {
    writeAll(List.of(new Staged(target, body)), () -> null);
  }

  /** One file of {@link #writeAll}: where, and what it holds. */
  public record Staged(Path target, Body body) {
    /** A file holding exactly {@code bytes}. */
    public static Staged of(Path target, byte[] bytes) {
      Objects.requireNonNull(bytes, "bytes");
      return new Staged(target, out -> out.write(bytes));
    }
  }

  /**
   * Writes several files as one step: checks every target ({@link #check}: none refused, no two
   * the same), writes each to a synced temporary file beside it, runs {@code beforeMove} (an issued
   * document is registered there, so what stands under a name is always a registered copy), then
   * renames each into place and syncs the folders. A failure before the renames leaves every target
   * as it was and no temporary file; {@code beforeMove}'s exception passes through unchanged.
   *
   * @return what {@code beforeMove} returned
   * @throws UserInputException naming the path: refused, or it cannot be written
   */
  public <T> T writeAll(List<Staged> files, java.util.function.Supplier<T> beforeMove) {
    check(files.stream().map(Staged::target).toArray(Path[]::new));
    List<Path> reals = new ArrayList<>();
    List<Path> temps = new ArrayList<>();
    try {
      for (Staged f : files) {
        Path real = resolve(f.target());
        reals.add(real);
        temps.add(writeTemporary(f.target(), real.getParent(), f.body()));
      }
      T result = beforeMove.get();
      for (int i = 0; i < files.size(); i++) {
        try {
          move(temps.get(i), reals.get(i));
        } catch (IOException e) {
          throw new UserInputException("cannot write " + files.get(i).target() + ": "
              + e.getMessage(), e);
        }
        temps.set(i, null);
        syncFolder(reals.get(i).getParent());
      }
      return result;
    } finally {
      for (Path tmp : temps) {
        if (tmp != null) {
          try {
            Files.deleteIfExists(tmp);
          } catch (IOException ignored) {
            // the write has failed already and says so; a stray hidden .part file is all that is left
          }
        }
      }
    }
  }

  /** The body written to a new synced temporary file in {@code folder} (made when missing). */
  private static Path writeTemporary(Path target, Path folder, Body body) {
    try {
      Files.createDirectories(folder);
    } catch (IOException e) {
      throw new UserInputException("cannot create the folder " + folder + " for " + target + ": "
          + e.getMessage(), e);
    }
    Path tmp = null;
    try {
      tmp = newTemporary(folder);
      try (FileChannel channel = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
        OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel), 1 << 16);
        body.writeTo(new FilterOutputStream(out) {
          @Override
          public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
          }

          @Override
          public void close() throws IOException {
            out.flush(); // the file is closed after it is synced, below
          }
        });
        out.flush();
        channel.force(true);
      }
      Path done = tmp;
      tmp = null;
      return done;
    } catch (IOException e) {
      throw new UserInputException("cannot write " + target + ": " + e.getMessage(), e);
    } finally {
      if (tmp != null) {
        try {
          Files.deleteIfExists(tmp);
        } catch (IOException ignored) {
          // the write has failed already and says so
        }
      }
    }
  }

  private static Path newTemporary(Path folder) throws IOException {
    while (true) {
      byte[] random = new byte[6];
      RANDOM.nextBytes(random);
      Path tmp = folder.resolve(".bracewalk-" + HexFormat.of().formatHex(random) + ".part");
      try {
        // default permissions (as any new file of the user), unlike createTempFile's owner-only
        FileChannel.open(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
        return tmp;
      } catch (FileAlreadyExistsException taken) {
        // another name
      }
    }
  }

  private static void move(Path tmp, Path target) throws IOException {
    try {
      Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (AtomicMoveNotSupportedException e) {
      // same folder, so a rename still; only file systems that cannot promise atomicity get here
      Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  /** Makes the rename durable (POSIX: fsync the folder). Windows cannot open a folder: skipped. */
  private static void syncFolder(Path folder) {
    try (FileChannel d = FileChannel.open(folder, StandardOpenOption.READ)) {
      d.force(true);
    } catch (IOException | UnsupportedOperationException notPossibleHere) {
      // the file itself is synced; the rename is then as durable as the platform allows
    }
  }

  /** The real path the target names, or a refusal naming it. */
  private Path resolve(Path target) {
    Path abs = target.toAbsolutePath();
    if (Files.isSymbolicLink(abs)) {
      String where;
      Path to;
      try {
        Path link = Files.readSymbolicLink(abs);
        to = real(abs.getParent() == null ? link : abs.getParent().resolve(link));
        where = link.toString();
      } catch (IOException e) {
        throw new UserInputException(target + " is a symbolic link that cannot be read ("
            + e.getMessage() + "); nothing was written: give the path of a file");
      }
      for (Guarded g : guarded) {
        if (same(to, g.real())) {
          throw new UserInputException(target + " is a symbolic link to " + g.what() + " ("
              + g.path() + "); Bracewalk never writes an output over it. Nothing was written:"
              + " choose another file");
        }
      }
      throw new UserInputException(target + " is a symbolic link (to " + where + "); Bracewalk"
          + " does not write through or over links. Nothing was written: give the path of the"
          + " file itself");
    }
    if (Files.isDirectory(abs)) {
      throw new UserInputException(target + " is a folder. Nothing was written: give a file"
          + " name");
    }
    Path real = real(abs);
    if (real.getParent() == null || real.getFileName() == null) {
      throw new UserInputException(target + " is not a file name. Nothing was written");
    }
    for (Guarded g : guarded) {
      if (same(real, g.real())) {
        throw new UserInputException(target + " is " + g.what()
            + (g.path().equals(abs) ? "" : " (" + g.path() + ")")
            + "; Bracewalk never writes an output over it. Nothing was written: choose another"
            + " file");
      }
    }
    if (isSqliteFile(real)) {
      throw new UserInputException(target + " is a SQLite database; an output never replaces a"
          + " database. Nothing was written: choose another file");
    }
    return real;
  }

  /**
   * The same file: both exist and the file system says they are one (hard links, case), or
   * either does not exist and they have the same real folder and a name equal but for case (so a
   * file made now cannot later pass for the database's journal on a case-blind disk).
   */
  private static boolean same(Path a, Path b) {
    if (Files.exists(a, LinkOption.NOFOLLOW_LINKS) && Files.exists(b, LinkOption.NOFOLLOW_LINKS)) {
      try {
        return Files.isSameFile(a, b);
      } catch (IOException e) {
        // fall back to the names
      }
    }
    return Objects.equals(a.getParent(), b.getParent())
        && a.getFileName() != null && b.getFileName() != null
        && a.getFileName().toString().equalsIgnoreCase(b.getFileName().toString());
  }

  /**
   * The path with its folder resolved to the real one (links in the folders followed, {@code ..}
   * taken out), as far as the folders exist; the file name itself is kept (not followed).
   */
  static Path real(Path path) {
    Path abs = path.toAbsolutePath();
    Path name = abs.getFileName();
    Path parent = abs.getParent();
    if (parent == null || name == null) {
      return abs.normalize();
    }
    Deque<Path> missing = new ArrayDeque<>();
    Path existing = parent;
    while (existing != null && !Files.isDirectory(existing)) {
      missing.push(existing.getFileName());
      existing = existing.getParent();
    }
    Path base;
    try {
      base = existing == null ? parent.getRoot() : existing.toRealPath();
    } catch (IOException e) {
      base = existing;
    }
    for (Path m : missing) {
      base = base.resolve(m);
    }
    return base.normalize().resolve(name);
  }

  private static boolean isSqliteFile(Path file) {
    if (!Files.isRegularFile(file, LinkOption.NOFOLLOW_LINKS)) {
      return false;
    }
    byte[] head = new byte[SQLITE_MAGIC.length];
    try (InputStream in = Files.newInputStream(file)) {
      return in.readNBytes(head, 0, head.length) == head.length && Arrays.equals(head, SQLITE_MAGIC);
    } catch (IOException e) {
      return false; // cannot be read: the write will say what is wrong
    }
  }
}
