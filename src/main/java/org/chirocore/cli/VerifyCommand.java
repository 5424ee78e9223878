package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.check.CompletenessCheck;
import org.chirocore.check.Escaping;
import org.chirocore.check.VerifierMain;
import org.chirocore.matroid.Catalogue;
import org.chirocore.report.CertificateSummary;
import org.chirocore.report.ReportException;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code chirocore verify FILE...}: checks certificates with the independent verifier. */
@Command(name = "verify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Check certificates of minor-minimal non-orientable matroids (docs/certificate-format.md).",
                "A file named *completeness.json is an enumeration's completeness evidence, checked with the class "
                        + "certificates beside it (docs/enumeration.md)."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every check of every file ran and passed",
                "1:some check failed",
                "2:bad usage",
                "4:no check failed, but some part was not checked (a given matroid's provenance without --input)"})
final class VerifyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Certificate files or completeness evidence.")
    private List<Path> files;

    @Option(names = "--input", paramLabel = "FILE", description = "The matroid file of a given-matroid provenance or of an enumeration's input.")
    private Path input;

    @Option(names = "--json", description = "Print a JSON array of verdicts instead of text.")
    private boolean json;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            return VerifierMain.verify(files, Optional.ofNullable(input), true, out);
        }
        int exit = VerifierMain.VERIFIED;
        for (Path file : files) {
            int verdict = VerifierMain.verify(List.of(file), Optional.ofNullable(input), false, out);
            if (verdict != VerifierMain.REJECTED && !CompletenessCheck.isEvidence(file)) {
                // named only after the independent check passed, by producer code outside the checker
                out.println(Escaping.printable(file.toString()) + ": isomorphism class of the core: " + Escaping.printable(named(file)));
            }
            exit = exit == VerifierMain.REJECTED || verdict == VerifierMain.REJECTED ? VerifierMain.REJECTED : Math.max(exit, verdict);
        }
        return exit;
    }

    /** The core's name in the catalogue; a core the report model cannot hold is not named. */
    private static String named(Path file) {
        try {
            return Format.named(Catalogue.identify(CertificateSummary.read(file).core()));
        } catch (ReportException e) {
            return "not named (" + e.getMessage() + ")";
        }
    }
}
