package org.bracewalk.app.damage;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.LocalDate;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.RackDamageLevel;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * Test vectors from shared/design/trade-facts.md: a bracing member may bow 10 mm over a 1 m straight
 * edge (DIN EN 15635:2009-08 Fig. 14 as reproduced in DGUV Information 208-043, read); above the
 * limit up to twice it, repair within 4 weeks; above twice it, offload and isolate (EN 15635 via
 * secondary sources); shorter gauges pro rata.
 */
class BowLimitsTest {
  private static final LocalDate DAY = LocalDate.of(2025, 3, 14);

  @ParameterizedTest(name = "bracing, {0} mm over {1} mm: {2}")
  @CsvSource({
    "0.0, 1000, MONITOR",
    "10.0, 1000, MONITOR",
    "10.1, 1000, REPAIR_WITHIN_4_WEEKS",
    "20.0, 1000, REPAIR_WITHIN_4_WEEKS",
    "20.1, 1000, OFFLOAD_AND_ISOLATE",
    // over more than 1 m the limit stays 10 mm
    "10.0, 1500, MONITOR",
    "20.1, 1500, OFFLOAD_AND_ISOLATE",
    // half the gauge, half the limit
    "5.0, 500, MONITOR",
    "5.1, 500, REPAIR_WITHIN_4_WEEKS",
    "10.0, 500, REPAIR_WITHIN_4_WEEKS",
    "10.1, 500, OFFLOAD_AND_ISOLATE",
    "3.0, 300, MONITOR",
    "6.0, 300, REPAIR_WITHIN_4_WEEKS",
    "6.1, 300, OFFLOAD_AND_ISOLATE"
  })
  void aBracingMemberIsJudgedByTheTenMillimetreLimit(double bow, double gauge, RackDamageLevel level) {
    assertThat(BowLimits.assess(RackMember.BRACING, bow, gauge, DAY).level()).isEqualTo(level);
  }

  @Test
  void uprightsHaveTheirOwnLimits() {
    // 5 mm in the beam direction, 3 mm in the plane of the frame bracing (DGUV 208-043, read)
    assertThat(BowLimits.assess(RackMember.UPRIGHT_BEAM_DIRECTION, 5.0, 1000, DAY).level())
        .isEqualTo(RackDamageLevel.MONITOR);
    assertThat(BowLimits.assess(RackMember.UPRIGHT_BEAM_DIRECTION, 5.1, 1000, DAY).level())
        .isEqualTo(RackDamageLevel.REPAIR_WITHIN_4_WEEKS);
    assertThat(BowLimits.assess(RackMember.UPRIGHT_FRAME_PLANE, 6.1, 1000, DAY).level())
        .isEqualTo(RackDamageLevel.OFFLOAD_AND_ISOLATE);
  }

  @Test
  void dueDatesCountFromTheDayOfMeasurement() {
    BowAssessment monitor = BowLimits.assess(RackMember.BRACING, 4, 1000, DAY);
    BowAssessment repair = BowLimits.assess(RackMember.BRACING, 12, 1000, DAY);
    BowAssessment isolate = BowLimits.assess(RackMember.BRACING, 25, 1000, DAY);
    assertThat(monitor.dueDate()).isNull();
    assertThat(repair.dueDate()).isEqualTo(LocalDate.of(2025, 4, 11));
    assertThat(isolate.dueDate()).isEqualTo(DAY);
    assertThat(repair.limitMm()).isEqualTo(10.0);
  }

  @Test
  void impossibleMeasurementsAreRefusedNamingTheField() {
    assertThatThrownBy(() -> BowLimits.assess(RackMember.BRACING, -1, 1000, DAY))
        .hasMessageContaining("bow: must be 0 mm or more");
    assertThatThrownBy(() -> BowLimits.assess(RackMember.BRACING, 3, 0, DAY))
        .hasMessageContaining("gauge length: must be more than 0 mm");
    assertThatThrownBy(() -> BowLimits.assess(RackMember.BRACING, Double.NaN, 1000, DAY))
        .hasMessageContaining("bow");
  }
}
