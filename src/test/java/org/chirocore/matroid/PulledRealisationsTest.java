package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The exact quotient of {@link PulledRealisations#minor} realises the contraction: for a matrix over
 * Q, M[A]/C is the matroid of the vectors projected along span(C) (Oxley, Matroid Theory, 2nd ed.,
 * §3.1 and §6.1, from memory; common practice), compared here subset by subset with {@link Minor}
 * on the real cube's rank oracle, on every r-subset. And no candidate realises the Fano plane, the corner core of the
 * 3-cube: F7 is representable only over fields of characteristic 2 (Oxley, §6.4, from memory).
 */
class PulledRealisationsTest {

    @ParameterizedTest(name = "the 4-cube / {0}")
    @CsvSource({"1111", "1111 0001", "0000 1000 0110", "''"})
    void theQuotientRealisesTheContraction(String contractedLabels) {
        AffineCube cube = AffineCube.real(4);
        List<String> contracted = contractedLabels.isEmpty() ? List.of() : List.of(contractedLabels.split(" "));
        int[] c = cube.indicesOf(contracted);
        List<long[]> contract = new ArrayList<>();
        for (int v : c) {
            contract.add(cube.matrixMatroid().column(v));
        }
        List<long[]> keep = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int v = 0; v < cube.size(); v++) {
            if (!ElementSets.contains(c, v)) {
                keep.add(cube.matrixMatroid().column(v));
                labels.add(cube.labels().get(v));
            }
        }
        Realisation r = PulledRealisations.minor(contract, keep, labels).orElseThrow();
        Minor expected = new Minor(cube, c, new int[0]);
        assertEquals(labels, expected.labels());
        assertEquals(expected.rank(), r.rank());
        assertEquals(expected.rank(), r.matrix().rows(), "the matrix is cut to its rank");
        int[] subset = ElementSets.range(expected.rank());
        do {
            assertEquals(expected.rank(subset), r.matrix().rank(subset), () -> java.util.Arrays.toString(subset));
        } while (ElementSets.nextCombination(subset, labels.size()));
    }

    @Test
    void noCandidateRealisesTheFanoCoreItself() {
        CubeConstruction corner = CubeConstruction.corner(3);
        Matroid fano = corner.build();
        List<Realisation> candidates = PulledRealisations.candidates(corner, fano.labels(), List.of(), 3);
        assertFalse(candidates.isEmpty());
        for (Realisation r : candidates) {
            assertEquals(fano.labels(), r.labels());
            boolean differs = false;
            int[] subset = ElementSets.range(3);
            do {
                differs |= fano.isBasis(subset) != (r.matrix().rank(subset) == 3);
            } while (ElementSets.nextCombination(subset, fano.size()));
            assertTrue(differs, "a rational matrix with the bases of F7");
        }
    }

    @Test
    void aConstructionOverGfPHasNoCandidates() {
        CubeConstruction c = new CubeConstruction(3, Field.gf(3), new HyperplaneSpec.ByVertices(List.of("100", "010", "001")), "111",
                true);
        assertEquals(List.of(), PulledRealisations.candidates(c, c.build().labels(), List.of(), 3));
        assertEquals(Optional.empty(), PulledRealisations.minor(List.of(), List.of(), List.of()));
    }
}
