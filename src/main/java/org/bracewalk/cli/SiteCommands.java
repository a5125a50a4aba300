package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.SiteService;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code site}, {@code structure} and {@code plane}: create and list. */
final class SiteCommands {
  private SiteCommands() {}

  @Command(name = "create", mixinStandardHelpOptions = true, description = "Create a site.")
  static final class SiteCreate extends StoreCommand {
    @Option(names = "--name", required = true, description = "Short name of the site.")
    String name;

    @Option(names = "--client", description = "For whom inspections are carried out.")
    String client;

    @Option(names = "--client-address", description = "Their address.")
    String clientAddress;

    @Option(names = "--location", description = "Where the structures stand.")
    String location;

    @Option(names = "--time-zone", defaultValue = "UTC",
        description = "Time zone times are shown in, e.g. Europe/London (default ${DEFAULT-VALUE}).")
    String zone;

    @Option(names = "--units", defaultValue = "metric",
        description = "metric or imperial (default ${DEFAULT-VALUE}).")
    String units;

    @Option(names = "--jurisdiction", defaultValue = "other",
        description = "Whose rules the site stands under: uk, us, eu or other (default"
            + " ${DEFAULT-VALUE}). Reports cite that jurisdiction's regulations only and ask for"
            + " the particulars they require; fixed once the site is created.")
    String jurisdiction;

    SiteCreate(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      ZoneId z;
      try {
        z = ZoneId.of(zone);
      } catch (java.time.DateTimeException e) {
        throw new IllegalArgumentException("--time-zone: unknown zone '" + zone
            + "'; use a region such as Europe/London");
      }
      Jurisdiction j;
      try {
        j = Jurisdiction.fromLabel(jurisdiction);
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("--jurisdiction: " + e.getMessage());
      }
      Site site = s.sites().createSite(new Site(0, name, client, clientAddress, location, z,
          DisplayUnits.fromLabel(units), j));
      out.println("site " + site.id() + " created: " + site.name() + " (jurisdiction "
          + j.label() + ")");
      if (j == Jurisdiction.OTHER) {
        err.println("note: no jurisdiction given (--jurisdiction uk, us or eu): its reports cite"
            + " no regulation specifically and ask for every particular");
      }
      return 0;
    }
  }

  @Command(name = "list", mixinStandardHelpOptions = true, description = "List the sites.")
  static final class SiteList extends StoreCommand {
    SiteList(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      List<Site> sites = s.sites().sites();
      if (sites.isEmpty()) {
        out.println("no sites yet; create one with 'bracewalk site create' or load the demo");
      }
      for (Site site : sites) {
        out.println("site " + site.id() + ": " + site.name()
            + (site.clientName().isEmpty() ? "" : ", for " + site.clientName())
            + (site.location().isEmpty() ? "" : ", at " + site.location())
            + " (" + site.timeZone().getId() + ", " + site.units().label() + ", jurisdiction "
            + site.jurisdiction().label() + ")");
      }
      return 0;
    }
  }

  @Command(name = "create", mixinStandardHelpOptions = true,
      description = "Create a structure on a site.")
  static final class StructureCreate extends StoreCommand {
    @Option(names = "--site", required = true, description = "The site's id.")
    long site;

    @Option(names = "--name", required = true, description = "Short name of the structure.")
    String name;

    @Option(names = "--kind", required = true,
        description = "scaffold, racking-run or other-braced-frame.")
    String kind;

    @Option(names = "--description", description = "What it is.")
    String description;

    @Option(names = "--design-ref", description = "The drawing or scheme of its design.")
    String designRef;

    @Option(names = "--interval-days", defaultValue = "7",
        description = "Days between routine inspections (default ${DEFAULT-VALUE}); a note names"
            + " the rules of the site's jurisdiction where they ask for more often.")
    int interval;

