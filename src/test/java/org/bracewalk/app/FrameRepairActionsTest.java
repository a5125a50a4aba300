package org.bracewalk.app;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Set;
import org.bracewalk.app.sitefile.FileFormatException;
import org.bracewalk.boot.AppContext;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.InspectionReason;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.RepairAction;
import org.bracewalk.core.model.RepairActionKind;
import org.bracewalk.core.model.RepairOrder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Repair actions on frame members through the application: refit, replace or repair a ledger or
 * standard (racking: beam, upright) of a plane the inspection covers, recorded done and then
 * verified by a later finalised inspection; refusals name the member and the plane; the site
 * file carries the actions and reads back the same.
 */
class FrameRepairActionsTest {
  @TempDir Path dir;

  private final AppContext context = AppContext.standard();

  private record Setup(PlaneRecord plane, Inspection found, RepairOrder order) {}

  /** Revision 2 of the 3 x 2 "spine" leaves the beam at level 3, bay 2 out; a finalised finding. */
  private static Setup setUp(AppServices s) {
    Fixtures.Services f = new Fixtures.Services(s.store(), new Fixtures.SteppingClock(),
        s.sites(), s.inspections());
    PlaneRecord plane = Fixtures.plane(f);
    s.sites().addDesignRevision(plane.id(), "D. Fenwick", LocalDate.of(2025, 3, 1),
        "top beam of bay 2 left out for the hoist",
        Fixtures.threeByTwo().withOmittedFrame(Set.of(FrameRef.ledger(3, 2))));
    Inspection found = s.inspections().start(plane.structureId(),
        NewInspection.of("M. Okafor", "inspector", InspectionReason.AFTER_IMPACT));
    s.inspections().recordObservation(found.id(), NewObservation.ofMember(plane.id(),
        FrameRef.ledger(0, 1), org.bracewalk.core.model.PanelState.MISSING, "M. Okafor"));
    s.inspections().finalise(found.id());
    RepairOrder order = s.repairs().raise(found.id(), "M. Okafor", "bottom horizontal hit");
    return new Setup(plane, found, order);
  }

  @Test
  void aFrameMemberActionIsRecordedDoneAndVerified() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(s);
      RepairAction refit = s.repairs().addFrameAction(x.order().id(), x.plane().id(),
          FrameRef.ledger(0, 1), RepairActionKind.REFIT, "  new horizontal, same section  ",
          LocalDate.of(2025, 3, 7), "crew B");
      assertThat(refit.frameMember()).isEqualTo(FrameRef.ledger(0, 1));
      assertThat(refit.panel()).isNull();
      assertThat(refit.brace()).isNull();
      assertThat(refit.description()).isEqualTo("new horizontal, same section");
      RepairAction replace = s.repairs().addFrameAction(x.order().id(), x.plane().id(),
          FrameRef.standard(1, 0), RepairActionKind.REPLACE, "", null, "");
      assertThat(s.repairs().actions(x.order().id())).containsExactly(refit, replace);

      RepairAction done = s.repairs().markDone(refit.id(), " crew B ");
      assertThat(done.isDone()).isTrue();
      assertThat(done.doneBy()).isEqualTo("crew B");
      assertThat(done.frameMember()).isEqualTo(FrameRef.ledger(0, 1));
      assertThatThrownBy(() -> s.repairs().markDone(refit.id(), "crew C"))
          .hasMessageContaining("already done");

