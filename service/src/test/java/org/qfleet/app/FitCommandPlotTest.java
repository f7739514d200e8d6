package org.qfleet.app;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.qfleet.sweep.FrequencyUnit;
import org.qfleet.sweep.TouchstoneFormat;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** {@code qfleet fit --plot}: one well-formed SVG per input, with the fitted circle when there is phase. */
class FitCommandPlotTest {

    private static final String SVG_NAMESPACE = "http://www.w3.org/2000/svg";

    @TempDir
    Path dir;

    @Test
    void onePlotPerFileWithTheFittedCircleForComplexData() throws Exception {
        Path s2p = SimulatedFiles.touchstone(dir, "cavity.s2p", SimulatedFiles.transmission(41).sweep(),
                FrequencyUnit.GHZ, TouchstoneFormat.RI);
        Path scalar = SimulatedFiles.write(dir.resolve("scalar.json"),
                SimulatedFiles.magnitudeOnlyMessage(SimulatedFiles.transmission(42).sweep(), SimulatedFiles.INFO));
        Path plots = dir.resolve("out").resolve("plots");

        CommandRun run = CommandRun.of("fit", "--plot", plots, s2p, scalar);

        assertThat(run.exitCode()).as(run.stdout()).isZero();
        assertThat(listSvg(plots)).containsExactlyInAnyOrder("cavity.s2p.svg", "scalar.json.svg");
        Document complex = parse(plots.resolve("cavity.s2p.svg"));
        Document magnitudeOnly = parse(plots.resolve("scalar.json.svg"));
        assertThat(complex.getDocumentElement().getLocalName()).isEqualTo("svg");
        assertThat(complex.getDocumentElement().getNamespaceURI()).isEqualTo(SVG_NAMESPACE);
        assertThat(withClass(complex, "circle", "fit-circle")).hasSize(1);
        assertThat(withClass(complex, "polyline", "fit")).hasSize(2);
        assertThat(magnitudeOnly.getDocumentElement().getLocalName()).isEqualTo("svg");
        assertThat(withClass(magnitudeOnly, "circle", "fit-circle")).isEmpty();
        assertThat(withClass(magnitudeOnly, "polyline", "fit")).hasSize(1);
        assertThat(magnitudeOnly.getDocumentElement().getTextContent()).contains("magnitude-only");
    }

    private static List<String> listSvg(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).toList();
        }
    }

    /** Parses with a namespace-aware parser that refuses DOCTYPEs, so a malformed file fails here. */
    private static Document parse(Path svg) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        factory.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        return factory.newDocumentBuilder().parse(svg.toFile());
    }

    private static List<Element> withClass(Document document, String tag, String cssClass) {
        NodeList nodes = document.getElementsByTagNameNS(SVG_NAMESPACE, tag);
        List<Element> found = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            Element e = (Element) nodes.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cssClass)) {
                found.add(e);
            }
        }
        return found;
    }
}
