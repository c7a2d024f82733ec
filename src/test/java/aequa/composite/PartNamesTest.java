package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.GeometryFactory;

import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.project.InsetsSpec;
import aequa.projection.ProjectionRequest;

/**
 * Default names of detached parts, taken from the regions' own names. On the US Census Bureau's 2017 counties
 * (src/test/resources/geometry/SOURCE.md: each county carries its {@code state} name) the parts are the
 * states and territories every US reference map frames (common practice), named after them; Puerto Rico
 * (about 9,100 km²) is larger than the US Virgin Islands (about 350 km²) and Guam (about 540 km²) larger
 * than the Northern Mariana Islands' land (about 460 km²) (areas from memory), so they are named first.
 */
class PartNamesTest {

    private static final GeometryFactory GEOMETRY = new GeometryFactory();

    @Test
    void countyPartsAreNamedByTheirStates() {
        RealRegions counties = RealRegions.read("us-counties-2017.geojson", "id");
        List<PartPlan> parts = CompositePlanner.plan(counties.regions(), counties.areaKm2ByKey(), InsetsSpec.AUTO,
                ProjectionRequest.automatic(), new CompositePlanner.SettingPlace(p -> "", "/insets"), new Findings());
        assertEquals(List.of("Main map", "Alaska", "Hawaii", "Puerto Rico and United States Virgin Islands",
                "Guam and Commonwealth of the Northern Mariana Islands", "American Samoa"),
                parts.stream().map(PartPlan::name).toList());
    }

    @Test
    void statePartsWithoutOtherPropertiesAreNamedByTheirRegions() {
        RealRegions states = RealRegions.read("us-states-2017.geojson", "id");
        List<PartPlan> parts = CompositePlanner.plan(states.regions(), states.areaKm2ByKey(), InsetsSpec.AUTO,
                ProjectionRequest.automatic(), new CompositePlanner.SettingPlace(p -> "", "/insets"), new Findings());
        assertEquals("Puerto Rico and United States Virgin Islands", parts.get(3).name());
    }

    /** Invented regions (labelled as such): a property every region shares names nothing; codes name nothing. */
    @Test
    void aPropertyOfTheWholeMapOrOfCodesIsNoName() {
        List<Region> all = List.of(
                region("a", "Avel", Map.of("country", "Invented Land", "zone", "17")),
                region("b", "Bramm", Map.of("country", "Invented Land", "zone", "17")),
                region("c", "Corrin", Map.of("country", "Invented Land", "zone", "18")),
                region("d", "Dask", Map.of("country", "Invented Land", "zone", "18")));
        List<Region> group = all.subList(0, 3);
        assertEquals(List.of(), SharedProperty.values(group, all, 2));
        Map<String, Double> areas = Map.of("a", 30.0, "b", 20.0, "c", 10.0, "d", 1.0);
        String name = CompositePlanner.defaultName(group, all, areas, 100, null, null);
        assertEquals("Avel and 2 more", name, "the largest region's name");
        List<Region> unnamed = List.of(region("x", "x", Map.of()), region("y", "y", Map.of()), region("z", "z", Map.of()));
        assertTrue(CompositePlanner.defaultName(unnamed, unnamed, Map.of("x", 1.0, "y", 1.0, "z", 1.0), Double.NaN,
                footprint(0, 0), footprint(0, 10)).startsWith("3 regions to the north"), "regions without names: where they lie");
    }

    private static Region region(String key, String name, Map<String, String> attributes) {
        return new Region(key, name, GEOMETRY.createPolygon(), attributes);
    }

    private static aequa.projection.Footprint footprint(double lonDeg, double latDeg) {
        var square = GEOMETRY.toGeometry(new org.locationtech.jts.geom.Envelope(lonDeg - 1, lonDeg + 1, latDeg - 1, latDeg + 1));
        return aequa.projection.Footprint.of(List.of(square));
    }
}
