package org.bracewalk.core.analysis;

import java.util.BitSet;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * A plane's braces as one byte per panel, indexed {@code (lift - 1) * bays + (bay - 1)}, so that
 * index order is lift-then-bay order and a million panels cost a megabyte. Bit 0: a rising member,
 * bit 1: a falling member, bit 2: tension-only. 0 means no member.
 */
final class PanelCodes {
  static final byte NONE = 0;
  private static final int RISING = 1;
  private static final int FALLING = 2;
  private static final int TENSION = 4;
  private static final Brace[] DECODED = new Brace[8];

  static {
    for (int code = 1; code < 8; code++) {
      Diagonal d = Diagonal.of((code & RISING) != 0, (code & FALLING) != 0);
      if (d != null) {
        DECODED[code] =
            new Brace(d, (code & TENSION) != 0 ? MemberKind.TENSION_ONLY : MemberKind.RIGID);
      }
    }
  }

  private PanelCodes() {}

  static byte encode(Brace b) {
    if (b == null) {
      return NONE;
    }
    int code = (b.diagonal().hasRising() ? RISING : 0) | (b.diagonal().hasFalling() ? FALLING : 0);
    return (byte) (code | (b.isRigid() ? 0 : TENSION));
  }

  static Brace decode(byte code) {
    return DECODED[code];
  }

  static byte[] encode(PlaneGrid grid, Map<PanelRef, Brace> braces) {
    byte[] codes = new byte[grid.panelCount()];
    int bays = grid.bays();
    for (Map.Entry<PanelRef, Brace> e : braces.entrySet()) {
      PanelRef p = e.getKey();
      codes[(p.lift() - 1) * bays + p.bay() - 1] = encode(e.getValue());
    }
    return codes;
  }

  static BitSet mark(PlaneGrid grid, Set<PanelRef> panels) {
    BitSet bits = new BitSet(grid.panelCount());
    int bays = grid.bays();
    for (PanelRef p : panels) {
      bits.set((p.lift() - 1) * bays + p.bay() - 1);
    }
    return bits;
  }

  static boolean isRigid(byte code) {
    return code != NONE && (code & TENSION) == 0;
  }

  static PanelRef panel(int index, int bays) {
    return new PanelRef(index / bays + 1, index % bays + 1);
  }
}
