package org.bracewalk.app;

import java.time.Clock;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionStatus;
import org.bracewalk.core.model.IssuedReport;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.Photo;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairOrder;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.GlobalIdentities.Kind;
import org.bracewalk.core.port.RecordStore;
import org.bracewalk.core.port.StoreException;

/**
 * Syncs a field file with the team server, matching records by their global identities (UUIDs,
 * migration V12):
 *
 * <ol>
 *   <li>the design side (sites, structures, planes, design revisions) goes both ways: each store
 *       gets the records the other has and it lacks, so an inspection made offline on a plane
 *       made offline can go to the server, and a field file gets the office's new sites;
 *   <li>the field file's finalised inspections go to the server, each with its observations,
 *       photos, repair orders and register rows, in one server transaction (an interrupted sync
 *       leaves whole inspections or none; the next one finishes the job);
 *   <li>for an inspection both hold, repair orders and actions and register rows the other lacks
 *       are copied either way (a report issued from either copy then verifies against the other).
 * </ol>
 *
 * <p>Nothing is resolved silently. A design revision whose number the other store has given to
 * another revision of the plane (a design revised in two places) is stored as the next free
 * number with a note naming both; one the other store's rules refuse as dated (a finalised
 * inspection there ended after it was recorded) is stored as of the sync with a note; an
 * inspection the server holds differently from the field file is refused, naming both ids. Every
 * such case is a {@link Conflict} in the summary. A record already in the other store (same
 * identity) is skipped, so a sync run twice stores nothing twice. Open inspections stay in the
 * field file until they are finalised.
 */
public final class SyncService {
  /** The store's refusal of a revision dated at or before a finalised inspection's finish. */
  private static final String DATED =
      "design revision recorded as of a finalised inspection's finish";

  private final Clock clock;

  public SyncService(Clock clock) {
    this.clock = Objects.requireNonNull(clock, "clock");
  }

  /** Something a sync did not copy as it stood, with the records named in both stores. */
  public record Conflict(String message) {}

