package aequa.projection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;

class DistortionTest {

    @Test
    void albersScaleFactorsMatchSnyder() {
        // Source: Snyder 1987, Appendix A, Albers ellipsoid example (Clarke 1866, 29.5/45.5, origin 23 N 96 W):
        // at 35 N 75 W, k = 0.9915546 along the parallel and h = 1.0085173 along the meridian
        // (reference/worked-examples.md, section 2a). Meridian and parallel are principal directions there.
        EqualAreaProjection albers = Projections.create(ProjectionFamily.ALBERS_CONIC, ReferenceTables.CLARKE_1866,
                Map.of("standard-parallel-1", 29.5, "standard-parallel-2", 45.5, "centre-lat", 23.0, "centre-lon", -96.0));
        Distortion.Tissot t = Distortion.at(albers, ReferenceTables.CLARKE_1866, -75, 35);
        assertEquals(1.0085173, t.maxScale(), 1e-7);
        assertEquals(0.9915546, t.minScale(), 1e-7);
        // omega = 2 asin((a - b)/(a + b)) (Snyder 1987, chapter 4)
        assertEquals(Math.toDegrees(2 * Math.asin((1.0085173 - 0.9915546) / (1.0085173 + 0.9915546))), t.omegaDeg(), 2e-5);
    }

    @Test
    void polarAzimuthalScaleFactorsMatchSnyder() {
        // Source: Snyder 1987, Appendix A, LAEA north polar ellipsoid example (International 1924, lon0 100 W):
        // at 80 N 5 E, k = 1.0038196 and h = 0.9961950 (reference/worked-examples.md, section 1c).
        EqualAreaProjection laea = Projections.create(ProjectionFamily.LAMBERT_AZIMUTHAL, ReferenceTables.INTERNATIONAL_1924,
                Map.of("centre-lat", 90.0, "centre-lon", -100.0));
        Distortion.Tissot t = Distortion.at(laea, ReferenceTables.INTERNATIONAL_1924, 5, 80);
        assertEquals(1.0038196, t.maxScale(), 1e-7);
        assertEquals(0.9961950, t.minScale(), 1e-7);
    }

    @Test
    void cylindricalOmegaFollowsTheClosedForm() {
        // Normal cylindrical equal-area on the ellipsoid: k = cos(phi_s) sqrt(1 - e^2 sin^2 phi) /
        // (cos(phi) sqrt(1 - e^2 sin^2 phi_s)), h = 1/k (Snyder 1987, eqs. 10-13/10-14 as recalled from memory,
        // the ellipsoidal form of 10-1/10-2), so omega = 2 asin(|k^2 - 1| / (k^2 + 1)); omega = 0 on phi_s.
        EqualAreaProjection cea = Projections.create(ProjectionFamily.CYLINDRICAL, Map.of("standard-parallel-1", 30.0));
        double e2 = EllipsoidAxes.WGS84.eccentricitySquared();
        for (double lat : new double[] {0, 15, 30, 45, 60, 75}) {
            double phi = Math.toRadians(lat);
            double phiS = Math.toRadians(30);
            double k = Math.cos(phiS) * Math.sqrt(1 - e2 * Math.sin(phi) * Math.sin(phi))
                    / (Math.cos(phi) * Math.sqrt(1 - e2 * Math.sin(phiS) * Math.sin(phiS)));
            double expected = Math.toDegrees(2 * Math.asin(Math.abs(k * k - 1) / (k * k + 1)));
            assertEquals(expected, Distortion.at(cea, 40, lat).omegaDeg(), 1e-7, "at " + lat);
        }
    }

    @Test
    void omegaIsZeroAtTheCentreOfAzimuthalAndAlongTheCentralLineOfTransverse() {
        assertEquals(0.0, Distortion.at(Projections.lambertAzimuthal(10, 52), 10, 52).omegaDeg(), 0.01);
        EqualAreaProjection transverse = Projections.create(ProjectionFamily.CYLINDRICAL_TRANSVERSE,
                Map.of("centre-lon", -70.0, "centre-lat", 0.0, "standard-line-offset", 0.0));
        // along the central meridian the transverse aspect is true to scale in every direction (up to the
        // authalic sphere's own angular distortion, below 0.13 deg: reference/README.md)
        for (double lat = -80; lat <= 80; lat += 20) {
            assertTrue(Distortion.at(transverse, -70, lat).omegaDeg() < 0.13, "at " + lat);
        }
    }

    @Test
    void batchOmegaMatchesSinglePoints() {
        EqualAreaProjection p = Projections.create(ProjectionFamily.EQUAL_EARTH, Map.of());
        double[] points = {0, 0, 179.9999, 10, -180, -60, 45, 89.99999, 100, -90};
        double[] omega = new double[5];
        Distortion.omegaDeg(p, points, 5, omega);
        for (int i = 0; i < 5; i++) {
            assertEquals(Distortion.at(p, points[2 * i], points[2 * i + 1]).omegaDeg(), omega[i], 1e-6);
            assertTrue(Double.isFinite(omega[i]), "finite at the cut and the poles: " + i);
        }
    }
}
