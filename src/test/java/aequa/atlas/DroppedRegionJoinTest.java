package aequa.atlas;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import aequa.findings.Finding;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;

/**
 * A region left out for an outline that encloses no area is reported by the join as such. In the US Census
 * Bureau's 2017 counties at 1:10m (src/test/resources/geometry/SOURCE.md), Falls Church city, Virginia
 * (FIPS 51610), is a ring of two distinct positions: too small to survive the generalisation of that scale.
 * Its neighbours Arlington (51013) and Fairfax (51059) are kept whole.
 */
class DroppedRegionJoinTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void aFigureOfARegionWithoutAreaIsReportedAsDroppedNotUnmatched(@TempDir Path project) throws IOException {
        Files.createDirectories(project.resolve("regions"));
        Files.createDirectories(project.resolve("figures"));
        ObjectNode all = (ObjectNode) JSON.readTree(Path.of("src/test/resources/geometry/us-counties-2017.geojson").toFile());
        ArrayNode kept = JSON.createArrayNode();
        all.withArray("features").forEach(f -> {
            if (Set.of("51610", "51013", "51059").contains(f.path("id").asText())) {
                kept.add(f);
            }
        });
        all.set("features", kept);
        JSON.writeValue(project.resolve("regions/virginia.geojson").toFile(), all);
        Files.writeString(project.resolve("figures/virginia.csv"), "code,rate\n51013,1.5\n51059,2.5\n51610,3.5\n");
        Files.writeString(project.resolve("aequa.yaml"), String.join("\n",
                "regions:",
                "  virginia: { file: regions/virginia.geojson, key: id, name: name }",
                "figures:",
                "  virginia: { file: figures/virginia.csv, key: code }",
                "maps:",
                "  - { id: virginia, regions: virginia, figures: virginia, indicator: rate, measure: rate, classes: { method: quantile, count: 2 } }",
                ""));
        Findings findings = new Findings();
        LoadedProject loaded = ProjectLoader.load(project, findings).orElseThrow();
        Atlas atlas = AtlasLoader.load(loaded, LoadOptions.defaults(), findings);
        assertEquals(1, atlas.maps().size(), findings.list().toString());
        assertEquals(2, atlas.maps().get(0).regions().size());
        List<Finding> dropped = findings.list().stream().filter(f -> f.code().equals("join-region-dropped")).toList();
        assertEquals(1, dropped.size(), findings.list().toString());
        assertTrue(dropped.get(0).message().contains("\"51610\"") && dropped.get(0).message().contains("encloses no area"),
                dropped.get(0).message());
        assertEquals("row 4", dropped.get(0).place());
        assertTrue(findings.list().stream().noneMatch(f -> f.code().equals("join-key-unmatched")), findings.list().toString());
    }
}
