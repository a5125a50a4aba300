package org.bracewalk.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeSet;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneRecord;

/** A plane across inspections, and what changed since the previous one (panels and frame members). */
public final class HistoryService {
  private final SiteService sites;
  private final InspectionService inspections;
  private final AnalysisService analysis;

  public HistoryService(SiteService sites, InspectionService inspections, AnalysisService analysis) {
    this.sites = Objects.requireNonNull(sites);
    this.inspections = Objects.requireNonNull(inspections);
    this.analysis = Objects.requireNonNull(analysis);
  }

  /**
   * The plane in every inspection of its structure that covers it (its scope, fixed when it
   * started, holds the plane), oldest first: a plane added later has no part in earlier
   * inspections, and a retired plane none in those started after its retirement.
   */
  public PlaneHistory history(long planeId) {
    PlaneRecord plane = sites.plane(planeId);
    List<PlaneHistory.Entry> entries = new ArrayList<>();
    Map<PanelRef, PanelFinding> previous = null;
    Map<FrameRef, PanelState> previousFrame = null;
    for (Inspection inspection : inspections.inspections(plane.structureId())) {
      if (!inspections.covers(inspection.id(), planeId)) {
        continue;
      }
      PlaneResult result = analysis.analysePlane(inspection.id(), planeId);
      Map<PanelRef, PanelFinding> findings = inspections.latestFindings(inspection.id(), planeId);
      Map<FrameRef, PanelState> frame = InspectionService.frameFindings(result.latestFrame());
      List<PanelChange> changes = previous == null ? List.of() : changes(previous, findings);
      List<FrameChange> frameChanges =
          previousFrame == null ? List.of() : frameChanges(previousFrame, frame);
      entries.add(
          new PlaneHistory.Entry(
              inspection, result.design(), findings, result.asBuilt(),
              result.analysis().analysedState(), changes, result.verdict(), frame, frameChanges));
      previous = findings;
      previousFrame = frame;
    }
    return new PlaneHistory(plane, entries);
  }

  /** Panels whose finding differs between two inspections, by panel. */
  static List<PanelChange> changes(
      Map<PanelRef, PanelFinding> before, Map<PanelRef, PanelFinding> after) {
    TreeSet<PanelRef> panels = new TreeSet<>(before.keySet());
    panels.addAll(after.keySet());
    List<PanelChange> out = new ArrayList<>();
    for (PanelRef p : panels) {
      PanelFinding b = before.get(p);
      PanelFinding a = after.get(p);
      if (!Objects.equals(a, b)) {
        out.add(new PanelChange(p, b, a));
      }
    }
    return out;
  }

  /** Frame members whose recorded state differs between two inspections, in member order. */
  static List<FrameChange> frameChanges(
      Map<FrameRef, PanelState> before, Map<FrameRef, PanelState> after) {
    TreeSet<FrameRef> members = new TreeSet<>(before.keySet());
    members.addAll(after.keySet());
    List<FrameChange> out = new ArrayList<>();
    for (FrameRef m : members) {
      PanelState b = before.get(m);
      PanelState a = after.get(m);
      if (b != a) {
        out.add(new FrameChange(m, b, a));
      }
    }
    return out;
  }
}
