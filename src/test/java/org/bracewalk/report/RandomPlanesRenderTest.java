package org.bracewalk.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.bracewalk.core.analysis.BuiltFrame;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.MotionSketch;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.app.verdict.Verdict;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.port.report.ReportContent;
import org.junit.jupiter.api.Test;

/**
 * Seeded random planes through the real engine - free and pinned, rigid and tension-only members,
 * openings, damaged, missing, extra and uninspected panels, uneven bays and lifts - drawn in one
 * report: every plane gets its page with its verdict, whatever the engine says about it.
 */
class RandomPlanesRenderTest {

  static PlaneSection plane(Random rnd, int k, PlaneAnalyzer engine) {
    int lifts = 1 + rnd.nextInt(7);
    int bays = 1 + rnd.nextInt(9);
    List<Double> w = new ArrayList<>();
    for (int j = 0; j < bays; j++) {
      w.add(0.6 + rnd.nextInt(30) / 10.0);
    }
    List<Double> h = new ArrayList<>();
    for (int i = 0; i < lifts; i++) {
      h.add(0.5 + rnd.nextInt(20) / 10.0);
    }
    Support support = rnd.nextInt(3) == 0 ? Support.FREE : Support.PINNED_BASE;
    PlaneGrid grid = new PlaneGrid(lifts, bays, w, h, support);
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> openings = new HashSet<>();
    Map<PanelRef, PanelFinding> findings = new HashMap<>();
    Diagonal[] ds = Diagonal.values();
    for (int i = 1; i <= lifts; i++) {
      for (int j = 1; j <= bays; j++) {
        PanelRef p = PanelRef.of(i, j);
        int roll = rnd.nextInt(10);
        if (roll < 5) {
          braces.put(p, new Brace(ds[rnd.nextInt(3)],
              rnd.nextInt(4) == 0 ? MemberKind.TENSION_ONLY : MemberKind.RIGID));
        } else if (roll == 5) {
          openings.add(p);
        }
        int state = rnd.nextInt(12);
        PanelFinding f;
        if (state == 0) {
          f = null;
        } else if (state == 1 && braces.containsKey(p)) {
          f = PanelFinding.of(PanelState.MISSING);
        } else if (state == 2 && braces.containsKey(p)) {
          f = PanelFinding.of(PanelState.DAMAGED_INEFFECTIVE);
        } else if (state == 3 && braces.containsKey(p)) {
          f = PanelFinding.of(PanelState.DAMAGED_EFFECTIVE);
        } else if (state == 4 && !braces.containsKey(p) && !openings.contains(p)) {
          f = new PanelFinding(PanelState.EXTRA, Brace.rigid(Diagonal.RISING));
        } else {
          f = PanelFinding.of(PanelState.SOUND);
        }
        if (f != null) {
          findings.put(p, f);
        }
      }
    }
    PlaneDesign design = new PlaneDesign(grid, braces, openings);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, findings);
    return new PlaneSection("random " + k, design, asBuilt, findings,
        engine.analyse(design, asBuilt), ReportFixtures.REV);
  }

  /**
   * A random plane with frame damage as well: some ledgers and standards left out of the design,
   * others recorded missing, damaged beyond use, damaged but counting or not inspected, analysed by
   * the real engine with the motion it gives for the sketch (as the report service takes it).
   */
  static PlaneSection frameDamaged(Random rnd, int k, PlaneAnalyzer engine) {
    PlaneSection base = plane(rnd, k, engine);
    PlaneGrid grid = base.design().grid();
    Set<FrameRef> omitted = new HashSet<>();
    Map<FrameRef, PanelState> frame = new HashMap<>();
    PanelState[] states = {PanelState.MISSING, PanelState.DAMAGED_INEFFECTIVE,
        PanelState.DAMAGED_EFFECTIVE, PanelState.NOT_INSPECTED, PanelState.SOUND};
    int damage = 1 + rnd.nextInt(3);
    for (int d = 0; d < damage; d++) {
      FrameRef f = rnd.nextBoolean()
          ? FrameRef.ledger(rnd.nextInt(grid.lifts() + 1), 1 + rnd.nextInt(grid.bays()))
          : FrameRef.standard(1 + rnd.nextInt(grid.lifts()), rnd.nextInt(grid.bays() + 1));
      if (rnd.nextInt(5) == 0) {
        omitted.add(f);
        frame.remove(f);
      } else if (!omitted.contains(f)) {
        frame.put(f, states[rnd.nextInt(states.length)]);
      }
    }
    PlaneDesign design = base.design().withOmittedFrame(omitted);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, base.findings(), frame);
    PlaneAnalysis analysis = engine.analyse(design, asBuilt);
    StateAnalysis state = analysis.analysedState();
    MotionSketch sketch = null;
    if (!state.rigid() && !state.freedoms().isEmpty()) {
      Freedom shown = state.freedoms().stream().filter(f -> f.kind() == FreedomKind.SWAY)
          .findFirst().orElse(state.freedoms().get(0));
      Set<FrameRef> absent = new HashSet<>(asBuilt.absentFrame());
      absent.addAll(asBuilt.unknownFrame());
      sketch = engine.motion(new BuiltFrame(grid, asBuilt.members(), absent), shown)
          .map(m -> new MotionSketch(shown, m)).orElse(null);
    }
    return new PlaneSection("framed " + k, design, asBuilt, base.findings(), analysis,
        ReportFixtures.REV, PlaneRole.OTHER, frame, sketch);
  }

  @Test
  void everyRandomPlaneWithFrameDamageIsDrawn() throws Exception {
    Random rnd = new Random(20261202L);
    PlaneAnalyzer engine = PlaneAnalyzer.standard();
    List<PlaneSection> planes = new ArrayList<>();
    for (int k = 1; k <= 24; k++) {
      planes.add(frameDamaged(rnd, k, engine));
    }
    // the seeded set holds each kind of freedom and sketches drawn from the engine's motion
    assertThat(planes).anyMatch(p -> p.analysis().analysedState().freedomsOf(FreedomKind.SWAY) > 0);
    assertThat(planes).anyMatch(p -> p.analysis().analysedState().freedomsOf(FreedomKind.LOST_RESTRAINT) > 0
        || p.analysis().analysedState().freedomsOf(FreedomKind.LOOSE_END) > 0);
    assertThat(planes).anyMatch(p -> p.sketch() != null);
    assertEachPlaneIsDrawn(planes, "random-frames.pdf");
  }

  @Test
  void everyRandomPlaneIsDrawn() throws Exception {
    Random rnd = new Random(20261201L);
    PlaneAnalyzer engine = PlaneAnalyzer.standard();
    List<PlaneSection> planes = new ArrayList<>();
    for (int k = 1; k <= 24; k++) {
      planes.add(plane(rnd, k, engine));
    }
    assertThat(planes).extracting(p -> Verdict.of(p.analysis(), p.role()).kind())
        .contains(VerdictKind.HOLDS, VerdictKind.LOST);
    assertEachPlaneIsDrawn(planes, "random-planes.pdf");
  }

  /**
   * Renders {@code planes} into one report (kept as {@code target/report-test/fileName} to look at)
   * and checks that each plane has a section headed with its name, or (holding its shape with
   * nothing found) a card in the compact table.
   */
  private static void assertEachPlaneIsDrawn(List<PlaneSection> planes, String fileName)
      throws Exception {
    ReportContent base = ReportFixtures.report(true);
    ReportContent r = new ReportContent(base.header(), base.particulars(), planes, List.of(),
        List.of(), base.fingerprint());
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    new PdfReportRenderer(TemplateSource.packed(), "en").renderReport(r, out);
    java.nio.file.Files.createDirectories(java.nio.file.Path.of("target", "report-test"));
    java.nio.file.Files.write(java.nio.file.Path.of("target", "report-test", fileName),
        out.toByteArray());
    List<String> pages = PdfReportRendererTest.pageTexts(out.toByteArray());
    for (PlaneSection p : planes) {
      int at = PdfReportRendererTest.indexOf(pages, "Plane: " + p.name() + " ");
      int card = PdfReportRendererTest.indexOf(pages, p.name() + " " + p.design().grid().lifts()
          + " lift");
      assertThat(Math.max(at, card)).as(p.name()).isPositive();
    }
  }
}