  /**
   * What a sync did.
   *
   * @param pulled design-side records the field file got from the server, by kind
   * @param pushedDesign design-side records the server got from the field file, by kind
   * @param pushedInspections inspections now on the server that were not
   * @param pushedObservations their observations
   * @param skippedInspections finalised inspections the server already held as in the field file
   * @param openInspections open inspections left in the field file (finalise them first)
   * @param exchanged repair orders, actions and register rows copied for inspections both hold
   * @param conflicts what was not copied as it stood, each named
   */
  public record Summary(Map<Kind, Integer> pulled, Map<Kind, Integer> pushedDesign,
      int pushedInspections, int pushedObservations, int skippedInspections, int openInspections,
      int exchanged, List<Conflict> conflicts) {
    public Summary {
      pulled = Map.copyOf(pulled);
      pushedDesign = Map.copyOf(pushedDesign);
      conflicts = List.copyOf(conflicts);
    }

    /** All records pulled into the field file. */
    public int pulledCount() {
      return pulled.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** All design-side records the server got from the field file. */
    public int pushedDesignCount() {
      return pushedDesign.values().stream().mapToInt(Integer::intValue).sum();
    }

    /** The records pulled, by kind in words ("1 site, 2 structures"); empty when none. */
    public String pulledWords() {
      return words(pulled);
    }

    /** The design-side records pushed, by kind in words; empty when none. */
    public String pushedDesignWords() {
      return words(pushedDesign);
    }

    private static String words(Map<Kind, Integer> byKind) {
      List<String> out = new ArrayList<>();
      for (Kind k : Kind.values()) {
        Integer n = byKind.get(k);
        if (n != null) {
          out.add(n + " " + k.words() + (n == 1 ? "" : "s"));
        }
      }
      return String.join(", ", out);
    }
  }

  /** Runs one sync of the field file's services with the server's. */
  public Summary sync(AppServices field, AppServices server) {
    return sync(field.store(), server.store());
  }

  /** Runs one sync of {@code field} with {@code server}. */
  public Summary sync(RecordStore field, RecordStore server) {
    Run run = new Run(field, server);
    run.designSide(server, field, run.pulled, "the server", "the field file");
    run.designSide(field, server, run.pushedDesign, "the field file", "the server");
    run.inspections();
    return new Summary(run.pulled, run.pushedDesign, run.pushedInspections,
        run.pushedObservations, run.skipped, run.open, run.exchanged, run.conflicts);
  }

  /** One sync's state. */
  private final class Run {
    final RecordStore field;
    final RecordStore server;
    final Map<Kind, Integer> pulled = new LinkedHashMap<>();
    final Map<Kind, Integer> pushedDesign = new LinkedHashMap<>();
    final List<Conflict> conflicts = new ArrayList<>();
    int pushedInspections;
    int pushedObservations;
    int skipped;
    int open;
    int exchanged;

    Run(RecordStore field, RecordStore server) {
      this.field = field;
      this.server = server;
    }

    /** The local id in {@code to} of the record with {@code from}'s id, by identity. */
    long map(RecordStore from, RecordStore to, Kind kind, long id) {
      String uuid = from.identities().uuidOf(kind, id);
      return to.identities().idOf(kind, uuid).orElseThrow(() -> new StoreException(
          "the " + kind.words() + " " + uuid + " is not in " + to.location()));
    }

    Long mapOrNull(RecordStore from, RecordStore to, Kind kind, Long id) {
      if (id == null) {
        return null;
      }
      return to.identities().idOf(kind, from.identities().uuidOf(kind, id)).orElse(null);
    }

    boolean has(RecordStore from, RecordStore to, Kind kind, long id) {
      return to.identities().idOf(kind, from.identities().uuidOf(kind, id)).isPresent();
    }

    <T> T adopt(RecordStore from, RecordStore to, Kind kind, long id, RecordStore.Work<T> add) {
      return to.identities().adopting(kind, from.identities().uuidOf(kind, id), add);
    }

    void count(Map<Kind, Integer> counts, Kind kind) {
      counts.merge(kind, 1, Integer::sum);
    }

    /** Copies sites, structures, planes and design revisions {@code to} lacks. */
    void designSide(RecordStore from, RecordStore to, Map<Kind, Integer> counts, String fromName,
        String toName) {
      for (Site site : from.sites().all()) {
        if (!has(from, to, Kind.SITE, site.id())) {
          adopt(from, to, Kind.SITE, site.id(), () -> to.sites().add(site.withId(0)));
          count(counts, Kind.SITE);
        }
        for (Structure st : from.structures().ofSite(site.id())) {
          if (!has(from, to, Kind.STRUCTURE, st.id())) {
            long siteId = map(from, to, Kind.SITE, site.id());
            adopt(from, to, Kind.STRUCTURE, st.id(), () -> to.structures().add(
                new Structure(0, siteId, st.name(), st.kind(), st.description(),
                    st.designReference(), st.inspectionIntervalDays())));
            count(counts, Kind.STRUCTURE);
          }
          for (PlaneRecord p : from.planes().ofStructure(st.id())) {
            planeAndRevisions(from, to, counts, st, p, fromName, toName);
          }
        }
      }
    }

    private void planeAndRevisions(RecordStore from, RecordStore to, Map<Kind, Integer> counts,
        Structure st, PlaneRecord p, String fromName, String toName) {
      if (!has(from, to, Kind.PLANE, p.id())) {
        long structureId = map(from, to, Kind.STRUCTURE, st.id());
        Optional<PlaneRecord> namesake = to.planes().findByName(structureId, p.name());
        if (namesake.isPresent()) {
          conflicts.add(new Conflict("plane '" + p.name() + "' of structure '" + st.name()
              + "' was made in " + fromName + " (id " + p.id() + ") and in " + toName
              + " (id " + namesake.get().id()
              + ") as two planes of one name: not copied; retire one and re-make it under"
              + " another name, then sync again"));
          return;
        }
        adopt(from, to, Kind.PLANE, p.id(), () -> to.planes().add(
            new PlaneRecord(0, structureId, p.name(), p.grid(), p.role())));
        count(counts, Kind.PLANE);
      }
      long planeId = map(from, to, Kind.PLANE, p.id());
      for (DesignRevision d : from.designs().ofPlane(p.id())) {
        if (has(from, to, Kind.DESIGN_REVISION, d.id())) {
          continue;
        }
        List<DesignRevision> there = to.designs().ofPlane(planeId);
        int number = d.number();
        String note = d.approvalNote();
        boolean taken = there.stream().anyMatch(r -> r.number() == d.number());
        if (taken) {
          number = there.stream().mapToInt(DesignRevision::number).max().orElse(0) + 1;
          note = joined(note, "revised in two places: revision " + d.number() + " in "
              + fromName + ", stored here as revision " + number + " beside this store's own"
              + " revision " + d.number() + "; an engineer decides which is in force");
          conflicts.add(new Conflict("design of plane '" + p.name() + "' of structure '"
              + st.name() + "' revised in two places: " + fromName + "'s revision "
              + d.number() + " (id " + d.id() + ") is revision " + number + " in " + toName
              + ", beside its own revision " + d.number() + "; both kept, with a note"));
        }
        DesignRevision copy = new DesignRevision(0, planeId, number, d.author(), d.date(), note,
            d.recordedAt(), d.design());
        try {
          adopt(from, to, Kind.DESIGN_REVISION, d.id(), () -> to.designs().add(copy));
        } catch (StoreException e) {
          if (!e.getMessage().contains(DATED)) {
            throw e;
          }
          // a finalised inspection here ended after the revision was recorded there: the rules
          // of the record keep it from changing what that inspection was checked against
          String asOfNow = joined(note, "recorded in " + fromName + " at " + d.recordedAt()
              + "; stored here as of the sync, as an inspection here had been finalised since");
          adopt(from, to, Kind.DESIGN_REVISION, d.id(), () -> to.designs().add(
              new DesignRevision(0, planeId, copy.number(), d.author(), d.date(), asOfNow,
                  clock.instant(), d.design())));
          conflicts.add(new Conflict("design revision " + d.number() + " of plane '" + p.name()
              + "' of structure '" + st.name() + "' (id " + d.id() + " in " + fromName
              + ") was recorded before an inspection finalised in " + toName
              + " ended: stored there as of the sync, with a note"));
        }
        count(counts, Kind.DESIGN_REVISION);
      }
    }

    /** Pushes the field file's finalised inspections; exchanges what both hold. */
    void inspections() {
      for (Inspection i : field.inspections().all()) {
        if (i.status() != InspectionStatus.FINALISED) {
          open++;
          continue;
        }
        String uuid = field.identities().uuidOf(Kind.INSPECTION, i.id());
        Optional<Long> there = server.identities().idOf(Kind.INSPECTION, uuid);
        if (there.isPresent()) {
          Optional<String> differs = differs(i, there.get());
          if (differs.isPresent()) {
            conflicts.add(new Conflict(where(i) + ": inspection " + i.id() + " of the field file"
                + " and inspection " + there.get() + " of the server (" + uuid + ") differ: "
                + differs.get() + "; the server's copy is kept, the field file's is not pushed"));
            continue;
          }
          skipped++;
          server.inTransaction(() -> {
            exchange(field, server, i.id(), there.get());
            return null;
          });
          field.inTransaction(() -> {
            exchange(server, field, there.get(), i.id());
            return null;
          });
          continue;
        }
        Optional<String> refused = refusal(i);
        if (refused.isPresent()) {
          conflicts.add(new Conflict(where(i) + ": inspection " + i.id() + " of the field file ("
              + uuid + ") not pushed: " + refused.get()));
          continue;
        }
        int observations;
        try {
          observations = server.inTransaction(() -> push(i));
        } catch (StoreException e) {
          // the server's rules refused part of it: nothing of it is stored (one transaction)
          conflicts.add(new Conflict(where(i) + ": inspection " + i.id() + " of the field file ("
              + uuid + ") not pushed, nothing of it stored: " + e.getMessage()));
          continue;
        }
        pushedInspections++;
        pushedObservations += observations;
      }
    }

    /** Site, structure and planes of a field inspection, in words. */
    String where(Inspection i) {
      Structure st = field.structures().find(i.structureId()).orElseThrow();
      Site site = field.sites().find(st.siteId()).orElseThrow();
      List<String> planes = field.planes().ofInspection(i.id()).stream()
          .map(p -> "'" + p.name() + "'").toList();
      return "site '" + site.name() + "', structure '" + st.name() + "', plane"
          + (planes.size() == 1 ? " " : "s ") + String.join(", ", planes);
    }

    /** Why the server cannot take the inspection as it is, if it cannot. */
    Optional<String> refusal(Inspection i) {
      for (Map.Entry<Long, Long> e : field.planes().scopeOf(i.id()).entrySet()) {
        if (!has(field, server, Kind.PLANE, e.getKey())
            || !has(field, server, Kind.DESIGN_REVISION, e.getValue())) {
          return Optional.of("a plane or design revision it covers is not on the server (see the"
              + " plane conflict above)");
        }
      }
      long structureId = map(field, server, Kind.STRUCTURE, i.structureId());
      int fieldInterval = field.structures().asOfInspection(i.id()).orElseThrow()
          .inspectionIntervalDays();
      int serverInterval = server.structures().find(structureId).orElseThrow()
          .inspectionIntervalDays();
      if (fieldInterval != serverInterval) {
        return Optional.of("it was finalised with an inspection interval of " + fieldInterval
            + " days and the server's structure now has " + serverInterval + " days (a"
            + " finalised inspection keeps the interval as at its finalisation); set the"
            + " server's interval to " + fieldInterval + ", sync, then set it back");
      }
      return Optional.empty();
    }

    /** How the server's copy differs from the field file's, if it does. */
    Optional<String> differs(Inspection mine, long theirsId) {
      Inspection theirs = server.inspections().find(theirsId).orElseThrow();
      Inspection asMine = new Inspection(theirs.id(), mine.structureId(), theirs.startedAt(),
          theirs.finishedAt(), theirs.inspectorName(), theirs.inspectorPosition(),
          theirs.competentPerson(), theirs.shift(), theirs.storageSafetyPerson(), theirs.reason(),
          theirs.status(), theirs.carriedOutForName(), theirs.carriedOutForAddress());
      if (!asMine.withId(mine.id()).equals(mine)) {
        return Optional.of("the inspection's particulars or status differ");
      }
      Set<String> a = uuids(field, Kind.OBSERVATION,
          field.observations().ofInspection(mine.id()).stream().map(Observation::id).toList());
      Set<String> b = uuids(server, Kind.OBSERVATION,
          server.observations().ofInspection(theirsId).stream().map(Observation::id).toList());
      if (!a.equals(b)) {
        return Optional.of(a.size() + " observations in the field file, " + b.size()
            + " on the server, not the same ones");
      }
      Set<String> pa = photoUuids(field, mine.id());
      Set<String> pb = photoUuids(server, theirsId);
      if (!pa.equals(pb)) {
        return Optional.of("their photos are not the same");
      }
      return Optional.empty();
    }

    Set<String> uuids(RecordStore store, Kind kind, List<Long> ids) {
      return new HashSet<>(store.identities().uuidsOf(kind, ids).values());
    }

    Set<String> photoUuids(RecordStore store, long inspectionId) {
      List<Long> ids = new ArrayList<>();
      for (long o : store.observations().withPhotos(inspectionId)) {
        store.observations().photosOf(o).forEach(ph -> ids.add(ph.id()));
      }
      return uuids(store, Kind.PHOTO, ids);
    }

    /** Copies one finalised field inspection to the server; inside a server transaction. */
    int push(Inspection i) {
      long structureId = map(field, server, Kind.STRUCTURE, i.structureId());
      Inspection opened = new Inspection(0, structureId, i.startedAt(), null, i.inspectorName(),
          i.inspectorPosition(), i.competentPerson(), i.shift(), i.storageSafetyPerson(),
          i.reason(), InspectionStatus.OPEN, i.carriedOutForName(), i.carriedOutForAddress());
      Inspection stored = adopt(field, server, Kind.INSPECTION, i.id(),
          () -> server.inspections().add(opened));
      // the server's id of each field plane, looked up once per inspection, not per observation
      Map<Long, Long> planeIds = new HashMap<>();
      Map<Long, Long> scope = new LinkedHashMap<>();
      field.planes().scopeOf(i.id()).forEach((plane, revision) -> scope.put(
          planeIds.computeIfAbsent(plane, p -> map(field, server, Kind.PLANE, p)),
          map(field, server, Kind.DESIGN_REVISION, revision)));
      server.planes().fixScope(stored.id(), scope);
      Map<Long, Long> observationIds = new LinkedHashMap<>();
      List<Observation> rows = field.observations().ofInspection(i.id());
      for (Observation o : rows) {
        Observation copy = new Observation(0, stored.id(),
            planeIds.computeIfAbsent(o.planeId(), p -> map(field, server, Kind.PLANE, p)),
            o.panel(), o.state(), o.memberFound(),
            o.bowMm(), o.gaugeLengthMm(), o.defect(), o.note(), o.recordedAt(), o.recordedBy(),
            o.supersedes() == null ? null : observationIds.get(o.supersedes()),
            o.correctionReason(), o.frameMember());
        Observation added = adopt(field, server, Kind.OBSERVATION, o.id(),
            () -> server.observations().add(copy));
        observationIds.put(o.id(), added.id());
        for (Photo ph : field.observations().photosOf(o.id())) {
          adopt(field, server, Kind.PHOTO, ph.id(), () -> server.observations().addPhoto(
              new Photo(0, added.id(), ph.fileName(), ph.mediaType(), ph.data(),
                  ph.attachedAt())));
        }
      }
      server.inspections().finalise(stored.id(), i.finishedAt());
      exchange(field, server, i.id(), stored.id());
      return rows.size();
    }

    /**
     * Copies repair orders, their actions and register rows of an inspection that {@code to}
     * lacks; inside a transaction of {@code to}.
     */
    void exchange(RecordStore from, RecordStore to, long fromInspection, long toInspection) {
      for (RepairOrder o : from.repairs().ordersOf(fromInspection)) {
        Long known = mapOrNull(from, to, Kind.REPAIR_ORDER, o.id());
        long orderId;
        if (known != null) {
          orderId = known;
        } else {
          orderId = adopt(from, to, Kind.REPAIR_ORDER, o.id(), () -> to.repairs().addOrder(
              new RepairOrder(0, toInspection, o.createdAt(), o.createdBy(), o.note()))).id();
          exchanged++;
        }
        for (RepairAction a : from.repairs().actionsOf(o.id())) {
          if (has(from, to, Kind.REPAIR_ACTION, a.id())) {
            continue;
          }
          RepairAction copy = new RepairAction(0, orderId,
              map(from, to, Kind.PLANE, a.planeId()), a.panel(), a.action(), a.brace(),
              a.description(), a.dueDate(), a.assignee(), a.doneAt(), a.doneBy(),
              mapOrNull(from, to, Kind.INSPECTION, a.verifiedByInspectionId()), a.frameMember());
          adopt(from, to, Kind.REPAIR_ACTION, a.id(), () -> to.repairs().addAction(copy));
          exchanged++;
        }
      }
      for (IssuedReport r : from.issuedReports().ofInspection(fromInspection)) {
        if (has(from, to, Kind.ISSUED_REPORT, r.id())) {
          continue;
        }
        adopt(from, to, Kind.ISSUED_REPORT, r.id(), () -> to.issuedReports().add(
            new IssuedReport(0, toInspection, r.kind(), r.fileName(), r.fingerprint(),
                r.recordsFingerprint(), r.origin(), r.issuedAt())));
        exchanged++;
      }
    }
  }

  private static String joined(String note, String more) {
    return note.isBlank() ? more : note + " — " + more;
  }
}
