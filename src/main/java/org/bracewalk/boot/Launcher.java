package org.bracewalk.boot;

import java.io.PrintWriter;
import java.util.Map;
import org.bracewalk.cli.BracewalkCommand;
import org.bracewalk.cli.ReportCommands;
import org.bracewalk.cli.StoreCommands;
import picocli.CommandLine;

/** Builds the command line with its services and runs it on the given streams. */
public final class Launcher {
  private Launcher() {}

  /** Runs one command; returns the exit code. Only {@link Main} touches the process streams. */
  public static int run(String[] args, PrintWriter out, PrintWriter err, Map<String, String> env) {
    CommandLine cli = commandLine(env);
    cli.setOut(out);
    cli.setErr(err);
    return cli.execute(args);
  }

  static CommandLine commandLine(Map<String, String> env) {
    return commandLine(env, AppContext.standard());
  }

  /** The command line over a given context (tests pass their own clock). */
  static CommandLine commandLine(Map<String, String> env, AppContext context) {
    CommandLine cli = new CommandLine(new BracewalkCommand());
    StoreCommands.addTo(cli, context.cliContext(env));
    ReportCommands.addTo(cli, context.cliContext(env), context.reportFactory(env));
    return cli;
  }

  /** Runs one command over a given context; returns the exit code. */
  static int run(
      String[] args, PrintWriter out, PrintWriter err, Map<String, String> env, AppContext context) {
    CommandLine cli = commandLine(env, context);
    cli.setOut(out);
    cli.setErr(err);
    return cli.execute(args);
  }
}
