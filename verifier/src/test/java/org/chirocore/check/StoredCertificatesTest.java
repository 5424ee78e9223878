package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every certificate stored in {@code certificates/} or {@code families/} passes every check of the independent
 * verifier, on every build (and so on every CI run). Given-matroid certificates are rebuilt from
 * their input in {@code certificates/inputs/}.
 */
class StoredCertificatesTest {
    private static final Path DIR = Path.of("certificates");

    /** The certificates in {@code certificates/} and in the family runs under {@code families/}. */
    static Stream<Path> certificates() throws IOException {
        try (Stream<Path> families = Files.walk(Path.of("families"))) {
            List<Path> all = new ArrayList<>(families.filter(StoredCertificatesTest::isCertificate).toList());
            try (Stream<Path> stored = Files.list(DIR)) {
                all.addAll(stored.filter(StoredCertificatesTest::isCertificate).toList());
            }
            return all.stream().sorted();
        }
    }

    private static boolean isCertificate(Path p) {
        return p.getFileName().toString().endsWith(".cert.json");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("certificates")
    void storedCertificateVerifies(Path certificate) {
        String name = certificate.getFileName().toString().replace(".cert.json", ".json");
        Path input = DIR.resolve("inputs").resolve(name);
        VerificationReport report = CertificateVerifier.verify(certificate, Files.exists(input) ? Optional.of(input) : Optional.empty());
        for (VerificationReport.Check c : report.checks()) {
            assertTrue(c.status() == VerificationReport.Status.PASS, certificate + ": " + c);
        }
        System.out.println(certificate + ": verified in " + report.millis() + " ms");
    }

    /** The stand-alone command line: one verdict line per file, exit 4 while a given matroid's input is missing, 0 with it. */
    @org.junit.jupiter.api.Test
    void theStandAloneCommandLineGivesTheVerdictsAndExitCodes() {
        java.io.StringWriter text = new java.io.StringWriter();
        int exit = VerifierMain.verify(List.of(DIR.resolve("corner-n3.cert.json"), DIR.resolve("fano.cert.json")), Optional.empty(), false,
                new java.io.PrintWriter(text));
        assertEquals(VerifierMain.INCOMPLETE, exit, text.toString());
        assertTrue(text.toString().contains("corner-n3.cert.json: verified (checked in "), text.toString());
        assertTrue(text.toString().contains("fano.cert.json: verified except provenance (checked in "), text.toString());
        java.io.StringWriter json = new java.io.StringWriter();
        assertEquals(VerifierMain.VERIFIED, VerifierMain.verify(List.of(DIR.resolve("fano.cert.json")), Optional.of(DIR.resolve("inputs/fano.json")), true,
                new java.io.PrintWriter(json)));
        JsonTree.Obj verdict = JsonTree.parse(json.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8)).asArray("output")
                .get(0).asObject("verdict");
        assertTrue(verdict.requireBoolean("complete"));
        assertEquals("verified", verdict.requireString("verdict"));
    }

    @org.junit.jupiter.api.Test
    void thereAreStoredCertificates() throws IOException {
        assertTrue(certificates().count() >= 18);
    }
}
