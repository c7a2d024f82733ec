package aequa.planar;

import java.util.List;

import aequa.projection.AspectFrame;
import aequa.projection.EqualAreaProjection;
import aequa.projection.Longitudes;
import aequa.projection.ProjectionFamily;
import aequa.projection.ProjectionParameter;

/**
 * Test-only normal-aspect cylindrical equal-area projection on the authalic sphere, with its cut at
 * lon0 + 180 (frame = geographic frame shifted by lon0). Formulas: Snyder 1987, USGS PP 1395, eq. 10-1
 * (x = R (lon - lon0)), eq. 10-2 with the authalic latitude (y = R sin(beta)), eq. 3-11 (sin beta = q / qp),
 * eq. 3-12 (q), and R = Rq = a sqrt(qp / 2) (eq. 3-13). Equal-area with respect to WGS 84 exactly.
 */
final class AuthalicCylindricalProjection implements EqualAreaProjection {

    private static final double A = 6378137.0;
    private static final double F = 1 / 298.257223563;
    private static final double E2 = F * (2 - F);
    private static final double E = Math.sqrt(E2);
    private static final double QP = q(Math.PI / 2);
    private static final double RQ = A * Math.sqrt(QP / 2);

    private final double lon0Deg;

    AuthalicCylindricalProjection(double lon0Deg) {
        this.lon0Deg = lon0Deg;
    }

    /** Snyder eq. 3-12. */
    private static double q(double phi) {
        double s = Math.sin(phi);
        return (1 - E2) * (s / (1 - E2 * s * s) - 1 / (2 * E) * Math.log((1 - E * s) / (1 + E * s)));
    }

    @Override
    public ProjectionFamily family() {
        return ProjectionFamily.CYLINDRICAL;
    }

    @Override
    public List<ProjectionParameter> parameters() {
        return List.of();
    }

    @Override
    public void forward(double[] src, int srcOffset, double[] dst, int dstOffset, int count) {
        double[] frame = new double[2];
        for (int i = 0; i < count; i++) {
            frame().toFrame(src[srcOffset + 2 * i], src[srcOffset + 2 * i + 1], frame);
            dst[dstOffset + 2 * i] = RQ * Math.toRadians(frame[0]);
            dst[dstOffset + 2 * i + 1] = RQ * q(Math.toRadians(frame[1])) / QP;
        }
    }

    @Override
    public void inverse(double[] src, int srcOffset, double[] dst, int dstOffset, int count) {
        for (int i = 0; i < count; i++) {
            double x = src[srcOffset + 2 * i];
            double qTarget = src[srcOffset + 2 * i + 1] / RQ * QP;
            double phi = Math.asin(Math.max(-1, Math.min(1, qTarget / 2)));
            for (int k = 0; k < 20; k++) { // Newton on q(phi) = qTarget; dq/dphi = 2 (1 - e2) cos(phi) / (1 - e2 sin^2)^2
                double s = Math.sin(phi);
                double derivative = 2 * (1 - E2) * Math.cos(phi) / Math.pow(1 - E2 * s * s, 2);
                phi -= (q(phi) - qTarget) / derivative;
            }
            dst[dstOffset + 2 * i] = Longitudes.normalize(lon0Deg + Math.toDegrees(x / RQ));
            dst[dstOffset + 2 * i + 1] = Math.toDegrees(phi);
        }
    }

    @Override
    public AspectFrame frame() {
        return new AspectFrame() {
            @Override
            public void toFrame(double lonDeg, double latDeg, double[] out) {
                out[0] = Longitudes.normalize(lonDeg - lon0Deg);
                out[1] = latDeg;
            }

            @Override
            public void fromFrame(double frameLonDeg, double frameLatDeg, double[] out) {
                out[0] = Longitudes.normalize(frameLonDeg + lon0Deg);
                out[1] = frameLatDeg;
            }

            @Override
            public double minFrameLatDeg() {
                return -90;
            }

            @Override
            public double maxFrameLatDeg() {
                return 90;
            }
        };
    }

    @Override
    public String wkt2() {
        throw new UnsupportedOperationException("test-only projection has no CRS definition");
    }
}
