package aequa.projection;

/**
 * The two semi-axes of an ellipsoid of revolution, in metres. aequa maps only WGS 84; other ellipsoids
 * exist so that published worked examples on GRS 80, Clarke 1866 or International 1924 can be reproduced.
 *
 * @param semiMajorM equatorial radius a, in metres
 * @param semiMinorM polar radius b, in metres (b = a for a sphere)
 */
record EllipsoidAxes(double semiMajorM, double semiMinorM) {

    /** WGS 84: a = 6378137 m, 1/f = 298.257223563 (NIMA TR8350.2); b derived from a and f. */
    static final EllipsoidAxes WGS84 = fromInverseFlattening(6378137.0, 298.257223563);

    EllipsoidAxes {
        if (!(semiMajorM > 0) || !(semiMinorM > 0) || semiMinorM > semiMajorM) {
            throw new IllegalArgumentException("need 0 < b <= a, got a=" + semiMajorM + " b=" + semiMinorM);
        }
    }

    static EllipsoidAxes fromInverseFlattening(double semiMajorM, double inverseFlattening) {
        return new EllipsoidAxes(semiMajorM, semiMajorM * (1.0 - 1.0 / inverseFlattening));
    }

    /** First eccentricity squared, e^2 = 1 - b^2/a^2 (Snyder 1987, chapter 3: e^2 = 2f - f^2). */
    double eccentricitySquared() {
        double ratio = semiMinorM / semiMajorM;
        return (1.0 - ratio) * (1.0 + ratio);
    }

    /** Meridional radius of curvature M at geodetic latitude phi (radians), in metres (Snyder 1987, eq. 4-18). */
    double meridionalRadiusM(double latRad) {
        double e2 = eccentricitySquared();
        double s = Math.sin(latRad);
        double w = 1.0 - e2 * s * s;
        return semiMajorM * (1.0 - e2) / (w * Math.sqrt(w));
    }

    /** Prime-vertical radius of curvature N at geodetic latitude phi (radians), in metres (Snyder 1987, eq. 4-20). */
    double primeVerticalRadiusM(double latRad) {
        double s = Math.sin(latRad);
        return semiMajorM / Math.sqrt(1.0 - eccentricitySquared() * s * s);
    }
}
