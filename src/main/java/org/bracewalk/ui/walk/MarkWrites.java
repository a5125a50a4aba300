package org.bracewalk.ui.walk;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Executor;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * The walk-round's writes, in key order, off the JavaFX thread. One job: get each mark and undo
 * into the record through the {@link MarkRecorder}, in the order made, and say how each went.
 *
 * <p>A write takes a {@link #ticket()} and is queued with {@link #mark} or {@link #undo} on the UI
 * thread, and runs on the ordered queue ({@link InOrder}). The chain of record ids lives on that queue: the latest stored record of
 * each panel's diagonals and of each frame member (a write names the member, else it is of the
 * panel's diagonals), so a second mark or an undo corrects exactly the record before it (a correction
 * supersedes the previous observation), whatever the screen shows meanwhile. Before a mark is
 * written, its photo files are checked there (gone, empty, too large, not a JPEG or PNG); a mark
 * with a photo that cannot be kept is not written at all. The answer comes back through the UI
 * executor to the {@link Outcome}: stored (with the record), refused (with why, naming the panel),
 * or passed over (an undo of a mark that was never stored).
 */
final class MarkWrites {
  /** What became of the writes; called on the UI executor, in the order they were queued. */
  interface Outcome {
    /** Write {@code ticket} is in the record as {@code made}. */
    void stored(long ticket, RecordedMark made);

    /**
     * Write {@code ticket} of {@code mark} on {@code panel} (on its frame member {@code member} when
     * not null) is not in the record, because {@code why}.
     */
    void refused(long ticket, PanelRef panel, FrameRef member, Mark mark, String why);

    /** Undo {@code ticket} wrote nothing: the mark it undoes never reached the record. */
    void passedOver(long ticket, PanelRef panel, FrameRef member);

    /** Write {@code ticket}, the rest of the panels as designed, is in the record as {@code made}. */
    void storedRest(long ticket, List<RecordedMark> made);

    /** Write {@code ticket}, {@code panels} as designed, recorded nothing, because {@code why}. */
    void refusedRest(long ticket, List<PanelRef> panels, String why);
  }

  private final MarkRecorder recorder;
  private final Executor ui;
  private final InOrder queue;
  private final Outcome outcome;
  private long tickets;

  // ---- held on the queue only ----
  /** The latest stored record of each panel's diagonals (by panel) and of each frame member (by member). */
  private final Map<Object, RecordedMark> stored = new HashMap<>();
  /** The marks that did not reach the record (an undo of one writes nothing). */
  private final Set<Long> refused = new HashSet<>();

  /**
   * @param existing the latest record of each panel already stored in this inspection
   * @param recorder commits marks (called on the queue only)
   * @param ui the UI thread's executor, where {@code outcome} is told
   * @param writes where the writes run (wrapped so they run one at a time, in order)
   */
  MarkWrites(List<RecordedMark> existing, MarkRecorder recorder, Executor ui, Executor writes, Outcome outcome) {
    this.recorder = Objects.requireNonNull(recorder, "recorder");
    this.ui = Objects.requireNonNull(ui, "ui");
    this.queue = new InOrder(Objects.requireNonNull(writes, "writes"));
    this.outcome = Objects.requireNonNull(outcome, "outcome");
    List<RecordedMark> copy = List.copyOf(existing);
    queue.execute(() -> copy.forEach(r -> stored.put(key(r.panel(), r.member()), r)));
  }

  /** What a record is kept under: its frame member, else its panel. */
  static Object key(PanelRef panel, FrameRef member) {
    return member != null ? member : panel;
  }

  /** Runs {@code work} on the queue, after every write queued before it (file work of the walk-round). */
  void onQueue(Runnable work) {
    queue.execute(work);
  }

  /** A new ticket, naming the next write (taken on the UI thread before the write is queued). */
  long ticket() {
    return ++tickets;
  }

  /**
   * Queues write {@code ticket}: {@code mark} for {@code panel}, a first record or a correction of
   * the panel's latest record saying {@code reason}.
   */
  void mark(long ticket, PanelRef panel, Mark mark, String reason) {
    mark(ticket, panel, null, mark, reason);
  }

  /** As above, for the frame member {@code member} (marked from {@code panel}) when not null. */
  void mark(long ticket, PanelRef panel, FrameRef member, Mark mark, String reason) {
    queue.execute(() -> {
      List<String> bad = new ArrayList<>();
      for (var photo : mark.photos()) {
        Optional<String> problem = CameraFolder.problem(photo);
        problem.ifPresent(why -> bad.add(photo + " (" + why + ")"));
      }
      if (!bad.isEmpty()) {
        refused.add(ticket);
        String why = "a photo cannot be kept: " + String.join("; ", bad);
        ui.execute(() -> outcome.refused(ticket, panel, member, mark, why));
        return;
      }
      write(ticket, panel, member, mark, reason);
    });
  }

  /**
   * Queues the undo of write {@code undone}: a correction of the panel's latest record back to
   * {@code back}. Nothing is written when {@code undone} never reached the record.
   */
  void undo(long ticket, long undone, PanelRef panel, FrameRef member, Mark back, String reason) {
    queue.execute(() -> {
      if (refused.contains(undone)) {
        ui.execute(() -> outcome.passedOver(ticket, panel, member));
        return;
      }
      write(ticket, panel, member, back, reason);
    });
  }

  /**
   * Queues write {@code ticket}: {@code panels} (those nobody has looked at, as confirmed) recorded
   * as found as designed, all or nothing, after every write queued before it.
   */
  void rest(long ticket, List<PanelRef> panels) {
    List<PanelRef> copy = List.copyOf(panels);
    queue.execute(() -> {
      List<RecordedMark> made;
      try {
        made = recorder.recordRestAsDesigned(copy);
      } catch (RuntimeException e) {
        refused.add(ticket);
        String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        ui.execute(() -> outcome.refusedRest(ticket, copy, why));
        return;
      }
      made.forEach(r -> stored.put(key(r.panel(), null), r));
      ui.execute(() -> outcome.storedRest(ticket, made));
    });
  }

  private void write(long ticket, PanelRef panel, FrameRef member, Mark mark, String reason) {
    Object key = key(panel, member);
    RecordedMark before = stored.get(key);
    RecordedMark made;
    try {
      if (before != null) {
        made = recorder.correct(before, mark, reason);
      } else {
        made = member == null ? recorder.record(panel, mark) : recorder.recordMember(member, panel, mark);
      }
    } catch (RuntimeException e) {
      refused.add(ticket);
      String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
      ui.execute(() -> outcome.refused(ticket, panel, member, mark, why));
      return;
    }
    stored.put(key, made);
    ui.execute(() -> outcome.stored(ticket, made));
  }
}
