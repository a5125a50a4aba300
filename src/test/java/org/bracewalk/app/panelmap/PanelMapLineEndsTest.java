package org.bracewalk.app.panelmap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/** Panel maps: line ends read alike, other separators refused, and what is written reads back. */
class PanelMapLineEndsTest {
  private final PanelMapParser parser = new PanelMapParser();

  @Test
  void crCrlfAndLfGiveTheSameMapOnTheSameLines() {
    String lf = "# frame\nsupport: free\n/ .\n. X\n";
    PanelMap a = parser.parse("m.txt", lf, MapKind.DESIGN);
    for (String end : new String[] {"\r\n", "\r"}) {
      PanelMap b = parser.parse("m.txt", lf.replace("\n", end), MapKind.DESIGN);
      assertThat(b.lifts()).isEqualTo(2);
      assertThat(b.bays()).isEqualTo(2);
      assertThat(b.row(2).line()).isEqualTo(a.row(2).line()).isEqualTo(3);
      assertThat(b.toDesign(b.grid(Support.FREE))).isEqualTo(a.toDesign(a.grid(Support.FREE)));
    }
  }

  @Test
  void aFormFeedIsRefusedWhereItStandsInTheMapsOwnFormat() {
    assertThatThrownBy(() -> parser.parse("m.txt", "/ .\n.\f X\n", MapKind.DESIGN))
        .isInstanceOfSatisfying(PanelMapException.class, e -> {
          assertThat(e.line()).isEqualTo(2);
          assertThat(e.column()).isEqualTo(2);
          assertThat(e.getMessage()).startsWith("m.txt:2:2: a form feed");
        });
  }

  @Test
  void aCommentHoldingSeparatorsAndControlsIsWrittenSoTheMapReadsBack() {
    PlaneGrid grid = PlaneGrid.uniform(1, 1, Support.PINNED_BASE);
    String text = new PanelMapWriter().write(PlaneDesign.of(grid, Map.of()),
        "by A\u2028checked\u000Bby B\u0001\tC");
    assertThat(text).startsWith("# by A\n# checked\n# by B?\tC\n");
    assertThat(parser.parse("w.txt", text, MapKind.DESIGN).lifts()).isEqualTo(1);
  }
}
