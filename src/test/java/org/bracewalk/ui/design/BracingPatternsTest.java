package org.bracewalk.ui.design;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import java.util.Set;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class BracingPatternsTest {
  private final PlaneDesign empty = PlaneDesign.of(PlaneGrid.uniform(4, 10, Support.PINNED_BASE), Map.of());

  @Test
  void everyThirdBayFromBayOnePutsBracesInBaysOneFourSevenTenOfEveryLift() {
    PlaneDesign d = BracingPatterns.everyKthBay(empty, 3, 1, Brace.rigid(Diagonal.RISING));
    assertThat(d.braces()).hasSize(16);
    for (int lift = 1; lift <= 4; lift++) {
      for (int bay : new int[] {1, 4, 7, 10}) {
        assertThat(d.braceAt(PanelRef.of(lift, bay))).isEqualTo(Brace.rigid(Diagonal.RISING));
      }
    }
  }

  @Test
  void aZigZagRisesInOddLiftsAndFallsInEvenOnes() {
    PlaneDesign d = BracingPatterns.zigZag(empty, 5, 2, MemberKind.RIGID);
    assertThat(d.braceAt(PanelRef.of(1, 2)).diagonal()).isEqualTo(Diagonal.RISING);
    assertThat(d.braceAt(PanelRef.of(2, 2)).diagonal()).isEqualTo(Diagonal.FALLING);
    assertThat(d.braceAt(PanelRef.of(3, 7)).diagonal()).isEqualTo(Diagonal.RISING);
    assertThat(d.braces()).hasSize(8);
  }

  @Test
  void fillsLeaveOpeningsEmpty() {
    PlaneDesign withDoor = new PlaneDesign(empty.grid(), Map.of(), Set.of(PanelRef.of(1, 4)));
    PlaneDesign d = BracingPatterns.everyPanel(withDoor, Brace.rigid(Diagonal.RISING), true);
    assertThat(d.braceAt(PanelRef.of(1, 4))).isNull();
    assertThat(d.braces()).hasSize(39);
  }

  @Test
  void aBracedUprightFrameOnAPinnedBaseIsRigid() {
    PlaneDesign frame = PlaneDesign.of(PlaneGrid.uniform(8, 1, Support.PINNED_BASE), Map.of());
    PlaneDesign d = BracingPatterns.everyPanel(frame, Brace.rigid(Diagonal.RISING), true);
    // pinned base: rigid iff every lift has an effective diagonal (shared/design/analysis.md)
    assertThat(PlaneAnalyzer.standard().analyse(d).design().rigid()).isTrue();
  }

  @Test
  void aStepBelowOneIsRefusedNamingTheField() {
    assertThatThrownBy(() -> BracingPatterns.everyKthBay(empty, 0, 1, Brace.rigid(Diagonal.RISING)))
        .hasMessageContaining("k must be 1 or more");
    assertThatThrownBy(() -> BracingPatterns.zigZag(empty, 2, 11, MemberKind.RIGID))
        .hasMessageContaining("First bay: 11");
  }
}