    StructureCreate(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Structure st = s.sites().createStructure(new Structure(0, site, name,
          StructureKind.fromLabel(kind), description, designRef, interval));
      out.println("structure " + st.id() + " created: " + st.name() + " (" + st.kind().label() + ")");
      // what the rules of the site's jurisdiction say against the interval, as for 'interval'
      s.sites().intervalNote(st.id(), st.inspectionIntervalDays())
          .ifPresent(n -> err.println("note: " + n.text()));
      return 0;
    }
  }

  @Command(name = "interval", mixinStandardHelpOptions = true,
      description = "Set the days between routine inspections of a structure. Where the rules of"
          + " its site's jurisdiction ask for more frequent inspections, a note names them (or,"
          + " where Bracewalk holds none, the local codes) on standard error.")
  static final class StructureInterval extends StoreCommand {
    @Option(names = "--structure", required = true, description = "The structure's id.")
    long structure;

    @Option(names = "--days", required = true, description = "Days between routine inspections, 1 to 366.")
    int days;

    StructureInterval(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Structure st = s.sites().setInspectionInterval(structure, days);
      out.println("structure " + st.id() + " (" + st.name() + "): routine inspection every "
          + st.inspectionIntervalDays() + (st.inspectionIntervalDays() == 1 ? " day" : " days")
          + s.inspections().nextInspectionDue(st.id()).map(d -> "; next due " + d).orElse("; not inspected yet"));
      s.sites().intervalNote(st.id(), days).ifPresent(n -> err.println("note: " + n.text()));
      return 0;
    }
  }

  @Command(name = "list", mixinStandardHelpOptions = true,
      description = "List the structures of a site, with when the next routine inspection is due.")
  static final class StructureList extends StoreCommand {
    @Option(names = "--site", required = true, description = "The site's id.")
    long site;

    StructureList(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      for (Structure st : s.sites().structures(site)) {
        String due = s.inspections().nextInspectionDue(st.id())
            .map(LocalDate::toString).orElse("not inspected yet");
        out.println("structure " + st.id() + ": " + st.name() + " (" + st.kind().label() + "), "
            + s.sites().planes(st.id()).size() + " planes, next routine inspection due " + due);
      }
      return 0;
    }
  }

  @Command(name = "create", mixinStandardHelpOptions = true,
      description = {"Create a brace plane of a structure: from a design panel map (--design"
          + " MAP.txt: grid, dimensions and bracing from the map, as design revision 1), or"
          + " unbraced from --lifts and --bays (add its bracing later with 'bracewalk import"
          + " --plane ID --design MAP.txt')."})
  static final class PlaneCreate extends StoreCommand {
    @Option(names = "--structure", required = true, description = "The structure's id.")
    long structure;

    @Option(names = "--name", required = true, description = "Name, unique in the structure.")
    String name;

    @Option(names = "--design", paramLabel = "MAP.txt", description = "A design panel map.")
    Path design;

    @Option(names = "--lifts", description = "Without --design: lifts (rows), bottom = 1; at most "
        + PlaneLimits.MAX_LIFTS + ".")
    Long lifts;

    @Option(names = "--bays", description = "Without --design: bays (columns), left = 1; at most "
        + PlaneLimits.MAX_BAYS + ".")
    Long bays;

    @Option(names = "--widths", split = ",",
        description = "Bay widths in metres, comma-separated, bay 1 first (default 1 each).")
    List<Double> widths;

    @Option(names = "--heights", split = ",",
        description = "Lift heights in metres, comma-separated, lift 1 first (default 1 each).")
    List<Double> heights;

    @Option(names = "--support",
        description = "Without --design: pinned-base or free (default pinned-base).")
    String support;

    @Option(names = "--author", description = "Who drew the design.")
    String author;

    @Option(names = "--role", paramLabel = "ROLE",
        description = "What the plane is: upright-frame, spine, facade, transverse-frame, plan-bracing or"
            + " other (default other). An upright frame's keep-off zone takes in the beam bays on both"
            + " sides of it. Fixed once created.")
    String role;

