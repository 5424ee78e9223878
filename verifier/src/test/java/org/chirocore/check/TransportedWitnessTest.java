package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Witnesses by symmetry on examples small enough to compute by hand (docs/mathematics.md §8),
 * with the verifier alone.
 */
class TransportedWitnessTest {
    /** A basis table of rank 2 on n elements from its bases, given in canonical order as pairs. */
    private static BasisTable pairs(int n, int[]... bases) {
        return new BasisTable(n, 2, java.util.List.of(bases));
    }

    @Test
    void aCyclicRelabellingOfFourPointsOnALineGivesTheHandComputedSigns() throws CertificateVerifier.Failure {
        // U(2,4): four points on a line; every permutation is an automorphism. σ = (0 1 2 3), σ(0) = 1.
        BasisTable core = pairs(4, new int[] {0, 1}, new int[] {0, 2}, new int[] {0, 3}, new int[] {1, 2}, new int[] {1, 3},
                new int[] {2, 3});
        int[] sigma = {1, 2, 3, 0};
        TransportedWitness.checkAutomorphism(core, sigma, "test");
        // core\0 = points 1, 2, 3 in increasing position, all signs +; core\1 has the core's elements 0, 2, 3.
        // B' = {0, 2}: σ⁻¹ gives (3, 1), one swap: −χ{1, 3} = −1; {0, 3}: (3, 2) gives −1; {2, 3}: (1, 2) gives +1.
        int[] transported = TransportedWitness.transport(core.deletion(0), 0, new int[] {1, 1, 1}, core.deletion(1), 1, sigma, "test");
        assertArrayEquals(new int[] {-1, -1, 1}, transported);
    }

    @Test
    void aPermutationMappingABasisToANonBasisIsRejectedNamingBoth() {
        // 0 and 1 parallel: every pair but {0, 1} is a basis; swapping 1 and 2 maps the basis {0, 2} to {0, 1}
        BasisTable core = pairs(4, new int[] {0, 2}, new int[] {0, 3}, new int[] {1, 2}, new int[] {1, 3}, new int[] {2, 3});
        CertificateVerifier.Failure f = assertThrows(CertificateVerifier.Failure.class,
                () -> TransportedWitness.checkAutomorphism(core, new int[] {0, 2, 1, 3}, "test"));
        assertTrue(f.getMessage().contains("maps the basis [0, 2] to [0, 1], which is not a basis"), f.getMessage());
    }
}
