package aequa.projection;

/**
 * Tissot's indicatrix of a projection at a point, from the projection's Jacobian measured against the
 * ellipsoid's own lengths: a step of d(lon) along a parallel is N cos(phi) d(lon) metres, a step of d(phi)
 * along a meridian is M d(phi) metres (M, N: radii of curvature, Snyder 1987, eqs. 4-18 and 4-20).
 *
 * <p>With J the 2x2 Jacobian so normalised, h^2 + k^2 = |J|_F^2 and h k sin(theta') = |det J| (the scale
 * factors along the meridian and parallel, and the angle at which they cross), and Snyder 1987, eqs. 4-9 to
 * 4-13 (equation numbers from memory) give a' = a + b = sqrt(h^2 + k^2 + 2 h k sin theta'),
 * b' = a - b = sqrt(h^2 + k^2 - 2 h k sin theta') and omega = 2 asin(b'/a'); the area scale is a b = |det J|.
 *
 * <p>The Jacobian is measured by fourth-order central differences with a ground step of {@value #STEP_DEG}
 * deg (in longitude, {@value #STEP_DEG} / cos(lat) deg, at most {@value #MAX_LON_STEP_DEG} deg, so that both
 * steps are as long on the ground and rounding does not grow near the poles). Truncation error is of order
 * (step in rad)^4 / 30, below 1e-11; rounding error about 1e-11 relative; so area scales are good to about
 * 1e-10. Points within about three steps of a pole, of the projection's cut or of
 * the edge of its domain are moved that far inside first, so the differences never straddle a
 * discontinuity. Off the domain the result is NaN.
 */
public final class Distortion {

    /** Step of the numeric derivatives, in degrees (see the class comment for the error budget). */
    static final double STEP_DEG = 1e-3;

    /** Longest longitude step, used near the poles, in degrees. */
    static final double MAX_LON_STEP_DEG = 0.2;

    private static final double MARGIN_DEG = 3 * STEP_DEG;

    /** Five-point central difference: f' = (f(-2h) - 8 f(-h) + 8 f(h) - f(2h)) / (12 h), error O(h^4). */
    private static final double[] FIVE_POINT = {-2, -1, 1, 2};
    private static final double[] FIVE_POINT_WEIGHTS = {1.0 / 12, -8.0 / 12, 8.0 / 12, -1.0 / 12};

    /** Three-point central difference: f' = (f(h) - f(-h)) / (2 h), error O(h^2). */
    private static final double[] THREE_POINT = {-1, 1};
    private static final double[] THREE_POINT_WEIGHTS = {-0.5, 0.5};

    private Distortion() {
    }

    /**
     * The indicatrix at one point.
     *
     * @param areaScale ratio of map area to ellipsoid area at the point (1 for an equal-area projection)
     * @param omegaDeg  maximum angular deformation, in degrees (0 where the projection is conformal)
     * @param maxScale  largest linear scale a
     * @param minScale  smallest linear scale b
     */
    public record Tissot(double areaScale, double omegaDeg, double maxScale, double minScale) {
    }

    /** Tissot's indicatrix of {@code projection} (on WGS 84) at (lonDeg, latDeg). */
    public static Tissot at(EqualAreaProjection projection, double lonDeg, double latDeg) {
        return at(projection, EllipsoidAxes.WGS84, lonDeg, latDeg);
    }

    static Tissot at(EqualAreaProjection projection, EllipsoidAxes ellipsoid, double lonDeg, double latDeg) {
        double[] stencil = new double[4 * FIVE_POINT.length];
        double[] where = new double[2];
        fillStencil(projection.frame(), lonDeg, latDeg, FIVE_POINT, stencil, 0, where);
        projection.forward(stencil, 0, stencil, 0, 2 * FIVE_POINT.length);
        return fromStencil(ellipsoid, FIVE_POINT, FIVE_POINT_WEIGHTS, stencil, 0, where[1]);
    }

    /**
     * omega in degrees at each of {@code count} (lon, lat) points, written to {@code omegaDeg[0..count)}:
     * the batch form used by the automatic choice, with one call to the projection for all points and
     * second-order central differences (half the work; omega still good to about 1e-7 deg, which is all
     * a comparison of candidates needs).
     */
    static void omegaDeg(EqualAreaProjection projection, double[] lonLatDeg, int count, double[] omegaDeg) {
        int perPoint = 4 * THREE_POINT.length;
        double[] stencil = new double[perPoint * count];
        double[] lats = new double[count];
        double[] where = new double[2];
        AspectFrame frame = projection.frame();
        for (int i = 0; i < count; i++) {
            fillStencil(frame, lonLatDeg[2 * i], lonLatDeg[2 * i + 1], THREE_POINT, stencil, perPoint * i, where);
            lats[i] = where[1];
        }
        projection.forward(stencil, 0, stencil, 0, 2 * THREE_POINT.length * count);
        for (int i = 0; i < count; i++) {
            omegaDeg[i] = fromStencil(EllipsoidAxes.WGS84, THREE_POINT, THREE_POINT_WEIGHTS, stencil, perPoint * i, lats[i]).omegaDeg();
        }
    }

