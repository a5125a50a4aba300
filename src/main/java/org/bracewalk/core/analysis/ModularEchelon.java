package org.bracewalk.core.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Row echelon form of a sparse integer matrix modulo the Mersenne prime p = 2^61 - 1 (products by
 * {@link Math#multiplyHigh}), built one row at a time. Rank mod p never exceeds the rational rank,
 * so a full rank mod p proves full rational rank; a deficiency is confirmed elsewhere ({@link
 * ExactRank}) before it is reported as proven.
 *
 * <p>Rows are sparse (sorted column indices, values mod p); each new row is reduced by the pivot
 * rows of its leading columns, fill-in moving to higher columns, so the cost follows the damage of
 * a plane, not its size.
 */
final class ModularEchelon {
  static final long P = (1L << 61) - 1;

  private final int columns;
  private final int[][] pivotCols;
  private final long[][] pivotVals;
  private final List<Integer> pivotOrder = new ArrayList<>();
  private int rank;

  ModularEchelon(int columns) {
    this.columns = columns;
    this.pivotCols = new int[columns][];
    this.pivotVals = new long[columns][];
  }

  static long mod(long x) {
    // most values here are coordinates and sums of them, far below p: no division for those
    if (x >= 0) {
      return x < P ? x : x % P;
    }
    if (x > -P) {
      return x + P;
    }
    long r = x % P;
    return r < 0 ? r + P : r;
  }

  static long add(long a, long b) {
    long s = a + b;
    return s >= P ? s - P : s;
  }

  static long sub(long a, long b) {
    long s = a - b;
    return s < 0 ? s + P : s;
  }

  static long mul(long a, long b) {
    long hi = Math.multiplyHigh(a, b);
    long lo = a * b;
    long low61 = lo & P;
    long high = (lo >>> 61) | (hi << 3);
    long r = low61 + high;
    r = (r & P) + (r >>> 61);
    return r >= P ? r - P : r;
  }

  static long inverse(long a) {
    if (a == 0) {
      throw new ArithmeticException("no inverse of 0");
    }
    long result = 1;
    long base = a;
    long e = P - 2;
    while (e > 0) {
      if ((e & 1) != 0) {
        result = mul(result, base);
      }
      base = mul(base, base);
      e >>= 1;
    }
    return result;
  }

  /** A uniformly random nonzero residue. */
  static long random(SplittableRandom rnd) {
    return 1 + rnd.nextLong(P - 1);
  }

  int columns() {
    return columns;
  }

  int rank() {
    return rank;
  }

  /**
   * Adds a row (columns need not be sorted or distinct; values are integers, reduced mod p here);
   * returns true when it raised the rank.
   */
  boolean addRow(int[] cols, long[] vals) {
    int len = cols.length;
    int[] sc = new int[len];
    long[] sv = new long[len];
    boolean ascending = true;
    for (int i = 1; i < len && ascending; i++) {
      ascending = cols[i - 1] < cols[i];
    }
    int k = 0;
    if (ascending) {
      // the usual case (rows built column by column): nothing to sort or merge
      for (int i = 0; i < len; i++) {
        sc[i] = cols[i];
        sv[i] = mod(vals[i]);
      }
      k = len;
    } else {
      // sort by column (index in the low bits keeps equal columns in input order), then merge
      long[] keyed = new long[len];
      for (int i = 0; i < len; i++) {
        keyed[i] = ((long) cols[i] << 32) | i;
      }
      Arrays.sort(keyed);
      for (int t = 0; t < len; t++) {
        int col = (int) (keyed[t] >>> 32);
        long val = mod(vals[(int) keyed[t]]);
        if (k > 0 && sc[k - 1] == col) {
          sv[k - 1] = add(sv[k - 1], val);
        } else {
          sc[k] = col;
          sv[k] = val;
          k++;
        }
      }
    }
    return addReduced(compact(sc, sv, k));
  }

  private boolean addReduced(Object[] row) {
    int[] rc = (int[]) row[0];
    long[] rv = (long[]) row[1];
    while (rc.length > 0) {
      int lead = rc[0];
      if (pivotCols[lead] == null) {
        long inv = inverse(rv[0]);
        for (int i = 0; i < rv.length; i++) {
          rv[i] = mul(rv[i], inv);
        }
        pivotCols[lead] = rc;
        pivotVals[lead] = rv;
        pivotOrder.add(lead);
        rank++;
        return true;
      }
      // row -= rv[0] * pivot (pivot's leading value is 1)
      Object[] next = combine(rc, rv, pivotCols[lead], pivotVals[lead], rv[0]);
      rc = (int[]) next[0];
      rv = (long[]) next[1];
    }
    return false;
  }

  private static Object[] combine(int[] ac, long[] av, int[] bc, long[] bv, long factor) {
    int[] oc = new int[ac.length + bc.length];
    long[] ov = new long[ac.length + bc.length];
    int i = 0;
    int j = 0;
    int k = 0;
    while (i < ac.length || j < bc.length) {
      if (j >= bc.length || (i < ac.length && ac[i] < bc[j])) {
        oc[k] = ac[i];
        ov[k++] = av[i++];
      } else if (i >= ac.length || bc[j] < ac[i]) {
        oc[k] = bc[j];
        ov[k++] = sub(0, mul(factor, bv[j++]));
      } else {
        oc[k] = ac[i];
        ov[k++] = sub(av[i++], mul(factor, bv[j++]));
      }
    }
    return compact(oc, ov, k);
  }

  private static Object[] compact(int[] c, long[] v, int len) {
    int k = 0;
    for (int i = 0; i < len; i++) {
      if (v[i] != 0) {
        c[k] = c[i];
        v[k] = v[i];
        k++;
      }
    }
    return new Object[] {Arrays.copyOf(c, k), Arrays.copyOf(v, k)};
  }

  /**
   * A random vector x of the null space (every row r: r . x = 0 mod p): free columns random, pivot
   * columns solved from the highest pivot down.
   */
  long[] randomNullVector(SplittableRandom rnd) {
    long[] x = new long[columns];
    for (int c = 0; c < columns; c++) {
      if (pivotCols[c] == null) {
        x[c] = random(rnd);
      }
    }
    for (int c = columns - 1; c >= 0; c--) {
      int[] rc = pivotCols[c];
      if (rc == null) {
        continue;
      }
      long[] rv = pivotVals[c];
      long s = 0;
      for (int i = 1; i < rc.length; i++) {
        s = add(s, mul(rv[i], x[rc[i]]));
      }
      x[c] = sub(0, s);
    }
    return x;
  }
}
