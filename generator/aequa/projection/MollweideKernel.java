package aequa.projection;

/**
 * Mollweide on the unit sphere (Snyder 1987, USGS PP 1395, eqs. 31-4, 31-1 and 31-2 with R = 1):
 * 2 theta + sin(2 theta) = pi sin(lat), x = (2 sqrt(2) / pi) lon cos(theta), y = sqrt(2) sin(theta);
 * inverse eqs. 31-6 to 31-8.
 *
 * <p>Snyder solves eq. 31-4 by Newton's method in theta, which converges slowly and loses digits near the
 * poles. aequa substitutes delta = pi - 2|theta|, which turns eq. 31-4 into delta - sin(delta) = pi (1 - |sin
 * lat|): the left side is evaluated by its Taylor series for small delta and the right side as
 * pi cos^2(lat) / (1 + |sin lat|), so no digits cancel; the function is convex and increasing on [0, pi],
 * so Newton's method started above the root at cbrt(6 pi (1 - |sin lat|)) converges monotonically.
 * This keeps the kernel good to about 1e-15 everywhere, which the 1e-9 deg round trips need near the poles.
 */
final class MollweideKernel implements SphereKernel {

    private static final double SQRT2 = Math.sqrt(2.0);

    @Override
    public void forward(double lonRad, double latRad, double[] out) {
        double s = Math.abs(Math.sin(latRad));
        double cosLat = Math.cos(latRad);
        double rhs = Math.PI * cosLat * cosLat / (1.0 + s);
        double delta = solveDelta(rhs);
        double sinTheta = Math.cos(delta / 2.0);
        double cosTheta = Math.sin(delta / 2.0);
        out[0] = 2.0 * SQRT2 / Math.PI * lonRad * cosTheta;
        out[1] = Math.copySign(SQRT2 * sinTheta, latRad);
    }

    @Override
    public void inverse(double x, double y, double[] out) {
        double t = Math.abs(y) / SQRT2;
        if (!(t <= 1.0 + 1e-12)) {
            out[0] = Double.NaN;
            out[1] = Double.NaN;
            return;
        }
        t = Math.min(t, 1.0);
        double halfDelta = Math.atan2(Math.sqrt((1.0 - t) * (1.0 + t)), t);   // pi/2 - |theta|
        double cosTheta = Math.sin(halfDelta);
        double oneMinusS = deltaMinusSinDelta(2.0 * halfDelta) / Math.PI;    // 1 - |sin lat|, eq. 31-7
        double lat = Math.atan2(1.0 - oneMinusS, Math.sqrt(oneMinusS * (2.0 - oneMinusS)));
        double lon = cosTheta == 0 ? 0.0 : Math.PI * x / (2.0 * SQRT2 * cosTheta);   // eq. 31-8
        if (!(Math.abs(lon) <= Math.PI * (1.0 + 1e-12))) {
            out[0] = Double.NaN;
            out[1] = Double.NaN;
            return;
        }
        out[0] = Math.max(-Math.PI, Math.min(Math.PI, lon));
        out[1] = Math.copySign(lat, y);
    }

    /** Solves delta - sin(delta) = rhs for delta in [0, pi], given 0 <= rhs <= pi. */
    private static double solveDelta(double rhs) {
        if (!(rhs > 0)) {
            return rhs == 0 ? 0.0 : Double.NaN;
        }
        double delta = Math.min(Math.cbrt(6.0 * rhs), Math.PI);
        for (int i = 0; i < 60; i++) {
            double half = Math.sin(delta / 2.0);
            double step = (deltaMinusSinDelta(delta) - rhs) / (2.0 * half * half);
            delta -= step;
            if (!(Math.abs(step) > 1e-16 * delta)) {
                break;
            }
        }
        return delta;
    }

    /** delta - sin(delta), by its Taylor series below 0.5 (no cancellation). */
    private static double deltaMinusSinDelta(double delta) {
        if (delta >= 0.5) {
            return delta - Math.sin(delta);
        }
        double d2 = delta * delta;
        return delta * d2 / 6.0 * (1 - d2 / 20.0 * (1 - d2 / 42.0 * (1 - d2 / 72.0 * (1 - d2 / 110.0 * (1 - d2 / 156.0)))));
    }
}
