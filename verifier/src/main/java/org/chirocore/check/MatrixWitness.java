package org.chirocore.check;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;

import org.chirocore.check.CertificateVerifier.Failure;

/**
 * A minimality witness given as an integer matrix, {@code {"matrix": [[column], ...]}}: r rows
 * (the minor's rank) and one column per element of the minor, in the minor's element order. It
 * proves the minor orientable when, for every r-subset B of the columns, det(A_B) ≠ 0 exactly when
 * B is a basis of the minor: then B ↦ sign det(A_B) is a chirotope with the minor's bases as
 * support ([BLSWZ, §1.2 and §3.5]; docs/mathematics.md §5), so no Grassmann–Plücker relation
 * needs to be scanned. Only whether a determinant vanishes is needed, so each r-subset gets an
 * exact rank test: fraction-free elimination in checked 64-bit arithmetic ({@link ExactRank}),
 * redone with BigInteger when a value overflows or an entry does not fit a long.
 *
 * <p>Cost: C(m, r) rank tests of r × r matrices, O(r³) each, for a witness of rank r on m
 * elements; {@link #steps} is that count, which the caller bounds before any work.
 */
final class MatrixWitness {
    private MatrixWitness() {
    }

    /** The elimination steps of a matrix witness of a minor of this shape: C(m, r) · r³, saturating at Long.MAX_VALUE. */
    static long steps(BasisTable.Shape minor) {
        long subsets = 1;
        for (int i = 0; i < minor.rank(); i++) {
            // C(m, i + 1) = C(m, i) · (m − i) / (i + 1), exact at every step
            long product = multiplySaturating(subsets, minor.size() - i);
            if (product == Long.MAX_VALUE) {
                return Long.MAX_VALUE;
            }
            subsets = product / (i + 1);
        }
        long cube = Math.max(1L, (long) minor.rank() * minor.rank() * minor.rank());
        return multiplySaturating(subsets, cube);
    }

    private static long multiplySaturating(long a, long b) {
        return b != 0 && a > Long.MAX_VALUE / b ? Long.MAX_VALUE : a * b;
    }

    /**
     * Checks the matrix witness {@code witness} (an object with the member {@code matrix}) of
     * {@code minor}, whose description in messages is {@code what}.
     *
     * @throws Failure naming the first column, entry or r-subset at fault
     */
    static void check(BasisTable minor, JsonTree.Obj witness, String what) throws Failure {
        witness.requireOnly(List.of("matrix"));
        JsonTree.Arr matrix = witness.require("matrix").asArray(what + ".matrix");
        int r = minor.rank;
        if (matrix.size() != minor.size) {
            throw new Failure(what + " is a matrix of " + matrix.size() + " columns; the minor has " + minor.size + " elements");
        }
        BigInteger[][] columns = new BigInteger[minor.size][];
        boolean fitsLong = true;
        for (int j = 0; j < columns.length; j++) {
            JsonTree.Arr column = matrix.get(j).asArray(what + ".matrix[" + j + "]");
            if (column.size() != r) {
                throw new Failure(what + ": column " + j + " has " + column.size() + " entries; the minor has rank " + r
                        + ", so every column needs " + r);
            }
            columns[j] = new BigInteger[r];
            for (int i = 0; i < r; i++) {
                columns[j][i] = entry(column.get(i), what + ": column " + j + ", row " + i);
                fitsLong &= columns[j][i].bitLength() < 64;
            }
        }
        long[][] small = fitsLong ? longs(columns) : null;
        int[] subset = new int[r];
        for (int i = 0; i < r; i++) {
            subset[i] = i;
        }
        do {
            boolean nonZero = fullRank(columns, small, subset);
            boolean basis = minor.positionOf(subset) >= 0;
            if (nonZero != basis) {
                throw new Failure(what + ": the columns " + Arrays.toString(subset) + " (elements numbered in the minor) have "
                        + (basis ? "determinant 0, but they are a basis of the minor" : "a non-zero determinant, but they are not a basis of the minor"));
            }
        } while (ProvenanceCheck.nextCombination(subset, minor.size));
    }

    /** An entry: a JSON integer of at most {@link VerifierLimits#MAX_MATRIX_DIGITS} digits. */
    private static BigInteger entry(JsonTree.Value v, String what) throws Failure {
        String text;
        if (v instanceof JsonTree.Int i) {
            text = Long.toString(i.value());
        } else if (v instanceof JsonTree.Num n && n.text().matches("-?(0|[1-9][0-9]*)")) {
            text = n.text();
        } else {
            throw new Failure(what + " is " + v.kind() + "; entries must be integers");
        }
        int digits = text.length() - (text.startsWith("-") ? 1 : 0);
        if (digits > VerifierLimits.MAX_MATRIX_DIGITS) {
            throw new Failure(what + " has " + digits + " digits, more than the verifier's limit of " + VerifierLimits.MAX_MATRIX_DIGITS
                    + " (MAX_MATRIX_DIGITS)");
        }
        return new BigInteger(text);
    }

    private static long[][] longs(BigInteger[][] columns) {
        long[][] out = new long[columns.length][];
        for (int j = 0; j < columns.length; j++) {
            out[j] = new long[columns[j].length];
            for (int i = 0; i < out[j].length; i++) {
                out[j][i] = columns[j][i].longValueExact();
            }
        }
        return out;
    }

    /** Whether the columns {@code subset} (r of them, each of length r) are independent, i.e. their determinant is non-zero. */
    private static boolean fullRank(BigInteger[][] columns, long[][] small, int[] subset) {
        if (small != null) {
            BitSet set = new BitSet();
            for (int e : subset) {
                set.set(e);
            }
            try {
                return ExactRank.rank(small, set, 0) == subset.length;
            } catch (ArithmeticException overflow) {
                // a value beyond 64 bits: redo exactly below
            }
        }
        return bigRank(columns, subset) == subset.length;
    }

    /** Rank by Bareiss's fraction-free elimination over BigInteger: every division is exact (Sylvester's identity). */
    private static int bigRank(BigInteger[][] columns, int[] subset) {
        int d = subset.length;
        BigInteger[][] a = new BigInteger[d][d];
        for (int j = 0; j < d; j++) {
            for (int i = 0; i < d; i++) {
                a[i][j] = columns[subset[j]][i];
            }
        }
        int rank = 0;
        BigInteger previous = BigInteger.ONE;
        for (int c = 0; c < d; c++) {
            int p = rank;
            while (p < d && a[p][c].signum() == 0) {
                p++;
            }
            if (p == d) {
                return rank; // a column without pivot: the determinant is 0
            }
            BigInteger[] t = a[p];
            a[p] = a[rank];
            a[rank] = t;
            for (int i = rank + 1; i < d; i++) {
                for (int j = c + 1; j < d; j++) {
                    a[i][j] = a[rank][c].multiply(a[i][j]).subtract(a[i][c].multiply(a[rank][j])).divide(previous);
                }
                a[i][c] = BigInteger.ZERO;
            }
            previous = a[rank][c];
            rank++;
        }
        return rank;
    }
}
