package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Attr;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.NodeList;
import org.xml.sax.InputSource;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.endtoend.DemoSite;

/**
 * The HTML fragment of every demo map, for systems that forbid frames: well-formed XHTML (XML 1.0 with the
 * XHTML and SVG namespaces, parsed by the JDK's parser with doctypes refused), self-contained (nothing that
 * loads: no script, style sheet, image, frame, {@code src}, {@code url(...)}; links only on {@code <a>} and
 * relative to the map's folder), no ids at all (so fragments never collide, even the same map twice on one
 * page), and the same accessible map: the SVG with role img, its title and description, every region, the key
 * and the caption of the map page.
 */
class EmbedFragmentTest {

    private static final String XHTML = "http://www.w3.org/1999/xhtml";
    private static final String SVG = "http://www.w3.org/2000/svg";
    /** Elements that load something or run something (HTML Living Standard; SVG 2 for image, use, foreignObject). */
    private static final Set<String> LOADING_ELEMENTS = Set.of("script", "style", "link", "img", "iframe", "object", "embed",
            "image", "use", "video", "audio", "source", "picture", "foreignobject", "base", "meta", "frame", "feimage");
    /** Attributes that load something or point at an id. */
    private static final Set<String> LOADING_OR_ID_REF = Set.of("src", "srcset", "href", "xlink:href", "poster", "background",
            "data", "aria-labelledby", "aria-describedby", "aria-controls", "aria-owns", "for", "form", "list", "usemap");

    private static Path site;
    private static JsonNode report;

    @BeforeAll
    static void publish() throws IOException {
        site = DemoSite.folder();
        report = new ObjectMapper().readTree(site.resolve("report.json").toFile());
    }

    @Test
    void eachFragmentIsWellFormedXhtmlWithTheAccessibleMapKeyAndCaption() throws Exception {
        for (JsonNode map : report.get("maps")) {
            String id = map.get("id").asText();
            Document doc = parse(fragment(map));
            Element root = doc.getDocumentElement();
            assertEquals(XHTML, root.getNamespaceURI(), id);
            assertEquals("figure", root.getLocalName(), id);

            NodeList svgs = doc.getElementsByTagNameNS(SVG, "svg");
            assertEquals(1, svgs.getLength(), id);
            Element svg = (Element) svgs.item(0);
            assertEquals("img", svg.getAttribute("role"));
            String title = map.get("title").asText();
            assertEquals(title, svg.getAttribute("aria-label"), "the SVG is named by the map's title");
            Element first = firstElementChild(svg);
            assertEquals("title", first.getLocalName());
            assertEquals(title, first.getTextContent());
            assertEquals("desc", nextElementSibling(first).getLocalName(), "then described");

            String webSvg = Files.readString(site.resolve(map.at("/files/webSvg").asText()), StandardCharsets.UTF_8);
            assertEquals(count(webSvg, "data-key='"), countElementsWith(doc, "data-key"), "every region of the web SVG");
            assertTrue(countElementsWith(doc, "data-key") > 0, id);

            String text = root.getTextContent();
            assertTrue(text.contains(map.at("/projection/name").asText()), "the caption names the projection: " + id);
            assertTrue(text.contains("imply no position on any border"), "the cautions travel with the map");
            boolean circles = webSvg.contains("id='symbols'");
            if (!circles) {
                NodeList items = doc.getElementsByTagNameNS(XHTML, "li");
                assertEquals(map.at("/classification/counts").size(), items.getLength(), "one key row per class: " + id);
            }
        }
    }

    @Test
    void fragmentsLoadNothingAndCarryNoIds() throws Exception {
        for (JsonNode map : report.get("maps")) {
            String id = map.get("id").asText();
            Document doc = parse(fragment(map));
            NodeList all = doc.getElementsByTagName("*");
            for (int i = 0; i < all.getLength(); i++) {
                Element e = (Element) all.item(i);
                String name = e.getLocalName().toLowerCase(Locale.ROOT);
                assertFalse(LOADING_ELEMENTS.contains(name), id + ": <" + name + ">");
                NamedNodeMap attributes = e.getAttributes();
                for (int a = 0; a < attributes.getLength(); a++) {
                    Attr attr = (Attr) attributes.item(a);
                    String attrName = attr.getName().toLowerCase(Locale.ROOT);
                    String value = attr.getValue();
                    if (attrName.equals("xmlns") || attrName.startsWith("xmlns:")) {
                        continue; // namespace names, never fetched (Namespaces in XML 1.0, section 2.2)
                    }
                    assertFalse(attrName.equals("id"), id + ": an id on <" + name + ">");
                    if (attrName.equals("href") && name.equals("a") && XHTML.equals(e.getNamespaceURI())) {
                        // a link is followed only when a reader chooses to; it must stay relative to the map's folder
                        assertFalse(value.contains(":") || value.startsWith("/"), id + ": link " + value);
                        continue;
                    }
                    assertFalse(LOADING_OR_ID_REF.contains(attrName), id + ": " + attrName + "=" + value);
                    String lower = value.toLowerCase(Locale.ROOT);
                    assertFalse(lower.contains("url(") || lower.contains("@import") || lower.contains("://"),
                            id + ": " + attrName + "=" + value);
                }
            }
        }
    }

