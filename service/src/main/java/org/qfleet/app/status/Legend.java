package org.qfleet.app.status;

import org.qfleet.app.plot.SvgBuilder;

/** A row of legend entries across the top of a chart: a short sample of each line and its name. */
final class Legend {

    private static final double SAMPLE = 18;
    private static final double CHAR_WIDTH = 6.6;

    private final SvgBuilder svg;
    private final double y;
    private double x;

    Legend(SvgBuilder svg, double x, double y) {
        this.svg = svg;
        this.x = x;
        this.y = y;
    }

    Legend entry(String lineClass, String name) {
        svg.line(x, y - 4, x + SAMPLE, y - 4, lineClass);
        svg.text(x + SAMPLE + 4, y, "start", "ch-legend", name);
        x += SAMPLE + 4 + name.length() * CHAR_WIDTH + 16;
        return this;
    }
}
