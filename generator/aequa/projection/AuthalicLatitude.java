package aequa.projection;

/**
 * Geodetic latitude to authalic latitude and back, for one ellipsoid. The authalic sphere of radius
 * {@link #radiusM()} has the ellipsoid's surface area, and the map (lon, phi) to (lon, beta) is
 * equal-area; so any equal-area formula for the sphere, fed beta and scaled by Rq, is exactly equal-area
 * on the ellipsoid.
 *
 * <p>Formulas: Snyder 1987 (USGS Professional Paper 1395) eq. 3-12 for q, 3-11 for beta = asin(q/qp),
 * 3-13 for Rq; the same q and beta appear in IOGP GN 7-2 method 9820. Near the poles asin(q/qp) loses
 * half the digits (q/qp is close to 1), so cos(beta) is computed from qp - q written without cancellation
 * (see {@link #complementOfQ}); this keeps beta good to about 1e-16 rad at every latitude. The inverse
 * starts from Snyder's series eq. 3-18 and refines with Newton's method on beta(phi), whose derivative
 * d(beta)/d(phi) = (dq/dphi) / (qp cos beta) stays finite at the poles; it converges to 1e-15 rad.
 *
 * <p>Angles in radians; NaN in, NaN out. Immutable.
 */
final class AuthalicLatitude {

    private final double e2;
    private final double e;
    private final double qp;
    private final double radiusM;
    // Snyder 1987 eq. 3-18 coefficients of sin(2 beta), sin(4 beta), sin(6 beta)
    private final double series2;
    private final double series4;
    private final double series6;

    AuthalicLatitude(EllipsoidAxes ellipsoid) {
        this.e2 = ellipsoid.eccentricitySquared();
        this.e = Math.sqrt(e2);
        // Snyder 1987 eq. 3-12 at phi = 90 deg: qp = 1 + (1 - e^2) atanh(e) / e (limit 2 for a sphere)
        this.qp = e == 0 ? 2.0 : 1.0 + (1.0 - e2) * atanhOverE(1.0);
        // Snyder 1987 eq. 3-13: Rq = a sqrt(qp / 2)
        this.radiusM = ellipsoid.semiMajorM() * Math.sqrt(qp / 2.0);
        double e4 = e2 * e2;
        double e6 = e4 * e2;
        this.series2 = e2 / 3.0 + 31.0 * e4 / 180.0 + 517.0 * e6 / 5040.0;
        this.series4 = 23.0 * e4 / 360.0 + 251.0 * e6 / 3780.0;
        this.series6 = 761.0 * e6 / 45360.0;
    }

    /** Radius Rq of the authalic sphere, in metres (Snyder 1987, eq. 3-13). */
    double radiusM() {
        return radiusM;
    }

    /** q at the pole, qp (Snyder 1987, eq. 3-12 with phi = 90 deg). */
    double qAtPole() {
        return qp;
    }

    /** q(phi) (Snyder 1987, eq. 3-12), with the logarithm written as atanh: -(1/2e) ln((1-es)/(1+es)) = atanh(es)/e. */
    double q(double latRad) {
        double s = Math.sin(latRad);
        return (1.0 - e2) * (s / (1.0 - e2 * s * s) + atanhOverE(s));
    }

    /** Authalic latitude beta of geodetic latitude phi, both in radians. */
    double toAuthalic(double latRad) {
        double phi = Math.abs(latRad);
        double q = q(phi);
        double d = complementOfQ(phi);
        // sin(beta) = q/qp (eq. 3-11); cos(beta) = sqrt((qp - q)(qp + q)) / qp = sqrt(d (2 qp - d)) / qp
        double beta = Math.atan2(q, Math.sqrt(d * (2.0 * qp - d)));
        return Math.copySign(beta, latRad);
    }

    /** Geodetic latitude phi of authalic latitude beta, both in radians. */
    double toGeodetic(double betaRad) {
        double beta = Math.abs(betaRad);
        if (!(beta < Math.PI / 2)) {
            return beta == Math.PI / 2 ? Math.copySign(beta, betaRad) : Double.NaN;
        }
        // Snyder 1987 eq. 3-18 (series, good to about 1e-9 rad on WGS 84) as the starting value
        double phi = beta + series2 * Math.sin(2 * beta) + series4 * Math.sin(4 * beta) + series6 * Math.sin(6 * beta);
        for (int i = 0; i < 8; i++) {
            double residual = toAuthalic(phi) - beta;
            double step = residual / derivative(phi);
            phi -= step;
            if (Math.abs(step) < 1e-15) {
                break;
            }
        }
        return Math.copySign(Math.min(phi, Math.PI / 2), betaRad);
    }

    /**
     * d(beta)/d(phi) = (dq/dphi) / (qp cos beta), with dq/dphi = 2 (1 - e^2) cos(phi) / (1 - e^2 sin^2 phi)^2
     * (the derivative of Snyder 1987 eq. 3-12, the same factor as in eq. 3-16). cos(phi)/cos(beta) tends to a
     * finite limit at the pole, so the ratio is formed from the accurate cos(beta).
     */
    private double derivative(double phi) {
        double s = Math.sin(phi);
        double w = 1.0 - e2 * s * s;
        double d = complementOfQ(phi);
        double cosBetaTimesQp = Math.sqrt(d * (2.0 * qp - d));
        return 2.0 * (1.0 - e2) * Math.cos(phi) / (w * w * cosBetaTimesQp);
    }

    /**
     * qp - q(phi) for phi >= 0, without the cancellation of subtracting two numbers close to qp. From eq. 3-12:
     * qp - q = (1 - s)(1 + e^2 s) / (1 - e^2 s^2) + (1 - e^2) [atanh(e) - atanh(e s)] / e, and
     * atanh(e) - atanh(e s) = atanh(e (1 - s) / (1 - e^2 s)); 1 - s is formed as cos^2(phi) / (1 + s).
     * (An algebraic rearrangement of Snyder's formula made for aequa; checked against authalic.csv.)
     */
    private double complementOfQ(double phi) {
        double s = Math.sin(phi);
        double c = Math.cos(phi);
        double oneMinusS = c * c / (1.0 + s);
        double algebraic = oneMinusS * (1.0 + e2 * s) / (1.0 - e2 * s * s);
        if (e == 0) {
            return algebraic + oneMinusS;   // sphere: q = 2 sin(phi)
        }
        return algebraic + (1.0 - e2) * atanh(e * oneMinusS / (1.0 - e2 * s)) / e;
    }

    /** atanh(e x) / e, tending to x for a sphere. */
    private double atanhOverE(double x) {
        return e == 0 ? x : atanh(e * x) / e;
    }

    private static double atanh(double x) {
        // 0.5 ln((1+x)/(1-x)) written with log1p for accuracy near zero
        return 0.5 * Math.log1p(2.0 * x / (1.0 - x));
    }
}
