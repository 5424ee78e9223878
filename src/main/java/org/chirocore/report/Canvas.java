package org.chirocore.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A picture as a list of shapes in pixel coordinates (y downwards), rendered as an SVG element
 * for HTML and Markdown and as a TikZ picture for LaTeX. Coordinates are doubles rounded to 0.1
 * (layout only; nothing is decided by them).
 */
final class Canvas {
    /** A colour-blind-safe palette (Okabe–Ito), used in turn for lines and series. */
    static final String[] PALETTE = {"#0072B2", "#E69F00", "#009E73", "#CC79A7", "#D55E00", "#56B4E9", "#000000", "#999999"};

    /** Width of the widest TikZ picture, in pt: below a plain article's 345 pt text width. */
    private static final double TEX_WIDTH = 320;

    /** A shape, drawn in both formats. */
    private interface Shape {
        String svg();

        String tikz();
    }

    private final List<Shape> shapes = new ArrayList<>();
    private final int width;
    private final int height;

    Canvas(int width, int height) {
        this.width = width;
        this.height = height;
    }

    /** Formats a coordinate with one decimal, independent of the locale. */
    static String num(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }

    /** Escapes text for XML character data and attribute values. */
    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }

    Canvas line(double x1, double y1, double x2, double y2, String cls, String stroke, double strokeWidth) {
        return polyline(new double[][] {{x1, y1}, {x2, y2}}, cls, stroke, strokeWidth);
    }

    Canvas polyline(double[][] points, String cls, String stroke, double strokeWidth) {
        return polyline(points, cls, stroke, strokeWidth, false);
    }

    /** A polyline, dashed when {@code dashed}: the second round of the palette is dashed. */
    Canvas polyline(double[][] points, String cls, String stroke, double strokeWidth, boolean dashed) {
        StringBuilder svg = new StringBuilder();
        StringBuilder tikz = new StringBuilder();
        for (int i = 0; i < points.length; i++) {
            svg.append(i == 0 ? "" : " ").append(num(points[i][0])).append(',').append(num(points[i][1]));
            tikz.append(i == 0 ? "" : " -- ").append(point(points[i][0], points[i][1]));
        }
        String tag = points.length == 2 ? "<line class=\"" + cls + "\" x1=\"" + num(points[0][0]) + "\" y1=\"" + num(points[0][1])
                + "\" x2=\"" + num(points[1][0]) + "\" y2=\"" + num(points[1][1]) + "\""
                : "<polyline class=\"" + cls + "\" fill=\"none\" stroke-linejoin=\"round\" points=\"" + svg + "\"";
        return add(tag + " stroke=\"" + stroke + "\" stroke-width=\"" + num(strokeWidth) + "\"" + dash(dashed, true) + " />",
                "\\draw[" + stroke("draw", stroke) + ", line width=" + num(strokeWidth * scale()) + "pt" + dash(dashed, false)
                        + "] " + tikz + ";");
    }

    /**
     * A closed smooth curve of cubic Bézier pieces: piece i runs from {@code points[i]} with the
     * control points {@code controls[i][0..1]} and {@code controls[i][2..3]} to the next point.
     */
    Canvas closedCurve(double[][] points, double[][] controls, String cls, String stroke, double strokeWidth, boolean dashed) {
        StringBuilder d = new StringBuilder("M " + num(points[0][0]) + " " + num(points[0][1]));
        StringBuilder tikz = new StringBuilder(point(points[0][0], points[0][1]));
        for (int i = 0; i < points.length; i++) {
            double[] c = controls[i];
            double[] to = points[(i + 1) % points.length];
            d.append(" C ").append(num(c[0])).append(' ').append(num(c[1])).append(' ').append(num(c[2])).append(' ')
                    .append(num(c[3])).append(' ').append(num(to[0])).append(' ').append(num(to[1]));
            tikz.append(" .. controls ").append(point(c[0], c[1])).append(" and ").append(point(c[2], c[3])).append(" .. ")
                    .append(i == points.length - 1 ? "cycle" : point(to[0], to[1]));
        }
        return add("<path class=\"" + cls + "\" fill=\"none\" d=\"" + d + " Z\" stroke=\"" + stroke + "\" stroke-width=\""
                + num(strokeWidth) + "\"" + dash(dashed, true) + " />",
                "\\draw[" + stroke("draw", stroke) + ", line width=" + num(strokeWidth * scale()) + "pt" + dash(dashed, false)
                        + "] " + tikz + ";");
    }

    Canvas circle(double x, double y, double r, String cls, String fill, String stroke) {
        return circle(x, y, r, cls, fill, stroke, 1.5);
    }

    Canvas circle(double x, double y, double r, String cls, String fill, String stroke, double strokeWidth) {
        return add("<circle class=\"" + cls + "\" cx=\"" + num(x) + "\" cy=\"" + num(y) + "\" r=\"" + num(r) + "\" fill=\""
                + fill + "\" stroke=\"" + stroke + "\" stroke-width=\"" + num(strokeWidth) + "\" />",
                "\\path[" + stroke("fill", fill) + ", " + stroke("draw", stroke) + ", line width=" + num(strokeWidth * scale())
                        + "pt] " + point(x, y) + " circle[radius=" + num(r) + "];");
    }

    Canvas rect(double x, double y, double w, double h, String cls, String fill) {
        return add("<rect class=\"" + cls + "\" x=\"" + num(x) + "\" y=\"" + num(y) + "\" width=\"" + num(w) + "\" height=\""
                + num(h) + "\" fill=\"" + fill + "\" />",
                "\\fill[" + stroke("fill", fill) + "] " + point(x, y) + " rectangle " + point(x + w, y + h) + ";");
    }

    /** A diamond (a square turned by 45°) of half-diagonal {@code r}. */
    Canvas diamond(double x, double y, double r, String cls, String fill) {
        return add("<polygon class=\"" + cls + "\" fill=\"" + fill + "\" points=\"" + num(x) + "," + num(y - r) + " "
                + num(x + r) + "," + num(y) + " " + num(x) + "," + num(y + r) + " " + num(x - r) + "," + num(y) + "\" />",
                "\\fill[" + stroke("fill", fill) + "] " + point(x, y - r) + " -- " + point(x + r, y) + " -- " + point(x, y + r)
                        + " -- " + point(x - r, y) + " -- cycle;");
    }

    /** Text with its baseline at y, anchored at x; {@code anchor} is start, middle or end. */
    Canvas text(double x, double y, String text, String anchor, int size) {
        String tikzAnchor = switch (anchor) {
            case "start" -> "base west";
            case "end" -> "base east";
            default -> "base";
        };
        return add("<text x=\"" + num(x) + "\" y=\"" + num(y) + "\" text-anchor=\"" + anchor
                + "\" font-family=\"sans-serif\" font-size=\"" + size + "\">" + escape(text) + "</text>",
                "\\node[anchor=" + tikzAnchor + ", inner sep=0pt, font=\\sffamily" + (size * scale() < 6 ? "\\tiny" : "\\scriptsize")
                        + "] at " + point(x, y) + " {" + ReportFormat.TEX.text(text) + "};");
    }

    /** The {@code <svg>} element, with {@code title} as its accessible title. */
    String toSvg(String title) {
        StringBuilder body = new StringBuilder();
        for (Shape s : shapes) {
            body.append(s.svg()).append('\n');
        }
        return "<svg width=\"" + width + "\" height=\"" + height + "\" viewBox=\"0 0 " + width + " " + height
                + "\" role=\"img\">\n<title>" + escape(title) + "</title>\n<rect x=\"0\" y=\"0\" width=\"" + width
                + "\" height=\"" + height + "\" fill=\"white\" />\n" + body + "</svg>";
    }

    /** A {@code tikzpicture} at most {@value #TEX_WIDTH} pt wide (needs the tikz package). */
    String toTikz() {
        StringBuilder out = new StringBuilder("\\begin{tikzpicture}[x=" + num(scale()) + "pt, y=-" + num(scale()) + "pt]\n");
        out.append("\\useasboundingbox (0,0) rectangle (").append(width).append(',').append(height).append(");\n");
        for (Shape s : shapes) {
            out.append(s.tikz()).append('\n');
        }
        return out.append("\\end{tikzpicture}").toString();
    }

    /** pt per pixel in the TikZ picture. */
    private double scale() {
        return Math.min(0.7, TEX_WIDTH / width);
    }

    private static String dash(boolean dashed, boolean svg) {
        return !dashed ? "" : svg ? " stroke-dasharray=\"8 4\"" : ", dashed";
    }

    private static String point(double x, double y) {
        return "(" + num(x) + "," + num(y) + ")";
    }

    /** A TikZ colour option: {@code draw=...} or {@code fill=...}, or {@code draw=none}. */
    private static String stroke(String key, String colour) {
        if (colour.startsWith("#") && colour.length() == 7) {
            int rgb = Integer.parseInt(colour.substring(1), 16);
            return key + "={rgb,255:red," + (rgb >> 16) + ";green," + (rgb >> 8 & 0xff) + ";blue," + (rgb & 0xff) + "}";
        }
        return key + "=" + colour;
    }

    private Canvas add(String svg, String tikz) {
        shapes.add(new Shape() {
            @Override
            public String svg() {
                return svg;
            }

            @Override
            public String tikz() {
                return tikz;
            }
        });
        return this;
    }
}
