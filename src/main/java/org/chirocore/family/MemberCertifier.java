package org.chirocore.family;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.chirocore.cert.CertificateWriter;
import org.chirocore.cert.Certification;
import org.chirocore.cert.Source;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Verdict;
import org.chirocore.matroid.CubeConstruction;
import org.chirocore.orient.Budget;
import org.chirocore.search.MinimalCore;

/**
 * Certifies a minimal core of a family member, writes the certificate atomically and verifies
 * the written file with the independent verifier; a rejected certificate is removed. Shared by
 * family runs, explorations and predictions. Cost: what {@link Certification#of} and the
 * verifier cost.
 */
final class MemberCertifier {
    private MemberCertifier() {
    }

    /** The outcome: a verified file, or a refutation that ran out of budget (no file). */
    sealed interface Outcome {
    }

    /**
     * The written and verified certificate.
     *
     * @param verification the verifier's verdict, never {@link Verification#FAILED}
     * @param facts what the file states, read back
     * @param verifyMillis the verifier's time
     */
    record Written(Verification verification, CertificateFacts facts, long verifyMillis) implements Outcome {
    }

    /** The refutation ran out of budget; nothing was written. */
    record OutOfBudget(String reason) implements Outcome {
    }

    /**
     * Certifies {@code core}, reduced from {@code construction}, into {@code file}.
     *
     * @throws IOException when the file cannot be written or read back
     * @throws IllegalStateException when the verifier rejects the file just written (a bug; the
     *     file and its DRAT side file are removed)
     */
    static Outcome certify(MinimalCore core, CubeConstruction construction, Budget budget, Path file)
            throws IOException {
        Certification certification = Certification.of(core, new Source.Constructed(construction), budget);
        if (certification instanceof Certification.OutOfBudget o) {
            return new OutOfBudget(o.reason());
        }
        CertificateWriter.Written written = CertificateWriter.write(((Certification.Certified) certification)
                .certificate(), file);
        Verdict report = CertificateVerifier.verify(file);
        Verification verification = Verification.of(report);
        if (verification == Verification.FAILED) {
            Files.deleteIfExists(file);
            if (written.dratFile().isPresent()) {
                Files.deleteIfExists(written.dratFile().get());
            }
            throw new IllegalStateException("The verifier rejected the certificate just written to " + file + " ("
                    + firstFailure(report) + "); it was removed.");
        }
        return new Written(verification, CertificateFacts.read(file), report.millis());
    }

    private static String firstFailure(Verdict report) {
        return report.checks().stream().filter(c -> c.status() == Verdict.Status.FAIL)
                .map(c -> c.name() + ": " + c.detail()).findFirst().orElse("no check failed");
    }
}
