package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/**
 * The bar-and-joint framework of a brace plane, built from first principles and independent of
 * the engine: joints at the real coordinates (uneven bay widths and lift heights), one bar per grid
 * line, one bar per rigid diagonal member (a cross is two bars), one cable per tension-only
 * member.
 *
 * <p>Rigidity matrix (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245 (1978)): one row
 * per member (a, b), {@code p_a - p_b} in a's columns and {@code p_b - p_a} in b's. Free plane:
 * freedoms = 2V - 3 - rank. Pinned base: the columns of the n + 1 base joints are dropped, freedoms
 * = 2V' - rank. The rank comes from the singular values (EJML).
 *
 * <p>Cables (B. Roth, W. Whiteley, "Tensegrity frameworks", Trans. AMS 265 (1981)): a cable may
 * shorten (go slack) but not lengthen, so an admissible first-order motion v has {@code r_c . v <=
 * 0} for every cable row r_c and {@code r . v = 0} for every bar row. The framework is rigid iff
 * every admissible motion is trivial. (Flipping every cable into a strut maps v to -v and gives the
 * same verdict, so the sign convention cannot change the answer.)
 */
final class BarJointFramework {
  /** Singular values below this fraction of the largest count as zero. */
  private static final double ZERO = 1e-9;
  /** Singular values inside (AMBIGUOUS_LOW, AMBIGUOUS_HIGH) times the largest make the rank unsure. */
  private static final double AMBIGUOUS_LOW = 1e-13;

  private static final double AMBIGUOUS_HIGH = 1e-6;

  private final PlaneGrid grid;
  private final int lifts;
  private final int bays;
  private final double[] x;
  private final double[] y;
  private final List<int[]> bars = new ArrayList<>();
  private final List<int[]> cables = new ArrayList<>();

  BarJointFramework(PlaneGrid grid, Map<PanelRef, Brace> members) {
    this.grid = grid;
    this.lifts = grid.lifts();
    this.bays = grid.bays();
    int joints = (lifts + 1) * (bays + 1);
    x = new double[joints];
    y = new double[joints];
    double level = 0;
    for (int i = 0; i <= lifts; i++) {
      if (i > 0) {
        level += grid.liftHeights().get(i - 1);
      }
      double line = 0;
      for (int j = 0; j <= bays; j++) {
        if (j > 0) {
          line += grid.bayWidths().get(j - 1);
        }
        x[joint(i, j)] = line;
        y[joint(i, j)] = level;
      }
    }
    for (int i = 0; i <= lifts; i++) {
      for (int j = 1; j <= bays; j++) {
        bars.add(new int[] {joint(i, j - 1), joint(i, j)});
      }
    }
    for (int i = 1; i <= lifts; i++) {
      for (int j = 0; j <= bays; j++) {
        bars.add(new int[] {joint(i - 1, j), joint(i, j)});
      }
    }
    for (Map.Entry<PanelRef, Brace> e : members.entrySet()) {
      PanelRef p = e.getKey();
      Brace b = e.getValue();
      List<int[]> into = b.isRigid() ? bars : cables;
      if (b.diagonal().hasRising()) {
        into.add(risingMember(p));
      }
      if (b.diagonal().hasFalling()) {
        into.add(fallingMember(p));
      }
    }
  }

  int joint(int level, int line) {
    return level * (bays + 1) + line;
  }

  double x(int level, int line) {
    return x[joint(level, line)];
  }

  double y(int level, int line) {
    return y[joint(level, line)];
  }

  int jointCount() {
    return x.length;
  }

  int levelOf(int joint) {
    return joint / (bays + 1);
  }

  int lineOf(int joint) {
    return joint % (bays + 1);
  }

  /** Length of a member (a joint pair) in the plane at rest. */
  double restLength(int[] member) {
    return Math.hypot(x[member[0]] - x[member[1]], y[member[0]] - y[member[1]]);
  }

  /** Length of a member (a joint pair) in a moved shape. */
  double lengthIn(MechanismShape s, int[] member) {
    int a = member[0];
    int b = member[1];
    return Math.hypot(
        s.x(levelOf(a), lineOf(a)) - s.x(levelOf(b), lineOf(b)),
        s.y(levelOf(a), lineOf(a)) - s.y(levelOf(b), lineOf(b)));
  }

  /** '/' in model coordinates (y up): bottom-left corner to top-right corner of the panel. */
  int[] risingMember(PanelRef p) {
    return new int[] {joint(p.lift() - 1, p.bay() - 1), joint(p.lift(), p.bay())};
  }

  /** '\' in model coordinates: top-left corner to bottom-right corner of the panel. */
  int[] fallingMember(PanelRef p) {
    return new int[] {joint(p.lift(), p.bay() - 1), joint(p.lift() - 1, p.bay())};
  }

  /** Every member (grid bars, rigid diagonals, cables) as joint pairs. */
  List<int[]> allMembers() {
    List<int[]> all = new ArrayList<>(bars);
    all.addAll(cables);
    return all;
  }

  int cableCount() {
    return cables.size();
  }

  /** Freedoms with every member, cables included, as a bar (the engine's degrees of freedom). */
  int freedoms() {
    return freedomsOf(allMembers());
  }

  /** Freedoms with the cables left out. */
  int freedomsWithoutCables() {
    return freedomsOf(bars);
  }

