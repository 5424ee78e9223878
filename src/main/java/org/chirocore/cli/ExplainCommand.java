package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.cert.ReadableCertificate;
import org.chirocore.pipeline.CertifiedReduction;
import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Escaping;
import org.chirocore.check.VerificationReport;
import org.chirocore.io.IoMessages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore explain CERT}: after the independent verifier has passed the certificate,
 * prints a non-orientability proof of its core that a person can follow (docs/human-proofs.md),
 * or says that none fits in the step limit; optionally writes the certificate variant whose
 * proof is the readable one.
 */
@Command(name = "explain", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Print a readable proof that a certificate's core is not orientable: sign propagation "
                + "through 3-term Grassmann-Pluecker relations with case splits (docs/human-proofs.md). "
                + "The certificate is verified first."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:a readable proof was printed, or the core is too large for one within the limit",
                "1:the certificate failed verification",
                "2:bad usage or bad input"})
final class ExplainCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "CERT", description = "A certificate written by reduce.")
    private Path certificate;

    @Option(names = "--input", paramLabel = "FILE", description = "The matroid file of a given-matroid provenance.")
    private Path input;

    @Mixin
    private OutputOptions output;

    @Option(names = "--max-steps", paramLabel = "N", defaultValue = "200",
            description = "Largest number of steps of a readable proof (default: ${DEFAULT-VALUE}).")
    private int maxSteps;

    @Option(names = "--out", paramLabel = "FILE", description = "Also write the proof's text to FILE.")
    private Path out;

    @Option(names = "--certificate-out", paramLabel = "FILE",
            description = "Write the certificate variant whose proof is the readable one, for checking with verify.")
    private Path certificateOut;

    @Override
    public Integer call() {
        if (maxSteps < 1) {
            throw new BadInputException("--max-steps must be positive, got " + maxSteps, null);
        }
        output.checkFiles(Arrays.asList(certificate, input), out, certificateOut);
        PrintWriter stdout = spec.commandLine().getOut();
        VerificationReport report = CertificateVerifier.verify(certificate, Optional.ofNullable(input));
        if (!report.passed()) {
            // the verifier's own lines, with the certificate's text escaped for the terminal
            String lines = report.toText();
            stdout.print(lines.substring(0, lines.lastIndexOf(Escaping.printable(report.source()) + ": ")));
            stdout.println(Escaping.printable(certificate.toString()) + ": REJECTED by the verifier; nothing to explain.");
            return ExitCodes.CHECK_FAILED;
        }
        ReadableCertificate.Explanation explanation;
        try {
            explanation = ReadableCertificate.explain(certificate, maxSteps);
        } catch (IOException e) {
            throw new BadInputException(certificate + ": cannot read it: " + IoMessages.plain(e), e);
        } catch (IllegalArgumentException e) {
            // Unreachable for a verified certificate; reported as bad input all the same.
            throw new BadInputException(certificate + ": cannot explain: " + e.getMessage(), e);
        }
        if (explanation instanceof ReadableCertificate.Unreadable u) {
            stdout.println(certificate + ": verified, but the core is " + u.reason().message()
                    + " Try a larger --max-steps.");
            return ExitCodes.OK;
        }
        ReadableCertificate.Readable r = (ReadableCertificate.Readable) explanation;
        stdout.print(r.text());
        stdout.println("(" + r.proof().steps() + " steps, " + r.proof().relations().size() + " relations)");
        if (out != null) {
            Inputs.writeText(out, r.text());
            stdout.println("wrote " + out);
        }
        if (certificateOut != null) {
            try {
                CertifiedReduction.Checked checked = CertifiedReduction.writeVerified(r.certificate(), certificateOut);
                stdout.println("wrote " + certificateOut + "; " + Format.verified(checked));
            } catch (IOException e) {
                throw new BadInputException(certificateOut + ": cannot write the certificate: " + IoMessages.plain(e), e);
            }
        }
        return ExitCodes.OK;
    }
}
