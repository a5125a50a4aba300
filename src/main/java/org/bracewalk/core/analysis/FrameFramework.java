package org.bracewalk.core.analysis;

import java.util.Arrays;
import java.util.Map;
import java.util.Set;
import org.bracewalk.core.model.Brace;
import org.bracewalk.core.model.FrameRef;
import org.bracewalk.core.model.Joint;
import org.bracewalk.core.model.PanelRef;
import org.bracewalk.core.model.PlaneGrid;
import org.bracewalk.core.model.Support;

/**
 * The bar-and-joint framework of one state of a plane, laid out as a plane graph in flat arrays:
 * every ledger and standard of the grid (with a flag saying whether it is there), every effective
 * diagonal, and the faces. A panel with a cross gets a pin at the crossing and four
 * half-diagonals: that changes no first-order freedom (the pin is held by two pairs of collinear
 * halves) and makes the graph planar.
 *
 * <p>Coordinates are integers: half-millimetres, cumulative, from the grid's metres, so the
 * crossing of a cross lies on the integer lattice and all arithmetic is exact.
 *
 * <p>Members: ledger (level, bay) has id {@code level * bays + bay - 1}; standard (lift, line) has
 * id {@code (lifts + 1) * bays + (lift - 1) * (bays + 1) + line}; diagonals follow. A member runs
 * from {@code ja} to {@code jb} (ledgers to the right, standards up, a rising diagonal up to the
 * right, a falling one down to the right); {@code faceL} is the face on its left, {@code faceR}
 * on its right, {@link #OUTER} outside the plane. Every face is walked anticlockwise.
 */
final class FrameFramework {
  static final int OUTER = -1;
  static final byte LEDGER = 0;
  static final byte STANDARD = 1;
  static final byte DIAGONAL = 2;
  static final byte HALF = 3;

  final PlaneGrid grid;
  final int lifts;
  final int bays;
  final boolean pinned;
  final long[] xs;
  final long[] ys;
  final int gridJoints;
  final int jointCount;
  final int frameCount;

  int memberCount;
  int[] ja;
  int[] jb;
  long[] dx;
  long[] dy;
  int[] faceL;
  int[] faceR;
  byte[] type;
  /** Panel index of a diagonal; unused for frame members. */
  int[] panel;
  /** 0 rising, 1 falling, for diagonals. */
  byte[] way;
  boolean[] present;
  boolean[] ground;
  /** For a half diagonal, the other half of the same diagonal. */
  int[] twin;

  int faceCount;
  /** Up to four members per face, anticlockwise; -1 pads a triangle. */
  int[] faceMembers;
  /** The diagonals of each panel as analysed: bit 0 rising, bit 1 falling. */
  final byte[] diagonals;

  private FrameFramework(PlaneGrid grid) {
    this.grid = grid;
    this.lifts = grid.lifts();
    this.bays = grid.bays();
    this.pinned = grid.support() == Support.PINNED_BASE;
    xs = new long[bays + 1];
    ys = new long[lifts + 1];
    for (int j = 1; j <= bays; j++) {
      xs[j] = xs[j - 1] + 2 * Math.max(1, Math.round(grid.bayWidths().get(j - 1) * 1000));
    }
    for (int i = 1; i <= lifts; i++) {
      ys[i] = ys[i - 1] + 2 * Math.max(1, Math.round(grid.liftHeights().get(i - 1) * 1000));
    }
    gridJoints = (lifts + 1) * (bays + 1);
    jointCount = gridJoints + lifts * bays;
    frameCount = (lifts + 1) * bays + lifts * (bays + 1);
    diagonals = new byte[lifts * bays];
  }

