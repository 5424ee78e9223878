package org.chirocore.check;

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
        Verdict report = CertificateVerifier.verify(certificate, Files.exists(input) ? Optional.of(input) : Optional.empty());
        for (Verdict.Check c : report.checks()) {
            assertTrue(c.status() == Verdict.Status.PASS, certificate + ": " + c);
        }
        System.out.println(certificate + ": verified in " + report.millis() + " ms");
    }

    @org.junit.jupiter.api.Test
    void thereAreStoredCertificates() throws IOException {
        assertTrue(certificates().count() >= 18);
    }
}
