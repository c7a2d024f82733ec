package aequa.ellipsoid;

import org.locationtech.jts.geom.CoordinateSequence;
import org.locationtech.jts.geom.Geometry;

/**
 * Exact areas on the WGS 84 ellipsoid of polygons whose edges are straight in longitude and latitude, as
 * GeoJSON reads them (RFC 7946, section 3.1.1): an edge between two points of one parallel runs along that
 * parallel, not along the geodesic. This is the shape the map draws, so it is the truth the area audit
 * compares the map with. No edge is read as a geodesic, however short: a length threshold (such as 0.05 deg)
 * would read one edge of a border as a geodesic and the next as lon/lat-straight, a shape neither RFC 7946 nor
 * the drawing has. GeographicLib measures geodesic edges only ({@link GeodesicArea}); a geodesic
 * between two points of a parallel bows towards the pole, by up to 2.9e-4 of a real US county's area
 * (county 22067, whose border follows the 33rd parallel), hence this class of our own.
 *
 * <p>Method: the map (lon, phi) to (x, y) = (lon, Z(phi)) with Z(phi) = (a^2 / 2) q(phi) is equal-area from
 * the ellipsoid to the plane, since a zone from the equator to phi has area (a^2 / 2) q(phi) per radian of
 * longitude (q: Snyder 1987, USGS Professional Paper 1395, eq. 3-12; the same q gives the authalic latitude,
 * eq. 3-11, and Rq^2 = a^2 qp / 2, eq. 3-13). Green's theorem in that plane gives a ring's area as
 * -sum over edges of dLon * mean of Z along the edge; along an edge lon and phi change linearly together,
 * so the mean is (1/dPhi) times the integral of Z over [phi0, phi1], taken here by
 * {@value #NODES}-point Gauss-Legendre quadrature on pieces at most {@value #PIECE_DEG} deg of latitude
 * long (Z is smooth there, with singularities only at sin(phi) = +-1/e, far off the real line; the
 * quadrature error is below 1e-15 relative). An edge along a parallel is exact with a single node.
 *
 * <p>Conventions as {@link GeodesicArea}: rings in RFC 7946 form (no edge spans more than 180 deg of
 * longitude); either orientation gives the enclosed area (a polar cap drawn as RFC 7946 draws it, along
 * +-180 and the pole's line, is a plain ring in this plane and measures right); holes are subtracted,
 * parts summed; empty geometry has area 0, NaN coordinates give NaN. A ring not in RFC 7946 form has no
 * lon/lat-straight reading of its jumping edge and is measured by {@link GeodesicArea} (geodesic edges,
 * smaller side), as before.
 */
public final class LonLatArea {

    private static final double M2_PER_KM2 = 1e6;

    /** WGS 84 semi-major axis, metres, and flattening (NIMA TR8350.2, table 3.1). */
    private static final double A_M = 6_378_137.0;
    private static final double F = 1.0 / 298.257223563;
    private static final double E2 = F * (2 - F);
    private static final double E = Math.sqrt(E2);

    /** Gauss-Legendre nodes per piece of an edge. */
    static final int NODES = 6;

    /** Longest piece of an edge, in degrees of latitude, integrated with one set of nodes. */
    static final double PIECE_DEG = 10.0;

    private static final double[] NODE_T = new double[NODES];
    private static final double[] NODE_WEIGHT = new double[NODES];

    static {
        gaussLegendreOnUnitInterval(NODE_T, NODE_WEIGHT);
    }

    private LonLatArea() {
    }

    /** The area of a Polygon or MultiPolygon in square kilometres. */
    public static double areaKm2(Geometry lonLat) {
        return areaM2(lonLat) / M2_PER_KM2;
    }

    /** The area of a Polygon or MultiPolygon in square metres. */
    public static double areaM2(Geometry lonLat) {
        return RingSums.areaM2(lonLat, LonLatArea::ringAreaM2);
    }

