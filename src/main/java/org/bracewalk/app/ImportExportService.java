package org.bracewalk.app;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;
import org.bracewalk.app.sitefile.ObservationCsv;
import org.bracewalk.app.sitefile.SiteFile;
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
import org.bracewalk.app.sitefile.SiteFileReader;
import org.bracewalk.app.sitefile.SiteFileWriter;
import org.bracewalk.app.panelmap.MapKind;
import org.bracewalk.app.panelmap.PanelMap;
import org.bracewalk.app.panelmap.PanelMapException;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.app.panelmap.PanelMapWriter;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.StoreBusyException;
import org.bracewalk.core.port.StoreException;

/**
 * Files in and out: the JSON site file, the CSV of one inspection's observations, and panel maps
 * (the {@code check} format) as a plane's design or as one inspection's findings. Imports read
 * and check the whole file before writing anything, then write in one transaction: on any error
 * nothing is stored.
 *
 * <p>Errors in a file are {@link org.bracewalk.app.sitefile.FileFormatException}s (site file,
 * CSV) or {@link UserInputException}s (panel maps, whose located message is kept), naming the file
 * and the line.
 */
public final class ImportExportService {
  private final RecordStore store;
  private final Clock clock;
  /** Made on first export: the JSON library is not loaded while the app starts. */
  private SiteFileWriter writer;
  private final PanelMapParser maps = new PanelMapParser();
  private final PanelMapWriter mapWriter = new PanelMapWriter();

  public ImportExportService(RecordStore store, Clock clock) {
    this.store = Objects.requireNonNull(store);
    this.clock = Objects.requireNonNull(clock);
  }

  /**
   * Imports a site file as a new site, all or nothing.
   *
   * @param fileName the name to show in errors
   * @param text the file's text
   * @throws org.bracewalk.app.sitefile.FileFormatException naming file, line, path and field
   */
  public ImportedSite importSite(String fileName, String text) {
    SiteFile file = SiteFileReader.read(fileName, text);
    return store.inTransaction(() -> load(file));
  }

