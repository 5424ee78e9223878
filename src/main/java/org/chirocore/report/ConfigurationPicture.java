package org.chirocore.report;

import java.util.ArrayList;
import java.util.List;

import org.chirocore.matroid.ExplicitMatroid;

/**
 * Draws a rank-3 core as a point–line configuration, placed by {@link ConfigurationLayout}:
 * lines straight where the exact search realised them, the others as smooth closed curves
 * through their points. Each line has its own colour (dashed on the palette's second round),
 * and a legend names each line's points and whether it is straight. Labels go beside their
 * points on the side that keeps them off other labels, points and lines. Cost: the layout
 * search, bounded by {@link ConfigurationLayout#MAX_NODES}.
 */
public final class ConfigurationPicture {
    private static final int WIDTH = 480;
    private static final int PLOT = 360;
    private static final int MARGIN = 40;
    private static final int ROW = 18;
    private static final int LABEL_SIZE = 13;
    /** Label positions tried on each ring: right, then counter-clockwise in equal steps. */
    private static final int DIRECTIONS = 16;
    /** Rings of label positions, each {@link #RING_STEP} px farther from the point than the last. */
    private static final int RINGS = 4;
    private static final int RING_STEP = 8;

    private ConfigurationPicture() {
    }

    /**
     * A drawing in pixels.
     *
     * @param layout the placement, in its own units
     * @param points each element's pixel position
     * @param scale pixels per layout unit
     * @param originX pixel x of layout x = 0
     * @param originY pixel y of layout y = 0
     */
    record Drawing(ConfigurationLayout.Layout layout, double[][] points, double scale, double originX, double originY) {
        double[] pixel(double x, double y) {
            return new double[] {originX + x * scale, originY - y * scale};
        }

        /** Distance in pixels from pixel (x, y) to line l's drawn path. */
        double distance(int l, double x, double y) {
            return layout.paths().get(l).distance((x - originX) / scale, (originY - y) / scale) * scale;
        }
    }

    /** The drawing of {@code core}'s lines, as {@link #of} draws it. */
    static Drawing drawing(ExplicitMatroid core, List<int[]> lines) {
        ConfigurationLayout.Layout layout = ConfigurationLayout.of(core.size(), lines);
        double minX = Double.MAX_VALUE;
        double minY = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double maxY = -Double.MAX_VALUE;
        List<double[]> all = new ArrayList<>();
        all.addAll(List.of(layout.points()));
        for (ConfigurationLayout.Path path : layout.paths()) {
            all.addAll(List.of(path.samples()));
        }
        for (double[] p : all) {
            minX = Math.min(minX, p[0]);
            maxX = Math.max(maxX, p[0]);
            minY = Math.min(minY, p[1]);
            maxY = Math.max(maxY, p[1]);
        }
        double scale = PLOT / Math.max(1e-9, Math.max(maxX - minX, maxY - minY));
        double originX = (WIDTH - (maxX - minX) * scale) / 2 - minX * scale;
        double originY = MARGIN + maxY * scale;
        double[][] points = new double[core.size()][];
        Drawing d = new Drawing(layout, points, scale, originX, originY);
        for (int e = 0; e < points.length; e++) {
            points[e] = d.pixel(layout.points()[e][0], layout.points()[e][1]);
        }
        return d;
    }

