package org.bracewalk.app.report;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;
import org.bracewalk.app.UserInputException;

/**
 * Puts issued documents on disk so that what stands under a chosen name is always a registered
 * copy: each file's final bytes go to a temporary file beside its target (synced), then the copies
 * are registered (one transaction), then each temporary file is moved into place. A failure before
 * the register leaves no file and no row; a failure to move after it leaves a registered copy no
 * file holds, which the error says.
 */
final class IssuedFiles {
  /** One file to issue: where, and its exact bytes. */
  record Pending(Path target, byte[] bytes) {}

  private IssuedFiles() {}

  static <T> T issue(List<Pending> files, Supplier<T> register) {
    List<Path> temps = new ArrayList<>();
    try {
      for (Pending p : files) {
        temps.add(writeTemp(p));
      }
      T registered = register.get();
      for (int i = 0; i < files.size(); i++) {
        Path target = files.get(i).target().toAbsolutePath();
        try {
          try {
            Files.move(temps.get(i), target, StandardCopyOption.REPLACE_EXISTING,
                StandardCopyOption.ATOMIC_MOVE);
          } catch (AtomicMoveNotSupportedException e) {
            Files.move(temps.get(i), target, StandardCopyOption.REPLACE_EXISTING);
          }
        } catch (IOException e) {
          throw new UserInputException("cannot write " + files.get(i).target() + ": " + e.getMessage()
              + "; the document is in the register as issued, but no file holds it: issue it again");
        }
      }
      return registered;
    } finally {
      for (Path t : temps) {
        try {
          Files.deleteIfExists(t);
        } catch (IOException ignored) {
          // a leftover hidden .part file beside the target; nothing else to do
        }
      }
    }
  }

  private static Path writeTemp(Pending p) {
    Path target = p.target().toAbsolutePath();
    Path parent = target.getParent();
    Path tmp = null;
    try {
      if (parent != null) {
        Files.createDirectories(parent);
      }
      tmp = Files.createTempFile(parent, ".bracewalk-", ".part");
      try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE,
          StandardOpenOption.TRUNCATE_EXISTING)) {
        java.nio.ByteBuffer buf = java.nio.ByteBuffer.wrap(p.bytes());
        while (buf.hasRemaining()) {
          ch.write(buf);
        }
        ch.force(true);
      }
      return tmp;
    } catch (IOException e) {
      if (tmp != null) {
        try {
          Files.deleteIfExists(tmp);
        } catch (IOException ignored) {
          // nothing more to do
        }
      }
      throw new UserInputException("cannot write " + p.target() + ": " + e.getMessage());
    }
  }
}
