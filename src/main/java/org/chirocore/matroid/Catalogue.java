package org.chirocore.matroid;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * A small catalogue of named matroids, recognised up to isomorphism: the minimal non-orientable
 * matroids on few elements (F7, F7*, AG(2,3)\e and its dual) and the classic matroids of
 * J. Oxley, <i>Matroid Theory</i>, 2nd ed., Oxford University Press, 2011, Appendix "Some
 * interesting matroids" ([Ox] below). Each entry's builder names its source; the test fixtures
 * are built by the same methods and their sizes, ranks, basis and line counts are checked
 * against the sources in {@code NamedMatroidsTest}.
 *
 * <p>Recognition compares the cheap invariants of {@link MatroidShape} first and runs
 * {@link HyperplaneIsomorphismInspector} only on entries with the same shape, so an unnamed core
 * costs one shape computation per entry of its size and rank.
 */
public final class Catalogue {
    private static final String OXLEY = "J. Oxley, Matroid Theory, 2nd ed., 2011, Appendix";
    private static final String BLSWZ = "A. Bjoerner, M. Las Vergnas, B. Sturmfels, N. White, G. M. Ziegler, "
            + "Oriented Matroids, 2nd ed., 1999, Section 6.6 (minimal non-orientable matroids; from memory)";

    private Catalogue() {
    }

    /** The entries, built once, in the order of the table in docs/reports.md. */
    private static final class Entries {
        static final List<NamedMatroid> ALL = build();

        private static List<NamedMatroid> build() {
            ExplicitMatroid fano = ExplicitMatroid.of(fano());
            ExplicitMatroid nonFano = ExplicitMatroid.of(nonFano());
            ExplicitMatroid agMinus = ExplicitMatroid.of(ternaryAffinePlaneMinusPoint());
            List<NamedMatroid> out = new ArrayList<>();
            out.add(new NamedMatroid("F7", "F_7", "the Fano plane", OXLEY + ", F7; " + BLSWZ, fano));
            out.add(new NamedMatroid("F7*", "F_7^*", "the dual of the Fano plane", OXLEY + ", F7*; " + BLSWZ,
                    Duality.dual(fano)));
            out.add(new NamedMatroid("F7-", "F_7^-", "the non-Fano matroid", OXLEY + ", F7-", nonFano));
            out.add(new NamedMatroid("(F7-)*", "(F_7^-)^*", "the dual of the non-Fano matroid", OXLEY + ", (F7-)*",
                    Duality.dual(nonFano)));
            out.add(new NamedMatroid("AG(2,3)\\e", "AG(2,3)\\setminus e", "the ternary affine plane minus a point",
                    OXLEY + ", AG(2,3); " + BLSWZ, agMinus));
            out.add(new NamedMatroid("(AG(2,3)\\e)*", "(AG(2,3)\\setminus e)^*",
                    "the dual of the ternary affine plane minus a point", OXLEY + ", AG(2,3); " + BLSWZ,
                    Duality.dual(agMinus)));
            out.add(new NamedMatroid("AG(2,3)", "AG(2,3)", "the ternary affine plane", OXLEY + ", AG(2,3)",
                    ExplicitMatroid.of(ternaryAffinePlane())));
            out.add(new NamedMatroid("AG(3,2)", "AG(3,2)", "the binary affine cube", OXLEY + ", AG(3,2)",
                    ExplicitMatroid.of(binaryAffineCube())));
            out.add(new NamedMatroid("M(K4)", "M(K_4)", "the cycle matroid of K4", OXLEY + ", M(K4); Section 5.1",
                    ExplicitMatroid.of(completeGraphK4())));
            out.add(new NamedMatroid("M(K3,3)", "M(K_{3,3})", "the cycle matroid of K3,3", "J. Oxley, Matroid Theory, "
                    + "2nd ed., 2011, Section 5.1 (graphic matroids)", ExplicitMatroid.of(completeBipartiteK33())));
            out.add(new NamedMatroid("U3,6", "U_{3,6}", "the uniform matroid of rank 3 on 6 elements",
                    "J. Oxley, Matroid Theory, 2nd ed., 2011, Section 1.2", ExplicitMatroid.of(uniformThreeSix())));
            out.add(new NamedMatroid("R10", "R_{10}", "the matroid R10", OXLEY + ", R10", ExplicitMatroid.of(r10())));
            out.add(new NamedMatroid("P9", "P_9", "the Pappus matroid", OXLEY + ", Pappus",
                    ExplicitMatroid.of(pappus())));
            out.add(new NamedMatroid("P9-", "P_9^-", "the non-Pappus matroid", OXLEY + ", non-Pappus", nonPappus()));
            out.add(new NamedMatroid("V8", "V_8", "the Vamos matroid", OXLEY + ", V8", vamos()));
            return List.copyOf(out);
        }
    }

    /** Every entry of the catalogue. */
    public static List<NamedMatroid> entries() {
        return Entries.ALL;
    }

