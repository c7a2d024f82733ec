package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

import aequa.ellipsoid.GeodesicArea;
import aequa.ellipsoid.LonLatDensifier;
import aequa.inputs.regions.Region;
import aequa.projection.EqualAreaProjection;
import aequa.projection.ProjectionFamily;
import aequa.projection.Projections;

class PolygonProjectorTest {

    /** LonLatDensifier.MAX_STEP_DEG: at 0.25 deg the audit fails for Luxembourg (1.5e-4), at 0.05 it passes. */
    private static final double STEP_DEG = 0.05;
    /** Width of the test cylindrical projection's map: 2 pi Rq, Rq = 6371007.180918 m (reference/README). */
    private static final double MAP_WIDTH_M = 2 * Math.PI * 6371007.180918;

    @ParameterizedTest(name = "central meridian {0}")
    @ValueSource(doubles = {0, 150, -100})
    void worldRegionsNeverStreakAndKeepTheirAreas(double lon0) {
        // The repaired hostile world file (Russia and Fiji across +-180, Antarctica round the pole) with a
        // normal-aspect cylindrical equal-area projection cut at lon0 + 180.
        List<Region> world = PlanarFixtures.load("world-atlas-110m.stitched.geojson", STEP_DEG);
        PolygonProjector projector = new PolygonProjector(cylindrical(lon0), STEP_DEG);
        assertFalse(projector.continuousAcrossCut());
        List<RegionAreaCheck> checks = new ArrayList<>();
        for (Region region : world) {
            Geometry planar = projector.project(region.lonLat());
            assertTrue(planar.isValid(), region.key());
            // a streak is an edge jumping across the map; densified at 0.05 deg, no honest edge exceeds 1 %
            assertTrue(longestEdgeM(planar) < 0.01 * MAP_WIDTH_M, region.key() + " has an edge " + longestEdgeM(planar) + " m long");
            checks.add(AreaAuditor.check(region.key(), GeodesicArea.areaKm2(region.lonLat()), planar));
        }
        AreaAudit audit = AreaAuditor.audit(checks, 1e-4);
        assertTrue(audit.passed(), audit.toString());
    }

    /** The longest edge of any ring, in metres. */
    static double longestEdgeM(Geometry polygons) {
        double longest = 0;
        for (int i = 0; i < polygons.getNumGeometries(); i++) {
            var polygon = (org.locationtech.jts.geom.Polygon) polygons.getGeometryN(i);
            for (int r = -1; r < polygon.getNumInteriorRing(); r++) {
                var ring = (r < 0 ? polygon.getExteriorRing() : polygon.getInteriorRingN(r)).getCoordinates();
                for (int k = 1; k < ring.length; k++) {
                    longest = Math.max(longest, ring[k].distance(ring[k - 1]));
                }
            }
        }
        return longest;
    }

    @Test
    void pointsExactlyOnTheCutLandOnTheirOwnSide() throws ParseException {
        // RFC 7946 form, section 3.1.9: one piece ends at +180, the other starts at -180. With the cut at
        // 180 (lon0 = 0), the first must lie on the map's east edge, the second on its west edge.
        Geometry east = new WKTReader().read("POLYGON((170 40, 180 40, 180 50, 170 50, 170 40))");
        Geometry west = new WKTReader().read("POLYGON((-180 40, -170 40, -170 50, -180 50, -180 40))");
        PolygonProjector projector = new PolygonProjector(cylindrical(0), 1.0);
        Geometry eastM = projector.project(LonLatDensifier.densify(east, 1.0));
        Geometry westM = projector.project(LonLatDensifier.densify(west, 1.0));
        assertTrue(eastM.getEnvelopeInternal().getMinX() > 0.9 * MAP_WIDTH_M / 2, eastM.toText());
        assertTrue(westM.getEnvelopeInternal().getMaxX() < -0.9 * MAP_WIDTH_M / 2, westM.toText());
        assertEquals(eastM.getArea(), westM.getArea(), 1e-6 * eastM.getArea(), "mirror images");
        assertEquals(GeodesicArea.areaM2(LonLatDensifier.densify(east, 1.0)), eastM.getArea(), 1e-4 * eastM.getArea());
    }

