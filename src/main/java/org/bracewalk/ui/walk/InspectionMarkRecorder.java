package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.bracewalk.app.InspectionService;
import org.bracewalk.app.NewObservation;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Observation;
import org.bracewalk.core.model.PanelRef;

/**
 * Records the walk-round's marks as observations of one plane in an open inspection, through
 * {@link InspectionService#record} and {@link InspectionService#correct}: a mark and its photos
 * are committed together (one transaction), and every photo file is checked before any is read,
 * so a file that cannot be kept records nothing.
 */
public final class InspectionMarkRecorder implements MarkRecorder {
  private final InspectionService inspections;
  private final long inspectionId;
  private final long planeId;
  private final String recordedBy;

  public InspectionMarkRecorder(
      InspectionService inspections, long inspectionId, long planeId, String recordedBy) {
    this.inspections = Objects.requireNonNull(inspections, "inspections");
    this.inspectionId = inspectionId;
    this.planeId = planeId;
    this.recordedBy = recordedBy;
  }

  @Override
  public RecordedMark record(PanelRef panel, Mark mark) {
    Observation o = inspections.record(inspectionId, observation(panel, mark), mark.photos())
        .observation();
    return new RecordedMark(o.id(), panel, mark);
  }

  @Override
  public RecordedMark recordMember(FrameRef member, PanelRef panel, Mark mark) {
    Observation o = inspections.record(inspectionId, observation(member, mark), mark.photos()).observation();
    return new RecordedMark(o.id(), panel, mark, member);
  }

  @Override
  public RecordedMark correct(RecordedMark earlier, Mark replacement, String reason) {
    NewObservation n = earlier.onFrame()
        ? observation(earlier.member(), replacement)
        : observation(earlier.panel(), replacement);
    Observation o = inspections.correct(inspectionId, earlier.id(), n, reason, replacement.photos()).observation();
    return new RecordedMark(o.id(), earlier.panel(), replacement, earlier.member());
  }

  @Override
  public List<RecordedMark> recordRestAsDesigned(List<PanelRef> panels) {
    List<RecordedMark> out = new ArrayList<>();
    for (Observation o : inspections.recordRestAsDesigned(inspectionId, planeId, panels, recordedBy)) {
      out.add(new RecordedMark(o.id(), o.panel(), restAsDesigned()));
    }
    return out;
  }

  /** The mark each panel recorded as found as designed holds (as {@link InspectionService#recordRestAsDesigned} records it). */
  static Mark restAsDesigned() {
    return new Mark(org.bracewalk.core.model.PanelState.SOUND, null, null, null, null,
        InspectionService.REST_AS_DESIGNED_NOTE, List.of());
  }

  private NewObservation observation(PanelRef panel, Mark m) {
    return new NewObservation(
        planeId, panel, m.state(), m.memberFound(), m.bowMm(), m.gaugeLengthMm(), m.defect(),
        m.note(), recordedBy);
  }

  /** A frame member's observation: state, defect, bow, note; never a diagonal found. */
  private NewObservation observation(FrameRef member, Mark m) {
    return new NewObservation(
        planeId, null, m.state(), null, m.bowMm(), m.gaugeLengthMm(), m.defect(), m.note(), recordedBy, member);
  }

  /**
   * The marks already recorded for the plane in this inspection: the latest per panel, then the
   * latest per frame member (each placed at a panel it borders, where the cursor goes on undo).
   */
  public static List<RecordedMark> existing(InspectionService inspections, long inspectionId, long planeId) {
    List<RecordedMark> out = new ArrayList<>();
    inspections.latestObservations(inspectionId, planeId).forEach((p, o) -> out.add(
        new RecordedMark(o.id(), p,
            new Mark(o.state(), o.memberFound(), o.defect(), o.bowMm(), o.gaugeLengthMm(), o.note(), List.of()))));
    inspections.latestFrameObservations(inspectionId, planeId).forEach((f, o) -> out.add(
        new RecordedMark(o.id(), org.bracewalk.ui.common.PanelSide.place(f).panel(),
            new Mark(o.state(), null, o.defect(), o.bowMm(), o.gaugeLengthMm(), o.note(), List.of()), f)));
    return out;
  }
}
