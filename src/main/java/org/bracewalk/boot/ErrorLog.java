package org.bracewalk.boot;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.Objects;

/**
 * The log of internal errors (failures that are not the input's fault: a bug, memory exhausted, a
 * disk failing): each is appended with its time and full stack trace to {@code
 * bracewalk-errors.log} in the log folder, and the user sees one line naming the error and the
 * file. Shared by the command line and the desktop app.
 */
final class ErrorLog {
  /** The log's file name in its folder. */
  static final String FILE_NAME = "bracewalk-errors.log";

  private final Path folder;

  ErrorLog(Path folder) {
    this.folder = Objects.requireNonNull(folder, "folder");
  }

  Path file() {
    return folder.resolve(FILE_NAME);
  }

  /**
   * Appends the error to the log and returns the one line to show: {@code bracewalk: internal
   * error (CLASS): MESSAGE; details in FILE}. When the log cannot be written, the line says so and
   * the details are printed to {@code fallback} instead, so they are never lost.
   */
  String record(Throwable error, String context, PrintWriter fallback) {
    String head = "bracewalk: internal error (" + error.getClass().getName() + "): "
        + oneLine(error.getMessage());
    StringWriter trace = new StringWriter();
    try (PrintWriter w = new PrintWriter(trace)) {
      w.println("---- " + Instant.now() + " " + context);
      error.printStackTrace(w);
    }
    try {
      Files.createDirectories(folder);
      Files.writeString(file(), trace.toString(), StandardCharsets.UTF_8,
          StandardOpenOption.CREATE, StandardOpenOption.APPEND, StandardOpenOption.WRITE);
      return head + "; details in " + file();
    } catch (IOException | RuntimeException e) {
      fallback.print(trace);
      fallback.flush();
      return head + "; the details could not be written to " + file() + " (" + e + "), so they"
          + " are printed above";
    }
  }

  /** The message on one line; "(no message)" when there is none. */
  private static String oneLine(String message) {
    if (message == null || message.isBlank()) {
      return "(no message)";
    }
    return message.strip().replaceAll("\\s*\\R\\s*", " / ");
  }
}
