package org.bracewalk.app.verdict;

import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.StructureKind;

/**
 * Which trade's words name the frame members: a scaffold has ledgers and standards, racking has
 * beams and uprights, and an upright frame of racking has horizontals between its uprights (the
 * trades' own words; {@link FrameMemberType}; the report's templates say the same,
 * {@code frame.ledger.upright-frame}).
 */
public enum Terms {
  SCAFFOLD,
  RACKING,
  /** A racking upright frame: horizontals and uprights. */
  RACKING_FRAME;

  /** Racking words for an upright frame or a spine (racking planes), scaffold words otherwise. */
  public static Terms of(PlaneRole role) {
    if (role == PlaneRole.UPRIGHT_FRAME) {
      return RACKING_FRAME;
    }
    return role == PlaneRole.SPINE ? RACKING : SCAFFOLD;
  }

  /** Racking words for any plane of a racking run, and for racking planes; scaffold words otherwise. */
  public static Terms of(StructureKind kind, PlaneRole role) {
    if (kind == StructureKind.RACKING_RUN) {
      return role == PlaneRole.UPRIGHT_FRAME ? RACKING_FRAME : RACKING;
    }
    return of(role);
  }

  /** {@code ledger}/{@code beam}/{@code horizontal}, {@code standard}/{@code upright}. */
  public String word(FrameMemberType type) {
    if (this == RACKING_FRAME && type == FrameMemberType.LEDGER) {
      return "horizontal";
    }
    return this == SCAFFOLD ? type.label() : type.rackingLabel();
  }
}