  /** The framework of a state: braces (tension-only taken as bars) and the absent frame members. */
  static FrameFramework of(PlaneGrid grid, Map<PanelRef, Brace> braces, Set<FrameRef> absent) {
    byte[] codes = new byte[grid.panelCount()];
    for (Map.Entry<PanelRef, Brace> e : braces.entrySet()) {
      PanelRef p = e.getKey();
      int idx = (p.lift() - 1) * grid.bays() + p.bay() - 1;
      codes[idx] =
          (byte)
              ((e.getValue().diagonal().hasRising() ? 1 : 0)
                  | (e.getValue().diagonal().hasFalling() ? 2 : 0));
    }
    boolean[] there = new boolean[(grid.lifts() + 1) * grid.bays() + grid.lifts() * (grid.bays() + 1)];
    Arrays.fill(there, true);
    for (FrameRef f : absent) {
      there[frameId(grid.lifts(), grid.bays(), f)] = false;
    }
    return of(grid, codes, there);
  }

  /**
   * The framework with diagonal codes per panel (bit 0 rising, bit 1 falling) and a flag per frame
   * member id saying it is there.
   */
  static FrameFramework of(PlaneGrid grid, byte[] codes, boolean[] frameThere) {
    FrameFramework f = new FrameFramework(grid);
    f.build(codes, frameThere);
    return f;
  }

  static int frameId(int lifts, int bays, FrameRef f) {
    return f.isLedger()
        ? f.first() * bays + f.second() - 1
        : (lifts + 1) * bays + (f.first() - 1) * (bays + 1) + f.second();
  }

  int frameId(FrameRef f) {
    return frameId(lifts, bays, f);
  }

  FrameRef frameRef(int member) {
    if (member < (lifts + 1) * bays) {
      return FrameRef.ledger(member / bays, member % bays + 1);
    }
    int s = member - (lifts + 1) * bays;
    return FrameRef.standard(s / (bays + 1) + 1, s % (bays + 1));
  }

  int joint(int level, int line) {
    return level * (bays + 1) + line;
  }

  boolean isGridJoint(int j) {
    return j < gridJoints;
  }

  Joint jointRef(int j) {
    return new Joint(j / (bays + 1), j % (bays + 1));
  }

  long x(int j) {
    if (j < gridJoints) {
      return xs[j % (bays + 1)];
    }
    int p = j - gridJoints;
    int bay = p % bays;
    return (xs[bay] + xs[bay + 1]) / 2;
  }

  long y(int j) {
    if (j < gridJoints) {
      return ys[j / (bays + 1)];
    }
    int p = j - gridJoints;
    int lift = p / bays;
    return (ys[lift] + ys[lift + 1]) / 2;
  }

  PanelRef panelRef(int idx) {
    return PanelCodes.panel(idx, bays);
  }

  boolean isFrame(int member) {
    return member < frameCount;
  }

  private int newMember(int a, int b, byte t) {
    return newMember(a, b, t, x(b) - x(a), y(b) - y(a));
  }

  private int newMember(int a, int b, byte t, long ddx, long ddy) {
    int e = memberCount++;
    ja[e] = a;
    jb[e] = b;
    dx[e] = ddx;
    dy[e] = ddy;
    faceL[e] = OUTER;
    faceR[e] = OUTER;
    type[e] = t;
    panel[e] = -1;
    twin[e] = -1;
    present[e] = true;
    return e;
  }

  private int newFace(int a, int b, int c, int d) {
    int f = faceCount++;
    faceMembers[4 * f] = a;
    faceMembers[4 * f + 1] = b;
    faceMembers[4 * f + 2] = c;
    faceMembers[4 * f + 3] = d;
    return f;
  }

