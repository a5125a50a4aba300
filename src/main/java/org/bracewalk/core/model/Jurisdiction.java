package org.bracewalk.core.model;

/**
 * Whose rules a site stands under. The report cites the regulations of its site's jurisdiction
 * only, and asks for the particulars they require (see shared/design/trade-facts.md):
 *
 * <ul>
 *   <li>{@link #UK}: the Work at Height Regulations 2005 (reg. 12, Schedule 7); racking HSE HSG76
 *       and EN 15635;
 *   <li>{@link #US}: 29 CFR 1926.451 (scaffolds);
 *   <li>{@link #EU}: for racking EN 15635; no scaffold report contents are cited (the project
 *       holds no checked source for them);
 *   <li>{@link #OTHER}: none recorded; the report cites no regulation and says so. Sites stored
 *       before jurisdictions were recorded are {@code OTHER}: nothing in their records says which
 *       rules apply, and a migration does not guess.
 * </ul>
 */
public enum Jurisdiction {
  UK("uk", "United Kingdom"),
  US("us", "United States"),
  EU("eu", "European Union"),
  OTHER("other", "other or not recorded");

  private final String label;
  private final String title;

  Jurisdiction(String label, String title) {
    this.label = label;
    this.title = title;
  }

  /** The file, database and command-line spelling: {@code uk}, {@code us}, {@code eu}, {@code other}. */
  public String label() {
    return label;
  }

  /** A name to show people, such as "United Kingdom". */
  public String title() {
    return title;
  }

  /** Parses {@code uk}, {@code us}, {@code eu} or {@code other}; throws naming the value otherwise. */
  public static Jurisdiction fromLabel(String label) {
    for (Jurisdiction j : values()) {
      if (j.label.equals(label)) {
        return j;
      }
    }
    throw new IllegalArgumentException(
        "unknown jurisdiction '" + label + "': use uk, us, eu or other");
  }
}
