package org.chirocore.matroid;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The vector matroid of the columns of an integer matrix over the rationals or over GF(p):
 * a set of columns is independent when the columns are linearly independent. Ranks over Q use
 * fraction-free (Bareiss) elimination in exact long arithmetic, redone with BigInteger when a
 * value would overflow; no floating point is involved. A rank query on k columns of an
 * m-row matrix costs O(m·k·min(m,k)) arithmetic operations. Immutable.
 */
public final class MatrixMatroid implements Matroid {
    private final Field field;
    private final long[][] columns;
    private final int rows;
    private final List<String> labels;
    private final int rank;

    /**
     * @param columns the columns, all of the same length; over GF(p) entries are reduced mod p
     * @param labels one distinct label per column
     */
    public MatrixMatroid(Field field, List<long[]> columns, List<String> labels) {
        if (columns.size() != labels.size()) {
            throw new InvalidMatroidException("A matrix with " + columns.size() + " columns needs as many labels, got "
                    + labels.size() + ".");
        }
        this.field = field;
        this.rows = columns.isEmpty() ? 0 : columns.get(0).length;
        this.columns = new long[columns.size()][];
        for (int j = 0; j < columns.size(); j++) {
            long[] c = columns.get(j);
            if (c.length != rows) {
                throw new InvalidMatroidException("Column " + j + " has " + c.length + " entries, but column 0 has "
                        + rows + ".");
            }
            this.columns[j] = c.clone();
            if (!field.isRational()) {
                for (int i = 0; i < rows; i++) {
                    this.columns[j][i] = Math.floorMod(c[i], field.characteristic());
                }
            }
        }
        this.labels = List.copyOf(labels);
        this.rank = rank(ElementSets.range(columns.size()));
    }

    /** The field of representation. */
    public Field field() {
        return field;
    }

    /** A copy of column {@code j}. */
    public long[] column(int j) {
        return columns[j].clone();
    }

    /** The number of rows. */
    public int rows() {
        return rows;
    }

    @Override
    public List<String> labels() {
        return labels;
    }

    @Override
    public int rank() {
        return rank;
    }

    @Override
    public int rank(int[] set) {
        if (set.length == 0 || rows == 0) {
            return 0;
        }
        long[][] a = new long[rows][set.length];
        for (int j = 0; j < set.length; j++) {
            long[] c = columns[set[j]];
            for (int i = 0; i < rows; i++) {
                a[i][j] = c[i];
            }
        }
        if (!field.isRational()) {
            return rankModP(a, field.characteristic());
        }
        try {
            return rankBareiss(a);
        } catch (ArithmeticException overflow) {
            return rankBig(set);
        }
    }

