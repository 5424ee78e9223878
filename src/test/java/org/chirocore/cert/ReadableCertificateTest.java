package org.chirocore.cert;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.Json;
import org.chirocore.proof.ReadableProof;
import org.chirocore.proof.ReadableProof.Branch;
import org.chirocore.proof.ReadableProof.Forced;
import org.junit.jupiter.api.Test;

/**
 * Readable proofs of stored certificates' cores, re-checked mechanically: the certificate variant
 * carrying the proof's lemmas must pass the independent verifier, and a tampered step must not.
 */
class ReadableCertificateTest {
    private static final Path FANO = Path.of("certificates/fano.cert.json");
    private static final Path CORNER_N4 = Path.of("certificates/corner-n4.cert.json");

    private static VerificationReport verify(Json.Obj document) {
        return CertificateVerifier.verify(document.toText().getBytes(StandardCharsets.UTF_8), Path.of("."), Optional.empty());
    }

    private static ReadableCertificate.Readable readable(Path file, int maxSteps) throws IOException {
        return assertInstanceOf(ReadableCertificate.Readable.class, ReadableCertificate.explain(file, maxSteps));
    }

    /**
     * The Fano plane F7 is not orientable (Bland & Las Vergnas 1978; Oxley, Matroid Theory, 2nd
     * ed., §6.6); its readable proof stays short and its clausal form passes the verifier.
     */
    @Test
    void fanoProofIsShortAndVerifies() throws IOException {
        ReadableCertificate.Readable r = readable(FANO, 200);
        assertTrue(r.proof().steps() <= 48, "the Fano proof has " + r.proof().steps() + " steps");
        VerificationReport report = verify(r.certificate());
        assertTrue(report.passed(), report.toString());
        assertEquals(r.proof().relations().size(),
                r.certificate().requireObject("content").requireObject("nonOrientability").requireArray("relations").size());
    }

    /** The n = 4 corner core needs case splits, but its proof still fits in 200 steps and verifies. */
    @Test
    void cornerN4ProofVerifies() throws IOException {
        ReadableCertificate.Readable r = readable(CORNER_N4, 200);
        assertTrue(r.proof().steps() > 48 && r.proof().steps() <= 200, "steps: " + r.proof().steps());
        VerificationReport report = verify(r.certificate());
        assertTrue(report.passed(), report.toString());
    }

    @Test
    void tooSmallALimitIsReported() throws IOException {
        ReadableCertificate.Unreadable u = assertInstanceOf(ReadableCertificate.Unreadable.class,
                ReadableCertificate.explain(CORNER_N4, 40));
        assertEquals(40, u.reason().limit());
        assertEquals("too large for a readable proof: the derivation reached 41 steps, more than the limit of 40.",
                u.reason().message());
    }

    /**
     * Flipping the sign of a forced step gives lemmas that the verifier must reject. The step is
     * taken at the root: a step inside a case that unit propagation alone refutes would stay RUP
     * whatever its sign, since its clause contains the negated case literal.
     */
    @Test
    void tamperedStepIsRejected() throws IOException {
        ReadableCertificate.Readable r = readable(FANO, 200);
        ReadableProof proof = r.proof();
        List<Forced> forced = new ArrayList<>(proof.root().forced());
        Forced step = forced.get(0);
        forced.set(0, new Forced(step.relation(), step.variable(), -step.sign()));
        ReadableProof tampered = new ReadableProof(proof.normalised(), new Branch(forced, proof.root().ending()));
        Json.Obj document = CertificateReader.readChecked(FANO);
        VerificationReport report = verify(ReadableCertificate.variant(document, tampered));
        assertFalse(report.passed());
        assertEquals(VerificationReport.Status.FAIL, report.check(CertificateVerifier.PROOF).status(), report.toString());
        assertTrue(verify(ReadableCertificate.variant(document, proof)).passed());
    }
}
