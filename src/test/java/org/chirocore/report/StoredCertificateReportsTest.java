package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A report in every format for every stored certificate in {@code certificates/}: it states the
 * claim, gives both hashes and the verify command, and is structurally valid for its format.
 */
class StoredCertificateReportsTest {
    private static final Path STORED = Path.of("certificates");
    private static final Pattern EXTERNAL = Pattern.compile("(src|href)\\s*=\\s*[\"']?[^\"'>]*http", Pattern.CASE_INSENSITIVE);

    @TempDir
    Path dir;

    static List<Path> certificates() throws IOException {
        try (Stream<Path> files = Files.list(STORED)) {
            return files.filter(p -> p.getFileName().toString().endsWith(".cert.json")).sorted().toList();
        }
    }

    static Stream<Arguments> reports() throws IOException {
        return certificates().stream().flatMap(c -> Stream.of(ReportFormat.values()).map(f -> Arguments.of(c, f)));
    }

    @Test
    void everyStoredCertificateIsCovered() throws IOException {
        assertTrue(certificates().size() >= 10, "certificates/ holds " + certificates());
    }

    @ParameterizedTest(name = "{0} as {1}")
    @MethodSource("reports")
    void reportStatesTheClaimTheHashesAndTheCommand(Path certificate, ReportFormat format) throws IOException {
        CertificateSummary s = CertificateSummary.read(certificate);
        Path out = dir.resolve("report." + format.extension());
        List<Path> written = ReportWriter.write(CertificateReport.of(certificate, Optional.empty()), format, out, true);
        // LaTeX may break a hash, and a long command line with a shell continuation
        String text = Files.readString(out).replace("\\allowbreak{}", "").replace(" \\\n    ", " ");
        boolean given = s.origin() instanceof Origin.Given;
        assertAll(
                () -> assertTrue(text.contains(CertificateReport.statement(s.core())), "statement"),
                () -> assertTrue(text.contains("rank " + s.core().rank() + " on " + s.core().labels().size() + " elements")),
                () -> assertTrue(text.contains(s.contentSha256()), "content hash"),
                () -> assertTrue(text.contains(s.fileSha256()), "file hash"),
                () -> assertTrue(text.contains("java -jar chirocore.jar verify " + certificate + (given ? " --input INPUT" : "")),
                        "verify command"),
                () -> assertTrue(s.origin() instanceof Origin.Given g ? text.contains(g.sha256())
                        : text.contains(((Origin.Construction) s.origin()).cube() + "-cube over"), "provenance"));
        switch (format) {
            case HTML -> assertAll(
                    () -> assertEquals("", Structure.htmlProblem(text)),
                    () -> assertEquals(1, count(text, "<html"), "one html"),
                    () -> assertEquals(1, count(text, "<head>"), "one head"),
                    () -> assertEquals(1, count(text, "<body>"), "one body"),
                    () -> assertFalse(EXTERNAL.matcher(text).find(), "an external reference"),
                    () -> assertFalse(text.contains("http"), "no URL at all"),
                    () -> assertEquals(List.of(out), written));
            case TEX -> assertAll(
                    () -> assertEquals("", Structure.latexProblem(text)),
                    () -> assertFalse(text.contains("\\documentclass"), "a fragment has no preamble"),
                    () -> assertFalse(text.contains("\\textbackslash") || text.contains("\\textasciicircum"),
                            "mathematics (M\\e, 2^n, AG(2,3)\\e) is in math mode, not escaped text"),
                    () -> assertEquals(List.of(out), written));
            case MD -> {
                for (Path side : written.subList(1, written.size())) {
                    assertTrue(text.contains("](" + side.getFileName() + ")"), side + " is linked");
                    assertTrue(Files.readString(side).startsWith("<svg xmlns="), side + " is a stand-alone SVG");
                }
                assertEquals(s.core().rank() == 3, text.contains("-configuration.svg)"), "the configuration is drawn in rank 3");
            }
        }
    }

    @Test
    void givenMatroidWithItsInputIsFullyVerifiedAndNamed() {
        Path input = STORED.resolve("inputs/fano.json");
        String md = ReportFormat.MD.render(CertificateReport.of(STORED.resolve("fano.cert.json"), Optional.of(input)), "r").text();
        assertTrue(md.contains("java -jar chirocore.jar verify certificates/fano.cert.json --input " + input), md);
        assertFalse(md.contains("not run"), md);
    }

