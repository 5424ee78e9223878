package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.chirocore.cert.Certificate;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Report;

/**
 * Writes a certificate and checks the written file with the independent verifier before anything
 * is reported: a file the verifier rejects is removed (with its proof side file) and reported as
 * an internal error, so no unverified certificate is left behind.
 */
final class VerifiedCertificates {
    private VerifiedCertificates() {
    }

    /**
     * Writes {@code certificate} to {@code file} and verifies it; {@code input} is the matroid
     * file of a given-matroid provenance (empty for a construction, which the verifier rebuilds).
     *
     * @throws BadInputException when the file cannot be written
     * @throws IllegalStateException when the verifier rejects the file (a bug; the file is removed)
     */
    static CertificateWriter.Written writeVerified(Path file, Certificate certificate, Optional<Path> input) {
        CertificateWriter.Written written = Inputs.write(file, certificate);
        Report report = CertificateVerifier.verify(file, input);
        if (!report.passed()) {
            try {
                Files.deleteIfExists(file);
                if (written.dratFile().isPresent()) {
                    Files.deleteIfExists(written.dratFile().get());
                }
            } catch (IOException e) {
                throw new IllegalStateException("The verifier rejected " + file + " and it could not be removed: " + e, e);
            }
            String failure = report.checks().stream().filter(c -> c.status() == Report.Status.FAIL)
                    .map(c -> c.name() + ": " + c.detail()).findFirst().orElse("no check named");
            throw new IllegalStateException("The verifier rejected the certificate just written to " + file + " ("
                    + failure + "); it was removed.");
        }
        return written;
    }
}
