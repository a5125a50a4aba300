package org.bracewalk.ui.walk;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;

/**
 * The marks on frame members (ledgers and standards) so far: the latest of each, its state, and the
 * members absent both ways the live verdict counts them. One job: the state of the frame marks.
 *
 * <p>A member nobody has marked is taken as designed (there, unless the design leaves it out), as
 * {@link AsBuiltPlane#fromFindings(PlaneDesign, Map, Map)} takes it; so is one whose mark was
 * withdrawn (undone to "not inspected"): the walk-round does not ask for every frame member.
 */
final class MarkedFrame {
  private final PlaneDesign design;
  private final Map<FrameRef, RecordedMark> latest = new HashMap<>();
  /** The state of each member with a mark in force (withdrawn marks excluded). */
  private final Map<FrameRef, PanelState> states = new HashMap<>();

  /** @param existing the latest mark of each frame member already recorded (each within the grid) */
  MarkedFrame(PlaneDesign design, List<RecordedMark> existing) {
    this.design = design;
    for (RecordedMark r : existing) {
      r.member().requireWithin(design.grid());
      put(r.member(), r, r.mark());
    }
  }

  RecordedMark latest(FrameRef f) {
    return latest.get(f);
  }

  /** True when {@code f} holds a mark in force. */
  boolean isMarked(FrameRef f) {
    return states.containsKey(f);
  }

  void put(FrameRef f, RecordedMark made, Mark mark) {
    latest.put(f, made);
    if (mark.state() == PanelState.NOT_INSPECTED) {
      states.remove(f);
    } else {
      states.put(f, mark.state());
    }
  }

  /** {@code f} holds what {@code r} holds, or nothing when {@code r} is null (a mark not stored is taken back). */
  void reset(FrameRef f, RecordedMark r) {
    if (r == null) {
      latest.remove(f);
      states.remove(f);
    } else {
      put(f, r, r.mark());
    }
  }

  /** The state of each member with a mark in force, live. */
  Map<FrameRef, PanelState> states() {
    return states;
  }

  /**
   * The members not there for the verdict: those the design leaves out and nobody found, those
   * found missing or beyond use, and, when {@code conservative}, those marked not reachable (else
   * they are taken as designed, as panels not yet seen are).
   */
  Set<FrameRef> absent(boolean conservative) {
    Set<FrameRef> out = new HashSet<>(design.omittedFrame());
    for (Map.Entry<FrameRef, PanelState> e : states.entrySet()) {
      PanelState s = e.getValue();
      FrameRef f = e.getKey();
      if (s.inspected()) {
        if (s.effective()) {
          out.remove(f);
        } else {
          out.add(f);
        }
      } else if (conservative) {
        out.add(f);
      }
    }
    return out;
  }

  /** Members marked not reachable: the verdict may depend on them. */
  int unknown() {
    int n = 0;
    for (PanelState s : states.values()) {
      if (!s.inspected()) {
        n++;
      }
    }
    return n;
  }

  /** Members marked missing or damaged beyond use. */
  int lost() {
    int n = 0;
    for (PanelState s : states.values()) {
      if (s.inspected() && !s.effective()) {
        n++;
      }
    }
    return n;
  }
}
