package org.bracewalk.core.analysis;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeMap;
import org.bracewalk.core.model.AsBuiltPlane;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.MemberKind;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;
import org.junit.jupiter.api.Test;

/**
 * Properties of the proposed repair on random designs (with openings) and as-built states
 * (missing, half-missing crosses, uninspected panels, extra members), each checked against the
 * bar-and-joint framework rather than the engine's own graph:
 *
 * <ul>
 *   <li>rigid members only: the repair makes the analysed state rigid by the rank of the rigidity
 *       matrix (Asimow & Roth 1978), has exactly as many braces as the state has freedoms, never
 *       uses an opening, and uses the fewest panels outside the design. The fewest is computed by
 *       linear algebra: with every design panel braced the matrix still has k freedoms, and each
 *       added diagonal is one row, raising the rank by at most one, so no repair uses fewer than k
 *       other panels; and k is reachable (the rows form a matroid: H. Whitney 1935). On planes up
 *       to 3 x 3 the same is confirmed by brute force over every set of panels;
 *   <li>{@code possible} is false exactly when bracing every allowed panel still leaves a freedom;
 *   <li>with tension-only members: the repair makes the plane rigid by the tensegrity linear
 *       programme (Roth & Whiteley 1981) and is irreducible (dropping any one brace undoes it);
 *   <li>the restore-to-design list names every missing design member, and marks exactly those in
 *       the repair as needed for rigidity.
 * </ul>
 */
class RepairPropertiesTest {
  private final PlaneAnalyzer engine = PlaneAnalyzer.standard();

  /** A random design and a random as-built state of it, and a picture of both for messages. */
  record Case(PlaneDesign design, AsBuiltPlane asBuilt) {
    String describe() {
      return "\ndesign:" + TestPlanes.map(design) + "as built:" + TestPlanes.map(asBuilt);
    }
  }

  static Case randomCase(Random rnd, int maxLifts, int maxBays, Support s, double tensionShare) {
    PlaneGrid grid =
        TestPlanes.unevenGrid(rnd, 1 + rnd.nextInt(maxLifts), 1 + rnd.nextInt(maxBays), s);
    double density = 0.2 + 0.6 * rnd.nextDouble();
    Map<PanelRef, Brace> braces = new TreeMap<>();
    Set<PanelRef> openings = new HashSet<>();
    Map<PanelRef, Brace> found = new TreeMap<>();
    Set<PanelRef> unknown = new HashSet<>();
    for (PanelRef p : TestPlanes.panels(grid)) {
      double r = rnd.nextDouble();
      if (r < 0.1) {
        openings.add(p);
      } else if (r < 0.1 + 0.9 * density) {
        braces.put(p, TestPlanes.randomBrace(rnd, tensionShare));
      }
    }
    for (PanelRef p : TestPlanes.panels(grid)) {
      Brace d = braces.get(p);
      double r = rnd.nextDouble();
      if (d != null) {
        if (r < 0.15) {
          unknown.add(p);
        } else if (r < 0.40) {
          // missing: nothing effective left
        } else if (r < 0.55 && d.diagonal() == Diagonal.BOTH) {
          found.put(p, new Brace(rnd.nextBoolean() ? Diagonal.RISING : Diagonal.FALLING, d.kind()));
        } else if (r < 0.55 && d.isRigid()) {
          // a rigid diagonal the other way stands in for the rigid design one
          found.put(p, Brace.rigid(d.diagonal() == Diagonal.RISING ? Diagonal.FALLING
              : Diagonal.RISING));
        } else {
          found.put(p, d);
        }
      } else if (openings.contains(p)) {
        if (r < 0.05) {
          unknown.add(p);
        }
      } else if (r < 0.08) {
        unknown.add(p);
      } else if (r < 0.20) {
        found.put(p, TestPlanes.randomBrace(rnd, tensionShare));
      }
    }
    PlaneDesign design = new PlaneDesign(grid, braces, openings);
    return new Case(design, new AsBuiltPlane(grid, found, unknown));
  }