    @Test
    void givenMatroidWithTheWrongInputGetsNoReport() {
        Path wrong = STORED.resolve("inputs/fano-dual.json");
        ReportException e = assertThrows(ReportException.class,
                () -> CertificateReport.of(STORED.resolve("fano.cert.json"), Optional.of(wrong)));
        assertTrue(e.getMessage().contains("provenance"), e.getMessage());
    }

    @Test
    void constructionNamesItsCubeAndDrawsIt() {
        Document doc = CertificateReport.of(STORED.resolve("corner-n4.cert.json"), Optional.empty());
        String md = ReportFormat.MD.render(doc, "r").text();
        assertAll(
                () -> assertTrue(md.contains("the affine 4-cube over Q"), md),
                () -> assertTrue(md.contains("O, the vertex pulled to H: `1111`; O is contracted after pulling"), md),
                () -> assertTrue(md.contains("C (contracted) (1): `0100`"), md),
                () -> assertTrue(md.contains("D (deleted) (6): `0000 0001 0010 0011 1010 1100`")
                        || md.contains("D (deleted): all other elements"), md),
                () -> assertTrue(md.contains("](r-cube.svg)"), md),
                () -> assertTrue(md.contains("labelled by their cube coordinates"), md),
                () -> assertTrue(md.contains(", N being the pulled matroid contracted by O"), md));
    }

    @Test
    void aGivenMatroidThatIsItsOwnCoreIsSaidToBeSo() {
        String md = ReportFormat.MD.render(CertificateReport.of(STORED.resolve("fano.cert.json"), Optional.empty()), "r").text();
        assertTrue(md.contains("M is the given matroid itself"), md);
    }

    @Test
    void anUnverifiableCertificateGetsNoReport() throws IOException {
        Path bad = dir.resolve("bad.cert.json");
        Files.writeString(bad, Files.readString(STORED.resolve("fano.cert.json")).replaceFirst("\\[0, 1, 2\\]", "[0, 1, 3]"));
        ReportException e = assertThrows(ReportException.class,
                () -> CertificateReport.of(bad, Optional.empty()));
        assertTrue(e.getMessage().contains("does not verify"), e.getMessage());
    }

    static Stream<Path> latexSubjects() throws IOException {
        return Stream.concat(certificates().stream(), Stream.of(Path.of("families/corner"), Path.of("certificates/sweep"),
                Path.of("docs/enumerations/corner-n4")));
    }

    /**
     * Compiles the LaTeX report of every stored certificate, of the corner family, of the stored sweep and enumeration inside a
     * plain article with tikz, when pdflatex is installed (texlive-latex-base and
     * texlive-pictures); the log must show no overfull box. Skipped, saying so, without pdflatex;
     * the structural test above runs always.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("latexSubjects")
    void latexCompilesWithoutOverfullBoxes(Path subject) throws IOException, InterruptedException {
        boolean available = Stream.of(System.getenv("PATH").split(java.io.File.pathSeparator))
                .anyMatch(p -> Files.isExecutable(Path.of(p, "pdflatex")));
        assumeTrue(available, "pdflatex is not installed: the LaTeX compile test is SKIPPED (the structural test still runs)");
        Document doc = Files.isDirectory(subject) ? RunReport.of(subject) : CertificateReport.of(subject, Optional.empty());
        String fragment = ReportFormat.TEX.render(doc, "r").text();
        Files.writeString(dir.resolve("paper.tex"), "\\documentclass{article}\n\\usepackage{tikz}\n\\begin{document}\n"
                + fragment + "\\end{document}\n");
        Process p = new ProcessBuilder("pdflatex", "-interaction=nonstopmode", "-halt-on-error", "paper.tex")
                .directory(dir.toFile()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "pdflatex did not finish");
        assertEquals(0, p.exitValue(), out);
        String log = Files.readString(dir.resolve("paper.log"), java.nio.charset.StandardCharsets.ISO_8859_1);
        assertFalse(log.contains("Overfull"), () -> log.lines().filter(l -> l.contains("Overfull")).toList().toString());
    }

    private static int count(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }
}
