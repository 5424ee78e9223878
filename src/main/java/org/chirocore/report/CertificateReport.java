package org.chirocore.report;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.chirocore.check.CertificateVerifier;
import org.chirocore.check.Escaping;
import org.chirocore.check.VerificationReport;
import org.chirocore.matroid.Catalogue;
import org.chirocore.matroid.ExplicitMatroid;
import org.chirocore.matroid.NamedMatroid;
import org.chirocore.report.Document.Block;
import org.chirocore.report.Document.Inline;
import org.chirocore.report.Document.Mono;
import org.chirocore.report.Document.Text;

/**
 * The report on one certificate, for a paper and its referees: the statement in the trade's
 * words, the core's name when it is in the {@link Catalogue}, the construction, the core with
 * its non-bases (and lines and a picture in rank 3, the cube for n ≤ 5), the proof's size, the
 * hashes and the command that verifies it. A report is only made for a certificate that
 * {@link CertificateVerifier} passes. Cost: the verification, plus O(C(k, r)) to list the
 * non-bases, plus the bounded layout search of a rank-3 picture.
 */
public final class CertificateReport {
    private CertificateReport() {
    }

    /**
     * Verifies {@code certificate} and describes it.
     *
     * @param certificate the certificate file, named in the verify command as given here
     *     (relative to the working directory when it lies below it)
     * @param input a given matroid's file, passed to the verifier and named in the command
     * @throws ReportException when the certificate does not verify or cannot be read
     */
    public static Document of(Path certificate, Optional<Path> input) {
        VerificationReport verdict = verified(certificate, input);
        CertificateSummary s = CertificateSummary.read(certificate);
        ExplicitMatroid core = s.core();
        Optional<NamedMatroid> name = Catalogue.identify(core);
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Document.Heading("Statement"));
        blocks.add(new Document.Paragraph(List.of(new Text(statement(core) + " Here M is the core of the certificate "),
                new Mono(s.file()), new Text(": M has no chirotope (checked by an unsatisfiability proof of its 3-term "
                        + "Grassmann-Pluecker constraints), and every single-element deletion "),
                new Document.Math("M\\setminus e", "M\\e"), new Text(" and contraction "), new Document.Math("M/e", "M/e"),
                new Text(" is orientable (a chirotope of each is listed and checked)."))));
        blocks.add(named(name));
        blocks.add(new Document.Heading("How it was obtained"));
        blocks.add(origin(s.origin(), core.size()));
        blocks.addAll(coreBlocks(core, s.origin() instanceof Origin.Construction));
        if (s.origin() instanceof Origin.Construction c && c.cube() <= CubePicture.MAX_CUBE) {
            blocks.add(new Document.Figure(CubePicture.of(c, core.labels())));
        }
        blocks.add(new Document.Heading("Proof"));
        CertificateSummary.ProofSize p = s.proof();
        blocks.add(new Document.Bullets(List.of(
                List.of(new Text(p.relations() + " three-term Grassmann-Pluecker relations")),
                List.of(new Text(p.kind() + " proof: " + p.lemmas() + " lemmas, " + p.bytes() + " bytes")),
                List.of(new Text(core.size() * 2 + " orientation witnesses (one per deletion and per contraction)")))));
        blocks.add(new Document.Heading("Verification"));
        blocks.add(new Document.Bullets(List.of(
                List.of(new Text("SHA-256 of the certificate's content (its sha256 member): "), new Mono(s.contentSha256())),
                List.of(new Text("SHA-256 of the file " + s.file() + ": "), new Mono(s.fileSha256())),
                List.of(new Text("Checks passed when this report was written: " + passed(verdict) + ".")))));
        blocks.add(Document.Paragraph.of("A referee verifies the certificate with the independent checker (it shares no "
                + "code with the search or the solver):"));
        blocks.add(new Document.Code(command(certificate, s.origin(), input)));
        if (s.origin() instanceof Origin.Given g && input.isEmpty()) {
            blocks.add(new Document.Paragraph(List.of(new Text("INPUT is the given matroid's file, the one with SHA-256 "),
                    new Mono(g.sha256()), new Text("; without --input the provenance check is not run."))));
        }
        List<Inline> heading = new ArrayList<>(List.of(new Text(title(core, Optional.empty()))));
        name.ifPresent(n -> heading.addAll(List.of(new Text(": " + n.name() + " "), new Document.Math(n.latex(), n.symbol()))));
        return new Document(title(core, name), heading, blocks);
    }

    /**
     * Runs the independent verifier.
     *
     * @throws ReportException naming the first failed check when the certificate does not verify
     */
    static VerificationReport verified(Path certificate, Optional<Path> input) {
        VerificationReport verdict = CertificateVerifier.verify(certificate, input);
        if (!verdict.passed()) {
            VerificationReport.Check failed = verdict.checks().stream().filter(c -> c.status() == VerificationReport.Status.FAIL).findFirst().orElseThrow();
            throw new ReportException(certificate + ": the certificate does not verify (" + failed.name() + ": "
                    + Escaping.printable(failed.detail()) + "); a report is only written for a verified certificate.", null);
        }
        return verdict;
    }

    /** "A minor-minimal non-orientable matroid of rank 3 on 7 elements: the Fano plane F7". */
    static String title(ExplicitMatroid core, Optional<NamedMatroid> name) {
        return "A minor-minimal non-orientable matroid of rank " + core.rank() + " on " + core.size() + " elements"
                + name.map(n -> ": " + n.title()).orElse("");
    }

    /** "M is a minor-minimal non-orientable matroid of rank 3 on 7 elements." */
    static String statement(ExplicitMatroid core) {
        return "M is a minor-minimal non-orientable matroid of rank " + core.rank() + " on " + core.size() + " elements.";
    }

    /** The paragraph naming the isomorphism class of the core. */
    static Block named(Optional<NamedMatroid> name) {
        if (name.isEmpty()) {
            return Document.Paragraph.of("Isomorphism class: not in the catalogue of named matroids (docs/reports.md).");
        }
        NamedMatroid n = name.get();
        return new Document.Paragraph(List.of(new Text("Isomorphism class: M is isomorphic to " + n.name() + " "),
                new Document.Math(n.latex(), n.symbol()), new Text(" (" + n.source() + ").")));
    }

    /** The core: its name, elements, non-bases, and in rank 3 its lines and their picture. */
    static List<Block> coreBlocks(ExplicitMatroid core, boolean cubeLabels) {
        List<Block> blocks = new ArrayList<>();
        blocks.add(new Document.Heading("The core"));
        blocks.add(new Document.Paragraph(List.of(new Text("Elements (" + core.size() + ", in element order"
                + (cubeLabels ? ", labelled by their cube coordinates" : "") + "): "),
                new Mono(String.join(" ", core.labels())), new Text(". Bases: " + core.basisCount() + "."))));
        blocks.add(nonBases(core));
        if (core.rank() == 3) {
            List<int[]> lines = Cores.lines(core);
            blocks.add(Document.Paragraph.of("Lines (" + lines.size() + ", the maximal sets of at least 3 collinear points, "
                    + "computed from the non-bases): " + sets(core, lines) + "."));
            blocks.add(new Document.Figure(ConfigurationPicture.of(core, lines)));
        }
        return blocks;
    }

    /** The verify command a referee runs, the certificate's path shown relative. */
    static String command(Path certificate, Origin origin, Optional<Path> input) {
        String cmd = "java -jar chirocore.jar verify " + RelativePaths.shown(certificate);
        return origin instanceof Origin.Given ? cmd + " --input " + input.map(RelativePaths::shown).orElse("INPUT") : cmd;
    }

    private static String passed(VerificationReport verdict) {
        List<String> names = new ArrayList<>();
        for (VerificationReport.Check c : verdict.checks()) {
            names.add(c.name() + (c.status() == VerificationReport.Status.PASS ? "" : " (not run: no input file given)"));
        }
        return String.join(", ", names);
    }

    /** How the core was obtained: the construction or given matroid, C, and D (compact when it is everything else). */
    static Block origin(Origin origin, int coreSize) {
        List<List<Inline>> items = new ArrayList<>();
        int ground;
        if (origin instanceof Origin.Construction c) {
            ground = (1 << c.cube()) - (c.contractPulled() ? 1 : 0);
            items.add(List.of(new Text("the affine " + c.cube() + "-cube over " + c.field() + ": its "),
                    new Document.Math("2^{" + c.cube() + "}", Integer.toString(1 << c.cube())),
                    new Text(" vertices v, element v being the column (1, v)")));
            items.add(List.of(new Text("H, a hyperplane, by its vertices: "), new Mono(String.join(" ", sortedCopy(c.hyperplane())))));
            items.add(List.of(new Text("O, the vertex pulled to H: "), new Mono(c.pulled()),
                    new Text(c.contractPulled() ? "; O is contracted after pulling" : "; O is not contracted")));
            items.add(List.of(new Text("the pulled matroid: its bases are the bases of the cube not contained in the set of H's vertices and O")));
        } else {
            Origin.Given g = (Origin.Given) origin;
            ground = g.elements();
            items.add(List.of(new Text("a given matroid of rank " + g.rank() + " on " + g.elements()
                    + " elements; its file has SHA-256 "), new Mono(g.sha256())));
        }
        items.add(path("C (contracted)", origin.contracted(), false));
        items.add(path("D (deleted)", origin.deleted(), origin.contracted().size() + origin.deleted().size() + coreSize == ground));
        String base = origin instanceof Origin.Construction c ? "the pulled matroid" + (c.contractPulled() ? " contracted by O" : "")
                : "the given matroid";
        items.add(origin.contracted().isEmpty() && origin.deleted().isEmpty() ? List.of(new Text("M is " + base + " itself"))
                : List.of(new Text("M = "), new Document.Math("N/C\\setminus D", "N/C\\D"), new Text(", N being " + base)));
        return new Document.Bullets(items);
    }

    /** A set of the path; D is written "all other elements" when it is everything outside C and the core. */
    private static List<Inline> path(String what, List<String> labels, boolean allOthers) {
        if (labels.isEmpty()) {
            return List.of(new Text(what + ": none"));
        }
        if (allOthers) {
            return List.of(new Text(what + ": all other elements (" + labels.size() + ")"));
        }
        return List.of(new Text(what + " (" + labels.size() + "): "), new Mono(String.join(" ", sortedCopy(labels))));
    }

    static List<String> sortedCopy(List<String> labels) {
        return labels.stream().sorted(Cores.LABEL_ORDER).toList();
    }

    private static Block nonBases(ExplicitMatroid core) {
        Optional<List<int[]>> sets = Cores.nonBases(core, Cores.MAX_SUBSETS);
        if (sets.isEmpty()) {
            return Document.Paragraph.of("Non-bases: " + (Cores.subsetCount(core) - core.basisCount()) + " (not listed: there are "
                    + Cores.subsetCount(core) + " " + core.rank() + "-subsets, more than " + Cores.MAX_SUBSETS + ").");
        }
        return Document.Paragraph.of("Non-bases (" + sets.get().size() + ", the " + core.rank()
                + "-subsets that are not bases): " + (sets.get().isEmpty() ? "none" : sets(core, sets.get())) + ".");
    }

    private static String sets(ExplicitMatroid core, List<int[]> sets) {
        return String.join(", ", sets.stream().map(s -> Cores.setText(core.labels(), s)).toList());
    }
}
