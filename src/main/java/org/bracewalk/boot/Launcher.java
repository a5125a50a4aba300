package org.bracewalk.boot;

import java.io.PrintWriter;
import java.util.Map;
import org.bracewalk.cli.BracewalkCommand;
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
    CommandLine cli = new CommandLine(new BracewalkCommand());
    return cli;
  }
}
