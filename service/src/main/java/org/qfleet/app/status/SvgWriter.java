package org.qfleet.app.status;

import java.util.Locale;
import java.util.Map;

/**
 * Writes one inline SVG chart of the status page: an {@code svg} element in the SVG namespace,
 * coordinates rounded to 0.1 px, every text escaped. Elements with non-finite coordinates are left
 * out rather than written broken.
 */
final class SvgWriter {

    private final StringBuilder out = new StringBuilder(16 * 1024);

    /**
     * @param attributes extra attributes of the {@code svg} element (values are escaped)
     * @param label      what the chart shows, for its {@code title}
     */
    SvgWriter(int width, int height, Map<String, String> attributes, String label) {
        out.append("<svg xmlns=\"http://www.w3.org/2000/svg\"");
        attributes.forEach((name, value) -> out.append(' ').append(name).append("=\"").append(Html.escape(value)).append('"'));
        out.append(" width=\"").append(width).append("\" height=\"").append(height).append("\" viewBox=\"0 0 ")
                .append(width).append(' ').append(height).append("\" role=\"img\">\n<title>").append(Html.escape(label))
                .append("</title>\n");
    }

    SvgWriter line(double x1, double y1, double x2, double y2, String cssClass) {
        if (finite(x1, y1, x2, y2)) {
            out.append("<line class=\"").append(cssClass).append('"');
            attr("x1", x1).attr("y1", y1).attr("x2", x2).attr("y2", y2);
            out.append("/>\n");
        }
        return this;
    }

    SvgWriter rect(double x, double y, double w, double h, String cssClass) {
        if (finite(x, y, w, h)) {
            out.append("<rect class=\"").append(cssClass).append('"');
            attr("x", x).attr("y", y).attr("width", w).attr("height", h);
            out.append("/>\n");
        }
        return this;
    }

    SvgWriter circle(double cx, double cy, double r, String cssClass) {
        if (finite(cx, cy, r, 0)) {
            out.append("<circle class=\"").append(cssClass).append('"');
            attr("cx", cx).attr("cy", cy).attr("r", r);
            out.append("/>\n");
        }
        return this;
    }

    /** A line through the points with finite coordinates; nothing when there are none. */
    SvgWriter polyline(double[] xs, double[] ys, String cssClass) {
        StringBuilder points = new StringBuilder(xs.length * 12);
        for (int i = 0; i < xs.length; i++) {
            if (finite(xs[i], ys[i], 0, 0)) {
                points.append(points.length() == 0 ? "" : " ").append(number(xs[i])).append(',').append(number(ys[i]));
            }
        }
        if (points.length() > 0) {
            out.append("<polyline class=\"").append(cssClass).append("\" points=\"").append(points).append("\"/>\n");
        }
        return this;
    }

    SvgWriter text(double x, double y, String anchor, String cssClass, String content) {
        if (finite(x, y, 0, 0)) {
            out.append("<text class=\"").append(cssClass).append("\" text-anchor=\"").append(anchor).append('"');
            attr("x", x).attr("y", y);
            out.append('>').append(Html.escape(content)).append("</text>\n");
        }
        return this;
    }

    /** Text turned 90 degrees counter-clockwise about its anchor, for vertical axis titles. */
    SvgWriter verticalText(double x, double y, String cssClass, String content) {
        out.append("<text class=\"").append(cssClass).append("\" text-anchor=\"middle\" transform=\"rotate(-90 ")
                .append(number(x)).append(' ').append(number(y)).append(")\"");
        attr("x", x).attr("y", y);
        out.append('>').append(Html.escape(content)).append("</text>\n");
        return this;
    }

    String finish() {
        return out.append("</svg>").toString();
    }

    private SvgWriter attr(String name, double value) {
        out.append(' ').append(name).append("=\"").append(number(value)).append('"');
        return this;
    }

    private static String number(double value) {
        double rounded = Math.round(value * 10) / 10.0;
        return rounded == Math.rint(rounded) ? Long.toString((long) rounded) : String.format(Locale.ROOT, "%.1f", rounded);
    }

    private static boolean finite(double a, double b, double c, double d) {
        return Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c) && Double.isFinite(d);
    }
}
