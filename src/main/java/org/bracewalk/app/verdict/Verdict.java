package org.bracewalk.app.verdict;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import org.bracewalk.core.analysis.AsBuiltAnalysis;
import org.bracewalk.core.analysis.Block;
import org.bracewalk.core.analysis.Freedom;
import org.bracewalk.core.analysis.FreedomKind;
import org.bracewalk.core.analysis.PlaneAnalysis;
import org.bracewalk.core.analysis.StateAnalysis;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.PlaneRole;
import org.bracewalk.core.model.Support;

/**
 * The one verdict on one plane: every screen, command and document shows this, in words from
 * {@link VerdictKind}, {@link KeepOffZone#where()} and {@link Cautions}. Computed only here.
 *
 * <p>Rules:
 *
 * <ul>
 *   <li>the kind is decided on the conservative state (panels and frame members not inspected
 *       counted as missing): rigid: holds its shape; not rigid but rigid with those as designed:
 *       depends on what is not inspected; otherwise sways one way only (no free motion with
 *       tension-only members taken as rigid), lost sideways restraint (every freedom is a joint
 *       where a member runs straight through unheld, see {@link
 *       org.bracewalk.core.analysis.FreedomKind#LOST_RESTRAINT}), or lost rigidity (anything that
 *       sways, and loose ends);
 *   <li>the keep-off zone, whenever the conservative state is not rigid (so for "depends on panels
 *       not inspected" it is the worst case: every such panel missing): on a pinned base, the
 *       lowest lift that can move and every lift above it, since the lifts above are carried
 *       sideways ({@code shared/design/analysis.md}): where the frame is complete, the lowest lift
 *       of a block not held by the base; where it is not (no blocks), the lowest level of a joint
 *       of any freedom (a sway's moving joints, a joint without sideways restraint, a loose end),
 *       lift 1 for a joint at the base; on a free plane, or when the plane leans one way only (the
 *       engine names no block), every lift; always every bay; and for an upright frame the beam
 *       bays on both sides too.
 * </ul>
 *
 * @param kind the verdict
 * @param degreesOfFreedom independent motions of the conservative state (tension-only as rigid)
 * @param unknownPanels panels nobody has looked at
 * @param role the plane's role in its structure
 * @param keepOffZone where to keep people and loads off; absent when nothing need be kept off
 * @param freedoms the conservative state's freedoms told apart by kind (empty where the engine
 *     lists none); put them into words with {@link #freedomWords(Set)}
 * @param unknownFrameMembers frame members nobody has looked at
 */
