package org.qfleet.app.plot;

import java.util.stream.Collectors;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;

/**
 * Draws one fitted sweep as a self-contained SVG document: a title with the source on one line and
 * the main numbers on the next (so a long path does not push them off the page), |S| in dB against
 * frequency on the left, the complex plane on the right.
 * Hand-written SVG, no plotting library; stateless and thread-safe.
 */
public final class ResonancePlot {

    static final int WIDTH = 1140;
    private static final String SEPARATOR = " \u00b7 ";
    static final int HEIGHT = 540;
    private static final PanelBox MAGNITUDE = new PanelBox(90, 80, 560, 380);
    private static final PanelBox COMPLEX = new PanelBox(750, 80, 380, 380);
    private static final String STYLE = String.join("",
            "text{font-family:sans-serif;font-size:12px;fill:#222}",
            ".title{font-size:14px}.strong{font-weight:bold}",
            ".axis-title{font-size:13px}.tick{font-size:11px}.note{font-size:13px;fill:#666}",
            ".marker-label{font-size:11px;fill:#555}.legend{font-size:12px}",
            ".frame{fill:none;stroke:#333}.axis{stroke:#333}.grid{stroke:#e6e6e6}",
            ".origin{stroke:#bbb;stroke-dasharray:2 2}",
            ".data{fill:#1f5fa8}.fit{fill:none;stroke:#d2412b;stroke-width:1.6}",
            ".fit-circle{fill:none;stroke:#d2412b;stroke-width:0.8;stroke-dasharray:5 4}",
            ".f0-point{fill:none;stroke:#222;stroke-width:1.2}",
            ".f0{stroke:#222;stroke-width:1}.half-power{stroke:#777;stroke-dasharray:4 3}");

    /** The SVG document for one sweep and its result. */
    public String render(Sweep sweep, ResonanceResult result) {
        SvgBuilder svg = SvgBuilder.standalone(WIDTH, HEIGHT, STYLE);
        svg.textTwoLines(20, 26, 20, "title", sweep.source(), titleNumbers(result));
        MainTrace main = MainTrace.of(sweep);
        if (main == null || sweep.size() == 0) {
            svg.text(WIDTH / 2.0, HEIGHT / 2.0, "middle", "note", "the sweep holds no trace to draw");
            return svg.finish();
        }
        double[] f = sweep.frequencyHz();
        ModelCurve curve = result.model() == null ? null
                : ModelCurve.sample(result.model(), f[0], f[f.length - 1], result.f0Hz(), result.qLoaded());
        MagnitudePanel.draw(svg, MAGNITUDE, f, main, curve, result);
        ComplexPanel.draw(svg, COMPLEX, main, curve, result);
        return svg.finish();
    }

    /** f0, QL, Qu with their uncertainties, and the quality flags, for the line below the source. */
    static String titleNumbers(ResonanceResult r) {
        String flags = r.flags().isEmpty() ? "none"
                : r.flags().stream().map(QualityFlag::code).collect(Collectors.joining(", "));
        return "f0 = " + ValueFormat.frequency(r.f0Hz(), r.f0UncertaintyHz())
                + SEPARATOR + "QL = " + ValueFormat.withUncertainty(r.qLoaded(), r.qLoadedUncertainty())
                + SEPARATOR + "Qu = " + ValueFormat.withUncertainty(r.qUnloaded(), r.qUnloadedUncertainty())
                + SEPARATOR + "flags: " + flags;
    }
}
