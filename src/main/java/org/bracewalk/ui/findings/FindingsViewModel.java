package org.bracewalk.ui.findings;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Executor;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.bracewalk.app.AnalysisService;
import org.bracewalk.app.InspectionService;
import org.bracewalk.app.SiteService;
import org.bracewalk.app.PlaneResult;
import java.util.TreeMap;
import java.util.TreeSet;
import org.bracewalk.app.verdict.Terms;
import org.bracewalk.app.verdict.Wording;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.BuiltFrame;
import org.bracewalk.core.analysis.RepairMember;
import org.bracewalk.core.analysis.RestoreFrameItem;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.analysis.PlacedBrace;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.PlaneAnalyzer;
import org.bracewalk.core.analysis.RepairBrace;
import org.bracewalk.core.analysis.RestoreItem;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Inspection;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneRecord;
import org.bracewalk.ui.common.DialogService;
import org.bracewalk.ui.common.PlanePicture;
import org.bracewalk.app.verdict.VerdictKind;
import org.bracewalk.ui.common.VerdictWords;

/**
 * One plane of an inspection after the walk-round: what was found, the least set of braces that
 * makes it rigid again, the restore-to-design list, and the inspection's documents and
 * finalising. Nothing of the database or files is touched on the UI thread: the findings are read
 * ({@link #load()}), the gaps before finalising counted, the inspection finalised and documents
 * made on the background executor; results come back on the UI one.
 */
public final class FindingsViewModel {
  private final SiteService sites;
  private final InspectionService inspections;
  private final AnalysisService analysis;
  private final PlaneAnalyzer analyzer;
  private final ReportIssuer issuer;
  private final DialogService dialogs;
  private final Executor ui;
  private final Executor background;
  private final long inspectionId;
  private final long planeId;

