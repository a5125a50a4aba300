package org.bracewalk.core.analysis;

import java.util.Set;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * Tension-only members where the frame is incomplete. The exact criterion (B. Roth, W. Whiteley,
 * "Tensegrity frameworks", Trans. AMS 265 (1981)): with the tension members as bars the framework
 * has no motion, and no nonzero motion of the rigid members' framework avoids lengthening every
 * tension member; equivalently, by Stiemke's alternative, the tension members carry a strictly
 * positive self-stress of the whole framework.
 *
 * <p>This first version decides the sufficient half only: the plane is called rigid when the rigid
 * members alone make it rigid. Otherwise it is reported as not rigid (one way only), the cautious
 * side; a plane that tension members alone hold in both ways is under-rated, never over-rated.
 */
final class TensionOnlyFrame {
  private TensionOnlyFrame() {}

  static boolean rigid(PlaneGrid grid, byte[] codes, Set<FrameRef> absent) {
    byte[] rigidOnly = new byte[codes.length];
    for (int i = 0; i < codes.length; i++) {
      rigidOnly[i] = PanelCodes.isRigid(codes[i]) ? codes[i] : PanelCodes.NONE;
    }
    FrameFramework fw =
        FrameFramework.of(grid, rigidOnly, FramePlaneAnalyzer.frameThere(grid, absent));
    return FrameFreedoms.of(fw, FramePlaneAnalyzer.SEED).dof == 0;
  }
}
