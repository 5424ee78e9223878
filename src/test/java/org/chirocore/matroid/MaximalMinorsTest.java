package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The shared-prefix elimination against the determinant computed on its own (BigInteger Bareiss,
 * {@link MatrixMatroid#determinantSign}): the same sign for every r-subset, in lexicographic order.
 * A determinant's sign is the definition, so this is common practice rather than a cited source.
 */
class MaximalMinorsTest {

    /** An r × n matrix with entries in [−bound, bound]; small bounds give many vanishing minors. */
    static MatrixMatroid random(long seed, int rank, int n, long bound) {
        SplittableRandom random = new SplittableRandom(seed);
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < n; j++) {
            long[] c = new long[rank];
            for (int i = 0; i < rank; i++) {
                c[i] = random.nextLong(-bound, bound + 1);
            }
            columns.add(c);
        }
        return new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(n));
    }

    static void assertSignsMatch(MatrixMatroid m) {
        Realisation r = Realisation.of(m).orElseThrow();
        int[] expected = ElementSets.range(m.rank());
        int[] visits = new int[1];
        r.forEachSign((subset, sign) -> {
            assertEquals(Arrays.toString(expected), Arrays.toString(subset), "lexicographic order");
            assertEquals(m.determinantSign(subset), sign, () -> "sign of " + Arrays.toString(subset));
            visits[0]++;
            ElementSets.nextCombination(expected, m.size());
            return true;
        });
        assertEquals(ElementSets.binomial(m.size(), m.rank()), visits[0]);
    }

    @ParameterizedTest
    @CsvSource({"1, 3, 8, 1", "2, 4, 9, 1", "3, 5, 10, 2", "4, 2, 6, 3", "5, 1, 4, 2", "6, 6, 9, 1"})
    void smallEntriesAgreeWithBareiss(long seed, int rank, int n, long bound) {
        MatrixMatroid m = random(seed, rank, n, bound);
        if (m.rank() == rank) {
            assertSignsMatch(m);
        }
    }

    /** Entries near 2^40 exceed the Hadamard bound for long arithmetic: the BigInteger path. */
    @Test
    void largeEntriesAgreeWithBareiss() {
        assertSignsMatch(random(7, 3, 7, 1L << 40));
    }

    @Test
    void realCubeHasDependentPrefixesAndAgrees() {
        // The affine 3-cube: rank 4 on 8 elements, 70 4-subsets. Its 20 hyperplanes (OEIS A007847)
        // are 6 facets and 6 skew facets of 4 vertices and 8 corner triangles, so exactly 12
        // 4-subsets are coplanar and vanish.
        MatrixMatroid cube = AffineCube.real(3).matrixMatroid();
        assertSignsMatch(cube);
        int[] zero = new int[1];
        Realisation.of(cube).orElseThrow().forEachSign((s, sign) -> {
            zero[0] += sign == 0 ? 1 : 0;
            return true;
        });
        assertEquals(12, zero[0]);
    }

    @Test
    void visitorStopsTheWalk() {
        int[] visits = new int[1];
        Realisation.of(AffineCube.real(3).matrixMatroid()).orElseThrow().forEachSign((s, sign) -> ++visits[0] < 5);
        assertEquals(5, visits[0]);
    }

    @Test
    void extraRowsAreCutToAnIndependentSet() {
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < 6; j++) {
            // third row = first + second: rank 2 with three rows
            columns.add(new long[] {j, j * j - 1, j + j * j - 1});
        }
        MatrixMatroid m = new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(6));
        Realisation r = Realisation.of(m).orElseThrow();
        assertEquals(2, r.matrix().rows());
        r.forEachSign((subset, sign) -> {
            assertEquals(m.isBasis(subset), sign != 0);
            return true;
        });
        assertTrue(Realisation.of(new MatrixMatroid(Field.gf(3), columns, m.labels())).isEmpty(), "no signs over GF(p)");
    }
}
