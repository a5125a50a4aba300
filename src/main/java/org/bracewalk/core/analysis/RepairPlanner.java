package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;

/**
 * The least set of braces that makes a state rigid.
 *
 * <p>Rigid members only: each added diagonal joins at most two blocks, so the least number is the
 * degrees of freedom, and choosing which is a minimum spanning forest of the block graph (J. B.
 * Kruskal, Proc. AMS 7 (1956); the graphic matroid makes the greedy choice optimal). Candidates
 * come first from design panels whose member is missing or ineffective, then from the other
 * panels; openings are never used. Ties go to the lower lift, then the lower bay. O(E α(V)) plus a
 * scan of the empty panels only while blocks remain apart.
 *
 * <p>With tension-only members every missing design member is restored, rigid members are added
 * elsewhere while strong components remain apart, then every brace that is not needed is dropped
 * (deviations from the design first): the result is
 * irreducible, not provably least (the least cable augmentation is a harder problem: H. Gabow, T.
 * Jordán, SIAM J. Comput. 30 (2000)).
 */
final class RepairPlanner {
  private static final Brace DEFAULT_BRACE = Brace.rigid(Diagonal.RISING);

  private RepairPlanner() {}

  private record Attempt(boolean possible, List<RepairBrace> braces) {}

  /**
   * Plans the repair of {@code state} (the effective members {@code analysed}) against {@code
   * design}. With {@code restoreList} the restore-to-design list is filled in too.
   */
  static RepairPlan plan(
      PlaneGrid grid,
      byte[] design,
      BitSet openings,
      byte[] analysed,
      BraceGraph state,
      boolean restoreList) {
    List<RepairBrace> designCandidates = new ArrayList<>();
    boolean tension = state.hasTension();
    int n = grid.bays();
    for (int idx = 0; idx < design.length; idx++) {
      if (design[idx] != PanelCodes.NONE && design[idx] != analysed[idx]) {
        Brace missing =
            PanelMatch.missing(PanelCodes.decode(design[idx]), PanelCodes.decode(analysed[idx]));
        if (missing != null) {
          designCandidates.add(new RepairBrace(PanelCodes.panel(idx, n), missing, true));
          tension |= !missing.isRigid();
        }
      }
    }
    Candidates space = new Candidates(grid, design, openings, analysed);
    Attempt attempt =
        tension
            ? tensionRepair(space, state, designCandidates)
            : rigidRepair(space, state, designCandidates);
    List<RepairBrace> braces = new ArrayList<>(attempt.braces());
    braces.sort((a, b) -> a.panel().compareTo(b.panel()));
    List<RestoreItem> restore = new ArrayList<>();
    if (restoreList) {
      Set<PanelRef> inRepair = new HashSet<>();
      for (RepairBrace b : braces) {
        inRepair.add(b.panel());
      }
      for (RepairBrace c : designCandidates) {
        restore.add(new RestoreItem(c.panel(), c.brace(), inRepair.contains(c.panel())));
      }
    }
    return new RepairPlan(attempt.possible(), braces, restore);
  }

  private static Attempt rigidRepair(
      Candidates space, BraceGraph state, List<RepairBrace> designCandidates) {
    UnionFindBlocks uf = UnionFindBlocks.of(state, false);
    int lifts = state.lifts;
    List<RepairBrace> chosen = new ArrayList<>();
    if (uf.count() == 1) {
      return new Attempt(true, chosen);
    }
    Iterator<RepairBrace> candidates = space.iterator(designCandidates);
    while (uf.count() > 1 && candidates.hasNext()) {
      RepairBrace c = candidates.next();
      if (uf.union(c.panel().lift() - 1, lifts + c.panel().bay() - 1)) {
        chosen.add(c);
      }
    }
    return new Attempt(uf.count() == 1, chosen);
  }

  private static Attempt tensionRepair(
      Candidates space, BraceGraph state, List<RepairBrace> designCandidates) {
    if (ContractedStrongComponents.of(state).count() == 1) {
      return new Attempt(true, List.of());
    }
    // Restore every missing design member: tension members often work only in pairs (each stops
    // one way of sway), so none may be judged alone.
    BraceGraph g = state.copy();
    List<RepairBrace> chosen = new ArrayList<>();
    for (RepairBrace c : designCandidates) {
      g.add(c.panel(), c.brace());
      chosen.add(c);
    }
    ContractedStrongComponents comp = ContractedStrongComponents.of(g);
    int sccs = comp.count();
    // Then rigid members elsewhere: one between two strong components always merges them.
    int lifts = state.lifts;
    Iterator<RepairBrace> others = space.iterator(List.of());
    while (sccs > 1 && others.hasNext()) {
      RepairBrace c = others.next();
      if (comp.of(c.panel().lift() - 1) != comp.of(lifts + c.panel().bay() - 1)) {
        g.add(c.panel(), c.brace());
        chosen.add(c);
        comp = ContractedStrongComponents.of(g);
        sccs = comp.count();
      }
    }
    // Drop every brace that is not needed: deviations from the design first, then design members
    // from the top of the plane down; a drop stands when the verdict (or, where no repair is
    // possible, the number of strong components) is no worse.
    List<RepairBrace> order = new ArrayList<>(chosen);
    order.sort(
        (a, b) ->
            a.inDesign() != b.inDesign()
                ? (a.inDesign() ? 1 : -1)
                : b.panel().compareTo(a.panel()));
    List<RepairBrace> kept = new ArrayList<>(chosen);
    for (RepairBrace drop : order) {
      List<RepairBrace> without = new ArrayList<>(kept);
      without.remove(drop);
      BraceGraph trial = state.copy();
      for (RepairBrace r : without) {
        trial.add(r.panel(), r.brace());
      }
      if (ContractedStrongComponents.of(trial).count() <= sccs) {
        kept = without;
      }
    }
    return new Attempt(sccs == 1, kept);
  }

  /** The panels a repair may use, in the order they are tried. */
  private record Candidates(PlaneGrid grid, byte[] design, BitSet openings, byte[] analysed) {

    /**
     * The given design candidates first, then every other panel that is neither in the design
     * nor an opening and has no rigid member yet, in lift-then-bay order, produced lazily so a huge
     * plane is scanned only as far as needed.
     */
    Iterator<RepairBrace> iterator(List<RepairBrace> designCandidates) {
      Iterator<RepairBrace> first = designCandidates.iterator();
      int n = grid.bays();
      return new Iterator<>() {
        private int idx;
        private RepairBrace pending;

        @Override
        public boolean hasNext() {
          if (pending != null) {
            return true;
          }
          if (first.hasNext()) {
            pending = first.next();
            return true;
          }
          while (idx < design.length) {
            int i = idx++;
            if (design[i] == PanelCodes.NONE
                && !openings.get(i)
                && !PanelCodes.isRigid(analysed[i])) {
              pending = new RepairBrace(PanelCodes.panel(i, n), DEFAULT_BRACE, false);
              return true;
            }
          }
          return false;
        }

        @Override
        public RepairBrace next() {
          if (!hasNext()) {
            throw new NoSuchElementException();
          }
          RepairBrace r = pending;
          pending = null;
          return r;
        }
      };
    }
  }
}
