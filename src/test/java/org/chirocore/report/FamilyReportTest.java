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

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The report on the stored corner family run, families/corner (n = 3..10). */
class FamilyReportTest {
    private static final Path CORNER = Path.of("families/corner");

    @Test
    void oneRowPerNAndThreeCharts() {
        Document doc = FamilyReport.of(CORNER);
        Document.Table table = (Document.Table) doc.blocks().stream()
                .filter(b -> b instanceof Document.Table t && t.header().get(0).equals("n") && t.header().size() > 3)
                .findFirst().orElseThrow();
        assertEquals(List.of("3", "4", "5", "6", "7", "8", "9", "10"), table.rows().stream().map(r -> r.get(0)).toList());
        assertEquals(List.of("7", "8", "7", "10", "8", "12", "15", "8"), table.rows().stream().map(r -> r.get(3)).toList(),
                "core elements as in docs/families.md");
        String html = ReportFormat.HTML.render(doc, "corner").text();
        assertAll(
                () -> assertEquals(3, count(html, "<svg ")),
                () -> assertEquals("", Structure.htmlProblem(html)),
                () -> assertFalse(html.contains("http")),
                () -> assertTrue(html.contains("java -jar chirocore.jar verify " + CORNER.resolve("n=*.cert.json"))));
    }

    @Test
    void markdownLinksThreeChartFiles(@TempDir Path dir) throws IOException {
        List<Path> written = ReportWriter.write(FamilyReport.of(CORNER), ReportFormat.MD, dir.resolve("corner.md"));
        assertEquals(List.of("corner.md", "corner-core-size.svg", "corner-proof-size.svg", "corner-time.svg"),
                written.stream().map(p -> p.getFileName().toString()).toList());
        String md = Files.readString(written.get(0));
        assertEquals(8, md.lines().filter(l -> l.matches("\\| \\d+ \\| \\d+ \\| .*verified \\|")).count(), md);
    }

    @Test
    void latexTableIsBalanced() {
        assertEquals("", Structure.latexProblem(ReportFormat.TEX.render(FamilyReport.of(CORNER), "corner").text()));
    }

    @Test
    void aDirectoryWithoutTableIsRefused(@TempDir Path dir) {
        ReportException e = assertThrows(ReportException.class, () -> FamilyReport.of(dir));
        assertTrue(e.getMessage().contains("table.json"), e.getMessage());
    }

    private static int count(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }
}
