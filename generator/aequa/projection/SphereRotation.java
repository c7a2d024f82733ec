package aequa.projection;

/**
 * A rotation of the unit sphere that carries geographic (lon, lat) to the (frameLon, frameLat) of an aspect
 * frame: the "transformation to a new pole" of Snyder 1987 (USGS PP 1395), eqs. 5-7 and 5-8, written as a
 * 3x3 orthonormal matrix acting on unit vectors so that forward and inverse are exact transposes and no
 * special case is needed at the old or new pole. Latitudes are those of the sphere being rotated (aequa
 * rotates the authalic sphere). Angles in radians; frame longitudes in [-pi, pi]; NaN in, NaN out.
 *
 * <p>The rows of the matrix are the frame's axes in geographic Cartesian coordinates: {@code e1} points at
 * frame (0, 0), {@code e2} at frame (90 deg E, 0), {@code e3} at the frame's north pole. Immutable.
 */
final class SphereRotation {

    private final boolean normalAspect;
    private final double centralLonRad;
    private final double[] m;

    private SphereRotation(boolean normalAspect, double centralLonRad, double[] m) {
        this.normalAspect = normalAspect;
        this.centralLonRad = centralLonRad;
        this.m = m;
    }

    /** The normal aspect: frame = geographic, shifted so that {@code centralLonDeg} becomes frame longitude 0. */
    static SphereRotation normal(double centralLonDeg) {
        double lon0 = Math.toRadians(centralLonDeg);
        double c = Math.cos(lon0);
        double s = Math.sin(lon0);
        return new SphereRotation(true, lon0, new double[] {c, s, 0, -s, c, 0, 0, 0, 1});
    }

    /**
     * A frame whose origin (frame lon 0, frame lat 0) is the given point and whose equator leaves it in the
     * direction {@code azimuthDeg} (clockwise from north); the frame pole lies 90 deg to the left of that
     * direction. Azimuth 90 at latitude 0 is the normal aspect; azimuth 0 is the transverse aspect whose
     * equator is the meridian through the point.
     */
    static SphereRotation centredOn(double lonDeg, double latDeg, double azimuthDeg) {
        double[] origin = unitVector(Math.toRadians(lonDeg), Math.toRadians(latDeg));
        double[] north = northTangent(Math.toRadians(lonDeg), Math.toRadians(latDeg));
        double[] east = eastTangent(Math.toRadians(lonDeg));
        double az = Math.toRadians(azimuthDeg);
        double[] along = new double[3];
        for (int i = 0; i < 3; i++) {
            along[i] = Math.sin(az) * east[i] + Math.cos(az) * north[i];
        }
        return fromAxes(origin, along, cross(origin, along));
    }

    /**
     * A frame whose north pole is the given point (for azimuthal projections). Frame longitude 0 runs from the
     * pole towards geographic south along the meridian of {@code lonDeg}, and frame longitude grows eastwards;
     * with the pole at the geographic north pole this is {@link #normal(double)}.
     */
    static SphereRotation poleAt(double lonDeg, double latDeg) {
        double lon = Math.toRadians(lonDeg);
        double lat = Math.toRadians(latDeg);
        double[] pole = unitVector(lon, lat);
        double[] north = northTangent(lon, lat);
        double[] south = {-north[0], -north[1], -north[2]};
        return fromAxes(south, cross(pole, south), pole);
    }

    /** Writes (frameLon, frameLat) in radians of the point (lon, lat) in radians into {@code out[0..1]}. */
    void forward(double lonRad, double latRad, double[] out) {
        if (normalAspect) {
            out[0] = wrap(lonRad - centralLonRad);
            out[1] = latRad;
            return;
        }
        double cosLat = Math.cos(latRad);
        double x = cosLat * Math.cos(lonRad);
        double y = cosLat * Math.sin(lonRad);
        double z = Math.sin(latRad);
        double fx = m[0] * x + m[1] * y + m[2] * z;
        double fy = m[3] * x + m[4] * y + m[5] * z;
        double fz = m[6] * x + m[7] * y + m[8] * z;
        out[0] = Math.atan2(fy, fx);
        out[1] = Math.atan2(fz, Math.hypot(fx, fy));
    }

    /** The inverse of {@link #forward}: writes (lon, lat) in radians, lon in [-pi, pi]. */
    void inverse(double frameLonRad, double frameLatRad, double[] out) {
        if (normalAspect) {
            out[0] = wrap(frameLonRad + centralLonRad);
            out[1] = frameLatRad;
            return;
        }
        double cosLat = Math.cos(frameLatRad);
        double fx = cosLat * Math.cos(frameLonRad);
        double fy = cosLat * Math.sin(frameLonRad);
        double fz = Math.sin(frameLatRad);
        double x = m[0] * fx + m[3] * fy + m[6] * fz;
        double y = m[1] * fx + m[4] * fy + m[7] * fz;
        double z = m[2] * fx + m[5] * fy + m[8] * fz;
        out[0] = Math.atan2(y, x);
        out[1] = Math.atan2(z, Math.hypot(x, y));
    }

    /**
     * The rotation as a row-major 3x3 matrix on geographic unit vectors (frame = M x geographic), for writing
     * it out ({@link ProjStrings}); the normal aspect's matrix is the turn by its central longitude.
     */
    double[] matrix() {
        return m.clone();
    }

    /** Wraps an angle into [-pi, pi]; values already inside are returned unchanged. */
    static double wrap(double rad) {
        if (rad >= -Math.PI && rad <= Math.PI) {
            return rad;
        }
        return Math.IEEEremainder(rad, 2 * Math.PI);
    }

    private static SphereRotation fromAxes(double[] e1, double[] e2, double[] e3) {
        return new SphereRotation(false, 0, new double[] {e1[0], e1[1], e1[2], e2[0], e2[1], e2[2], e3[0], e3[1], e3[2]});
    }

    private static double[] unitVector(double lon, double lat) {
        return new double[] {Math.cos(lat) * Math.cos(lon), Math.cos(lat) * Math.sin(lon), Math.sin(lat)};
    }

    /** Unit vector pointing north at (lon, lat); at a pole, the limit along the meridian lon. */
    private static double[] northTangent(double lon, double lat) {
        return new double[] {-Math.sin(lat) * Math.cos(lon), -Math.sin(lat) * Math.sin(lon), Math.cos(lat)};
    }

    private static double[] eastTangent(double lon) {
        return new double[] {-Math.sin(lon), Math.cos(lon), 0};
    }

    private static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }
}
