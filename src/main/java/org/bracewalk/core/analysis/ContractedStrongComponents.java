package org.bracewalk.core.analysis;

import java.util.Arrays;
import java.util.BitSet;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.jgrapht.Graph;
import org.jgrapht.alg.connectivity.KosarajuStrongConnectivityInspector;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleDirectedGraph;

/**
 * The strong components of the brace digraph (tension-only members, analysis.md): a plane with
 * tension-only members is rigid iff its digraph is strongly connected (J. Baglivo, J. Graver,
 * "Incidence and Symmetry in Design and Architecture", CUP 1983).
 *
 * <p>Technique: contraction, then Kosaraju's algorithm. A rigid member and a ground link give arcs
 * both ways, so the vertices they join always share a strong component; the blocks of the rigid
 * members and ground links ({@link UnionFindBlocks}, linear on flat arrays) are contracted to one
 * vertex each, and only the tension-only members remain as arcs between blocks, each pair once.
 * The contracted digraph has at most lifts + bays + 1 vertices, which is small enough for an
 * object graph, so its strong components are JGraphT's {@link KosarajuStrongConnectivityInspector}
 * (S. R. Kosaraju 1978; M. Sharir, Comput. Math. Appl. 7 (1981)), O(V + E) on the contracted
 * digraph.
 */
final class ContractedStrongComponents {
  /** Above this many block pairs the arcs are told apart by a hash set instead of a bit set. */
  private static final long BITSET_PAIRS = 1L << 26;

  private final int[] component;
  private final int count;

  private ContractedStrongComponents(int[] component, int count) {
    this.component = component;
    this.count = count;
  }

  /** The strong components of {@code g}. */
  static ContractedStrongComponents of(BraceGraph g) {
    UnionFindBlocks uf = UnionFindBlocks.of(g, true);
    int v = g.vertexCount;
    int[] block = new int[v];
    int[] blockOfRoot = new int[v];
    Arrays.fill(blockOfRoot, -1);
    int blocks = 0;
    for (int x = 0; x < v; x++) {
      int r = uf.find(x);
      if (blockOfRoot[r] < 0) {
        blockOfRoot[r] = blocks++;
      }
      block[x] = blockOfRoot[r];
    }
    if (!g.hasTension()) {
      return new ContractedStrongComponents(block, blocks); // no arcs between blocks
    }
    Graph<Integer, DefaultEdge> contracted = new SimpleDirectedGraph<>(DefaultEdge.class);
    for (int b = 0; b < blocks; b++) {
      contracted.addVertex(b);
    }
    long pairs = (long) blocks * blocks;
    BitSet seenBits = pairs <= BITSET_PAIRS ? new BitSet((int) pairs) : null;
    Set<Long> seenSet = seenBits == null ? new HashSet<>() : null;
    for (int e = 0; e < g.memberCount(); e++) {
      if (g.isRigid(e)) {
        continue;
      }
      int from = block[g.liftVertex(e)];
      int to = block[g.bayVertex(e)];
      if (!g.isRising(e)) {
        int t = from;
        from = to;
        to = t;
      }
      if (from == to) {
        continue;
      }
      long pair = (long) from * blocks + to;
      boolean fresh = seenBits != null ? !seenBits.get((int) pair) : seenSet.add(pair);
      if (fresh) {
        if (seenBits != null) {
          seenBits.set((int) pair);
        }
        contracted.addEdge(from, to);
      }
    }
    List<Set<Integer>> sets =
        new KosarajuStrongConnectivityInspector<>(contracted).stronglyConnectedSets();
    int[] sccOfBlock = new int[blocks];
    for (int s = 0; s < sets.size(); s++) {
      for (int b : sets.get(s)) {
        sccOfBlock[b] = s;
      }
    }
    int[] component = new int[v];
    for (int x = 0; x < v; x++) {
      component[x] = sccOfBlock[block[x]];
    }
    return new ContractedStrongComponents(component, sets.size());
  }

  /** The strong component of vertex {@code x}, numbered from 0. */
  int of(int x) {
    return component[x];
  }

  /** The number of strong components. */
  int count() {
    return count;
  }
}
