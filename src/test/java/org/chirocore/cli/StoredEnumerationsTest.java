package org.chirocore.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.CompletenessCheck;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.Json;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The enumerations stored under {@code docs/enumerations/}: complete, each class's certificate
 * passes the independent verifier and has the digest the summary records, and the completeness
 * evidence passes the independent checker wherever it can.
 */
class StoredEnumerationsTest {
    static Stream<Path> summaries() throws IOException {
        try (Stream<Path> dirs = Files.list(Path.of("docs/enumerations"))) {
            return dirs.map(d -> d.resolve(EnumerateCommand.SUMMARY_JSON)).sorted().toList().stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("summaries")
    void storedEnumerationIsCompleteAndItsCertificatesVerify(Path summaryFile) throws IOException {
        Json.Obj summary = Json.parse(Files.readString(summaryFile)).asObject("summary");
        assertTrue(summary.requireBoolean("complete"));
        Json.Arr classes = summary.requireArray("classes");
        assertTrue(classes.size() > 0);
        for (int k = 0; k < classes.size(); k++) {
            Json.Obj c = classes.get(k).asObject("class");
            Path certificate = summaryFile.resolveSibling(c.requireString("certificate"));
            assertTrue(CertificateVerifier.verify(certificate, Optional.empty()).passed(), certificate.toString());
            Json.Obj written = Json.parse(Files.readString(certificate)).asObject("certificate");
            assertEquals(c.requireString("sha256"), written.requireString("sha256"));
            assertEquals(c.requireInt("elements"), written.requireObject("content").requireObject("core")
                    .requireArray("labels").size());
        }
    }

    /**
     * The stored completeness evidence verifies in full with the independent checker: witnesses,
     * transversal duality, symmetry, coverage of the contraction sets, certificates, the dead ends'
     * refutations and the class members' isomorphisms, and every listed minimal set is accounted for.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("summaries")
    void storedCompletenessEvidenceVerifiesInFull(Path summaryFile) {
        VerificationReport r = CompletenessCheck.verify(summaryFile.resolveSibling(EnumerateCommand.COMPLETENESS_JSON),
                Optional.empty());
        assertTrue(r.complete(), r.toText());
        for (String check : List.of("input", "symmetry", "contraction sets", "witnesses", "transversal duality",
                "certificates", "dead-end refutations", "class members", "minimal sets accounted for")) {
            assertEquals(VerificationReport.Status.PASS, r.check(check).status(), r.toText());
        }
    }
}
