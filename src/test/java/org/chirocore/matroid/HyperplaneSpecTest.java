package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class HyperplaneSpecTest {
    private final AffineCube cube = AffineCube.real(3);

    @ParameterizedTest(name = "\"{0}\"")
    @CsvSource(delimiter = ';', value = {
        "1,1,1=1; 100 010 001",
        "100,010,001; 100 010 001",
        "2, 2, 2 = 2; 100 010 001",
        "1,0,0=0; 000 001 010 011",
        "1,-1,0=0; 000 001 110 111",
        "0,1,1=1; 001 010 101 110"})
    void resolvesEquationsAndVertexLists(String text, String expectedLabels) {
        int[] expected = cube.indicesOf(List.of(expectedLabels.split(" ")));
        assertArrayEquals(expected, HyperplaneSpec.parse(text).resolve(cube));
    }

    @Test
    void threeVerticesOfAFacetAreNotAFlat() {
        InvalidHyperplaneException e = assertThrows(InvalidHyperplaneException.class,
                () -> new HyperplaneSpec.ByVertices(List.of("000", "100", "010")).resolve(cube));
        assertEquals("The vertex set {000, 010, 100} is not a flat: 110 lies in its closure but not in the set.",
                e.getMessage());
    }

    @ParameterizedTest(name = "\"{0}\" has rank {1}")
    @CsvSource(delimiter = ';', value = {
        "1,1,1=3; 1",
        "1,1,0=2; 2",
        "1,1,1=4; 0",
        "000,111; 2"})
    void setsOfTheWrongRankAreRefusedNamingTheRank(String text, int rank) {
        InvalidHyperplaneException e = assertThrows(InvalidHyperplaneException.class,
                () -> HyperplaneSpec.parse(text).resolve(cube));
        assertTrue(e.getMessage().contains("has rank " + rank + ", but a hyperplane has rank 3"), e.getMessage());
    }

    @Test
    void spanningSetsAreRefusedByRank() {
        InvalidHyperplaneException e = assertThrows(InvalidHyperplaneException.class,
                () -> HyperplaneSpec.parse("000,100,010,001").resolve(cube));
        assertTrue(e.getMessage().contains("{000, 001, 010, 100} has rank 4"), e.getMessage());
    }

    @Test
    void malformedDescriptionsAreNamed() {
        assertTrue(assertThrows(InvalidHyperplaneException.class, () -> HyperplaneSpec.parse("1,x,1=1"))
                .getMessage().contains("\"1,x,1=1\""));
        assertTrue(assertThrows(InvalidHyperplaneException.class, () -> HyperplaneSpec.parse("100,01x,001")
                .resolve(cube)).getMessage().contains("\"01x\""));
        assertTrue(assertThrows(InvalidHyperplaneException.class, () -> HyperplaneSpec.parse("1,1=1")
                .resolve(cube)).getMessage().contains("[1, 1] has 2 coefficients"));
        assertTrue(assertThrows(InvalidHyperplaneException.class, () -> HyperplaneSpec.parse("0,0,0=1"))
                .getMessage().contains("[0, 0, 0] is zero"));
    }

    /**
     * Over GF(2) the equation x1 + x2 + x3 = 1 (read over the integers) gives the corner
     * triangle {100, 010, 001}, whose closure in AG(3,2) adds 111 (100 + 010 + 001 = 111 mod 2).
     */
    @Test
    void equationSetsAreCheckedForClosureOverFiniteFields() {
        InvalidHyperplaneException e = assertThrows(InvalidHyperplaneException.class,
                () -> HyperplaneSpec.parse("1,1,1=1").resolve(AffineCube.of(3, Field.gf(2))));
        assertTrue(e.getMessage().contains("111 lies in its closure"), e.getMessage());
    }
}
