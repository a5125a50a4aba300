package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.Diagonal;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneDesign;
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
 * <p>With tension-only members the greedy pass adds a candidate only when it lowers the number of
 * strongly connected components, then drops every brace that is not needed: the result is
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
      PlaneDesign design, Map<PanelRef, Brace> analysed, BraceGraph state, boolean restoreList) {
    List<RepairBrace> designCandidates = new ArrayList<>();
    boolean tension = state.hasTension();
    for (Map.Entry<PanelRef, Brace> e : design.sortedBraces().entrySet()) {
      Brace missing = PanelMatch.missing(e.getValue(), analysed.get(e.getKey()));
      if (missing != null) {
        designCandidates.add(new RepairBrace(e.getKey(), missing, true));
        tension |= !missing.isRigid();
      }
    }
    Attempt attempt =
        tension
            ? tensionRepair(design, analysed, state, designCandidates)
            : rigidRepair(design, analysed, state, designCandidates);
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
      PlaneDesign design,
      Map<PanelRef, Brace> analysed,
      BraceGraph state,
      List<RepairBrace> designCandidates) {
    BraceGraph.UnionFind uf = state.components(false);
    int lifts = state.lifts;
    List<RepairBrace> chosen = new ArrayList<>();
    if (uf.count() == 1) {
      return new Attempt(true, chosen);
    }
    Iterator<RepairBrace> candidates = candidates(design, analysed, designCandidates);
    while (uf.count() > 1 && candidates.hasNext()) {
      RepairBrace c = candidates.next();
      if (uf.union(c.panel().lift() - 1, lifts + c.panel().bay() - 1)) {
        chosen.add(c);
      }
    }
    return new Attempt(uf.count() == 1, chosen);
  }

  private static Attempt tensionRepair(
      PlaneDesign design,
      Map<PanelRef, Brace> analysed,
      BraceGraph state,
      List<RepairBrace> designCandidates) {
    BraceGraph g = state.copy();
    int sccs = g.strongComponentCount();
    List<RepairBrace> chosen = new ArrayList<>();
    if (sccs == 1) {
      return new Attempt(true, chosen);
    }
    int lifts = state.lifts;
    int[] comp = g.strongComponents();
    Iterator<RepairBrace> candidates = candidates(design, analysed, designCandidates);
    while (sccs > 1 && candidates.hasNext()) {
      RepairBrace c = candidates.next();
      int l = c.panel().lift() - 1;
      int b = lifts + c.panel().bay() - 1;
      boolean bothWays = c.brace().isRigid() || c.brace().diagonal() == Diagonal.BOTH;
      if (bothWays && comp[l] == comp[b]) {
        continue; // both arcs within one strong component change nothing
      }
      int added = g.add(c.panel(), c.brace());
      int[] next = g.strongComponents();
      if (next[g.vertexCount] < sccs) {
        chosen.add(c);
        comp = next;
        sccs = next[g.vertexCount];
      } else {
        g.removeLast(added);
      }
    }
    if (sccs > 1) {
      return new Attempt(false, chosen);
    }
    // Drop every brace that is not needed, last added first.
    for (int k = chosen.size() - 1; k >= 0; k--) {
      List<RepairBrace> without = new ArrayList<>(chosen);
      without.remove(k);
      BraceGraph trial = state.copy();
      for (RepairBrace r : without) {
        trial.add(r.panel(), r.brace());
      }
      if (trial.strongComponentCount() == 1) {
        chosen = without;
      }
    }
    return new Attempt(true, chosen);
  }

  /**
   * Design panels with missing members first, then every other panel that is not an opening, in
   * lift-then-bay order, produced lazily so a huge empty plane is scanned only as far as needed.
   */
  private static Iterator<RepairBrace> candidates(
      PlaneDesign design, Map<PanelRef, Brace> analysed, List<RepairBrace> designCandidates) {
    PlaneGrid grid = design.grid();
    Iterator<RepairBrace> first = designCandidates.iterator();
    return new Iterator<>() {
      private int lift = 1;
      private int bay = 1;
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
        while (lift <= grid.lifts()) {
          PanelRef p = new PanelRef(lift, bay);
          if (++bay > grid.bays()) {
            bay = 1;
            lift++;
          }
          if (design.braceAt(p) == null && !design.isOpening(p)) {
            Brace there = analysed.get(p);
            if (there == null || !there.isRigid()) {
              pending = new RepairBrace(p, DEFAULT_BRACE, false);
              return true;
            }
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
