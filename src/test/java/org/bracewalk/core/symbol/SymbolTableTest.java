package org.bracewalk.core.symbol;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.bracewalk.app.verdict.VerdictKind;
import org.junit.jupiter.api.Test;

/**
 * One set of symbols: the README's table is {@link Symbol}, row for row, and no shape or glyph
 * stands for two things. (Project rule from issue 12, item 13; common practice for drawing keys:
 * one symbol, one meaning.)
 */
class SymbolTableTest {
  private static final String START = "<!-- symbols: start -->";
  private static final String END = "<!-- symbols: end -->";

  @Test
  void theReadmeTableIsTheSymbolList() throws Exception {
    String readme = Files.readString(Path.of("README.md"));
    int a = readme.indexOf(START);
    int b = readme.indexOf(END);
    assertThat(a).as("README marker " + START).isGreaterThanOrEqualTo(0);
    assertThat(b).as("README marker " + END).isGreaterThan(a);
    List<String> rows = Arrays.stream(readme.substring(a + START.length(), b).split("\n"))
        .map(String::strip).filter(l -> !l.isEmpty()).toList();
    assertThat(rows).as("README symbols table (between the markers)").containsExactlyElementsOf(Symbol.readmeTable());
  }

  @Test
  void noShapeOrGlyphMeansTwoThings() {
    Set<String> shapes = new HashSet<>();
    Set<String> glyphs = new HashSet<>();
    for (Symbol s : Symbol.values()) {
      assertThat(shapes.add(s.shape())).as("shape of " + s + " used twice: " + s.shape()).isTrue();
      assertThat(glyphs.add(s.glyph())).as("glyph of " + s + " used twice: " + s.glyph()).isTrue();
      assertThat(s.meaning()).doesNotContain("|").isNotBlank();
    }
  }

  @Test
  void verdictsWriteTheirSymbolsFromTheList() {
    Set<String> text = new HashSet<>();
    for (Symbol s : Symbol.values()) {
      if (s.where() == Symbol.Where.TEXT) {
        text.add(s.glyph());
      }
    }
    for (VerdictKind k : VerdictKind.values()) {
      assertThat(text).as(k + " symbol " + k.symbol()).contains(k.symbol());
    }
    assertThat(VerdictKind.LOST.symbol()).isEqualTo(Symbol.LOST_RIGIDITY.glyph());
    assertThat(VerdictKind.HOLDS.symbol()).isEqualTo(Symbol.HOLDS_SHAPE.glyph());
  }
}
