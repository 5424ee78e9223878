package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The affine n-cube over a field: the vector matroid on the 2^n vertices v of {0,1}^n, vertex v
 * represented by the column (1, v_1, …, v_n); its rank is n + 1. Over Q this is the real affine
 * cube; over GF(p) the same 0/1 columns are read mod p, which for small p loses bases (a basis
 * of the real cube whose determinant is divisible by p).
 *
 * <p>Labels are 0/1 strings with coordinate 1 first ("100" is e1 for n = 3). Element order: the
 * element index of a vertex is its label read as a binary number, coordinate 1 being the most
 * significant bit, so the elements are "000", "001", "010", …, "111". Consequently the index is
 * the vertex's coordinate bitmask, and coordinate k is bit n − k of the index.
 *
 * <p>Rank queries are those of the underlying {@link MatrixMatroid} (exact, O((n+1)·k·min(n+1,k))
 * for k elements); label look-ups cost O(n). Immutable.
 */
public final class AffineCube implements Matroid {
    /** Largest supported dimension: {@link Limits#CUBE_DIMENSION}. */
    public static final int MAX_DIMENSION = Limits.CUBE_DIMENSION;

    private static final Map<List<Object>, AffineCube> CACHE = new ConcurrentHashMap<>();

    private final int dimension;
    private final MatrixMatroid matrix;

    private AffineCube(int dimension, Field field) {
        this.dimension = dimension;
        int size = 1 << dimension;
        List<long[]> columns = new ArrayList<>(size);
        List<String> labels = new ArrayList<>(size);
        for (int v = 0; v < size; v++) {
            long[] column = new long[dimension + 1];
            column[0] = 1;
            for (int k = 1; k <= dimension; k++) {
                column[k] = coordinate(dimension, v, k);
            }
            columns.add(column);
            labels.add(label(dimension, v));
        }
        this.matrix = new MatrixMatroid(field, columns, labels);
    }

    /**
     * The affine n-cube over {@code field}, built once per (n, field) and shared: building the
     * 16-cube's matrix is the expensive part of every construction on it, and the cube is
     * immutable. The cache holds at most one cube per dimension and field asked for.
     *
     * @throws IllegalArgumentException when n is not between 1 and {@link #MAX_DIMENSION}
     */
    public static AffineCube of(int n, Field field) {
        requireDimension(n);
        return CACHE.computeIfAbsent(List.of(n, field), k -> new AffineCube(n, field));
    }

    private static void requireDimension(int n) {
        if (n < 1 || n > MAX_DIMENSION) {
            throw new IllegalArgumentException("The cube dimension must be between 1 and " + MAX_DIMENSION
                    + ", not " + n + ".");
        }
    }

    /** The real affine n-cube (over Q), as {@link #of}. */
    public static AffineCube real(int n) {
        return of(n, Field.RATIONALS);
    }

    /** The dimension n; the matroid has 2^n elements and rank n + 1. */
    public int dimension() {
        return dimension;
    }

    /** The field of representation. */
    public Field field() {
        return matrix.field();
    }

    /** The underlying vector matroid of the columns (1, v). */
    public MatrixMatroid matrixMatroid() {
        return matrix;
    }

    /**
     * The element index of the vertex with the given label.
     *
     * @throws IllegalArgumentException when the label is not a 0/1 string of length n
     */
    public int indexOf(String label) {
        if (label.length() != dimension || !label.chars().allMatch(c -> c == '0' || c == '1')) {
            throw new IllegalArgumentException("The vertex \"" + label + "\" is not a 0/1 string of length "
                    + dimension + ".");
        }
        return Integer.parseInt(label, 2);
    }

    /**
     * The element indices of the vertices with the given labels, strictly increasing.
     *
     * @throws IllegalArgumentException when a label is malformed or repeated (naming it)
     */
    public int[] indicesOf(Collection<String> labels) {
        int[] out = new int[labels.size()];
        int k = 0;
        for (String label : labels) {
            out[k++] = indexOf(label);
        }
        Arrays.sort(out);
        for (int i = 1; i < out.length; i++) {
            if (out[i] == out[i - 1]) {
                throw new IllegalArgumentException("The vertex \"" + label(dimension, out[i])
                        + "\" is listed more than once.");
            }
        }
        return out;
    }

    /**
     * The element index of the vertex with the given coordinates (v_1, …, v_n).
     *
     * @throws IllegalArgumentException when there are not n coordinates or one is not 0 or 1
     */
    public int indexOf(int[] coordinates) {
        if (coordinates.length != dimension) {
            throw new IllegalArgumentException("A vertex of the " + dimension + "-cube has " + dimension
                    + " coordinates, not " + coordinates.length + ": " + Arrays.toString(coordinates) + ".");
        }
        int v = 0;
        for (int c : coordinates) {
            if (c != 0 && c != 1) {
                throw new IllegalArgumentException("The vertex " + Arrays.toString(coordinates)
                        + " has a coordinate other than 0 or 1.");
            }
            v = 2 * v + c;
        }
        return v;
    }

    /** The coordinates (v_1, …, v_n) of element {@code element}. */
    public int[] coordinates(int element) {
        if (element < 0 || element >= size()) {
            throw new IllegalArgumentException("Element index " + element + " is outside 0.." + (size() - 1) + ".");
        }
        int[] out = new int[dimension];
        for (int k = 1; k <= dimension; k++) {
            out[k - 1] = coordinate(dimension, element, k);
        }
        return out;
    }

    /** The label of element {@code element}. */
    public String label(int element) {
        return matrix.labels().get(element);
    }

    /** Coordinate k (1-based) of the vertex with bitmask {@code vertex} in the n-cube: bit n − k. */
    static int coordinate(int n, int vertex, int k) {
        return (vertex >> (n - k)) & 1;
    }

    /** The label of vertex index {@code v} of the n-cube: its binary expansion padded to n digits. */
    static String label(int n, int v) {
        StringBuilder s = new StringBuilder(Integer.toBinaryString(v));
        while (s.length() < n) {
            s.insert(0, '0');
        }
        return s.toString();
    }

    @Override
    public List<String> labels() {
        return matrix.labels();
    }

    @Override
    public int rank() {
        return matrix.rank();
    }

    @Override
    public int rank(int[] set) {
        return matrix.rank(set);
    }

    @Override
    public int[] inClosure(int[] set, int[] candidates) {
        return matrix.inClosure(set, candidates);
    }

    @Override
    public String toString() {
        return "AffineCube[n = " + dimension + " over " + field() + "]";
    }
}
