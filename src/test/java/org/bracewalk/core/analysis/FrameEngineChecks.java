package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;

/**
 * The engine's answer on one state against {@link FrameOracle} (the exact rank of the rigidity
 * matrix: L. Asimow, B. Roth, Trans. AMS 245 (1978)). Shared by the frame cross-checks.
 */
final class FrameEngineChecks {
  private FrameEngineChecks() {}

  /**
   * Degrees of freedom, verdict (rigid members only), moving joints (pinned base: a joint moves iff
   * its velocity is nonzero in some null vector), and the freedoms' counts adding up to the degrees
   * of freedom. Returns the engine's analysis for further checks.
   */
  static StateAnalysis assertVerdictMatches(PlaneAnalyzer engine, BuiltFrame state) {
    String plane = FramePlanes.describe(state);
    FrameOracle oracle = FrameOracle.of(state);
    int expected = oracle.freedoms();
    StateAnalysis a = engine.analyseState(state);
    // Asimow & Roth 1978: freedoms = 2V' - rank (pinned base), 2V - 3 - rank (free), exact rank
    assertThat(a.degreesOfFreedom()).as("degrees of freedom of" + plane).isEqualTo(expected);
    if (!oracle.hasCables()) {
      assertThat(a.rigid()).as("verdict of" + plane).isEqualTo(expected == 0);
      assertThat(a.oneWayOnly()).as("oneWayOnly of" + plane).isFalse();
    }
    if (expected > 0) {
      assertThat(a.rigid()).as("verdict of" + plane).isFalse();
    }
    assertThat(a.frameComplete()).as("frameComplete of" + plane).isEqualTo(state.frameComplete());
    if (!state.frameComplete()) {
      assertThat(a.blocks()).as("blocks of an incomplete frame (analysis API: empty) in" + plane)
          .isEmpty();
    }
    if (oracle.pinned()) {
      // null space of the exact matrix: a joint stays put iff both unit vectors are in the row space
      assertThat(a.movingJoints()).as("moving joints of" + plane)
          .containsExactlyElementsOf(oracle.movingJoints());
    } else {
      assertThat(a.movingJoints()).as("moving joints of a free plane (listed for a pinned base only)"
          + plane).isEmpty();
    }
    int sum = 0;
    for (Freedom f : a.freedoms()) {
      sum += f.count();
    }
    assertThat(sum).as("freedoms' counts against the degrees of freedom of" + plane + a.freedoms())
        .isEqualTo(expected);
    return a;
  }

