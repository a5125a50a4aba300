package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Structure;
import org.bracewalk.core.port.InspectionFinalisedException;
import org.bracewalk.store.Database;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The "rest as designed" step of a routine walk (issue 12, item 4), over the demo facade. The
 * outside reference is the demo's own design map, {@code demo-site/maps/north-elevation.design.txt}
 * (10 bays by 5 lifts, braced in bays 1, 6 and 10, an opening at lift 1, bay 4), read here as plain
 * text: which panels it braces, and so which the step must record.
 */
class RestAsDesignedTest {
  private static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-15T09:00:00Z"), ZoneOffset.UTC);
  @TempDir Path dir;
  private AppServices s;
  private PlaneRecord facade;
  private PlaneRecord endFrame;
  private Inspection inspection;
  /** The design map's token per panel, read from the demo's map file. */
  private Map<PanelRef, String> map;

  @BeforeEach
  void open() throws IOException {
    s = AppServices.over(Database.open(dir.resolve("t.db")), CLOCK, PlaneAnalyzer.standard());
    s.demo().load();
    Structure scaffold = s.sites().sites().stream()
        .flatMap(site -> s.sites().structures(site.id()).stream())
        .filter(st -> st.name().equals("North facade scaffold")).findFirst().orElseThrow();
    facade = plane(scaffold, "north facade");
    endFrame = plane(scaffold, "east end frame");
    inspection = s.inspections().start(scaffold.id(),
        NewInspection.of("Rowan Test", "scaffold inspector", InspectionReason.ROUTINE));
    map = designMap(Path.of("demo-site/maps/north-elevation.design.txt"));
  }

  @AfterEach
  void close() {
    s.close();
  }

  private PlaneRecord plane(Structure st, String name) {
    return s.sites().planes(st.id()).stream().filter(p -> p.name().equals(name)).findFirst().orElseThrow();
  }

