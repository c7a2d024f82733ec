package aequa.publish;

import java.nio.file.Path;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionRequest;

/**
 * The projections of the edition currently published in an output folder, as its report.json recorded
 * them, so the next load can keep a map's projection unless a new one is clearly better.
 */
public final class PreviousProjections {

    private PreviousProjections() {
    }

    /** By map id; empty when there is no readable report.json (a first publish, or a damaged one). */
    public static Map<String, ProjectionRequest.Previous> read(Path outDir) {
        Map<String, ProjectionRequest.Previous> byMap = new TreeMap<>();
        Optional<JsonNode> report = SiteReport.readPrevious(outDir.toAbsolutePath().normalize(), new ObjectMapper());
        report.ifPresent(root -> root.path("maps").forEach(map -> {
            JsonNode projection = map.path("projection");
            Optional<ProjectionFamily> family = ProjectionFamily.fromConfigName(projection.path("family").asText(""));
            if (family.isEmpty() || !map.path("id").isTextual()) {
                return;
            }
            Map<String, Double> parameters = new TreeMap<>();
            projection.path("parameters").forEach(p -> {
                if (p.path("key").isTextual() && p.path("value").isNumber()) {
                    parameters.put(p.path("key").asText(), p.path("value").asDouble());
                }
            });
            byMap.put(map.path("id").asText(), new ProjectionRequest.Previous(family.get(), parameters));
        }));
        return byMap;
    }
}
