package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import java.util.function.Function;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlacedBrace;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;

/**
 * The readable verdict on one plane: the support used, the verdict on each state in plain words,
 * loss tolerance, critical braces, the blocks that can sway, an elevation picture in characters
 * (top lift first) with the repair marked, a legend, the repair and restore-to-design lists, the
 * panels nobody has inspected, and the cautions. It never calls a structure safe. Stateless.
 */
public final class VerdictText {

  /** Longer lists are cut in the text (the JSON output always has them whole). */
  static final int LIST_LIMIT = 40;

  /** Planes larger than this are described but not drawn. */
  static final int MAX_DRAWN_LIFTS = 200;

  static final int MAX_DRAWN_BAYS = 120;

  private static final int WRAP = 100;

  /**
   * Renders the verdict.
   *
   * @param title what was checked, e.g. {@code design.txt, as built: site.txt}
   * @param supportNote where the support came from, e.g. {@code from the design map's header}
   * @param design the design the analysis was made on
   * @param asBuilt the as-built state, when one was analysed
   * @param analysis the engine's analysis of {@code design} (and {@code asBuilt})
   */
  public String render(
      String title,
      String supportNote,
      PlaneDesign design,
      Optional<AsBuiltPlane> asBuilt,
      PlaneAnalysis analysis) {
    return render(title, supportNote, design, asBuilt, analysis, PlaneRole.OTHER);
  }

  /** As above, for a plane of the given role (an upright frame's zone takes in the bays beside). */
  public String render(
      String title,
      String supportNote,
      PlaneDesign design,
      Optional<AsBuiltPlane> asBuilt,
      PlaneAnalysis analysis,
      PlaneRole role) {
    Verdict verdict = Verdict.of(analysis, role);
    PlaneGrid grid = analysis.grid();
    Terms terms = Terms.of(role);
    FrameView frame = new FrameView(design, asBuilt, analysis, terms);
    StringBuilder out = new StringBuilder();
    out.append("Bracewalk check: ").append(title).append('\n');
    out.append("Verdict: ").append(verdict.headline()).append('\n');
    out.append("Plane: ")
        .append(Wording.plural(grid.lifts(), "lift", "lifts"))
        .append(" x ")
        .append(Wording.plural(grid.bays(), "bay", "bays"))
        .append("; support used: ")
        .append(grid.support().label())
        .append(" (")
        .append(supportNote)
        .append(")\n\n");

    state(out, "As designed", analysis.design(), grid, frame, design.omittedFrame());
    if (analysis.asBuilt().isPresent()) {
      AsBuiltAnalysis a = analysis.asBuilt().get();
      out.append('\n');
      state(out, "As built", a.state(), grid, frame, frame.absentAsBuilt());
      uninspected(out, a, asBuilt);
      if (frame.shown()) {
        frameUninspected(out, a, asBuilt, terms);
      }
      extras(out, a.extraBraces());
      frame.takenAsThere(out);
    }

    out.append('\n');
    if (frame.shown()) {
      frame.elevation(out);
    } else {
      elevation(out, design, asBuilt, analysis);
    }
    out.append('\n');
    repair(out, analysis, design, asBuilt, terms);
    if (analysis.asBuilt().isPresent()) {
      out.append('\n');
      restore(out, analysis.repair().restoreToDesign());
      if (frame.shown()) {
        restoreFrame(out, analysis.repair().restoreFrame(), terms);
      }
    }

    out.append('\n');
    if (verdict.anyLostRestraint()) {
      wrap(out, Wording.LOST_RESTRAINT_NOTE, "");
    }
    if (verdict.keepOffZone().isPresent()) {
      wrap(out, verdict.keepOff(), "");
    }
    wrap(out, Cautions.STANDING, "");
    return out.toString();
  }

  // ---------------------------------------------------------------- states

