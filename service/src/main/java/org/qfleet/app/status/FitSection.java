package org.qfleet.app.status;

import java.util.stream.Collectors;
import org.qfleet.app.plot.ResonancePlot;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.SweepInfo;
import org.qfleet.verdict.Verdict;
import org.qfleet.verdict.VerdictReason;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

/** The last fitted sweep: who measured it, its numbers and verdict, and the plot of the fit inline. */
final class FitSection {

    private static final Logger LOG = LoggerFactory.getLogger(FitSection.class);

    /** Sweeps with more points are not drawn: the page is fetched every few seconds and should stay light. */
    static final int MAX_PLOTTED_POINTS = 5001;

    private final ResonancePlot plot = new ResonancePlot();
    private final int maxPlottedPoints;

    FitSection() {
        this(MAX_PLOTTED_POINTS);
    }

    FitSection(int maxPlottedPoints) {
        this.maxPlottedPoints = maxPlottedPoints;
    }

    String render(LastFit fit) {
        if (fit == null) {
            return "<p class=\"empty\">No sweep fitted yet.</p>\n";
        }
        SweepInfo info = fit.sweep().info();
        ResonanceResult r = fit.result();
        StringBuilder html = new StringBuilder(128 * 1024);
        html.append("<dl class=\"facts\">")
                .append(fact("sweep", info.sweepId() == null ? fit.sweep().source() : info.sweepId()))
                .append(fact("station", info.stationId()))
                .append(fact("product", info.product()))
                .append(fact("lot", info.lot()))
                .append(fact("unit", info.unit()))
                .append(fact("measured at", info.measuredAt()))
                .append(fact("Qu", Html.number(r.qUnloaded(), 0) + " \u00b1 " + Html.number(r.qUnloadedUncertainty(), 0)))
                .append(fact("QL", Html.number(r.qLoaded(), 0)))
                .append(fact("f0", Html.number(r.f0Hz() / 1e9, 6) + " GHz"))
                .append(fact("flags", r.flags().isEmpty() ? "none"
                        : r.flags().stream().map(QualityFlag::code).collect(Collectors.joining(", "))))
                .append(fact("verdict", verdict(fit.verdict())))
                .append("</dl>\n<div class=\"fit-plot-box\">\n");
        if (fit.sweep().size() > maxPlottedPoints) {
            return html.append("<p class=\"empty\">The sweep has ").append(fit.sweep().size())
                    .append(" points, too many to draw on this page; at most ").append(maxPlottedPoints)
                    .append(" are drawn.</p>\n</div>\n").toString();
        }
        try {
            html.append(inline(plot.render(fit.sweep(), r)));
        } catch (RuntimeException e) {
            LOG.warn("cannot draw the last fitted sweep {}: {}", fit.sweep().source(), e.toString());
            html.append("<p class=\"empty\">The plot of this sweep could not be drawn.</p>");
        }
        return html.append("\n</div>\n").toString();
    }

    /** The plot's SVG document as an element of the page: without its XML declaration, with an id. */
    static String inline(String svgDocument) {
        String svg = svgDocument.strip();
        if (svg.startsWith("<?xml")) {
            svg = svg.substring(svg.indexOf("?>") + 2).strip();
        }
        return svg.replaceFirst("^<svg ", "<svg id=\"fit-plot\" class=\"fit-plot\" ");
    }

    private static String verdict(Verdict v) {
        if (v == null) {
            return null;
        }
        return v.status().code() + (v.reasons().isEmpty() ? ""
                : ": " + v.reasons().stream().map(VerdictReason::code).collect(Collectors.joining(", ")));
    }

    private static String fact(String name, String value) {
        return "<dt>" + Html.escape(name) + "</dt><dd>" + Html.escape(value == null ? "\u2013" : value) + "</dd>";
    }
}
