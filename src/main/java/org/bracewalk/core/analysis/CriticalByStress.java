package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.TreeSet;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * Critical frame members and critical braces of a {@link FrameFramework}: members whose loss alone
 * lowers the rank of the rigidity matrix (analysis.md, "Frame members"), i.e. those that carry no
 * self-stress ({@link RandomSelfStress}). A member holding a loose end is critical in this sense
 * (its loss frees nothing new, but the joint it held drops out with it). A diagonal of a cross is
 * critical iff either of its halves carries no self-stress (both carry the same force through the
 * crossing).
 */
final class CriticalByStress {
  record Critical(List<FrameRef> members, List<PanelRef> braces) {}

  private CriticalByStress() {}

  static Critical of(FrameFramework fw, long seed) {
    FaceClassSystem sys = new FaceClassSystem(fw, new int[0], new int[0]);
    boolean[] stressed = RandomSelfStress.stressed(sys, new SplittableRandom(seed));
    List<FrameRef> members = new ArrayList<>();
    TreeSet<PanelRef> braces = new TreeSet<>();
    for (int e = 0; e < fw.memberCount; e++) {
      if (!fw.present[e] || fw.ground[e]) {
        continue;
      }
      if (fw.type[e] == FrameFramework.HALF) {
        int t = fw.twin[e];
        if (e > t) {
          continue;
        }
        if (!stressed[e] || !stressed[t]) {
          braces.add(fw.panelRef(fw.panel[e]));
        }
        continue;
      }
      if (stressed[e]) {
        continue;
      }
      if (fw.isFrame(e)) {
        members.add(fw.frameRef(e));
      } else {
        braces.add(fw.panelRef(fw.panel[e]));
      }
    }
    members.sort(null);
    return new Critical(members, new ArrayList<>(braces));
  }
}
