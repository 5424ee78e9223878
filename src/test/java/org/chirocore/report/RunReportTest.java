package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.regex.Pattern;

import org.chirocore.family.FamilyDefinition;
import org.chirocore.family.FamilyExploration;
import org.chirocore.family.FamilyPrediction;
import org.chirocore.family.FamilyRun;
import org.chirocore.orient.Budget;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reports on run directories: the stored corner family run (families/corner, n = 3..16), the
 * stored sweep and enumeration, and an exploration and a checked prediction of the corner family
 * made here.
 */
class RunReportTest {
    private static final Path CORNER = Path.of("families/corner");
    private static final FamilyDefinition CORNER_DEFINITION = FamilyDefinition.read(Path.of("families/corner.json"));
    /** The report of the stored run, made once: it verifies all 14 certificates (several seconds). */
    private static Document cornerReport;

    @BeforeAll
    static void reportTheStoredRun() {
        cornerReport = RunReport.of(CORNER);
    }

    @Test
    void familyRunHasItsTablesChartsAndNamedCores() {
        Document doc = cornerReport;
        Document.Table table = (Document.Table) doc.blocks().stream()
                .filter(b -> b instanceof Document.Table t && t.header().contains("core elements"))
                .findFirst().orElseThrow();
        assertEquals(List.of("3", "4", "5", "6", "7", "8", "9", "10", "11", "12", "13", "14", "15", "16"), column(table, 0));
        assertEquals(List.of("7", "8", "7", "10", "8", "12", "15", "8", "7", "14", "7", "16", "10", "10"), column(table, 3),
                "core elements as in docs/families.md");
        // the family's description names F7 at n = 3; the corner-n4 certificate's core is AG(2,3)\e (CatalogueTest)
        Document.Math fano = (Document.Math) table.rows().get(0).get(7);
        Document.Math ag = (Document.Math) table.rows().get(1).get(7);
        assertAll(() -> assertEquals("F7", fano.text()), () -> assertEquals("F_7", fano.latex()),
                () -> assertEquals("AG(2,3)\\e", ag.text()), () -> assertEquals("AG(2,3)\\setminus e", ag.latex()));
        String html = ReportFormat.HTML.render(doc, "corner").text();
        assertAll(
                // three charts and one configuration per member (all cores have rank 3)
                () -> assertEquals(3 + 14, count(html, "<svg ")),
                () -> assertEquals("", Structure.htmlProblem(html)),
                () -> assertFalse(html.contains("http")),
                () -> assertTrue(html.contains("java -jar chirocore.jar verify families/corner/n=*.cert.json"), "relative command"),
                // the corner family's description says n = 3 gives the Fano plane (docs/families.md)
                () -> assertTrue(html.contains("isomorphic to the Fano plane"), "F7 named"),
                () -> assertTrue(html.contains("Core vertices (sorted): <code>000 001 010 011 100 101 110</code>"), html),
                () -> assertTrue(html.contains("D (deleted): all other elements"), "compact deleted set"));
    }

    @Test
    void markdownLinksChartsAndPicturesWithDistinctNames(@TempDir Path dir) throws IOException {
        List<Path> written = ReportWriter.write(cornerReport, ReportFormat.MD, dir.resolve("corner.md"), true);
        List<String> names = written.stream().map(p -> p.getFileName().toString()).toList();
        assertEquals("corner.md", names.get(0));
        assertTrue(names.containsAll(List.of("corner-core-size.svg", "corner-proof-size.svg", "corner-time.svg",
                "corner-configuration.svg", "corner-configuration-8.svg")), names.toString());
        assertEquals(1 + 3 + 14, names.stream().distinct().count());
    }

    @Test
    void latexIsBalancedWithMathInMathMode() {
        String tex = ReportFormat.TEX.render(cornerReport, "corner").text();
        assertEquals("", Structure.latexProblem(tex));
        assertFalse(tex.contains("\\textbackslash") || tex.contains("\\textasciicircum"), "math mode, not escaped text");
        assertTrue(tex.contains("$AG(2,3)\\setminus e$") && tex.contains("$F_7$"), "the classes in math mode");
    }

    @Test
    void indexLinksTheRunAndEveryCertificate(@TempDir Path dir) throws IOException {
        List<Path> written = RunReport.writeAll(CORNER, ReportFormat.HTML, dir, true);
        String index = Files.readString(dir.resolve("index.html"));
        assertAll(
                () -> assertEquals(dir.resolve("index.html"), written.get(0)),
                () -> assertTrue(index.contains("<a href=\"run.html\">"), index),
                () -> assertTrue(index.contains("<a href=\"n=3.html\">"), index),
                () -> assertTrue(index.contains("the Fano plane F7"), index),
                () -> assertEquals(1 + 1 + 14, written.size()),
                () -> assertEquals("", Structure.htmlProblem(index)));
    }

    @Test
    void explorationIsReported(@TempDir Path dir) throws IOException {
        new FamilyExploration(CORNER_DEFINITION, dir, FamilyExploration.Settings.unconstrained(0, 2, Budget.UNLIMITED),
                FamilyRun.Listener.SILENT).run(3, 3);
        assertTrue(RunReport.kindOf(dir) instanceof ExploreRunKind);
        String md = ReportFormat.MD.render(RunReport.of(dir), "explore").text();
        assertTrue(md.contains("Exploration of the family corner"), md);
        assertTrue(md.contains("isomorphic to the Fano plane"), md);
    }

