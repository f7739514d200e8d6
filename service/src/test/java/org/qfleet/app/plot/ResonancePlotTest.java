package org.qfleet.app.plot;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.qfleet.app.ResonanceFixtures.CAVITY;
import static org.qfleet.app.ResonanceFixtures.CAVITY_MAGNITUDE;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.app.ResonanceFixtures;
import org.qfleet.fit.QualityFlag;
import org.qfleet.fit.ResonanceResult;
import org.qfleet.sweep.Sweep;
import org.qfleet.sweep.SweepInfo;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class ResonancePlotTest {

    private static final int POINTS = 201;

    private final ResonancePlot plot = new ResonancePlot();

    @Test
    void documentIsWellFormedSvgWithBothPanels() throws Exception {
        Document svg = parse(plot.render(sweep(CAVITY), result(CAVITY)));

        assertThat(svg.getDocumentElement().getTagName()).isEqualTo("svg");
        assertThat(svg.getDocumentElement().getAttribute("xmlns")).isEqualTo("http://www.w3.org/2000/svg");
        assertThat(elements(svg, "polyline", "fit")).as("fitted line in each panel").hasSize(2);
        assertThat(elements(svg, "circle", "fit-circle")).hasSize(1);
        assertThat(elements(svg, "circle", "data")).as("every point in each panel").hasSize(2 * POINTS);
        assertThat(texts(svg)).contains("Frequency (GHz)", "|S21| (dB)", "Re S21", "Im S21");
    }

    @Test
    void titleNamesSourceNumbersAndFlags() throws Exception {
        Document svg = parse(plot.render(sweep(CAVITY), result(CAVITY)));

        String title = elements(svg, "text", "title").get(0).getTextContent();
        assertThat(title).contains("cavity-17.s2p", "f0 = 10.4", "GHz", "QL = 5000", "Qu = ", "±",
                "flags: low-snr, span-narrow");
        NodeList lines = elements(svg, "text", "title").get(0).getElementsByTagName("tspan");
        assertThat(lines.getLength()).as("source and numbers on lines of their own").isEqualTo(2);
        assertThat(lines.item(0).getTextContent()).isEqualTo("cavity-17.s2p");
        assertThat(Double.parseDouble(((Element) lines.item(1)).getAttribute("dy"))).isPositive();
        assertThat(lines.item(1).getTextContent()).startsWith("f0 = ");
    }

    @Test
    void halfPowerMarkersSitSymmetricallyAroundF0() throws Exception {
        Document svg = parse(plot.render(sweep(CAVITY), result(CAVITY)));

        double f0 = x1(elements(svg, "line", "f0").get(0));
        List<Element> halfPower = elements(svg, "line", "half-power");
        assertThat(halfPower).hasSize(2);
        double low = x1(halfPower.get(0));
        double high = x1(halfPower.get(1));
        assertThat(low).isLessThan(f0);
        assertThat(high).isGreaterThan(f0);
        assertThat(f0 - low).isCloseTo(high - f0, within(0.02));
    }

    @Test
    void complexPlaneUsesEqualScalesSoTheDataLieOnTheDrawnCircle() throws Exception {
        Document svg = parse(plot.render(sweep(CAVITY), result(CAVITY)));

        Element circle = elements(svg, "circle", "fit-circle").get(0);
        double cx = attr(circle, "cx");
        double cy = attr(circle, "cy");
        double r = attr(circle, "r");
        List<Element> dots = inGroup(svg, "url(#clip-complex)", "circle", "data");
        assertThat(dots).hasSize(POINTS);
        for (Element dot : dots) {
            assertThat(Math.hypot(attr(dot, "cx") - cx, attr(dot, "cy") - cy)).isCloseTo(r, within(0.05));
        }
    }

    @Test
    void magnitudeOnlyDataHasNoComplexPlane() throws Exception {
        Document svg = parse(plot.render(sweep(CAVITY_MAGNITUDE), result(CAVITY_MAGNITUDE)));

        assertThat(elements(svg, "circle", "fit-circle")).isEmpty();
        assertThat(elements(svg, "polyline", "fit")).hasSize(1);
        assertThat(elements(svg, "circle", "data")).hasSize(POINTS);
        assertThat(texts(svg)).anyMatch(t -> t.contains("magnitude-only"));
    }

    @Test
    void markupInTheSourceIsEscaped() throws Exception {
        Sweep sweep = ResonanceFixtures.sweep("<unit & \"7\">.s2p", CAVITY, 51, 10, SweepInfo.NONE, null);

        Document svg = parse(plot.render(sweep, result(CAVITY)));

        assertThat(elements(svg, "text", "title").get(0).getTextContent()).startsWith("<unit & \"7\">.s2p");
    }

    @Test
    void longSweepsAreThinnedOut() throws Exception {
        Sweep sweep = ResonanceFixtures.sweep("long.s2p", CAVITY, 10_001, 10, SweepInfo.NONE, null);

        Document svg = parse(plot.render(sweep, result(CAVITY)));

        assertThat(inGroup(svg, "url(#clip-magnitude)", "circle", "data").size()).isBetween(1000, DataDots.MAX_DOTS);
        assertThat(inGroup(svg, "url(#clip-complex)", "circle", "data").size()).isBetween(1000, DataDots.MAX_DOTS);
    }

    @Test
    void plotDirectoryWritesOneFilePerSourceAndKeepsClashingNamesApart(@TempDir Path dir) throws Exception {
        PlotDirectory plots = new PlotDirectory(dir.resolve("plots"));

        Path first = plots.write(ResonanceFixtures.fileSweep("lotA/u1.s2p", CAVITY), result(CAVITY));
        Path second = plots.write(ResonanceFixtures.fileSweep("lotB/u1.s2p", CAVITY), result(CAVITY));

        assertThat(first.getFileName().toString()).isEqualTo("u1.s2p.svg");
        assertThat(second.getFileName().toString()).isEqualTo("u1.s2p-2.svg");
        assertThat(parse(Files.readString(second)).getDocumentElement().getTagName()).isEqualTo("svg");
    }

    private static Sweep sweep(ResonanceFixtures.CircleModel model) {
        return ResonanceFixtures.sweep("cavity-17.s2p", model, POINTS, 10, SweepInfo.NONE, null);
    }

    private static ResonanceResult result(ResonanceFixtures.CircleModel model) {
        return ResonanceFixtures.result(model, List.of(QualityFlag.LOW_SNR, QualityFlag.SPAN_NARROW));
    }

    /** Parses with a JDK parser that refuses DTDs, as for any untrusted XML. */
    static Document parse(String xml) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(xml.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<Element> elements(Document doc, String tag, String cssClass) {
        return select(doc.getElementsByTagName(tag), e -> e.getAttribute("class").equals(cssClass));
    }

    private static List<Element> inGroup(Document doc, String clipPath, String tag, String cssClass) {
        List<Element> groups = select(doc.getElementsByTagName("g"), g -> g.getAttribute("clip-path").equals(clipPath));
        assertThat(groups).hasSize(1);
        return select(groups.get(0).getElementsByTagName(tag), e -> e.getAttribute("class").equals(cssClass));
    }

    private static List<Element> select(NodeList nodes, Predicate<Element> keep) {
        List<Element> selected = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            Element e = (Element) nodes.item(i);
            if (keep.test(e)) {
                selected.add(e);
            }
        }
        return selected;
    }

    private static List<String> texts(Document doc) {
        return select(doc.getElementsByTagName("text"), e -> true).stream().map(Element::getTextContent).toList();
    }

    private static double x1(Element line) {
        return attr(line, "x1");
    }

    private static double attr(Element e, String name) {
        return Double.parseDouble(e.getAttribute(name));
    }
}
