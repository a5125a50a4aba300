package org.bracewalk.app.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Jurisdiction;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * The fingerprint of an inspection's records, in the canonical order and form documented in
 * DEVELOPERS.md ("Record fingerprint"): one SHA-256 per section (site, structure, inspection,
 * then for each plane by id its grid, design in force, observations and photos, then the repair
 * orders), and the fingerprint as the SHA-256 of the scheme name and the section digests. A
 * change to any field of any of these records changes its section's digest and the fingerprint.
 */
public final class RecordFingerprinter {
  /** The first canonical form: records named by their local row ids. Still verified. */
  public static final String SCHEME_1 = "bracewalk-records-1";

  /**
   * The second canonical form: records named by their global identities (UUIDs), so a document
   * verifies against any copy of the records (a field file, the team server). New documents
   * carry it.
   */
  public static final String SCHEME_2 = "bracewalk-records-2";

  /** The name of the first canonical form, as {@link #fingerprint(InspectionRecords)} computes. */
  public static final String SCHEME = SCHEME_1;

  /** The prefix of the v2 section that names the inspection: {@code inspection <uuid>}. */
  public static final String INSPECTION_SECTION_2 = "inspection ";

  private RecordFingerprinter() {}

  /** The fingerprint in the first canonical form ({@code bracewalk-records-1}). */
  public static RecordFingerprint fingerprint(InspectionRecords r) {
    return fingerprint(r, SCHEME_1);
  }

  /**
   * The fingerprint in the named canonical form: {@link #SCHEME_1} or {@link #SCHEME_2} (which
   * needs the records' global identities, {@link InspectionRecords#identities()}).
   *
   * @throws IllegalArgumentException for a scheme this program does not know
   */
  public static RecordFingerprint fingerprint(InspectionRecords r, String scheme) {
    Ids ids = switch (scheme) {
      case SCHEME_1 -> Ids.LOCAL;
      case SCHEME_2 -> r.identities()::uuid;
      default -> throw new IllegalArgumentException("unknown canonical form " + scheme);
    };
    boolean v2 = scheme.equals(SCHEME_2);
    List<SectionDigest> sections = new ArrayList<>();
    sections.add(section("site", site(r.site(), ids)));
    sections.add(section("structure", structure(r.structure(), ids)));
    sections.add(section(v2 ? INSPECTION_SECTION_2
        + ids.of(Kind.INSPECTION, r.inspection().id()) : "inspection",
        inspection(r.inspection(), ids)));
    List<InspectionRecords.PlaneRecords> planes = r.planes();
    if (v2) {
      planes = planes.stream().sorted(Comparator.comparing(
          (InspectionRecords.PlaneRecords p) -> ids.of(Kind.PLANE, p.plane().id()).toString()))
          .toList();
    }
    for (InspectionRecords.PlaneRecords p : planes) {
      Object id = ids.of(Kind.PLANE, p.plane().id());
      List<Observation> rows = v2 ? byUuid(p.observations(), Kind.OBSERVATION, Observation::id, ids)
          : p.observations();
      sections.add(section("plane " + id + " grid", grid(p.plane(), ids)));
      sections.add(section("plane " + id + " design", design(p.design(), ids)));
      sections.add(section("plane " + id + " observations", observations(rows, ids)));
      sections.add(section("plane " + id + " photos", photos(rows, p.photos(), ids, v2)));
    }
    List<InspectionRecords.OrderRecords> orders = r.orders();
    if (v2) {
      orders = byUuid(orders, Kind.REPAIR_ORDER, o -> o.order().id(), ids).stream()
          .map(o -> new InspectionRecords.OrderRecords(o.order(),
              byUuid(o.actions(), Kind.REPAIR_ACTION, RepairAction::id, ids)))
          .toList();
    }
    sections.add(section("repair orders", orders(orders, ids)));
    StringBuilder all = new StringBuilder(scheme).append('\n');
    for (SectionDigest d : sections) {
      all.append(d.name()).append('=').append(d.sha256()).append('\n');
    }
    return new RecordFingerprint(scheme, sha256(all.toString().getBytes(StandardCharsets.UTF_8)),
        sections);
  }

  /**
   * How a record is named in the canonical text: by its local id (the first form) or by its
   * global identity (the second). An absent reference stays absent.
   */
  @FunctionalInterface
  interface Ids {
    Ids LOCAL = (kind, id) -> id;

    Object name(Kind kind, long id);

    default Object of(Kind kind, Long id) {
      return id == null ? null : name(kind, id);
    }
  }

  private static <T> List<T> byUuid(List<T> rows, Kind kind, java.util.function.ToLongFunction<T> id,
      Ids ids) {
    return rows.stream()
        .sorted(Comparator.comparing((T t) -> ids.of(kind, id.applyAsLong(t)).toString()))
        .toList();
  }

  /** The SHA-256 of {@code bytes} in lower-case hex. */
  public static String sha256(byte[] bytes) {
    try {
      return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java runtime has SHA-256", e);
    }
  }

  private static SectionDigest section(String name, Canonical c) {
    return new SectionDigest(name, sha256(c.bytes()));
  }

