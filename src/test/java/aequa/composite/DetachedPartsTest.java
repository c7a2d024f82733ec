package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;

import aequa.inputs.regions.Region;
import aequa.projection.Footprint;
import aequa.projection.ProjectionChoice;
import aequa.projection.ProjectionChooser;
import aequa.projection.ProjectionRequest;

/**
 * The detached parts found in real boundary files (src/test/resources/geometry/SOURCE.md): the US Census
 * Bureau's 2017 states and counties, keyed by FIPS codes (FIPS 5-2 state codes: 02 Alaska, 15 Hawaii,
 * 60 American Samoa, 66 Guam, 69 Northern Mariana Islands, 72 Puerto Rico, 78 US Virgin Islands), and Natural
 * Earth's 1:110m countries. The expected parts are the ones every US reference map draws apart (common
 * practice); the distances quoted are great-circle figures from memory, checked only to a wide margin.
 */
class DetachedPartsTest {

    /** The parts expected for the US files, by state FIPS code, largest first. */
    private static final List<Set<String>> US_PARTS = List.of(Set.of("02"), Set.of("15"), Set.of("72", "78"),
            Set.of("66", "69"), Set.of("60"));

    @Test
    void theUsStatesSplitIntoTheContiguousStatesAlaskaHawaiiAndTheTerritories() {
        RealRegions states = RealRegions.read("us-states-2017.geojson", "id");
        DetachedParts.Result found = DetachedParts.find(states.regions(), states.areaKm2ByKey());
        assertEquals(49, found.main().keys().size(), "48 contiguous states and the District of Columbia");
        assertEquals(US_PARTS, found.detached().stream().map(g -> Set.copyOf(g.keys())).toList());
        // Alaska's panhandle lies about 800 km from Washington state across British Columbia (from memory)
        double alaskaGapKm = found.detached().get(0).gapKm();
        assertTrue(alaskaGapKm > 700 && alaskaGapKm < 950, "Alaska gap " + alaskaGapKm);
        // Hawaii is detached by its gap alone: about 3,700 km from California (from memory)
        assertTrue(found.detached().get(1).gapKm() > 3400, "Hawaii gap " + found.detached().get(1).gapKm());
        assertTrue(found.detached().get(0).omegaWithDeg() > found.omegaMainDeg() * 1.5, "Alaska stretches the main map");
    }

    @Test
    void theUsCountiesSplitAlongStateLines() {
        RealRegions counties = RealRegions.read("us-counties-2017.geojson", "id");
        DetachedParts.Result found = DetachedParts.find(counties.regions(), counties.areaKm2ByKey());
        List<Set<String>> byState = new ArrayList<>();
        for (DetachedParts.Group g : found.detached()) {
            Set<String> states = new TreeSet<>();
            g.keys().forEach(k -> states.add(k.substring(0, 2)));
            byState.add(states);
        }
        assertEquals(US_PARTS, byState.stream().map(Set::copyOf).toList());
        assertEquals(Set.copyOf(counties.keysStartingWith("02")), Set.copyOf(found.detached().get(0).keys()), "every Alaska borough");
        assertTrue(found.main().keys().stream().noneMatch(k -> k.startsWith("02") || k.startsWith("15") || k.startsWith("72")));
        // offshore island counties stay with their mainland: Nantucket (25019), Dukes (25007), Monroe with the Keys (12087)
        assertTrue(found.main().keys().containsAll(List.of("25019", "25007", "12087")));
    }

    @Test
    void theChoiceMadeForTheOmegaTestIsTheMainPartsOwnAutomaticChoice() {
        // the planner reuses this choice for the main part, so it must be the one a fresh automatic choice on the
        // main part's regions (in file order) gives: same family, parameters and largest omega
        RealRegions counties = RealRegions.read("us-counties-2017.geojson", "id");
        DetachedParts.Result found = DetachedParts.find(counties.regions(), counties.areaKm2ByKey());
        DetachedParts.ChosenFor made = found.automaticChoices().get(found.main().keys());
        assertTrue(made != null, "Alaska needed the omega test");
        Set<String> main = Set.copyOf(found.main().keys());
        Footprint footprint = Footprint.of(counties.regions().stream().filter(r -> main.contains(r.key()))
                .map(Region::lonLat).toList());
        ProjectionChoice fresh = ProjectionChooser.choose(footprint, ProjectionRequest.automatic());
        ProjectionChoice reused = made.choice();
        assertEquals(fresh.projection().wkt2(), reused.projection().wkt2());
        assertEquals(fresh.omegaMaxDeg(), reused.omegaMaxDeg(), 0.0);
        assertEquals(found.omegaMainDeg(), reused.omegaMaxDeg(), 0.0);
        Footprint kept = made.footprint();
        assertEquals(footprint.sphericalCentreLonDeg(), kept.sphericalCentreLonDeg(), 0.0);
        assertEquals(footprint.angularRadiusDeg(), kept.angularRadiusDeg(), 0.0);
        // the parts' own choices, made side by side with the omega test, are each part's fresh choice too
        Map<String, Region> byKey = new HashMap<>();
        counties.regions().forEach(r -> byKey.put(r.key(), r));
        for (DetachedParts.Group part : found.detached()) {
            DetachedParts.ChosenFor own = found.automaticChoices().get(part.keys());
            assertTrue(own != null, part.keys().get(0));
            ProjectionChoice alone = ProjectionChooser.choose(Footprint.of(part.keys().stream()
                    .map(k -> byKey.get(k).lonLat()).toList()), ProjectionRequest.automatic());
            assertEquals(alone.projection().wkt2(), own.choice().projection().wkt2(), part.keys().get(0));
            assertEquals(alone.omegaMaxDeg(), own.choice().omegaMaxDeg(), 0.0);
        }
        assertEquals(6, found.automaticChoices().size(), "the main part and its five detached parts");
    }

    @Test
    void aWorldFileStaysOneMap() {
        RealRegions world = RealRegions.read("ne-admin0-110m.geojson", "adm0_a3");
        DetachedParts.Result found = DetachedParts.find(world.regions(), world.areaKm2ByKey());
        assertEquals(List.of(), found.detached());
        assertEquals(world.regions().size(), found.main().keys().size());
    }
}
