package org.chirocore.report;

import java.util.List;

/**
 * A line chart of one or more series of (x, y) points with integer x, drawn as SVG with axes,
 * ticks at every x and at "nice" y steps (1, 2 or 5 times a power of ten) from 0, and a legend
 * when there is more than one series.
 */
public final class LineChart {
    private static final int WIDTH = 520;
    private static final int HEIGHT = 320;
    private static final int LEFT = 70;
    private static final int RIGHT = 20;
    private static final int TOP = 40;
    private static final int BOTTOM = 50;

    private LineChart() {
    }

    /**
     * One series.
     *
     * @param name the legend text
     * @param points (x, y) pairs, x increasing
     */
    public record Series(String name, List<long[]> points) {
        public Series {
            points = points.stream().map(long[]::clone).toList();
        }
    }

    /**
     * The chart.
     *
     * @param name the picture's file-name-safe name
     * @param title the chart's title (also its caption)
     * @throws IllegalArgumentException when there is no point at all
     */
    public static Document.Picture of(String name, String title, String xLabel, String yLabel, List<Series> series) {
        List<long[]> all = series.stream().flatMap(s -> s.points().stream()).toList();
        if (all.isEmpty()) {
            throw new IllegalArgumentException("A chart needs at least one point: \"" + title + "\" has none.");
        }
        long minX = all.stream().mapToLong(p -> p[0]).min().orElseThrow();
        long maxX = all.stream().mapToLong(p -> p[0]).max().orElseThrow();
        long step = niceStep(Math.max(1, all.stream().mapToLong(p -> p[1]).max().orElseThrow()));
        long maxY = step * Math.max(1, (all.stream().mapToLong(p -> p[1]).max().orElseThrow() + step - 1) / step);
        double plotW = WIDTH - LEFT - RIGHT;
        double plotH = HEIGHT - TOP - BOTTOM;
        double spanX = Math.max(1, maxX - minX);
        Canvas svg = new Canvas(WIDTH, HEIGHT);
        svg.text(WIDTH / 2.0, 22, title, "middle", 14);
        svg.line(LEFT, TOP + plotH, LEFT + plotW, TOP + plotH, "axis", "black", 1);
        svg.line(LEFT, TOP, LEFT, TOP + plotH, "axis", "black", 1);
        for (long x = minX; x <= maxX; x++) {
            double px = LEFT + (x - minX) / spanX * plotW;
            svg.line(px, TOP + plotH, px, TOP + plotH + 5, "tick", "black", 1).text(px, TOP + plotH + 18, Long.toString(x), "middle", 11);
        }
        for (long y = 0; y <= maxY; y += step) {
            double py = TOP + plotH - (double) y / maxY * plotH;
            svg.line(LEFT - 5, py, LEFT, py, "tick", "black", 1).line(LEFT, py, LEFT + plotW, py, "grid", "#eeeeee", 1)
                    .text(LEFT - 8, py + 4, Long.toString(y), "end", 11);
        }
        svg.text(LEFT + plotW / 2, HEIGHT - 10, xLabel, "middle", 12).text(14, TOP - 12, yLabel, "start", 12);
        for (int s = 0; s < series.size(); s++) {
            String colour = Canvas.PALETTE[s % Canvas.PALETTE.length];
            List<long[]> points = series.get(s).points();
            double[][] xy = new double[points.size()][];
            for (int i = 0; i < xy.length; i++) {
                xy[i] = new double[] {LEFT + (points.get(i)[0] - minX) / spanX * plotW,
                    TOP + plotH - (double) points.get(i)[1] / maxY * plotH};
            }
            svg.polyline(xy, "series", colour, 2);
            for (double[] p : xy) {
                svg.circle(p[0], p[1], 3, "datum", colour, colour);
            }
            if (series.size() > 1) {
                svg.rect(LEFT + plotW - 130, TOP + 6 + 16 * s, 12, 3, "key", colour)
                        .text(LEFT + plotW - 112, TOP + 11 + 16 * s, series.get(s).name(), "start", 11);
            }
        }
        return new Document.Picture(name, title, svg);
    }

    /** The smallest of 1, 2, 5, 10, 20, … that divides [0, max] into at most 8 steps. */
    static long niceStep(long max) {
        long power = 1;
        while (true) {
            for (long m : new long[] {1, 2, 5}) {
                if (m * power * 8 >= max) {
                    return m * power;
                }
            }
            power *= 10;
        }
    }
}
