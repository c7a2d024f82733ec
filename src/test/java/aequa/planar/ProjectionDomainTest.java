package aequa.planar;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.GeometryFactory;

import aequa.ellipsoid.LonLatDensifier;
import aequa.inputs.regions.Region;
import aequa.projection.ProjectionFamily;
import aequa.projection.Projections;

/**
 * The regions a forced projection cannot draw whole, on Natural Earth admin-0 1:110m (real data,
 * src/test/resources/geometry/SOURCE.md), checked against spherical trigonometry computed here.
 */
class ProjectionDomainTest {

    private static final List<Region> COUNTRIES = PlanarFixtures.load("ne-admin0-110m.geojson", LonLatDensifier.MAX_STEP_DEG);

    @Test
    void anEquatorialAzimuthalMapClipsExactlyTheCountriesReachingBeyond135DegFromItsCentre() {
        // Reference: the great-circle distance from the centre (0, 0), cos d = cos(lat) cos(lon) (spherical law
        // of cosines, e.g. Snyder 1987, eq. 5-3a). aequa's cap is 135 deg on the authalic sphere, whose latitudes
        // differ from geodetic ones by at most 0.13 deg (Snyder 1987, table 3), so countries within 0.2 deg of
        // the edge are not judged here.
        ProjectionDomain domain = new ProjectionDomain(Projections.lambertAzimuthal(0, 0));
        Set<String> clipped = new TreeSet<>();
        Set<String> surelyBeyond = new TreeSet<>();
        Set<String> surelyWithin = new TreeSet<>();
        for (Region country : COUNTRIES) {
            if (domain.of(country.lonLat()) == ProjectionDomain.Limit.BEYOND_DOMAIN) {
                clipped.add(country.key());
            }
            double farthestDeg = 0;
            for (Coordinate c : country.lonLat().getCoordinates()) {
                double cos = Math.cos(Math.toRadians(c.y)) * Math.cos(Math.toRadians(c.x));
                farthestDeg = Math.max(farthestDeg, Math.toDegrees(Math.acos(cos)));
            }
            if (farthestDeg > 135.2) {
                surelyBeyond.add(country.key());
            } else if (farthestDeg < 134.8) {
                surelyWithin.add(country.key());
            }
        }
        assertTrue(clipped.containsAll(surelyBeyond), "missed: " + surelyBeyond + " vs " + clipped);
        assertTrue(clipped.stream().noneMatch(surelyWithin::contains), "wrongly clipped: " + clipped);
        // the cases: Fiji and New Zealand lie partly on the far side
        assertTrue(clipped.containsAll(Set.of("FJI", "NZL")), clipped.toString());
    }

    @Test
    void anObliqueCylinderWhosePoleLiesInTheUnitedStatesIsRefusedThere() {
        // The parameters: centre (20 E, 30 N), azimuth 60, standard lines 20 deg off the central line.
        // Reference: the pole of the central great circle is the cross product of the centre's unit vector and
        // the unit vector of the direction (azimuth 60) there (vector form of spherical trigonometry, common
        // practice), on the authalic sphere the cylinder is defined on (centre latitude made authalic by Snyder 1987, eqs. 3-11
        // and 3-12); its latitude is taken back to geodetic by
        // Snyder 1987, eq. 3-18. One pole falls in the United States, the other on Kerguelen (French Southern
        // Lands), within a few km of the island's coast: the authalic conversion decides that one.
        ProjectionDomain domain = new ProjectionDomain(Projections.create(ProjectionFamily.CYLINDRICAL_OBLIQUE,
                Map.of("centre-lon", 20.0, "centre-lat", 30.0, "azimuth", 60.0, "standard-line-offset", 20.0)));
        double[] pole = greatCirclePole(20, 30, 60);
        Set<String> holdingPole = new TreeSet<>();
        Set<String> refused = new TreeSet<>();
        GeometryFactory factory = new GeometryFactory();
        for (Region country : COUNTRIES) {
            Coordinate antipode = new Coordinate(pole[0] > 0 ? pole[0] - 180 : pole[0] + 180, -pole[1]);
            for (Coordinate c : new Coordinate[] {new Coordinate(pole[0], pole[1]), antipode}) {
                if (country.lonLat().covers(factory.createPoint(c))) {
                    holdingPole.add(country.key());
                }
            }
            if (domain.of(country.lonLat()) == ProjectionDomain.Limit.AROUND_ASPECT_POLE) {
                refused.add(country.key());
            }
        }
        assertTrue(holdingPole.contains("USA"), holdingPole.toString());
        assertEquals(holdingPole, refused);
        // the normal aspect's poles are the geographic ones: Antarctica is drawn, not refused
        ProjectionDomain normal = new ProjectionDomain(Projections.create(ProjectionFamily.CYLINDRICAL, Map.of()));
        assertTrue(COUNTRIES.stream().allMatch(c -> normal.of(c.lonLat()) == ProjectionDomain.Limit.NONE));
    }

    /** The pole (lon, lat in degrees, lon in [-180, 180]) of the great circle leaving (lon, lat) at an azimuth. */
    private static double[] greatCirclePole(double lonDeg, double latDeg, double azimuthDeg) {
        double lon = Math.toRadians(lonDeg);
        double lat = authalicFromGeodetic(Math.toRadians(latDeg));
        double az = Math.toRadians(azimuthDeg);
        double[] p = {Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat)};
        double[] east = {-Math.sin(lon), Math.cos(lon), 0};
        double[] north = {-Math.sin(lat) * Math.cos(lon), -Math.sin(lat) * Math.sin(lon), Math.cos(lat)};
        double[] d = new double[3];
        for (int i = 0; i < 3; i++) {
            d[i] = Math.cos(az) * north[i] + Math.sin(az) * east[i];
        }
        double[] n = {p[1] * d[2] - p[2] * d[1], p[2] * d[0] - p[0] * d[2], p[0] * d[1] - p[1] * d[0]};
        return new double[] {Math.toDegrees(Math.atan2(n[1], n[0])), Math.toDegrees(geodeticFromAuthalic(Math.asin(n[2])))};
    }

    /** Snyder 1987, eqs. 3-11 and 3-12, on WGS 84: beta = asin(q / qp). */
    private static double authalicFromGeodetic(double phi) {
        double e = Math.sqrt(0.00669437999014);
        java.util.function.DoubleUnaryOperator q = p -> (1 - e * e) * (Math.sin(p) / (1 - e * e * Math.sin(p) * Math.sin(p))
                - 1 / (2 * e) * Math.log((1 - e * Math.sin(p)) / (1 + e * Math.sin(p))));
        return Math.asin(q.applyAsDouble(phi) / q.applyAsDouble(Math.PI / 2));
    }

    /** Snyder 1987, eq. 3-18, on WGS 84 (e^2 = 0.00669437999014, NIMA TR8350.2). */
    private static double geodeticFromAuthalic(double beta) {
        double e2 = 0.00669437999014;
        double e4 = e2 * e2;
        double e6 = e4 * e2;
        return beta + (e2 / 3 + 31 * e4 / 180 + 517 * e6 / 5040) * Math.sin(2 * beta)
                + (23 * e4 / 360 + 251 * e6 / 3780) * Math.sin(4 * beta) + 761 * e6 / 45360 * Math.sin(6 * beta);
    }
}
