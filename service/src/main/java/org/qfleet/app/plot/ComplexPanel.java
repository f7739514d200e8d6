package org.qfleet.app.plot;

import org.qfleet.fit.ResonanceResult;
import org.qfleet.fit.ResponseModel;
import org.qfleet.sweep.Trace;

/**
 * Right panel: the complex plane with equal scales on both axes, the data as dots, the fitted
 * response as a line and the circle through the fit at f0 and at the two half-power points.
 * For a resonance with a constant background that circle is the exact locus; with cable delay
 * the line shows the small departure from it.
 */
final class ComplexPanel {

    private static final int TICKS = 6;

    private ComplexPanel() {
    }

    static void draw(SvgBuilder svg, PanelBox box, MainTrace main, ModelCurve curve, ResonanceResult r) {
        Trace trace = main.trace();
        boolean showData = trace.phaseKnown();
        ResponseModel model = r.model();
        boolean showFit = curve != null && model != null && model.hasPhase();
        if (!showData && !showFit) {
            svg.rect(box.left(), box.top(), box.width(), box.height(), "frame");
            svg.text(box.left() + box.width() / 2, box.top() + box.height() / 2, "middle", "note",
                    "magnitude-only data: no complex plane");
            return;
        }
        Circle circle = showFit ? fittedCircle(model, r) : null;
        PlotArea area = squareArea(box, trace, showData, curve, showFit, circle);

        area.declareClip(svg, "clip-complex");
        area.drawAxes(svg, 1, "Re " + main.label(), "Im " + main.label());
        svg.openGroup("panel-data", "clip-complex");
        svg.line(area.px(0), area.top(), area.px(0), area.bottom(), "origin");
        svg.line(area.left(), area.py(0), area.right(), area.py(0), "origin");
        if (showData) {
            int stride = DataDots.stride(trace.size());
            for (int i = 0; i < trace.size(); i += stride) {
                svg.circle(area.px(trace.re()[i]), area.py(trace.im()[i]), DataDots.RADIUS, "data");
            }
        }
        if (circle != null) {
            double pixelsPerUnit = area.width() / (area.x().max() - area.x().min());
            svg.circle(area.px(circle.centerRe()), area.py(circle.centerIm()), circle.radius() * pixelsPerUnit,
                    "fit-circle");
        }
        if (showFit) {
            double[] xs = new double[curve.size()];
            double[] ys = new double[curve.size()];
            for (int i = 0; i < xs.length; i++) {
                xs[i] = area.px(curve.re()[i]);
                ys[i] = area.py(curve.im()[i]);
            }
            svg.polyline(xs, ys, "fit");
            double[] atF0 = new double[2];
            model.evaluate(r.f0Hz(), atF0);
            svg.circle(area.px(atF0[0]), area.py(atF0[1]), 4, "f0-point");
        }
        svg.closeGroup();
        legend(svg, area, showData, showFit);
    }

    private static void legend(SvgBuilder svg, PlotArea area, boolean showData, boolean showFit) {
        double y = area.top() - 10;
        double x = area.left();
        if (showData) {
            svg.circle(x + 4, y - 4, DataDots.RADIUS + 0.5, "data key");
            svg.text(x + 12, y, "start", "legend", "measured");
            x += 90;
        }
        if (showFit) {
            svg.line(x, y - 4, x + 20, y - 4, "fit");
            svg.text(x + 26, y, "start", "legend", "fit");
            svg.circle(x + 68, y - 4, 4, "f0-point");
            svg.text(x + 78, y, "start", "legend", "fit at f0");
        }
    }

    /** The circle through the model at f0 and at f0 ± f0 / (2 QL), or null when undefined. */
    private static Circle fittedCircle(ResponseModel model, ResonanceResult r) {
        double f0 = r.f0Hz();
        double ql = r.qLoaded();
        if (!(Double.isFinite(f0) && Double.isFinite(ql) && ql > 0)) {
            return null;
        }
        double halfWidth = f0 / (2 * ql);
        double[] a = new double[2];
        double[] b = new double[2];
        double[] c = new double[2];
        model.evaluate(f0, a);
        model.evaluate(f0 - halfWidth, b);
        model.evaluate(f0 + halfWidth, c);
        return Circle.through(a[0], a[1], b[0], b[1], c[0], c[1]);
    }

    /** Equal scales on both axes, covering data, fit, circle and the origin. */
    private static PlotArea squareArea(PanelBox box, Trace trace, boolean showData, ModelCurve curve,
            boolean showFit, Circle circle) {
        Range re = Range.EMPTY.with(0);
        Range im = Range.EMPTY.with(0);
        if (showData) {
            re = re.with(Range.of(trace.re()));
            im = im.with(Range.of(trace.im()));
        }
        if (showFit) {
            re = re.with(Range.of(curve.re()));
            im = im.with(Range.of(curve.im()));
        }
        if (circle != null) {
            re = re.with(circle.centerRe() - circle.radius()).with(circle.centerRe() + circle.radius());
            im = im.with(circle.centerIm() - circle.radius()).with(circle.centerIm() + circle.radius());
        }
        double span = Math.max(Math.max(re.span(), im.span()) * 1.1, 1e-9);
        double step = NiceScale.covering(0, span, TICKS).step();
        NiceScale x = new NiceScale(re.center() - span / 2, re.center() + span / 2, step);
        NiceScale y = new NiceScale(im.center() - span / 2, im.center() + span / 2, step);
        double side = Math.min(box.width(), box.height());
        return new PlotArea(box.left(), box.top(), side, side, x, y);
    }
}
