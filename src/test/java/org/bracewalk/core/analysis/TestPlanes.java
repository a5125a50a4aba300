package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.stream.Collectors;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/** Seeded random planes for the cross-checks, and panel-map pictures for failure messages. */
final class TestPlanes {
  private TestPlanes() {}

  /** A grid with uneven bay widths (0.6..3.2 m) and lift heights (0.8..2.6 m). */
  static PlaneGrid unevenGrid(Random rnd, int lifts, int bays, Support support) {
    List<Double> widths = new ArrayList<>();
    for (int j = 0; j < bays; j++) {
      widths.add(round(0.6 + 2.6 * rnd.nextDouble()));
    }
    List<Double> heights = new ArrayList<>();
    for (int i = 0; i < lifts; i++) {
      heights.add(round(0.8 + 1.8 * rnd.nextDouble()));
    }
    return new PlaneGrid(lifts, bays, widths, heights, support);
  }

  private static double round(double v) {
    return Math.round(v * 100) / 100.0;
  }

  /**
   * Random members: each panel braced with probability {@code density}; a brace is '/', '\' or 'X'
   * (2:2:1), tension-only with probability {@code tensionShare}.
   */
  static Map<PanelRef, Brace> members(
      Random rnd, PlaneGrid grid, double density, double tensionShare) {
    Map<PanelRef, Brace> members = new TreeMap<>();
    for (int i = 1; i <= grid.lifts(); i++) {
      for (int j = 1; j <= grid.bays(); j++) {
        if (rnd.nextDouble() < density) {
          members.put(PanelRef.of(i, j), randomBrace(rnd, tensionShare));
        }
      }
    }
    return members;
  }

  static Brace randomBrace(Random rnd, double tensionShare) {
    int d = rnd.nextInt(5);
    Diagonal diagonal = d < 2 ? Diagonal.RISING : d < 4 ? Diagonal.FALLING : Diagonal.BOTH;
    MemberKind kind = rnd.nextDouble() < tensionShare ? MemberKind.TENSION_ONLY : MemberKind.RIGID;
    return new Brace(diagonal, kind);
  }

  /** Every panel of the grid, lift by lift from the bottom, bay by bay from the left. */
  static List<PanelRef> panels(PlaneGrid grid) {
    List<PanelRef> all = new ArrayList<>();
    for (int i = 1; i <= grid.lifts(); i++) {
      for (int j = 1; j <= grid.bays(); j++) {
        all.add(PanelRef.of(i, j));
      }
    }
    return all;
  }

  static boolean allRigid(Map<PanelRef, Brace> members) {
    return members.values().stream().allMatch(Brace::isRigid);
  }

  /**
   * Adds {@code extra} to the members of a panel. A rigid member squares a panel by itself, so a
   * rigid member meeting a cable keeps the rigid one(s) only (same rigidity, and the model holds
   * one kind per panel); members of the same kind unite.
   */
  static Brace merge(Brace present, Brace extra) {
    if (present == null) {
      return extra;
    }
    if (present.kind() == extra.kind()) {
      return new Brace(
          Diagonal.of(
              present.diagonal().hasRising() || extra.diagonal().hasRising(),
              present.diagonal().hasFalling() || extra.diagonal().hasFalling()),
          present.kind());
    }
    return present.isRigid() ? present : extra;
  }

  /** The members with every repair brace added. */
  static Map<PanelRef, Brace> withRepairs(Map<PanelRef, Brace> state, List<RepairBrace> repairs) {
    Map<PanelRef, Brace> out = new TreeMap<>(state);
    for (RepairBrace r : repairs) {
      out.put(r.panel(), merge(out.get(r.panel()), r.brace()));
    }
    return out;
  }

  /** A panel map of one state: header lines, then the top lift first, bay 1 on the left. */
  static String map(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return map(grid, p -> members.containsKey(p) ? members.get(p).token() : ".");
  }

  /** A design map: its braces, 'o' for openings. */
  static String map(PlaneDesign design) {
    return map(
        design.grid(),
        p -> design.isOpening(p) ? "o" : design.braceAt(p) != null ? design.braceAt(p).token() : ".");
  }

  /** An as-built map: its members, '?' for panels not inspected. */
  static String map(AsBuiltPlane asBuilt) {
    return map(
        asBuilt.grid(),
        p -> asBuilt.isUninspected(p)
            ? "?"
            : asBuilt.memberAt(p) != null ? asBuilt.memberAt(p).token() : ".");
  }

  private static String map(PlaneGrid grid, java.util.function.Function<PanelRef, String> token) {
    StringBuilder sb = new StringBuilder("\nsupport: ").append(grid.support().label()).append('\n');
    sb.append("widths: ")
        .append(grid.bayWidths().stream().map(String::valueOf).collect(Collectors.joining(" ")))
        .append('\n');
    sb.append("heights: ")
        .append(grid.liftHeights().stream().map(String::valueOf).collect(Collectors.joining(" ")))
        .append('\n');
    for (int i = grid.lifts(); i >= 1; i--) {
      List<String> row = new ArrayList<>();
      for (int j = 1; j <= grid.bays(); j++) {
        row.add(token.apply(PanelRef.of(i, j)));
      }
      sb.append(String.join(" ", row)).append('\n');
    }
    return sb.toString();
  }

  /**
   * Parses the grid part of a panel map (top lift first) into members, for hand-written cases.
   * Tokens: '.', '/', '\', 'X', '~/', '~\', '~X'.
   */
  static Map<PanelRef, Brace> parse(String... topLiftFirst) {
    Map<PanelRef, Brace> members = new TreeMap<>();
    int lifts = topLiftFirst.length;
    for (int r = 0; r < lifts; r++) {
      String[] tokens = topLiftFirst[r].trim().split("\\s+");
      for (int j = 0; j < tokens.length; j++) {
        String t = tokens[j];
        if (t.equals(".")) {
          continue;
        }
        boolean tension = t.startsWith("~");
        Diagonal d = Diagonal.fromSymbol(tension ? t.substring(1) : t);
        if (d == null) {
          throw new IllegalArgumentException("bad token '" + t + "' in test map");
        }
        members.put(
            PanelRef.of(lifts - r, j + 1), tension ? Brace.tension(d) : Brace.rigid(d));
      }
    }
    return members;
  }
}
