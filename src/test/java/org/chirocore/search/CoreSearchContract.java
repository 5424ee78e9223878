package org.chirocore.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.AffineCube;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.HyperplaneIsomorphismInspector;
import org.chirocore.matroid.HyperplaneSpec;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.matroid.PulledMatroid;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.IndependentCheck;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The contract of every {@link CoreSearch}: reductions of the named fixtures to minimal cores,
 * checked against published excluded minors (sources beside each case). Every core found is
 * certified through the pipeline, whose verifier run checks its non-orientability (DRAT) and
 * every minimality witness; every orientable answer's witness passes the independent checker.
 * One subclass per implementation supplies the search.
 */
abstract class CoreSearchContract {
    @TempDir
    Path dir;

    /** The search under test with {@code settings}. */
    abstract CoreSearch search(SearchSettings settings);

    SearchResult reduce(Matroid m, long seed, Strategy strategy) {
        return search(new SearchSettings(seed, strategy, Budget.UNLIMITED)).reduce(m);
    }

    static boolean isomorphic(Matroid a, Matroid b) {
        return new HyperplaneIsomorphismInspector(a, b).find().isPresent();
    }

    /** Certifies {@code found} and has the independent verifier check the written certificate. */
    void assertMinimalityDecider(MinimalCore found) {
        assertEquals(2 * found.core().size(), found.witnesses().size());
        IndependentCheck.assertCertified(found, dir);
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
        assertMinimalityDecider(found);
    }

    @ParameterizedTest
    @CsvSource({"0, CONTRACT_FIRST", "1, CONTRACT_FIRST", "2, DELETE_FIRST", "3, DELETE_FIRST"})
    void ag32ReducesToFanoOrItsDual(long seed, Strategy strategy) {
        // AG(3,2)/e = F7 and AG(3,2)\e = F7* (Oxley, Matroid Theory, 2nd ed., Appendix).
        SearchResult r = reduce(NamedMatroids.binaryAffineCube(), seed, strategy);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertTrue(isomorphic(found.core(), NamedMatroids.fano()) || isomorphic(found.core(), NamedMatroids.fanoDual()),
                found.core().toString());
        assertMinimalityDecider(found);
    }

    @Test
    void orientableInputGivesACheckedWitness() {
        // The non-Fano matroid is real-representable, hence orientable (BLSWZ §1.2, common practice).
        SearchResult r = reduce(NamedMatroids.nonFano(), 0, Strategy.CONTRACT_FIRST);
        SearchResult.Orientable o = assertInstanceOf(SearchResult.Orientable.class, r);
        IndependentCheck.assertOrients(NamedMatroids.nonFano(), o.witness());
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
        assertMinimalityDecider(found);
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
                construction.focus());
        SearchResult r = search(settings).reduce(m);
        MinimalCore found = assertInstanceOf(SearchResult.Found.class, r).core();
        assertMinimalityDecider(found);
        int[] c = found.contracted().stream().mapToInt(m.labels()::indexOf).sorted().toArray();
        int[] d = found.deleted().stream().mapToInt(m.labels()::indexOf).sorted().toArray();
        assertEquals(found.core(), ExplicitMatroid.of(new Minor(m, c, d)));
    }
}
