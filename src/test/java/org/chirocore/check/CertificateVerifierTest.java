package org.chirocore.check;

import static org.chirocore.check.TestCertificates.bytes;
import static org.chirocore.check.TestCertificates.get;
import static org.chirocore.check.TestCertificates.tamper;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.VerificationReport.Status;
import org.chirocore.io.Json;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The verifier accepts certificates built from the project's search and sat4j, and rejects them when
 * tampered with. Mathematical sources: F7 is a minor-minimal non-orientable matroid (Bland & Las
 * Vergnas 1978; Oxley, Matroid Theory, 2nd ed., §6.6); the n = 3 corner construction gives F7
 * (docs/mathematics.md §7); 3-term relations characterise chirotopes (BLSWZ, Thm. 3.6.2).
 */
class CertificateVerifierTest {
    @TempDir
    static Path dir;

    static Json.Obj fano;
    static Json.Obj corner;

    @BeforeAll
    static void build() {
        fano = TestCertificates.fano(dir, TestCertificates.DEFAULT_SOLVER);
        corner = TestCertificates.corner(TestCertificates.DEFAULT_SOLVER);
    }

    static VerificationReport verify(Json cert) {
        return CertificateVerifier.verify(bytes(cert), dir, Optional.of(dir.resolve("f7.json")));
    }

    static VerificationReport verify(String text) {
        return CertificateVerifier.verify(text.getBytes(StandardCharsets.UTF_8), dir, Optional.empty());
    }

    /** The named check failed with a detail containing {@code fragment}, and the report did not pass. */
    static void assertRejected(VerificationReport report, String check, String fragment) {
        assertFalse(report.passed(), report::toString);
        VerificationReport.Check c = report.check(check);
        assertEquals(Status.FAIL, c.status(), report::toString);
        assertTrue(c.detail().contains(fragment), () -> "expected \"" + fragment + "\" in: " + c.detail());
    }

    @Test
    void fanoWithItsInputPassesEveryCheck() {
        VerificationReport r = verify(fano);
        assertTrue(r.passed(), r::toString);
        assertEquals(CertificateVerifier.CHECKS, r.checks().stream().map(VerificationReport.Check::name).toList());
        assertTrue(r.checks().stream().allMatch(c -> c.status() == Status.PASS), r::toString);
    }

    @Test
    void fanoWithoutInputLeavesOnlyTheProvenanceNotRun() {
        VerificationReport r = CertificateVerifier.verify(bytes(fano), dir, Optional.empty());
        assertTrue(r.passed(), r::toString);
        assertEquals(Status.NOT_RUN, r.check(CertificateVerifier.PROVENANCE).status());
        assertEquals(7, r.checks().stream().filter(c -> c.status() == Status.PASS).count());
    }

    @Test
    void cornerConstructionPassesEveryCheck() {
        VerificationReport r = verify(corner);
        assertTrue(r.checks().stream().allMatch(c -> c.status() == Status.PASS), r::toString);
        assertEquals("000", get(corner, "content", "core", "labels", "0").asString("label"));
    }

    @Test
    void cornerConstructionInDimensionFourWithANonEmptyPathPassesEveryCheck() {
        // the search's core of the pulled 4-cube, reached by contracting and deleting along a path
        VerificationReport r = verify(TestCertificates.construction(org.chirocore.matroid.CubeConstruction.corner(4), TestCertificates.DEFAULT_SOLVER));
        assertTrue(r.checks().stream().allMatch(c -> c.status() == Status.PASS), r::toString);
        assertTrue(r.check(CertificateVerifier.PROVENANCE).detail().contains("|D| = 6"), r::toString);
    }

    // ---- tampering: each is rejected with a message naming the item ----

    static String drat(Json.Obj cert) {
        return get(cert, "content", "nonOrientability", "drat").asString("drat");
    }

    static Json.Arr array(Json.Obj cert, String... path) {
        return (Json.Arr) get(cert, path);
    }

    static Json.Arr ints(int... values) {
        return Json.Arr.ofInts(values);
    }

    static Json.Arr relation(int[] x, int a, int b, int c, int d) {
        return new Json.Arr(List.of(ints(x), Json.Num.of(a), Json.Num.of(b), Json.Num.of(c), Json.Num.of(d)));
    }

    @Test
    void flippedWitnessSign() {
        String signs = get(fano, "content", "minimality", "0", "deletion").asString("");
        String flipped = (signs.charAt(0) == '+' ? "-" : "+") + signs.substring(1);
        assertRejected(verify(tamper(fano, new Json.Str(flipped), "minimality", "0", "deletion")), CertificateVerifier.MINIMALITY,
                "the deletion witness of 1: relation (X = ");
    }