  private static void state(
      StringBuilder out, String name, StateAnalysis s, PlaneGrid grid, FrameView frame,
      java.util.Set<FrameRef> absent) {
    out.append(name).append(": ").append(verdict(s)).append('\n');
    out.append("  Loss tolerance: ").append(lossTolerance(s)).append('\n');
    out.append("  Critical braces (losing any one of them alone adds a motion): ")
        .append(list(s.criticalBraces(), Wording::panel))
        .append('\n');
    if (frame.shown()) {
      wrap(out, "Critical frame members (losing any one of them alone adds a motion): "
          + list(s.criticalMembers(), f -> Wording.frameMember(f, frame.terms())), "  ");
    }
    if (s.frameComplete() && !s.blocks().isEmpty()) {
      blocks(out, s, grid);
    } else if (!s.rigid() && grid.support() == Support.PINNED_BASE) {
      out.append("  Joints that can move: ")
          .append(list(s.movingJoints(), Wording::joint))
          .append('\n');
    }
    if (!s.freedoms().isEmpty() && (frame.shown() || !s.frameComplete()
        || s.freedoms().stream().anyMatch(f -> f.kind() != FreedomKind.SWAY))) {
      out.append("  Freedoms, by kind:\n");
      int shown = 0;
      for (Freedom f : s.freedoms()) {
        if (shown++ == LIST_LIMIT) {
          out.append("    ... and ").append(s.freedoms().size() - LIST_LIMIT).append(" more (see --format json)\n");
          break;
        }
        wrap(out, "- " + Wording.kind(f.kind()) + ": " + Wording.freedom(f, frame.terms(), absent), "    ");
      }
    }
  }

  /** The verdict in plain words. */
  static String verdict(StateAnalysis s) {
    if (s.rigid()) {
      return "holds its shape.";
    }
    int restraint = s.freedomsOf(FreedomKind.LOST_RESTRAINT);
    if (s.degreesOfFreedom() > 0 && restraint == s.degreesOfFreedom()) {
      return "no part sways, but "
          + Wording.plural(restraint, "joint has", "joints have")
          + " lost sideways restraint: an engineer checks the members there before loading.";
    }
    if (s.degreesOfFreedom() > 0) {
      return "has lost rigidity: "
          + Wording.plural(s.degreesOfFreedom(), "independent motion", "independent motions")
          + ".";
    }
    if (s.oneWayOnly()) {
      return "sways one way only: its tension-only members go slack when it leans the other way.";
    }
    return "has lost rigidity.";
  }

  private static String lossTolerance(StateAnalysis s) {
    if (!s.rigid() || s.lossTolerance() < 0) {
      return "none: it does not hold its shape now";
    }
    String atLeast = s.lossToleranceExact() ? "" : "at least ";
    if (s.lossTolerance() == 0) {
      return atLeast + "0: losing a single brace can break it";
    }
    if (s.lossTolerance() == 1) {
      return atLeast + "1: any single brace may be lost and it still holds its shape";
    }
    return atLeast
        + s.lossTolerance()
        + ": any "
        + s.lossTolerance()
        + " braces may be lost and it still holds its shape";
  }

  private static void blocks(StringBuilder out, StateAnalysis s, PlaneGrid grid) {
    List<Block> blocks = s.blocks();
    Map<Block, String> names = blockNames(s, grid);
    boolean anyFixed = blocks.stream().anyMatch(Block::fixed);
    if (blocks.size() == 1) {
      Block only = blocks.get(0);
      out.append("  Blocks: one block, ")
          .append(only.fixed() ? "held by the base" : "free-standing: it can move only as a whole")
          .append(" (")
          .append(extent(only))
          .append(")")
          .append(s.oneWayOnly() ? ", yet it can lean one way: its tension-only members go slack\n" : "\n");
      return;
    }
    out.append(
        anyFixed
            ? "  Blocks (groups of lifts and bays that move together):\n"
            : "  Blocks (free-standing: nothing is held, each block can move against the others):\n");
    int shown = 0;
    for (Block b : blocks) {
      if (shown == LIST_LIMIT) {
        out.append("    ... and ").append(blocks.size() - shown).append(" more blocks\n");
        break;
      }
      shown++;
      if (b.fixed()) {
        heldAndCarried(out, b, Verdict.lowestSwayingLift(grid, s));
      } else {
        boolean together = b.lifts().size() + b.bays().size() > 1;
        out.append("    ")
            .append(names.get(b))
            .append(": ")
            .append(extent(b))
            .append(together ? " can sway together" : " can sway")
            .append(anyFixed ? ", not held\n" : "\n");
      }
    }
  }

