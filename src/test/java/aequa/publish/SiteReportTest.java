package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.findings.Finding;

/** report.json against the model it was written from, and the site's internal links. */
class SiteReportTest {

    @TempDir
    static Path tmp;

    static Atlas atlas;
    static JsonNode report;

    @BeforeAll
    static void publish() throws Exception {
        atlas = SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 2, 12);
        SitePublisher.publish(atlas, List.of(Finding.warning("join-missing-figure", "figures.csv", "row 7",
                "Region K001 has no figure.", "Add a row for K001.")), new FakeArtwork(), tmp.resolve("site"),
                PublishOptions.defaults());
        report = new ObjectMapper().readTree(tmp.resolve("site/report.json").toFile());
    }

    @Test
    void mapsCarryProjectionAuditClassesAndRegions() {
        MapModel map = atlas.maps().get(0);
        JsonNode m = report.at("/maps/0");
        assertEquals(map.id(), m.get("id").asText());
        assertEquals("lambert-azimuthal", m.at("/projection/family").asText());
        assertEquals(map.projection().projection().wkt2(), m.at("/projection/wkt2").asText());
        assertEquals(52.0, parameter(m.at("/projection/parameters"), "centre-lat"));
        assertEquals(map.projection().reason(), m.at("/projection/reason").asText());
        assertEquals(3e-9, m.at("/areaAudit/maxRelativeError").asDouble());
        assertEquals("K002", m.at("/areaAudit/worstKey").asText());
        assertEquals(map.classification().limits().size(), m.at("/classification/breaks").size());
        assertEquals(map.regions().size(), m.get("regions").size());
        JsonNode noData = m.at("/regions/1");
        assertEquals("no-data", noData.get("status").asText());
        assertTrue(noData.get("value").isNull() && noData.get("class").isNull(), "NaN and no class are null");
        assertEquals("not-applicable", m.at("/regions/3/status").asText());
        assertTrue(m.at("/regions/4/unreliable").asBoolean());
        assertEquals(0.0, m.at("/regions/4/value").asDouble());
        assertEquals(1, m.at("/regions/4/class").asInt(), "classes count from 1");
        assertEquals(1, m.at("/regions/4/periods").size());
    }

    @Test
    void findingsAreKeptAndNoTimingsAreWritten() throws Exception {
        assertEquals("join-missing-figure", report.at("/findings/0/code").asText());
        assertEquals("warning", report.at("/findings/0/severity").asText());
        String text = Files.readString(tmp.resolve("site/report.json"));
        assertFalse(Pattern.compile("\"(elapsed|time|timing|duration|generated)\\w*\"", Pattern.CASE_INSENSITIVE)
                .matcher(text).find(), "report.json must hold no timings");
        assertEquals(List.of("format", "site", "editionDigest", "maps", "findings", "changes"), fieldNames(report));
    }

    @Test
    void everyCaptionNamesTheProjectionReportJsonRecords() throws Exception {
        for (JsonNode m : report.get("maps")) {
            String page = Files.readString(tmp.resolve("site").resolve(m.at("/files/page").asText()));
            assertTrue(page.contains(m.at("/projection/name").asText() + " projection"), m.get("id").asText());
        }
    }

    @Test
    void everyInternalLinkResolvesToAFile() throws Exception {
        Path site = tmp.resolve("site");
        Pattern link = Pattern.compile("(?:href|src)=\"([^\"#]+)(?:#[^\"]*)?\"");
        List<String> broken = new ArrayList<>();
        for (Map.Entry<String, byte[]> file : PublishTestSupport.files(site).entrySet()) {
            if (!file.getKey().endsWith(".html")) {
                continue;
            }
            Matcher m = link.matcher(new String(file.getValue(), java.nio.charset.StandardCharsets.UTF_8));
            while (m.find()) {
                if (URI.create(m.group(1)).isAbsolute()) {
                    continue;
                }
                Path target = site.resolve(file.getKey()).getParent().resolve(m.group(1)).normalize();
                if (!target.startsWith(site) || !Files.isRegularFile(target)) {
                    broken.add(file.getKey() + " -> " + m.group(1));
                }
            }
        }
        assertEquals(List.of(), broken);
    }

    private static List<String> fieldNames(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    /** The value of the parameter with {@code key} in a report's parameter list. */
    static double parameter(JsonNode parameters, String key) {
        for (JsonNode p : parameters) {
            if (p.path("key").asText().equals(key)) {
                return p.path("value").asDouble();
            }
        }
        throw new AssertionError("no parameter " + key + " in " + parameters);
    }
}
