package org.chirocore.orient;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;

import org.chirocore.fixtures.NamedMatroids;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.matroid.Matroid;
import org.chirocore.matroid.Minor;
import org.chirocore.search.MinimalCore;
import org.chirocore.search.Progress;
import org.chirocore.search.SearchResult;
import org.chirocore.search.SearchSettings;
import org.chirocore.search.Strategy;
import org.chirocore.search.UnsatCoreSearch;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Refutations of minimal non-orientable cores, each checked by an independent RUP checker. */
class RefutationSearchTest {

    static Stream<Arguments> cores() {
        return Stream.of(
                // F7 and F7* are excluded minors for orientability (Oxley, Matroid Theory, 2nd ed., §6.6).
                Arguments.of("F7", NamedMatroids.fano()),
                Arguments.of("F7*", NamedMatroids.fanoDual()),
                // AG(3,2)/e is F7 and AG(3,2)\e is F7* (Oxley, Matroid Theory, 2nd ed., Appendix, "Some interesting matroids").
                Arguments.of("AG(3,2)", NamedMatroids.binaryAffineCube()),
                Arguments.of("corner 3", CubeConstruction.corner(3).build()),
                Arguments.of("corner 4", CubeConstruction.corner(4).build()));
    }

    static MinimalCore core(Matroid m) {
        SearchSettings settings = new SearchSettings(0, Strategy.CONTRACT_FIRST, Budget.UNLIMITED);
        return assertInstanceOf(SearchResult.Found.class, new UnsatCoreSearch(settings, Progress.SILENT).reduce(m))
                .core();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cores")
    void proofOfTheCoreIsAcceptedByAnIndependentRupCheck(String name, Matroid input) {
        Matroid core = core(input).core();
        Refutation r = assertInstanceOf(RefutationSearch.Refuted.class,
                new RefutationSearch(Budget.UNLIMITED).refute(core)).refutation();
        BasisIndex index = BasisIndex.of(core);
        assertFalse(r.relations().isEmpty(), name);
        for (GpRelation relation : r.relations()) {
            assertFalse(ClauseEncoding.clauses(index, relation).isEmpty(), relation::toString);
        }
        assertEquals(Normalisation.fixedVariables(index).length, r.normalised().size());
        assertTrue(r.drat().endsWith("\n0\n") || r.drat().equals("0\n"));
        RupChecker.check(index.basisCount(), r.cnf(index), r.drat());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cores")
    void trimmedProofIsAcceptedAndListsNoMoreRelations(String name, Matroid input) {
        Matroid core = core(input).core();
        BasisIndex index = BasisIndex.of(core);
        Refutation full = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED).refute(core)).refutation();
        Refutation trimmed = assertInstanceOf(RefutationSearch.Refuted.class,
                new RefutationSearch(Budget.UNLIMITED, true).refute(core)).refutation();
        assertFalse(trimmed.relations().isEmpty(), name);
        assertTrue(trimmed.relations().size() <= full.relations().size(),
                name + ": " + trimmed.relations().size() + " > " + full.relations().size());
        RupChecker.check(index.basisCount(), trimmed.cnf(index), trimmed.drat());
    }

    /**
     * The tipless rank-6 spike (docs/families.md): the lazy loop adds thousands of relations, and
     * the core the trimmed proof lists is a small part of them. The same core and proof come out of a
     * second run (determinism). The spike's non-orientability is this project's finding, checked
     * here by the independent RUP checker, not an outside fact.
     */
    @Test
    void trimmingCutsTheSpikesRefutationDownDeterministically() {
        Matroid spike = CubeConstruction.corner(6).build();
        Matroid core = Minor.restriction(spike, spikeElements(spike, 6));
        BasisIndex index = BasisIndex.of(core);
        assertEquals(537, index.basisCount()); // the count derived in docs/families.md
        Refutation full = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED).refute(core)).refutation();
        Refutation a = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED, true).refute(core)).refutation();
        Refutation b = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED, true).refute(core)).refutation();
        assertTrue(5 * a.relations().size() < full.relations().size(), a.relations().size() + " of " + full.relations().size());
        assertEquals(a.relations(), b.relations());
        assertEquals(a.drat(), b.drat());
        RupChecker.check(index.basisCount(), a.cnf(index), a.drat());
    }

    /** The elements of the corner member that are unit vectors or of weight n − 1 (the spike's legs). */
    private static int[] spikeElements(Matroid member, int n) {
        return java.util.stream.IntStream.range(0, member.size()).filter(e -> {
            long ones = member.labels().get(e).chars().filter(c -> c == '1').count();
            return ones == 1 || ones == n - 1;
        }).toArray();
    }

    @Test
    void theTestCheckerRejectsWhatIsNotRup() {
        // (1 ∨ 2) does not give 1 by unit propagation, and alone it is satisfiable.
        List<int[]> cnf = List.of(new int[] {1, 2});
        assertThrows(AssertionError.class, () -> RupChecker.check(2, cnf, "1 0\n0\n"));
        assertThrows(AssertionError.class, () -> RupChecker.check(2, cnf, "0\n"));
        RupChecker.check(2, List.of(new int[] {1, 2}, new int[] {-1, 2}, new int[] {-2}), "2 0\n0\n");
    }

    @Test
    void sameCoreGivesTheSameProof() {
        Matroid fano = NamedMatroids.fano();
        Refutation a = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED).refute(fano)).refutation();
        Refutation b = ((RefutationSearch.Refuted) new RefutationSearch(Budget.UNLIMITED).refute(fano)).refutation();
        assertEquals(a.relations(), b.relations());
        assertEquals(a.drat(), b.drat());
    }

    @Test
    void orientableMatroidIsNotRefuted() {
        // The non-Fano plane is representable over the rationals (Oxley, 2nd ed., §6.4), hence orientable.
        assertInstanceOf(RefutationSearch.Orientable.class,
                new RefutationSearch(Budget.UNLIMITED).refute(NamedMatroids.nonFano()));
    }
}
