package org.bracewalk.app.report;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.damage.BowLimits;
import org.bracewalk.app.damage.RackMember;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.port.DocumentStampReader;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.RepairOrderRenderer;
import org.bracewalk.core.port.ReportRenderer;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.DocumentStamp;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.FindingPhoto;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.Particular;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.RecordedOrder;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.ReportHeader;
import org.bracewalk.core.port.report.ReportParticulars;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * The inspection report, the repair order and the check of a document against the records.
 * Everything shown comes from one consistent read of the inspection's records (one transaction),
 * and the fingerprint is taken over exactly those records.
 */
public final class ReportService {
  private final AppServices services;
  private final PlaneAnalyzer analyzer;
  private final ReportRenderer reports;
  private final RepairOrderRenderer orders;
  private final DocumentStampReader stamps;
  private final Clock clock;

  public ReportService(AppServices services, PlaneAnalyzer analyzer, ReportRenderer reports,
      RepairOrderRenderer orders, DocumentStampReader stamps, Clock clock) {
    this.services = Objects.requireNonNull(services, "services");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.reports = Objects.requireNonNull(reports, "reports");
    this.orders = Objects.requireNonNull(orders, "orders");
    this.stamps = Objects.requireNonNull(stamps, "stamps");
    this.clock = Objects.requireNonNull(clock, "clock");
  }

  // ---- records and fingerprint --------------------------------------------------------------

  /** Every record the inspection's report rests on, read in one transaction. */
  public InspectionRecords records(long inspectionId) {
    RecordStore store = services.store();
    return store.inTransaction(() -> {
      Inspection inspection = services.inspections().inspection(inspectionId);
      Structure structure = services.sites().structure(inspection.structureId());
      Site site = services.sites().site(structure.siteId());
      List<Observation> rows = services.inspections().observations(inspectionId);
      Set<Long> withPhotos = new HashSet<>(store.observations().withPhotos(inspectionId));
      List<InspectionRecords.PlaneRecords> planes = new ArrayList<>();
      for (PlaneRecord plane : services.inspections().planesOf(inspectionId)) {
        DesignRevision design = services.inspections().designInForce(inspectionId, plane.id());
        List<Observation> own = rows.stream().filter(o -> o.planeId() == plane.id()).toList();
        Map<Long, List<Photo>> photos = new HashMap<>();
        for (Observation o : own) {
          if (withPhotos.contains(o.id())) {
            photos.put(o.id(), services.inspections().photos(o.id()));
          }
        }
        planes.add(new InspectionRecords.PlaneRecords(plane, design, own, photos));
      }
      List<InspectionRecords.OrderRecords> orderRecords = new ArrayList<>();
      for (RepairOrder o : store.repairs().ordersOf(inspectionId)) {
        orderRecords.add(new InspectionRecords.OrderRecords(o, store.repairs().actionsOf(o.id())));
      }
      return new InspectionRecords(site, structure, inspection, planes, orderRecords);
    });
  }

  public RecordFingerprint fingerprint(long inspectionId) {
    return RecordFingerprinter.fingerprint(records(inspectionId));
  }

  // ---- the report -----------------------------------------------------------------------------

  /** The report's content, particulars unchecked (see {@link #reportPdf}). */
  public ReportContent reportContent(long inspectionId) {
    return content(records(inspectionId));
  }

  /**
   * The report as a PDF. Refused, naming every one, while a recorded particular is empty.
   *
   * @throws MissingParticularsException when particulars are missing; nothing is made then
   */
  public byte[] reportPdf(long inspectionId) {
    return reportPdf(reportContent(inspectionId));
  }

