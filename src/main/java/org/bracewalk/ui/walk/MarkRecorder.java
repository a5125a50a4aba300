package org.bracewalk.ui.walk;

import java.util.List;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * Where the walk-round's marks go: the open inspection's record of one plane. Each call returns
 * only once the mark is durable (committed), so what the screen shows is what the record holds.
 * Nothing is ever deleted: a change to an earlier mark is a correction that names it.
 */
public interface MarkRecorder {

  /** Commits a first mark for {@code panel}. */
  RecordedMark record(PanelRef panel, Mark mark);

  /**
   * Commits a first mark for the frame member {@code member}, marked from {@code panel} (a panel
   * it borders). The mark names no diagonal found.
   */
  RecordedMark recordMember(FrameRef member, PanelRef panel, Mark mark);

  /** Commits a mark that supersedes {@code earlier} (of a panel or of a frame member), saying why. */
  RecordedMark correct(RecordedMark earlier, Mark replacement, String reason);

  /**
   * Commits, all or nothing, every panel of {@code panels} as found as designed: the panels nobody
   * has looked at, as the inspector confirmed them (refused, recording nothing, when the record
   * holds others). Returns the records, one per panel, in the order given.
   */
  List<RecordedMark> recordRestAsDesigned(List<PanelRef> panels);
}
