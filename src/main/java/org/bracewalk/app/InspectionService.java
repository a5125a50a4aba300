package org.bracewalk.app;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.core.port.RecordStore;

/**
 * Inspections: start one, record observations panel by panel or frame member by frame member (each
 * committed when recorded, with its photos), correct them (a new row of the same inspection naming the one it supersedes),
 * finalise. Also the latest
 * findings per panel and the as-built plane they give.
 */
public final class InspectionService {
  private final RecordStore store;
  private final Clock clock;

  public InspectionService(RecordStore store, Clock clock) {
    this.store = Objects.requireNonNull(store);
    this.clock = Objects.requireNonNull(clock);
  }

  /**
   * Starts an open inspection of a structure now. Empty "carried out for" fields take the site's
   * client name and address. Its scope is fixed here, in the same transaction: the structure's
   * planes not retired by then, each with its highest-numbered design revision; analysis, report,
   * repair order, history and export of the inspection use exactly that, whatever is added or
   * revised later. Its start is never put before a retirement already recorded for the structure
   * (a clock that stands still or steps back would otherwise make it cover a plane retired before
   * it was started).
   */
  public Inspection start(long structureId, NewInspection details) {
    Structure structure =
        store.structures()
            .find(structureId)
            .orElseThrow(() -> new NotFoundException("structure " + structureId));
    Site site = store.sites().find(structure.siteId()).orElseThrow();
    String forName =
        blank(details.carriedOutForName()) ? site.clientName() : details.carriedOutForName();
    String forAddress =
        blank(details.carriedOutForAddress())
            ? site.clientAddress()
            : details.carriedOutForAddress();
    Instant now = clock.instant();
    for (PlaneRetirement r : store.planes().retirementsOf(structureId)) {
      if (r.retiredAt().isAfter(now)) {
        now = r.retiredAt();
      }
    }
    Inspection inspection = StoredText.inspection(new Inspection(
        0, structureId, now, null, details.inspectorName(),
        details.inspectorPosition(), details.competentPerson(), details.shift(),
        details.storageSafetyPerson(), details.reason(), InspectionStatus.OPEN, forName,
        forAddress));
    Instant startedAt = now;
    return store.inTransaction(() -> {
      Inspection started = store.inspections().add(inspection);
      store.planes().fixScope(started.id(), scopeAt(structureId, startedAt));
      return started;
    });
  }

  /**
   * The scope of an inspection of a structure started at {@code startedAt}: each plane of the
   * structure not retired by then, with its highest-numbered design revision (design revision id
   * by plane id). A plane with no design revision cannot be analysed and is left out.
   */
  private Map<Long, Long> scopeAt(long structureId, Instant startedAt) {
    Map<Long, Long> scope = new TreeMap<>();
    Map<Long, PlaneRetirement> retired = new java.util.HashMap<>();
    store.planes().retirementsOf(structureId).forEach(r -> retired.put(r.planeId(), r));
    for (PlaneRecord p : store.planes().ofStructure(structureId)) {
      PlaneRetirement r = retired.get(p.id());
      if (r != null && r.appliesToInspectionStartedAt(startedAt)) {
        continue;
      }
      store.designs().latest(p.id()).ifPresent(d -> scope.put(p.id(), d.id()));
    }
    return scope;
  }

  /** The inspection with this id; {@link NotFoundException} otherwise. */
  public Inspection inspection(long id) {
    return store.inspections()
        .find(id)
        .orElseThrow(() -> new NotFoundException("inspection " + id));
  }

  /** The inspections of a structure, oldest first. */
  public List<Inspection> inspections(long structureId) {
    return store.inspections().ofStructure(structureId);
  }

  /** Every inspection in the store, by id. */
  public List<Inspection> allInspections() {
    return store.inspections().all();
  }

  /**
   * The structure an inspection is of, as the inspection has it: once finalised, with the
   * inspection interval as at its finalisation, so a later change of interval leaves its report
   * and record fingerprint as they were; while open, as the structure is now.
   */
  public Structure structureOf(Inspection inspection) {
    return store.structures()
        .asOfInspection(inspection.id())
        .orElseThrow(() -> new NotFoundException("structure " + inspection.structureId()));
  }

  /**
   * The planes an inspection covers, by id: its scope, fixed when it started (the planes of its
   * structure not retired by then that had a design). A plane added later, or retired later, is
   * as it was: not in it, or still in it.
   */
  public List<PlaneRecord> planesOf(long inspectionId) {
    inspection(inspectionId);
    return store.planes().ofInspection(inspectionId);
  }

