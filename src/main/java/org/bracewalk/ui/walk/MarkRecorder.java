package org.bracewalk.ui.walk;

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
}