    @Test
    void predictionIsReported(@TempDir Path dir) throws IOException {
        new FamilyPrediction(CORNER_DEFINITION, FamilyPrediction.Prediction.read(Path.of("families/corner.predict.json")), dir,
                Budget.UNLIMITED).run(3, 3);
        assertTrue(RunReport.kindOf(dir) instanceof PredictRunKind);
        String md = ReportFormat.MD.render(RunReport.of(dir), "predict").text();
        assertTrue(md.contains("## n = 3: n=3.predicted.cert.json"), md);
        assertTrue(md.contains("isomorphic to the Fano plane"), md);
    }

    @Test
    void sweepIsReportedWithItsClasses() {
        Path sweep = Path.of("certificates/sweep");
        assertTrue(RunReport.kindOf(sweep) instanceof SweepRunKind);
        String tex = ReportFormat.TEX.render(RunReport.of(sweep), "sweep").text();
        // docs/sweep.md: the n = 3 pair's core is F7; AG(2,3)\e occurs among the others
        assertAll(() -> assertEquals("", Structure.latexProblem(tex)),
                () -> assertTrue(tex.contains("$F_7$") && tex.contains("$AG(2,3)\\setminus e$"), "classes named"),
                () -> assertTrue(tex.contains("rank-n core") && tex.contains("7, 3, 28 bases"),
                        "the table of the cores of rank n; n = 3: the Fano plane, 28 bases (docs/sweep.md)"),
                () -> assertEquals(23 + count(Files.readString(sweep.resolve("sweep.json")), "\"status\": \"found\""),
                        count(tex, "\\subsection*{n = "),
                        "one section per pair (23 pairs, docs/sweep.md) and one per core of rank n found"));
    }

    @Test
    void enumerationIsReportedInEveryFormat(@TempDir Path dir) throws IOException {
        Path enumeration = Path.of("docs/enumerations/corner-n4");
        assertTrue(RunReport.kindOf(enumeration) instanceof EnumerationRunKind);
        Document doc = RunReport.of(enumeration);
        Document.Table table = (Document.Table) doc.blocks().stream()
                .filter(b -> b instanceof Document.Table t && t.header().contains("example labels")).findFirst().orElseThrow();
        // docs/enumerations/corner-n4/summary.md: three classes, 8 elements each, ranks 4, 4, 3
        assertEquals(List.of("1", "2", "3"), column(table, 0));
        assertEquals(List.of("4", "4", "3"), column(table, 2));
        assertEquals(List.of("59", "56", "48"), column(table, 3));
        assertEquals(List.of("5", "24", "96"), column(table, 4));
        // AG(2,3) minus a point: rank 3 on 8 elements with C(8,3) - 8 = 48 bases (its 8 three-point lines)
        Document.Math ag = (Document.Math) table.rows().get(2).get(5);
        String md = ReportFormat.MD.render(doc, "enumeration").text();
        String tex = ReportFormat.TEX.render(doc, "enumeration").text();
        String html = ReportFormat.HTML.render(doc, "enumeration").text();
        assertAll(() -> assertEquals("AG(2,3)\\e", ag.text()),
                () -> assertTrue(md.contains("The enumeration is complete"), md),
                () -> assertTrue(md.contains("## class 3: class-3.cert.json"), md),
                () -> assertTrue(md.contains("0010 0100 0110 0111 1000 1011 1100 1101"), "example labels"),
                () -> assertEquals("", Structure.latexProblem(tex)),
                () -> assertTrue(tex.contains("$AG(2,3)\\setminus e$"), "class named in math mode"),
                () -> assertEquals("", Structure.htmlProblem(html)),
                () -> assertEquals(1, count(html, "<svg "), "the rank-3 core drawn"),
                () -> assertTrue(html.contains("java -jar chirocore.jar verify docs/enumerations/corner-n4/class-*.cert.json"),
                        "relative command"));
        List<Path> written = RunReport.writeAll(enumeration, ReportFormat.HTML, dir, true);
        assertEquals(1 + 1 + 3, written.size());
        assertTrue(Files.readString(dir.resolve("index.html")).contains("<a href=\"class-3.html\">"));
    }

    @Test
    void anIncompleteEnumerationIsNeverCalledComplete(@TempDir Path dir) throws IOException {
        Path stored = Path.of("docs/enumerations/corner-n4");
        for (String f : List.of("class-1.cert.json", "class-2.cert.json", "class-3.cert.json")) {
            Files.copy(stored.resolve(f), dir.resolve(f));
        }
        Files.writeString(dir.resolve("summary.json"), Files.readString(stored.resolve("summary.json"))
                .replace("\"incomplete\": null", "\"incomplete\": \"the total time ran out\""));
        String md = ReportFormat.MD.render(RunReport.of(dir), "enumeration").text();
        assertTrue(md.contains("INCOMPLETE (the total time ran out)"), md);
        assertFalse(md.contains("is complete"), md);
    }

    @Test
    void aDirectoryOfNoKnownKindIsRefused(@TempDir Path dir) {
        ReportException e = assertThrows(ReportException.class, () -> RunReport.of(dir));
        assertTrue(e.getMessage().contains("not a run directory"), e.getMessage());
    }

    private static List<String> column(Document.Table table, int c) {
        return table.rows().stream().map(r -> ((Document.Text) r.get(c)).text()).toList();
    }

    private static int count(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }
}
