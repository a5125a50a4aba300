package org.bracewalk.core.analysis;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
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
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;

/**
 * An oracle for planes whose frame may be incomplete, built from first principles and independent
 * of the engine: the bar-and-joint framework of every ledger, standard and diagonal that is there,
 * joints at the real coordinates (uneven bay widths and lift heights), pinned joints. An X is two
 * bars that cross without a joint. A joint with no member is left out.
 *
 * <p>Rigidity matrix (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245 (1978)): one row
 * per member (a, b), {@code p_a - p_b} in a's columns and {@code p_b - p_a} in b's. Pinned base: the
 * columns of the base joints are dropped, freedoms = 2V' - rank (V' the other joints that carry a
 * member); free plane: freedoms = 2V - 3 - rank. The rank is EXACT: the widths and heights are whole
 * centimetres, so every entry is an integer, and the rank comes from fraction-free elimination over
 * {@link BigInteger} (integer row operations that keep the row space over the rationals, each row
 * divided by the gcd of its entries). {@link #ejmlRank()} gives EJML's singular-value rank for a
 * second, independent opinion.
 *
 * <p>Tension-only members (cables): the engine's degrees of freedom count them as bars. The verdict
 * with cables is the tensegrity test of B. Roth, W. Whiteley, "Tensegrity frameworks", Trans. AMS
 * 265 (1981): rigid iff the matrix with cables as bars has full rank and no nonzero first-order
 * motion v with {@code R_bars v = 0} and {@code R_cables v <= 0} shortens a cable (a linear
 * programme, commons-math3 simplex).
 */
final class FrameOracle {
  /** Singular values below this fraction of the largest count as zero in {@link #ejmlRank()}. */
  static final double SVD_ZERO = 1e-9;

  /** One member as a bar between two joints (joint index {@code level * (bays + 1) + line}). */
  record Bar(String name, FrameRef frame, PanelRef panel, boolean rising, boolean cable, int a, int b) {
    @Override
    public String toString() {
      return name;
    }
  }

  private final PlaneGrid grid;
  private final int lifts;
  private final int bays;
  private final long[] xs;
  private final long[] ys;
  private final List<Bar> bars;

  private FrameOracle(PlaneGrid grid, List<Bar> bars) {
    this.grid = grid;
    this.lifts = grid.lifts();
    this.bays = grid.bays();
    this.xs = new long[bays + 1];
    this.ys = new long[lifts + 1];
    for (int j = 1; j <= bays; j++) {
      xs[j] = xs[j - 1] + centimetres(grid.bayWidths().get(j - 1));
    }
    for (int i = 1; i <= lifts; i++) {
      ys[i] = ys[i - 1] + centimetres(grid.liftHeights().get(i - 1));
    }
    this.bars = List.copyOf(bars);
  }

  /** The framework of one state: every frame member not in {@code absentFrame}, every diagonal. */
  static FrameOracle of(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<FrameRef> absentFrame) {
    List<Bar> bars = new ArrayList<>();
    FrameOracle shape = new FrameOracle(grid, List.of());
    for (FrameRef f : allFrameMembers(grid)) {
      if (!absentFrame.contains(f)) {
        bars.add(shape.frameBar(f));
      }
    }
    for (Map.Entry<PanelRef, Brace> e : new java.util.TreeMap<>(braces).entrySet()) {
      Brace b = e.getValue();
      if (b.diagonal().hasRising()) {
        bars.add(shape.diagonalBar(e.getKey(), true, !b.isRigid()));
      }
      if (b.diagonal().hasFalling()) {
        bars.add(shape.diagonalBar(e.getKey(), false, !b.isRigid()));
      }
    }
    return new FrameOracle(grid, bars);
  }

  static FrameOracle of(BuiltFrame state) {
    return of(state.grid(), state.braces(), state.absentFrame());
  }

  /** The same grid with exactly these bars. */
  FrameOracle withBars(List<Bar> newBars) {
    return new FrameOracle(grid, newBars);
  }

