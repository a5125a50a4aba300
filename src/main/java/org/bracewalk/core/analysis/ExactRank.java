package org.bracewalk.core.analysis;

import java.math.BigInteger;

/**
 * Exact rank and null vectors of a small dense integer matrix by fraction-free Gaussian
 * elimination over BigInteger (E. H. Bareiss, "Sylvester's identity and multistep
 * integer-preserving Gaussian elimination", Math. Comp. 22 (1968)). Used to confirm a rank
 * deficiency found modulo a prime ({@link ModularEchelon}) and to give drawings an exact motion.
 */
final class ExactRank {
  private ExactRank() {}

  /** The rank of {@code rows} (each of length {@code columns}); the array is not changed. */
  static int rank(long[][] rows, int columns) {
    return eliminate(toBig(rows, columns), columns).rank;
  }

  /**
   * A nonzero integer vector x with every row . x = 0, or {@code null} when the columns are
   * independent.
   */
  static BigInteger[] nullVector(long[][] rows, int columns) {
    Reduced r = eliminate(toBig(rows, columns), columns);
    if (r.rank == columns) {
      return null;
    }
    int free = -1;
    for (int c = 0; c < columns; c++) {
      if (!r.isPivot[c]) {
        free = c;
        break;
      }
    }
    return solve(r, columns, free);
  }

  /** A basis of the null space: one integer vector per free column (empty when independent). */
  static BigInteger[][] nullBasis(long[][] rows, int columns) {
    Reduced r = eliminate(toBig(rows, columns), columns);
    BigInteger[][] out = new BigInteger[columns - r.rank][];
    int k = 0;
    for (int c = 0; c < columns; c++) {
      if (!r.isPivot[c]) {
        out[k++] = solve(r, columns, c);
      }
    }
    return out;
  }

  private static BigInteger[] solve(Reduced r, int columns, int free) {
    // Back substitution with a common denominator: x_free = D, other free columns 0.
    BigInteger[] num = new BigInteger[columns];
    BigInteger[] den = new BigInteger[columns];
    for (int c = 0; c < columns; c++) {
      num[c] = BigInteger.ZERO;
      den[c] = BigInteger.ONE;
    }
    num[free] = BigInteger.ONE;
    for (int i = r.rank - 1; i >= 0; i--) {
      BigInteger[] row = r.m[i];
      int pc = r.pivotCol[i];
      // row[pc] * x_pc + sum row[c] x_c = 0
      BigInteger sNum = BigInteger.ZERO;
      BigInteger sDen = BigInteger.ONE;
      for (int c = pc + 1; c < columns; c++) {
        if (row[c].signum() != 0 && num[c].signum() != 0) {
          BigInteger tn = row[c].multiply(num[c]);
          BigInteger td = den[c];
          sNum = sNum.multiply(td).add(tn.multiply(sDen));
          sDen = sDen.multiply(td);
          BigInteger g = sNum.gcd(sDen);
          if (g.signum() != 0 && !g.equals(BigInteger.ONE)) {
            sNum = sNum.divide(g);
            sDen = sDen.divide(g);
          }
        }
      }
      BigInteger n = sNum.negate();
      BigInteger d = sDen.multiply(row[pc]);
      if (d.signum() < 0) {
        n = n.negate();
        d = d.negate();
      }
      BigInteger g = n.gcd(d);
      if (g.signum() != 0 && !g.equals(BigInteger.ONE)) {
        n = n.divide(g);
        d = d.divide(g);
      }
      num[pc] = n;
      den[pc] = d;
    }
    BigInteger lcm = BigInteger.ONE;
    for (int c = 0; c < columns; c++) {
      lcm = lcm.divide(lcm.gcd(den[c])).multiply(den[c]);
    }
    BigInteger[] x = new BigInteger[columns];
    for (int c = 0; c < columns; c++) {
      x[c] = num[c].multiply(lcm.divide(den[c]));
    }
    return x;
  }

  private static BigInteger[][] toBig(long[][] rows, int columns) {
    BigInteger[][] m = new BigInteger[rows.length][columns];
    for (int i = 0; i < rows.length; i++) {
      for (int c = 0; c < columns; c++) {
        m[i][c] = BigInteger.valueOf(rows[i][c]);
      }
    }
    return m;
  }

  private record Reduced(BigInteger[][] m, int rank, int[] pivotCol, boolean[] isPivot) {}

  private static Reduced eliminate(BigInteger[][] m, int columns) {
    int rows = m.length;
    int r = 0;
    int[] pivotCol = new int[Math.min(rows, columns)];
    boolean[] isPivot = new boolean[columns];
    BigInteger prev = BigInteger.ONE;
    for (int c = 0; c < columns && r < rows; c++) {
      int sel = -1;
      for (int i = r; i < rows; i++) {
        if (m[i][c].signum() != 0) {
          sel = i;
          break;
        }
      }
      if (sel < 0) {
        continue;
      }
      BigInteger[] t = m[sel];
      m[sel] = m[r];
      m[r] = t;
      BigInteger piv = m[r][c];
      for (int i = r + 1; i < rows; i++) {
        BigInteger f = m[i][c];
        for (int k = c; k < columns; k++) {
          m[i][k] = m[i][k].multiply(piv).subtract(f.multiply(m[r][k])).divide(prev);
        }
      }
      prev = piv;
      pivotCol[r] = c;
      isPivot[c] = true;
      r++;
    }
    return new Reduced(m, r, pivotCol, isPivot);
  }
}
