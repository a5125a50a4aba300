package org.bracewalk.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.ZoneId;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.CsvRecording;
import org.bracewalk.app.NewInspection;
import org.bracewalk.app.NewObservation;
import org.bracewalk.app.RecordedObservation;
import org.bracewalk.app.UserInputException;
import org.bracewalk.app.sitefile.ObservationCsv;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code inspection start|list|show}, {@code record}, {@code finalise}. */
final class InspectionCommands {
  private InspectionCommands() {}

  static ZoneId zoneOf(AppServices s, Inspection i) {
    Structure st = s.sites().structure(i.structureId());
    return s.sites().site(st.siteId()).timeZone();
  }

  static Map<Long, String> planeNames(AppServices s, long inspectionId) {
    Map<Long, String> names = new HashMap<>();
    for (PlaneRecord p : s.inspections().planesOf(inspectionId)) {
      names.put(p.id(), p.name());
    }
    return names;
  }

  /** A plane of the inspected structure by name, or by id when no plane has that name. */
  static PlaneRecord plane(AppServices s, Inspection i, String nameOrId) {
    List<PlaneRecord> planes = s.sites().planes(i.structureId());
    for (PlaneRecord p : planes) {
      if (p.name().equals(nameOrId.strip())) {
        return p;
      }
    }
    for (PlaneRecord p : planes) {
      if (String.valueOf(p.id()).equals(nameOrId.strip())) {
        return p;
      }
    }
    throw new UserInputException("--plane: no plane '" + nameOrId + "' in the structure "
        + i.label() + " covers; its planes are "
        + String.join(", ", planes.stream().map(PlaneRecord::name).toList()));
  }

  @Command(name = "start", mixinStandardHelpOptions = true,
      description = "Start an inspection of a structure now; prints its id.")
  static final class Start extends StoreCommand {
    @Option(names = "--structure", required = true, description = "The structure's id.")
    long structure;

    @Option(names = "--inspector", required = true, description = "Who inspects (name).")
    String inspector;

    @Option(names = "--position", description = "Their position.")
    String position;

    @Option(names = "--reason", defaultValue = "routine",
        description = "routine, after-impact, after-alteration, handover or after-severe-weather"
            + " (default ${DEFAULT-VALUE}).")
    String reason;

    @Option(names = "--competent-person", description = "US sites: the competent person.")
    String competentPerson;

    @Option(names = "--shift", description = "US sites: the shift.")
    String shift;

    @Option(names = "--storage-safety-person",
        description = "Racking: the person responsible for storage equipment safety.")
    String storageSafetyPerson;

    @Option(names = "--for-name", description = "For whom (default: the site's client).")
    String forName;

    @Option(names = "--for-address", description = "Their address (default: the client's).")
    String forAddress;

    Start(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Inspection i = s.inspections().start(structure, new NewInspection(inspector, position,
          competentPerson, shift, storageSafetyPerson, InspectionReason.fromLabel(reason),
          forName, forAddress));
      out.println("inspection " + i.id() + " started (" + i.reason().label() + ")");
      return 0;
    }
  }

  @Command(name = "list", mixinStandardHelpOptions = true,
      description = "List inspections (of one structure, or all).")
  static final class ListInspections extends StoreCommand {
    @Option(names = "--structure", description = "Only this structure's inspections.")
    Long structure;

    ListInspections(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      List<Inspection> all = structure == null
          ? s.inspections().allInspections() : s.inspections().inspections(structure);
      if (all.isEmpty()) {
        out.println("no inspections yet");
      }
      for (Inspection i : all) {
        Structure st = s.sites().structure(i.structureId());
        out.println(Show.inspection(i, zoneOf(s, i)) + " (structure " + st.id() + " '"
            + st.name() + "')");
      }
      return 0;
    }
  }

