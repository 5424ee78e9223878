package org.chirocore.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.chirocore.check.VerificationReport;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.NamedMatroid;

/**
 * Reports on a run directory of any kind in {@link #KINDS} (family run, exploration,
 * prediction, sweep, enumeration): what the run's record says, then every certificate of the run that the
 * independent verifier passes, with its core's isomorphism class, vertices, contracted and
 * deleted sets and picture. A certificate that does not verify is named with the failed check
 * and not described. {@link #writeAll} also writes each certificate's own report and an index
 * that links them. Cost: one verification per certificate plus the bounded drawings.
 */
public final class RunReport {
    /** The kinds of run directory, tried in order; the first that recognises a directory describes it. */
    static final List<RunKind> KINDS = List.of(new FamilyRunKind(), new ExploreRunKind(), new PredictRunKind(),
            new SweepRunKind(), new EnumerationRunKind());

    private RunReport() {
    }

    /**
     * The kind of {@code dir}.
     *
     * @throws ReportException when no kind recognises it
     */
    public static RunKind kindOf(Path dir) {
        return KINDS.stream().filter(k -> k.recognises(dir)).findFirst().orElseThrow(() -> new ReportException(dir
                + ": not a run directory: expected a family run (table.json), an exploration (explore.json), a "
                + "prediction (n=K.predicted.cert.json files), a sweep (sweep.json) or an enumeration (summary.json).", null));
    }

    /** The report on the run in {@code dir}. */
    public static Document of(Path dir) {
        RunKind kind = kindOf(dir);
        Map<Path, Checked> checked = new LinkedHashMap<>();
        for (RunKind.Member m : kind.certificates(dir)) {
            checked.put(m.file(), Checked.of(m.file()));
        }
        List<Document.Block> blocks = new ArrayList<>(kind.summary(dir, file -> {
            Checked c = checked.get(file);
            return c == null || c.summary() == null ? new Document.Text("not verified")
                    : c.name().<Document.Inline>map(n -> new Document.Math(n.latex(), n.symbol()))
                            .orElse(new Document.Text("unnamed"));
        }));
        blocks.add(new Document.Heading("The cores"));
        for (RunKind.Member m : kind.certificates(dir)) {
            blocks.addAll(member(m, checked.get(m.file())));
        }
        return new Document(kind.title(dir), blocks);
    }

    /**
     * A run's certificate after the verifier: its summary and name when it passed, otherwise why not.
     *
     * @param verdict the verifier's report, null when it failed
     * @param summary what the certificate says, null when it failed
     * @param name the core's isomorphism class in the catalogue
     * @param failure why it is not described, empty when it passed
     */
    private record Checked(VerificationReport verdict, CertificateSummary summary, Optional<NamedMatroid> name, String failure) {
        static Checked of(Path file) {
            try {
                VerificationReport verdict = CertificateReport.verified(file, Optional.empty());
                CertificateSummary s = CertificateSummary.read(file);
                return new Checked(verdict, s, Catalogue.identify(s.core()), "");
            } catch (ReportException e) {
                return new Checked(null, null, Optional.empty(), e.getMessage());
            }
        }
    }

    /**
     * Writes into {@code out} the run's report ({@code run.EXT}), each verified certificate's
     * report ({@code STEM.EXT}, STEM its file name without {@code .cert.json}) and
     * {@code index.EXT} linking them; all are rendered and checked before the first is written.
     *
     * @param overwrite whether existing files in {@code out} may be replaced
     * @return the files written, the index first
     * @throws org.chirocore.io.OutputRefusedException before anything is written, naming a file
     *     that exists (without {@code overwrite}) or cannot be written
     * @throws IOException when a file cannot be written
     */
    public static List<Path> writeAll(Path dir, ReportFormat format, Path out, boolean overwrite) throws IOException {
        RunKind kind = kindOf(dir);
        List<List<Document.Inline>> items = new ArrayList<>();
        String ext = "." + format.extension();
        Map<Path, String> rest = new LinkedHashMap<>(ReportWriter.render(of(dir), format, out.resolve("run" + ext)));
        items.add(List.of(new Document.Link("run" + ext, "run" + ext), new Document.Text(": the " + kind.name() + ": "
                + kind.title(dir))));
        for (RunKind.Member m : kind.certificates(dir)) {
            String stem = m.file().getFileName().toString().replaceFirst("\\.cert\\.json$", "");
            try {
                Document doc = CertificateReport.of(m.file(), Optional.empty());
                rest.putAll(ReportWriter.render(doc, format, out.resolve(stem + ext)));
                List<Document.Inline> item = new ArrayList<>(List.of(new Document.Link(stem + ext, stem + ext),
                        new Document.Text(": " + m.caption() + ": ")));
                item.addAll(doc.heading());
                items.add(item);
            } catch (ReportException e) {
                items.add(List.of(new Document.Text(m.caption() + ": no report, " + e.getMessage())));
            }
        }
        Document index = new Document("Reports on " + RelativePaths.shown(dir), List.of(
                Document.Paragraph.of("The " + kind.name() + " in " + RelativePaths.shown(dir) + " and the report on each of "
                        + "its certificates that verifies."), new Document.Bullets(items)));
        Map<Path, String> files = new LinkedHashMap<>(ReportWriter.render(index, format, out.resolve("index" + ext)));
        files.putAll(rest);
        return ReportWriter.write(files, overwrite);
    }

    /** One certificate of the run: verified, named, described and drawn; or why not. */
    private static List<Document.Block> member(RunKind.Member m, Checked c) {
        List<Document.Block> blocks = new ArrayList<>();
        blocks.add(new Document.Heading(m.caption() + ": " + m.file().getFileName()));
        if (c.summary() == null) {
            blocks.add(Document.Paragraph.of("Not described: " + c.failure()));
            return blocks;
        }
        CertificateSummary s = c.summary();
        ExplicitMatroid core = s.core();
        blocks.add(Document.Paragraph.of(CertificateReport.statement(core) + " The certificate verifies ("
                + c.verdict().checks().size() + " checks; content SHA-256 " + s.contentSha256().substring(0, 16) + "...)."));
        blocks.add(CertificateReport.named(c.name()));
        blocks.add(new Document.Paragraph(List.of(new Document.Text("Core vertices (sorted): "),
                new Document.Mono(String.join(" ", CertificateReport.sortedCopy(core.labels()))))));
        blocks.add(CertificateReport.origin(s.origin(), core.size()));
        if (core.rank() == 3) {
            blocks.add(new Document.Figure(ConfigurationPicture.of(core, Cores.lines(core))));
        }
        return blocks;
    }
}
