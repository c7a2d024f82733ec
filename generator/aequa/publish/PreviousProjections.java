package aequa.publish;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionRequest;

/**
 * The projections of the edition currently published in an output folder, as its report.json recorded
 * them, so the next load can keep a map's projection unless a new one is clearly better.
 *
 * <p>The report is streamed: only each map's {@code id} and {@code projection} are built, every other
 * member (the regions above all, most of the file) is skipped unread into objects. A report.json of the
 * US counties is 1.2 MB, of which the projection is 4 kB.
 */
public final class PreviousProjections {

    private PreviousProjections() {
    }

    /** By map id; empty when there is no readable report.json (a first publish, or a damaged one). */
    public static Map<String, ProjectionRequest.Previous> read(Path outDir) {
        Path file = outDir.toAbsolutePath().normalize().resolve(SiteReport.FILE_NAME);
        if (!Files.isRegularFile(file)) {
            return Map.of();
        }
        Map<String, ProjectionRequest.Previous> byMap = new TreeMap<>();
        ObjectMapper json = new ObjectMapper();
        try (JsonParser parser = json.getFactory().createParser(file.toFile())) {
            if (parser.nextToken() != JsonToken.START_OBJECT) {
                return Map.of();
            }
            boolean sawMaps = false;
            while (parser.nextToken() == JsonToken.FIELD_NAME) {
                String field = parser.getCurrentName();
                JsonToken value = parser.nextToken();
                if (field.equals("maps") && value == JsonToken.START_ARRAY) {
                    sawMaps = true;
                    while (parser.nextToken() == JsonToken.START_OBJECT) {
                        readMap(parser, json, byMap);
                    }
                } else {
                    parser.skipChildren();
                }
            }
            return sawMaps ? byMap : Map.of();
        } catch (IOException unreadable) {
            return Map.of(); // then the choice starts afresh, as on a first publish
        }
    }

    /** One element of {@code maps}, the parser on its opening brace; leaves it on the closing one. */
    private static void readMap(JsonParser parser, ObjectMapper json, Map<String, ProjectionRequest.Previous> byMap)
            throws IOException {
        String id = null;
        JsonNode projection = null;
        while (parser.nextToken() == JsonToken.FIELD_NAME) {
            String field = parser.getCurrentName();
            JsonToken value = parser.nextToken();
            if (field.equals("id") && value == JsonToken.VALUE_STRING) {
                id = parser.getText();
            } else if (field.equals("projection") && value == JsonToken.START_OBJECT) {
                projection = json.readTree(parser);
            } else {
                parser.skipChildren();
            }
        }
        if (id == null || projection == null) {
            return;
        }
        Optional<ProjectionFamily> family = ProjectionFamily.fromConfigName(projection.path("family").asText(""));
        if (family.isEmpty()) {
            return;
        }
        Map<String, Double> parameters = new TreeMap<>();
        projection.path("parameters").forEach(p -> {
            if (p.path("key").isTextual() && p.path("value").isNumber()) {
                parameters.put(p.path("key").asText(), p.path("value").asDouble());
            }
        });
        byMap.put(id, new ProjectionRequest.Previous(family.get(), parameters));
    }
}
