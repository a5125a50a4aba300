package org.bracewalk.app.sitefile;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.StreamReadConstraints;
import org.bracewalk.app.text.TextInput;
import org.bracewalk.app.text.TextInputException;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.time.DateTimeException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import org.bracewalk.app.sitefile.SiteFile.DesignData;
import org.bracewalk.app.sitefile.SiteFile.InspectionData;
import org.bracewalk.app.sitefile.SiteFile.IssuedReportData;
import org.bracewalk.app.sitefile.SiteFile.ObservationData;
import org.bracewalk.app.sitefile.SiteFile.PhotoData;
import org.bracewalk.app.sitefile.SiteFile.PlaneData;
import org.bracewalk.app.sitefile.SiteFile.RepairActionData;
import org.bracewalk.app.sitefile.SiteFile.RepairOrderData;
import org.bracewalk.app.sitefile.SiteFile.RetirementData;
import org.bracewalk.app.sitefile.SiteFile.StructureData;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DefectType;
import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;

/**
 * Reads and validates a site file. Every check that the store or the model would make is made
 * here first, so an error names the file, the line, the JSON path and the field, and a file that
 * reads without error imports without error into any database.
 *
 * <p>Unknown fields are errors (a misspelt optional field would otherwise be lost silently).
 */
public final class SiteFileReader {
  /**
   * The bounds of a site file: 512 MiB (photos travel in it, base64); no line limit, as a photo
   * is one line. Line ends and separators follow {@link TextInput}, as in every text file: a raw
   * U+2028 is valid JSON inside a string, but is refused here like everywhere else.
   */
  public static final TextInput.Limits LIMITS =
      new TextInput.Limits("a site file", 512L * 1024 * 1024, 0);

  /**
   * The JSON parser's bounds: a string may be as long as a photo of the largest size allowed,
   * base64 ({@link Photo#MAX_BYTES}: 28 million characters; Jackson's default is 20 million, so
   * a site file holding a 16 MB photo could be exported and not imported).
   */
  static final JsonFactory FACTORY = JsonFactory.builder()
      .streamReadConstraints(StreamReadConstraints.builder()
          .maxStringLength((Photo.MAX_BYTES + 2) / 3 * 4 + 16)
          .build())
      .build();

  private static final ObjectMapper MAPPER =
      JsonMapper.builder(FACTORY)
          .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
          .enable(DeserializationFeature.FAIL_ON_READING_DUP_TREE_KEY)
          .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
          .build();

  private final String fileName;
  private final String text;
  private JsonLines lines;

  private SiteFileReader(String fileName, String text) {
    this.fileName = fileName;
    this.text = text;
  }

  /**
   * Reads a site file.
   *
   * @param fileName the name to show in errors
   * @param text the file's text
   * @throws FileFormatException naming file, line, path and field of the first problem
   */
  public static SiteFile read(String fileName, String text) {
    return new SiteFileReader(fileName, text).read();
  }

  /** The file's spelling of an instant: ISO-8601 UTC, as {@link Instant#toString()}. */
  static String instantText(Instant at) {
    return at.truncatedTo(ChronoUnit.MILLIS).toString();
  }

