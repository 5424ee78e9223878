package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.cert.CertificateForms;
import org.chirocore.cert.WitnessForms;
import org.chirocore.io.Json;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.pipeline.Subject;
import org.chirocore.search.Progress;
import org.chirocore.search.Strategy;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Matrix witnesses in the minimality check: a certificate of the n = 4 corner core written with
 * matrices verifies, and a matrix changed in one entry so that one determinant vanishes on a basis
 * (or a non-basis gets a non-zero one), a matrix of the wrong shape, or an entry beyond the digit
 * limit is rejected with a FAIL line naming the witness and what is wrong. Which one-entry changes
 * do what is found by the test's own determinants (Laplace expansion, independent of the verifier).
 */
class MatrixWitnessTest {
    @TempDir
    static Path dir;

    static Json.Obj cert;

    @BeforeAll
    static void build() throws IOException {
        Path out = dir.resolve("corner-n4.cert.json");
        CertifiedReduction.Outcome o = new CertifiedReduction(new CertifiedReduction.Settings(0, Strategy.CONTRACT_FIRST,
                Budget.UNLIMITED, CertificateForms.of(WitnessForms.MATRICES)), Progress.SILENT).run(Subject.of(CubeConstruction.corner(4)), out);
        assertInstanceOf(CertifiedReduction.Verified.class, o);
        cert = (Json.Obj) Json.parseUtf8(Files.readAllBytes(out));
    }

    static VerificationReport verify(Json c) {
        return CertificateVerifier.verify(TestCertificates.bytes(c), dir, Optional.empty());
    }

    /** The path (below content) of the first matrix witness whose minor has the given rank. */
    static List<String> firstMatrix(int rank) {
        Json.Arr entries = (Json.Arr) TestCertificates.get(cert, "content", "minimality");
        for (int i = 0; i < entries.size(); i++) {
            for (String side : List.of("deletion", "contraction")) {
                Json w = TestCertificates.get(entries.get(i), side);
                if (w instanceof Json.Obj o && columns(o).get(0).length == rank) {
                    return List.of("minimality", Integer.toString(i), side);
                }
            }
        }
        throw new AssertionError("no matrix witness of rank " + rank + " in the certificate");
    }

    static List<BigInteger[]> columns(Json.Obj witness) {
        List<BigInteger[]> out = new ArrayList<>();
        for (Json c : ((Json.Arr) witness.require("matrix")).elements()) {
            List<Json> entries = ((Json.Arr) c).elements();
            out.add(entries.stream().map(x -> x.asBigInteger("entry")).toArray(BigInteger[]::new));
        }
        return out;
    }

    static Json.Obj matrix(List<BigInteger[]> columns) {
        List<Json> cols = new ArrayList<>();
        for (BigInteger[] c : columns) {
            List<Json> entries = new ArrayList<>();
            for (BigInteger x : c) {
                entries.add(Json.Num.of(x));
            }
            cols.add(new Json.Arr(entries));
        }
        return Json.Obj.builder().put("matrix", new Json.Arr(cols)).build();
    }

    static Json.Obj withWitness(List<String> path, Json witness) {
        return TestCertificates.tamper(cert, witness, path.toArray(String[]::new));
    }

    /** Laplace expansion along the first column (common practice); r ≤ 3 here. */
    static BigInteger det(List<BigInteger[]> cols) {
        int r = cols.size();
        if (r == 0) {
            return BigInteger.ONE;
        }
        BigInteger sum = BigInteger.ZERO;
        for (int i = 0; i < r; i++) {
            final int skip = i;
            List<BigInteger[]> minor = new ArrayList<>();
            for (int j = 1; j < r; j++) {
                BigInteger[] c = cols.get(j);
                BigInteger[] shorter = new BigInteger[r - 1];
                for (int k = 0, at = 0; k < r; k++) {
                    if (k != skip) {
                        shorter[at++] = c[k];
                    }
                }
                minor.add(shorter);
            }
            BigInteger term = cols.get(0)[i].multiply(det(minor));
            sum = i % 2 == 0 ? sum.add(term) : sum.subtract(term);
        }
        return sum;
    }

