package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;
import static org.bracewalk.core.model.Support.FREE;
import static org.bracewalk.core.model.Support.PINNED_BASE;

import java.util.List;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.junit.jupiter.api.Test;

class EngineBasicsTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  private static final String[] CONTRACT_DESIGN = {
    ". / . . \\", ". . / . .", "/ . . X .", ". / . . o"
  };
  private static final String[] CONTRACT_BUILT = {
    ". / . . \\", ". . . . .", "/ . . X .", ". / . . ."
  };

  @Test
  void contractExampleDesignHoldsWithCriticalBraces() {
    // check-contract.md worked example (the project's own contract).
    PlaneAnalysis a = engine.analyse(Planes.design(PINNED_BASE, CONTRACT_DESIGN));
    assertThat(a.design().rigid()).isTrue();
    assertThat(a.design().degreesOfFreedom()).isZero();
    assertThat(a.design().lossTolerance()).isZero();
    assertThat(a.design().criticalBraces())
        .containsExactly(PanelRef.of(1, 2), PanelRef.of(3, 3));
    assertThat(a.design().blocks())
        .containsExactly(new Block(List.of(1, 2, 3, 4), List.of(1, 2, 3, 4, 5), true));
    assertThat(a.repair().braces()).isEmpty();
    assertThat(a.repair().possible()).isTrue();
  }

  @Test
  void contractExampleAsBuiltLosesLiftThree() {
    PlaneAnalysis a =
        engine.analyse(
            Planes.design(PINNED_BASE, CONTRACT_DESIGN), Planes.asBuilt(PINNED_BASE, CONTRACT_BUILT));
    StateAnalysis s = a.asBuilt().orElseThrow().state();
    assertThat(s.rigid()).isFalse();
    assertThat(s.degreesOfFreedom()).isEqualTo(1);
    assertThat(s.lossTolerance()).isEqualTo(-1);
    assertThat(s.criticalBraces()).containsExactly(PanelRef.of(1, 2));
    assertThat(s.blocks())
        .containsExactly(
            new Block(List.of(1, 2, 4), List.of(1, 2, 3, 4, 5), true),
            new Block(List.of(3), List.of(), false));
    assertThat(a.repair().braces())
        .containsExactly(new RepairBrace(PanelRef.of(3, 3), Brace.rigid(Diagonal.RISING), true));
    assertThat(a.repair().restoreToDesign())
        .containsExactly(new RestoreItem(PanelRef.of(3, 3), Brace.rigid(Diagonal.RISING), true));
    assertThat(a.asBuilt().orElseThrow().extraBraces()).isEmpty();
  }

  @Test
  void nonGenericThreeByThreeHasOneFreedom() {
    // analysis.md: corners + centre braced, 2V-3 members, yet one freedom (grids are special).
    StateAnalysis s = engine.analyse(Planes.design(FREE, "/ . /", ". / .", "/ . /")).design();
    assertThat(s.degreesOfFreedom()).isEqualTo(1);
    assertThat(s.rigid()).isFalse();
  }

  @Test
  void unbracedFreeThreeByFourHasSixFreedomsAndNeedsSixBraces() {
    // Bolker & Crapo 1979: a minimal bracing has m + n - 1 diagonals.
    PlaneAnalysis a = engine.analyse(Planes.design(FREE, ". . . .", ". . . .", ". . . ."));
    assertThat(a.design().degreesOfFreedom()).isEqualTo(6);
    assertThat(a.repair().minimum()).isEqualTo(6);
    assertThat(a.repair().braces()).allMatch(b -> !b.inDesign());
  }

  @Test
  void singleTensionPanelNeedsBothDiagonals() {
    // analysis.md / Baglivo & Graver 1983: a single panel needs an X of tension members.
    StateAnalysis one = engine.analyse(Planes.design(FREE, "~/")).design();
    assertThat(one.degreesOfFreedom()).isZero();
    assertThat(one.rigid()).isFalse();
    assertThat(one.oneWayOnly()).isTrue();
    StateAnalysis cross = engine.analyse(Planes.design(FREE, "~X")).design();
    assertThat(cross.rigid()).isTrue();
  }

  @Test
  void tensionRepairIsIrreducible() {
    PlaneAnalysis a =
        engine.analyse(
            Planes.design(PINNED_BASE, "~X ~X", "~X ~X"), Planes.asBuilt(PINNED_BASE, "~/ .", ". ."));
    assertThat(a.asBuilt().orElseThrow().state().rigid()).isFalse();
    assertThat(a.repair().possible()).isTrue();
    // pinned base: each lift needs its arcs both ways; one tension X per lift (or the missing half).
    assertThat(a.repair().braces()).hasSize(2);
    assertThat(a.repair().braces().get(0).brace().kind()).isEqualTo(MemberKind.TENSION_ONLY);
  }

  @Test
  void openingsAreNeverUsedAndImpossibleIsSaid() {
    PlaneAnalysis a = engine.analyse(Planes.design(PINNED_BASE, ". .", "o o"));
    assertThat(a.repair().possible()).isFalse();
    assertThat(a.repair().braces()).extracting(RepairBrace::panel).containsExactly(PanelRef.of(2, 1));
  }

  @Test
  void partOfACrossMissingIsNamed() {
    PlaneAnalysis a =
        engine.analyse(Planes.design(PINNED_BASE, "X"), Planes.asBuilt(PINNED_BASE, "\\"));
    assertThat(a.repair().restoreToDesign())
        .containsExactly(new RestoreItem(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING), false));
    assertThat(a.asBuilt().orElseThrow().state().rigid()).isTrue();
  }

  @Test
  void uninspectedPanelsGiveBothVerdicts() {
    PlaneAnalysis a =
        engine.analyse(Planes.design(PINNED_BASE, "/ .", "/ ."), Planes.asBuilt(PINNED_BASE, "? .", "/ ."));
    AsBuiltAnalysis b = a.asBuilt().orElseThrow();
    assertThat(b.state().rigid()).isFalse();
    assertThat(b.rigidIfUnknownSound()).isTrue();
    assertThat(b.unknownPanels()).isEqualTo(1);
    assertThat(b.verdictDependsOnUninspected()).isTrue();
  }

  @Test
  void extraBracesAreListedAndCount() {
    PlaneAnalysis a =
        engine.analyse(Planes.design(PINNED_BASE, ". .", "/ ."), Planes.asBuilt(PINNED_BASE, ". \\", "/ ."));
    AsBuiltAnalysis b = a.asBuilt().orElseThrow();
    assertThat(b.state().rigid()).isTrue();
    assertThat(b.extraBraces())
        .containsExactly(new PlacedBrace(PanelRef.of(2, 2), Brace.rigid(Diagonal.FALLING)));
  }

  @Test
  void lossToleranceOfAFreeCrossedGrid() {
    // every panel an X on a free 2x2: K_{2,2} with doubled edges, edge connectivity 4.
    StateAnalysis s = engine.analyse(Planes.design(FREE, "X X", "X X")).design();
    assertThat(s.lossTolerance()).isEqualTo(3);
    assertThat(s.criticalBraces()).isEmpty();
  }

  @Test
  void aRepairNeverChangesTheMemberOfADesignPanel() {
    // check-contract.md: a repair brace in a design panel repeats the design. A lone tension rod
    // that already is its design member leaves nothing allowed to add, so the plane is reported
    // as not repairable within the design rules (an engineer must decide).
    PlaneAnalysis a = engine.analyse(Planes.design(PINNED_BASE, "~/"));
    assertThat(a.design().rigid()).isFalse();
    assertThat(a.design().oneWayOnly()).isTrue();
    assertThat(a.repair().possible()).isFalse();
    assertThat(a.repair().braces()).isEmpty();
  }
}
