package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

class RangesTest {
  @Test
  void runsOfThreeOrMoreBecomeRanges() {
    assertThat(Ranges.compact(List.of(5, 1, 3, 4, 8, 9))).isEqualTo("1, 3\u20135, 8, 9");
  }

  @Test
  void oneNumberTakesTheSingularWord() {
    assertThat(Ranges.named("lift", "lifts", List.of(3))).isEqualTo("lift 3");
    assertThat(Ranges.named("lift", "lifts", List.of(3, 4, 5))).isEqualTo("lifts 3\u20135");
    assertThat(Ranges.named("lift", "lifts", List.of())).isEmpty();
  }
}
