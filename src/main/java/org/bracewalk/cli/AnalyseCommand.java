package org.bracewalk.cli;

import java.io.PrintWriter;
import org.bracewalk.app.AnalysisOutput;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.InspectionAnalysis;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code analyse --inspection ID}: every plane of the inspection, as built against its design. */
@Command(name = "analyse", aliases = "analyze", mixinStandardHelpOptions = true,
    description = {"Analyse every plane of an inspection: the latest observation of each panel"
        + " against the design in force, in the check contract's terms (a panel with no"
        + " observation counts as not inspected, and as missing for the verdict).",
        "Exit status: 0 when every plane holds its shape as built, 1 when any does not, 2 on"
            + " bad input."})
final class AnalyseCommand extends StoreCommand {
  @Option(names = "--inspection", required = true, description = "The inspection's id.")
  long inspection;

  @Option(names = "--format", defaultValue = "text",
      description = "text (default) or json: {\"inspection\": ID, \"planes\": [{\"plane\": NAME,"
          + " \"design\": ..., \"asBuilt\": ..., \"repair\": ...}], ...}.")
  String format;

  private final AnalysisOutput output;

  AnalyseCommand(CliContext context, AnalysisOutput output) {
    super(context);
    this.output = output;
  }

  @Override
  int run(AppServices s, PrintWriter out, PrintWriter err) {
    if (!format.equals("text") && !format.equals("json")) {
      throw new IllegalArgumentException("--format: use text or json, not '" + format + "'");
    }
    InspectionAnalysis a = s.analysis().analyse(inspection);
    out.print(format.equals("json") ? output.json(a) : output.text(a));
    return a.allRigid() ? 0 : 1;
  }
}
