package org.chirocore.matroid;

import java.math.BigInteger;
import java.util.Arrays;

/**
 * The signs of all maximal minors of an r × n integer matrix of rank r, visited in lexicographic
 * order of the column subsets. The r-subsets are walked depth first, and the fraction-free
 * (Bareiss) elimination of a prefix c1 < … < ck is shared by every subset that starts with it:
 * the remaining columns are carried through one more elimination step per level, so a subset's
 * determinant costs O(1) at the last level and a prefix costs O(r·n) once. A prefix whose columns
 * are dependent ends its subtree: every completion has determinant 0. Bareiss's intermediate
 * values are minors of the matrix, so when Hadamard's bound H (the product of the r largest column
 * norms) has H² < 2^62 no product can overflow a long; otherwise each determinant is computed on
 * its own with BigInteger. Exact throughout; not thread-safe (one instance per walk).
 */
final class MaximalMinors {
    private final long[][] columns;
    private final int rank;
    private final int size;
    /** work[k][c]: column c after the elimination steps of levels 0..k−1 (rows below k are stale). */
    private final long[][][] work;
    private final int[] subset;
    private Realisation.SignVisitor visitor;
    private boolean stopped;

    /** @param columns n columns of length r; the matrix must have rank r for any sign to be non-zero */
    MaximalMinors(long[][] columns, int rank) {
        this.columns = columns;
        this.rank = rank;
        this.size = columns.length;
        this.work = new long[Math.max(rank, 1)][size][rank];
        this.subset = new int[rank];
    }

    /** Visits every r-subset in lexicographic order with the sign of its determinant. */
    void walk(Realisation.SignVisitor v) {
        visitor = v;
        stopped = false;
        if (rank == 0) {
            v.visit(subset, 1);
            return;
        }
        if (size < rank) {
            return;
        }
        if (fitsLong()) {
            for (int c = 0; c < size; c++) {
                System.arraycopy(columns[c], 0, work[0][c], 0, rank);
            }
            descend(0, 0, 1, 1);
        } else {
            walkBig();
        }
    }

    /** Whether H² < 2^62 for Hadamard's bound H on every minor of size at most r. */
    private boolean fitsLong() {
        BigInteger[] norms = new BigInteger[size];
        for (int c = 0; c < size; c++) {
            BigInteger n = BigInteger.ZERO;
            for (long x : columns[c]) {
                n = n.add(BigInteger.valueOf(x).pow(2));
            }
            norms[c] = n.max(BigInteger.ONE);
        }
        Arrays.sort(norms);
        BigInteger h2 = BigInteger.ONE;
        for (int i = 0; i < rank; i++) {
            h2 = h2.multiply(norms[size - 1 - i]);
        }
        return h2.bitLength() <= 62;
    }

    private void descend(int level, int from, long previousPivot, int sign) {
        long[][] current = work[level];
        for (int c = from; c <= size - rank + level && !stopped; c++) {
            subset[level] = c;
            long[] x = current[c];
            if (level == rank - 1) {
                // After r − 1 Bareiss steps the last entry is the determinant of the permuted rows.
                stopped = !visitor.visit(subset, sign * Long.signum(x[rank - 1]));
                continue;
            }
            int p = level;
            while (p < rank && x[p] == 0) {
                p++;
            }
            if (p == rank) {
                zeros(level + 1, c + 1);
                continue;
            }
            long pivot = x[p];
            long[][] next = work[level + 1];
            // Swap rows `level` and p (virtually), then eliminate below the pivot in every later column.
            for (int d = c + 1; d < size; d++) {
                long[] y = current[d];
                long[] z = next[d];
                long yTop = y[p];
                for (int i = level + 1; i < rank; i++) {
                    long yi = i == p ? y[level] : y[i];
                    long xi = i == p ? x[level] : x[i];
                    z[i] = (pivot * yi - xi * yTop) / previousPivot;
                }
            }
            descend(level + 1, c + 1, pivot, p == level ? sign : -sign);
        }
    }

    /** Visits, with sign 0, every completion of subset[0..level) by elements from {@code from} on. */
    private void zeros(int level, int from) {
        if (level == rank) {
            stopped = !visitor.visit(subset, 0);
            return;
        }
        for (int c = from; c <= size - rank + level && !stopped; c++) {
            subset[level] = c;
            zeros(level + 1, c + 1);
        }
    }

    /** The slow path for large entries: each determinant by BigInteger Bareiss elimination. */
    private void walkBig() {
        int[] comb = ElementSets.range(rank);
        do {
            BigInteger[][] a = new BigInteger[rank][rank];
            for (int j = 0; j < rank; j++) {
                for (int i = 0; i < rank; i++) {
                    a[i][j] = BigInteger.valueOf(columns[comb[j]][i]);
                }
            }
            System.arraycopy(comb, 0, subset, 0, rank);
            stopped = !visitor.visit(subset, MatrixMatroid.bareissDeterminant(a).signum());
        } while (!stopped && ElementSets.nextCombination(comb, size));
    }
}
