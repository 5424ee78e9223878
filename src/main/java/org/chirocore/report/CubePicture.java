package org.chirocore.report;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Draws the n-cube of a construction (n ≤ {@value #MAX_CUBE}) with H, −H (the reflection
 * x ↦ 1 − x of H), O and the core's vertices marked. Vertex v is projected to
 * Σ v_i · ℓ_i (cos πi/n, sin πi/n), directions spread over a half-turn as in a Petrie
 * projection; the lengths ℓ_i = 1 + i/(2n) differ slightly so that no two vertices coincide (with
 * equal lengths 101 and 010 of the 3-cube would). Cost: O(n · 2^n).
 */
public final class CubePicture {
    /** Largest cube drawn. */
    public static final int MAX_CUBE = 5;
    private static final int SIZE = 460;
    private static final int LEGEND = 110;

    private CubePicture() {
    }

    /**
     * The picture of the cube of {@code construction}, marking the vertices in {@code coreLabels}.
     *
     * @throws IllegalArgumentException when n exceeds {@value #MAX_CUBE}
     */
    public static Document.Picture of(Origin.Construction construction, List<String> coreLabels) {
        int n = construction.cube();
        if (n < 1 || n > MAX_CUBE) {
            throw new IllegalArgumentException("The cube is drawn for 1 <= n <= " + MAX_CUBE + " only, but n = " + n + ".");
        }
        double[][] xy = layout(n);
        Canvas svg = new Canvas(SIZE, SIZE + LEGEND);
        for (int v = 0; v < 1 << n; v++) {
            for (int i = 0; i < n; i++) {
                int w = v | 1 << i;
                if (w != v) {
                    svg.line(xy[v][0], xy[v][1], xy[w][0], xy[w][1], "edge", "#bbbbbb", 1);
                }
            }
        }
        Set<String> h = new HashSet<>(construction.hyperplane());
        Set<String> minusH = new HashSet<>();
        h.forEach(v -> minusH.add(reflect(v)));
        Set<String> core = new HashSet<>(coreLabels);
        for (int v = 0; v < 1 << n; v++) {
            String label = label(v, n);
            double x = xy[v][0];
            double y = xy[v][1];
            if (core.contains(label)) {
                svg.circle(x, y, 11, "core", "none", "black");
            }
            if (minusH.contains(label)) {
                svg.rect(x - 6, y - 6, 12, 12, "minus-h", Canvas.PALETTE[1]);
            }
            if (h.contains(label)) {
                svg.circle(x, y, 6, "h", Canvas.PALETTE[0], "white");
            }
            if (label.equals(construction.pulled())) {
                svg.diamond(x, y, 8, "pulled", Canvas.PALETTE[4]);
            }
            svg.circle(x, y, 2, "vertex", "black", "none");
            if (n <= 4) {
                svg.text(x + 9, y - 8, label, "start", 10);
            }
        }
        legend(svg);
        String caption = "The " + n + "-cube (edges grey) with H, -H (the reflection x -> 1 - x of H), the pulled vertex O "
                + construction.pulled() + " and the core's vertices marked.";
        return new Document.Picture("cube", caption, svg);
    }

    private static void legend(Canvas svg) {
        double y = SIZE + 10;
        svg.circle(20, y + 10, 6, "h", Canvas.PALETTE[0], "white").text(34, y + 14, "H (vertices of the hyperplane)", "start", 12);
        svg.rect(14, y + 29, 12, 12, "minus-h", Canvas.PALETTE[1]).text(34, y + 39, "-H (reflection of H)", "start", 12);
        svg.diamond(20, y + 60, 8, "pulled", Canvas.PALETTE[4]).text(34, y + 64, "O (pulled vertex)", "start", 12);
        svg.circle(20, y + 85, 11, "core", "none", "black").text(34, y + 89, "vertex of the core", "start", 12);
    }

    /** Vertex v's label: coordinate 1 first, bit i of v being coordinate i + 1. */
    static String label(int v, int n) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < n; i++) {
            s.append(v >>> i & 1);
        }
        return s.toString();
    }

    private static String reflect(String label) {
        StringBuilder s = new StringBuilder();
        for (char c : label.toCharArray()) {
            s.append(c == '0' ? '1' : '0');
        }
        return s.toString();
    }

    /** The projected vertices, scaled and centred into the picture. */
    static double[][] layout(int n) {
        double[][] xy = new double[1 << n][2];
        for (int v = 0; v < 1 << n; v++) {
            for (int i = 0; i < n; i++) {
                if ((v >>> i & 1) != 0) {
                    double length = 1 + i / (2.0 * n);
                    xy[v][0] += length * Math.cos(Math.PI * i / n);
                    xy[v][1] -= length * Math.sin(Math.PI * i / n);
                }
            }
        }
        double minX = Double.MAX_VALUE, maxX = -Double.MAX_VALUE, minY = Double.MAX_VALUE, maxY = -Double.MAX_VALUE;
        for (double[] p : xy) {
            minX = Math.min(minX, p[0]);
            maxX = Math.max(maxX, p[0]);
            minY = Math.min(minY, p[1]);
            maxY = Math.max(maxY, p[1]);
        }
        double margin = 40;
        double scale = (SIZE - 2 * margin) / Math.max(Math.max(maxX - minX, maxY - minY), 1e-9);
        for (double[] p : xy) {
            p[0] = margin + (p[0] - minX) * scale + (SIZE - 2 * margin - (maxX - minX) * scale) / 2;
            p[1] = margin + (p[1] - minY) * scale + (SIZE - 2 * margin - (maxY - minY) * scale) / 2;
        }
        return xy;
    }
}
