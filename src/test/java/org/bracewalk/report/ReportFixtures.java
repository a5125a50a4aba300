package org.bracewalk.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import javax.imageio.ImageIO;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.JointMotion;
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
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.MotionSketch;
import org.bracewalk.core.port.report.FindingPhoto;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.RackDamageLevel;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.RecordedOrder;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.RepairStepKind;
import org.bracewalk.core.port.report.RepairOrderContent;
import org.bracewalk.core.port.report.RepairUrgency;
import org.bracewalk.core.port.report.ReportHeader;
import org.bracewalk.core.port.report.ReportParticulars;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * Hand-built report content, independent of the engine and the store: an invented site with a
 * facade that lost lift 3 after an impact, a transverse frame that holds, and a free plan-bracing
 * level with one bay loose. The analyses are worked out by hand from the brace-graph rules of
 * shared/design/analysis.md (pinned base: rigid iff every lift keeps a diagonal).
 */
final class ReportFixtures {
  static final String FACADE = "North elevation";
  static final String FRAME = "Transverse frame T1";
  static final String PLAN = "Plan bracing L3";
  static final Instant INSPECTED = Instant.parse("2025-03-14T07:40:00Z");
  static final PlaneSection.DesignRef REV =
      new PlaneSection.DesignRef(3, LocalDate.of(2025, 2, 20), "R. Okafor");

  private ReportFixtures() {}

  static ReportParticulars particulars() {
    return new ReportParticulars(
        "Hollin Vale Housing Partnership",
        "14 Quarry Lane, Hollin Vale, HV3 9QT",
        "Marten Court, north facade",
        "Tube-and-fitting facade scaffold, 10 bays by 5 lifts, with transverse frames",
        INSPECTED,
        List.of(new RecordedOrder(4, Instant.parse("2025-03-14T08:10:00Z"), "Ada Brennock",
            "Lift 3 closed and signed off; site manager told at 08:10.",
            List.of(new RecordedOrder.Action(RepairStepKind.TAKE_OUT_OF_SERVICE, FACADE, null, null,
                "barrier lift 3 and tag the ladder access", LocalDate.of(2025, 3, 14),
                Instant.parse("2025-03-14T08:30:00Z"), "Col Marsh")))),
        "Ada Brennock",
        "Scaffold inspector (competent person)",
        "Ada Brennock",
        "Early shift, 07:00-15:00",
        "");
  }

  static ReportHeader header(boolean finalised, LengthUnits units, String kind) {
    return new ReportHeader(
        "17", "Marten Court", "Facade scaffold A", kind, "after-impact", "Drawing MC-SC-004 rev C",
        finalised, ZoneId.of("Europe/London"), units, Instant.parse("2025-03-14T09:05:00Z"));
  }

  static RecordFingerprint fingerprint() {
    List<SectionDigest> sections =
        List.of(
            new SectionDigest("site", "1".repeat(64)),
            new SectionDigest("inspection", "2".repeat(64)),
            new SectionDigest("plane 1 design", "3".repeat(64)),
            new SectionDigest("plane 1 observations", "4".repeat(64)));
    return new RecordFingerprint("bracewalk-records-1", "ab".repeat(32), sections);
  }

  // ---- the facade: 5 lifts x 10 bays, pinned base ------------------------------------------

