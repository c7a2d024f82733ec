package aequa.publish;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.atlas.Atlas;
import aequa.atlas.MapModel;
import aequa.projection.ProjectionParameter;
import aequa.projection.ProjectionRequest;

/**
 * The previous edition's projections, streamed from report.json, against the model the report was written
 * from and against the same report read whole by Jackson's tree model (a general-purpose JSON library).
 */
class PreviousProjectionsTest {

    @TempDir
    static Path tmp;

    static Atlas atlas;
    static Path site;

    @BeforeAll
    static void publish() throws Exception {
        atlas = SiteFixtures.atlas(tmp.resolve("project"), SiteFixtures.Texts.plain(), 3, 6);
        site = tmp.resolve("site");
        SitePublisher.publish(atlas, List.of(), new FakeArtwork(), site, PublishOptions.defaults());
    }

    @Test
    void everyMapKeepsItsFamilyAndParameters() {
        Map<String, ProjectionRequest.Previous> read = PreviousProjections.read(site);
        assertEquals(atlas.maps().size(), read.size());
        for (MapModel map : atlas.maps()) {
            ProjectionRequest.Previous previous = read.get(map.id());
            assertEquals(map.projection().projection().family(), previous.family(), map.id());
            Map<String, Double> expected = new TreeMap<>();
            for (ProjectionParameter p : map.projection().projection().parameters()) {
                expected.put(p.key(), p.value());
            }
            assertEquals(expected, previous.parameters(), map.id());
        }
    }

    @Test
    void agreesWithTheWholeTree() throws Exception {
        JsonNode tree = new ObjectMapper().readTree(site.resolve("report.json").toFile());
        Map<String, ProjectionRequest.Previous> read = PreviousProjections.read(site);
        for (JsonNode map : tree.path("maps")) {
            ProjectionRequest.Previous previous = read.get(map.path("id").asText());
            assertEquals(map.at("/projection/family").asText(), previous.family().configName());
            for (JsonNode p : map.at("/projection/parameters")) {
                assertEquals(p.path("value").asDouble(), previous.parameters().get(p.path("key").asText()));
            }
        }
    }

    @Test
    void noReportOrADamagedOneGivesNothing() throws Exception {
        assertTrue(PreviousProjections.read(tmp.resolve("nowhere")).isEmpty());
        Path damaged = tmp.resolve("damaged");
        Files.createDirectories(damaged);
        String whole = Files.readString(site.resolve("report.json"), StandardCharsets.UTF_8);
        Files.writeString(damaged.resolve("report.json"), whole.substring(0, whole.length() / 2));
        assertTrue(PreviousProjections.read(damaged).isEmpty(), "a report cut in half");
        Files.writeString(damaged.resolve("report.json"), "{\"maps\": {\"id\": \"map-a\"}}");
        assertTrue(PreviousProjections.read(damaged).isEmpty(), "maps that are not an array");
        Files.writeString(damaged.resolve("report.json"), "[1, 2]");
        assertTrue(PreviousProjections.read(damaged).isEmpty(), "not an object");
    }
}
