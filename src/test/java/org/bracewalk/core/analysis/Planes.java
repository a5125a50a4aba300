package org.bracewalk.core.analysis;

import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/** Test helper: planes written as rows of tokens, top lift first (as in the check format). */
final class Planes {
  private Planes() {}

  static PlaneDesign design(Support support, String... rows) {
    Parsed p = parse(support, rows);
    return new PlaneDesign(p.grid, p.braces, p.special);
  }

  static AsBuiltPlane asBuilt(Support support, String... rows) {
    Parsed p = parse(support, rows);
    return new AsBuiltPlane(p.grid, p.braces, p.special);
  }

  private record Parsed(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<PanelRef> special) {}

  private static Parsed parse(Support support, String... rows) {
    int m = rows.length;
    int n = rows[0].trim().split("\\s+").length;
    Map<PanelRef, Brace> braces = new HashMap<>();
    Set<PanelRef> special = new HashSet<>();
    for (int r = 0; r < m; r++) {
      String[] t = rows[r].trim().split("\\s+");
      int lift = m - r;
      for (int c = 0; c < n; c++) {
        String tok = t[c];
        PanelRef p = new PanelRef(lift, c + 1);
        if (tok.equals("?") || tok.equals("o")) {
          special.add(p);
          continue;
        }
        MemberKind kind = MemberKind.RIGID;
        if (tok.startsWith("~")) {
          kind = MemberKind.TENSION_ONLY;
          tok = tok.substring(1);
        }
        Diagonal d = Diagonal.fromSymbol(tok);
        if (d != null) {
          braces.put(p, new Brace(d, kind));
        }
      }
    }
    return new Parsed(PlaneGrid.uniform(m, n, support), braces, special);
  }
}
