package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.MatrixMatroid;
import org.chirocore.matroid.Realisation;
import org.chirocore.pipeline.IndependentCheck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A matrix over Q as its own orientation witness. The theorem relied on: the signs of the maximal
 * minors of a real matrix form a chirotope whose support is the column matroid's bases (Björner,
 * Las Vergnas, Sturmfels, White, Ziegler, <i>Oriented Matroids</i>, 2nd ed., §3.5, from memory).
 * Every orientable answer here is re-checked the long way, against every 3-term Grassmann–Plücker
 * relation, by {@link WitnessCheck} and by the independent checker.
 */
class RealisationCheckTest {

    @ParameterizedTest
    @CsvSource({"1, 3, 7", "2, 4, 8", "3, 4, 9", "4, 5, 9", "5, 2, 6"})
    void realMatricesAreDecidedOrientableWithAChirotope(long seed, int rows, int cols) {
        MatrixMatroid m = NamedMatroids.randomRational(seed, rows, cols, 2);
        Realised r = Realised.decide(m).orElseThrow();
        BasisIndex index = BasisIndex.of(m);
        assertEquals(index.basisCount(), r.bases());
        Chirotope signs = RealisationCheck.chirotope(r.witness());
        assertEquals(Optional.empty(), WitnessCheck.defect(m, signs));
        IndependentCheck.assertOrients(m, signs);
    }

    /**
     * The non-Fano matroid (the seven 0/1 vectors over Q) differs from the Fano plane by one
     * basis: the line {3, 5, 6} of F7 is relaxed ([Ox, Appendix, F7 and F7^-]). So the non-Fano
     * matrix is a wrong witness for F7, and it must be rejected naming that set.
     */
    @Test
    void aMatrixWhoseMatroidDiffersByOneBasisIsRejected() {
        ExplicitMatroid fano = ExplicitMatroid.of(NamedMatroids.fano());
        Realisation nonFano = Realisation.of(NamedMatroids.nonFano()).orElseThrow();
        assertEquals(1, BasisIndex.of(NamedMatroids.nonFano()).basisCount() - BasisIndex.of(fano).basisCount());
        String defect = RealisationCheck.defect(fano, nonFano).orElseThrow();
        assertTrue(defect.contains("{3, 5, 6}") && defect.contains("non-zero, but they are not a basis"), defect);
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> RealisationCheck.checkedBasisCount(fano, nonFano));
        assertTrue(e.getMessage().contains("failed its check"), e.getMessage());
    }

    /**
     * The other direction: relaxing the circuit-hyperplane {1, 2, 3} of the non-Fano matroid gives a
     * matroid with one basis more ([Ox, Prop. 1.5.14], relaxation); the non-Fano matrix misses it.
     */
    @Test
    void aMatrixMissingABasisIsRejected() {
        MatrixMatroid nonFano = NamedMatroids.nonFano();
        // The five other lines of the non-Fano matroid, 0-based (label k is element k − 1).
        ExplicitMatroid relaxed = ExplicitMatroid.fromNonBases(nonFano.labels(), 3, List.of(new int[] {0, 3, 4},
                new int[] {0, 5, 6}, new int[] {1, 3, 5}, new int[] {1, 4, 6}, new int[] {2, 3, 6}));
        assertEquals(1, BasisIndex.of(relaxed).basisCount() - BasisIndex.of(nonFano).basisCount());
        String defect = RealisationCheck.defect(relaxed, Realisation.of(nonFano).orElseThrow()).orElseThrow();
        assertTrue(defect.contains("{1, 2, 3}") && defect.contains("zero, but they are a basis"), defect);
    }

    @Test
    void otherLabelsOrRankAreRejected() {
        Realisation w = Realisation.of(NamedMatroids.nonFano()).orElseThrow();
        assertTrue(RealisationCheck.defect(ExplicitMatroid.of(NamedMatroids.uniformThreeSix()), w).isPresent());
    }

    @Test
    void onlyMatricesOverQAreDecided() {
        assertTrue(Realised.decide(NamedMatroids.fano()).isEmpty(), "GF(2): determinant signs mean nothing");
        assertTrue(Realised.decide(NamedMatroids.vamos()).isEmpty(), "not a matrix");
    }

    /** The real 4-cube: its realisation check and the basis index count the same bases. */
    @Test
    void realFourCube() {
        MatrixMatroid cube = AffineCube.real(4).matrixMatroid();
        assertEquals(BasisIndex.of(cube).basisCount(), Realised.decide(cube).orElseThrow().bases());
    }

    /** The 6-cube has C(64, 7) = 621,216,192 7-subsets: refused before any work, naming the limit. */
    @Test
    void sixCubeIsRefusedEarlyWithTheLimit() {
        EnumerationLimitException e = assertThrows(EnumerationLimitException.class,
                () -> Realised.decide(AffineCube.real(6).matrixMatroid()));
        assertTrue(e.getMessage().contains("621,216,192") && e.getMessage().contains("134,217,728"), e.getMessage());
    }
}