  private ImportedSite load(SiteFile file) {
    Site site = store.sites().add(StoredText.site(file.site()));
    List<Structure> structures = new ArrayList<>();
    List<PlaneRecord> allPlanes = new ArrayList<>();
    List<Inspection> inspections = new ArrayList<>();
    Map<Integer, Long> inspectionIds = new HashMap<>();
    Map<Long, Integer> verifications = new LinkedHashMap<>();
    int observations = 0;
    for (StructureData s : file.structures()) {
      Structure structure = store.structures().add(StoredText.structure(new Structure(0,
          site.id(), s.name(), s.kind(), s.description(), s.designReference(),
          s.inspectionIntervalDays())));
      structures.add(structure);
      Map<String, PlaneRecord> planes = new HashMap<>();
      for (PlaneData p : s.planes()) {
        PlaneRecord plane = store.planes().add(
            StoredText.plane(new PlaneRecord(0, structure.id(), p.name(), p.grid(), p.role())));
        planes.put(plane.name(), plane);
        allPlanes.add(plane);
        for (DesignData d : p.designs()) {
          store.designs().add(StoredText.revision(new DesignRevision(0, plane.id(), d.number(),
              d.author(), d.date(), d.approvalNote(), d.recordedAt(), d.design())));
        }
      }
      for (InspectionData i : s.inspections()) {
        Inspection inspection = store.inspections().add(StoredText.inspection(new Inspection(0,
            structure.id(), i.startedAt(), null, i.inspectorName(), i.inspectorPosition(),
            i.competentPerson(), i.shift(), i.storageSafetyPerson(), i.reason(),
            InspectionStatus.OPEN, i.carriedOutForName(), i.carriedOutForAddress())));
        inspectionIds.put(i.number(), inspection.id());
        Map<Long, Long> scope = new java.util.TreeMap<>();
        for (SiteFile.ScopeData d : i.scope() != null ? i.scope() : scopeAtStart(s, i)) {
          PlaneRecord plane = planes.get(d.plane());
          scope.put(plane.id(), store.designs().ofPlane(plane.id()).stream()
              .filter(r -> r.number() == d.design()).findFirst().orElseThrow().id());
        }
        store.planes().fixScope(inspection.id(), scope);
        List<Long> ids = new ArrayList<>();
        for (ObservationData o : i.observations()) {
          Long supersedes = o.supersedes() == null ? null : ids.get(o.supersedes() - 1);
          PlaneRecord plane = planes.get(o.plane());
          if (o.frameMember() != null && o.state() == PanelState.EXTRA
              && designIn(scope, plane) != null
              && designIn(scope, plane).hasFrameMember(o.frameMember())) {
            throw new UserInputException("inspection " + i.number() + ", observation "
                + (ids.size() + 1) + " (plane \"" + o.plane() + "\"): the " + o.frameMember()
                + " is in the design the inspection is checked against, so it cannot be extra"
                + " (there although the design leaves it out); nothing was imported");
          }
          Observation stored = store.observations().add(StoredText.observation(new Observation(0,
              inspection.id(), plane.id(), o.panel(), o.state(), o.member(),
              o.bowMm(), o.gaugeLengthMm(), o.defect(), o.note(), o.recordedAt(), o.recordedBy(),
              supersedes, o.correctionReason(), o.frameMember())));
          ids.add(stored.id());
          for (PhotoData ph : o.photos()) {
            store.observations().addPhoto(StoredText.photo(new Photo(0, stored.id(), ph.fileName(),
                ph.mediaType(), ph.data(), ph.attachedAt())));
          }
        }
        observations += ids.size();
        if (i.status() == InspectionStatus.FINALISED) {
          inspection = store.inspections().finalise(inspection.id(), i.finishedAt());
        }
        inspections.add(inspection);
        for (RepairOrderData r : i.repairOrders()) {
          RepairOrder order = store.repairs().addOrder(StoredText.order(
              new RepairOrder(0, inspection.id(), r.createdAt(), r.createdBy(), r.note())));
          for (RepairActionData a : r.actions()) {
            RepairAction action = store.repairs().addAction(StoredText.action(new RepairAction(0,
                order.id(), planes.get(a.plane()).id(), a.panel(), a.action(), a.brace(),
                a.description(), a.dueDate(), a.assignee(), a.doneAt(), a.doneBy(), null,
                a.frameMember())));
            if (a.verifiedByInspection() != null) {
              verifications.put(action.id(), a.verifiedByInspection());
            }
          }
        }
        for (IssuedReportData r : i.issuedReports()) {
          store.issuedReports().add(
              new IssuedReport(0, inspection.id(), r.fileName(), r.fingerprint(), r.issuedAt()));
        }
      }
    }
    for (int k = 0; k < file.structures().size(); k++) {
      long structureId = structures.get(k).id();
      for (PlaneData p : file.structures().get(k).planes()) {
        if (p.retired() != null) {
          PlaneRecord plane = store.planes().findByName(structureId, p.name()).orElseThrow();
          store.planes().retire(new PlaneRetirement(plane.id(), p.retired().at(),
              p.retired().by(), p.retired().reason()));
        }
      }
    }
    verifications.forEach((action, number) ->
        store.repairs().markVerified(action, inspectionIds.get(number)));
    return new ImportedSite(site, structures, allPlanes, inspections, observations);
  }

  /** The design of a plane in an inspection's scope (design revision id by plane id). */
  private PlaneDesign designIn(Map<Long, Long> scope, PlaneRecord plane) {
    Long revision = scope.get(plane.id());
    return revision == null ? null
        : store.designs().find(revision).orElseThrow().design();
  }

