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
        double[] stencil = new double[16];
        double[] where = new double[2];
        fillStencil(projection.frame(), lonDeg, latDeg, stencil, 0, where);
        projection.forward(stencil, 0, stencil, 0, 8);
        return fromStencil(ellipsoid, stencil, 0, where[1]);
    }

    /**
     * omega in degrees at each of {@code count} (lon, lat) points, written to {@code omegaDeg[0..count)}:
     * the batch form used by the automatic choice (one call to the projection for all points).
     */
    static void omegaDeg(EqualAreaProjection projection, double[] lonLatDeg, int count, double[] omegaDeg) {
        double[] stencil = new double[16 * count];
        double[] lats = new double[count];
        double[] where = new double[2];
        AspectFrame frame = projection.frame();
        for (int i = 0; i < count; i++) {
            fillStencil(frame, lonLatDeg[2 * i], lonLatDeg[2 * i + 1], stencil, 16 * i, where);
            lats[i] = where[1];
        }
        projection.forward(stencil, 0, stencil, 0, 8 * count);
        for (int i = 0; i < count; i++) {
            omegaDeg[i] = fromStencil(EllipsoidAxes.WGS84, stencil, 16 * i, lats[i]).omegaDeg();
        }
    }

    /**
     * Writes the 8 stencil points (lon +-h, +-2h; lat +-h, +-2h) around the point, moved inside the frame's
     * domain and away from the poles and the cut, into {@code stencil[offset..offset+16)}; the point actually
     * used goes to {@code where}. A point outside the domain gets NaN coordinates.
     */
    private static void fillStencil(AspectFrame frame, double lonDeg, double latDeg, double[] stencil, int offset,
                                    double[] where) {
        double[] f = new double[2];
        frame.toFrame(lonDeg, latDeg, f);
        if (f[1] < frame.minFrameLatDeg() || Double.isNaN(f[1])) {
            java.util.Arrays.fill(stencil, offset, offset + 16, Double.NaN);
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
        double[] multiples = {-2, -1, 1, 2};
        for (int j = 0; j < 4; j++) {
            stencil[offset + 2 * j] = lonDeg + multiples[j] * hLon;
            stencil[offset + 2 * j + 1] = latDeg;
            stencil[offset + 8 + 2 * j] = lonDeg;
            stencil[offset + 8 + 2 * j + 1] = latDeg + multiples[j] * STEP_DEG;
        }
    }

    /** The indicatrix from 8 projected stencil points (4 along lon, then 4 along lat). */
    private static Tissot fromStencil(EllipsoidAxes ellipsoid, double[] p, int offset, double latDeg) {
        double lat = Math.toRadians(latDeg);
        double degree = Math.PI / 180.0;
        double parallelMetresPerDeg = ellipsoid.primeVerticalRadiusM(lat) * Math.cos(lat) * degree;
        double meridianMetresPerDeg = ellipsoid.meridionalRadiusM(lat) * degree;
        // five-point central difference: f' = (f(-2h) - 8 f(-h) + 8 f(h) - f(2h)) / (12 h)
        double hLon = lonStepDeg(latDeg);
        double dxdLon = derivative(p[offset], p[offset + 2], p[offset + 4], p[offset + 6], hLon) / parallelMetresPerDeg;
        double dydLon = derivative(p[offset + 1], p[offset + 3], p[offset + 5], p[offset + 7], hLon) / parallelMetresPerDeg;
        double dxdLat = derivative(p[offset + 8], p[offset + 10], p[offset + 12], p[offset + 14], STEP_DEG) / meridianMetresPerDeg;
        double dydLat = derivative(p[offset + 9], p[offset + 11], p[offset + 13], p[offset + 15], STEP_DEG) / meridianMetresPerDeg;
        double sumSquares = dxdLon * dxdLon + dydLon * dydLon + dxdLat * dxdLat + dydLat * dydLat;
        double areaScale = Math.abs(dxdLon * dydLat - dxdLat * dydLon);
        double aPlusB = Math.sqrt(sumSquares + 2 * areaScale);
        double aMinusB = Math.sqrt(Math.max(0.0, sumSquares - 2 * areaScale));
        double omegaDeg = Math.toDegrees(2 * Math.asin(Math.min(1.0, aMinusB / aPlusB)));
        return new Tissot(areaScale, omegaDeg, (aPlusB + aMinusB) / 2, (aPlusB - aMinusB) / 2);
    }

    private static double derivative(double minus2, double minus1, double plus1, double plus2, double step) {
        return (minus2 - 8 * minus1 + 8 * plus1 - plus2) / (12 * step);
    }

    private static double lonStepDeg(double latDeg) {
        return Math.min(STEP_DEG / Math.cos(Math.toRadians(latDeg)), MAX_LON_STEP_DEG);
    }
}