  static Canonical site(Site s) {
    return site(s, Ids.LOCAL);
  }

  static Canonical site(Site s, Ids ids) {
    Canonical c = new Canonical().record("site")
        .field("id", ids.of(Kind.SITE, s.id())).field("name", s.name()).field("clientName", s.clientName())
        .field("clientAddress", s.clientAddress()).field("location", s.location())
        .field("timeZone", s.timeZone().getId()).field("units", s.units().label());
    // the report's citations and required particulars follow the jurisdiction; a site without
    // one (every site stored before V11) keeps its canonical text, so earlier documents verify
    if (s.jurisdiction() != Jurisdiction.OTHER) {
      c.field("jurisdiction", s.jurisdiction().label());
    }
    return c;
  }

  static Canonical structure(Structure s) {
    return structure(s, Ids.LOCAL);
  }

  static Canonical structure(Structure s, Ids ids) {
    return new Canonical().record("structure")
        .field("id", ids.of(Kind.STRUCTURE, s.id())).field("siteId", ids.of(Kind.SITE, s.siteId())).field("name", s.name())
        .field("kind", s.kind().label()).field("description", s.description())
        .field("designReference", s.designReference())
        .field("inspectionIntervalDays", s.inspectionIntervalDays());
  }

  static Canonical inspection(Inspection i) {
    return inspection(i, Ids.LOCAL);
  }

  static Canonical inspection(Inspection i, Ids ids) {
    return new Canonical().record("inspection")
        .field("id", ids.of(Kind.INSPECTION, i.id()))
        .field("structureId", ids.of(Kind.STRUCTURE, i.structureId()))
        .field("startedAt", i.startedAt()).field("finishedAt", i.finishedAt())
        .field("inspectorName", i.inspectorName()).field("inspectorPosition", i.inspectorPosition())
        .field("competentPerson", i.competentPerson()).field("shift", i.shift())
        .field("storageSafetyPerson", i.storageSafetyPerson())
        .field("reason", i.reason().label()).field("status", i.status().label())
        .field("carriedOutForName", i.carriedOutForName())
        .field("carriedOutForAddress", i.carriedOutForAddress());
  }

  static Canonical grid(PlaneRecord p) {
    return grid(p, Ids.LOCAL);
  }

  static Canonical grid(PlaneRecord p, Ids ids) {
    PlaneGrid g = p.grid();
    Canonical c = new Canonical().record("plane")
        .field("id", ids.of(Kind.PLANE, p.id()))
        .field("structureId", ids.of(Kind.STRUCTURE, p.structureId())).field("name", p.name())
        .field("lifts", g.lifts()).field("bays", g.bays()).field("support", g.support().label());
    for (int j = 0; j < g.bays(); j++) {
      c.field("widthMm", Math.round(g.bayWidths().get(j) * 1000));
    }
    for (int i = 0; i < g.lifts(); i++) {
      c.field("heightMm", Math.round(g.liftHeights().get(i) * 1000));
    }
    return c;
  }

  static Canonical design(DesignRevision d) {
    return design(d, Ids.LOCAL);
  }

  static Canonical design(DesignRevision d, Ids ids) {
    Canonical c = new Canonical().record("design")
        .field("id", ids.of(Kind.DESIGN_REVISION, d.id()))
        .field("planeId", ids.of(Kind.PLANE, d.planeId())).field("number", d.number())
        .field("author", d.author()).field("date", d.date()).field("approvalNote", d.approvalNote())
        .field("recordedAt", d.recordedAt());
    for (Map.Entry<PanelRef, Brace> e : new TreeMap<>(d.design().braces()).entrySet()) {
      c.record("brace").field("lift", e.getKey().lift()).field("bay", e.getKey().bay())
          .field("member", e.getValue().token());
    }
    for (PanelRef p : d.design().sortedOpenings()) {
      c.record("opening").field("lift", p.lift()).field("bay", p.bay());
    }
    // added with frame members: present only where the design leaves a member out, so every
    // earlier design (a complete frame) has the form it had
    for (FrameRef f : d.design().sortedOmittedFrame()) {
      c.record("omitted-frame-member").field("type", f.type().label())
          .field("first", f.first()).field("second", f.second());
    }
    return c;
  }

  static Canonical observations(List<Observation> rows) {
    return observations(rows, Ids.LOCAL);
  }

  static Canonical observations(List<Observation> rows, Ids ids) {
    Canonical c = new Canonical();
    for (Observation o : rows) {
      if (o.frameMember() != null) {
        frameObservation(c, o, ids);
        continue;
      }
      c.record("observation")
          .field("id", ids.of(Kind.OBSERVATION, o.id()))
        .field("inspectionId", ids.of(Kind.INSPECTION, o.inspectionId()))
        .field("planeId", ids.of(Kind.PLANE, o.planeId()))
          .field("lift", o.panel().lift()).field("bay", o.panel().bay())
          .field("state", o.state().label())
          .field("member", o.memberFound() == null ? null : o.memberFound().token())
          .field("bowTenthsMm", o.bowMm() == null ? null : Math.round(o.bowMm() * 10))
          .field("gaugeLengthMm", o.gaugeLengthMm())
          .field("defect", o.defect() == null ? null : o.defect().label())
          .field("note", o.note()).field("recordedAt", o.recordedAt())
          .field("recordedBy", o.recordedBy())
        .field("supersedes", ids.of(Kind.OBSERVATION, o.supersedes()))
          .field("correctionReason", o.correctionReason());
    }
    return c;
  }