    /** The picture of the rank-3 {@code core}; {@code lines} are its lines ({@link Cores#lines}). */
    public static Document.Picture of(ExplicitMatroid core, List<int[]> lines) {
        Drawing d = drawing(core, lines);
        double plotHeight = 0;
        for (ConfigurationLayout.Path path : d.layout().paths()) {
            for (double[] s : path.samples()) {
                plotHeight = Math.max(plotHeight, d.pixel(s[0], s[1])[1]);
            }
        }
        for (double[] p : d.points()) {
            plotHeight = Math.max(plotHeight, p[1]);
        }
        List<double[]> boxes = labelBoxes(d, core.labels());
        for (double[] box : boxes) {
            plotHeight = Math.max(plotHeight, box[3]);
        }
        int legendTop = (int) Math.ceil(plotHeight) + 30;
        int longest = 0;
        for (int[] line : lines) {
            longest = Math.max(longest, Cores.setText(core.labels(), line).length() + " (curved)".length());
        }
        // two legend columns when the entries fit in half the width (about 7 px a character at 12 px)
        int columns = 32 + 7 * longest < WIDTH / 2 - 20 ? 2 : 1;
        int rows = (lines.size() + columns - 1) / columns;
        // a legend entry longer than the drawing widens the picture instead of running off it
        Canvas svg = new Canvas(Math.max(WIDTH, 60 + 7 * longest), legendTop + ROW * (rows + 1) + 10);
        for (int l = 0; l < lines.size(); l++) {
            draw(svg, d, l);
        }
        for (double[] p : d.points()) {
            svg.circle(p[0], p[1], 5.5, "point", "black", "white");
        }
        for (int e = 0; e < boxes.size(); e++) {
            double[] box = boxes.get(e);
            svg.text((box[0] + box[2]) / 2, box[3] - 2, core.labels().get(e), "middle", LABEL_SIZE);
        }
        svg.text(20, legendTop, "Lines (colour, points; straight or curved):", "start", 12);
        for (int l = 0; l < lines.size(); l++) {
            double x = 20 + (l % columns) * (WIDTH / 2.0);
            double y = legendTop + ROW * (1 + l / columns);
            svg.polyline(new double[][] {{x, y - 4}, {x + 26, y - 4}}, "key", colour(l), 2.5, dashed(l));
            svg.text(x + 32, y, Cores.setText(core.labels(), lines.get(l)) + (d.layout().straight()[l] ? "" : " (curved)"),
                    "start", 12);
        }
        int curved = lines.size() - d.layout().straightCount();
        String caption = "The core as a configuration of " + core.size() + " points and " + lines.size() + " lines: "
                + d.layout().straightCount() + " drawn straight (points at exact rational coordinates, collinear exactly "
                + "where a line says so)" + (curved == 0 ? "." : ", " + curved + " drawn as a curve through its points "
                + "(the search found no placement with " + (curved == 1 ? "it" : "them") + " straight as well).");
        return new Document.Picture("configuration", caption, svg);
    }

    private static String colour(int l) {
        return Canvas.PALETTE[l % Canvas.PALETTE.length];
    }

    private static boolean dashed(int l) {
        return l / Canvas.PALETTE.length % 2 == 1;
    }

    private static void draw(Canvas svg, Drawing d, int l) {
        ConfigurationLayout.Path path = d.layout().paths().get(l);
        if (path instanceof ConfigurationLayout.Segment s) {
            double[] a = d.pixel(s.x1(), s.y1());
            double[] b = d.pixel(s.x2(), s.y2());
            svg.polyline(new double[][] {a, b}, "line", colour(l), 2.5, dashed(l));
            return;
        }
        double[][] points;
        double[][] controls;
        if (path instanceof ConfigurationLayout.Circle c) {
            // four quarter arcs, each a cubic Bézier with handles 0.5523 r (common practice)
            double h = 0.5523 * c.r();
            double[][] at = {{c.cx() + c.r(), c.cy()}, {c.cx(), c.cy() + c.r()}, {c.cx() - c.r(), c.cy()}, {c.cx(), c.cy() - c.r()}};
            double[][] tangent = {{0, 1}, {-1, 0}, {0, -1}, {1, 0}};
            points = new double[4][];
            controls = new double[4][];
            for (int i = 0; i < 4; i++) {
                int j = (i + 1) % 4;
                points[i] = d.pixel(at[i][0], at[i][1]);
                double[] c1 = d.pixel(at[i][0] + h * tangent[i][0], at[i][1] + h * tangent[i][1]);
                double[] c2 = d.pixel(at[j][0] - h * tangent[j][0], at[j][1] - h * tangent[j][1]);
                controls[i] = new double[] {c1[0], c1[1], c2[0], c2[1]};
            }
        } else {
            ConfigurationLayout.Spline s = (ConfigurationLayout.Spline) path;
            points = new double[s.points().length][];
            controls = new double[points.length][];
            for (int i = 0; i < points.length; i++) {
                points[i] = d.pixel(s.points()[i][0], s.points()[i][1]);
                double[] c = s.controls(i);
                double[] c1 = d.pixel(c[0], c[1]);
                double[] c2 = d.pixel(c[2], c[3]);
                controls[i] = new double[] {c1[0], c1[1], c2[0], c2[1]};
            }
        }
        svg.closedCurve(points, controls, "line", colour(l), 2.5, dashed(l));
    }