  /**
   * The block held by the base, split where a lift below sways: a lift above the lowest swaying
   * lift keeps its shape but is carried sideways with it, so it is never called held.
   */
  private static void heldAndCarried(StringBuilder out, Block fixed, int lowestSwaying) {
    List<Integer> held = new ArrayList<>();
    List<Integer> carried = new ArrayList<>();
    for (int lift : fixed.lifts()) {
      (lift < lowestSwaying ? held : carried).add(lift);
    }
    String bays = fixed.bays().isEmpty() ? "" : "; " + Wording.numbered("bay", fixed.bays());
    if (!held.isEmpty() || carried.isEmpty()) {
      out.append("    held by the base: ").append(Wording.numbered("lift", held)).append(bays).append('\n');
    }
    if (!carried.isEmpty()) {
      out.append("    keeps its shape but is carried sideways by the swaying lift below: ")
          .append(Wording.numbered("lift", carried))
          .append('\n');
    }
  }

  private static String extent(Block b) {
    if (b.bays().isEmpty()) {
      return Wording.numbered("lift", b.lifts());
    }
    if (b.lifts().isEmpty()) {
      return Wording.numbered("bay", b.bays());
    }
    return Wording.numbered("lift", b.lifts()) + "; " + Wording.numbered("bay", b.bays());
  }

  /**
   * Letters for the blocks that can move: A-Z, then a-z, then {@code %}. On a pinned base the held
   * block has none; a free plane in one piece has none either (nothing moves inside it).
   */
  private static Map<Block, String> blockNames(StateAnalysis s, PlaneGrid grid) {
    Map<Block, String> names = new HashMap<>();
    boolean lettered = s.blocks().size() > 1;
    int k = 0;
    for (Block b : s.blocks()) {
      if (b.fixed() || !lettered) {
        names.put(b, " ");
      } else {
        names.put(b, k < 26 ? String.valueOf((char) ('A' + k)) : k < 52 ? String.valueOf((char) ('a' + k - 26)) : "%");
        k++;
      }
    }
    return names;
  }

  private static void uninspected(StringBuilder out, AsBuiltAnalysis a, Optional<AsBuiltPlane> plane) {
    if (a.unknownPanels() == 0) {
      out.append("  Not inspected: no panels.\n");
      return;
    }
    List<PanelRef> unknown =
        plane.map(p -> List.copyOf(new TreeSet<>(p.uninspected()))).orElse(List.of());
    StringBuilder sb = new StringBuilder("Not inspected: ");
    sb.append(Wording.plural(a.unknownPanels(), "panel", "panels"));
    if (!unknown.isEmpty()) {
      sb.append(" (").append(list(unknown, Wording::panel)).append(")");
    }
    sb.append(", counted as missing. ");
    boolean one = a.unknownPanels() == 1;
    String they = one ? "it is" : "they are";
    String them = one ? "it" : "them";
    if (a.verdictDependsOnUninspected()) {
      sb.append("If ")
          .append(they)
          .append(" sound the plane holds its shape: this verdict depends on ")
          .append(one ? "a panel" : "panels")
          .append(" nobody has looked at. Inspect ")
          .append(them)
          .append(" before relying on either verdict.");
    } else if (a.state().rigid()) {
      sb.append("The verdict does not depend on ").append(them).append(".");
    } else {
      sb.append("Even if ")
          .append(they)
          .append(" sound the plane does not hold its shape: the verdict does not depend on ")
          .append(them)
          .append(".");
    }
    wrap(out, sb.toString(), "  ");
  }

