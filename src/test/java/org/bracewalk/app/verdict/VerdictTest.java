package org.bracewalk.app.verdict;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The one classifier: every kind, and the keep-off zone (the lowest lift that can sway and every
 * lift above it, all bays; the whole plane where nothing is held or it leans one way only). Facts
 * from shared/design/analysis.md: on a pinned base a plane is rigid iff every lift has an
 * effective diagonal, a lift above a swaying lift is carried sideways with it, and tension-only
 * members in one way only let the plane lean that way. That an upright frame's keep-off zone takes
 * in the beam bays beside it is common practice for racking (no published source checked).
 */
class VerdictTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();
  private static final Brace RIGID = Brace.rigid(Diagonal.RISING);

  /** A plane with one rigid brace in bay 1 of every lift except those named. */
  private StateAnalysis bracedExcept(PlaneGrid grid, int... unbraced) {
    Map<PanelRef, Brace> m = new HashMap<>();
    outer:
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      for (int u : unbraced) {
        if (u == lift) {
          continue outer;
        }
      }
      m.put(PanelRef.of(lift, 1), RIGID);
    }
    return engine.analyseState(grid, m);
  }

  @Test
  void aSwayingLiftCarriesEveryLiftAboveItSoTheZoneRunsToTheTopOverEveryBay() {
    PlaneGrid grid = PlaneGrid.uniform(5, 4, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.FACADE, bracedExcept(grid, 3), 0, false);
    assertThat(v.kind()).isEqualTo(VerdictKind.LOST);
    assertThat(v.degreesOfFreedom()).isEqualTo(1);
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(3, 4, 5), List.of(1, 2, 3, 4), false));
    assertThat(v.keepOff()).isEqualTo("Keep people and loads off lifts 3-5, bays 1-4 until a competent person has acted.");
    // two swaying lifts: from the lower one up
    Verdict two = Verdict.classify(grid, PlaneRole.FACADE, bracedExcept(grid, 2, 4), 0, false);
    assertThat(two.keepOffZone().orElseThrow().lifts()).containsExactly(2, 3, 4, 5);
  }

  @Test
  void anUprightFrameAlsoOffloadsTheBeamBaysBesideIt() {
    PlaneGrid grid = PlaneGrid.uniform(5, 1, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.UPRIGHT_FRAME, bracedExcept(grid, 1, 2), 0, false);
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(1, 2, 3, 4, 5), List.of(1), true));
    assertThat(v.keepOff()).contains("off-load the beam bays on both sides of this upright frame");
    Verdict other = Verdict.classify(grid, PlaneRole.OTHER, bracedExcept(grid, 1, 2), 0, false);
    assertThat(other.keepOffZone().orElseThrow().offloadBeside()).isFalse();
  }

  @Test
  void aRigidPlaneHasNoZone() {
    PlaneGrid grid = PlaneGrid.uniform(3, 2, Support.PINNED_BASE);
    Verdict v = Verdict.classify(grid, PlaneRole.SPINE, bracedExcept(grid), 0, true);
    assertThat(v.kind()).isEqualTo(VerdictKind.HOLDS);
    assertThat(v.keepOffZone()).isEmpty();
    assertThat(v.keepOff()).isEmpty();
  }

  @Test
  void whenItDependsOnUnseenPanelsTheZoneIsTheWorstCase() {
    PlaneGrid grid = PlaneGrid.uniform(4, 2, Support.PINNED_BASE);
    // lift 2's only brace not inspected: counted missing it sways; if sound it holds
    Verdict v = Verdict.classify(grid, PlaneRole.OTHER, bracedExcept(grid, 2), 1, true);
    assertThat(v.kind()).isEqualTo(VerdictKind.DEPENDS_ON_UNSEEN);
    assertThat(v.keepOffZone()).contains(new KeepOffZone(List.of(2, 3, 4), List.of(1, 2), false));
    // not rigid even if sound: lost, not "depends"
    Verdict lost = Verdict.classify(grid, PlaneRole.OTHER, bracedExcept(grid, 2), 1, false);
    assertThat(lost.kind()).isEqualTo(VerdictKind.LOST);
  }

  @Test
  void aFreePlaneOrOneThatLeansOneWayKeepsEveryLiftOff() {
    PlaneGrid free = PlaneGrid.uniform(2, 2, Support.FREE);
    Map<PanelRef, Brace> two = Map.of(PanelRef.of(1, 1), RIGID, PanelRef.of(2, 1), RIGID);
    Verdict v = Verdict.classify(free, PlaneRole.OTHER, engine.analyseState(free, two), 0, false);
    assertThat(v.kind()).isEqualTo(VerdictKind.LOST);
    assertThat(v.keepOffZone().orElseThrow().lifts()).containsExactly(1, 2);
    assertThat(v.keepOffZone().orElseThrow().bays()).containsExactly(1, 2);

    PlaneGrid pinned = PlaneGrid.uniform(2, 1, Support.PINNED_BASE);
    // one tension-only member in lift 2: it holds one way only
    Map<PanelRef, Brace> slack = Map.of(PanelRef.of(1, 1), RIGID, PanelRef.of(2, 1), Brace.tension(Diagonal.RISING));
    StateAnalysis s = engine.analyseState(pinned, slack);
    Verdict oneWay = Verdict.classify(pinned, PlaneRole.OTHER, s, 0, false);
    assertThat(oneWay.kind()).isEqualTo(VerdictKind.SWAYS_ONE_WAY);
    assertThat(oneWay.keepOffZone().orElseThrow().lifts()).containsExactly(1, 2);
  }

  @Test
  void nothingRecordedIsNotYetInspectedWithTheWorstCaseZone() {
    PlaneGrid grid = PlaneGrid.uniform(2, 2, Support.PINNED_BASE);
    assertThat(Verdict.notInspected(grid, PlaneRole.OTHER).keepOffZone()).isEqualTo(Optional.empty());
    assertThat(Verdict.notInspected(grid, PlaneRole.OTHER).kind()).isEqualTo(VerdictKind.NOT_INSPECTED);
  }
}
