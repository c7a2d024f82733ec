package aequa.endtoend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.cli.Main;
import aequa.testing.RealProject;

/**
 * A user forces a projection that cannot draw every region whole: publish stops with a finding that names the
 * cause and the regions (exit 1), never crashes (exit 3) and never publishes a caption calling areas true.
 * Real data: Natural Earth admin-0 1:110m (src/test/resources/geometry/SOURCE.md); which countries are
 * affected is checked against spherical trigonometry in {@code planar.ProjectionDomainTest}.
 */
class ForcedProjectionTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void anObliqueCylinderWithItsPoleInTheUnitedStatesIsRefusedWithTheReason(@TempDir Path project, @TempDir Path out)
            throws IOException {
        // the case: with a loose tolerance this ended in a JTS TopologyException (exit 3)
        String terminal = publishWorld(project, out, "{ family: cylindrical-oblique, parameters: { centre-lon: 20, "
                + "centre-lat: 30, azimuth: 60, standard-line-offset: 20 } }", 0.5, 1);
        assertTrue(terminal.contains("a pole of the cylindrical-oblique"), terminal);
        assertTrue(terminal.contains("United States (USA)"), terminal);
        assertFalse(terminal.contains("outline"), "the outline is not to blame: " + terminal);
        assertFalse(Files.exists(out.resolve("report.json")));
    }

    @Test
    void anAzimuthalMapThatWouldClipFarCountriesIsRefusedWithTheReason(@TempDir Path project, @TempDir Path out)
            throws IOException {
        // centre (0, 0): Fiji and New Zealand reach beyond 135 deg; with a tolerance of 0.5 New Zealand's 30 %
        // loss used to pass and the caption called the areas true
        String terminal = publishWorld(project, out, "{ family: lambert-azimuthal, parameters: { centre-lon: 0, centre-lat: 0 } }",
                0.5, 1);
        assertTrue(terminal.contains("beyond the domain of the lambert-azimuthal"), terminal);
        assertTrue(terminal.contains("New Zealand (NZL)") && terminal.contains("Fiji (FJI)"), terminal);
        assertFalse(terminal.contains("outline"), terminal);
        assertFalse(Files.exists(out.resolve("report.json")));
    }

    @Test
    void anAzimuthalMapWithinItsDomainPublishesWithTrueAreas(@TempDir Path project, @TempDir Path out) throws IOException {
        // centred on Africa (20 E, 0), every country but those of the far Pacific lies within 135 deg; a map of
        // Africa alone is the legitimate use, so the world file is limited to one continent here
        publishWorld(project, out, "{ family: lambert-azimuthal, parameters: { centre-lon: 20, centre-lat: 0 } }", 1e-4, 0,
                "Africa");
        JsonNode map = JSON.readTree(out.resolve("report.json").toFile()).path("maps").get(0);
        assertTrue(map.path("areaAudit").path("maxRelativeError").asDouble() < 1e-4);
        assertEquals("lambert-azimuthal", map.path("projection").path("family").asText());
    }

    private static String publishWorld(Path project, Path out, String projection, double tolerance, int expectedCode,
                                       String... continents) throws IOException {
        RealProject world = RealProject.in(project).regions("world", "ne-admin0-110m.geojson");
        if (continents.length > 0) {
            keepContinents(project.resolve("regions/world.geojson"), continents);
        }
        world.figures("world", "adm0_a3", "pop_est", RealProject.property("pop_est")).projectFile(
                "site: { title: \"Forced projections\" }",
                "regions:",
                "  world: { file: regions/world.geojson, key: adm0_a3, name: name }",
                "figures:",
                "  world: { file: figures/world.csv, key: code }",
                "checks: { area-tolerance: " + tolerance + " }",
                "maps:",
                "  - { id: world, regions: world, figures: world, indicator: pop_est, measure: count, normalise: area,",
                "      unit: \"people per km²\", projection: " + projection + " }");
        StringWriter terminal = new StringWriter();
        int code = Main.run(new String[] {"publish", project.toString(), "--out", out.toString()},
                new PrintWriter(terminal, true), new PrintWriter(terminal, true));
        assertEquals(expectedCode, code, terminal.toString());
        return terminal.toString();
    }

    private static void keepContinents(Path geojson, String... continents) throws IOException {
        com.fasterxml.jackson.databind.node.ObjectNode root = (com.fasterxml.jackson.databind.node.ObjectNode) JSON.readTree(geojson.toFile());
        com.fasterxml.jackson.databind.node.ArrayNode kept = JSON.createArrayNode();
        for (JsonNode feature : root.path("features")) {
            if (java.util.List.of(continents).contains(feature.path("properties").path("continent").asText())) {
                kept.add(feature);
            }
        }
        root.set("features", kept);
        JSON.writeValue(geojson.toFile(), root);
    }
}
