package org.bracewalk.ui;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.app.AppServices;
import org.bracewalk.app.PlaneResult;
import org.bracewalk.app.verdict.Terms;
import org.bracewalk.app.verdict.Wording;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.FakeDialogs;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.ui.findings.FindingsViewModel;
import org.bracewalk.ui.findings.ReportIssuer;
import org.bracewalk.ui.history.HistoryViewModel;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Frame findings on the Findings and History screens, over the demo: the racking run's
 * after-impact inspection (2) records frame 2's bottom horizontal missing and an upright damaged
 * beyond use; the facade scaffold's inspection 3 records the ledger at level 1, bay 1 taken out.
 * The view models hand the drawing the frame findings, the freedoms, the frame members of the
 * repair and the frame members that changed, and name them in the words of {@link Wording}, the
 * one place the report's words come from too. The mechanisms expected (a loose end at the struck
 * foot; the end standard without sideways restraint) are those worked out by hand in
 * {@code app.DemoFrameMembersTest} from {@code shared/design/analysis.md}.
 */
class FrameFindingsViewModelsTest {
  @TempDir Path dir;
  private AppServices services;

  private static final ReportIssuer NO_DOCUMENTS = new ReportIssuer() {
    @Override
    public String issueReport(long id, Path out, java.util.function.Consumer<Progress> progress) {
      throw new IllegalStateException("not in this test");
    }

    @Override
    public String issueRepairOrder(long id, Path out,
        java.util.function.Consumer<Progress> progress) {
      throw new IllegalStateException("not in this test");
    }
  };

  @BeforeEach
  void demo() {
    services = DemoDatabase.withDemo(dir);
  }

  @AfterEach
  void close() {
    services.close();
  }

  private PlaneRecord plane(long inspection, String name) {
    return services.inspections().planesOf(inspection).stream()
        .filter(p -> p.name().equals(name)).findFirst().orElseThrow();
  }

  private FindingsViewModel findings(long inspection, PlaneRecord plane) {
    FindingsViewModel vm = new FindingsViewModel(services.sites(), services.inspections(),
        services.analysis(), PlaneAnalyzer.standard(), NO_DOCUMENTS, new FakeDialogs(),
        Runnable::run, Runnable::run, inspection, plane.id());
    vm.load();
    assertThat(vm.errorProperty().get()).isEmpty();
    return vm;
  }

  private static List<Joint> joints(PlanePicture pic, FreedomKind kind) {
    return pic.freedoms().stream().filter(f -> f.kind() == kind)
        .flatMap(f -> f.joints().stream()).toList();
  }

  @Test
  void theStruckRackingFrameIsDrawnAndListedWithItsFrameFindings() {
    PlaneRecord frame2 = plane(2, "frame 2");
    FindingsViewModel vm = findings(2, frame2);
    PlanePicture pic = vm.pictureProperty().get();
    assertThat(pic.frameFindings()).isEqualTo(Map.of(FrameRef.ledger(1, 1), PanelState.MISSING,
        FrameRef.standard(1, 0), PanelState.DAMAGED_INEFFECTIVE));
    assertThat(joints(pic, FreedomKind.LOOSE_END)).contains(new Joint(1, 0));
    // the repair's frame members are the engine's, drawn and listed first, in order
    PlaneResult r = services.analysis().analysePlane(2, frame2.id());
    List<FrameRef> members = r.analysis().repair().members().stream()
        .map(RepairMember::member).toList();
    assertThat(members).isNotEmpty();
    assertThat(pic.repairMembers()).isEqualTo(members);
    Terms racking = Terms.RACKING_FRAME; // an upright frame: horizontals and uprights
    for (int k = 0; k < members.size(); k++) {
      FrameRef f = members.get(k);
      String action = f.equals(FrameRef.standard(1, 0)) ? "replace" : "refit";
      assertThat(vm.repairLines().get(k)).isEqualTo((k + 1) + ".  "
          + Wording.frameMember(f, racking) + ": " + action + " \u2014 restores the design");
    }
    assertThat(vm.repairLines()).hasSize(r.analysis().repair().minimum());
    assertThat(vm.findingLines())
        .anyMatch(s -> s.startsWith("horizontal at level 1, bay 1: missing, torn \u2014 bottom horizontal"))
        .anyMatch(s -> s.startsWith("upright of lift 1 on line 0: damaged beyond use, bent, bow 9.0"
            + " mm over 1000 mm"));
    List<String> freedomWords = r.verdict().freedomWords(Set.of(FrameRef.ledger(1, 1),
        FrameRef.standard(1, 0)));
    for (String w : freedomWords) {
      assertThat(vm.findingLines()).contains("Can move: " + w + ".");
    }
    assertThat(freedomWords).anyMatch(w -> w.startsWith("loose end at level 1, line 0"));
    assertThat(vm.restoreLines())
        .contains("horizontal at level 1, bay 1: missing \u2014 needed for rigidity");
    assertThat(vm.summaryProperty().get()).contains("2 frame members marked");
    assertThat(vm.verdictProperty().get().advice()).contains("member");
  }

