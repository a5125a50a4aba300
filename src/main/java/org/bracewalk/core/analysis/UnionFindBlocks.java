package org.bracewalk.core.analysis;

/**
 * The blocks of a brace graph (its connected components) by union-find: disjoint sets with path
 * halving and union by size, O(E α(V)). The verdict and the blocks of every plane, and the
 * repair's Kruskal over the panels a repair may use, run here.
 *
 * <p>Flat arrays, not JGraphT: this runs on every plane, up to a million panels, and the repair
 * scans candidate panels lazily, only as far as needed to join the blocks; a JGraphT graph of a
 * million edges costs far more time and heap (measured with {@code bench}).
 */
final class UnionFindBlocks {
  private final int[] parent;
  private final int[] size;
  private int count;

  UnionFindBlocks(int n) {
    parent = new int[n];
    size = new int[n];
    for (int i = 0; i < n; i++) {
      parent[i] = i;
      size[i] = 1;
    }
    count = n;
  }

  /**
   * The blocks of {@code g}: every member joins its lift and bay ({@code rigidOnly}: rigid members
   * only), and on a pinned base the ground links join the ground to every bay.
   */
  static UnionFindBlocks of(BraceGraph g, boolean rigidOnly) {
    UnionFindBlocks uf = new UnionFindBlocks(g.vertexCount);
    if (g.pinned) {
      for (int j = 0; j < g.bays; j++) {
        uf.union(g.ground, g.lifts + j);
      }
    }
    for (int e = 0; e < g.memberCount(); e++) {
      if (!rigidOnly || g.isRigid(e)) {
        uf.union(g.liftVertex(e), g.bayVertex(e));
      }
    }
    return uf;
  }

  /** The representative of the block holding vertex {@code x}. */
  int find(int x) {
    while (parent[x] != x) {
      parent[x] = parent[parent[x]];
      x = parent[x];
    }
    return x;
  }

  /** Joins the blocks of a and b; true when they were apart. */
  boolean union(int a, int b) {
    int ra = find(a);
    int rb = find(b);
    if (ra == rb) {
      return false;
    }
    if (size[ra] < size[rb]) {
      int t = ra;
      ra = rb;
      rb = t;
    }
    parent[rb] = ra;
    size[ra] += size[rb];
    count--;
    return true;
  }

  /** The number of blocks. */
  int count() {
    return count;
  }
}