  /**
   * The kinds of freedom (Freedom's javadoc, analysis.md "Frame members"), checked against the
   * framework: a LOOSE_END or LOST_RESTRAINT counts 1 at one joint; a loose end names the one member
   * holding it, present and ending there; a lost restraint names two or more members that are there
   * and run in one straight line through the joint. Where the reading is beyond doubt (pinned base)
   * it must be found: a joint held by one member whose other end stays put is a loose end, and a
   * joint whose only members are two in one straight line, both other ends staying put, has lost
   * its sideways restraint. With a pinned base every joint a freedom names moves, and every moving
   * joint is named by some freedom.
   */
  static void assertKindsMatch(StateAnalysis a, BuiltFrame state) {
    String plane = FramePlanes.describe(state);
    FrameOracle oracle = FrameOracle.of(state);
    Map<Integer, List<FrameOracle.Bar>> at = oracle.barsAtJoints();
    TreeSet<Joint> loose = new TreeSet<>();
    TreeSet<Joint> straight = new TreeSet<>();
    TreeSet<Joint> named = new TreeSet<>();
    for (Freedom f : a.freedoms()) {
      String what = f + " in" + plane;
      named.addAll(f.joints());
      if (f.kind() == FreedomKind.SWAY) {
        continue;
      }
      assertThat(f.count()).as("count of " + what).isEqualTo(1);
      assertThat(f.joints()).as("joints of " + what).hasSize(1);
      Joint j = f.joints().get(0);
      List<FrameOracle.Bar> listed = listedBars(oracle, state, f, what);
      if (f.kind() == FreedomKind.LOOSE_END) {
        loose.add(j);
        assertThat(listed).as("the one member holding the loose end " + what).hasSize(1);
        FrameOracle.Bar b = listed.get(0);
        assertThat(oracle.jointOf(b.a()).equals(j) || oracle.jointOf(b.b()).equals(j))
            .as(b + " ends at the loose end " + what).isTrue();
      } else {
        straight.add(j);
        assertThat(listed).as("the members running through " + what).hasSizeGreaterThanOrEqualTo(2);
        for (FrameOracle.Bar b : listed) {
          assertThat(oracle.onLine(b, oracle.joint(j)))
              .as(b + " on one straight line through the joint of " + what).isTrue();
        }
      }
    }
    if (oracle.pinned()) {
      java.util.Set<Joint> moving = new java.util.HashSet<>(oracle.movingJoints());
      for (Joint j : oracle.looseEnds()) {
        FrameOracle.Bar b = at.get(oracle.joint(j)).get(0);
        int other = b.a() == oracle.joint(j) ? b.b() : b.a();
        if (!moving.contains(oracle.jointOf(other))) {
          assertThat(loose).as("loose ends of" + plane).contains(j);
        }
      }
      for (Joint j : oracle.straightThroughJoints()) {
        boolean othersHeld = true;
        for (FrameOracle.Bar b : at.get(oracle.joint(j))) {
          int other = b.a() == oracle.joint(j) ? b.b() : b.a();
          othersHeld &= !moving.contains(oracle.jointOf(other));
        }
        if (othersHeld) {
          assertThat(straight).as("joints without sideways restraint of" + plane).contains(j);
        }
      }
      assertThat(named).as("joints named by the freedoms of" + plane)
          .containsExactlyElementsOf(a.movingJoints());
    }
  }

  /**
   * The bars of the members a freedom names; for a named panel, its diagonal that is there and runs
   * on a line through the freedom's joint.
   */
  private static List<FrameOracle.Bar> listedBars(FrameOracle o, BuiltFrame state, Freedom f, String what) {
    int j = o.joint(f.joints().get(0));
    List<FrameOracle.Bar> out = new ArrayList<>();
    for (FrameRef m : f.members()) {
      assertThat(state.absentFrame()).as(m + " named by " + what + " is there").doesNotContain(m);
      out.add(o.frameBar(m));
    }
    for (PanelRef p : f.diagonals()) {
      assertThat(state.braces()).as("a diagonal in " + p + " named by " + what).containsKey(p);
      org.bracewalk.core.model.Brace b = state.braces().get(p);
      List<FrameOracle.Bar> through = new ArrayList<>();
      if (b.diagonal().hasRising() && o.onLine(o.diagonalBar(p, true, false), j)) {
        through.add(o.diagonalBar(p, true, !b.isRigid()));
      }
      if (b.diagonal().hasFalling() && o.onLine(o.diagonalBar(p, false, false), j)) {
        through.add(o.diagonalBar(p, false, !b.isRigid()));
      }
      assertThat(through).as("the diagonal in " + p + " named by " + what + " runs through its joint")
          .isNotEmpty();
      out.add(through.get(0));
    }
    return out;
  }

  /**
   * Critical members and braces by removal and rank: a member is critical iff its loss alone adds
   * a freedom (check-contract.md, "Frame members"), found by removing each member and taking the
   * exact rank again. That is a coloop of the row matroid (analysis.md) that leaves no joint bare.
   */
  static void assertCriticalMatch(StateAnalysis a, BuiltFrame state) {
    assertCriticalMatch(a, state, FrameOracle.of(state).criticalByRemoval());
  }

