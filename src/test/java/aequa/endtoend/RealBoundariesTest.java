package aequa.endtoend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.cli.Main;
import aequa.testing.RealProject;

/**
 * Real open boundary files publish cleanly: a national file with thousands of regions (US counties, US Census
 * Bureau 2017) and a world file with antimeridian and polar regions (Natural Earth admin-0 1:110m, whose
 * own population estimates give the figures). Sources and licences: src/test/resources/geometry/SOURCE.md.
 */
class RealBoundariesTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    @Test
    void aNationalAndAWorldFilePublishWithTrueAreas(@TempDir Path project, @TempDir Path out) throws IOException {
        // the figures: Natural Earth's own population estimate (pop_est) per country; the county's state FIPS
        // code as its "figure" (real attribute data, enough to classify and draw)
        RealProject.in(project).regions("world", "ne-admin0-110m.geojson").regions("counties", "us-counties-2017.geojson")
                .figures("world", "adm0_a3", "pop_est", RealProject.property("pop_est"))
                .figures("counties", "id", "state_code", RealProject.property("state_fips"))
                .projectFile(
                "site: { title: \"Real boundaries\" }",
                "regions:",
                "  world: { file: regions/world.geojson, key: adm0_a3, name: name }",
                "  counties: { file: regions/counties.geojson, key: id, name: name }",
                "figures:",
                "  world: { file: figures/world.csv, key: code }",
                "  counties: { file: figures/counties.csv, key: code }",
                "maps:",
                "  - { id: world-density, regions: world, figures: world, indicator: pop_est, measure: count,",
                "      normalise: area, unit: \"people per km²\" }",
                "  - { id: county-test, regions: counties, figures: counties, indicator: state_code, measure: rate }");
        StringWriter terminal = new StringWriter();
        int code = Main.run(new String[] {"publish", project.toString(), "--out", out.toString()},
                new PrintWriter(terminal, true), new PrintWriter(terminal, true));
        assertEquals(0, code, terminal.toString());

        JsonNode report = JSON.readTree(out.resolve("report.json").toFile());
        for (JsonNode map : report.path("maps")) {
            double error = map.path("areaAudit").path("maxRelativeError").asDouble();
            // the project's default tolerance, and the figure the issue asks every real map to meet
            assertTrue(error < 1e-4, map.path("id").asText() + ": area error " + error);
        }
        JsonNode world = report.path("maps").get(0);
        assertTrue(world.path("projection").path("family").asText().matches("equal-earth|mollweide"));
        assertEquals(177, world.path("regions").size(), "every Natural Earth country kept");
        // one county of the file (Falls Church, 51610) collapses to no area and is reported, not drawn
        assertEquals(3230, report.path("maps").get(1).path("regions").size());
    }
}
