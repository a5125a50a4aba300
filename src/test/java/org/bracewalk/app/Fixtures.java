package org.bracewalk.app;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.DisplayUnits;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.model.StructureKind;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.RecordStore;

/** Small invented records for tests, and a clock that moves one second per reading. */
public final class Fixtures {
  private Fixtures() {}

  /** A clock starting at 2025-03-03 08:00 UTC that advances one second each time it is read. */
  public static final class SteppingClock extends Clock {
    private final AtomicReference<Instant> now;

    public SteppingClock() {
      this(Instant.parse("2025-03-03T08:00:00Z"));
    }

    public SteppingClock(Instant start) {
      now = new AtomicReference<>(start);
    }

    @Override
    public ZoneId getZone() {
      return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(ZoneId zone) {
      return this;
    }

    @Override
    public Instant instant() {
      return now.getAndUpdate(t -> t.plus(Duration.ofSeconds(1)));
    }
  }

  /** Services over one store, with one stepping clock. */
  public record Services(
      RecordStore store,
      Clock clock,
      SiteService sites,
      InspectionService inspections) {
    public static Services over(RecordStore store) {
      Clock clock = new SteppingClock();
      return new Services(
          store, clock, new SiteService(store, clock), new InspectionService(store, clock));
    }
  }

  public static Site site() {
    return new Site(
        0, "Larkspur Yard", "Orrin Vale Storage Ltd", "4 Quarry Lane, Eastmere", "Unit 3",
        ZoneId.of("Europe/London"), DisplayUnits.METRIC);
  }

  public static Structure structure(long siteId) {
    return new Structure(0, siteId, "Aisle B run", StructureKind.RACKING_RUN, "pallet racking",
        "drawing R-12", 7);
  }

  /** A 3-lift, 2-bay pinned-base plane braced / in bay 1 of every lift. */
  public static PlaneDesign threeByTwo() {
    PlaneGrid grid = new PlaneGrid(3, 2, List.of(2.7, 2.7), List.of(1.0, 1.2, 1.2),
        Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int lift = 1; lift <= 3; lift++) {
      braces.put(PanelRef.of(lift, 1), Brace.rigid(Diagonal.RISING));
    }
    return PlaneDesign.of(grid, braces);
  }

  /** A site, a structure and one plane ("spine") with design {@link #threeByTwo()}. */
  public static PlaneRecord plane(Services s) {
    Site site = s.sites().createSite(site());
    Structure structure = s.sites().createStructure(structure(site.id()));
    PlaneDesign design = threeByTwo();
    return s.sites().createPlane(
        new PlaneRecord(0, structure.id(), "spine", design.grid()),
        "D. Fenwick", LocalDate.of(2025, 2, 1), "approved for issue", design);
  }
}
