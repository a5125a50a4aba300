package org.bracewalk.app;

import java.util.Objects;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelState;

/**
 * How one frame member's recorded state differs from the previous inspection's.
 *
 * @param member the frame member
 * @param before the previous state; {@code null} when it was not recorded then (taken as designed)
 * @param after this inspection's state; {@code null} when it is not recorded now
 */
public record FrameChange(FrameRef member, PanelState before, PanelState after) {
  public FrameChange {
    Objects.requireNonNull(member, "member");
  }
}