    @Test
    void witnessOfWrongLength() {
        String signs = get(fano, "content", "minimality", "2", "contraction").asString("");
        assertRejected(verify(tamper(fano, new Json.Str(signs + "+"), "minimality", "2", "contraction")), CertificateVerifier.MINIMALITY,
                "the contraction witness of 3 has " + (signs.length() + 1) + " signs; the minor has " + signs.length() + " bases");
    }

    @Test
    void witnessWithABadCharacter() {
        String signs = get(fano, "content", "minimality", "1", "deletion").asString("");
        assertRejected(verify(tamper(fano, new Json.Str("0" + signs.substring(1)), "minimality", "1", "deletion")),
                CertificateVerifier.MINIMALITY, "has '0' at position 0");
    }

    @Test
    void witnessForTheWrongElement() {
        assertRejected(verify(tamper(fano, new Json.Str("7"), "minimality", "0", "element")), CertificateVerifier.MINIMALITY,
                "minimality[0] is for element \"7\", expected \"1\"");
    }

    /** The proof text with line {@code drop} removed, or replaced by {@code replacement}. */
    static String editLine(String proof, int line, String replacement) {
        List<String> lines = new ArrayList<>(proof.lines().toList());
        if (replacement == null) {
            lines.remove(line);
        } else {
            lines.set(line, replacement);
        }
        return String.join("\n", lines) + "\n";
    }

    @Test
    void droppingANeededLemmaIsRejected() {
        String proof = drat(corner);
        int lemmas = (int) proof.lines().count() - 1;
        boolean someNeeded = false;
        for (int i = 0; i < lemmas; i++) {
            VerificationReport r = verify(tamper(corner, new Json.Str(editLine(proof, i, null)), "nonOrientability", "drat"));
            if (!r.passed()) {
                assertRejected(r, CertificateVerifier.PROOF, "line ");
                someNeeded = true;
            }
        }
        assertTrue(someNeeded, "no lemma of the proof is needed:\n" + proof);
    }

    @Test
    void anAlteredLemmaIsRejected() {
        // any implied clause may be a lemma, so search for a unit lemma that unit propagation cannot justify
        String proof = drat(corner);
        VerificationReport rejected = null;
        String altered = null;
        for (int v = 1; v <= 28 && rejected == null; v++) {
            for (int sign = -1; sign <= 1 && rejected == null; sign += 2) {
                altered = sign * v + " 0";
                VerificationReport r = verify(tamper(corner, new Json.Str(editLine(proof, 0, altered)), "nonOrientability", "drat"));
                rejected = r.passed() ? null : r;
            }
        }
        assertTrue(rejected != null, "every unit lemma is RUP here");
        assertRejected(rejected, CertificateVerifier.PROOF, "line 1: lemma " + altered + " is neither RUP nor RAT");
    }

    @Test
    void droppingRelationsTheProofNeedsIsRejected() {
        // with only the first relation kept, the regenerated CNF is satisfiable, so no proof can pass
        Json.Arr relations = array(corner, "content", "nonOrientability", "relations");
        VerificationReport r = verify(tamper(corner, new Json.Arr(List.of(relations.get(0))), "nonOrientability", "relations"));
        assertRejected(r, CertificateVerifier.PROOF, "line ");
        // the proof needs the relations of some X: dropping them all leaves a lemma unjustified
        boolean someNeeded = false;
        for (int x = 0; x < 7; x++) {
            List<Json> fewer = new ArrayList<>();
            for (Json rel : relations.elements()) {
                if (mask(((Json.Arr) rel).get(0)) != 1L << x) {
                    fewer.add(rel);
                }
            }
            VerificationReport without = verify(tamper(corner, new Json.Arr(fewer), "nonOrientability", "relations"));
            if (!without.passed()) {
                assertRejected(without, CertificateVerifier.PROOF, "line ");
                someNeeded = true;
            }
        }
        assertTrue(someNeeded, "the proof needs the relations of no single X");
    }

    @Test
    void relationNotInIncreasingOrder() {
        assertRejected(verify(tamper(fano, relation(new int[] {0}, 2, 1, 3, 4), "nonOrientability", "relations", "0")),
                CertificateVerifier.RELATIONS, "relation 0 [[0], 2, 1, 3, 4]: a, b, c, d [2, 1, 3, 4] is not a sorted set");
    }

    @Test
    void relationWithXOverlappingABCD() {
        assertRejected(verify(tamper(fano, relation(new int[] {1}, 1, 2, 3, 4), "nonOrientability", "relations", "0")),
                CertificateVerifier.RELATIONS, "relation 0 [[1], 1, 2, 3, 4]: a, b, c, d must lie outside X");
    }