    /**
     * Each label's box {left, top, right, bottom} in pixels, placed in turn at the candidate
     * position with the lowest cost: overlapping a label already placed or a point is worst, a
     * box that a line's drawn path crosses (its overhang past the end points included) is next, a
     * position off the picture's left, right or top follows; then passing close to a line costs in
     * proportion, and a farther ring of positions a little more than a nearer one.
     */
    static List<double[]> labelBoxes(Drawing d, List<String> labels) {
        List<double[][]> paths = new ArrayList<>();
        for (int l = 0; l < d.layout().paths().size(); l++) {
            paths.add(pixelPath(d, l));
        }
        List<double[]> boxes = new ArrayList<>();
        for (int e = 0; e < labels.size(); e++) {
            double w = 7.5 * labels.get(e).length() + 2;
            double h = LABEL_SIZE;
            double[] best = null;
            double bestCost = Double.MAX_VALUE;
            for (int ring = 0; ring < RINGS; ring++) {
                for (int dir = 0; dir < DIRECTIONS; dir++) {
                    double angle = 2 * Math.PI * dir / DIRECTIONS;
                    double cx = d.points()[e][0] + Math.cos(angle) * (10 + RING_STEP * ring + w / 2);
                    double cy = d.points()[e][1] - Math.sin(angle) * (9 + RING_STEP * ring + h / 2);
                    double[] box = {cx - w / 2, cy - h / 2, cx + w / 2, cy + h / 2};
                    double cost = ring * 3 + dir * 0.01;
                    for (double[] other : boxes) {
                        cost += overlap(box, other) ? 1000 : 0;
                    }
                    for (double[] p : d.points()) {
                        cost += overlap(box, new double[] {p[0] - 6, p[1] - 6, p[0] + 6, p[1] + 6}) ? 1000 : 0;
                    }
                    // the stroke is 2.5 px wide: a path within 1.5 px of the box touches the text
                    double[] padded = {box[0] - 1.5, box[1] - 1.5, box[2] + 1.5, box[3] + 1.5};
                    for (int l = 0; l < paths.size(); l++) {
                        cost += crosses(paths.get(l), padded) ? 300 : Math.max(0, 12 - d.distance(l, cx, cy));
                    }
                    cost += box[0] < 0 || box[2] > WIDTH || box[1] < 0 ? 500 : 0;
                    if (cost < bestCost) {
                        bestCost = cost;
                        best = box;
                    }
                }
            }
            boxes.add(best);
        }
        return boxes;
    }

    /** Line l's drawn path in pixels as a polyline: a segment's two ends, or a closed curve's samples (first repeated). */
    static double[][] pixelPath(Drawing d, int l) {
        ConfigurationLayout.Path path = d.layout().paths().get(l);
        if (path instanceof ConfigurationLayout.Segment s) {
            return new double[][] {d.pixel(s.x1(), s.y1()), d.pixel(s.x2(), s.y2())};
        }
        double[][] samples = path.samples();
        double[][] out = new double[samples.length + 1][];
        for (int i = 0; i <= samples.length; i++) {
            double[] q = samples[i % samples.length];
            out[i] = d.pixel(q[0], q[1]);
        }
        return out;
    }

    /** Whether the polyline meets the box {left, top, right, bottom}: a piece clipped to it keeps some length (Liang–Barsky). */
    private static boolean crosses(double[][] polyline, double[] box) {
        for (int i = 0; i + 1 < polyline.length; i++) {
            double[] a = polyline[i];
            double dx = polyline[i + 1][0] - a[0];
            double dy = polyline[i + 1][1] - a[1];
            double[] p = {-dx, dx, -dy, dy};
            double[] q = {a[0] - box[0], box[2] - a[0], a[1] - box[1], box[3] - a[1]};
            double lo = 0;
            double hi = 1;
            boolean outside = false;
            for (int k = 0; k < 4 && !outside; k++) {
                if (p[k] == 0) {
                    outside = q[k] < 0;
                } else if (p[k] < 0) {
                    lo = Math.max(lo, q[k] / p[k]);
                } else {
                    hi = Math.min(hi, q[k] / p[k]);
                }
            }
            if (!outside && lo <= hi) {
                return true;
            }
        }
        return false;
    }

    private static boolean overlap(double[] a, double[] b) {
        return a[0] < b[2] && b[0] < a[2] && a[1] < b[3] && b[1] < a[3];
    }
}
