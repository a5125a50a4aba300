package org.bracewalk.core.model;

import java.util.Comparator;

/**
 * One panel of a brace plane: lift {@code lift} (1 = bottom) and bay {@code bay} (1 = left).
 * Ordered by lift, then bay, the order every list in the output uses.
 */
public record PanelRef(int lift, int bay) implements Comparable<PanelRef> {

  private static final Comparator<PanelRef> ORDER =
      Comparator.comparingInt(PanelRef::lift).thenComparingInt(PanelRef::bay);

  public PanelRef {
    if (lift < 1 || bay < 1) {
      throw new IllegalArgumentException(
          "lift and bay are numbered from 1, got lift " + lift + ", bay " + bay);
    }
  }

  public static PanelRef of(int lift, int bay) {
    return new PanelRef(lift, bay);
  }

  @Override
  public int compareTo(PanelRef other) {
    return ORDER.compare(this, other);
  }

  /**
   * A well-mixed hash: the default record hash (31 * lift + bay) collides heavily on large grids
   * and makes hash maps of a million panels crawl. The record's own equals compares the same two
   * fields, so the two agree.
   */
  @Override
  @SuppressWarnings("checkstyle:EqualsHashCode")
  public int hashCode() {
    int h = lift * 0x9E3779B9 + bay * 0x85EBCA6B;
    return h ^ (h >>> 15);
  }

  @Override
  public String toString() {
    return "lift " + lift + ", bay " + bay;
  }
}
