package aequa.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Geometry;

import aequa.ellipsoid.GeodesicDistance;
import aequa.inputs.regions.Region;

/**
 * The pruned nearest-pair search of {@link PointCloud#gapKm} gives exactly what comparing every pair gives,
 * on real outlines: the US Census Bureau's 2017 states (src/test/resources/geometry/SOURCE.md), state FIPS
 * codes (FIPS 5-2): 02 Alaska, 06 California, 12 Florida, 15 Hawaii, 53 Washington, 72 Puerto Rico. The sets
 * are small enough that no thinning applies, so the exhaustive search sees the same points.
 */
class PointCloudTest {

    private static final RealRegions STATES = RealRegions.read("us-states-2017.geojson", "id");

    @Test
    void thePrunedSearchFindsThePairEveryPairComparisonFinds() {
        List<List<String>> pairs = List.of(List.of("15", "06"), List.of("02", "53"), List.of("72", "12"),
                List.of("06", "53"), List.of("53", "02"));
        for (List<String> pair : pairs) {
            List<Geometry> a = outlines(pair.get(0));
            List<Geometry> b = outlines(pair.get(1));
            assertTrue(points(a) <= PointCloud.MAX_POINTS && points(b) <= PointCloud.MAX_POINTS, "no thinning: " + pair);
            assertEquals(exhaustiveGapKm(a, b), PointCloud.of(a).gapKm(PointCloud.of(b)), pair.toString());
        }
    }

    @Test
    void anEmptySetIsInfinitelyFar() {
        assertEquals(Double.POSITIVE_INFINITY, PointCloud.of(List.of()).gapKm(PointCloud.of(outlines("15"))));
        assertEquals(Double.POSITIVE_INFINITY, PointCloud.of(outlines("15")).gapKm(PointCloud.of(List.of())));
    }

    /** Every pair of vertices compared by chord length, the first of equally near pairs kept. */
    private static double exhaustiveGapKm(List<Geometry> a, List<Geometry> b) {
        Coordinate[] as = coordinates(a);
        Coordinate[] bs = coordinates(b);
        double[] p = new double[3];
        double[] q = new double[3];
        double best = Double.POSITIVE_INFINITY;
        Coordinate bestA = null;
        Coordinate bestB = null;
        for (Coordinate ca : as) {
            GeodesicDistance.geocentric(ca.x, ca.y, p, 0);
            for (Coordinate cb : bs) {
                GeodesicDistance.geocentric(cb.x, cb.y, q, 0);
                double dx = p[0] - q[0];
                double dy = p[1] - q[1];
                double dz = p[2] - q[2];
                double d2 = dx * dx + dy * dy + dz * dz;
                if (d2 < best) {
                    best = d2;
                    bestA = ca;
                    bestB = cb;
                }
            }
        }
        return GeodesicDistance.metres(bestA.x, bestA.y, bestB.x, bestB.y) / 1000;
    }

    private static List<Geometry> outlines(String stateCode) {
        return STATES.regions().stream().filter(r -> r.key().equals(stateCode)).map(Region::lonLat).toList();
    }

    private static int points(List<Geometry> geometries) {
        return geometries.stream().mapToInt(Geometry::getNumPoints).sum();
    }

    private static Coordinate[] coordinates(List<Geometry> geometries) {
        return geometries.stream().flatMap(g -> java.util.Arrays.stream(g.getCoordinates())).toArray(Coordinate[]::new);
    }
}