  private final ReadOnlyObjectWrapper<PlanePicture> picture = new ReadOnlyObjectWrapper<>(this, "picture");
  private final ReadOnlyObjectWrapper<VerdictWords> verdict = new ReadOnlyObjectWrapper<>(this, "verdict");
  private final ObservableList<String> repairLines = FXCollections.observableArrayList();
  private final ObservableList<String> restoreLines = FXCollections.observableArrayList();
  private final ObservableList<String> findingLines = FXCollections.observableArrayList();
  private final ObservableList<PlaneChoice> planes = FXCollections.observableArrayList();
  private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");
  private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "");
  private final ReadOnlyStringWrapper error = new ReadOnlyStringWrapper(this, "error", "");
  private final ReadOnlyStringWrapper progressWords = new ReadOnlyStringWrapper(this, "progressWords", "");
  private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
  private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(this, "busy");
  private final ReadOnlyBooleanWrapper finalised = new ReadOnlyBooleanWrapper(this, "finalised");
  private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "");
  private final ReadOnlyBooleanWrapper loading = new ReadOnlyBooleanWrapper(this, "loading");
  /** True from the finalise key until the inspection is finalised or the question declined. */
  private boolean finalising;

  /** A plane of the inspection, with its progress ("15 of 50 panels") and verdict, for switching between them. */
  public record PlaneChoice(long planeId, String name, VerdictKind verdict, String progress) {
    @Override
    public String toString() {
      return verdict.symbol() + " " + name + " \u2014 " + progress + " \u2014 " + verdict.words();
    }
  }

  public FindingsViewModel(
      SiteService sites,
      InspectionService inspections,
      AnalysisService analysis,
      PlaneAnalyzer analyzer,
      ReportIssuer issuer,
      DialogService dialogs,
      Executor ui,
      Executor background,
      long inspectionId,
      long planeId) {
    this.sites = Objects.requireNonNull(sites, "sites");
    this.inspections = Objects.requireNonNull(inspections, "inspections");
    this.analysis = Objects.requireNonNull(analysis, "analysis");
    this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
    this.issuer = Objects.requireNonNull(issuer, "issuer");
    this.dialogs = Objects.requireNonNull(dialogs, "dialogs");
    this.ui = Objects.requireNonNull(ui, "ui");
    this.background = Objects.requireNonNull(background, "background");
    this.inspectionId = inspectionId;
    this.planeId = planeId;
  }

  /**
   * Reads the findings on the background executor and shows them through the UI one (call once
   * the view is built; until then the screen shows nothing). A failure is shown in the error line.
   */
  public void load() {
    loading.set(true);
    background.execute(() -> {
      Loaded read;
      try {
        read = read();
      } catch (RuntimeException e) {
        ui.execute(() -> {
          loading.set(false);
          error.set("The findings of inspection " + inspectionId + " could not be read (" + e.getMessage()
              + "). Open the screen again (Ctrl+4).");
        });
        return;
      }
      ui.execute(() -> {
        show(read);
        loading.set(false);
      });
    });
  }

  /** What the screen shows, read and worked out off the UI thread. */
  private record Loaded(boolean finalised, String title, List<PlaneChoice> planes, VerdictWords verdict,
      PlanePicture picture, List<String> repairLines, List<String> restoreLines, List<String> findingLines,
      String summary) {}

  private void show(Loaded l) {
    finalised.set(l.finalised());
    title.set(l.title());
    planes.setAll(l.planes());
    verdict.set(l.verdict());
    picture.set(l.picture());
    repairLines.setAll(l.repairLines());
    restoreLines.setAll(l.restoreLines());
    findingLines.setAll(l.findingLines());
    summary.set(l.summary());
  }

  /** Reads and works out everything the screen shows (on the background executor). */
  private Loaded read() {
    Inspection inspection = inspections.inspection(inspectionId);
    PlaneRecord plane = sites.plane(planeId);
    String titleWords = plane.name() + " in inspection " + inspectionId + " (" + inspection.reason().label().replace('-', ' ')
        + ", " + (inspection.isFinalised() ? "finalised" : "open") + ")";
    List<PlaneChoice> planes = new ArrayList<>();
    for (org.bracewalk.app.PlaneProgress p : analysis.progress(inspectionId)) {
      planes.add(new PlaneChoice(p.plane().id(), p.plane().name(), p.verdict(), p.countWords()));
    }
    PlaneResult result = analysis.analysePlane(inspectionId, planeId);
    PlaneDesign design = result.design().design();
    PlaneAnalysis analysis = result.analysis();
    AsBuiltAnalysis ab = analysis.asBuilt().orElseThrow();
    Terms terms = Terms.of(sites.structure(plane.structureId()).kind(), plane.role());
    AsBuiltPlane built = result.asBuilt();
    Map<FrameRef, PanelState> frameFound = new TreeMap<>();
    result.latestFrame().forEach((f, o) -> frameFound.put(f, o.state()));
    // frame members not there as analysed (missing, beyond use, not inspected, left out)
    Set<FrameRef> absent = new TreeSet<>(built.absentFrame());
    absent.addAll(built.unknownFrame());
    Map<PanelRef, PanelFinding> findings = new java.util.HashMap<>();
    result.latest().forEach((p, o) -> {
      if (o.state() != PanelState.NOT_INSPECTED) {
        findings.put(p, o.finding());
      }
    });
    StateAnalysis seen = ab.state();
    if (ab.unknownPanels() > 0 || !built.unknownFrame().isEmpty()) {
      // drawn as found where seen: what was not inspected (panel or frame member) as designed
      Map<PanelRef, PanelFinding> optimistic = new java.util.HashMap<>(findings);
      for (int i = 1; i <= design.grid().lifts(); i++) {
        for (int j = 1; j <= design.grid().bays(); j++) {
          PanelRef p = new PanelRef(i, j);
          PanelFinding f = optimistic.get(p);
          if (f == null || !f.state().inspected()) {
            optimistic.put(p, PanelFinding.of(PanelState.SOUND));
          }
        }
      }
      Map<PanelRef, Brace> members = AsBuiltPlane.fromFindings(design, optimistic).members();
      seen = built.absentFrame().isEmpty()
          ? analyzer.analyseState(design.grid(), members)
          : analyzer.analyseState(new BuiltFrame(design.grid(), members, built.absentFrame()));
    }
    List<RepairBrace> repair = analysis.repair().braces();
    List<FrameRef> repairMembers = analysis.repair().members().stream()
        .map(RepairMember::member).toList();
    VerdictWords verdictWords = VerdictWords.of(result.verdict(), ab.state(),
        analysis.repair().minimum(), absent);
    PlanePicture drawn = new PlanePicture(design, findings, true, seen.blocks(), Set.copyOf(seen.criticalBraces()),
        repair, Set.of(), null, frameFound, null, seen.freedoms(), repairMembers, Set.of());

    List<String> repairLines = new ArrayList<>();
    int n = 1;
    for (FrameRef f : repairMembers) {
      repairLines.add(n++ + ".  " + Wording.frameMember(f, terms) + ": "
          + frameAction(frameFound.get(f)) + " \u2014 restores the design");
    }
    for (RepairBrace b : repair) {
      repairLines.add(n++ + ".  " + b.panel() + ": fit " + b.brace().token() + " (" + b.brace().kind().label() + ")"
          + (b.inDesign() ? " \u2014 restores the design" : " \u2014 NEW POSITION: needs a licensed engineer's approval"));
    }
    if (repair.isEmpty() && repairMembers.isEmpty()) {
      repairLines.add(ab.state().rigid() ? "None needed: the plane holds its shape as found." : "");
    }
    if (!analysis.repair().possible()) {
      repairLines.add("No set of allowed panels makes this plane rigid: a licensed engineer must redesign it.");
    }
    List<String> restoreLines = new ArrayList<>();
    for (RestoreItem r : analysis.repair().restoreToDesign()) {
      boolean unseen = ab.unknownPanels() > 0 && !findings.containsKey(r.panel())
          || findings.containsKey(r.panel()) && !findings.get(r.panel()).state().inspected();
      restoreLines.add(r.panel() + ": " + r.missing().token() + " (" + r.missing().kind().label() + ") \u2014 "
          + (r.neededForRigidity() ? "needed for rigidity" : "restores redundancy only")
          + (unseen ? " (not inspected yet: inspect first)" : ""));
    }
    for (RestoreFrameItem r : analysis.repair().restoreFrame()) {
      PanelState s = frameFound.get(r.member());
      restoreLines.add(Wording.frameMember(r.member(), terms) + ": "
          + (s == null ? "not there" : org.bracewalk.ui.common.PanelLook.of(s).words()) + " \u2014 "
          + (r.neededForRigidity() ? "needed for rigidity" : "restores redundancy only")
          + (s != null && !s.inspected() ? " (not inspected yet: inspect first)" : ""));
    }
    if (restoreLines.isEmpty()) {
      restoreLines.add("Nothing: every design brace and frame member is there and effective.");
    }
    List<String> findingLines = new ArrayList<>();
    new TreeMap<>(result.latest()).forEach((p, o) -> {
      if (o.state() != PanelState.SOUND && o.state() != PanelState.NOT_INSPECTED) {
        StringBuilder sb = new StringBuilder(p + ": " + org.bracewalk.ui.common.PanelLook.of(o.state()).words());
        if (o.memberFound() != null) {
          sb.append(" (member ").append(o.memberFound().token()).append(')');
        }
        if (o.defect() != null) {
          sb.append(", ").append(o.defect().label());
        }
        if (o.bowMm() != null) {
          sb.append(", bow ").append(o.bowMm()).append(" mm over ").append(o.gaugeLengthMm()).append(" mm");
        }
        if (!o.note().isEmpty()) {
          sb.append(" \u2014 ").append(o.note());
        }
        findingLines.add(sb.toString());
      }
    });
    for (PlacedBrace e : ab.extraBraces()) {
      findingLines.add(e.panel() + ": extra " + e.brace().token() + " (not in the design; counts)");
    }
    new TreeMap<>(result.latestFrame()).forEach((f, o) -> {
      if (o.state() != PanelState.SOUND && o.state() != PanelState.NOT_INSPECTED) {
        findingLines.add(frameFindingLine(Wording.frameMember(f, terms), o));
      }
    });
    for (String w : result.verdict().freedomWords(absent)) {
      findingLines.add("Can move: " + w + ".");
    }
    if (result.verdict().anyLostRestraint()) {
      findingLines.add(Wording.LOST_RESTRAINT_NOTE);
    }
    if (findingLines.isEmpty()) {
      findingLines.add("Every panel inspected was found sound.");
    }
    int marked = (int) result.latest().values().stream().filter(o -> o.state() != PanelState.NOT_INSPECTED).count();
    long frameMarked = result.latestFrame().values().stream()
        .filter(o -> o.state() != PanelState.NOT_INSPECTED).count();
    String summaryWords = marked + " of " + design.grid().panelCount() + " panels marked; "
        + ab.unknownPanels() + " not inspected (counted as missing in the repair set); "
        + (frameMarked == 0 ? "" : frameMarked + (frameMarked == 1 ? " frame member" : " frame members")
            + " marked (the others taken as designed); ")
        + "design revision " + result.design().number() + ".";
    return new Loaded(inspection.isFinalised(), titleWords, planes, verdictWords, drawn, repairLines, restoreLines,
        findingLines, summaryWords);
  }

  /**
   * What is done to a design frame member of the repair, as the repair order says: inspected
   * (and fitted if missing) when nobody has looked at it, replaced when damaged beyond use, else
   * refitted.
   */
  static String frameAction(PanelState recorded) {
    if (recorded != null && !recorded.inspected()) {
      return "inspect, fit if missing";
    }
    return recorded == PanelState.DAMAGED_INEFFECTIVE ? "replace" : "refit";
  }

  /** A frame finding as the found list words it: member, state, defect, bow, note. */
  private static String frameFindingLine(String member, Observation o) {
    StringBuilder sb = new StringBuilder(member + ": " + org.bracewalk.ui.common.PanelLook.of(o.state()).words());
    if (o.defect() != null) {
      sb.append(", ").append(o.defect().label());
    }
    if (o.bowMm() != null) {
      sb.append(", bow ").append(o.bowMm()).append(" mm over ").append(o.gaugeLengthMm()).append(" mm");
    }
    if (!o.note().isEmpty()) {
      sb.append(" \u2014 ").append(o.note());
    }
    return sb.toString();
  }

  // ---- documents ------------------------------------------------------------------------------

  /** Asks where to save the report, then issues it off the UI thread. */
  public boolean issueReport() {
    return issue("Save the inspection report", "inspection-" + inspectionId + "-report.pdf", true);
  }

  /** Asks where to save the repair order, then issues it off the UI thread. */
  public boolean issueRepairOrder() {
    return issue("Save the repair order", "inspection-" + inspectionId + "-repair-order.pdf", false);
  }

  private boolean issue(String question, String name, boolean report) {
    if (busy.get()) {
      error.set("A document is still being made; wait for it to finish.");
      return false;
    }
    Optional<Path> out = dialogs.chooseSaveFile(question, name);
    if (out.isEmpty()) {
      return false;
    }
    busy.set(true);
    error.set("");
    progress.set(0);
    progressWords.set("starting");
    Path file = out.get();
    background.execute(() -> {
      try {
        java.util.function.Consumer<ReportIssuer.Progress> tell =
            p -> ui.execute(() -> {
              progress.set(p.fraction());
              progressWords.set(p.words());
            });
        String done = report ? issuer.issueReport(inspectionId, file, tell) : issuer.issueRepairOrder(inspectionId, file, tell);
        ui.execute(() -> {
          busy.set(false);
          progress.set(1);
          progressWords.set("done");
          status.set(done);
        });
      } catch (RuntimeException e) {
        ui.execute(() -> {
          busy.set(false);
          progress.set(0);
          progressWords.set("");
          error.set((report ? "Report" : "Repair order") + " not issued: " + e.getMessage());
          dialogs.showError(report ? "Report not issued" : "Repair order not issued", error.get());
        });
      }
    });
    return true;
  }

  // ---- finalise -------------------------------------------------------------------------------

  /**
   * Finalises the inspection after asking; from then on it is read-only. The panels not inspected
   * are counted, and the inspection finalised, on the background executor; the question is asked on
   * the UI thread between. False when refused at once (already finalised, or finalising already).
   */
  public boolean finaliseInspection() {
    if (finalised.get()) {
      error.set("Inspection " + inspectionId + " is already finalised.");
      return false;
    }
    if (finalising) {
      error.set("Inspection " + inspectionId + " is being finalised; wait for it to finish.");
      return false;
    }
    finalising = true;
    background.execute(() -> {
      String gaps;
      try {
        // the facts (each plane with panels nobody has looked at, named) come from the use case
        gaps = org.bracewalk.app.PlaneProgress.finaliseWarning(analysis.progress(inspectionId));
      } catch (RuntimeException e) {
        ui.execute(() -> notFinalised(e));
        return;
      }
      ui.execute(() -> ask(gaps));
    });
    return true;
  }

  private void ask(String gaps) {
    String warning = gaps.isEmpty() ? "" : "\n\n" + gaps;
    boolean go = dialogs.confirm("Finalise inspection " + inspectionId + "?",
        "After finalising, nothing in this inspection can be changed: no mark, correction or photo."
            + " Later changes need a new inspection." + warning, "Finalise");
    if (!go) {
      finalising = false;
      return;
    }
    background.execute(() -> {
      Loaded read;
      try {
        inspections.finalise(inspectionId);
        read = read();
      } catch (RuntimeException e) {
        ui.execute(() -> notFinalised(e));
        return;
      }
      ui.execute(() -> {
        finalising = false;
        show(read);
        error.set("");
        status.set("Inspection " + inspectionId + " finalised: it is read-only now. Issue the report (R) for the record.");
      });
    });
  }

  private void notFinalised(RuntimeException e) {
    finalising = false;
    error.set("Not finalised: " + e.getMessage());
    dialogs.showError("Not finalised", error.get());
  }

  // ---- properties -----------------------------------------------------------------------------

  public long inspectionId() {
    return inspectionId;
  }

  public long planeId() {
    return planeId;
  }

  public ReadOnlyObjectProperty<PlanePicture> pictureProperty() {
    return picture.getReadOnlyProperty();
  }

  public ReadOnlyObjectProperty<VerdictWords> verdictProperty() {
    return verdict.getReadOnlyProperty();
  }

  public ObservableList<String> repairLines() {
    return repairLines;
  }

  public ObservableList<String> restoreLines() {
    return restoreLines;
  }

  public ObservableList<String> findingLines() {
    return findingLines;
  }

  public ObservableList<PlaneChoice> planes() {
    return planes;
  }

  public ReadOnlyStringProperty summaryProperty() {
    return summary.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty statusProperty() {
    return status.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty errorProperty() {
    return error.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty progressWordsProperty() {
    return progressWords.getReadOnlyProperty();
  }

  public ReadOnlyDoubleProperty progressProperty() {
    return progress.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty busyProperty() {
    return busy.getReadOnlyProperty();
  }

  public ReadOnlyBooleanProperty finalisedProperty() {
    return finalised.getReadOnlyProperty();
  }

  /** True while the findings are being read. */
  public ReadOnlyBooleanProperty loadingProperty() {
    return loading.getReadOnlyProperty();
  }

  public ReadOnlyStringProperty titleProperty() {
    return title.getReadOnlyProperty();
  }
}