  /**
   * The scope of an inspection whose site file does not state it (a file written before the scope
   * was recorded), by the rule migration V7 gave the inspections already in a database: the planes
   * of the structure that have a design, are not retired by the inspection's start and were
   * created (first design revision recorded) by its start, or by its last issued document when
   * it has one; and every plane it has an observation or repair action of. A finalised
   * inspection is checked against the highest revision recorded by its finish (else revision 1),
   * an open one against the highest revision.
   */
  static List<SiteFile.ScopeData> scopeAtStart(StructureData s, InspectionData i) {
    Set<String> used = new HashSet<>();
    i.observations().forEach(o -> used.add(o.plane()));
    i.repairOrders().forEach(r -> r.actions().forEach(a -> used.add(a.plane())));
    Instant upTo = i.startedAt();
    for (IssuedReportData r : i.issuedReports()) {
      if (r.issuedAt().isAfter(upTo)) {
        upTo = r.issuedAt();
      }
    }
    List<SiteFile.ScopeData> out = new ArrayList<>();
    for (PlaneData p : s.planes()) {
      if (p.designs().isEmpty()) {
        continue;
      }
      Instant born = p.designs().stream().map(DesignData::recordedAt)
          .min(Instant::compareTo).orElseThrow();
      boolean retired = p.retired() != null && !p.retired().at().isAfter(i.startedAt());
      if (!used.contains(p.name()) && (retired || born.isAfter(upTo))) {
        continue;
      }
      List<DesignData> byNumber = new ArrayList<>(p.designs());
      byNumber.sort(java.util.Comparator.comparingInt(DesignData::number));
      DesignData design = byNumber.get(byNumber.size() - 1);
      if (i.status() == InspectionStatus.FINALISED) {
        design = byNumber.get(0);
        for (DesignData d : byNumber) {
          if (!d.recordedAt().isAfter(i.finishedAt())) {
            design = d;
          }
        }
      }
      out.add(new SiteFile.ScopeData(p.name(), design.number()));
    }
    return out;
  }

  /** The site file of one site: everything about it, as text. */
  public String exportSite(long siteId) {
    SiteFile file = siteFile(siteId);
    synchronized (this) {
      if (writer == null) {
        writer = new SiteFileWriter();
      }
      return writer.write(file);
    }
  }

  /** The content of the site file of one site. */
  public SiteFile siteFile(long siteId) {
    Site site = store.sites().find(siteId).orElseThrow(() -> new NotFoundException("site " + siteId));
    List<Structure> structures = store.structures().ofSite(siteId);
    Map<Long, Integer> numbers = new HashMap<>();
    for (Structure s : structures) {
      for (Inspection i : store.inspections().ofStructure(s.id())) {
        numbers.put(i.id(), numbers.size() + 1);
      }
    }
    List<StructureData> out = new ArrayList<>();
    for (Structure s : structures) {
      Map<Long, String> planeNames = new HashMap<>();
      List<PlaneData> planes = new ArrayList<>();
      Map<Long, PlaneRetirement> retired = new HashMap<>();
      store.planes().retirementsOf(s.id()).forEach(r -> retired.put(r.planeId(), r));
      for (PlaneRecord p : store.planes().ofStructure(s.id())) {
        // a plane stored before the limit (migration V6) may be far larger: say so rather than
        // write a map of millions of panels
        PlaneLimits.problem(p.name(), p.grid().lifts(), p.grid().bays()).ifPresent(problem -> {
          throw new UserInputException("structure '" + s.name() + "', " + problem
              + ", so the site file cannot carry it (it was stored before the limit)");
        });
        planeNames.put(p.id(), p.name());
        List<DesignData> designs = new ArrayList<>();
        for (DesignRevision d : store.designs().ofPlane(p.id())) {
          designs.add(new DesignData(d.number(), d.author(), d.date(), d.approvalNote(),
              d.recordedAt(), d.design()));
        }
        PlaneRetirement r = retired.get(p.id());
        planes.add(new PlaneData(p.name(), p.grid(), designs,
            r == null ? null : new RetirementData(r.retiredAt(), r.retiredBy(), r.reason()), p.role()));
      }
      List<InspectionData> inspections = new ArrayList<>();
      for (Inspection i : store.inspections().ofStructure(s.id())) {
        inspections.add(inspectionData(i, numbers, planeNames));
      }
      out.add(new StructureData(s.name(), s.kind(), s.description(), s.designReference(),
          s.inspectionIntervalDays(), planes, inspections));
    }
    return new SiteFile(site.withId(0), out);
  }

