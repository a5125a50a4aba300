package org.bracewalk.boot;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.util.Map;
import org.bracewalk.app.AnalysisOutput;
import org.bracewalk.app.Refusals;
import org.bracewalk.app.check.CheckService;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.app.verdict.VerdictJson;
import org.bracewalk.app.verdict.VerdictText;
import org.bracewalk.bench.BenchCommand;
import org.bracewalk.bench.BenchFormat;
import org.bracewalk.bench.BenchPlan;
import org.bracewalk.bench.BenchReportCommand;
import org.bracewalk.bench.BenchService;
import org.bracewalk.bench.BenchStoreCommand;
import org.bracewalk.bench.BenchSyncCommand;
import org.bracewalk.bench.SnapshotCommand;
import org.bracewalk.cli.BracewalkCommand;
import org.bracewalk.cli.CheckCommand;
import org.bracewalk.cli.ReportCommands;
import org.bracewalk.cli.StoreCommands;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;

/** Builds the command line with its services and runs it on the given streams. */
public final class Launcher {
  /** Exit status on bad input, picocli's own usage errors included (the contract's 2). */
  static final int BAD_INPUT = 2;

  /** Exit status when something fails that is not the input's fault. */
  static final int INTERNAL_ERROR = 3;

  private Launcher() {}

  /** Runs one command; returns the exit code. Only {@link Main} touches the process streams. */
  public static int run(String[] args, PrintWriter out, PrintWriter err, Map<String, String> env) {
    return run(args, out, err, env, AppContext.standard());
  }

  static CommandLine commandLine(Map<String, String> env) {
    return commandLine(env, AppContext.standard());
  }

  /** The command line over a given context (tests pass their own clock). */
  static CommandLine commandLine(Map<String, String> env, AppContext context) {
    CommandLine cli = new CommandLine(new BracewalkCommand());
    PlaneAnalyzer analyzer = context.analyzer();
    cli.addSubcommand(
        "check",
        new CheckCommand(new CheckService(analyzer, new PanelMapParser()), new VerdictJson(), new VerdictText()));
    cli.addSubcommand(
        "bench",
        new BenchCommand(
            new BenchService(
                analyzer,
                System::nanoTime,
                ManagementFactory.getMemoryMXBean(),
                ManagementFactory.getMemoryPoolMXBeans(),
                Runtime.getRuntime().availableProcessors(),
                System.getProperty("java.version")),
            new BenchFormat(),
            BenchPlan.quick(),
            BenchPlan.standard()));
    StoreCommands.addTo(cli, context.cliContext(env),
        new AnalysisOutput(new VerdictJson(), new VerdictText()));
    ReportCommands.addTo(cli, context.cliContext(env), context.reportFactory(env));
    // benchmark and picture scaffolding (package bench): registered here, used by nothing else
    cli.addSubcommand("bench-store", new BenchStoreCommand(context.cliContext(env)));
    cli.addSubcommand("bench-sync", new BenchSyncCommand(context.cliContext(env)));
    cli.addSubcommand("bench-report",
        new BenchReportCommand(context.cliContext(env), context.reportFactory(env)));
    cli.addSubcommand("snapshot", new SnapshotCommand(context::open, context.analyzer(),
        context.clock(), services -> ReportIssuers.over(context, services, env)));
    // Set after the sub-commands are added: picocli copies these settings down the hierarchy.
    handleErrors(cli, new ErrorLog(context.cliContext(env).logFolder()));
    return cli;
  }

  /**
   * What a command's failure exits with: a located user error that escaped its command (a bad
   * file) prints {@code error: ...} and exits 2; anything else is an internal error: exit 3, one
   * line on standard error, the stack trace in the error log.
   */
  static void handleErrors(CommandLine cli, ErrorLog log) {
    cli.setExitCodeExceptionMapper(e -> e instanceof ParameterException ? BAD_INPUT : INTERNAL_ERROR);
    cli.setExecutionExceptionHandler(
        (e, command, parseResult) -> failed(e, command.getErr(), log, "bracewalk "
            + String.join(" ", parseResult.originalArgs())));
  }

  /** Exits 2 for an input error that escaped its command, else records an internal error: 3. */
  private static int failed(Throwable e, PrintWriter err, ErrorLog log, String context) {
    if (isUserError(e)) {
      err.println("error: " + e.getMessage());
      err.flush();
      return BAD_INPUT;
    }
    err.println(log.record(e, context, err));
    err.flush();
    return INTERNAL_ERROR;
  }

  /** The located errors about the user's input, which commands normally catch themselves. */
  private static boolean isUserError(Throwable e) {
    return Refusals.isInputError(e);
  }

  /** Runs one command over a given context; returns the exit code. */
  static int run(
      String[] args, PrintWriter out, PrintWriter err, Map<String, String> env, AppContext context) {
    ErrorLog log = new ErrorLog(context.cliContext(env).logFolder());
    try {
      CommandLine cli = commandLine(env, context);
      cli.setOut(out);
      cli.setErr(err);
      return execute(cli, args, err, log);
    } catch (Throwable e) { // building the command line failed: still one line and exit 3
      out.flush();
      return failed(e, err, log, "bracewalk " + String.join(" ", args));
    }
  }

  /**
   * Executes a command line whose errors {@link #handleErrors} set. picocli hands only {@link
   * Exception}s to the handler; an {@link Error} (memory exhausted, stack overflow) leaves {@code
   * execute}, and is caught here: it too is an internal error, exit 3 and one line, never a Java
   * stack trace on the console and the JVM's exit 1 (which {@code check} uses for "does not hold
   * its shape").
   */
  static int execute(CommandLine cli, String[] args, PrintWriter err, ErrorLog log) {
    try {
      return cli.execute(args);
    } catch (Throwable e) {
      cli.getOut().flush();
      return failed(e, err, log, "bracewalk " + String.join(" ", args));
    }
  }
}