  /**
   * Records one observation now and returns it with its id. It is committed (synced to disk)
   * before this returns, unless called inside a {@link RecordStore#inTransaction}.
   *
   * @throws InspectionFinalisedException when the inspection is finalised
   * @throws UserInputException naming the plane or panel when they do not belong to it
   */
  public Observation recordObservation(long inspectionId, NewObservation observation) {
    return record(inspectionId, observation, List.of()).observation();
  }

  /**
   * Records one observation now with its photos, all in one transaction: every photo file is
   * checked before any is read (see {@link PhotoFiles}) and all are read before anything is
   * stored, so a missing, oversized or non-picture file records nothing.
   *
   * @throws UserInputException naming the photo file, plane or panel that cannot be kept
   * @throws InspectionFinalisedException when the inspection is finalised
   */
  public RecordedObservation record(
      long inspectionId, NewObservation observation, List<Path> photos) {
    Inspection inspection = inspection(inspectionId);
    return store(toObservation(inspection, observation, null, null), photos);
  }

  /**
   * Corrects an earlier observation of an open inspection: stores a new observation of the same
   * inspection that names the one it supersedes and why. The earlier row stays as it was.
   *
   * @throws UserInputException when the observation is not one of this inspection (naming both),
   *     is already corrected, or no reason is given
   */
  public Observation correct(
      long inspectionId, long supersededId, NewObservation replacement, String reason) {
    return correct(inspectionId, supersededId, replacement, reason, List.of()).observation();
  }

  /**
   * As {@link #correct(long, long, NewObservation, String)}, with photos stored in the same
   * transaction (see {@link #record}).
   */
  public RecordedObservation correct(long inspectionId, long supersededId,
      NewObservation replacement, String reason, List<Path> photos) {
    Inspection inspection = inspection(inspectionId);
    Observation old =
        store.observations()
            .find(supersededId)
            .orElseThrow(() -> new NotFoundException("observation " + supersededId));
    if (old.inspectionId() != inspectionId) {
      throw new UserInputException("observation " + supersededId + " is of inspection "
          + old.inspectionId() + ", not of inspection " + inspectionId + ": a correction is"
          + " recorded in the inspection of the observation it corrects; correct it in inspection "
          + old.inspectionId() + ", or record a new observation in inspection " + inspectionId);
    }
    if (blank(reason)) {
      throw new UserInputException(
          "say why observation " + supersededId + " is corrected (the reason is kept with it)");
    }
    for (Observation o : store.observations().ofInspection(inspectionId)) {
      if (Long.valueOf(supersededId).equals(o.supersedes())) {
        throw new UserInputException("observation " + supersededId + " is already corrected by"
            + " observation " + o.id() + "; correct that one instead");
      }
    }
    return store(toObservation(inspection, replacement, supersededId, reason), photos);
  }

  /** Reads and checks the photos, then stores the observation and them in one transaction. */
  private RecordedObservation store(Observation observation, List<Path> photos) {
    List<PhotoFiles.PhotoFile> files = PhotoFiles.read(photos);
    return store.inTransaction(() -> {
      Observation saved = store.observations().add(observation);
      List<Photo> stored = new ArrayList<>();
      for (PhotoFiles.PhotoFile f : files) {
        stored.add(store.observations().addPhoto(StoredText.photo(
            new Photo(0, saved.id(), f.fileName(), f.mediaType(), f.data(), clock.instant()))));
      }
      return new RecordedObservation(saved, stored);
    });
  }

  public List<Photo> photos(long observationId) {
    return store.observations().photosOf(observationId);
  }

  /**
   * Finalises an open inspection now. From then on nothing about it changes: no observation, no
   * correction, no photo (the database refuses too).
   */
  public Inspection finalise(long inspectionId) {
    Inspection inspection = inspection(inspectionId);
    requireOpen(inspection, "finalise it again");
    Instant now = clock.instant();
    Instant at = now.isBefore(inspection.startedAt()) ? inspection.startedAt() : now;
    return store.inspections().finalise(inspectionId, at);
  }

  /** Every observation of the inspection, superseded ones included, in the order recorded. */
  public List<Observation> observations(long inspectionId) {
    inspection(inspectionId);
    return store.observations().ofInspection(inspectionId);
  }

  /** Why a panel recorded by {@link #recordRestAsDesigned} that had a withdrawn mark is corrected. */
  public static final String REST_AS_DESIGNED_REASON =
      "recorded as found as designed with the rest of the plane, after the inspector confirmed it";

