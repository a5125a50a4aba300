package org.bracewalk.ui.common;

/**
 * What the screens are about: a structure, one of its planes, and the inspection being worked on
 * or looked at. Ids are the records' ids; 0 means none chosen.
 *
 * @param structureId the structure, 0 for none
 * @param planeId the plane, 0 for none
 * @param inspectionId the inspection, 0 for none
 */
public record Selection(long structureId, long planeId, long inspectionId) {
  public static final Selection NONE = new Selection(0, 0, 0);

  public Selection {
    if (structureId < 0 || planeId < 0 || inspectionId < 0) {
      throw new IllegalArgumentException("ids are 0 (none) or positive");
    }
  }

  public boolean hasPlane() {
    return planeId > 0;
  }

  public boolean hasInspection() {
    return inspectionId > 0;
  }

  public Selection withPlane(long structure, long plane) {
    return new Selection(structure, plane, structure == structureId ? inspectionId : 0);
  }
}
