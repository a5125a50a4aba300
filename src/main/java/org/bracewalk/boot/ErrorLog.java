package org.bracewalk.boot;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.lang.System.Logger.Level;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Objects;
import java.util.logging.Handler;
import java.util.logging.LogRecord;

/**
 * The log of internal errors (failures that are not the input's fault: a bug, memory exhausted, a
 * disk failing): the technical detail of each, its time, where it happened and its full stack
 * trace, is logged once through the {@link System.Logger} {@value #LOGGER_NAME}, whose only
 * handler appends it to {@code bracewalk-errors.log} in the log folder; the user sees one line
 * naming the error and the file. Shared by the command line and the desktop app.
 *
 * <p>The platform logger's backend is {@code java.util.logging} (the JDK's default): the logger's
 * parent handlers are switched off, so the detail never reaches the console as well.
 */
final class ErrorLog {
  /** The log's file name in its folder. */
  static final String FILE_NAME = "bracewalk-errors.log";

  /** The name of the logger internal errors are logged to. */
  static final String LOGGER_NAME = "org.bracewalk.internal-errors";

  private static final System.Logger LOGGER = System.getLogger(LOGGER_NAME);

  private final Path folder;

  ErrorLog(Path folder) {
    this.folder = Objects.requireNonNull(folder, "folder");
  }

  Path file() {
    return folder.resolve(FILE_NAME);
  }

  /**
   * Logs the error and returns the one line to show: {@code bracewalk: internal error (CLASS):
   * MESSAGE; details in FILE}. When the log cannot be written, the line says so and the details
   * are printed to {@code fallback} instead, so they are never lost.
   */
  String record(Throwable error, String context, PrintWriter fallback) {
    String head = "bracewalk: internal error (" + error.getClass().getName() + "): "
        + oneLine(error.getMessage());
    FileAppender appender = new FileAppender(folder, file());
    // one backend logger for the process, directed at this log's file while the error is logged
    synchronized (ErrorLog.class) {
      java.util.logging.Logger backend = java.util.logging.Logger.getLogger(LOGGER_NAME);
      backend.setUseParentHandlers(false);
      for (Handler h : backend.getHandlers()) {
        backend.removeHandler(h);
      }
      backend.addHandler(appender);
      try {
        LOGGER.log(Level.ERROR, context, error);
      } finally {
        backend.removeHandler(appender);
      }
    }
    if (appender.written) {
      return head + "; details in " + file();
    }
    fallback.print(appender.text);
    fallback.flush();
    return head + "; the details could not be written to " + file() + " (" + appender.failure
        + "), so they are printed above";
  }

  /** The message on one line; "(no message)" when there is none. */
  private static String oneLine(String message) {
    if (message == null || message.isBlank()) {
      return "(no message)";
    }
    return message.strip().replaceAll("\\s*\\R\\s*", " / ");
  }

  /**
   * Appends each record to the file as {@code ---- INSTANT CONTEXT} and the stack trace, UTF-8;
   * remembers whether that worked, and the text when it did not.
   */
  private static final class FileAppender extends Handler {
    private final Path folder;
    private final Path file;
    private boolean written;
    private String text = "";
    private String failure = "";

    FileAppender(Path folder, Path file) {
      this.folder = folder;
      this.file = file;
    }

    @Override
    public void publish(LogRecord r) {
      StringWriter trace = new StringWriter();
      try (PrintWriter w = new PrintWriter(trace)) {
        w.println("---- " + r.getInstant() + " " + r.getMessage());
        if (r.getThrown() != null) {
          r.getThrown().printStackTrace(w);
        }
      }
      text = trace.toString();
      try {
        Files.createDirectories(folder);
        Files.writeString(file, text, StandardCharsets.UTF_8,
            StandardOpenOption.CREATE, StandardOpenOption.APPEND, StandardOpenOption.WRITE);
        written = true;
      } catch (IOException | RuntimeException e) {
        failure = e.toString();
      }
    }

    @Override
    public void flush() {
      // each record is written and closed in publish
    }

    @Override
    public void close() {
      // nothing held open
    }
  }
}
