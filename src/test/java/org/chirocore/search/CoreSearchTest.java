package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneSpec;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.PulledMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.orient.LazySatDecider;
import org.chirocore.orient.WitnessCheck;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

/** Reductions to minimal cores, checked against published excluded minors (each source named beside its case). */
class CoreSearchTest {

    static SearchResult reduce(Matroid m, long seed, Strategy strategy) {
        return new UnsatCoreSearch(new SearchSettings(seed, strategy, Budget.UNLIMITED), Progress.SILENT).reduce(m);
    }

    static boolean isomorphic(Matroid a, Matroid b) {
        return new HyperplaneIsomorphismInspector(a, b).find().isPresent();
    }

    /** Re-checks every minimality witness against the minor built here from the core. */
    static void assertMinimalityProof(MinimalCore found) {
        ExplicitMatroid core = found.core();
        assertEquals(2 * core.size(), found.witnesses().size());
        for (MinorWitness w : found.witnesses()) {
            int e = core.labels().indexOf(w.element());
            int[] single = {e};
            Matroid minor = w.operation() == Operation.DELETION
                    ? new Minor(core, new int[0], single) : new Minor(core, single, new int[0]);
            assertTrue(WitnessCheck.defect(minor, w.witness()).isEmpty(), () -> w.operation() + " " + w.element());
        }
        // The core itself is non-orientable: minimal means non-orientable with orientable minors.
        assertEquals("non-orientable", new LazySatDecider(Budget.UNLIMITED).decide(core).verdict());
    }

    @ParameterizedTest
    @EnumSource(Strategy.class)
    void fanoIsItsOwnCoreWithFourteenWitnesses(Strategy strategy) {
        // F7 is an excluded minor for orientability (Oxley, Matroid Theory, 2nd ed., §6.6).
        SearchResult r = reduce(NamedMatroids.fano(), 1, strategy);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertEquals(7, found.core().size());
        assertEquals(List.of(), found.contracted());
        assertEquals(List.of(), found.deleted());
        assertEquals(14, found.witnesses().size());
        assertMinimalityProof(found);
    }

    @ParameterizedTest
    @CsvSource({"0, CONTRACT_FIRST", "1, CONTRACT_FIRST", "2, DELETE_FIRST", "3, DELETE_FIRST"})
    void ag32ReducesToFanoOrItsDual(long seed, Strategy strategy) {
        // AG(3,2)/e = F7 and AG(3,2)\e = F7* (Oxley, Matroid Theory, 2nd ed., Appendix).
        SearchResult r = reduce(NamedMatroids.binaryAffineCube(), seed, strategy);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertTrue(isomorphic(found.core(), NamedMatroids.fano()) || isomorphic(found.core(), NamedMatroids.fanoDual()),
                found.core().toString());
        assertMinimalityProof(found);
    }

    @Test
    void orientableInputGivesACheckedWitness() {
        // The non-Fano matroid is real-representable, hence orientable (BLSWZ §1.2, common practice).
        SearchResult r = reduce(NamedMatroids.nonFano(), 0, Strategy.CONTRACT_FIRST);
        SearchResult.Orientable o = assertInstanceOf(SearchResult.Orientable.class, r);
        assertTrue(WitnessCheck.defect(NamedMatroids.nonFano(), o.witness()).isEmpty());
    }

    @Test
    void cornerConstructionInDimensionThreeGivesTheFanoPlane() {
        // docs/mathematics.md §7: H = {e1, e2, e3}, O = (1,1,1), pulled and contracted, gives F7.
        AffineCube cube = AffineCube.real(3);
        int[] h = HyperplaneSpec.parse("100,010,001").resolve(cube);
        int o = cube.indexOf("111");
        Matroid m = new Minor(PulledMatroid.pull(cube, h, o), new int[] {o}, new int[0]);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, reduce(m, 0, Strategy.CONTRACT_FIRST)).core();
        assertTrue(isomorphic(found.core(), NamedMatroids.fano()));
        assertMinimalityProof(found);
    }

    @Test
    void sameSeedSameCoreAndPath() {
        MinimalCore a = ((SearchResult.Found) reduce(NamedMatroids.binaryAffineCube(), 5, Strategy.CONTRACT_FIRST)).core();
        MinimalCore b = ((SearchResult.Found) reduce(NamedMatroids.binaryAffineCube(), 5, Strategy.CONTRACT_FIRST)).core();
        assertEquals(a.core(), b.core());
        assertEquals(a.contracted(), b.contracted());
        assertEquals(a.deleted(), b.deleted());
        assertEquals(a.witnesses(), b.witnesses());
    }

    @Test
    void theRecordedPathRebuildsTheCoreFromTheInput() {
        Matroid input = NamedMatroids.binaryAffineCube();
        MinimalCore found = ((SearchResult.Found) reduce(input, 9, Strategy.DELETE_FIRST)).core();
        int[] c = found.contracted().stream().mapToInt(input.labels()::indexOf).sorted().toArray();
        int[] d = found.deleted().stream().mapToInt(input.labels()::indexOf).sorted().toArray();
        assertEquals(found.core(), ExplicitMatroid.of(new Minor(input, c, d)));
    }

    @ParameterizedTest
    @CsvSource({"4, 0", "4, 1", "5, 0", "5, 2", "6, 0", "7, 0", "8, 0"})
    void cornerConstructionsReduceToCheckedMinimalCores(int n, long seed) {
        // Focused on the pulled hyperplane, as the reduce command does for constructions.
        CubeConstruction construction = CubeConstruction.corner(n);
        Matroid m = construction.build();
        SearchSettings settings = new SearchSettings(seed, Strategy.CONTRACT_FIRST, Budget.UNLIMITED,
                construction.hyperplaneVertices());
        SearchResult r = new UnsatCoreSearch(settings, Progress.SILENT).reduce(m);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertMinimalityProof(found);
        int[] c = found.contracted().stream().mapToInt(m.labels()::indexOf).sorted().toArray();
        int[] d = found.deleted().stream().mapToInt(m.labels()::indexOf).sorted().toArray();
        assertEquals(found.core(), ExplicitMatroid.of(new Minor(m, c, d)));
    }

    @Test
    void growthFindsANonOrientableRestriction() {
        // AG(3,2) is non-orientable (binary, not regular: Oxley §6.6), so growth must stop at a
        // non-orientable restriction of full rank.
        Matroid m = NamedMatroids.binaryAffineCube();
        RestrictionGrowth.Grown grown = new RestrictionGrowth(m,
                new SearchSettings(3, Strategy.CONTRACT_FIRST, Budget.UNLIMITED), Progress.SILENT).grow();
        Matroid restriction = Minor.restriction(m, grown.elements());
        assertEquals(m.rank(), restriction.rank());
        assertEquals("non-orientable", new LazySatDecider(Budget.UNLIMITED).decide(restriction).verdict());
    }

    @Test
    @Tag("slow")
    void withoutFocusTheFiveCubeIsReducedThroughGrowth() {
        Matroid m = CubeConstruction.corner(5).build();
        SearchResult r = new UnsatCoreSearch(new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED),
                Progress.SILENT).reduce(m);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertTrue(found.stats().grownTo() < m.size());
        assertMinimalityProof(found);
    }
}
