package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class CubeGeometryTest {

    /** OEIS A007847: number of hyperplanes spanned by vertices of an n-cube, 2, 6, 20, 140, 3254. */
    @ParameterizedTest(name = "n = {0}: {1} hyperplanes")
    @CsvSource({"1, 2", "2, 6", "3, 20", "4, 140", "5, 3254"})
    void hyperplaneCountsMatchOeisA007847(int n, int count) {
        List<CubeHyperplane> hyperplanes = CubeGeometry.realHyperplanes(n);
        assertEquals(count, hyperplanes.size());
        assertEquals(count, new HashSet<>(hyperplanes).size());
    }

    /** Second method: the generic rank-oracle enumeration finds the same vertex sets. */
    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4})
    void hyperplanesAgreeWithGenericFlatEnumeration(int n) {
        assertEquals(vertexSets(Flats.hyperplanes(AffineCube.real(n))),
                vertexSets(CubeGeometry.realHyperplanes(n).stream().map(CubeHyperplane::elements).toList()));
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5})
    void everyEnumeratedHyperplaneIsAFlatOfRankN(int n) {
        AffineCube cube = AffineCube.real(n);
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(n)) {
            assertEquals(n, cube.rank(h.elements()), h.equation());
            assertTrue(Flats.isFlat(cube, h.elements()), h.equation());
        }
    }

    /**
     * 2n facets and n(n−1) skew facets (two for each unordered pair i &lt; j: x_i = x_j and x_i = 1 − x_j; counting ordered pairs
     * would double them, as x_i = x_j and x_j = x_i are one set; for n = 3
     * the 20 hyperplanes are 6 facets, 6 skew facets and 8 corner triangles). Each is a
     * hyperplane of the real cube and of the cube over GF(2) and GF(3), and occurs in the
     * enumeration.
     */
    @ParameterizedTest
    @MethodSource("dimensionsAndFields")
    void facetsAndSkewFacetsAreHyperplanes(int n, Field field) {
        AffineCube cube = AffineCube.of(n, field);
        List<CubeHyperplane> facets = CubeGeometry.facets(n);
        List<CubeHyperplane> skew = CubeGeometry.skewFacets(n);
        assertEquals(2 * n, new HashSet<>(facets).size());
        assertEquals(n * (n - 1), new HashSet<>(skew).size());
        for (CubeHyperplane h : Stream.concat(facets.stream(), skew.stream()).toList()) {
            assertEquals(1 << (n - 1), h.vertices().size(), h.equation());
            assertEquals(n, cube.rank(h.elements()), h.equation());
            assertTrue(Flats.isFlat(cube, h.elements()), h.equation());
        }
        if (n <= CubeGeometry.MAX_ENUMERATED_DIMENSION && field.isRational()) {
            List<CubeHyperplane> all = CubeGeometry.realHyperplanes(n);
            assertTrue(all.containsAll(facets));
            assertTrue(all.containsAll(skew));
        }
    }

    static Stream<Arguments> dimensionsAndFields() {
        return cubes(6);
    }

    static Stream<Arguments> smallDimensionsAndFields() {
        return cubes(4);
    }

    private static Stream<Arguments> cubes(int maxDimension) {
        return Stream.iterate(2, n -> n <= maxDimension, n -> n + 1)
                .flatMap(n -> Stream.of(Field.RATIONALS, Field.gf(2), Field.gf(3)).map(f -> Arguments.of(n, f)));
    }

    @Test
    void realThreeCubeHasTwelveRectangles() {
        // 6 square faces + 6 diagonal rectangles (common practice: count them on a drawn cube).
        assertEquals(12, CubeGeometry.rectangles(3).size());
    }

    /**
     * Count derived here (not from a source): a rectangle is an unordered pair of vertex pairs
     * with the same midpoint m; if m has k coordinates equal to 1/2, there are 2^(k−1) vertex
     * pairs with midpoint m and C(n, k)·2^(n−k) such midpoints, so the count is
     * Σ_{k≥2} C(n,k)·2^(n−k)·C(2^(k−1), 2): 1, 12, 100, 720, 4816 for n = 2..6.
     */
    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8})
    void rectangleCountMatchesTheMidpointFormula(int n) {
        long expected = 0;
        for (int k = 2; k <= n; k++) {
            expected += ElementSets.binomial(n, k) * (1L << (n - k)) * ElementSets.binomial(1 << (k - 1), 2);
        }
        List<int[]> rectangles = CubeGeometry.rectangles(n);
        assertEquals(expected, rectangles.size());
        assertEquals(expected, vertexSets(rectangles).size());
    }

    @ParameterizedTest
    @MethodSource("smallDimensionsAndFields")
    void everyRectangleIsAFourElementCircuit(int n, Field field) {
        AffineCube cube = AffineCube.of(n, field);
        for (int[] r : CubeGeometry.rectangles(n)) {
            assertEquals(3, cube.rank(r), Arrays.toString(r));
            int[] three = ElementSets.range(3);
            do {
                int[] subset = {r[three[0]], r[three[1]], r[three[2]]};
                assertTrue(cube.isIndependent(subset), Arrays.toString(subset));
            } while (ElementSets.nextCombination(three, 4));
        }
    }

    @Test
    void enumerationRefusesLargeDimensions() {
        assertThrows(IllegalArgumentException.class, () -> CubeGeometry.realHyperplanes(6));
    }

    @Test
    void hyperplaneRecordIsNormalised() {
        CubeHyperplane h = CubeHyperplane.of(new int[] {-2, -2, -2}, -2);
        assertEquals(List.of(1, 1, 1), h.normal());
        assertEquals(1, h.offset());
        assertEquals(List.of(1, 2, 4), h.vertices());
        assertEquals("x1 + x2 + x3 = 1", h.equation());
        assertThrows(IllegalArgumentException.class, () -> new CubeHyperplane(List.of(2, 2, 2), 2, List.of(1, 2, 4)));
        assertThrows(IllegalArgumentException.class, () -> new CubeHyperplane(List.of(1, 1, 1), 1, List.of(1, 2)));
        assertThrows(IllegalArgumentException.class, () -> CubeHyperplane.of(new int[] {0, 0}, 1));
    }

    private static Set<List<Integer>> vertexSets(List<int[]> sets) {
        Set<List<Integer>> out = new HashSet<>();
        for (int[] s : sets) {
            out.add(Arrays.stream(s).boxed().toList());
        }
        return out;
    }
}
