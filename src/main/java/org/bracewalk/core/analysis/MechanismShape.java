package org.bracewalk.core.analysis;

import org.bracewalk.core.model.PlaneGrid;

/**
 * The exact finite motion of a plane that is not rigid: one block turned by a small angle, every
 * other block held. Joint (level {@code i}, line {@code j}) sits at {@code Σ_{k≤j} w_k (cos b_k,
 * sin b_k) + Σ_{l≤i} h_l (−sin a_l, cos a_l)}, where {@code a_l} is the turn of the verticals of
 * lift {@code l} and {@code b_k} that of the horizontals of bay {@code k}: each panel stays a
 * parallelogram, so every member keeps its length and every effective diagonal its panel square.
 * Level 0 is the base, line 0 the left edge.
 */
public final class MechanismShape {
  private final int lifts;
  private final int bays;
  private final double[] xs;
  private final double[] ys;

  private MechanismShape(int lifts, int bays, double[] xs, double[] ys) {
    this.lifts = lifts;
    this.bays = bays;
    this.xs = xs;
    this.ys = ys;
  }

  /** The plane with the lifts and bays of {@code moving} turned by {@code angle} radians. */
  public static MechanismShape of(PlaneGrid grid, Block moving, double angle) {
    int m = grid.lifts();
    int n = grid.bays();
    double[] a = new double[m + 1];
    double[] b = new double[n + 1];
    for (int lift : moving.lifts()) {
      a[lift] = angle;
    }
    for (int bay : moving.bays()) {
      b[bay] = angle;
    }
    double[] xs = new double[(m + 1) * (n + 1)];
    double[] ys = new double[(m + 1) * (n + 1)];
    double[] rowX = new double[n + 1];
    double[] rowY = new double[n + 1];
    for (int k = 1; k <= n; k++) {
      double w = grid.bayWidths().get(k - 1);
      rowX[k] = rowX[k - 1] + w * Math.cos(b[k]);
      rowY[k] = rowY[k - 1] + w * Math.sin(b[k]);
    }
    double upX = 0;
    double upY = 0;
    for (int i = 0; i <= m; i++) {
      if (i > 0) {
        double h = grid.liftHeights().get(i - 1);
        upX += -h * Math.sin(a[i]);
        upY += h * Math.cos(a[i]);
      }
      for (int j = 0; j <= n; j++) {
        xs[i * (n + 1) + j] = rowX[j] + upX;
        ys[i * (n + 1) + j] = rowY[j] + upY;
      }
    }
    return new MechanismShape(m, n, xs, ys);
  }

  public int lifts() {
    return lifts;
  }

  public int bays() {
    return bays;
  }

  /** x of the joint at level {@code level} (0 = base) on line {@code line} (0 = left), metres. */
  public double x(int level, int line) {
    return xs[index(level, line)];
  }

  /** y (up) of the joint at level {@code level} on line {@code line}, metres. */
  public double y(int level, int line) {
    return ys[index(level, line)];
  }

  private int index(int level, int line) {
    if (level < 0 || level > lifts || line < 0 || line > bays) {
      throw new IndexOutOfBoundsException("joint " + level + "/" + line);
    }
    return level * (bays + 1) + line;
  }
}
