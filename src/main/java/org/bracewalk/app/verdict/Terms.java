package org.bracewalk.app.verdict;

import org.bracewalk.core.model.FrameMemberType;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.StructureKind;

/**
 * Which trade's words name the frame members: a scaffold has ledgers and standards, racking has
 * beams and uprights (both trades' own words; {@link FrameMemberType}).
 */
public enum Terms {
  SCAFFOLD,
  RACKING;

  /** Racking words for an upright frame or a spine (racking planes), scaffold words otherwise. */
  public static Terms of(PlaneRole role) {
    return role == PlaneRole.UPRIGHT_FRAME || role == PlaneRole.SPINE ? RACKING : SCAFFOLD;
  }

  /** Racking words for any plane of a racking run, and for racking planes; scaffold words otherwise. */
  public static Terms of(StructureKind kind, PlaneRole role) {
    return kind == StructureKind.RACKING_RUN ? RACKING : of(role);
  }

  /** {@code ledger}/{@code beam}, {@code standard}/{@code upright}. */
  public String word(FrameMemberType type) {
    return this == RACKING ? type.rackingLabel() : type.label();
  }
}