  @Test
  void rigidOnlyRepairsAreMinimalPreferTheDesignAndMakeThePlaneRigid() {
    Random rnd = new Random(0x4E9A_0001L);
    int bruteForced = 0;
    int impossible = 0;
    int deviations = 0;
    for (int k = 0; k < 260; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      Case c = k < 90 ? randomCase(rnd, 3, 3, s, 0) : randomCase(rnd, 4, 5, s, 0);
      RepairPlan plan = checkAsBuiltAndRepair(c);
      Map<PanelRef, Brace> state = c.asBuilt().members();
      int fewestOther = checkRigidOnlyRepair(c.design(), state, plan, c.describe());
      if (c.design().grid().panelCount() <= 9) {
        assertThat(bruteForceFewestOtherPanels(c.design(), state, plan.minimum()))
            .as("brute force: fewest non-design panels" + c.describe())
            .isEqualTo(fewestOther);
        bruteForced++;
      }
      impossible += plan.possible() ? 0 : 1;
      deviations += fewestOther > 0 ? 1 : 0;
    }
    assertThat(bruteForced).isGreaterThan(60);
    assertThat(impossible).isGreaterThan(5);
    assertThat(deviations).isGreaterThan(20);
  }

  @Test
  void designOnlyRepairsUseNonDesignPanelsMinimallyAndRestoreNothing() {
    Random rnd = new Random(0x4E9A_0002L);
    int repaired = 0;
    for (int k = 0; k < 120; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      PlaneDesign design = randomCase(rnd, 4, 5, s, 0).design();
      String plane = "\ndesign:" + TestPlanes.map(design);
      PlaneAnalysis a = engine.analyse(design);
      assertThat(a.asBuilt()).as(plane).isEmpty();
      assertThat(a.repair().restoreToDesign()).as("restore list of a design alone" + plane).isEmpty();
      assertThat(a.design().degreesOfFreedom()).as("design freedoms" + plane)
          .isEqualTo(new BarJointFramework(design.grid(), design.braces()).freedoms());
      checkRigidOnlyRepair(design, design.braces(), a.repair(), plane);
      assertThat(a.repair().braces()).as("design alone: every repair panel lies outside it" + plane)
          .noneMatch(RepairBrace::inDesign);
      repaired += a.repair().braces().isEmpty() ? 0 : 1;
    }
    assertThat(repaired).isGreaterThan(30);
  }

  @Test
  void tensionRepairsMakeThePlaneRigidAndAreIrreducible() {
    Random rnd = new Random(0x4E9A_0003L);
    int repaired = 0;
    for (int k = 0; k < 160; k++) {
      Support s = k % 2 == 0 ? Support.FREE : Support.PINNED_BASE;
      Case c = randomCase(rnd, 3, 4, s, 0.6);
      RepairPlan plan = checkAsBuiltAndRepair(c);
      PlaneGrid grid = c.design().grid();
      Map<PanelRef, Brace> state = c.asBuilt().members();
      String plane = c.describe();
      checkPanelsAndKinds(c.design(), state, plan, plane);
      boolean expectedPossible =
          new BarJointFramework(grid, everyAllowedPanelBraced(c.design(), state)).rigidWithCables();
      assertThat(plan.possible()).as("possible" + plane).isEqualTo(expectedPossible);
      boolean rigidNow = new BarJointFramework(grid, state).rigidWithCables();
      if (rigidNow) {
        assertThat(plan.braces()).as("no repair for a rigid plane" + plane).isEmpty();
        continue;
      }
      if (!expectedPossible) {
        continue;
      }
      assertThat(plan.braces()).as("repair of a plane that is not rigid" + plane).isNotEmpty();
      Map<PanelRef, Brace> after = TestPlanes.withRepairs(state, plan.braces());
      // Roth & Whiteley 1981 via the linear programme, and the engine itself
      assertThat(new BarJointFramework(grid, after).rigidWithCables())
          .as("repaired plane rigid by the tensegrity LP; repair " + plan.braces() + plane)
          .isTrue();
      assertThat(engine.analyseState(grid, after).rigid()).as("repaired plane rigid" + plane)
          .isTrue();
      for (RepairBrace dropped : plan.braces()) {
        List<RepairBrace> rest = new ArrayList<>(plan.braces());
        rest.remove(dropped);
        Map<PanelRef, Brace> less = TestPlanes.withRepairs(state, rest);
        assertThat(new BarJointFramework(grid, less).rigidWithCables())
            .as("irreducible: repair without " + dropped + " is still rigid by the LP" + plane)
            .isFalse();
      }
      repaired++;
    }
    assertThat(repaired).isGreaterThan(40);
  }

