package org.bracewalk.app.sitefile;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The observation CSV reads the same rows whatever its line ends: LF, CRLF (what RFC 4180 writes)
 * or a bare CR (classic Mac OS), also inside a quoted value, where a line break is part of the
 * value (RFC 4180) and is kept as one LF.
 */
class ObservationCsvLineEndsTest {
  private static final Map<String, PlaneGrid> PLANES =
      Map.of("frame 2", PlaneGrid.uniform(5, 1, Support.PINNED_BASE));

  private static final String LF = "plane,lift,bay,state,note\n"
      + "frame 2,1,1,sound,\"two\nlines\"\n"
      + "frame 2,2,1,missing,gone\n";

  @Test
  void lfCrlfAndCrGiveTheSameRowsOnTheSameLines() {
    List<ObservationCsv.Row> lf = ObservationCsv.read("o.csv", LF, PLANES);
    assertThat(lf).hasSize(2);
    assertThat(lf.get(0).note()).isEqualTo("two\nlines");
    assertThat(lf).extracting(ObservationCsv.Row::line).containsExactly(2, 4);
    assertThat(ObservationCsv.read("o.csv", LF.replace("\n", "\r\n"), PLANES)).isEqualTo(lf);
    assertThat(ObservationCsv.read("o.csv", LF.replace("\n", "\r"), PLANES)).isEqualTo(lf);
  }

  @Test
  void aLineAfterAQuotedLineBreakWrittenAsCrIsStillLocated() {
    String text = LF.replace("\n", "\r") + "frame 2,9,1,sound,\r";
    assertThatThrownBy(() -> ObservationCsv.read("o.csv", text, PLANES))
        .hasMessageStartingWith("o.csv, line 5 (at column lift), field \"lift\": 9 is out of range");
  }

  @Test
  void aVerticalTabIsRefusedAtItsLineAndColumn() {
    String text = LF.replace("gone", "go\u000Bne");
    assertThatThrownBy(() -> ObservationCsv.read("o.csv", text, PLANES))
        .isInstanceOfSatisfying(FileFormatException.class, e -> {
          assertThat(e.line()).isEqualTo(4);
          assertThat(e.getMessage()).startsWith("o.csv, line 4 (at column 23): a vertical tab");
        });
  }
}
