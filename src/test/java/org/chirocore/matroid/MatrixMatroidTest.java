package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * {@link MatrixMatroid#inClosure} (orthogonal vectors from one elimination) against the
 * definition cl(S) = {e : rank(S ∪ {e}) = rank(S)} evaluated by rank queries.
 */
class MatrixMatroidTest {

    /** The same matroid seen only through its rank oracle, so it answers closures by the definition. */
    record RankOnly(Matroid m) implements Matroid {
        @Override
        public List<String> labels() {
            return m.labels();
        }

        @Override
        public int rank() {
            return m.rank();
        }

        @Override
        public int rank(int[] set) {
            return m.rank(set);
        }
    }

    private static MatrixMatroid matroid(Field field, long[]... columns) {
        return new MatrixMatroid(field, List.of(columns), MatrixMatroid.indexLabels(columns.length));
    }

    /**
     * PG(2, 2): the seven non-zero vectors of GF(2)^3 form the Fano plane, whose lines are the
     * three-element sets {u, v, u + v} (Oxley, Matroid Theory, 2nd ed., Example 1.5.7 and Appendix).
     */
    @Test
    void theClosureOfTwoPointsOfTheFanoPlaneIsTheirLine() {
        MatrixMatroid fano = matroid(Field.gf(2), new long[] {1, 0, 0}, new long[] {0, 1, 0}, new long[] {1, 1, 0},
                new long[] {0, 0, 1}, new long[] {1, 0, 1}, new long[] {0, 1, 1}, new long[] {1, 1, 1});
        assertArrayEquals(new int[] {0, 1, 2}, fano.inClosure(new int[] {0, 1}, ElementSets.range(7)));
        assertArrayEquals(new int[] {6, 3, 2}, fano.inClosure(new int[] {3, 6}, new int[] {6, 5, 4, 3, 2, 1, 0}));
        assertArrayEquals(new int[] {}, fano.inClosure(new int[] {}, ElementSets.range(7)));
        assertArrayEquals(ElementSets.range(7), fano.inClosure(new int[] {0, 1, 3}, ElementSets.range(7)));
    }

    /** Fixed-seed random matrices with repeated and proportional columns, over Q and two prime fields. */
    @ParameterizedTest
    @ValueSource(ints = {0, 2, 3, 5})
    void agreesWithRankQueriesOnRandomMatrices(int characteristic) {
        Field field = characteristic == 0 ? Field.RATIONALS : Field.gf(characteristic);
        Random random = new Random(11);
        for (int trial = 0; trial < 200; trial++) {
            int rows = 1 + random.nextInt(6);
            int size = 1 + random.nextInt(10);
            List<long[]> columns = new ArrayList<>();
            for (int j = 0; j < size; j++) {
                long[] column = new long[rows];
                if (j > 0 && random.nextInt(4) == 0) {
                    long[] earlier = columns.get(random.nextInt(j));
                    long factor = random.nextInt(5) - 2;
                    for (int i = 0; i < rows; i++) {
                        column[i] = factor * earlier[i];
                    }
                } else {
                    for (int i = 0; i < rows; i++) {
                        column[i] = random.nextInt(7) - 3;
                    }
                }
                columns.add(column);
            }
            MatrixMatroid m = new MatrixMatroid(field, columns, MatrixMatroid.indexLabels(size));
            long mask = random.nextLong() & ElementSets.allMask(size);
            int[] set = ElementSets.elements(mask);
            int[] all = ElementSets.range(size);
            assertArrayEquals(new RankOnly(m).inClosure(set, all), m.inClosure(set, all),
                    "trial " + trial + ", set " + java.util.Arrays.toString(set));
        }
    }

    /** Entries near 2^40: the elimination overflows a long, and the answer comes from exact rank queries. */
    @Test
    void anOverflowingEliminationFallsBackToRankQueries() {
        long big = 1L << 40;
        MatrixMatroid m = matroid(Field.RATIONALS, new long[] {big, 1, 0}, new long[] {1, big, 0},
                new long[] {big + 1, big + 1, 0}, new long[] {0, 0, 1}, new long[] {big, big + 3, 0});
        int[] all = ElementSets.range(5);
        assertArrayEquals(new int[] {0, 1, 2, 4}, m.inClosure(new int[] {0, 1}, all));
        assertArrayEquals(new RankOnly(m).inClosure(new int[] {2, 3}, all), m.inClosure(new int[] {2, 3}, all));
    }
}