  private SiteFile read() {
    try {
      TextInput.checkCharacters(fileName, text, LIMITS);
    } catch (TextInputException e) {
      throw FileFormatException.of(e);
    }
    JsonNode root;
    try {
      root = MAPPER.readTree(text);
    } catch (JsonProcessingException e) {
      int line = e.getLocation() == null ? 0 : e.getLocation().getLineNr();
      throw new FileFormatException(
          fileName, line, "", "", "not valid JSON: " + e.getOriginalMessage());
    }
    if (root == null || root.isMissingNode()) {
      throw new FileFormatException(fileName, 0, "", "", "the file is empty; expected a site file");
    }
    Obj top = obj(root, "");
    top.known("format", "version", "site", "structures");
    String format = top.requiredText("format");
    if (!SiteFile.FORMAT.equals(format)) {
      throw top.error("format", "expected \"" + SiteFile.FORMAT + "\", found \"" + format + "\"");
    }
    int version = top.integer("version", 1, Integer.MAX_VALUE);
    if (version > SiteFile.VERSION) {
      throw top.error(
          "version",
          "version " + version + " is newer than this program reads (" + SiteFile.VERSION
              + "); use a newer Bracewalk");
    }
    Site site = site(top.object("site"));
    List<Obj> structureNodes = top.objects("structures");
    Set<String> structureNames = new HashSet<>();
    List<StructureData> structures = new ArrayList<>();
    int[] inspectionNumber = {0};
    Map<Integer, String> inspectionPaths = new HashMap<>();
    List<Pending> pendingVerifications = new ArrayList<>();
    for (Obj s : structureNodes) {
      structures.add(structure(s, structureNames, inspectionNumber, inspectionPaths,
          pendingVerifications));
    }
    for (Pending p : pendingVerifications) {
      if (!inspectionPaths.containsKey(p.number)) {
        throw p.at.error(
            "verifiedByInspection",
            "no inspection number " + p.number + " in this file (numbers run 1 to "
                + inspectionNumber[0] + ")");
      }
    }
    return new SiteFile(site, structures);
  }

  private record Pending(Obj at, int number) {}

  private Site site(Obj n) {
    n.known("name", "clientName", "clientAddress", "location", "timeZone", "units",
        "jurisdiction");
    String zone = n.requiredText("timeZone");
    ZoneId timeZone;
    try {
      timeZone = ZoneId.of(zone);
    } catch (DateTimeException e) {
      throw n.error("timeZone", "unknown time zone \"" + zone + "\"; use a region such as Europe/London");
    }
    DisplayUnits units = n.label("units", DisplayUnits::fromLabel);
    Jurisdiction jurisdiction = n.has("jurisdiction")
        ? n.label("jurisdiction", Jurisdiction::fromLabel) : Jurisdiction.OTHER;
    return n.build(
        "name",
        () -> new Site(0, n.requiredText("name"), n.text("clientName"), n.text("clientAddress"),
            n.text("location"), timeZone, units, jurisdiction));
  }

  private StructureData structure(Obj n, Set<String> names, int[] inspectionNumber,
      Map<Integer, String> inspectionPaths, List<Pending> pending) {
    n.known("name", "kind", "description", "designReference", "inspectionIntervalDays", "planes",
        "inspections");
    String name = n.requiredText("name");
    if (!names.add(name)) {
      throw n.error("name", "a second structure named \"" + name + "\"; names must differ");
    }
    StructureKind kind = n.label("kind", StructureKind::fromLabel);
    int interval = n.has("inspectionIntervalDays")
        ? n.integer("inspectionIntervalDays", 1, 366)
        : Structure.DEFAULT_INTERVAL_DAYS;
    n.build("name", () -> new Structure(0, 1, name, kind, n.text("description"),
        n.text("designReference"), interval));
    Map<String, PlaneData> planes = new java.util.LinkedHashMap<>();
    for (Obj p : n.objects("planes")) {
      PlaneData plane = plane(p);
      if (planes.putIfAbsent(plane.name(), plane) != null) {
        throw p.error("name", "a second plane named \"" + plane.name() + "\" in structure \""
            + name + "\"; names must differ");
      }
    }
    List<InspectionData> inspections = new ArrayList<>();
    for (Obj i : n.objects("inspections")) {
      inspectionNumber[0]++;
      inspections.add(inspection(i, inspectionNumber[0], planes, pending));
      inspectionPaths.put(inspectionNumber[0], i.path);
    }
    return new StructureData(name, kind, n.text("description"), n.text("designReference"),
        interval, List.copyOf(planes.values()), inspections);
  }

