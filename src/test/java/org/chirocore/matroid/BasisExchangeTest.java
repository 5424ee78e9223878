package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The fast exchange check (one test per flat E − K(I)) against the basis exchange axiom applied
 * literally to every pair of bases ([Ox, §1.2], axiom (B2)), on random families of r-sets.
 */
class BasisExchangeTest {

    static boolean exchangeHoldsLiterally(List<int[]> family) {
        List<Long> masks = family.stream().map(ElementSets::mask).toList();
        for (long b1 : masks) {
            for (long b2 : masks) {
                for (long xs = b1 & ~b2; xs != 0; xs &= xs - 1) {
                    long x = Long.lowestOneBit(xs);
                    boolean found = false;
                    for (long ys = b2 & ~b1; ys != 0; ys &= ys - 1) {
                        found |= masks.contains((b1 & ~x) | Long.lowestOneBit(ys));
                    }
                    if (!found) {
                        return false;
                    }
                }
            }
        }
        return true;
    }

    static boolean accepted(int n, int r, List<int[]> family) {
        try {
            ExplicitMatroid.fromBases(MatrixMatroid.indexLabels(n), r, family);
            return true;
        } catch (InvalidMatroidException e) {
            assertTrue(e.getMessage().startsWith("Basis exchange fails: from basis "), e.getMessage());
            return false;
        }
    }

    @ParameterizedTest(name = "random families of {1}-subsets of {0} elements")
    @CsvSource({"5, 2", "6, 3", "6, 2", "7, 3", "6, 4"})
    void fastCheckAgreesWithTheAxiom(int n, int r) {
        Random random = new Random(1000L * n + r);
        List<int[]> all = new ArrayList<>();
        int[] comb = ElementSets.range(r);
        do {
            all.add(comb.clone());
        } while (ElementSets.nextCombination(comb, n));
        int matroids = 0;
        for (int trial = 0; trial < 400; trial++) {
            List<int[]> family = new ArrayList<>();
            // Dense families, so that some are matroids and many fail narrowly.
            for (int[] s : all) {
                if (random.nextInt(10) < 8) {
                    family.add(s);
                }
            }
            if (family.isEmpty()) {
                continue;
            }
            boolean literal = exchangeHoldsLiterally(family);
            assertEquals(literal, accepted(n, r, family));
            matroids += literal ? 1 : 0;
        }
        assertTrue(matroids > 0, "some random families should be matroids");
    }

    @Test
    void matrixMatroidsPass() {
        // Every vector matroid satisfies the axiom (common practice).
        for (long seed = 0; seed < 20; seed++) {
            Random random = new Random(seed);
            List<long[]> columns = new ArrayList<>();
            for (int j = 0; j < 8; j++) {
                columns.add(new long[] {random.nextInt(3) - 1, random.nextInt(3) - 1, random.nextInt(3) - 1});
            }
            MatrixMatroid m = new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(8));
            ExplicitMatroid e = ExplicitMatroid.of(m);
            assertEquals(e, ExplicitMatroid.fromBases(e.labels(), e.rank(), e.bases()));
        }
    }
}
