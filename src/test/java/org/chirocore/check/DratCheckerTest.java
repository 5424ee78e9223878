package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Supplier;
import java.util.stream.Stream;

import org.chirocore.cert.LratConversion;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.sat4j.minisat.SolverFactory;
import org.sat4j.specs.ISolver;

/**
 * The DRAT and LRAT checkers on hand-made proofs and on sat4j's DRUP proofs of the pigeonhole
 * formula PHP(n+1, n), unsatisfiable for every n (Cook and Reckhow 1979; Haken 1985 for its hardness).
 */
class DratCheckerTest {
    /** Pigeon i in hole j is variable i·holes + j + 1; every pigeon has a hole, no hole two pigeons. */
    static Cnf pigeonhole(int holes) {
        int pigeons = holes + 1;
        List<int[]> clauses = new ArrayList<>();
        for (int i = 0; i < pigeons; i++) {
            int[] some = new int[holes];
            for (int j = 0; j < holes; j++) {
                some[j] = i * holes + j + 1;
            }
            clauses.add(some);
        }
        for (int j = 0; j < holes; j++) {
            for (int i = 0; i < pigeons; i++) {
                for (int k = i + 1; k < pigeons; k++) {
                    clauses.add(new int[] {-(i * holes + j + 1), -(k * holes + j + 1)});
                }
            }
        }
        return new Cnf(pigeons * holes, clauses);
    }