    /**
     * The catalogue entry isomorphic to {@code m}, if any. Cost: one shape and, for entries of the
     * same shape, one isomorphism search each (see the class comment).
     *
     * @throws InvalidMatroidException when {@code m} has more than {@link Limits#ELEMENTS} elements
     */
    public static Optional<NamedMatroid> identify(Matroid m) {
        MatroidShape shape = null;
        for (NamedMatroid e : Entries.ALL) {
            if (e.matroid().size() != m.size() || e.matroid().rank() != m.rank()) {
                continue;
            }
            if (shape == null) {
                shape = MatroidShape.of(m);
            }
            if (shape.equals(MatroidShape.of(e.matroid())) && new HyperplaneIsomorphismInspector(m, e.matroid()).find().isPresent()) {
                return Optional.of(e);
            }
        }
        return Optional.empty();
    }

    /**
     * The Fano plane F7 = PG(2,2): the seven non-zero vectors of GF(2)^3 [Ox, F7]. Column k
     * (labelled k, 1 ≤ k ≤ 7) is the binary expansion of k, low bit in the first row.
     */
    public static MatrixMatroid fano() {
        return binaryVectorsOver(Field.gf(2));
    }

    /**
     * The non-Fano matroid F7^-: the same seven 0/1 vectors over Q [Ox, F7^-]. Over a field of
     * characteristic other than 2 the three vectors of weight two are independent, so the
     * seventh line of the Fano plane is relaxed.
     */
    public static MatrixMatroid nonFano() {
        return binaryVectorsOver(Field.RATIONALS);
    }

