package org.qfleet.app.plot;

import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.FrequencyUnit;

/**
 * Left panel: |S| in dB against frequency, the data as dots, the fit as a line, and vertical
 * markers at f0 and at the half-power points f0 ± f0 / (2 QL).
 */
final class MagnitudePanel {

    private static final int MAX_TICKS = 7;
    /** Room left of the first and right of the last point, as a share of the span, so no dot is cut. */
    private static final double EDGE_MARGIN = 0.02;

    private MagnitudePanel() {
    }

    static void draw(SvgBuilder svg, PanelBox box, double[] frequencyHz, MainTrace main, ModelCurve curve,
            ResonanceResult result) {
        double[] dataDb = new double[frequencyHz.length];
        for (int i = 0; i < dataDb.length; i++) {
            dataDb[i] = 20 * Math.log10(main.trace().magnitude(i));
        }
        Range db = Range.of(dataDb);
        if (curve != null) {
            for (int i = 0; i < curve.size(); i++) {
                db = db.with(curve.magnitudeDb(i));
            }
        }
        db = db.padded(0.05, 0.5);
        double first = frequencyHz[0];
        double last = frequencyHz[frequencyHz.length - 1];
        double margin = Math.max(last - first, Math.abs(first) * 1e-9) * EDGE_MARGIN;
        NiceScale x = NiceScale.inside(first - margin, last + margin, MAX_TICKS);
        NiceScale y = NiceScale.covering(db.min(), db.max(), MAX_TICKS);
        PlotArea area = new PlotArea(box.left(), box.top(), box.width(), box.height(), x, y);
        FrequencyUnit unit = AxisUnits.forAxis(x);

        area.declareClip(svg, "clip-magnitude");
        area.drawAxes(svg, unit.hertz(), "Frequency (" + unit.symbol() + ")", "|" + main.label() + "| (dB)");
        svg.openGroup("panel-data", "clip-magnitude");
        int stride = DataDots.stride(frequencyHz.length);
        for (int i = 0; i < frequencyHz.length; i += stride) {
            svg.circle(area.px(frequencyHz[i]), area.py(dataDb[i]), DataDots.RADIUS, "data");
        }
        if (curve != null) {
            double[] xs = new double[curve.size()];
            double[] ys = new double[curve.size()];
            for (int i = 0; i < xs.length; i++) {
                xs[i] = area.px(curve.frequencyHz()[i]);
                ys[i] = area.py(curve.magnitudeDb(i));
            }
            svg.polyline(xs, ys, "fit");
        }
        drawMarkers(svg, area, result);
        svg.closeGroup();
        legend(svg, area, curve != null);
    }

    private static void drawMarkers(SvgBuilder svg, PlotArea area, ResonanceResult r) {
        double f0 = r.f0Hz();
        if (!Double.isFinite(f0)) {
            return;
        }
        double x0 = area.px(f0);
        svg.line(x0, area.top(), x0, area.bottom(), "f0");
        svg.text(x0 + 4, area.top() + 14, "start", "marker-label", "f0");
        double ql = r.qLoaded();
        if (Double.isFinite(ql) && ql > 0) {
            double halfWidth = f0 / (2 * ql);
            double xLow = area.px(f0 - halfWidth);
            double xHigh = area.px(f0 + halfWidth);
            svg.line(xLow, area.top(), xLow, area.bottom(), "half-power");
            svg.line(xHigh, area.top(), xHigh, area.bottom(), "half-power");
            svg.text(xLow - 4, area.top() + 30, "end", "marker-label", "half-power");
            svg.text(xHigh + 4, area.top() + 30, "start", "marker-label", "half-power");
        }
    }

    private static void legend(SvgBuilder svg, PlotArea area, boolean withFit) {
        double y = area.top() - 10;
        double x = area.right() - (withFit ? 150 : 70);
        svg.circle(x, y - 4, DataDots.RADIUS + 0.5, "data key");
        svg.text(x + 8, y, "start", "legend", "measured");
        if (withFit) {
            svg.line(x + 80, y - 4, x + 100, y - 4, "fit");
            svg.text(x + 106, y, "start", "legend", "fit");
        }
    }
}
