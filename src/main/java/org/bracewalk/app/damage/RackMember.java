package org.bracewalk.app.damage;

/**
 * A racking member and the bow it may show over a 1 m straight edge before it counts as damaged
 * beyond the first level. Values from DIN EN 15635:2009-08, Fig. 14, as reproduced in DGUV
 * Information 208-043 (see shared/design/trade-facts.md, "read").
 */
public enum RackMember {
  /** An upright bent in the direction of the beams: 5 mm. */
  UPRIGHT_BEAM_DIRECTION(5.0),
  /** An upright bent in the plane of the frame bracing: 3 mm. */
  UPRIGHT_FRAME_PLANE(3.0),
  /** A bracing member bent in either plane: 10 mm. */
  BRACING(10.0);

  private final double limitPerMetreMm;

  RackMember(double limitPerMetreMm) {
    this.limitPerMetreMm = limitPerMetreMm;
  }

  /** The limit over a straight edge of 1 m or more, millimetres. */
  public double limitPerMetreMm() {
    return limitPerMetreMm;
  }
}
