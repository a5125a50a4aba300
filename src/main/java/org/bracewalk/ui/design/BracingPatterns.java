package org.bracewalk.ui.design;

import java.util.HashMap;
import java.util.Map;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Fill helpers for common bracing patterns. Each returns a new design and leaves openings alone;
 * braces already placed outside the filled panels are kept. Pure functions, no toolkit.
 */
public final class BracingPatterns {
  private BracingPatterns() {}

  /** A brace in bays {@code firstBay}, {@code firstBay + k}, ... of every lift. */
  public static PlaneDesign everyKthBay(PlaneDesign d, int k, int firstBay, Brace brace) {
    requireStep(d.grid(), k, firstBay);
    Map<PanelRef, Brace> braces = new HashMap<>(d.braces());
    for (int lift = 1; lift <= d.grid().lifts(); lift++) {
      for (int bay = firstBay; bay <= d.grid().bays(); bay += k) {
        put(d, braces, new PanelRef(lift, bay), brace);
      }
    }
    return new PlaneDesign(d.grid(), braces, d.openings(), d.omittedFrame());
  }

  /**
   * A zig-zag up the bays {@code firstBay}, {@code firstBay + k}, ...: rising in odd lifts, falling
   * in even ones, so the braces of one bay meet end to end at the nodes.
   */
  public static PlaneDesign zigZag(PlaneDesign d, int k, int firstBay, MemberKind kind) {
    requireStep(d.grid(), k, firstBay);
    Map<PanelRef, Brace> braces = new HashMap<>(d.braces());
    for (int lift = 1; lift <= d.grid().lifts(); lift++) {
      Diagonal dir = lift % 2 == 1 ? Diagonal.RISING : Diagonal.FALLING;
      for (int bay = firstBay; bay <= d.grid().bays(); bay += k) {
        put(d, braces, new PanelRef(lift, bay), new Brace(dir, kind));
      }
    }
    return new PlaneDesign(d.grid(), braces, d.openings(), d.omittedFrame());
  }

  /**
   * Every panel braced, as an upright frame is: {@code alternate} true runs the braces in a zig-zag
   * (rising, falling, ... from the bottom), else every panel gets {@code brace}.
   */
  public static PlaneDesign everyPanel(PlaneDesign d, Brace brace, boolean alternate) {
    Map<PanelRef, Brace> braces = new HashMap<>(d.braces());
    for (int lift = 1; lift <= d.grid().lifts(); lift++) {
      for (int bay = 1; bay <= d.grid().bays(); bay++) {
        Brace b = brace;
        if (alternate) {
          b = new Brace((lift + bay) % 2 == 0 ? Diagonal.RISING : Diagonal.FALLING, brace.kind());
        }
        put(d, braces, new PanelRef(lift, bay), b);
      }
    }
    return new PlaneDesign(d.grid(), braces, d.openings(), d.omittedFrame());
  }

  /** No braces at all; openings stay. */
  public static PlaneDesign clear(PlaneDesign d) {
    return new PlaneDesign(d.grid(), Map.of(), d.openings(), d.omittedFrame());
  }

  private static void put(PlaneDesign d, Map<PanelRef, Brace> braces, PanelRef p, Brace b) {
    if (!d.isOpening(p)) {
      braces.put(p, b);
    }
  }

  private static void requireStep(PlaneGrid g, int k, int firstBay) {
    if (k < 1) {
      throw new IllegalArgumentException("Every k bays: k must be 1 or more, got " + k + ".");
    }
    if (firstBay < 1 || firstBay > g.bays()) {
      throw new IllegalArgumentException(
          "First bay: " + firstBay + " is not a bay of this plane (1 to " + g.bays() + ").");
    }
  }
}
