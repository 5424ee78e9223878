package org.chirocore.check;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Every certificate stored in {@code certificates/} passes every check of the independent
 * verifier, on every build (and so on every CI run). Given-matroid certificates are rebuilt from
 * their input in {@code certificates/inputs/}.
 */
class StoredCertificatesTest {
    private static final Path DIR = Path.of("certificates");

    static Stream<Path> certificates() throws IOException {
        return Files.list(DIR).filter(p -> p.getFileName().toString().endsWith(".cert.json")).sorted();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("certificates")
    void storedCertificateVerifies(Path certificate) {
        String name = certificate.getFileName().toString().replace(".cert.json", ".json");
        Path input = DIR.resolve("inputs").resolve(name);
        Report report = CertificateVerifier.verify(certificate, Files.exists(input) ? Optional.of(input) : Optional.empty());
        for (Report.Check c : report.checks()) {
            assertTrue(c.status() == Report.Status.PASS, certificate + ": " + c);
        }
        System.out.println(certificate + ": verified in " + report.millis() + " ms");
    }

    @org.junit.jupiter.api.Test
    void thereAreStoredCertificates() throws IOException {
        assertTrue(certificates().count() >= 7);
    }
}
