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
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RepairPlan;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.BowAssessment;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.LengthUnits;
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
