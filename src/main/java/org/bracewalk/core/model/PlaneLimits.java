package org.bracewalk.core.model;

import java.util.Optional;

/**
 * The one size limit of a stored plane, used wherever a plane is created: the command line, the
 * app's design editor, the site file, a design panel map, and the database (migration V6 refuses
 * a larger plane with the same numbers).
 *
 * <p>Why these numbers: a scaffold lift is about 2 m, so 100 lifts is a 200 m scaffold; a bay is
 * about 2.5 m, so 500 bays is a run over a kilometre long (common practice; no scaffold or
 * racking run on record comes near either). A full-size plane, 100 x 500 unbraced, was measured
 * on a shared two-core machine at about 1.2 s for {@code analyse} and 4 to 4.5 s for {@code
 * report} (a 1.9 MB PDF); 200 x 1000 took 1.5 to 3 s and 6 to 12 s (7 MB), which is why the limit is not
 * larger. {@code check} and {@code bench} analyse panel maps without storing them and keep their
 * own, larger bounds.
 */
public final class PlaneLimits {
  /** The most lifts (rows) a stored plane may have. */
  public static final int MAX_LIFTS = 100;

  /** The most bays (columns) a stored plane may have. */
  public static final int MAX_BAYS = 500;

  private PlaneLimits() {}

  /** Whether a plane of this many lifts and bays may be stored (long: no overflow on input). */
  public static boolean fits(long lifts, long bays) {
    return lifts <= MAX_LIFTS && bays <= MAX_BAYS;
  }

  /**
   * The reason a plane of this size may not be stored, naming the plane, its size and the limit;
   * empty when it fits. Callers add the field they read the size from.
   */
  public static Optional<String> problem(String planeName, long lifts, long bays) {
    if (fits(lifts, bays)) {
      return Optional.empty();
    }
    String who = planeName == null || planeName.isBlank() ? "the plane" : "plane '" + planeName.strip() + "'";
    return Optional.of(who + ": " + lifts + (lifts == 1 ? " lift" : " lifts") + " x " + bays
        + (bays == 1 ? " bay" : " bays") + " is larger than the limit of " + describe()
        + " a stored plane may have");
  }

  /** Which of the two is over its limit: {@code "lifts"} (checked first) or {@code "bays"}. */
  public static String fieldOver(long lifts, long bays) {
    return lifts > MAX_LIFTS ? "lifts" : "bays";
  }

  /** The limit in words: {@code 100 lifts x 500 bays}. */
  public static String describe() {
    return MAX_LIFTS + " lifts x " + MAX_BAYS + " bays";
  }
}