  private static void extras(StringBuilder out, List<PlacedBrace> extra) {
    out.append("  Extra braces (not in the design; they count because they are there): ")
        .append(list(extra, b -> Wording.panel(b.panel()) + " " + Wording.member(b.brace())))
        .append('\n');
  }

  // ---------------------------------------------------------------- elevation

  private static void elevation(
      StringBuilder out, PlaneDesign design, Optional<AsBuiltPlane> asBuilt, PlaneAnalysis analysis) {
    PlaneGrid grid = analysis.grid();
    String which = asBuilt.isPresent() ? "as built" : "as designed";
    if (grid.lifts() > MAX_DRAWN_LIFTS || grid.bays() > MAX_DRAWN_BAYS) {
      out.append("Elevation ")
          .append(which)
          .append(": not drawn, the plane is larger than ")
          .append(MAX_DRAWN_LIFTS)
          .append(" lifts or ")
          .append(MAX_DRAWN_BAYS)
          .append(" bays.\n");
      return;
    }
    StateAnalysis s = analysis.analysedState();
    Map<Block, String> names = blockNames(s, grid);
    String[] liftMark = new String[grid.lifts() + 1];
    String[] bayMark = new String[grid.bays() + 1];
    int lowestSwaying = s.rigid() ? Integer.MAX_VALUE : Verdict.lowestSwayingLift(grid, s);
    boolean anyCarried = false;
    for (Block b : s.blocks()) {
      for (int lift : b.lifts()) {
        // a held lift above a swaying one is carried sideways with it: marked, never blank
        boolean carried = b.fixed() && s.blocks().size() > 1 && lift > lowestSwaying;
        liftMark[lift] = carried ? ">" : names.get(b);
        anyCarried |= carried;
      }
      for (int bay : b.bays()) {
        bayMark[bay] = names.get(b);
      }
    }
    Map<PanelRef, RepairBrace> repairs = new HashMap<>();
    for (RepairBrace r : analysis.repair().braces()) {
      repairs.put(r.panel(), r);
    }
    Map<PanelRef, RestoreItem> restores = new HashMap<>();
    for (RestoreItem r : analysis.repair().restoreToDesign()) {
      restores.put(r.panel(), r);
    }
    TreeSet<PanelRef> extras = new TreeSet<>();
    analysis.asBuilt().ifPresent(a -> a.extraBraces().forEach(b -> extras.add(b.panel())));

    int tokenWidth = Math.max(2, String.valueOf(grid.bays()).length());
    String liftLabel = "lift " + grid.lifts();
    int labelWidth = Math.max(liftLabel.length(), "block".length());

    out.append("Elevation ").append(which).append(", top lift first (lift 1 is the bottom, bay 1 the left):\n");
    StringBuilder header = new StringBuilder("  ").append(pad("bay", labelWidth));
    for (int bay = 1; bay <= grid.bays(); bay++) {
      header.append(' ').append("  ").append(pad(String.valueOf(bay), tokenWidth));
    }
    out.append(header.toString().stripTrailing()).append('\n');
    boolean showBayBlocks = grid.support() == Support.FREE && s.blocks().size() > 1;
    if (showBayBlocks) {
      StringBuilder row = new StringBuilder("  ").append(pad("block", labelWidth));
      for (int bay = 1; bay <= grid.bays(); bay++) {
        row.append(' ').append("  ").append(pad(bayMark[bay] == null ? " " : bayMark[bay], tokenWidth));
      }
      out.append(row.toString().stripTrailing()).append('\n');
    }
    for (int lift = grid.lifts(); lift >= 1; lift--) {
      StringBuilder row = new StringBuilder("  ").append(pad("lift " + lift, labelWidth));
      for (int bay = 1; bay <= grid.bays(); bay++) {
        PanelRef p = new PanelRef(lift, bay);
        String mark = liftMark[lift] == null ? " " : liftMark[lift];
        String flag = " ";
        String token;
        if (repairs.containsKey(p)) {
          flag = "+";
          token = repairs.get(p).brace().token();
        } else {
          token = present(p, design, asBuilt);
          if (restores.containsKey(p) && !restores.get(p).neededForRigidity()) {
            flag = "-";
          } else if (extras.contains(p)) {
            flag = "*";
          }
        }
        row.append(' ').append(mark).append(flag).append(pad(token, tokenWidth));
      }
      out.append(row.toString().stripTrailing()).append('\n');
    }
    out.append("Legend: / \\ X rigid diagonals, ~/ ~\\ ~X tension-only, . none, ? not inspected, o opening\n");
    out.append("        + a brace to fit (the repair), - a design member missing, not needed for rigidity,\n");
    out.append("        * an extra brace, not in the design\n");
    if (s.blocks().size() > 1) {
      if (showBayBlocks) {
        out.append("        A, B, ...: the block of the panel's lift (the block row: of each bay); nothing is held\n");
      } else {
        out.append("        A, B, ...: the panel's lift belongs to a block that can sway; blank: held by the base\n");
      }
      if (anyCarried) {
        out.append("        >: the lift keeps its shape but is carried sideways by a swaying lift below it\n");
      }
    }
  }

