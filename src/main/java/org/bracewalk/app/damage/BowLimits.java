package org.bracewalk.app.damage;

import java.time.LocalDate;
import java.util.Objects;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.RackDamageLevel;

/**
 * Judges a measured bow of a racking member by the EN 15635 limits as trade-facts.md gives them:
 * up to the limit, record and monitor; above it up to twice it, offload, do not reload and repair
 * within 4 weeks; above twice it, offload at once and isolate until repaired. The limit holds for a
 * straight edge of 1 m or more and is taken pro rata for a shorter one (EN 15635 via secondary
 * sources). A bow exactly at a threshold belongs to the lower level.
 */
public final class BowLimits {
  /** Measurements are read to a tenth of a millimetre; this keeps 10.0 from reading as 10.0000001. */
  private static final double TOLERANCE_MM = 1e-6;

  private static final int REPAIR_WITHIN_DAYS = 28;

  private BowLimits() {}

  /** The limit for {@code member} over a straight edge of {@code gaugeMm}. */
  public static double limitMm(RackMember member, double gaugeMm) {
    requirePositive(gaugeMm, "gauge length");
    return gaugeMm >= 1000 ? member.limitPerMetreMm() : member.limitPerMetreMm() * gaugeMm / 1000.0;
  }

  /**
   * The damage level of a bow and the date its action falls due.
   *
   * @param bowMm the bow measured from the straight edge, millimetres (0 or more)
   * @param gaugeMm the straight edge's length, millimetres (more than 0)
   * @param inspected the day it was measured; the due dates count from it
   */
  public static BowAssessment assess(RackMember member, double bowMm, double gaugeMm, LocalDate inspected) {
    Objects.requireNonNull(member, "member");
    Objects.requireNonNull(inspected, "inspected");
    if (!(bowMm >= 0) || Double.isInfinite(bowMm)) {
      throw new IllegalArgumentException("bow: must be 0 mm or more, got " + bowMm);
    }
    double limit = limitMm(member, gaugeMm);
    RackDamageLevel level;
    LocalDate due;
    if (bowMm <= limit + TOLERANCE_MM) {
      level = RackDamageLevel.MONITOR;
      due = null;
    } else if (bowMm <= 2 * limit + TOLERANCE_MM) {
      level = RackDamageLevel.REPAIR_WITHIN_4_WEEKS;
      due = inspected.plusDays(REPAIR_WITHIN_DAYS);
    } else {
      level = RackDamageLevel.OFFLOAD_AND_ISOLATE;
      due = inspected;
    }
    return new BowAssessment(bowMm, gaugeMm, limit, level, due);
  }

  private static void requirePositive(double v, String what) {
    if (!(v > 0) || Double.isInfinite(v)) {
      throw new IllegalArgumentException(what + ": must be more than 0 mm, got " + v);
    }
  }
}
