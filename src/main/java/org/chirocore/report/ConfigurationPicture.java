package org.chirocore.report;

import java.util.List;

/**
 * Draws a rank-3 core as a point–line configuration: its elements on a circle and each line
 * (maximal set of at least 3 collinear elements, {@link Core#lines}) as a polyline through its
 * points. The circular order is chosen to keep lines short: starting from the element order,
 * swaps of two positions are made while one shortens the total drawn length (a local optimum,
 * deterministic). Cost: O(k² · L · k) per improving round for k points and L lines.
 */
public final class ConfigurationPicture {
    private static final int SIZE = 480;
    private static final double RADIUS = 150;

    private ConfigurationPicture() {
    }

    /** The picture of {@code core}; throws {@link IllegalStateException} if its rank is not 3. */
    public static Document.Picture of(Core core) {
        List<Long> lines = core.lines();
        int k = core.labels().size();
        int[] position = new int[k];
        for (int e = 0; e < k; e++) {
            position[e] = e;
        }
        improve(position, lines);
        double[][] xy = new double[k][];
        for (int e = 0; e < k; e++) {
            xy[e] = point(position[e], k);
        }
        Svg svg = new Svg(SIZE, SIZE);
        for (int i = 0; i < lines.size(); i++) {
            svg.polyline(path(lines.get(i), position, xy), "line", Svg.PALETTE[i % Svg.PALETTE.length], 2.5);
        }
        for (int e = 0; e < k; e++) {
            svg.circle(xy[e][0], xy[e][1], 6, "point", "black", "white");
            double[] label = point(position[e], k, RADIUS + 14);
            double side = label[0] - SIZE / 2.0;
            svg.text(label[0], label[1] + 4, core.labels().get(e), side > 20 ? "start" : side < -20 ? "end" : "middle", 13);
        }
        String caption = "The core as a configuration of " + k + " points and " + lines.size()
                + " lines (each line drawn through its points; points on a circle only for layout).";
        return new Document.Picture("configuration", caption, svg.toSvg(caption));
    }

    private static double[] point(int position, int k) {
        return point(position, k, RADIUS);
    }

    private static double[] point(int position, int k, double radius) {
        double angle = 2 * Math.PI * position / k - Math.PI / 2;
        return new double[] {SIZE / 2.0 + radius * Math.cos(angle), SIZE / 2.0 + radius * Math.sin(angle)};
    }

    /**
     * A line's points in circular order, starting after the largest gap, so that the polyline
     * never wraps across the circle's widest empty arc.
     */
    private static double[][] path(long line, int[] position, double[][] xy) {
        int k = position.length;
        int[] elementAt = new int[k];
        for (int e = 0; e < k; e++) {
            elementAt[position[e]] = e;
        }
        int[] onLine = new int[Long.bitCount(line)];
        int n = 0;
        for (int p = 0; p < k; p++) {
            if ((line >>> elementAt[p] & 1) != 0) {
                onLine[n++] = p;
            }
        }
        int start = 0;
        int widest = -1;
        for (int i = 0; i < n; i++) {
            int gap = Math.floorMod(onLine[(i + 1) % n] - onLine[i], k);
            if (gap > widest) {
                widest = gap;
                start = (i + 1) % n;
            }
        }
        double[][] out = new double[n][];
        for (int i = 0; i < n; i++) {
            out[i] = xy[elementAt[onLine[(start + i) % n]]];
        }
        return out;
    }

    private static double length(int[] position, List<Long> lines) {
        int k = position.length;
        double[][] xy = new double[k][];
        for (int e = 0; e < k; e++) {
            xy[e] = point(position[e], k);
        }
        double total = 0;
        for (long line : lines) {
            double[][] p = path(line, position, xy);
            for (int i = 1; i < p.length; i++) {
                total += Math.hypot(p[i][0] - p[i - 1][0], p[i][1] - p[i - 1][1]);
            }
        }
        return total;
    }

    private static void improve(int[] position, List<Long> lines) {
        double best = length(position, lines);
        boolean improved = true;
        while (improved) {
            improved = false;
            for (int a = 0; a < position.length; a++) {
                for (int b = a + 1; b < position.length; b++) {
                    swap(position, a, b);
                    double l = length(position, lines);
                    if (l < best - 1e-9) {
                        best = l;
                        improved = true;
                    } else {
                        swap(position, a, b);
                    }
                }
            }
        }
    }

    private static void swap(int[] position, int a, int b) {
        int t = position[a];
        position[a] = position[b];
        position[b] = t;
    }
}
