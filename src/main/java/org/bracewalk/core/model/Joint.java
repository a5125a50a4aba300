package org.bracewalk.core.model;

import java.util.Comparator;

/**
 * A joint of a brace plane: level {@code level} (0 = base, {@code i} = top of lift {@code i}) on
 * line {@code line} (0 = left end, {@code j} = right side of bay {@code j}). Ordered by level, then
 * line.
 */
public record Joint(int level, int line) implements Comparable<Joint> {

  private static final Comparator<Joint> ORDER =
      Comparator.comparingInt(Joint::level).thenComparingInt(Joint::line);

  public Joint {
    if (level < 0 || line < 0) {
      throw new IllegalArgumentException(
          "levels and lines are numbered from 0, got level " + level + ", line " + line);
    }
  }

  @Override
  public int compareTo(Joint other) {
    return ORDER.compare(this, other);
  }

  @Override
  public String toString() {
    return "joint at level " + level + ", line " + line;
  }
}
