package org.bracewalk.app.verdict;


/**
 * The cautions every Bracewalk output carries, from "Cautions every output carries" in {@code
 * shared/design/trade-facts.md}, in the project's own words. Reports, screens and the command line
 * all take them from here so they never drift apart.
 */
public final class Cautions {

  /** The standing caution: what the check is and what it is not. */
  public static final String STANDING =
      "Bracewalk checks only whether the bracing keeps the plane in shape, on a model in which every"
          + " joint is a pin. It does not check the strength of members, connections, ties,"
          + " foundations, loads, plumb or stability under load, and it is no substitute for the"
          + " inspection itself. Restoring rigidity, any departure from the design, and any structure"
          + " tall enough to need an engineered design must be reviewed by a licensed engineer (or"
          + " the system's manufacturer) under the local codes that apply.";

  private Cautions() {}

  /**
   * What to do while a plane has lost rigidity, naming where: {@code Keep people and loads off
   * lifts 3-5, bays 1-5 until a competent person has acted.} For an upright frame it adds the beam
   * bays either side.
   */
  public static String keepOff(KeepOffZone zone) {
    return "Keep people and loads off " + zone.where()
        + (zone.offloadBeside()
            ? ", and off-load the beam bays on both sides of this upright frame,"
            : "")
        + " until a competent person has acted.";
  }
}