  @Test
  void tensionMembersThatOnlyWorkTogetherAreRestoredTogether() {
    // Pinned base, one lift, two bays, designed "~/ ~\": each rod stops one way of sway, so the
    // design is rigid (Roth & Whiteley 1981, via the linear programme), but neither rod alone
    // stops the lift both ways. As built both are missing: restoring the design is a repair.
    PlaneGrid grid = PlaneGrid.uniform(1, 2, Support.PINNED_BASE);
    PlaneDesign design = PlaneDesign.of(grid, TestPlanes.parse("~/ ~\\"));
    AsBuiltPlane asBuilt = new AsBuiltPlane(grid, Map.of(), Set.of());
    assertThat(new BarJointFramework(grid, design.braces()).rigidWithCables()).isTrue();
    PlaneAnalysis a = engine.analyse(design, asBuilt);
    assertThat(a.design().rigid()).isTrue();
    RepairPlan plan = a.repair();
    assertThat(plan.possible()).as("repair possible; braces " + plan.braces()).isTrue();
    assertThat(plan.braces())
        .containsExactly(
            new RepairBrace(PanelRef.of(1, 1), Brace.tension(Diagonal.RISING), true),
            new RepairBrace(PanelRef.of(1, 2), Brace.tension(Diagonal.FALLING), true));
    assertThat(plan.restoreToDesign()).allMatch(RestoreItem::neededForRigidity);
  }

  /**
   * Checks the as-built part of the analysis against the framework and returns the repair: the
   * conservative verdict (uninspected panels missing), the verdict with them built to design, the
   * count of uninspected panels, the extra braces and the restore-to-design list.
   */
  private RepairPlan checkAsBuiltAndRepair(Case c) {
    PlaneDesign design = c.design();
    AsBuiltPlane asBuilt = c.asBuilt();
    PlaneGrid grid = design.grid();
    String plane = c.describe();
    PlaneAnalysis a = engine.analyse(design, asBuilt);
    assertThat(a.asBuilt()).as("as-built analysis present" + plane).isPresent();
    AsBuiltAnalysis ab = a.asBuilt().orElseThrow();
    BarJointFramework now = new BarJointFramework(grid, asBuilt.members());
    assertThat(ab.state().degreesOfFreedom()).as("as-built freedoms" + plane)
        .isEqualTo(now.freedoms());
    assertThat(ab.state().rigid()).as("as-built verdict" + plane).isEqualTo(now.rigidWithCables());
    assertThat(a.design().rigid()).as("design verdict" + plane)
        .isEqualTo(new BarJointFramework(grid, design.braces()).rigidWithCables());
    assertThat(ab.unknownPanels()).as("unknown panels" + plane)
        .isEqualTo(asBuilt.uninspected().size());
    Map<PanelRef, Brace> ifSound = new TreeMap<>(asBuilt.members());
    for (PanelRef p : asBuilt.uninspected()) {
      if (design.braceAt(p) != null) {
        ifSound.put(p, design.braceAt(p));
      }
    }
    assertThat(ab.rigidIfUnknownSound()).as("verdict with uninspected panels sound" + plane)
        .isEqualTo(new BarJointFramework(grid, ifSound).rigidWithCables());
    List<PlacedBrace> extras = new ArrayList<>();
    for (Map.Entry<PanelRef, Brace> e : new TreeMap<>(asBuilt.members()).entrySet()) {
      if (design.braceAt(e.getKey()) == null) {
        extras.add(new PlacedBrace(e.getKey(), e.getValue()));
      }
    }
    assertThat(ab.extraBraces()).as("extra braces" + plane).containsExactlyElementsOf(extras);

    // restore to design: every missing design member (check-contract.md), in lift-then-bay order
    RepairPlan plan = a.repair();
    Set<PanelRef> repairPanels = new HashSet<>();
    plan.braces().forEach(b -> repairPanels.add(b.panel()));
    List<RestoreItem> expected = new ArrayList<>();
    for (Map.Entry<PanelRef, Brace> e : design.sortedBraces().entrySet()) {
      Brace missing = missingMembers(e.getValue(), asBuilt.memberAt(e.getKey()));
      if (missing != null) {
        expected.add(new RestoreItem(e.getKey(), missing, repairPanels.contains(e.getKey())));
      }
    }
    assertThat(plan.restoreToDesign()).as("restore-to-design list" + plane)
        .containsExactlyElementsOf(expected);
    for (RepairBrace b : plan.braces()) {
      if (b.inDesign()) {
        assertThat(expected).as("design panel " + b.panel() + " in the repair is a restore item"
            + plane).anyMatch(r -> r.panel().equals(b.panel()));
      }
    }
    return plan;
  }