  private PlaneData plane(Obj n) {
    n.known("name", "lifts", "bays", "support", "role", "bayWidthsMm", "liftHeightsMm", "designs",
        "retired");
    String name = n.requiredText("name");
    long liftCount = n.count("lifts");
    long bayCount = n.count("bays");
    // the one limit of a stored plane (PlaneLimits), checked before anything is allocated
    PlaneLimits.problem(name, liftCount, bayCount).ifPresent(problem -> {
      throw n.error(PlaneLimits.fieldOver(liftCount, bayCount), problem);
    });
    int lifts = (int) liftCount;
    int bays = (int) bayCount;
    Support support = n.label("support", s -> {
      Support v = Support.fromLabel(s);
      if (v == null) {
        throw new IllegalArgumentException("unknown support \"" + s + "\": use pinned-base or free");
      }
      return v;
    });
    // optional: absent means other (files written before planes had roles)
    PlaneRole role = n.has("role") ? n.label("role", PlaneRole::fromLabel) : PlaneRole.OTHER;
    List<Integer> widths = n.millimetres("bayWidthsMm", bays, "bays");
    List<Integer> heights = n.millimetres("liftHeightsMm", lifts, "lifts");
    PlaneGrid grid = new PlaneGrid(lifts, bays, Millimetres.toMetres(widths),
        Millimetres.toMetres(heights), support);
    List<DesignData> designs = new ArrayList<>();
    int expected = 1;
    List<Obj> designNodes = n.objects("designs");
    if (designNodes.isEmpty()) {
      throw n.error("designs", "plane \"" + name + "\" needs at least one design revision");
    }
    for (Obj d : designNodes) {
      d.known("revision", "author", "date", "approvalNote", "recordedAt", "map", "omittedFrame");
      int number = d.integer("revision", 1, Integer.MAX_VALUE);
      if (number != expected) {
        throw d.error("revision", "expected revision " + expected
            + " (revisions are numbered 1, 2, 3 ... in order)");
      }
      expected++;
      LocalDate date = d.date("date", true);
      Instant recordedAt = d.instant("recordedAt", true);
      PlaneDesign design = designMap(d, grid);
      if (d.has("omittedFrame")) {
        Set<FrameRef> omitted = new LinkedHashSet<>();
        for (Obj m : d.objects("omittedFrame")) {
          m.known("frame", "level", "bay", "lift", "line");
          FrameRef f = frameMember(m, grid);
          if (!omitted.add(f)) {
            throw m.error("frame", "the " + f + " is left out twice; name each member once");
          }
        }
        design = design.withOmittedFrame(omitted);
      }
      designs.add(new DesignData(number, d.text("author"), date, d.text("approvalNote"),
          recordedAt, design));
    }
    for (int i = 1; i < designs.size(); i++) {
      if (designs.get(i).recordedAt().isBefore(designs.get(i - 1).recordedAt())) {
        throw designNodes.get(i).error("recordedAt",
            "revision " + designs.get(i).number() + " is recorded before revision "
                + designs.get(i - 1).number() + "; later revisions are recorded later");
      }
    }
    RetirementData retired = null;
    if (n.has("retired")) {
      Obj r = n.object("retired");
      r.known("at", "by", "reason");
      Instant at = r.instant("at", true);
      if (at.isBefore(designs.get(0).recordedAt())) {
        throw r.error("at", "plane \"" + name + "\" is retired before its first design revision"
            + " was recorded (" + instantText(designs.get(0).recordedAt()) + ")");
      }
      PlaneRetirement checked = r.build("reason",
          () -> new PlaneRetirement(1, at, r.text("by"), r.requiredText("reason")));
      retired = new RetirementData(at, checked.retiredBy(), checked.reason());
    }
    return new PlaneData(name, grid, designs, retired, role);
  }