  /** {@link #reportPdf(long)} from content already gathered. */
  public byte[] reportPdf(ReportContent content) {
    List<Particular> missing = content.particulars().missing(content.header().racking());
    if (!missing.isEmpty()) {
      throw new MissingParticularsException(Long.parseLong(content.header().inspectionId()), missing);
    }
    ByteArrayOutputStream out = new ByteArrayOutputStream(128 * 1024);
    try {
      reports.renderReport(content, out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }

  /** Remembers that {@code pdf} was issued as {@code fileName} for the inspection. */
  public IssuedReport recordIssued(long inspectionId, String fileName, byte[] pdf) {
    return services.store().issuedReports().add(new IssuedReport(0, inspectionId, fileName,
        RecordFingerprinter.sha256(pdf), clock.instant()));
  }

  // ---- the repair order -----------------------------------------------------------------------

  public RepairOrderContent repairOrderContent(long inspectionId) {
    ReportContent c = reportContent(inspectionId);
    Set<String> named = new HashSet<>();
    c.actions().forEach(a -> named.add(a.plane()));
    List<PlaneSection> planes = c.planes().stream().filter(p -> named.contains(p.name())).toList();
    return new RepairOrderContent(c.header(), c.particulars().inspectedAt(), planes, c.actions(),
        c.fingerprint());
  }

  public byte[] repairOrderPdf(RepairOrderContent content) {
    ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
    try {
      orders.renderRepairOrder(content, out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }

  public static String repairOrderCsv(RepairOrderContent content) {
    return RepairOrderCsv.write(content.actions());
  }

  // ---- checking a document --------------------------------------------------------------------

  /** Checks a document's fingerprint against the records it names. */
  public Verification verify(byte[] document) {
    Optional<DocumentStamp> read;
    try {
      read = stamps.readStamp(new ByteArrayInputStream(document));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    if (read.isEmpty()) {
      return Verification.notOurs();
    }
    DocumentStamp stamp = read.get();
    RecordFingerprint carried = stamp.fingerprint();
    long id;
    try {
      id = Long.parseLong(stamp.inspectionId());
    } catch (NumberFormatException e) {
      return Verification.notOurs();
    }
    List<String> differences = new ArrayList<>();
    Optional<Inspection> inspection = services.store().inspections().find(id);
    if (inspection.isEmpty()) {
      differences.add("inspection " + id + " is not in " + services.store().location());
      return new Verification(Verification.Outcome.DIFFERS, stamp.kind(), stamp.inspectionId(),
          carried.sha256(), differences, Optional.empty());
    }
    InspectionRecords records = records(id);
    RecordFingerprint now = RecordFingerprinter.fingerprint(records);
    if (!carried.scheme().equals(now.scheme())) {
      differences.add("the document uses canonical form " + carried.scheme()
          + "; this program computes " + now.scheme());
    } else if (!carried.sha256().equals(now.sha256())) {
      differences.addAll(compare(carried.sections(), now.sections(), records));
      if (differences.isEmpty()) {
        differences.add("the fingerprint differs although every section matches: the document's"
            + " fingerprint was altered");
      }
    }
    String fileHash = RecordFingerprinter.sha256(document);
    Optional<IssuedReport> copy = services.store().issuedReports().ofInspection(id).stream()
        .filter(r -> r.fingerprint().equals(fileHash)).findFirst();
    return new Verification(
        differences.isEmpty() ? Verification.Outcome.MATCH : Verification.Outcome.DIFFERS,
        stamp.kind(), stamp.inspectionId(), carried.sha256(), differences, copy);
  }

  private static List<String> compare(List<SectionDigest> then, List<SectionDigest> now,
      InspectionRecords records) {
    Map<String, String> a = new LinkedHashMap<>();
    then.forEach(d -> a.put(d.name(), d.sha256()));
    Map<String, String> b = new LinkedHashMap<>();
    now.forEach(d -> b.put(d.name(), d.sha256()));
    Map<Long, String> planeNames = new HashMap<>();
    records.planes().forEach(p -> planeNames.put(p.plane().id(), p.plane().name()));
    List<String> out = new ArrayList<>();
    for (Map.Entry<String, String> e : a.entrySet()) {
      String nowDigest = b.get(e.getKey());
      if (nowDigest == null) {
        out.add("no longer in the database: " + describe(e.getKey(), planeNames));
      } else if (!nowDigest.equals(e.getValue())) {
        out.add("changed since the document was made: " + describe(e.getKey(), planeNames));
      }
    }
    for (String name : b.keySet()) {
      if (!a.containsKey(name)) {
        out.add("new in the database: " + describe(name, planeNames));
      }
    }
    return out;
  }

  /** "plane 3 observations" as "the observations of plane 'frame 2' (id 3)". */
  static String describe(String section, Map<Long, String> planeNames) {
    String[] parts = section.split(" ");
    if (parts.length == 3 && parts[0].equals("plane")) {
      try {
        long id = Long.parseLong(parts[1]);
        String name = planeNames.get(id);
        return "the " + parts[2] + " of plane " + (name == null ? "" : "'" + name + "' ")
            + "(id " + id + ")";
      } catch (NumberFormatException e) {
        return section;
      }
    }
    return switch (section) {
      case "repair orders" -> "the repair orders and their actions";
      default -> "the " + section + " record";
    };
  }

  // ---- content --------------------------------------------------------------------------------

  ReportContent content(InspectionRecords r) {
    Site site = r.site();
    Structure structure = r.structure();
    Inspection inspection = r.inspection();
    ZoneId zone = site.timeZone();
    boolean racking = structure.kind() == StructureKind.RACKING_RUN;
    List<PlaneSection> sections = new ArrayList<>();
    List<Finding> findings = new ArrayList<>();
    Map<String, Map<PanelRef, BowAssessment>> bows = new HashMap<>();
    for (InspectionRecords.PlaneRecords p : r.planes()) {
      Map<PanelRef, Observation> latest = latest(p.observations());
      Map<PanelRef, PanelFinding> panelFindings = new TreeMap<>();
      latest.forEach((panel, o) -> panelFindings.put(panel, o.finding()));
      AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(p.design().design(), panelFindings);
      PlaneAnalysis analysis = analyzer.analyse(p.design().design(), asBuilt);
      String name = p.plane().name();
      sections.add(new PlaneSection(name, p.design().design(), asBuilt, panelFindings, analysis,
          new PlaneSection.DesignRef(p.design().number(), p.design().date(), p.design().author())));
      for (Observation o : latest.values()) {
        if (o.state() == PanelState.SOUND) {
          continue;
        }
        BowAssessment bow = null;
        if (racking && o.bowMm() != null) {
          LocalDate day = o.recordedAt().atZone(zone).toLocalDate();
          bow = BowLimits.assess(RackMember.BRACING, o.bowMm(), o.gaugeLengthMm(), day);
          bows.computeIfAbsent(name, k -> new HashMap<>()).put(o.panel(), bow);
        }
        List<FindingPhoto> photos = p.photos().getOrDefault(o.id(), List.of()).stream()
            .map(ph -> new FindingPhoto(ph.data(), "")).toList();
        findings.add(new Finding(name, o.panel(), o.state(),
            o.defect() == null ? "" : o.defect().label(), o.bowMm(),
            o.gaugeLengthMm() == null ? null : o.gaugeLengthMm().doubleValue(), bow, o.note(),
            o.recordedAt(), o.recordedBy(), photos));
      }
    }
    LocalDate day = inspection.startedAt().atZone(zone).toLocalDate();
    List<RepairStep> steps = RepairSteps.plan(sections, bows, day);

    Map<Long, String> planeNames = new HashMap<>();
    r.planes().forEach(p -> planeNames.put(p.plane().id(), p.plane().name()));
    List<RecordedOrder> recorded = new ArrayList<>();
    for (InspectionRecords.OrderRecords or : r.orders()) {
      List<RecordedOrder.Action> actions = new ArrayList<>();
      for (RepairAction a : or.actions()) {
        actions.add(new RecordedOrder.Action(kind(a.action()),
            planeNames.getOrDefault(a.planeId(), "plane " + a.planeId()), a.panel(), a.brace(),
            a.description(), a.dueDate(), a.doneAt(), a.doneBy()));
      }
      recorded.add(new RecordedOrder(or.order().id(), or.order().createdAt(),
          or.order().createdBy(), or.order().note(), actions));
    }
    String forName = inspection.carriedOutForName().isBlank()
        ? site.clientName() : inspection.carriedOutForName();
    String forAddress = inspection.carriedOutForAddress().isBlank()
        ? site.clientAddress() : inspection.carriedOutForAddress();
    ReportParticulars particulars = new ReportParticulars(forName, forAddress, site.location(),
        structure.description(), inspection.startedAt(), recorded, inspection.inspectorName(),
        inspection.inspectorPosition(), inspection.competentPerson(), inspection.shift(),
        inspection.storageSafetyPerson());
    ReportHeader header = new ReportHeader(String.valueOf(inspection.id()), site.name(),
        structure.name(), kindCode(structure.kind()), inspection.reason().label(),
        structure.designReference(), inspection.isFinalised(), zone,
        site.units() == DisplayUnits.IMPERIAL ? LengthUnits.IMPERIAL : LengthUnits.METRIC,
        clock.instant());
    return new ReportContent(header, particulars, sections, findings, steps,
        RecordFingerprinter.fingerprint(r));
  }

  /** The observation that counts per panel: the latest one no correction supersedes. */
  static Map<PanelRef, Observation> latest(List<Observation> rows) {
    Set<Long> superseded = new HashSet<>();
    for (Observation o : rows) {
      if (o.supersedes() != null) {
        superseded.add(o.supersedes());
      }
    }
    Map<PanelRef, Observation> out = new TreeMap<>();
    for (Observation o : rows) {
      if (!superseded.contains(o.id())) {
        out.put(o.panel(), o);
      }
    }
    return out;
  }

  static String kindCode(StructureKind k) {
    return switch (k) {
      case SCAFFOLD -> "scaffold";
      case RACKING_RUN -> "racking";
      case OTHER_FRAME -> "other";
    };
  }

  static RepairStepKind kind(org.bracewalk.core.model.RepairActionKind k) {
    return switch (k) {
      case REPAIR -> RepairStepKind.REPAIR;
      case REPLACE -> RepairStepKind.REPLACE;
      case BRACE -> RepairStepKind.BRACE;
      case TAKE_OUT_OF_SERVICE -> RepairStepKind.TAKE_OUT_OF_SERVICE;
    };
  }
}
