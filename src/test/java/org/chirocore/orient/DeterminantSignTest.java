package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.chirocore.matroid.ElementSet;
import org.chirocore.matroid.ElementSets;
import org.chirocore.matroid.Field;
import org.chirocore.matroid.MatrixMatroid;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Sign conventions against real determinants: for a real matrix, χ(B) = sign det(columns B) is a
 * chirotope ([BLSWZ, §3.5]; docs/mathematics.md §2, "sanity check"), so it must satisfy every relation
 * the scanner checks and every clause the encoder writes, and flipping any one sign that takes part
 * in a non-trivial relation must be caught.
 */
class DeterminantSignTest {

    static MatrixMatroid randomMatrix(int rows, int cols, long seed) {
        Random random = new Random(seed);
        List<long[]> columns = new ArrayList<>();
        for (int j = 0; j < cols; j++) {
            long[] c = new long[rows];
            for (int i = 0; i < rows; i++) {
                // small entries make many vanishing minors, so 2-term relations occur too
                c[i] = random.nextInt(5) - 2;
            }
            columns.add(c);
        }
        return new MatrixMatroid(Field.RATIONALS, columns, MatrixMatroid.indexLabels(cols));
    }

    static Chirotope determinantSigns(MatrixMatroid m, BasisIndex index) {
        byte[] signs = new byte[index.basisCount()];
        for (int v = 1; v <= signs.length; v++) {
            signs[v - 1] = (byte) m.determinantSign(index.basis(v).elements());
        }
        return new Chirotope(m.labels(), m.rank(), index.bases(), signs);
    }

    @ParameterizedTest
    @CsvSource({"3, 7, 1", "3, 9, 2", "4, 8, 3", "4, 9, 4", "5, 9, 5", "2, 6, 6"})
    void determinantSignsPassEveryRelationAndEveryClause(int rows, int cols, long seed) {
        MatrixMatroid m = randomMatrix(rows, cols, seed);
        BasisIndex index = BasisIndex.of(m);
        Chirotope chi = determinantSigns(m, index);
        assertTrue(WitnessCheck.defect(m, chi).isEmpty(), () -> WitnessCheck.defect(m, chi).get());

        byte[] signs = chi.signs();
        int checked = 0;
        for (GpRelation r : allRelations(index)) {
            for (int[] clause : ClauseEncoding.clauses(index, r)) {
                assertTrue(satisfied(clause, signs), () -> "clause of " + r + " fails under determinant signs");
                checked++;
            }
        }
        assertTrue(checked > 0, "the matrix should have non-trivial relations");
    }

    /**
     * A single flipped sign need not be caught: flipping a simplicial basis is a mutation and gives
     * another chirotope ([BLSWZ, §7.3]). It must be caught when the basis takes part in a relation
     * with exactly two non-zero terms (they must be opposite, and the flip makes them equal), and
     * scan and clauses must agree on every flip.
     */
    @ParameterizedTest
    @CsvSource({"3, 7, 11", "4, 8, 12", "5, 9, 13", "3, 8, 14"})
    void flippingOneSignIsCaughtByScanAndClausesAlike(int rows, int cols, long seed) {
        MatrixMatroid m = randomMatrix(rows, cols, seed);
        BasisIndex index = BasisIndex.of(m);
        byte[] signs = determinantSigns(m, index).signs();
        List<GpRelation> relations = allRelations(index);
        int forced = 0;
        for (int v = 1; v <= signs.length; v++) {
            final int flipped = v;
            byte[] wrong = signs.clone();
            wrong[v - 1] = (byte) -wrong[v - 1];
            Chirotope bad = new Chirotope(m.labels(), m.rank(), index.bases(), wrong);
            boolean scanCatches = WitnessCheck.defect(m, bad).isPresent();
            boolean clausesCatch = relations.stream().flatMap(r -> ClauseEncoding.clauses(index, r).stream())
                    .anyMatch(c -> !satisfied(c, wrong));
            assertEquals(scanCatches, clausesCatch, "scan and clauses disagree on the flip of basis " + v);
            boolean inTwoTermRelation = relations.stream()
                    .map(r -> ClauseEncoding.clauses(index, r))
                    .anyMatch(cs -> cs.size() == 8 && java.util.Arrays.stream(cs.get(0)).anyMatch(l -> Math.abs(l) == flipped));
            if (inTwoTermRelation) {
                assertTrue(scanCatches, "flip of basis " + v + " breaks a 2-term relation but was not caught");
                forced++;
            }
        }
        assertTrue(forced > 0, "the matrix should have 2-term relations");
    }

    static List<GpRelation> allRelations(BasisIndex index) {
        List<GpRelation> out = new ArrayList<>();
        int n = index.size();
        int k = index.rank() - 2;
        int[] x = ElementSets.range(k);
        do {
            ElementSet xm = ElementSet.of(x);
            int[] rest = ElementSet.range(n).minus(xm).elements();
            if (rest.length < 4) {
                continue;
            }
            int[] q = ElementSets.range(4);
            do {
                out.add(new GpRelation(xm, rest[q[0]], rest[q[1]], rest[q[2]], rest[q[3]]));
            } while (ElementSets.nextCombination(q, rest.length));
        } while (ElementSets.nextCombination(x, n));
        return out;
    }

    static boolean satisfied(int[] clause, byte[] signs) {
        for (int lit : clause) {
            boolean positive = signs[Math.abs(lit) - 1] > 0;
            if (lit > 0 == positive) {
                return true;
            }
        }
        return false;
    }

    @ParameterizedTest
    @CsvSource({"3, 7, 21", "4, 9, 22"})
    void realMatricesAreDecidedOrientable(int rows, int cols, long seed) {
        MatrixMatroid m = randomMatrix(rows, cols, seed);
        Orientability answer = new LazySatDecider(Budget.UNLIMITED).decide(m);
        assertEquals("orientable", answer.verdict());
    }
}