  @Command(name = "show", mixinStandardHelpOptions = true,
      description = "Show an inspection and every observation recorded in it.")
  static final class ShowInspection extends StoreCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    ShowInspection(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Inspection i = s.inspections().inspection(inspection);
      ZoneId zone = zoneOf(s, i);
      out.println(Show.inspection(i, zone));
      out.println("inspector: " + i.inspectorName()
          + (i.inspectorPosition().isEmpty() ? "" : ", " + i.inspectorPosition()));
      out.println("carried out for: " + i.carriedOutForName()
          + (i.carriedOutForAddress().isEmpty() ? "" : ", " + i.carriedOutForAddress()));
      if (!i.competentPerson().isEmpty() || !i.shift().isEmpty()) {
        out.println("competent person: " + i.competentPerson() + ", shift: " + i.shift());
      }
      if (!i.storageSafetyPerson().isEmpty()) {
        out.println("responsible for storage equipment safety: " + i.storageSafetyPerson());
      }
      Map<Long, String> names = planeNames(s, inspection);
      List<Observation> rows = s.inspections().observations(inspection);
      out.println(rows.size() + " observations:");
      for (Observation o : rows) {
        out.println("  " + o.id() + "  " + Show.time(o.recordedAt(), zone) + "  "
            + names.get(o.planeId()) + ", " + Show.where(o) + ": " + o.state().label()
            + (o.memberFound() == null ? "" : " (" + o.memberFound().token() + ")")
            + (o.bowMm() == null ? "" : ", bow " + o.bowMm() + " mm / " + o.gaugeLengthMm() + " mm")
            + (o.defect() == null ? "" : ", " + o.defect().label())
            + (o.note().isEmpty() ? "" : ", " + o.note())
            + (o.supersedes() == null ? "" : ", corrects " + o.supersedes() + ": "
                + o.correctionReason()));
      }
      return 0;
    }
  }

  /** One observation given by options. */
  static final class Single {
    @Option(names = "--plane", required = true, description = "Plane name (or id).")
    String plane;

    @Option(names = "--lift", required = true, description = "Lift, 1 = bottom.")
    int lift;

    @Option(names = "--bay", required = true, description = "Bay, 1 = left.")
    int bay;

    @Option(names = "--state", required = true,
        description = "sound, damaged-effective, damaged-ineffective, missing, extra,"
            + " not-inspected or not-reachable.")
    String state;

    @Option(names = "--member", description = "Member found: / \\ X ~/ ~\\ ~X (needed for extra).")
    String member;

    @Option(names = "--bow", description = "Measured bow, mm (to 0.1).")
    Double bow;

    @Option(names = "--gauge", description = "Gauge length the bow was measured over, mm.")
    Integer gauge;

    @Option(names = "--defect", description = "bent, torn, loose-connection, corroded or other.")
    String defect;

    @Option(names = "--note", description = "Free text.")
    String note;

    @Option(names = "--supersedes",
        description = "Id of the observation this corrects (one of the same inspection).")
    Long supersedes;

    @Option(names = "--reason", description = "Why the corrected observation was wrong.")
    String reason;

    @Option(names = "--photo", paramLabel = "FILE",
        description = "A photo to attach, JPEG or PNG, up to 20 MB; may be repeated. Kept in the"
            + " database, stored with the observation or not at all.")
    List<Path> photos;
  }

  /** Either a CSV file or one observation. */
  static final class Source {
    @Option(names = "--from", required = true, paramLabel = "FILE.csv",
        description = "Record every row of this observation CSV (columns in README.md).")
    Path from;

    @ArgGroup(exclusive = false)
    Single single;
  }

  @Command(name = "record", mixinStandardHelpOptions = true,
      description = {"Record observations of an open inspection, each committed to disk as it"
          + " is recorded, one line per acknowledged observation id.",
          "Either --from FILE.csv (the whole file is checked first; a bad file records nothing;"
              + " rows an earlier run of the same file recorded are not recorded again, so after"
              + " an interruption run the same command again) or one observation by options."})
  static final class Record extends StoreCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    @Option(names = "--by", description = "Who records (default: the inspector).")
    String by;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Source source;

    Record(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Inspection i = s.inspections().inspection(inspection);
      String who = by == null || by.isBlank() ? i.inspectorName() : by;
      Map<Long, String> names = planeNames(s, inspection);
      if (source.from != null) {
        String text = readText(source.from, ObservationCsv.LIMITS);
        CsvRecording done = s.files().recordFromCsv(inspection, source.from.toString(), text,
            who, o -> {
              out.println(Show.observation(o, names.get(o.planeId())));
              out.flush();
            });
        err.println("observations of " + source.from + ": " + done.summary() + " in "
            + i.label());
        return 0;
      }
      Single o = source.single;
      Brace member = null;
      if (o.member != null && !o.member.isBlank()) {
        member = braceOf(o.member);
      }
      PlaneRecord plane = plane(s, i, o.plane);
      NewObservation n = new NewObservation(plane.id(), PanelRef.of(o.lift, o.bay),
          PanelState.fromLabel(o.state), member, o.bow, o.gauge,
          o.defect == null ? null : DefectType.fromLabel(o.defect), o.note, who);
      List<Path> photos = o.photos == null ? List.of() : o.photos;
      for (Path photo : photos) {
        outputs = outputs.withInput(photo);
      }
      RecordedObservation saved = o.supersedes == null
          ? s.inspections().record(inspection, n, photos)
          : s.inspections().correct(inspection, o.supersedes, n, o.reason, photos);
      out.println(Show.observation(saved.observation(), plane.name()));
      for (Photo p : saved.photos()) {
        out.println("photo " + p.id() + " attached to observation " + saved.observation().id()
            + ": " + p.fileName() + " (" + p.size() + " bytes, " + p.mediaType() + ")");
      }
      return 0;
    }

    private static Brace braceOf(String token) {
      boolean tension = token.startsWith("~");
      var d = org.bracewalk.core.model.Diagonal.fromSymbol(tension ? token.substring(1) : token);
      if (d == null) {
        throw new IllegalArgumentException("--member: use / \\ X ~/ ~\\ or ~X, not '" + token + "'");
      }
      return tension ? Brace.tension(d) : Brace.rigid(d);
    }
  }

  @Command(name = "finalise", mixinStandardHelpOptions = true,
      description = "Finalise an inspection: from then on nothing about it can change.")
  static final class Finalise extends StoreCommand {
    @Option(names = "--inspection", required = true, description = "The inspection's id.")
    long inspection;

    Finalise(CliContext context) {
      super(context);
    }

    @Override
    int run(AppServices s, PrintWriter out, PrintWriter err) {
      Inspection i = s.inspections().finalise(inspection);
      out.println("inspection " + i.id() + " finalised at " + Show.time(i.finishedAt(), zoneOf(s, i)));
      return 0;
    }
  }
}
