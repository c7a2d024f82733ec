package aequa.projection;

/**
 * Equal Earth on the unit sphere (Savric, Patterson and Jenny 2018, "The Equal Earth map projection",
 * IJGIS 33(3), eqs. 1 and 2; IOGP GN 7-2, EPSG method 1078, which applies them to the authalic latitude):
 * sin(theta) = (sqrt(3)/2) sin(lat),
 * x = 2 sqrt(3) lon cos(theta) / (3 (9 A4 theta^8 + 7 A3 theta^6 + 3 A2 theta^2 + A1)),
 * y = A4 theta^9 + A3 theta^7 + A2 theta^3 + A1 theta.
 * The inverse solves the polynomial for theta by Newton's method, as the paper recommends.
 */
final class EqualEarthKernel implements SphereKernel {

    // Savric et al. 2018, Table 1 (also EPSG method 1078)
    private static final double A1 = 1.340264;
    private static final double A2 = -0.081106;
    private static final double A3 = 0.000893;
    private static final double A4 = 0.003796;
    private static final double M = Math.sqrt(3.0) / 2.0;
    private static final double THETA_MAX = Math.PI / 3.0;   // theta at the poles: asin(sqrt(3)/2)

    @Override
    public void forward(double lonRad, double latRad, double[] out) {
        double theta = Math.asin(M * Math.sin(latRad));
        double t2 = theta * theta;
        double t6 = t2 * t2 * t2;
        out[0] = 2.0 * Math.sqrt(3.0) * lonRad * Math.cos(theta) / (3.0 * (9 * A4 * t6 * t2 + 7 * A3 * t6 + 3 * A2 * t2 + A1));
        out[1] = theta * (A1 + A2 * t2 + t6 * (A3 + A4 * t2));
    }

    @Override
    public void inverse(double x, double y, double[] out) {
        double yMax = THETA_MAX * (A1 + A2 * THETA_MAX * THETA_MAX
                + Math.pow(THETA_MAX, 6) * (A3 + A4 * THETA_MAX * THETA_MAX));
        if (!(Math.abs(y) <= yMax * (1.0 + 1e-12))) {
            out[0] = Double.NaN;
            out[1] = Double.NaN;
            return;
        }
        double theta = y / A1;
        for (int i = 0; i < 20; i++) {
            double t2 = theta * theta;
            double t6 = t2 * t2 * t2;
            double f = theta * (A1 + A2 * t2 + t6 * (A3 + A4 * t2)) - y;
            double df = A1 + 3 * A2 * t2 + t6 * (7 * A3 + 9 * A4 * t2);
            double step = f / df;
            theta -= step;
            if (Math.abs(step) < 1e-15) {
                break;
            }
        }
        theta = Math.max(-THETA_MAX, Math.min(THETA_MAX, theta));
        double t2 = theta * theta;
        double t6 = t2 * t2 * t2;
        double lon = 3.0 * x * (9 * A4 * t6 * t2 + 7 * A3 * t6 + 3 * A2 * t2 + A1) / (2.0 * Math.sqrt(3.0) * Math.cos(theta));
        if (Math.abs(lon) > Math.PI * (1.0 + 1e-12)) {
            out[0] = Double.NaN;
            out[1] = Double.NaN;
            return;
        }
        out[0] = Math.max(-Math.PI, Math.min(Math.PI, lon));
        out[1] = Math.asin(Math.max(-1.0, Math.min(1.0, Math.sin(theta) / M)));
    }
}
