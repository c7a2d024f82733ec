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

    private static final Pattern NUMBER = Pattern.compile("-?(?:\\d+(?:\\.\\d*)?|\\.\\d+)");

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
     * The area enclosed by a path of M (absolute), L (absolute), l (relative, with implicit repetition) and
     * Z commands: the shoelace formula per subpath, signs summed (holes wound opposite to their shell
     * subtract).
     */
    static double pathArea(String d) {
        double total = 0;
        for (String sub : d.split("(?=M)")) {
            if (sub.isBlank()) {
                continue;
            }
            List<double[]> points = new ArrayList<>();
            Matcher m = Pattern.compile("([MLlZz])|(-?(?:\\d+(?:\\.\\d*)?|\\.\\d+))").matcher(sub);
            char command = 'M';
            List<Double> pending = new ArrayList<>();
            double x = 0;
            double y = 0;
            while (m.find()) {
                if (m.group(1) != null) {
                    command = m.group(1).charAt(0);
                    continue;
                }
                pending.add(Double.parseDouble(m.group(2)));
                if (pending.size() == 2) {
                    boolean relative = command == 'l';
                    x = relative ? x + pending.get(0) : pending.get(0);
                    y = relative ? y + pending.get(1) : pending.get(1);
                    points.add(new double[]{x, y});
                    pending.clear();
                }
            }
            double s = 0;
            for (int i = 0; i < points.size(); i++) {
                double[] a = points.get(i);
                double[] b = points.get((i + 1) % points.size());
                s += a[0] * b[1] - b[0] * a[1];
            }
            total += s / 2;
        }
        return Math.abs(total);
    }
}
