package org.bracewalk.core.port.report;

import java.time.LocalDate;
import java.util.Objects;

/**
 * A measured bow of a racking member judged against its limit.
 *
 * @param bowMm the bow measured from the straight edge, millimetres
 * @param gaugeMm the length of straight edge (gauge) it was measured over, millimetres
 * @param limitMm the limit for that member and gauge (pro rata below 1 m)
 * @param level the damage level
 * @param dueDate when the action falls due: the inspection day for offload-and-isolate, four weeks
 *     later for a repair, {@code null} for monitor (next inspection)
 */
public record BowAssessment(
    double bowMm, double gaugeMm, double limitMm, RackDamageLevel level, LocalDate dueDate) {
  public BowAssessment {
    Objects.requireNonNull(level, "level");
  }
}
