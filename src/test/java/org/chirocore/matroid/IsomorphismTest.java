package org.chirocore.matroid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.chirocore.fixtures.NamedMatroids;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Isomorphism search on the element–hyperplane incidence graph, tested on published
 * isomorphisms and non-isomorphisms ([Ox] = J. Oxley, Matroid Theory, 2nd ed., 2011). Every
 * isomorphism found is also re-checked here, independently of the inspector's own check.
 */
class IsomorphismTest {

    /** The isomorphism found, after checking in this test that it maps bases onto bases. */
    private static Optional<Isomorphism> find(Matroid a, Matroid b) {
        Optional<Isomorphism> iso = new HyperplaneIsomorphismInspector(a, b).find();
        iso.ifPresent(i -> assertMapsBasesOntoBases(i, a, b));
        return iso;
    }

    private static void assertMapsBasesOntoBases(Isomorphism iso, Matroid a, Matroid b) {
        ExplicitMatroid ea = ExplicitMatroid.of(a);
        ExplicitMatroid eb = ExplicitMatroid.of(b);
        assertEquals(eb.basisCount(), ea.basisCount());
        for (int[] basis : ea.bases()) {
            assertTrue(eb.isBasis(iso.apply(basis)), "The image of a basis is a basis.");
        }
    }

    private static boolean isomorphic(Matroid a, Matroid b) {
        return find(a, b).isPresent();
    }

    static IntStream affineCubeElements() {
        return IntStream.range(0, 8);
    }

    /** AG(3,2)/e ≅ F7 for every element e [Ox, Appendix, AG(3,2)]. */
    @ParameterizedTest(name = "element {0}")
    @MethodSource("affineCubeElements")
    void contractingAnAffineCubePointGivesTheFano(int e) {
        Minor contraction = new Minor(NamedMatroids.binaryAffineCube(), new int[] {e}, new int[0]);
        assertTrue(isomorphic(contraction, NamedMatroids.fano()));
    }

    /** AG(3,2)\e ≅ F7* for every element e [Ox, Appendix, AG(3,2)]. */
    @ParameterizedTest(name = "element {0}")
    @MethodSource("affineCubeElements")
    void deletingAnAffineCubePointGivesTheFanoDual(int e) {
        Minor deletion = new Minor(NamedMatroids.binaryAffineCube(), new int[0], new int[] {e});
        assertTrue(isomorphic(deletion, NamedMatroids.fanoDual()));
    }

    /** F7 ≇ F7^-: seven lines against six [Ox, Appendix]. */
    @Test
    void fanoIsNotTheNonFano() {
        assertFalse(isomorphic(NamedMatroids.fano(), NamedMatroids.nonFano()));
    }

    @Test
    void uniformThreeSixIsNeitherTheNonFanoNorMK4() {
        assertFalse(isomorphic(NamedMatroids.uniformThreeSix(), NamedMatroids.nonFano()));
        assertFalse(isomorphic(NamedMatroids.uniformThreeSix(), NamedMatroids.completeGraphK4()));
    }

    /** The Fano plane from its GF(2) matrix with the columns in another order is still F7. */
    @Test
    void fanoWithReorderedColumnsIsTheFano() {
        MatrixMatroid fano = NamedMatroids.fano();
        int[] order = {6, 2, 4, 0, 5, 1, 3};
        List<long[]> columns = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        for (int j : order) {
            columns.add(fano.column(j));
            labels.add(fano.labels().get(j));
        }
        MatrixMatroid reordered = new MatrixMatroid(Field.gf(2), columns, labels);
        assertNotEquals(ExplicitMatroid.of(fano).relabel(labels), ExplicitMatroid.of(reordered),
                "The reordering changes the basis list, so the search has work to do.");
        assertTrue(isomorphic(fano, reordered));
        assertTrue(isomorphic(Duality.dual(ExplicitMatroid.of(reordered)), NamedMatroids.fanoDual()),
                "F7* is dual(F7) up to isomorphism, whatever the column order [Ox, §2.1].");
    }

    static Stream<Supplier<Matroid>> fixtures() {
        return Stream.of(NamedMatroids::fano, NamedMatroids::nonFano, NamedMatroids::fanoDual,
                NamedMatroids::binaryAffineCube, NamedMatroids::completeGraphK4, NamedMatroids::r10,
                NamedMatroids::pappus, NamedMatroids::nonPappus, NamedMatroids::vamos,
                NamedMatroids::ternaryAffinePlane, () -> NamedMatroids.randomRational(99L, 4, 8, 2));
    }

