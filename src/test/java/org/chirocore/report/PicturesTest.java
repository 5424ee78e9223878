package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

import org.chirocore.matroid.ExplicitMatroid;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/** The core's geometry and the SVG pictures drawn from it. */
class PicturesTest {
    /** The Fano plane F7 as stored in certificates/fano.cert.json (from certificates/inputs/fano.json). */
    private static ExplicitMatroid fano() {
        return CertificateSummary.read(Path.of("certificates/fano.cert.json")).core();
    }

    @Test
    void fanoPlaneHasSevenLinesOfThreePoints() {
        // F7 has 7 lines of 3 points, and they are its only non-bases [Ox, Appendix, F7].
        List<int[]> lines = Cores.lines(fano());
        assertEquals(7, lines.size());
        assertTrue(lines.stream().allMatch(l -> l.length == 3));
        assertEquals(text(lines), text(Cores.nonBases(fano(), Cores.MAX_SUBSETS).orElseThrow()));
    }

    @Test
    void fanoDrawingHasSevenPointsSevenLinesAndALegend() {
        String svg = ConfigurationPicture.of(fano(), Cores.lines(fano())).svg();
        assertEquals(7, count(svg, "class=\"point\""));
        assertEquals(7, count(svg, "class=\"line\""));
        assertEquals(7, count(svg, "class=\"key\""), "one legend key per line");
        assertTrue(svg.contains(">a</text>") && svg.contains(">g</text>"), "points are labelled");
    }

    @Test
    void linesOfAG23MinusAPoint() {
        ExplicitMatroid core = CertificateSummary.read(Path.of("certificates/ag23-minus-point.cert.json")).core();
        // AG(2,3) has 12 lines of 3 points; deleting a point leaves the 8 lines that avoid it [Ox, Appendix, AG(2,3)].
        assertEquals(8, Cores.lines(core).size());
        assertEquals(8, Cores.nonBases(core, Cores.MAX_SUBSETS).orElseThrow().size());
    }

    @Test
    void nonBasesAreNotListedBeyondTheLimit() {
        assertEquals(Optional.empty(), Cores.nonBases(fano(), 34));
        assertEquals(7, Cores.nonBases(fano(), 35).orElseThrow().size());
    }

    @Test
    void linesNeedRankThree() {
        ExplicitMatroid dual = CertificateSummary.read(Path.of("certificates/fano-dual.cert.json")).core();
        assertThrows(IllegalStateException.class, () -> Cores.lines(dual));
    }

    private static List<String> text(List<int[]> sets) {
        return sets.stream().map(java.util.Arrays::toString).sorted().toList();
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5})
    void cubeVerticesAreDrawnApart(int n) {
        double[][] xy = CubePicture.layout(n);
        for (int a = 0; a < xy.length; a++) {
            for (int b = a + 1; b < xy.length; b++) {
                double d = Math.hypot(xy[a][0] - xy[b][0], xy[a][1] - xy[b][1]);
                assertTrue(d > 8, CubePicture.label(a, n) + " and " + CubePicture.label(b, n) + " are " + d + " apart");
            }
        }
    }

    @Test
    void cornerCubeMarksHMinusHOAndTheCore() {
        CertificateSummary s = CertificateSummary.read(Path.of("certificates/corner-n3.cert.json"));
        String svg = CubePicture.of((Origin.Construction) s.origin(), s.core().labels()).svg();
        // 8 vertices, 12 edges; H = the 3 unit vectors, -H = the 3 vertices of weight 2, O = 111;
        // each legend entry adds one more mark of its kind.
        assertAll(
                () -> assertEquals(8, count(svg, "class=\"vertex\"")),
                () -> assertEquals(12, count(svg, "class=\"edge\"")),
                () -> assertEquals(3 + 1, count(svg, "class=\"h\"")),
                () -> assertEquals(3 + 1, count(svg, "class=\"minus-h\"")),
                () -> assertEquals(1 + 1, count(svg, "class=\"pulled\"")),
                () -> assertEquals(s.core().labels().size() + 1, count(svg, "class=\"core\"")));
    }

    @Test
    void cubesAboveFiveAreRefused() {
        Origin.Construction six = new Origin.Construction(6, "Q", List.of(), "111111", true, List.of(), List.of());
        assertThrows(IllegalArgumentException.class, () -> CubePicture.of(six, List.of()));
    }

    @ParameterizedTest(name = "max {0}: step {1}")
    @CsvSource({"1, 1", "8, 1", "9, 2", "16, 2", "17, 5", "40, 5", "41, 10", "800, 100", "801, 200"})
    void chartStepsAreNice(long max, long step) {
        assertEquals(step, LineChart.niceStep(max));
    }

    @Test
    void chartHasAxesTicksAndALegendForSeveralSeries() {
        String svg = LineChart.of("t", "T", "n", "ms", List.of(
                new LineChart.Series("a", List.of(new long[] {3, 10}, new long[] {4, 25})),
                new LineChart.Series("b", List.of(new long[] {3, 5}, new long[] {4, 7})))).svg();
        assertAll(
                () -> assertEquals(2, count(svg, "class=\"axis\"")),
                () -> assertEquals(2 + 6, count(svg, "class=\"tick\""), "x ticks 3, 4; y ticks 0, 5, ..., 25"),
                () -> assertEquals(2, count(svg, "class=\"series\"")),
                () -> assertEquals(2, count(svg, "class=\"key\"")));
    }

    private static int count(String text, String part) {
        return text.split(Pattern.quote(part), -1).length - 1;
    }
}
