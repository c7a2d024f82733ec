package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.coverage.CoverageValidator;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;
import org.locationtech.jts.operation.overlayng.OverlayNGRobust;

import aequa.inputs.regions.Region;
import aequa.projection.Projections;

/**
 * The coverage invariant on real data: the 3,231 US counties of 2017 (US Census via npm us-atlas 3.0.1;
 * src/test/resources/geometry/SOURCE.md), projected with Lambert azimuthal equal-area and simplified for a
 * 1,000-pixel-wide screen map. Checks, in the spirit of JTS's own coverage tests: the coverage validator
 * flags no new region; no new overlaps (sum of areas minus the area of the union does not grow); no new
 * gaps (no more holes in the union of all counties).
 */
class CoverageSimplificationTest {

    private static List<String> keys;
    private static List<Geometry> projected;
    private static double toleranceM;

    @BeforeAll
    static void projectCounties() {
        double stepDeg = LonLatDensifierStep.STEP_DEG;
        List<Region> counties = PlanarFixtures.load("us-counties-2017.geojson", stepDeg);
        PolygonProjector projector = new PolygonProjector(Projections.lambertAzimuthal(-96, 38), stepDeg);
        keys = counties.stream().map(Region::key).collect(Collectors.toList());
        projected = counties.stream().map(r -> projector.project(r.lonLat())).collect(Collectors.toList());
        // the conterminous states span about 4,600 km east-west
        toleranceM = CoverageSimplification.screenToleranceM(4_600_000, 1000);
    }

    /** The densification step used for the counties. */
    private static final class LonLatDensifierStep {
        static final double STEP_DEG = 0.05;
    }

    private static double areaSum(List<Geometry> coverage) {
        return coverage.stream().mapToDouble(Geometry::getArea).sum();
    }

    private static int holes(Geometry union) {
        int holes = 0;
        for (int i = 0; i < union.getNumGeometries(); i++) {
            holes += ((org.locationtech.jts.geom.Polygon) union.getGeometryN(i)).getNumInteriorRing();
        }
        return holes;
    }

    /** Indices of the regions CoverageValidator flags (overlapping or not matching a neighbour's edges). */
    private static java.util.Set<Integer> flagged(List<Geometry> coverage) {
        Geometry[] invalid = CoverageValidator.validate(coverage.toArray(new Geometry[0]));
        java.util.Set<Integer> out = new java.util.TreeSet<>();
        for (int i = 0; i < invalid.length; i++) {
            if (invalid[i] != null && !invalid[i].isEmpty()) {
                out.add(i);
            }
        }
        return out;
    }

    @Test
    void simplificationAddsNoGapsOrOverlaps() {
        // SOURCE.md: 3,231 counties; one, 51610 (Falls Church city), is a ring with fewer than three distinct
        // positions at this scale and is left out by validation
        assertEquals(3230, keys.size());
        // The source itself is not a perfect coverage: quantisation made a few neighbours cross (validation
        // reports them as coverage-mismatch). The invariant is that simplification makes nothing worse.
        java.util.Set<Integer> flaggedBefore = flagged(projected);
        assertTrue(flaggedBefore.size() < 20, "source mismatches: " + flaggedBefore.size());

        CoverageSimplification.Result result = CoverageSimplification.simplify(keys, projected, toleranceM, 0);
        for (Geometry g : result.planarM()) {
            assertTrue(g.isValid());
            assertFalse(g.isEmpty());
        }
        assertTrue(flaggedBefore.containsAll(flagged(result.planarM())), "CoverageValidator flags no new region");
        int verticesBefore = projected.stream().mapToInt(Geometry::getNumPoints).sum();
        int verticesAfter = result.planarM().stream().mapToInt(Geometry::getNumPoints).sum();
        assertTrue(verticesAfter < verticesBefore / 2, verticesBefore + " -> " + verticesAfter);

        // overlaps: sum of the areas minus the area of the union (pairwise overlap area) does not grow
        Geometry unionBefore = OverlayNGRobust.union(projected, new GeometryFactory());
        Geometry unionAfter = OverlayNGRobust.union(result.planarM(), new GeometryFactory());
        double overlapBeforeM2 = areaSum(projected) - unionBefore.getArea();
        double overlapAfterM2 = areaSum(result.planarM()) - unionAfter.getArea();
        assertTrue(overlapAfterM2 <= overlapBeforeM2 + 1e-9 * unionAfter.getArea(), overlapBeforeM2 + " -> " + overlapAfterM2);
        // gaps: the union has no new holes, and the gap finder finds no new narrow gaps
        // (holes narrower than the tolerance may close, as their rings shrink below what the simplifier keeps)
        assertTrue(holes(unionAfter) <= holes(unionBefore), holes(unionBefore) + " -> " + holes(unionAfter));
        // (CoverageGapFinder needs a valid coverage, which this source is not; the union's holes are the gaps)
        // the map's total area moves by well under 0.1 % (only the outer coast is smoothed)
        assertEquals(unionBefore.getArea(), unionAfter.getArea(), 1e-3 * unionBefore.getArea());
    }

