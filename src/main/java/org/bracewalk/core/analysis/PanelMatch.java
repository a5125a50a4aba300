package org.bracewalk.core.analysis;

import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;

/**
 * Matches the members found in a panel against the members designed there. A rigid member stands
 * in for a rigid design member whichever way it runs; a tension-only design member is matched only
 * by a member running the designed way (a rigid one carries tension too); a tension-only member
 * never stands in for a rigid one. Exact matches are taken first.
 */
final class PanelMatch {
  private final boolean[] designLeft;
  private final boolean[] foundLeft;
  private final MemberKind designKind;
  private final MemberKind foundKind;

  private PanelMatch(Brace design, Brace found) {
    designLeft = members(design);
    foundLeft = members(found);
    designKind = design == null ? null : design.kind();
    foundKind = found == null ? null : found.kind();
    // 1. exact: same direction, same kind.
    if (designKind != null && designKind == foundKind) {
      for (int d = 0; d < 2; d++) {
        if (designLeft[d] && foundLeft[d]) {
          designLeft[d] = false;
          foundLeft[d] = false;
        }
      }
    }
    // 2. a rigid design member by any rigid member found.
    if (designKind == MemberKind.RIGID && foundKind == MemberKind.RIGID) {
      for (int d = 0; d < 2; d++) {
        if (designLeft[d]) {
          for (int f = 0; f < 2; f++) {
            if (foundLeft[f]) {
              designLeft[d] = false;
              foundLeft[f] = false;
              break;
            }
          }
        }
      }
    }
    // 3. a tension-only design member by a rigid member running the same way.
    if (designKind == MemberKind.TENSION_ONLY && foundKind == MemberKind.RIGID) {
      for (int d = 0; d < 2; d++) {
        if (designLeft[d] && foundLeft[d]) {
          designLeft[d] = false;
          foundLeft[d] = false;
        }
      }
    }
  }

  private static boolean[] members(Brace b) {
    if (b == null) {
      return new boolean[2];
    }
    return new boolean[] {b.diagonal().hasRising(), b.diagonal().hasFalling()};
  }

  /** The design member(s) not matched by what was found, or {@code null} when none is missing. */
  static Brace missing(Brace design, Brace found) {
    if (design == null) {
      return null;
    }
    PanelMatch m = new PanelMatch(design, found);
    Diagonal d = Diagonal.of(m.designLeft[0], m.designLeft[1]);
    return d == null ? null : new Brace(d, m.designKind);
  }

  /** The member(s) found that the design does not account for, or {@code null}. */
  static Brace extra(Brace design, Brace found) {
    if (found == null) {
      return null;
    }
    PanelMatch m = new PanelMatch(design, found);
    Diagonal d = Diagonal.of(m.foundLeft[0], m.foundLeft[1]);
    return d == null ? null : new Brace(d, m.foundKind);
  }
}
