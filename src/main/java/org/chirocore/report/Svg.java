package org.chirocore.report;

import java.util.Locale;

/**
 * A small SVG writer: elements appended in order to one {@code <svg>} element with a white
 * background. Coordinates are doubles rounded to 0.1 (layout only; nothing is decided by them).
 */
final class Svg {
    /** A colour-blind-safe palette (Okabe–Ito), used in turn for lines and series. */
    static final String[] PALETTE = {"#0072B2", "#E69F00", "#009E73", "#CC79A7", "#D55E00", "#56B4E9", "#F0E442", "#000000"};

    private final StringBuilder body = new StringBuilder();
    private final int width;
    private final int height;

    Svg(int width, int height) {
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

    Svg line(double x1, double y1, double x2, double y2, String cls, String stroke, double strokeWidth) {
        body.append("<line class=\"").append(cls).append("\" x1=\"").append(num(x1)).append("\" y1=\"").append(num(y1))
                .append("\" x2=\"").append(num(x2)).append("\" y2=\"").append(num(y2)).append("\" stroke=\"").append(stroke)
                .append("\" stroke-width=\"").append(num(strokeWidth)).append("\" />\n");
        return this;
    }

    Svg polyline(double[][] points, String cls, String stroke, double strokeWidth) {
        body.append("<polyline class=\"").append(cls).append("\" fill=\"none\" stroke=\"").append(stroke)
                .append("\" stroke-width=\"").append(num(strokeWidth)).append("\" stroke-linejoin=\"round\" points=\"");
        for (int i = 0; i < points.length; i++) {
            body.append(i == 0 ? "" : " ").append(num(points[i][0])).append(',').append(num(points[i][1]));
        }
        body.append("\" />\n");
        return this;
    }

    Svg circle(double x, double y, double r, String cls, String fill, String stroke) {
        body.append("<circle class=\"").append(cls).append("\" cx=\"").append(num(x)).append("\" cy=\"").append(num(y))
                .append("\" r=\"").append(num(r)).append("\" fill=\"").append(fill).append("\" stroke=\"").append(stroke)
                .append("\" stroke-width=\"1.5\" />\n");
        return this;
    }

    Svg rect(double x, double y, double w, double h, String cls, String fill) {
        body.append("<rect class=\"").append(cls).append("\" x=\"").append(num(x)).append("\" y=\"").append(num(y))
                .append("\" width=\"").append(num(w)).append("\" height=\"").append(num(h)).append("\" fill=\"").append(fill)
                .append("\" />\n");
        return this;
    }

    /** A diamond (a square turned by 45°) of half-diagonal {@code r}. */
    Svg diamond(double x, double y, double r, String cls, String fill) {
        body.append("<polygon class=\"").append(cls).append("\" fill=\"").append(fill).append("\" points=\"")
                .append(num(x)).append(',').append(num(y - r)).append(' ').append(num(x + r)).append(',').append(num(y)).append(' ')
                .append(num(x)).append(',').append(num(y + r)).append(' ').append(num(x - r)).append(',').append(num(y))
                .append("\" />\n");
        return this;
    }

    /** Text anchored at (x, y); {@code anchor} is start, middle or end. */
    Svg text(double x, double y, String text, String anchor, int size) {
        body.append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y)).append("\" text-anchor=\"").append(anchor)
                .append("\" font-family=\"sans-serif\" font-size=\"").append(size).append("\">").append(escape(text))
                .append("</text>\n");
        return this;
    }

    /** The {@code <svg>} element, with {@code title} as its accessible title. */
    String toSvg(String title) {
        return "<svg width=\"" + width + "\" height=\"" + height + "\" viewBox=\"0 0 " + width + " " + height
                + "\" role=\"img\">\n<title>" + escape(title) + "</title>\n<rect x=\"0\" y=\"0\" width=\"" + width
                + "\" height=\"" + height + "\" fill=\"white\" />\n" + body + "</svg>";
    }
}
