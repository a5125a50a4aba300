package org.bracewalk.app.panelmap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.stream.Stream;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Frame lines of a panel map: check-contract.md, "Frame members". */
class PanelMapFrameLinesTest {
  private final PanelMapParser parser = new PanelMapParser();

  /** The contract's own frame example (check-contract.md, "Frame members"), as-built states. */
  @Test
  void theContractsFrameExampleReadsAsAnAsBuiltState() {
    String text =
        """
        support: pinned-base
        / . \\
        . X .
        ledger 1 2 missing
        standard 2 3 ineffective
        beam 2 1 ?
        """;
    PanelMap map = parser.parse("frame.txt", text, MapKind.AS_BUILT);

    assertThat(map.lifts()).isEqualTo(2);
    assertThat(map.frameLines()).hasSize(3);
    assertThat(map.frameLines().get(0).line()).isEqualTo(4);
    assertThat(map.frameLines().get(2).member()).isEqualTo(FrameRef.ledger(2, 1));
    AsBuiltPlane built = map.toAsBuilt(map.grid(Support.PINNED_BASE));
    assertThat(built.absentFrame())
        .containsExactlyInAnyOrder(FrameRef.ledger(1, 2), FrameRef.standard(2, 3));
    assertThat(built.unknownFrame()).containsExactly(FrameRef.ledger(2, 1));
  }

  @Test
  void soundAndDamagedMembersAreThereAndANoneInTheDesignIsLeftOut() {
    String design = ". .\n/ .\nledger 1 1 none\nupright 2 0 none\n";
    PlaneDesign d = parser.parse("d.txt", design, MapKind.DESIGN).toDesign(
        parser.parse("d.txt", design, MapKind.DESIGN).grid(Support.PINNED_BASE));
    assertThat(d.omittedFrame()).containsExactlyInAnyOrder(FrameRef.ledger(1, 1), FrameRef.standard(2, 0));

    // contract: an as-built member where the design says none counts; one not listed is sound
    String asBuilt = ". .\n/ .\nledger 1 1 sound\nSTANDARD 1 2 Damaged\n";
    PanelMap a = parser.parse("a.txt", asBuilt, MapKind.AS_BUILT);
    AsBuiltPlane built = a.toAsBuilt(a.grid(Support.PINNED_BASE));
    assertThat(built.absentFrame()).isEmpty();
    assertThat(built.unknownFrame()).isEmpty();
    assertThat(built.frameComplete()).isTrue();
  }

  @Test
  void aMapWithoutFrameLinesHasTheWholeFrame() {
    PanelMap d = parser.parse("d.txt", "/ .\n", MapKind.DESIGN);
    assertThat(d.frameLines()).isEmpty();
    assertThat(d.toDesign(d.grid(Support.FREE)).frameComplete()).isTrue();
  }

  @Test
  void theEdgesOfThePlaneAreInside() {
    // 2 lifts x 3 bays: ledgers at levels 0..2 across bays 1..3; standards of lifts 1..2 on lines 0..3
    String text = ". . .\n. . .\nledger 0 1 none\nledger 2 3 none\nstandard 1 0 none\nstandard 2 3 none\n";
    PanelMap map = parser.parse("d.txt", text, MapKind.DESIGN);
    assertThat(map.toDesign(map.grid(Support.PINNED_BASE)).omittedFrame()).containsExactlyInAnyOrder(
        FrameRef.ledger(0, 1), FrameRef.ledger(2, 3), FrameRef.standard(1, 0), FrameRef.standard(2, 3));
  }

