package org.bracewalk.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.DesignRevision;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.core.model.Site;
import org.bracewalk.core.model.Structure;

/**
 * Analyses every plane of an inspection: as built (latest findings on panels and frame members)
 * against its design.
 */
public final class AnalysisService {
  private final InspectionService inspections;
  private final SiteService sites;
  private final PlaneAnalyzer analyzer;

  public AnalysisService(InspectionService inspections, SiteService sites, PlaneAnalyzer analyzer) {
    this.inspections = Objects.requireNonNull(inspections);
    this.sites = Objects.requireNonNull(sites);
    this.analyzer = Objects.requireNonNull(analyzer);
  }

  /** Every plane the inspection covers ({@link InspectionService#planesOf}), analysed, by id. */
  public InspectionAnalysis analyse(long inspectionId) {
    Inspection inspection = inspections.inspection(inspectionId);
    Structure structure = sites.structure(inspection.structureId());
    Site site = sites.site(structure.siteId());
    List<Observation> rows = inspections.observations(inspectionId);
    List<PlaneResult> results = new ArrayList<>();
    for (PlaneRecord plane : inspections.planesOf(inspectionId)) {
      results.add(analysePlane(inspection, plane, rows));
    }
    return new InspectionAnalysis(site, structure, inspection, results);
  }

  /**
   * Every plane the inspection covers, by id, with how many of its panels have been looked at and
   * its verdict on the records so far (read in one pass over the observations).
   */
  public List<PlaneProgress> progress(long inspectionId) {
    Inspection inspection = inspections.inspection(inspectionId);
    List<Observation> rows = inspections.observations(inspectionId);
    List<PlaneProgress> out = new ArrayList<>();
    for (PlaneRecord plane : inspections.planesOf(inspectionId)) {
      PlaneResult r = analysePlane(inspection, plane, rows);
      int lookedAt = 0;
      int notReachable = 0;
      for (Observation o : r.latest().values()) {
        if (o.state() != org.bracewalk.core.model.PanelState.NOT_INSPECTED) {
          lookedAt++;
        }
        if (o.state() == org.bracewalk.core.model.PanelState.NOT_REACHABLE) {
          notReachable++;
        }
      }
      out.add(new PlaneProgress(plane, lookedAt, notReachable, plane.grid().panelCount(),
          r.verdict().kind()));
    }
    return out;
  }

  /** One plane of an inspection, analysed. */
  public PlaneResult analysePlane(long inspectionId, long planeId) {
    Inspection inspection = inspections.inspection(inspectionId);
    PlaneRecord plane = sites.plane(planeId);
    return analysePlane(inspection, plane, inspections.observations(inspectionId));
  }

  private PlaneResult analysePlane(Inspection inspection, PlaneRecord plane, List<Observation> rows) {
    DesignRevision design = inspections.designInForce(inspection.id(), plane.id());
    Map<PanelRef, Observation> latest = InspectionService.latest(rows, plane.id());
    Map<PanelRef, PanelFinding> findings = new TreeMap<>();
    latest.forEach((p, o) -> findings.put(p, o.finding()));
    Map<FrameRef, Observation> latestFrame = InspectionService.latestFrame(rows, plane.id());
    AsBuiltPlane asBuilt = AsBuiltPlane.fromFindings(design.design(), findings,
        InspectionService.frameFindings(latestFrame));
    return new PlaneResult(plane, design, latest, asBuilt,
        analyzer.analyse(design.design(), asBuilt), latestFrame);
  }
}
