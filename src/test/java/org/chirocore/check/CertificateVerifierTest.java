package org.chirocore.check;

import static org.chirocore.check.TestCertificates.bytes;
import static org.chirocore.check.TestCertificates.get;
import static org.chirocore.check.TestCertificates.tamper;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Optional;

import org.chirocore.check.Report.Status;
import org.chirocore.io.Json;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The verifier accepts certificates built from the project's search and sat4j, and rejects them when
 * tampered with. Mathematical sources: F7 is a minor-minimal non-orientable matroid (Bland & Las
 * Vergnas 1978; Oxley, Matroid Theory, 2nd ed., §6.6); the n = 3 corner construction gives F7
 * (math-notes §3); 3-term relations characterise chirotopes (BLSWZ, Thm. 3.6.2).
 */
class CertificateVerifierTest {
    @TempDir
    static Path dir;

    static {
        try {
            dir = java.nio.file.Files.createTempDirectory("tmpcheck");
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    static Json.Obj fano;
    static Json.Obj corner;

    @BeforeAll
    static void build() {
        fano = TestCertificates.fano(dir, TestCertificates.DEFAULT_SOLVER);
        corner = TestCertificates.corner(TestCertificates.DEFAULT_SOLVER);
    }

    static Report verify(Json cert) {
        return CertificateVerifier.verify(bytes(cert), dir, Optional.of(dir.resolve("f7.json")));
    }

    static Report verify(String text) {
        return CertificateVerifier.verify(text.getBytes(StandardCharsets.UTF_8), dir, Optional.empty());
    }

    /** The named check failed with a detail containing {@code fragment}, and the report did not pass. */
    static void assertRejected(Report report, String check, String fragment) {
        assertFalse(report.passed(), report::toString);
        Report.Check c = report.check(check);
        assertEquals(Status.FAIL, c.status(), report::toString);
        assertTrue(c.detail().contains(fragment), () -> "expected \"" + fragment + "\" in: " + c.detail());
    }

    @Test
    void fanoWithItsInputPassesEveryCheck() {
        Report r = verify(fano);
        assertTrue(r.passed(), r::toString);
        assertEquals(CertificateVerifier.CHECKS, r.checks().stream().map(Report.Check::name).toList());
        assertTrue(r.checks().stream().allMatch(c -> c.status() == Status.PASS), r::toString);
    }

    @Test
    void fanoWithoutInputLeavesOnlyTheProvenanceNotRun() {
        Report r = CertificateVerifier.verify(bytes(fano), dir, Optional.empty());
        assertTrue(r.passed(), r::toString);
        assertEquals(Status.NOT_RUN, r.check(CertificateVerifier.PROVENANCE).status());
        assertEquals(7, r.checks().stream().filter(c -> c.status() == Status.PASS).count());
    }

    @Test
    void cornerConstructionPassesEveryCheck() {
        Report r = verify(corner);
        assertTrue(r.checks().stream().allMatch(c -> c.status() == Status.PASS), r::toString);
        assertEquals("000", get(corner, "content", "core", "labels", "0").asString("label"));
    }
}
