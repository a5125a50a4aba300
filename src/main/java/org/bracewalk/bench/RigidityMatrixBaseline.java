package org.bracewalk.bench;

import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/**
 * The general-purpose way to decide rigidity: build the bar-and-joint rigidity matrix of the plane
 * (joints at their real coordinates; one row per member, {@code p_a - p_b} in the columns of joint
 * {@code a} and {@code p_b - p_a} in those of {@code b}) and take its rank by a dense singular
 * value decomposition. Free plane: freedoms {@code = 2V - 3 - rank}; pinned base: the columns of
 * the base joints are dropped and freedoms {@code = 2V' - rank} (L. Asimow, B. Roth, Trans. AMS 245
 * (1978); see analysis.md). Rigid members only. O(V^3) time, O(V^2) memory: the point of the
 * comparison.
 */
final class RigidityMatrixBaseline {
  private RigidityMatrixBaseline() {}

  /** Independent motions of the plane with the given (rigid) members and its whole frame. */
  static int freedoms(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return freedoms(grid, members, Set.of());
  }

  /**
   * Independent motions of the plane with the given (rigid) members and every frame member but
   * those in {@code absentFrame}. A joint left with no member at all is left out of the count (its
   * two columns are zero).
   */
  static int freedoms(PlaneGrid grid, Map<PanelRef, Brace> members, Set<FrameRef> absentFrame) {
    int m = grid.lifts();
    int n = grid.bays();
    boolean pinned = grid.support() == Support.PINNED_BASE;
    double[] x = new double[n + 1];
    for (int j = 1; j <= n; j++) {
      x[j] = x[j - 1] + grid.bayWidths().get(j - 1);
    }
    double[] y = new double[m + 1];
    for (int i = 1; i <= m; i++) {
      y[i] = y[i - 1] + grid.liftHeights().get(i - 1);
    }
    int firstLevel = pinned ? 1 : 0; // base joints of a pinned plane are held: no columns
    int joints = (m + 1 - firstLevel) * (n + 1);
    int rows = 0;
    rows += (m + 1 - firstLevel) * n; // horizontals at the levels that can move
    rows += m * (n + 1); // verticals
    for (Brace b : members.values()) {
      rows += b.diagonal().memberCount();
    }
    boolean[] carries = new boolean[(m + 1) * (n + 1)]; // whether a joint carries a member
    DMatrixRMaj a = new DMatrixRMaj(rows, 2 * joints);
    int[] row = {0};
    Bar bar = (i1, j1, i2, j2) -> {
      carries[i1 * (n + 1) + j1] = true;
      carries[i2 * (n + 1) + j2] = true;
      double dx = x[j1] - x[j2];
      double dy = y[i1] - y[i2];
      int r = row[0]++;
      if (i1 >= firstLevel) {
        int c = 2 * ((i1 - firstLevel) * (n + 1) + j1);
        a.set(r, c, dx);
        a.set(r, c + 1, dy);
      }
      if (i2 >= firstLevel) {
        int c = 2 * ((i2 - firstLevel) * (n + 1) + j2);
        a.set(r, c, -dx);
        a.set(r, c + 1, -dy);
      }
    };
    for (int i = firstLevel; i <= m; i++) {
      for (int j = 0; j < n; j++) {
        if (!absentFrame.contains(FrameRef.ledger(i, j + 1))) {
          bar.add(i, j, i, j + 1);
        }
      }
    }
    for (int i = 0; i < m; i++) {
      for (int j = 0; j <= n; j++) {
        if (!absentFrame.contains(FrameRef.standard(i + 1, j))) {
          bar.add(i, j, i + 1, j);
        }
      }
    }
    for (Map.Entry<PanelRef, Brace> e : members.entrySet()) {
      int i = e.getKey().lift();
      int j = e.getKey().bay();
      if (e.getValue().diagonal().hasRising()) {
        bar.add(i - 1, j - 1, i, j);
      }
      if (e.getValue().diagonal().hasFalling()) {
        bar.add(i, j - 1, i - 1, j);
      }
    }
    SingularValueDecomposition_F64<DMatrixRMaj> svd =
        DecompositionFactory_DDRM.svd(a.numRows, a.numCols, false, false, true);
    if (!svd.decompose(a)) {
      throw new IllegalStateException("the singular value decomposition did not converge");
    }
    int rank = SingularOps_DDRM.rank(svd);
    int present = 0;
    for (int v = firstLevel * (n + 1); v < carries.length; v++) {
      present += carries[v] ? 1 : 0;
    }
    return 2 * present - (pinned ? 0 : 3) - rank;
  }

  @FunctionalInterface
  private interface Bar {
    void add(int level1, int line1, int level2, int line2);
  }
}
