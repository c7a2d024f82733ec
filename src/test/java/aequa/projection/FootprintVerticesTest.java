package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import aequa.ellipsoid.RegionValidator;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;

/**
 * The stated largest omega is a true maximum over the regions' vertices, not over a sample of them (issue:
 * Africa's figure was 6.55 deg over samples against 6.77 deg over its vertices). Real data: Natural Earth
 * admin-0 1:110m (src/test/resources/geometry/SOURCE.md). The reference maximum is taken here over every
 * vertex with {@link Distortion#at}, whose omega agrees with PROJ's within 2e-8 deg ({@code DistortionTest}).
 */
class FootprintVerticesTest {

    private static final Path GEOMETRY = Path.of("src/test/resources/geometry");

    @Test
    void africasLargestOmegaIsTheMaximumOverItsVertices() throws IOException {
        List<Geometry> africa = countries("Africa");
        ProjectionChoice choice = ProjectionChooser.choose(Footprint.of(africa), ProjectionRequest.automatic());
        double vertexMaxDeg = vertexMaxDeg(choice.projection(), africa);
        assertTrue(vertexMaxDeg > 6.5, "fixture sanity: the issue's figure is about 6.8 deg, got " + vertexMaxDeg);
        // every vertex is a sample, and the maximum of omega over a region lies on its outline
        assertEquals(vertexMaxDeg, choice.omegaMaxDeg(), 1e-9, choice.reason());
    }

    @Test
    void aWorldMapsPoleFigureIsTakenAtThePole() throws IOException {
        List<Geometry> world = countries(null);
        ProjectionChoice choice = ProjectionChooser.choose(Footprint.of(world), ProjectionRequest.automatic());
        // Antarctica's ring runs along the South Pole (RFC 7946, section 3.1.9), so the pole is among the vertices
        double atPoleDeg = Distortion.at(choice.projection(), 0, -90).omegaDeg();
        assertEquals(vertexMaxDeg(choice.projection(), world), choice.omegaMaxDeg(), 1e-9);
        assertTrue(choice.omegaMaxDeg() >= atPoleDeg - 1e-9, choice.omegaMaxDeg() + " < " + atPoleDeg);
    }

    private static double vertexMaxDeg(EqualAreaProjection projection, List<Geometry> regions) {
        double max = 0;
        for (Geometry region : regions) {
            for (Coordinate c : region.getCoordinates()) {
                max = Math.max(max, Distortion.at(projection, c.x, c.y).omegaDeg());
            }
        }
        return max;
    }

    /** The countries of a continent (Natural Earth's own 'continent' attribute), or all when null. */
    private static List<Geometry> countries(String continent) throws IOException {
        Set<String> keys = new HashSet<>();
        for (JsonNode feature : new ObjectMapper().readTree(GEOMETRY.resolve("ne-admin0-110m.geojson").toFile()).path("features")) {
            if (continent == null || continent.equals(feature.path("properties").path("continent").asText())) {
                keys.add(feature.path("properties").path("adm0_a3").asText());
            }
        }
        Findings findings = new Findings();
        List<Region> read = RegionReaders.read(GEOMETRY, new RegionSourceSpec("ne-admin0-110m.geojson", "adm0_a3", "name", ""), findings);
        return RegionValidator.validate(read, "ne-admin0-110m.geojson", findings).stream()
                .filter(r -> keys.contains(r.key())).map(Region::lonLat).toList();
    }
}