  /** The same with the critical bars given (say by the faster stress route). */
  static void assertCriticalMatch(StateAnalysis a, BuiltFrame state, List<FrameOracle.Bar> critical) {
    String plane = FramePlanes.describe(state);
    TreeSet<FrameRef> members = new TreeSet<>();
    TreeSet<PanelRef> panels = new TreeSet<>();
    for (FrameOracle.Bar b : critical) {
      if (b.frame() != null) {
        members.add(b.frame());
      } else {
        panels.add(b.panel());
      }
    }
    assertThat(a.criticalMembers()).as("critical frame members of" + plane)
        .containsExactlyElementsOf(members);
    assertThat(a.criticalBraces()).as("critical braces of" + plane)
        .containsExactlyElementsOf(panels);
  }

  /**
   * Each freedom's motion keeps every member's length to first order (the rigidity matrix times the
   * velocities vanishes), is scaled to a largest velocity of 1, holds the base of a pinned plane,
   * leaves joints with no member at rest, moves the joints the freedom names, and is not a rigid
   * motion of the whole plane.
   */
  static void assertMotionsMatch(PlaneAnalyzer engine, StateAnalysis a, BuiltFrame state) {
    String plane = FramePlanes.describe(state);
    FrameOracle oracle = FrameOracle.of(state);
    boolean[] present = oracle.present();
    for (Freedom f : a.freedoms()) {
      String where = " of " + f + " in" + plane;
      Optional<JointMotion> m = engine.motion(state, f);
      assertThat(m).as("motion" + where).isPresent();
      JointMotion motion = m.orElseThrow();
      int n = oracle.jointCount();
      double[] dx = new double[n];
      double[] dy = new double[n];
      double largest = 0;
      for (int v = 0; v < n; v++) {
        Joint j = oracle.jointOf(v);
        dx[v] = motion.dx(j.level(), j.line());
        dy[v] = motion.dy(j.level(), j.line());
        largest = Math.max(largest, Math.hypot(dx[v], dy[v]));
        if (!oracle.movable(v) || !present[v]) {
          assertThat(motion.moves(j.level(), j.line()))
              .as(j + " (held or carrying no member) moves in the motion" + where).isFalse();
        }
      }
      assertThat(largest).as("largest velocity" + where).isCloseTo(1.0, org.assertj.core.data.Offset.offset(1e-9));
      assertThat(oracle.largestRelativeStretch(dx, dy)).as("member stretch rate" + where)
          .isLessThan(1e-9);
      if (f.kind() != FreedomKind.SWAY) {
        for (Joint j : f.joints()) {
          assertThat(motion.moves(j.level(), j.line())).as(j + " moves" + where).isTrue();
        }
      } else {
        assertThat(f.joints()).as("joints" + where)
            .anyMatch(j -> motion.moves(j.level(), j.line()));
      }
      if (!oracle.pinned()) {
        assertThat(largestDistanceRate(oracle, dx, dy)).as("a change of shape, not a rigid motion" + where)
            .isGreaterThan(1e-6);
      }
    }
  }

  /** The largest first-order change of the distance between two joints carrying members. */
  private static double largestDistanceRate(FrameOracle o, double[] dx, double[] dy) {
    boolean[] present = o.present();
    List<Integer> joints = new ArrayList<>();
    for (int v = 0; v < present.length; v++) {
      if (present[v]) {
        joints.add(v);
      }
    }
    double worst = 0;
    for (int s = 0; s < joints.size(); s++) {
      for (int t = s + 1; t < joints.size(); t++) {
        int p = joints.get(s);
        int q = joints.get(t);
        double ex = (o.x(p) - o.x(q)) / 100.0;
        double ey = (o.y(p) - o.y(q)) / 100.0;
        double rate = (ex * (dx[p] - dx[q]) + ey * (dy[p] - dy[q])) / Math.hypot(ex, ey);
        worst = Math.max(worst, Math.abs(rate));
      }
    }
    return worst;
  }
}
