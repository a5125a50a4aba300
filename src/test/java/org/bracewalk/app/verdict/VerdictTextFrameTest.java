package org.bracewalk.app.verdict;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The readable verdict of a plane with frame members missing. The analysis is written by hand as
 * the engine reports plane A of shared/design/analysis.md, "Frame members" (3 lifts x 1 bay, braces
 * /, \, / from lift 1, the ledger at level 1 missing: one freedom, joint (1, 0) only moves, the
 * standards meeting in a straight line there); the words and drawing are what is tested.
 */
class VerdictTextFrameTest {
  private final VerdictText text = new VerdictText();

  private static final PlaneGrid GRID = PlaneGrid.uniform(3, 1, Support.PINNED_BASE);
  private static final FrameRef LEDGER = FrameRef.ledger(1, 1);
  private static final PlaneDesign DESIGN = PlaneDesign.of(GRID, Map.of(
      PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING),
      PanelRef.of(2, 1), Brace.rigid(Diagonal.FALLING),
      PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING)));
  private static final AsBuiltPlane BUILT =
      new AsBuiltPlane(GRID, DESIGN.braces(), Set.of(), Set.of(LEDGER), Set.of(FrameRef.standard(3, 1)));

  private static PlaneAnalysis planeA() {
    StateAnalysis design = new StateAnalysis(true, 0, false, 0, true, List.of(PanelRef.of(1, 1)),
        List.of(new Block(List.of(1, 2, 3), List.of(1), true)), List.of(LEDGER), List.of(), List.of(), true);
    Joint j = new Joint(1, 0);
    StateAnalysis built = new StateAnalysis(false, 1, false, -1, true, List.of(), List.of(), List.of(),
        List.of(j), List.of(new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(j),
            List.of(FrameRef.standard(1, 0), FrameRef.standard(2, 0)), List.of())), false);
    RepairPlan repair = new RepairPlan(true, List.of(), List.of(), List.of(new RepairMember(LEDGER, true)),
        List.of(new RestoreFrameItem(LEDGER, true), new RestoreFrameItem(FrameRef.standard(3, 1), false)));
    return new PlaneAnalysis(GRID, design, Optional.of(new AsBuiltAnalysis(built, 0, false, List.of(), 1)), repair);
  }

  @Test
  void theVerdictNamesTheStandardTheKindOfFreedomAndTheMemberToRefit() {
    String out = text.render("a.txt", "test", DESIGN, Optional.of(BUILT), planeA(), PlaneRole.FACADE);
    String flat = out.replaceAll("\\s+", " ");

    assertThat(out).contains("Verdict: \u25B3 Lost sideways restraint: an engineer checks it before loading");
    assertThat(flat)
        .contains("As built: no part sways, but 1 joint has lost sideways restraint")
        .contains("Critical frame members (losing any one of them alone adds a motion): ledger at level 1, bay 1")
        .contains("Joints that can move: level 1, line 0")
        .contains("- lost sideways restraint: standard on line 0 runs unrestrained through level 1"
            + " (ledger at level 1, bay 1 not there): its unbraced length grows; an engineer checks it before loading")
        .contains("Frame members not inspected: 1 member (standard of lift 3 on line 1), counted as missing.")
        .contains("ledger at level 1, bay 1: refit (a design member)")
        .contains("Restore the frame to design")
        .contains("standard of lift 3 on line 1 - restores redundancy only")
        .contains(Wording.LOST_RESTRAINT_NOTE)
        .contains("Keep people and loads off lifts 1-3, bay 1")
        .doesNotContainIgnoringCase("safe")
        .doesNotContain("holds its shape.\n  Loss tolerance: none");
  }

  @Test
  void theElevationDrawsTheFrameInItsStatesAndMarksTheJoint() {
    String out = text.render("a.txt", "test", DESIGN, Optional.of(BUILT), planeA(), PlaneRole.FACADE);

    assertThat(out).contains(String.join("\n",
        "  bay        1",
        "  level 3 +-----+",
        "  lift 3  |  /  ?",
        "  level 2 +-----+",
        "  lift 2  |  \\  |",
        "  level 1 #     +",
        "  lift 1  |  /  |",
        "  level 0 +-----+",
        "Legend: "));
  }

  @Test
  void uprightFramesSayHorizontalAndUpright() {
    String out = text.render("a.txt", "test", DESIGN, Optional.of(BUILT), planeA(), PlaneRole.UPRIGHT_FRAME)
        .replaceAll("\\s+", " ");
    assertThat(out).contains("upright on line 0 runs unrestrained through level 1 (horizontal at level 1, bay 1 not there)")
        .contains("horizontal at level 1, bay 1: refit");
  }

  @Test
  void aDesignThatLeavesAMemberOutShowsItDottedAndAnAsBuiltMapSilentOnItIsCalledOut() {
    PlaneDesign d = DESIGN.withOmittedFrame(Set.of(FrameRef.ledger(2, 1), FrameRef.standard(1, 1)));
    AsBuiltPlane b = new AsBuiltPlane(GRID, DESIGN.braces(), Set.of());
    StateAnalysis rigid = new StateAnalysis(true, 0, false, 0, true, List.of(),
        List.of(new Block(List.of(1, 2, 3), List.of(1), true)));
    PlaneAnalysis a = new PlaneAnalysis(GRID, rigid, Optional.empty(), new RepairPlan(true, List.of(), List.of()));

    String designOnly = text.render("d.txt", "test", d, Optional.empty(), a, PlaneRole.FACADE);
    assertThat(designOnly).contains("  level 2 +.....+").contains("  lift 1  |  /  :");

    PlaneAnalysis ab = new PlaneAnalysis(GRID, rigid, Optional.of(new AsBuiltAnalysis(rigid, 0, true, List.of())),
        new RepairPlan(true, List.of(), List.of()));
    String withBuilt = text.render("d.txt", "test", d, Optional.of(b), ab, PlaneRole.FACADE).replaceAll("\\s+", " ");
    assertThat(withBuilt).contains("Left out by the design but there as built")
        .contains("ledger at level 2, bay 1, standard of lift 1 on line 1");
  }
}
