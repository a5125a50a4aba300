package org.bracewalk.app;

import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneLimits;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRetirement;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.RecordStore;

/** Sites, their structures, planes and plane designs: create, list, look up. */
public final class SiteService {
  private final RecordStore store;
  private final Clock clock;

  public SiteService(RecordStore store, Clock clock) {
    this.store = Objects.requireNonNull(store);
    this.clock = Objects.requireNonNull(clock);
  }

  /** Stores a new site (id 0) and returns it with its id. */
  public Site createSite(Site site) {
    requireNew(site.id(), "site");
    return store.sites().add(StoredText.site(site));
  }

  public List<Site> sites() {
    return store.sites().all();
  }

  /** The site with this id; {@link NotFoundException} naming it otherwise. */
  public Site site(long id) {
    return store.sites().find(id).orElseThrow(() -> new NotFoundException("site " + id));
  }

  /** Stores a new structure of an existing site. */
  public Structure createStructure(Structure structure) {
    requireNew(structure.id(), "structure");
    site(structure.siteId());
    return store.structures().add(StoredText.structure(structure));
  }

  public List<Structure> structures(long siteId) {
    site(siteId);
    return store.structures().ofSite(siteId);
  }

  public Structure structure(long id) {
    return store.structures()
        .find(id)
        .orElseThrow(() -> new NotFoundException("structure " + id));
  }

  /** The fewest and most days between routine inspections a structure may have. */
  public static final int MIN_INTERVAL_DAYS = 1;

  public static final int MAX_INTERVAL_DAYS = 366;

  /**
   * Sets the days between routine inspections of a structure: what its "next inspection due"
   * counts from the last finalised inspection. A finalised inspection keeps the interval as at
   * its finalisation (the store keeps it with the inspection), so its reports and their record
   * fingerprint stay as issued.
   *
   * @throws UserInputException naming the field when {@code days} is outside 1 to 366
   */
  public Structure setInspectionInterval(long structureId, int days) {
    if (days < MIN_INTERVAL_DAYS || days > MAX_INTERVAL_DAYS) {
      throw new UserInputException("days between inspections: " + days + " is outside "
          + MIN_INTERVAL_DAYS + " to " + MAX_INTERVAL_DAYS);
    }
    structure(structureId);
    return store.structures().setInspectionInterval(structureId, days)
        .orElseThrow(() -> new NotFoundException("structure " + structureId));
  }

  /**
   * What the rules of the structure's site say against {@code days} between its routine
   * inspections, citing only the site's own jurisdiction ({@link IntervalRules}); empty when
   * nothing. Front ends ask for a confirmation, or print it, before or after setting the days.
   */
  public Optional<IntervalRules.Note> intervalNote(long structureId, int days) {
    Structure st = structure(structureId);
    return IntervalRules.note(site(st.siteId()).jurisdiction(), st.kind(), st.name(), days);
  }

  /**
   * Stores a new plane of an existing structure with its first design revision, in one
   * transaction. Widths and heights are rounded to whole millimetres; the design's grid must then
   * be the plane's.
   */
  public PlaneRecord createPlane(
      PlaneRecord plane, String author, LocalDate date, String approvalNote, PlaneDesign design) {
    requireNew(plane.id(), "plane");
    requireWithinLimits(plane.name(), plane.grid().lifts(), plane.grid().bays(), "lifts", "bays");
    structure(plane.structureId());
    PlaneRecord rounded = StoredText.plane(
        new PlaneRecord(0, plane.structureId(), plane.name(), Millimetres.round(plane.grid()), plane.role()));
    PlaneDesign roundedDesign = Millimetres.round(design);
    requireSameGrid(rounded, roundedDesign);
    return store.inTransaction(
        () -> {
          PlaneRecord stored = store.planes().add(rounded);
          store.designs()
              .add(
                  StoredText.revision(new DesignRevision(
                      0, stored.id(), 1, author, date, approvalNote, clock.instant(),
                      roundedDesign)));
          return stored;
        });
  }

