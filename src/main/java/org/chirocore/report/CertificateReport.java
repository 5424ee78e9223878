package org.chirocore.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Escaping;
import org.chirocore.check.VerificationReport;
import org.chirocore.report.Document.Block;
import org.chirocore.report.Document.Inline;
import org.chirocore.report.Document.Mono;
import org.chirocore.report.Document.Text;

/**
 * The report on one certificate, for a paper and its referees: the statement in the trade's
 * words, the construction, the core with its non-bases (and lines and a picture in rank 3, the
 * cube for n ≤ 5), the proof's size, the hashes and the command that verifies it. A report is
 * only made for a certificate that {@link CertificateVerifier} passes. Cost: the verification,
 * plus O(C(k, r)) to list the non-bases.
 */
public final class CertificateReport {
    private CertificateReport() {
    }

    /**
     * Verifies {@code certificate} and describes it.
     *
     * @param certificate the certificate file, named in the verify command as given here
     * @param input a given matroid's file, passed to the verifier and named in the command
     * @throws ReportException when the certificate does not verify or cannot be read
     */
    public static Document of(Path certificate, Optional<Path> input) {
        VerificationReport verdict = CertificateVerifier.verify(certificate, input);
        if (!verdict.passed()) {
            VerificationReport.Check failed = verdict.checks().stream().filter(c -> c.status() == VerificationReport.Status.FAIL).findFirst().orElseThrow();
            throw new ReportException(certificate + ": the certificate does not verify (" + failed.name() + ": "
                    + Escaping.printable(failed.detail()) + "); a report is only written for a verified certificate.", null);
        }
        CertificateSummary s = CertificateSummary.read(certificate);
        Core core = s.core();
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Document.Heading("Statement"));
        blocks.add(new Document.Paragraph(List.of(new Text(statement(core) + " Here M is the core of the certificate "),
                new Mono(s.file()), new Text(": M has no chirotope (checked by an unsatisfiability proof of its 3-term "
                        + "Grassmann-Pluecker constraints), and every single-element deletion M\\e and contraction M/e is "
                        + "orientable (a chirotope of each is listed and checked)."))));
        blocks.add(new Document.Heading("How it was obtained"));
        blocks.add(origin(s.origin()));
        blocks.add(new Document.Heading("The core"));
        blocks.add(new Document.Paragraph(List.of(new Text("Elements (" + core.labels().size() + ", in element order"
                + (s.origin() instanceof Origin.Construction ? ", labelled by their cube coordinates" : "") + "): "),
                new Mono(String.join(" ", core.labels())), new Text(". Bases: " + core.basisCount() + "."))));
        blocks.addAll(nonBases(core));
        if (core.rank() == 3) {
            blocks.addAll(lines(core));
        }
        if (s.origin() instanceof Origin.Construction c && c.cube() <= CubePicture.MAX_CUBE) {
            blocks.add(new Document.Figure(CubePicture.of(c, core.labels())));
        }
        blocks.add(new Document.Heading("Proof"));
        CertificateSummary.ProofSize p = s.proof();
        blocks.add(new Document.Bullets(List.of(
                List.of(new Text(p.relations() + " three-term Grassmann-Pluecker relations")),
                List.of(new Text(p.kind() + " proof: " + p.lemmas() + " lemmas, " + p.bytes() + " bytes")),
                List.of(new Text(core.labels().size() * 2 + " orientation witnesses (one per deletion and per contraction)")))));
        blocks.add(new Document.Heading("Verification"));
        blocks.add(new Document.Bullets(List.of(
                List.of(new Text("SHA-256 of the certificate's content (its sha256 member): "), new Mono(s.contentSha256())),
                List.of(new Text("SHA-256 of the file " + s.file() + ": "), new Mono(s.fileSha256())),
                List.of(new Text("Checks passed when this report was written: " + passed(verdict) + ".")))));
        blocks.add(Document.Paragraph.of("A referee verifies the certificate with the independent checker (it shares no "
                + "code with the search or the solver):"));
        blocks.add(new Document.Code(command(certificate, s.origin(), input)));
        if (s.origin() instanceof Origin.Given g && input.isEmpty()) {
            blocks.add(Document.Paragraph.of("INPUT is the given matroid's file, the one with SHA-256 " + g.sha256()
                    + "; without --input the provenance check is not run."));
        }
        return new Document("A minor-minimal non-orientable matroid of rank " + core.rank() + " on "
                + core.labels().size() + " elements", blocks);
    }

    /** "M is a minor-minimal non-orientable matroid of rank 3 on 7 elements." */
    static String statement(Core core) {
        return "M is a minor-minimal non-orientable matroid of rank " + core.rank() + " on " + core.labels().size() + " elements.";
    }

    /** The verify command a referee runs. */
    static String command(Path certificate, Origin origin, Optional<Path> input) {
        String cmd = "java -jar chirocore.jar verify " + certificate;
        return origin instanceof Origin.Given ? cmd + " --input " + input.map(Path::toString).orElse("INPUT") : cmd;
    }

    private static String passed(VerificationReport verdict) {
        List<String> names = new ArrayList<>();
        for (VerificationReport.Check c : verdict.checks()) {
            names.add(c.name() + (c.status() == VerificationReport.Status.PASS ? "" : " (not run: no input file given)"));
        }
        return String.join(", ", names);
    }

    private static Block origin(Origin origin) {
        List<List<Inline>> items = new ArrayList<>();
        if (origin instanceof Origin.Construction c) {
            items.add(List.of(new Text("the affine " + c.cube() + "-cube over " + c.field() + ": its 2^" + c.cube()
                    + " vertices v, element v being the column (1, v)")));
            items.add(List.of(new Text("H, a hyperplane, by its vertices: "), new Mono(String.join(" ", c.hyperplane()))));
            items.add(List.of(new Text("O, the vertex pulled to H: "), new Mono(c.pulled()),
                    new Text(c.contractPulled() ? "; O is contracted after pulling" : "; O is not contracted")));
            items.add(List.of(new Text("the pulled matroid: its bases are the bases of the cube not contained in the set of H's vertices and O")));
            items.add(path("C (contracted)", c.contracted()));
            items.add(path("D (deleted)", c.deleted()));
            items.add(List.of(new Text("M is the pulled matroid" + (c.contractPulled() ? " contracted by O" : "") + ", then /C\\D")));
        } else {
            Origin.Given g = (Origin.Given) origin;
            items.add(List.of(new Text("a given matroid of rank " + g.rank() + " on " + g.elements()
                    + " elements; its file has SHA-256 "), new Mono(g.sha256())));
            items.add(path("C (contracted)", g.contracted()));
            items.add(path("D (deleted)", g.deleted()));
            items.add(List.of(new Text("M is the given matroid /C\\D")));
        }
        return new Document.Bullets(items);
    }

    private static List<Inline> path(String what, List<String> labels) {
        return labels.isEmpty() ? List.of(new Text(what + ": none"))
                : List.of(new Text(what + ": "), new Mono(String.join(" ", labels)));
    }

    private static List<Block> nonBases(Core core) {
        Optional<List<Long>> sets = core.nonBases();
        if (sets.isEmpty()) {
            return List.of(Document.Paragraph.of("Non-bases: " + core.nonBasisCount() + " (not listed: there are "
                    + core.subsetCount() + " " + core.rank() + "-subsets, more than " + Core.MAX_SUBSETS + ")."));
        }
        return List.of(Document.Paragraph.of("Non-bases (" + sets.get().size() + ", the " + core.rank()
                + "-subsets that are not bases): " + sets.get().stream().map(core::setText).reduce((a, b) -> a + ", " + b)
                        .orElse("none") + "."));
    }

    private static List<Block> lines(Core core) {
        List<Long> lines = core.lines();
        return List.of(Document.Paragraph.of("Lines (" + lines.size() + ", the maximal sets of at least 3 collinear points, "
                + "computed from the non-bases): " + lines.stream().map(core::setText).reduce((a, b) -> a + ", " + b)
                        .orElse("none") + "."),
                new Document.Figure(ConfigurationPicture.of(core)));
    }
}
