package org.bracewalk.core.model;

/**
 * What a brace plane is in its structure. It decides what else must be kept clear when the plane
 * loses rigidity: a racking upright frame carries the beam bays on both sides of it, so their
 * loads come off too (common practice in racking inspection: the beam levels either side of a
 * damaged upright frame are off-loaded).
 */
public enum PlaneRole {
  UPRIGHT_FRAME("upright-frame", "upright frame"),
  SPINE("spine", "spine"),
  FACADE("facade", "facade"),
  TRANSVERSE_FRAME("transverse-frame", "transverse frame"),
  PLAN_BRACING("plan-bracing", "plan bracing"),
  OTHER("other", "other");

  private final String label;
  private final String words;

  PlaneRole(String label, String words) {
    this.label = label;
    this.words = words;
  }

  /** The file, database and command-line spelling. */
  public String label() {
    return label;
  }

  /** The words a person reads. */
  public String words() {
    return words;
  }

  /** Parses a label; throws naming the value and the choices otherwise. */
  public static PlaneRole fromLabel(String label) {
    for (PlaneRole r : values()) {
      if (r.label.equals(label)) {
        return r;
      }
    }
    throw new IllegalArgumentException("unknown plane role '" + label + "': use upright-frame,"
        + " spine, facade, transverse-frame, plan-bracing or other");
  }
}
