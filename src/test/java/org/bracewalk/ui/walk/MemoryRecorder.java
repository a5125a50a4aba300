package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.List;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/** Keeps every record in a list, as an append-only log would; can be told to fail. */
final class MemoryRecorder implements MarkRecorder {
  /** One record: of a panel's diagonals ({@code member} null) or of a frame member. */
  record Row(long id, PanelRef panel, Mark mark, Long supersedes, String reason, FrameRef member) {}

  final List<Row> rows = new ArrayList<>();
  boolean failNext;

  @Override
  public RecordedMark record(PanelRef panel, Mark mark) {
    return add(panel, mark, null, null, null);
  }

  @Override
  public RecordedMark recordMember(FrameRef member, PanelRef panel, Mark mark) {
    return add(panel, mark, null, null, member);
  }

  @Override
  public RecordedMark correct(RecordedMark earlier, Mark replacement, String reason) {
    return add(earlier.panel(), replacement, earlier.id(), reason, earlier.member());
  }

  @Override
  public List<RecordedMark> recordRestAsDesigned(List<PanelRef> panels) {
    if (failNext) {
      failNext = false;
      throw new IllegalStateException("disk full");
    }
    List<RecordedMark> out = new ArrayList<>();
    for (PanelRef p : panels) {
      out.add(add(p, InspectionMarkRecorder.restAsDesigned(), null, null, null));
    }
    return out;
  }

  private RecordedMark add(PanelRef panel, Mark mark, Long supersedes, String reason, FrameRef member) {
    if (failNext) {
      failNext = false;
      throw new IllegalStateException("disk full");
    }
    long id = rows.size() + 1;
    rows.add(new Row(id, panel, mark, supersedes, reason, member));
    return new RecordedMark(id, panel, mark, member);
  }
}