    /** The area enclosed by one closed ring, whatever its orientation, in square metres. */
    static double ringAreaM2(CoordinateSequence ring) {
        if (ring.size() < 4) {
            return 0;
        }
        if (jumpsAcrossAntimeridian(ring)) {
            return GeodesicArea.ringAreaM2(ring);
        }
        // Z is summed in units of a^2 / 2 and relative to the first vertex's latitude: the ring is closed,
        // so the constant drops out of the sum and the terms stay small for a small ring far from the equator
        double qRef = q(Math.toRadians(ring.getY(0)));
        double sum = 0;
        for (int i = 0; i + 1 < ring.size(); i++) {
            double dLonRad = Math.toRadians(ring.getX(i + 1) - ring.getX(i));
            if (dLonRad != 0) {
                sum += dLonRad * (meanQ(ring.getY(i), ring.getY(i + 1)) - qRef);
            }
        }
        return Math.abs(sum) * A_M * A_M / 2;
    }

    /**
     * Whether an edge spans more than 180 deg of longitude, other than one running from -180 to +180 (a whole
     * parallel or the pole's line, as RFC 7946 writes a polar cap).
     */
    private static boolean jumpsAcrossAntimeridian(CoordinateSequence ring) {
        for (int i = 0; i + 1 < ring.size(); i++) {
            double x0 = ring.getX(i);
            double x1 = ring.getX(i + 1);
            if (Math.abs(x1 - x0) > 180 && !(Math.abs(x0) == 180 && Math.abs(x1) == 180)) {
                return true;
            }
        }
        return false;
    }

    /** The mean of q over the latitude interval [lat0Deg, lat1Deg] (q at lat0 when they are equal). */
    static double meanQ(double lat0Deg, double lat1Deg) {
        double dLatDeg = lat1Deg - lat0Deg;
        if (dLatDeg == 0) {
            return q(Math.toRadians(lat0Deg));
        }
        int pieces = Math.max(1, (int) Math.ceil(Math.abs(dLatDeg) / PIECE_DEG));
        double sum = 0;
        for (int p = 0; p < pieces; p++) {
            for (int k = 0; k < NODES; k++) {
                double t = (p + NODE_T[k]) / pieces;
                sum += NODE_WEIGHT[k] * q(Math.toRadians(lat0Deg + t * dLatDeg));
            }
        }
        return sum / pieces;
    }

    /**
     * Snyder 1987 eq. 3-12: q = (1 - e^2) [sin(phi) / (1 - e^2 sin^2(phi)) - (1 / 2e) ln((1 - e sin(phi)) /
     * (1 + e sin(phi)))], the logarithm written as atanh(e sin(phi)) / e.
     */
    static double q(double latRad) {
        double s = Math.sin(latRad);
        double x = E * s;
        double atanh = 0.5 * Math.log1p(2 * x / (1 - x));
        return (1 - E2) * (s / (1 - E2 * s * s) + atanh / E);
    }

    /**
     * Gauss-Legendre nodes and weights moved to [0, 1] (weights summing to 1): the roots of the Legendre
     * polynomial P_n by Newton's method from the Chebyshev-like guess cos(pi (i + 3/4) / (n + 1/2)), with
     * P_n and its derivative from the three-term recurrence and weight 2 / ((1 - x^2) P_n'(x)^2)
     * (Abramowitz and Stegun 1964, 25.4.29 and 22.7.10; the usual construction, e.g. Press et al.,
     * Numerical Recipes, section 4.5).
     */
    private static void gaussLegendreOnUnitInterval(double[] nodes, double[] weights) {
        int n = nodes.length;
        for (int i = 0; i < n; i++) {
            double x = Math.cos(Math.PI * (i + 0.75) / (n + 0.5));
            double derivative = 0;
            for (int iteration = 0; iteration < 100; iteration++) {
                double p0 = 1;
                double p1 = x;
                for (int k = 2; k <= n; k++) {
                    double p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
                    p0 = p1;
                    p1 = p2;
                }
                derivative = n * (x * p1 - p0) / (x * x - 1);
                double step = p1 / derivative;
                x -= step;
                if (Math.abs(step) < 1e-16) {
                    break;
                }
            }
            nodes[i] = (1 - x) / 2;
            weights[i] = 1 / ((1 - x * x) * derivative * derivative);
        }
    }
}