    /** Whether each r-subset (lexicographic order) has a non-zero determinant. */
    static List<Boolean> support(List<BigInteger[]> columns) {
        int r = columns.get(0).length;
        List<Boolean> out = new ArrayList<>();
        int[] s = new int[r];
        for (int i = 0; i < r; i++) {
            s[i] = i;
        }
        while (true) {
            List<BigInteger[]> picked = new ArrayList<>();
            for (int e : s) {
                picked.add(columns.get(e));
            }
            out.add(det(picked).signum() != 0);
            int i = r - 1;
            while (i >= 0 && s[i] == columns.size() - r + i) {
                i--;
            }
            if (i < 0) {
                return out;
            }
            s[i]++;
            for (int k = i + 1; k < r; k++) {
                s[k] = s[k - 1] + 1;
            }
        }
    }

    /**
     * The witness at {@code path} with one entry changed so that, against the original support,
     * determinants only vanish ({@code vanish}) or only appear; the first such change in column,
     * row, value order.
     */
    static List<BigInteger[]> oneEntryChange(List<String> path, boolean vanish) {
        List<BigInteger[]> original = columns((Json.Obj) TestCertificates.get(cert, prefixed(path)));
        List<Boolean> before = support(original);
        for (int j = 0; j < original.size(); j++) {
            for (int i = 0; i < original.get(j).length; i++) {
                for (int v = -6; v <= 6; v++) {
                    List<BigInteger[]> changed = new ArrayList<>();
                    for (BigInteger[] c : original) {
                        changed.add(c.clone());
                    }
                    changed.get(j)[i] = BigInteger.valueOf(v);
                    List<Boolean> after = support(changed);
                    boolean lost = false;
                    boolean gained = false;
                    for (int k = 0; k < before.size(); k++) {
                        lost |= before.get(k) && !after.get(k);
                        gained |= !before.get(k) && after.get(k);
                    }
                    if (vanish ? lost && !gained : gained && !lost) {
                        return changed;
                    }
                }
            }
        }
        throw new AssertionError("no one-entry change of the witness at " + path + " does that");
    }

    static String[] prefixed(List<String> path) {
        List<String> out = new ArrayList<>(List.of("content"));
        out.addAll(path);
        return out.toArray(String[]::new);
    }

    @Test
    void theCertificateWithMatricesVerifiesAndSaysHowManyWitnessesAreMatrices() {
        VerificationReport r = verify(cert);
        assertTrue(r.passed(), r::toString);
        assertTrue(r.check(CertificateVerifier.MINIMALITY).detail().matches(".*\\(\\d+ by signs, 0 transported, [1-9]\\d* by matrices\\)"),
                r::toString);
    }

    @Test
    void aDeterminantVanishingOnABasisIsRejected() {
        for (int rank : new int[] {2, 3}) {
            List<String> path = firstMatrix(rank);
            VerificationReport r = verify(withWitness(path, matrix(oneEntryChange(path, true))));
            assertRejected(r, CertificateVerifier.MINIMALITY, "have determinant 0, but they are a basis of the minor");
        }
    }

    @Test
    void aNonZeroDeterminantOnANonBasisIsRejected() {
        for (int rank : new int[] {2, 3}) {
            List<String> path = firstMatrix(rank);
            VerificationReport r = verify(withWitness(path, matrix(oneEntryChange(path, false))));
            assertRejected(r, CertificateVerifier.MINIMALITY, "a non-zero determinant, but they are not a basis of the minor");
        }
    }

