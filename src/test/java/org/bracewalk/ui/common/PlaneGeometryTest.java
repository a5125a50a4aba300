package org.bracewalk.ui.common;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class PlaneGeometryTest {
  private final PlaneGrid grid =
      new PlaneGrid(3, 2, List.of(2.4, 1.2), List.of(2.0, 1.0, 1.0), Support.PINNED_BASE);
  private final PlaneGeometry geo = new PlaneGeometry(grid, 400, 400, 40, 20);

  @Test
  void aRisingBraceRunsFromBottomLeftToTopRightOnScreen() {
    // screen y grows downwards: the start of '/' must have the larger y and the smaller x
    double[] s = geo.member(new PanelRef(1, 1), true, 0);
    assertThat(s[0]).isLessThan(s[2]);
    assertThat(s[1]).isGreaterThan(s[3]);
    assertThat(s[1]).isEqualTo(geo.levelY(0));
    assertThat(s[3]).isEqualTo(geo.levelY(1));
  }

  @Test
  void aFallingBraceRunsFromTopLeftToBottomRightOnScreen() {
    double[] s = geo.member(new PanelRef(2, 2), false, 0);
    assertThat(s[0]).isLessThan(s[2]);
    assertThat(s[1]).isLessThan(s[3]);
  }

  @Test
  void aCrossHasBothMembersAndTheyAreMirrorImages() {
    double[][] segs = geo.members(new PanelRef(3, 1), Diagonal.BOTH, 2);
    assertThat(segs).hasNumberOfRows(2);
    assertThat(segs[0][1]).isEqualTo(segs[1][3]);
    assertThat(segs[0][3]).isEqualTo(segs[1][1]);
  }

  @Test
  void liftOneIsAtTheBottomAndHigherLiftsHaveSmallerScreenY() {
    assertThat(geo.bottom(new PanelRef(1, 1))).isGreaterThan(geo.bottom(new PanelRef(2, 1)));
    assertThat(geo.top(new PanelRef(3, 1))).isEqualTo(geo.levelY(3));
  }

  @Test
  void panelsAreDrawnToScale() {
    // bay 1 is 2.4 m, bay 2 is 1.2 m; lift 1 is 2.0 m, lift 2 is 1.0 m
    // grid lines sit on whole pixels, so sizes are true to within a pixel
    assertThat(geo.panelWidth(new PanelRef(1, 1)))
        .isCloseTo(2 * geo.panelWidth(new PanelRef(1, 2)), within(2.0));
    assertThat(geo.panelHeight(new PanelRef(1, 1)))
        .isCloseTo(2 * geo.panelHeight(new PanelRef(2, 1)), within(2.0));
    assertThat(geo.panelWidth(new PanelRef(1, 1)))
        .isCloseTo(2.4 * geo.scale(), within(1.0));
    assertThat(geo.panelHeight(new PanelRef(1, 1)))
        .isCloseTo(2.0 * geo.scale(), within(1.0));
  }

  @Test
  void aPointInsideAPanelPicksThatPanelAndOutsidePicksNothing() {
    for (int i = 1; i <= 3; i++) {
      for (int j = 1; j <= 2; j++) {
        PanelRef p = new PanelRef(i, j);
        double x = (geo.left(p) + geo.right(p)) / 2;
        double y = (geo.top(p) + geo.bottom(p)) / 2;
        assertThat(geo.panelAt(x, y)).isEqualTo(p);
      }
    }
    assertThat(geo.panelAt(geo.lineX(0) - 1, geo.levelY(0) - 5)).isNull();
    assertThat(geo.panelAt(geo.lineX(1), geo.levelY(0) + 1)).isNull();
  }
}