    /** The columns 1..7 in binary, over the given field. */
    public static MatrixMatroid binaryVectorsOver(Field field) {
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int k = 1; k <= 7; k++) {
            columns.add(new long[] {k & 1, (k >> 1) & 1, (k >> 2) & 1});
            labels.add(Integer.toString(k));
        }
        return new MatrixMatroid(field, columns, labels);
    }

    /**
     * The binary affine cube AG(3,2): the vectors (1, v) over GF(2) for v ∈ GF(2)^3 [Ox, AG(3,2)];
     * rank 4 on 8 elements. Element labels are the bit strings v.
     */
    public static MatrixMatroid binaryAffineCube() {
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int v = 0; v < 8; v++) {
            columns.add(new long[] {1, v & 1, (v >> 1) & 1, (v >> 2) & 1});
            labels.add("" + (v & 1) + ((v >> 1) & 1) + ((v >> 2) & 1));
        }
        return new MatrixMatroid(Field.gf(2), columns, labels);
    }

    /**
     * The affine plane AG(2,3): the vectors (1, x, y) over GF(3), x, y ∈ GF(3) [Ox, AG(2,3)];
     * 9 points, 12 lines of three. Labels "xy".
     */
    public static MatrixMatroid ternaryAffinePlane() {
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int x = 0; x < 3; x++) {
            for (int y = 0; y < 3; y++) {
                columns.add(new long[] {1, x, y});
                labels.add("" + x + y);
            }
        }
        return new MatrixMatroid(Field.gf(3), columns, labels);
    }

    /**
     * AG(2,3) with the point (0,0) deleted: 8 points of rank 3 with 8 three-point lines (the four
     * lines through the deleted point lose it). AG(2,3) is point-transitive, so which point is
     * deleted does not matter up to isomorphism [Ox, AG(2,3)].
     */
    public static ExplicitMatroid ternaryAffinePlaneMinusPoint() {
        return ExplicitMatroid.of(new Minor(ternaryAffinePlane(), new int[0], new int[] {0}));
    }

    /**
     * The cycle matroid M(K4) from the signed vertex-edge incidence matrix over Q: the column of
     * edge ij is e_i − e_j ([Ox, Section 5.1], graphic matroids are regular). 6 elements, rank 3.
     */
    public static MatrixMatroid completeGraphK4() {
        List<int[]> edges = new ArrayList<>();
        for (int i = 1; i <= 4; i++) {
            for (int j = i + 1; j <= 4; j++) {
                edges.add(new int[] {i, j});
            }
        }
        return graphic(4, edges);
    }

    /**
     * The cycle matroid M(K3,3), vertices 1..3 on one side and 4..6 on the other, from the signed
     * incidence matrix over Q. 9 elements, rank 5 [Ox, R10].
     */
    public static MatrixMatroid completeBipartiteK33() {
        List<int[]> edges = new ArrayList<>();
        for (int i = 1; i <= 3; i++) {
            for (int j = 4; j <= 6; j++) {
                edges.add(new int[] {i, j});
            }
        }
        return graphic(6, edges);
    }

    /** The signed incidence matrix over Q of a graph on vertices 1..n; edge "ij" has column e_i − e_j. */
    private static MatrixMatroid graphic(int vertices, List<int[]> edges) {
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int[] edge : edges) {
            long[] c = new long[vertices];
            c[edge[0] - 1] = 1;
            c[edge[1] - 1] = -1;
            columns.add(c);
            labels.add("" + edge[0] + edge[1]);
        }
        return new MatrixMatroid(Field.RATIONALS, columns, labels);
    }

    /**
     * The uniform matroid U(3,6) over Q: the points (1, t, t²), t = 0..5, on the moment curve;
     * every three are independent (Vandermonde determinants) [Ox, Section 1.2].
     */
    public static MatrixMatroid uniformThreeSix() {
        List<long[]> columns = new ArrayList<>();
        for (int t = 0; t < 6; t++) {
            columns.add(new long[] {1, t, (long) t * t});
        }
        return new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(6));
    }

    /**
     * R10 over GF(2): [I5 | A] where column j of A has ones in the three cyclically consecutive
     * rows j − 1, j, j + 1 (mod 5) [Ox, R10; the matrix from memory]. 10 elements, rank 5.
     */
    public static MatrixMatroid r10() {
        return r10With(Field.gf(2), 1);
    }

    /**
     * R10 over Q from the signing of {@link #r10()} with −1 in A's diagonal: [I5 | A'] with
     * A'(j, j) = −1 and A'(j ± 1, j) = +1 (mod 5) [Ox, R10; from memory].
     */
    public static MatrixMatroid r10OverRationals() {
        return r10With(Field.RATIONALS, -1);
    }

    private static MatrixMatroid r10With(Field field, long diagonal) {
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < 5; j++) {
            long[] unit = new long[5];
            unit[j] = 1;
            columns.add(unit);
        }
        for (int j = 0; j < 5; j++) {
            long[] c = new long[5];
            c[Math.floorMod(j - 1, 5)] = 1;
            c[j] = diagonal;
            c[(j + 1) % 5] = 1;
            columns.add(c);
        }
        return new MatrixMatroid(field, columns, MatrixMatroid.indexLabels(10));
    }

    /** The Pappus labels: a1 a2 a3 on one line, b1 b2 b3 on another, c1 c2 c3 the cross points. */
    private static final List<String> PAPPUS_LABELS = List.of("a1", "a2", "a3", "b1", "b2", "b3", "c1", "c2", "c3");

    /**
     * The Pappus matroid over Q [Ox, Pappus; Pappus's theorem]: a1, a2, a3 on the line y = 0 at
     * x = 0, 1, 3; b1, b2, b3 on y = 1 at x = 0, 2, 5; c1 = a1b2 ∩ a2b1, c2 = a1b3 ∩ a3b1,
     * c3 = a2b3 ∩ a3b2, which Pappus's theorem puts on a ninth line. The cross points are computed
     * exactly with homogeneous coordinates (join and meet are cross products).
     */
    public static MatrixMatroid pappus() {
        long[][] a = {{0, 0, 1}, {1, 0, 1}, {3, 0, 1}};
        long[][] b = {{0, 1, 1}, {2, 1, 1}, {5, 1, 1}};
        List<long[]> points = new ArrayList<>(List.of(a[0], a[1], a[2], b[0], b[1], b[2]));
        points.add(meet(a[0], b[1], a[1], b[0]));
        points.add(meet(a[0], b[2], a[2], b[0]));
        points.add(meet(a[1], b[2], a[2], b[1]));
        return new MatrixMatroid(Field.RATIONALS, points, PAPPUS_LABELS);
    }

    /**
     * The non-Pappus matroid [Ox, non-Pappus]: the Pappus configuration with the line
     * {c1, c2, c3} relaxed, given by its non-bases since it has no representation over any field.
     */
    public static ExplicitMatroid nonPappus() {
        return ExplicitMatroid.fromNonBases(PAPPUS_LABELS, 3, List.of(
                new int[] {0, 1, 2}, new int[] {3, 4, 5},
                new int[] {0, 4, 6}, new int[] {1, 3, 6},
                new int[] {0, 5, 7}, new int[] {2, 3, 7},
                new int[] {1, 5, 8}, new int[] {2, 4, 8}));
    }

    /** The point where the line pq meets the line rs, in homogeneous coordinates. */
    private static long[] meet(long[] p, long[] q, long[] r, long[] s) {
        return cross(cross(p, q), cross(r, s));
    }

    private static long[] cross(long[] u, long[] v) {
        return new long[] {u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]};
    }

    /**
     * The Vámos matroid V8 [Ox, V8]: rank 4 on a, a', b, b', c, c', d, d', whose only non-bases
     * are the five 4-sets {a,a',b,b'}, {a,a',c,c'}, {a,a',d,d'}, {b,b',c,c'}, {b,b',d,d'}
     * ({c,c',d,d'} is a basis). Not representable over any field, so given by its non-bases.
     */
    public static ExplicitMatroid vamos() {
        List<String> labels = List.of("a", "a'", "b", "b'", "c", "c'", "d", "d'");
        return ExplicitMatroid.fromNonBases(labels, 4, List.of(
                new int[] {0, 1, 2, 3}, new int[] {0, 1, 4, 5}, new int[] {0, 1, 6, 7},
                new int[] {2, 3, 4, 5}, new int[] {2, 3, 6, 7}));
    }
}
