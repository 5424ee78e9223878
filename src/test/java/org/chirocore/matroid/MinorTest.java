package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MinorTest {
    /**
     * Minor.isBasis takes a shortcut through the parent's bases; it must agree with the definition
     * by rank, r_{M/C\D}(S) = r_M(S ∪ C) − r_M(C) (Oxley, Matroid Theory, 2nd ed., Prop. 3.1.6), on
     * every subset of the minor's rank, for contraction sets that are independent, dependent, and
     * deletions that do and do not lower the rank. Parents: AG(3,2) as an explicit matroid (a
     * hash lookup of bases) and as a matrix.
     */
    @Test
    void basisShortcutAgreesWithTheRankDefinition() {
        MatrixMatroid matrix = Catalogue.binaryAffineCube();
        ExplicitMatroid explicit = ExplicitMatroid.of(matrix);
        int[][][] cases = {
            {{}, {}}, {{}, {0, 3}}, {{1}, {}}, {{0, 5}, {2}}, {{0, 1, 2}, {}},
            {{}, {0, 1, 2, 3}}, {{}, {1, 2, 3, 4, 5, 6}}, {{0, 1, 2, 3}, {}}, {{4, 5, 6, 7}, {}}, {{0, 1}, {2, 3, 4, 5}},
        };
        int checked = 0;
        for (Matroid parent : new Matroid[] {explicit, matrix}) {
            for (int[][] c : cases) {
                Minor minor = new Minor(parent, c[0], c[1]);
                int[] comb = ElementSets.range(minor.rank());
                do {
                    boolean byRank = minor.rank(comb) == comb.length;
                    assertEquals(byRank, minor.isBasis(comb), () -> "C " + java.util.Arrays.toString(c[0]));
                    checked++;
                } while (ElementSets.nextCombination(comb, minor.size()));
            }
        }
        assertEquals(true, checked > 100);
    }
}