  /** The grid rows of a design map, top lift first, as tokens by panel (independent of the app's parser). */
  private static Map<PanelRef, String> designMap(Path file) throws IOException {
    List<String[]> rows = new ArrayList<>();
    for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
      String t = line.strip();
      if (t.isEmpty() || t.startsWith("#") || t.contains(":")) {
        continue;
      }
      rows.add(t.split("\\s+"));
    }
    Map<PanelRef, String> out = new TreeMap<>();
    for (int r = 0; r < rows.size(); r++) {
      for (int b = 0; b < rows.get(r).length; b++) {
        out.put(PanelRef.of(rows.size() - r, b + 1), rows.get(r)[b]);
      }
    }
    return out;
  }

  private static boolean braced(String token) {
    return !token.equals(".") && !token.equals("o");
  }

  private Observation record(PanelRef p, PanelState state) {
    return s.inspections().recordObservation(inspection.id(), NewObservation.of(facade.id(), p, state, "Rowan Test"));
  }

  @Test
  void afterTheBracedPanelsOneStepRecordsEveryOtherPanelAsDesignedInOneGo() {
    assertThat(map).hasSize(50);
    List<PanelRef> bracedPanels = map.entrySet().stream().filter(e -> braced(e.getValue())).map(Map.Entry::getKey).toList();
    List<PanelRef> unbraced = map.entrySet().stream().filter(e -> !braced(e.getValue())).map(Map.Entry::getKey).toList();
    assertThat(bracedPanels).as("the demo map: bays 1, 6 and 10 in every lift").hasSize(15);
    bracedPanels.forEach(p -> record(p, PanelState.SOUND));
    // one unbraced panel marked by mistake and undone (a correction back to "not inspected")
    Observation wrong = record(PanelRef.of(2, 2), PanelState.MISSING);
    Observation undone = s.inspections().correct(inspection.id(), wrong.id(),
        NewObservation.of(facade.id(), PanelRef.of(2, 2), PanelState.NOT_INSPECTED, "Rowan Test"), "undone");
    // one looked for and not reachable: looked at, so not recorded as designed
    record(PanelRef.of(5, 3), PanelState.NOT_REACHABLE);

    List<PanelRef> rest = s.inspections().notLookedAt(inspection.id(), facade.id());
    List<PanelRef> expected = new ArrayList<>(unbraced);
    expected.remove(PanelRef.of(5, 3));
    assertThat(rest).containsExactlyElementsOf(expected).hasSize(34);
    int before = s.inspections().observations(inspection.id()).size();

    List<Observation> made = s.inspections().recordRestAsDesigned(inspection.id(), facade.id(), rest, "Rowan Test");

    assertThat(made).hasSize(34);
    assertThat(s.inspections().observations(inspection.id())).hasSize(before + 34);
    for (Observation o : made) {
      assertThat(o.state()).isEqualTo(PanelState.SOUND);
      assertThat(o.memberFound()).as("as the design has it").isNull();
      assertThat(o.note()).isEqualTo(InspectionService.REST_AS_DESIGNED_NOTE);
      assertThat(o.recordedBy()).isEqualTo("Rowan Test");
    }
    Observation again = made.stream().filter(o -> o.panel().equals(PanelRef.of(2, 2))).findFirst().orElseThrow();
    assertThat(again.supersedes()).as("the withdrawn mark is corrected, not left beside").isEqualTo(undone.id());
    assertThat(again.correctionReason()).isEqualTo(InspectionService.REST_AS_DESIGNED_REASON);
    assertThat(made.stream().filter(o -> o.panel().equals(PanelRef.of(1, 1))).toList()).isEmpty();
    assertThat(s.inspections().notLookedAt(inspection.id(), facade.id())).isEmpty();
    assertThat(s.inspections().latestObservations(inspection.id(), facade.id()).get(PanelRef.of(5, 3)).state())
        .isEqualTo(PanelState.NOT_REACHABLE);

    // the plane as built now has exactly the design map's braces where inspected
    AsBuiltPlane built = s.inspections().asBuilt(inspection.id(), facade.id());
    assertThat(built.uninspected()).containsExactly(PanelRef.of(5, 3));
    for (Map.Entry<PanelRef, String> e : map.entrySet()) {
      if (e.getKey().equals(PanelRef.of(5, 3))) {
        continue;
      }
      assertThat(built.members().containsKey(e.getKey())).as("%s (%s)", e.getKey(), e.getValue()).isEqualTo(braced(e.getValue()));
      if (braced(e.getValue())) {
        assertThat(built.members().get(e.getKey()).token()).isEqualTo(e.getValue());
      }
    }
  }

  @Test
  void whatIsRecordedIsExactlyWhatWasConfirmedOrNothing() {
    List<PanelRef> rest = s.inspections().notLookedAt(inspection.id(), facade.id());
    assertThat(rest).hasSize(50);
    record(PanelRef.of(1, 1), PanelState.MISSING); // marked after the question was asked
    int before = s.inspections().observations(inspection.id()).size();
    assertThatThrownBy(() -> s.inspections().recordRestAsDesigned(inspection.id(), facade.id(), rest, "Rowan Test"))
        .isInstanceOf(UserInputException.class)
        .hasMessageContaining("north facade").hasMessageContaining("49 panels are not yet looked at, but 50")
        .hasMessageContaining("already looked at: [lift 1, bay 1]")
        .hasMessageContaining("Nothing was recorded");
    assertThat(s.inspections().observations(inspection.id())).hasSize(before);
  }

  @Test
  void aFinalisedInspectionTakesNothingAndTheOtherPlaneIsUntouched() {
    List<PanelRef> rest = s.inspections().notLookedAt(inspection.id(), facade.id());
    s.inspections().recordRestAsDesigned(inspection.id(), facade.id(), rest, "Rowan Test");
    assertThat(s.inspections().notLookedAt(inspection.id(), endFrame.id())).hasSize(endFrame.grid().panelCount());
    s.inspections().finalise(inspection.id());
    List<PanelRef> frameRest = s.inspections().notLookedAt(inspection.id(), endFrame.id());
    assertThatThrownBy(() -> s.inspections().recordRestAsDesigned(inspection.id(), endFrame.id(), frameRest, "Rowan Test"))
        .isInstanceOf(InspectionFinalisedException.class);
  }

  @Test
  void progressCountsEachPlaneAndTheWarningNamesThePlaneNobodyLookedAt() {
    s.inspections().recordRestAsDesigned(inspection.id(), facade.id(),
        s.inspections().notLookedAt(inspection.id(), facade.id()), "Rowan Test");
    List<PlaneProgress> progress = s.analysis().progress(inspection.id());
    assertThat(progress).extracting(p -> p.plane().name()).containsExactly("north facade", "east end frame");
    PlaneProgress f = progress.get(0);
    assertThat(f.countWords()).isEqualTo("50 of 50 panels");
    // the demo design map holds its shape with every brace there (bays 1, 6, 10 braced in every lift)
    assertThat(f.verdict()).isEqualTo(VerdictKind.HOLDS);
    PlaneProgress e = progress.get(1);
    assertThat(e.lookedAt()).isZero();
    assertThat(e.verdict()).isEqualTo(VerdictKind.NOT_INSPECTED);
    String warning = PlaneProgress.finaliseWarning(progress);
    assertThat(warning).contains("plane 'east end frame': " + e.total() + " of " + e.total() + " panels nobody has looked at")
        .doesNotContain("north facade");
    assertThat(PlaneProgress.finaliseWarning(List.of(f))).isEmpty();
  }
}