    /** Every fragment of the demo on one page, the first one twice: still well-formed, no id twice (none at all). */
    @Test
    void fragmentsShareOnePageWithoutCollidingIds() throws Exception {
        StringBuilder page = new StringBuilder("<html xmlns=\"" + XHTML + "\"><head><title>Test article</title></head><body>");
        List<String> fragments = new ArrayList<>();
        for (JsonNode map : report.get("maps")) {
            fragments.add(fragment(map));
        }
        fragments.add(fragments.get(0));
        fragments.forEach(f -> page.append("<p>Text of the article.</p>").append(f));
        Document doc = parse(page.append("</body></html>").toString());
        List<String> ids = new ArrayList<>();
        NodeList all = doc.getElementsByTagName("*");
        for (int i = 0; i < all.getLength(); i++) {
            Element e = (Element) all.item(i);
            if (e.hasAttribute("id")) {
                ids.add(e.getAttribute("id"));
            }
        }
        Set<String> distinct = new HashSet<>(ids);
        assertEquals(ids.size(), distinct.size(), "ids used twice: " + ids);
        assertEquals(fragments.size(), doc.getElementsByTagNameNS(SVG, "svg").getLength());
    }

    /** The map page's frame code: the embed page in a frame with a fallback height, and the host script. */
    @Test
    void theMapPageOffersFrameCodeAndTheFragment() throws IOException {
        Pattern frame = Pattern.compile("&lt;iframe src=&quot;embed\\.html&quot; title=&quot;[^&]+&quot; data-aequa-embed=&quot;&quot;"
                + " height=&quot;(\\d+)&quot;");
        for (JsonNode map : report.get("maps")) {
            String id = map.get("id").asText();
            String page = Files.readString(site.resolve(map.at("/files/page").asText()), StandardCharsets.UTF_8);
            Matcher m = frame.matcher(page);
            assertTrue(m.find(), "frame code on the map page of " + id);
            assertTrue(Integer.parseInt(m.group(1)) > 200, "a fallback height that shows a map: " + m.group(1));
            assertTrue(page.contains("&lt;script src=&quot;../../assets/embed-host.js&quot;"), id);
            assertTrue(page.contains("href=\"" + id + "-fragment.html\""), id);
            assertTrue(page.contains("<button type=\"button\" class=\"embed-copy\""), "a real button: " + id);
            assertTrue(page.contains("role=\"status\""), "a status text for the copy: " + id);
            assertTrue(Files.isRegularFile(site.resolve(map.at("/files/embed").asText())), id);
        }
        for (String asset : List.of("embed-frame.js", "embed-host.js", "embed-copy.js")) {
            assertTrue(Files.isRegularFile(site.resolve("assets").resolve(asset)), asset);
        }
    }

    /** Anything that loads or refers to an id is refused; text that merely looks like markup stays text. */
    @Test
    void theSvgRewritingRefusesWhatWouldLoadAndLeavesTextAlone() {
        String svg = "<svg id='map-m' xmlns='http://www.w3.org/2000/svg' viewBox='0 0 10 10' role='img'"
                + " aria-labelledby='map-m-title map-m-desc'><title id='map-m-title'>A &apos;title&apos;</title>"
                + "<desc id='map-m-desc'>id='x' src=y url(z)</desc><g id='r-A' data-key='A'><title>A: 1</title>"
                + "<g style='fill:rgb(1,2,3)'><path d='M0,0h1v1z'/></g></g></svg>";
        String out = FragmentSvg.of(svg);
        assertFalse(Pattern.compile("<[^>]* id='").matcher(out).find(), "no id attribute: " + out);
        assertTrue(out.startsWith("<svg aria-label='A &apos;title&apos;' style='"), out);
        assertTrue(out.contains("<desc>id='x' src=y url(z)</desc>"), "text is not rewritten: " + out);
        assertTrue(out.contains("<g data-key='A'>"), out);
        for (String loads : List.of("<use href='#r-A'/>", "<image xlink:href='a.png'/>", "<style>g{}</style>",
                "<g style='fill:url(#p)'></g>", "<script>1</script>")) {
            assertThrows(IllegalStateException.class, () -> FragmentSvg.of(svg.replace("</svg>", loads + "</svg>")), loads);
        }
    }

    private static String fragment(JsonNode map) throws IOException {
        String id = map.get("id").asText();
        return Files.readString(site.resolve(map.at("/files/fragment").asText()), StandardCharsets.UTF_8);
    }

    private static Document parse(String xml) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        factory.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        factory.setFeature(XMLConstants.FEATURE_SECURE_PROCESSING, true);
        DocumentBuilder builder = factory.newDocumentBuilder();
        builder.setErrorHandler(null);
        return builder.parse(new InputSource(new StringReader(xml)));
    }

    private static Element firstElementChild(Element parent) {
        for (org.w3c.dom.Node n = parent.getFirstChild(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element) {
                return (Element) n;
            }
        }
        throw new AssertionError("no child element");
    }

    private static Element nextElementSibling(Element e) {
        for (org.w3c.dom.Node n = e.getNextSibling(); n != null; n = n.getNextSibling()) {
            if (n instanceof Element) {
                return (Element) n;
            }
        }
        throw new AssertionError("no next element");
    }

    private static int countElementsWith(Document doc, String attribute) {
        NodeList all = doc.getElementsByTagName("*");
        int n = 0;
        for (int i = 0; i < all.getLength(); i++) {
            n += ((Element) all.item(i)).hasAttribute(attribute) ? 1 : 0;
        }
        return n;
    }

    private static int count(String text, String needle) {
        int n = 0;
        for (int i = text.indexOf(needle); i >= 0; i = text.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }
}
