package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * An affine hyperplane a·x = b of R^n with integer normal, together with the vertices of the
 * n-cube {0,1}^n on it (as element indices of {@link AffineCube}). The equation is normalised:
 * gcd(a_1, …, a_n, b) = 1 and the first nonzero a_i is positive, so two records are equal iff
 * they describe the same hyperplane. When the vertices span it (rank n in the real cube) they
 * form a hyperplane of the real cube's matroid; the record itself does not require that.
 *
 * @param normal the coefficients a_1, …, a_n, not all zero
 * @param offset the right-hand side b
 * @param vertices the element indices v with a·v = b, strictly increasing
 */
public record CubeHyperplane(List<Integer> normal, int offset, List<Integer> vertices) {
    public CubeHyperplane {
        normal = List.copyOf(normal);
        vertices = List.copyOf(vertices);
        checkLength(normal.size());
        int[] a = normal.stream().mapToInt(Integer::intValue).toArray();
        if (normalisingScale(a, offset) != 1) {
            throw new IllegalArgumentException("The equation " + equation(a, offset)
                    + " is not normalised (gcd 1, first nonzero coefficient positive).");
        }
        if (!vertices.equals(solutions(a, offset))) {
            throw new IllegalArgumentException("The vertex list " + vertices + " is not the set of vertices with "
                    + equation(a, offset) + ".");
        }
    }

    /**
     * The hyperplane a·x = b, normalised, with its vertex set. Costs O(n·2^n).
     *
     * @throws IllegalArgumentException when the normal is empty, all zero, or longer than
     *     {@link AffineCube#MAX_DIMENSION}
     */
    public static CubeHyperplane of(int[] normal, int offset) {
        checkLength(normal.length);
        List<Integer> form = normalForm(normal, offset);
        int n = normal.length;
        int[] a = form.subList(0, n).stream().mapToInt(Integer::intValue).toArray();
        int b = form.get(n);
        return new CubeHyperplane(form.subList(0, n), b, solutions(a, b));
    }

    /**
     * The real hyperplane whose vertices in the n-cube are exactly {@code vertices}, if there is
     * one. Method: n affinely independent vertices are picked greedily; the cofactors
     * c_k = (−1)^k·det(their rows (1, v) without column k) are orthogonal to every row, which
     * gives a·x = −c_0 with a = (c_1, …, c_n); the answer stands when that equation's vertex set
     * is the given one. Costs |vertices| rank queries of the real cube, n + 1 determinants of
     * size n and O(n·2^n).
     *
     * @param vertices strictly increasing element indices of {@link AffineCube} for dimension n
     */
    public static Optional<CubeHyperplane> withVertices(int n, int[] vertices) {
        checkLength(n);
        AffineCube cube = AffineCube.real(n);
        int[] chosen = new int[0];
        for (int v : vertices) {
            int[] t = ElementSets.with(chosen, v);
            if (chosen.length < n && cube.rank(t) == t.length) {
                chosen = t;
            }
        }
        if (chosen.length < n) {
            return Optional.empty();
        }
        long[] cofactors = new long[n + 1];
        for (int k = 0; k <= n; k++) {
            long[][] minor = new long[n][n];
            for (int i = 0; i < n; i++) {
                long[] row = CubeGeometry.homogeneous(n, chosen[i]);
                for (int c = 0, col = 0; c <= n; c++) {
                    if (c != k) {
                        minor[i][col++] = row[c];
                    }
                }
            }
            long d = CubeGeometry.determinant(minor);
            cofactors[k] = k % 2 == 0 ? d : -d;
        }
        int[] normal = new int[n];
        for (int k = 1; k <= n; k++) {
            normal[k - 1] = Math.toIntExact(cofactors[k]);
        }
        CubeHyperplane h = of(normal, Math.toIntExact(-cofactors[0]));
        return Arrays.equals(h.elements(), vertices) ? Optional.of(h) : Optional.empty();
    }

    private static void checkLength(int n) {
        if (n < 1 || n > AffineCube.MAX_DIMENSION) {
            throw new IllegalArgumentException("A normal vector needs between 1 and " + AffineCube.MAX_DIMENSION
                    + " coefficients, not " + n + ".");
        }
    }

    /**
     * The normalised equation of a·x = b as the list (a_1, …, a_n, b): divided by the gcd of all
     * entries and signed so that the first nonzero a_i is positive. Proportional equations get
     * equal lists, so this is also a hash key for the hyperplane.
     *
     * @throws IllegalArgumentException when a is zero
     */
    static List<Integer> normalForm(int[] a, int b) {
        long scale = normalisingScale(a, b);
        if (scale == 0) {
            throw new IllegalArgumentException("The normal vector " + Arrays.toString(a)
                    + " is zero, so it defines no hyperplane.");
        }
        List<Integer> form = new ArrayList<>(a.length + 1);
        for (int x : a) {
            form.add((int) (x / scale));
        }
        form.add((int) (b / scale));
        return form;
    }

    /** The dimension n of the cube. */
    public int dimension() {
        return normal.size();
    }

    /** The vertex set as strictly increasing element indices. */
    public int[] elements() {
        return vertices.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The equation, e.g. "x1 + x2 - x3 = 1". */
    public String equation() {
        return equation(normal.stream().mapToInt(Integer::intValue).toArray(), offset);
    }

    private static List<Integer> solutions(int[] a, int b) {
        int n = a.length;
        List<Integer> out = new ArrayList<>();
        for (int v = 0; v < (1 << n); v++) {
            long value = 0;
            for (int k = 1; k <= n; k++) {
                value += (long) a[k - 1] * AffineCube.coordinate(n, v, k);
            }
            if (value == b) {
                out.add(v);
            }
        }
        return out;
    }

    /**
     * The number dividing (a, b) into normal form: the gcd of all entries, signed like the first
     * nonzero coefficient; 0 when a is zero.
     */
    private static long normalisingScale(int[] a, int b) {
        long g = Math.abs((long) b);
        int firstSign = 0;
        for (int c : a) {
            g = gcd(g, Math.abs((long) c));
            if (firstSign == 0) {
                firstSign = Integer.signum(c);
            }
        }
        return firstSign * g;
    }

    private static long gcd(long x, long y) {
        return y == 0 ? x : gcd(y, x % y);
    }

    private static String equation(int[] a, int b) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < a.length; i++) {
            if (a[i] == 0) {
                continue;
            }
            String term = (Math.abs(a[i]) == 1 ? "" : Math.abs(a[i]) + "·") + "x" + (i + 1);
            if (s.length() == 0) {
                s.append(a[i] < 0 ? "-" : "").append(term);
            } else {
                s.append(a[i] < 0 ? " - " : " + ").append(term);
            }
        }
        return (s.length() == 0 ? "0" : s.toString()) + " = " + b;
    }
}
