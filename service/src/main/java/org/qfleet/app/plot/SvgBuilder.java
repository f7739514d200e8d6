package org.qfleet.app.plot;

import java.util.Map;

/**
 * Writes SVG 1.1 markup by hand: a few element kinds, coordinates rounded to 0.01 px, text
 * escaped for XML. Elements with non-finite coordinates are left out rather than written broken.
 * The plot files are standalone documents ({@link #standalone}); the status page's charts are
 * elements inside its HTML ({@link #inline}).
 */
public final class SvgBuilder {

    private final StringBuilder svg = new StringBuilder(64 * 1024);

    private SvgBuilder() {
    }

    /** A standalone SVG document with its own style sheet and a white background. */
    public static SvgBuilder standalone(int width, int height, String style) {
        SvgBuilder b = new SvgBuilder();
        b.svg.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
                .append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(width)
                .append("\" height=\"").append(height).append("\" viewBox=\"0 0 ").append(width).append(' ')
                .append(height).append("\">\n<style>").append(style).append("</style>\n")
                .append("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>\n");
        return b;
    }

    /**
     * An {@code svg} element to place inside an HTML page, styled by the page.
     *
     * @param attributes extra attributes of the {@code svg} element (values are escaped)
     * @param label      what the chart shows, for its {@code title}
     */
    public static SvgBuilder inline(int width, int height, Map<String, String> attributes, String label) {
        SvgBuilder b = new SvgBuilder();
        b.svg.append("<svg xmlns=\"http://www.w3.org/2000/svg\"");
        attributes.forEach((name, value) -> b.svg.append(' ').append(name).append("=\"").append(escape(value)).append('"'));
        b.svg.append(" width=\"").append(width).append("\" height=\"").append(height).append("\" viewBox=\"0 0 ")
                .append(width).append(' ').append(height).append("\" role=\"img\">\n<title>").append(escape(label))
                .append("</title>\n");
        return b;
    }

    SvgBuilder clipRect(String id, double x, double y, double w, double h) {
        svg.append("<clipPath id=\"").append(id).append("\"><rect");
        attr("x", x).attr("y", y).attr("width", w).attr("height", h);
        svg.append("/></clipPath>\n");
        return this;
    }

    SvgBuilder openGroup(String cssClass, String clipId) {
        svg.append("<g class=\"").append(cssClass).append('"');
        if (clipId != null) {
            svg.append(" clip-path=\"url(#").append(clipId).append(")\"");
        }
        svg.append(">\n");
        return this;
    }

    SvgBuilder closeGroup() {
        svg.append("</g>\n");
        return this;
    }

    public SvgBuilder line(double x1, double y1, double x2, double y2, String cssClass) {
        if (finite(x1, y1, x2, y2)) {
            svg.append("<line class=\"").append(cssClass).append('"');
            attr("x1", x1).attr("y1", y1).attr("x2", x2).attr("y2", y2);
            svg.append("/>\n");
        }
        return this;
    }

    public SvgBuilder rect(double x, double y, double w, double h, String cssClass) {
        if (finite(x, y, w, h)) {
            svg.append("<rect class=\"").append(cssClass).append('"');
            attr("x", x).attr("y", y).attr("width", w).attr("height", h);
            svg.append("/>\n");
        }
        return this;
    }

    public SvgBuilder circle(double cx, double cy, double r, String cssClass) {
        if (finite(cx, cy, r, 0)) {
            svg.append("<circle class=\"").append(cssClass).append('"');
            attr("cx", cx).attr("cy", cy).attr("r", r);
            svg.append("/>\n");
        }
        return this;
    }

    /** A connected line through the points; non-finite points are skipped, and with none left, the line. */
    public SvgBuilder polyline(double[] xs, double[] ys, String cssClass) {
        int start = svg.length();
        svg.append("<polyline class=\"").append(cssClass).append("\" points=\"");
        int pointsStart = svg.length();
        for (int i = 0; i < xs.length; i++) {
            if (finite(xs[i], ys[i], 0, 0)) {
                number(xs[i]).append(',');
                number(ys[i]).append(' ');
            }
        }
        if (svg.length() == pointsStart) {
            svg.setLength(start);
            return this;
        }
        svg.append("\"/>\n");
        return this;
    }

    public SvgBuilder text(double x, double y, String anchor, String cssClass, String content) {
        if (finite(x, y, 0, 0)) {
            svg.append("<text class=\"").append(cssClass).append("\" text-anchor=\"").append(anchor).append('"');
            attr("x", x).attr("y", y);
            svg.append('>').append(escape(content)).append("</text>\n");
        }
        return this;
    }

    /** Two lines of text, one element: {@code lead} in bold (class {@code strong}), {@code rest} below it. */
    SvgBuilder textTwoLines(double x, double y, double lineHeight, String cssClass, String lead, String rest) {
        svg.append("<text class=\"").append(cssClass).append('"');
        attr("x", x).attr("y", y);
        svg.append("><tspan class=\"strong\">").append(escape(lead)).append("</tspan><tspan");
        attr("x", x).attr("dy", lineHeight);
        svg.append('>').append(escape(rest)).append("</tspan></text>\n");
        return this;
    }

    /** Text turned 90 degrees counter-clockwise about its anchor, for vertical axis titles. */
    public SvgBuilder verticalText(double x, double y, String cssClass, String content) {
        svg.append("<text class=\"").append(cssClass).append("\" text-anchor=\"middle\" transform=\"rotate(-90 ");
        number(x).append(' ');
        number(y).append(")\"");
        attr("x", x).attr("y", y);
        svg.append('>').append(escape(content)).append("</text>\n");
        return this;
    }

    public String finish() {
        return svg.append("</svg>\n").toString();
    }

    /** Escapes XML markup characters and drops characters XML 1.0 does not allow; null gives "". */
    public static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder out = new StringBuilder(text.length() + 16);
        text.codePoints().forEach(c -> {
            switch (c) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                case '\'' -> out.append("&apos;");
                default -> {
                    if (allowedInXml(c)) {
                        out.appendCodePoint(c);
                    }
                }
            }
        });
        return out.toString();
    }

    /** The Char production of XML 1.0 (W3C Recommendation, section 2.2). */
    private static boolean allowedInXml(int c) {
        return c == 0x9 || c == 0xA || c == 0xD
                || (c >= 0x20 && c <= 0xD7FF)
                || (c >= 0xE000 && c <= 0xFFFD)
                || (c >= 0x10000 && c <= 0x10FFFF);
    }

    private SvgBuilder attr(String name, double value) {
        svg.append(' ').append(name).append("=\"");
        number(value).append('"');
        return this;
    }

    private StringBuilder number(double value) {
        double rounded = Math.round(value * 100) / 100.0;
        if (rounded == Math.rint(rounded) && Math.abs(rounded) < 1e9) {
            return svg.append((long) rounded);
        }
        return svg.append(rounded);
    }

    private static boolean finite(double a, double b, double c, double d) {
        return Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d);
    }
}