  /** Every ledger and standard of the grid, in output order (ledgers first). */
  static List<FrameRef> allFrameMembers(PlaneGrid grid) {
    List<FrameRef> all = new ArrayList<>();
    for (int level = 0; level <= grid.lifts(); level++) {
      for (int bay = 1; bay <= grid.bays(); bay++) {
        all.add(FrameRef.ledger(level, bay));
      }
    }
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      for (int line = 0; line <= grid.bays(); line++) {
        all.add(FrameRef.standard(lift, line));
      }
    }
    return all;
  }

  private static long centimetres(double metres) {
    long cm = Math.round(metres * 100);
    if (Math.abs(cm - metres * 100) > 1e-6) {
      throw new IllegalArgumentException(
          "the exact oracle needs whole centimetres, got " + metres + " m");
    }
    return cm;
  }

  Bar frameBar(FrameRef f) {
    return new Bar(f.toString(), f, null, false, false, joint(f.start()), joint(f.end()));
  }

  /** '/' (rising) runs from the bottom-left to the top-right corner in model coordinates (y up). */
  Bar diagonalBar(PanelRef p, boolean rising, boolean cable) {
    String name = (rising ? "'/'" : "'\\'") + (cable ? " cable" : "") + " in " + p;
    return rising
        ? new Bar(name, null, p, true, cable, joint(p.lift() - 1, p.bay() - 1), joint(p.lift(), p.bay()))
        : new Bar(name, null, p, false, cable, joint(p.lift(), p.bay() - 1), joint(p.lift() - 1, p.bay()));
  }

  int joint(int level, int line) {
    return level * (bays + 1) + line;
  }

  int joint(Joint j) {
    return joint(j.level(), j.line());
  }

  Joint jointOf(int index) {
    return new Joint(index / (bays + 1), index % (bays + 1));
  }

  int jointCount() {
    return (lifts + 1) * (bays + 1);
  }

  PlaneGrid grid() {
    return grid;
  }

  List<Bar> bars() {
    return bars;
  }

  boolean pinned() {
    return grid.support() == Support.PINNED_BASE;
  }

  /** x of a joint in centimetres. */
  long x(int joint) {
    return xs[joint % (bays + 1)];
  }

  /** y (up) of a joint in centimetres. */
  long y(int joint) {
    return ys[joint / (bays + 1)];
  }

  /** Whether the joint can move at all: a pinned base holds level 0. */
  boolean movable(int joint) {
    return !pinned() || joint > bays;
  }

  /** The joints that carry at least one of the bars. */
  boolean[] present() {
    boolean[] p = new boolean[jointCount()];
    for (Bar b : bars) {
      p[b.a()] = true;
      p[b.b()] = true;
    }
    return p;
  }

  /** Movable joints that carry a member: V' (pinned) or V (free). */
  int movableJoints() {
    boolean[] p = present();
    int n = 0;
    for (int v = 0; v < p.length; v++) {
      if (p[v] && movable(v)) {
        n++;
      }
    }
    return n;
  }

  /** Movable joints that carry no member at all (left out of the count). */
  List<Joint> isolatedJoints() {
    boolean[] p = present();
    List<Joint> out = new ArrayList<>();
    for (int v = 0; v < p.length; v++) {
      if (!p[v] && movable(v)) {
        out.add(jointOf(v));
      }
    }
    return out;
  }

  /** The matrix row of a bar: columns 2v (x) and 2v + 1 (y) of joint v; held joints dropped. */
  Row row(Bar bar) {
    long dx = x(bar.a()) - x(bar.b());
    long dy = y(bar.a()) - y(bar.b());
    Map<Integer, Long> entries = new java.util.TreeMap<>();
    if (movable(bar.a())) {
      entries.merge(2 * bar.a(), dx, Long::sum);
      entries.merge(2 * bar.a() + 1, dy, Long::sum);
    }
    if (movable(bar.b())) {
      entries.merge(2 * bar.b(), -dx, Long::sum);
      entries.merge(2 * bar.b() + 1, -dy, Long::sum);
    }
    return Row.of(entries);
  }

  /** Exact rank of the rows of {@code subset}. */
  int rank(List<Bar> subset) {
    Echelon e = new Echelon();
    for (Bar b : subset) {
      e.add(row(b));
    }
    return e.rank();
  }

  /** Exact rank of the whole matrix (cables as bars). */
  int rank() {
    return rank(bars);
  }

  /** Degrees of freedom with cables as bars (Asimow and Roth 1978). */
  int freedoms() {
    int v = movableJoints();
    int r = rank();
    return pinned() ? 2 * v - r : 2 * v - 3 - r;
  }

  /**
   * With a pinned base, the joints that move in some first-order motion: a joint stays put in every
   * motion iff both its unit vectors lie in the row space (then every null vector is zero there).
   */
  List<Joint> movingJoints() {
    Echelon e = new Echelon();
    for (Bar b : bars) {
      e.add(row(b));
    }
    boolean[] p = present();
    List<Joint> moving = new ArrayList<>();
    for (int v = 0; v < p.length; v++) {
      if (p[v] && movable(v)
          && !(e.inSpan(Row.unit(2 * v)) && e.inSpan(Row.unit(2 * v + 1)))) {
        moving.add(jointOf(v));
      }
    }
    return moving;
  }

  /** Members whose removal alone lowers the exact rank (coloops of the row matroid). */
  List<Bar> coloops() {
    int full = rank();
    List<Bar> out = new ArrayList<>();
    for (int k = 0; k < bars.size(); k++) {
      List<Bar> without = new ArrayList<>(bars);
      without.remove(k);
      if (rank(without) < full) {
        out.add(bars.get(k));
      }
    }
    return out;
  }

  /**
   * The same coloops by a second route: a row is a coloop iff no self-stress uses it, i.e. iff its
   * unit vector lies in the column space of the matrix (the row space of the transpose).
   */
  List<Bar> coloopsByStresses() {
    Map<Integer, Map<Integer, Long>> columns = new HashMap<>();
    for (int k = 0; k < bars.size(); k++) {
      Row r = row(bars.get(k));
      for (int t = 0; t < r.cols.length; t++) {
        columns.computeIfAbsent(r.cols[t], c -> new java.util.TreeMap<>())
            .put(k, r.vals[t].longValueExact());
      }
    }
    Echelon e = new Echelon();
    for (Map<Integer, Long> c : columns.values()) {
      e.add(Row.of(c));
    }
    List<Bar> out = new ArrayList<>();
    for (int k = 0; k < bars.size(); k++) {
      if (e.inSpan(Row.unit(k))) {
        out.add(bars.get(k));
      }
    }
    return out;
  }

  /**
   * Critical members as the check contract defines them: those whose loss alone adds a freedom,
   * found by removing each one and counting the freedoms again (joints left bare are left out).
   */
  List<Bar> criticalByRemoval() {
    int before = freedoms();
    List<Bar> out = new ArrayList<>();
    for (int k = 0; k < bars.size(); k++) {
      List<Bar> without = new ArrayList<>(bars);
      without.remove(k);
      if (withBars(without).freedoms() > before) {
        out.add(bars.get(k));
      }
    }
    return out;
  }

  /**
   * The same by the stress route: a coloop ({@link #coloopsByStresses()}) adds a freedom when
   * lost unless it leaves a movable joint bare (that joint's two columns go with it, and its own
   * freedom: the count drops instead).
   */
  List<Bar> criticalByStresses() {
    Map<Integer, List<Bar>> at = barsAtJoints();
    List<Bar> out = new ArrayList<>();
    for (Bar b : coloopsByStresses()) {
      boolean leavesBare =
          (movable(b.a()) && at.get(b.a()).size() == 1) || (movable(b.b()) && at.get(b.b()).size() == 1);
      if (!leavesBare) {
        out.add(b);
      }
    }
    return out;
  }

  /**
   * Greedy basis extension (W. Whiteley, "Some matroids from discrete applied geometry", Contemp.
   * Math. 197 (1996): the rows form a linear matroid, so adding candidates in cost order whenever
   * they raise the rank gives a largest independent extension of least cost). Returns the chosen
   * candidates, in the order given.
   */
  List<Bar> greedyExtension(List<Bar> candidatesInCostOrder) {
    Echelon e = new Echelon();
    for (Bar b : bars) {
      e.add(row(b));
    }
    List<Bar> chosen = new ArrayList<>();
    for (Bar c : candidatesInCostOrder) {
      if (e.add(row(c))) {
        chosen.add(c);
      }
    }
    return chosen;
  }

  /** Members (cables as bars) meeting at each joint, by joint index. */
  Map<Integer, List<Bar>> barsAtJoints() {
    Map<Integer, List<Bar>> at = new HashMap<>();
    for (Bar b : bars) {
      at.computeIfAbsent(b.a(), k -> new ArrayList<>()).add(b);
      at.computeIfAbsent(b.b(), k -> new ArrayList<>()).add(b);
    }
    return at;
  }

  /** Movable joints held by exactly one member (a loose end), sorted. */
  TreeSet<Joint> looseEnds() {
    TreeSet<Joint> out = new TreeSet<>();
    barsAtJoints().forEach((v, list) -> {
      if (movable(v) && list.size() == 1) {
        out.add(jointOf(v));
      }
    });
    return out;
  }

  /** Movable joints with two or more members, all on one straight line through the joint, sorted. */
  TreeSet<Joint> straightThroughJoints() {
    TreeSet<Joint> out = new TreeSet<>();
    barsAtJoints().forEach((v, list) -> {
      if (movable(v) && list.size() >= 2 && allCollinear(v, list)) {
        out.add(jointOf(v));
      }
    });
    return out;
  }

  /** Whether the joint lies on the straight line of the bar (exact, integer coordinates). */
  boolean onLine(Bar bar, int joint) {
    long ux = x(bar.b()) - x(bar.a());
    long uy = y(bar.b()) - y(bar.a());
    long wx = x(joint) - x(bar.a());
    long wy = y(joint) - y(bar.a());
    return ux * wy - uy * wx == 0;
  }

  private boolean allCollinear(int v, List<Bar> list) {
    Bar first = list.get(0);
    int o0 = first.a() == v ? first.b() : first.a();
    long ux = x(o0) - x(v);
    long uy = y(o0) - y(v);
    for (Bar b : list) {
      int o = b.a() == v ? b.b() : b.a();
      long wx = x(o) - x(v);
      long wy = y(o) - y(v);
      if (ux * wy - uy * wx != 0) {
        return false;
      }
    }
    return true;
  }

  /**
   * The matrix times a joint velocity field (dx, dy per joint index), relative to the largest bar
   * length times the largest velocity: zero (to rounding) iff the field keeps every bar's length to
   * first order.
   */
  double largestRelativeStretch(double[] dx, double[] dy) {
    double worst = 0;
    double vmax = 0;
    for (int v = 0; v < dx.length; v++) {
      vmax = Math.max(vmax, Math.hypot(dx[v], dy[v]));
    }
    for (Bar b : bars) {
      double ex = x(b.a()) - x(b.b());
      double ey = y(b.a()) - y(b.b());
      double rate = ex * (dx[b.a()] - dx[b.b()]) + ey * (dy[b.a()] - dy[b.b()]);
      worst = Math.max(worst, Math.abs(rate) / (Math.hypot(ex, ey) * Math.max(vmax, 1e-300)));
    }
    return worst;
  }

  /** EJML's rank from the singular values (those below {@link #SVD_ZERO} times the largest are 0). */
  int ejmlRank() {
    int cols = 2 * jointCount();
    if (bars.isEmpty()) {
      return 0;
    }
    DMatrixRMaj a = new DMatrixRMaj(bars.size(), cols);
    for (int k = 0; k < bars.size(); k++) {
      Row r = row(bars.get(k));
      for (int t = 0; t < r.cols.length; t++) {
        a.set(k, r.cols[t], r.vals[t].doubleValue() / 100.0);
      }
    }
    SingularValueDecomposition_F64<DMatrixRMaj> svd =
        DecompositionFactory_DDRM.svd(a.numRows, a.numCols, false, false, true);
    if (!svd.decompose(a)) {
      throw new AssertionError("SVD did not converge");
    }
    double[] s = svd.getSingularValues();
    double max = 0;
    for (int k = 0; k < svd.numberOfSingularValues(); k++) {
      max = Math.max(max, s[k]);
    }
    int rank = 0;
    for (int k = 0; k < svd.numberOfSingularValues(); k++) {
      if (s[k] > max * SVD_ZERO) {
        rank++;
      }
    }
    return rank;
  }

  boolean hasCables() {
    return bars.stream().anyMatch(Bar::cable);
  }

  /**
   * Whether some admissible first-order motion strictly shortens a cable (Roth and Whiteley 1981):
   * minimise the sum of the cables' length rates subject to bars keeping length, cables not
   * lengthening, |v_k| <= 1, and (free plane) v orthogonal to the three rigid motions of the plane.
   * Every cable rate is <= 0, so the minimum is negative iff some cable can go slack.
   */
  boolean someCableCanSlacken() {
    if (!hasCables()) {
      return false;
    }
    boolean[] p = present();
    int[] col = new int[2 * jointCount()];
    java.util.Arrays.fill(col, -1);
    int vars = 0;
    for (int v = 0; v < p.length; v++) {
      if (p[v] && movable(v)) {
        col[2 * v] = vars++;
        col[2 * v + 1] = vars++;
      }
    }
    List<LinearConstraint> constraints = new ArrayList<>();
    double[] objective = new double[vars];
    for (Bar b : bars) {
      Row r = row(b);
      double[] dense = new double[vars];
      boolean nonZero = false;
      for (int t = 0; t < r.cols.length; t++) {
        dense[col[r.cols[t]]] = r.vals[t].doubleValue() / 100.0;
        nonZero |= r.vals[t].signum() != 0;
      }
      if (!nonZero) {
        continue;
      }
      if (b.cable()) {
        constraints.add(new LinearConstraint(dense, Relationship.LEQ, 0));
        for (int k = 0; k < vars; k++) {
          objective[k] += dense[k];
        }
      } else {
        constraints.add(new LinearConstraint(dense, Relationship.EQ, 0));
      }
    }
    if (!pinned()) {
      double[] tx = new double[vars];
      double[] ty = new double[vars];
      double[] turn = new double[vars];
      for (int v = 0; v < p.length; v++) {
        if (col[2 * v] >= 0) {
          tx[col[2 * v]] = 1;
          ty[col[2 * v + 1]] = 1;
          turn[col[2 * v]] = -y(v) / 100.0;
          turn[col[2 * v + 1]] = x(v) / 100.0;
        }
      }
      constraints.add(new LinearConstraint(tx, Relationship.EQ, 0));
      constraints.add(new LinearConstraint(ty, Relationship.EQ, 0));
      constraints.add(new LinearConstraint(turn, Relationship.EQ, 0));
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
                new MaxIter(200_000),
                new LinearObjectiveFunction(objective, 0),
                new LinearConstraintSet(constraints),
                GoalType.MINIMIZE,
                new NonNegativeConstraint(false));
    return best.getValue() < -1e-7;
  }

  /** The tensegrity verdict: no freedom with cables as bars, and no cable can go slack. */
  boolean rigidWithCables() {
    return freedoms() == 0 && !someCableCanSlacken();
  }

  /** A sparse integer row: sorted column indices and their nonzero values. */
  static final class Row {
    final int[] cols;
    final BigInteger[] vals;

    private Row(int[] cols, BigInteger[] vals) {
      this.cols = cols;
      this.vals = vals;
    }

    static Row of(Map<Integer, Long> entries) {
      List<Integer> c = new ArrayList<>();
      List<BigInteger> v = new ArrayList<>();
      new java.util.TreeMap<>(entries).forEach((k, val) -> {
        if (val != 0) {
          c.add(k);
          v.add(BigInteger.valueOf(val));
        }
      });
      int[] cols = new int[c.size()];
      for (int t = 0; t < cols.length; t++) {
        cols[t] = c.get(t);
      }
      return new Row(cols, v.toArray(new BigInteger[0]));
    }

    static Row unit(int col) {
      return new Row(new int[] {col}, new BigInteger[] {BigInteger.ONE});
    }

    boolean isZero() {
      return cols.length == 0;
    }

    /** {@code a * this - b * other}, divided by the gcd of its entries (sign kept). */
    Row combine(BigInteger a, BigInteger b, Row other) {
      int[] c = new int[cols.length + other.cols.length];
      BigInteger[] v = new BigInteger[c.length];
      int i = 0;
      int j = 0;
      int n = 0;
      while (i < cols.length || j < other.cols.length) {
        int ci = i < cols.length ? cols[i] : Integer.MAX_VALUE;
        int cj = j < other.cols.length ? other.cols[j] : Integer.MAX_VALUE;
        BigInteger value;
        int col;
        if (ci == cj) {
          col = ci;
          value = vals[i++].multiply(a).subtract(other.vals[j++].multiply(b));
        } else if (ci < cj) {
          col = ci;
          value = vals[i++].multiply(a);
        } else {
          col = cj;
          value = other.vals[j++].multiply(b).negate();
        }
        if (value.signum() != 0) {
          c[n] = col;
          v[n++] = value;
        }
      }
      BigInteger g = BigInteger.ZERO;
      for (int t = 0; t < n; t++) {
        g = g.gcd(v[t]);
      }
      if (g.compareTo(BigInteger.ONE) > 0) {
        for (int t = 0; t < n; t++) {
          v[t] = v[t].divide(g);
        }
      }
      return new Row(java.util.Arrays.copyOf(c, n), java.util.Arrays.copyOf(v, n));
    }
  }

  /** Row echelon form over the integers, row by row (exact: the row space over Q is kept). */
  static final class Echelon {
    private final Map<Integer, Row> byPivot = new HashMap<>();

    /** Adds a row; true when it raised the rank. */
    boolean add(Row r) {
      Row reduced = reduce(r);
      if (reduced.isZero()) {
        return false;
      }
      byPivot.put(reduced.cols[0], reduced);
      return true;
    }

    boolean inSpan(Row r) {
      return reduce(r).isZero();
    }

    int rank() {
      return byPivot.size();
    }

    private Row reduce(Row r) {
      Row cur = r;
      while (!cur.isZero()) {
        Row pivot = byPivot.get(cur.cols[0]);
        if (pivot == null) {
          return cur;
        }
        BigInteger p = pivot.vals[0];
        BigInteger q = cur.vals[0];
        BigInteger g = p.gcd(q);
        cur = cur.combine(p.divide(g), q.divide(g), pivot);
      }
      return cur;
    }
  }
}
