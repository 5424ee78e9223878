package org.chirocore.cert;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ExplicitMatroid;
import org.junit.jupiter.api.Test;

/**
 * The orbits of a core's automorphism group and the automorphism chosen for each element, against
 * group orders and orbit structures known from outside the project.
 */
class ElementOrbitsTest {

    /** Every carrier is a bijection that maps bases to bases and its representative to its element. */
    private static void assertCarriersAreAutomorphisms(ExplicitMatroid m, ElementOrbits orbits) {
        for (int e = 0; e < m.size(); e++) {
            int[] sigma = orbits.carrier().get(e);
            assertEquals(e, sigma[orbits.representative()[e]]);
            assertArrayEquals(java.util.stream.IntStream.range(0, m.size()).toArray(), Arrays.stream(sigma).sorted().toArray());
            for (int[] basis : m.bases()) {
                assertTrue(m.isBasis(Arrays.stream(basis).map(x -> sigma[x]).sorted().toArray()),
                        () -> Arrays.toString(sigma) + " maps " + Arrays.toString(basis) + " to a non-basis");
            }
        }
    }

    @Test
    void theBinaryAffineCubeHasOneOrbit() {
        // Aut(AG(3, 2)) is the affine group AGL(3, 2), of order 8 · 168 = 1344, transitive on the eight points
        // (common practice: translations act transitively; Oxley, Matroid Theory, 2nd ed., Appendix, AG(3, 2); from memory)
        ExplicitMatroid ag32 = ExplicitMatroid.of(Catalogue.binaryAffineCube());
        ElementOrbits orbits = ElementOrbits.of(ag32).orElseThrow();
        assertEquals(1, orbits.count());
        assertArrayEquals(new int[8], orbits.representative());
        assertCarriersAreAutomorphisms(ag32, orbits);
    }

    @Test
    void aDirectSumOfUniformMatroidsHasItsComponentsAsOrbits() {
        // U(2,3) on {0,1,2} plus U(1,2) on {3,4}: an automorphism permutes the connected components (Oxley, Matroid
        // Theory, 2nd ed., §4.2), here of different sizes, and each uniform component is transitive (common practice)
        List<int[]> bases = List.of(new int[] {0, 1, 3}, new int[] {0, 1, 4}, new int[] {0, 2, 3}, new int[] {0, 2, 4},
                new int[] {1, 2, 3}, new int[] {1, 2, 4});
        ExplicitMatroid m = ExplicitMatroid.fromBases(List.of("a", "b", "c", "d", "e"), 3, bases);
        ElementOrbits orbits = ElementOrbits.of(m).orElseThrow();
        assertEquals(2, orbits.count());
        assertArrayEquals(new int[] {0, 0, 0, 3, 3}, orbits.representative());
        assertCarriersAreAutomorphisms(m, orbits);
        // a representative is carried by the identity
        assertArrayEquals(new int[] {0, 1, 2, 3, 4}, orbits.carrier().get(0));
        assertArrayEquals(new int[] {0, 1, 2, 3, 4}, orbits.carrier().get(3));
    }
}
