package aequa.ellipsoid;

import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicMask;

/**
 * Distances on the WGS 84 ellipsoid: the geodesic between two points by GeographicLib (Karney 2013, "Algorithms
 * for geodesics", J. Geodesy 87, doi:10.1007/s00190-012-0578-z), and geocentric (earth-centred, earth-fixed)
 * coordinates, in which the straight-line (chord) distance grows with the geodesic one, so the nearest of many
 * points can be found with plain arithmetic before the geodesic is measured. Arguments are longitude first,
 * in degrees, as everywhere in aequa; GeographicLib takes latitude first.
 */
public final class GeodesicDistance {

    private static final double A_M = Geodesic.WGS84.EquatorialRadius();
    /** First eccentricity squared, e^2 = f (2 - f). */
    private static final double E2 = Geodesic.WGS84.Flattening() * (2 - Geodesic.WGS84.Flattening());

    private GeodesicDistance() {
    }

    /** The length of the shortest geodesic between two points, in metres (NaN for NaN input). */
    public static double metres(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        return Geodesic.WGS84.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg, GeodesicMask.DISTANCE).s12;
    }

    /** The azimuth of the geodesic from point 1 to point 2 at point 1, degrees clockwise from north, in (-180, 180]. */
    public static double azimuthDeg(double lon1Deg, double lat1Deg, double lon2Deg, double lat2Deg) {
        return Geodesic.WGS84.Inverse(lat1Deg, lon1Deg, lat2Deg, lon2Deg, GeodesicMask.AZIMUTH).azi1;
    }

    /**
     * Writes the geocentric x, y, z (metres; x towards 0 deg E on the equator, z towards the North Pole) of a
     * point on the ellipsoid's surface into {@code xyz} at {@code offset}.
     */
    public static void geocentric(double lonDeg, double latDeg, double[] xyz, int offset) {
        // IOGP Guidance Note 7-2, section 4.1.1 (geographic to geocentric), with ellipsoidal height 0:
        // X = nu cos(lat) cos(lon), Y = nu cos(lat) sin(lon), Z = (1 - e^2) nu sin(lat), nu = a / sqrt(1 - e^2 sin^2(lat))
        double lat = Math.toRadians(latDeg);
        double lon = Math.toRadians(lonDeg);
        double sinLat = Math.sin(lat);
        double nu = A_M / Math.sqrt(1 - E2 * sinLat * sinLat);
        xyz[offset] = nu * Math.cos(lat) * Math.cos(lon);
        xyz[offset + 1] = nu * Math.cos(lat) * Math.sin(lon);
        xyz[offset + 2] = (1 - E2) * nu * sinLat;
    }
}
