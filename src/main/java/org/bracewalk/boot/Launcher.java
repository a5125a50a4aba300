package org.bracewalk.boot;

import java.io.PrintWriter;
import java.lang.management.ManagementFactory;
import java.util.Map;
import org.bracewalk.app.AnalysisOutput;
import org.bracewalk.app.bench.BenchFormat;
import org.bracewalk.app.bench.BenchPlan;
import org.bracewalk.app.bench.BenchService;
import org.bracewalk.app.check.CheckService;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.app.verdict.VerdictJson;
import org.bracewalk.app.verdict.VerdictText;
import org.bracewalk.cli.BenchCommand;
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
    cli.addSubcommand("snapshot", new SnapshotCommand(context, env));
    // Set after the sub-commands are added: picocli copies these settings down the hierarchy.
    cli.setExitCodeExceptionMapper(e -> e instanceof ParameterException ? BAD_INPUT : INTERNAL_ERROR);
    cli.setExecutionExceptionHandler(
        (e, command, parseResult) -> {
          PrintWriter err = command.getErr();
          err.println("bracewalk: internal error (not a problem with your input): " + e);
          e.printStackTrace(err);
          err.flush();
          return INTERNAL_ERROR;
        });
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
