package org.chirocore.report;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The geometry of the drawn configurations: every point lies on the drawn path of each of its
 * lines and clearly off every other line's path, no two points coincide, and the straight lines
 * are exact (homogeneous integer determinants). Run on F7, AG(2,3) minus a point, and 10-, 12- and
 * 15-element cores of the corner family.
 */
class ConfigurationGeometryTest {
    /** Pixels: on a path means closer than this. */
    private static final double ON = 0.5;
    /** Pixels: off a path means farther than this. */
    private static final double OFF = 4;

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"certificates/fano.cert.json", "certificates/ag23-minus-point.cert.json",
        "certificates/corner-n6.cert.json", "certificates/corner-n8.cert.json", "families/corner/n=9.cert.json"})
    void pointsLieOnTheirLinesOnlyAndApart(String file) {
        ExplicitMatroid core = CertificateSummary.read(Path.of(file)).core();
        List<int[]> lines = Cores.lines(core);
        ConfigurationPicture.Drawing d = ConfigurationPicture.drawing(core, lines);
        double[][] p = d.points();
        for (int l = 0; l < lines.size(); l++) {
            for (int e = 0; e < core.size(); e++) {
                double distance = d.distance(l, p[e][0], p[e][1]);
                boolean member = contains(lines.get(l), e);
                String what = core.labels().get(e) + " and line " + Cores.setText(core.labels(), lines.get(l)) + ": " + distance + " px";
                assertTrue(member ? distance < ON : distance > OFF, what);
            }
        }
        for (int a = 0; a < p.length; a++) {
            for (int b = a + 1; b < p.length; b++) {
                assertTrue(Math.hypot(p[a][0] - p[b][0], p[a][1] - p[b][1]) > 10, a + " and " + b + " nearly coincide");
            }
        }
        // A configuration drawn with every line straight would be a real realisation, which gives
        // an orientation (Bjoerner et al., Oriented Matroids, Section 1.2); these cores are
        // non-orientable (their certificates verify), so at least one line must be curved.
        assertTrue(d.layout().straightCount() < lines.size(), "a non-orientable core cannot be drawn all straight");
        exactIncidences(core, lines, d.layout());
    }

    /**
     * No label's box is met by a line's drawn path, overhangs past the end points included: each
     * path is walked in steps of at most 0.5 px and no step lands in a box. On F7, AG(2,3) minus a
     * point and the 7- and 8-element corner cores; the denser 10- to 15-element cores with longer
     * labels still have a few labels touched (docs/reports.md, Not done).
     */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"certificates/fano.cert.json", "certificates/ag23-minus-point.cert.json",
        "certificates/corner-n4.cert.json", "certificates/corner-n5.cert.json", "certificates/corner-n7.cert.json"})
    void noLineCrossesALabel(String file) {
        ExplicitMatroid core = CertificateSummary.read(Path.of(file)).core();
        List<int[]> lines = Cores.lines(core);
        ConfigurationPicture.Drawing d = ConfigurationPicture.drawing(core, lines);
        List<double[]> boxes = ConfigurationPicture.labelBoxes(d, core.labels());
        for (int l = 0; l < lines.size(); l++) {
            double[][] path = ConfigurationPicture.pixelPath(d, l);
            for (int i = 0; i + 1 < path.length; i++) {
                double[] a = path[i];
                double[] b = path[i + 1];
                int steps = (int) Math.ceil(2 * Math.hypot(b[0] - a[0], b[1] - a[1])) + 1;
                for (int s = 0; s <= steps; s++) {
                    double x = a[0] + (b[0] - a[0]) * s / steps;
                    double y = a[1] + (b[1] - a[1]) * s / steps;
                    for (int e = 0; e < boxes.size(); e++) {
                        double[] box = boxes.get(e);
                        assertTrue(x < box[0] || x > box[2] || y < box[1] || y > box[3], "line "
                                + Cores.setText(core.labels(), lines.get(l)) + " crosses label " + core.labels().get(e));
                    }
                }
            }
        }
    }

    @Test
    void fanoIsTheUsualPictureWithOneCircle() {
        ExplicitMatroid core = CertificateSummary.read(Path.of("certificates/fano.cert.json")).core();
        ConfigurationLayout.Layout layout = ConfigurationPicture.drawing(core, Cores.lines(core)).layout();
        // F7 minus one line's collinearity is the non-Fano matroid, realisable over Q [Ox, Appendix, F7^-]:
        // six lines straight, one circle.
        assertAll(() -> assertEquals(6, layout.straightCount()),
                () -> assertEquals(1, layout.paths().stream().filter(q -> q instanceof ConfigurationLayout.Circle).count()));
    }

    @Test
    void ag23MinusAPointKeepsMostLinesStraight() {
        ExplicitMatroid core = CertificateSummary.read(Path.of("certificates/ag23-minus-point.cert.json")).core();
        ConfigurationLayout.Layout layout = ConfigurationPicture.drawing(core, Cores.lines(core)).layout();
        assertTrue(layout.straightCount() >= 6, layout.straightCount() + " of 8 lines straight");
    }

    /** Three points are exactly collinear when a straight line holds them, and never when no line does. */
    private static void exactIncidences(ExplicitMatroid core, List<int[]> lines, ConfigurationLayout.Layout layout) {
        long[][] q = layout.exact();
        for (int a = 0; a < q.length; a++) {
            for (int b = a + 1; b < q.length; b++) {
                for (int c = b + 1; c < q.length; c++) {
                    Long det = Homogeneous.detOrNull(q[a], q[b], q[c]);
                    assertTrue(det != null, "coordinates within range");
                    int line = -1;
                    for (int l = 0; l < lines.size(); l++) {
                        if (contains(lines.get(l), a) && contains(lines.get(l), b) && contains(lines.get(l), c)) {
                            line = l;
                        }
                    }
                    String triple = core.labels().get(a) + core.labels().get(b) + core.labels().get(c);
                    if (line < 0) {
                        assertTrue(det != 0, triple + " is on no line but drawn collinear");
                    } else if (layout.straight()[line]) {
                        assertEquals(0L, det, triple + " is on a straight line but not collinear");
                    }
                }
            }
        }
    }

    private static boolean contains(int[] set, int e) {
        for (int x : set) {
            if (x == e) {
                return true;
            }
        }
        return false;
    }
}
