package aequa.drawing;

import java.io.ByteArrayInputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;

import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/** Test helper: an SVG parsed by the JDK's XML parser (javax.xml, a conforming XML 1.0 parser), with lookups. */
final class SvgDoc {

    private static final Pattern NUMBER = Pattern.compile("-?\\d+(?:\\.\\d+)?");

    final Document document;

    private SvgDoc(Document document) {
        this.document = document;
    }

    /** Parses or fails the test with the parser's message. */
    static SvgDoc parse(byte[] svg) {
        try {
            DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
            factory.setNamespaceAware(true);
            factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
            DocumentBuilder builder = factory.newDocumentBuilder();
            builder.setErrorHandler(null);
            return new SvgDoc(builder.parse(new ByteArrayInputStream(svg)));
        } catch (Exception e) {
            throw new AssertionError("SVG does not parse as XML: " + e.getMessage(), e);
        }
    }

    Element root() {
        return document.getDocumentElement();
    }

    Element byId(String id) {
        List<Element> all = elements("*");
        Element found = null;
        for (Element e : all) {
            if (id.equals(e.getAttribute("id"))) {
                if (found != null) {
                    throw new AssertionError("id " + id + " appears twice");
                }
                found = e;
            }
        }
        return found;
    }

    List<Element> elements(String localName) {
        return elements(root(), localName);
    }

    static List<Element> elements(Element scope, String localName) {
        NodeList list = scope.getElementsByTagNameNS("*", localName);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < list.getLength(); i++) {
            out.add((Element) list.item(i));
        }
        return out;
    }

    /** Direct child elements. */
    static List<Element> children(Element parent) {
        List<Element> out = new ArrayList<>();
        for (Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element) {
                out.add((Element) n);
            }
        }
        return out;
    }

    /** All text content of {@code <text>} elements under {@code scope}, in document order. */
    static List<String> texts(Element scope) {
        List<String> out = new ArrayList<>();
        for (Element t : elements(scope, "text")) {
            out.add(t.getTextContent());
        }
        return out;
    }

    /** Every number in a path's d attribute. */
    static List<String> numbers(String d) {
        List<String> out = new ArrayList<>();
        Matcher m = NUMBER.matcher(d);
        while (m.find()) {
            out.add(m.group());
        }
        return out;
    }

    /**
     * The area enclosed by a path of absolute M/L/Z commands (shoelace formula, summed over subpaths with
     * their signs; holes wound opposite to their shell subtract, as in JTS's output).
     */
    static double pathArea(String d) {
        double total = 0;
        for (String sub : d.split("(?=M)")) {
            List<String> n = numbers(sub);
            double s = 0;
            int count = n.size() / 2;
            for (int i = 0; i < count; i++) {
                double x1 = Double.parseDouble(n.get(2 * i));
                double y1 = Double.parseDouble(n.get(2 * i + 1));
                double x2 = Double.parseDouble(n.get(2 * ((i + 1) % count)));
                double y2 = Double.parseDouble(n.get(2 * ((i + 1) % count) + 1));
                s += x1 * y2 - x2 * y1;
            }
            total += s / 2;
        }
        return Math.abs(total);
    }
}