    /**
     * Writes the stencil points (lon + m hLon for each multiple m, then lat + m h) around the point, moved
     * inside the frame's domain and away from the poles and the cut, into {@code stencil[offset..)}; the
     * point actually used goes to {@code where}. A point outside the domain gets NaN coordinates.
     */
    private static void fillStencil(AspectFrame frame, double lonDeg, double latDeg, double[] multiples,
                                    double[] stencil, int offset, double[] where) {
        double[] f = new double[2];
        frame.toFrame(lonDeg, latDeg, f);
        int n = multiples.length;
        if (f[1] < frame.minFrameLatDeg() || Double.isNaN(f[1])) {
            java.util.Arrays.fill(stencil, offset, offset + 4 * n, Double.NaN);
            where[0] = Double.NaN;
            where[1] = Double.NaN;
            return;
        }
        double frameLat = Math.max(frame.minFrameLatDeg() + MARGIN_DEG, Math.min(frame.maxFrameLatDeg() - MARGIN_DEG, f[1]));
        double frameLon = f[0];
        if (frame.hasCut()) {
            // the stencil reaches 2 ground steps away; in frame longitude that is 2 steps / cos(frameLat)
            double margin = Math.min(MARGIN_DEG / Math.max(Math.cos(Math.toRadians(frameLat)), 1e-3), 3 * MAX_LON_STEP_DEG);
            frameLon = Math.max(-180.0 + margin, Math.min(180.0 - margin, frameLon));
        }
        if (frameLat != f[1] || frameLon != f[0]) {
            frame.fromFrame(frameLon, frameLat, f);
            lonDeg = f[0];
            latDeg = f[1];
        }
        latDeg = Math.max(-90.0 + MARGIN_DEG, Math.min(90.0 - MARGIN_DEG, latDeg));
        where[0] = lonDeg;
        where[1] = latDeg;
        double hLon = lonStepDeg(latDeg);
        for (int j = 0; j < n; j++) {
            stencil[offset + 2 * j] = lonDeg + multiples[j] * hLon;
            stencil[offset + 2 * j + 1] = latDeg;
            stencil[offset + 2 * n + 2 * j] = lonDeg;
            stencil[offset + 2 * n + 2 * j + 1] = latDeg + multiples[j] * STEP_DEG;
        }
    }

    /** The indicatrix from the projected stencil (n points along lon, then n along lat). */
    private static Tissot fromStencil(EllipsoidAxes ellipsoid, double[] multiples, double[] weights, double[] p, int offset,
                                      double latDeg) {
        double lat = Math.toRadians(latDeg);
        double degree = Math.PI / 180.0;
        double parallelMetresPerDeg = ellipsoid.primeVerticalRadiusM(lat) * Math.cos(lat) * degree;
        double meridianMetresPerDeg = ellipsoid.meridionalRadiusM(lat) * degree;
        double hLon = lonStepDeg(latDeg);
        int n = multiples.length;
        double dxdLon = 0;
        double dydLon = 0;
        double dxdLat = 0;
        double dydLat = 0;
        for (int j = 0; j < n; j++) {
            dxdLon += weights[j] * p[offset + 2 * j];
            dydLon += weights[j] * p[offset + 2 * j + 1];
            dxdLat += weights[j] * p[offset + 2 * n + 2 * j];
            dydLat += weights[j] * p[offset + 2 * n + 2 * j + 1];
        }
        dxdLon /= hLon * parallelMetresPerDeg;
        dydLon /= hLon * parallelMetresPerDeg;
        dxdLat /= STEP_DEG * meridianMetresPerDeg;
        dydLat /= STEP_DEG * meridianMetresPerDeg;
        double sumSquares = dxdLon * dxdLon + dydLon * dydLon + dxdLat * dxdLat + dydLat * dydLat;
        double areaScale = Math.abs(dxdLon * dydLat - dxdLat * dydLon);
        double aPlusB = Math.sqrt(sumSquares + 2 * areaScale);
        double aMinusB = Math.sqrt(Math.max(0.0, sumSquares - 2 * areaScale));
        double omegaDeg = Math.toDegrees(2 * Math.asin(Math.min(1.0, aMinusB / aPlusB)));
        return new Tissot(areaScale, omegaDeg, (aPlusB + aMinusB) / 2, (aPlusB - aMinusB) / 2);
    }

    private static double lonStepDeg(double latDeg) {
        return Math.min(STEP_DEG / Math.cos(Math.toRadians(latDeg)), MAX_LON_STEP_DEG);
    }
}
