package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * The brace graph of one bracing state, held in flat arrays so that planes of a million panels
 * stay fast and small. Vertex {@code i} (0-based) is lift {@code i + 1}, vertex {@code m + j} is
 * bay {@code j + 1}, and on a pinned base vertex {@code m + n} is the ground, joined to every bay by
 * links that cannot be lost. Each member is one edge: a cross is two parallel edges.
 *
 * <p>This class holds the members only; each algorithm on them is a class of its own, named for
 * its technique and problem: {@link UnionFindBlocks} (verdict, blocks, the repair's Kruskal),
 * {@link TarjanBridges} (critical braces), {@link ContractedStrongComponents} (tension-only
 * members) and {@link StoerWagnerEdgeConnectivity} (loss tolerance).
 *
 * <p>Arcs for tension-only members follow analysis.md: a rising ({@code /}) member in panel
 * {@code (i, j)} gives the arc lift → bay, a falling ({@code \}) member the arc bay → lift; a rigid
 * member and every ground link give both arcs.
 */
final class BraceGraph {
  static final byte RISING = 0;
  static final byte FALLING = 1;

  final int lifts;
  final int bays;
  final boolean pinned;
  final int vertexCount;
  final int ground;
  private int memberCount;
  private int[] lift = new int[16];
  private int[] bay = new int[16];
  private byte[] dir = new byte[16];
  private boolean[] rigid = new boolean[16];
  private int tensionCount;

  BraceGraph(PlaneGrid grid) {
    this.lifts = grid.lifts();
    this.bays = grid.bays();
    this.pinned = grid.support() == Support.PINNED_BASE;
    this.ground = pinned ? lifts + bays : -1;
    this.vertexCount = lifts + bays + (pinned ? 1 : 0);
  }

  static BraceGraph of(PlaneGrid grid, Map<PanelRef, Brace> members) {
    return of(grid, PanelCodes.encode(grid, members));
  }

  /** The graph of the members coded per panel (see {@link PanelCodes}), in lift-then-bay order. */
  static BraceGraph of(PlaneGrid grid, byte[] codes) {
    BraceGraph g = new BraceGraph(grid);
    int n = grid.bays();
    for (int idx = 0; idx < codes.length; idx++) {
      if (codes[idx] != PanelCodes.NONE) {
        g.add(idx / n, idx % n, PanelCodes.decode(codes[idx]));
      }
    }
    return g;
  }

  BraceGraph copy() {
    BraceGraph c = new BraceGraph(lifts, bays, pinned);
    c.memberCount = memberCount;
    c.lift = Arrays.copyOf(lift, lift.length);
    c.bay = Arrays.copyOf(bay, bay.length);
    c.dir = Arrays.copyOf(dir, dir.length);
    c.rigid = Arrays.copyOf(rigid, rigid.length);
    c.tensionCount = tensionCount;
    return c;
  }

  private BraceGraph(int lifts, int bays, boolean pinned) {
    this.lifts = lifts;
    this.bays = bays;
    this.pinned = pinned;
    this.ground = pinned ? lifts + bays : -1;
    this.vertexCount = lifts + bays + (pinned ? 1 : 0);
  }

  /** Adds the member(s) of {@code brace} in panel {@code p}; returns how many edges were added. */
  int add(PanelRef p, Brace brace) {
    return add(p.lift() - 1, p.bay() - 1, brace);
  }

  private int add(int l, int b, Brace brace) {
    boolean isRigid = brace.isRigid();
    int added = 0;
    if (brace.diagonal().hasRising()) {
      addMember(l, b, RISING, isRigid);
      added++;
    }
    if (brace.diagonal().hasFalling()) {
      addMember(l, b, FALLING, isRigid);
      added++;
    }
    return added;
  }

  private void addMember(int l, int b, byte d, boolean isRigid) {
    if (memberCount == lift.length) {
      int cap = memberCount * 2;
      lift = Arrays.copyOf(lift, cap);
      bay = Arrays.copyOf(bay, cap);
      dir = Arrays.copyOf(dir, cap);
      rigid = Arrays.copyOf(rigid, cap);
    }
    lift[memberCount] = l;
    bay[memberCount] = b;
    dir[memberCount] = d;
    rigid[memberCount] = isRigid;
    memberCount++;
    if (!isRigid) {
      tensionCount++;
    }
  }

  int memberCount() {
    return memberCount;
  }

  boolean hasTension() {
    return tensionCount > 0;
  }

  /** The vertex of the lift of {@code member}. */
  int liftVertex(int member) {
    return lift[member];
  }

  /** The vertex of the bay of {@code member}. */
  int bayVertex(int member) {
    return lifts + bay[member];
  }

  /** Whether {@code member} is rigid (else it is tension-only). */
  boolean isRigid(int member) {
    return rigid[member];
  }

  /** Whether {@code member} rises ({@code /}; else it falls, {@code \}). */
  boolean isRising(int member) {
    return dir[member] == RISING;
  }

  PanelRef panel(int member) {
    return new PanelRef(lift[member] + 1, bay[member] + 1);
  }

  /** Members of each panel, for listing critical panels. */
  List<PanelRef> panelsOf(boolean[] memberFlags) {
    List<PanelRef> out = new ArrayList<>();
    for (int e = 0; e < memberCount; e++) {
      if (memberFlags[e]) {
        out.add(panel(e));
      }
    }
    return out;
  }
}
