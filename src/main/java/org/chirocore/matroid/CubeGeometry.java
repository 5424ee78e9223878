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
                    int[] r = ElementSets.union(pairs.get(i), pairs.get(j));
                    out.add(r);
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
     * <p>Method: for each n-subset of vertices, the cofactors of the n × (n+1) matrix of rows
     * (1, v) give an integer vector (c_0, a) orthogonal to every row (Laplace expansion of the
     * square matrix with a row repeated), so a·v = −c_0 on all of them; it is zero exactly when
     * the subset is affinely dependent. Normalised equations are deduplicated in a hash map.
     * Exact long arithmetic. Costs C(2^n, n)·(n+1) determinants of size n; for n = 5 that is
     * about 1.2 million 5 × 5 determinants.
     *
     * @throws IllegalArgumentException when n is not between 1 and {@link #MAX_ENUMERATED_DIMENSION}
     */
    public static List<CubeHyperplane> realHyperplanes(int n) {
        checkDimension(n, MAX_ENUMERATED_DIMENSION);
        Map<List<Integer>, CubeHyperplane> found = new LinkedHashMap<>();
        int[] comb = ElementSets.range(n);
        long[][] rows = new long[n][n + 1];
        do {
            for (int t = 0; t < n; t++) {
                rows[t][0] = 1;
                for (int k = 1; k <= n; k++) {
                    rows[t][k] = AffineCube.coordinate(n, comb[t], k);
                }
            }
            long[] c = cofactors(rows);
            int[] normal = new int[n];
            boolean zero = true;
            for (int k = 1; k <= n; k++) {
                normal[k - 1] = Math.toIntExact(c[k]);
                zero &= c[k] == 0;
            }
            if (zero) {
                // Then c_0 = 0 as well: the points are affinely dependent and span no hyperplane.
                continue;
            }
            int offset = Math.toIntExact(-c[0]);
            found.computeIfAbsent(CubeHyperplane.normalForm(normal, offset), k -> CubeHyperplane.of(normal, offset));
        } while (ElementSets.nextCombination(comb, 1 << n));
        return List.copyOf(found.values());
    }

    /** c_k = (−1)^k · det(rows without column k), for the n × (n+1) matrix {@code rows}. */
    private static long[] cofactors(long[][] rows) {
        int n = rows.length;
        long[] c = new long[n + 1];
        long[][] minor = new long[n][n];
        for (int k = 0; k <= n; k++) {
            for (int i = 0; i < n; i++) {
                for (int j = 0, col = 0; j <= n; j++) {
                    if (j != k) {
                        minor[i][col++] = rows[i][j];
                    }
                }
            }
            long d = determinant(minor);
            c[k] = k % 2 == 0 ? d : -d;
        }
        return c;
    }

    /** Bareiss fraction-free determinant; destroys {@code a}. Every division is exact. */
    private static long determinant(long[][] a) {
        int n = a.length;
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
