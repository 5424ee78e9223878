package org.chirocore.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.chirocore.io.IoMessages;
import org.chirocore.io.OutputRefusedException;
import org.chirocore.report.CertificateReport;
import org.chirocore.report.Document;
import org.chirocore.report.ReportException;
import org.chirocore.report.ReportFormat;
import org.chirocore.report.ReportWriter;
import org.chirocore.report.RunReport;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code chirocore report}: writes a report on a verified certificate, or on a family run, in
 * Markdown, LaTeX or HTML (docs/reports.md).
 */
@Command(name = "report", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = {"Write a report for a paper on a certificate (only if it verifies) or on a run directory: "
                + "the statement, the construction, the core, the proof's size, the hashes and the verify command."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:report written",
                "2:bad usage, an unknown format, or a certificate that does not verify"})
final class ReportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @ArgGroup(multiplicity = "1")
    private Subject subject;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "md", converter = FormatConverter.class,
            description = "md, tex or html (default: ${DEFAULT-VALUE}).")
    private ReportFormat format;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The report file (a directory with "
            + "--index); a Markdown report's pictures go beside it as STEM-NAME.svg.")
    private Path out;

    @Option(names = "--index", description = "With --run: --out is a directory, and the run's report (run.EXT), "
            + "a report on each of its certificates that verifies, and index.EXT linking them are written into it.")
    private boolean index;

    @Mixin
    private OutputOptions output;

    @Option(names = "--input", paramLabel = "FILE", description = "The matroid file of a given-matroid provenance: "
            + "the provenance is verified too and the file is named in the verify command.")
    private Path input;

    /** What the report is about: one certificate or one family run. */
    static final class Subject {
        @Parameters(paramLabel = "CERT", description = "A certificate file.")
        private Path certificate;

        @Option(names = {"--run", "--family"}, paramLabel = "DIR", description = "A run directory: a family run "
                + "(table.json), an exploration (explore.json), a checked prediction (n=K.predicted.cert.json), "
                + "a sweep (sweep.json) or an enumeration (summary.json).")
        private Path family;
    }

    /** Parses md, tex or html, case-insensitively. */
    static final class FormatConverter implements ITypeConverter<ReportFormat> {
        @Override
        public ReportFormat convert(String value) {
            for (ReportFormat f : ReportFormat.values()) {
                if (f.extension().equalsIgnoreCase(value)) {
                    return f;
                }
            }
            throw new TypeConversionException("unknown format \"" + value + "\": use "
                    + List.of(ReportFormat.values()).stream().map(ReportFormat::extension).collect(Collectors.joining(", ")));
        }
    }

    @Override
    public Integer call() {
        if (subject.family != null && input != null) {
            throw new BadInputException("--input applies to a certificate, not to --family", null);
        }
        if (subject.family != null && !Files.isDirectory(subject.family)) {
            throw new BadInputException(subject.family + ": not an existing directory", null);
        }
        for (Path file : Arrays.asList(subject.certificate, input)) {
            if (file != null && !Files.isRegularFile(file)) {
                throw new BadInputException(file + ": cannot read the file: " + (Files.exists(file) ? "not a regular file" : "no such file"),
                        null);
            }
        }
        if (index && subject.family == null) {
            throw new BadInputException("--index applies to --run DIR, not to a certificate", null);
        }
        if (index) {
            String ext = "." + format.extension();
            output.checkDirectory(out, reportInputs(), List.of("index" + ext, "run" + ext));
        } else {
            output.checkFiles(reportInputs(), out);
        }
        try {
            List<Path> written;
            if (index) {
                Files.createDirectories(out);
                written = RunReport.writeAll(subject.family, format, out, output.force());
            } else {
                Document doc = subject.family != null ? RunReport.of(subject.family)
                        : CertificateReport.of(subject.certificate, Optional.ofNullable(input));
                written = ReportWriter.write(doc, format, out, output.force());
            }
            spec.commandLine().getOut().println("wrote " + written.stream().map(Path::toString).collect(Collectors.joining(", ")));
        } catch (ReportException | OutputRefusedException e) {
            throw new BadInputException(e.getMessage(), e);
        } catch (IOException e) {
            throw new BadInputException(out + ": cannot be written: " + IoMessages.plain(e), e);
        }
        return ExitCodes.OK;
    }

    /** The files the report reads: the certificate and --input, or the family directory's files. */
    private List<Path> reportInputs() {
        List<Path> inputs = new ArrayList<>(Arrays.asList(subject.certificate, input));
        if (subject.family != null) {
            try (Stream<Path> files = Files.list(subject.family)) {
                files.forEach(inputs::add);
            } catch (IOException e) {
                throw new BadInputException(subject.family + ": cannot list the directory: " + IoMessages.plain(e), e);
            }
        }
        return inputs;
    }
}
