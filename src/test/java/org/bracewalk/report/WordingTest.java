package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.bracewalk.core.port.report.LengthUnits;
import org.junit.jupiter.api.Test;

/**
 * Numbers, counts and lists in the documents read as plain English: singular and plural, a last
 * item joined with "and", "every bay" where all are meant, never an empty list ("bays none") or a
 * bare "(actions 2)". The English wording is the packed template file.
 */
class WordingTest {
  private final Wording w = new Wording(Templates.load(TemplateSource.packed(), "en"),
      ReportFixtures.header(true, LengthUnits.METRIC, "scaffold"));

  @Test
  void numbersAreASeriesWithRangesAndAFinalAnd() {
    assertThat(w.series(List.of(4))).isEqualTo("4");
    assertThat(w.series(List.of(2, 1))).isEqualTo("1 and 2");
    assertThat(w.series(List.of(3, 4, 5))).isEqualTo("3-5");
    assertThat(w.series(List.of(1, 3, 4, 5, 8))).isEqualTo("1, 3-5 and 8");
    assertThat(w.series(List.of(1, 2, 4, 5))).isEqualTo("1, 2, 4 and 5");
  }

  @Test
  void liftsBaysAndActionsAreSingularOrPluralAndEveryWhenAll() {
    assertThat(w.numbered("lift", List.of(3), 5)).isEqualTo("lift 3");
    assertThat(w.numbered("lift", List.of(3, 4, 5), 5)).isEqualTo("lifts 3-5");
    assertThat(w.numbered("lift", List.of(1, 2, 3, 4, 5), 5)).isEqualTo("every lift");
    // a part whose block names no bays spans every bay: never "bays none"
    assertThat(w.numbered("bay", List.of(), 10)).isEqualTo("every bay");
    assertThat(w.numbered("bay", List.of(1), 1)).isEqualTo("every bay");
    assertThat(w.numbered("action", List.of(2), 0)).isEqualTo("action 2");
    assertThat(w.numbered("action", List.of(2, 4), 0)).isEqualTo("actions 2 and 4");
  }

  @Test
  void countsTakeTheirNounInTheRightNumber() {
    assertThat(w.count("action", 1)).isEqualTo("1 action");
    assertThat(w.count("action", 5)).isEqualTo("5 actions");
    assertThat(w.count("urgent", 0)).isEqualTo("none at once");
    assertThat(w.count("plane", 1)).isEqualTo("1 plane");
    assertThat(w.count("motion", 2)).isEqualTo("2 free motions");
    assertThat(w.plural("plane.repair", 1, "count", 1)).isEqualTo("One brace restores rigidity.");
    assertThat(w.plural("plane.repair", 3, "count", 3))
        .isEqualTo("The fewest braces that restore rigidity: 3.");
  }

  @Test
  void thePartsAndTheRepairLineReadAsSentences() {
    String part = w.format("plane.part", "letter", "A", "state", w.text("plane.part.sways"),
        "lifts", w.numbered("lift", List.of(3), 5), "bays", w.numbered("bay", List.of(), 10));
    assertThat(part).isEqualTo("Part A can sway: lift 3, every bay.");
    assertThat(w.format("plane.repair.actions", "actions", w.numbered("action", List.of(2), 0)))
        .isEqualTo("In the repair plan: action 2.");
  }
}