  private PlaneDesign designMap(Obj d, PlaneGrid grid) {
    List<String> rows = d.texts("map");
    if (rows.size() != grid.lifts()) {
      throw d.error("map", rows.size() + " rows for " + grid.lifts()
          + " lifts; give one row per lift, top lift first");
    }
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    for (int r = 0; r < rows.size(); r++) {
      int lift = grid.lifts() - r;
      String[] tokens = rows.get(r).strip().split("\\s+");
      String at = d.path + ".map[" + r + "]";
      if (tokens.length != grid.bays()) {
        throw d.errorAt(at, "map", "row " + (r + 1) + " (lift " + lift + ") has " + tokens.length
            + " tokens for " + grid.bays() + " bays");
      }
      for (int b = 0; b < tokens.length; b++) {
        PanelRef p = PanelRef.of(lift, b + 1);
        String t = tokens[b];
        if (t.equals("o")) {
          openings.add(p);
        } else if (!t.equals(".")) {
          Brace brace = braceToken(t);
          if (brace == null) {
            throw d.errorAt(at, "map", "unknown token \"" + t + "\" at lift " + lift + ", bay "
                + (b + 1) + "; use . / \\ X ~/ ~\\ ~X or o");
          }
          braces.put(p, brace);
        }
      }
    }
    return new PlaneDesign(grid, braces, openings);
  }

  /** A brace token: {@code / \ X}, or the same after {@code ~} for tension-only; else null. */
  static Brace braceToken(String token) {
    boolean tension = token.startsWith("~");
    Diagonal d = Diagonal.fromSymbol(tension ? token.substring(1) : token);
    if (d == null) {
      return null;
    }
    return new Brace(d, tension ? MemberKind.TENSION_ONLY : MemberKind.RIGID);
  }

  private InspectionData inspection(Obj n, int number, Map<String, PlaneData> planes,
      List<Pending> pending) {
    n.known("number", "reason", "status", "startedAt", "finishedAt", "inspectorName",
        "inspectorPosition", "competentPerson", "shift", "storageSafetyPerson",
        "carriedOutForName", "carriedOutForAddress", "scope", "observations", "repairOrders",
        "issuedReports");
    int declared = n.integer("number", 1, Integer.MAX_VALUE);
    if (declared != number) {
      throw n.error("number", "expected " + number
          + ": inspections are numbered 1, 2, 3 ... through the whole file, in order");
    }
    InspectionReason reason = n.label("reason", InspectionReason::fromLabel);
    InspectionStatus status = n.label("status", InspectionStatus::fromLabel);
    Instant started = n.instant("startedAt", true);
    Instant finished = n.instant("finishedAt", false);
    n.build(status == InspectionStatus.FINALISED ? "finishedAt" : "status", () -> new Inspection(
        0, 1, started, finished, n.requiredText("inspectorName"), "", "", "", "", reason, status,
        "", ""));
    List<SiteFile.ScopeData> scope = null;
    Set<String> scoped = new HashSet<>();
    if (n.has("scope")) {
      scope = new ArrayList<>();
      for (Obj d : n.objects("scope")) {
        d.known("plane", "design");
        PlaneData plane = planeNamed(d, planes);
        if (!scoped.add(plane.name())) {
          throw d.error("plane", "plane \"" + plane.name() + "\" is in this inspection's scope"
              + " twice; name each plane once");
        }
        int design = d.integer("design", 1, Integer.MAX_VALUE);
        if (plane.designs().stream().noneMatch(r -> r.number() == design)) {
          throw d.error("design", "plane \"" + plane.name() + "\" has no design revision "
              + design);
        }
        if (plane.retired() != null && !plane.retired().at().isAfter(started)) {
          throw d.error("plane", "plane \"" + plane.name() + "\" was retired at "
              + instantText(plane.retired().at()) + ", before this inspection started ("
              + instantText(started) + "); it is not part of it");
        }
        scope.add(new SiteFile.ScopeData(plane.name(), design));
      }
    }
    List<ObservationData> observations = new ArrayList<>();
    Set<Integer> corrected = new HashSet<>();
    for (Obj o : n.objects("observations")) {
      observations.add(
          observation(o, observations.size() + 1, started, planes, observations, corrected));
      if (scope != null && !scoped.contains(observations.get(observations.size() - 1).plane())) {
        throw o.error("plane", "plane \"" + observations.get(observations.size() - 1).plane()
            + "\" is not in this inspection's scope (field scope): an inspection covers the"
            + " planes fixed when it started");
      }
    }
    List<RepairOrderData> orders = new ArrayList<>();
    for (Obj r : n.objects("repairOrders")) {
      r.known("createdAt", "createdBy", "note", "actions");
      Instant created = r.instant("createdAt", true);
      List<RepairActionData> actions = new ArrayList<>();
      for (Obj a : r.objects("actions")) {
        actions.add(action(a, planes, pending));
      }
      orders.add(new RepairOrderData(created, r.text("createdBy"), r.text("note"), actions));
    }
    List<IssuedReportData> reports = new ArrayList<>();
    for (Obj r : n.objects("issuedReports")) {
      r.known("fileName", "fingerprint", "issuedAt");
      Instant issued = r.instant("issuedAt", true);
      IssuedReport checked = r.build("fingerprint", () -> new IssuedReport(0, 1,
          r.requiredText("fileName"), r.requiredText("fingerprint"), issued));
      reports.add(new IssuedReportData(checked.fileName(), checked.fingerprint(), issued));
    }
    return new InspectionData(number, started, finished, status, reason,
        n.requiredText("inspectorName"), n.text("inspectorPosition"), n.text("competentPerson"),
        n.text("shift"), n.text("storageSafetyPerson"), n.text("carriedOutForName"),
        n.text("carriedOutForAddress"), observations, orders, reports, scope);
  }

