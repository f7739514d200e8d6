package org.qfleet.app.plot;

/**
 * A rectangle of the drawing with its two scales: converts data values to pixels and draws the
 * frame, grid, tick labels and axis titles.
 */
record PlotArea(double left, double top, double width, double height, NiceScale x, NiceScale y) {

    private static final double TICK = 4;

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

    /** Frame, grid lines at every tick, tick labels (x divided by {@code xUnit}) and axis titles. */
    void drawAxes(SvgBuilder svg, double xUnit, String xTitle, String yTitle) {
        for (double t : x.ticks()) {
            double p = px(t);
            svg.line(p, top, p, bottom(), "grid");
            svg.line(p, bottom(), p, bottom() + TICK, "axis");
            svg.text(p, bottom() + 17, "middle", "tick", x.label(t, xUnit));
        }
        for (double t : y.ticks()) {
            double p = py(t);
            svg.line(left, p, right(), p, "grid");
            svg.line(left - TICK, p, left, p, "axis");
            svg.text(left - 7, p + 4, "end", "tick", y.label(t, 1));
        }
        svg.rect(left, top, width, height, "frame");
        svg.text(left + width / 2, bottom() + 38, "middle", "axis-title", xTitle);
        svg.verticalText(left - 52, top + height / 2, "axis-title", yTitle);
    }

    /** Clip region for data drawn inside this area. */
    void declareClip(SvgBuilder svg, String id) {
        svg.clipRect(id, left, top, width, height);
    }
}