  static Stream<Arguments> badFrameLines() {
    String grid = ". .\n/ .\n"; // 2 lifts x 2 bays; frame lines start on line 3
    return Stream.of(
        // a member outside the plane
        Arguments.of(grid + "ledger 3 1 none\n", MapKind.DESIGN, 3, 8, "LEVEL 3 is outside the plane"),
        Arguments.of(grid + "ledger 1 0 none\n", MapKind.DESIGN, 3, 10, "BAY 0 is outside the plane"),
        Arguments.of(grid + "ledger 1 3 none\n", MapKind.DESIGN, 3, 10, "the bays are 1 (the left) to 2"),
        Arguments.of(grid + "standard 0 1 missing\n", MapKind.AS_BUILT, 3, 10, "LIFT 0 is outside"),
        Arguments.of(grid + "standard 1 3 missing\n", MapKind.AS_BUILT, 3, 12, "LINE 3 is outside"),
        Arguments.of(grid + "upright 1 -1 missing\n", MapKind.AS_BUILT, 3, 11, "LINE -1 is outside"),
        Arguments.of(grid + "ledger one 1 none\n", MapKind.DESIGN, 3, 8, "LEVEL must be a whole number"),
        // an unknown member word or state
        Arguments.of(grid + "ledgr 1 1 none\n", MapKind.DESIGN, 3, 1, "unknown frame member 'ledgr'"),
        Arguments.of(grid + "brace 1 1 missing\n", MapKind.AS_BUILT, 3, 1, "unknown frame member 'brace'"),
        Arguments.of(grid + "ledger 1 1 gone\n", MapKind.AS_BUILT, 3, 12, "unknown state 'gone'"),
        Arguments.of(grid + "ledger 1 1 gone\n", MapKind.DESIGN, 3, 12, "use none"),
        // a design state in an as-built map, or the reverse
        Arguments.of(grid + "ledger 1 1 none\n", MapKind.AS_BUILT, 3, 12, "'none' is a design state"),
        Arguments.of(grid + "ledger 1 1 missing\n", MapKind.DESIGN, 3, 12, "'missing' is an as-built state"),
        Arguments.of(grid + "standard 1 1 ?\n", MapKind.DESIGN, 3, 14, "'?' is an as-built state"),
        // the same member twice (either word)
        Arguments.of(grid + "ledger 1 1 none\nbeam 1 1 none\n", MapKind.DESIGN, 4, 1, "given twice (first on line 3)"),
        Arguments.of(grid + "upright 2 0 ?\nstandard 2 0 sound\n", MapKind.AS_BUILT, 4, 1, "standard of lift 2 on line 0 is given twice"),
        // a frame line before or between grid rows
        Arguments.of("ledger 1 1 none\n" + grid, MapKind.DESIGN, 1, 1, "frame line before the grid"),
        Arguments.of(". .\nledger 1 1 none\n/ .\n", MapKind.DESIGN, 2, 1, "frame line between grid rows (the grid goes on at line 3)"),
        Arguments.of(grid + "  beam 1 1 none\n# note\n/ .\n", MapKind.DESIGN, 3, 3, "frame line between grid rows"),
        // too few or too many fields
        Arguments.of(grid + "ledger 1 1\n", MapKind.DESIGN, 3, 11, "too few fields"),
        Arguments.of(grid + "ledger 1\n", MapKind.DESIGN, 3, 9, "BAY is missing"),
        Arguments.of(grid + "standard\n", MapKind.AS_BUILT, 3, 9, "LIFT is missing"),
        Arguments.of(grid + "ledger 1 1 none left\n", MapKind.DESIGN, 3, 17, "too many fields"),
        // a header after frame lines is still a header after the grid
        Arguments.of(grid + "ledger 1 1 none\nsupport: free\n", MapKind.DESIGN, 4, 1, "header line after the grid"));
  }

  @ParameterizedTest
  @MethodSource("badFrameLines")
  void everyBadFrameLineNamesTheFileLineAndColumn(
      String text, MapKind kind, int line, int column, String says) {
    assertThatThrownBy(() -> parser.parse("plane.txt", text, kind))
        .isInstanceOfSatisfying(
            PanelMapException.class,
            e -> {
              assertThat(e.problem()).contains(says);
              assertThat(e.line()).as("line").isEqualTo(line);
              assertThat(e.column()).as("column").isEqualTo(column);
              assertThat(e.getMessage()).startsWith("plane.txt:" + line + ":" + column + ": ");
            });
  }
}