    /** A renumbering of the elements by a fixed-seed random permutation is found isomorphic. */
    @ParameterizedTest
    @MethodSource("fixtures")
    void randomRenumberingIsFoundIsomorphic(Supplier<Matroid> fixture) {
        Matroid m = fixture.get();
        ExplicitMatroid shuffled = NamedMatroids.permuted(m, NamedMatroids.randomPermutation(12345L, m.size()));
        assertTrue(isomorphic(m, shuffled));
        assertEquals(MatroidShape.of(m), MatroidShape.of(shuffled));
    }

    /** Vámos is self-dual up to isomorphism [Ox, Appendix, V8; from memory], confirmed here. */
    @Test
    void vamosIsIsomorphicToItsDual() {
        ExplicitMatroid vamos = NamedMatroids.vamos();
        assertTrue(isomorphic(vamos, Duality.dual(vamos)));
    }

    /**
     * R10\e ≅ M(K3,3) and R10/e ≅ M*(K3,3) for every e, and R10 ≅ R10* [Ox, Appendix, R10; from
     * memory], confirmed here.
     */
    @Test
    void r10MinorsAreK33AndItsDualAndR10IsSelfDual() {
        MatrixMatroid r10 = NamedMatroids.r10();
        ExplicitMatroid k33 = ExplicitMatroid.of(NamedMatroids.completeBipartiteK33());
        ExplicitMatroid k33Dual = Duality.dual(k33);
        for (int e = 0; e < r10.size(); e++) {
            assertTrue(isomorphic(new Minor(r10, new int[0], new int[] {e}), k33), "R10 \\ " + e);
            assertTrue(isomorphic(new Minor(r10, new int[] {e}, new int[0]), k33Dual), "R10 / " + e);
        }
        assertTrue(isomorphic(r10, Duality.dual(ExplicitMatroid.of(r10))));
    }

    /** The rank-3 pairs of lines through a common point and disjoint lines: equal shapes, not isomorphic. */
    @Test
    void equalShapesNeedNotBeIsomorphic() {
        List<String> labels = MatrixMatroid.indexLabels(7);
        ExplicitMatroid meeting = ExplicitMatroid.fromNonBases(labels, 3, List.of(new int[] {0, 1, 2}, new int[] {2, 3, 4}));
        ExplicitMatroid disjoint = ExplicitMatroid.fromNonBases(labels, 3, List.of(new int[] {0, 1, 2}, new int[] {3, 4, 5}));
        assertEquals(MatroidShape.of(meeting), MatroidShape.of(disjoint));
        assertFalse(isomorphic(meeting, disjoint));
    }

    @Test
    void fanoShapeHasSevenThreePointLines() {
        assertEquals(new MatroidShape(7, 3, 28, List.of(0, 0, 0, 7, 0, 0, 0, 0)), MatroidShape.of(NamedMatroids.fano()));
    }

    /** Rank 0 (all loops) has no hyperplanes; any bijection is an isomorphism. */
    @Test
    void rankZeroAndEmptyMatroidsAreHandled() {
        ExplicitMatroid loops = ExplicitMatroid.fromBases(MatrixMatroid.indexLabels(3), 0, List.of(new int[0]));
        assertTrue(isomorphic(loops, loops.relabel(List.of("x", "y", "z"))));
        ExplicitMatroid empty = ExplicitMatroid.fromBases(List.of(), 0, List.of(new int[0]));
        assertTrue(isomorphic(empty, empty));
        assertFalse(isomorphic(empty, loops));
    }

    /** Loops and parallel classes are matched: a loop goes to a loop, and U(1,3) has no loop. */
    @Test
    void loopsAndParallelElementsAreMatched() {
        List<String> labels = MatrixMatroid.indexLabels(3);
        // Element 0 a loop, 1 and 2 parallel: rank 1, bases {1}, {2}.
        ExplicitMatroid loopAndPair = ExplicitMatroid.fromBases(labels, 1, List.of(new int[] {1}, new int[] {2}));
        ExplicitMatroid pairAndLoop = ExplicitMatroid.fromBases(labels, 1, List.of(new int[] {0}, new int[] {1}));
        ExplicitMatroid u13 = ExplicitMatroid.fromBases(labels, 1, List.of(new int[] {0}, new int[] {1}, new int[] {2}));
        Isomorphism iso = find(loopAndPair, pairAndLoop).orElseThrow();
        assertEquals(2, iso.apply(0), "The loop goes to the loop.");
        assertFalse(isomorphic(loopAndPair, u13));
    }

    @Test
    void aBijectionThatIsNotAPermutationIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new Isomorphism(List.of(0, 0, 1)));
        Isomorphism swap = new Isomorphism(List.of(1, 0, 2, 3, 4, 5, 6));
        assertFalse(swap.isIsomorphism(NamedMatroids.fano(), NamedMatroids.nonFano()));
    }
}
