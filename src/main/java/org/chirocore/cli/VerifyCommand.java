package org.chirocore.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Text;
import org.chirocore.check.Verdict;
import org.chirocore.io.Json;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code chirocore verify FILE...}: checks certificates with the independent verifier. */
@Command(name = "verify", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Check certificates of minor-minimal non-orientable matroids (docs/certificate-format.md).",
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:every check of every file ran and passed",
                "1:some check failed",
                "2:bad usage",
                "4:no check failed, but some part was not checked (a given matroid's provenance without --input)"})
final class VerifyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "FILE", arity = "1..*", description = "Certificate files.")
    private List<Path> files;

    @Option(names = "--input", paramLabel = "FILE", description = "The matroid file of a given-matroid provenance.")
    private Path input;

    @Option(names = "--json", description = "Print a JSON array of verdicts instead of text.")
    private boolean json;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        List<Json> verdicts = new ArrayList<>();
        boolean allPassed = true;
        boolean allComplete = true;
        for (Path file : files) {
            Verdict verdict = CertificateVerifier.verify(file, Optional.ofNullable(input));
            allPassed &= verdict.passed();
            allComplete &= verdict.complete();
            if (json) {
                verdicts.add(toJson(verdict));
            } else {
                out.print(verdict.toText());
            }
        }
        if (json) {
            out.println(new Json.Arr(verdicts).toText());
        }
        return !allPassed ? ExitCodes.CHECK_FAILED : allComplete ? ExitCodes.OK : ExitCodes.INCOMPLETE;
    }

    private static Json toJson(Verdict verdict) {
        List<Json> checks = new ArrayList<>();
        for (Verdict.Check c : verdict.checks()) {
            checks.add(Json.Obj.builder().put("name", c.name()).put("status", c.status().name()).put("detail", Text.printable(c.detail())).build());
        }
        return Json.Obj.builder().put("file", Text.printable(verdict.source())).put("passed", verdict.passed()).put("complete", verdict.complete())
                .put("verdict", verdict.word()).put("millis", verdict.millis()).put("checks", new Json.Arr(checks)).build();
    }
}
