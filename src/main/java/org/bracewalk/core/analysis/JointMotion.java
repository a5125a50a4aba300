package org.bracewalk.core.analysis;

/**
 * One first-order motion of a plane, for drawings: a velocity for every joint (level 0..lifts, line
 * 0..bays), scaled so that the largest has length 1. Joints that carry no member at all are still
 * given (velocity 0). An exact solution of the framework's equations, rounded to doubles only at the
 * end.
 */
public final class JointMotion {
  private final int lifts;
  private final int bays;
  private final double[] dx;
  private final double[] dy;

  /**
   * @param dx x velocity per joint, index {@code level * (bays + 1) + line}
   * @param dy y velocity (up) per joint, same index
   */
  public JointMotion(int lifts, int bays, double[] dx, double[] dy) {
    int joints = (lifts + 1) * (bays + 1);
    if (dx.length != joints || dy.length != joints) {
      throw new IllegalArgumentException("a " + lifts + " x " + bays + " plane has " + joints + " joints");
    }
    this.lifts = lifts;
    this.bays = bays;
    this.dx = dx.clone();
    this.dy = dy.clone();
  }

  public int lifts() {
    return lifts;
  }

  public int bays() {
    return bays;
  }

  /** x velocity of the joint at {@code level} on {@code line}. */
  public double dx(int level, int line) {
    return dx[index(level, line)];
  }

  /** y velocity (up) of the joint at {@code level} on {@code line}. */
  public double dy(int level, int line) {
    return dy[index(level, line)];
  }

  /** Whether the joint moves in this motion. */
  public boolean moves(int level, int line) {
    int i = index(level, line);
    return dx[i] != 0 || dy[i] != 0;
  }

  private int index(int level, int line) {
    if (level < 0 || level > lifts || line < 0 || line > bays) {
      throw new IndexOutOfBoundsException("joint " + level + "/" + line);
    }
    return level * (bays + 1) + line;
  }
}