  private ObservationData observation(Obj n, int position, Instant started,
      Map<String, PlaneData> planes, List<ObservationData> earlier, Set<Integer> corrected) {
    n.known("plane", "lift", "bay", "frame", "level", "line", "state", "member", "bowMm",
        "gaugeLengthMm", "defect", "note", "recordedAt", "recordedBy", "supersedes",
        "correctionReason", "photos");
    PlaneData plane = planeNamed(n, planes);
    if (plane.retired() != null && !plane.retired().at().isAfter(started)) {
      throw n.error("plane", "plane \"" + plane.name() + "\" was retired at "
          + instantText(plane.retired().at()) + ", before this inspection started ("
          + instantText(started) + "); it is not part of it");
    }
    FrameRef frameMember = n.has("frame") ? frameMember(n, plane.grid()) : null;
    if (frameMember == null && (n.has("level") || n.has("line"))) {
      throw n.error(n.has("level") ? "level" : "line", "a level or line names a frame member:"
          + " give \"frame\" (ledger or standard) too, or lift and bay for a panel");
    }
    PanelRef panel = frameMember == null ? panel(n, plane) : null;
    PanelState state = n.label("state", PanelState::fromLabel);
    if (frameMember != null && n.has("member")) {
      throw n.error("member", "a frame member names no diagonal found (field member is for a"
          + " panel's diagonals)");
    }
    Brace member = n.has("member") ? brace(n, "member") : null;
    Double bow = n.has("bowMm") ? n.decimal("bowMm", 0, Observation.MAX_LENGTH_MM) : null;
    Integer gauge = n.has("gaugeLengthMm")
        ? n.integer("gaugeLengthMm", 1, Observation.MAX_LENGTH_MM) : null;
    DefectType defect = n.has("defect") ? n.label("defect", DefectType::fromLabel) : null;
    Instant at = n.instant("recordedAt", true);
    Integer supersedes = null;
    if (n.has("supersedes")) {
      supersedes = n.integer("supersedes", 1, Integer.MAX_VALUE);
      if (supersedes >= position) {
        throw n.error("supersedes", "observation " + position + " can only correct an earlier one"
            + " of the same inspection (1 to " + (position - 1) + ")");
      }
      if (!corrected.add(supersedes)) {
        throw n.error("supersedes", "observation " + supersedes
            + " is already corrected; correct the correction instead");
      }
    }
    Integer sup = supersedes;
    String field = n.has("bowMm") && !n.has("gaugeLengthMm") ? "gaugeLengthMm"
        : state == PanelState.EXTRA && member == null && frameMember == null ? "member"
        : sup != null || n.has("correctionReason") ? "correctionReason" : "state";
    n.build(field, () -> new Observation(0, 1, 1, panel, state, member, bow, gauge, defect,
        n.text("note"), at, n.text("recordedBy"), sup == null ? null : (long) sup,
        n.text("correctionReason"), frameMember));
    List<PhotoData> photos = new ArrayList<>();
    for (Obj p : n.objects("photos")) {
      p.known("fileName", "mediaType", "attachedAt", "data");
      Instant attached = p.instant("attachedAt", true);
      byte[] data = p.binary("data");
      Photo checked = p.build("data", () -> new Photo(0, 1, p.requiredText("fileName"),
          p.requiredText("mediaType"), data, attached));
      photos.add(new PhotoData(checked.fileName(), checked.mediaType(), attached, data));
    }
    return new ObservationData(plane.name(), panel, state, member, bow, gauge, defect,
        n.text("note"), at, n.text("recordedBy"), supersedes, n.text("correctionReason"), photos,
        frameMember);
  }

