package org.bracewalk.bench;

import java.io.PrintWriter;
import java.util.Objects;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code bracewalk bench [--quick] [--format text|json]}: times the engine on seeded random planes
 * and compares it with the rigidity-matrix rank. Progress goes to stderr, the figures to stdout.
 */
@Command(
    name = "bench",
    mixinStandardHelpOptions = true,
    description = {
      "Times the engine on seeded random planes of 10 x 10 to 1000 x 1000 panels and compares it"
          + " with the general-purpose method (the rank of the rigidity matrix) on small ones.",
      "Takes a few minutes; --quick takes under a minute."
    })
public final class BenchCommand implements Callable<Integer> {
  @Spec CommandSpec spec;

  @Option(names = "--quick", description = "fewer samples and no 30 x 30 baseline: under a minute")
  boolean quick;

  @Option(names = "--format", paramLabel = "text|json", defaultValue = "text", description = "text (the default) or json")
  String format;

  private final BenchService service;
  private final BenchFormat output;
  private final BenchPlan quickPlan;
  private final BenchPlan fullPlan;

  /** The plans are passed in so that tests can run tiny ones. */
  public BenchCommand(BenchService service, BenchFormat output, BenchPlan quickPlan, BenchPlan fullPlan) {
    this.service = Objects.requireNonNull(service, "service");
    this.output = Objects.requireNonNull(output, "output");
    this.quickPlan = Objects.requireNonNull(quickPlan, "quickPlan");
    this.fullPlan = Objects.requireNonNull(fullPlan, "fullPlan");
  }

  @Override
  public Integer call() {
    if (!format.equals("text") && !format.equals("json")) {
      throw new ParameterException(spec.commandLine(), "--format must be text or json, got '" + format + "'");
    }
    PrintWriter out = spec.commandLine().getOut();
    PrintWriter err = spec.commandLine().getErr();
    BenchReport report =
        service.run(
            quick ? quickPlan : fullPlan,
            step -> {
              err.println("bench: " + step);
              err.flush();
            });
    out.print(format.equals("json") ? output.jsonText(report) : output.text(report));
    out.flush();
    return 0;
  }
}