      Inspection check = s.inspections().start(x.plane().structureId(),
          NewInspection.of("M. Okafor", "", InspectionReason.AFTER_ALTERATION));
      s.inspections().finalise(check.id());
      RepairAction verified = s.repairs().markVerified(refit.id(), check.id());
      assertThat(verified.verifiedByInspectionId()).isEqualTo(check.id());
      assertThat(verified.frameMember()).isEqualTo(FrameRef.ledger(0, 1));
      assertThatThrownBy(() -> s.repairs().markVerified(replace.id(), check.id()))
          .hasMessageContaining("not done yet");
    }
  }

  @Test
  void aFrameMemberActionIsRefusedWithTheMemberAndPlaneNamed() {
    try (AppServices s = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(s);
      long o = x.order().id();
      long p = x.plane().id();
      // racking words: the plane is of a racking run
      assertThatThrownBy(() -> s.repairs().addFrameAction(o, p, FrameRef.ledger(4, 1),
              RepairActionKind.REFIT, "", null, ""))
          .isInstanceOf(UserInputException.class)
          .hasMessageContaining("beam at level 4, bay 1 lies outside plane 'spine'");
      assertThatThrownBy(() -> s.repairs().addFrameAction(o, p, FrameRef.standard(1, 3),
              RepairActionKind.REPLACE, "", null, ""))
          .hasMessageContaining("upright of lift 1 on line 3 lies outside plane 'spine'");
      assertThatThrownBy(() -> s.repairs().addFrameAction(o, p, FrameRef.standard(1, 0),
              RepairActionKind.BRACE, "", null, ""))
          .hasMessageContaining("upright of lift 1 on line 0 of plane 'spine'")
          .hasMessageContaining("not given the action brace");
      assertThatThrownBy(() -> s.repairs().addFrameAction(o, p, FrameRef.ledger(3, 2),
              RepairActionKind.REFIT, "", null, ""))
          .hasMessageContaining("beam at level 3, bay 2 of plane 'spine' is left out by design"
              + " revision 2");
      assertThatThrownBy(() -> s.repairs().addAction(o, p, PanelRef.of(1, 1),
              RepairActionKind.REFIT, Brace.rigid(Diagonal.RISING), "", null, ""))
          .hasMessageContaining("refit puts back a frame member");
      assertThat(s.repairs().actions(o)).isEmpty();
    }
  }

  @Test
  void theSiteFileCarriesFrameMemberActionsAndReadsBackTheSame() {
    String first;
    try (AppServices a = context.open(dir.resolve("a.db"))) {
      Setup x = setUp(a);
      RepairAction refit = a.repairs().addFrameAction(x.order().id(), x.plane().id(),
          FrameRef.ledger(0, 1), RepairActionKind.REFIT, "new horizontal",
          LocalDate.of(2025, 3, 7), "crew B");
      a.repairs().markDone(refit.id(), "crew B");
      a.repairs().addFrameAction(x.order().id(), x.plane().id(), FrameRef.standard(2, 2),
          RepairActionKind.REPAIR, "", null, "");
      a.repairs().addAction(x.order().id(), x.plane().id(), null,
          RepairActionKind.TAKE_OUT_OF_SERVICE, null, "", null, "");
      first = a.files().exportSite(a.sites().sites().get(0).id());
    }
    assertThat(first)
        .contains("\"frame\": \"ledger\", \"level\": 0, \"bay\": 1, \"action\": \"refit\"")
        .contains("\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"repair\"")
        .contains("\"plane\": \"spine\", \"action\": \"take-out-of-service\"");
    String second;
    try (AppServices b = context.open(dir.resolve("b.db"))) {
      b.files().importSite("first.json", first);
      second = b.files().exportSite(b.sites().sites().get(0).id());
      List<RepairAction> actions = b.repairs().actions(
          b.repairs().orders(1).get(0).id());
      assertThat(actions).extracting(RepairAction::frameMember)
          .containsExactly(FrameRef.ledger(0, 1), FrameRef.standard(2, 2), null);
    }
    assertThat(second).isEqualTo(first);

    record Bad(String from, String to, String field) {}
    List<Bad> cases = List.of(
        new Bad("\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"repair\"",
            "\"frame\": \"standard\", \"lift\": 2, \"line\": 3, \"action\": \"repair\"", "line"),
        new Bad("\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"repair\"",
            "\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"brace\"", "action"),
        new Bad("\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"repair\"",
            "\"frame\": \"standard\", \"lift\": 2, \"line\": 2, \"action\": \"repair\","
                + " \"brace\": \"/\"", "brace"),
        new Bad("\"plane\": \"spine\", \"action\": \"take-out-of-service\"",
            "\"plane\": \"spine\", \"action\": \"refit\"", "action"),
        new Bad("\"plane\": \"spine\", \"action\": \"take-out-of-service\"",
            "\"plane\": \"spine\", \"level\": 1, \"action\": \"take-out-of-service\"", "level"));
    // an import is all or nothing, so one file serves every case
    try (AppServices b = context.open(dir.resolve("c.db"))) {
      for (Bad c : cases) {
        assertThat(first).as(c.from()).contains(c.from());
        String bad = first.replace(c.from(), c.to());
        assertThatThrownBy(() -> b.files().importSite("bad.json", bad))
            .as(c.to())
            .isInstanceOfSatisfying(FileFormatException.class,
                e -> assertThat(e.field()).as(e.getMessage()).isEqualTo(c.field()));
        assertThat(b.sites().sites()).isEmpty();
      }
    }
  }
}
