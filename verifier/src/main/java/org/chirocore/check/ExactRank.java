package org.chirocore.check;

import java.util.BitSet;

/**
 * Exact ranks of integer vectors: over Q by fraction-free (Bareiss) elimination in 64-bit integers,
 * every step checked for overflow (an overflow throws instead of giving a wrong rank), and over GF(p)
 * by Gaussian elimination mod p. Cost O(d² · k) for k vectors of length d.
 */
final class ExactRank {
    private ExactRank() {
    }

    /**
     * The rank of the columns whose indices are in {@code set}.
     *
     * @param p 0 for Q, else a prime
     * @throws ArithmeticException when an intermediate value of the elimination over Q overflows a long
     */
    static int rank(long[][] columns, BitSet set, long p) {
        int k = set.cardinality();
        int d = columns.length == 0 ? 0 : columns[0].length;
        long[][] a = new long[d][k];
        int j = 0;
        for (int e = set.nextSetBit(0); e >= 0; e = set.nextSetBit(e + 1)) {
            long[] column = columns[e];
            for (int i = 0; i < d; i++) {
                a[i][j] = p == 0 ? column[i] : Math.floorMod(column[i], p);
            }
            j++;
        }
        return p == 0 ? bareiss(a, k) : modular(a, k, p);
    }

    /**
     * Bareiss's fraction-free elimination: after each pivot step every entry below is a minor of the
     * original matrix (Sylvester's identity), so the division by the previous pivot is exact.
     */
    private static int bareiss(long[][] a, int cols) {
        int rank = 0;
        long previous = 1;
        for (int c = 0; c < cols && rank < a.length; c++) {
            if (!pivotUp(a, rank, c)) {
                continue;
            }
            for (int i = rank + 1; i < a.length; i++) {
                for (int j = c + 1; j < cols; j++) {
                    long cross = Math.subtractExact(Math.multiplyExact(a[rank][c], a[i][j]),
                            Math.multiplyExact(a[i][c], a[rank][j]));
                    a[i][j] = cross / previous;
                }
                a[i][c] = 0;
            }
            previous = a[rank][c];
            rank++;
        }
        return rank;
    }

    private static int modular(long[][] a, int cols, long p) {
        int rank = 0;
        for (int c = 0; c < cols && rank < a.length; c++) {
            if (!pivotUp(a, rank, c)) {
                continue;
            }
            long inverse = java.math.BigInteger.valueOf(a[rank][c]).modInverse(java.math.BigInteger.valueOf(p)).longValue();
            for (int i = rank + 1; i < a.length; i++) {
                long factor = a[i][c] * inverse % p;
                for (int j = c; j < cols; j++) {
                    a[i][j] = Math.floorMod(a[i][j] - factor * a[rank][j], p);
                }
            }
            rank++;
        }
        return rank;
    }

    /** Swaps a row with a non-zero entry in column c into row {@code row}; false when there is none. */
    private static boolean pivotUp(long[][] a, int row, int c) {
        for (int i = row; i < a.length; i++) {
            if (a[i][c] != 0) {
                long[] t = a[row];
                a[row] = a[i];
                a[i] = t;
                return true;
            }
        }
        return false;
    }

    /**
     * The cofactor vector c of d − 1 vectors v_1, …, v_{d−1} of length d (the columns {@code picked}):
     * c · x = det(v_1, …, v_{d−1}, x) for every x, by expanding the determinant along x. So c is zero
     * exactly when the vectors are dependent, and otherwise x lies in their span iff c · x = 0.
     * Cost: d determinants of order d − 1.
     *
     * @throws ArithmeticException when an intermediate value over Q overflows a long
     */
    static long[] cofactors(long[][] columns, int[] picked, long p) {
        int d = picked.length + 1;
        long[] c = new long[d];
        for (int skip = 0; skip < d; skip++) {
            long[][] a = new long[d - 1][d - 1];
            for (int i = 0, row = 0; i < d; i++) {
                if (i == skip) {
                    continue;
                }
                for (int j = 0; j < d - 1; j++) {
                    a[row][j] = p == 0 ? columns[picked[j]][i] : Math.floorMod(columns[picked[j]][i], p);
                }
                row++;
            }
            // the coordinate x_skip sits in row skip of the d × d matrix (v_1, …, v_{d−1}, x)
            long minor = determinant(a, p);
            long sign = (skip + d - 1) % 2 == 0 ? 1 : -1;
            c[skip] = p == 0 ? sign * minor : Math.floorMod(sign * minor, p);
        }
        return c;
    }

    /** c · x, exactly over Q (overflow throws) or mod p. */
    static long dot(long[] c, long[] x, long p) {
        long sum = 0;
        for (int i = 0; i < c.length; i++) {
            sum = p == 0 ? Math.addExact(sum, Math.multiplyExact(c[i], x[i])) : (sum + c[i] * Math.floorMod(x[i], p)) % p;
        }
        return sum;
    }

    /** Whether every entry of {@code c} is 0. */
    static boolean isZero(long[] c) {
        for (long v : c) {
            if (v != 0) {
                return false;
            }
        }
        return true;
    }

    /**
     * The determinant of the square matrix {@code a} (overwritten): over Q by Bareiss's elimination,
     * whose last pivot is the determinant; mod p by Gaussian elimination, the product of the pivots.
     */
    private static long determinant(long[][] a, long p) {
        int k = a.length;
        long sign = 1;
        long previous = 1;
        long product = 1;
        for (int c = 0; c < k; c++) {
            int r = c;
            while (r < k && a[r][c] == 0) {
                r++;
            }
            if (r == k) {
                return 0;
            }
            if (r != c) {
                long[] t = a[r];
                a[r] = a[c];
                a[c] = t;
                sign = -sign;
            }
            long inverse = p == 0 ? 0 : java.math.BigInteger.valueOf(a[c][c]).modInverse(java.math.BigInteger.valueOf(p)).longValue();
            for (int i = c + 1; i < k; i++) {
                long factor = p == 0 ? 0 : a[i][c] * inverse % p;
                for (int j = c + 1; j < k; j++) {
                    a[i][j] = p == 0 ? Math.subtractExact(Math.multiplyExact(a[c][c], a[i][j]), Math.multiplyExact(a[i][c], a[c][j])) / previous
                            : Math.floorMod(a[i][j] - factor * a[c][j], p);
                }
                a[i][c] = 0;
            }
            previous = a[c][c];
            product = p == 0 ? 1 : product * a[c][c] % p;
        }
        if (k == 0) {
            return 1;
        }
        return p == 0 ? sign * a[k - 1][k - 1] : Math.floorMod(sign * product, p);
    }

    /** Whether p is a prime, by trial division (p is at most 46 340 here). */
    static boolean isPrime(long p) {
        if (p < 2) {
            return false;
        }
        for (long q = 2; q * q <= p; q++) {
            if (p % q == 0) {
                return false;
            }
        }
        return true;
    }
}