    /**
     * The candidates in the closure of {@code set}, through the vectors orthogonal to the span of
     * its columns S: eliminating the rows of [S | I] (the same elimination as a rank query) makes
     * the S-part zero from row rank(S) on, and as the row operations are invertible the I-part of
     * those rows is a basis of the vectors w with w · s = 0 for every column s of S. A column x
     * lies in span(S) exactly when it is orthogonal to that basis too. So the cost is one
     * elimination of an m × (|S| + m) matrix plus, per candidate, m − rank(S) dot products of
     * length m, instead of a rank query each. Exact: over Q an overflowing elimination or dot
     * product falls back to rank queries.
     */
    @Override
    public int[] inClosure(int[] set, int[] candidates) {
        if (rows == 0) {
            return candidates.clone();
        }
        long[][] a = new long[rows][set.length + rows];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < set.length; j++) {
                a[i][j] = columns[set[j]][i];
            }
            a[i][set.length + i] = 1;
        }
        int r = rank(set);
        try {
            if (field.isRational()) {
                rankBareiss(a);
            } else {
                rankModP(a, field.characteristic());
            }
        } catch (ArithmeticException overflow) {
            return Matroid.super.inClosure(set, candidates);
        }
        return Arrays.stream(candidates).filter(e -> orthogonal(a, r, set.length, e, set)).toArray();
    }

    /**
     * Whether column e is orthogonal to the I-parts (from column {@code offset}) of the rows
     * {@code from}.. of {@code a}, {@code from} being rank(set); a dot product that overflows is
     * replaced by the rank query rank(set ∪ {e}) = rank(set).
     */
    private boolean orthogonal(long[][] a, int from, int offset, int e, int[] set) {
        long[] x = columns[e];
        try {
            for (int i = from; i < rows; i++) {
                long dot = 0;
                for (int k = 0; k < rows; k++) {
                    dot = field.isRational() ? Math.addExact(dot, Math.multiplyExact(a[i][offset + k], x[k]))
                            : (dot + a[i][offset + k] * x[k]) % field.characteristic();
                }
                if (dot != 0) {
                    return false;
                }
            }
            return true;
        } catch (ArithmeticException overflow) {
            return rank(ElementSets.with(set, e)) == from;
        }
    }

    /**
     * The sign (−1, 0, +1) of the determinant of the square submatrix on the given columns, over
     * Q only: the chirotope of the realisation ([BLSWZ, §3.5]; common practice).
     *
     * @throws IllegalArgumentException when the field is not Q or the submatrix is not square
     */
    public int determinantSign(int[] set) {
        if (!field.isRational() || set.length != rows) {
            throw new IllegalArgumentException("A determinant sign needs " + rows + " columns over Q; got "
                    + set.length + " over " + field + ".");
        }
        return bareissDeterminant(bigColumns(set)).signum();
    }

    private static int rankBareiss(long[][] a) {
        int m = a.length;
        int n = a[0].length;
        long prev = 1;
        int r = 0;
        for (int col = 0; col < n && r < m; col++) {
            if (!raisePivot(a, r, col)) {
                continue;
            }
            for (int i = r + 1; i < m; i++) {
                for (int j = col + 1; j < n; j++) {
                    long v = Math.subtractExact(Math.multiplyExact(a[r][col], a[i][j]),
                            Math.multiplyExact(a[i][col], a[r][j]));
                    a[i][j] = v / prev;
                }
                a[i][col] = 0;
            }
            prev = a[r][col];
            r++;
        }
        return r;
    }

    private int rankBig(int[] set) {
        BigInteger[][] a = bigColumns(set);
        return eliminate(a, set.length);
    }

    /**
     * Bareiss's fraction-free elimination of {@code a} in place, pivoting on its first
     * {@code pivotColumns} columns (rows are swapped, every later column is updated; every division
     * is exact by Sylvester's identity). Afterwards the rows from the returned rank on are zero in
     * the pivot columns, so with the pivot columns a set C they span the quotient by C.
     *
     * @return the rank of the first {@code pivotColumns} columns
     */
    static int eliminate(BigInteger[][] a, int pivotColumns) {
        int m = a.length;
        int width = m == 0 ? 0 : a[0].length;
        BigInteger prev = BigInteger.ONE;
        int r = 0;
        for (int col = 0; col < pivotColumns && r < m; col++) {
            if (raisePivot(a, r, col) < 0) {
                continue;
            }
            for (int i = r + 1; i < m; i++) {
                for (int j = col + 1; j < width; j++) {
                    a[i][j] = a[r][col].multiply(a[i][j]).subtract(a[i][col].multiply(a[r][j])).divide(prev);
                }
                a[i][col] = BigInteger.ZERO;
            }
            prev = a[r][col];
            r++;
        }
        return r;
    }

    /** The columns {@code set} as a matrix of big integers. */
    private BigInteger[][] bigColumns(int[] set) {
        BigInteger[][] a = new BigInteger[rows][set.length];
        for (int j = 0; j < set.length; j++) {
            for (int i = 0; i < rows; i++) {
                a[i][j] = BigInteger.valueOf(columns[set[j]][i]);
            }
        }
        return a;
    }

    /**
     * Swaps the first row at or below {@code r} with a non-zero entry in column {@code col} into
     * row {@code r}.
     *
     * @return whether there was such a row
     */
    private static boolean raisePivot(long[][] a, int r, int col) {
        int pivot = r;
        while (pivot < a.length && a[pivot][col] == 0) {
            pivot++;
        }
        if (pivot == a.length) {
            return false;
        }
        long[] t = a[pivot];
        a[pivot] = a[r];
        a[r] = t;
        return true;
    }

    /**
     * Swaps the first row at or below {@code r} with a non-zero entry in column {@code col} into
     * row {@code r}.
     *
     * @return the row it came from, or -1 when there was none
     */
    private static int raisePivot(BigInteger[][] a, int r, int col) {
        int pivot = r;
        while (pivot < a.length && a[pivot][col].signum() == 0) {
            pivot++;
        }
        if (pivot == a.length) {
            return -1;
        }
        BigInteger[] t = a[pivot];
        a[pivot] = a[r];
        a[r] = t;
        return pivot;
    }

    /** Bareiss determinant with row swaps tracked; exact division at every step. */
    static BigInteger bareissDeterminant(BigInteger[][] a) {
        int n = a.length;
        BigInteger prev = BigInteger.ONE;
        int sign = 1;
        for (int k = 0; k < n; k++) {
            int pivot = raisePivot(a, k, k);
            if (pivot < 0) {
                return BigInteger.ZERO;
            }
            if (pivot != k) {
                sign = -sign;
            }
            for (int i = k + 1; i < n; i++) {
                for (int j = k + 1; j < n; j++) {
                    a[i][j] = a[k][k].multiply(a[i][j]).subtract(a[i][k].multiply(a[k][j])).divide(prev);
                }
            }
            prev = a[k][k];
        }
        return sign > 0 ? a[n - 1][n - 1] : a[n - 1][n - 1].negate();
    }

    private static int rankModP(long[][] a, int p) {
        int m = a.length;
        int n = a[0].length;
        int r = 0;
        for (int col = 0; col < n && r < m; col++) {
            if (!raisePivot(a, r, col)) {
                continue;
            }
            long inv = inverse(a[r][col], p);
            for (int i = r + 1; i < m; i++) {
                long f = a[i][col] * inv % p;
                if (f != 0) {
                    for (int j = col; j < n; j++) {
                        a[i][j] = Math.floorMod(a[i][j] - f * a[r][j], p);
                    }
                }
            }
            r++;
        }
        return r;
    }

    private static long inverse(long a, int p) {
        long result = 1;
        long base = a % p;
        for (long e = p - 2; e > 0; e >>= 1) {
            if ((e & 1) == 1) {
                result = result * base % p;
            }
            base = base * base % p;
        }
        return result;
    }

    /** Labels "0", "1", … for {@code n} columns. */
    public static List<String> indexLabels(int n) {
        List<String> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            out.add(Integer.toString(i));
        }
        return out;
    }
}