  private RepairActionData action(Obj n, Map<String, PlaneData> planes, List<Pending> pending) {
    n.known("plane", "lift", "bay", "frame", "level", "line", "action", "brace", "description",
        "dueDate", "assignee", "doneAt", "doneBy", "verifiedByInspection");
    PlaneData plane = planeNamed(n, planes);
    FrameRef frameMember = n.has("frame") ? frameMember(n, plane.grid()) : null;
    if (frameMember == null && (n.has("level") || n.has("line"))) {
      throw n.error(n.has("level") ? "level" : "line", "a level or line names a frame member:"
          + " give \"frame\" (ledger or standard) too, lift and bay for a panel, or neither for"
          + " the whole plane");
    }
    PanelRef panel = frameMember == null && (n.has("lift") || n.has("bay")) ? panel(n, plane)
        : null;
    RepairActionKind kind = n.label("action", RepairActionKind::fromLabel);
    if (frameMember != null && n.has("brace")) {
      throw n.error("brace", "an action on a frame member fits no diagonal (field brace is for a"
          + " panel)");
    }
    Brace brace = n.has("brace") ? brace(n, "brace") : null;
    LocalDate due = n.date("dueDate", false);
    Instant done = n.instant("doneAt", false);
    Integer verified = null;
    if (n.has("verifiedByInspection")) {
      verified = n.integer("verifiedByInspection", 1, Integer.MAX_VALUE);
      pending.add(new Pending(n, verified));
    }
    Integer v = verified;
    n.build(done == null && (n.has("doneBy") || v != null) ? "doneAt" : "action",
        () -> new RepairAction(0, 1, 1, panel, kind, brace, n.text("description"), due,
            n.text("assignee"), done, n.text("doneBy"), v == null ? null : (long) v,
            frameMember));
    return new RepairActionData(plane.name(), panel, kind, brace, n.text("description"), due,
        n.text("assignee"), done, n.text("doneBy"), verified, frameMember);
  }

  private PlaneData planeNamed(Obj n, Map<String, PlaneData> planes) {
    String name = n.requiredText("plane");
    PlaneData plane = planes.get(name);
    if (plane == null) {
      throw n.error("plane", "no plane named \"" + name + "\" in this structure; its planes are "
          + String.join(", ", planes.keySet()));
    }
    return plane;
  }

  /**
   * A frame member: {@code "frame": "ledger"} (or {@code "beam"}) with {@code level} 0..lifts and
   * {@code bay} 1..bays, or {@code "frame": "standard"} (or {@code "upright"}) with {@code lift}
   * 1..lifts and {@code line} 0..bays.
   */
  private FrameRef frameMember(Obj n, PlaneGrid grid) {
    FrameMemberType type = n.label("frame", w -> {
      try {
        return FrameMemberType.fromWord(w);
      } catch (IllegalArgumentException e) {
        throw new IllegalArgumentException("unknown frame member \"" + w
            + "\": use ledger (beam) or standard (upright)", e);
      }
    });
    if (type == FrameMemberType.LEDGER) {
      for (String wrong : List.of("lift", "line")) {
        if (n.has(wrong)) {
          throw n.error(wrong, "a ledger is named by level and bay, not " + wrong);
        }
      }
      return FrameRef.ledger(n.integer("level", 0, grid.lifts()), n.integer("bay", 1, grid.bays()));
    }
    for (String wrong : List.of("level", "bay")) {
      if (n.has(wrong)) {
        throw n.error(wrong, "a standard is named by lift and line, not " + wrong);
      }
    }
    return FrameRef.standard(n.integer("lift", 1, grid.lifts()), n.integer("line", 0, grid.bays()));
  }

