package org.bracewalk.app.report;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.OutputFiles;
import org.bracewalk.app.damage.BowLimits;
import org.bracewalk.app.damage.RackMember;
import org.bracewalk.core.analysis.BuiltFrame;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.port.DocumentSigner;
import org.bracewalk.core.port.DocumentStampReader;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.RepairOrderRenderer;
import org.bracewalk.core.port.ReportRenderer;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.DocumentStamp;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.FindingPhoto;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.MotionSketch;
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
  private final DocumentSigner signer;
  private final Clock clock;

  /** A report service issuing unsigned documents. */
  public ReportService(AppServices services, PlaneAnalyzer analyzer, ReportRenderer reports,
      RepairOrderRenderer orders, DocumentStampReader stamps, Clock clock) {
    this(services, analyzer, reports, orders, stamps, DocumentSigner.NONE, clock);
  }

  /** A report service whose reports and repair orders {@code signer} signs. */
  public ReportService(AppServices services, PlaneAnalyzer analyzer, ReportRenderer reports,
      RepairOrderRenderer orders, DocumentStampReader stamps, DocumentSigner signer, Clock clock) {
    this.services = Objects.requireNonNull(services, "services");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.reports = Objects.requireNonNull(reports, "reports");
    this.orders = Objects.requireNonNull(orders, "orders");
    this.stamps = Objects.requireNonNull(stamps, "stamps");
    this.signer = Objects.requireNonNull(signer, "signer");
    this.clock = Objects.requireNonNull(clock, "clock");
  }

  /** True when issued reports and repair orders carry a digital signature. */
  public boolean signs() {
    return signer.signs();
  }

  // ---- records and fingerprint --------------------------------------------------------------

  /** Every record the inspection's report rests on, read in one transaction. */
  public InspectionRecords records(long inspectionId) {
    RecordStore store = services.store();
    return store.inTransaction(() -> {
      Inspection inspection = services.inspections().inspection(inspectionId);
      Structure structure = services.inspections().structureOf(inspection);
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
      return new InspectionRecords(site, structure, inspection, planes, orderRecords,
          identities(store, site, structure, inspection, planes, orderRecords));
    });
  }

  /** The global identities of every record the fingerprint names, read in bulk. */
  private static InspectionRecords.Identities identities(RecordStore store, Site site,
      Structure structure, Inspection inspection, List<InspectionRecords.PlaneRecords> planes,
      List<InspectionRecords.OrderRecords> orders) {
    Map<Kind, Set<Long>> wanted = new EnumMap<>(Kind.class);
    for (Kind k : Kind.values()) {
      wanted.put(k, new HashSet<>());
    }
    wanted.get(Kind.SITE).add(site.id());
    wanted.get(Kind.STRUCTURE).add(structure.id());
    wanted.get(Kind.INSPECTION).add(inspection.id());
    for (InspectionRecords.PlaneRecords p : planes) {
      wanted.get(Kind.PLANE).add(p.plane().id());
      wanted.get(Kind.DESIGN_REVISION).add(p.design().id());
      for (Observation o : p.observations()) {
        wanted.get(Kind.OBSERVATION).add(o.id());
      }
      p.photos().values().forEach(list -> list.forEach(ph -> wanted.get(Kind.PHOTO).add(ph.id())));
    }
    for (InspectionRecords.OrderRecords o : orders) {
      wanted.get(Kind.REPAIR_ORDER).add(o.order().id());
      for (RepairAction a : o.actions()) {
        wanted.get(Kind.REPAIR_ACTION).add(a.id());
        if (a.verifiedByInspectionId() != null) {
          wanted.get(Kind.INSPECTION).add(a.verifiedByInspectionId());
        }
      }
    }
    Map<Kind, Map<Long, String>> found = new EnumMap<>(Kind.class);
    wanted.forEach((k, ids) -> {
      if (!ids.isEmpty()) {
        found.put(k, store.identities().uuidsOf(k, ids));
      }
    });
    return new InspectionRecords.Identities(found);
  }

  /** The fingerprint new documents carry (the current canonical form). */
  public RecordFingerprint fingerprint(long inspectionId) {
    return RecordFingerprinter.fingerprint(records(inspectionId), RecordFingerprinter.SCHEME_2);
  }

  // ---- the report -----------------------------------------------------------------------------

  /** The report's content, particulars unchecked (see {@link #reportPdf}). */
  public ReportContent reportContent(long inspectionId) {
    return content(records(inspectionId));
  }

  /**
   * The report as a PDF, signed when a certificate is configured: the final bytes. Refused,
   * naming every one, while a recorded particular is empty.
   *
   * @throws MissingParticularsException when particulars are missing; nothing is made then
   */
  public byte[] reportPdf(long inspectionId) {
    return reportPdf(reportContent(inspectionId));
  }

  /** {@link #reportPdf(long)} from content already gathered. */
  public byte[] reportPdf(ReportContent content) {
    List<Particular> missing =
        content.particulars().missing(content.header().requiredParticulars());
    if (!missing.isEmpty()) {
      throw new MissingParticularsException(Long.parseLong(content.header().inspectionId()), missing,
          content.header().jurisdiction());
    }
    ByteArrayOutputStream out = new ByteArrayOutputStream(128 * 1024);
    try {
      reports.renderReport(content, out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return signer.sign(out.toByteArray(),
        "inspection report of inspection " + content.header().inspectionId());
  }

  /**
   * Issues the report: its final bytes (signed when a certificate is configured) are registered
   * as issued and written to {@code out} (through a temporary file beside it, so what stands under
   * the name is always a registered copy).
   *
   * @return the register's row
   * @throws MissingParticularsException when particulars are missing; nothing is written then
   */
  public IssuedReport issueReport(ReportContent content, Path out) {
    return issueReport(content, out, services.outputs());
  }

  /**
   * {@link #issueReport(ReportContent, Path)} written through {@code outputs} (a command's, which
   * also guards the files it reads): the target is checked before the report is drawn.
   */
  public IssuedReport issueReport(ReportContent content, Path out, OutputFiles outputs) {
    outputs.check(out);
    return writeReport(content, out, outputs);
  }

  /** Draws, signs, registers and writes the report; the target is checked already. */
  private IssuedReport writeReport(ReportContent content, Path out, OutputFiles outputs) {
    byte[] pdf = reportPdf(content);
    long id = Long.parseLong(content.header().inspectionId());
    String records = content.fingerprint().sha256();
    return outputs.writeAll(List.of(OutputFiles.Staged.of(out, pdf)),
        () -> register(id, IssuedReport.Kind.INSPECTION_REPORT, out, pdf, records));
  }

  /**
   * Issues the repair order as a PDF at {@code pdfOut} and, when {@code csvOut} is not null, the
   * same actions as CSV; both are registered as issued in one transaction before they take their
   * names.
   *
   * @return the register's rows: the PDF's, then the CSV's
   */
  public List<IssuedReport> issueRepairOrder(RepairOrderContent order, Path pdfOut, Path csvOut) {
    return issueRepairOrder(order, pdfOut, csvOut, services.outputs());
  }

  /** {@link #issueRepairOrder(RepairOrderContent, Path, Path)} written through {@code outputs}. */
  public List<IssuedReport> issueRepairOrder(RepairOrderContent order, Path pdfOut, Path csvOut,
      OutputFiles outputs) {
    outputs.check(pdfOut, csvOut);
    return writeRepairOrder(order, pdfOut, csvOut, outputs);
  }

  /** Draws, signs, registers and writes the repair order; the targets are checked already. */
  private List<IssuedReport> writeRepairOrder(RepairOrderContent order, Path pdfOut, Path csvOut,
      OutputFiles outputs) {
    byte[] pdf = repairOrderPdf(order);
    long id = Long.parseLong(order.header().inspectionId());
    String records = order.fingerprint().sha256();
    List<OutputFiles.Staged> files = new ArrayList<>();
    files.add(OutputFiles.Staged.of(pdfOut, pdf));
    byte[] csv = csvOut == null ? null
        : repairOrderCsv(order).getBytes(java.nio.charset.StandardCharsets.UTF_8);
    if (csv != null) {
      files.add(OutputFiles.Staged.of(csvOut, csv));
    }
    return outputs.writeAll(files, () -> services.store().inTransaction(() -> {
      List<IssuedReport> rows = new ArrayList<>();
      rows.add(register(id, IssuedReport.Kind.REPAIR_ORDER, pdfOut, pdf, records));
      if (csv != null) {
        rows.add(register(id, IssuedReport.Kind.REPAIR_ORDER_CSV, csvOut, csv, records));
      }
      return rows;
    }));
  }

  /**
   * The report use case as a front end calls it: checks the target, gathers the inspection's
   * records, draws, signs when configured, registers and writes the report (see {@link
   * #issueReport(ReportContent, Path, OutputFiles)}), telling {@code progress} as it goes.
   */
  public Issued.Report issueReport(long inspectionId, Path out, OutputFiles outputs,
      Issued.Progress progress) {
    outputs.check(out);
    progress.at(0.1, "reading the inspection's records");
    ReportContent content = reportContent(inspectionId);
    progress.at(0.4, "drawing the report" + (signs() ? " and signing it" : ""));
    IssuedReport row = writeReport(content, out, outputs);
    return new Issued.Report(row, inspectionId, content.header().draft(), content.planes().size(),
        content.findings().size(), content.actions().size(), planeLines(content),
        content.fingerprint().sha256(), signs());
  }

  /**
   * The repair-order use case as a front end calls it: the PDF at {@code pdfOut} and, when {@code
   * csvOut} is not null, the CSV, both checked before anything is drawn and registered together.
   */
  public Issued.RepairOrder issueRepairOrder(long inspectionId, Path pdfOut, Path csvOut,
      OutputFiles outputs, Issued.Progress progress) {
    outputs.check(pdfOut, csvOut);
    progress.at(0.1, "reading the inspection's records");
    RepairOrderContent order = repairOrderContent(inspectionId);
    progress.at(0.4, "drawing the repair order" + (signs() ? " and signing it" : ""));
    List<IssuedReport> rows = writeRepairOrder(order, pdfOut, csvOut, outputs);
    return new Issued.RepairOrder(rows, order.actions().size(), signs());
  }

  /** One line per plane: its name, verdict and, where anything must be kept off, where. */
  static List<String> planeLines(ReportContent c) {
    List<String> lines = new ArrayList<>();
    for (PlaneSection p : c.planes()) {
      org.bracewalk.app.verdict.Verdict v =
          org.bracewalk.app.verdict.Verdict.of(p.analysis(), p.role(), !p.findings().isEmpty());
      lines.add(p.name() + ": " + v.headline()
          + (v.keepOffZone().isPresent() ? ". " + v.keepOff() : ""));
    }
    return lines;
  }

  /** Adds a document's exact bytes to the register of issued documents. */
  IssuedReport register(long inspectionId, IssuedReport.Kind kind, Path file, byte[] bytes,
      String recordsFingerprint) {
    return services.store().issuedReports().add(IssuedReport.issued(inspectionId, kind,
        file.getFileName().toString(), RecordFingerprinter.sha256(bytes), recordsFingerprint,
        clock.instant()));
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

  /** The repair order as a PDF, signed when a certificate is configured: the final bytes. */
  public byte[] repairOrderPdf(RepairOrderContent content) {
    ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
    try {
      orders.renderRepairOrder(content, out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return signer.sign(out.toByteArray(),
        "repair order of inspection " + content.header().inspectionId());
  }

  public static String repairOrderCsv(RepairOrderContent content) {
    return RepairOrderCsv.write(content.actions());
  }

  // ---- checking a document --------------------------------------------------------------------

  /**
   * Checks a document against the register of issued documents and the records. It matches only
   * when (a) its SHA-256 is that of a copy this database issued, (b) its stamp names that same
   * registered document (inspection, kind, records fingerprint), and (c) the inspection's records
   * now give the registered fingerprint. Anything else differs, and each difference is named. A
   * document with no stamp is not ours, unless its bytes are a registered CSV repair order.
   *
   * <p>A copy registered before the register kept record fingerprints (origin
   * {@code before-register}) is checked against the fingerprint its own stamp carries: its bytes,
   * stamp included, are shown unchanged by the registered SHA-256. A row brought in by a site-file
   * import vouches for nothing: another database issued it.
   */
  public Verification verify(byte[] document) {
    Optional<DocumentStamp> read;
    try {
      read = stamps.readStamp(new ByteArrayInputStream(document));
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    String bytesHash = RecordFingerprinter.sha256(document);
    List<IssuedReport> copies = services.store().issuedReports().withBytes(bytesHash);
    if (read.isEmpty()) {
      return verifyUnstamped(copies);
    }
    DocumentStamp stamp = read.get();
    long stamped;
    try {
      stamped = Long.parseLong(stamp.inspectionId());
    } catch (NumberFormatException e) {
      return Verification.notOurs();
    }
    String where = services.store().location();
    // the second canonical form names the inspection by its global identity: the document may
    // have been issued from another copy of the records (a field file, the team server), where
    // the inspection has another local id
    List<String> earlyNotes = new ArrayList<>();
    Optional<String> uuid = inspectionUuid(stamp);
    if (uuid.isPresent()) {
      Optional<Long> local = services.store().identities().idOf(Kind.INSPECTION, uuid.get());
      if (local.isEmpty()) {
        return new Verification(Verification.Outcome.DIFFERS, stamp.kind(), stamp.inspectionId(),
            stamp.fingerprint().sha256(), List.of("the document is about inspection "
                + stamp.inspectionId() + " (global identity " + uuid.get() + "), which is not in "
                + where + " (sync the field file that holds it first)"),
            Optional.empty(), List.of());
      }
      if (local.get() != stamped) {
        earlyNotes.add("issued from another copy of the records (a field file or the team"
            + " server), where the inspection is " + stamped + "; in " + where + " it is "
            + local.get() + " (global identity " + uuid.get() + ")");
      }
      stamped = local.get();
    }
    final long id = stamped;
    List<String> differences = new ArrayList<>();
    List<String> notes = new ArrayList<>(earlyNotes);

    // (a) the bytes are those of a copy this database issued
    Optional<IssuedReport> copy = copies.stream()
        .filter(r -> r.origin() != IssuedReport.Origin.IMPORTED)
        .min(java.util.Comparator.comparing((IssuedReport r) -> !sameDocument(r, stamp, id)));
    if (copy.isEmpty()) {
      if (copies.isEmpty()) {
        differences.add("these bytes are not an issued copy (edited after issue, or never issued):"
            + " no document with SHA-256 " + bytesHash + " is in the register of " + where);
      } else {
        IssuedReport imported = copies.get(0);
        differences.add("these bytes are registered only through a site-file import (as "
            + imported.fileName() + ", issued " + imported.issuedAt() + "): another database issued"
            + " them, so " + where + " cannot vouch for them; check the document against the"
            + " database that issued it");
      }
    }

    // (b) the stamp names that same registered document
    if (copy.isPresent()) {
      IssuedReport r = copy.get();
      if (r.inspectionId() != id) {
        differences.add("stamp names inspection " + id + " but this document was issued for"
            + " inspection " + r.inspectionId());
      }
      if (!r.kind().label().equals(stamp.kind())) {
        differences.add("stamp says " + stamp.kind() + " but this document was issued as "
            + r.kind().label());
      }
      if (r.recordsFingerprint() != null
          && !r.recordsFingerprint().equals(stamp.fingerprint().sha256())) {
        differences.add("stamp carries records fingerprint " + stamp.fingerprint().sha256()
            + " but this document was issued with " + r.recordsFingerprint());
      }
      if (r.origin() == IssuedReport.Origin.BEFORE_REGISTER) {
        notes.add("registered before the register kept record fingerprints: the fingerprint is"
            + " taken from the document's own stamp, which its registered SHA-256 shows unchanged;"
            + " whether this database issued it or a site-file import brought the row in was not"
            + " recorded then (issue it again for a copy the register vouches for fully)");
      }
    } else {
      List<IssuedReport> named = services.store().issuedReports().ofInspection(id).stream()
          .filter(r -> r.origin() == IssuedReport.Origin.ISSUED && sameDocument(r, stamp, id))
          .toList();
      if (named.isEmpty()) {
        differences.add("stamp names no registered document: no " + stamp.kind()
            + " of inspection " + id + " with records fingerprint " + stamp.fingerprint().sha256()
            + " was issued from " + where);
      } else {
        IssuedReport n = named.get(named.size() - 1);
        differences.add("stamp names the " + stamp.kind() + " of inspection " + id + " issued as "
            + n.fileName() + " at " + n.issuedAt() + ", but this file is not that copy");
      }
    }

    // (c) the records still give the fingerprint the document was issued with
    String issuedWith = copy.map(IssuedReport::recordsFingerprint)
        .orElse(stamp.fingerprint().sha256());
    if (issuedWith == null) {
      issuedWith = stamp.fingerprint().sha256();
    }
    Optional<Inspection> inspection = services.store().inspections().find(id);
    if (inspection.isEmpty()) {
      differences.add("records changed since issue: inspection " + id + " is not in " + where);
    } else {
      InspectionRecords records = records(id);
      RecordFingerprint carried = stamp.fingerprint();
      boolean known = carried.scheme().equals(RecordFingerprinter.SCHEME_1)
          || carried.scheme().equals(RecordFingerprinter.SCHEME_2);
      // a document is checked in the canonical form it was issued with
      RecordFingerprint now = RecordFingerprinter.fingerprint(records,
          known ? carried.scheme() : RecordFingerprinter.SCHEME_2);
      if (!known) {
        differences.add("the document uses canonical form " + carried.scheme()
            + "; this program computes " + RecordFingerprinter.SCHEME_1 + " and "
            + RecordFingerprinter.SCHEME_2);
      } else if (!issuedWith.equals(now.sha256())) {
        List<String> sections = carried.sha256().equals(issuedWith)
            ? compare(carried.sections(), now.sections(), records) : List.of();
        if (sections.isEmpty()) {
          differences.add("records changed since issue: the records of inspection " + id
              + " now give fingerprint " + now.sha256() + ", not " + issuedWith);
        } else {
          differences.addAll(sections);
        }
      }
    }
    return new Verification(
        differences.isEmpty() ? Verification.Outcome.MATCH : Verification.Outcome.DIFFERS,
        stamp.kind(), stamp.inspectionId(), issuedWith, differences, copy, notes);
  }

  /**
   * The inspection's global identity a document of the second canonical form carries (its section
   * {@code inspection <uuid>}); empty for the first form.
   */
  static Optional<String> inspectionUuid(DocumentStamp stamp) {
    if (!stamp.fingerprint().scheme().equals(RecordFingerprinter.SCHEME_2)) {
      return Optional.empty();
    }
    return stamp.fingerprint().sections().stream().map(SectionDigest::name)
        .filter(n -> n.startsWith(RecordFingerprinter.INSPECTION_SECTION_2))
        .map(n -> n.substring(RecordFingerprinter.INSPECTION_SECTION_2.length()))
        .findFirst();
  }

  /** True when the register row is the document the stamp names. */
  private static boolean sameDocument(IssuedReport r, DocumentStamp stamp, long id) {
    return r.inspectionId() == id && r.kind().label().equals(stamp.kind())
        && (r.recordsFingerprint() == null
            || r.recordsFingerprint().equals(stamp.fingerprint().sha256()));
  }

  /** A file with no stamp: ours only when its bytes are a registered CSV repair order. */
  private Verification verifyUnstamped(List<IssuedReport> copies) {
    Optional<IssuedReport> csv = copies.stream()
        .filter(r -> r.origin() == IssuedReport.Origin.ISSUED
            && r.kind() == IssuedReport.Kind.REPAIR_ORDER_CSV)
        .reduce((first, second) -> second);
    if (csv.isEmpty()) {
      return Verification.notOurs();
    }
    IssuedReport r = csv.get();
    List<String> differences = new ArrayList<>();
    String where = services.store().location();
    if (services.store().inspections().find(r.inspectionId()).isEmpty()) {
      differences.add("records changed since issue: inspection " + r.inspectionId()
          + " is not in " + where);
    } else {
      String now = fingerprint(r.inspectionId()).sha256();
      if (!now.equals(r.recordsFingerprint())) {
        differences.add("records changed since issue: the records of inspection "
            + r.inspectionId() + " now give fingerprint " + now + ", not "
            + r.recordsFingerprint() + " (a CSV carries no section digests; issue the repair"
            + " order again, or check its PDF, to see which records changed)");
      }
    }
    return new Verification(
        differences.isEmpty() ? Verification.Outcome.MATCH : Verification.Outcome.DIFFERS,
        r.kind().label(), String.valueOf(r.inspectionId()), r.recordsFingerprint(), differences,
        Optional.of(r), List.of());
  }

  private static List<String> compare(List<SectionDigest> then, List<SectionDigest> now,
      InspectionRecords records) {
    Map<String, String> a = new LinkedHashMap<>();
    then.forEach(d -> a.put(d.name(), d.sha256()));
    Map<String, String> b = new LinkedHashMap<>();
    now.forEach(d -> b.put(d.name(), d.sha256()));
    // a section names a plane by its id (first form) or its global identity (second form)
    Map<String, PlaneRecord> planeNames = new HashMap<>();
    records.planes().forEach(p -> {
      planeNames.put(String.valueOf(p.plane().id()), p.plane());
      if (records.identities().byKind().containsKey(Kind.PLANE)) {
        planeNames.put(records.identities().uuid(Kind.PLANE, p.plane().id()), p.plane());
      }
    });
    List<String> out = new ArrayList<>();
    for (Map.Entry<String, String> e : a.entrySet()) {
      String nowDigest = b.get(e.getKey());
      if (nowDigest == null) {
        out.add("records changed since issue: no longer in the database: "
            + describe(e.getKey(), planeNames));
      } else if (!nowDigest.equals(e.getValue())) {
        out.add("records changed since issue: " + describe(e.getKey(), planeNames));
      }
    }
    for (String name : b.keySet()) {
      if (!a.containsKey(name)) {
        out.add("records changed since issue: new in the database: " + describe(name, planeNames));
      }
    }
    return out;
  }

  /**
   * "plane 3 observations" (or "plane UUID observations") as "the observations of plane 'frame 2'
   * (id 3)".
   */
  static String describe(String section, Map<String, PlaneRecord> planes) {
    String[] parts = section.split(" ");
    if (parts.length == 3 && parts[0].equals("plane")) {
      PlaneRecord plane = planes.get(parts[1]);
      if (plane != null) {
        return "the " + parts[2] + " of plane '" + plane.name() + "' (id " + plane.id() + ")";
      }
      return "the " + parts[2] + " of plane " + parts[1];
    }
    if (section.startsWith(RecordFingerprinter.INSPECTION_SECTION_2)) {
      return "the inspection record";
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
      Map<FrameRef, Observation> latestFrame = latestFrame(p.observations());
      Map<PanelRef, PanelFinding> panelFindings = new TreeMap<>();
      latest.forEach((panel, o) -> panelFindings.put(panel, o.finding()));
      Map<FrameRef, PanelState> frameFindings = new TreeMap<>();
      latestFrame.forEach((member, o) -> frameFindings.put(member, o.state()));
      PlaneDesign design = p.design().design();
      AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, panelFindings, frameFindings);
      PlaneAnalysis analysis = analyzer.analyse(design, asBuilt);
      String name = p.plane().name();
      sections.add(new PlaneSection(name, design, asBuilt, panelFindings, analysis,
          new PlaneSection.DesignRef(p.design().number(), p.design().date(), p.design().author()),
          p.plane().role(), frameFindings, sketch(analysis, asBuilt)));
      List<Observation> notSound = new ArrayList<>(latest.values());
      notSound.addAll(latestFrame.values());
      for (Observation o : notSound) {
        if (o.state() == PanelState.SOUND) {
          continue;
        }
        BowAssessment bow = null;
        if (racking && o.bowMm() != null && !o.isFrameMember()) {
          LocalDate day = o.recordedAt().atZone(zone).toLocalDate();
          bow = BowLimits.assess(RackMember.BRACING, o.bowMm(), o.gaugeLengthMm(), day);
          bows.computeIfAbsent(name, k -> new HashMap<>()).put(o.panel(), bow);
        }
        List<FindingPhoto> photos = p.photos().getOrDefault(o.id(), List.of()).stream()
            .map(ph -> new FindingPhoto(ph.data(), "")).toList();
        findings.add(new Finding(name, o.panel(), o.state(),
            o.defect() == null ? "" : o.defect().label(), o.bowMm(),
            o.gaugeLengthMm() == null ? null : o.gaugeLengthMm().doubleValue(), bow, o.note(),
            o.recordedAt(), o.recordedBy(), photos, o.frameMember()));
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
            a.description(), a.dueDate(), a.doneAt(), a.doneBy(), a.frameMember()));
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
        clock.instant(), site.jurisdiction());
    return new ReportContent(header, particulars, sections, findings, steps,
        RecordFingerprinter.fingerprint(r, RecordFingerprinter.SCHEME_2));
  }

  /**
   * The observation that counts per panel: the latest one no correction supersedes (observations
   * of frame members are left out: see {@link #latestFrame}).
   */
  static Map<PanelRef, Observation> latest(List<Observation> rows) {
    Set<Long> superseded = superseded(rows);
    Map<PanelRef, Observation> out = new TreeMap<>();
    for (Observation o : rows) {
      if (!o.isFrameMember() && !superseded.contains(o.id())) {
        out.put(o.panel(), o);
      }
    }
    return out;
  }

  /** The observation that counts per frame member: the latest one no correction supersedes. */
  static Map<FrameRef, Observation> latestFrame(List<Observation> rows) {
    Set<Long> superseded = superseded(rows);
    Map<FrameRef, Observation> out = new TreeMap<>();
    for (Observation o : rows) {
      if (o.isFrameMember() && !superseded.contains(o.id())) {
        out.put(o.frameMember(), o);
      }
    }
    return out;
  }

  private static Set<Long> superseded(List<Observation> rows) {
    Set<Long> superseded = new HashSet<>();
    for (Observation o : rows) {
      if (o.supersedes() != null) {
        superseded.add(o.supersedes());
      }
    }
    return superseded;
  }

  /**
   * The motion the report sketches where the analysed frame is incomplete: the engine's motion of
   * the first swaying part, else of the first freedom of any kind; {@code null} when the frame is
   * complete (the sketch then turns the engine's blocks: an exact finite motion that costs nothing
   * more on the largest planes), when the state lists no freedom, or when the engine gives no
   * motion.
   */
  MotionSketch sketch(PlaneAnalysis analysis, AsBuiltPlane asBuilt) {
    StateAnalysis state = analysis.analysedState();
    if (state.rigid() || state.frameComplete() || state.freedoms().isEmpty()) {
      return null;
    }
    Freedom shown = state.freedoms().stream().filter(f -> f.kind() == FreedomKind.SWAY)
        .findFirst().orElse(state.freedoms().get(0));
    Set<FrameRef> absent = new HashSet<>(asBuilt.absentFrame());
    absent.addAll(asBuilt.unknownFrame());
    BuiltFrame built = new BuiltFrame(asBuilt.grid(), asBuilt.members(), absent);
    return analyzer.motion(built, shown).map(m -> new MotionSketch(shown, m)).orElse(null);
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
      case REFIT -> RepairStepKind.REFIT;
    };
  }
}
