package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The frame of a plane in the readable verdict: whether to show it at all (only when a map names a
 * frame member that is not as designed or sound, or the engine finds the frame incomplete, so a
 * map without frame lines reads exactly as before), and the elevation in characters that draws
 * every ledger and standard in its state and marks the joints of each kind of freedom.
 *
 * <p>The frame elevation, top level first; a row of joints and ledgers for each level, a row of
 * standards and panels for each lift:
 *
 * <pre>
 *   level 2  +-----+-----+
 *   lift 2   |  /  |  .  |
 *   level 1  #     +-----+
 *   lift 1   |  /  ?  .  |
 *   level 0  +-----+-----+
 * </pre>
 *
 * Ledgers: {@code -----} there, blank missing or damaged beyond use, {@code  ? } (centred) not
 * inspected, {@code .....} left out by the design. Standards: {@code |} there, blank missing or
 * damaged beyond use, {@code ?} not inspected, {@code :} left out by the design. Joints: {@code +}
 * held, {@code @} moves with a swaying part, {@code #} a member runs through it without sideways
 * restraint, {@code !} a loose end (the joints of the analysed state's freedoms). Panels as in the
 * panel map, with {@code +} before a brace to fit.
 */
final class FrameView {
  private final PlaneDesign design;
  private final Optional<AsBuiltPlane> asBuilt;
  private final PlaneAnalysis analysis;
  private final Terms terms;
  private final boolean shown;

  FrameView(PlaneDesign design, Optional<AsBuiltPlane> asBuilt, PlaneAnalysis analysis, Terms terms) {
    this.design = design;
    this.asBuilt = asBuilt;
    this.analysis = analysis;
    this.terms = terms;
    this.shown = !design.frameComplete()
        || asBuilt.map(a -> !a.frameComplete()).orElse(false)
        || !analysis.design().frameComplete()
        || analysis.asBuilt().map(a -> !a.state().frameComplete() || a.unknownFrameMembers() > 0).orElse(false)
        || !analysis.repair().members().isEmpty()
        || !analysis.repair().restoreFrame().isEmpty();
  }

  /** Whether the frame is worth showing: some member is not as designed or sound. */
  boolean shown() {
    return shown;
  }

  Terms terms() {
    return terms;
  }

  /** Frame members not there as built (missing, ineffective, not inspected); empty without one. */
  Set<FrameRef> absentAsBuilt() {
    Set<FrameRef> out = new HashSet<>();
    asBuilt.ifPresent(a -> {
      out.addAll(a.absentFrame());
      out.addAll(a.unknownFrame());
    });
    return out;
  }

  /**
   * The members the design leaves out but the as-built map does not list: the contract takes them
   * as there and sound; say so, since a map that simply forgot them would read too well.
   */
  void takenAsThere(StringBuilder out) {
    if (asBuilt.isEmpty()) {
      return;
    }
    List<FrameRef> there = new ArrayList<>();
    for (FrameRef f : design.sortedOmittedFrame()) {
      if (asBuilt.get().hasFrameMember(f)) {
        there.add(f);
      }
    }
    if (there.isEmpty()) {
      return;
    }
    VerdictText.wrap(out, "Left out by the design but there as built (the as-built map lists them as"
        + " sound or not at all, so they count): "
        + VerdictText.list(there, f -> Wording.frameMember(f, terms))
        + ". If one is not there, list it as missing in the as-built map.", "  ");
  }

  /** The frame elevation of the analysed state (as built when given, else as designed). */
  void elevation(StringBuilder out) {
    PlaneGrid grid = analysis.grid();
    String which = asBuilt.isPresent() ? "as built" : "as designed";
    if (grid.lifts() > VerdictText.MAX_DRAWN_LIFTS || grid.bays() > VerdictText.MAX_DRAWN_BAYS) {
      out.append("Elevation ").append(which).append(": not drawn, the plane is larger than ")
          .append(VerdictText.MAX_DRAWN_LIFTS).append(" lifts or ").append(VerdictText.MAX_DRAWN_BAYS)
          .append(" bays.\n");
      return;
    }
    StateAnalysis s = analysis.analysedState();
    Map<Joint, Character> jointMark = new HashMap<>();
    for (Joint j : s.movingJoints()) {
      jointMark.put(j, '@');
    }
    for (Freedom f : s.freedoms()) {
      char c = switch (f.kind()) {
        case SWAY -> '@';
        case LOST_RESTRAINT -> '#';
        case LOOSE_END -> '!';
      };
      for (Joint j : f.joints()) {
        jointMark.put(j, c);
      }
    }
    Map<PanelRef, RepairBrace> repairs = new HashMap<>();
    for (RepairBrace r : analysis.repair().braces()) {
      repairs.put(r.panel(), r);
    }
    int tokenWidth = Math.max(2, String.valueOf(grid.bays()).length());
    int cell = tokenWidth + 3;
    int labelWidth = ("level " + grid.lifts()).length();

    out.append("Elevation ").append(which)
        .append(" with its frame, top level first (level 0 is the base, line 0 the left end):\n");
    StringBuilder header = new StringBuilder("  ").append(VerdictText.pad("bay", labelWidth)).append(' ');
    for (int bay = 1; bay <= grid.bays(); bay++) {
      header.append(' ').append(center(String.valueOf(bay), cell));
    }
    out.append(header.toString().stripTrailing()).append('\n');
    for (int level = grid.lifts(); level >= 0; level--) {
      StringBuilder row = new StringBuilder("  ").append(VerdictText.pad("level " + level, labelWidth)).append(' ');
      for (int line = 0; line <= grid.bays(); line++) {
        row.append(jointMark.getOrDefault(new Joint(level, line), '+'));
        if (line < grid.bays()) {
          row.append(ledger(FrameRef.ledger(level, line + 1), cell));
        }
      }
      out.append(row.toString().stripTrailing()).append('\n');
      if (level == 0) {
        break;
      }
      int lift = level;
      StringBuilder panels = new StringBuilder("  ").append(VerdictText.pad("lift " + lift, labelWidth)).append(' ');
      for (int line = 0; line <= grid.bays(); line++) {
        panels.append(standard(FrameRef.standard(lift, line)));
        if (line < grid.bays()) {
          PanelRef p = new PanelRef(lift, line + 1);
          String token;
          String flag = " ";
          if (repairs.containsKey(p)) {
            flag = "+";
            token = repairs.get(p).brace().token();
          } else {
            token = VerdictText.present(p, design, asBuilt);
          }
          panels.append(' ').append(flag).append(VerdictText.pad(token, tokenWidth)).append(' ');
        }
      }
      out.append(panels.toString().stripTrailing()).append('\n');
    }
    out.append("Legend: ledgers ----- there, blank missing or damaged beyond use, ? not inspected,\n");
    out.append("        ..... left out by the design; standards | there, blank missing or damaged beyond use,\n");
    out.append("        ? not inspected, : left out by the design; joints + held, @ moves with a swaying part,\n");
    out.append("        # a member runs through without sideways restraint, ! a loose end;\n");
    out.append("        panels / \\ X rigid diagonals, ~/ ~\\ ~X tension-only, . none, ? not inspected,\n");
    out.append("        o opening, + a brace to fit (the repair)\n");
  }

  private enum Seen { THERE, ABSENT, UNKNOWN, LEFT_OUT }

  private Seen state(FrameRef f) {
    if (asBuilt.isPresent()) {
      AsBuiltPlane a = asBuilt.get();
      if (a.unknownFrame().contains(f)) {
        return Seen.UNKNOWN;
      }
      if (a.absentFrame().contains(f)) {
        return design.hasFrameMember(f) ? Seen.ABSENT : Seen.LEFT_OUT;
      }
      return Seen.THERE;
    }
    return design.hasFrameMember(f) ? Seen.THERE : Seen.LEFT_OUT;
  }

  private String ledger(FrameRef f, int cell) {
    return switch (state(f)) {
      case THERE -> "-".repeat(cell);
      case ABSENT -> " ".repeat(cell);
      case UNKNOWN -> center("?", cell);
      case LEFT_OUT -> ".".repeat(cell);
    };
  }

  private char standard(FrameRef f) {
    return switch (state(f)) {
      case THERE -> '|';
      case ABSENT -> ' ';
      case UNKNOWN -> '?';
      case LEFT_OUT -> ':';
    };
  }

  private static String center(String s, int width) {
    int left = (width - s.length()) / 2;
    return " ".repeat(Math.max(0, left)) + s + " ".repeat(Math.max(0, width - s.length() - left));
  }
}
