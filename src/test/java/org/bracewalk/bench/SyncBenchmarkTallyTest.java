package org.bracewalk.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The benchmark's own check of "exactly once", by global identity: a record the server lacks is
 * missing; one it holds twice, or holds under an identity no field file has (a record stored
 * again under a new identity), is doubled. Plain set arithmetic, worked by hand below.
 */
class SyncBenchmarkTallyTest {
  private static final Set<String> FIELD = Set.of("a", "b", "c");

  @Test
  void everyRecordOnceIsNeitherMissingNorDoubled() {
    List<String> server = List.of("c", "a", "b");
    assertThat(SyncBenchmark.missing(FIELD, server)).isZero();
    assertThat(SyncBenchmark.extra(FIELD, server)).isZero();
    assertThat(new SyncBenchmark.Tally(3, 3, 0, 0, 6, 6, 0, 0).exactlyOnce()).isTrue();
  }

  @Test
  void aRecordTheServerLacksIsMissing() {
    List<String> server = List.of("a", "c");
    assertThat(SyncBenchmark.missing(FIELD, server)).isEqualTo(1);
    assertThat(SyncBenchmark.extra(FIELD, server)).isZero();
    assertThat(new SyncBenchmark.Tally(3, 2, 1, 0, 6, 6, 0, 0).exactlyOnce()).isFalse();
  }

  @Test
  void aRecordHeldTwiceOrUnderANewIdentityIsDoubled() {
    assertThat(SyncBenchmark.extra(FIELD, List.of("a", "b", "c", "b"))).isEqualTo(1);
    assertThat(SyncBenchmark.extra(FIELD, List.of("a", "b", "c", "x"))).isEqualTo(1);
    assertThat(SyncBenchmark.missing(FIELD, List.of("a", "b", "c", "x"))).isZero();
    // the counts alone also tell: four held where three were expected
    assertThat(new SyncBenchmark.Tally(3, 4, 0, 0, 6, 6, 0, 0).exactlyOnce()).isFalse();
    assertThat(new SyncBenchmark.Tally(3, 3, 0, 0, 6, 7, 0, 1).exactlyOnce()).isFalse();
  }
}
