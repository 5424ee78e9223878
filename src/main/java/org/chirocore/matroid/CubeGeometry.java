package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Vertex configurations of the n-cube {0,1}^n, as element indices of {@link AffineCube} (the
 * index of a vertex is its coordinate bitmask, so sums and comparisons work coordinate-wise on
 * bits). These sets depend only on n, not on the field.
 *
 * <ul>
 *   <li>rectangles: 4-sets {a, b, c, d} with a + c = b + d as integer vectors — 4-element
 *       circuits of the cube over any field;
 *   <li>facets {x_i = 0}, {x_i = 1} (2n of them) and skew facets {x_i = x_j}, {x_i = 1 − x_j}
 *       for i &lt; j (n(n−1) of them: each unordered pair i, j gives two);
 *   <li>all hyperplanes of the real cube's matroid, for n ≤ {@link #MAX_ENUMERATED_DIMENSION}.
 * </ul>
 */
public final class CubeGeometry {
    /** Largest n for which {@link #realHyperplanes} is offered (C(2^n, n) subsets are visited). */
    public static final int MAX_ENUMERATED_DIMENSION = 5;

    private CubeGeometry() {
    }

    /**
     * The rectangles of the n-cube, each once as a strictly increasing 4-element index array, in
     * lexicographic order of the first diagonal pair found. Two vertex pairs {a, c} ≠ {b, d} with
     * equal sums a + c = b + d form a rectangle, and a 4-set has at most one such split (if also
     * a + b = c + d then b = c), so grouping pairs by their sum lists each rectangle once.
     * Costs O(4^n) plus the output.
     */
    public static List<int[]> rectangles(int n) {
        checkDimension(n, AffineCube.MAX_DIMENSION);
        int size = 1 << n;
        // A coordinate-wise sum a + c in {0,1,2}^n is determined by the pair (a AND c, a XOR c).
        Map<Long, List<int[]>> pairsBySum = new LinkedHashMap<>();
        for (int a = 0; a < size; a++) {
            for (int c = a + 1; c < size; c++) {
                long sum = ((long) (a & c) << n) | (a ^ c);
                pairsBySum.computeIfAbsent(sum, k -> new ArrayList<>()).add(new int[] {a, c});
            }
        }
        List<int[]> out = new ArrayList<>();
        for (List<int[]> pairs : pairsBySum.values()) {
            for (int i = 0; i < pairs.size(); i++) {
                for (int j = i + 1; j < pairs.size(); j++) {
                    out.add(ElementSets.union(pairs.get(i), pairs.get(j)));
                }
            }
        }
        return out;
    }

