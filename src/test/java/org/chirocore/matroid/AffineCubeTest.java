package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class AffineCubeTest {

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
    void hasTwoToTheNVerticesAndRankNPlusOne(int n) {
        AffineCube cube = AffineCube.real(n);
        assertEquals(1 << n, cube.size());
        assertEquals(n + 1, cube.rank());
        for (int e = 0; e < cube.size(); e++) {
            assertEquals(e, cube.indexOf(cube.label(e)));
            assertEquals(e, cube.indexOf(cube.coordinates(e)));
        }
    }

    @Test
    void elementOrderReadsLabelsAsBinaryWithCoordinateOneMostSignificant() {
        AffineCube cube = AffineCube.real(3);
        assertEquals(List.of("000", "001", "010", "011", "100", "101", "110", "111"), cube.labels());
        assertArrayEquals(new int[] {1, 0, 0}, cube.coordinates(cube.indexOf("100")));
        assertArrayEquals(new long[] {1, 1, 0, 0}, cube.matrixMatroid().column(cube.indexOf("100")));
        assertArrayEquals(new int[] {1, 2, 4}, cube.indicesOf(List.of("100", "010", "001")));
    }

    @Test
    void badLabelsAreNamed() {
        AffineCube cube = AffineCube.real(3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> cube.indexOf("10x"));
        assertEquals("The vertex \"10x\" is not a 0/1 string of length 3.", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> cube.indexOf("1000"));
        IllegalArgumentException twice = assertThrows(IllegalArgumentException.class,
                () -> cube.indicesOf(List.of("100", "010", "100")));
        assertTrue(twice.getMessage().contains("\"100\""), twice.getMessage());
        assertThrows(IllegalArgumentException.class, () -> cube.indexOf(new int[] {1, 2, 0}));
        assertThrows(IllegalArgumentException.class, () -> AffineCube.real(0));
    }

    /**
     * Over GF(2) the 3-cube is AG(3,2): a 4-subset with zero sum mod 2 is dependent, so it has
     * C(8,3)/C(4,3) = 14 four-point planes (any three points x, y, z lie on exactly one, with
     * fourth point x + y + z; derived here; AG(3,2) is described in [Oxley, Matroid Theory, 2nd
     * ed., Appendix]). The real 3-cube has only the 6 facets and 6 skew facets; the 8 other
     * hyperplanes are corner triangles. Both counts are computed from the rank oracles here.
     */
    @Test
    void ag32HasFourteenFourPointPlanesTheRealCubeTwelve() {
        AffineCube binary = AffineCube.of(3, Field.gf(2));
        AffineCube real = AffineCube.real(3);
        int[] comb = ElementSets.range(4);
        do {
            if ((comb[0] ^ comb[1] ^ comb[2] ^ comb[3]) == 0) {
                assertFalse(binary.isIndependent(comb));
            }
        } while (ElementSets.nextCombination(comb, 8));
        assertEquals(14, fourPointPlanes(binary));
        assertEquals(12, fourPointPlanes(real));
    }

    private static long fourPointPlanes(Matroid m) {
        return Flats.flatsOfRank(m, 3, ElementSets.range(m.size())).stream().filter(f -> f.length == 4).count();
    }

    /**
     * Whether the affine n-cube over GF(p) has the same bases as the real one. A basis over
     * GF(p) is a basis over Q (a determinant nonzero mod p is nonzero); conversely a real basis
     * is lost exactly when p divides its determinant. Translating one vertex of an (n+1)-set to
     * the origin by reflecting coordinates (an affine symmetry of the cube, which keeps |det|)
     * shows these determinants are, up to sign, the determinants of n × n 0/1 matrices. The
     * largest such are 1, 1, 2, 3, 5 for n = 1..5 (OEIS A003432), so p = 2 first differs at
     * n = 3 (det of rows 110, 011, 101 is 2), p = 3 at n = 4 (J − I has det −3), p = 5 at n = 5.
     * Each row below was computed by the comparison, which is the proof; the reasoning only
     * explains it.
     */
    @ParameterizedTest(name = "GF({0}), n = {1}: same bases as the real cube = {2}")
    @CsvSource({
        "2, 1, true", "2, 2, true", "2, 3, false", "2, 4, false",
        "3, 2, true", "3, 3, true", "3, 4, false",
        "5, 4, true", "5, 5, false",
        "7, 4, true"})
    void finiteFieldCubeAgreesWithTheRealCubeOnlyForSmallN(int p, int n, boolean same) {
        int[] difference = firstDifferingSubset(AffineCube.real(n), AffineCube.of(n, Field.gf(p)));
        if (same) {
            assertNull(difference);
        } else {
            assertNotNull(difference);
        }
    }

    /** The first (n+1)-subset in lexicographic order that is a basis of one cube but not the other. */
    private static int[] firstDifferingSubset(AffineCube real, AffineCube modular) {
        int[] comb = ElementSets.range(real.rank());
        do {
            boolean overQ = real.isBasis(comb);
            boolean overP = modular.isBasis(comb);
            if (overQ != overP) {
                assertTrue(overQ, "A GF(p) basis is always a real basis.");
                return comb;
            }
        } while (ElementSets.nextCombination(comb, real.size()));
        return null;
    }

    @Test
    void theBinaryWitnessForNThreeIsTheEvenTetrahedron() {
        int[] tetrahedron = AffineCube.real(3).indicesOf(List.of("000", "110", "011", "101"));
        assertTrue(AffineCube.real(3).isBasis(tetrahedron));
        assertFalse(AffineCube.of(3, Field.gf(2)).isBasis(tetrahedron));
    }
}