  /**
   * What of the design brace {@code design} is missing when {@code found} is there (contract): a
   * rigid member stands in for a rigid design one whichever way it runs; a tension-only member does
   * not stand in for a rigid one; tension-only members must run as designed.
   */
  static Brace missingMembers(Brace design, Brace found) {
    if (found == null) {
      return design;
    }
    if (design.isRigid()) {
      if (!found.isRigid()) {
        return design;
      }
      if (found.diagonal().memberCount() >= design.diagonal().memberCount()) {
        return null;
      }
      return Brace.rigid(found.diagonal() == Diagonal.RISING ? Diagonal.FALLING : Diagonal.RISING);
    }
    Diagonal rest =
        Diagonal.of(
            design.diagonal().hasRising() && !found.diagonal().hasRising(),
            design.diagonal().hasFalling() && !found.diagonal().hasFalling());
    return rest == null ? null : new Brace(rest, MemberKind.TENSION_ONLY);
  }

  /** The state with the design brace in every design panel and a rigid '/' in every other one. */
  static Map<PanelRef, Brace> everyAllowedPanelBraced(PlaneDesign design, Map<PanelRef, Brace> s) {
    Map<PanelRef, Brace> all = new TreeMap<>(s);
    for (PanelRef p : TestPlanes.panels(design.grid())) {
      if (design.isOpening(p)) {
        continue;
      }
      Brace add = design.braceAt(p) != null ? design.braceAt(p) : Brace.rigid(Diagonal.RISING);
      all.put(p, TestPlanes.merge(all.get(p), add));
    }
    return all;
  }

  static Map<PanelRef, Brace> everyDesignPanelBraced(PlaneDesign design, Map<PanelRef, Brace> s) {
    Map<PanelRef, Brace> all = new TreeMap<>(s);
    design.braces().forEach((p, b) -> all.put(p, TestPlanes.merge(all.get(p), b)));
    return all;
  }

  /** Panels, inDesign flags, members of each repair brace (check-contract.md, "repair"). */
  private static void checkPanelsAndKinds(
      PlaneDesign design, Map<PanelRef, Brace> state, RepairPlan plan, String plane) {
    Set<PanelRef> seen = new HashSet<>();
    for (RepairBrace b : plan.braces()) {
      assertThat(seen.add(b.panel())).as("panel used twice: " + b + plane).isTrue();
      assertThat(design.isOpening(b.panel())).as("repair in an opening: " + b + plane).isFalse();
      assertThat(b.inDesign()).as("inDesign of " + b + plane)
          .isEqualTo(design.braceAt(b.panel()) != null);
      if (b.inDesign()) {
        // the contract says the design's diagonal and kind are repeated; where part of a design
        // cross is still there, naming only the missing part (as the restore list does) adds the
        // same members, so either is accepted
        Brace d = design.braceAt(b.panel());
        assertThat(b.brace()).as("member of " + b + plane)
            .isIn(d, missingMembers(d, state.get(b.panel())));
      } else {
        assertThat(b.brace()).as("member of " + b + plane).isEqualTo(Brace.rigid(Diagonal.RISING));
      }
    }
    List<PanelRef> order = plan.braces().stream().map(RepairBrace::panel).toList();
    assertThat(order).as("repair sorted by lift, then bay" + plane).isSorted();
  }

