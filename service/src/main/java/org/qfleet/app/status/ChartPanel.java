package org.qfleet.app.status;

import org.qfleet.app.plot.SvgBuilder;

/**
 * One plotting area of a chart: its place in the SVG, its axis ranges, and the mapping from data
 * to pixels; draws its frame, grid, ticks and axis titles.
 */
record ChartPanel(double left, double top, double width, double height, NiceRange x, NiceRange y) {

    double px(double value) {
        return left + (value - x.min()) / (x.max() - x.min()) * width;
    }

    double py(double value) {
        return top + height - (value - y.min()) / (y.max() - y.min()) * height;
    }

    double right() {
        return left + width;
    }

    double bottom() {
        return top + height;
    }

    void drawAxes(SvgBuilder svg, String xTitle, String yTitle) {
        svg.rect(left, top, width, height, "ch-area");
        for (double t : y.ticks()) {
            svg.line(left, py(t), right(), py(t), "ch-grid");
            svg.text(left - 6, py(t) + 4, "end", "ch-tick", y.label(t));
        }
        for (double t : x.ticks()) {
            svg.line(px(t), bottom(), px(t), bottom() + 4, "ch-axis");
            svg.text(px(t), bottom() + 16, "middle", "ch-tick", x.label(t));
        }
        svg.rect(left, top, width, height, "ch-frame");
        svg.text(left + width / 2, bottom() + 32, "middle", "ch-axis-title", xTitle);
        svg.verticalText(left - 44, top + height / 2, "ch-axis-title", yTitle);
    }
}