  /**
   * An observation of a frame member (added with frame members: present only where one was
   * recorded, so every earlier inspection's observations have the form they had).
   */
  private static void frameObservation(Canonical c, Observation o, Ids ids) {
    FrameRef f = o.frameMember();
    c.record("frame-observation")
        .field("id", ids.of(Kind.OBSERVATION, o.id()))
        .field("inspectionId", ids.of(Kind.INSPECTION, o.inspectionId()))
        .field("planeId", ids.of(Kind.PLANE, o.planeId()))
        .field("type", f.type().label()).field("first", f.first()).field("second", f.second())
        .field("state", o.state().label())
        .field("bowTenthsMm", o.bowMm() == null ? null : Math.round(o.bowMm() * 10))
        .field("gaugeLengthMm", o.gaugeLengthMm())
        .field("defect", o.defect() == null ? null : o.defect().label())
        .field("note", o.note()).field("recordedAt", o.recordedAt())
        .field("recordedBy", o.recordedBy())
        .field("supersedes", ids.of(Kind.OBSERVATION, o.supersedes()))
        .field("correctionReason", o.correctionReason());
  }

  static Canonical photos(InspectionRecords.PlaneRecords p) {
    return photos(p.observations(), p.photos(), Ids.LOCAL, false);
  }

  static Canonical photos(List<Observation> rows, Map<Long, List<Photo>> photos, Ids ids,
      boolean byUuid) {
    Canonical c = new Canonical();
    for (Observation o : rows) {
      List<Photo> own = photos.getOrDefault(o.id(), List.of());
      if (byUuid) {
        own = byUuid(own, Kind.PHOTO, Photo::id, ids);
      }
      for (Photo ph : own) {
        c.record("photo").field("id", ids.of(Kind.PHOTO, ph.id()))
            .field("observationId", ids.of(Kind.OBSERVATION, ph.observationId()))
            .field("fileName", ph.fileName()).field("mediaType", ph.mediaType())
            .field("attachedAt", ph.attachedAt()).field("sha256", sha256(ph.data()));
      }
    }
    return c;
  }

  static Canonical orders(List<InspectionRecords.OrderRecords> orders) {
    return orders(orders, Ids.LOCAL);
  }

  static Canonical orders(List<InspectionRecords.OrderRecords> orders, Ids ids) {
    Canonical c = new Canonical();
    for (InspectionRecords.OrderRecords or : orders) {
      RepairOrder o = or.order();
      c.record("order").field("id", ids.of(Kind.REPAIR_ORDER, o.id()))
          .field("inspectionId", ids.of(Kind.INSPECTION, o.inspectionId()))
          .field("createdAt", o.createdAt()).field("createdBy", o.createdBy())
          .field("note", o.note());
      for (RepairAction a : or.actions()) {
        if (a.frameMember() != null) {
          frameAction(c, a, ids);
          continue;
        }
        c.record("action").field("id", ids.of(Kind.REPAIR_ACTION, a.id()))
            .field("orderId", ids.of(Kind.REPAIR_ORDER, a.orderId()))
            .field("planeId", ids.of(Kind.PLANE, a.planeId()))
            .field("lift", a.panel() == null ? null : a.panel().lift())
            .field("bay", a.panel() == null ? null : a.panel().bay())
            .field("action", a.action().label())
            .field("member", a.brace() == null ? null : a.brace().token())
            .field("description", a.description()).field("dueDate", a.dueDate())
            .field("assignee", a.assignee()).field("doneAt", a.doneAt())
            .field("doneBy", a.doneBy())
        .field("verifiedBy", ids.of(Kind.INSPECTION, a.verifiedByInspectionId()));
      }
    }
    return c;
  }

  /**
   * A repair action on a frame member (added with V10: present only where one was recorded, so
   * every earlier order's actions have the form they had).
   */
  private static void frameAction(Canonical c, RepairAction a, Ids ids) {
    FrameRef f = a.frameMember();
    c.record("frame-action").field("id", ids.of(Kind.REPAIR_ACTION, a.id()))
        .field("orderId", ids.of(Kind.REPAIR_ORDER, a.orderId()))
        .field("planeId", ids.of(Kind.PLANE, a.planeId()))
        .field("type", f.type().label()).field("first", f.first()).field("second", f.second())
        .field("action", a.action().label())
        .field("description", a.description()).field("dueDate", a.dueDate())
        .field("assignee", a.assignee()).field("doneAt", a.doneAt())
        .field("doneBy", a.doneBy())
        .field("verifiedBy", ids.of(Kind.INSPECTION, a.verifiedByInspectionId()));
  }
}
