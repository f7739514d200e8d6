package org.qfleet.app.status;

import org.qfleet.app.plot.SvgBuilder;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The control chart of one open or recently closed lot as inline SVG: the lot's mean Qu against the
 * units so far, with the X-bar lower limit mu0 - L sigma0 / sqrt(n) (Shewhart; Montgomery; L and the
 * widening for a learned baseline as in {@link org.qfleet.drift.Baseline#xbarLowerLimit}) that
 * narrows as units arrive, the product's lot limit and the baseline mean mu0; points below a limit
 * are marked. The chart's classes: {@code lot-chart}, {@code closed-lot} once the lot closed,
 * {@code alerted} when {@link LotView#highlighted()}. Series classes: {@code lot-mean} (one vertex
 * per kept point), {@code xbar-limit}, {@code lot-limit}, {@code mu0-line}, {@code below-limit}.
 */
final class LotChart {

    static final int WIDTH = 470;
    static final int HEIGHT = 260;
    private static final double LEFT = 64;
    private static final double TOP = 34;
    private static final double PLOT_WIDTH = 390;
    private static final double PLOT_HEIGHT = 172;

    /** @param id the element id, unique in the page */
    String render(LotView lot, String id) {
        Map<String, String> attributes = new LinkedHashMap<>();
        attributes.put("id", id);
        attributes.put("class", "lot-chart" + (lot.closed() ? " closed-lot" : "") + (lot.highlighted() ? " alerted" : ""));
        attributes.put("data-product", lot.product());
        attributes.put("data-lot", lot.lot());
        SvgBuilder svg = SvgBuilder.inline(WIDTH, HEIGHT, attributes,
                "Control chart of the mean Qu of lot " + lot.lot() + " of " + lot.product());
        List<LotPoint> points = lot.points();
        double[] xs = new double[points.size()];
        double[] means = new double[points.size()];
        double[] limits = new double[points.size()];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        long maxUnits = 10;
        for (int i = 0; i < points.size(); i++) {
            LotPoint p = points.get(i);
            xs[i] = p.units();
            means[i] = p.mean();
            limits[i] = p.xbarLimit();
            maxUnits = Math.max(maxUnits, p.units());
            for (double v : new double[] {p.mean(), p.xbarLimit()}) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        for (double v : new double[] {lot.mu0(), lot.lotLimit()}) {
            if (Double.isFinite(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        double pad = hi > lo ? 0.04 * (hi - lo) : 0;
        ChartPanel panel = new ChartPanel(LEFT, TOP, PLOT_WIDTH, PLOT_HEIGHT, NiceRange.covering(0, maxUnits, 6),
                NiceRange.covering(lo - pad, hi + pad, 5));
        panel.drawAxes(svg, "trusted units in the lot", "mean Qu");
        if (Double.isFinite(lot.mu0())) {
            svg.line(panel.left(), panel.py(lot.mu0()), panel.right(), panel.py(lot.mu0()), "mu0-line");
        }
        if (Double.isFinite(lot.lotLimit())) {
            svg.line(panel.left(), panel.py(lot.lotLimit()), panel.right(), panel.py(lot.lotLimit()), "lot-limit");
        }
        svg.polyline(pixels(panel, xs, true), pixels(panel, limits, false), "xbar-limit");
        svg.polyline(pixels(panel, xs, true), pixels(panel, means, false), "lot-mean");
        for (LotPoint p : points) {
            if (p.below(lot.lotLimit())) {
                svg.circle(panel.px(p.units()), panel.py(p.mean()), 3, "below-limit");
            }
        }
        if (points.isEmpty()) {
            svg.text(panel.left() + PLOT_WIDTH / 2, panel.top() + PLOT_HEIGHT / 2, "middle", "ch-note",
                    "no trusted unit yet");
        }
        new Legend(svg, LEFT, 18).entry("lot-mean", "lot mean").entry("xbar-limit", "X-bar lower limit")
                .entry("lot-limit", "lot limit").entry("mu0-line", "\u03bc0");
        return svg.finish();
    }

    private static double[] pixels(ChartPanel panel, double[] values, boolean horizontal) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = horizontal ? panel.px(values[i]) : panel.py(values[i]);
        }
        return out;
    }
}