    PlaneCreate(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      PlaneRole planeRole;
      try {
        planeRole = role == null ? PlaneRole.OTHER : PlaneRole.fromLabel(role);
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("--role: " + e.getMessage());
      }
      if (design != null) {
        if (lifts != null || bays != null || widths != null || heights != null || support != null) {
          throw new IllegalArgumentException("with --design the map gives the grid: leave out"
              + " --lifts, --bays, --widths, --heights and --support");
        }
        PlaneRecord p = s.files().createPlaneFromMap(structure, name, planeRole, design.toString(),
            readText(design, PanelMapParser.LIMITS), author, LocalDate.now(context.clock()), "");
        out.println(Show.plane(p) + " created from " + design);
        return 0;
      }
      if (lifts == null || bays == null) {
        throw new IllegalArgumentException("give --design MAP.txt, or --lifts and --bays");
      }
      if (lifts < 1 || bays < 1) {
        throw new IllegalArgumentException("--" + (lifts < 1 ? "lifts" : "bays")
            + ": a plane needs at least one lift and one bay, got " + lifts + " x " + bays);
      }
      // before anything of that size is built
      SiteService.requireWithinLimits(name, lifts, bays, "--lifts", "--bays");
      Support sup = Support.fromLabel(support == null ? "pinned-base" : support);
      if (sup == null) {
        throw new IllegalArgumentException("--support: use pinned-base or free, not '" + support + "'");
      }
      PlaneGrid grid = new PlaneGrid(lifts.intValue(), bays.intValue(), widths, heights, sup);
      PlaneRecord p = s.sites().createPlane(new PlaneRecord(0, structure, name, grid, planeRole), author,
          LocalDate.now(context.clock()), "", PlaneDesign.of(grid, Map.of()));
      out.println(Show.plane(p) + " created, unbraced");
      return 0;
    }
  }

  @Command(name = "list", mixinStandardHelpOptions = true,
      description = "List the planes of a structure with their latest design revision.")
  static final class PlaneList extends StoreCommand {
    @Option(names = "--structure", required = true, description = "The structure's id.")
    long structure;

    PlaneList(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      List<String> lines = new ArrayList<>();
      Map<Long, PlaneRetirement> retired = new HashMap<>();
      s.sites().retirements(structure).forEach(r -> retired.put(r.planeId(), r));
      for (PlaneRecord p : s.sites().planes(structure)) {
        var d = s.sites().currentDesign(p.id());
        PlaneRetirement r = retired.get(p.id());
        lines.add(Show.plane(p) + ", design revision " + d.number() + " of " + d.date()
            + ", " + d.design().braces().size() + " braced panels"
            + (r == null ? "" : "; retired " + r.retiredAt() + " (" + r.reason()
                + "): left out of inspections started since"));
      }
      lines.forEach(out::println);
      return 0;
    }
  }

  @Command(name = "retire", mixinStandardHelpOptions = true,
      description = {"Retire a plane, for instance one created by mistake. It is kept for the"
          + " record with its designs, observations and reports; inspections started from now on"
          + " leave it out, and inspections already started keep it as they did. A retirement"
          + " cannot be undone."})
  static final class PlaneRetire extends StoreCommand {
    @Option(names = "--plane", required = true, description = "The plane's id.")
    long plane;

    @Option(names = "--reason", required = true,
        description = "Why it is retired (kept with the record).")
    String reason;

    @Option(names = "--by", description = "Who retires it.")
    String by;

    PlaneRetire(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      PlaneRecord p = s.sites().plane(plane);
      PlaneRetirement r = s.sites().retirePlane(plane, by, reason);
      out.println(Show.plane(p) + " retired at " + r.retiredAt() + " (" + r.reason()
          + "); inspections started from now on leave it out");
      return 0;
    }
  }
}
