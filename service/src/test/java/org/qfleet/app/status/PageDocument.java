package org.qfleet.app.status;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The status page read with the JDK's XML parser, which fails on any markup that is not well-formed. */
final class PageDocument {

    private final Document document;

    private PageDocument(Document document) {
        this.document = document;
    }

    static PageDocument parse(String page) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        factory.setExpandEntityReferences(false);
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return new PageDocument(factory.newDocumentBuilder()
                .parse(new ByteArrayInputStream(page.getBytes(StandardCharsets.UTF_8))));
    }

    /** Elements of that local name (any namespace) whose class attribute lists {@code cssClass}; null for any class. */
    List<Element> elements(String tag, String cssClass) {
        return elementsIn(document.getDocumentElement(), tag, cssClass);
    }

    static List<Element> elementsIn(Element root, String tag, String cssClass) {
        NodeList all = root.getElementsByTagNameNS("*", tag);
        List<Element> found = new ArrayList<>();
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (cssClass == null || Arrays.asList(e.getAttribute("class").split(" ")).contains(cssClass)) {
                found.add(e);
            }
        }
        return found;
    }

    Element byId(String id) {
        for (Element e : elements("*", null)) {
            if (id.equals(e.getAttribute("id"))) {
                return e;
            }
        }
        return null;
    }

    String text() {
        return document.getDocumentElement().getTextContent();
    }

    /** Vertices of a polyline. */
    static int vertices(Element polyline) {
        String points = polyline.getAttribute("points").trim();
        return points.isEmpty() ? 0 : points.split(" ").length;
    }
}