  /**
   * The rigid-only repair checks; returns the fewest non-design panels any repair needs (computed
   * from the rigidity matrix).
   */
  private int checkRigidOnlyRepair(
      PlaneDesign design, Map<PanelRef, Brace> state, RepairPlan plan, String plane) {
    PlaneGrid grid = design.grid();
    checkPanelsAndKinds(design, state, plan, plane);
    int freedoms = new BarJointFramework(grid, state).freedoms();
    int leftWithAll =
        new BarJointFramework(grid, everyAllowedPanelBraced(design, state)).freedoms();
    int leftWithDesign =
        new BarJointFramework(grid, everyDesignPanelBraced(design, state)).freedoms();
    int fewestOther = leftWithDesign - leftWithAll;
    assertThat(plan.possible()).as("possible" + plane).isEqualTo(leftWithAll == 0);
    // each diagonal is one row of the rigidity matrix: it removes at most one freedom
    assertThat(plan.minimum()).as("repair size" + plane).isEqualTo(freedoms - leftWithAll);
    if (plan.possible()) {
      assertThat(plan.minimum()).as("repair size = degrees of freedom" + plane)
          .isEqualTo(freedoms);
    }
    long other = plan.braces().stream().filter(b -> !b.inDesign()).count();
    assertThat(other).as("non-design panels used by " + plan.braces() + plane)
        .isEqualTo(fewestOther);
    Map<PanelRef, Brace> after = TestPlanes.withRepairs(state, plan.braces());
    assertThat(new BarJointFramework(grid, after).freedoms())
        .as("freedoms left after repair " + plan.braces() + " by the rigidity matrix" + plane)
        .isEqualTo(leftWithAll);
    StateAnalysis repaired = engine.analyseState(grid, after);
    assertThat(repaired.rigid()).as("engine verdict after repair" + plane).isEqualTo(plan.possible());
    assertThat(repaired.degreesOfFreedom()).as("engine freedoms after repair" + plane)
        .isEqualTo(leftWithAll);
    return fewestOther;
  }

  /**
   * Brute force: over every set of {@code size} allowed panels, the fewest non-design panels in a
   * set that leaves as few freedoms as bracing every allowed panel does.
   */
  private static int bruteForceFewestOtherPanels(
      PlaneDesign design, Map<PanelRef, Brace> state, int size) {
    PlaneGrid grid = design.grid();
    int target = new BarJointFramework(grid, everyAllowedPanelBraced(design, state)).freedoms();
    List<PanelRef> allowed = new ArrayList<>();
    for (PanelRef p : TestPlanes.panels(grid)) {
      if (!design.isOpening(p)) {
        allowed.add(p);
      }
    }
    int best = Integer.MAX_VALUE;
    for (int mask = 0; mask < (1 << allowed.size()); mask++) {
      if (Integer.bitCount(mask) != size) {
        continue;
      }
      Map<PanelRef, Brace> trial = new TreeMap<>(state);
      int other = 0;
      for (int k = 0; k < allowed.size(); k++) {
        if ((mask & (1 << k)) != 0) {
          PanelRef p = allowed.get(k);
          Brace add = design.braceAt(p) != null ? design.braceAt(p) : Brace.rigid(Diagonal.RISING);
          other += design.braceAt(p) != null ? 0 : 1;
          trial.put(p, TestPlanes.merge(trial.get(p), add));
        }
      }
      if (other < best && new BarJointFramework(grid, trial).freedoms() == target) {
        best = other;
      }
    }
    return best;
  }
}
