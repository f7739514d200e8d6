package org.qfleet.app.status;

import org.qfleet.app.plot.SvgBuilder;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.ToDoubleFunction;

/**
 * The charts of one station as inline SVG: on the left the EWMA of the standardized Qu deviation
 * with its limits +-L sqrt(lambda / (2 - lambda)) (Lucas & Saccucci 1990), on the right the
 * two-sided CUSUMs of the f0 and coupling-level deviations with the decision interval h
 * (Montgomery), all against the units charted. Classes: {@code ewma-z}, {@code ewma-limit},
 * {@code cusum-h}, {@code cusum-f0-upper}, {@code cusum-f0-lower}, {@code cusum-coupling-upper},
 * {@code cusum-coupling-lower}; each series has one vertex per kept point.
 */
final class StationChart {

    static final int WIDTH = 800;
    static final int HEIGHT = 260;
    private static final double TOP = 34;
    private static final double PLOT_WIDTH = 290;
    private static final double PLOT_HEIGHT = 172;
    private static final double EWMA_LEFT = 64;
    private static final double CUSUM_LEFT = 450;

    /** @param id the element id, unique in the page */
    String render(StationView station, String id) {
        Map<String, String> attributes = new LinkedHashMap<>();
        attributes.put("id", id);
        attributes.put("class", station.alerted() ? "station-chart alerted" : "station-chart");
        attributes.put("data-product", station.product());
        attributes.put("data-station", station.station());
        SvgBuilder svg = SvgBuilder.inline(WIDTH, HEIGHT, attributes,
                "EWMA and CUSUM charts of station " + station.station() + " for " + station.product());
        List<StationPoint> points = station.points();
        long maxUnits = Math.max(10, points.isEmpty() ? 0 : station.latest().units());
        NiceRange units = NiceRange.covering(0, maxUnits, 5);
        double[] xs = series(points, p -> p.units());

        double limit = station.ewmaLimit();
        double ewmaSpan = Double.isFinite(limit) ? 1.25 * limit : 1;
        for (StationPoint p : points) {
            ewmaSpan = Math.max(ewmaSpan, Math.abs(p.quEwma()));
        }
        ChartPanel ewma = new ChartPanel(EWMA_LEFT, TOP, PLOT_WIDTH, PLOT_HEIGHT, units,
                NiceRange.covering(-ewmaSpan, ewmaSpan, 6));
        ewma.drawAxes(svg, "units charted", "EWMA of Qu deviation (\u03c3)");
        svg.line(ewma.left(), ewma.py(0), ewma.right(), ewma.py(0), "ch-centre");
        if (Double.isFinite(limit)) {
            svg.line(ewma.left(), ewma.py(limit), ewma.right(), ewma.py(limit), "ewma-limit");
            svg.line(ewma.left(), ewma.py(-limit), ewma.right(), ewma.py(-limit), "ewma-limit");
        }
        svg.polyline(pixels(xs, ewma, true), pixels(series(points, StationPoint::quEwma), ewma, false), "ewma-z");

        double h = station.cusumLimit();
        double cusumTop = Double.isFinite(h) ? 1.2 * h : 1;
        for (StationPoint p : points) {
            cusumTop = Math.max(cusumTop, Math.max(Math.max(p.f0Upper(), p.f0Lower()), Math.max(p.couplingUpper(), p.couplingLower())));
        }
        ChartPanel cusum = new ChartPanel(CUSUM_LEFT, TOP, PLOT_WIDTH, PLOT_HEIGHT, units, NiceRange.covering(0, cusumTop, 5));
        cusum.drawAxes(svg, "units charted", "CUSUM (\u03c3)");
        if (Double.isFinite(h)) {
            svg.line(cusum.left(), cusum.py(h), cusum.right(), cusum.py(h), "cusum-h");
        }
        svg.polyline(pixels(xs, cusum, true), pixels(series(points, StationPoint::f0Upper), cusum, false), "cusum-f0-upper");
        svg.polyline(pixels(xs, cusum, true), pixels(series(points, StationPoint::f0Lower), cusum, false), "cusum-f0-lower");
        svg.polyline(pixels(xs, cusum, true), pixels(series(points, StationPoint::couplingUpper), cusum, false),
                "cusum-coupling-upper");
        svg.polyline(pixels(xs, cusum, true), pixels(series(points, StationPoint::couplingLower), cusum, false),
                "cusum-coupling-lower");
        if (points.isEmpty()) {
            svg.text(WIDTH / 2.0, TOP + PLOT_HEIGHT / 2, "middle", "ch-note", "no charted unit yet");
        }
        new Legend(svg, EWMA_LEFT, 18).entry("ewma-z", "EWMA").entry("ewma-limit", "\u00b1 limit");
        new Legend(svg, CUSUM_LEFT - 40, 18).entry("cusum-f0-upper", "f0 +").entry("cusum-f0-lower", "f0 \u2212")
                .entry("cusum-coupling-upper", "coupling +").entry("cusum-coupling-lower", "coupling \u2212")
                .entry("cusum-h", "h");
        return svg.finish();
    }

    private static double[] series(List<StationPoint> points, ToDoubleFunction<StationPoint> value) {
        return points.stream().mapToDouble(value).toArray();
    }

    private static double[] pixels(double[] values, ChartPanel panel, boolean horizontal) {
        double[] out = new double[values.length];
        for (int i = 0; i < values.length; i++) {
            out[i] = horizontal ? panel.px(values[i]) : panel.py(values[i]);
        }
        return out;
    }
}
