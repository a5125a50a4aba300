package org.bracewalk.ui.walk;

import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelFinding;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PanelState;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;

/**
 * What the plane holds so far: the latest mark of each panel, its finding, and the effective
 * members both ways the live verdict counts them. One job: the state of the marks. The walk-round
 * keeps two: the marks as shown (each at once, at the key press; a record id of 0 until stored)
 * and the marks as stored (as the record confirms them), from which the live verdict is drawn.
 */
final class MarkedPanels {
  private final PlaneDesign design;
  private final Map<PanelRef, RecordedMark> latest = new LinkedHashMap<>();
  /** The finding of each marked panel, kept in step with {@code latest}. */
  private final Map<PanelRef, PanelFinding> findings = new HashMap<>();
  /** Effective members, panels not inspected counted as missing (the conservative state). */
  private final Map<PanelRef, Brace> conservativeMembers = new HashMap<>();
  /** Effective members, panels not inspected taken as designed (what the marks so far prove). */
  private final Map<PanelRef, Brace> seenMembers = new HashMap<>();

  /** @param existing the latest mark of each panel already recorded (each within the grid) */
  MarkedPanels(PlaneDesign design, List<RecordedMark> existing) {
    this.design = design;
    for (RecordedMark r : existing) {
      design.grid().requireContains(r.panel());
      latest.put(r.panel(), r);
    }
    PlaneGrid g = design.grid();
    for (int i = 1; i <= g.lifts(); i++) {
      for (int j = 1; j <= g.bays(); j++) {
        PanelRef p = new PanelRef(i, j);
        RecordedMark r = latest.get(p);
        updatePanel(p, r == null ? null : r.mark().finding());
      }
    }
  }

  /** The latest mark of {@code p}, or null. */
  RecordedMark latest(PanelRef p) {
    return latest.get(p);
  }

  /** True when {@code p} holds a mark that is not "not inspected". */
  boolean isMarked(PanelRef p) {
    RecordedMark r = latest.get(p);
    return r != null && r.mark().state() != PanelState.NOT_INSPECTED;
  }

  /** {@code made} is now the latest record of {@code p}, holding {@code mark}. */
  void put(PanelRef p, RecordedMark made, Mark mark) {
    latest.put(p, made);
    updatePanel(p, mark.finding());
  }

  /** {@code p} holds what {@code r} holds, or nothing when {@code r} is null (a mark not stored is taken back). */
  void reset(PanelRef p, RecordedMark r) {
    if (r == null) {
      latest.remove(p);
      updatePanel(p, null);
    } else {
      put(p, r, r.mark());
    }
  }

  /** The finding of each panel with a mark (withdrawn marks excluded), live. */
  Map<PanelRef, PanelFinding> findingMap() {
    return findings;
  }

  Map<PanelRef, Brace> conservativeMembers() {
    return conservativeMembers;
  }

  Map<PanelRef, Brace> seenMembers() {
    return seenMembers;
  }

  /**
   * Brings the finding and both member maps of one panel up to date. Follows the rule of {@link
   * AsBuiltPlane#fromFindings} (a test holds the two together): sound or damaged-effective carries
   * the member found or else the design's; any other inspected state only the member found; a panel
   * not inspected nothing (conservative) or its design brace (as seen so far).
   */
  private void updatePanel(PanelRef p, PanelFinding f) {
    if (f == null || f.state() == PanelState.NOT_INSPECTED) {
      findings.remove(p);
    } else {
      findings.put(p, f);
    }
    Brace designed = design.braceAt(p);
    Brace member;
    boolean inspected = f != null && f.state().inspected();
    if (!inspected) {
      member = null;
    } else if (f.state() == PanelState.SOUND || f.state() == PanelState.DAMAGED_EFFECTIVE) {
      member = f.memberFound() != null ? f.memberFound() : designed;
    } else {
      member = f.memberFound();
    }
    put(conservativeMembers, p, member);
    put(seenMembers, p, inspected ? member : designed);
  }

  private static void put(Map<PanelRef, Brace> map, PanelRef p, Brace b) {
    if (b == null) {
      map.remove(p);
    } else {
      map.put(p, b);
    }
  }
}
