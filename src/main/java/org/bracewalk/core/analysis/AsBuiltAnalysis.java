package org.bracewalk.core.analysis;

import java.util.List;

/**
 * The as-built state compared with the design.
 *
 * @param state the conservative verdict: panels not inspected count as missing
 * @param unknownPanels how many panels nobody has looked at
 * @param rigidIfUnknownSound the verdict with the uninspected panels counted as built to design
 * @param extraBraces as-built members the design does not have (they count: they are there)
 * @param unknownFrameMembers how many frame members are recorded as not inspected; {@code
 *     rigidIfUnknownSound} takes them as designed too
 */
public record AsBuiltAnalysis(
    StateAnalysis state,
    int unknownPanels,
    boolean rigidIfUnknownSound,
    List<PlacedBrace> extraBraces,
    int unknownFrameMembers) {

  /** An as-built analysis with no frame member recorded as not inspected. */
  public AsBuiltAnalysis(
      StateAnalysis state, int unknownPanels, boolean rigidIfUnknownSound, List<PlacedBrace> extraBraces) {
    this(state, unknownPanels, rigidIfUnknownSound, extraBraces, 0);
  }

  public AsBuiltAnalysis {
    extraBraces = List.copyOf(extraBraces);
  }

  /** Panels and frame members nobody has looked at. */
  public int unknownItems() {
    return unknownPanels + unknownFrameMembers;
  }

  /** True when the verdict shown would change if the uninspected panels turned out sound. */
  public boolean verdictDependsOnUninspected() {
    return (unknownPanels > 0 || unknownFrameMembers > 0) && state.rigid() != rigidIfUnknownSound;
  }
}
