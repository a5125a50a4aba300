package org.bracewalk.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.ejml.data.DMatrixRMaj;
import org.ejml.dense.row.SingularOps_DDRM;
import org.ejml.dense.row.factory.DecompositionFactory_DDRM;
import org.ejml.interfaces.decomposition.SingularValueDecomposition_F64;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * An acceptance check of {@code check}'s frame section (shared/design/check-contract.md, "Frame
 * members") from outside the engine: planes written here as panel maps (not the repository's
 * examples), run through the launcher, and every JSON answer compared with the rigidity matrix of
 * the bar-and-joint framework of the members that are there, ranked here with EJML's singular value
 * decomposition (L. Asimow, B. Roth, "The rigidity of graphs", Trans. AMS 245 (1978); pinned base:
 * base joints' columns dropped, freedoms {@code 2V' - rank}; free: {@code 2V - 3 - rank}; a joint
 * with no member is left out, as in analysis.md). The tolerance is EJML's default for {@code
 * SingularOps_DDRM.rank}; the planes are at most 4 x 4 with whole-centimetre dimensions, so the
 * singular values are far from it. Critical members are found by removal (does the loss alone add
 * a freedom, the contract's words); the proposed repair is applied and ranked again.
 *
 * <p>The cases here are those not already in {@link CheckCommandFrameTest} (the examples of
 * analysis.md) or the engine-level cross-checks: odd shapes, the support override changing what a
 * base ledger means, the contract surface (map in, JSON out) on seeded random planes with frame
 * damage, and malformed frame lines not covered elsewhere.
 */
class CheckFrameAcceptanceTest {
  private static final double[] WIDTHS = {1.2, 1.8, 2.4, 2.5, 3.0};
  private static final double[] HEIGHTS = {1.5, 2.0, 2.5};

  @TempDir Path dir;

  /** The launcher's answer, as {@link CheckCommandFrameTest} runs it. */
  private static CheckCommandFrameTest.Run run(String... args) {
    return CheckCommandFrameTest.run(args);
  }

  private Path map(String name, String text) throws IOException {
    return Files.writeString(dir.resolve(name), text);
  }

  /** A frame member as the contract names it: {@code L level bay} or {@code S lift line}. */
  record Member(char kind, int a, int b) implements Comparable<Member> {
    static Member of(JsonNode o) {
      return o.get("member").asText().equals("ledger")
          ? new Member('L', o.get("level").asInt(), o.get("bay").asInt())
          : new Member('S', o.get("lift").asInt(), o.get("line").asInt());
    }

    String line(String state) {
      return (kind == 'L' ? "ledger " : "standard ") + a + " " + b + " " + state;
    }

    @Override
    public int compareTo(Member o) {
      // the contract's order: ledgers first, then by the two numbers
      return kind != o.kind ? Character.compare(kind, o.kind)
          : a != o.a ? Integer.compare(a, o.a) : Integer.compare(b, o.b);
    }

    @Override
    public String toString() {
      return line("").strip();
    }
  }

  /**
   * One plane as this test sees it: dimensions, the diagonal tokens (rigid only: . / \ X), and the
   * frame members that are not there. Knows nothing of the engine.
   */
  static final class Plane {
    final int lifts;
    final int bays;
    final boolean pinned;
    final double[] widths;
    final double[] heights;
    final Map<Long, String> panels = new HashMap<>(); // key lift * 100 + bay
    final Set<Member> absent = new HashSet<>();

    Plane(int lifts, int bays, boolean pinned, double[] widths, double[] heights) {
      this.lifts = lifts;
      this.bays = bays;
      this.pinned = pinned;
      this.widths = widths;
      this.heights = heights;
    }

    Plane copy() {
      Plane p = new Plane(lifts, bays, pinned, widths, heights);
      p.panels.putAll(panels);
      p.absent.addAll(absent);
      return p;
    }

    String token(int lift, int bay) {
      return panels.getOrDefault(lift * 100L + bay, ".");
    }

    static List<Member> frame(int lifts, int bays) {
      List<Member> out = new ArrayList<>();
      for (int i = 0; i <= lifts; i++) {
        for (int j = 1; j <= bays; j++) {
          out.add(new Member('L', i, j));
        }
      }
      for (int i = 1; i <= lifts; i++) {
        for (int j = 0; j <= bays; j++) {
          out.add(new Member('S', i, j));
        }
      }
      return out;
    }

    /** Bars as {name, level1, line1, level2, line2}; name a Member or "D lift bay /" or "\". */
    List<Object[]> bars(Set<Object> leaveOut) {
      List<Object[]> out = new ArrayList<>();
      for (Member f : frame(lifts, bays)) {
        if (absent.contains(f) || leaveOut.contains(f)) {
          continue;
        }
        out.add(f.kind == 'L'
            ? new Object[] {f, f.a, f.b - 1, f.a, f.b}
            : new Object[] {f, f.a - 1, f.b, f.a, f.b});
      }
      for (int i = 1; i <= lifts; i++) {
        for (int j = 1; j <= bays; j++) {
          String t = token(i, j);
          String up = "D " + i + " " + j + " /";
          String down = "D " + i + " " + j + " \\";
          if ((t.equals("/") || t.equals("X")) && !leaveOut.contains(up)) {
            out.add(new Object[] {up, i - 1, j - 1, i, j});
          }
          if ((t.equals("\\") || t.equals("X")) && !leaveOut.contains(down)) {
            out.add(new Object[] {down, i, j - 1, i - 1, j});
          }
        }
      }
      return out;
    }

    double x(int line) {
      double s = 0;
      for (int j = 0; j < line; j++) {
        s += widths[j];
      }
      return s;
    }

    double y(int level) {
      double s = 0;
      for (int i = 0; i < level; i++) {
        s += heights[i];
      }
      return s;
    }

    /** Freedoms and moving joints from the rigidity matrix (EJML SVD). */
    Answer analyse(Set<Object> leaveOut) {
      List<Object[]> bars = bars(leaveOut);
      TreeSet<Long> carrying = new TreeSet<>();
      for (Object[] b : bars) {
        carrying.add((int) b[1] * 1000L + (int) b[2]);
        carrying.add((int) b[3] * 1000L + (int) b[4]);
      }
      List<Long> joints = new ArrayList<>();
      for (long j : carrying) {
        if (!(pinned && j / 1000 == 0)) {
          joints.add(j);
        }
      }
      Map<Long, Integer> column = new HashMap<>();
      for (int k = 0; k < joints.size(); k++) {
        column.put(joints.get(k), 2 * k);
      }
      if (joints.isEmpty()) {
        return new Answer(0, List.of());
      }
      DMatrixRMaj a = new DMatrixRMaj(Math.max(1, bars.size()), 2 * joints.size());
      for (int r = 0; r < bars.size(); r++) {
        Object[] b = bars.get(r);
        long p = (int) b[1] * 1000L + (int) b[2];
        long q = (int) b[3] * 1000L + (int) b[4];
        double dx = x((int) b[2]) - x((int) b[4]);
        double dy = y((int) b[1]) - y((int) b[3]);
        if (column.containsKey(p)) {
          a.set(r, column.get(p), dx);
          a.set(r, column.get(p) + 1, dy);
        }
        if (column.containsKey(q)) {
          a.set(r, column.get(q), -dx);
          a.set(r, column.get(q) + 1, -dy);
        }
      }
      SingularValueDecomposition_F64<DMatrixRMaj> svd =
          DecompositionFactory_DDRM.svd(a.numRows, a.numCols, false, true, false);
      assertThat(svd.decompose(a.copy())).isTrue();
      int rank = SingularOps_DDRM.rank(svd);
      int freedoms = 2 * joints.size() - (pinned ? 0 : 3) - rank;
      List<String> moving = new ArrayList<>();
      if (pinned && freedoms > 0) {
        DMatrixRMaj nullSpace = SingularOps_DDRM.nullSpace(svd, null, SingularOps_DDRM.singularThreshold(svd));
        for (int k = 0; k < joints.size(); k++) {
          boolean moves = false;
          for (int c = 0; c < nullSpace.numCols; c++) {
            moves |= Math.abs(nullSpace.get(2 * k, c)) > 1e-8 || Math.abs(nullSpace.get(2 * k + 1, c)) > 1e-8;
          }
          if (moves) {
            moving.add(joints.get(k) / 1000 + "/" + joints.get(k) % 1000);
          }
        }
      }
      return new Answer(freedoms, moving);
    }

    /**
     * Pinned planes with tension-only members (every diagonal here a cable): whether some
     * first-order motion keeps every frame member's length and shortens a cable without
     * lengthening any (B. Roth, W. Whiteley, "Tensegrity frameworks", Trans. AMS 265 (1981)): the
     * least sum of the cables' length rates, with every coordinate rate in [-1, 1], by the simplex
     * method of commons-math3; below zero iff a cable can go slack.
     */
    boolean someCableCanSlacken() {
      assertThat(pinned).isTrue();
      List<Object[]> bars = bars(Set.of());
      Map<Long, Integer> column = new HashMap<>();
      for (Object[] b : bars) {
        for (int e : new int[] {1, 3}) {
          long j = (int) b[e] * 1000L + (int) b[e + 1];
          if (j / 1000 > 0 && !column.containsKey(j)) {
            column.put(j, 2 * column.size());
          }
        }
      }
      int vars = 2 * column.size();
      double[] objective = new double[vars];
      List<LinearConstraint> constraints = new ArrayList<>();
      for (Object[] b : bars) {
        double[] row = new double[vars];
        long p = (int) b[1] * 1000L + (int) b[2];
        long q = (int) b[3] * 1000L + (int) b[4];
        double dx = x((int) b[2]) - x((int) b[4]);
        double dy = y((int) b[1]) - y((int) b[3]);
        if (column.containsKey(p)) {
          row[column.get(p)] = dx;
          row[column.get(p) + 1] = dy;
        }
        if (column.containsKey(q)) {
          row[column.get(q)] = -dx;
          row[column.get(q) + 1] = -dy;
        }
        if (b[0] instanceof String) { // a diagonal: a cable
          constraints.add(new LinearConstraint(row, Relationship.LEQ, 0));
          for (int k = 0; k < vars; k++) {
            objective[k] += row[k];
          }
        } else {
          constraints.add(new LinearConstraint(row, Relationship.EQ, 0));
        }
      }
      for (int k = 0; k < vars; k++) {
        double[] unit = new double[vars];
        unit[k] = 1;
        constraints.add(new LinearConstraint(unit, Relationship.LEQ, 1));
        constraints.add(new LinearConstraint(unit, Relationship.GEQ, -1));
      }
      PointValuePair best = new SimplexSolver().optimize(new MaxIter(100_000),
          new LinearObjectiveFunction(objective, 0), new LinearConstraintSet(constraints),
          GoalType.MINIMIZE, new NonNegativeConstraint(false));
      return best.getValue() < -1e-7;
    }

    /** Frame members whose loss alone adds a freedom (check-contract.md, criticalMembers). */
    List<Member> criticalMembers() {
      int base = analyse(Set.of()).freedoms();
      List<Member> out = new ArrayList<>();
      for (Member f : frame(lifts, bays)) {
        if (!absent.contains(f) && analyse(Set.of(f)).freedoms() > base) {
          out.add(f);
        }
      }
      return out;
    }

    /** Panels holding a diagonal whose loss alone adds a freedom (criticalBraces). */
    List<String> criticalBraces() {
      int base = analyse(Set.of()).freedoms();
      List<String> out = new ArrayList<>();
      for (int i = 1; i <= lifts; i++) {
        for (int j = 1; j <= bays; j++) {
          boolean critical = false;
          for (String way : List.of("/", "\\")) {
            String t = token(i, j);
            if ((t.equals(way) || t.equals("X"))
                && analyse(Set.of("D " + i + " " + j + " " + way)).freedoms() > base) {
              critical = true;
            }
          }
          if (critical) {
            out.add(i + "/" + j);
          }
        }
      }
      return out;
    }

    /** Adds a diagonal ({@code /}, {@code \} or {@code X}) to a panel. */
    void add(int lift, int bay, String diagonal) {
      String t = token(lift, bay);
      boolean up = t.equals("/") || t.equals("X") || diagonal.contains("/") || diagonal.equals("X");
      boolean down = t.equals("\\") || t.equals("X") || diagonal.contains("\\") || diagonal.equals("X");
      panels.put(lift * 100L + bay, up && down ? "X" : up ? "/" : down ? "\\" : ".");
    }

    String header() {
      StringBuilder sb = new StringBuilder("support: " + (pinned ? "pinned-base" : "free") + "\nwidths:");
      for (double w : widths) {
        sb.append(' ').append(String.format(Locale.ROOT, "%.1f", w));
      }
      sb.append("\nheights:");
      for (double h : heights) {
        sb.append(' ').append(String.format(Locale.ROOT, "%.1f", h));
      }
      return sb.append('\n').toString();
    }
  }

  record Answer(int freedoms, List<String> moving) {}

  private static List<String> joints(JsonNode array) {
    List<String> out = new ArrayList<>();
    array.forEach(j -> out.add(j.get("level").asInt() + "/" + j.get("line").asInt()));
    return out;
  }

  private static List<String> panels(JsonNode array) {
    List<String> out = new ArrayList<>();
    array.forEach(p -> out.add(p.get("lift").asInt() + "/" + p.get("bay").asInt()));
    return out;
  }

  private static List<Member> members(JsonNode array) {
    List<Member> out = new ArrayList<>();
    array.forEach(m -> out.add(Member.of(m)));
    return out;
  }

  /** A state of the JSON ({@code design} or {@code asBuilt}) against the plane's rigidity matrix. */
  private static void matchesTheMatrix(String what, JsonNode state, Plane plane) {
    Answer a = plane.analyse(Set.of());
    assertThat(state.get("degreesOfFreedom").asInt()).as(what + ": degreesOfFreedom").isEqualTo(a.freedoms());
    assertThat(state.get("rigid").asBoolean()).as(what + ": rigid").isEqualTo(a.freedoms() == 0);
    assertThat(joints(state.get("movingJoints"))).as(what + ": movingJoints").isEqualTo(a.moving());
    assertThat(members(state.get("criticalMembers"))).as(what + ": criticalMembers, by removal")
        .isEqualTo(plane.criticalMembers());
    if (!plane.absent.isEmpty()) {
      assertThat(panels(state.get("criticalBraces"))).as(what + ": criticalBraces, by removal")
          .isEqualTo(plane.criticalBraces());
      assertThat(state.get("blocks")).as(what + ": blocks on an incomplete frame").isEmpty();
    }
    int counted = 0;
    for (JsonNode f : state.get("freedoms")) {
      counted += f.get("count").asInt();
    }
    assertThat(counted).as(what + ": the freedoms' counts add up").isEqualTo(a.freedoms());
  }

  // ---------------------------------------------------------------- odd shapes, one member at a time

  static Stream<Arguments> oneMemberGone() {
    List<Arguments> out = new ArrayList<>();
    int[][] shapes = {{1, 1}, {1, 3}, {3, 1}};
    String[] fills = {"/", "X", "\\"};
    for (int[] s : shapes) {
      for (boolean pinned : new boolean[] {true, false}) {
        for (String fill : fills) {
          for (Member f : Plane.frame(s[0], s[1])) {
            out.add(Arguments.of(s[0], s[1], pinned, fill, f));
          }
        }
      }
    }
    return out.stream();
  }

  /**
   * 1 x 1, 1 x N and N x 1 planes, pinned and free, every panel braced alike, each frame member in
   * turn missing as built; the design, as built and the repair against the rigidity matrix.
   */
  @ParameterizedTest(name = "{0} x {1}, pinned {2}, {3} everywhere, {4} missing")
  @MethodSource("oneMemberGone")
  void everySingleFrameMemberMissingOnOddShapes(int lifts, int bays, boolean pinned, String fill, Member gone)
      throws IOException {
    Plane design = new Plane(lifts, bays, pinned, new double[bays], new double[lifts]);
    Arrays.fill(design.widths, 2.4);
    Arrays.fill(design.heights, 2.0);
    StringBuilder grid = new StringBuilder(design.header());
    for (int i = lifts; i >= 1; i--) {
      for (int j = 1; j <= bays; j++) {
        design.panels.put(i * 100L + j, fill);
        grid.append(j > 1 ? " " : "").append(fill);
      }
      grid.append('\n');
    }
    Plane built = design.copy();
    built.absent.add(gone);
    CheckCommandFrameTest.Run r = run("check", map("d.txt", grid.toString()).toString(),
        map("b.txt", grid + gone.line("missing") + "\n").toString(), "--format", "json");
    assertThat(r.err()).isEmpty();
    JsonNode v = r.json();
    matchesTheMatrix("design", v.get("design"), design);
    matchesTheMatrix("as built", v.get("asBuilt"), built);
    assertThat(r.code()).as("exit status").isEqualTo(built.analyse(Set.of()).freedoms() == 0 ? 0 : 1);
    repairHolds(v.get("repair"), design, built, Set.of());
  }

  /**
   * The proposed repair, applied to the as-built plane, leaves no freedom by the rigidity matrix;
   * with rigid members only its size is the freedoms (contract); it never uses an opening or a
   * member the design leaves out; and it uses the fewest items outside the design: the freedoms
   * less what the design's own missing members can add to the rank (greedy basis extension in a
   * linear matroid is optimal: W. Whiteley, Contemp. Math. 197 (1996)).
   */
  private static void repairHolds(JsonNode repair, Plane design, Plane built, Set<Long> openings) {
    int freedoms = built.analyse(Set.of()).freedoms();
    if (!repair.get("possible").asBoolean()) {
      // the contract: "possible: false when no set of allowed panels can make the plane rigid".
      // Every allowed item at once (every design frame member back, both diagonals in every panel
      // that is not an opening) must still leave a freedom, by the matrix.
      Plane everything = built.copy();
      everything.absent.retainAll(design.absent);
      for (int i = 1; i <= built.lifts; i++) {
        for (int j = 1; j <= built.bays; j++) {
          if (!openings.contains(i * 100L + j)) {
            everything.panels.put(i * 100L + j, "X");
          }
        }
      }
      assertThat(everything.analyse(Set.of()).freedoms())
          .as("possible: false, yet every allowed item added at once makes the plane rigid")
          .isPositive();
      return;
    }
    assertThat(repair.get("minimum").asInt()).as("minimum = freedoms")
        .isEqualTo(freedoms)
        .isEqualTo(repair.get("braces").size() + repair.get("members").size());
    Plane repaired = built.copy();
    int outside = 0;
    for (JsonNode b : repair.get("braces")) {
      long key = b.get("lift").asInt() * 100L + b.get("bay").asInt();
      assertThat(openings).as("never an opening").doesNotContain(key);
      String d = design.token(b.get("lift").asInt(), b.get("bay").asInt());
      String add = b.get("diagonal").asText();
      // in the design: the design's diagonal there, unless an as-built diagonal already stands in
      // for the design's single one (a rigid diagonal stands in whichever way it runs: contract)
      boolean standsIn = !d.equals("X") && !built.token(b.get("lift").asInt(), b.get("bay").asInt()).equals(".");
      assertThat(b.get("inDesign").asBoolean()).as("inDesign of " + b)
          .isEqualTo((d.equals("X") || d.equals(add)) && !standsIn);
      outside += b.get("inDesign").asBoolean() ? 0 : 1;
      repaired.add(b.get("lift").asInt(), b.get("bay").asInt(), add);
    }
    for (JsonNode m : repair.get("members")) {
      Member f = Member.of(m);
      assertThat(design.absent).as("never a member the design leaves out").doesNotContain(f);
      assertThat(built.absent).as("a repair member is one that is not there").contains(f);
      assertThat(m.get("inDesign").asBoolean()).isTrue();
      repaired.absent.remove(f);
    }
    assertThat(repaired.analyse(Set.of()).freedoms()).as("the repaired plane, by the matrix").isZero();
    // the design's own members first: how much of the rank they can restore
    Plane restored = built.copy();
    restored.absent.retainAll(design.absent);
    for (Map.Entry<Long, String> e : design.panels.entrySet()) {
      if (!e.getValue().equals(".")) {
        restored.add((int) (e.getKey() / 100), (int) (e.getKey() % 100), e.getValue());
      }
    }
    int gain = freedoms - restored.analyse(Set.of()).freedoms();
    assertThat(outside).as("items outside the design").isEqualTo(freedoms - gain);
  }

  // ---------------------------------------------------------------- seeded random planes

  /**
   * 60 seeded random planes up to 4 x 4, both supports, uneven bays and lifts, openings, members
   * the design leaves out, and as built: diagonals gone, changed or not inspected, frame members
   * sound, damaged, ineffective, missing or not inspected. Every field the contract gives a meaning
   * is checked against the rigidity matrix.
   */
  @Test
  void randomPlanesWithFrameDamageMatchTheRigidityMatrix() throws IOException {
    Random rnd = new Random(20261203L);
    String[] tokens = {".", "/", "\\", "X", "o"};
    String[] states = {"sound", "damaged", "ineffective", "missing", "?"};
    for (int t = 0; t < 60; t++) {
      int lifts = 1 + rnd.nextInt(4);
      int bays = 1 + rnd.nextInt(4);
      boolean pinned = rnd.nextInt(5) < 3;
      double[] w = new double[bays];
      double[] h = new double[lifts];
      for (int j = 0; j < bays; j++) {
        w[j] = WIDTHS[rnd.nextInt(WIDTHS.length)];
      }
      for (int i = 0; i < lifts; i++) {
        h[i] = HEIGHTS[rnd.nextInt(HEIGHTS.length)];
      }
      Plane design = new Plane(lifts, bays, pinned, w, h);
      Plane built = new Plane(lifts, bays, pinned, w, h);
      Plane ifSound = new Plane(lifts, bays, pinned, w, h);
      Set<Long> openings = new HashSet<>();
      StringBuilder d = new StringBuilder(design.header());
      StringBuilder b = new StringBuilder(design.header());
      for (int i = lifts; i >= 1; i--) {
        for (int j = 1; j <= bays; j++) {
          String dt = tokens[rnd.nextInt(tokens.length)];
          double roll = rnd.nextDouble();
          String bt = roll < 0.6 ? (dt.equals("o") ? "." : dt)
              : roll < 0.75 ? "." : roll < 0.85 ? "?" : tokens[rnd.nextInt(4)];
          long key = i * 100L + j;
          if (dt.equals("o")) {
            openings.add(key);
          } else {
            design.panels.put(key, dt);
          }
          built.panels.put(key, bt.equals("?") ? "." : bt);
          ifSound.panels.put(key, bt.equals("?") ? (dt.equals("o") ? "." : dt) : bt);
          d.append(j > 1 ? " " : "").append(dt);
          b.append(j > 1 ? " " : "").append(bt);
        }
        d.append('\n');
        b.append('\n');
      }
      Map<Member, String> recorded = new HashMap<>();
      int unknown = 0;
      for (Member f : Plane.frame(lifts, bays)) {
        if (rnd.nextInt(14) == 0) {
          design.absent.add(f);
          d.append(f.line("none")).append('\n');
        }
        if (rnd.nextInt(7) == 0) {
          String s = states[rnd.nextInt(states.length)];
          recorded.put(f, s);
          b.append(f.line(s)).append('\n');
        }
      }
      // as built: a member not listed is sound, even where the design leaves it out (DEVELOPERS.md)
      for (Map.Entry<Member, String> e : recorded.entrySet()) {
        String s = e.getValue();
        if (s.equals("ineffective") || s.equals("missing") || s.equals("?")) {
          built.absent.add(e.getKey());
        }
        // rigidIfUnknownSound: a member not inspected taken as designed
        if (s.equals("ineffective") || s.equals("missing")
            || (s.equals("?") && design.absent.contains(e.getKey()))) {
          ifSound.absent.add(e.getKey());
        }
        unknown += s.equals("?") ? 1 : 0;
      }
      String label = "plane " + t + "\n" + d + "--- as built\n" + b;
      CheckCommandFrameTest.Run r = run("check", map("d.txt", d.toString()).toString(), map("b.txt", b.toString()).toString(),
          "--format", "json");
      assertThat(r.err()).as(label).isEmpty();
      JsonNode v = r.json();
      try {
        matchesTheMatrix("design", v.get("design"), design);
        JsonNode ab = v.get("asBuilt");
        matchesTheMatrix("as built", ab, built);
        int freedoms = built.analyse(Set.of()).freedoms();
        assertThat(r.code()).isEqualTo(freedoms == 0 ? 0 : 1);
        assertThat(ab.get("unknownFrameMembers").asInt()).isEqualTo(unknown);
        assertThat(ab.get("rigidIfUnknownSound").asBoolean())
            .isEqualTo(ifSound.analyse(Set.of()).freedoms() == 0);
        JsonNode repair = v.get("repair");
        repairHolds(repair, design, built, openings);
        // restoreFrame: every design member missing, ineffective or ? as built, sorted
        List<Member> want = new ArrayList<>();
        for (Map.Entry<Member, String> e : recorded.entrySet()) {
          if (!design.absent.contains(e.getKey()) && built.absent.contains(e.getKey())) {
            want.add(e.getKey());
          }
        }
        want.sort(null);
        assertThat(members(repair.get("restoreFrame"))).isEqualTo(want);
        Set<Member> used = new HashSet<>(members(repair.get("members")));
        for (JsonNode m : repair.get("restoreFrame")) {
          assertThat(m.get("neededForRigidity").asBoolean()).isEqualTo(used.contains(Member.of(m)));
        }
      } catch (AssertionError e) {
        throw new AssertionError(label + "\n" + e.getMessage(), e);
      }
    }
  }

  // ---------------------------------------------------------------- the support and the base ledgers

  /**
   * A ledger at level 0 missing: with a pinned base the base joints are held whatever the base
   * ledger (nothing changes); on a free plane it is the bottom chord, and without it the foot of
   * the right-hand standard is a loose end. Plane 1 lift x 2 bays, "/ /", as built with the base
   * ledger of bay 2 missing; the design's header says pinned-base and --support free overrides it.
   */
  @Test
  void aMissingBaseLedgerMattersOnlyOnAFreePlane() throws IOException {
    Plane free = new Plane(1, 2, false, new double[] {2.4, 1.8}, new double[] {2.0});
    free.panels.put(101L, "/");
    free.panels.put(102L, "/");
    free.absent.add(new Member('L', 0, 2));
    Plane pinned = new Plane(1, 2, true, free.widths, free.heights);
    pinned.panels.putAll(free.panels);
    pinned.absent.addAll(free.absent);
    Path d = map("d.txt", "support: pinned-base\nwidths: 2.4 1.8\n/ /\n");
    Path b = map("b.txt", "widths: 2.4 1.8\n/ /\nledger 0 2 missing\n");
    CheckCommandFrameTest.Run p = run("check", d.toString(), b.toString(), "--format", "json");
    matchesTheMatrix("pinned", p.json().get("asBuilt"), pinned);
    assertThat(p.code()).isZero();
    CheckCommandFrameTest.Run f = run("check", d.toString(), b.toString(), "--support", "free", "--format", "json");
    assertThat(f.json().get("support").asText()).isEqualTo("free");
    matchesTheMatrix("free", f.json().get("asBuilt"), free);
    assertThat(f.code()).isEqualTo(free.analyse(Set.of()).freedoms() == 0 ? 0 : 1);
    assertThat(free.analyse(Set.of()).freedoms()).as("the matrix: the right-hand bay's foot is loose").isPositive();
    assertThat(f.json().at("/repair/members").toString())
        .isEqualTo("[{\"member\":\"ledger\",\"level\":0,\"bay\":2,\"inDesign\":true}]");
  }

  // ---------------------------------------------------------------- tension-only members, frame damaged

  static Stream<Arguments> cablePlanes() {
    return Stream.of(
        Arguments.of(2, 1, "X", new Member('S', 1, 0)),
        Arguments.of(2, 2, "X", new Member('S', 2, 1)),
        Arguments.of(2, 2, "/", new Member('S', 2, 1)),
        Arguments.of(2, 2, "X", new Member('L', 1, 2)),
        Arguments.of(1, 2, "X", new Member('L', 1, 1)),
        Arguments.of(2, 2, "X", null));
  }

  /**
   * Pinned planes whose every diagonal is tension-only, one frame member missing (or none, the
   * control): degreesOfFreedom against the rigidity matrix with cables as bars; rigid and
   * oneWayOnly against the tensegrity test (a linear programme, Roth and Whiteley 1981).
   */
  @ParameterizedTest(name = "{0} x {1}, ~{2} everywhere, {3} missing")
  @MethodSource("cablePlanes")
  void tensionOnlyMembersWithTheFrameDamaged(int lifts, int bays, String way, Member gone) throws IOException {
    Plane built = new Plane(lifts, bays, true, new double[bays], new double[lifts]);
    Arrays.fill(built.widths, 2.4);
    Arrays.fill(built.heights, 2.0);
    StringBuilder grid = new StringBuilder();
    for (int i = lifts; i >= 1; i--) {
      for (int j = 1; j <= bays; j++) {
        built.panels.put(i * 100L + j, way);
        grid.append(j > 1 ? " " : "").append('~').append(way);
      }
      grid.append('\n');
    }
    String damage = "";
    if (gone != null) {
      built.absent.add(gone);
      damage = gone.line("missing") + "\n";
    }
    String header = built.header();
    CheckCommandFrameTest.Run r = run("check", map("d.txt", header + grid).toString(), map("b.txt", header + grid + damage).toString(),
        "--format", "json");
    JsonNode ab = r.json().get("asBuilt");
    int freedoms = built.analyse(Set.of()).freedoms();
    boolean slack = built.someCableCanSlacken();
    assertThat(ab.get("degreesOfFreedom").asInt()).as("cables as bars, by the matrix").isEqualTo(freedoms);
    assertThat(ab.get("rigid").asBoolean()).as("rigid, by the tensegrity test").isEqualTo(freedoms == 0 && !slack);
    assertThat(ab.get("oneWayOnly").asBoolean()).as("one way only").isEqualTo(freedoms == 0 && slack);
    assertThat(r.code()).isEqualTo(freedoms == 0 && !slack ? 0 : 1);
  }

  // ---------------------------------------------------------------- malformed frame lines

  static Stream<Arguments> moreBadFrameLines() {
    return Stream.of(
        Arguments.of("as-built", "/ .\nledger -1 1 missing\n", 2, 8, "LEVEL -1 is outside the plane"),
        Arguments.of("as-built", "/ .\nledger 1 0 missing\n", 2, 10, "BAY 0 is outside the plane"),
        Arguments.of("as-built", "/ .\nstandard 0 1 missing\n", 2, 10, "LIFT 0 is outside the plane"),
        Arguments.of("as-built", "/ .\nupright 2 1 missing\n", 2, 9, "LIFT 2 is outside the plane"),
        Arguments.of("as-built", "/ .\nledger 1 x missing\n", 2, 10, "BAY must be a whole number"),
        Arguments.of("as-built", "/ .\nbeam 1.5 1 missing\n", 2, 6, "LEVEL must be a whole number"),
        Arguments.of("as-built", "/ .\nledger 99999999999 1 missing\n", 2, 8, "LEVEL must be a whole number"),
        Arguments.of("as-built", "/ .\nledgers 1 1 missing\n", 2, 1, "unknown frame member 'ledgers'"),
        Arguments.of("as-built", "/ .\nledger 1 1 missing # bent\n", 2, 20, "too many fields"),
        Arguments.of("as-built", "/ .\nstandard\n", 2, 9, "LIFT is missing"),
        Arguments.of("as-built", "/ .\nupright 1\n", 2, 10, "LINE is missing"),
        Arguments.of("as-built", "/ .\nledger 1 1 missing\r\nstandard 1 1 \r\n", 3, 13, "STATE is missing"),
        Arguments.of("as-built", "/ .\nledger 01 1 missing\nbeam 1 1 sound\n", 3, 1, "given twice (first on line 2)"),
        Arguments.of("as-built", "/ .\nledger 1 1 missing\nsupport: free\n", 3, 1, "header line after the grid"),
        Arguments.of("as-built", "/ .\nledger 1 1 missing\n# a note\n\n? .\n", 2, 1, "frame line between grid rows"),
        Arguments.of("as-built", "/ .\nupright 1 2 -\n", 2, 13, "unknown state '-'"),
        Arguments.of("design", "support: free\nstandard 1 1 none\n", 2, 1, "frame line before the grid"),
        Arguments.of("design", "/ .\nledger 1 1 ?\n", 2, 12, "'?' is an as-built state"),
        Arguments.of("design", "/ .\nbeam 1 2 damaged\n", 2, 10, "'damaged' is an as-built state"),
        Arguments.of("design", "/ .\nstandard 1 2 none\nupright 1 2 none\n", 3, 1, "given twice"));
  }

  /** Each: exit 2, nothing on stdout, file:line:column and the problem on stderr (the contract). */
  @ParameterizedTest(name = "{0}: {4}")
  @MethodSource("moreBadFrameLines")
  void moreMalformedFrameLinesAreLocated(String which, String text, int line, int column, String says)
      throws IOException {
    Path bad = map("bad.txt", text);
    Path good = map("good.txt", "/ .\n");
    for (String format : List.of("json", "text")) {
      CheckCommandFrameTest.Run r = which.equals("design")
          ? run("check", bad.toString(), "--format", format)
          : run("check", good.toString(), bad.toString(), "--format", format);
      assertThat(r.code()).isEqualTo(2);
      assertThat(r.out()).isEmpty();
      assertThat(r.err()).startsWith(bad + ":" + line + ":" + column + ": ").contains(says);
    }
  }

  /** Words in any case, tabs between fields and leading blanks are read as the same frame line. */
  @Test
  void frameLinesReadAlikeWhateverTheCaseAndSpacing() throws IOException {
    Path d = map("d.txt", "/\n\\\n/\n");
    String expected = run("check", d.toString(), map("b0.txt", "/\n\\\n/\nledger 1 1 missing\n").toString(),
        "--format", "json").out();
    for (String line : List.of("Ledger 1 1 MISSING", "  beam\t1\t1\tMissing", "LEDGER +1 1 missing")) {
      CheckCommandFrameTest.Run r = run("check", d.toString(), map("b.txt", "/\n\\\n/\n" + line + "\n").toString(), "--format", "json");
      assertThat(r.code()).as(line).isEqualTo(1);
      assertThat(r.out()).as(line).isEqualTo(expected);
    }
  }
}