    @Test
    void relationWithXOfTheWrongSize() {
        assertRejected(verify(tamper(fano, relation(new int[] {0, 5}, 1, 2, 3, 4), "nonOrientability", "relations", "3")),
                CertificateVerifier.RELATIONS, "relation 3 [[0, 5], 1, 2, 3, 4]: X [0, 5] has 2 elements, not 1");
    }

    @Test
    void relationMentioningANonElement() {
        assertRejected(verify(tamper(fano, relation(new int[] {0}, 1, 2, 3, 7), "nonOrientability", "relations", "0")),
                CertificateVerifier.RELATIONS, "is not a sorted set of elements 0..6");
    }

    @Test
    void aRelationWithExactlyOneNonZeroTermIsFoundOnANonMatroid() {
        // {01, 23} is no matroid (basis exchange fails), so a matroid core never gets here; the check still exists
        BasisTable t = new BasisTable(4, 2, List.of(new int[] {0, 1}, new int[] {2, 3}));
        assertEquals(1, Relations.nonZero(Relations.terms(t, new int[0], 0, 1, 2, 3)).size());
        assertTrue(t.exchangeDefect().isPresent());
    }

    static Json.Obj withBases(Json.Obj cert, List<Json> bases) {
        return tamper(cert, new Json.Arr(bases), "core", "bases");
    }

    @Test
    void basisRemoved() {
        List<Json> bases = new ArrayList<>(array(fano, "content", "core", "bases").elements());
        bases.remove(0);
        assertRejected(verify(withBases(fano, bases)), CertificateVerifier.CORE, "basis exchange fails");
    }

    @Test
    void basisAdded() {
        // F7 (element k+1 is the binary vector of k+1) plus its line {1, 2, 3} is the relaxation of a circuit-hyperplane: a matroid (Oxley §1.5), but no longer the core
        List<Json> bases = new ArrayList<>(array(fano, "content", "core", "bases").elements());
        int at = 0;
        while (at < bases.size() && java.util.Arrays.compare(elements(bases.get(at)), new int[] {0, 1, 2}) < 0) {
            at++;
        }
        bases.add(at, ints(0, 1, 2));
        VerificationReport r = verify(withBases(fano, bases));
        assertRejected(r, CertificateVerifier.PROVENANCE, "the core lists [0, 1, 2], which is not a basis of the rebuilt minor");
        assertRejected(r, CertificateVerifier.MINIMALITY, "signs; the minor has");
    }

    static int[] elements(Json set) {
        return ((Json.Arr) set).elements().stream().mapToInt(e -> e.asInt("e")).toArray();
    }

    /** A set of a small test core as a bit mask. */
    static long mask(Json set) {
        long m = 0;
        for (int e : elements(set)) {
            m |= 1L << e;
        }
        return m;
    }

    @Test
    void basesOutOfOrder() {
        List<Json> bases = new ArrayList<>(array(fano, "content", "core", "bases").elements());
        java.util.Collections.swap(bases, 0, 1);
        assertRejected(verify(withBases(fano, bases)), CertificateVerifier.CORE, "basis 2 [0, 1, 3] does not come after basis 1 [0, 1, 4]");
    }

    @Test
    void basisRepeated() {
        List<Json> bases = new ArrayList<>(array(fano, "content", "core", "bases").elements());
        bases.add(1, bases.get(0));
        assertRejected(verify(withBases(fano, bases)), CertificateVerifier.CORE, "(or repeats it)");
    }

    @Test
    void normalisedBasesThatAreGf2Dependent() {
        // (1, 1_B) for B1..B4 sum to zero iff B1 ⊕ B2 ⊕ B3 ⊕ B4 = 0 (an odd number of such vectors never sums to zero)
        List<Json> bases = array(fano, "content", "core", "bases").elements();
        List<Json> dependent = null;
        for (int i = 0; i < bases.size() && dependent == null; i++) {
            for (int j = i + 1; j < bases.size() && dependent == null; j++) {
                for (int k = j + 1; k < bases.size() && dependent == null; k++) {
                    for (int l = k + 1; l < bases.size() && dependent == null; l++) {
                        if ((mask(bases.get(i)) ^ mask(bases.get(j)) ^ mask(bases.get(k)) ^ mask(bases.get(l))) == 0) {
                            dependent = List.of(bases.get(i), bases.get(j), bases.get(k), bases.get(l));
                        }
                    }
                }
            }
        }
        assertTrue(dependent != null);
        assertRejected(verify(tamper(fano, new Json.Arr(dependent), "nonOrientability", "normalised")), CertificateVerifier.NORMALISATION,
                "normalised[3] " + dependent.get(3).toText() + " makes the vectors (1, 1_B) linearly dependent over GF(2)");
    }

