package aequa.ellipsoid;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.geom.Polygon;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKTReader;

class AntimeridianCutterTest {

    private static final GeometryFactory FACTORY = new GeometryFactory();
    private static final AntimeridianCutter.Options GEOGRAPHIC =
            new AntimeridianCutter.Options(-90, 90, 0, Double.POSITIVE_INFINITY, AntimeridianCutter.PoleRule.NEARER_POLE);

    private static Polygon polygon(String wkt) throws ParseException {
        return (Polygon) new WKTReader(FACTORY).read(wkt);
    }

    private static Geometry union(List<Polygon> pieces) {
        return FACTORY.createMultiPolygon(pieces.toArray(new Polygon[0]));
    }

    @Test
    void rfc7946RectangleAcrossTheAntimeridianBecomesTwoPolygons() throws ParseException {
        // RFC 7946, section 3.1.9: "a rectangle extending from 40 degrees N, 170 degrees E across the
        // antimeridian to 50 degrees N, 170 degrees W should be cut in two and represented as a MultiPolygon":
        // [[[180.0, 40.0], [180.0, 50.0], [170.0, 50.0], [170.0, 40.0], [180.0, 40.0]]],
        // [[[-170.0, 40.0], [-170.0, 50.0], [-180.0, 50.0], [-180.0, 40.0], [-170.0, 40.0]]]
        Polygon wrapped = polygon("POLYGON((170 40, -170 40, -170 50, 170 50, 170 40))");
        List<Polygon> pieces = AntimeridianCutter.cut(wrapped, GEOGRAPHIC, FACTORY);
        Geometry expected = new WKTReader(FACTORY).read("MULTIPOLYGON(((180 40, 180 50, 170 50, 170 40, 180 40)),"
                + " ((-170 40, -170 50, -180 50, -180 40, -170 40)))");
        assertEquals(2, pieces.size());
        assertTrue(union(pieces).equalsTopo(expected), union(pieces).toText());
    }

    @Test
    void rfc7946LineCrossingPointIsInterpolatedOnTheCut() throws ParseException {
        // RFC 7946, section 3.1.9: the LineString [[170.0, 45.0], [-170.0, 45.0]] is cut into
        // [[170.0, 45.0], [180.0, 45.0]] and [[-180.0, 45.0], [-170.0, 45.0]]. Here the same edge is the
        // slanted side of a polygon from (170, 45) to (-170, 55): it must cross the cut at latitude 50.
        Polygon wrapped = polygon("POLYGON((170 45, -170 55, -170 60, 170 60, 170 45))");
        List<Polygon> pieces = AntimeridianCutter.cut(wrapped, GEOGRAPHIC, FACTORY);
        Geometry expected = new WKTReader(FACTORY).read("MULTIPOLYGON(((170 45, 180 50, 180 60, 170 60, 170 45)),"
                + " ((-180 50, -170 55, -170 60, -180 60, -180 50)))");
        assertTrue(union(pieces).equalsTopo(expected), union(pieces).toText());
    }

    @Test
    void theCrossingPointDoesNotDependOnTheEdgeDirection() throws ParseException {
        // two neighbours sharing the edge (175 41.3) - (-176 43.7), each walking it the other way
        Polygon north = polygon("POLYGON((175 41.3, -176 43.7, -176 50, 175 50, 175 41.3))");
        Polygon south = polygon("POLYGON((175 41.3, 175 30, -176 30, -176 43.7, 175 41.3))");
        Geometry a = union(AntimeridianCutter.cut(north, GEOGRAPHIC, FACTORY));
        Geometry b = union(AntimeridianCutter.cut(south, GEOGRAPHIC, FACTORY));
        long shared = java.util.Arrays.stream(a.getCoordinates())
                .filter(c -> Math.abs(c.x) == 180)
                .filter(c -> java.util.Arrays.stream(b.getCoordinates()).anyMatch(d -> d.equals2D(c)))
                .count();
        assertTrue(shared >= 2, "both pieces' cut points are bit-identical in the two neighbours");
        assertEquals(0.0, a.intersection(b).getArea(), 1e-12);
    }

    @Test
    void aRingAroundTheSouthPoleIsClosedAlongThePole() throws ParseException {
        // a ring at latitude -80 running westward all round the pole, written with wrapped longitudes
        // (as in the hostile world file's Antarctica): the region is the cap south of -80.
        Polygon ring = polygon("POLYGON((180 -80, 90 -80, 0 -80, -90 -80, -180 -80, 180 -80))");
        List<Polygon> pieces = AntimeridianCutter.cut(ring, GEOGRAPHIC, FACTORY);
        Geometry expected = new WKTReader(FACTORY).read("POLYGON((-180 -90, 180 -90, 180 -80, -180 -80, -180 -90))");
        assertTrue(union(pieces).equalsTopo(expected), union(pieces).toText());
    }

    @Test
    void aPolarCapWrittenInRfcFormIsKeptAsItIs() throws ParseException {
        // reference/areas.csv north_cap_80 form: a lon/lat rectangle -180..180 x 80..90
        Polygon cap = polygon("POLYGON((-180 80, 0 80, 180 80, 180 90, 0 90, -180 90, -180 80))");
        List<Polygon> pieces = AntimeridianCutter.cut(cap, GEOGRAPHIC, FACTORY);
        assertEquals(1, pieces.size());
        assertTrue(pieces.get(0).equalsTopo(cap));
        assertEquals(GeodesicArea.areaM2(cap), GeodesicArea.areaM2(pieces.get(0)), 1e-6 * GeodesicArea.areaM2(cap));
    }

    @Test
    void pointsOnTheCutAreNudgedInsideTheirPiece() throws ParseException {
        AntimeridianCutter.Options nudged = new AntimeridianCutter.Options(-90, 90, 1e-6, 1.0, AntimeridianCutter.PoleRule.ORIENTATION);
        List<Polygon> pieces = AntimeridianCutter.cut(polygon("POLYGON((170 40, -170 40, -170 50, 170 50, 170 40))"), nudged, FACTORY);
        for (Polygon piece : pieces) {
            double minX = piece.getEnvelopeInternal().getMinX();
            double maxX = piece.getEnvelopeInternal().getMaxX();
            assertTrue(maxX < 0 ? minX == -180 + 1e-6 : maxX == 180 - 1e-6, piece.toText());
            // the edge along the cut (10 deg of latitude) was densified to 1 deg steps
            assertTrue(piece.getNumPoints() >= 14, piece.toText());
        }
    }

    @Test
    void theLatitudeBandClipsThePolygon() throws ParseException {
        AntimeridianCutter.Options band = new AntimeridianCutter.Options(-60, 90, 0, Double.POSITIVE_INFINITY, AntimeridianCutter.PoleRule.ORIENTATION);
        List<Polygon> pieces = AntimeridianCutter.cut(polygon("POLYGON((0 -70, 10 -70, 10 -50, 0 -50, 0 -70))"), band, FACTORY);
        assertTrue(union(pieces).equalsTopo(polygon("POLYGON((0 -60, 10 -60, 10 -50, 0 -50, 0 -60))")));
    }
}