    /** The 2n facets x_i = 0 and x_i = 1, for i = 1..n in turn. Costs O(n²·2^n). */
    public static List<CubeHyperplane> facets(int n) {
        checkDimension(n, AffineCube.MAX_DIMENSION);
        List<CubeHyperplane> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            for (int side = 0; side <= 1; side++) {
                int[] normal = new int[n];
                normal[i - 1] = 1;
                out.add(CubeHyperplane.of(normal, side));
            }
        }
        return out;
    }

    /**
     * The n(n−1) skew facets x_i = x_j and x_i = 1 − x_j for pairs i &lt; j in lexicographic
     * order. Costs O(n³·2^n).
     */
    public static List<CubeHyperplane> skewFacets(int n) {
        checkDimension(n, AffineCube.MAX_DIMENSION);
        List<CubeHyperplane> out = new ArrayList<>();
        for (int i = 1; i <= n; i++) {
            for (int j = i + 1; j <= n; j++) {
                int[] equal = new int[n];
                equal[i - 1] = 1;
                equal[j - 1] = -1;
                out.add(CubeHyperplane.of(equal, 0));
                int[] opposite = new int[n];
                opposite[i - 1] = 1;
                opposite[j - 1] = 1;
                out.add(CubeHyperplane.of(opposite, 1));
            }
        }
        return out;
    }

    /**
     * Every hyperplane of the real affine n-cube's matroid (flat of rank n, i.e. affine
     * hyperplane spanned by vertices), each once, in order of its lexicographically first
     * spanning n-subset of vertices.
     *
     * <p>Method: for n vertices with rows (1, v), the cofactors c_k = (−1)^k·det(rows without
     * column k) give an integer vector (c_0, a) orthogonal to every row (Laplace expansion of the
     * square matrix with a row repeated), so a·v = −c_0 on all of them; a is zero exactly when
     * the vertices are affinely dependent. Expanding along the last row, c = Q·(1, w) is linear
     * in the last vertex w, with Q made of the (n−1)-minors of the first n − 1 rows; so Q is
     * computed once per (n−1)-subset (skipping all extensions of a dependent one) and each
     * n-subset costs one matrix-vector product. Normalised equations are deduplicated in a hash
     * map. Exact long arithmetic. Costs C(2^n, n−1)·C(n+1, 2) determinants of size n − 1 plus
     * C(2^n, n)·(n+1)² operations; for n = 5 about 540,000 4 × 4 determinants and 7 million
     * multiplications.
     *
     * @throws IllegalArgumentException when n is not between 1 and {@link #MAX_ENUMERATED_DIMENSION}
     */
    public static List<CubeHyperplane> realHyperplanes(int n) {
        checkDimension(n, MAX_ENUMERATED_DIMENSION);
        int size = 1 << n;
        Map<List<Integer>, CubeHyperplane> found = new LinkedHashMap<>();
        int[] prefix = ElementSets.range(n - 1);
        long[][] rows = new long[n - 1][];
        long[][] q = new long[n + 1][n + 1];
        do {
            for (int t = 0; t < n - 1; t++) {
                rows[t] = homogeneous(n, prefix[t]);
            }
            if (!lastRowCofactors(rows, q)) {
                continue;
            }
            for (int w = n == 1 ? 0 : prefix[n - 2] + 1; w < size; w++) {
                long[] row = homogeneous(n, w);
                int[] normal = new int[n];
                boolean zero = true;
                for (int k = 1; k <= n; k++) {
                    normal[k - 1] = Math.toIntExact(dot(q[k], row));
                    zero &= normal[k - 1] == 0;
                }
                if (!zero) {
                    int offset = Math.toIntExact(-dot(q[0], row));
                    found.computeIfAbsent(CubeHyperplane.normalForm(normal, offset),
                            key -> CubeHyperplane.of(normal, offset));
                }
            }
        } while (ElementSets.nextCombination(prefix, size));
        return List.copyOf(found.values());
    }

    /** The row (1, v_1, …, v_n) of vertex {@code v}. */
    static long[] homogeneous(int n, int v) {
        long[] row = new long[n + 1];
        row[0] = 1;
        for (int k = 1; k <= n; k++) {
            row[k] = AffineCube.coordinate(n, v, k);
        }
        return row;
    }

    private static long dot(long[] x, long[] y) {
        long s = 0;
        for (int i = 0; i < x.length; i++) {
            s = Math.addExact(s, Math.multiplyExact(x[i], y[i]));
        }
        return s;
    }

    /**
     * Fills {@code q} so that, for the m × (m+2) matrix {@code rows} and any row w,
     * (q·w)_k = (−1)^k·det([rows; w] without column k). Expanding that determinant along w, the
     * entry w_j (j ≠ k) sits in column p = (j &lt; k ? j : j − 1) with sign (−1)^(m+p), and its
     * minor is rows without columns k and j.
     *
     * @return false when every such minor is zero (the rows are dependent), so q·w = 0 for all w
     */
    private static boolean lastRowCofactors(long[][] rows, long[][] q) {
        int m = rows.length;
        int cols = m + 2;
        long[][] minor = new long[m][m];
        boolean nonzero = false;
        for (int k = 0; k < cols; k++) {
            for (int j = k + 1; j < cols; j++) {
                for (int i = 0; i < m; i++) {
                    for (int c = 0, col = 0; c < cols; c++) {
                        if (c != k && c != j) {
                            minor[i][col++] = rows[i][c];
                        }
                    }
                }
                long d = determinant(minor);
                nonzero |= d != 0;
                q[k][j] = ((k + m + j - 1) % 2 == 0) ? d : -d;
                q[j][k] = ((j + m + k) % 2 == 0) ? d : -d;
            }
        }
        return nonzero;
    }

    /** Bareiss fraction-free determinant; destroys {@code a}. Every division is exact. */
    static long determinant(long[][] a) {
        int n = a.length;
        if (n == 0) {
            return 1;
        }
        long prev = 1;
        int sign = 1;
        for (int k = 0; k < n; k++) {
            int pivot = k;
            while (pivot < n && a[pivot][k] == 0) {
                pivot++;
            }
            if (pivot == n) {
                return 0;
            }
            if (pivot != k) {
                long[] t = a[pivot];
                a[pivot] = a[k];
                a[k] = t;
                sign = -sign;
            }
            for (int i = k + 1; i < n; i++) {
                for (int j = k + 1; j < n; j++) {
                    a[i][j] = Math.subtractExact(Math.multiplyExact(a[k][k], a[i][j]),
                            Math.multiplyExact(a[i][k], a[k][j])) / prev;
                }
            }
            prev = a[k][k];
        }
        return sign * a[n - 1][n - 1];
    }

    private static void checkDimension(int n, int max) {
        if (n < 1 || n > max) {
            throw new IllegalArgumentException("The cube dimension must be between 1 and " + max + ", not " + n + ".");
        }
    }
}
