package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.operation.polygonize.Polygonizer;

import aequa.ellipsoid.LonLatArea;
import aequa.findings.Findings;
import aequa.inputs.regions.Region;
import aequa.inputs.regions.RegionReaders;
import aequa.project.RegionSourceSpec;

/**
 * Dissolving the US Census Bureau's 2017 counties by their {@code state} property gives the states of the
 * Bureau's own 2017 states file (src/test/resources/geometry/SOURCE.md; both files come from the same
 * topology in npm us-atlas 3.0.1, whose states are the merged counties): the outlines of each state enclose
 * that state's area as the states file gives it.
 */
class DissolvedOutlinesTest {

    private static final Path GEOMETRY = Path.of("src/test/resources/geometry");

    @Test
    void countiesDissolvedByStateEncloseTheStatesOfTheStatesFile() {
        Findings findings = new Findings();
        List<Region> counties = RegionReaders.read(GEOMETRY, new RegionSourceSpec("us-counties-2017.geojson", "id", "name", ""), findings);
        List<Region> states = RegionReaders.read(GEOMETRY, new RegionSourceSpec("us-states-2017.geojson", "id", "name", ""), findings);
        Map<String, Double> stateAreaKm2 = new LinkedHashMap<>();
        states.forEach(s -> stateAreaKm2.put(s.name(), LonLatArea.areaKm2(s.lonLat())));
        // three states of different shapes: straight lines (Colorado), rivers and coasts (Kentucky, Maine)
        for (String state : List.of("Colorado", "Kentucky", "Maine")) {
            Map<String, List<Geometry>> groups = new LinkedHashMap<>();
            List<Geometry> members = new ArrayList<>();
            counties.stream().filter(c -> state.equals(c.attributes().get("state"))).forEach(c -> members.add(c.lonLat()));
            groups.put(state, members);
            Geometry outline = DissolvedOutlines.of(groups);
            Polygonizer polygonizer = new Polygonizer(true);
            polygonizer.add(outline);
            double enclosedKm2 = 0;
            for (Object p : polygonizer.getPolygons()) {
                enclosedKm2 += LonLatArea.areaKm2(((Geometry) p).norm().reverse());
            }
            assertEquals(1, enclosedKm2 / stateAreaKm2.get(state), 1e-6, state);
            // no county border inside the state is left: the outline is far shorter than all county rings
            double countyRingsDeg = members.stream().mapToDouble(g -> g.getBoundary().getLength()).sum();
            assertTrue(outline.getLength() < 0.5 * countyRingsDeg, state + ": " + outline.getLength() + " of " + countyRingsDeg);
        }
    }
}
