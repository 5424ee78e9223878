package org.chirocore.check;

import static org.chirocore.check.CertificateVerifierTest.assertRejected;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import java.util.zip.GZIPOutputStream;

import org.chirocore.io.Json;
import org.chirocore.io.JsonFormatException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sat4j.minisat.SolverFactory;

/**
 * Proofs in a (gzip) file beside the certificate, proofs from a second solver configuration, and a
 * fixed-seed random mutation loop: no mutated certificate is accepted unless its content is the
 * original's (F7 via the n = 3 corner construction, docs/mathematics.md §7).
 */
class MutationAndFileTest {
    @TempDir
    static Path dir;

    static Json.Obj withFile;

    @BeforeAll
    static void build() throws IOException {
        withFile = withProofFile(dir);
    }

    /** The corner certificate with its proof moved to {@code dir}/corner.drat.gz. */
    static Json.Obj withProofFile(Path dir) throws IOException {
        Json.Obj corner = TestCertificates.corner(TestCertificates.DEFAULT_SOLVER);
        String drat = CertificateVerifierTest.drat(corner);
        try (OutputStream out = new GZIPOutputStream(Files.newOutputStream(dir.resolve("corner.drat.gz")))) {
            out.write(drat.getBytes(StandardCharsets.UTF_8));
        }
        Json.Obj non = (Json.Obj) TestCertificates.get(corner, "content", "nonOrientability");
        Json.Obj moved = Json.Obj.builder().put("normalised", non.require("normalised")).put("relations", non.require("relations"))
                .put("dratFile", "corner.drat.gz")
                .put("dratSha256", CertificateVerifier.sha256(drat.getBytes(StandardCharsets.UTF_8))).build();
        return TestCertificates.tamper(corner, moved, "nonOrientability");
    }

    static VerificationReport verify(Json cert) {
        return CertificateVerifier.verify(TestCertificates.bytes(cert), dir, Optional.empty());
    }

    @Test
    void aGzippedProofFileIsReadAndHashed() {
        assertTrue(verify(withFile).passed(), () -> verify(withFile).toString());
    }

    @Test
    void aProofFileWithAnotherHashIsRejected() {
        assertRejected(verify(TestCertificates.tamper(withFile, new Json.Str("0".repeat(64)), "nonOrientability", "dratSha256")),
                CertificateVerifier.PROOF, "corner.drat.gz hashes to");
    }

    @Test
    void aTruncatedGzipProofFileIsRejectedByName() throws IOException {
        byte[] whole = Files.readAllBytes(dir.resolve("corner.drat.gz"));
        Files.write(dir.resolve("cut.drat.gz"), java.util.Arrays.copyOf(whole, whole.length / 2));
        assertRejected(verify(TestCertificates.tamper(withFile, new Json.Str("cut.drat.gz"), "nonOrientability", "dratFile")),
                CertificateVerifier.PROOF, "the proof file cut.drat.gz is not a complete gzip file");
    }

    @Test
    void aProofFileOutsideTheCertificatesDirectoryIsRefused() {
        assertRejected(verify(TestCertificates.tamper(withFile, new Json.Str("../corner.drat.gz"), "nonOrientability", "dratFile")),
                CertificateVerifier.PROOF, "must be a plain file name beside the certificate");
    }

    @Test
    void aMissingProofFileIsAFailureNotAnException() {
        assertRejected(verify(TestCertificates.tamper(withFile, new Json.Str("absent.drat"), "nonOrientability", "dratFile")),
                CertificateVerifier.PROOF, "the proof file absent.drat does not exist");
    }

    @Test
    void proofsFromOtherSolverConfigurationsAreAccepted() {
        // LogicNG's lesson: re-check a claim with a second configuration
        VerificationReport glucose = verify(TestCertificates.corner(SolverFactory::newGlucose21));
        VerificationReport heap = verify(TestCertificates.corner(SolverFactory::newMiniLearningHeap));
        assertTrue(glucose.passed(), glucose::toString);
        assertTrue(heap.passed(), heap::toString);
    }

    @Test
    void randomMutationsOfTheContentAreNeverAcceptedUnlessTheContentIsUnchanged() {
        Json original = TestCertificates.get(withFile, "content");
        String text = original.toText();
        String alphabet = "0123456789+-,[]{}\": ae";
        Random random = new Random(20_240_601);
        int parsed = 0;
        for (int i = 0; i < 300; i++) {
            StringBuilder mutated = new StringBuilder(text);
            mutated.setCharAt(random.nextInt(text.length()), alphabet.charAt(random.nextInt(alphabet.length())));
            Json content;
            try {
                content = Json.parse(mutated.toString());
            } catch (JsonFormatException e) {
                // not JSON: the hash cannot even be recomputed, and the file is rejected at check 1
                String file = "{\"format\": \"chirocore-certificate\", \"version\": 1, \"sha256\": \"\", \"content\": " + mutated + "}";
                VerificationReport r = CertificateVerifier.verify(file.getBytes(StandardCharsets.UTF_8), dir, Optional.empty());
                assertRejected(r, CertificateVerifier.FORMAT, "not valid JSON");
                continue;
            }
            parsed++;
            VerificationReport r = verify(TestCertificates.rehash((Json.Obj) TestCertificates.with(withFile, List.of("content"), content)));
            assertTrue(!r.passed() || content.equals(original), () -> "accepted a changed certificate: " + r);
        }
        assertTrue(parsed > 50, "too few mutations parse to exercise the checks: " + parsed);
    }

    @Test
    void aCertificateFileIsReadFromDisk() throws IOException {
        Path file = dir.resolve("corner.json");
        Files.write(file, TestCertificates.bytes(withFile));
        assertTrue(CertificateVerifier.verify(file).passed());
        VerificationReport missing = CertificateVerifier.verify(dir.resolve("nothing.json"));
        assertRejected(missing, CertificateVerifier.FORMAT, "cannot read the file");
        assertEquals(8, missing.checks().size());
    }
}
