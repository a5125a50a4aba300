package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.stream.Stream;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.CsvRecording;
import org.bracewalk.app.ImportedSite;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.app.sitefile.ObservationCsv;
import org.bracewalk.app.sitefile.SiteFileReader;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PlaneRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code import}, {@code export} (site files, observation CSVs, panel maps) and {@code demo}. */
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

  @Command(name = "import", mixinStandardHelpOptions = true,
      description = {"Import a site file, an observation CSV or a panel map:",
          "  --site FILE.json                      a site file, stored as a new site",
          "  --inspection ID --csv FILE.csv        observations into an open inspection",
          "  --plane ID --design MAP.txt           a panel map as the plane's next design revision",
          "  --inspection ID --plane P --map MAP.txt  a panel map as one plane's findings",
          "The whole file is checked first and stored in one transaction: on any error nothing"
              + " is stored, and the error names the file, line and field."})
  static final class Import extends StoreCommand {
    @Option(names = "--site", paramLabel = "FILE.json", description = "A site file.")
    Path site;

    @Option(names = "--csv", paramLabel = "FILE.csv",
        description = "An observation CSV (columns in README.md); needs --inspection.")
    Path csv;

    @Option(names = "--design", paramLabel = "MAP.txt",
        description = "A design panel map; needs --plane (its id).")
    Path design;

    @Option(names = "--map", paramLabel = "MAP.txt",
        description = "An as-built panel map; needs --inspection and --plane. '?' panels get no"
            + " observation (they stay not inspected).")
    Path map;

    @Option(names = "--inspection", description = "The open inspection the file belongs to.")
    Long inspection;

    @Option(names = "--plane", description = "The plane (id; with --inspection also its name).")
    String plane;

    @Option(names = "--author", description = "With --design: who drew it.")
    String author;

    @Option(names = "--date", description = "With --design: its date, YYYY-MM-DD (default today).")
    LocalDate date;

    @Option(names = "--note", description = "With --design: the approval note.")
    String note;

    Import(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      long given = Stream.of(site, csv, design, map).filter(Objects::nonNull).count();
      if (given != 1) {
        throw new IllegalArgumentException(
            "give exactly one of --site, --csv, --design or --map (see 'bracewalk import --help')");
      }
      if (site != null) {
        ImportedSite imported = s.files().importSite(site.toString(), readText(site, SiteFileReader.LIMITS));
        out.println("imported " + site);
        summary(imported, out);
        return 0;
      }
      if (csv != null) {
        long id = need(inspection, "--inspection", "--csv");
        CsvRecording stored = s.files().importObservationsCsv(id, csv.toString(), readText(csv, ObservationCsv.LIMITS));
        out.println("imported " + stored.recorded().size() + " observations into inspection " + id
            + (stored.alreadyRecorded() == 0 ? ""
                : " (" + stored.alreadyRecorded() + " rows already recorded by an earlier run)"));
        return 0;
      }
      if (design != null) {
        long planeId = planeId(need(plane, "--plane", "--design"));
        DesignRevision d = s.files().importDesignMap(planeId, design.toString(), readText(design, PanelMapParser.LIMITS),
            author, date == null ? LocalDate.now(context.clock()) : date, note);
        out.println("design revision " + d.number() + " of plane " + planeId + " stored ("
            + d.design().braces().size() + " braced panels, " + d.design().openings().size()
            + " openings)");
        return 0;
      }
      long id = need(inspection, "--inspection", "--map");
      Inspection i = s.inspections().inspection(id);
      PlaneRecord p = InspectionCommands.plane(s, i, need(plane, "--plane", "--map"));
      List<Observation> stored = s.files().importAsBuiltMap(id, p.id(), map.toString(),
          readText(map, PanelMapParser.LIMITS), null);
      for (Observation o : stored) {
        out.println(Show.observation(o, p.name()));
      }
      int unknown = p.grid().panelCount() - stored.size();
      out.println("imported " + stored.size() + " observations of plane '" + p.name()
          + "' into inspection " + id + " (" + unknown
          + (unknown == 1 ? " panel marked ? stays" : " panels marked ? stay") + " not inspected)");
      return 0;
    }
  }

  static <T> T need(T value, String option, String with) {
    if (value == null) {
      throw new IllegalArgumentException(with + " needs " + option);
    }
    return value;
  }

  static long planeId(String text) {
    try {
      return Long.parseLong(text.strip());
    } catch (NumberFormatException e) {
      throw new IllegalArgumentException("--plane: give the plane's id (see 'bracewalk plane"
          + " list'), not '" + text + "'");
    }
  }

  @Command(name = "export", mixinStandardHelpOptions = true,
      description = {"Export a site file, an observation CSV or a panel map, to --to FILE or to"
          + " standard output:",
          "  --site ID                     the site as a site file (JSON)",
          "  --inspection ID               the inspection's observations as CSV",
          "  --plane ID                    the plane's latest design as a panel map",
          "  --inspection ID --plane P     the plane as found in the inspection, as a panel map"})
  static final class Export extends StoreCommand {
    @Option(names = "--site", description = "A site's id.")
    Long site;

    @Option(names = "--inspection", description = "An inspection's id.")
    Long inspection;

    @Option(names = "--plane", description = "A plane (id; with --inspection also its name).")
    String plane;

    @Option(names = "--to", paramLabel = "FILE", description = "Write here (default: standard"
        + " output). Never the database, its -wal/-shm, a link or a database file: refused, exit 2.")
    Path to;

    Export(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      String text;
      if (site != null) {
        if (inspection != null || plane != null) {
          throw new IllegalArgumentException("--site goes alone");
        }
        text = s.files().exportSite(site);
      } else if (inspection != null && plane != null) {
        Inspection i = s.inspections().inspection(inspection);
        text = s.files().exportAsBuiltMap(inspection, InspectionCommands.plane(s, i, plane).id());
      } else if (inspection != null) {
        text = s.files().exportObservationsCsv(inspection);
      } else if (plane != null) {
        text = s.files().exportDesignMap(planeId(plane));
      } else {
        throw new IllegalArgumentException(
            "say what to export: --site, --inspection or --plane (see 'bracewalk export --help')");
      }
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
    @Option(names = "--replace",
        description = "If the database file exists and is a Bracewalk database, delete it first"
            + " (with its -wal and -shm files) so the demo gets its documented ids. Any other"
            + " file is refused (exit 2) and left as it was.")
    boolean replace;

    Demo(CliContext context) {
      super(context);
    }

    @Override
    void beforeOpen(Path file, PrintWriter err) {
      if (replace && context.services().deleteDatabase(file)) {
        err.println("replaced: the old " + file + " was deleted");
      }
    }

    @Override
    void beforeOpenServer(String address) {
      if (replace) {
        throw new org.bracewalk.app.UserInputException("--replace deletes a database file; " + address + " is a"
            + " server's database, which Bracewalk never deletes (its administrator drops and"
            + " creates it: README, \"A team server: PostgreSQL\")");
      }
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
