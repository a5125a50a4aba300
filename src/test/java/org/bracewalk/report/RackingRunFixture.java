package org.bracewalk.report;

import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.app.report.RepairSteps;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;
import org.bracewalk.core.port.report.Finding;
import org.bracewalk.core.port.report.LengthUnits;
import org.bracewalk.core.port.report.PlaneSection;
import org.bracewalk.core.port.report.RecordFingerprint;
import org.bracewalk.core.port.report.ReportContent;
import org.bracewalk.core.port.report.ReportParticulars;
import org.bracewalk.core.port.report.RepairStep;
import org.bracewalk.core.port.report.SectionDigest;

/**
 * An invented racking run of 50 upright frames, analysed by the real engine and planned by
 * {@link RepairSteps}: each frame 1.1 m deep (typical, from memory), six bracing panels of 1.0 m
 * with diagonals alternating / and \ (common practice), pinned at the floor. Frame 7 was struck: the
 * diagonal of panel 2 is missing (it loses rigidity from lift 2 up); frame 31 has a bent diagonal
 * that still counts; every other frame was found as designed.
 */
final class RackingRunFixture {
  static final int FRAMES = 50;
  static final String STRUCK = frameName(7);
  static final String BENT = frameName(31);

  private RackingRunFixture() {}

  static String frameName(int k) {
    return "Upright frame " + k;
  }

  static ReportContent report() {
    PlaneAnalyzer engine = PlaneAnalyzer.standard();
    PlaneGrid grid = new PlaneGrid(6, 1, List.of(1.1), List.of(1.0, 1.0, 1.0, 1.0, 1.0, 1.0),
        Support.PINNED_BASE);
    Map<PanelRef, Brace> braces = new HashMap<>();
    for (int lift = 1; lift <= 6; lift++) {
      braces.put(PanelRef.of(lift, 1), Brace.rigid(lift % 2 == 1 ? Diagonal.RISING : Diagonal.FALLING));
    }
    PlaneDesign design = PlaneDesign.of(grid, braces);
    List<PlaneSection> planes = new ArrayList<>();
    List<Finding> findings = new ArrayList<>();
    Instant at = Instant.parse("2025-03-14T08:30:00Z");
    List<SectionDigest> sections = new ArrayList<>(List.of(new SectionDigest("site", "1".repeat(64)),
        new SectionDigest("structure", "2".repeat(64)), new SectionDigest("inspection", "3".repeat(64))));
    for (int k = 1; k <= FRAMES; k++) {
      String name = frameName(k);
      Map<PanelRef, PanelFinding> found = new HashMap<>();
      for (int lift = 1; lift <= 6; lift++) {
        found.put(PanelRef.of(lift, 1), PanelFinding.of(PanelState.SOUND));
      }
      if (name.equals(STRUCK)) {
        found.put(PanelRef.of(2, 1), PanelFinding.of(PanelState.MISSING));
        findings.add(new Finding(name, PanelRef.of(2, 1), PanelState.MISSING, "other", null, null,
            null, "Diagonal torn off by a reach truck.", at, "Ada Brennock", List.of()));
      }
      if (name.equals(BENT)) {
        found.put(PanelRef.of(1, 1), PanelFinding.of(PanelState.DAMAGED_EFFECTIVE));
        findings.add(new Finding(name, PanelRef.of(1, 1), PanelState.DAMAGED_EFFECTIVE, "bent", 4.0,
            1000.0, null, "Slight bow.", at, "Ada Brennock", List.of()));
      }
      AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design, found);
      PlaneAnalysis analysis = engine.analyse(design, asBuilt);
      planes.add(new PlaneSection(name, design, asBuilt, found, analysis, ReportFixtures.REV,
          PlaneRole.UPRIGHT_FRAME, Map.<FrameRef, PanelState>of(), null));
      for (String s : new String[] {"grid", "design", "observations", "photos"}) {
        sections.add(new SectionDigest("plane " + k + " " + s,
            String.format("%064x", (long) k * 7919 + s.length())));
      }
    }
    List<RepairStep> steps = RepairSteps.plan(planes, Map.of(), LocalDate.of(2025, 3, 14));
    ReportParticulars p = ReportFixtures.particulars();
    ReportParticulars racking = new ReportParticulars(p.clientName(), p.clientAddress(),
        "Bay hall 2, aisle C", "Adjustable pallet racking, run C, 50 upright frames",
        p.inspectedAt(), List.of(), p.reporterName(), p.reporterPosition(), p.competentPerson(),
        p.shift(), "Dee Ashworth");
    return new ReportContent(ReportFixtures.header(true, LengthUnits.METRIC, "racking"), racking,
        planes, findings, steps, new RecordFingerprint("bracewalk-records-1", "cd".repeat(32),
            sections));
  }
}
