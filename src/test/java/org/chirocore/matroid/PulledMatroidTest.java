package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Random;
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
        assertTrue(v.holdsIn(cube));
        GeneralPositionViolation forged = new GeneralPositionViolation(v.hyperline(), o, cube.indexOf("010"), "");
        assertFalse(forged.holdsIn(cube), "010 is in the facet x1 = 0, so it cannot violate.");
        GeneralPositionException e = assertThrows(GeneralPositionException.class,
                () -> PulledMatroid.pull(cube, facet, o));
        assertEquals("The point 100 and the hyperplane {000, 001, 010, 011} are not in general position: "
                + "the closure of the hyperline {000, 001} together with 100 also contains 101.", e.getMessage());
        assertEquals(v, e.violation());
    }

    /**
     * Every (hyperplane, outside vertex) pair of the real 3-cube: in general position the pulled
     * bases pass basis exchange (re-checked by fromBases); otherwise the witness really lies in
     * the closure of the hyperline with the point. Counts computed here, not from a source.
     */
    @Test
    void everyPairOfTheThreeCubeEitherPullsToAMatroidOrHasACheckedWitness() {
        AffineCube cube = AffineCube.real(3);
        int inPosition = 0;
        int violated = 0;
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(3)) {
            for (int o = 0; o < cube.size(); o++) {
                if (!h.vertices().contains(o)) {
                    if (checkPullOrWitness(cube, h.elements(), o)) {
                        inPosition++;
                    } else {
                        violated++;
                    }
                }
            }
        }
        // 8 triangles × 5 outside vertices + 12 four-point planes × 4 = 88 pairs, of which the
        // computation finds 8 in general position.
        assertEquals(8, inPosition);
        assertEquals(80, violated);
    }

    /**
     * The real 4-cube has 80 pairs in general position among its 1520 (hyperplane, outside
     * vertex) pairs (computed here, not from a source); a fixed-seed sample of both kinds is
     * checked as above.
     */
    @Test
    void sampledPairsOfTheFourCubeEitherPullToAMatroidOrHaveACheckedWitness() {
        AffineCube cube = AffineCube.real(4);
        List<Pair> inPosition = new ArrayList<>();
        List<Pair> violated = new ArrayList<>();
        for (CubeHyperplane h : CubeGeometry.realHyperplanes(4)) {
            for (int o = 0; o < cube.size(); o++) {
                if (!h.vertices().contains(o)) {
                    boolean ok = PulledMatroid.generalPositionViolation(cube, h.elements(), o).isEmpty();
                    (ok ? inPosition : violated).add(new Pair(h.elements(), o));
                }
            }
        }
        assertEquals(80, inPosition.size());
        assertEquals(1440, violated.size());
        Random random = new Random(20240601L);
        for (List<Pair> kind : List.of(inPosition, violated)) {
            for (int trial = 0; trial < 3; trial++) {
                Pair pair = kind.get(random.nextInt(kind.size()));
                assertEquals(kind == inPosition, checkPullOrWitness(cube, pair.hyperplane(), pair.point()));
            }
        }
    }

    /** A hyperplane (element indices) and a point outside it. */
    private record Pair(int[] hyperplane, int point) {
    }

    /** Checks the pull or the violation; returns whether the pair was in general position. */
    private static boolean checkPullOrWitness(Matroid m, int[] hyperplane, int o) {
        Optional<GeneralPositionViolation> violation = PulledMatroid.generalPositionViolation(m, hyperplane, o);
        if (violation.isPresent()) {
            GeneralPositionViolation v = violation.get();
            assertTrue(v.holdsIn(m), v.message());
            return false;
        }
        ExplicitMatroid pulled = ExplicitMatroid.of(PulledMatroid.pull(m, hyperplane, o));
        assertDoesNotThrow(() -> ExplicitMatroid.fromBases(pulled.labels(), pulled.rank(), pulled.bases()));
        return true;
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
    /**
     * Closures in the pulled 4-cube, in minors of it (contracting and deleting random sets) and in
     * minors of minors agree with the definition rank(S ∪ {e}) = rank(S) evaluated by rank queries,
     * at every rank of S (at rank r − 1 and r the pulled matroid's own rule applies).
     */
    @Test
    void closuresInPulledCubesAndTheirMinorsAgreeWithRankQueries() {
        AffineCube cube = AffineCube.real(4);
        PulledMatroid pulled = PulledMatroid.pull(cube, unitVectors(cube), allOnes(cube));
        Random random = new Random(16);
        for (int trial = 0; trial < 100; trial++) {
            Matroid m = pulled;
            for (int level = 0; level < trial % 3; level++) {
                int[] contracted = ElementSets.elements(random.nextLong() & random.nextLong() & ElementSets.allMask(m.size()));
                int[] deleted = Arrays.stream(ElementSets.elements(random.nextLong() & random.nextLong()
                        & ElementSets.allMask(m.size()))).filter(e -> !ElementSets.contains(contracted, e)).toArray();
                m = new Minor(m, contracted, deleted);
            }
            int[] set = ElementSets.elements(random.nextLong() & random.nextLong() & ElementSets.allMask(m.size()));
            int[] candidates = ElementSets.range(m.size());
            assertArrayEquals(new MatrixMatroidTest.RankOnly(m).inClosure(set, candidates), m.inClosure(set, candidates),
                    "trial " + trial);
        }
    }

    /** Simplifying a contracted pulled 5-cube with closure queries keeps the first element of each parallel class. */
    @Test
    void simplificationKeepsTheFirstElementOfEachParallelClass() {
        AffineCube cube = AffineCube.real(5);
        PulledMatroid pulled = PulledMatroid.pull(cube, unitVectors(cube), allOnes(cube));
        Matroid m = new Minor(pulled, cube.indicesOf(List.of("11111", "10000", "01000")), new int[0]);
        int[] kept = Simplification.representatives(m);
        for (int e = 0; e < m.size(); e++) {
            int first = e;
            for (int f = 0; f < e; f++) {
                if (m.rank(new int[] {f}) == 1 && m.rank(new int[] {f, e}) == 1) {
                    first = Math.min(first, f);
                }
            }
            boolean keep = m.rank(new int[] {e}) == 1 && first == e;
            assertEquals(keep, ElementSets.contains(kept, e), m.labels().get(e));
        }
        assertTrue(kept.length < m.size() - 1, "the contraction has parallel elements: " + kept.length);
    }
}
