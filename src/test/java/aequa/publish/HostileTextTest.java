package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.NodeList;

import aequa.pages.PageRenderer;

/**
 * Hostile text in titles, names and notes (markup, quotes, ampersands, U+202E, 10,000 characters) must come
 * out as text: escaped in HTML (Freemarker's HTML auto-escaping), neutralised in CSV (OWASP "CSV
 * Injection"). The pages are written as well-formed XML (polyglot HTML5), so a real XML parser (the JDK's)
 * is a strict check that no markup leaked: any stray {@code <script>} or unbalanced quote breaks the parse
 * or adds an element.
 */
class HostileTextTest {

    @TempDir
    static Path tmp;

    static Map<String, byte[]> site;

    @BeforeAll
    static void publish() throws IOException {
        Path out = tmp.resolve("site");
        SitePublisher.publish(SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.hostile(), 1, 12),
                new FakeArtwork(), out, PublishOptions.defaults());
        site = PublishTestSupport.files(out);
    }

    @Test
    void everyPageParsesAsXmlAndHasNoScriptButOurs() throws Exception {
        for (Map.Entry<String, byte[]> page : site.entrySet()) {
            if (!page.getKey().endsWith(".html")) {
                continue;
            }
            Document doc = parse(page.getValue());
            NodeList scripts = doc.getElementsByTagName("script");
            List<String> sources = new ArrayList<>();
            for (int i = 0; i < scripts.getLength(); i++) {
                assertEquals("", scripts.item(i).getTextContent(), "an inline script in " + page.getKey());
                String src = scripts.item(i).getAttributes().getNamedItem("src").getNodeValue();
                assertTrue(PageRenderer.ASSET_NAMES.stream().anyMatch(asset -> src.equals("../../" + asset) || src.equals(asset)),
                        "a script that is not ours in " + page.getKey() + ": " + src);
                sources.add(src);
            }
            boolean fragment = page.getKey().endsWith("-fragment.html");
            assertEquals(!fragment, sources.stream().anyMatch(src -> src.endsWith("assets/hover.js")), page.getKey());
            assertEquals(0, doc.getElementsByTagName("img").getLength() - countThumbnails(page.getKey()),
                    "an <img> from the notes leaked into " + page.getKey());
            assertEquals(0, doc.getElementsByTagName("b").getLength(), page.getKey());
            assertEquals(0, doc.getElementsByTagName("i").getLength(), page.getKey());
        }
    }

    @Test
    void hostileTitleIsPrintedAsEscapedText() {
        String page = new String(site.get("maps/map-a/index.html"), StandardCharsets.UTF_8);
        assertTrue(page.contains("Map &lt;script&gt;alert(1)&lt;/script&gt; &amp; &#39;quotes&#39; &quot;double&quot;"), page);
        assertFalse(page.contains("<script>alert"));
        assertTrue(page.contains("\u202E"), "the right-to-left mark stays as text, escaped context only");
        String index = new String(site.get("index.html"), StandardCharsets.UTF_8);
        assertTrue(index.contains("alt=\"Small map: Map &lt;script&gt;"), "attribute context escaped");
    }

    @Test
    void hostileRegionNameIsNeutralisedInCsv() {
        String csv = new String(site.get("maps/map-a/map-a.csv"), StandardCharsets.UTF_8);
        // OWASP "CSV Injection": a leading = becomes '= and the cell is quoted, inner quotes doubled (RFC 4180)
        assertTrue(csv.contains("\"'=HYPERLINK(\"\"http://x.invalid\"\",\"\"click\"\") <b>bold</b> & \u202Egnp.exe\""), csv);
        for (String line : csv.split("\r\n")) {
            for (String cell : line.split(",")) {
                String raw = cell.startsWith("\"") ? cell.substring(1) : cell;
                assertFalse(raw.startsWith("=") || raw.startsWith("+") || raw.startsWith("@"), cell);
            }
        }
    }

    @Test
    void reportJsonKeepsTheTextExactly() throws IOException {
        com.fasterxml.jackson.databind.JsonNode report = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(site.get("report.json"));
        assertEquals(SiteFixtures.Texts.hostile().regionName(), report.at("/maps/0/regions/0/name").asText());
    }

    private static int countThumbnails(String page) {
        return page.equals("index.html") ? 1 : 0;
    }

    static Document parse(byte[] html) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(html));
    }
}
