package org.bracewalk.app.panelmap;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class PanelMapWriterTest {
  private final PanelMapWriter writer = new PanelMapWriter();
  private final PanelMapParser parser = new PanelMapParser();

  @Test
  void writesTheHeaderThenTheGridTopLiftFirstWithAlignedColumns() {
    PlaneGrid grid = new PlaneGrid(2, 3, List.of(2.4, 1.8, 0.73), List.of(2.0, 1.5), Support.FREE);
    PlaneDesign design =
        new PlaneDesign(
            grid,
            Map.of(
                PanelRef.of(2, 1), Brace.tension(Diagonal.BOTH),
                PanelRef.of(1, 2), Brace.rigid(Diagonal.FALLING)),
            Set.of(PanelRef.of(1, 3)));

    assertThat(writer.write(design, "West gable\nas designed"))
        .isEqualTo(
            """
            # West gable
            # as designed
            support: free
            widths: 2.4 1.8 0.73
            heights: 2 1.5
            ~X . .
            .  \\ o
            """);
  }

  @Test
  void writesFrameLinesAfterTheGridInScaffoldWordsLedgersFirst() {
    PlaneGrid grid = PlaneGrid.uniform(1, 2, Support.PINNED_BASE);
    PlaneDesign design = new PlaneDesign(grid, Map.of(), Set.of(),
        Set.of(FrameRef.standard(1, 2), FrameRef.ledger(1, 2)));
    assertThat(writer.write(design)).endsWith(". .\nledger 1 2 none\nstandard 1 2 none\n");
    AsBuiltPlane built = new AsBuiltPlane(grid, Map.of(), Set.of(),
        Set.of(FrameRef.standard(1, 0)), Set.of(FrameRef.ledger(0, 1)));
    assertThat(writer.write(built)).endsWith(". .\nledger 0 1 ?\nstandard 1 0 missing\n");
  }

  @Test
  void writesUninspectedPanelsOfAnAsBuiltStateAsQuestionMarks() {
    PlaneGrid grid = PlaneGrid.uniform(1, 3, Support.PINNED_BASE);
    AsBuiltPlane built =
        new AsBuiltPlane(grid, Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING)), Set.of(PanelRef.of(1, 3)));

    assertThat(writer.write(built)).endsWith("heights: 1\n/ . ?\n");
  }

  @Property(tries = 60)
  void aWrittenDesignParsesBackToTheSameDesign(
      @ForAll @IntRange(min = 1, max = 9) int lifts,
      @ForAll @IntRange(min = 1, max = 9) int bays,
      @ForAll long seed) {
    java.util.Random random = new java.util.Random(seed);
    PlaneGrid grid = randomGrid(lifts, bays, random);
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    for (PanelRef p : panels(grid)) {
      int r = random.nextInt(4);
      if (r == 0) {
        braces.put(p, randomBrace(random));
      } else if (r == 1) {
        openings.add(p);
      }
    }
    PlaneDesign design = new PlaneDesign(grid, braces, openings, randomFrame(grid, random));

    String text = writer.write(design, "seed " + seed);
    PanelMap map = parser.parse("round-trip.txt", text, MapKind.DESIGN);

    assertThat(map.toDesign(map.grid(map.statedSupport().orElseThrow()))).isEqualTo(design);
  }

  @Property(tries = 60)
  void aWrittenAsBuiltStateParsesBackToTheSameState(
      @ForAll @IntRange(min = 1, max = 9) int lifts,
      @ForAll @IntRange(min = 1, max = 9) int bays,
      @ForAll long seed) {
    java.util.Random random = new java.util.Random(seed);
    PlaneGrid grid = randomGrid(lifts, bays, random);
    Map<PanelRef, Brace> members = new HashMap<>();
    Set<PanelRef> unknown = new HashSet<>();
    for (PanelRef p : panels(grid)) {
      int r = random.nextInt(4);
      if (r == 0) {
        members.put(p, randomBrace(random));
      } else if (r == 1) {
        unknown.add(p);
      }
    }
    Set<FrameRef> absent = randomFrame(grid, random);
    Set<FrameRef> unknownFrame = randomFrame(grid, random);
    unknownFrame.removeAll(absent);
    AsBuiltPlane built = new AsBuiltPlane(grid, members, unknown, absent, unknownFrame);

    PanelMap map = parser.parse("round-trip.txt", writer.write(built), MapKind.AS_BUILT);

    assertThat(map.toAsBuilt(map.grid(map.statedSupport().orElseThrow()))).isEqualTo(built);
  }

  private static PlaneGrid randomGrid(int lifts, int bays, java.util.Random random) {
    List<Double> widths = new ArrayList<>();
    for (int j = 0; j < bays; j++) {
      widths.add(random.nextBoolean() ? 0.5 + random.nextDouble() * 3 : 2.4);
    }
    List<Double> heights = new ArrayList<>();
    for (int i = 0; i < lifts; i++) {
      heights.add(random.nextBoolean() ? 1e-3 + random.nextDouble() * 1e3 : 2.0);
    }
    Support support = random.nextBoolean() ? Support.FREE : Support.PINNED_BASE;
    return new PlaneGrid(lifts, bays, widths, heights, support);
  }

  /** About one frame member in five, ledgers and standards, the plane's edges included. */
  private static Set<FrameRef> randomFrame(PlaneGrid grid, java.util.Random random) {
    Set<FrameRef> out = new HashSet<>();
    for (int level = 0; level <= grid.lifts(); level++) {
      for (int bay = 1; bay <= grid.bays(); bay++) {
        if (random.nextInt(5) == 0) {
          out.add(FrameRef.ledger(level, bay));
        }
      }
    }
    for (int lift = 1; lift <= grid.lifts(); lift++) {
      for (int line = 0; line <= grid.bays(); line++) {
        if (random.nextInt(5) == 0) {
          out.add(FrameRef.standard(lift, line));
        }
      }
    }
    return out;
  }

  private static Brace randomBrace(java.util.Random random) {
    Diagonal d = Diagonal.values()[random.nextInt(3)];
    MemberKind k = random.nextBoolean() ? MemberKind.RIGID : MemberKind.TENSION_ONLY;
    return new Brace(d, k);
  }

  private static List<PanelRef> panels(PlaneGrid grid) {
    List<PanelRef> all = new ArrayList<>();
    for (int i = 1; i <= grid.lifts(); i++) {
      for (int j = 1; j <= grid.bays(); j++) {
        all.add(PanelRef.of(i, j));
      }
    }
    return all;
  }
}
