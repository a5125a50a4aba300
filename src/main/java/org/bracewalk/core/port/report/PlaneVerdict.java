package org.bracewalk.core.port.report;

import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.StateAnalysis;

/**
 * A plane's verdict in the three cases a reader must tell apart. Never "safe": holding its shape
 * is a statement about bracing continuity only.
 */
public enum PlaneVerdict {
  /** The analysed state is rigid (panels not inspected counted as missing). */
  HOLDS_SHAPE("holds-shape"),
  /** The analysed state is not rigid, whatever the uninspected panels turn out to be. */
  LOST_RIGIDITY("lost-rigidity"),
  /** Not rigid as shown, but rigid if the panels nobody has looked at are sound. */
  DEPENDS_ON_UNINSPECTED("depends-on-uninspected");

  private final String code;

  PlaneVerdict(String code) {
    this.code = code;
  }

  public String code() {
    return code;
  }

  /** The verdict on the analysed state of a plane (as built when known, else as designed). */
  public static PlaneVerdict of(PlaneAnalysis analysis) {
    StateAnalysis state = analysis.analysedState();
    if (state.rigid()) {
      return HOLDS_SHAPE;
    }
    boolean depends = analysis.asBuilt().map(AsBuiltAnalysis::verdictDependsOnUninspected).orElse(false);
    return depends ? DEPENDS_ON_UNINSPECTED : LOST_RIGIDITY;
  }
}