  /**
   * The token for what is there: the as-built member (or ?), else the design's; o for openings.
   * Also used by {@link FrameView}.
   */
  static String present(PanelRef p, PlaneDesign design, Optional<AsBuiltPlane> asBuilt) {
    Brace member;
    if (asBuilt.isPresent()) {
      if (asBuilt.get().isUninspected(p)) {
        return "?";
      }
      member = asBuilt.get().memberAt(p);
    } else {
      member = design.braceAt(p);
    }
    if (member != null) {
      return member.token();
    }
    return design.isOpening(p) ? "o" : ".";
  }

  // ---------------------------------------------------------------- repair

  private static void repair(
      StringBuilder out, PlaneAnalysis analysis, PlaneDesign design, Optional<AsBuiltPlane> asBuilt,
      Terms terms) {
    RepairPlan plan = analysis.repair();
    StateAnalysis s = analysis.analysedState();
    if (s.rigid() && plan.braces().isEmpty() && plan.members().isEmpty()) {
      out.append("Repair: none needed for rigidity: the ")
          .append(asBuilt.isPresent() ? "as-built state" : "design")
          .append(" holds its shape.\n");
      return;
    }
    boolean tension = anyTension(design, asBuilt, plan);
    if (plan.possible()) {
      String set =
          tension
              ? " (an irreducible set: with tension-only members it is not proven to be the least)"
              : " (the least number; design positions first)";
      String what = plan.members().isEmpty()
          ? (plan.minimum() == 1 ? "this brace" : "these " + plan.minimum() + " braces")
          : plan.minimum() == 1 ? "this frame member" : "these " + plan.minimum() + " members";
      wrap(out,
          "Repair: fit "
              + what
              + " to make the plane hold its shape"
              + set
              + ":",
          "");
    } else {
      wrap(out,
          "Repair: no set of braces in the allowed panels (openings are never used) can make this"
              + " plane hold its shape; it needs a new bracing design from an engineer."
              + (plan.braces().isEmpty()
                  ? ""
                  : " These braces help as far as anything can:"),
          "");
    }
    int shown = 0;
    for (RepairBrace b : plan.braces()) {
      if (shown++ == LIST_LIMIT) {
        out.append("  ... and ").append(plan.braces().size() - LIST_LIMIT).append(" more (see --format json)\n");
        break;
      }
      out.append("  ").append(Wording.panel(b.panel())).append(": ").append(Wording.member(b.brace()));
      if (b.inDesign()) {
        out.append(" (a design position)\n");
      } else {
        out.append(" - NOT IN THE DESIGN: a deviation that needs engineering approval before it is fitted\n");
      }
    }
    for (RepairMember m : plan.members()) {
      out.append("  ").append(Wording.frameMember(m.member(), terms))
          .append(m.inDesign() ? ": refit (a design member)\n"
              : ": NOT IN THE DESIGN: a deviation that needs engineering approval before it is fitted\n");
    }
  }