public record Verdict(
    VerdictKind kind,
    int degreesOfFreedom,
    int unknownPanels,
    PlaneRole role,
    Optional<KeepOffZone> keepOffZone,
    List<Freedom> freedoms,
    int unknownFrameMembers) {

  /** A verdict with no freedoms listed and every frame member inspected. */
  public Verdict(
      VerdictKind kind, int degreesOfFreedom, int unknownPanels, PlaneRole role,
      Optional<KeepOffZone> keepOffZone) {
    this(kind, degreesOfFreedom, unknownPanels, role, keepOffZone, List.of(), 0);
  }

  public Verdict {
    Objects.requireNonNull(kind, "kind");
    Objects.requireNonNull(role, "role");
    Objects.requireNonNull(keepOffZone, "keepOffZone");
    freedoms = List.copyOf(freedoms);
  }

  /** The verdict on the analysed state of a plane (as built when known, else as designed). */
  public static Verdict of(PlaneAnalysis analysis, PlaneRole role) {
    return of(analysis, role, true);
  }

  /**
   * The verdict on a plane of an inspection. {@code recorded} is false when the inspection holds
   * no observation on the plane at all: then the kind is "not yet inspected", while the zone stays
   * the worst case (every panel counted as missing), since nobody has looked.
   */
  public static Verdict of(PlaneAnalysis analysis, PlaneRole role, boolean recorded) {
    Verdict v = classifyAnalysis(analysis, role);
    return recorded ? v
        : new Verdict(VerdictKind.NOT_INSPECTED, v.degreesOfFreedom, v.unknownPanels, role, v.keepOffZone,
            v.freedoms, v.unknownFrameMembers);
  }

  private static Verdict classifyAnalysis(PlaneAnalysis analysis, PlaneRole role) {
    Optional<AsBuiltAnalysis> ab = analysis.asBuilt();
    return classify(
        analysis.grid(),
        role,
        analysis.analysedState(),
        ab.map(AsBuiltAnalysis::unknownPanels).orElse(0),
        ab.map(AsBuiltAnalysis::unknownFrameMembers).orElse(0),
        ab.map(AsBuiltAnalysis::rigidIfUnknownSound).orElse(analysis.analysedState().rigid()));
  }

  /** As below, with every frame member inspected. */
  public static Verdict classify(
      PlaneGrid grid,
      PlaneRole role,
      StateAnalysis conservative,
      int unknownPanels,
      boolean rigidIfUnknownSound) {
    return classify(grid, role, conservative, unknownPanels, 0, rigidIfUnknownSound);
  }

  /**
   * The verdict from the conservative state alone (the walk-round has no repair plan per key).
   *
   * @param conservative the state with panels not inspected counted as missing
   * @param unknownPanels how many panels nobody has looked at
   * @param unknownFrameMembers how many frame members nobody has looked at
   * @param rigidIfUnknownSound whether the plane is rigid with those panels and members as designed
   */
  public static Verdict classify(
      PlaneGrid grid,
      PlaneRole role,
      StateAnalysis conservative,
      int unknownPanels,
      int unknownFrameMembers,
      boolean rigidIfUnknownSound) {
    VerdictKind kind;
    if (conservative.rigid()) {
      kind = VerdictKind.HOLDS;
    } else if (unknownPanels + unknownFrameMembers > 0 && rigidIfUnknownSound) {
      kind = VerdictKind.DEPENDS_ON_UNSEEN;
    } else if (conservative.degreesOfFreedom() == 0) {
      kind = VerdictKind.SWAYS_ONE_WAY;
    } else if (onlyLostRestraint(conservative)) {
      kind = VerdictKind.LOST_RESTRAINT;
    } else {
      kind = VerdictKind.LOST;
    }
    return new Verdict(kind, conservative.degreesOfFreedom(), unknownPanels, role,
        zone(grid, role, conservative), conservative.freedoms(), unknownFrameMembers);
  }

  /** Every freedom is a joint without sideways restraint, and they account for all of them. */
  private static boolean onlyLostRestraint(StateAnalysis s) {
    return !s.freedoms().isEmpty()
        && s.freedoms().stream().allMatch(f -> f.kind() == FreedomKind.LOST_RESTRAINT)
        && s.freedomsOf(FreedomKind.LOST_RESTRAINT) == s.degreesOfFreedom();
  }

  /**
   * The freedoms in words, one sentence each, in the plane's trade words ({@link Terms#of(PlaneRole)}):
   * see {@link Wording#freedom(Freedom, Terms, Set)}.
   *
   * @param absent frame members not there as analysed (to name them beside a joint), or empty
   */
  public List<String> freedomWords(Set<FrameRef> absent) {
    List<String> out = new ArrayList<>();
    for (Freedom f : freedoms) {
      out.add(Wording.freedom(f, Terms.of(role), absent));
    }
    return out;
  }

  /** Whether any freedom is a joint without sideways restraint (then say {@link Wording#LOST_RESTRAINT_NOTE}). */
  public boolean anyLostRestraint() {
    return freedoms.stream().anyMatch(f -> f.kind() == FreedomKind.LOST_RESTRAINT);
  }

  /** A plane nothing has been recorded for: no verdict yet, and no zone. */
  public static Verdict notInspected(PlaneGrid grid, PlaneRole role) {
    return new Verdict(VerdictKind.NOT_INSPECTED, 0, grid.panelCount(), role, Optional.empty());
  }

  /** The keep-off zone of a state (absent when it is rigid). */
  static Optional<KeepOffZone> zone(PlaneGrid grid, PlaneRole role, StateAnalysis s) {
    if (s.rigid()) {
      return Optional.empty();
    }
    int lowest = lowestSwayingLift(grid, s);
    List<Integer> lifts = new ArrayList<>();
    for (int i = lowest; i <= grid.lifts(); i++) {
      lifts.add(i);
    }
    List<Integer> bays = new ArrayList<>();
    for (int j = 1; j <= grid.bays(); j++) {
      bays.add(j);
    }
    return Optional.of(new KeepOffZone(lifts, bays, role == PlaneRole.UPRIGHT_FRAME));
  }

  /**
   * The lowest lift that can sway: on a pinned base the lowest lift outside the block held by the
   * base, or where the frame is incomplete (no blocks) the lowest level of a joint of any freedom
   * (of a moving joint when no freedom is listed), at least 1; 1 on a free plane, when it leans one
   * way only, or when no block is held and no joint is named.
   */
  public static int lowestSwayingLift(PlaneGrid grid, StateAnalysis s) {
    if (grid.support() == Support.PINNED_BASE && !s.oneWayOnly()
        && (!s.frameComplete() || s.blocks().isEmpty())) {
      return lowestMovingLift(s);
    }
    boolean anyFixed = s.blocks().stream().anyMatch(Block::fixed);
    if (grid.support() != Support.PINNED_BASE || !anyFixed || s.oneWayOnly()) {
      return 1;
    }
    int lowest = Integer.MAX_VALUE;
    for (Block b : s.blocks()) {
      if (!b.fixed()) {
        for (int lift : b.lifts()) {
          lowest = Math.min(lowest, lift);
        }
      }
    }
    return lowest == Integer.MAX_VALUE ? 1 : lowest;
  }

  /** The lowest level of a joint of any freedom (else of a moving joint), at least 1. */
  private static int lowestMovingLift(StateAnalysis s) {
    int lowest = Integer.MAX_VALUE;
    for (Freedom f : s.freedoms()) {
      for (Joint j : f.joints()) {
        lowest = Math.min(lowest, j.level());
      }
    }
    if (lowest == Integer.MAX_VALUE) {
      for (Joint j : s.movingJoints()) {
        lowest = Math.min(lowest, j.level());
      }
    }
    return lowest == Integer.MAX_VALUE ? 1 : Math.max(1, lowest);
  }

  /** {@code ▲ Lost rigidity}. */
  public String headline() {
    return kind.headline();
  }

  /**
   * What to do about the zone, or empty when nothing need be kept off: {@code Keep people and
   * loads off lifts 3-5, bays 1-5 until a competent person has acted.}
   */
  public String keepOff() {
    return keepOffZone.map(Cautions::keepOff).orElse("");
  }
}