    /**
     * Our edge simplifier against JTS's CoverageSimplifier (a general-purpose reference library; the same
     * Visvalingam-Whyatt reading of the tolerance, area at most tolerance squared) on the same real
     * counties: both must keep a like number of vertices. Ours keeps a vertex the triangle guard once
     * blocked until a neighbour goes, so it may keep a few more (measured: 62,326 against 62,315).
     */
    @Test
    void keepsAboutAsManyVerticesAsJtsCoverageSimplifier() {
        Geometry[] reference = org.locationtech.jts.coverage.CoverageSimplifier.simplify(
                projected.toArray(new Geometry[0]), toleranceM);
        int jtsKept = java.util.Arrays.stream(reference).mapToInt(Geometry::getNumPoints).sum();
        int oursKept = CoverageSimplification.simplify(keys, projected, toleranceM, 0).planarM().stream()
                .mapToInt(Geometry::getNumPoints).sum();
        double ratio = (double) oursKept / jtsKept;
        assertTrue(ratio > 0.98 && ratio < 1.02, "ours " + oursKept + ", JTS " + jtsKept);
    }

    @Test
    void smallFreeStandingIslandsAreDroppedAndRecorded() {
        double islandM2 = CoverageSimplification.islandThresholdM2(toleranceM);
        CoverageSimplification.Result result = CoverageSimplification.simplify(keys, projected, toleranceM, islandM2);
        assertFalse(result.dropped().isEmpty(), "the 1:10m counties include islets below one pixel");
        for (CoverageSimplification.DroppedPart part : result.dropped()) {
            assertTrue(part.areaKm2() * 1e6 < islandM2, part.toString());
            int index = keys.indexOf(part.key());
            assertFalse(result.planarM().get(index).isEmpty(), "a region keeps its largest part");
        }
        assertTrue(flagged(projected).containsAll(flagged(result.planarM())));
    }

    @Test
    void islandsTouchingANeighbourAreKept() throws ParseException {
        WKTReader wkt = new WKTReader();
        List<Geometry> coverage = new ArrayList<>(List.of(
                wkt.read("MULTIPOLYGON(((0 0, 100 0, 100 100, 0 100, 0 0)), ((200 0, 201 0, 201 1, 200 0)), ((300 0, 301 0, 301 1, 300 0)))"),
                wkt.read("POLYGON((301 0, 400 0, 400 100, 301 1, 301 0))")));
        CoverageSimplification.Result result = CoverageSimplification.simplify(List.of("a", "b"), coverage, 0, 10);
        assertEquals(1, result.dropped().size(), result.dropped().toString());
        assertEquals("a", result.dropped().get(0).key());
        assertEquals(200.67, result.dropped().get(0).xM(), 0.4);
        assertEquals(2, result.planarM().get(0).getNumGeometries());
    }

    @Test
    void toleranceFollowsTheOutputSize() {
        // 0.5 pixel of a 1,000 px map 5,000 km wide = 2.5 km; 0.1 mm of a 250 mm print of the same map = 2 km
        assertEquals(2500, CoverageSimplification.screenToleranceM(5_000_000, 1000), 1e-9);
        assertEquals(2000, CoverageSimplification.printToleranceM(5_000_000, 250), 1e-9);
        assertEquals(4 * 2500 * 2500, CoverageSimplification.islandThresholdM2(2500), 1e-6);
    }
}
