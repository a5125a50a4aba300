package org.bracewalk.app.check;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;
import java.util.Optional;
import java.util.concurrent.atomic.AtomicInteger;
import org.bracewalk.app.panelmap.PanelMapException;
import org.bracewalk.app.panelmap.PanelMapParser;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

class CheckServiceTest {
  /** Counts calls and delegates to the real engine. */
  static final class CountingAnalyzer implements PlaneAnalyzer {
    final AtomicInteger calls = new AtomicInteger();
    private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

    @Override
    public StateAnalysis analyseState(PlaneGrid grid, Map<PanelRef, Brace> members) {
      calls.incrementAndGet();
      return engine.analyseState(grid, members);
    }

    @Override
    public StateAnalysis analyseState(org.bracewalk.core.analysis.BuiltFrame state) {
      calls.incrementAndGet();
      return engine.analyseState(state);
    }

    @Override
    public Optional<org.bracewalk.core.analysis.JointMotion> motion(
        org.bracewalk.core.analysis.BuiltFrame state, org.bracewalk.core.analysis.Freedom freedom) {
      return engine.motion(state, freedom);
    }

    @Override
    public PlaneAnalysis analyse(PlaneDesign design) {
      calls.incrementAndGet();
      return engine.analyse(design);
    }

    @Override
    public PlaneAnalysis analyse(PlaneDesign design, AsBuiltPlane asBuilt) {
      calls.incrementAndGet();
      return engine.analyse(design, asBuilt);
    }
  }

  private final CountingAnalyzer analyzer = new CountingAnalyzer();
  private final CheckService service = new CheckService(analyzer, new PanelMapParser());

  private static MapSource map(String name, String text) {
    return new MapSource(name, text);
  }

  @Test
  void theSupportComesFromTheOptionThenTheDesignHeaderThenTheDefault() {
    CheckResult header = service.check(map("d.txt", "support: free\n/ .\n"), Optional.empty(), Optional.empty());
    CheckResult option =
        service.check(map("d.txt", "support: free\n/ .\n"), Optional.empty(), Optional.of(Support.PINNED_BASE));
    CheckResult none = service.check(map("d.txt", "/ .\n"), Optional.empty(), Optional.empty());

    assertThat(header.supportChoice()).isEqualTo(SupportChoice.DESIGN_HEADER);
    assertThat(header.analysis().grid().support()).isEqualTo(Support.FREE);
    assertThat(option.supportChoice()).isEqualTo(SupportChoice.OPTION);
    assertThat(option.analysis().grid().support()).isEqualTo(Support.PINNED_BASE);
    assertThat(none.supportChoice()).isEqualTo(SupportChoice.DEFAULT);
    assertThat(none.analysis().grid().support()).isEqualTo(Support.PINNED_BASE);
  }

  @Test
  void withAnAsBuiltMapTheAsBuiltStateIsAnalysedOnTheDesignsGrid() {
    CheckResult r =
        service.check(
            map("d.txt", "widths: 2.4 1.8\n/ X\n"),
            Optional.of(map("a.txt", "? /\n")),
            Optional.empty());

    assertThat(r.asBuilt()).isPresent();
    assertThat(r.asBuilt().get().grid().bayWidths()).containsExactly(2.4, 1.8);
    assertThat(r.analysis().asBuilt()).isPresent();
    assertThat(r.analysis().asBuilt().get().unknownPanels()).isEqualTo(1);
    assertThat(r.rigid()).isTrue();
  }

  @Test
  void anAsBuiltMapMayRepeatTheDesignsHeader() {
    CheckResult r =
        service.check(
            map("d.txt", "support: free\nwidths: 2 2\n/ /\n/ .\n"),
            Optional.of(map("a.txt", "support: free\nwidths: 2.0 2\n/ /\n/ .\n")),
            Optional.empty());

    assertThat(r.rigid()).isTrue();
  }

  @Test
  void aSupportChosenOnTheCommandLineSettlesADisagreementBetweenTheMaps() {
    CheckResult r =
        service.check(
            map("d.txt", "support: free\n/ /\n/ .\n"),
            Optional.of(map("a.txt", "support: pinned-base\n/ /\n/ .\n")),
            Optional.of(Support.PINNED_BASE));

    assertThat(r.analysis().grid().support()).isEqualTo(Support.PINNED_BASE);
  }

  @Test
  void aMisfitAsBuiltMapIsLocatedAndNothingIsAnalysed() {
    assertThatThrownBy(
            () ->
                service.check(
                    map("d.txt", "/ .\n. /\n"), Optional.of(map("a.txt", "# top lift missing\n. /\n")), Optional.empty()))
        .isInstanceOfSatisfying(
            PanelMapException.class,
            e -> {
              assertThat(e.source()).isEqualTo("a.txt");
              assertThat(e.line()).isEqualTo(2);
              assertThat(e.column()).isEqualTo(1);
              assertThat(e.problem()).contains("1 lift (grid lines) but the design d.txt has 2 lifts");
            });
    assertThat(analyzer.calls).hasValue(0);
  }

  @Test
  void heightsThatDifferFromTheDesignsAreLocatedInTheAsBuiltMap() {
    assertThatThrownBy(
            () ->
                service.check(
                    map("d.txt", "/ .\n"), Optional.of(map("a.txt", "\nheights: 2.5\n/ .\n")), Optional.empty()))
        .isInstanceOfSatisfying(
            PanelMapException.class,
            e -> {
              assertThat(e.getMessage()).startsWith("a.txt:2:10: heights differ from those of the design d.txt");
              assertThat(e.problem()).contains("which gives none: 1 m each");
            });
  }

  @Test
  void decodingStopsAtTheFirstByteThatIsNotUtf8() {
    byte[] bytes = {'/', '\n', 'X', ' ', (byte) 0xC3};
    assertThatThrownBy(() -> CheckService.decode("m.txt", bytes))
        .hasMessage("m.txt:2:3: this is not UTF-8 text: save the file as UTF-8 (plain text)");
    assertThat(CheckService.decode("m.txt", "é /\n".getBytes(java.nio.charset.StandardCharsets.UTF_8)))
        .isEqualTo("é /\n");
  }
}
