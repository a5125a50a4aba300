package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.OutputFiles;
import org.bracewalk.app.Refusals;
import org.bracewalk.app.UserInputException;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * A command that works on the database: resolves the file ({@code --db}, {@code BRACEWALK_DB},
 * or the per-user default), prints it to standard error as the first line ({@code database:
 * PATH}), opens the services, runs, closes. The folder must exist unless it is the per-user
 * default (made then); a file that is not a Bracewalk database is refused unchanged (exit 2).
 * Output files go through {@link #outputs}: never over the database or a file the command read. A user error (a {@code UserInputException}, a
 * located {@code FileFormatException}, a {@code StoreException} or a value the model refuses)
 * prints {@code error: ...} to standard error and exits with status 2; nothing has been changed
 * then.
 */
abstract class StoreCommand implements Callable<Integer> {
  /** Exit status for bad input, as the {@code check} command uses. */
  static final int BAD_INPUT = 2;

  @Spec CommandSpec spec;

  @Option(
      names = "--db",
      paramLabel = "FILE|postgresql://HOST[:PORT]/DB",
      description =
          "The database file (created when new), or a team server's database (login: PGUSER,"
              + " ~/.pgpass or PGPASSWORD). Default: $BRACEWALK_DB, else bracewalk.db in the"
              + " per-user data folder.")
  String db;

  final CliContext context;

  /**
   * Writes the command's output files: never over the database or a file the command has read
   * ({@link #readText} adds each). Set once the database is open.
   */
  OutputFiles outputs = OutputFiles.none();

  StoreCommand(CliContext context) {
    this.context = context;
  }

  @Override
  public final Integer call() {
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    String where = context.location(db);
    boolean server = CliContext.isServer(where);
    Path file = server ? null : Path.of(where);
    err.println("database: " + CliContext.shown(where));
    err.flush();
    try {
      if (server) {
        beforeOpenServer(where);
      } else {
        context.prepareFolder(file);
        beforeOpen(file, err);
      }
    } catch (RuntimeException e) {
      if (!Refusals.isRefusal(e)) {
        throw e;
      }
      err.println("error: " + e.getMessage());
      return BAD_INPUT;
    }
    try (AppServices services = server ? context.services().openServer(where)
        : context.services().open(file)) {
      outputs = services.outputs();
      return run(services, out, err);
    } catch (RuntimeException e) {
      if (!Refusals.isRefusal(e)) {
        throw e; // the launcher's: exit 3, one line, the detail in the log
      }
      out.flush();
      err.println("error: " + e.getMessage());
      return BAD_INPUT;
    } finally {
      out.flush();
      err.flush();
    }
  }

  /** Runs before the database file is opened; nothing by default. */
  void beforeOpen(Path file, PrintWriter err) {}

  /** Runs before a team server's database is opened; nothing by default. */
  void beforeOpenServer(String address) {}

  /** The command's work; returns the exit status. */
  abstract int run(AppServices services, PrintWriter out, PrintWriter err);

  /**
   * A text file's content: bounded by the format's limits before it is read, strict UTF-8 (a
   * leading byte-order mark dropped), or a user error naming the file (and the line and column of
   * a byte that is not UTF-8). The format's reader checks line ends and separators. The file is
   * guarded from the command's outputs from then on.
   */
  String readText(Path file, TextInput.Limits limits) {
    outputs = outputs.withInput(file);
    try {
      String text = TextInput.decode(file.toString(), TextInput.readBytes(file, file.toString(), limits));
      return text.startsWith("\uFEFF") ? text.substring(1) : text;
    } catch (TextInputException e) {
      throw new UserInputException(e.getMessage(), e);
    }
  }

  /**
   * Writes text to a file (UTF-8) through {@link #outputs}: a refusal or a failure is a user error
   * naming the file, and the old file is then as it was.
   */
  void writeText(Path file, String text) {
    outputs.writeText(file, text);
  }
}
