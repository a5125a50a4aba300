package org.bracewalk.core.model;

import java.util.Objects;

/**
 * One brace plane of a structure as stored: an elevation, a transverse frame, an upright frame,
 * a spine. Its grid (lifts, bays, widths, heights, support) is fixed; the bracing lives in its
 * {@link DesignRevision}s. Widths and heights are kept as whole millimetres in the store, so the
 * grid's metre values are multiples of 0.001.
 *
 * @param id stored id; 0 when new
 * @param structureId the structure it belongs to
 * @param name unique within the structure (the store enforces it)
 * @param grid lifts, bays, dimensions and support
 * @param role what the plane is in its structure (decides what else a keep-off zone covers)
 */
public record PlaneRecord(long id, long structureId, String name, PlaneGrid grid, PlaneRole role) {

  /** A plane of no particular role ({@link PlaneRole#OTHER}). */
  public PlaneRecord(long id, long structureId, String name, PlaneGrid grid) {
    this(id, structureId, name, grid, PlaneRole.OTHER);
  }

  public PlaneRecord {
    Text.id(id, "plane id");
    Text.ref(structureId, "structure");
    name = Text.required(name, "plane name");
    Objects.requireNonNull(grid, "grid");
    Objects.requireNonNull(role, "role");
  }

  public PlaneRecord withId(long newId) {
    return new PlaneRecord(newId, structureId, name, grid, role);
  }
}
