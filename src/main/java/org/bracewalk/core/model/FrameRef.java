package org.bracewalk.core.model;

import java.util.Comparator;
import java.util.Objects;

/**
 * One frame member of a brace plane. Joints are named by level and line: level 0 is the base,
 * level {@code i} the top of lift {@code i}; line 0 is the left end, line {@code j} the right side of
 * bay {@code j} ({@code shared/design/check-contract.md}, "Frame members").
 *
 * <ul>
 *   <li>a ledger: {@code first} = level (0..lifts), {@code second} = bay (1..bays); it joins
 *       joints (level, bay-1) and (level, bay);
 *   <li>a standard: {@code first} = lift (1..lifts), {@code second} = line (0..bays); it joins
 *       joints (lift-1, line) and (lift, line).
 * </ul>
 *
 * Ordered as every output lists them: ledgers first, then by the two numbers.
 */
public record FrameRef(FrameMemberType type, int first, int second) implements Comparable<FrameRef> {

  private static final Comparator<FrameRef> ORDER =
      Comparator.comparing(FrameRef::type)
          .thenComparingInt(FrameRef::first)
          .thenComparingInt(FrameRef::second);

  public FrameRef {
    Objects.requireNonNull(type, "type");
    if (type == FrameMemberType.LEDGER && (first < 0 || second < 1)) {
      throw new IllegalArgumentException(
          "a ledger is named by level (from 0) and bay (from 1), got level " + first + ", bay " + second);
    }
    if (type == FrameMemberType.STANDARD && (first < 1 || second < 0)) {
      throw new IllegalArgumentException(
          "a standard is named by lift (from 1) and line (from 0), got lift " + first + ", line " + second);
    }
  }

  /** The ledger at {@code level} (0 = base) across bay {@code bay}. */
  public static FrameRef ledger(int level, int bay) {
    return new FrameRef(FrameMemberType.LEDGER, level, bay);
  }

  /** The standard segment of lift {@code lift} on line {@code line} (0 = left end). */
  public static FrameRef standard(int lift, int line) {
    return new FrameRef(FrameMemberType.STANDARD, lift, line);
  }

  public boolean isLedger() {
    return type == FrameMemberType.LEDGER;
  }

  /** The lower (standard) or left (ledger) end. */
  public Joint start() {
    return isLedger() ? new Joint(first, second - 1) : new Joint(first - 1, second);
  }

  /** The upper (standard) or right (ledger) end. */
  public Joint end() {
    return new Joint(first, second);
  }

  /** Whether this member lies in a plane of that grid. */
  public boolean within(PlaneGrid grid) {
    // ledger: level <= lifts, bay <= bays; standard: lift <= lifts, line <= bays
    return first <= grid.lifts() && second <= grid.bays();
  }

  /** Throws when the member lies outside the grid, naming it. */
  public void requireWithin(PlaneGrid grid) {
    if (!within(grid)) {
      throw new IllegalArgumentException(
          this + " lies outside the " + grid.lifts() + " x " + grid.bays() + " plane");
    }
  }

  @Override
  public int compareTo(FrameRef other) {
    return ORDER.compare(this, other);
  }

  /** A well-mixed hash (see {@link PanelRef#hashCode()}); equals compares the same fields. */
  @Override
  @SuppressWarnings("checkstyle:EqualsHashCode")
  public int hashCode() {
    int h = first * 0x9E3779B9 + second * 0x85EBCA6B + type.ordinal() * 0x27D4EB2F;
    return h ^ (h >>> 15);
  }

  /** "ledger at level 1, bay 2" or "standard of lift 2 on line 3" (scaffold words). */
  @Override
  public String toString() {
    return isLedger()
        ? "ledger at level " + first + ", bay " + second
        : "standard of lift " + first + " on line " + second;
  }
}
