package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class PulledMatroidTest {

    /** The unit vectors e1..en: the hyperplane x1 + … + xn = 1 of the n-cube. */
    private static int[] unitVectors(AffineCube cube) {
        return HyperplaneSpec.parse("1,".repeat(cube.dimension() - 1) + "1=1").resolve(cube);
    }

    private static int allOnes(AffineCube cube) {
        return cube.indexOf("1".repeat(cube.dimension()));
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 4})
    void unitVectorsAndAllOnesAreInGeneralPosition(int n) {
        AffineCube cube = AffineCube.real(n);
        assertEquals(Optional.empty(),
                PulledMatroid.generalPositionViolation(cube, unitVectors(cube), allOnes(cube)));
    }

    @Test
    void pullingTheThreeCubeMakesTheNewHyperplaneAndKeepsTheAxioms() {
        AffineCube cube = AffineCube.real(3);
        PulledMatroid pulled = PulledMatroid.pull(cube, unitVectors(cube), allOnes(cube));
        int[] newHyperplane = pulled.pulledHyperplane();
        assertEquals(List.of("001", "010", "100", "111"),
                Arrays.stream(newHyperplane).mapToObj(cube::label).toList());
        assertEquals(4, pulled.rank());
        assertEquals(3, pulled.rank(newHyperplane));
        assertTrue(Flats.isFlat(pulled, newHyperplane));
        assertTrue(cube.isBasis(newHyperplane));
        assertFalse(pulled.isBasis(newHyperplane));
        // The bases of M' must satisfy basis exchange: fromBases re-checks it.
        ExplicitMatroid explicit = ExplicitMatroid.of(pulled);
        assertDoesNotThrow(() -> ExplicitMatroid.fromBases(explicit.labels(), explicit.rank(), explicit.bases()));
        assertEquals(ExplicitMatroid.of(cube).basisCount() - 1, explicit.basisCount());
    }

    /**
     * Contracting O gives a rank-3 matroid on 7 elements with 7 three-point lines and no other
     * lines, the line count of the Fano plane F7 ([Oxley, Matroid Theory, 2nd ed., §1.5 and
     * Appendix]); a simple rank-3 matroid on 7 points whose lines all have 3 points is F7.
     */
    @Test
    void contractingThePulledPointOfTheThreeCubeGivesSevenThreePointLines() {
        AffineCube cube = AffineCube.real(3);
        PulledMatroid pulled = PulledMatroid.pull(cube, unitVectors(cube), allOnes(cube));
        Minor contracted = new Minor(pulled, new int[] {allOnes(cube)}, new int[0]);
        assertEquals(7, contracted.size());
        assertEquals(3, contracted.rank());
        List<int[]> lines = Flats.flatsOfRank(contracted, 2, ElementSets.range(7));
        assertEquals(7, lines.stream().filter(l -> l.length == 3).count());
        assertEquals(7, lines.size());
        assertTrue(Flats.flatsOfRank(contracted, 1, ElementSets.range(7)).stream().allMatch(p -> p.length == 1),
                "The contraction is simple.");
    }

    @Test
    void contractingThePulledPointOfTheFourCubeGivesAMatroid() {
        AffineCube cube = AffineCube.real(4);
        PulledMatroid pulled = PulledMatroid.pull(cube, unitVectors(cube), allOnes(cube));
        Minor contracted = new Minor(pulled, new int[] {allOnes(cube)}, new int[0]);
        assertEquals(15, contracted.size());
        assertEquals(4, contracted.rank());
        ExplicitMatroid explicit = ExplicitMatroid.of(contracted);
        assertDoesNotThrow(() -> ExplicitMatroid.fromBases(explicit.labels(), explicit.rank(), explicit.bases()));
    }

    /**
     * Found by computation: for the facet x1 = 0 and O = 100, the first hyperline of the facet
     * is the edge {000, 001}, and with 100 it spans the facet x2 = 0, which also holds 101.
     */
    @Test
    void aFacetAndAnAdjacentVertexAreNotInGeneralPosition() {
        AffineCube cube = AffineCube.real(3);
        int[] facet = HyperplaneSpec.parse("1,0,0=0").resolve(cube);
        int o = cube.indexOf("100");
        GeneralPositionViolation v = PulledMatroid.generalPositionViolation(cube, facet, o).orElseThrow();
        assertEquals(List.of(cube.indexOf("000"), cube.indexOf("001")), v.hyperline());
        assertEquals(cube.indexOf("101"), v.witness());
        int[] lineWithPoint = ElementSets.with(cube.indicesOf(List.of("000", "001")), o);
        assertEquals(cube.rank(lineWithPoint), cube.rank(ElementSets.with(lineWithPoint, v.witness())),
                "The witness lies in the closure of L ∪ {O}.");
        GeneralPositionException e = assertThrows(GeneralPositionException.class,
                () -> PulledMatroid.pull(cube, facet, o));
        assertEquals("The point 100 and the hyperplane {000, 001, 010, 011} are not in general position: "
                + "the closure of the hyperline {000, 001} together with 100 also contains 101.", e.getMessage());
        assertEquals(v, e.violation());
    }

    @Test
    void aPointInsideTheHyperplaneIsRefused() {
        AffineCube cube = AffineCube.real(3);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PulledMatroid.pull(cube, unitVectors(cube), cube.indexOf("010")));
        assertTrue(e.getMessage().startsWith("The point 010 lies in the hyperplane {001, 010, 100}"), e.getMessage());
    }

    @Test
    void aSetThatIsNoHyperplaneIsRefused() {
        AffineCube cube = AffineCube.real(3);
        InvalidHyperplaneException e = assertThrows(InvalidHyperplaneException.class,
                () -> PulledMatroid.pull(cube, cube.indicesOf(List.of("000", "100", "010")), cube.indexOf("111")));
        assertTrue(e.getMessage().contains("110 lies in its closure"), e.getMessage());
    }
}
