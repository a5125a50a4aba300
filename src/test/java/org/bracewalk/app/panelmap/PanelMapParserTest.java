package org.bracewalk.app.panelmap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.stream.Stream;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class PanelMapParserTest {
  private final PanelMapParser parser = new PanelMapParser();

  /** The example of check-contract.md. */
  static final String CONTRACT_DESIGN =
      """
      # North elevation, lifts 1-4
      support: pinned-base
      widths: 2.4 2.4 2.4 1.8 2.4
      heights: 2.0 2.0 2.0 2.0
      . / . . \\
      . . / . .
      / . . X .
      . / . . o
      """;

  @Test
  void readsTheContractExampleWithTheTopLineAsTheTopLift() {
    PanelMap map = parser.parse("north.txt", CONTRACT_DESIGN, MapKind.DESIGN);

    assertThat(map.lifts()).isEqualTo(4);
    assertThat(map.bays()).isEqualTo(5);
    assertThat(map.statedSupport()).contains(Support.PINNED_BASE);
    assertThat(map.widths()).containsExactly(2.4, 2.4, 2.4, 1.8, 2.4);
    assertThat(map.heights()).containsExactly(2.0, 2.0, 2.0, 2.0);
    // the last grid line (text line 8) is lift 1, the first (line 5) lift 4
    assertThat(map.lineOf(1)).isEqualTo(8);
    assertThat(map.lineOf(4)).isEqualTo(5);
    assertThat(map.tokenAt(PanelRef.of(4, 5))).isEqualTo(PanelToken.FALLING);
    assertThat(map.tokenAt(PanelRef.of(1, 5))).isEqualTo(PanelToken.OPENING);
    assertThat(map.columnOf(PanelRef.of(4, 5))).isEqualTo(9);

    PlaneDesign design = map.toDesign(map.grid(Support.PINNED_BASE));
    assertThat(design.sortedBraces())
        .containsExactly(
            entry(1, 2, Brace.rigid(Diagonal.RISING)),
            entry(2, 1, Brace.rigid(Diagonal.RISING)),
            entry(2, 4, Brace.rigid(Diagonal.BOTH)),
            entry(3, 3, Brace.rigid(Diagonal.RISING)),
            entry(4, 2, Brace.rigid(Diagonal.RISING)),
            entry(4, 5, Brace.rigid(Diagonal.FALLING)));
    assertThat(design.openings()).containsExactly(PanelRef.of(1, 5));
    assertThat(design.grid().bayWidths()).containsExactly(2.4, 2.4, 2.4, 1.8, 2.4);
  }

  private static java.util.Map.Entry<PanelRef, Brace> entry(int lift, int bay, Brace b) {
    return java.util.Map.entry(PanelRef.of(lift, bay), b);
  }

  @Test
  void aMapOfMorePanelsThanTheLimitIsRefusedAtTheLineThatPassesIt() {
    // 2,001 lines of 2,000 bays: the 2,001st grid line passes 4,000,000 panels
    String row = String.join(" ", java.util.Collections.nCopies(2000, "."));
    String text = String.join("\n", java.util.Collections.nCopies(2001, row)) + "\n";
    assertThatThrownBy(() -> parser.parse("huge.txt", text, MapKind.DESIGN))
        .isInstanceOf(PanelMapException.class)
        .hasMessageStartingWith("huge.txt:2001:1: ")
        .hasMessageContaining("more than 4000000 panels");
    // 2000 x 2000 itself is read
    String most = String.join("\n", java.util.Collections.nCopies(2000, row)) + "\n";
    assertThat(parser.parse("most.txt", most, MapKind.DESIGN).lifts()).isEqualTo(2000);
  }

  @Test
  void slashRisesToTheRightAndBackslashFallsToTheRight() {
    PanelMap map = parser.parse("m.txt", "/ \\\n\\ /\n", MapKind.DESIGN);
    PlaneDesign d = map.toDesign(map.grid(Support.FREE));

    // top line "/ \" is lift 2; bottom line "\ /" is lift 1
    assertThat(d.braceAt(PanelRef.of(2, 1)).diagonal()).isEqualTo(Diagonal.RISING);
    assertThat(d.braceAt(PanelRef.of(2, 2)).diagonal()).isEqualTo(Diagonal.FALLING);
    assertThat(d.braceAt(PanelRef.of(1, 1)).diagonal()).isEqualTo(Diagonal.FALLING);
    assertThat(d.braceAt(PanelRef.of(1, 2)).diagonal()).isEqualTo(Diagonal.RISING);
  }

  @Test
  void tildeMarksTensionOnlyMembersAndEveryTokenIsRead() {
    PanelMap map = parser.parse("m.txt", ". / \\ X ~/ ~\\ ~X ?\n", MapKind.AS_BUILT);

    assertThat(map.row(1).tokens())
        .containsExactly(
            PanelToken.NONE,
            PanelToken.RISING,
            PanelToken.FALLING,
            PanelToken.BOTH,
            PanelToken.TENSION_RISING,
            PanelToken.TENSION_FALLING,
            PanelToken.TENSION_BOTH,
            PanelToken.UNKNOWN);
    var built = map.toAsBuilt(map.grid(Support.PINNED_BASE));
    assertThat(built.memberAt(PanelRef.of(1, 6))).isEqualTo(Brace.tension(Diagonal.FALLING));
    assertThat(built.memberAt(PanelRef.of(1, 4))).isEqualTo(Brace.rigid(Diagonal.BOTH));
    assertThat(built.uninspected()).containsExactly(PanelRef.of(1, 8));
    assertThat(built.members()).hasSize(6);
  }

  @Test
  void commentsBlankLinesCarriageReturnsAndAByteOrderMarkAreSkipped() {
    String text = "\uFEFF# a comment\r\n\r\nsupport: free\r\n  # indented comment\r\n/ .\r\n\r\n. X\r\n";
    PanelMap map = parser.parse("m.txt", text, MapKind.DESIGN);

    assertThat(map.lifts()).isEqualTo(2);
    assertThat(map.statedSupport()).contains(Support.FREE);
    assertThat(map.tokenAt(PanelRef.of(1, 2))).isEqualTo(PanelToken.BOTH);
    assertThat(map.lineOf(2)).isEqualTo(5);
  }

  @Test
  void withoutAHeaderNothingIsStatedAndTheGridHasUnitDimensions() {
    PanelMap map = parser.parse("m.txt", "/ .\n", MapKind.DESIGN);

    assertThat(map.statedSupport()).isEmpty();
    assertThat(map.widths()).isNull();
    assertThat(map.grid(Support.PINNED_BASE).bayWidths()).containsExactly(1.0, 1.0);
  }

  static Stream<Arguments> badMaps() {
    return Stream.of(
        // text, kind, line, column, what the message must say
        Arguments.of("colour: red\n/ .\n", MapKind.DESIGN, 1, 1, "unknown header key 'colour'"),
        Arguments.of("support: pinned\n/ .\n", MapKind.DESIGN, 1, 10, "support must be pinned-base"),
        Arguments.of("support:\n/ .\n", MapKind.DESIGN, 1, 9, "support must be pinned-base"),
        Arguments.of("widths: 2.4 abc\n/ .\n", MapKind.DESIGN, 1, 13, "'abc' is not a number"),
        Arguments.of("widths: 2,4 2.4\n/ .\n", MapKind.DESIGN, 1, 9, "use a point for decimals"),
        Arguments.of("widths: 2.4 0\n/ .\n", MapKind.DESIGN, 1, 13, "must be a positive length"),
        Arguments.of("heights: -2\n/ .\n", MapKind.DESIGN, 1, 10, "must be a positive length"),
        Arguments.of("widths:\n/ .\n", MapKind.DESIGN, 1, 8, "widths: no values"),
        Arguments.of("widths: 2.4 2.4 2.4\n/ .\n", MapKind.DESIGN, 1, 17, "3 values for 2 bays"),
        Arguments.of("heights: 2.0\n/ .\n. .\n", MapKind.DESIGN, 1, 13, "1 value for 2 lifts"),
        Arguments.of("support: free\nsupport: free\n/\n", MapKind.DESIGN, 2, 1, "given twice (first on line 1)"),
        Arguments.of("/ .\nsupport: free\n", MapKind.DESIGN, 2, 1, "header line after the grid has started"),
        Arguments.of("/ . .\n. /\n", MapKind.DESIGN, 2, 4, "this grid line has 2 panels but the first grid line (line 1) has 3"),
        Arguments.of("/ .\n. / /\n", MapKind.DESIGN, 2, 5, "has 3 panels"),
        Arguments.of(". Y\n", MapKind.DESIGN, 1, 3, "unknown panel token 'Y'"),
        Arguments.of(". x\n", MapKind.DESIGN, 1, 3, "did you mean X?"),
        Arguments.of("support free\n/\n", MapKind.DESIGN, 1, 1, "a header line is written 'key: value'"),
        Arguments.of(". ?\n", MapKind.DESIGN, 1, 3, "'?' (not inspected) belongs in as-built maps only"),
        Arguments.of("o .\n", MapKind.AS_BUILT, 1, 1, "'o' (opening) belongs in design maps only"),
        Arguments.of("# nothing but a comment\n", MapKind.DESIGN, 1, 24, "the map has no grid"),
        Arguments.of("", MapKind.AS_BUILT, 1, 1, "the map has no grid"),
        Arguments.of("support: free\n\n", MapKind.DESIGN, 1, 14, "the map has no grid"));
  }

  @ParameterizedTest
  @MethodSource("badMaps")
  void everyBadInputNamesTheFileLineAndColumn(
      String text, MapKind kind, int line, int column, String says) {
    assertThatThrownBy(() -> parser.parse("plane.txt", text, kind))
        .isInstanceOfSatisfying(
            PanelMapException.class,
            e -> {
              assertThat(e.source()).isEqualTo("plane.txt");
              assertThat(e.line()).as("line").isEqualTo(line);
              assertThat(e.column()).as("column").isEqualTo(column);
              assertThat(e.problem()).contains(says);
              assertThat(e.getMessage()).startsWith("plane.txt:" + line + ":" + column + ": ");
            });
  }

  @Test
  void unknownTokenMessagesListTheTokensThatAreAllowedInThatKindOfMap() {
    assertThatThrownBy(() -> parser.parse("d.txt", "#\n", MapKind.DESIGN))
        .hasMessageContaining("o)");
    assertThatThrownBy(() -> parser.parse("d.txt", "Q\n", MapKind.DESIGN))
        .hasMessageContaining("o for an opening");
    assertThatThrownBy(() -> parser.parse("a.txt", "Q\n", MapKind.AS_BUILT))
        .hasMessageContaining("? for a panel not inspected");
  }

  @Test
  void headerKeysAreTheThreeOfTheContract() {
    assertThat(PanelMapParser.HEADER_KEYS).isEqualTo(List.of("support", "widths", "heights"));
  }
}
