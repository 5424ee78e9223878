package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;

import org.chirocore.cert.CertificateExport;
import org.chirocore.cert.CertificateWriter;
import org.chirocore.io.IoMessages;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore export}: writes a certificate's CNF (DIMACS, regenerated from its content)
 * and its DRAT proof as separate files, for external proof checkers such as drat-trim.
 */
@Command(name = "export", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Write the CNF of a certificate's non-orientability claim as DIR/NAME.cnf (DIMACS, "
                + "regenerated from the certificate) and its proof as DIR/NAME.drat, NAME being the "
                + "certificate's file name without .json."})
final class ExportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(paramLabel = "CERT", description = "A certificate written by reduce.")
    private Path certificate;

    @Option(names = "--out-dir", paramLabel = "DIR", required = true, description = "The output directory, created when missing.")
    private Path outDir;

    @Mixin
    private OutputOptions output;

    @Option(names = "--lrat", description = "Also write DIR/NAME.lrat: the proof with the unit-propagation hints "
            + "the verifier finds for every step.")
    private boolean lrat;

    @Override
    public Integer call() {
        String name = CertificateWriter.baseName(certificate);
        output.checkDirectory(outDir, List.of(certificate),
                lrat ? List.of(name + ".cnf", name + ".drat", name + ".lrat") : List.of(name + ".cnf", name + ".drat"));
        CertificateExport.Exported e;
        try {
            e = CertificateExport.export(certificate, outDir, lrat);
        } catch (IOException ex) {
            throw new BadInputException(certificate + ": cannot export it: " + IoMessages.plain(ex), ex);
        } catch (IllegalArgumentException ex) {
            // Malformed JSON, a wrong digest, bases that are no matroid's and malformed relations
            // are all reported as IllegalArgumentException subclasses with a full sentence.
            throw new BadInputException(certificate + ": not a valid certificate: " + ex.getMessage(), ex);
        }
        spec.commandLine().getOut().println("wrote " + e.cnf() + " (" + e.variables() + " variables, "
                + e.clauses() + " clauses) and " + e.drat() + e.lrat().map(l -> " and " + l).orElse(""));
        return ExitCodes.OK;
    }
}
