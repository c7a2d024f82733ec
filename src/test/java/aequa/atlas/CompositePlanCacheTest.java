package aequa.atlas;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import aequa.composite.PartPlan;
import aequa.findings.Findings;
import aequa.project.LoadedProject;
import aequa.project.ProjectLoader;
import aequa.project.RegionSourceSpec;
import aequa.projection.Footprint;
import aequa.projection.ProjectionParameter;
import aequa.projection.ProjectionRequest;
import aequa.testing.RealProject;

/**
 * The monthly rebuild of a composite map takes the map's parts (the detached-part search and each part's
 * projection choice) and the parts' planar layers from the geometry cache: the search does not run again, and
 * what the cache gives is what a load without any cache computes. The map is the US Census Bureau's 2017
 * states (src/test/resources/geometry/SOURCE.md) with {@code insets: auto}, which splits off Alaska, Hawaii and
 * the territories (as {@code CompositeMapsTest} shows for the counties).
 */
class CompositePlanCacheTest {

    private static Path project;
    private static Path cacheFolder;
    private static LoadedProject loaded;
    private static MapModel firstLoad;

    @BeforeAll
    static void publishOnceIntoACache(@TempDir Path tmp) throws IOException {
        project = tmp.resolve("project");
        cacheFolder = project.resolve(".aequa-cache");
        RealProject.in(project).regions("states", "us-states-2017.geojson")
                .figures("states", "id", "value", RealProject.codeModulo("id", 13))
                .projectFile(
                "regions:",
                "  states: { file: regions/states.geojson, key: id, name: name, insets: auto }",
                "figures:",
                "  states: { file: figures/states.csv, key: code }",
                "maps:",
                "  - { id: states, regions: states, figures: states, indicator: value, measure: rate }");
        Findings findings = new Findings();
        loaded = ProjectLoader.load(project, findings).orElseThrow(() -> new AssertionError(findings.list()));
        firstLoad = load(Map.of());
        assertTrue(firstLoad.parts().size() > 1, "a composite map: " + firstLoad.parts().size() + " part(s)");
    }

    @Test
    void theCacheHoldsThePartsAndEachPartsPlanarLayer() throws IOException {
        List<String> files = cacheFiles();
        assertEquals(1, files.stream().filter(f -> f.contains("-parts-")).count(), files.toString());
        assertEquals(firstLoad.parts().size(), files.stream().filter(f -> f.contains("-planar-")).count(), files.toString());
    }

    @Test
    void aRebuildTakesThePartsFromTheCacheWithoutSearchingAgain() {
        List<PartPlan> cached = cachedParts(ProjectionRequest.automatic());
        assertPartsMatch(firstLoad.parts(), cached);
    }

    @Test
    void theMonthlyUpdateWithThePreviousEditionsChoiceAlsoSkipsTheSearch() {
        // the second publish into a folder asks with the previous edition's projection of the main part
        Map<String, Double> parameters = new java.util.TreeMap<>();
        for (ProjectionParameter p : firstLoad.projection().projection().parameters()) {
            parameters.put(p.key(), p.value());
        }
        ProjectionRequest withPrevious = new ProjectionRequest(Optional.empty(), Map.of(), Optional.of(
                new ProjectionRequest.Previous(firstLoad.projection().projection().family(), parameters)));
        assertPartsMatch(firstLoad.parts(), cachedParts(withPrevious));
    }

    @Test
    void aMapLoadedFromTheCacheEqualsOneLoadedWithoutIt() {
        MapModel fromCache = load(Map.of());
        Findings findings = new Findings();
        MapModel cold = AtlasLoader.load(loaded, LoadOptions.defaults(), findings).maps().get(0);
        assertPartsMatch(cold.parts().stream().map(CompositePlanCacheTest::plan).toList(), fromCache.parts());
        assertEquals(cold.regions().size(), fromCache.regions().size());
        for (int i = 0; i < cold.regions().size(); i++) {
            MapRegion a = cold.regions().get(i);
            MapRegion b = fromCache.regions().get(i);
            assertEquals(a.key(), b.key());
            assertTrue(a.planarM().equalsExact(b.planarM()), "the drawn outline of " + a.key());
        }
    }

    /** The parts a fresh run's cache gives for the states layer; the search and the layer's reading must not run. */
    private static List<PartPlan> cachedParts(ProjectionRequest request) {
        GeometryCache cache = GeometryCache.in(cacheFolder, false);
        RegionSourceSpec spec = loaded.file().regions().get("states");
        RegionLayer layer = cache.layer(project, "states", spec, new Findings(),
                () -> fail("the layer should come from the cache"));
        return cache.parts(layer, spec.insets(), request, () -> fail("the part search ran"));
    }

    private static MapModel load(Map<String, ProjectionRequest.Previous> previous) {
        Findings findings = new Findings();
        LoadOptions options = new LoadOptions(LoadOptions.defaults().pageBackground(), previous)
                .withCache(cacheFolder, LoadOptions.CacheUse.READ_AND_STORE);
        Atlas atlas = AtlasLoader.load(loaded, options, findings);
        assertFalse(findings.hasErrors(), findings.list().toString());
        return atlas.maps().get(0);
    }

    private static void assertPartsMatch(List<?> expected, List<?> actual) {
        assertEquals(expected.size(), actual.size());
        for (int i = 0; i < expected.size(); i++) {
            PartPlan a = plan(expected.get(i));
            PartPlan b = plan(actual.get(i));
            assertEquals(List.of(a.id(), a.name(), sorted(a.keys()), a.main(), a.areaScale(), a.areaKm2(), a.gapKm()),
                    List.of(b.id(), b.name(), sorted(b.keys()), b.main(), b.areaScale(), b.areaKm2(), b.gapKm()));
            assertEquals(a.choice().projection().wkt2(), b.choice().projection().wkt2());
            assertEquals(a.choice().omegaMaxDeg(), b.choice().omegaMaxDeg());
            if (a.footprint() != null) {
                assertFootprintsEqual(a.footprint(), b.footprint());
            }
        }
    }

    private static List<String> sorted(List<String> keys) {
        return keys.stream().sorted().toList();
    }

    private static void assertFootprintsEqual(Footprint a, Footprint b) {
        assertEquals(List.of(a.centreLonDeg(), a.lonSpanDeg(), a.minLatDeg(), a.maxLatDeg(), a.sphericalCentreLonDeg(),
                        a.sphericalCentreLatDeg(), a.angularRadiusDeg(), a.elongation(), a.orientationDeg()),
                List.of(b.centreLonDeg(), b.lonSpanDeg(), b.minLatDeg(), b.maxLatDeg(), b.sphericalCentreLonDeg(),
                        b.sphericalCentreLatDeg(), b.angularRadiusDeg(), b.elongation(), b.orientationDeg()));
        assertArrayEquals(a.samples().lonLatDeg(), b.samples().lonLatDeg());
        assertArrayEquals(a.samples().weights(), b.samples().weights());
        assertEquals(a.samples().interiorCount(), b.samples().interiorCount());
        assertEquals(a.samples().extremeCount(), b.samples().extremeCount());
    }

    /** A map part as the plan it came from (no footprint: a drawn part does not keep one). */
    private static PartPlan plan(Object part) {
        if (part instanceof PartPlan plan) {
            return plan;
        }
        MapPart p = (MapPart) part;
        return new PartPlan(p.id(), p.name(), p.keys(), p.main(), p.areaScale(), "", p.areaKm2(), p.gapKm(), null,
                p.projection());
    }

    private static List<String> cacheFiles() throws IOException {
        try (Stream<Path> files = Files.list(cacheFolder)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }
}
