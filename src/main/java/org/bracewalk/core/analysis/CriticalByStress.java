package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.TreeSet;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;

/**
 * Critical frame members and critical braces of a {@link FrameFramework}: members whose loss alone
 * adds a freedom (check-contract.md, "Frame members"). Removing a member lowers the rank of the rigidity matrix iff it carries no
 * self-stress ({@link RandomSelfStress}); the freedoms then grow by one unless the removal also
 * drops a joint from the framework (a joint held by that member alone, which takes its own
 * freedoms with it), so such a member is not critical. A diagonal of a cross is critical iff
 * either of its halves carries no self-stress (both carry the same force through the crossing).
 */
final class CriticalByStress {
  record Critical(List<FrameRef> members, List<PanelRef> braces) {}

  private CriticalByStress() {}

  static Critical of(FrameFramework fw, long seed) {
    return of(FrameSystem.of(fw), seed);
  }

  /** The same, on a state's shared equations. */
  static Critical of(FrameSystem system, long seed) {
    FrameFramework fw = system.fw;
    FaceClassSystem sys = system.base;
    boolean[] stressed = RandomSelfStress.stressed(sys, new SplittableRandom(seed));
    int[] deg = new int[fw.jointCount];
    for (int e = 0; e < fw.memberCount; e++) {
      if (fw.present[e] && !fw.ground[e]) {
        deg[fw.ja[e]]++;
        deg[fw.jb[e]]++;
      }
    }
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
        // the diagonal's ends are the grid corners of its two halves
        int a = fw.isGridJoint(fw.ja[e]) ? fw.ja[e] : fw.jb[e];
        int b = fw.isGridJoint(fw.ja[t]) ? fw.ja[t] : fw.jb[t];
        if ((!stressed[e] || !stressed[t]) && !isolated(fw, deg, a) && !isolated(fw, deg, b)) {
          braces.add(fw.panelRef(fw.panel[e]));
        }
        continue;
      }
      if (stressed[e] || isolated(fw, deg, fw.ja[e]) || isolated(fw, deg, fw.jb[e])) {
        continue;
      }
      if (fw.isFrame(e)) {
        members.add(fw.frameRef(e));
      } else {
        braces.add(fw.panelRef(fw.panel[e]));
      }
    }
    // frame member ids run in the members' own order (ledgers by level and bay, then standards
    // by lift and line): the list is sorted as built
    return new Critical(members, new ArrayList<>(braces));
  }

  private static boolean isolated(FrameFramework fw, int[] deg, int j) {
    return deg[j] == 1 && !(fw.pinned && j <= fw.bays);
  }
}