    @Test
    void aMatrixOfTheWrongShapeIsRejected() {
        List<String> path = firstMatrix(3);
        List<BigInteger[]> original = columns((Json.Obj) TestCertificates.get(cert, prefixed(path)));
        List<BigInteger[]> fewer = new ArrayList<>(original.subList(1, original.size()));
        assertRejected(verify(withWitness(path, matrix(fewer))), CertificateVerifier.MINIMALITY,
                "is a matrix of " + fewer.size() + " columns; the minor has " + original.size() + " elements");
        List<BigInteger[]> shortColumn = new ArrayList<>(original);
        shortColumn.set(2, new BigInteger[] {BigInteger.ONE, BigInteger.TWO});
        assertRejected(verify(withWitness(path, matrix(shortColumn))), CertificateVerifier.MINIMALITY,
                "column 2 has 2 entries; the minor has rank 3");
    }

    @Test
    void anEntryBeyondTheDigitLimitIsRejectedNamingTheLimit() {
        List<String> path = firstMatrix(3);
        List<BigInteger[]> huge = new ArrayList<>(columns((Json.Obj) TestCertificates.get(cert, prefixed(path))));
        BigInteger big = BigInteger.TEN.pow(VerifierLimits.MAX_MATRIX_DIGITS);
        huge.set(0, new BigInteger[] {big, huge.get(0)[1], huge.get(0)[2]});
        assertRejected(verify(withWitness(path, matrix(huge))), CertificateVerifier.MINIMALITY,
                "has " + (VerifierLimits.MAX_MATRIX_DIGITS + 1) + " digits, more than the verifier's limit of "
                        + VerifierLimits.MAX_MATRIX_DIGITS + " (MAX_MATRIX_DIGITS)");
    }

    @Test
    void entriesBeyondALongAreCheckedExactly() {
        // scaling a column by 10^30 keeps every determinant's zero pattern: still a witness
        List<String> path = firstMatrix(3);
        List<BigInteger[]> scaled = new ArrayList<>(columns((Json.Obj) TestCertificates.get(cert, prefixed(path))));
        BigInteger factor = BigInteger.TEN.pow(30);
        BigInteger[] first = scaled.get(0).clone();
        for (int i = 0; i < first.length; i++) {
            first[i] = first[i].multiply(factor);
        }
        scaled.set(0, first);
        VerificationReport r = verify(withWitness(path, matrix(scaled)));
        assertTrue(r.passed(), r::toString);
    }

    @Test
    void aNonIntegerEntryOrAnObjectWithoutMatrixIsRejected() {
        List<String> path = firstMatrix(2);
        Json.Obj w = (Json.Obj) TestCertificates.get(cert, prefixed(path));
        Json.Arr cols = (Json.Arr) w.require("matrix");
        Json.Arr firstColumn = (Json.Arr) cols.get(0);
        List<Json> entries = new ArrayList<>(firstColumn.elements());
        entries.set(0, new Json.Num("1.5"));
        List<Json> changed = new ArrayList<>(cols.elements());
        changed.set(0, new Json.Arr(entries));
        assertRejected(verify(withWitness(path, Json.Obj.builder().put("matrix", new Json.Arr(changed)).build())),
                CertificateVerifier.MINIMALITY, "column 0, row 0 is the number 1.5; entries must be integers");
        assertRejected(verify(withWitness(path, Json.Obj.builder().put("columns", cols).build())),
                CertificateVerifier.MINIMALITY, "is an object without \"image\" or \"matrix\"");
    }

    @Test
    void theWorkOfAMatrixWitnessIsCountedAndSaturates() {
        // C(14, 3) · 3³ for a rank-3 minor on 14 elements
        assertEquals(364L * 27, MatrixWitness.steps(new BasisTable.Shape(14, 3, 0)));
        assertEquals(Long.MAX_VALUE, MatrixWitness.steps(new BasisTable.Shape(63, 31, 0)));
        assertTrue(MatrixWitness.steps(new BasisTable.Shape(63, 31, 0)) > VerifierLimits.MAX_DETERMINANT_STEPS);
    }
}