    @Test
    void aRegionAcrossTheCutIsSplitIntoOnePiecePerSide() throws ParseException {
        // the RFC 7946 section 3.1.9 rectangle, 170 E to 170 W, seen with lon0 = 0: two pieces, one per map edge
        Geometry box = new WKTReader().read("MULTIPOLYGON(((170 40, 180 40, 180 50, 170 50, 170 40)), ((-180 40, -170 40, -170 50, -180 50, -180 40)))");
        Geometry onePiece = projectorAt(-175).project(LonLatDensifier.densify(box, 0.5));
        assertEquals(1, onePiece.getNumGeometries(), "on a Pacific-centred map the two source parts merge again");
        assertTrue(onePiece.isValid());
        assertTrue(onePiece.getEnvelopeInternal().getWidth() < 0.1 * MAP_WIDTH_M);
        // and a single ring written across the cut (not RFC form) is cut by the projector itself
        Geometry wrapped = new WKTReader().read("POLYGON((-10 40, 10 40, 10 50, -10 50, -10 40))");
        Geometry split = projectorAt(180).project(LonLatDensifier.densify(wrapped, 0.5));
        assertEquals(2, split.getNumGeometries());
        assertEquals(GeodesicArea.areaM2(LonLatDensifier.densify(wrapped, 0.5)), split.getArea(), 1e-4 * split.getArea());
    }

    private static PolygonProjector projectorAt(double lon0) {
        return new PolygonProjector(cylindrical(lon0), 0.5);
    }

    @Test
    void anAzimuthalProjectionIsContinuousAndClipsToItsDomain() throws ParseException {
        // Projections.lambertAzimuthal: frame latitude domain [-45, 90], i.e. within 135 deg of the centre.
        PolygonProjector projector = new PolygonProjector(Projections.lambertAzimuthal(0, 0), 0.5);
        assertTrue(projector.continuousAcrossCut());
        Geometry beyond = new WKTReader().read("POLYGON((150 -5, 170 -5, 170 5, 150 5, 150 -5))");
        assertTrue(projector.project(LonLatDensifier.densify(beyond, 0.5)).isEmpty(), "more than 135 deg from the centre");
        Geometry straddling = new WKTReader().read("POLYGON((125 -5, 145 -5, 145 5, 125 5, 125 -5))");
        Geometry dense = LonLatDensifier.densify(straddling, 0.1);
        double ratio = projector.project(dense).getArea() / GeodesicArea.areaM2(dense);
        // the box reaches 135 deg from the centre at its middle: about half of it is inside the domain
        assertTrue(ratio > 0.4 && ratio < 0.6, "ratio " + ratio);
    }

    @Test
    void anAzimuthalProjectionCutsAStraddlingPartAlongTheDomainEdgeRatherThanDroppingPoints() throws ParseException {
        // Projections.lambertAzimuthal: frame latitude domain [-45, 90]. A part with points beyond it must be
        // clipped in the frame (new vertices on the frame parallel -45), not merely lose its NaN points.
        EqualAreaProjection laea = Projections.lambertAzimuthal(0, 0);
        PolygonProjector projector = new PolygonProjector(laea, 0.5);
        Geometry straddling = LonLatDensifier.densify(new WKTReader().read("POLYGON((125 -5, 145 -5, 145 5, 125 5, 125 -5))"), 0.1);
        Coordinate[] projected = projector.project(straddling).getCoordinates();
        double[] lonLat = new double[2 * projected.length];
        double[] xy = new double[2 * projected.length];
        for (int i = 0; i < projected.length; i++) {
            xy[2 * i] = projected[i].x;
            xy[2 * i + 1] = projected[i].y;
        }
        laea.inverse(xy, 0, lonLat, 0, projected.length);
        int onEdge = 0;
        double[] frame = new double[2];
        for (int i = 0; i < projected.length; i++) {
            laea.frame().toFrame(lonLat[2 * i], lonLat[2 * i + 1], frame);
            assertTrue(frame[1] > -45 - 1e-6, "inside the domain: " + frame[1]);
            if (Math.abs(frame[1] + 45) < 1e-6) {
                onEdge++;
            }
        }
        // the edge crosses the 10-degree-tall box; cut edges are densified to the 0.5 deg step: about 20 vertices
        assertTrue(onEdge >= 15, onEdge + " vertices on the domain edge");
    }

    /** Normal-aspect Lambert cylindrical equal-area on WGS 84: a projection with a cut at lon0 + 180. */
    private static EqualAreaProjection cylindrical(double lon0Deg) {
        return Projections.create(ProjectionFamily.CYLINDRICAL, java.util.Map.of("centre-lon", lon0Deg));
    }
}