  /** Adds the next design revision of a plane (number = highest + 1) and returns it. */
  public DesignRevision addDesignRevision(
      long planeId, String author, LocalDate date, String approvalNote, PlaneDesign design) {
    PlaneRecord plane = plane(planeId);
    PlaneDesign rounded = Millimetres.round(design);
    requireSameGrid(plane, rounded);
    return store.inTransaction(
        () -> {
          int next = store.designs().latest(planeId).map(r -> r.number() + 1).orElse(1);
          return store.designs()
              .add(StoredText.revision(new DesignRevision(
                      0, planeId, next, author, date, approvalNote, clock.instant(), rounded)));
        });
  }

  public List<PlaneRecord> planes(long structureId) {
    structure(structureId);
    return store.planes().ofStructure(structureId);
  }

  public PlaneRecord plane(long id) {
    return store.planes().find(id).orElseThrow(() -> new NotFoundException("plane " + id));
  }

  /** The latest design revision of a plane. */
  public DesignRevision currentDesign(long planeId) {
    PlaneRecord plane = plane(planeId);
    return store.designs()
        .latest(planeId)
        .orElseThrow(() -> new NotFoundException("design of plane '" + plane.name() + "'"));
  }

  /**
   * Refuses a plane larger than the one limit of a stored plane ({@link PlaneLimits}), naming the
   * plane, its size, the limit and the field it was given in. Front ends call it with the size as
   * typed, before building anything of that size.
   *
   * @throws UserInputException when the plane is larger than the limit
   */
  public static void requireWithinLimits(
      String planeName, long lifts, long bays, String liftsField, String baysField) {
    PlaneLimits.problem(planeName, lifts, bays).ifPresent(problem -> {
      throw new UserInputException(problem + " (field "
          + (PlaneLimits.fieldOver(lifts, bays).equals("lifts") ? liftsField : baysField) + ")");
    });
  }

  /**
   * Retires a plane, for instance one created by mistake: it is kept for the record, with its
   * designs, observations and reports, and inspections started from now on leave it out.
   * Inspections already started keep it as they did (even one started within the same
   * millisecond: the retirement is then recorded one millisecond after it).
   *
   * @throws NotFoundException when there is no such plane
   * @throws UserInputException when the reason is blank or the plane is already retired
   */
  public PlaneRetirement retirePlane(long planeId, String retiredBy, String reasonGiven) {
    PlaneRecord plane = plane(planeId);
    String reason = reasonGiven == null ? null : StoredText.clean(reasonGiven, "reason");
    String by = retiredBy == null ? "" : StoredText.clean(retiredBy, "retired by");
    if (reason == null || reason.isBlank()) {
      throw new UserInputException("say why plane '" + plane.name() + "' (id " + planeId
          + ") is retired: the reason is kept with the record");
    }
    return store.inTransaction(() -> {
      store.planes().retirement(planeId).ifPresent(r -> {
        throw new UserInputException("plane '" + plane.name() + "' (id " + planeId
            + ") is already retired (" + r.retiredAt() + ": " + r.reason() + ")");
      });
      Instant at = clock.instant().truncatedTo(ChronoUnit.MILLIS);
      for (Inspection i : store.inspections().ofStructure(plane.structureId())) {
        if (!i.startedAt().isBefore(at)) {
          at = i.startedAt().truncatedTo(ChronoUnit.MILLIS).plusMillis(1);
        }
      }
      return store.planes().retire(new PlaneRetirement(planeId, at, by, reason));
    });
  }

  /** The retirement of a plane, if it is retired. */
  public Optional<PlaneRetirement> retirement(long planeId) {
    plane(planeId);
    return store.planes().retirement(planeId);
  }

  /** The retirements of the planes of a structure, by plane id. */
  public List<PlaneRetirement> retirements(long structureId) {
    structure(structureId);
    return store.planes().retirementsOf(structureId);
  }

  static void requireSameGrid(PlaneRecord plane, PlaneDesign design) {
    if (!plane.grid().equals(design.grid())) {
      throw new UserInputException(
          "the design's grid ("
              + design.grid().lifts()
              + " lifts x "
              + design.grid().bays()
              + " bays, "
              + design.grid().support().label()
              + ") differs from plane '"
              + plane.name()
              + "' ("
              + plane.grid().lifts()
              + " x "
              + plane.grid().bays()
              + ", "
              + plane.grid().support().label()
              + ", with its widths and heights); give a design of the same grid");
    }
  }

  private static void requireNew(long id, String what) {
    if (id != 0) {
      throw new IllegalArgumentException("a new " + what + " has id 0, got " + id);
    }
  }
}
