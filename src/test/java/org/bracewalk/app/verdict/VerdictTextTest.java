package org.bracewalk.app.verdict;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class VerdictTextTest {
  private final VerdictText text = new VerdictText();
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private String render(PlaneDesign design) {
    return text.render("t.txt", "test", design, Optional.empty(), engine.analyse(design));
  }

  private String render(PlaneDesign design, AsBuiltPlane built) {
    return text.render("t.txt", "test", design, Optional.of(built), engine.analyse(design, built));
  }

  private static PlaneDesign design(PlaneGrid grid, Object... lbd) {
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int k = 0; k < lbd.length; k += 3) {
      braces.put(PanelRef.of((Integer) lbd[k], (Integer) lbd[k + 1]), (Brace) lbd[k + 2]);
    }
    return PlaneDesign.of(grid, braces);
  }

  @Test
  void theElevationIsDrawnTopLiftFirstAndMarksTheRepair() {
    // pinned base, 3 lifts x 2 bays: lift 3 braced, lift 2 not, lift 1 braced
    PlaneDesign d =
        design(PlaneGrid.uniform(3, 2, Support.PINNED_BASE),
            3, 1, Brace.rigid(Diagonal.FALLING), 1, 2, Brace.tension(Diagonal.BOTH));

    String out = render(d);

    assertThat(out)
        .contains(
            """
              bay      1    2
              lift 3 > \\  > .
              lift 2 A+/  A .
              lift 1   .    ~X
            """)
        .contains("A, B, ...: the panel's lift belongs to a block that can sway; blank: held by the base")
        .contains("A: lift 2 can sway, not held")
        // lift 3 keeps its shape but rides on the swaying lift 2: carried sideways, never "held"
        .contains("keeps its shape but is carried sideways by the swaying lift below: lift 3")
        .doesNotContain("held by the base: lifts 1, 3")
        .contains("Keep people and loads off lifts 2, 3, bays 1, 2 until a competent person has acted.");
  }

  @Test
  void aFreePlaneLettersEveryBlockAndShowsTheBlockOfEachBay() {
    PlaneDesign d =
        design(PlaneGrid.uniform(2, 2, Support.FREE), 1, 1, Brace.rigid(Diagonal.RISING), 2, 1, Brace.rigid(Diagonal.RISING));

    String out = render(d);

    // published value (analysis.md): the two lifts and bay 1 hold together, bay 2 is free: 1 freedom
    assertThat(out)
        .contains("As designed: has lost rigidity: 1 independent motion.")
        .contains("Blocks (free-standing: nothing is held, each block can move against the others):")
        .contains("A: lifts 1, 2; bay 1 can sway together")
        .contains("B: bay 2 can sway")
        .contains("  block    A    B\n")
        .contains("Keep people and loads off lifts 1, 2, bays 1, 2 until a competent person has acted.");
  }

  @Test
  void aPlaneThatLeansOneWayIsSaidToSwayOneWayOnly() {
    PlaneDesign d = design(PlaneGrid.uniform(1, 2, Support.PINNED_BASE), 1, 1, Brace.tension(Diagonal.RISING));

    String out = render(d);

    assertThat(out)
        .contains("As designed: sways one way only")
        .contains("  lift 1   ~/  +/\n")
        .contains("yet it can lean one way")
        .contains("(an irreducible set: with tension-only")
        .contains("it is not proven to be the least)");
  }

  @Test
  void extraBracesMissingDesignMembersAndUninspectedPanelsAreShownAndListed() {
    PlaneGrid grid = PlaneGrid.uniform(2, 3, Support.PINNED_BASE);
    PlaneDesign d =
        design(grid, 1, 1, Brace.rigid(Diagonal.BOTH), 2, 2, Brace.rigid(Diagonal.RISING), 2, 3, Brace.rigid(Diagonal.RISING));
    AsBuiltPlane built =
        new AsBuiltPlane(
            grid,
            Map.of(
                PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING),
                PanelRef.of(1, 3), Brace.rigid(Diagonal.FALLING),
                PanelRef.of(2, 2), Brace.rigid(Diagonal.RISING)),
            Set.of(PanelRef.of(2, 3)));

    String out = render(d, built);

    assertThat(out)
        .contains("As built: holds its shape.")
        .contains("Not inspected: 1 panel (lift 2 bay 3), counted as missing. The verdict does not depend on it.")
        .contains("Extra braces (not in the design; they count because they are there): lift 1 bay 3 \\ rigid")
        .contains("  lift 2   .    /   -?\n")
        .contains("  lift 1  -/    .   *\\\n")
        .contains("lift 1 bay 1: \\ rigid - restores redundancy only")
        .contains("lift 2 bay 3: / rigid - restores redundancy only")
        .contains("Repair: none needed for rigidity: the as-built state holds its shape.")
        .doesNotContain("Keep people");
  }

  @Test
  void aPlaneTooLargeToDrawIsDescribedButNotDrawnAndLongListsAreCut() {
    PlaneGrid grid = PlaneGrid.uniform(VerdictText.MAX_DRAWN_LIFTS + 1, 2, Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      braces.put(PanelRef.of(lift, 1), Brace.rigid(Diagonal.RISING));
    }
    String out = render(PlaneDesign.of(grid, braces));

    assertThat(out).contains("Elevation as designed: not drawn, the plane is larger than 200 lifts or 120 bays.");
    // every brace is critical: 201 of them, the text shows 40
    assertThat(out).contains(", ... and " + (grid.lifts() - VerdictText.LIST_LIMIT) + " more");
  }

  @Test
  void theVerdictNeverUsesTheWordSafe() {
    PlaneDesign d = design(PlaneGrid.uniform(2, 2, Support.PINNED_BASE), 1, 1, Brace.rigid(Diagonal.RISING));
    assertThat(render(d)).doesNotContainIgnoringCase("safe").contains(Cautions.STANDING.substring(0, 40));
    assertThat(Cautions.STANDING).doesNotContainIgnoringCase("safe");
  }

  @Test
  void rangesAreWrittenShort() {
    assertThat(Wording.ranges(List.of(1, 2, 3, 5, 7, 8, 9, 10))).isEqualTo("1-3, 5, 7-10");
    assertThat(Wording.numbered("lift", List.of(3))).isEqualTo("lift 3");
    assertThat(Wording.numbered("bay", List.of())).isEqualTo("no bays");
  }
}
