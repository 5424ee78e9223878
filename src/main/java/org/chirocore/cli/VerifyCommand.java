package org.chirocore.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Report;
import org.chirocore.io.Json;
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
        description = "Check certificates of minor-minimal non-orientable matroids (docs/certificate-format.md).",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every file passed every check (a given-matroid provenance without --input is not run)",
                "1:some check failed",
                "2:bad usage"})
final class VerifyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Certificate files.")
    private List<Path> files;

    @Option(names = "--input", paramLabel = "FILE", description = "The matroid file of a given-matroid provenance.")
    private Path input;

    @Option(names = "--json", description = "Print a JSON array of reports instead of text.")
    private boolean json;

    /**
     * The search and refutation time the writer recorded in the unhashed run section, if any:
     * informative only (the verifier never reads that section), so that a reader can compare
     * checking with finding.
     */
    private static Optional<Long> producedMillis(Path file) {
        try {
            Json.Obj run = Json.parseUtf8(Files.readAllBytes(file)).asObject("certificate").requireObject("run");
            return Optional.of(run.requireObject("search").requireLong("millis")
                    + run.requireObject("refutation").requireLong("millis"));
        } catch (IOException | IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        List<Json> reports = new ArrayList<>();
        boolean allPassed = true;
        for (Path file : files) {
            Report report = CertificateVerifier.verify(file, Optional.ofNullable(input));
            allPassed &= report.passed();
            if (json) {
                reports.add(toJson(report));
            } else {
                for (Report.Check c : report.checks()) {
                    out.printf("%-8s %s: %s%n", c.status(), c.name(), c.detail());
                }
                out.println(file + ": " + (report.passed() ? "verified" : "REJECTED") + " (" + report.millis() + " ms"
                        + producedMillis(file).map(p -> "; producing it took " + p + " ms, by its run section").orElse("")
                        + ")");
                if (report.passed()) {
                    // named only after the independent check passed, by producer code outside the checker
                    out.println(file + ": isomorphism class of the core: " + named(file));
                }
            }
        }
        if (json) {
            out.println(new Json.Arr(reports).toText());
        }
        return allPassed ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    /** The core's name in the catalogue; a core the report model cannot hold (over 64 elements) is not named. */
    private static String named(Path file) {
        try {
            return Format.named(Catalogue.identify(CertificateSummary.read(file).core()));
        } catch (ReportException e) {
            return "not named (" + e.getMessage() + ")";
        }
    }

    private static Json toJson(Report report) {
        List<Json> checks = new ArrayList<>();
        for (Report.Check c : report.checks()) {
            checks.add(Json.Obj.builder().put("name", c.name()).put("status", c.status().name()).put("detail", c.detail()).build());
        }
        return Json.Obj.builder().put("file", report.source()).put("passed", report.passed()).put("millis", report.millis())
                .put("checks", new Json.Arr(checks)).build();
    }
}
