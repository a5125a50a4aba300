package org.bracewalk.ui.design;

import java.time.Clock;
import java.time.LocalDate;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Supplier;
import org.bracewalk.app.SiteService;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.Millimetres;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.ui.common.DialogService;

/**
 * Saves the editor's design through the site service. A stored plane's grid is fixed (its
 * inspections refer to its panels), so a design on the same grid becomes the plane's next revision
 * and a design on a changed grid becomes a new plane of the same structure, named by the person.
 * After that the saver goes on with the new plane: the next save is its next revision.
 */
public final class PlaneDesignSaver implements DesignSaver {
  private final SiteService sites;
  private final Clock clock;
  private final DialogService dialogs;
  /** The plane edited: set on the background thread by a save as a new plane, read on the UI thread. */
  private volatile PlaneRecord plane;
  /** Its latest revision's number, likewise. */
  private volatile int revision;

  public PlaneDesignSaver(SiteService sites, PlaneRecord plane, Clock clock, DialogService dialogs) {
    this(sites, plane, 0, clock, dialogs);
  }

  /** @param revision the number of the plane's revision the editor starts from (0: not known) */
  public PlaneDesignSaver(SiteService sites, PlaneRecord plane, int revision, Clock clock, DialogService dialogs) {
    this.sites = Objects.requireNonNull(sites, "sites");
    this.plane = Objects.requireNonNull(plane, "plane");
    this.revision = revision;
    this.clock = Objects.requireNonNull(clock, "clock");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
  }

  @Override
  public String title() {
    PlaneRecord p = plane;
    int r = revision;
    return p.name() + (r > 0 ? " (revision " + r + ")" : "");
  }

  @Override
  public long planeId() {
    return plane.id();
  }

  @Override
  public String save(PlaneDesign design, String author, String note) {
    return save(design, author, note, plane.role());
  }

  @Override
  public PlaneRole role() {
    return plane.role();
  }

  @Override
  public String save(PlaneDesign design, String author, String note, PlaneRole role) {
    return prepare(design, author, note, role).get();
  }

  /** Refuses a changed role and asks the new plane's name here; the returned work only stores. */
  @Override
  public Supplier<String> prepare(PlaneDesign design, String author, String note, PlaneRole role) {
    LocalDate today = LocalDate.now(clock);
    PlaneRecord plane = this.plane;
    if (Millimetres.round(design.grid()).equals(Millimetres.round(plane.grid()))) {
      if (role != plane.role()) {
        throw new IllegalStateException("plane '" + plane.name() + "' is stored as " + plane.role().words()
            + " and a stored plane's role is fixed: choose " + plane.role().words()
            + " to save a revision, or change the grid to save a new plane of another role");
      }
      return () -> {
        DesignRevision r = sites.addDesignRevision(plane.id(), author, today, note, design);
        revision = r.number();
        return "revision " + r.number() + " of plane '" + plane.name() + "'";
      };
    }
    Optional<String> name =
        dialogs.askText(
            "Save as a new plane",
            "The lifts, bays, sizes or support differ from plane '" + plane.name() + "', whose grid is"
                + " fixed because its inspections refer to its panels. Name the new plane of the same"
                + " structure:",
            plane.name() + " (new grid)");
    if (name.isEmpty()) {
      throw new SaveDeclined("no name given for the new plane");
    }
    String chosen = name.get();
    return () -> {
      PlaneRecord p =
          sites.createPlane(new PlaneRecord(0, plane.structureId(), chosen, design.grid(), role), author, today,
              note, design);
      this.plane = p;
      revision = 1;
      return "new plane '" + p.name() + "', revision 1";
    };
  }
}