    static Stream<Arguments> solvers() {
        return Stream.of(Arguments.of("default", (Supplier<ISolver>) SolverFactory::newDefault),
                Arguments.of("glucose21", (Supplier<ISolver>) SolverFactory::newGlucose21),
                Arguments.of("miniLearningHeap", (Supplier<ISolver>) SolverFactory::newMiniLearningHeap));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("solvers")
    void sat4jProofsOfPigeonholeAreAcceptedAndTheirLratToo(String name, Supplier<ISolver> solver) {
        Cnf cnf = pigeonhole(6);
        String drat = TestCertificates.proof(cnf.variables(), cnf.clauses(), solver);
        DratChecker.Outcome outcome = DratChecker.check(cnf, drat);
        assertTrue(outcome.valid(), outcome::failure);
        String lrat = LratConversion.convert(cnf.variables(), cnf.clauses(), drat);
        assertEquals(Optional.empty(), LratChecker.check(cnf, lrat));
    }

    @Test
    void aLongProofWithDeletionsIsAcceptedAndItsLratToo() {
        Cnf cnf = pigeonhole(8);
        String drat = TestCertificates.proof(cnf.variables(), cnf.clauses(), SolverFactory::newDefault);
        DratChecker.Outcome outcome = DratChecker.check(cnf, drat);
        assertTrue(outcome.valid(), outcome::failure);
        assertFalse(outcome.summary().contains(" 0 deletions applied"), outcome.summary());
        String lrat = LratConversion.convert(cnf.variables(), cnf.clauses(), drat);
        assertEquals(Optional.empty(), LratChecker.check(cnf, lrat));
        // the conversion keeps only the lemmas the empty clause needs, so it never has more lines than the DRAT has lemmas
        // plus one unit step per variable
        long lemmas = drat.lines().filter(l -> !l.startsWith("d")).count();
        assertTrue(lrat.lines().filter(l -> !l.contains(" d ")).count() <= lemmas + cnf.variables());
    }

    @Test
    void aCorruptedLratHintIsRejected() {
        Cnf cnf = pigeonhole(4);
        String lrat = LratConversion.convert(cnf.variables(), cnf.clauses(), TestCertificates.proof(cnf.variables(), cnf.clauses(), SolverFactory::newDefault));
        // replace the last hint of the first lemma by a clause that is not unit there
        String first = lrat.lines().filter(l -> !l.contains(" d ")).findFirst().orElseThrow();
        String[] t = first.split(" ");
        t[t.length - 2] = "1";
        String corrupted = lrat.replaceFirst(java.util.regex.Pattern.quote(first), String.join(" ", t));
        Optional<String> fault = LratChecker.check(cnf, corrupted);
        assertTrue(fault.isPresent() && fault.get().startsWith("line "), fault::toString);
    }

    /** {(−1 2), (2 3), (2 −3)} and an unsatisfiable core on 4, 5; the lemma (1) is RAT on 1 but not RUP. */
    static final Cnf RAT_EXAMPLE = new Cnf(5, List.of(new int[] {-1, 2}, new int[] {2, 3}, new int[] {2, -3},
            new int[] {4, 5}, new int[] {-4, 5}, new int[] {4, -5}, new int[] {-4, -5}));

    @Test
    void aRatLemmaIsAcceptedAndALemmaTheEmptyClauseDoesNotNeedIsLeftOutOfTheLrat() {
        String drat = "1 0\n4 0\n0\n";
        assertTrue(DratChecker.check(RAT_EXAMPLE, drat).valid());
        String lrat = LratConversion.convert(RAT_EXAMPLE.variables(), RAT_EXAMPLE.clauses(), drat);
        // (1) is RAT, but the refutation only uses clauses 4..7: it is dropped, and (4) gets id 8;
        // 5, implied at top level by (4) through clause 5, gets a unit step (9) of its own
        assertEquals("8 4 0 4 6 0\n9 5 0 8 5 0\n10 0 9 8 7 0\n", lrat);
        assertEquals(Optional.empty(), LratChecker.check(RAT_EXAMPLE, lrat));
    }

    /**
     * Unsatisfiable (x2 can be neither true nor false), but unit propagation alone finds nothing;
     * the lemma (1) is RAT on 1, not RUP, and with it the empty clause is RUP.
     */
    static final Cnf RAT_NEEDED = new Cnf(4, List.of(new int[] {-1, 2}, new int[] {-1, -2}, new int[] {2, 3},
            new int[] {2, -3}, new int[] {-2, 4}, new int[] {-2, -4}));

    @Test
    void aRatLemmaTheEmptyClauseNeedsIsWrittenWithItsResolventHints() {
        String drat = "1 0\n0\n";
        assertTrue(DratChecker.check(RAT_NEEDED, drat).valid());
        String lrat = LratConversion.convert(RAT_NEEDED.variables(), RAT_NEEDED.clauses(), drat);
        assertEquals("7 1 0 -1 3 4 -2 5 6 0\n8 2 0 7 1 0\n9 0 8 7 2 0\n", lrat);
        assertEquals(Optional.empty(), LratChecker.check(RAT_NEEDED, lrat));
        // without the group for clause 2 the RAT check fails
        assertTrue(LratChecker.check(RAT_NEEDED, "7 1 0 -1 3 4 0\n8 2 0 7 1 0\n9 0 8 7 2 0\n").isPresent());
    }

    @Test
    void aLemmaThatIsNeitherRupNorRatIsRejectedWithItsLine() {
        DratChecker.Outcome o = DratChecker.check(RAT_EXAMPLE, "-2 0\n4 0\n0\n");
        assertFalse(o.valid());
        assertEquals("line 1: lemma -2 0 is neither RUP nor RAT on -2 (the resolvent with clause 1, 2 -1 0, is not RUP)", o.failure());
    }

    @Test
    void aProofWithoutTheEmptyClauseIsRejected() {
        assertEquals("line 1: the proof ends without deriving the empty clause", DratChecker.check(RAT_EXAMPLE, "4 0\n").failure());
    }

    @Test
    void deletionsAreAppliedSoAProofRelyingOnADeletedClauseFails() {
        // deleting (4 5) leaves (4) unprovable by unit propagation
        DratChecker.Outcome o = DratChecker.check(RAT_EXAMPLE, "d 4 5 0\n4 0\n0\n");
        assertFalse(o.valid());
        assertTrue(o.failure().startsWith("line 2: lemma 4 0"), o.failure());
    }

    @Test
    void malformedProofTextIsRejectedNotThrown() {
        assertEquals("line 1: \"x\" is not an integer of at most 10 digits", DratChecker.check(RAT_EXAMPLE, "4 x 0\n").failure());
        assertEquals("line 1: literal 9 names no variable of the CNF (1..5)", DratChecker.check(RAT_EXAMPLE, "9 0\n").failure());
        assertEquals("line 1: missing the closing 0", DratChecker.check(RAT_EXAMPLE, "4").failure());
        assertEquals("line 1: the clause contains both -4 and 4", DratChecker.check(RAT_EXAMPLE, "4 -4 0").failure());
    }
}
