package org.bracewalk.app.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.RepairUrgency;
import org.junit.jupiter.api.Test;

/**
 * The repair plan with frame members, from hand-made analyses of two planes of
 * shared/design/analysis.md ("Frame members"): example A (3 lifts x 1 bay, pinned, braces /, \, /,
 * the ledger at level 1 missing: one freedom at joint (1, 0)) with its lift-3 diagonal missing as
 * well (a lift with four sides and no diagonal sways: one more freedom, Bolker and Crapo 1979), and
 * example I (4 lifts x 1 bay, / in every lift, both standards of lift 2 gone: two freedoms). The
 * least repairs are the engine's to find; here they are given, and the plan's order, kinds and
 * CSV rows are checked.
 */
class RepairStepsFrameMembersTest {
  private static final LocalDate DAY = LocalDate.of(2025, 3, 14);

  static PlaneSection exampleA() {
    PlaneGrid grid = new PlaneGrid(3, 1, List.of(1.2), List.of(2.0, 2.0, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> b = Map.of(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING),
        PanelRef.of(2, 1), Brace.rigid(Diagonal.FALLING), PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING));
    PlaneDesign design = PlaneDesign.of(grid, b);
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    f.put(PanelRef.of(1, 1), PanelFinding.of(PanelState.SOUND));
    f.put(PanelRef.of(2, 1), PanelFinding.of(PanelState.SOUND));
    f.put(PanelRef.of(3, 1), PanelFinding.of(PanelState.MISSING));
    Map<FrameRef, PanelState> frame = Map.of(FrameRef.ledger(1, 1), PanelState.MISSING,
        FrameRef.ledger(0, 1), PanelState.NOT_INSPECTED);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f, frame);
    StateAnalysis designState = new StateAnalysis(true, 0, false, 0, true, List.of(),
        List.of(new Block(List.of(1, 2, 3), List.of(1), true)));
    List<Freedom> freedoms = List.of(
        new Freedom(FreedomKind.SWAY, 1, List.of(new Joint(3, 0), new Joint(3, 1)), List.of(), List.of()),
        new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(new Joint(1, 0)),
            List.of(FrameRef.standard(1, 0), FrameRef.standard(2, 0)), List.of()));
    StateAnalysis found = new StateAnalysis(false, 2, false, -1, true, List.of(), List.of(),
        List.of(), List.of(new Joint(1, 0), new Joint(3, 0), new Joint(3, 1)), freedoms, false);
    RepairPlan repair = new RepairPlan(true,
        List.of(new RepairBrace(PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING), true)),
        List.of(new RestoreItem(PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING), true)),
        List.of(new RepairMember(FrameRef.ledger(1, 1), true)),
        List.of(new RestoreFrameItem(FrameRef.ledger(0, 1), false),
            new RestoreFrameItem(FrameRef.ledger(1, 1), true)));
    return new PlaneSection("return end", design, asBuilt, f,
        new PlaneAnalysis(grid, designState, Optional.of(new AsBuiltAnalysis(found, 0, false, List.of(), 1)),
            repair),
        new PlaneSection.DesignRef(1, DAY, ""), PlaneRole.OTHER, frame, null);
  }

  static PlaneSection exampleI() {
    PlaneGrid grid = new PlaneGrid(4, 1, List.of(1.1), List.of(1.0, 1.0, 1.0, 1.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> b = new HashMap<>();
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 4; lift++) {
      b.put(PanelRef.of(lift, 1), Brace.rigid(Diagonal.RISING));
      f.put(PanelRef.of(lift, 1), PanelFinding.of(PanelState.SOUND));
    }
    PlaneDesign design = PlaneDesign.of(grid, b);
    Map<FrameRef, PanelState> frame = Map.of(FrameRef.standard(2, 0), PanelState.MISSING,
        FrameRef.standard(2, 1), PanelState.DAMAGED_INEFFECTIVE);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f, frame);
    StateAnalysis designState = new StateAnalysis(true, 0, false, 0, true, List.of(),
        List.of(new Block(List.of(1, 2, 3, 4), List.of(1), true)));
    StateAnalysis found = new StateAnalysis(false, 2, false, -1, true, List.of(), List.of(),
        List.of(), List.of(), List.of(new Freedom(FreedomKind.SWAY, 2, List.of(new Joint(2, 0)),
            List.of(), List.of())), false);
    RepairPlan repair = new RepairPlan(true, List.of(), List.of(),
        List.of(new RepairMember(FrameRef.standard(2, 0), true),
            new RepairMember(FrameRef.standard(2, 1), true)),
        List.of(new RestoreFrameItem(FrameRef.standard(2, 0), true),
            new RestoreFrameItem(FrameRef.standard(2, 1), true)));
    return new PlaneSection("upright frame", design, asBuilt, f,
        new PlaneAnalysis(grid, designState, Optional.of(new AsBuiltAnalysis(found, 0, false, List.of())),
            repair),
        new PlaneSection.DesignRef(1, DAY, ""), PlaneRole.UPRIGHT_FRAME, frame, null);
  }

  @Test
  void frameMembersAreRefittedReplacedOrInspectedBeforeTheDiagonalsOfTheirPlane() {
    List<RepairStep> steps = RepairSteps.plan(List.of(exampleA(), exampleI()), Map.of(), DAY);
    assertThat(steps).extracting(RepairStep::number).containsExactly(1, 2, 3, 4, 5, 6, 7, 8);
    // isolate both planes first: no block is held where the frame is incomplete, so every lift
    assertThat(steps.get(0).type()).isEqualTo(RepairStepKind.TAKE_OUT_OF_SERVICE);
    assertThat(steps.get(0).lifts()).containsExactly(1, 2, 3);
    assertThat(steps.get(1).type()).isEqualTo(RepairStepKind.TAKE_OUT_OF_SERVICE);
    assertThat(steps.get(1).plane()).isEqualTo("upright frame");
    // a racking upright frame that lost rigidity: the beam bays on both sides of it are
    // off-loaded with it (common practice in racking inspection), over the same lifts
    assertThat(steps.get(2).type()).isEqualTo(RepairStepKind.OFFLOAD_BESIDE);
    assertThat(steps.get(2).plane()).isEqualTo("upright frame");
    assertThat(steps.get(2).lifts()).isEqualTo(steps.get(1).lifts());
    assertThat(steps.get(2).priority()).isEqualTo(RepairUrgency.ISOLATE);
    // the scaffold's return end is not racking: nothing beside it to off-load
    assertThat(steps).filteredOn(s -> s.plane().equals("return end"))
        .noneMatch(s -> s.type() == RepairStepKind.OFFLOAD_BESIDE);
    // then, per plane, the frame before the diagonals fixed to it
    RepairStep ledger = steps.get(3);
    assertThat(ledger.frameMember()).isEqualTo(FrameRef.ledger(1, 1));
    assertThat(ledger.panel()).isNull();
    assertThat(ledger.type()).isEqualTo(RepairStepKind.REFIT);
    assertThat(ledger.priority()).isEqualTo(RepairUrgency.NEEDED_FOR_RIGIDITY);
    assertThat(ledger.dueDate()).isEqualTo(DAY);
    assertThat(ledger.lifts()).containsExactly(1, 2);
    RepairStep diagonal = steps.get(4);
    assertThat(diagonal.panel()).isEqualTo(PanelRef.of(3, 1));
    assertThat(diagonal.type()).isEqualTo(RepairStepKind.REPLACE);
    // the upright frame: missing -> refit, beyond use -> replace
    assertThat(steps.get(5).frameMember()).isEqualTo(FrameRef.standard(2, 0));
    assertThat(steps.get(5).type()).isEqualTo(RepairStepKind.REFIT);
    assertThat(steps.get(6).frameMember()).isEqualTo(FrameRef.standard(2, 1));
    assertThat(steps.get(6).type()).isEqualTo(RepairStepKind.REPLACE);
    // last, what restores the design only: the base ledger nobody could see is inspected
    RepairStep base = steps.get(7);
    assertThat(base.frameMember()).isEqualTo(FrameRef.ledger(0, 1));
    assertThat(base.type()).isEqualTo(RepairStepKind.INSPECT);
    assertThat(base.priority()).isEqualTo(RepairUrgency.RESTORES_REDUNDANCY);
    assertThat(base.dueDate()).isNull();
    // each member is in the plan once, though the least set and the restore list both name it
    assertThat(steps.stream().filter(s -> FrameRef.ledger(1, 1).equals(s.frameMember()))).hasSize(1);
  }

  @Test
  void theCsvNamesFrameMembersByLevelAndBayOrLiftAndLine() {
    List<RepairStep> steps = RepairSteps.plan(List.of(exampleA(), exampleI()), Map.of(), DAY);
    String[] lines = RepairOrderCsv.write(steps).split("\r\n");
    assertThat(lines[0]).isEqualTo("number,plane,lift,bay,lifts,action,member,kind,urgency,due,"
        + "deviation,done_by,done_date,level,line");
    for (String line : lines) {
      assertThat(line.split(",", -1)).hasSize(RepairOrderCsv.COLUMNS.size());
    }
    assertThat(lines[3]).isEqualTo("3,upright frame,2,1,2 3 4,offload-beside,,,isolate,2025-03-14,false,,,,");
    assertThat(lines[4]).isEqualTo("4,return end,,1,1 2,refit,ledger,,rigidity,2025-03-14,false,,,1,");
    assertThat(lines[5]).isEqualTo("5,return end,3,1,3,replace,/,rigid,rigidity,2025-03-14,false,,,,");
    assertThat(lines[6]).isEqualTo("6,upright frame,2,,2,refit,standard,,rigidity,2025-03-14,false,,,,0");
    assertThat(lines[7]).isEqualTo("7,upright frame,2,,2,replace,standard,,rigidity,2025-03-14,false,,,,1");
    assertThat(lines[8]).isEqualTo("8,return end,,1,1,inspect,ledger,,redundancy,,false,,,0,");
  }

  @Test
  void aStepIsOnAPanelOrOnAFrameMemberNeverBoth() {
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> new RepairStep(1, "p", PanelRef.of(1, 1),
        List.of(1), RepairStepKind.REFIT, null, RepairUrgency.NEEDED_FOR_RIGIDITY, false, DAY,
        FrameRef.ledger(1, 1))).isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("not both");
    org.assertj.core.api.Assertions.assertThatThrownBy(() -> new RepairStep(1, "p", null,
        List.of(1), RepairStepKind.BRACE, null, RepairUrgency.NEEDED_FOR_RIGIDITY, false, DAY,
        FrameRef.ledger(1, 1))).isInstanceOf(IllegalArgumentException.class)
        .hasMessageContaining("ledger at level 1, bay 1");
  }
}