  private void build(byte[] codes, boolean[] frameThere) {
    int diagCount = 0;
    int faces = 0;
    for (int idx = 0; idx < codes.length; idx++) {
      diagonals[idx] = codes[idx];
      switch (codes[idx]) {
        case 1, 2 -> {
          diagCount += 1;
          faces += 2;
        }
        case 3 -> {
          diagCount += 4;
          faces += 4;
        }
        default -> faces += 1;
      }
    }
    int cap = frameCount + diagCount;
    ja = new int[cap];
    jb = new int[cap];
    dx = new long[cap];
    dy = new long[cap];
    faceL = new int[cap];
    faceR = new int[cap];
    type = new byte[cap];
    panel = new int[cap];
    way = new byte[cap];
    present = new boolean[cap];
    ground = new boolean[cap];
    twin = new int[cap];
    faceMembers = new int[4 * faces];
    for (int level = 0; level <= lifts; level++) {
      for (int bay = 1; bay <= bays; bay++) {
        int e = newMember(joint(level, bay - 1), joint(level, bay), LEDGER, xs[bay] - xs[bay - 1], 0);
        present[e] = frameThere[e];
        if (pinned && level == 0) {
          present[e] = true;
          ground[e] = true;
        }
      }
    }
    for (int lift = 1; lift <= lifts; lift++) {
      for (int line = 0; line <= bays; line++) {
        int e = newMember(joint(lift - 1, line), joint(lift, line), STANDARD, 0, ys[lift] - ys[lift - 1]);
        present[e] = frameThere[e];
      }
    }
    for (int lift = 1; lift <= lifts; lift++) {
      for (int bay = 1; bay <= bays; bay++) {
        int idx = (lift - 1) * bays + bay - 1;
        int bl = joint(lift - 1, bay - 1);
        int br = joint(lift - 1, bay);
        int tl = joint(lift, bay - 1);
        int tr = joint(lift, bay);
        int bottom = (lift - 1) * bays + bay - 1;
        int top = lift * bays + bay - 1;
        int left = (lifts + 1) * bays + (lift - 1) * (bays + 1) + bay - 1;
        int right = left + 1;
        switch (codes[idx]) {
          case 1 -> {
            int d = diagonal(bl, tr, DIAGONAL, idx, (byte) 0);
            int lr = newFace(bottom, right, d, -1);
            int ul = newFace(top, left, d, -1);
            faceL[bottom] = lr;
            faceL[right] = lr;
            faceR[d] = lr;
            faceR[top] = ul;
            faceR[left] = ul;
            faceL[d] = ul;
          }
          case 2 -> {
            int d = diagonal(tl, br, DIAGONAL, idx, (byte) 1);
            int ll = newFace(bottom, d, left, -1);
            int ur = newFace(right, top, d, -1);
            faceL[bottom] = ll;
            faceR[left] = ll;
            faceR[d] = ll;
            faceL[right] = ur;
            faceR[top] = ur;
            faceL[d] = ur;
          }
          case 3 -> {
            int c = gridJoints + idx;
            int r1 = diagonal(bl, c, HALF, idx, (byte) 0);
            int r2 = diagonal(c, tr, HALF, idx, (byte) 0);
            int f1 = diagonal(tl, c, HALF, idx, (byte) 1);
            int f2 = diagonal(c, br, HALF, idx, (byte) 1);
            twin[r1] = r2;
            twin[r2] = r1;
            twin[f1] = f2;
            twin[f2] = f1;
            int fb = newFace(bottom, f2, r1, -1);
            int fr = newFace(right, r2, f2, -1);
            int ft = newFace(top, f1, r2, -1);
            int fl = newFace(left, r1, f1, -1);
            faceL[bottom] = fb;
            faceR[f2] = fb;
            faceR[r1] = fb;
            faceL[right] = fr;
            faceR[r2] = fr;
            faceL[f2] = fr;
            faceR[top] = ft;
            faceL[f1] = ft;
            faceL[r2] = ft;
            faceR[left] = fl;
            faceL[r1] = fl;
            faceR[f1] = fl;
          }
          default -> {
            int f = newFace(bottom, right, top, left);
            faceL[bottom] = f;
            faceL[right] = f;
            faceR[top] = f;
            faceR[left] = f;
          }
        }
      }
    }
  }

  private int diagonal(int a, int b, byte t, int idx, byte w) {
    int e = newMember(a, b, t);
    panel[e] = idx;
    way[e] = w;
    return e;
  }

  /** +1 when face f lies on the left of member e (e walked a to b), -1 when on its right. */
  int side(int f, int e) {
    return faceL[e] == f ? 1 : -1;
  }
}