  @Test
  void theFacadeLedgerTakenOutShowsTheStandardWithoutSidewaysRestraint() {
    PlaneRecord facade = plane(3, "north facade");
    FindingsViewModel vm = findings(3, facade);
    PlanePicture pic = vm.pictureProperty().get();
    assertThat(pic.frameFindings()).containsEntry(FrameRef.ledger(1, 1), PanelState.MISSING);
    assertThat(joints(pic, FreedomKind.LOST_RESTRAINT)).contains(new Joint(1, 0));
    assertThat(pic.freedoms()).extracting(Freedom::kind).doesNotContain(FreedomKind.SWAY);
    assertThat(pic.repairMembers()).containsExactly(FrameRef.ledger(1, 1));
    assertThat(vm.repairLines().get(0))
        .isEqualTo("1.  ledger at level 1, bay 1: refit \u2014 restores the design");
    assertThat(vm.findingLines()).contains(Wording.LOST_RESTRAINT_NOTE)
        .anyMatch(s -> s.startsWith("ledger at level 1, bay 1: missing \u2014 ledger at the first"));
    assertThat(vm.findingLines()).anyMatch(s -> s.startsWith(
        "Can move: standard on line 0 runs unrestrained through level 1"));
  }

  @Test
  void aPlaneWithACompleteFrameIsListedAsBefore() {
    PlaneRecord frame2 = plane(1, "frame 2");
    FindingsViewModel vm = findings(1, frame2);
    PlanePicture pic = vm.pictureProperty().get();
    assertThat(pic.frameFindings()).isEmpty();
    assertThat(pic.repairMembers()).isEmpty();
    assertThat(vm.findingLines()).noneMatch(s -> s.startsWith("Can move"));
    assertThat(vm.summaryProperty().get()).doesNotContain("frame member");
  }

  @Test
  void historyMarksAndListsTheFrameMembersThatChanged() {
    PlaneRecord frame2 = plane(2, "frame 2");
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(),
        Runnable::run, Runnable::run, frame2.id());
    assertThat(vm.chosenProperty().get()).isEqualTo(1);
    PlanePicture pic = vm.pictureProperty().get();
    assertThat(pic.changedMembers())
        .containsExactlyInAnyOrder(FrameRef.ledger(1, 1), FrameRef.standard(1, 0));
    assertThat(pic.frameFindings()).containsEntry(FrameRef.ledger(1, 1), PanelState.MISSING);
    assertThat(joints(pic, FreedomKind.LOOSE_END)).contains(new Joint(1, 0));
    assertThat(vm.changes()).contains(
        "horizontal at level 1, bay 1: not recorded (as designed) \u2192 missing",
        "upright of lift 1 on line 0: not recorded (as designed) \u2192 damaged beyond use");
    assertThat(vm.entries().get(1)).contains("(2 frame members)");
    vm.older();
    assertThat(vm.pictureProperty().get().changedMembers()).isEmpty();
    assertThat(vm.pictureProperty().get().frameFindings()).isEmpty();
  }

  @Test
  void historyOfTheFacadeDrawsTheLedgerTakenOutInItsFirstInspection() {
    PlaneRecord facade = plane(3, "north facade");
    HistoryViewModel vm = new HistoryViewModel(services.history(), services.sites(),
        Runnable::run, Runnable::run, facade.id());
    // inspection 3 is the facade's first: nothing to compare with, the finding still drawn
    assertThat(vm.entries()).hasSize(1);
    assertThat(vm.changes())
        .containsExactly("The first inspection of this plane: nothing to compare with.");
    PlanePicture pic = vm.pictureProperty().get();
    assertThat(pic.changedMembers()).isEmpty();
    assertThat(pic.frameFindings()).containsEntry(FrameRef.ledger(1, 1), PanelState.MISSING);
    assertThat(joints(pic, FreedomKind.LOST_RESTRAINT)).contains(new Joint(1, 0));
  }
}