  private PanelRef panel(Obj n, PlaneData plane) {
    int lift = n.integer("lift", 1, plane.grid().lifts());
    int bay = n.integer("bay", 1, plane.grid().bays());
    return PanelRef.of(lift, bay);
  }

  private Brace brace(Obj n, String field) {
    String token = n.requiredText(field);
    Brace b = braceToken(token);
    if (b == null) {
      throw n.error(field, "unknown member \"" + token + "\"; use / \\ X ~/ ~\\ or ~X");
    }
    return b;
  }

  // ---------------------------------------------------------------- located access to nodes

  private Obj obj(JsonNode node, String path) {
    if (!node.isObject()) {
      throw new FileFormatException(fileName, line(path), display(path), "",
          "expected a JSON object {...}");
    }
    return new Obj(node, path);
  }

  private int line(String path) {
    if (lines == null) {
      lines = new JsonLines(text);
    }
    return lines.lineOf(path);
  }

  private static String display(String path) {
    return path.isEmpty() ? "top level" : path;
  }

  private static String child(String path, String field) {
    return path.isEmpty() ? field : path + "." + field;
  }

  /** One JSON object and where it is. */
  private final class Obj {
    final JsonNode node;
    final String path;

    Obj(JsonNode node, String path) {
      this.node = node;
      this.path = path;
    }

    FileFormatException error(String field, String problem) {
      String at = node.has(field) ? child(path, field) : path;
      return new FileFormatException(fileName, line(at), display(at), field, problem);
    }

    FileFormatException errorAt(String at, String field, String problem) {
      return new FileFormatException(fileName, line(at), display(at), field, problem);
    }

    boolean has(String field) {
      return node.has(field) && !node.get(field).isNull();
    }

    void known(String... fields) {
      Set<String> allowed = new LinkedHashSet<>(List.of(fields));
      for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
        String f = it.next();
        if (!allowed.contains(f)) {
          throw error(f, "unknown field; the fields here are " + String.join(", ", allowed));
        }
      }
    }

    JsonNode required(String field) {
      if (!has(field)) {
        throw error(field, "missing; it is required here");
      }
      return node.get(field);
    }

    String requiredText(String field) {
      String s = text(field);
      if (s.isBlank()) {
        throw error(field, has(field) ? "must not be empty" : "missing; it is required here");
      }
      return s;
    }

    String text(String field) {
      if (!has(field)) {
        return "";
      }
      JsonNode v = node.get(field);
      if (!v.isTextual()) {
        throw error(field, "expected text in quotes, found " + v.getNodeType().name().toLowerCase());
      }
      return v.asText().strip();
    }

    /** A count of one or more, as given (a number too large for a long reads as the largest). */
    long count(String field) {
      JsonNode v = required(field);
      if (!v.isIntegralNumber()) {
        throw error(field, "expected a whole number, found " + v);
      }
      long c = v.canConvertToLong() ? v.longValue() : (v.bigIntegerValue().signum() < 0 ? Long.MIN_VALUE : Long.MAX_VALUE);
      if (c < 1) {
        throw error(field, c + " is out of range: use 1 or more");
      }
      return c;
    }

