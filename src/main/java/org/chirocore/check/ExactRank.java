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
