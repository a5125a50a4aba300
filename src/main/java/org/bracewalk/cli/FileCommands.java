package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code import} and {@code export}: site files and observation CSVs. */
final class FileCommands {
  private FileCommands() {}

  /** Prints what an import or the demo stored. */
  static void summary(ImportedSite imported, PrintWriter out) {
    out.println("site " + imported.site().id() + ": " + imported.site().name()
        + (imported.site().clientName().isEmpty() ? "" : ", for " + imported.site().clientName()));
    imported.structures().forEach(st -> out.println("  structure " + st.id() + ": " + st.name()
        + " (" + st.kind().label() + ")"));
    out.println("  " + imported.planes().size() + " planes, " + imported.observations()
        + " observations");
    for (Inspection i : imported.inspections()) {
      out.println("  inspection " + i.id() + ": " + i.reason().label() + ", " + i.status().label()
          + ", structure " + i.structureId() + ", by " + i.inspectorName());
    }
  }

  static final class ImportWhat {
    @Option(names = "--site", paramLabel = "FILE.json", required = true,
        description = "A site file: stored as a new site, all or nothing.")
    Path site;

    @ArgGroup(exclusive = false)
    CsvImport csv;
  }

  static final class CsvImport {
    @Option(names = "--inspection", required = true, description = "An open inspection's id.")
    long inspection;

    @Option(names = "--csv", paramLabel = "FILE.csv", required = true,
        description = "Observations (columns in README.md), stored all or nothing.")
    Path csv;
  }

  @Command(name = "import", mixinStandardHelpOptions = true,
      description = {"Import a site file (--site FILE.json) as a new site, or an observation CSV"
          + " into an open inspection (--inspection ID --csv FILE.csv).",
          "The whole file is checked first and stored in one transaction: on any error nothing"
              + " is stored, and the error names the file, line and field."})
  static final class Import extends StoreCommand {
    @ArgGroup(exclusive = true, multiplicity = "1")
    ImportWhat what;

    Import(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      if (what.site != null) {
        ImportedSite imported = s.files().importSite(what.site.toString(), readText(what.site));
        out.println("imported " + what.site);
        summary(imported, out);
        return 0;
      }
      List<Observation> stored = s.files().importObservationsCsv(what.csv.inspection,
          what.csv.csv.toString(), readText(what.csv.csv));
      out.println("imported " + stored.size() + " observations into inspection "
          + what.csv.inspection);
      return 0;
    }
  }

  static final class ExportWhat {
    @Option(names = "--site", description = "Export this site as a site file.")
    Long site;

    @Option(names = "--inspection", description = "Export this inspection's observations as CSV.")
    Long inspection;
  }

  @Command(name = "export", mixinStandardHelpOptions = true,
      description = {"Export a site (--site ID) as a site file, or an inspection's observations"
          + " (--inspection ID) as CSV, to --to FILE or to standard output."})
  static final class Export extends StoreCommand {
    @ArgGroup(exclusive = true, multiplicity = "1")
    ExportWhat what;

    @Option(names = "--to", paramLabel = "FILE", description = "Write here (default: standard output).")
    Path to;

    Export(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      String text = what.site != null
          ? s.files().exportSite(what.site)
          : s.files().exportObservationsCsv(what.inspection);
      if (to == null) {
        out.print(text);
      } else {
        writeText(to, text);
        err.println("written " + to);
      }
      return 0;
    }
  }

  @Command(name = "demo", mixinStandardHelpOptions = true,
      description = {"Load the invented demo site (Larkspur Depot: a facade scaffold and a racking"
          + " run with two finalised inspections) into a new database, and print what it loaded.",
          "Then try: bracewalk analyse --db FILE --inspection 2"})
  static final class Demo extends StoreCommand {
    Demo(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      ImportedSite imported = s.demo().load();
      out.println("demo loaded");
      summary(imported, out);
      return 0;
    }
  }
}
