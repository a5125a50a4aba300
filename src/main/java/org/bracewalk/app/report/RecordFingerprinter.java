package org.bracewalk.app.report;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
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
  /** The name of the canonical form; a new form gets a new name. */
  public static final String SCHEME = "bracewalk-records-1";

  private RecordFingerprinter() {}

  public static RecordFingerprint fingerprint(InspectionRecords r) {
    List<SectionDigest> sections = new ArrayList<>();
    sections.add(section("site", site(r.site())));
    sections.add(section("structure", structure(r.structure())));
    sections.add(section("inspection", inspection(r.inspection())));
    for (InspectionRecords.PlaneRecords p : r.planes()) {
      long id = p.plane().id();
      sections.add(section("plane " + id + " grid", grid(p.plane())));
      sections.add(section("plane " + id + " design", design(p.design())));
      sections.add(section("plane " + id + " observations", observations(p.observations())));
      sections.add(section("plane " + id + " photos", photos(p)));
    }
    sections.add(section("repair orders", orders(r.orders())));
    StringBuilder all = new StringBuilder(SCHEME).append('\n');
    for (SectionDigest d : sections) {
      all.append(d.name()).append('=').append(d.sha256()).append('\n');
    }
    return new RecordFingerprint(SCHEME, sha256(all.toString().getBytes(StandardCharsets.UTF_8)),
        sections);
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
    Canonical c = new Canonical().record("site")
        .field("id", s.id()).field("name", s.name()).field("clientName", s.clientName())
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
    return new Canonical().record("structure")
        .field("id", s.id()).field("siteId", s.siteId()).field("name", s.name())
        .field("kind", s.kind().label()).field("description", s.description())
        .field("designReference", s.designReference())
        .field("inspectionIntervalDays", s.inspectionIntervalDays());
  }

  static Canonical inspection(Inspection i) {
    return new Canonical().record("inspection")
        .field("id", i.id()).field("structureId", i.structureId())
        .field("startedAt", i.startedAt()).field("finishedAt", i.finishedAt())
        .field("inspectorName", i.inspectorName()).field("inspectorPosition", i.inspectorPosition())
        .field("competentPerson", i.competentPerson()).field("shift", i.shift())
        .field("storageSafetyPerson", i.storageSafetyPerson())
        .field("reason", i.reason().label()).field("status", i.status().label())
        .field("carriedOutForName", i.carriedOutForName())
        .field("carriedOutForAddress", i.carriedOutForAddress());
  }

  static Canonical grid(PlaneRecord p) {
    PlaneGrid g = p.grid();
    Canonical c = new Canonical().record("plane")
        .field("id", p.id()).field("structureId", p.structureId()).field("name", p.name())
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
    Canonical c = new Canonical().record("design")
        .field("id", d.id()).field("planeId", d.planeId()).field("number", d.number())
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
    Canonical c = new Canonical();
    for (Observation o : rows) {
      if (o.frameMember() != null) {
        frameObservation(c, o);
        continue;
      }
      c.record("observation")
          .field("id", o.id()).field("inspectionId", o.inspectionId()).field("planeId", o.planeId())
          .field("lift", o.panel().lift()).field("bay", o.panel().bay())
          .field("state", o.state().label())
          .field("member", o.memberFound() == null ? null : o.memberFound().token())
          .field("bowTenthsMm", o.bowMm() == null ? null : Math.round(o.bowMm() * 10))
          .field("gaugeLengthMm", o.gaugeLengthMm())
          .field("defect", o.defect() == null ? null : o.defect().label())
          .field("note", o.note()).field("recordedAt", o.recordedAt())
          .field("recordedBy", o.recordedBy()).field("supersedes", o.supersedes())
          .field("correctionReason", o.correctionReason());
    }
    return c;
  }

  /**
   * An observation of a frame member (added with frame members: present only where one was
   * recorded, so every earlier inspection's observations have the form they had).
   */
  private static void frameObservation(Canonical c, Observation o) {
    FrameRef f = o.frameMember();
    c.record("frame-observation")
        .field("id", o.id()).field("inspectionId", o.inspectionId()).field("planeId", o.planeId())
        .field("type", f.type().label()).field("first", f.first()).field("second", f.second())
        .field("state", o.state().label())
        .field("bowTenthsMm", o.bowMm() == null ? null : Math.round(o.bowMm() * 10))
        .field("gaugeLengthMm", o.gaugeLengthMm())
        .field("defect", o.defect() == null ? null : o.defect().label())
        .field("note", o.note()).field("recordedAt", o.recordedAt())
        .field("recordedBy", o.recordedBy()).field("supersedes", o.supersedes())
        .field("correctionReason", o.correctionReason());
  }

  static Canonical photos(InspectionRecords.PlaneRecords p) {
    Canonical c = new Canonical();
    for (Observation o : p.observations()) {
      for (Photo ph : p.photos().getOrDefault(o.id(), List.of())) {
        c.record("photo").field("id", ph.id()).field("observationId", ph.observationId())
            .field("fileName", ph.fileName()).field("mediaType", ph.mediaType())
            .field("attachedAt", ph.attachedAt()).field("sha256", sha256(ph.data()));
      }
    }
    return c;
  }

  static Canonical orders(List<InspectionRecords.OrderRecords> orders) {
    Canonical c = new Canonical();
    for (InspectionRecords.OrderRecords or : orders) {
      RepairOrder o = or.order();
      c.record("order").field("id", o.id()).field("inspectionId", o.inspectionId())
          .field("createdAt", o.createdAt()).field("createdBy", o.createdBy())
          .field("note", o.note());
      for (RepairAction a : or.actions()) {
        if (a.frameMember() != null) {
          frameAction(c, a);
          continue;
        }
        c.record("action").field("id", a.id()).field("orderId", a.orderId())
            .field("planeId", a.planeId())
            .field("lift", a.panel() == null ? null : a.panel().lift())
            .field("bay", a.panel() == null ? null : a.panel().bay())
            .field("action", a.action().label())
            .field("member", a.brace() == null ? null : a.brace().token())
            .field("description", a.description()).field("dueDate", a.dueDate())
            .field("assignee", a.assignee()).field("doneAt", a.doneAt())
            .field("doneBy", a.doneBy()).field("verifiedBy", a.verifiedByInspectionId());
      }
    }
    return c;
  }

  /**
   * A repair action on a frame member (added with V10: present only where one was recorded, so
   * every earlier order's actions have the form they had).
   */
  private static void frameAction(Canonical c, RepairAction a) {
    FrameRef f = a.frameMember();
    c.record("frame-action").field("id", a.id()).field("orderId", a.orderId())
        .field("planeId", a.planeId())
        .field("type", f.type().label()).field("first", f.first()).field("second", f.second())
        .field("action", a.action().label())
        .field("description", a.description()).field("dueDate", a.dueDate())
        .field("assignee", a.assignee()).field("doneAt", a.doneAt())
        .field("doneBy", a.doneBy()).field("verifiedBy", a.verifiedByInspectionId());
  }
}
