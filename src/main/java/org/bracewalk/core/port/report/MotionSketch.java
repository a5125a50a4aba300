package org.bracewalk.core.port.report;

import java.util.Objects;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.JointMotion;

/**
 * The motion a report sketches for a plane that is not rigid: one of the analysed state's freedoms
 * and the engine's exact first-order motion showing it (joint velocities, the largest 1).
 *
 * @param freedom the freedom shown (a swaying part where there is one)
 * @param motion the joint velocities
 */
public record MotionSketch(Freedom freedom, JointMotion motion) {
  public MotionSketch {
    Objects.requireNonNull(freedom, "freedom");
    Objects.requireNonNull(motion, "motion");
  }
}
