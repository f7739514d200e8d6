package org.qfleet.app.status;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import org.junit.jupiter.api.Test;
import org.qfleet.fit.ResonanceAnalyzer;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sim.DemoPlant;
import org.qfleet.sweep.Sweep;
import org.qfleet.verdict.ProductCatalogue;
import org.w3c.dom.Element;

class FitSectionTest {

    private static final String PAGE_START = "<html xmlns=\"http://www.w3.org/1999/xhtml\"><body>";
    private static final String PAGE_END = "</body></html>";

    @Test
    void theFitIsDrawnInlineWithTheSweepsIdsAndItsVerdict() throws Exception {
        LastFit fit = demoFit();
        PageDocument page = PageDocument.parse(PAGE_START + new FitSection().render(fit) + PAGE_END);

        Element svg = page.byId("fit-plot");
        assertThat(svg.getNamespaceURI()).isEqualTo("http://www.w3.org/2000/svg");
        assertThat(PageDocument.elementsIn(svg, "circle", "data").stream().filter(c -> c.getAttribute("class").equals("data")))
                .as("every point of the main trace, in both panels").hasSize(2 * fit.sweep().size());
        assertThat(page.text()).contains(fit.sweep().info().sweepId(), fit.sweep().info().stationId(),
                fit.sweep().info().lot(), fit.verdict().status().code());
    }

    @Test
    void aSweepWithMorePointsThanTheBoundIsNotDrawn() throws Exception {
        LastFit fit = demoFit();
        PageDocument page = PageDocument.parse(PAGE_START + new FitSection(fit.sweep().size() - 1).render(fit) + PAGE_END);

        assertThat(page.byId("fit-plot")).isNull();
        assertThat(page.text()).contains(fit.sweep().size() + " points, too many to draw");
    }

    @Test
    void theXmlDeclarationOfThePlotIsDropped() {
        assertThat(FitSection.inline("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n<svg xmlns=\"x\"></svg>\n"))
                .isEqualTo("<svg id=\"fit-plot\" class=\"fit-plot\" xmlns=\"x\"></svg>");
    }

    private static LastFit demoFit() throws Exception {
        Sweep sweep = new DemoPlant(4, Clock.fixed(Instant.parse("2026-03-02T08:00:00Z"), ZoneOffset.UTC)).next().sweep();
        ResonanceResult result = new ResonanceAnalyzer().analyze(sweep);
        return new LastFit(sweep, result, ProductCatalogue.demoPlant().judge(sweep.info().product(), sweep.topology(), result));
    }
}