  static PlaneDesign facadeDesign() {
    List<Double> widths = new ArrayList<>();
    for (int j = 1; j <= 10; j++) {
      widths.add(j == 10 ? 1.8 : 2.4);
    }
    PlaneGrid grid = new PlaneGrid(5, 10, widths, List.of(2.0, 2.0, 2.0, 2.0, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> b = new HashMap<>();
    for (int lift = 1; lift <= 4; lift++) {
      b.put(PanelRef.of(lift, 1), Brace.rigid(lift % 2 == 1 ? Diagonal.RISING : Diagonal.FALLING));
      b.put(PanelRef.of(lift, 6), Brace.rigid(lift % 2 == 1 ? Diagonal.FALLING : Diagonal.RISING));
    }
    b.put(PanelRef.of(5, 3), Brace.rigid(Diagonal.RISING));
    return new PlaneDesign(grid, b, Set.of(PanelRef.of(1, 4)));
  }

  static Map<PanelRef, PanelFinding> facadeFindings() {
    PlaneDesign d = facadeDesign();
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 5; lift++) {
      for (int bay = 1; bay <= 10; bay++) {
        PanelRef p = PanelRef.of(lift, bay);
        if (!d.isOpening(p)) {
          f.put(p, PanelFinding.of(PanelState.SOUND));
        }
      }
    }
    f.put(PanelRef.of(1, 4), PanelFinding.of(PanelState.SOUND));
    f.put(PanelRef.of(3, 1), PanelFinding.of(PanelState.MISSING));
    f.put(PanelRef.of(3, 6), PanelFinding.of(PanelState.DAMAGED_INEFFECTIVE));
    f.put(PanelRef.of(2, 6), PanelFinding.of(PanelState.DAMAGED_EFFECTIVE));
    f.put(PanelRef.of(4, 9), new PanelFinding(PanelState.EXTRA, Brace.rigid(Diagonal.RISING)));
    f.remove(PanelRef.of(5, 10));
    return f;
  }

  static PlaneSection facade() {
    PlaneDesign design = facadeDesign();
    Map<PanelRef, PanelFinding> findings = facadeFindings();
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, findings);
    List<Integer> allBays = List.of(1, 2, 3, 4, 5, 6, 7, 8, 9, 10);
    StateAnalysis designState =
        new StateAnalysis(true, 0, false, 0, true, List.of(PanelRef.of(5, 3)),
            List.of(new Block(List.of(1, 2, 3, 4, 5), allBays, true)));
    StateAnalysis asFound =
        new StateAnalysis(false, 1, false, -1, true, List.of(PanelRef.of(5, 3)),
            List.of(new Block(List.of(1, 2, 4, 5), allBays, true), new Block(List.of(3), List.of(), false)));
    AsBuiltAnalysis ab =
        new AsBuiltAnalysis(asFound, 1, false,
            List.of(new org.bracewalk.core.analysis.PlacedBrace(PanelRef.of(4, 9), Brace.rigid(Diagonal.RISING))));
    RepairPlan repair =
        new RepairPlan(true,
            List.of(new RepairBrace(PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING), true)),
            List.of(
                new RestoreItem(PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING), true),
                new RestoreItem(PanelRef.of(3, 6), Brace.rigid(Diagonal.FALLING), false)));
    return new PlaneSection(FACADE, design, asBuilt, findings,
        new PlaneAnalysis(design.grid(), designState, Optional.of(ab), repair), REV);
  }

  // ---- a transverse frame: 5 lifts x 1 bay, holds ---------------------------------------------

  static PlaneSection frame() {
    PlaneGrid grid = new PlaneGrid(5, 1, List.of(1.09), List.of(2.0, 2.0, 2.0, 2.0, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> b = new HashMap<>();
    for (int lift = 1; lift <= 5; lift++) {
      b.put(PanelRef.of(lift, 1), Brace.rigid(Diagonal.BOTH));
    }
    PlaneDesign design = PlaneDesign.of(grid, b);
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 5; lift++) {
      f.put(PanelRef.of(lift, 1), PanelFinding.of(PanelState.SOUND));
    }
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f);
    StateAnalysis s = new StateAnalysis(true, 0, false, 1, true, List.of(),
        List.of(new Block(List.of(1, 2, 3, 4, 5), List.of(1), true)));
    return new PlaneSection(FRAME, design, asBuilt, f,
        new PlaneAnalysis(grid, s, Optional.of(new AsBuiltAnalysis(s, 0, true, List.of())),
            new RepairPlan(true, List.of(), List.of())), REV);
  }

  // ---- a free plan-bracing level: 2 x 3, bay 3 loose -----------------------------------------

  static PlaneSection plan() {
    PlaneGrid grid = new PlaneGrid(2, 3, List.of(2.4, 2.4, 2.4), List.of(1.09, 1.09), Support.FREE);
    Map<PanelRef, Brace> b = new HashMap<>();
    b.put(PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING));
    b.put(PanelRef.of(1, 2), Brace.rigid(Diagonal.FALLING));
    b.put(PanelRef.of(1, 3), Brace.rigid(Diagonal.RISING));
    b.put(PanelRef.of(2, 1), Brace.rigid(Diagonal.RISING));
    PlaneDesign design = PlaneDesign.of(grid, b);
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 2; lift++) {
      for (int bay = 1; bay <= 3; bay++) {
        f.put(PanelRef.of(lift, bay), PanelFinding.of(PanelState.SOUND));
      }
    }
    f.put(PanelRef.of(1, 3), PanelFinding.of(PanelState.MISSING));
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f);
    StateAnalysis designState = new StateAnalysis(true, 0, false, 0, true,
        List.of(PanelRef.of(1, 1), PanelRef.of(1, 2), PanelRef.of(1, 3), PanelRef.of(2, 1)),
        List.of(new Block(List.of(1, 2), List.of(1, 2, 3), false)));
    StateAnalysis asFound = new StateAnalysis(false, 1, false, -1, true,
        List.of(PanelRef.of(1, 1), PanelRef.of(1, 2), PanelRef.of(2, 1)),
        List.of(new Block(List.of(1, 2), List.of(1, 2), false), new Block(List.of(), List.of(3), false)));
    RepairPlan repair = new RepairPlan(true,
        List.of(new RepairBrace(PanelRef.of(1, 3), Brace.rigid(Diagonal.RISING), true)),
        List.of(new RestoreItem(PanelRef.of(1, 3), Brace.rigid(Diagonal.RISING), true)));
    return new PlaneSection(PLAN, design, asBuilt, f,
        new PlaneAnalysis(grid, designState, Optional.of(new AsBuiltAnalysis(asFound, 0, false, List.of())),
            repair), REV);
  }

  static List<Finding> findings() {
    Instant at = Instant.parse("2025-03-14T07:52:00Z");
    return List.of(
        new Finding(FACADE, PanelRef.of(2, 6), PanelState.DAMAGED_EFFECTIVE, "bent", 6.5, 1000.0, null,
            "Slight bow near the lower coupler.", at, "Ada Brennock", List.of(photoOf(Color.ORANGE))),
        new Finding(FACADE, PanelRef.of(3, 1), PanelState.MISSING, "other", null, null, null,
            "Brace and both couplers gone; marks of impact on the standard.", at, "Ada Brennock",
            List.of(photoOf(Color.RED), photoOf(Color.BLUE))),
        new Finding(FACADE, PanelRef.of(3, 6), PanelState.DAMAGED_INEFFECTIVE, "bent", 24.0, 1000.0,
            new BowAssessment(24.0, 1000, 10.0, RackDamageLevel.OFFLOAD_AND_ISOLATE, LocalDate.of(2025, 3, 14)),
            "Kinked at mid-length.", at, "Ada Brennock", List.of()),
        new Finding(FACADE, PanelRef.of(4, 9), PanelState.EXTRA, "", null, null, null,
            "Brace added by the crew, not on the drawing.", at, "Ada Brennock", List.of()),
        new Finding(PLAN, PanelRef.of(1, 3), PanelState.MISSING, "", null, null, null, "", at,
            "Ada Brennock", List.of()));
  }

  static List<RepairStep> actions() {
    LocalDate day = LocalDate.of(2025, 3, 14);
    return List.of(
        new RepairStep(1, FACADE, PanelRef.of(3, 1), List.of(3), RepairStepKind.TAKE_OUT_OF_SERVICE,
            null, RepairUrgency.ISOLATE, false, day),
        new RepairStep(2, FACADE, PanelRef.of(3, 1), List.of(3), RepairStepKind.REPLACE,
            Brace.rigid(Diagonal.RISING), RepairUrgency.NEEDED_FOR_RIGIDITY, false, day),
        new RepairStep(3, PLAN, PanelRef.of(1, 3), List.of(1), RepairStepKind.REPLACE,
            Brace.rigid(Diagonal.RISING), RepairUrgency.NEEDED_FOR_RIGIDITY, false, day),
        new RepairStep(4, FACADE, PanelRef.of(3, 6), List.of(3), RepairStepKind.REPLACE,
            Brace.rigid(Diagonal.FALLING), RepairUrgency.RESTORES_REDUNDANCY, false, null),
        new RepairStep(5, FACADE, PanelRef.of(5, 10), List.of(5), RepairStepKind.INSPECT,
            null, RepairUrgency.RESTORES_REDUNDANCY, false, null));
  }

  static ReportContent report(boolean finalised) {
    return report(finalised, LengthUnits.METRIC);
  }

  static ReportContent report(boolean finalised, LengthUnits units) {
    return new ReportContent(header(finalised, units, "scaffold"), particulars(),
        List.of(facade(), frame(), plan()), findings(), actions(), fingerprint());
  }

  static RepairOrderContent order() {
    return new RepairOrderContent(header(true, LengthUnits.METRIC, "scaffold"), INSPECTED, List.of(facade(), plan()),
        actions(), fingerprint());
  }

  // ---- frame members: the examples of shared/design/analysis.md, "Frame members" -------------
  //
  // The freedoms, moving joints and repairs below are those of the table in analysis.md (computed
  // there from the rigidity matrix with exact rank). The critical members follow by counting: a
  // state whose bars are as many as its rank (2 unknowns per joint off the base, less its
  // freedoms) has independent rows, so losing any bar lowers the rank. The joint motions are exact
  // first-order motions worked by hand (noted at each).

  static final String RETURN = "Return end R1";
  static final String UPRIGHT = "Upright frame F4";

  /**
   * Example A: 3 lifts x 1 bay, pinned, braces /, \, / (lift 1 first), the ledger at level 1
   * missing: one freedom, joint (1, 0) only, where the standards of lifts 1 and 2 meet in a straight
   * line. The design leaves out the base ledger (both its ends are held, so rigidity does not
   * depend on it); the standard of lift 3 on line 1 is damaged but still counts.
   */
  static PlaneSection returnEnd() {
    PlaneGrid grid = new PlaneGrid(3, 1, List.of(1.2), List.of(2.0, 2.0, 2.0), Support.PINNED_BASE);
    Map<PanelRef, Brace> b = Map.of(
        PanelRef.of(1, 1), Brace.rigid(Diagonal.RISING),
        PanelRef.of(2, 1), Brace.rigid(Diagonal.FALLING),
        PanelRef.of(3, 1), Brace.rigid(Diagonal.RISING));
    PlaneDesign design = new PlaneDesign(grid, b, Set.of(), Set.of(FrameRef.ledger(0, 1)));
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 3; lift++) {
      f.put(PanelRef.of(lift, 1), PanelFinding.of(PanelState.SOUND));
    }
    Map<FrameRef, PanelState> frame = Map.of(
        FrameRef.ledger(1, 1), PanelState.MISSING,
        FrameRef.standard(3, 1), PanelState.DAMAGED_EFFECTIVE);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f, frame);
    List<PanelRef> allPanels = List.of(PanelRef.of(1, 1), PanelRef.of(2, 1), PanelRef.of(3, 1));
    List<FrameRef> standards = List.of(FrameRef.standard(1, 0), FrameRef.standard(1, 1),
        FrameRef.standard(2, 0), FrameRef.standard(2, 1), FrameRef.standard(3, 0),
        FrameRef.standard(3, 1));
    // design: 6 joints off the base (12 unknowns), 12 bars (6 standards, ledgers 1-3, 3 braces)
    List<FrameRef> designCritical = new ArrayList<>(List.of(FrameRef.ledger(1, 1),
        FrameRef.ledger(2, 1), FrameRef.ledger(3, 1)));
    designCritical.addAll(standards);
    StateAnalysis designState = new StateAnalysis(true, 0, false, 0, true, allPanels,
        List.of(new Block(List.of(1, 2, 3), List.of(1), true)), designCritical, List.of(),
        List.of(), false);
    // as found: 11 bars, rank 11 (one freedom)
    List<FrameRef> foundCritical = new ArrayList<>(List.of(FrameRef.ledger(2, 1),
        FrameRef.ledger(3, 1)));
    foundCritical.addAll(standards);
    Freedom restraint = new Freedom(FreedomKind.LOST_RESTRAINT, 1, List.of(new Joint(1, 0)),
        List.of(FrameRef.standard(1, 0), FrameRef.standard(2, 0)), List.of());
    StateAnalysis asFound = new StateAnalysis(false, 1, false, -1, true, allPanels, List.of(),
        foundCritical, List.of(new Joint(1, 0)), List.of(restraint), false);
    RepairPlan repair = new RepairPlan(true, List.of(), List.of(),
        List.of(new RepairMember(FrameRef.ledger(1, 1), true)),
        List.of(new RestoreFrameItem(FrameRef.ledger(1, 1), true)));
    // joint (1, 0) moves across the straight line of the standards, everything else is held
    double[] dx = new double[8];
    double[] dy = new double[8];
    dx[2] = -1; // index level * (bays + 1) + line = 1 * 2 + 0
    MotionSketch sketch = new MotionSketch(restraint, new JointMotion(3, 1, dx, dy));
    return new PlaneSection(RETURN, design, asBuilt, f,
        new PlaneAnalysis(grid, designState, Optional.of(new AsBuiltAnalysis(asFound, 0, false,
            List.of(), 0)), repair), REV, PlaneRole.TRANSVERSE_FRAME, frame, sketch);
  }

  /**
   * Example I: 4 lifts x 1 bay, pinned, / in every lift, both standards (uprights) of lift 2 gone:
   * two freedoms, every joint from level 2 up. As a racking upright frame: the upright of lift 2 on
   * line 0 missing, the one on line 1 damaged beyond use; the base horizontal not inspected (both
   * its ends are held, so it changes nothing).
   */
  static PlaneSection uprightFrame() {
    PlaneGrid grid = new PlaneGrid(4, 1, List.of(1.1), List.of(1.0, 1.0, 1.0, 1.0),
        Support.PINNED_BASE);
    Map<PanelRef, Brace> b = new HashMap<>();
    Map<PanelRef, PanelFinding> f = new HashMap<>();
    for (int lift = 1; lift <= 4; lift++) {
      b.put(PanelRef.of(lift, 1), Brace.rigid(Diagonal.RISING));
      f.put(PanelRef.of(lift, 1), PanelFinding.of(PanelState.SOUND));
    }
    PlaneDesign design = PlaneDesign.of(grid, b);
    Map<FrameRef, PanelState> frame = Map.of(
        FrameRef.standard(2, 0), PanelState.MISSING,
        FrameRef.standard(2, 1), PanelState.DAMAGED_INEFFECTIVE,
        FrameRef.ledger(0, 1), PanelState.NOT_INSPECTED);
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, f, frame);
    List<PanelRef> allPanels = List.of(PanelRef.of(1, 1), PanelRef.of(2, 1), PanelRef.of(3, 1),
        PanelRef.of(4, 1));
    StateAnalysis designState = new StateAnalysis(true, 0, false, 0, true, allPanels,
        List.of(new Block(List.of(1, 2, 3, 4), List.of(1), true)));
    List<Joint> moving = new ArrayList<>();
    for (int level = 2; level <= 4; level++) {
      moving.add(new Joint(level, 0));
      moving.add(new Joint(level, 1));
    }
    Freedom sway = new Freedom(FreedomKind.SWAY, 2, moving, List.of(), List.of());
    StateAnalysis asFound = new StateAnalysis(false, 2, false, -1, true, List.of(), List.of(),
        List.of(), moving, List.of(sway), false);
    RepairPlan repair = new RepairPlan(true, List.of(), List.of(),
        List.of(new RepairMember(FrameRef.standard(2, 0), true),
            new RepairMember(FrameRef.standard(2, 1), true)),
        List.of(new RestoreFrameItem(FrameRef.ledger(0, 1), false),
            new RestoreFrameItem(FrameRef.standard(2, 0), true),
            new RestoreFrameItem(FrameRef.standard(2, 1), true)));
    // levels 2-4 are one braced body held only by the diagonal of lift 2, from joint (1, 0) to
    // (2, 1): turning that body about (1, 0), at (0 m, 1 m), keeps the diagonal's length to first
    // order: v = (-(y - 1), x) for each joint of levels 2-4
    double[] dx = new double[10];
    double[] dy = new double[10];
    for (int level = 2; level <= 4; level++) {
      for (int line = 0; line <= 1; line++) {
        double x = line * 1.1;
        double y = level * 1.0;
        dx[level * 2 + line] = -(y - 1);
        dy[level * 2 + line] = x;
      }
    }
    double largest = Math.hypot(3, 1.1);
    for (int k = 0; k < 10; k++) {
      dx[k] /= largest;
      dy[k] /= largest;
    }
    MotionSketch sketch = new MotionSketch(sway, new JointMotion(4, 1, dx, dy));
    return new PlaneSection(UPRIGHT, design, asBuilt, f,
        new PlaneAnalysis(grid, designState, Optional.of(new AsBuiltAnalysis(asFound, 0, false,
            List.of(), 1)), repair), REV, PlaneRole.UPRIGHT_FRAME, frame, sketch);
  }

  static List<Finding> frameFindings() {
    Instant at = Instant.parse("2025-03-14T08:02:00Z");
    return List.of(
        new Finding(RETURN, null, PanelState.MISSING, "", null, null, null,
            "Ledger taken out for access to the hoist.", at, "Ada Brennock", List.of(),
            FrameRef.ledger(1, 1)),
        new Finding(RETURN, null, PanelState.DAMAGED_EFFECTIVE, "bent", null, null, null,
            "Slight kink below the top coupler.", at, "Ada Brennock", List.of(),
            FrameRef.standard(3, 1)));
  }

  static List<Finding> rackingFindings() {
    Instant at = Instant.parse("2025-03-14T08:12:00Z");
    return List.of(
        new Finding(UPRIGHT, null, PanelState.MISSING, "other", null, null, null,
            "Upright section torn off by the truck.", at, "Ada Brennock", List.of(),
            FrameRef.standard(2, 0)),
        new Finding(UPRIGHT, null, PanelState.DAMAGED_INEFFECTIVE, "bent", null, null, null,
            "Buckled at the beam connector.", at, "Ada Brennock", List.of(),
            FrameRef.standard(2, 1)),
        new Finding(UPRIGHT, null, PanelState.NOT_INSPECTED, "", null, null, null,
            "Behind stacked pallets.", at, "Ada Brennock", List.of(), FrameRef.ledger(0, 1)));
  }

  /** The repair plan of the two frame planes as RepairSteps draws it up (checked there). */
  static List<RepairStep> frameActions() {
    LocalDate day = LocalDate.of(2025, 3, 14);
    return List.of(
        new RepairStep(1, RETURN, PanelRef.of(1, 1), List.of(1, 2, 3),
            RepairStepKind.TAKE_OUT_OF_SERVICE, null, RepairUrgency.ISOLATE, false, day),
        new RepairStep(2, RETURN, null, List.of(1, 2), RepairStepKind.REFIT, null,
            RepairUrgency.NEEDED_FOR_RIGIDITY, false, day, FrameRef.ledger(1, 1)));
  }

  static List<RepairStep> rackingActions() {
    LocalDate day = LocalDate.of(2025, 3, 14);
    return List.of(
        new RepairStep(1, UPRIGHT, PanelRef.of(1, 1), List.of(1, 2, 3, 4),
            RepairStepKind.TAKE_OUT_OF_SERVICE, null, RepairUrgency.ISOLATE, false, day),
        new RepairStep(2, UPRIGHT, PanelRef.of(1, 1), List.of(1, 2, 3, 4),
            RepairStepKind.OFFLOAD_BESIDE, null, RepairUrgency.ISOLATE, false, day),
        new RepairStep(3, UPRIGHT, null, List.of(2), RepairStepKind.REFIT, null,
            RepairUrgency.NEEDED_FOR_RIGIDITY, false, day, FrameRef.standard(2, 0)),
        new RepairStep(4, UPRIGHT, null, List.of(2), RepairStepKind.REPLACE, null,
            RepairUrgency.NEEDED_FOR_RIGIDITY, false, day, FrameRef.standard(2, 1)),
        new RepairStep(5, UPRIGHT, null, List.of(1), RepairStepKind.INSPECT, null,
            RepairUrgency.RESTORES_REDUNDANCY, false, null, FrameRef.ledger(0, 1)));
  }

  /** A scaffold report with the facade and the return end whose ledger was taken out. */
  static ReportContent frameReport() {
    return new ReportContent(header(true, LengthUnits.METRIC, "scaffold"), particulars(),
        List.of(frame(), returnEnd()), frameFindings(), frameActions(), fingerprint());
  }

  /** A racking report with the struck upright frame. */
  static ReportContent rackingReport() {
    ReportParticulars p = particulars();
    ReportParticulars racking = new ReportParticulars(p.clientName(), p.clientAddress(),
        p.equipmentLocation(), "Adjustable pallet racking, run 3", p.inspectedAt(),
        p.actionsTaken(), p.reporterName(), p.reporterPosition(), p.competentPerson(), p.shift(),
        "Dee Ashworth");
    return new ReportContent(header(true, LengthUnits.METRIC, "racking"), racking,
        List.of(uprightFrame()), rackingFindings(), rackingActions(), fingerprint());
  }

  static RepairOrderContent frameOrder() {
    List<RepairStep> all = new ArrayList<>(frameActions());
    for (RepairStep a : rackingActions()) {
      all.add(new RepairStep(all.size() + 1, a.plane(), a.panel(), a.lifts(), a.type(), a.member(),
          a.priority(), a.deviation(), a.dueDate(), a.frameMember()));
    }
    return new RepairOrderContent(header(true, LengthUnits.METRIC, "racking"), INSPECTED,
        List.of(returnEnd(), uprightFrame()), all, fingerprint());
  }

  static byte[] photo(Color c) {
    BufferedImage img = new BufferedImage(64, 48, BufferedImage.TYPE_INT_RGB);
    Graphics2D g = img.createGraphics();
    g.setColor(Color.WHITE);
    g.fillRect(0, 0, 64, 48);
    g.setColor(c);
    g.fillOval(8, 6, 48, 36);
    g.dispose();
    ByteArrayOutputStream out = new ByteArrayOutputStream();
    try {
      ImageIO.write(img, "png", out);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
    return out.toByteArray();
  }

  static FindingPhoto photoOf(Color c) {
    return new FindingPhoto(photo(c), "");
  }
}