  private InspectionData inspectionData(Inspection i, Map<Long, Integer> numbers,
      Map<Long, String> planeNames) {
    List<Observation> rows = store.observations().ofInspection(i.id());
    Map<Long, Integer> position = new HashMap<>();
    List<Long> withPhotos = store.observations().withPhotos(i.id());
    List<ObservationData> observations = new ArrayList<>();
    for (Observation o : rows) {
      position.put(o.id(), position.size() + 1);
      List<PhotoData> photos = new ArrayList<>();
      if (withPhotos.contains(o.id())) {
        for (Photo ph : store.observations().photosOf(o.id())) {
          photos.add(new PhotoData(ph.fileName(), ph.mediaType(), ph.attachedAt(), ph.data()));
        }
      }
      observations.add(new ObservationData(planeNames.get(o.planeId()), o.panel(), o.state(),
          o.memberFound(), o.bowMm(), o.gaugeLengthMm(), o.defect(), o.note(), o.recordedAt(),
          o.recordedBy(), o.supersedes() == null ? null : position.get(o.supersedes()),
          o.correctionReason(), photos, o.frameMember()));
    }
    List<RepairOrderData> orders = new ArrayList<>();
    for (RepairOrder r : store.repairs().ordersOf(i.id())) {
      List<RepairActionData> actions = new ArrayList<>();
      for (RepairAction a : store.repairs().actionsOf(r.id())) {
        Integer verified = null;
        if (a.verifiedByInspectionId() != null) {
          verified = numbers.get(a.verifiedByInspectionId());
          if (verified == null) {
            throw new UserInputException("repair action " + a.id() + " is verified by inspection "
                + a.verifiedByInspectionId() + ", which is not of this site; the site file cannot"
                + " refer to it");
          }
        }
        actions.add(new RepairActionData(planeNames.get(a.planeId()), a.panel(), a.action(),
            a.brace(), a.description(), a.dueDate(), a.assignee(), a.doneAt(), a.doneBy(),
            verified, a.frameMember()));
      }
      orders.add(new RepairOrderData(r.createdAt(), r.createdBy(), r.note(), actions));
    }
    List<IssuedReportData> reports = new ArrayList<>();
    for (IssuedReport r : store.issuedReports().ofInspection(i.id())) {
      reports.add(new IssuedReportData(r.fileName(), r.fingerprint(), r.issuedAt()));
    }
    List<SiteFile.ScopeData> scope = new ArrayList<>();
    store.planes().scopeOf(i.id()).forEach((plane, revision) -> scope.add(new SiteFile.ScopeData(
        planeNames.get(plane), store.designs().find(revision).orElseThrow().number())));
    return new InspectionData(numbers.get(i.id()), i.startedAt(), i.finishedAt(), i.status(),
        i.reason(), i.inspectorName(), i.inspectorPosition(), i.competentPerson(), i.shift(),
        i.storageSafetyPerson(), i.carriedOutForName(), i.carriedOutForAddress(), observations,
        orders, reports, scope);
  }

  /** The CSV of every observation of an inspection, superseded ones included, in order. */
  public String exportObservationsCsv(long inspectionId) {
    Inspection inspection = inspection(inspectionId);
    Map<Long, String> planeNames = new HashMap<>();
    for (PlaneRecord p : store.planes().ofStructure(inspection.structureId())) {
      planeNames.put(p.id(), p.name());
    }
    Map<Long, Integer> row = new HashMap<>();
    List<ObservationCsv.Row> rows = new ArrayList<>();
    for (Observation o : store.observations().ofInspection(inspectionId)) {
      row.put(o.id(), row.size() + 1);
      rows.add(new ObservationCsv.Row(0, planeNames.get(o.planeId()), o.panel(), o.state(),
          o.memberFound(), o.bowMm(), o.gaugeLengthMm(), o.defect(), o.note(), o.recordedAt(),
          o.recordedBy(), o.supersedes() == null ? null : row.get(o.supersedes()),
          o.correctionReason(), o.frameMember()));
    }
    return ObservationCsv.write(rows);
  }

