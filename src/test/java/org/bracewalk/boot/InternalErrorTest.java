package org.bracewalk.boot;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.bracewalk.app.Fixtures;
import org.bracewalk.app.UserInputException;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * An internal error (not the input's fault) exits 3 with one line on standard error naming the
 * error and the log file; the stack trace goes to the log. Errors too (memory exhausted, stack
 * overflow), which picocli does not hand to its exception handler: before, they left the JVM
 * with a stack trace and exit 1, which for {@code check} means "does not hold its shape".
 */
class InternalErrorTest {
  @TempDir Path dir;

  /** A command whose work throws what it is given. */
  @Command(name = "fail")
  static final class Failing implements Callable<Integer> {
    private final Throwable thrown;

    Failing(Throwable thrown) {
      this.thrown = thrown;
    }

    @Override
    public Integer call() throws Exception {
      if (thrown instanceof Error e) {
        throw e;
      }
      throw (Exception) thrown;
    }
  }

  record Run(int code, String out, String err) {}

  private Run execute(Throwable thrown, ErrorLog log) {
    CommandLine cli = new CommandLine(new Failing(thrown));
    StringWriter out = new StringWriter();
    StringWriter err = new StringWriter();
    cli.setOut(new PrintWriter(out));
    cli.setErr(new PrintWriter(err));
    Launcher.handleErrors(cli, log);
    int code = Launcher.execute(cli, new String[0], new PrintWriter(err), log);
    return new Run(code, out.toString(), err.toString());
  }

  @Test
  void outOfMemoryExitsThreeWithOneLineAndTheStackTraceInTheLog() throws Exception {
    ErrorLog log = new ErrorLog(dir.resolve("logs"));
    Run r = execute(new OutOfMemoryError("Java heap space"), log);
    assertThat(r.code()).isEqualTo(3);
    assertThat(r.err().lines()).containsExactly("bracewalk: internal error"
        + " (java.lang.OutOfMemoryError): Java heap space; details in " + log.file());
    String logged = Files.readString(log.file());
    assertThat(logged).contains("java.lang.OutOfMemoryError: Java heap space")
        .contains("at org.bracewalk.boot.InternalErrorTest.");
  }

  @Test
  void theDetailIsLoggedOnceThroughTheSystemLoggerAndNotToTheConsole() throws Exception {
    ErrorLog log = new ErrorLog(dir.resolve("logs"));
    java.util.logging.Logger backend = java.util.logging.Logger.getLogger(ErrorLog.LOGGER_NAME);
    java.util.List<java.util.logging.LogRecord> seen = new java.util.ArrayList<>();
    backend.setFilter(r -> seen.add(r));
    try {
      IllegalStateException bug = new IllegalStateException("a bug");
      Run r = execute(bug, log);
      assertThat(r.code()).isEqualTo(3);
      // System.Logger's ERROR is java.util.logging's SEVERE (java.lang.System.Logger javadoc)
      assertThat(seen).singleElement().satisfies(rec -> {
        assertThat(rec.getLevel()).isEqualTo(java.util.logging.Level.SEVERE);
        assertThat(rec.getThrown()).isSameAs(bug);
        assertThat(rec.getMessage()).isEqualTo("bracewalk ");
      });
      assertThat(backend.getUseParentHandlers()).as("the console handler of the root logger").isFalse();
      String logged = Files.readString(log.file());
      assertThat(logged.split("java.lang.IllegalStateException: a bug", -1)).hasSize(2);
      assertThat(r.err()).doesNotContain("\tat ");
    } finally {
      backend.setFilter(null);
    }
  }

  @Test
  void aStackOverflowAndARuntimeExceptionAreInternalErrorsToo() throws Exception {
    ErrorLog log = new ErrorLog(dir.resolve("logs"));
    Run overflow = execute(new StackOverflowError(), log);
    Run bug = execute(new IllegalStateException("a bug\nover two lines"), log);
    assertThat(overflow.code()).isEqualTo(3);
    assertThat(overflow.err().lines()).containsExactly("bracewalk: internal error"
        + " (java.lang.StackOverflowError): (no message); details in " + log.file());
    assertThat(bug.code()).isEqualTo(3);
    assertThat(bug.err().lines()).containsExactly("bracewalk: internal error"
        + " (java.lang.IllegalStateException): a bug / over two lines; details in " + log.file());
    // appended, both kept
    assertThat(Files.readString(log.file())).contains("java.lang.StackOverflowError")
        .contains("java.lang.IllegalStateException: a bug");
  }

  @Test
  void aUserErrorThatEscapedItsCommandIsBadInputNotAnInternalError() {
    ErrorLog log = new ErrorLog(dir.resolve("logs"));
    Run r = execute(new UserInputException("plan.txt: no such file"), log);
    assertThat(r.code()).isEqualTo(2);
    assertThat(r.err().lines()).containsExactly("error: plan.txt: no such file");
    assertThat(log.file()).doesNotExist();
  }

  @Test
  void whenTheLogCannotBeWrittenTheDetailsGoToStandardErrorInstead() throws Exception {
    Path notAFolder = dir.resolve("file");
    Files.writeString(notAFolder, "x");
    ErrorLog log = new ErrorLog(notAFolder);
    Run r = execute(new OutOfMemoryError("Java heap space"), log);
    assertThat(r.code()).isEqualTo(3);
    assertThat(r.err()).contains("at org.bracewalk.boot.InternalErrorTest.")
        .contains("bracewalk: internal error (java.lang.OutOfMemoryError): Java heap space; the"
            + " details could not be written to " + log.file());
  }

  @Test
  void theLogFolderIsBracewalkLogDirElseLogsInTheDataFolder() {
    AppContext context = new AppContext(new Fixtures.SteppingClock(), PlaneAnalyzer.standard());
    assertThat(context.cliContext(Map.of("BRACEWALK_LOG_DIR", dir.toString())).logFolder())
        .isEqualTo(dir.toAbsolutePath());
    Path data = dir.resolve("data");
    assertThat(context.cliContext(Map.of("XDG_DATA_HOME", data.toString())).logFolder())
        .isEqualTo(System.getProperty("os.name").toLowerCase().startsWith("linux")
            ? data.resolve("bracewalk").resolve("logs") : context.cliContext(Map.of()).logFolder());
  }

  @Test
  void aRealOutOfMemoryInTheProgramExitsThreeWithOneLine() throws Exception {
    // a panel map within the 64 MiB file limit, in a JVM with too little memory to parse it
    Path map = dir.resolve("large.txt");
    String row = "/ ".repeat(5000).strip() + "\n";
    try (var w = Files.newBufferedWriter(map)) {
      for (int i = 0; i < 3000; i++) {
        w.write(row);
      }
    }
    Path logs = dir.resolve("child-logs");
    String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
    Path javaBin = Path.of(System.getProperty("java.home"), "bin", "java");
    ProcessBuilder pb = new ProcessBuilder(javaBin.toString(), "-Xmx64m", "-cp", classpath,
        Main.class.getName(), "check", map.toString(), "--format", "json")
        .redirectOutput(dir.resolve("out.txt").toFile())
        .redirectError(dir.resolve("err.txt").toFile());
    pb.environment().put("BRACEWALK_LOG_DIR", logs.toString());
    Process child = pb.start();
    assertThat(child.waitFor(120, java.util.concurrent.TimeUnit.SECONDS)).isTrue();
    String err = Files.readString(dir.resolve("err.txt"));
    assertThat(child.exitValue()).as(err).isEqualTo(3);
    assertThat(err.lines()).containsExactly("bracewalk: internal error"
        + " (java.lang.OutOfMemoryError): Java heap space; details in "
        + logs.resolve(ErrorLog.FILE_NAME));
    assertThat(Files.readString(dir.resolve("out.txt"))).isEmpty();
    assertThat(Files.readString(logs.resolve(ErrorLog.FILE_NAME)))
        .contains("bracewalk check " + map).contains("java.lang.OutOfMemoryError");
  }

  @Test
  void theDesktopAppLogsAnUncaughtErrorAndSaysSoInOneLine() throws Exception {
    Thread.UncaughtExceptionHandler before = Thread.getDefaultUncaughtExceptionHandler();
    ErrorLog log = new ErrorLog(dir.resolve("logs"));
    StringWriter err = new StringWriter();
    try {
      GuiLauncher.logInternalErrors(log, new PrintWriter(err));
      Thread t = new Thread(() -> {
        throw new IllegalStateException("a screen failed");
      }, "bracewalk-test-thread");
      t.start();
      t.join();
    } finally {
      Thread.setDefaultUncaughtExceptionHandler(before);
    }
    assertThat(err.toString().lines()).containsExactly("bracewalk: internal error"
        + " (java.lang.IllegalStateException): a screen failed; details in " + log.file());
    assertThat(Files.readString(log.file())).contains("desktop app, thread bracewalk-test-thread")
        .contains("at org.bracewalk.boot.InternalErrorTest.");
  }
}
