package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** The table of limits refuses before the work, and the entries bound what they say they bound. */
class LimitsTest {
    @Test
    void explicitMatroidsAreBoundedByTheirSubsets() {
        // C(31, 5) = 169911 and C(63, 6) = 67945521 (binomial coefficients, common practice).
        assertDoesNotThrow(() -> Limits.requireExplicit(31, 5, "the 5-cube's construction"));
        TooLargeException six = assertThrows(TooLargeException.class,
                () -> Limits.requireExplicit(63, 6, "the 6-cube's construction"));
        assertTrue(six.getMessage().contains("67945521 6-element subsets"), six.getMessage());
        assertDoesNotThrow(() -> Limits.requireExplicit(65, 2, "a matroid beyond one 64-bit word"));
        TooLargeException wide = assertThrows(TooLargeException.class,
                () -> Limits.requireExplicit(Limits.ELEMENTS + 1, 2, "a matroid"));
        assertTrue(wide.getMessage().contains("has at most " + Limits.ELEMENTS), wide.getMessage());
    }

    @Test
    void nonBasesOfAHugeUniformMatroidAreRefusedBeforeEnumeration() {
        // U(32, 64) has C(64, 32) > 10^18 bases: refused at once instead of exhausting memory.
        List<String> labels = java.util.stream.IntStream.range(0, 64).mapToObj(Integer::toString).toList();
        TooLargeException e = assertThrows(TooLargeException.class,
                () -> ExplicitMatroid.fromNonBases(labels, 32, List.of()));
        assertTrue(e.getMessage().contains("rank 32 on 64 elements"), e.getMessage());
    }

    @Test
    void cubesAreBuiltUpToTheDeclaredDimension() {
        assertDoesNotThrow(() -> Limits.requireCube(Limits.CUBE_DIMENSION, "n"));
        assertThrows(TooLargeException.class, () -> Limits.requireCube(Limits.CUBE_DIMENSION + 1, "n"));
        // The largest cube is really built: 2^16 vertices of rank 17.
        AffineCube cube = AffineCube.real(Limits.CUBE_DIMENSION);
        assertTrue(cube.size() == 1 << Limits.CUBE_DIMENSION && cube.rank() == Limits.CUBE_DIMENSION + 1);
        assertThrows(IllegalArgumentException.class, () -> AffineCube.real(Limits.CUBE_DIMENSION + 1));
    }
}