  /**
   * Reads and checks an observation CSV for an open inspection without storing anything.
   *
   * @throws org.bracewalk.app.sitefile.FileFormatException naming file, line and column
   */
  public List<ObservationCsv.Row> readObservationsCsv(long inspectionId, String fileName, String text) {
    Inspection inspection = inspection(inspectionId);
    if (inspection.isFinalised()) {
      throw new InspectionFinalisedException(inspectionId, "record observations from " + fileName);
    }
    Map<String, PlaneGrid> grids = new HashMap<>();
    Map<String, Set<FrameRef>> omitted = new HashMap<>();
    Map<Long, Long> scope = store.planes().scopeOf(inspectionId);
    for (PlaneRecord p : store.planes().ofInspection(inspectionId)) {
      grids.put(p.name(), p.grid());
      PlaneDesign design = designIn(scope, p);
      if (design != null) {
        omitted.put(p.name(), design.omittedFrame());
      }
    }
    return ObservationCsv.read(fileName, text, grids, omitted);
  }

  /**
   * Imports an observation CSV into an open inspection, all or nothing (one transaction). Rows
   * with an empty {@code recorded_at} take the time of import. Rows an earlier run of the same
   * file recorded into this inspection are not recorded again (see {@link #recordFromCsv}).
   */
  public CsvRecording importObservationsCsv(long inspectionId, String fileName, String text) {
    List<ObservationCsv.Row> rows = readObservationsCsv(inspectionId, fileName, text);
    return store.inTransaction(
        () -> record(inspectionId, fileName, text, rows, "", o -> { }, false));
  }

  /**
   * Records the rows of an observation CSV one by one, each committed before the next: {@code
   * acknowledged} hears of each stored observation as soon as it is on disk. The whole file is
   * checked first, so a bad file records nothing.
   *
   * <p>A row is known by the file's content (SHA-256 of its text) and the line it starts on,
   * noted in the row's own transaction: a run of the same file into the same inspection skips
   * the rows already recorded, so running it again after any interruption records the rest and
   * nothing twice. (Content, not name: an edited file is another file, and its rows are all new;
   * two files that happen to hold the same row are two findings, not one.)
   *
   * @param recordedBy used where the row's {@code recorded_by} is empty
   * @throws RecordingStoppedException when a row cannot be stored part-way: it names the rows
   *     recorded (the last acknowledged line) and says nothing after them is
   */
  public CsvRecording recordFromCsv(long inspectionId, String fileName, String text,
      String recordedBy, Consumer<Observation> acknowledged) {
    List<ObservationCsv.Row> rows = readObservationsCsv(inspectionId, fileName, text);
    return record(inspectionId, fileName, text, rows, recordedBy, acknowledged, true);
  }

