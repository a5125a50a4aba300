package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * The repair of planes with frame damage against {@link FrameOracle}: every proposed repair
 * (diagonals and frame members) applied to the as-built state and checked rigid by the exact rank
 * of the rigidity matrix (L. Asimow, B. Roth, Trans. AMS 245 (1978)); its size equal to the degrees
 * of freedom (rigid members only: each item raises the rank by at most one); its number of items
 * outside the design the least possible, by the matroid argument (W. Whiteley, "Some matroids from
 * discrete applied geometry", Contemp. Math. 197 (1996): greedy basis extension over the candidates
 * in cost order, design members first, then new rigid diagonals either way in panels that are not
 * openings), the greedy itself checked by brute force on small planes; never an opening, never a
 * frame member the design leaves out.
 */
class FrameRepairCrossCheckTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  /** A random design (rigid members) and an as-built state of it with frame and brace damage. */
  record Case(PlaneDesign design, AsBuiltPlane asBuilt) {
    String describe() {
      return FramePlanes.describe(design, asBuilt);
    }

    /** The as-built state the verdict is about: unknown frame members counted as absent. */
    BuiltFrame built() {
      Set<FrameRef> absent = new HashSet<>(asBuilt.absentFrame());
      absent.addAll(asBuilt.unknownFrame());
      return new BuiltFrame(asBuilt.grid(), asBuilt.members(), absent);
    }
  }

  static Case randomCase(Random rnd, int maxSize, Support support) {
    PlaneGrid grid = FramePlanes.grid(rnd, 1 + rnd.nextInt(maxSize), 1 + rnd.nextInt(maxSize), support);
    Map<PanelRef, Brace> braces = new TreeMap<>();
    Set<PanelRef> openings = new HashSet<>();
    double density = 0.3 + 0.6 * rnd.nextDouble();
    for (PanelRef p : TestPlanes.panels(grid)) {
      if (rnd.nextDouble() < density) {
        braces.put(p, TestPlanes.randomBrace(rnd, 0));
      } else if (rnd.nextDouble() < 0.2) {
        openings.add(p);
      }
    }
    Set<FrameRef> omitted = rnd.nextInt(3) == 0 ? FramePlanes.damage(rnd, grid, 0.05) : Set.of();
    PlaneDesign design = new PlaneDesign(grid, braces, openings, omitted);

    Map<PanelRef, Brace> members = new TreeMap<>();
    for (PanelRef p : TestPlanes.panels(grid)) {
      Brace b = braces.get(p);
      double r = rnd.nextDouble();
      if (b != null) {
        if (r < 0.65) {
          members.put(p, b);
        } else if (r < 0.8 && b.diagonal() == Diagonal.BOTH) {
          members.put(p, Brace.rigid(rnd.nextBoolean() ? Diagonal.RISING : Diagonal.FALLING));
        }
      } else if (!openings.contains(p) && r < 0.05) {
        members.put(p, TestPlanes.randomBrace(rnd, 0));
      }
    }
    double share = 0.25 * rnd.nextDouble();
    Set<FrameRef> absent = new HashSet<>();
    Set<FrameRef> unknown = new HashSet<>();
    for (FrameRef f : FrameOracle.allFrameMembers(grid)) {
      double r = rnd.nextDouble();
      if (omitted.contains(f)) {
        if (r >= 0.2) {
          absent.add(f); // else: there although the design leaves it out (an extra)
        }
      } else if (r < share) {
        absent.add(f);
      } else if (r < share + 0.02) {
        unknown.add(f);
      }
    }
    return new Case(design, new AsBuiltPlane(grid, members, Set.of(), absent, unknown));
  }

  /** One repair candidate: a bar, whether the design has it. */
  record Candidate(FrameOracle.Bar bar, boolean inDesign) {}

  /** Design members not effective as built, then new rigid diagonals either way outside openings. */
  static List<Candidate> candidates(Case c, FrameOracle built) {
    PlaneDesign design = c.design();
    AsBuiltPlane asBuilt = c.asBuilt();
    List<Candidate> out = new ArrayList<>();
    for (FrameRef f : FrameOracle.allFrameMembers(design.grid())) {
      if (design.hasFrameMember(f) && !asBuilt.hasFrameMember(f)) {
        out.add(new Candidate(built.frameBar(f), true));
      }
    }
    List<Candidate> outside = new ArrayList<>();
    for (PanelRef p : TestPlanes.panels(design.grid())) {
      if (design.isOpening(p)) {
        continue;
      }
      Brace d = design.braceAt(p);
      Brace b = asBuilt.memberAt(p);
      for (boolean rising : new boolean[] {true, false}) {
        boolean there = b != null && (rising ? b.diagonal().hasRising() : b.diagonal().hasFalling());
        if (there) {
          continue;
        }
        boolean designed = d != null && (rising ? d.diagonal().hasRising() : d.diagonal().hasFalling());
        (designed ? out : outside).add(new Candidate(built.diagonalBar(p, rising, false), designed));
      }
    }
    out.addAll(outside);
    return out;
  }

  /** What the oracle says the least repair is: its size, items outside the design, final rank. */
  record Least(boolean possible, int size, int outside, int rank) {}

  static Least least(Case c) {
    FrameOracle built = FrameOracle.of(c.built());
    List<Candidate> cands = candidates(c, built);
    List<FrameOracle.Bar> order = new ArrayList<>();
    for (Candidate x : cands) {
      order.add(x.bar());
    }
    List<FrameOracle.Bar> chosen = built.greedyExtension(order);
    Set<FrameOracle.Bar> chosenSet = new HashSet<>(chosen);
    int outside = 0;
    for (Candidate x : cands) {
      if (chosenSet.contains(x.bar()) && !x.inDesign()) {
        outside++;
      }
    }
    List<FrameOracle.Bar> all = new ArrayList<>(built.bars());
    all.addAll(chosen);
    FrameOracle repaired = built.withBars(all);
    return new Least(repaired.freedoms() == 0, chosen.size(), outside, repaired.rank());
  }

  @Test
  void everyProposedRepairMakesThePlaneRigidWithTheFewestItemsAndTheFewestOutsideTheDesign() {
    Random rnd = new Random(0x4E9A_0001L);
    int repaired = 0;
    int withFrame = 0;
    int withOutside = 0;
    int impossible = 0;
    int skipped = 0;
    List<String> minimumOff = new ArrayList<>();
    for (int k = 0; k < 300; k++) {
      Case c = randomCase(rnd, 6, k % 2 == 0 ? Support.FREE : Support.PINNED_BASE);
      FrameOracle built = FrameOracle.of(c.built());
      if (!built.isolatedJoints().isEmpty()) {
        // a joint that carries nothing is left out of the count; a repair touching it would have
        // to hold it too, which the least-count argument below does not cover
        skipped++;
        continue;
      }
      String plane = c.describe();
      int dof = built.freedoms();
      Least least = least(c);
      PlaneAnalysis analysis = engine.analyse(c.design(), c.asBuilt());
      assertThat(analysis.asBuilt()).as("as-built analysis of" + plane).isPresent();
      assertThat(analysis.asBuilt().orElseThrow().state().degreesOfFreedom())
          .as("as-built degrees of freedom of" + plane).isEqualTo(dof);
      RepairPlan repair = analysis.repair();
      Applied applied = apply(c, repair, plane);
      FrameOracle after = FrameOracle.of(applied.state());
      assertThat(repair.possible()).as("repair possible for" + plane).isEqualTo(least.possible());
      if (least.possible()) {
        assertThat(after.freedoms()).as("freedoms after the repair " + repair + " of" + plane).isZero();
        assertThat(applied.items()).as("items (members) of the repair " + repair + " of" + plane)
            .isEqualTo(dof);
        if (repair.minimum() != dof) {
          minimumOff.add("minimum() " + repair.minimum() + " against " + dof + " freedoms for " + repair
              + " of" + plane);
        }
        assertThat(applied.outside()).as("items outside the design in " + repair + " of" + plane)
            .isEqualTo(least.outside());
      } else {
        assertThat(after.rank()).as("rank after the best possible repair " + repair + " of" + plane)
            .isEqualTo(least.rank());
        impossible++;
      }
      assertRestoreFrame(c, repair, plane);
      repaired += dof > 0 ? 1 : 0;
      withFrame += repair.restoreFrame().isEmpty() ? 0 : 1;
      withOutside += least.outside() > 0 ? 1 : 0;
    }
    // check-contract.md: "minimum is the number of entries in braces and members together; with
    // rigid members only it equals degreesOfFreedom" (so a cross of two new members is two entries)
    assertThat(minimumOff).as("repairs whose minimum() is not the degrees of freedom").isEmpty();
    assertThat(skipped).isLessThan(60);
    assertThat(repaired).isGreaterThan(150);
    assertThat(withFrame).isGreaterThan(50);
    assertThat(withOutside).isGreaterThan(30);
    assertThat(impossible).isLessThan(100);
  }

  /** The as-built state with the repair applied, its size in members and those outside the design. */
  record Applied(BuiltFrame state, int items, int outside) {}

  private static Applied apply(Case c, RepairPlan repair, String plane) {
    PlaneDesign design = c.design();
    BuiltFrame built = c.built();
    Map<PanelRef, Brace> members = new TreeMap<>(built.braces());
    Set<FrameRef> absent = new HashSet<>(built.absentFrame());
    int items = 0;
    int outside = 0;
    for (RepairBrace rb : repair.braces()) {
      PanelRef p = rb.panel();
      assertThat(design.isOpening(p)).as("repair brace in an opening, " + p + ", in" + plane).isFalse();
      assertThat(rb.brace().isRigid()).as("repair brace kind at " + p + " in" + plane).isTrue();
      Brace d = design.braceAt(p);
      Brace b = members.get(p);
      boolean allInDesign = true;
      for (boolean rising : new boolean[] {true, false}) {
        if (rising ? rb.brace().diagonal().hasRising() : rb.brace().diagonal().hasFalling()) {
          boolean there = b != null && (rising ? b.diagonal().hasRising() : b.diagonal().hasFalling());
          assertThat(there).as("repair places a diagonal already there at " + p + " in" + plane).isFalse();
          boolean designed = d != null && (rising ? d.diagonal().hasRising() : d.diagonal().hasFalling());
          items++;
          if (!designed) {
            outside++;
            allInDesign = false;
          }
        }
      }
      assertThat(rb.inDesign()).as("inDesign of the repair brace at " + p + " in" + plane)
          .isEqualTo(allInDesign);
      members.put(p, TestPlanes.merge(b, rb.brace()));
    }
    for (RepairMember rm : repair.members()) {
      FrameRef f = rm.member();
      assertThat(design.hasFrameMember(f)).as("repair uses " + f + ", which the design leaves out, in" + plane)
          .isTrue();
      assertThat(absent.remove(f)).as("repair refits " + f + ", which is there, in" + plane).isTrue();
      assertThat(rm.inDesign()).as("inDesign of " + f + " in" + plane).isTrue();
      items++;
    }
    return new Applied(new BuiltFrame(built.grid(), members, absent), items, outside);
  }

  /** restoreFrame: every design frame member absent or not inspected as built, needed iff repaired. */
  private static void assertRestoreFrame(Case c, RepairPlan repair, String plane) {
    TreeSet<FrameRef> expected = new TreeSet<>();
    for (FrameRef f : FrameOracle.allFrameMembers(c.design().grid())) {
      if (c.design().hasFrameMember(f) && !c.asBuilt().hasFrameMember(f)) {
        expected.add(f);
      }
    }
    Set<FrameRef> inRepair = new HashSet<>();
    for (RepairMember rm : repair.members()) {
      inRepair.add(rm.member());
    }
    List<FrameRef> listed = new ArrayList<>();
    for (RestoreFrameItem item : repair.restoreFrame()) {
      listed.add(item.member());
      assertThat(item.neededForRigidity()).as("neededForRigidity of " + item.member() + " in" + plane)
          .isEqualTo(inRepair.contains(item.member()));
    }
    assertThat(listed).as("restoreFrame of" + plane).containsExactlyElementsOf(expected);
  }

  @Test
  void theGreedyOracleFindsTheBruteForceOptimumOnSmallPlanes() {
    // the matroid argument checked by exhaustive search: every set of candidates of the least size
    // that makes the plane rigid, and among those the fewest outside the design
    Random rnd = new Random(0x4E9A_0002L);
    int checked = 0;
    for (int k = 0; k < 150 && checked < 80; k++) {
      Case c = randomCase(rnd, 2, k % 2 == 0 ? Support.FREE : Support.PINNED_BASE);
      FrameOracle built = FrameOracle.of(c.built());
      int dof = built.freedoms();
      if (!built.isolatedJoints().isEmpty() || dof == 0) {
        continue;
      }
      List<Candidate> cands = candidates(c, built);
      if (binomial(cands.size(), dof) > 1500) {
        continue;
      }
      Least greedy = least(c);
      List<FrameOracle.Bar> everything = new ArrayList<>(built.bars());
      for (Candidate x : cands) {
        everything.add(x.bar());
      }
      boolean possible = built.withBars(everything).freedoms() == 0;
      int bestOutside = Integer.MAX_VALUE;
      int smallest = Integer.MAX_VALUE;
      for (int size = 1; size <= Math.min(cands.size(), dof) && smallest == Integer.MAX_VALUE; size++) {
        for (int[] pick : subsets(cands.size(), size)) {
          List<FrameOracle.Bar> all = new ArrayList<>(built.bars());
          int outside = 0;
          for (int i : pick) {
            all.add(cands.get(i).bar());
            outside += cands.get(i).inDesign() ? 0 : 1;
          }
          if (built.withBars(all).freedoms() == 0) {
            smallest = size;
            bestOutside = Math.min(bestOutside, outside);
          }
        }
      }
      String plane = c.describe();
      assertThat(greedy.possible()).as("greedy possible for" + plane).isEqualTo(possible);
      if (greedy.possible()) {
        assertThat(smallest).as("least repair size (brute force) of" + plane).isEqualTo(dof);
        assertThat(greedy.size()).as("greedy size of" + plane).isEqualTo(dof);
        assertThat(greedy.outside()).as("greedy items outside the design of" + plane).isEqualTo(bestOutside);
      }
      checked++;
    }
    assertThat(checked).isGreaterThanOrEqualTo(60);
  }

  private static long binomial(int n, int k) {
    long r = 1;
    for (int i = 1; i <= k; i++) {
      r = r * (n - k + i) / i;
    }
    return r;
  }

  private static List<int[]> subsets(int n, int size) {
    List<int[]> out = new ArrayList<>();
    int[] pick = new int[size];
    fill(out, pick, 0, 0, n);
    return out;
  }

  private static void fill(List<int[]> out, int[] pick, int at, int from, int n) {
    if (at == pick.length) {
      out.add(pick.clone());
      return;
    }
    for (int i = from; i < n; i++) {
      pick[at] = i;
      fill(out, pick, at + 1, i + 1, n);
    }
  }
}