    int integer(String field, int min, int max) {
      JsonNode v = required(field);
      if (!v.isIntegralNumber() || !v.canConvertToInt()) {
        throw error(field, "expected a whole number, found " + v);
      }
      int i = v.intValue();
      if (i < min || i > max) {
        throw error(field, i + " is out of range: use " + min
            + (max == Integer.MAX_VALUE ? " or more" : " to " + max));
      }
      return i;
    }

    double decimal(String field, double min, double max) {
      JsonNode v = required(field);
      if (!v.isNumber()) {
        throw error(field, "expected a number, found " + v);
      }
      double d = v.doubleValue();
      if (!(d >= min && d <= max)) {
        throw error(field, d + " is out of range: use " + (int) min + " to " + (int) max);
      }
      return d;
    }

    <T> T label(String field, Function<String, T> parse) {
      String s = requiredText(field);
      try {
        return parse.apply(s);
      } catch (IllegalArgumentException e) {
        throw error(field, e.getMessage());
      }
    }

    Instant instant(String field, boolean required) {
      if (!has(field)) {
        if (required) {
          throw error(field, "missing; give a UTC time such as 2025-03-04T07:30:00Z");
        }
        return null;
      }
      String s = text(field);
      try {
        return Instant.parse(s).truncatedTo(ChronoUnit.MILLIS);
      } catch (DateTimeException e) {
        throw error(field, "\"" + s + "\" is not a UTC time such as 2025-03-04T07:30:00Z");
      }
    }

    LocalDate date(String field, boolean required) {
      if (!has(field)) {
        if (required) {
          throw error(field, "missing; give a date such as 2025-03-04");
        }
        return null;
      }
      String s = text(field);
      try {
        return LocalDate.parse(s);
      } catch (DateTimeException e) {
        throw error(field, "\"" + s + "\" is not a date such as 2025-03-04");
      }
    }

    byte[] binary(String field) {
      JsonNode v = required(field);
      try {
        if (!v.isTextual()) {
          throw new IOException("not text");
        }
        return v.binaryValue();
      } catch (IOException e) {
        throw error(field, "expected the photo's bytes in base64");
      }
    }

    Obj object(String field) {
      return obj(required(field), child(path, field));
    }

    List<Obj> objects(String field) {
      List<Obj> out = new ArrayList<>();
      if (!has(field)) {
        return out;
      }
      JsonNode v = node.get(field);
      if (!v.isArray()) {
        throw error(field, "expected a list [...]");
      }
      for (int i = 0; i < v.size(); i++) {
        out.add(obj(v.get(i), child(path, field) + "[" + i + "]"));
      }
      return out;
    }

    List<String> texts(String field) {
      JsonNode v = required(field);
      if (!v.isArray()) {
        throw error(field, "expected a list of text rows [...]");
      }
      List<String> out = new ArrayList<>();
      for (int i = 0; i < v.size(); i++) {
        if (!v.get(i).isTextual()) {
          throw errorAt(child(path, field) + "[" + i + "]", field, "expected a text row in quotes");
        }
        out.add(v.get(i).asText());
      }
      return out;
    }

    List<Integer> millimetres(String field, int count, String what) {
      JsonNode v = required(field);
      if (!v.isArray() || v.size() != count) {
        throw error(field, "expected a list of " + count + " whole millimetres, one per "
            + what.substring(0, what.length() - 1));
      }
      List<Integer> out = new ArrayList<>();
      for (int i = 0; i < v.size(); i++) {
        JsonNode x = v.get(i);
        if (!x.isIntegralNumber() || !x.canConvertToInt() || x.intValue() < 1
            || x.intValue() > 1_000_000) {
          throw errorAt(child(path, field) + "[" + i + "]", field, "entry " + (i + 1)
              + " must be a whole number of millimetres from 1 to 1000000, found " + x);
        }
        out.add(x.intValue());
      }
      return out;
    }

    /** Builds a model record to run its checks, naming {@code field} when they fail. */
    <T> T build(String field, java.util.function.Supplier<T> make) {
      try {
        return make.get();
      } catch (IllegalArgumentException | NullPointerException e) {
        throw error(field, e.getMessage());
      }
    }
  }
}
