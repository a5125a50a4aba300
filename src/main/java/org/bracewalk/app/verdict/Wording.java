package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRole;

/**
 * The words of verdicts, shared by the text verdict, the cautions, the screens and the documents:
 * the one place where a freedom, a frame member or a joint is put into words. Public entry points
 * for other front ends: {@link #freedom(Freedom, Terms, Set)}, {@link #freedom(Freedom, PlaneRole)},
 * {@link #frameMember(FrameRef, Terms)}, {@link #joint(Joint)} and {@link #LOST_RESTRAINT_NOTE}.
 */
public final class Wording {
  private Wording() {}

  /**
   * Said once wherever a joint without sideways restraint is named ({@code
   * shared/design/analysis.md}, "Frame members"): why it is not a collapse by itself, and why it is
   * still counted.
   */
  public static final String LOST_RESTRAINT_NOTE =
      "Where a member runs unrestrained through a joint, a continuous standard, upright, ledger or"
          + " beam does not fold there by itself, but its unbraced length grows and it may buckle under"
          + " load. The pin-jointed model counts the joint as a freedom, which is the conservative"
          + " side. An engineer checks the member before it is loaded.";

  /**
   * One freedom in words an inspector reads at once, naming the members and the place, and, in
   * brackets, the frame members of that joint that are not there ({@code absent}: missing,
   * ineffective, not inspected or left out of the design; empty when unknown). For example:
   *
   * <ul>
   *   <li>{@code standard on line 0 runs unrestrained through level 1 (ledger at level 1, bay 1
   *       not there): its unbraced length grows; an engineer checks it before loading}
   *   <li>{@code loose end at level 1, line 3: the standard of lift 1 on line 3 is held there by
   *       nothing else (ledger at level 1, bay 3 not there)}
   *   <li>{@code the part at levels 2-4, lines 0, 1 can sway (2 independent motions): keep people
   *       and loads off it and everything it carries}
   * </ul>
   */
  public static String freedom(Freedom f, Terms terms, Set<FrameRef> absent) {
    return switch (f.kind()) {
      case SWAY -> sway(f);
      case LOST_RESTRAINT -> lostRestraint(f, terms, absent);
      case LOOSE_END -> looseEnd(f, terms, absent);
    };
  }

  /** As {@link #freedom(Freedom, Terms, Set)} in the words of the plane's role, no absent members. */
  public static String freedom(Freedom f, PlaneRole role) {
    return freedom(f, Terms.of(role), Set.of());
  }

  /** A short name of the kind: {@code sways}, {@code lost sideways restraint}, {@code loose end}. */
  public static String kind(FreedomKind kind) {
    return switch (kind) {
      case SWAY -> "sways";
      case LOST_RESTRAINT -> "lost sideways restraint";
      case LOOSE_END -> "loose end";
    };
  }

  /**
   * {@code ledger at level 1, bay 2}, {@code standard of lift 2 on line 3}; racking words {@code
   * beam at level 1, bay 2} (an upright frame: {@code horizontal at ...}), {@code upright of lift 2 on line 3}.
   */
  public static String frameMember(FrameRef f, Terms terms) {
    String word = terms.word(f.type());
    return f.isLedger()
        ? word + " at level " + f.first() + ", bay " + f.second()
        : word + " of lift " + f.first() + " on line " + f.second();
  }

  /** {@code level 1, line 0}. */
  public static String joint(Joint j) {
    return "level " + j.level() + ", line " + j.line();
  }

  private static String sway(Freedom f) {
    TreeSet<Integer> levels = new TreeSet<>();
    TreeSet<Integer> lines = new TreeSet<>();
    for (Joint j : f.joints()) {
      levels.add(j.level());
      lines.add(j.line());
    }
    String where = levels.isEmpty()
        ? "a part of the plane"
        : "the part at " + numbered("level", List.copyOf(levels)) + ", " + numbered("line", List.copyOf(lines));
    return where + " can sway (" + plural(f.count(), "independent motion", "independent motions")
        + "): keep people and loads off it and everything it carries";
  }