    @Test
    void normalisedSetThatIsNotABasis() {
        assertRejected(verify(tamper(fano, ints(0, 1, 2), "nonOrientability", "normalised", "1")), CertificateVerifier.NORMALISATION,
                "normalised[1] [0, 1, 2] is not a basis of the core");
    }

    @Test
    void changedPulledVertex() {
        assertRejected(verify(tamper(corner, new Json.Str("110"), "provenance", "construction", "pulled")),
                CertificateVerifier.PROVENANCE, "");
    }

    @Test
    void changedHyperplaneVertex() {
        assertRejected(verify(tamper(corner, Json.Arr.ofStrings(List.of("100", "010", "011")), "provenance", "construction", "hyperplane")),
                CertificateVerifier.PROVENANCE, "the hyperplane is not a flat: its closure contains");
    }

    @Test
    void aPathThatDoesNotRebuildTheCore() {
        assertRejected(verify(tamper(corner, Json.Arr.ofStrings(List.of("000")), "provenance", "path", "deleted")),
                CertificateVerifier.PROVENANCE, "path.deleted[0] \"000\" repeats a label of the path or of the core");
    }

    @Test
    void givenMatroidFileWithAnotherHash() {
        assertRejected(verify(tamper(fano, new Json.Str("00".repeat(32)), "provenance", "given", "sha256")),
                CertificateVerifier.PROVENANCE, "not the recorded 0000");
    }

    @Test
    void wrongSha256() {
        Json.Obj cert = (Json.Obj) TestCertificates.with(fano, List.of("sha256"), new Json.Str("ab".repeat(32)));
        assertRejected(verify(cert), CertificateVerifier.HASH, "not the recorded abab");
    }

    @Test
    void contentChangedWithoutRehashing() {
        Json.Obj cert = (Json.Obj) TestCertificates.with(fano, List.of("content", "core", "labels", "0"), new Json.Str("one"));
        assertRejected(verify(cert), CertificateVerifier.HASH, "the canonical content hashes to");
    }

    @Test
    void truncatedFile() {
        String text = fano.toText();
        VerificationReport r = verify(text.substring(0, text.length() / 2));
        assertRejected(r, CertificateVerifier.FORMAT, "not valid JSON: line ");
        assertEquals(Status.NOT_RUN, r.check(CertificateVerifier.PROOF).status());
    }

    @Test
    void notJson() {
        assertRejected(verify("chirocore certificate, trust me"), CertificateVerifier.FORMAT, "not valid JSON");
    }

    @Test
    void notAnObject() {
        assertRejected(verify("[1, 2, 3]"), CertificateVerifier.FORMAT, "the certificate must be an object, found an array");
    }

    @Test
    void unknownVersion() {
        assertRejected(verify(TestCertificates.with(fano, List.of("version"), Json.Num.of(2))), CertificateVerifier.FORMAT,
                "unknown version 2");
    }

    @Test
    void absurdlyLargeNumber() {
        assertRejected(verify(tamper(fano, new Json.Num("1" + "0".repeat(500)), "core", "rank")), CertificateVerifier.FORMAT,
                "field \"rank\" must be an integer, found the number 10000000000000000000… (501 characters)");
    }

    @Test
    void absurdlyLongArray() {
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < VerifierLimits.MAX_ELEMENTS + 1; i++) {
            labels.add("e" + i);
        }
        assertRejected(verify(tamper(fano, Json.Arr.ofStrings(labels), "core", "labels")), CertificateVerifier.FORMAT,
                "core.labels has " + labels.size() + " elements; at most " + VerifierLimits.MAX_ELEMENTS + " are allowed");
    }

    @Test
    void tooManyNormalisedBases() {
        int tooMany = VerifierLimits.MAX_ELEMENTS + 2;
        List<Json> many = java.util.Collections.nCopies(tooMany, ints(0, 1, 2));
        assertRejected(verify(tamper(fano, new Json.Arr(many), "nonOrientability", "normalised")), CertificateVerifier.FORMAT,
                "nonOrientability.normalised has " + tooMany + " entries; at most " + (VerifierLimits.MAX_ELEMENTS + 1) + " are allowed");
    }

    @Test
    void missingMember() {
        assertRejected(verify(tamper(fano, null, "minimality")), CertificateVerifier.FORMAT, "field \"minimality\" is missing");
    }

    @Test
    void unknownMember() {
        assertRejected(verify(tamper(fano, Json.NULL, "comment")), CertificateVerifier.FORMAT, "unknown field \"comment\"");
    }

    @Test
    void wrongType() {
        assertRejected(verify(tamper(fano, new Json.Str("3"), "core", "rank")), CertificateVerifier.FORMAT,
                "field \"rank\" must be an integer, found a string");
    }
}