  /** The SHA-256 of a file's text as UTF-8, in lower-case hex: the identity of its rows. */
  static String sourceKey(String text) {
    try {
      return java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
          .digest(text.getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    } catch (java.security.NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java runtime has SHA-256", e);
    }
  }

  private CsvRecording record(long inspectionId, String fileName, String text,
      List<ObservationCsv.Row> rows, String recordedBy, Consumer<Observation> acknowledged,
      boolean eachCommitted) {
    Inspection inspection = inspection(inspectionId);
    Map<String, Long> planeIds = new HashMap<>();
    for (PlaneRecord p : store.planes().ofInspection(inspection.id())) {
      planeIds.put(p.name(), p.id());
    }
    String source = sourceKey(text);
    Map<Integer, Long> earlier = store.observations().recordedFrom(inspectionId, source);
    List<Long> ids = new ArrayList<>(); // by data row: the observation recorded from it
    List<Observation> stored = new ArrayList<>();
    int already = 0;
    for (int i = 0; i < rows.size(); i++) {
      ObservationCsv.Row r = rows.get(i);
      Long done = earlier.get(r.line());
      if (done != null) {
        ids.add(done);
        already++;
        continue;
      }
      Instant at = r.recordedAt() != null ? r.recordedAt() : clock.instant();
      String by = r.recordedBy().isEmpty() && recordedBy != null ? recordedBy : r.recordedBy();
      Long supersedes = r.supersedesRow() == null ? null : ids.get(r.supersedesRow() - 1);
      Observation o;
      try {
        o = store.inTransaction(() -> {
          Observation added = store.observations().add(StoredText.observation(new Observation(0,
              inspectionId, planeIds.get(r.plane()), r.panel(), r.state(), r.member(), r.bowMm(),
              r.gaugeLengthMm(), r.defect(), r.note(), at, by, supersedes, r.correctionReason(),
              r.frameMember())));
          store.observations().addSource(inspectionId, source, r.line(), added.id());
          return added;
        });
      } catch (StoreException | UserInputException | IllegalArgumentException e) {
        if (!eachCommitted) {
          throw e; // one transaction: nothing of the file is kept
        }
        throw stopped(fileName, rows, i, stored.size(), already, earlier, e);
      }
      ids.add(o.id());
      stored.add(o);
      acknowledged.accept(o);
    }
    return new CsvRecording(stored, already);
  }

  /**
   * Says exactly what is recorded when row {@code failed} could not be: rows before it are (by
   * this run or an earlier one, each committed before the next), it and the rows after it are not
   * (unless an earlier run recorded some of them, which is said too).
   */
  private static RecordingStoppedException stopped(String fileName, List<ObservationCsv.Row> rows,
      int failed, int byThisRun, int byEarlier, Map<Integer, Long> earlier, RuntimeException e) {
    ObservationCsv.Row at = rows.get(failed);
    String why = e instanceof StoreBusyException busy ? busy.reason() : e.getMessage();
    StringBuilder m = new StringBuilder("recording ").append(fileName).append(" stopped at line ")
        .append(at.line()).append(": ").append(why).append(". ");
    int last = failed == 0 ? 0 : rows.get(failed - 1).line();
    long laterFromEarlier = rows.subList(failed + 1, rows.size()).stream()
        .filter(r -> earlier.containsKey(r.line())).count();
    String after = laterFromEarlier == 0 ? "nothing after it"
        : "after it only the " + laterFromEarlier + " rows an earlier run recorded";
    if (failed == 0) {
      m.append("No row of ").append(fileName).append(" is recorded by this run; ").append(after);
    } else {
      m.append("Rows ").append(rows.get(0).line()).append('-').append(last).append(" of ")
          .append(fileName).append(" are recorded (last acknowledged: line ").append(last);
      if (byThisRun == 0) {
        m.append(", by an earlier run");
      } else if (byEarlier > 0) {
        m.append("; ").append(byThisRun).append(" by this run, ").append(byEarlier)
            .append(" by an earlier run");
      }
      m.append("); ").append(after);
    }
    m.append("; run the same command again to record the rest (rows already recorded are not"
        + " recorded twice)");
    return new RecordingStoppedException(m.toString(), last, e);
  }

  // ------------------------------------------------------------------ panel maps

  private PanelMap parseMap(String fileName, String text, MapKind kind) {
    try {
      return maps.parse(fileName, text, kind);
    } catch (PanelMapException e) {
      throw new UserInputException(e.getMessage(), e);
    }
  }

  /**
   * Checks that a map fits a plane: same lifts and bays, and any support, widths or heights its
   * header states equal to the plane's; errors name the file and line.
   */
  private static void requireFits(PanelMap map, String fileName, PlaneRecord plane) {
    PlaneGrid g = plane.grid();
    if (map.lifts() != g.lifts() || map.bays() != g.bays()) {
      throw new UserInputException(fileName + ": the map has " + map.lifts() + " lifts x "
          + map.bays() + " bays; plane '" + plane.name() + "' has " + g.lifts() + " x "
          + g.bays());
    }
    map.statedSupport().ifPresent(sup -> {
      if (sup != g.support()) {
        throw new UserInputException(fileName + ":" + map.headerEntry("support").orElseThrow().line()
            + ": support is " + sup.label() + ", plane '" + plane.name() + "' is "
            + g.support().label() + "; remove the line or make them agree");
      }
    });
    PlaneGrid stated = Millimetres.round(map.grid(g.support()));
    checkHeader(map, fileName, plane, "widths", stated.bayWidths(), g.bayWidths());
    checkHeader(map, fileName, plane, "heights", stated.liftHeights(), g.liftHeights());
  }

  private static void checkHeader(PanelMap map, String fileName, PlaneRecord plane, String key,
      List<Double> stated, List<Double> actual) {
    map.headerEntry(key).ifPresent(h -> {
      if (!stated.equals(actual)) {
        throw new UserInputException(fileName + ":" + h.line() + ": " + key + " " + stated
            + " m differ from plane '" + plane.name() + "' (" + actual
            + " m); remove the line or make them agree");
      }
    });
  }

  /**
   * Creates a plane of a structure from a design panel map (its grid from the map's header;
   * support pinned-base unless stated), with the map as design revision 1.
   */
  public PlaneRecord createPlaneFromMap(long structureId, String name, String fileName,
      String text, String author, LocalDate date, String approvalNote) {
    return createPlaneFromMap(structureId, name, PlaneRole.OTHER, fileName, text, author, date,
        approvalNote);
  }

  /** As above, for a plane of the given role. */
  public PlaneRecord createPlaneFromMap(long structureId, String name, PlaneRole role, String fileName,
      String text, String author, LocalDate date, String approvalNote) {
    PanelMap map = parseMap(fileName, text, MapKind.DESIGN);
    PlaneLimits.problem(name, map.lifts(), map.bays()).ifPresent(problem -> {
      throw new UserInputException(fileName + ": " + problem + " (the map's rows and columns)");
    });
    PlaneGrid grid = map.grid(map.statedSupport().orElse(Support.PINNED_BASE));
    return new SiteService(store, clock).createPlane(new PlaneRecord(0, structureId, name, grid, role),
        author, date, approvalNote, map.toDesign(grid));
  }

  /** Adds a design panel map as the next design revision of a plane. */
  public DesignRevision importDesignMap(long planeId, String fileName, String text, String author,
      LocalDate date, String approvalNote) {
    SiteService sites = new SiteService(store, clock);
    PlaneRecord plane = sites.plane(planeId);
    PanelMap map = parseMap(fileName, text, MapKind.DESIGN);
    requireFits(map, fileName, plane);
    return sites.addDesignRevision(planeId, author, date, approvalNote, map.toDesign(plane.grid()));
  }

  /**
   * Records an as-built panel map as observations of one plane of an open inspection, all or
   * nothing: one observation per panel that is not {@code ?}, its state found by comparing the
   * map with the design in force (as designed: sound; design member gone: missing, naming what is
   * left; a member where the design has none: extra). Panels marked {@code ?} get no observation
   * and so count as not inspected. Frame lines become observations of their members (see {@link
   * #frameFindings}).
   */
  public List<Observation> importAsBuiltMap(long inspectionId, long planeId, String fileName,
      String text, String recordedBy) {
    InspectionService inspections = new InspectionService(store, clock);
    Inspection inspection = inspections.inspection(inspectionId);
    if (inspection.isFinalised()) {
      throw new InspectionFinalisedException(inspectionId, "record observations from " + fileName);
    }
    PlaneRecord plane = new SiteService(store, clock).plane(planeId);
    PanelMap map = parseMap(fileName, text, MapKind.AS_BUILT);
    requireFits(map, fileName, plane);
    PlaneDesign design = inspections.designInForce(inspectionId, planeId).design();
    AsBuiltPlane found = map.toAsBuilt(plane.grid());
    String by = recordedBy == null || recordedBy.isBlank() ? inspection.inspectorName() : recordedBy;
    return store.inTransaction(() -> {
      List<Observation> stored = new ArrayList<>();
      for (int lift = 1; lift <= plane.grid().lifts(); lift++) {
        for (int bay = 1; bay <= plane.grid().bays(); bay++) {
          PanelRef p = PanelRef.of(lift, bay);
          if (found.isUninspected(p)) {
            continue;
          }
          PanelFinding f = findingFor(design.braceAt(p), found.memberAt(p));
          stored.add(inspections.recordObservation(inspectionId, new NewObservation(planeId, p,
              f.state(), f.memberFound(), null, null, null, "from panel map " + fileName, by)));
        }
      }
      frameFindings(map, design).forEach((member, state) ->
          stored.add(inspections.recordObservation(inspectionId, new NewObservation(planeId, null,
              state, null, null, null, null, "from panel map " + fileName, by, member))));
      return stored;
    });
  }

  /**
   * The frame-member states that make the as-built plane carry exactly the map's frame: each frame
   * line's state ({@code sound}, {@code damaged} effective, {@code ineffective}, {@code missing},
   * {@code ?} not inspected), and {@code extra} for a member the design leaves out that the map
   * has there (listed sound or damaged, or not listed: an as-built map's unlisted members are
   * there). Members the design has and the map does not list are not recorded (taken as
   * designed). In member order.
   */
  static Map<FrameRef, PanelState> frameFindings(PanelMap map, PlaneDesign design) {
    Map<FrameRef, PanelState> out = new java.util.TreeMap<>();
    for (FrameRef omitted : design.omittedFrame()) {
      out.put(omitted, PanelState.EXTRA);
    }
    for (PanelMap.FrameLine line : map.frameLines()) {
      FrameRef m = line.member();
      PanelState state = switch (line.state()) {
        case SOUND -> PanelState.SOUND;
        case DAMAGED -> PanelState.DAMAGED_EFFECTIVE;
        case INEFFECTIVE -> PanelState.DAMAGED_INEFFECTIVE;
        case MISSING -> PanelState.MISSING;
        case UNKNOWN -> PanelState.NOT_INSPECTED;
        case NONE -> throw new IllegalStateException("a design state in an as-built map");
      };
      if (!design.hasFrameMember(m) && state.effective()) {
        state = PanelState.EXTRA;
      }
      out.put(m, state);
    }
    return out;
  }

  /**
   * The finding that makes the as-built plane carry exactly {@code found} where the design has
   * {@code designed}.
   */
  static PanelFinding findingFor(Brace designed, Brace found) {
    if (Objects.equals(designed, found)) {
      return PanelFinding.of(PanelState.SOUND);
    }
    if (designed == null) {
      return new PanelFinding(PanelState.EXTRA, found);
    }
    if (found == null) {
      return PanelFinding.of(PanelState.MISSING);
    }
    boolean covers = found.kind() == designed.kind()
        && found.diagonal().memberCount() >= designed.diagonal().memberCount();
    return new PanelFinding(covers ? PanelState.SOUND : PanelState.MISSING, found);
  }

  /** The latest design revision of a plane as a panel map. */
  public String exportDesignMap(long planeId) {
    SiteService sites = new SiteService(store, clock);
    PlaneRecord plane = sites.plane(planeId);
    DesignRevision d = sites.currentDesign(planeId);
    return mapWriter.write(d.design(), "plane '" + plane.name() + "', design revision "
        + d.number() + " of " + d.date() + (d.author().isEmpty() ? "" : ", " + d.author()));
  }

  /** A plane as found in an inspection (latest observations; {@code ?} where none) as a panel map. */
  public String exportAsBuiltMap(long inspectionId, long planeId) {
    InspectionService inspections = new InspectionService(store, clock);
    PlaneRecord plane = new SiteService(store, clock).plane(planeId);
    Inspection inspection = inspections.inspection(inspectionId);
    return mapWriter.write(inspections.asBuilt(inspectionId, planeId), "plane '" + plane.name()
        + "' as found in inspection " + inspectionId + " (" + inspection.reason().label() + ", "
        + inspection.status().label() + ")");
  }

  private Inspection inspection(long id) {
    return store.inspections().find(id).orElseThrow(() -> new NotFoundException("inspection " + id));
  }
}