  private static String lostRestraint(Freedom f, Terms terms, Set<FrameRef> absent) {
    Joint at = f.joints().isEmpty() ? null : f.joints().get(0);
    String through;
    if (!f.members().isEmpty()) {
      FrameRef m = f.members().get(0);
      through = m.isLedger()
          ? terms.word(m.type()) + " at level " + m.first() + " runs unrestrained"
              + (at == null ? "" : " across line " + at.line())
          : terms.word(m.type()) + " on line " + m.second() + " runs unrestrained"
              + (at == null ? "" : " through level " + at.level());
    } else {
      through = "the " + (f.diagonals().size() == 1 ? "diagonal in " : "diagonals in ")
          + panels(f.diagonals()) + " run in a straight line, unrestrained"
          + (at == null ? "" : " at " + joint(at));
    }
    return through + absentAt(at, terms, absent)
        + ": its unbraced length grows; an engineer checks it before loading";
  }

  private static String looseEnd(Freedom f, Terms terms, Set<FrameRef> absent) {
    Joint at = f.joints().isEmpty() ? null : f.joints().get(0);
    String held;
    if (!f.members().isEmpty()) {
      held = "the " + frameMember(f.members().get(0), terms);
    } else if (!f.diagonals().isEmpty()) {
      held = "the diagonal in " + panel(f.diagonals().get(0));
    } else {
      held = "the member";
    }
    return "loose end" + (at == null ? "" : " at " + joint(at)) + ": " + held
        + " is held there by nothing else" + absentAt(at, terms, absent);
  }

  /** {@code  (ledger at level 1, bay 1 not there)}: the absent frame members meeting at the joint. */
  private static String absentAt(Joint at, Terms terms, Set<FrameRef> absent) {
    if (at == null || absent.isEmpty()) {
      return "";
    }
    List<String> names = new ArrayList<>();
    for (FrameRef f : new TreeSet<>(absent)) {
      if (f.start().equals(at) || f.end().equals(at)) {
        names.add(frameMember(f, terms));
      }
    }
    return names.isEmpty() ? "" : " (" + String.join(", ", names) + " not there)";
  }

  private static String panels(List<PanelRef> ps) {
    List<String> out = new ArrayList<>();
    for (PanelRef p : ps) {
      out.add(panel(p));
    }
    return String.join(" and ", out);
  }

  /** {@code lift 3}, {@code lifts 1, 2, 4}, {@code bays 1-5}, {@code no bays}. */
  static String numbered(String noun, List<Integer> sorted) {
    if (sorted.isEmpty()) {
      return "no " + noun + "s";
    }
    return (sorted.size() == 1 ? noun : noun + "s") + " " + ranges(sorted);
  }

  /** {@code 1-5}, {@code 1, 2, 4}, {@code 1-3, 7}: runs of three or more become ranges. */
  static String ranges(List<Integer> sorted) {
    List<String> parts = new ArrayList<>();
    int i = 0;
    while (i < sorted.size()) {
      int j = i;
      while (j + 1 < sorted.size() && sorted.get(j + 1) == sorted.get(j) + 1) {
        j++;
      }
      if (j - i >= 2) {
        parts.add(sorted.get(i) + "-" + sorted.get(j));
      } else {
        for (int k = i; k <= j; k++) {
          parts.add(String.valueOf(sorted.get(k)));
        }
      }
      i = j + 1;
    }
    return String.join(", ", parts);
  }

  /** {@code lift 3 bay 2}. */
  static String panel(PanelRef p) {
    return "lift " + p.lift() + " bay " + p.bay();
  }

  /** {@code / rigid}, {@code ~X tension-only}. */
  static String member(Brace b) {
    return b.token() + " " + b.kind().label();
  }

  static String plural(int n, String one, String many) {
    return n + " " + (n == 1 ? one : many);
  }
}