  /** The note each record of {@link #recordRestAsDesigned} carries, so the record says how it was made. */
  public static final String REST_AS_DESIGNED_NOTE =
      "found as designed: recorded with the rest of the plane in one confirmed step";

  /**
   * The panels of a plane nobody has looked at in this inspection, lift then bay: those with no
   * observation in force, or whose latest observation withdrew a mark ("not inspected"). A panel
   * marked "not reachable" was looked for, so it is not one of them.
   */
  public List<PanelRef> notLookedAt(long inspectionId, long planeId) {
    return notLookedAt(designInForce(inspectionId, planeId).design().grid(),
        latestObservations(inspectionId, planeId));
  }

  private static List<PanelRef> notLookedAt(org.bracewalk.core.model.PlaneGrid grid,
      Map<PanelRef, Observation> latest) {
    List<PanelRef> out = new ArrayList<>();
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      for (int bay = 1; bay <= grid.bays(); bay++) {
        PanelRef p = new PanelRef(lift, bay);
        Observation o = latest.get(p);
        if (o == null || o.state() == PanelState.NOT_INSPECTED) {
          out.add(p);
        }
      }
    }
    return out;
  }

  /**
   * Records every panel of a plane nobody has looked at yet ({@link #notLookedAt}) as found as
   * designed, in one transaction: one ordinary observation per panel, state {@code sound} with no
   * member named, which the records read as "as the design has it" (the design's brace there and
   * sound; an unbraced panel or an opening with no member). A panel whose mark was withdrawn gets
   * a correction of that record. Frame members need no records: one not recorded is taken as
   * designed. The person confirms the panels first, so the call names them: when the panels not
   * yet looked at are not exactly {@code expected} (another mark came in between), nothing is
   * recorded and the difference is named.
   *
   * @return the observations recorded, lift then bay
   * @throws UserInputException when the panels differ from {@code expected} or the plane is not
   *     in the inspection
   * @throws InspectionFinalisedException when the inspection is finalised
   */
  public List<Observation> recordRestAsDesigned(long inspectionId, long planeId,
      List<PanelRef> expected, String recordedBy) {
    Objects.requireNonNull(expected, "expected");
    return store.inTransaction(() -> {
      Inspection inspection = inspection(inspectionId);
      requireOpen(inspection, "record the rest of a plane as designed");
      PlaneRecord plane = plane(planeId);
      DesignRevision design = designInForce(inspectionId, planeId);
      Map<PanelRef, Observation> latest = latestObservations(inspectionId, planeId);
      List<PanelRef> rest = notLookedAt(design.design().grid(), latest);
      Set<PanelRef> confirmed = new HashSet<>(expected);
      if (!confirmed.equals(new HashSet<>(rest)) || expected.size() != rest.size()) {
        List<PanelRef> notNamed = new ArrayList<>(rest);
        notNamed.removeAll(confirmed);
        List<PanelRef> lookedAt = new ArrayList<>(expected);
        lookedAt.removeAll(rest);
        throw new UserInputException("plane '" + plane.name() + "' in " + inspection.label()
            + ": " + rest.size() + " panels are not yet looked at, but " + expected.size()
            + " were confirmed" + (notNamed.isEmpty() ? "" : "; not confirmed: " + notNamed)
            + (lookedAt.isEmpty() ? "" : "; already looked at: " + lookedAt)
            + ". Nothing was recorded; confirm again");
      }
      List<Observation> out = new ArrayList<>();
      Observation checked = null; // the plane's checks (open, in scope, not retired) once, not per panel
      for (PanelRef p : rest) {
        Observation withdrawn = latest.get(p);
        Long supersedes = withdrawn == null ? null : withdrawn.id();
        String reason = supersedes == null ? null : REST_AS_DESIGNED_REASON;
        Observation o;
        if (checked == null) {
          o = toObservation(inspection, new NewObservation(planeId, p, PanelState.SOUND, null, null, null,
              null, REST_AS_DESIGNED_NOTE, recordedBy), supersedes, reason);
          checked = o;
        } else {
          o = new Observation(0, inspection.id(), planeId, p, PanelState.SOUND, null, null, null, null,
              checked.note(), clock.instant(), checked.recordedBy(), supersedes, reason, null);
        }
        out.add(store.observations().add(o));
      }
      return out;
    });
  }

  /**
   * The observation that counts for each panel of a plane: the latest one recorded for the panel
   * that no correction supersedes. Panels with none are absent (not inspected).
   */
  public Map<PanelRef, Observation> latestObservations(long inspectionId, long planeId) {
    return latest(observations(inspectionId), planeId);
  }

  /**
   * The observation that counts for each frame member of a plane: the latest one recorded for the
   * member that no correction supersedes. Members with none are absent (taken as designed).
   */
  public Map<FrameRef, Observation> latestFrameObservations(long inspectionId, long planeId) {
    return latestFrame(observations(inspectionId), planeId);
  }

  /** The latest state per frame member (see {@link #latestFrameObservations}). */
  public Map<FrameRef, PanelState> latestFrameFindings(long inspectionId, long planeId) {
    return frameFindings(latestFrameObservations(inspectionId, planeId));
  }

  /** The states of the given latest frame-member observations, by member. */
  static Map<FrameRef, PanelState> frameFindings(Map<FrameRef, Observation> latest) {
    Map<FrameRef, PanelState> out = new TreeMap<>();
    latest.forEach((m, o) -> out.put(m, o.state()));
    return out;
  }

  /** The latest finding per panel (see {@link #latestObservations}). */
  public Map<PanelRef, PanelFinding> latestFindings(long inspectionId, long planeId) {
    Map<PanelRef, PanelFinding> out = new TreeMap<>();
    latestObservations(inspectionId, planeId).forEach((p, o) -> out.put(p, o.finding()));
    return out;
  }

  /**
   * The design revision this inspection checks the plane against: the one in its scope, fixed
   * when it started. A revision recorded later (even while the inspection is open) is for later
   * inspections; the walk continues against the revision in force at the start.
   *
   * @throws NotFoundException naming the plane and the inspection when the plane is not in the
   *     inspection's scope (for instance a plane added to the structure after it started)
   */
  public DesignRevision designInForce(long inspectionId, long planeId) {
    Inspection inspection = inspection(inspectionId);
    PlaneRecord plane = plane(planeId);
    Long revisionId = store.planes().scopeOf(inspectionId).get(planeId);
    if (revisionId == null) {
      throw new UserInputException("plane '" + plane.name() + "' (id " + planeId + ") is not"
          + " part of " + inspection.label() + ": the planes an inspection covers are fixed when"
          + " it starts; inspect it in an inspection started after it was added");
    }
    return store.designs()
        .find(revisionId)
        .orElseThrow(() -> new NotFoundException("design revision " + revisionId + " of plane '"
            + plane.name() + "'"));
  }

  /** True when the inspection covers the plane (its scope, fixed when it started, holds it). */
  public boolean covers(long inspectionId, long planeId) {
    return store.planes().scopeOf(inspectionId).containsKey(planeId);
  }

  /** The plane as found in this inspection, against the design in force. */
  public AsBuiltPlane asBuilt(long inspectionId, long planeId) {
    DesignRevision design = designInForce(inspectionId, planeId);
    List<Observation> rows = observations(inspectionId);
    Map<PanelRef, PanelFinding> findings = new TreeMap<>();
    latest(rows, planeId).forEach((p, o) -> findings.put(p, o.finding()));
    return AsBuiltPlane.fromFindings(design.design(), findings,
        frameFindings(latestFrame(rows, planeId)));
  }

  /**
   * When the next routine inspection of a structure is due: the day its last finalised inspection
   * finished plus the structure's interval, in the site's time zone; empty when never inspected.
   * Event-triggered inspections (impact, alteration, weather) are due at once, whatever this says.
   * The interval is the structure's current one (changing it moves the next due date, which is
   * what changing it is for); what a finalised inspection's own report shows is the interval as
   * at its finalisation ({@link #structureOf}).
   */
  public Optional<LocalDate> nextInspectionDue(long structureId) {
    Structure structure =
        store.structures()
            .find(structureId)
            .orElseThrow(() -> new NotFoundException("structure " + structureId));
    Site site = store.sites().find(structure.siteId()).orElseThrow();
    return store.inspections().ofStructure(structureId).stream()
        .filter(Inspection::isFinalised)
        .map(Inspection::finishedAt)
        .max(Instant::compareTo)
        .map(
            at ->
                at.atZone(site.timeZone())
                    .toLocalDate()
                    .plusDays(structure.inspectionIntervalDays()));
  }

  /**
   * The latest non-superseded observation per panel of one plane, from rows in id order
   * (observations of frame members are left out: see {@link #latestFrame}).
   */
  static Map<PanelRef, Observation> latest(List<Observation> rows, long planeId) {
    Set<Long> superseded = superseded(rows);
    Map<PanelRef, Observation> out = new TreeMap<>();
    for (Observation o : rows) {
      if (o.planeId() == planeId && o.panel() != null && !superseded.contains(o.id())) {
        out.put(o.panel(), o);
      }
    }
    return out;
  }

  /** The latest non-superseded observation per frame member of one plane, from rows in id order. */
  static Map<FrameRef, Observation> latestFrame(List<Observation> rows, long planeId) {
    Set<Long> superseded = superseded(rows);
    Map<FrameRef, Observation> out = new TreeMap<>();
    for (Observation o : rows) {
      if (o.planeId() == planeId && o.frameMember() != null && !superseded.contains(o.id())) {
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

  Observation toObservation(
      Inspection inspection, NewObservation n, Long supersedes, String reason) {
    requireOpen(inspection, supersedes == null ? "record an observation" : "correct an observation");
    PlaneRecord plane = plane(n.planeId());
    if (plane.structureId() != inspection.structureId()) {
      throw new UserInputException(
          "plane '"
              + plane.name()
              + "' (id "
              + plane.id()
              + ") is not part of the structure "
              + inspection.label()
              + " covers; pick one of its planes");
    }
    store.planes().retirement(plane.id())
        .filter(r -> r.appliesToInspectionStartedAt(inspection.startedAt()))
        .ifPresent(r -> {
          throw new UserInputException("plane '" + plane.name() + "' (id " + plane.id()
              + ") was retired at " + r.retiredAt() + " (" + r.reason() + "), before "
              + inspection.label() + " started; it is not part of it");
        });
    if (!store.planes().scopeOf(inspection.id()).containsKey(plane.id())) {
      throw new UserInputException("plane '" + plane.name() + "' (id " + plane.id() + ") is not"
          + " part of " + inspection.label() + ": the planes an inspection covers are fixed when"
          + " it starts, and this one was added after; record it in a new inspection");
    }
    String what = n.panel() != null ? n.panel().toString() : n.frameMember().toString();
    if (n.frameMember() != null) {
      checkFrameMember(inspection, plane, n);
    } else if (!plane.grid().contains(n.panel())) {
      throw new UserInputException(
          "panel "
              + n.panel()
              + " lies outside plane '"
              + plane.name()
              + "' ("
              + plane.grid().lifts()
              + " lifts x "
              + plane.grid().bays()
              + " bays)");
    }
    try {
      return StoredText.observation(new Observation(
          0, inspection.id(), plane.id(), n.panel(), n.state(), n.memberFound(), n.bowMm(),
          n.gaugeLengthMm(), n.defect(), n.note(), clock.instant(), n.recordedBy(), supersedes,
          reason, n.frameMember()));
    } catch (IllegalArgumentException e) {
      throw new UserInputException(
          "observation of plane '" + plane.name() + "', " + what + ": " + e.getMessage(), e);
    }
  }

  /**
   * A frame member must lie in the plane, name no diagonal found, and be recorded as extra only
   * where the design in force leaves it out.
   */
  private void checkFrameMember(Inspection inspection, PlaneRecord plane, NewObservation n) {
    FrameRef m = n.frameMember();
    if (!m.within(plane.grid())) {
      throw new UserInputException(m + " lies outside plane '" + plane.name() + "' ("
          + plane.grid().lifts() + " lifts x " + plane.grid().bays() + " bays: levels 0 to "
          + plane.grid().lifts() + ", lines 0 to " + plane.grid().bays() + ")");
    }
    if (n.memberFound() != null) {
      throw new UserInputException("observation of plane '" + plane.name() + "', " + m
          + ": a frame member names no diagonal found (the member found belongs to a panel's"
          + " diagonals); record the diagonals of a panel separately");
    }
    if (n.state() == PanelState.EXTRA
        && designInForce(inspection.id(), plane.id()).design().hasFrameMember(m)) {
      throw new UserInputException("observation of plane '" + plane.name() + "', " + m
          + ": the design has this member, so it cannot be extra (extra means there although"
          + " the design leaves it out); record it sound, damaged or missing");
    }
  }

  private PlaneRecord plane(long planeId) {
    return store.planes().find(planeId).orElseThrow(() -> new NotFoundException("plane " + planeId));
  }

  private static void requireOpen(Inspection inspection, String attempted) {
    if (inspection.isFinalised()) {
      throw new InspectionFinalisedException(inspection.id(), attempted);
    }
  }

  private static boolean blank(String s) {
    return s == null || s.isBlank();
  }
}