  /**
   * Whether some nontrivial admissible first-order motion strictly shortens a cable: minimise the
   * sum of the cables' length rates over bars-keep-length, cables-do-not-lengthen, |v_k| <= 1, with
   * the trivial motions removed (pinned base: base joints held; free: joint (0,0) held and joint
   * (0,1) kept on the base line, which the base ledger allows only because the ledger is a bar).
   * Each cable rate is <= 0, so the minimum is negative iff some cable can go slack.
   */
  boolean someCableCanSlacken() {
    if (cables.isEmpty()) {
      return false;
    }
    int[][] cols = columns(true);
    int vars = cols[2][0];
    List<LinearConstraint> constraints = new ArrayList<>();
    for (int[] bar : bars) {
      double[] r = row(bar, cols, vars);
      if (nonZero(r)) {
        constraints.add(new LinearConstraint(r, Relationship.EQ, 0));
      }
    }
    double[] objective = new double[vars];
    for (int[] cable : cables) {
      double[] r = row(cable, cols, vars);
      if (nonZero(r)) {
        constraints.add(new LinearConstraint(r, Relationship.LEQ, 0));
        for (int k = 0; k < vars; k++) {
          objective[k] += r[k];
        }
      }
    }
    for (int k = 0; k < vars; k++) {
      double[] unit = new double[vars];
      unit[k] = 1;
      constraints.add(new LinearConstraint(unit, Relationship.LEQ, 1));
      constraints.add(new LinearConstraint(unit, Relationship.GEQ, -1));
    }
    PointValuePair best =
        new SimplexSolver()
            .optimize(
                new MaxIter(100_000),
                new LinearObjectiveFunction(objective, 0),
                new LinearConstraintSet(constraints),
                GoalType.MINIMIZE,
                new NonNegativeConstraint(false));
    return best.getValue() < -1e-7;
  }

  /**
   * The tensegrity verdict (Roth and Whiteley 1981): rigid iff the matrix with cables as bars has
   * no nontrivial kernel (else a motion keeps every length) and no admissible motion slackens a
   * cable (else a motion keeps the bars and lets some cable go slack).
   */
  boolean rigidWithCables() {
    return freedoms() == 0 && !someCableCanSlacken();
  }

  private int freedomsOf(List<int[]> members) {
    int[][] cols = columns(false);
    int vars = cols[2][0];
    double[][] rows = new double[members.size()][];
    for (int k = 0; k < members.size(); k++) {
      rows[k] = row(members.get(k), cols, vars);
    }
    int rank = rank(rows, vars);
    int joints = x.length;
    return grid.support() == Support.FREE ? 2 * joints - 3 - rank : vars - rank;
  }

  /**
   * Column of each joint's x and y ({@code -1}: dropped), and the column count in {@code [2][0]}.
   * Pinned base drops the base joints; {@code normalised} on a free plane also drops the x and y of
   * joint (0,0) and the y of joint (0,1), which removes the three trivial motions.
   */
  private int[][] columns(boolean normalised) {
    int joints = x.length;
    int[] cx = new int[joints];
    int[] cy = new int[joints];
    int next = 0;
    for (int v = 0; v < joints; v++) {
      boolean base = v <= bays;
      boolean dropX;
      boolean dropY;
      if (grid.support() == Support.PINNED_BASE) {
        dropX = base;
        dropY = base;
      } else if (normalised) {
        dropX = v == joint(0, 0);
        dropY = v == joint(0, 0) || v == joint(0, 1);
      } else {
        dropX = false;
        dropY = false;
      }
      cx[v] = dropX ? -1 : next++;
      cy[v] = dropY ? -1 : next++;
    }
    return new int[][] {cx, cy, {next}};
  }

  private double[] row(int[] member, int[][] cols, int vars) {
    int a = member[0];
    int b = member[1];
    double dx = x[a] - x[b];
    double dy = y[a] - y[b];
    double[] r = new double[vars];
    put(r, cols[0][a], dx);
    put(r, cols[1][a], dy);
    put(r, cols[0][b], -dx);
    put(r, cols[1][b], -dy);
    return r;
  }

  private static void put(double[] r, int col, double value) {
    if (col >= 0) {
      r[col] += value;
    }
  }

  private static boolean nonZero(double[] r) {
    for (double v : r) {
      if (v != 0) {
        return true;
      }
    }
    return false;
  }

  /** Numerical rank from the singular values; fails loudly when the rank is not clear-cut. */
  static int rank(double[][] rows, int cols) {
    if (rows.length == 0 || cols == 0) {
      return 0;
    }
    DMatrixRMaj a = new DMatrixRMaj(rows);
    SingularValueDecomposition_F64<DMatrixRMaj> svd =
        DecompositionFactory_DDRM.svd(a.numRows, a.numCols, false, false, true);
    if (!svd.decompose(a)) {
      throw new AssertionError("SVD did not converge for a " + rows.length + " x " + cols + " matrix");
    }
    double[] s = svd.getSingularValues();
    int count = svd.numberOfSingularValues();
    double max = 0;
    for (int k = 0; k < count; k++) {
      max = Math.max(max, s[k]);
    }
    int rank = 0;
    for (int k = 0; k < count; k++) {
      if (s[k] > max * AMBIGUOUS_LOW && s[k] < max * AMBIGUOUS_HIGH) {
        throw new AssertionError(
            "rank not clear-cut: singular value " + s[k] + " against largest " + max);
      }
      if (s[k] > max * ZERO) {
        rank++;
      }
    }
    return rank;
  }
}