  private static void restoreFrame(StringBuilder out, List<RestoreFrameItem> items, Terms terms) {
    if (items.isEmpty()) {
      out.append("Restore the frame to design: no design frame member is missing.\n");
      return;
    }
    out.append("Restore the frame to design (design frame members missing, ineffective or not inspected"
        + " as built):\n");
    int shown = 0;
    for (RestoreFrameItem r : items) {
      if (shown++ == LIST_LIMIT) {
        out.append("  ... and ").append(items.size() - LIST_LIMIT).append(" more (see --format json)\n");
        break;
      }
      out.append("  ").append(Wording.frameMember(r.member(), terms))
          .append(r.neededForRigidity() ? " - needed for rigidity\n" : " - restores redundancy only\n");
    }
  }

  private static void frameUninspected(
      StringBuilder out, AsBuiltAnalysis a, Optional<AsBuiltPlane> plane, Terms terms) {
    if (a.unknownFrameMembers() == 0) {
      out.append("  Frame members not inspected: none.\n");
      return;
    }
    List<FrameRef> unknown = plane.map(p -> List.copyOf(new TreeSet<>(p.unknownFrame()))).orElse(List.of());
    wrap(out, "Frame members not inspected: "
        + Wording.plural(a.unknownFrameMembers(), "member", "members")
        + (unknown.isEmpty() ? "" : " (" + list(unknown, f -> Wording.frameMember(f, terms)) + ")")
        + ", counted as missing.", "  ");
  }

  private static boolean anyTension(PlaneDesign design, Optional<AsBuiltPlane> asBuilt, RepairPlan plan) {
    boolean t = design.braces().values().stream().anyMatch(b -> b.kind() == MemberKind.TENSION_ONLY);
    t |= asBuilt.map(a -> a.members().values().stream().anyMatch(b -> b.kind() == MemberKind.TENSION_ONLY)).orElse(false);
    t |= plan.braces().stream().anyMatch(b -> b.brace().kind() == MemberKind.TENSION_ONLY);
    return t;
  }

  private static void restore(StringBuilder out, List<RestoreItem> items) {
    if (items.isEmpty()) {
      out.append("Restore to design: nothing is missing from the design.\n");
      return;
    }
    out.append("Restore to design (design members missing as built, or in panels not inspected):\n");
    int shown = 0;
    for (RestoreItem r : items) {
      if (shown++ == LIST_LIMIT) {
        out.append("  ... and ").append(items.size() - LIST_LIMIT).append(" more (see --format json)\n");
        break;
      }
      out.append("  ")
          .append(Wording.panel(r.panel()))
          .append(": ")
          .append(Wording.member(r.missing()))
          .append(r.neededForRigidity() ? " - needed for rigidity\n" : " - restores redundancy only\n");
    }
  }

  // ---------------------------------------------------------------- helpers

  static <T> String list(List<T> items, Function<T, String> show) {
    if (items.isEmpty()) {
      return "none";
    }
    List<String> parts = new ArrayList<>();
    for (int i = 0; i < items.size() && i < LIST_LIMIT; i++) {
      parts.add(show.apply(items.get(i)));
    }
    String more = items.size() > LIST_LIMIT ? ", ... and " + (items.size() - LIST_LIMIT) + " more" : "";
    return String.join(", ", parts) + more;
  }

  static String pad(String s, int width) {
    return s.length() >= width ? s : s + " ".repeat(width - s.length());
  }

  /** Appends {@code text} wrapped at {@value #WRAP} columns, each line starting with {@code indent}. */
  static void wrap(StringBuilder out, String text, String indent) {
    StringBuilder line = new StringBuilder(indent);
    for (String word : text.split(" ")) {
      if (line.length() > indent.length() && line.length() + 1 + word.length() > WRAP) {
        out.append(line).append('\n');
        line = new StringBuilder(indent);
      }
      if (line.length() > indent.length()) {
        line.append(' ');
      }
      line.append(word);
    }
    out.append(line).append('\n');
  }
}
